#include "solver/network/elements/MomentumFace.hpp"

#include <stdexcept>
#include <type_traits>

#include "solver/network/elements/FaceReconstruction.hpp"
#include "solver/network/elements/PassageLaws.hpp"

namespace coldtip {

MomentumFace::MomentumFace(const FlowFace& face, int face_index, int before, int after,
                           const std::vector<GasCell>& cells, int quad_enthalpy,
                           int quad_conduction)
    : m_face(face), m_index(face_index), m_before(before), m_after(after),
      m_a(&cells.at(face.from)), m_b(&cells.at(face.to)), m_quad_h(quad_enthalpy),
      m_quad_q(quad_conduction)
{
    if (before >= 0) m_before_cell = &cells.at(before);
    if (after >= 0) m_after_cell = &cells.at(after);
    for (const GasCell* c : {m_a, m_b})
        if (c->length > 0.0) m_inertance += 0.5 * c->length / c->flow_area;
    m_oscillating.omega = driveAngularFrequency(cells);
    m_tube_a = hasTubeMomentumClosure(*m_a);
    m_tube_b = hasTubeMomentumClosure(*m_b);
    if (m_inertance <= 0.0)
        throw std::logic_error("face " + face.name + " joins two lumped volumes: it has no "
                               "inertance (put a passage or an orifice between them)");
    auto& s = m_stencil;
    for (int col : {m_a->offset, m_a->offset + 1, m_b->offset, m_b->offset + 1, face.offset})
        s.addInput(col);
    // Cells beyond a and b enter the energy fluxes through the reconstruction only.
    const GasCell* before_cell = m_before_cell ? m_before_cell : m_a;
    const GasCell* after_cell = m_after_cell ? m_after_cell : m_b;
    for (int col : {before_cell->offset, before_cell->offset + 1, after_cell->offset,
                    after_cell->offset + 1})
        s.addInput(col);
    for (int row : {m_a->offset, m_a->offset + 1, m_b->offset, m_b->offset + 1, face.offset})
        s.addOutput(row);
    s.depends(0, 4);
    s.depends(2, 4);
    for (int o : {1, 3}) {
        for (int k = 0; k < 5; ++k) s.depends(o, k);
        if (m_before_cell) {
            s.depends(o, 5);
            s.depends(o, 6);
        }
        if (m_after_cell) {
            s.depends(o, 7);
            s.depends(o, 8);
        }
    }
    for (int k = 0; k < 5; ++k) s.depends(4, k);
}

std::string MomentumFace::describe() const { return "momentum face " + m_face.name; }

template <class S>
MomentumFace::Result<S> MomentumFace::compute(const GasState<S>* before, const GasState<S>& a,
                                              const GasState<S>& b, const GasState<S>* after,
                                              const S& mdot, const NetworkView& v) const
{
    const double eps = v.flow_smoothing;
    const double cp = v.properties->cp;
    S drop(0.0);
    S inertance(0.0);
    S resistance(0.0); // thermal, [K/W]
    bool conducts = false;
    auto half = [&](const GasCell& c, int cell, const GasState<S>& g, bool tube) {
        if (c.length <= 0.0) return;
        const double l = 0.5 * c.length;
        const PassageFlow<S> pf = passageFlow(*c.passage, c.flow_area, g, mdot, eps, cp);
        if (tube && m_oscillating.active()) {
            LaminarTubeMomentum<S> laminar;
            if constexpr (std::is_same_v<S, double>)
                laminar = (*v.laminar_tube)[cell];
            else
                laminar = laminarTubeMomentum(g, c.passage->hydraulicDiameter(),
                                              m_oscillating.omega);
            const TubeMomentumLaw<S> law =
                oscillatingTubeMomentum(pf, laminar, *c.passage, m_oscillating);
            drop += frictionDrop(law.fRe, g, *c.passage, mdot, l, c.flow_area);
            inertance += law.inertance_factor * (l / c.flow_area);
        } else {
            drop += frictionDrop(steadyFrictionTimesReynolds(pf, *c.passage), g, *c.passage, mdot,
                                 l, c.flow_area);
            inertance += l / c.flow_area;
        }
        resistance += l / (g.k * thermalDispersion(pf, *c.passage) * c.flow_area);
        conducts = true;
    };
    half(*m_a, m_face.from, a, m_tube_a);
    half(*m_b, m_face.to, b, m_tube_b);

    using RC = ReconstructionCell<S>;
    const RC cell_before{before ? &before->T : nullptr, before ? m_before_cell->x : 0.0,
                         before && m_before_cell->length <= 0.0,
                         before ? m_before_cell->component : -1};
    const RC cell_a{&a.T, m_a->x, m_a->length <= 0.0, m_a->component};
    const RC cell_b{&b.T, m_b->x, m_b->length <= 0.0, m_b->component};
    const RC cell_after{after ? &after->T : nullptr, after ? m_after_cell->x : 0.0,
                        after && m_after_cell->length <= 0.0,
                        after ? m_after_cell->component : -1};
    const S T_left = reconstructFaceTemperature(cell_before, cell_a, cell_b, m_face.x);
    const S T_right = reconstructFaceTemperature(cell_after, cell_b, cell_a, m_face.x);

    Result<S> r;
    const S mplus = smoothPositive(mdot, eps);
    const S mminus = mdot - mplus;
    r.enthalpy_flow = cp * (mplus * T_left + mminus * T_right);
    r.conduction = conducts ? (a.T - b.T) / resistance : S(0.0);
    r.rate[0] = -mdot;
    r.rate[1] = -r.enthalpy_flow - r.conduction;
    r.rate[2] = mdot;
    r.rate[3] = r.enthalpy_flow + r.conduction;
    r.rate[4] = (a.p - b.p - drop) / inertance;
    return r;
}

void MomentumFace::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const auto& gas = *v.gas;
    const Result<double> r =
        compute(m_before >= 0 ? &gas[m_before] : nullptr, gas[m_face.from], gas[m_face.to],
                m_after >= 0 ? &gas[m_after] : nullptr, v.y[m_face.offset], v);
    for (int o = 0; o < 5; ++o) ydot[m_stencil.output(o)] += r.rate[o];
    if (quad) {
        quad[m_quad_h] += r.enthalpy_flow;
        if (m_quad_q >= 0) quad[m_quad_q] += r.conduction;
    }
}

void MomentumFace::addJacobian(const NetworkView& v, double* values) const
{
    using D = Dual<9>;
    const auto a = v.seededGas<9>(m_face.from, 0);
    const auto b = v.seededGas<9>(m_face.to, 2);
    const D mdot = D::seed(v.y[m_face.offset], 4);
    GasState<D> before, after;
    if (m_before >= 0) before = v.seededGas<9>(m_before, 5);
    if (m_after >= 0) after = v.seededGas<9>(m_after, 7);
    const Result<D> r = compute(m_before >= 0 ? &before : nullptr, a, b,
                                m_after >= 0 ? &after : nullptr, mdot, v);
    m_stencil.scatter(r.rate, values);
}

} // namespace coldtip
