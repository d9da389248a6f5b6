#pragma once
//! \file OrificePhasors.hpp
//! Mass flow through the orifices of a network (in-line orifices and links), which hold no
//! state of their own: the element's law (models/correlations/OrificeFlow.hpp) at a sampled
//! state, and its first-order part at the mean state along a phasor y1,
//! mdot1 = d_dpa p1a + d_dTa T1a + d_dpb p1b + d_dTb T1b.

#include <complex>
#include <vector>

#include "solver/network/Network.hpp"

namespace coldtip {

class OrificeLink;

//! An orifice element and the cells it joins (positive flow from -> to).
struct OrificeOnPath {
    const OrificeLink* link = nullptr;
    int element = -1; //!< index in Network::elements()
    int from = -1, to = -1;
};

//! Every orifice of the network, in element order.
std::vector<OrificeOnPath> networkOrifices(const Network& net);

//! Mass flow [kg/s] through orifice `o` with gas states a (from) and b (to).
double orificeFlow(const Network& net, const OrificeOnPath& o, const GasState<double>& a,
                   const GasState<double>& b);

struct OrificePhasor {
    OrificeOnPath orifice;
    std::complex<double> mass_flow; //!< [kg/s]
};

//! First-order flows at the mean state y_m for the state phasor y1 (the cells' volumes at
//! their means).
std::vector<OrificePhasor> orificePhasors(const Network& net, const std::vector<double>& y_m,
                                          const std::vector<std::complex<double>>& y1);

} // namespace coldtip
