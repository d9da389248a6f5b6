#include "solver/network/elements/SupportConduction.hpp"

#include <fmt/format.h>

namespace coldtip {

SupportConduction::SupportConduction(const models::SolidTable& material, double area,
                                     double length, int count, double ambient_temperature)
    : m_ambient(ambient_temperature)
{
    m_conductor.material = &material;
    m_conductor.area_over_length = area / length;
    m_conductor.count = count;
}

models::Slope SupportConduction::heat(double, double T) const
{
    const Dual<1> Q = m_conductor.heat(Dual<1>(m_ambient), Dual<1>::seed(T, 0));
    return {Q.v, Q.d[0]};
}

std::string SupportConduction::describe() const
{
    return fmt::format("support conduction from {:g} K", m_ambient);
}

} // namespace coldtip
