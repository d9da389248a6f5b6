#include "models/correlations/OrificeFlow.hpp"

#include <algorithm>
#include <cmath>

#include "models/numeric/SmoothStep.hpp"

namespace coldtip::models {
namespace {

// Flow function of one direction: S = p_up sqrt(2/(R T_up)) g(P(r)), with partials.
struct Directed {
    double value = 0.0;
    double d_dpUp = 0.0;
    double d_dTUp = 0.0;
    double d_dpDown = 0.0;
};

Directed directedFlow(double p_up, double T_up, double p_down, double R, double gamma,
                      double eps)
{
    const double r_star = std::pow(2.0 / (gamma + 1.0), gamma / (gamma - 1.0));
    const double r = p_down / p_up;
    const bool choked = r <= r_star;
    const double rc = choked ? r_star : r;
    const double c = gamma / (gamma - 1.0);
    const double a = std::pow(rc, 2.0 / gamma);
    const double b = std::pow(rc, (gamma + 1.0) / gamma);
    const double P = c * (a - b);
    const double dP_dr =
        choked ? 0.0 : c * (2.0 / gamma * a - (gamma + 1.0) / gamma * b) / rc;

    double g;
    double dg;
    if (std::abs(P) >= eps) {
        const double root = std::sqrt(std::abs(P));
        g = std::copysign(root, P);
        dg = 0.5 / root;
    } else {
        const double s = 1.0 / std::sqrt(eps);
        const double q = P * P / (eps * eps);
        g = P * s * (1.25 - 0.25 * q);
        dg = s * (1.25 - 0.75 * q);
    }
    const double k = std::sqrt(2.0 / (R * T_up));
    const double S = p_up * k * g;
    // dr/dp_up = -r/p_up, dr/dp_down = 1/p_up.
    return {S, k * (g - r * dg * dP_dr), -0.5 * S / T_up, k * dg * dP_dr};
}

} // namespace

OrificeFlow orificeMassFlow(double p_a, double T_a, double p_b, double T_b,
                            double discharge_area, double gas_constant, double gamma,
                            double relative_band)
{
    const double sum = p_a + p_b;
    const double z = 2.0 * (p_a - p_b) / sum;
    const Slope w = smoothStep(z, -0.5 * relative_band, 0.5 * relative_band);
    const double dz_dpa = 4.0 * p_b / (sum * sum);
    const double dz_dpb = -4.0 * p_a / (sum * sum);

    OrificeFlow out;
    if (w.value > 0.0) { // a upstream: +S_a
        const Directed s =
            directedFlow(p_a, T_a, p_b, gas_constant, gamma, relative_band);
        out.mdot += w.value * s.value;
        out.d_dpa += w.value * s.d_dpUp + w.slope * dz_dpa * s.value;
        out.d_dpb += w.value * s.d_dpDown + w.slope * dz_dpb * s.value;
        out.d_dTa += w.value * s.d_dTUp;
    }
    if (w.value < 1.0) { // b upstream: -S_b
        const double v = 1.0 - w.value;
        const Directed s =
            directedFlow(p_b, T_b, p_a, gas_constant, gamma, relative_band);
        out.mdot -= v * s.value;
        out.d_dpb -= v * s.d_dpUp - w.slope * dz_dpb * s.value;
        out.d_dpa -= v * s.d_dpDown - w.slope * dz_dpa * s.value;
        out.d_dTb -= v * s.d_dTUp;
    }
    out.mdot *= discharge_area;
    out.d_dpa *= discharge_area;
    out.d_dpb *= discharge_area;
    out.d_dTa *= discharge_area;
    out.d_dTb *= discharge_area;
    return out;
}

} // namespace coldtip::models
