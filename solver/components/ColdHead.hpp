#pragma once
//! \file ColdHead.hpp
//! The cold head: the cold exchanger's own lumped body, further lumped bodies (a copper
//! cold block, a detector mount) joined to it by conductive links, and the heat loads on
//! any of them. Each body is one solid node of heat capacity m c_p(T) (NIST fit of its
//! material); links conduct by a constant conductance or the conductivity integral of a
//! strap (ThermalLink.hpp); loads are constant (HeatLoad), scheduled in time or tabulated in
//! temperature (TableLoad.hpp), radiation from the surroundings (RadiationLoad.hpp) or
//! conduction through supports (SupportConduction.hpp). Every load has its own cycle-integral
//! channel (an applied load entering the machine from outside), so the energy balance
//! reports each one and closes with all of them.

#include <string>
#include <vector>

#include "solver/components/Component.hpp"

namespace coldtip {

class ColdHead {
public:
    //! The cold head on the lumped-body wall `wall` of exchanger `exchanger` (network
    //! component index `component`).
    ColdHead(const WallSpec& wall, std::string exchanger, int component);

    //! Phase 1: one solid node per body, added right after the exchanger's body
    //! `exchanger_body` (so that the cold head's nodes are contiguous), at axial position
    //! x [m] and, for bodies without their own, the initial temperature T0 [K].
    void addNodes(AssemblyContext& ctx, int exchanger_body, double T0, double x);
    //! Phase 2: the links and the loads, each load with its channel.
    void addElements(AssemblyContext& ctx);

    //! Solid nodes of the cold head, the exchanger's body first.
    const std::vector<int>& bodyNodes() const { return m_nodes; }

private:
    //! Node of the body named `name` ("" or the exchanger's name: the exchanger's body).
    int nodeOf(const std::string& name) const;

    WallSpec m_wall;
    std::string m_exchanger;
    int m_component;
    std::vector<int> m_nodes;
};

} // namespace coldtip
