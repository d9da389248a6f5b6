#pragma once
//! \file LinearResult.hpp
//! Output of the frequency-domain commands: the `--json` objects of `coldtip linear` and
//! `coldtip compare` (layout in docs/linear-json.md) and the HDF5 groups /linear and
//! /compare, written through Hdf5Writer next to the usual /case and /grid.

#include <nlohmann/json.hpp>
#include <string>

#include "solver/linear/Comparison.hpp"
#include "solver/linear/LinearAnalysis.hpp"
#include "solver/linear/LumpedModel.hpp"
#include "solver/output/Hdf5File.hpp"
#include "solver/output/ResultFile.hpp"

namespace coldtip {

//! One port: pressure_amplitude_Pa, pressure_phase_deg, mass_flow_amplitude_kg_s,
//! mass_flow_phase_deg, volume_flow_amplitude_m3_s, volume_flow_phase_deg, flow_phase_deg,
//! acoustic_power_W, enthalpy_flow_W.
nlohmann::json toJson(const PortPhasor& port);
//! {"components": {name: {kind, inlet, outlet, input_impedance}}, "summary": {...}}.
nlohmann::json toJson(const MachinePhasors& phasors);
//! {name: {kind, inertance_kg_m4, compliance_m3_Pa, resistance_Pa_s_m3, ...}}.
nlohmann::json toJson(const LumpedModel& lumped);
nlohmann::json toJson(const Comparison& comparison);

//! /case attributes (case text, tool version, command line) of a frequency-domain file,
//! with /summary (case, status, frequency_Hz) and /grid/components as every coldtip file.
void writeCaseAttributes(Hdf5Writer& w, const Machine& machine, const RunInfo& info);
//! Port phasors of every component under `group`/components and the summary attributes.
void writePhasors(Hdf5Writer& w, const std::string& group, const MachinePhasors& phasors);
//! /linear: cells, faces (distributed solution), components, summary, lumped elements.
void writeLinear(Hdf5Writer& w, const Machine& machine, const LinearSolution* distributed,
                 const MachinePhasors& phasors, const LumpedModel* lumped);
//! /compare: one subgroup per drive amplitude with nonlinear, linear and lumped phasors,
//! harmonic content and the summary table.
void writeComparison(Hdf5Writer& w, const Comparison& comparison);

} // namespace coldtip
