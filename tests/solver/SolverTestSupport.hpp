#pragma once
//! \file SolverTestSupport.hpp
//! What the engine-level physics tests share: the test rigs of tests/data/solver/, the gas
//! state of one cell, and a blow-down run from a buffer at raised pressure.

#include <algorithm>
#include <span>
#include <string>
#include <vector>

#include "solver/components/Machine.hpp"
#include "solver/cycle/CycleRunner.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/network/GasState.hpp"

namespace coldtip::testing {

//! A test rig's case file from tests/data/solver/.
inline CaseDescription rigCase(const std::string& file)
{
    return input::readCaseFile(COLDTIP_TEST_DATA "/solver/" + file);
}

//! Gas state (p [Pa], T [K], rho [kg/m^3], mu [Pa s], ...) of cell i at (t, y).
inline GasState<double> cellGas(const Machine& machine, std::span<const double> y, int i,
                                double t)
{
    const GasCell& c = machine.network().cells()[i];
    return gasState(y[c.offset], y[c.offset + 1], c.volumeAt(t), machine.network().gas());
}

//! Index of the component named `name` in the network, -1 if none.
inline int componentIndex(const Machine& machine, const std::string& name)
{
    const auto& slices = machine.network().components();
    for (std::size_t k = 0; k < slices.size(); ++k)
        if (slices[k].name == name) return static_cast<int>(k);
    return -1;
}

//! One state of a blow-down run.
struct Snapshot {
    double t = 0.0;         //!< [s]
    std::vector<double> y;
};

//! Blow-down: the machine's initial state with the gas of cell 0 (the compression space,
//! used as a buffer) raised to `factor` times its pressure at unchanged temperature
//! (m and E both scaled), integrated from t = 0 and kept at the increasing `times` [s].
inline std::vector<Snapshot> blowDown(Machine& machine, double factor,
                                      const std::vector<double>& times)
{
    std::vector<double> y0 = machine.initialState();
    const int k = machine.network().cells()[0].offset;
    y0[k] *= factor;
    y0[k + 1] *= factor;
    CvodeSession session(machine.network(), CycleRunner::optionsFor(machine), 0.0, y0);
    std::vector<Snapshot> out;
    for (double t : times) {
        session.advance(t, times.back());
        const auto y = session.state();
        out.push_back({t, {y.begin(), y.end()}});
    }
    return out;
}

//! A blow-down state read across the passage joining the first buffer (cell 0) to the
//! last one (the network's last cell), for the isothermal steady-flow checks.
struct PassageReading {
    double dp = 0.0;       //!< p(first buffer) - p(last buffer) [Pa]
    double T = 0.0;        //!< mean gas temperature of the passage's cells [K]
    double T_spread = 0.0; //!< largest minus smallest of those [K]
    //! Density at T and the mean of the end pressures [kg/m^3]. For isothermal flow at a
    //! fixed Reynolds number, integrating dp/dx ~ mdot / rho with rho = p / (R T) along
    //! the passage gives the incompressible law at this mean density.
    double rho = 0.0;
    double mu = 0.0;       //!< viscosity at (T, rho) [Pa s]
    double mdot = 0.0;     //!< mass flow into the passage's middle cell [kg/s]
};

inline PassageReading readPassage(const Machine& machine, const Snapshot& s, int component)
{
    const Network& net = machine.network();
    const ComponentSlice& slice = net.components().at(component);
    const int last = static_cast<int>(net.cells().size()) - 1;
    const double p_a = cellGas(machine, s.y, 0, s.t).p;
    const double p_b = cellGas(machine, s.y, last, s.t).p;
    PassageReading r;
    r.dp = p_a - p_b;
    double T_lo = 1e300, T_hi = 0.0;
    for (int i = slice.first_cell; i <= slice.last_cell; ++i) {
        const double T = cellGas(machine, s.y, i, s.t).T;
        r.T += T;
        T_lo = std::min(T_lo, T);
        T_hi = std::max(T_hi, T);
    }
    r.T /= slice.last_cell - slice.first_cell + 1;
    r.T_spread = T_hi - T_lo;
    r.rho = 0.5 * (p_a + p_b) / (net.gas().R * r.T);
    r.mu = net.gas().transport->viscosity(r.T, r.rho).value;
    const int mid = (slice.first_cell + slice.last_cell + 1) / 2;
    for (const FlowFace& f : net.faces())
        if (f.to == mid) r.mdot = s.y[f.offset];
    return r;
}

} // namespace coldtip::testing
