#include "models/solids/DebyeHeatCapacity.hpp"

#include <algorithm>
#include <cmath>

#include "models/gas/WorkingGas.hpp"

namespace coldtip::models {

double debyeHeatCapacity(double T, double theta, double molar_mass)
{
    // 8-point Gauss-Legendre on unit panels; x^4 e^x/(e^x-1)^2 = x^4 / (4 sinh^2(x/2)) is
    // smooth and stable at x -> 0, and beyond x = 80 it is below 1e-26 of its peak.
    static constexpr double node[4] = {0.1834346424956498, 0.5255324099163290,
                                       0.7966664774136267, 0.9602898564975363};
    static constexpr double weight[4] = {0.3626837833783620, 0.3137066458778873,
                                         0.2223810344533745, 0.1012285362903763};
    const double y = std::min(theta / T, 80.0);
    auto integrand = [](double x) {
        const double s = std::sinh(0.5 * x);
        return x * x * x * x / (4.0 * s * s);
    };
    const int panels = static_cast<int>(std::ceil(y));
    const double width = y / panels;
    double integral = 0.0;
    for (int p = 0; p < panels; ++p) {
        const double mid = (p + 0.5) * width;
        for (int k = 0; k < 4; ++k) {
            const double dx = 0.5 * width * node[k];
            integral += weight[k] * (integrand(mid - dx) + integrand(mid + dx));
        }
    }
    integral *= 0.5 * width;
    const double r = T / theta;
    return 9.0 * kMolarGasConstant / molar_mass * r * r * r * integral;
}

} // namespace coldtip::models
