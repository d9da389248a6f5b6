#include "models/solids/NistCryogenicFit.hpp"

#include <algorithm>
#include <cmath>

namespace coldtip::models {

double NistLogPolynomial::operator()(double T) const
{
    const double x = std::log10(std::clamp(T, t_min, t_max));
    double sum = 0.0;
    for (auto c = coefficients.rbegin(); c != coefficients.rend(); ++c) {
        sum = sum * x + *c;
    }
    return std::pow(10.0, sum);
}

double NistCopperRational::operator()(double T) const
{
    const double s = std::sqrt(std::clamp(T, t_min, t_max));
    const auto& k = coefficients;
    const double numerator = k[0] + s * (k[2] + s * (k[4] + s * (k[6] + s * k[8])));
    const double denominator = 1.0 + s * (k[1] + s * (k[3] + s * (k[5] + s * k[7])));
    return std::pow(10.0, numerator / denominator);
}

} // namespace coldtip::models
