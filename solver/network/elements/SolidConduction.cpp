#include "solver/network/elements/SolidConduction.hpp"

#include <stdexcept>

namespace coldtip {

SolidConduction::SolidConduction(int i, int j, double wall_temperature,
                                 const std::vector<SolidNode>& solids, int quad_heat)
    : m_i(i), m_j(j), m_wall_temperature(wall_temperature), m_a(&solids.at(i)),
      m_quad_heat(quad_heat)
{
    if (j >= 0) m_b = &solids.at(j);
    const bool resistive = m_a->length > 0.0 || (m_b && m_b->length > 0.0);
    if (!resistive)
        throw std::logic_error("conduction between " + m_a->name + " and " +
                               (m_b ? m_b->name : std::string("a fixed wall")) +
                               " has no resistance");
    m_stencil.addInput(m_a->offset);
    m_stencil.addInput(m_b ? m_b->offset : m_a->offset);
    m_stencil.addOutput(m_a->offset);
    m_stencil.addOutput(m_b ? m_b->offset : -1);
    for (int o = 0; o < 2; ++o) {
        m_stencil.depends(o, 0);
        if (m_b) m_stencil.depends(o, 1);
    }
}

std::string SolidConduction::describe() const
{
    return "solid conduction " + m_a->name + " -> " + (m_b ? m_b->name : "wall");
}

template <class S>
S SolidConduction::heatFlow(const SolidState<S>& a, const SolidState<S>* b) const
{
    S resistance(0.0);
    if (m_a->length > 0.0) resistance += 0.5 * m_a->length / a.kA;
    if (b && m_b->length > 0.0) resistance += 0.5 * m_b->length / b->kA;
    const S Tb = b ? b->T : S(m_wall_temperature);
    return (a.T - Tb) / resistance;
}

void SolidConduction::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const auto& solid = *v.solid;
    const double Q = heatFlow(solid[m_i], m_b ? &solid[m_j] : nullptr);
    ydot[m_a->offset] -= Q / solid[m_i].C;
    if (m_b) ydot[m_b->offset] += Q / solid[m_j].C;
    if (quad && m_quad_heat >= 0) quad[m_quad_heat] += Q;
}

void SolidConduction::addJacobian(const NetworkView& v, double* values) const
{
    using D = Dual<2>;
    const auto a = v.seededSolid<2>(m_i, 0);
    D out[2];
    if (m_b) {
        const auto b = v.seededSolid<2>(m_j, 1);
        const D Q = heatFlow(a, &b);
        out[0] = -Q / a.C;
        out[1] = Q / b.C;
    } else {
        out[0] = -heatFlow<D>(a, nullptr) / a.C;
    }
    m_stencil.scatter(out, values);
}

} // namespace coldtip
