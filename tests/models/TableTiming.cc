// Standalone timing of the property-table lookups on the engine's hot path (not a Catch2
// test: timings depend on the machine and its load). Deliberately a .cc file so that the
// test-suite glob (tests/*.cpp) does not pick it up. Build and run after building the
// models library, e.g.:
//   g++ -O3 -DNDEBUG -std=c++20 -I/work/main tests/models/TableTiming.cc \
//       build-<you>/libcoldtip_models.a -o /tmp/table_timing && /tmp/table_timing
// It prints nanoseconds per call for: TransportTable viscosity + conductivity at
// regenerator-like states (helium, 3 MPa, 30-300 K), the same at random states over the
// whole table, the direct helium model for comparison, and SolidTable lookups.

#include <chrono>
#include <cstdio>
#include <random>
#include <vector>

#include "models/gas/TransportTable.hpp"
#include "models/gas/WorkingGas.hpp"
#include "models/solids/SolidMaterial.hpp"
#include "models/solids/SolidTable.hpp"

using namespace coldtip::models;

namespace {

struct State {
    double T, rho;
};

template <class F>
double nanosecondsPerCall(const std::vector<State>& states, int repeats, F f)
{
    double sink = 0.0;
    const auto start = std::chrono::steady_clock::now();
    for (int r = 0; r < repeats; ++r) {
        for (const State& s : states) {
            sink += f(s);
        }
    }
    const auto stop = std::chrono::steady_clock::now();
    const double ns = std::chrono::duration<double, std::nano>(stop - start).count();
    if (sink == 42.0) {
        std::printf("(unlikely)\n");
    }
    return ns / (static_cast<double>(repeats) * static_cast<double>(states.size()));
}

} // namespace

int main()
{
    const auto helium = makeWorkingGas("helium");
    const auto t0 = std::chrono::steady_clock::now();
    const TransportTable table(*helium, 2.5, 1500.0, 200.0);
    const auto t1 = std::chrono::steady_clock::now();
    std::printf("helium table 2.5-1500 K x 0-200 kg/m^3: %d x %d cells, build %.0f ms, "
                "estimated max deviation %.1e\n",
                table.temperatureCells(), table.densityCells(),
                std::chrono::duration<double, std::milli>(t1 - t0).count(),
                table.estimatedError());

    std::mt19937 rng(7);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    // 300 regenerator-like states: T from 300 K to 30 K, p = 3 MPa +- 10 %.
    std::vector<State> regenerator;
    for (int i = 0; i < 300; ++i) {
        const double T = 300.0 - 270.0 * i / 299.0 + unit(rng);
        const double p = 3e6 * (0.9 + 0.2 * unit(rng));
        regenerator.push_back({T, p / (helium->gasConstant() * T)});
    }
    std::vector<State> scattered;
    for (int i = 0; i < 4096; ++i) {
        scattered.push_back({2.5 * std::pow(600.0, unit(rng)), 200.0 * unit(rng)});
    }

    auto both = [&](const State& s) {
        const Slope2 mu = table.viscosity(s.T, s.rho);
        const Slope2 k = table.conductivity(s.T, s.rho);
        return mu.value + mu.d_dT + mu.d_drho + k.value + k.d_dT + k.d_drho;
    };
    auto viscosityOnly = [&](const State& s) {
        const Slope2 mu = table.viscosity(s.T, s.rho);
        return mu.value + mu.d_dT + mu.d_drho;
    };
    auto direct = [&](const State& s) {
        return helium->viscosity(s.T, s.rho) + helium->conductivity(s.T, s.rho);
    };
    nanosecondsPerCall(regenerator, 2000, both); // warm-up
    std::printf(
        "TransportTable, regenerator states: %.1f ns per lookup (viscosity alone %.1f)\n",
        nanosecondsPerCall(regenerator, 20000, both) / 2.0,
        nanosecondsPerCall(regenerator, 20000, viscosityOnly));
    std::printf("TransportTable, random states over the table: %.1f ns per lookup\n",
                nanosecondsPerCall(scattered, 2000, both) / 2.0);
    std::printf("Helium model directly: %.1f ns per property\n",
                nanosecondsPerCall(regenerator, 500, direct) / 2.0);

    const auto steel = makeSolidMaterial("stainless-304");
    const SolidTable solid(*steel);
    auto solidLookups = [&](const State& s) {
        const Slope c = solid.specificHeat(s.T);
        const Slope k = solid.conductivity(s.T);
        return c.value + c.slope + k.value + k.slope;
    };
    std::vector<State> enthalpies;
    for (const State& s : regenerator) {
        enthalpies.push_back({solid.enthalpy(s.T), 0.0});
    }
    auto enthalpy = [&](const State& s) { return solid.enthalpy(s.T); };
    auto inversion = [&](const State& s) { return solid.temperatureFromEnthalpy(s.T); };
    std::printf("SolidTable c_p or k: %.1f ns per lookup; enthalpy %.1f ns; "
                "temperatureFromEnthalpy %.1f ns\n",
                nanosecondsPerCall(regenerator, 20000, solidLookups) / 2.0,
                nanosecondsPerCall(regenerator, 20000, enthalpy),
                nanosecondsPerCall(enthalpies, 5000, inversion));
    return 0;
}
