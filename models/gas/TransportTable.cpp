#include "models/gas/TransportTable.hpp"

#include <algorithm>
#include <cmath>
#include <functional>
#include <stdexcept>
#include <string>

#include "models/numeric/CubicHermite.hpp"

namespace coldtip::models {
namespace {

// Relative finite-difference step for the node slopes: truncation ~1e-8, round-off ~1e-12.
constexpr double kRelativeStep = 1e-4;

enum class Side { Central, Forward, Backward };

// First derivative of f at x; one-sided second-order stencils at the table edges so that
// the gas's own clamping beyond its range never enters a node slope.
double derivative(const std::function<double(double)>& f, double x, double h, Side side)
{
    switch (side) {
    case Side::Forward:
        return (-3.0 * f(x) + 4.0 * f(x + h) - f(x + 2.0 * h)) / (2.0 * h);
    case Side::Backward:
        return (3.0 * f(x) - 4.0 * f(x - h) + f(x - 2.0 * h)) / (2.0 * h);
    default:
        return (f(x + h) - f(x - h)) / (2.0 * h);
    }
}

double checkedMaximum(const WorkingGas& gas, double T_min, double T_max)
{
    const double lo = std::max(T_min, gas.minTemperature());
    const double hi = std::min(T_max, gas.maxTemperature());
    if (!(hi > lo)) {
        throw std::invalid_argument(
            "TransportTable: temperature range [" + std::to_string(T_min) + ", " +
            std::to_string(T_max) + "] K does not overlap the validity range of " +
            std::string(gas.name()) + " [" + std::to_string(gas.minTemperature()) + ", " +
            std::to_string(gas.maxTemperature()) + "] K");
    }
    return hi;
}

struct NodeData {
    double f, fT, fr, fTr;
};

} // namespace

TransportTable::TransportTable(const WorkingGas& gas, double T_min, double T_max,
                               double rho_max, int cells_per_octave, int density_cells)
    : m_grid(std::max(T_min, gas.minTemperature()), checkedMaximum(gas, T_min, T_max),
             cells_per_octave),
      m_rhoMax(std::min(rho_max, gas.maxDensity()))
{
    if (!(rho_max > 0.0) || density_cells < 1) {
        throw std::invalid_argument(
            "TransportTable: need rho_max > 0 and density_cells >= 1");
    }
    const double lo = m_grid.minimum();
    const double hi = m_grid.maximum();
    int perOctave = cells_per_octave;
    for (;;) {
        m_grid = OctaveGrid(lo, hi, perOctave);
        build(gas, density_cells);
        // The Hermite error peaks near the middle of a cell edge or face; refine whichever
        // direction misses the target there, within a memory budget.
        const Deviation e = deviationFromModel(gas);
        m_estimatedError = std::max({e.t_edges, e.rho_edges, e.faces});
        // A face-centre miss with both edge sets on target is a mixed term: refine both.
        const bool mixed = e.faces > kTargetError && e.t_edges <= kTargetError &&
                           e.rho_edges <= kTargetError;
        const bool refineT =
            (e.t_edges > kTargetError || mixed) && perOctave < kMaxCellsPerOctave;
        const bool refineRho =
            (e.rho_edges > kTargetError || mixed) && density_cells < kMaxDensityCells;
        if (!(refineT || refineRho) || m_patches.size() * sizeof(Patch) > kMaxBytes / 4) {
            break;
        }
        perOctave *= refineT ? 2 : 1;
        density_cells *= refineRho ? 2 : 1;
    }
}

TransportTable::Deviation TransportTable::deviationFromModel(const WorkingGas& gas) const
{
    auto deviation = [&](double T, double rho) {
        const double mu = gas.viscosity(T, rho);
        const double k = gas.conductivity(T, rho);
        return std::max(std::abs(viscosity(T, rho).value - mu) / std::abs(mu),
                        std::abs(conductivity(T, rho).value - k) / std::abs(k));
    };
    const double drho = m_rhoMax / m_nRho;
    Deviation e;
    for (int i = 0; i < m_grid.cellCount(); ++i) {
        const double T0 = m_grid.node(i);
        const double Tm = 0.5 * (T0 + m_grid.node(i + 1));
        for (int j = 0; j < m_nRho; ++j) {
            const double rho0 = j * drho;
            e.t_edges = std::max(e.t_edges, deviation(Tm, rho0));
            e.rho_edges = std::max(e.rho_edges, deviation(T0, rho0 + 0.5 * drho));
            e.faces = std::max(e.faces, deviation(Tm, rho0 + 0.5 * drho));
        }
    }
    return e;
}

void TransportTable::build(const WorkingGas& gas, int density_cells)
{
    m_nRho = density_cells;
    const double rho_max = m_rhoMax;
    const int nT = m_grid.cellCount();
    const double drho = rho_max / density_cells;
    m_invDrho = 1.0 / drho;
    m_invWidth.resize(static_cast<std::size_t>(nT));
    for (int i = 0; i < nT; ++i) {
        m_invWidth[static_cast<std::size_t>(i)] =
            1.0 / (m_grid.node(i + 1) - m_grid.node(i));
    }

    const std::function<double(double, double)> property[2] = {
        [&gas](double T, double rho) { return gas.viscosity(T, rho); },
        [&gas](double T, double rho) { return gas.conductivity(T, rho); }};
    const int nNodesT = nT + 1;
    const int nNodesR = density_cells + 1;
    std::vector<NodeData> nodes[2];
    for (int p = 0; p < 2; ++p) {
        nodes[p].resize(static_cast<std::size_t>(nNodesT * nNodesR));
        const auto& f = property[p];
        for (int i = 0; i < nNodesT; ++i) {
            const double T = m_grid.node(i);
            const double hT = kRelativeStep * T;
            const Side sT = i == 0    ? Side::Forward
                            : i == nT ? Side::Backward
                                      : Side::Central;
            for (int j = 0; j < nNodesR; ++j) {
                const double rho = j * drho;
                const double hr = kRelativeStep * rho_max;
                const Side sr = j == 0               ? Side::Forward
                                : j == density_cells ? Side::Backward
                                                     : Side::Central;
                auto dRho = [&](double Tx) {
                    return derivative([&](double r) { return f(Tx, r); }, rho, hr, sr);
                };
                nodes[p][static_cast<std::size_t>(i * nNodesR + j)] = {
                    f(T, rho),
                    derivative([&](double Tx) { return f(Tx, rho); }, T, hT, sT), dRho(T),
                    derivative(dRho, T, hT, sT)};
            }
        }
    }

    m_patches.resize(static_cast<std::size_t>(2 * nT * density_cells));
    for (int p = 0; p < 2; ++p) {
        for (int i = 0; i < nT; ++i) {
            const double wT = m_grid.node(i + 1) - m_grid.node(i);
            for (int j = 0; j < density_cells; ++j) {
                HermiteCorners d;
                for (int k = 0; k < 2; ++k) {
                    for (int l = 0; l < 2; ++l) {
                        const NodeData& n =
                            nodes[p][static_cast<std::size_t>((i + k) * nNodesR + j + l)];
                        d.f[k][l] = n.f;
                        d.ft[k][l] = n.fT * wT;
                        d.fu[k][l] = n.fr * drho;
                        d.ftu[k][l] = n.fTr * wT * drho;
                    }
                }
                m_patches[static_cast<std::size_t>(2 * (i * density_cells + j) + p)] =
                    bicubicHermite(d);
            }
        }
    }
}

} // namespace coldtip::models
