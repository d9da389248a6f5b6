#pragma once
//! \file ChannelFlow.hpp
//! Steady fully developed flow in a straight channel (tube or slot) from laminar through
//! transition to turbulent, as a C1 blend of the laminar constants and the turbulent tube
//! laws on the hydraulic diameter:
//!   X = (1 - w) X_laminar + w X_turbulent,  w = smoothstep(Re; Re_laminar, Re_turbulent)
//! X = f Re (turbulent: Haaland, TubeFriction.hpp) or Nu (turbulent: Gnielinski).
//! The default band 2000-4000 brackets the observed steady-pipe transition (Re ~ 2040-2300
//! onset, fully turbulent by ~4000; common practice). Oscillating-flow corrections are not
//! included here.

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

//! Reynolds numbers [-] between which the laminar law gives way to the turbulent one.
struct TransitionRange {
    double laminar_limit = 2000.0;   //!< below: purely laminar
    double turbulent_onset = 4000.0; //!< above: purely turbulent
};

//! Throws std::invalid_argument unless 0 < laminar_limit < turbulent_onset.
void checkTransitionRange(const TransitionRange& range);

//! Blended f Re [-] and d(f Re)/dRe for a channel of laminar f Re = laminar_fRe and
//! relative wall roughness eps/d_h.
Slope channelFrictionTimesReynolds(double Re, double laminar_fRe,
                                   double relative_roughness,
                                   const TransitionRange& range);

//! Blended Nu [-] and dNu/dRe for a channel of laminar Nusselt number laminar_Nu.
Slope channelNusselt(double Re, double Pr, double laminar_Nu,
                     const TransitionRange& range);

} // namespace coldtip::models
