#include "models/gas/Helium.hpp"

#include <algorithm>
#include <cmath>

#include "models/numeric/SmoothStep.hpp"

namespace coldtip::models {
namespace {

// TN 1334 viscosities are in ug/(cm s).
constexpr double kMicrogramPerCmSecond = 1e-7;

double lowBranchDilute(double T)
{
    const double x = std::log(T);
    return std::exp(-0.135311743 / x + 1.00347841 + 1.20654649 * x - 0.149564551 * x * x +
                    0.012520841 * x * x * x);
}

double highBranchDilute(double T)
{
    return 196.0 * std::pow(T, 0.71938) *
           std::exp(12.451 / T - 295.67 / (T * T) - 4.1249);
}

// min(T, 300 K) of the TN 1334 excess terms, with its corner rounded by a quadratic over
// 280-320 K so that eta stays C1 (the shift is at most 5 K in the argument of B, C, D,
// below 1e-4 of eta at any density where helium at 300 K is a gas).
double excessTemperature(double T)
{
    constexpr double corner = 300.0;
    constexpr double band = 40.0;
    const double lo = corner - 0.5 * band;
    if (T <= lo) {
        return T;
    }
    if (T >= corner + 0.5 * band) {
        return corner;
    }
    return T - (T - lo) * (T - lo) / (2.0 * band);
}

double cubicInLog(double x, const double (&c)[5])
{
    return c[0] / x + c[1] + x * (c[2] + x * (c[3] + x * c[4]));
}

} // namespace

double Helium::viscosity(double T, double rho) const
{
    T = std::clamp(T, minTemperature(), maxTemperature());
    const double rho_cgs = std::clamp(rho, 0.0, maxDensity()) * 1e-3;
    const double eta_low = lowBranchDilute(T);
    const double w = smoothStep(T, 90.0, 110.0).value;
    const double eta0 = w > 0.0 ? (1.0 - w) * eta_low + w * highBranchDilute(T) : eta_low;

    static constexpr double b[5] = {-47.5295259, 87.6799309, -42.0741589, 8.33128289,
                                    -0.589252385};
    static constexpr double c[5] = {547.309267, -904.870586, 431.404928, -81.4504854,
                                    5.37008433};
    static constexpr double d[5] = {-1684.39324, 3331.08630, -1632.19172, 308.804413,
                                    -20.2936367};
    const double x = std::log(excessTemperature(T));
    const double e =
        rho_cgs *
        (cubicInLog(x, b) + rho_cgs * (cubicInLog(x, c) + rho_cgs * cubicInLog(x, d)));
    return (eta0 + eta_low * std::expm1(e)) * kMicrogramPerCmSecond;
}

double Helium::conductivity(double T, double rho) const
{
    T = std::clamp(T, minTemperature(), maxTemperature());
    rho = std::clamp(rho, 0.0, maxDensity());
    const double u = 1.0 / T;
    const double lambda0 =
        2.7870034e-3 * std::pow(T, 0.7034007057) *
        std::exp(
            u * (3.739232544 + u * (-26.20316969 + u * (59.82252246 - u * 49.26397634))));
    if (rho == 0.0) {
        return lambda0;
    }
    const double t13 = std::cbrt(T);
    const double t23 = t13 * t13;
    const double linear =
        1.862970530e-4 - 7.275964435e-7 * T - 1.427549651e-4 * t13 + 3.290833592e-5 * t23;
    const double cubic = -5.213335363e-8 + 4.492659933e-8 * t13 - 5.924416513e-9 * t23;
    const double logarithmic =
        7.087321137e-6 - 6.013335678e-6 * t13 + 8.067145814e-7 * t23 + 3.995125013e-7 * u;
    constexpr double rho_c = 68.0; // Hands & Arp's reducing density [kg/m^3]
    return lambda0 +
           rho * (linear + rho * (rho * cubic + logarithmic * std::log(rho / rho_c)));
}

} // namespace coldtip::models
