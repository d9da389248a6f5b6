// Ideal limit (R. Radebaugh, "A review of pulse tube refrigeration", Adv. Cryog. Eng. 35,
// 1191, 1990; physics reference §7.2): with a regenerator whose gas follows the matrix
// temperature and an adiabatic pulse tube, the gross cooling at the cold end equals the
// acoustic power entering the pulse tube there, <Q_c> = <H>_c = 1/2 Re[p1 conj(U1,c)],
// within 2 %. Rig: tests/data/linear/ideal-pulse-tube.yaml (invented).
#include <catch2/catch.hpp>

#include <cmath>

#include "solver/input/CaseReader.hpp"
#include "solver/linear/LinearAnalysis.hpp"

using namespace coldtip;

TEST_CASE("linear model: ideal pulse tube cools by its cold-end acoustic power", "[linear]")
{
    Machine machine(input::readCaseFile(COLDTIP_TEST_DATA "/linear/ideal-pulse-tube.yaml"));
    const LinearSolution s = solveLinear(machine, linearMeanState(machine));
    const MachinePhasors m = machinePhasors(machine, firstHarmonics(machine, s));
    const double Q = m.summary.gross_cooling_W, E = m.summary.cold_end_acoustic_power_W;
    WARN("linear: gross cooling " << Q << " W, cold-end acoustic power " << E << " W, ratio "
                                  << Q / E);
    REQUIRE(E > 0.0);
    CHECK(Q / E == Approx(1.0).epsilon(0.02));
}
