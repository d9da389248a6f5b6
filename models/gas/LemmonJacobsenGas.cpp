#include "models/gas/LemmonJacobsenGas.hpp"

#include <algorithm>
#include <cmath>

namespace coldtip::models {

double LemmonJacobsenGas::diluteViscosityMicro(double T) const
{
    T = std::clamp(T, m_c.t_min, m_c.t_max);
    const double s = std::log(T / m_c.epsilon_k);
    const double ln_omega =
        0.431 + s * (-0.4623 + s * (0.08406 + s * (0.005341 - s * 0.00331)));
    const double m_gmol = m_c.molar_mass * 1e3;
    return 0.0266958 * std::sqrt(m_gmol * T) /
           (m_c.sigma * m_c.sigma * std::exp(ln_omega));
}

double LemmonJacobsenGas::viscosity(double T, double /*rho*/) const
{
    return diluteViscosityMicro(T) * 1e-6;
}

double LemmonJacobsenGas::conductivity(double T, double /*rho*/) const
{
    T = std::clamp(T, m_c.t_min, m_c.t_max);
    const double tau = m_c.t_reducing / T;
    const double milli = m_c.n1 * diluteViscosityMicro(T) +
                         m_c.n2 * std::pow(tau, m_c.t2) + m_c.n3 * std::pow(tau, m_c.t3);
    return milli * 1e-3;
}

} // namespace coldtip::models
