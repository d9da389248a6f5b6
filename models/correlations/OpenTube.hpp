#pragma once
//! \file OpenTube.hpp
//! Open circular tube, steady fully developed flow (ChannelFlow.hpp blend):
//!  - laminar: Hagen-Poiseuille f = 64/Re (f Re = 64), Nu = 3.66 (uniform wall temperature)
//!    (R. K. Shah and A. L. London, "Laminar Flow Forced Convection in Ducts", 1978);
//!  - turbulent: Haaland friction with wall roughness, Gnielinski Nu (smooth-tube form);
//!  - C1 blend over TransitionRange (default Re 2000-4000).
//! Porosity 1, d_h = D, wetted area per volume 4/D. No thermal dispersion (factor 1).
//! Oscillating-flow corrections (Womersley, Stokes-layer transition) are not included.

#include "models/correlations/ChannelFlow.hpp"
#include "models/correlations/FlowPassage.hpp"

namespace coldtip::models {

class OpenTube final : public FlowPassage {
public:
    //! Tube of inner diameter [m] and relative roughness eps/D [-].
    explicit OpenTube(double diameter, double relative_roughness = 0.0,
                      TransitionRange transition = {});
    //! 64 (laminar) blended to f_Haaland Re.
    Slope frictionTimesReynolds(double Re) const override;
    //! 3.66 (laminar) blended to Gnielinski.
    Slope nusselt(double Re, double Pr) const override;

    static constexpr double kLaminarFrictionTimesReynolds = 64.0;
    static constexpr double kLaminarNusselt = 3.66;

private:
    double m_roughness;
    TransitionRange m_transition;
};

} // namespace coldtip::models
