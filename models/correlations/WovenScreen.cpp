#include "models/correlations/WovenScreen.hpp"

#include <cmath>
#include <numbers>
#include <stdexcept>

#include "models/numeric/PowerLaw.hpp"

namespace coldtip::models {
namespace {

double checkedPorosity(double mesh, double wire_diameter, std::optional<double> porosity)
{
    if (!(mesh > 0.0 && wire_diameter > 0.0)) {
        throw std::invalid_argument(
            "woven screen: mesh and wire diameter must be positive");
    }
    const double phi =
        porosity ? *porosity : WovenScreen::geometricPorosity(mesh, wire_diameter);
    if (!(phi > 0.0 && phi < 1.0)) {
        throw std::invalid_argument("woven screen: porosity must be in (0, 1), got " +
                                    std::to_string(phi));
    }
    return phi;
}

} // namespace

double WovenScreen::geometricPorosity(double mesh, double wire_diameter)
{
    return 1.0 - std::numbers::pi * mesh * wire_diameter / 4.0;
}

WovenScreen::WovenScreen(double mesh, double wire_diameter,
                         std::optional<double> porosity)
    : WovenScreen(Geometry{wire_diameter, checkedPorosity(mesh, wire_diameter, porosity)})
{}

WovenScreen::WovenScreen(Geometry g)
    : FlowPassage(g.porosity, g.porosity * g.wire_diameter / (1.0 - g.porosity)),
      m_nusseltScale(std::pow(g.porosity, 1.79)),
      m_dispersionScale(0.5 * std::pow(g.porosity, -2.91))
{}

Slope WovenScreen::frictionTimesReynolds(double Re) const
{
    const Slope p = powerLaw(Re, 0.897);
    return {129.0 + 2.91 * p.value, 2.91 * p.slope};
}

Slope WovenScreen::nusselt(double Re, double Pr) const
{
    const Slope p = powerLaw(Re * Pr, 0.66);
    return {(1.0 + 0.99 * p.value) * m_nusseltScale,
            0.99 * p.slope * Pr * m_nusseltScale};
}

Slope WovenScreen::axialConductionFactor(double Pe) const
{
    const Slope p = powerLaw(Pe, 0.66);
    return {1.0 + m_dispersionScale * p.value, m_dispersionScale * p.slope};
}

} // namespace coldtip::models
