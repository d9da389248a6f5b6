#include "solver/network/elements/OrificeLink.hpp"

#include "models/correlations/OrificeFlow.hpp"

namespace coldtip {

OrificeLink::OrificeLink(std::string name, int from, int to, double discharge_area,
                         const std::vector<GasCell>& cells, int quad_enthalpy)
    : m_name(std::move(name)), m_from(from), m_to(to), m_discharge_area(discharge_area),
      m_a(&cells.at(from)), m_b(&cells.at(to)), m_quad_h(quad_enthalpy)
{
    for (int col : {m_a->offset, m_a->offset + 1, m_b->offset, m_b->offset + 1})
        m_stencil.addInput(col);
    for (int row : {m_a->offset, m_a->offset + 1, m_b->offset, m_b->offset + 1})
        m_stencil.addOutput(row);
    for (int o = 0; o < 4; ++o) m_stencil.dependsOnAll(o);
}

std::string OrificeLink::describe() const
{
    return "orifice " + m_name + " (" + m_a->name + " -> " + m_b->name + ")";
}

namespace {
// The orifice law is known through its value and partials in (p_a, T_a, p_b, T_b).
inline double orificeChain(const models::OrificeFlow& f, double, double, double, double)
{
    return f.mdot;
}
template <int N>
Dual<N> orificeChain(const models::OrificeFlow& f, const Dual<N>& pa, const Dual<N>& Ta,
                     const Dual<N>& pb, const Dual<N>& Tb)
{
    Dual<N> r(f.mdot);
    for (int k = 0; k < N; ++k)
        r.d[k] = f.d_dpa * pa.d[k] + f.d_dTa * Ta.d[k] + f.d_dpb * pb.d[k] + f.d_dTb * Tb.d[k];
    return r;
}
} // namespace

template <class S>
OrificeLink::Result<S> OrificeLink::compute(const GasState<S>& a, const GasState<S>& b,
                                            const NetworkView& v) const
{
    const auto& gas = *v.properties;
    const models::OrificeFlow f =
        models::orificeMassFlow(valueOf(a.p), valueOf(a.T), valueOf(b.p), valueOf(b.T),
                                m_discharge_area, gas.R, gas.gamma);
    Result<S> r;
    r.mass_flow = orificeChain(f, a.p, a.T, b.p, b.T);
    const S mplus = smoothPositive(r.mass_flow, v.flow_smoothing);
    r.enthalpy_flow = mplus * a.h + (r.mass_flow - mplus) * b.h;
    r.rate[0] = -r.mass_flow;
    r.rate[1] = -r.enthalpy_flow;
    r.rate[2] = r.mass_flow;
    r.rate[3] = r.enthalpy_flow;
    return r;
}

void OrificeLink::evaluate(const NetworkView& v, double* ydot, double* quad) const
{
    const Result<double> r = compute((*v.gas)[m_from], (*v.gas)[m_to], v);
    for (int o = 0; o < 4; ++o) ydot[m_stencil.output(o)] += r.rate[o];
    if (quad) quad[m_quad_h] += r.enthalpy_flow;
}

void OrificeLink::addJacobian(const NetworkView& v, double* values) const
{
    const auto a = v.seededGas<4>(m_from, 0);
    const auto b = v.seededGas<4>(m_to, 2);
    const Result<Dual<4>> r = compute(a, b, v);
    m_stencil.scatter(r.rate, values);
}

} // namespace coldtip
