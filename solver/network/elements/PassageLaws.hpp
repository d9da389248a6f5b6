#pragma once
//! \file PassageLaws.hpp
//! The flow state of a passage cell as the closure laws need it, for any scalar type:
//!   Re = |mdot| d_h / (A mu),  Pr = c_p mu / k,  Pe = Re Pr,
//! with |mdot| smoothed (Dual.hpp) so the laws stay differentiable through flow reversal.

#include <cmath>

#include "models/correlations/FlowPassage.hpp"
#include "solver/network/Dual.hpp"
#include "solver/network/GasState.hpp"

namespace coldtip {

template <class S>
struct PassageFlow {
    S Re;         //!< Reynolds number on d_h and pore velocity [-]
    S Pr;         //!< Prandtl number [-]
    S dispersion; //!< k_eff / k of the gas along the passage [-]
};

template <class S>
PassageFlow<S> passageFlow(const models::FlowPassage& passage, double flow_area,
                           const GasState<S>& g, const S& mdot, double eps, double cp)
{
    PassageFlow<S> f;
    f.Re = smoothAbs(mdot, eps) * passage.hydraulicDiameter() / (flow_area * g.mu);
    f.Pr = cp * g.mu / g.k;
    const S Pe = f.Re * f.Pr;
    f.dispersion = chain(passage.axialConductionFactor(valueOf(Pe)), Pe);
    return f;
}

//! Friction pressure drop over a length l in the direction of mdot [Pa]:
//! dp = (f Re) mu l mdot / (2 rho A d_h^2).
template <class S>
S frictionDrop(const PassageFlow<S>& f, const GasState<S>& g, const models::FlowPassage& passage,
               const S& mdot, double length, double flow_area)
{
    const double dh = passage.hydraulicDiameter();
    const S fRe = chain(passage.frictionTimesReynolds(valueOf(f.Re)), f.Re);
    return fRe * g.mu * length * mdot / (2.0 * g.rho * flow_area * dh * dh);
}

//! Nusselt number Nu(Re, Pr) with both partials. The passage supplies d/dRe; d/dPr comes
//! from a central difference of the law (relative step 1e-4, truncation error ~1e-8), and
//! only when derivatives are wanted.
inline double nusselt(const models::FlowPassage& passage, double Re, double Pr)
{
    return passage.nusselt(Re, Pr).value;
}
template <int N>
Dual<N> nusselt(const models::FlowPassage& passage, const Dual<N>& Re, const Dual<N>& Pr)
{
    const models::Slope nu = passage.nusselt(Re.v, Pr.v);
    const double dPr = 1e-4 * Pr.v;
    const double dNu_dPr = (passage.nusselt(Re.v, Pr.v + dPr).value -
                            passage.nusselt(Re.v, Pr.v - dPr).value) / (2.0 * dPr);
    Dual<N> r(nu.value);
    for (int k = 0; k < N; ++k) r.d[k] = nu.slope * Re.d[k] + dNu_dPr * Pr.d[k];
    return r;
}

} // namespace coldtip
