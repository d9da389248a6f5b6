#include "models/correlations/Gnielinski.hpp"

#include <cmath>

#include "models/correlations/TubeFriction.hpp"

namespace coldtip::models {

Slope gnielinskiNusselt(double Re, double Pr)
{
    const Slope f = petukhovFriction(Re);
    const double f8 = f.value / 8.0;
    const double root = std::sqrt(f8);
    const double pr23 = std::pow(Pr, 2.0 / 3.0) - 1.0;
    const double numerator = f8 * (Re - 1000.0) * Pr;
    const double denominator = 1.0 + 12.7 * root * pr23;
    const double dNumerator = Pr * (f.slope / 8.0 * (Re - 1000.0) + f8);
    const double dDenominator = 12.7 * pr23 * f.slope / (16.0 * root);
    return {numerator / denominator,
            (dNumerator * denominator - numerator * dDenominator) /
                (denominator * denominator)};
}

} // namespace coldtip::models
