#include "models/solids/SolidTable.hpp"

#include <algorithm>
#include <cmath>
#include <functional>

namespace coldtip::models {
namespace {

constexpr double kRelativeStep = 1e-5;

// Node slope of a material property. At the table ends the inward one-sided difference
// (the material beyond is held). At a fit-range end inside the table the material has a
// corner between its fit and its held value; there the fit's slope is used, so that the
// spline follows the fit exactly and rounds the corner within the first cell of the held
// side. Elsewhere the one-sided slopes agree and their mean is the central difference.
double nodeSlope(const std::function<double(double)>& f, double T, int i, int last)
{
    const double h = kRelativeStep * T;
    const double f0 = f(T);
    const double up[2] = {f(T + h), f(T + 2.0 * h)};
    const double down[2] = {f(T - h), f(T - 2.0 * h)};
    const double forward = (-3.0 * f0 + 4.0 * up[0] - up[1]) / (2.0 * h);
    const double backward = (3.0 * f0 - 4.0 * down[0] + down[1]) / (2.0 * h);
    const bool heldBelow = down[0] == f0 && down[1] == f0;
    const bool heldAbove = up[0] == f0 && up[1] == f0;
    if (i == 0 || (heldBelow && !heldAbove)) {
        return forward;
    }
    if (i == last || (heldAbove && !heldBelow)) {
        return backward;
    }
    return (up[0] - down[0]) / (2.0 * h);
}

} // namespace

SolidTable::SolidTable(const SolidMaterial& material)
    : m_name(material.name()), m_density(material.density()),
      m_grid(kMinTemperature, kMaxTemperature, kCellsPerOctave),
      m_enthalpyGrid(1.0, 2.0, 1)
{
    const int n = m_grid.cellCount();
    const std::function<double(double)> cp = [&](double T) {
        return material.specificHeat(T);
    };
    const std::function<double(double)> k = [&](double T) {
        return material.conductivity(T);
    };
    std::vector<double> cpNode(static_cast<std::size_t>(n + 1));
    std::vector<double> cpSlope(cpNode.size());
    std::vector<double> kNode(cpNode.size());
    std::vector<double> kSlope(cpNode.size());
    for (int i = 0; i <= n; ++i) {
        const auto s = static_cast<std::size_t>(i);
        const double T = m_grid.node(i);
        cpNode[s] = cp(T);
        kNode[s] = k(T);
        cpSlope[s] = nodeSlope(cp, T, i, n);
        kSlope[s] = nodeSlope(k, T, i, n);
    }
    m_invWidth.resize(static_cast<std::size_t>(n));
    m_cells.resize(static_cast<std::size_t>(n));
    // Below 1 K the held c_p and k integrate linearly from 0 K.
    double h = cpNode.front() * kMinTemperature;
    double K = kNode.front() * kMinTemperature;
    for (int i = 0; i < n; ++i) {
        const auto s = static_cast<std::size_t>(i);
        const double w = m_grid.node(i + 1) - m_grid.node(i);
        m_invWidth[s] = 1.0 / w;
        Cell& c = m_cells[s];
        c.cp =
            Cubic::hermite(cpNode[s], cpNode[s + 1], cpSlope[s] * w, cpSlope[s + 1] * w);
        c.k = Cubic::hermite(kNode[s], kNode[s + 1], kSlope[s] * w, kSlope[s + 1] * w);
        c.cp_integral = h;
        c.k_integral = K;
        h += w * c.cp.integral(1.0);
        K += w * c.k.integral(1.0);
    }
    m_enthalpyMax = h;
    m_kIntegralMax = K;

    m_enthalpyGrid =
        OctaveGrid(m_cells.front().cp_integral, m_enthalpyMax, kCellsPerOctave);
    m_firstCell.resize(static_cast<std::size_t>(m_enthalpyGrid.cellCount()));
    int i = 0;
    for (int j = 0; j < m_enthalpyGrid.cellCount(); ++j) {
        while (i + 1 < n && m_cells[static_cast<std::size_t>(i + 1)].cp_integral <=
                                m_enthalpyGrid.node(j)) {
            ++i;
        }
        m_firstCell[static_cast<std::size_t>(j)] = i;
    }
}

double SolidTable::integral(Cubic Cell::*field, double Cell::*base, double top,
                            double T) const
{
    if (T <= kMinTemperature) {
        return (m_cells.front().*field).value(0.0) * T;
    }
    if (T >= kMaxTemperature) {
        return top + (m_cells.back().*field).value(1.0) * (T - kMaxTemperature);
    }
    const int i = m_grid.cell(T);
    const Cell& c = m_cells[static_cast<std::size_t>(i)];
    const double inv = m_invWidth[static_cast<std::size_t>(i)];
    return c.*base + (c.*field).integral((T - m_grid.node(i)) * inv) / inv;
}

double SolidTable::enthalpy(double T) const
{
    return integral(&Cell::cp, &Cell::cp_integral, m_enthalpyMax, T);
}

double SolidTable::temperatureFromEnthalpy(double h) const
{
    const double cpLow = m_cells.front().cp.value(0.0);
    if (h <= m_cells.front().cp_integral) {
        return h / cpLow;
    }
    if (h >= m_enthalpyMax) {
        return kMaxTemperature + (h - m_enthalpyMax) / m_cells.back().cp.value(1.0);
    }
    // Last cell whose start enthalpy is <= h (enthalpy increases with T since c_p > 0).
    auto i = static_cast<std::size_t>(
        m_firstCell[static_cast<std::size_t>(m_enthalpyGrid.cell(h))]);
    while (i + 1 < m_cells.size() && m_cells[i + 1].cp_integral <= h) {
        ++i;
    }
    const Cell& c = m_cells[i];
    const double w = 1.0 / m_invWidth[i];
    const double target = (h - c.cp_integral) / w; // = integral_0^t p
    const double total = c.cp.integral(1.0);
    // Safeguarded Newton on the quartic integral_0^t p - target, bracketed in [0, 1].
    double lo = 0.0;
    double hi = 1.0;
    double t = std::clamp(target / total, 0.0, 1.0);
    for (int iteration = 0; iteration < 60; ++iteration) {
        const double g = c.cp.integral(t) - target;
        if (g == 0.0) {
            break;
        }
        if (g > 0.0) {
            hi = t;
        } else {
            lo = t;
        }
        double next = t - g / c.cp.value(t);
        if (!(next >= lo && next <= hi)) {
            next = 0.5 * (lo + hi);
        }
        if (std::abs(next - t) <= 1e-15) {
            t = next;
            break;
        }
        t = next;
    }
    return m_grid.node(static_cast<int>(i)) + w * t;
}

} // namespace coldtip::models
