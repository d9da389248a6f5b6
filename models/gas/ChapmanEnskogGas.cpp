#include "models/gas/ChapmanEnskogGas.hpp"

#include <algorithm>
#include <cmath>
#include <numbers>

namespace coldtip::models {
namespace {

constexpr double kBoltzmann = 1.380649e-23; // [J/K], exact (SI 2019)
constexpr double kAvogadro = 6.02214076e23; // [1/mol], exact (SI 2019)

double omega22(double t_star)
{
    return 1.16145 * std::pow(t_star, -0.14874) + 0.52487 * std::exp(-0.77320 * t_star) +
           2.16178 * std::exp(-2.43787 * t_star);
}

} // namespace

double ChapmanEnskogGas::viscosity(double T, double /*rho*/) const
{
    using std::numbers::pi;
    T = std::clamp(T, m_p.t_min, m_p.t_max);
    const double m = m_p.molar_mass / kAvogadro;
    return 5.0 / 16.0 * std::sqrt(pi * m * kBoltzmann * T) /
           (pi * m_p.sigma * m_p.sigma * omega22(T / m_p.epsilon_k));
}

double ChapmanEnskogGas::conductivity(double T, double rho) const
{
    return 3.75 * gasConstant() * viscosity(T, rho);
}

} // namespace coldtip::models
