#include "solver/network/elements/RadiationLoad.hpp"

#include <fmt/format.h>

namespace coldtip {

RadiationLoad::RadiationLoad(double area, double emissivity, double ambient_temperature)
    : m_sigma_eps_A(kStefanBoltzmann * emissivity * area), m_ambient(ambient_temperature)
{
}

models::Slope RadiationLoad::heat(double, double T) const
{
    const double T2 = T * T, Ta2 = m_ambient * m_ambient;
    return {m_sigma_eps_A * (Ta2 * Ta2 - T2 * T2), -4.0 * m_sigma_eps_A * T2 * T};
}

std::string RadiationLoad::describe() const
{
    return fmt::format("radiation from {:g} K", m_ambient);
}

} // namespace coldtip
