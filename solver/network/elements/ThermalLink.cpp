#include "solver/network/elements/ThermalLink.hpp"

namespace coldtip {

ThermalLink::ThermalLink(int a, int b, Conductor conductor, const std::vector<SolidNode>& solids,
                         int quad_heat)
    : m_a(a), m_b(b), m_conductor(conductor), m_na(&solids.at(a)), m_nb(&solids.at(b)),
      m_quad_heat(quad_heat)
{
    m_stencil.addInput(m_na->offset);
    m_stencil.addInput(m_nb->offset);
    m_stencil.addOutput(m_na->offset);
    m_stencil.addOutput(m_nb->offset);
    for (int o = 0; o < 2; ++o) m_stencil.dependsOnAll(o);
}

std::string ThermalLink::describe() const
{
    return "thermal link " + m_na->name + " -> " + m_nb->name;
}

void ThermalLink::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const auto& solid = *v.solid;
    const double Q = m_conductor.heat(solid[m_a].T, solid[m_b].T);
    ydot[m_na->offset] -= Q / solid[m_a].C;
    ydot[m_nb->offset] += Q / solid[m_b].C;
    if (quad && m_quad_heat >= 0) quad[m_quad_heat] += Q;
}

void ThermalLink::addJacobian(const NetworkView& v, double* values) const
{
    using D = Dual<2>;
    const auto a = v.seededSolid<2>(m_a, 0);
    const auto b = v.seededSolid<2>(m_b, 1);
    const D Q = m_conductor.heat(a.T, b.T);
    const D out[2] = {-Q / a.C, Q / b.C};
    m_stencil.scatter(out, values);
}

} // namespace coldtip
