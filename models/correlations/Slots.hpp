#pragma once
//! \file Slots.hpp
//! Parallel-plate slots (stacked plates or slotted heat exchangers), steady fully developed
//! flow, d_h = 2 x gap (ChannelFlow.hpp blend):
//!  - laminar: f Re = 96, Nu = 7.541 (both walls at uniform temperature) (R. K. Shah and
//!    A. L. London, "Laminar Flow Forced Convection in Ducts", 1978);
//!  - turbulent: the smooth-tube laws on d_h (Haaland, Gnielinski; common practice);
//!  - C1 blend over TransitionRange (default Re 2000-4000).
//! No thermal dispersion (factor 1). For oscillating flow with a gap comparable to the
//! thermal penetration depth the steady Nu does not apply (Rott's plate functions do).

#include "models/correlations/ChannelFlow.hpp"
#include "models/correlations/FlowPassage.hpp"

namespace coldtip::models {

class Slots final : public FlowPassage {
public:
    //! Slots filling `porosity` of the frontal volume, hydraulic diameter [m] = 2 x gap.
    Slots(double porosity, double hydraulic_diameter, TransitionRange transition = {});
    //! 96 (laminar) blended to f_Haaland Re.
    Slope frictionTimesReynolds(double Re) const override;
    //! 7.541 (laminar) blended to Gnielinski.
    Slope nusselt(double Re, double Pr) const override;

    static constexpr double kLaminarFrictionTimesReynolds = 96.0;
    static constexpr double kLaminarNusselt = 7.541;

private:
    TransitionRange m_transition;
};

} // namespace coldtip::models
