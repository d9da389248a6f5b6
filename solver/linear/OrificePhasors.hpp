#pragma once
//! \file OrificePhasors.hpp
//! First-order mass flow through every orifice of a network (in-line orifices and links):
//! the directional derivative of the orifice law at the mean state along the phasor y1,
//! mdot1 = (d mdot/dy) Re y1 + i (d mdot/dy) Im y1, from the element's own dual-number
//! evaluation (orifices hold no state of their own).

#include <complex>
#include <vector>

#include "solver/network/Network.hpp"

namespace coldtip {

struct OrificePhasor {
    int element = -1;           //!< index in Network::elements()
    int from = -1, to = -1;     //!< cells (positive flow from -> to)
    std::complex<double> mass_flow; //!< [kg/s]
};

std::vector<OrificePhasor> orificePhasors(const Network& net, const std::vector<double>& y_m,
                                          const std::vector<std::complex<double>>& y1);

} // namespace coldtip
