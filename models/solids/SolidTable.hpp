#pragma once
//! \file SolidTable.hpp
//! Fast C1 tables of one solid material for the engine: specific heat, conductivity, and
//! their exact integrals (enthalpy, conductivity integral), over 1-1000 K.
//!
//! c_p(T) and k(T) are cubic Hermite splines (CubicHermite.hpp) on an OctaveGrid with 64
//! cells per octave from 1 K to 1000 K (1, 4, 10 and 300 K, where the NIST fits start or
//! end, are nodes). Node values come from the material, node slopes from central
//! differences of it (one-sided at 1 K and 1000 K, and the fit's own slope at a fit-range
//! end). Inside the fit ranges the spline reproduces the material to about 1e-6. Where the
//! material starts holding its end value it has a corner; the spline rounds it within the
//! first cell on the held side (1/64 of an octave, e.g. 3.94-4 K or 300-304 K), deviating
//! from the held value there by at most (4/27) h |dy/dT|: up to 0.3 % (G-10 c_p just
//! below 4 K) and 0.2 % (G-10 k just above 300 K).
//!
//! The enthalpy and the conductivity integral are the exact integrals of those splines, so
//! d(enthalpy)/dT equals specificHeat(T) to round-off:
//!   h(T) = integral_0^T c_p dT'   (reference h(0 K) = 0, c_p held at its 1 K value below)
//!   K(T) = integral_0^T k dT'
//! Outside 1-1000 K, c_p and k are held (slope zero) and h, K continue linearly, consistent
//! with the held values.

#include <string>
#include <string_view>
#include <vector>

#include "models/numeric/CubicHermite.hpp"
#include "models/numeric/OctaveGrid.hpp"
#include "models/numeric/Slope.hpp"
#include "models/solids/SolidMaterial.hpp"

namespace coldtip::models {

class SolidTable {
public:
    static constexpr double kMinTemperature = 1.0;    //!< [K]
    static constexpr double kMaxTemperature = 1000.0; //!< [K]
    static constexpr int kCellsPerOctave = 64;

    explicit SolidTable(const SolidMaterial& material);

    //! c_p(T) [J/(kg K)] and dc_p/dT [J/(kg K^2)].
    Slope specificHeat(double T) const { return lookup(&Cell::cp, T); }
    //! k(T) [W/(m K)] and dk/dT [W/(m K^2)].
    Slope conductivity(double T) const { return lookup(&Cell::k, T); }
    //! h(T) = integral_0^T c_p dT' [J/kg].
    double enthalpy(double T) const;
    //! The T [K] with enthalpy(T) = h (h in J/kg); the inverse of enthalpy() (O(1) cell
    //! search, then safeguarded Newton on the cell's quartic; exact to round-off).
    double temperatureFromEnthalpy(double h) const;
    //! integral_{T1}^{T2} k dT [W/m].
    double conductivityIntegral(double T1, double T2) const
    {
        return integral(&Cell::k, &Cell::k_integral, m_kIntegralMax, T2) -
               integral(&Cell::k, &Cell::k_integral, m_kIntegralMax, T1);
    }
    //! Room-temperature density [kg/m^3].
    double density() const { return m_density; }
    std::string_view name() const { return m_name; }

private:
    struct Cell {
        Cubic cp; // in t = (T - T_i)/(T_{i+1} - T_i)
        Cubic k;
        double cp_integral = 0.0; // h(T_i)
        double k_integral = 0.0;  // K(T_i)
    };

    Slope lookup(Cubic Cell::*field, double T) const
    {
        if (T <= kMinTemperature) {
            return {(m_cells.front().*field).value(0.0), 0.0};
        }
        if (T >= kMaxTemperature) {
            return {(m_cells.back().*field).value(1.0), 0.0};
        }
        const int i = m_grid.cell(T);
        const double inv = m_invWidth[static_cast<std::size_t>(i)];
        const Cubic& p = m_cells[static_cast<std::size_t>(i)].*field;
        const double t = (T - m_grid.node(i)) * inv;
        return {p.value(t), p.slope(t) * inv};
    }
    // integral_0^T of the spline `field`; `base` holds its value at each cell start and
    // `top` at 1000 K.
    double integral(Cubic Cell::*field, double Cell::*base, double top, double T) const;

    std::string m_name;
    double m_density = 0.0;
    OctaveGrid m_grid;
    std::vector<double> m_invWidth;
    std::vector<Cell> m_cells;
    // Inversion index: an OctaveGrid over h(1 K)..h(1000 K) and, per cell of it, the first
    // T cell that can hold its enthalpies, so that finding the T cell of h is O(1).
    OctaveGrid m_enthalpyGrid;
    std::vector<int> m_firstCell;
    double m_enthalpyMax = 0.0; // h(1000 K)
    double m_kIntegralMax = 0.0;
};

} // namespace coldtip::models
