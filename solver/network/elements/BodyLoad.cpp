#include "solver/network/elements/BodyLoad.hpp"

namespace coldtip {

BodyLoad::BodyLoad(int solid, std::unique_ptr<LoadLaw> law, const std::vector<SolidNode>& solids,
                   int quad_load)
    : m_solid(solid), m_law(std::move(law)), m_s(&solids.at(solid)), m_quad_load(quad_load)
{
    m_stencil.addInput(m_s->offset);
    m_stencil.addOutput(m_s->offset);
    m_stencil.depends(0, 0);
}

std::string BodyLoad::describe() const { return m_law->describe() + " on " + m_s->name; }

void BodyLoad::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const SolidState<double>& s = (*v.solid)[m_solid];
    const double Q = m_law->heat(v.t, s.T).value;
    ydot[m_s->offset] += Q / s.C;
    if (quad) quad[m_quad_load] += Q;
}

void BodyLoad::addJacobian(const NetworkView& v, double* values) const
{
    const auto s = v.seededSolid<1>(m_solid, 0);
    const Dual<1> rate = chain(m_law->heat(v.t, s.T.v), s.T) / s.C;
    m_stencil.scatter(&rate, values);
}

} // namespace coldtip
