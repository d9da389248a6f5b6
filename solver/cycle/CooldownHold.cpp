#include "solver/cycle/CooldownHold.hpp"

namespace coldtip {

CooldownHold::CooldownHold(int solid, const std::vector<SolidNode>& solids, int quad_heat)
    : m_solid(solid), m_s(&solids.at(solid)), m_quad_heat(quad_heat)
{
    m_stencil.addInput(m_s->offset);
    m_stencil.addOutput(m_s->offset);
    m_stencil.depends(0, 0);
}

std::string CooldownHold::describe() const { return "cooldown hold on " + m_s->name; }

void CooldownHold::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    if (m_rate == 0.0) return;
    const SolidState<double>& s = (*v.solid)[m_solid];
    const double rate = -(s.T - m_T_hold) * m_rate;
    ydot[m_s->offset] += rate;
    if (quad) quad[m_quad_heat] -= s.C * rate;
}

void CooldownHold::addJacobian(const NetworkView& v, double* values) const
{
    const auto s = v.seededSolid<1>(m_solid, 0);
    const Dual<1> rate = -(s.T - m_T_hold) * m_rate;
    m_stencil.scatter(&rate, values);
}

} // namespace coldtip
