#pragma once
//! \file TransportTable.hpp
//! Fast, C1-continuous tables of a working gas's viscosity and thermal conductivity over
//! (T, rho), built once from any WorkingGas, for the engine's hot path (about 300 calls per
//! right-hand-side evaluation).
//!
//! Layout: bicubic Hermite patches (see CubicHermite.hpp) on a grid that is quasi-
//! logarithmic in T (OctaveGrid: the same number of cells per octave, so the relative
//! resolution is nearly uniform from a few kelvin to 1500 K) and uniform in rho from 0 to
//! rho_max. Node values come from the gas model; node slopes d/dT, d/drho and the cross
//! derivative from finite differences of the model (central inside, one-sided
//! second-order at the table edges). The table is therefore C1 in T and rho everywhere
//! inside its range. After building, the constructor compares the table with the model in
//! the middle of every cell edge and face (where the Hermite error peaks) and doubles the
//! resolution in T and/or rho until the largest relative deviation is below 2e-4 (so the
//! table stays well within 0.1 % of the model), within a memory budget of 64 MB.
//! Helium over 2.5-1500 K and 0-200 kg/m^3 ends at 16 cells per octave (147 in T) and 64
//! in rho (2.4 MB, built in about 20 ms; lookups about 12-15 ns); the other gases, which
//! ignore density, need far less.
//!
//! Outside its range a lookup is clamped: T to [minTemperature(), maxTemperature()] and rho
//! to [0, maxDensity()]; the value is held and the partial derivative in a clamped
//! direction is zero. The table's T range is the requested one intersected with the gas's
//! validity range, and its density range [0, min(rho_max, gas.maxDensity())] (the gas
//! holds its properties outside those ranges too, so the table and the model agree
//! everywhere in the requested range).

#include <algorithm>
#include <array>
#include <vector>

#include "models/gas/WorkingGas.hpp"
#include "models/numeric/OctaveGrid.hpp"
#include "models/numeric/Slope.hpp"

namespace coldtip::models {

class TransportTable {
public:
    //! Default resolution: cells per octave of T, and cells from 0 to rho_max.
    static constexpr int kCellsPerOctave = 16;
    static constexpr int kDensityCells = 16;
    //! Relative deviation from the model at which refinement stops [-].
    static constexpr double kTargetError = 2e-4;

    //! Tabulates `gas` over [T_min, T_max] x [0, rho_max] [K, K, kg/m^3], starting from
    //! the given resolution and refining it as described above. Throws
    //! std::invalid_argument if the range is empty (after intersection with the gas's
    //! validity range) or rho_max <= 0.
    TransportTable(const WorkingGas& gas, double T_min, double T_max, double rho_max,
                   int cells_per_octave = kCellsPerOctave,
                   int density_cells = kDensityCells);

    //! mu(T, rho) [Pa s] with d/dT [Pa s/K] and d/drho [Pa s m^3/kg].
    Slope2 viscosity(double T, double rho) const { return lookup(0, T, rho); }
    //! k(T, rho) [W/(m K)] with d/dT [W/(m K^2)] and d/drho [W m^2/(kg K)].
    Slope2 conductivity(double T, double rho) const { return lookup(1, T, rho); }
    //! Both at one point, located once (the engine's gas states need both).
    struct Properties {
        Slope2 viscosity, conductivity;
    };
    Properties both(double T, double rho) const
    {
        const Place p = locate(T, rho);
        return {evaluate(0, p), evaluate(1, p)};
    }

    double minTemperature() const { return m_grid.minimum(); }
    double maxTemperature() const { return m_grid.maximum(); }
    double maxDensity() const { return m_rhoMax; }
    //! Largest relative deviation from the model found at the check points [-].
    double estimatedError() const { return m_estimatedError; }
    //! Resolution finally used: T cells in the table and cells in rho.
    int temperatureCells() const { return m_grid.cellCount(); }
    int densityCells() const { return m_nRho; }

private:
    static constexpr int kMaxCellsPerOctave = 256;
    static constexpr int kMaxDensityCells = 1024;
    static constexpr std::size_t kMaxBytes = std::size_t{64} << 20;

    void build(const WorkingGas& gas, int density_cells);
    //! Largest relative deviation from the model at the midpoints of the cell edges along
    //! T, of the edges along rho, and at the cell centres.
    struct Deviation {
        double t_edges = 0.0;
        double rho_edges = 0.0;
        double faces = 0.0;
    };
    Deviation deviationFromModel(const WorkingGas& gas) const;

    // Patch coefficients a[4 i + j] of t^i u^j; viscosity and conductivity of one cell are
    // adjacent so that the two lookups the engine makes at one point share cache lines.
    using Patch = std::array<double, 16>;

    //! Where (T, rho) falls in the table, clamped to its range.
    struct Place {
        std::size_t patch = 0; //!< index of the viscosity patch; conductivity's is next
        double t = 0.0, u = 0.0;       //!< position in the cell [-]
        double dT_scale = 0.0;         //!< d t / d T [1/K], 0 if clamped
        double drho_scale = 0.0;       //!< d u / d rho [m^3/kg], 0 if clamped
    };
    Place locate(double T, double rho) const
    {
        Place p;
        double dT_scale = 1.0;
        if (T <= m_grid.minimum()) {
            T = m_grid.minimum();
            dT_scale = 0.0;
        } else if (T >= m_grid.maximum()) {
            T = m_grid.maximum();
            dT_scale = 0.0;
        }
        p.drho_scale = m_invDrho;
        if (rho <= 0.0) {
            rho = 0.0;
            p.drho_scale = 0.0;
        } else if (rho >= m_rhoMax) {
            rho = m_rhoMax;
            p.drho_scale = 0.0;
        }
        const int i = m_grid.cell(T);
        const double inv_width = m_invWidth[static_cast<std::size_t>(i)];
        p.t = (T - m_grid.node(i)) * inv_width;
        p.dT_scale = inv_width * dT_scale;
        const double us = rho * m_invDrho;
        const int j = std::min(static_cast<int>(us), m_nRho - 1);
        p.u = us - j;
        p.patch = static_cast<std::size_t>(2 * (i * m_nRho + j));
        return p;
    }
    Slope2 evaluate(int property, const Place& p) const
    {
        const Patch& a = m_patches[p.patch + static_cast<std::size_t>(property)];
        const double t = p.t, u = p.u;
        // c_k(u) = sum_l a[4k + l] u^l and its u-derivative, then Horner in t.
        double c[4];
        double cu[4];
        for (int k = 0; k < 4; ++k) {
            const double* r = &a[static_cast<std::size_t>(4 * k)];
            c[k] = r[0] + u * (r[1] + u * (r[2] + u * r[3]));
            cu[k] = r[1] + u * (2.0 * r[2] + 3.0 * u * r[3]);
        }
        const double value = c[0] + t * (c[1] + t * (c[2] + t * c[3]));
        const double dt = c[1] + t * (2.0 * c[2] + 3.0 * t * c[3]);
        const double du = cu[0] + t * (cu[1] + t * (cu[2] + t * cu[3]));
        return {value, dt * p.dT_scale, du * p.drho_scale};
    }
    Slope2 lookup(int property, double T, double rho) const
    {
        return evaluate(property, locate(T, rho));
    }

    OctaveGrid m_grid;
    std::vector<double> m_invWidth; //!< 1 / (T_{i+1} - T_i) per T cell
    double m_rhoMax = 0.0;
    double m_invDrho = 0.0;
    int m_nRho = 0;
    std::vector<Patch> m_patches;
    double m_estimatedError = 0.0;
};

} // namespace coldtip::models
