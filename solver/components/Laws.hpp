#pragma once
//! \file Laws.hpp
//! Adding a law to the network together with the cycle-integral channels that account for
//! it (what it carries, and whether that crosses a thermal boundary or the machine's
//! boundary). Components and the machine assembly call these instead of creating elements
//! directly, so every element is accounted for in the energy balance the same way.

#include <string>

#include "solver/network/Network.hpp"

namespace coldtip {

//! Momentum face on network face `face`, with a channel for its enthalpy flow (returned)
//! and, at a junction between components, one for its gas conduction.
int addMomentumFace(Network& net, int face);

//! Orifice between cells `from` and `to` at axial position x, discharge area C_d A [m^2];
//! returns its enthalpy-flow channel.
int addOrifice(Network& net, const std::string& name, int component, int from, int to,
               double discharge_area, double x);

//! The channel for the heat a component's walls give its gas; `boundary` is the thermal
//! boundary the heat leaves (-1 for matrix and wall nodes inside the machine), `external`
//! whether that boundary is outside the machine.
int addWallHeatChannel(Network& net, int component, int boundary, bool external);

//! Gas-wall heat exchange of `cell` with solid node `solid` or, if solid < 0, with a wall at
//! `wall_temperature`, accounted in `channel`.
void addWallHeatTransfer(Network& net, int cell, int solid, double wall_temperature, int channel);

//! Solid conduction from node `i` into node `j` or, if j < 0, into a wall at
//! `wall_temperature`; `boundary` is the thermal boundary on the j side, if any. Conduction
//! within one component's column has no channel (it is internal); conduction into another
//! component's wall or solid is accounted.
void addSolidConduction(Network& net, int i, int j, double wall_temperature, int boundary,
                        bool external);

//! The two faces of a cell along the main path (-1 where there is none).
struct CellFaces {
    int in = -1, out = -1;
};
CellFaces facesOfCell(const Network& net, int cell);

} // namespace coldtip
