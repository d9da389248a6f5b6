#include "solver/linear/OrificePhasors.hpp"

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

std::vector<OrificePhasor> orificePhasors(const Network& net, const std::vector<double>& y_m,
                                          const std::vector<std::complex<double>>& y1)
{
    std::vector<OrificePhasor> out;
    const NetworkView v = net.view(0.0, y_m);
    for (std::size_t e = 0; e < net.elements().size(); ++e) {
        const auto* o = dynamic_cast<const OrificeLink*>(net.elements()[e].get());
        if (!o) continue;
        // The stencil's inputs are (m_a, E_a, m_b, E_b) of the two cells.
        OrificePhasor p;
        p.element = static_cast<int>(e);
        p.from = cellAt(net, o->stencil().input(0));
        p.to = cellAt(net, o->stencil().input(2));
        double part[2];
        for (int k = 0; k < 2; ++k) {
            auto seeded = [&](int cell) {
                const GasCell& c = net.cells()[cell];
                Dual<4> m(y_m[c.offset]), E(y_m[c.offset + 1]); // the width the element instantiates
                m.d[0] = k == 0 ? y1[c.offset].real() : y1[c.offset].imag();
                E.d[0] = k == 0 ? y1[c.offset + 1].real() : y1[c.offset + 1].imag();
                return gasState(m, E, c.volumeAt(0.0), net.gas());
            };
            part[k] = o->compute(seeded(p.from), seeded(p.to), v).mass_flow.d[0];
        }
        p.mass_flow = {part[0], part[1]};
        out.push_back(p);
    }
    return out;
}

} // namespace coldtip
