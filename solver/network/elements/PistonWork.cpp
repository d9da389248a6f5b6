#include "solver/network/elements/PistonWork.hpp"

namespace coldtip {

PistonWork::PistonWork(int cell, const std::vector<GasCell>& cells, int quad_work)
    : m_cell(cell), m_c(&cells.at(cell)), m_quad_work(quad_work)
{
    m_stencil.addInput(m_c->offset + 1);
    m_stencil.addOutput(m_c->offset + 1);
    m_stencil.depends(0, 0);
}

std::string PistonWork::describe() const { return "piston work on " + m_c->name; }

void PistonWork::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const double power = -(*v.gas)[m_cell].p * m_c->volumeRateAt(v.t);
    ydot[m_c->offset + 1] += power;
    if (quad) quad[m_quad_work] += power;
}

void PistonWork::addJacobian(const NetworkView& v, double* values) const
{
    // p = (gamma - 1) E / V, so d(-p dV/dt)/dE = -(gamma - 1) (dV/dt) / V.
    const double gm1 = v.properties->gamma - 1.0;
    const Dual<1> E = Dual<1>::seed(v.y[m_c->offset + 1], 0);
    const Dual<1> power = -gm1 * E / m_c->volumeAt(v.t) * m_c->volumeRateAt(v.t);
    m_stencil.scatter(&power, values);
}

HeatLoad::HeatLoad(int solid, double load, const std::vector<SolidNode>& solids, int quad_load)
    : m_solid(solid), m_load(load), m_s(&solids.at(solid)), m_quad_load(quad_load)
{
    m_stencil.addInput(m_s->offset);
    m_stencil.addOutput(m_s->offset);
    m_stencil.depends(0, 0);
}

std::string HeatLoad::describe() const { return "applied load on " + m_s->name; }

void HeatLoad::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    ydot[m_s->offset] += m_load / (*v.solid)[m_solid].C;
    if (quad) quad[m_quad_load] += m_load;
}

void HeatLoad::addJacobian(const NetworkView& v, double* values) const
{
    const auto s = v.seededSolid<1>(m_solid, 0);
    const Dual<1> rate = m_load / s.C;
    m_stencil.scatter(&rate, values);
}

} // namespace coldtip
