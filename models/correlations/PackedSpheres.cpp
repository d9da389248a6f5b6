#include "models/correlations/PackedSpheres.hpp"

#include <cmath>
#include <stdexcept>

#include "models/numeric/PowerLaw.hpp"

namespace coldtip::models {
namespace {

double checkedHydraulicDiameter(double d_p, double phi)
{
    if (!(d_p > 0.0 && phi > 0.0 && phi < 1.0)) {
        throw std::invalid_argument(
            "packed spheres: need a positive sphere diameter and 0 < porosity < 1");
    }
    return 2.0 * phi * d_p / (3.0 * (1.0 - phi));
}

} // namespace

PackedSpheres::PackedSpheres(double sphere_diameter, double porosity)
    : FlowPassage(porosity, checkedHydraulicDiameter(sphere_diameter, porosity)),
      m_sphereDiameter(sphere_diameter)
{}

Slope PackedSpheres::frictionTimesReynolds(double Re) const
{
    if (Re <= 0.0) {
        return {400.0 / 3.0, 7.0 / 3.0};
    }
    return {400.0 / 3.0 + 7.0 / 3.0 * Re, 7.0 / 3.0};
}

Slope PackedSpheres::nusselt(double Re, double Pr) const
{
    const double phi = porosity();
    const double toParticle = 1.5 * (1.0 - phi);              // Re_p / Re
    const double toChannel = 2.0 * phi / (3.0 * (1.0 - phi)); // Nu / Nu_p
    const double c = 1.1 * std::cbrt(Pr);
    const Slope p = powerLaw(Re * toParticle, 0.6);
    return {(2.0 + c * p.value) * toChannel, c * p.slope * toParticle * toChannel};
}

} // namespace coldtip::models
