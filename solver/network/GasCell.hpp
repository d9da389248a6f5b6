#pragma once
//! \file GasCell.hpp
//! A gas control volume: holds mass m and internal energy E (two states). Geometry, and the
//! closure laws of the passage it sits in, are fixed at assembly. A cell of zero length is a
//! lumped volume (compression space, buffer): it has no friction, conduction or inertia.

#include <cmath>
#include <string>

#include "models/correlations/FlowPassage.hpp"

namespace coldtip {

//! Prescribed piston motion x(t) = X sin(omega t) moving one boundary of a cell:
//!   V(t) = V_dead + A_p (X - x(t)),   dV/dt = -A_p X omega cos(omega t).
struct MovingBoundary {
    double piston_area = 0.0; //!< [m^2]
    double amplitude = 0.0;   //!< [m]
    double dead_volume = 0.0; //!< [m^3]
    double omega = 0.0;       //!< [rad/s]
    double scale = 1.0;       //!< drive amplitude multiplier (linear analysis, sweeps)

    double volume(double t) const
    {
        const double X = scale * amplitude;
        return dead_volume + piston_area * (X - X * std::sin(omega * t));
    }
    double volumeRate(double t) const
    {
        return -piston_area * scale * amplitude * omega * std::cos(omega * t);
    }
    double meanVolume() const { return dead_volume + piston_area * scale * amplitude; }
};

struct GasCell {
    std::string name;      //!< "regenerator[12]"
    int component = -1;    //!< index of the owning component
    int offset = -1;       //!< state index of m; E is at offset + 1
    double x = 0.0;        //!< axial position of the centre along the main path [m]
    double length = 0.0;   //!< [m]; 0 = lumped volume
    double frontal_area = 0.0; //!< [m^2]
    double flow_area = 0.0;    //!< frontal area times porosity [m^2]
    double volume = 0.0;       //!< gas volume [m^3] (mean volume for a piston space)
    const models::FlowPassage* passage = nullptr; //!< null for a lumped volume
    const MovingBoundary* piston = nullptr;       //!< non-null for a compression space
    double initial_temperature = 300.0;           //!< [K]

    double volumeAt(double t) const { return piston ? piston->volume(t) : volume; }
    double volumeRateAt(double t) const { return piston ? piston->volumeRate(t) : 0.0; }
};

} // namespace coldtip
