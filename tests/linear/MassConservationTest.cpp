// The linear solution conserves mass cell by cell: i omega m1 equals the net inflow of
// mdot1 through the cell's faces and orifices (equivalently the divergence of the volume
// flow balances the compliance term i omega (V rho1 + rho V1)). Common practice: a
// conservative finite-volume scheme keeps this to round-off.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>

#include "solver/input/CaseReader.hpp"
#include "solver/linear/LinearAnalysis.hpp"

using namespace coldtip;

TEST_CASE("the linear solution conserves mass in every cell", "[linear]")
{
    for (const std::string& path : {std::string(COLDTIP_CASES "/ge-spectrometer-85K.yaml"),
                                   std::string(COLDTIP_TEST_DATA "/solver/cli-valid.yaml")}) {
        INFO(path);
        Machine machine(input::readCaseFile(path));
        const LinearSolution s = solveLinear(machine, linearMeanState(machine));
        double flow = 0.0, worst = 0.0;
        for (const Complex& m : s.mass_flow) flow = std::max(flow, std::abs(m));
        for (const Complex& r : s.mass_residual) worst = std::max(worst, std::abs(r));
        REQUIRE(flow > 0.0);
        CHECK(worst / flow < 1e-10);
    }
}
