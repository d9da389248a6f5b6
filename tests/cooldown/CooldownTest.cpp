// The cooldown transient (coldtip cooldown): the accelerated method (averaged slow equation)
// against plain cycle-by-cycle integration on a small invented cold head, its end state
// against the periodic steady-state solver, its energy accounting against the NIST enthalpy
// of the cold bodies, and the parasitic-load laws against hand calculations.
#include <catch2/catch.hpp>

#include <cmath>
#include <fmt/format.h>
#include <functional>

#include "models/solids/SolidMaterial.hpp"
#include "models/solids/SolidTable.hpp"
#include "solver/components/Machine.hpp"
#include "solver/cycle/Cooldown.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/network/elements/RadiationLoad.hpp"
#include "solver/network/elements/SupportConduction.hpp"

using namespace coldtip;

namespace {

const char* const kCase = COLDTIP_TEST_DATA "/cooldown/small-cold-head.yaml";

//! Composite Simpson rule with n (even) intervals.
double simpson(const std::function<double(double)>& f, double a, double b, int n = 4000)
{
    const double h = (b - a) / n;
    double s = f(a) + f(b);
    for (int i = 1; i < n; ++i) s += (i % 2 ? 4.0 : 2.0) * f(a + i * h);
    return s * h / 3.0;
}

//! A cooldown of the small cold head; time_limit [s] replaces the case's when > 0.
CooldownOutcome cool(const std::string& method, double time_limit = 0.0)
{
    const CaseDescription d = input::readCaseFile(kCase);
    Machine machine(d);
    CooldownOptions o = cooldownOptionsFor(machine, method);
    if (time_limit > 0.0) o.time_limit = time_limit;
    return runCooldown(machine, o);
}

//! The cold bodies' enthalpy drop from the start to the end of the cooldown by hand: both
//! are 10 g of copper (the case file), m integral_{T_end}^{T_start} c_p dT with c_p the
//! NIST cryogenic fit for OFHC copper (NIST Cryogenic Material Properties database, copper
//! RRR 50 specific-heat fit) integrated by Simpson's rule [J].
double enthalpyDrop(const CooldownOutcome& out)
{
    const auto copper = models::makeSolidMaterial("copper");
    const double T0 = out.history.front().cold_temperature;
    double drop = 0.0;
    for (double T : out.history.back().body_temperatures)
        drop += 0.010 * simpson([&](double x) { return copper->specificHeat(x); }, T, T0);
    return drop;
}

void checkEnergy(const CooldownOutcome& out)
{
    REQUIRE(out.history.size() >= 2);
    REQUIRE(out.history.back().body_temperatures.size() == 2);
    const double by_hand = enthalpyDrop(out);
    INFO(fmt::format("{}: integral of net cooling {:.4f} J, NIST enthalpy drop {:.4f} J, "
                     "the run's own {:.4f} J",
                     out.method, out.net_cooling_integral, by_hand, out.body_energy_change));
    CHECK(by_hand > 100.0);
    CHECK(std::abs(out.net_cooling_integral - by_hand) <= 0.01 * by_hand);
}

} // namespace

TEST_CASE("accelerated cooldown reaches 280, 260 and 245 K within 2 % of the plain times, "
          "net cooling integral equal to the NIST enthalpy drop within 1 %",
          "[cooldown]")
{
    // The case's time limit (32 s) ends both runs just after the last report temperature.
    const CooldownOutcome plain = cool("plain");
    const CooldownOutcome fast = cool("accelerated");
    REQUIRE(plain.status != "failed");
    REQUIRE(fast.status != "failed");
    REQUIRE(plain.reports.size() == 3);
    REQUIRE(fast.reports.size() == 3);
    INFO(fmt::format("wall time {:.1f} s plain ({} cycles), {:.1f} s accelerated ({} cycles)",
                     plain.wall_time_s, plain.cycles, fast.wall_time_s, fast.cycles));
    for (std::size_t k = 0; k < 3; ++k) {
        const double tp = plain.reports[k].time, ta = fast.reports[k].time;
        INFO(fmt::format("{:g} K: plain {:.3f} s, accelerated {:.3f} s ({:+.3f} %)",
                         plain.reports[k].temperature, tp, ta, 100.0 * (ta - tp) / tp));
        REQUIRE(std::isfinite(tp));
        REQUIRE(std::isfinite(ta));
        CHECK(std::abs(ta - tp) <= 0.02 * tp);
    }
    checkEnergy(plain);
    checkEnergy(fast);
}

TEST_CASE("accelerated cooldown settles within 0.1 K of the steady solver's cold "
          "temperature, net cooling integral equal to the NIST enthalpy drop within 1 %",
          "[cooldown]")
{
    const CooldownOutcome fast = cool("accelerated", 1800.0);
    REQUIRE(fast.status == "settled");
    REQUIRE(fast.steady_checked);
    REQUIRE(fast.final_cycle.converged);
    // The steady solver from the end state of the slow integration (runCooldown).
    const double T_slow = fast.history.back().cold_temperature;
    const double T_steady = fast.steady_cold_temperature;
    INFO(fmt::format("slow integration settled at {:.3f} K at {:.1f} s, steady solver "
                     "{:.3f} K; wall {:.1f} s",
                     T_slow, fast.end_time, T_steady, fast.wall_time_s));
    // Issue 5 asks for 0.1 K. With the hold's time constant at 5 periods the slow equation
    // settled 0.45 K above the steady state here (CooldownAveraged.cpp, kHoldPeriods).
    CHECK(std::abs(T_slow - T_steady) <= 0.1);
    checkEnergy(fast);
}

TEST_CASE("radiation load equals the Stefan-Boltzmann law by hand", "[cooldown-loads]")
{
    // Stefan-Boltzmann law between a small grey body and a large enclosure, Q = sigma eps A
    // (T_amb^4 - T^4) (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed.
    // 2007, eq. 1.7), sigma = 5.670374419e-8 W/(m^2 K^4) (CODATA 2018).
    const double sigma = 5.670374419e-8, eps = 0.02, A = 150e-4, Ta = 300.0;
    const RadiationLoad load(A, eps, Ta);
    for (double T : {300.0, 150.0, 80.0, 20.0}) {
        const models::Slope q = load.heat(0.0, T);
        const double by_hand = sigma * eps * A * (Ta * Ta * Ta * Ta - T * T * T * T);
        INFO("T = " << T << " K: " << q.value << " W against " << by_hand << " W");
        CHECK(q.value == Approx(by_hand).epsilon(1e-12).margin(1e-15));
        CHECK(q.slope == Approx(-4.0 * sigma * eps * A * T * T * T).epsilon(1e-12));
    }
    // 150 cm^2 behind a blanket of effective emissivity 0.02 at 80 K: 0.137 W (by hand:
    // 5.670374e-8 * 0.02 * 0.015 * (8.1e9 - 4.096e7) = 0.13709 W).
    CHECK(load.heat(0.0, 80.0).value == Approx(0.13709).epsilon(1e-4));
}

TEST_CASE("support conduction equals a Simpson quadrature of the NIST G-10 conductivity fit",
          "[cooldown-loads]")
{
    // NIST Cryogenic Material Properties database, G-10 CR (normal direction) thermal
    // conductivity fit; conductivity integral Q = n (A/L) integral_T^{T_amb} k dT (Ekin,
    // Experimental Techniques for Low-Temperature Measurements, 2006, sec. 2.2), here by
    // Simpson's rule with 4000 intervals on the fit itself, not on the engine's table.
    const auto g10 = models::makeSolidMaterial("g10");
    const models::SolidTable table(*g10);
    const double A = 12e-6, L = 0.040, Ta = 300.0;
    const int n = 3;
    const SupportConduction support(table, A, L, n, Ta);
    for (double T : {250.0, 150.0, 80.0, 20.0}) {
        const double by_quadrature =
            n * A / L * simpson([&](double x) { return g10->conductivity(x); }, T, Ta);
        const models::Slope q = support.heat(0.0, T);
        INFO("T = " << T << " K: " << q.value << " W against " << by_quadrature << " W");
        CHECK(q.value == Approx(by_quadrature).epsilon(1e-4));
        CHECK(q.slope == Approx(-n * A / L * g10->conductivity(T)).epsilon(1e-4));
    }
}
