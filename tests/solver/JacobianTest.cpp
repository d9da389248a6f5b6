// The Jacobian CVODE uses (exact local partials from dual numbers, scattered on the fixed
// sparsity pattern) against a central-difference Jacobian of the whole network.
#include <catch2/catch.hpp>

#include <cmath>
#include <map>

#include "solver/components/Machine.hpp"
#include "solver/cycle/CycleRunner.hpp"
#include "solver/input/CaseReader.hpp"

using namespace coldtip;

namespace {

enum class Kind { Mass, Energy, Flow, Solid };

Kind kindOf(const Network& net, int k)
{
    const std::string name = net.stateName(k);
    if (name.ends_with(".m")) return Kind::Mass;
    if (name.ends_with(".E")) return Kind::Energy;
    if (name.ends_with(".mdot")) return Kind::Flow;
    return Kind::Solid;
}

//! A mid-cycle state of the demo machine, with flow in every face.
std::vector<double> demoState(Machine& machine, double& t)
{
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    runner.runCycle();
    t = runner.session().advance(1.3 * machine.period(), 2.0 * machine.period());
    const auto y = runner.session().state();
    return {y.begin(), y.end()};
}

} // namespace

TEST_CASE("network Jacobian matches central differences on the demo state", "[jacobian]")
{
    const CaseDescription d = input::readCaseFile(COLDTIP_CASES "/ge-spectrometer-85K.yaml");
    Machine machine(d);
    const Network& net = machine.network();
    double t = 0.0;
    const std::vector<double> y = demoState(machine, t);
    const int n = net.size();
    const SparsityPattern& p = net.pattern();
    std::vector<double> values(p.nnz());
    net.jacobian(t, y, values);

    // Central differences with one Richardson step, (4 D(h/2) - D(h)) / 3: the truncation
    // error falls from O(h^2) to O(h^4), which the steep (but smooth) extremum switch of the
    // face reconstruction needs for a 1e-6 comparison.
    std::vector<double> yp = y, ym = y, fp(n), fm(n), d1(n), d2(n);
    auto central = [&](int k, double h, std::vector<double>& d) {
        yp[k] = y[k] + h;
        ym[k] = y[k] - h;
        net.evaluate(t, yp, fp, nullptr);
        net.evaluate(t, ym, fm, nullptr);
        yp[k] = ym[k] = y[k];
        for (int i = 0; i < n; ++i) d[i] = (fp[i] - fm[i]) / (2.0 * h);
    };
    // Block maxima: |J_fd| and |J_fd - J| per (row kind, column kind).
    std::map<std::pair<Kind, Kind>, std::pair<double, double>> blocks;
    long outside_nonzero = 0;
    for (int k = 0; k < n; ++k) {
        const double h = 1e-6 * std::max(std::abs(y[k]), 1e-3 * machine.massFlowScale());
        central(k, h, d1);
        central(k, 0.5 * h, d2);
        long slot = p.column_starts[k];
        for (int i = 0; i < n; ++i) {
            const double fd = (4.0 * d2[i] - d1[i]) / 3.0;
            double analytic = 0.0;
            bool in_pattern = false;
            while (slot < p.column_starts[k + 1] && p.row_indices[slot] < i) ++slot;
            if (slot < p.column_starts[k + 1] && p.row_indices[slot] == i) {
                analytic = values[slot];
                in_pattern = true;
            }
            if (!in_pattern) {
                // Nothing couples: the difference quotient is exactly zero.
                if (fd != 0.0) ++outside_nonzero;
                continue;
            }
            auto& b = blocks[{kindOf(net, i), kindOf(net, k)}];
            b.first = std::max(b.first, std::abs(fd));
            b.second = std::max(b.second, std::abs(fd - analytic));
        }
    }
    CHECK(outside_nonzero == 0);
    for (const auto& [key, b] : blocks) {
        if (b.first == 0.0) continue;
        INFO("block (" << int(key.first) << ", " << int(key.second) << "): max |J| " << b.first
                       << ", max error " << b.second);
        CHECK(b.second / b.first < 1e-6);
    }
}
