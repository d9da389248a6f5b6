#include "solver/linear/OrificePhasors.hpp"

#include "models/correlations/OrificeFlow.hpp"
#include "solver/network/elements/OrificeLink.hpp"

namespace coldtip {

namespace {
//! Cell whose mass state sits at `offset`.
int cellAt(const Network& net, int offset)
{
    for (std::size_t i = 0; i < net.cells().size(); ++i)
        if (net.cells()[i].offset == offset) return static_cast<int>(i);
    return -1;
}
} // namespace

std::vector<OrificeOnPath> networkOrifices(const Network& net)
{
    std::vector<OrificeOnPath> out;
    for (std::size_t e = 0; e < net.elements().size(); ++e) {
        const auto* o = dynamic_cast<const OrificeLink*>(net.elements()[e].get());
        if (!o) continue;
        // The stencil's inputs are (m_a, E_a, m_b, E_b) of the two cells.
        out.push_back({o, static_cast<int>(e), cellAt(net, o->stencil().input(0)),
                       cellAt(net, o->stencil().input(2))});
    }
    return out;
}

double orificeFlow(const Network& net, const OrificeOnPath& o, const GasState<double>& a,
                   const GasState<double>& b)
{
    const GasProperties& gas = net.gas();
    return models::orificeMassFlow(a.p, a.T, b.p, b.T, o.link->dischargeArea(), gas.R, gas.gamma)
        .mdot;
}

std::vector<OrificePhasor> orificePhasors(const Network& net, const std::vector<double>& y_m,
                                          const std::vector<std::complex<double>>& y1)
{
    const GasProperties& gas = net.gas();
    std::vector<OrificePhasor> out;
    for (const OrificeOnPath& o : networkOrifices(net)) {
        // p = (gamma - 1) E/V and T = E/(m c_v), to first order in (m1, E1).
        auto linear = [&](int cell, double& p, double& T, std::complex<double>& p1,
                          std::complex<double>& T1) {
            const GasCell& c = net.cells()[cell];
            const double m = y_m[c.offset], E = y_m[c.offset + 1], V = c.volumeAt(0.0);
            p = (gas.gamma - 1.0) * E / V;
            T = E / (m * gas.cv);
            p1 = (gas.gamma - 1.0) * y1[c.offset + 1] / V;
            T1 = (y1[c.offset + 1] - T * gas.cv * y1[c.offset]) / (m * gas.cv);
        };
        double pa, Ta, pb, Tb;
        std::complex<double> pa1, Ta1, pb1, Tb1;
        linear(o.from, pa, Ta, pa1, Ta1);
        linear(o.to, pb, Tb, pb1, Tb1);
        const models::OrificeFlow f =
            models::orificeMassFlow(pa, Ta, pb, Tb, o.link->dischargeArea(), gas.R, gas.gamma);
        out.push_back({o, f.d_dpa * pa1 + f.d_dTa * Ta1 + f.d_dpb * pb1 + f.d_dTb * Tb1});
    }
    return out;
}

} // namespace coldtip
