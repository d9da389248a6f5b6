#pragma once
//! \file SolidNode.hpp
//! A solid node: one temperature state for a piece of matrix, wall or cold-head body, made of
//! one or more layers of material (e.g. screen matrix plus the regenerator housing). Its heat
//! capacity and axial conductance follow the materials' NIST fits at the node temperature:
//!   C(T) = sum_l m_l c_p,l(T)   [J/K],     kA(T) = sum_l k_l(T) A_l   [W m/K]
//! where A_l is the layer's effective conduction cross-section (already multiplied by any
//! degradation factor). A node conducts to a neighbour through its half length.

#include <string>
#include <vector>

#include "models/solids/SolidTable.hpp"
#include "solver/network/Dual.hpp"

namespace coldtip {

struct SolidLayer {
    const models::SolidTable* material = nullptr;
    double mass = 0.0;              //!< [kg]
    double conduction_area = 0.0;   //!< effective axial cross-section [m^2]
};

struct SolidNode {
    std::string name;       //!< "regenerator[12].T_matrix"
    int component = -1;     //!< index of the owning component
    int offset = -1;        //!< state index of T
    double x = 0.0;         //!< axial position of the centre [m]
    double length = 0.0;    //!< axial length [m]; 0 for a lumped body (no internal resistance)
    std::vector<SolidLayer> layers;
    double initial_temperature = 300.0; //!< [K]
};

template <class S>
struct SolidState {
    S T;  //!< temperature [K]
    S C;  //!< heat capacity [J/K]
    S kA; //!< axial conductance-length product [W m/K]
};

template <class S>
SolidState<S> solidState(const S& T, const SolidNode& node)
{
    SolidState<S> s;
    s.T = T;
    s.C = S(0.0);
    s.kA = S(0.0);
    const double t = valueOf(T);
    for (const auto& layer : node.layers) {
        s.C += layer.mass * chain(layer.material->specificHeat(t), T);
        if (layer.conduction_area > 0.0)
            s.kA += layer.conduction_area * chain(layer.material->conductivity(t), T);
    }
    return s;
}

//! A solid boundary held at a fixed temperature (isothermal wall): infinite heat capacity,
//! no internal resistance.
struct FixedWall {
    std::string name;
    double temperature = 0.0; //!< [K]
};

} // namespace coldtip
