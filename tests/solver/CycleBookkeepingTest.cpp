// Conservation over whole cycles of the demo cooler, from its initial state (far from the
// periodic steady state, so the stored energy still changes from cycle to cycle): the gas
// mass is constant, and the work and heat that cross the machine's boundary equal the
// change of the energy stored in its gas and solids. On every cycle with net refrigeration
// the COP stays below Carnot's.
#include <catch2/catch.hpp>

#include <cmath>
#include <fstream>
#include <sstream>

#include "solver/cycle/CycleMetrics.hpp"
#include "tests/solver/SolverTestSupport.hpp"

using namespace coldtip;

namespace {

std::string demoText()
{
    std::ifstream in(COLDTIP_CASES "/ge-spectrometer-85K.yaml");
    std::stringstream s;
    s << in.rdbuf();
    return s.str();
}

//! Energy stored in the machine: gas internal energy plus solid internal energy [J].
double storedEnergy(const Network& net, std::span<const double> y)
{
    double U = 0.0;
    for (const GasCell& c : net.cells()) U += y[c.offset + 1];
    for (std::size_t s = 0; s < net.solids().size(); ++s)
        U += net.solidEnergy(static_cast<int>(s), y[net.solids()[s].offset]);
    return U;
}

struct Bookkeeping {
    int cycles = 0;
    int refrigerating = 0;  //!< cycles with positive cooling power
    double worst_mass = 0.0;   //!< max |relative mass change| per cycle
    double worst_energy = 0.0; //!< max |W + Q - dU| / |W| per cycle
    double best_carnot_fraction = -1e300;
};

//! Runs `n` cycles of the case from its initial state, checking every one.
Bookkeeping checkCycles(const CaseDescription& d, int n)
{
    Machine machine(d);
    const Network& net = machine.network();
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    runner.start(0, machine.initialState());
    Bookkeeping b;
    for (int k = 1; k <= n; ++k) {
        const CycleRecord r = runner.runCycle();
        const CycleMetrics m = cycleMetrics(machine, r);
        const double period = r.t_end - r.t_start;
        INFO(d.source_path << ", cycle " << k);

        const double M0 = net.totalMass(r.start_state), M1 = net.totalMass(r.end_state);
        const double mass_change = std::abs(M1 - M0) / M0;
        CHECK(mass_change < 1e-10);
        CHECK(std::abs(m.mass_change) < 1e-10);

        // First law for the machine as a closed system over one cycle (common practice):
        // PV work + heat in - heat out = change of stored energy.
        const double W = m.pv_power * period;
        const double Q = m.external_heat_in * period;
        const double dU = storedEnergy(net, r.end_state) - storedEnergy(net, r.start_state);
        const double energy_error = std::abs(W + Q - dU) / std::abs(W);
        INFO("W = " << W << " J, Q = " << Q << " J, dU = " << dU << " J");
        CHECK(energy_error < 1e-3);

        // Second law: COP <= T_c / (T_h - T_c) (Carnot; physics.md §7.3).
        const double Tc = m.cold_temperature, Th = m.reject_temperature;
        REQUIRE(Th > Tc);
        if (m.cooling_power > 0.0) {
            ++b.refrigerating;
            CHECK(m.cop < Tc / (Th - Tc));
            CHECK(m.carnot_fraction < 1.0);
            b.best_carnot_fraction = std::max(b.best_carnot_fraction, m.carnot_fraction);
        }
        b.worst_mass = std::max(b.worst_mass, mass_change);
        b.worst_energy = std::max(b.worst_energy, energy_error);
        ++b.cycles;
    }
    return b;
}

} // namespace

TEST_CASE("demo cooler conserves mass and closes its energy balance over every cycle",
          "[physics]")
{
    const CaseDescription d = input::parseCaseText(demoText(), "ge-spectrometer-85K.yaml");
    const Bookkeeping b = checkCycles(d, 5);
    CHECK(b.cycles == 5);
    // The worst cycle, for the record (each cycle is checked above).
    CHECK(b.worst_mass < 1e-10);
    CHECK(b.worst_energy < 1e-3);
}

TEST_CASE("demo cooler with a 250 K cold end refrigerates below the Carnot COP",
          "[physics]")
{
    // The demo's cold end at 85 K gives no net refrigeration within the first hundred cycles
    // (the regenerator profile is still forming); held at 250 K it refrigerates early.
    std::string text = demoText();
    const std::string cold = "wall: {temperature: 85 K}";
    const auto at = text.find(cold);
    REQUIRE(at != std::string::npos);
    text.replace(at, cold.size(), "wall: {temperature: 250 K}");
    const CaseDescription d = input::parseCaseText(text, "cold-end-250K.yaml");
    const Bookkeeping b = checkCycles(d, 12);
    CHECK(b.refrigerating >= 3);
    CHECK(b.best_carnot_fraction < 1.0);
}
