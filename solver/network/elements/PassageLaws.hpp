#pragma once
//! \file PassageLaws.hpp
//! The flow state of a passage cell as the closure laws need it, for any scalar type:
//!   Re = |mdot| d_h / (A mu),  Pr = c_p mu / k,  Pe = Re Pr,
//! with |mdot| smoothed (Dual.hpp) so the laws stay differentiable through flow reversal.
//!
//! Open circular tubes (models::OpenTube) in a machine driven at angular frequency omega
//! also get the oscillating-flow closure (DEVELOPERS.md, "Oscillating-flow closure and
//! linear analysis"): below the oscillating-flow transition the laminar friction and
//! inertance follow Womersley at omega and the film coefficient follows Rott's thermal
//! function; above it the quasi-steady laws of the passage take over,
//!   (f Re)_eff = (1 - w) 64 K_R(r0/delta_nu) + w (f Re)_qs(Re),
//!   L_eff / (l/A) = (1 - w) K_L(r0/delta_nu) + w,
//!   Nu_eff = (1 - w) Nu_Rott(r0/delta_kappa) + w Nu_qs(Re, Pr),
//!   w = smoothstep(Re_delta; 0.7 Re_delta,c, 1.3 Re_delta,c),  Re_delta = Re delta_nu/d_h
//! with delta_nu = sqrt(2 mu/(rho omega)), delta_kappa = sqrt(2 k/(rho c_p omega)), and the
//! instantaneous Stokes-layer Reynolds number Re_delta = |u| delta_nu/nu: the turbulent
//! law acts in the part of the cycle where the flow exceeds the critical Re_delta,c
//! (default 400, between Merkli & Thomann, J. Fluid Mech. 68, 567, 1975: 280, and Hino,
//! Sawamoto & Takasu, J. Fluid Mech. 75, 193, 1976: 550; physics reference §4.2).

#include <cmath>
#include <vector>

#include "models/correlations/FlowPassage.hpp"
#include "models/correlations/OpenTube.hpp"
#include "models/correlations/RottFunctions.hpp"
#include "models/numeric/SmoothStep.hpp"
#include "solver/network/Dual.hpp"
#include "solver/network/GasCell.hpp"
#include "solver/network/GasState.hpp"

namespace coldtip {

template <class S>
struct PassageFlow {
    S Re; //!< Reynolds number on d_h and pore velocity [-]
    S Pr; //!< Prandtl number [-]
};

template <class S>
PassageFlow<S> passageFlow(const models::FlowPassage& passage, double flow_area,
                           const GasState<S>& g, const S& mdot, double eps, double cp)
{
    PassageFlow<S> f;
    f.Re = smoothAbs(mdot, eps) * passage.hydraulicDiameter() / (flow_area * g.mu);
    f.Pr = cp * g.mu / g.k;
    return f;
}

//! k_eff / k of the gas along the passage [-] at the flow's Peclet number Re Pr: only the
//! axial conduction needs it, the wall heat transfer does not (a power law per call).
template <class S>
S thermalDispersion(const PassageFlow<S>& f, const models::FlowPassage& passage)
{
    const S Pe = f.Re * f.Pr;
    return chain(passage.axialConductionFactor(valueOf(Pe)), Pe);
}

//! The passage's quasi-steady f Re [-] at the flow's Reynolds number.
template <class S>
S steadyFrictionTimesReynolds(const PassageFlow<S>& f, const models::FlowPassage& passage)
{
    return chain(passage.frictionTimesReynolds(valueOf(f.Re)), f.Re);
}

//! Friction pressure drop over a length l in the direction of mdot [Pa]:
//! dp = (f Re) mu l mdot / (2 rho A d_h^2).
template <class S>
S frictionDrop(const S& fRe, const GasState<S>& g, const models::FlowPassage& passage,
               const S& mdot, double length, double flow_area)
{
    const double dh = passage.hydraulicDiameter();
    return fRe * g.mu * length * mdot / (2.0 * g.rho * flow_area * dh * dh);
}

// ---- oscillating flow in open tubes ---------------------------------------------------------

//! Default critical Stokes-layer Reynolds number Re_delta,c [-] (physics reference §4.2).
inline constexpr double kCriticalStokesReynolds = 400.0;
//! Half width of the transition band relative to Re_delta,c [-]: 280-520 at the default.
inline constexpr double kStokesTransitionBand = 0.3;

//! What the oscillating-flow closure needs to know of the machine.
struct OscillatingFlow {
    double omega = 0.0; //!< drive angular frequency [rad/s]; 0: quasi-steady laws only
    double critical_re_delta = kCriticalStokesReynolds; //!< [-]
    bool active() const { return omega > 0.0; }
};

//! Angular frequency [rad/s] of the first piston among the cells, 0 if none drives them.
inline double driveAngularFrequency(const std::vector<GasCell>& cells)
{
    for (const GasCell& c : cells)
        if (c.piston) return c.piston->omega;
    return 0.0;
}

//! Whether a passage gets the oscillating-flow closure (open circular tubes).
inline bool isOpenTube(const models::FlowPassage* passage)
{
    return dynamic_cast<const models::OpenTube*>(passage) != nullptr;
}

//! Whether a cell's half-passages get the oscillating-flow momentum closure: a distributed
//! cell (not a lumped volume) in an open tube. The network caches the closure's laminar
//! part for exactly these cells, and the momentum faces read the cache for them.
inline bool hasTubeMomentumClosure(const GasCell& c)
{
    return c.length > 0.0 && isOpenTube(c.passage);
}

//! Penetration depth sqrt(2 D/omega) [m] of a diffusivity D [m^2/s].
template <class S>
S penetrationDepth(const S& diffusivity, double omega)
{
    using std::sqrt;
    return sqrt(2.0 * diffusivity / omega);
}

//! Weight w [-] of the quasi-steady laws: smoothstep of Re_delta = Re delta_nu/d_h over
//! (1 -+ kStokesTransitionBand) Re_delta,c.
template <class S>
S quasiSteadyWeight(const PassageFlow<S>& f, const S& delta_nu, double dh,
                    const OscillatingFlow& osc)
{
    const S re_delta = f.Re * delta_nu / dh;
    const double c = osc.critical_re_delta;
    return chain(models::smoothStep(valueOf(re_delta), (1.0 - kStokesTransitionBand) * c,
                                    (1.0 + kStokesTransitionBand) * c),
                 re_delta);
}

//! Effective f Re [-] and inertance factor L_eff/(l/A) [-] of an open tube in oscillating
//! flow (the blend in this file's header).
template <class S>
struct TubeMomentumLaw {
    S fRe;
    S inertance_factor;
};

//! The laminar (Womersley) side of the blend and the viscous penetration depth [m]: they
//! depend on the cell's gas state only, so the network evaluates them once per cell and
//! right-hand side, and the two faces of the cell share them (NetworkView::laminar_tube).
template <class S>
struct LaminarTubeMomentum {
    S delta_nu;
    TubeMomentumLaw<S> law;
};

template <class S>
LaminarTubeMomentum<S> laminarTubeMomentum(const GasState<S>& g, double dh, double omega)
{
    const S delta = penetrationDepth(g.mu / g.rho, omega);
    const S x = 0.5 * dh / delta;
    const models::WomersleyFactors laminar = models::womersleyFactors(valueOf(x));
    return {delta,
            {models::OpenTube::kLaminarFrictionTimesReynolds * chain(laminar.resistance, x),
             chain(laminar.inertance, x)}};
}

template <class S>
TubeMomentumLaw<S> oscillatingTubeMomentum(const PassageFlow<S>& f,
                                           const LaminarTubeMomentum<S>& laminar,
                                           const models::FlowPassage& passage,
                                           const OscillatingFlow& osc)
{
    const double dh = passage.hydraulicDiameter();
    const S w = quasiSteadyWeight(f, laminar.delta_nu, dh, osc);
    // Below the transition band w and its slope are exactly zero: the quasi-steady law
    // (a logarithm and powers) is not needed for most of the cycle.
    if (valueOf(w) == 0.0) return laminar.law;
    const TubeMomentumLaw<S>& l = laminar.law;
    return {l.fRe + w * (steadyFrictionTimesReynolds(f, passage) - l.fRe),
            l.inertance_factor + w * (1.0 - l.inertance_factor)};
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

//! Effective Nusselt number on d_h [-] of an open tube in oscillating flow (the blend in
//! this file's header; Nu_Rott from models/correlations/RottFunctions.hpp).
template <class S>
S oscillatingTubeNusselt(const PassageFlow<S>& f, const GasState<S>& g,
                         const models::FlowPassage& passage, double cp,
                         const OscillatingFlow& osc)
{
    const double dh = passage.hydraulicDiameter();
    const S delta_nu = penetrationDepth(g.mu / g.rho, osc.omega);
    const S delta_kappa = penetrationDepth(g.k / (g.rho * cp), osc.omega);
    const S x = 0.5 * dh / delta_kappa;
    const S w = quasiSteadyWeight(f, delta_nu, dh, osc);
    const S laminar = chain(models::rottNusselt(valueOf(x)), x);
    if (valueOf(w) == 0.0) return laminar;
    return laminar + w * (nusselt(passage, f.Re, f.Pr) - laminar);
}

} // namespace coldtip
