#include "solver/network/elements/WallHeatTransfer.hpp"

#include <cmath>
#include <stdexcept>

#include "solver/network/elements/PassageLaws.hpp"

namespace coldtip {

WallHeatTransfer::WallHeatTransfer(int cell, int face_in, int face_out, int solid,
                                   double wall_temperature, const std::vector<GasCell>& cells,
                                   const std::vector<FlowFace>& faces,
                                   const std::vector<SolidNode>& solids, int quad_heat)
    : m_cell(cell), m_solid(solid), m_wall_temperature(wall_temperature), m_c(&cells.at(cell)),
      m_quad_heat(quad_heat)
{
    if (!m_c->passage || m_c->length <= 0.0)
        throw std::logic_error("wall heat transfer needs a passage cell: " + m_c->name);
    m_area = m_c->passage->wettedAreaPerVolume() * m_c->frontal_area * m_c->length;
    if (isOpenTube(m_c->passage)) m_oscillating.omega = driveAngularFrequency(cells);
    if (face_in >= 0) m_face_in_offset = faces.at(face_in).offset;
    if (face_out >= 0) m_face_out_offset = faces.at(face_out).offset;
    auto& s = m_stencil;
    s.addInput(m_c->offset);
    s.addInput(m_c->offset + 1);
    s.addInput(m_face_in_offset >= 0 ? m_face_in_offset : m_c->offset);
    s.addInput(m_face_out_offset >= 0 ? m_face_out_offset : m_c->offset);
    s.addInput(solid >= 0 ? solids.at(solid).offset : m_c->offset);
    s.addOutput(m_c->offset + 1);
    s.addOutput(solid >= 0 ? solids.at(solid).offset : -1);
    for (int o = 0; o < 2; ++o) {
        s.depends(o, 0);
        s.depends(o, 1);
        if (m_face_in_offset >= 0) s.depends(o, 2);
        if (m_face_out_offset >= 0) s.depends(o, 3);
        if (solid >= 0) s.depends(o, 4);
    }
}

std::string WallHeatTransfer::describe() const { return "wall heat transfer at " + m_c->name; }

template <class S>
S WallHeatTransfer::meanFlow(const S& a, const S& b) const
{
    if (m_face_in_offset >= 0 && m_face_out_offset >= 0) return 0.5 * (a + b);
    return m_face_in_offset >= 0 ? a : b;
}

template <class S>
S WallHeatTransfer::heatToGas(const GasState<S>& g, const S& mdot_in, const S& mdot_out,
                              const S& T_s, const NetworkView& v) const
{
    const models::FlowPassage& passage = *m_c->passage;
    const S mdot = meanFlow(mdot_in, mdot_out);
    const PassageFlow<S> f = passageFlow(passage, m_c->flow_area, g, mdot, v.flow_smoothing,
                                         v.properties->cp);
    const S Nu = m_oscillating.active()
                     ? oscillatingTubeNusselt(f, g, passage, v.properties->cp, m_oscillating)
                     : nusselt(passage, f.Re, f.Pr);
    const S h = Nu * g.k / passage.hydraulicDiameter();
    return h * m_area * (T_s - g.T);
}

void WallHeatTransfer::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const double m_in = m_face_in_offset >= 0 ? v.y[m_face_in_offset] : 0.0;
    const double m_out = m_face_out_offset >= 0 ? v.y[m_face_out_offset] : 0.0;
    const double Ts = m_solid >= 0 ? (*v.solid)[m_solid].T : m_wall_temperature;
    const double Q = heatToGas((*v.gas)[m_cell], m_in, m_out, Ts, v);
    ydot[m_c->offset + 1] += Q;
    if (m_solid >= 0) ydot[m_stencil.output(1)] -= Q / (*v.solid)[m_solid].C;
    if (quad && m_quad_heat >= 0) quad[m_quad_heat] += Q;
}

void WallHeatTransfer::addJacobian(const NetworkView& v, double* values) const
{
    using D = Dual<5>;
    const auto g = v.seededGas<5>(m_cell, 0);
    const D m_in = D::seed(m_face_in_offset >= 0 ? v.y[m_face_in_offset] : 0.0, 2);
    const D m_out = D::seed(m_face_out_offset >= 0 ? v.y[m_face_out_offset] : 0.0, 3);
    D out[2];
    if (m_solid >= 0) {
        const auto s = v.seededSolid<5>(m_solid, 4);
        out[0] = heatToGas(g, m_in, m_out, s.T, v);
        out[1] = -out[0] / s.C;
    } else {
        out[0] = heatToGas(g, m_in, m_out, D(m_wall_temperature), v);
    }
    m_stencil.scatter(out, values);
}

FilmHeatTransfer::FilmHeatTransfer(int cell, double bore, double coefficient,
                                   double wall_temperature, const std::vector<GasCell>& cells,
                                   int quad_heat)
    : m_cell(cell), m_bore(bore), m_h(coefficient), m_wall_temperature(wall_temperature),
      m_c(&cells.at(cell)), m_quad_heat(quad_heat)
{
    m_stencil.addInput(m_c->offset);
    m_stencil.addInput(m_c->offset + 1);
    m_stencil.addOutput(m_c->offset + 1);
    m_stencil.dependsOnAll(0);
}

std::string FilmHeatTransfer::describe() const { return "film heat transfer at " + m_c->name; }

template <class S>
S FilmHeatTransfer::heatToGas(const GasState<S>& g) const
{
    const double piston_area = 0.25 * M_PI * m_bore * m_bore;
    const double area = 2.0 * piston_area + 4.0 * g.V / m_bore;
    return m_h * area * (m_wall_temperature - g.T);
}

void FilmHeatTransfer::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const double Q = heatToGas((*v.gas)[m_cell]);
    ydot[m_c->offset + 1] += Q;
    if (quad) quad[m_quad_heat] += Q;
}

void FilmHeatTransfer::addJacobian(const NetworkView& v, double* values) const
{
    const Dual<2> Q = heatToGas(v.seededGas<2>(m_cell, 0));
    m_stencil.scatter(&Q, values);
}

} // namespace coldtip
