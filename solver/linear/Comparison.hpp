#pragma once
//! \file Comparison.hpp
//! Nonlinear periodic cycle against the linear distributed and the lumped model, side by
//! side (issue: `coldtip compare`). The nonlinear phasors are the DFT harmonics of the
//! sampled last cycle (Harmonics.hpp) at every cell and face; the cycle-mean quantities
//! (PV power, gross cooling) are the exact cycle integrals, and the DFT is checked against
//! them: the PV power from the first harmonics, 1/2 Re[p1 conj(-i omega V1)] (the drive
//! volume has no other harmonic), must equal the exact <-p dV/dt> up to the DFT's
//! aliasing. The linear models are linearised about the nonlinear cycle's own mean
//! temperature profile, so the differences are the machine's nonlinearity.

#include <string>
#include <vector>

#include "solver/cycle/CycleRunner.hpp"
#include "solver/linear/LinearAnalysis.hpp"
#include "solver/linear/LumpedModel.hpp"

namespace coldtip {

//! Mean and first three harmonic amplitudes at one component port.
struct PortHarmonics {
    std::string component, port;  //!< "regenerator", "inlet"
    double pressure[4] = {0, 0, 0, 0};  //!< mean, |p1|, |p2|, |p3| [Pa]
    double mass_flow[4] = {0, 0, 0, 0}; //!< mean, |mdot1|, |mdot2|, |mdot3| [kg/s]
};

//! One row of the side-by-side table.
struct ComparedQuantity {
    std::string key;   //!< with its unit: "cooling_power_W", "phase_cold_end_deg"
    double nonlinear = 0.0, linear = 0.0, lumped = 0.0;
    //! (model - nonlinear)/|nonlinear| for amounts; model - nonlinear [deg] for phases.
    double linear_difference = 0.0, lumped_difference = 0.0;
    bool phase = false;
};

//! What the nonlinear cycle gives from its exact integrals.
struct CycleIntegrals {
    double pv_power_W = 0.0;
    double gross_cooling_W = 0.0;
    bool converged = false;
    long cycles = 0;
    double wall_time_s = 0.0;
};

struct AmplitudeComparison {
    double scale = 1.0; //!< drive amplitude multiplier
    MachinePhasors nonlinear, linear, lumped;
    std::vector<PortHarmonics> harmonics;
    std::vector<ComparedQuantity> table;
    CycleIntegrals integrals;
    double pv_power_dft_W = 0.0;     //!< from the first harmonics
    double dft_check = 0.0;          //!< |dft - exact| / |exact| [-]
    double max_p2_over_p1 = 0.0, max_p3_over_p1 = 0.0; //!< over all ports
};

struct Comparison {
    std::string case_name;
    double frequency_Hz = 0.0;
    std::vector<AmplitudeComparison> amplitudes;
};

//! Harmonic k >= 1 of every cell pressure and temperature and face and orifice flow of a
//! sampled cycle (time from a period boundary), referred to the piston displacement;
//! densities are cycle means. The machine's piston sets the reference.
FirstHarmonics cycleHarmonics(const Machine& machine, const CycleSamples& samples, int k);

//! Cycle-mean gas temperature per cell and solid temperature per node of a sampled cycle.
void cycleMeanTemperatures(const Machine& machine, const CycleSamples& samples,
                           std::vector<double>& cell_T, std::vector<double>& solid_T);

//! The comparison at the machine's present drive scale, from its converged sampled cycle.
AmplitudeComparison compareCycle(Machine& machine, const CycleSamples& samples,
                                 const CycleIntegrals& integrals);

} // namespace coldtip
