#include "models/correlations/TubeFriction.hpp"

#include <cmath>
#include <numbers>

namespace coldtip::models {

Slope haalandFriction(double Re, double relative_roughness)
{
    const double a = std::pow(relative_roughness / 3.7, 1.11) + 6.9 / Re;
    const double l = 1.8 * std::log10(a);
    const double f = 1.0 / (l * l);
    // df/dRe = -2 f / l * dl/dRe,  dl/dRe = 1.8 / (a ln 10) * (-6.9 / Re^2)
    const double dl = -1.8 * 6.9 / (a * std::numbers::ln10 * Re * Re);
    return {f, -2.0 * f / l * dl};
}

Slope petukhovFriction(double Re)
{
    const double l = 0.790 * std::log(Re) - 1.64;
    const double f = 1.0 / (l * l);
    return {f, -2.0 * f / l * 0.790 / Re};
}

} // namespace coldtip::models
