#include "models/correlations/RottFunctions.hpp"

#include <array>
#include <cmath>

namespace coldtip::models {

namespace {

using Complex = std::complex<double>;
const Complex kI(0.0, 1.0);

//! Below this |z| the continued fraction, above it the asymptotic series (both agree there
//! to round-off: the series' smallest term at |z| = 40 is below 1e-16).
constexpr double kAsymptoticModulus = 40.0;
constexpr int kAsymptoticTerms = 14;

//! Coefficients a_m of J1/J0 ~ sum a_m z^-m for large |z| with Im z > 0 (where the Hankel
//! function H2 dominates J): from r' = 1 - r/z + r^2 order by order,
//! a_0 = i, a_m = [(2 - m) a_{m-1} - sum_{j=1}^{m-1} a_j a_{m-j}] / (2i).
std::array<Complex, kAsymptoticTerms> asymptoticCoefficients()
{
    std::array<Complex, kAsymptoticTerms> a{};
    a[0] = kI;
    for (int m = 1; m < kAsymptoticTerms; ++m) {
        Complex s = static_cast<double>(2 - m) * a[m - 1];
        for (int j = 1; j < m; ++j) s -= a[j] * a[m - j];
        a[m] = s / (2.0 * kI);
    }
    return a;
}

//! r1 = J1(z)/J0(z) and r2 = J2(z)/J1(z) for z = (i - 1) x, x > 0.
void besselRatios(const Complex& z, Complex& r1, Complex& r2)
{
    if (std::abs(z) < kAsymptoticModulus) {
        // J_n/J_{n-1} = 1/(2n/z - J_{n+1}/J_n), run downward from a start far above |z|
        // (Miller's backward recurrence; the error of the zero start decays like
        // (|z|/2n)^(N-n)).
        const int N = static_cast<int>(std::abs(z)) + 40;
        Complex r = 0.0;
        for (int n = N; n >= 2; --n) r = 1.0 / (2.0 * n / z - r);
        r2 = r;
        r1 = 1.0 / (2.0 / z - r2);
        return;
    }
    static const std::array<Complex, kAsymptoticTerms> a = asymptoticCoefficients();
    const Complex w = 1.0 / z;
    Complex s = 0.0;
    for (int m = kAsymptoticTerms - 1; m >= 0; --m) s = s * w + a[m];
    r1 = s;
    r2 = 2.0 / z - 1.0 / r1;
}

//! f, 1 - f and df/dx of the circular pore (x > 0).
struct CircularPore {
    Complex f, one_minus_f, df_dx;
};

CircularPore circularPore(double x)
{
    const Complex dz_dx(-1.0, 1.0);
    const Complex z = dz_dx * x;
    Complex r1, r2;
    besselRatios(z, r1, r2);
    CircularPore c;
    c.f = 2.0 * r1 / z;
    c.one_minus_f = -r1 * r2; // J0 - 2 J1/z = -J2: no cancellation for small z
    const Complex dr = 1.0 - r1 / z + r1 * r1;
    c.df_dx = (2.0 * dr / z - 2.0 * r1 / (z * z)) * dz_dx;
    return c;
}

//! Below this x every function takes its x -> 0 limit (the next term is of order x^4).
constexpr double kSmallRatio = 1e-6;

} // namespace

ComplexSlope rottCircular(double x)
{
    if (x < kSmallRatio) return {1.0, 0.0};
    const CircularPore c = circularPore(x);
    return {c.f, c.df_dx};
}

ComplexSlope oneMinusRottCircular(double x)
{
    if (x < kSmallRatio) return {0.0, 0.0};
    const CircularPore c = circularPore(x);
    return {c.one_minus_f, -c.df_dx};
}

ComplexSlope rottPlates(double x)
{
    if (x < kSmallRatio) return {1.0, 0.0};
    const Complex dz_dx(1.0, 1.0);
    const Complex z = dz_dx * x;
    const Complex t = std::tanh(z);
    return {t / z, ((1.0 - t * t) / z - t / (z * z)) * dz_dx};
}

Slope womersleyResistanceFactor(double x)
{
    if (x < kSmallRatio) return {1.0, 0.0};
    const ComplexSlope w = oneMinusRottCircular(x);
    const Complex q = kI * x * x / (4.0 * w.value);
    const Complex dq = kI * (2.0 * x / (4.0 * w.value) - x * x * w.slope / (4.0 * w.value * w.value));
    return {q.real(), dq.real()};
}

Slope womersleyInertanceFactor(double x)
{
    if (x < kSmallRatio) return {4.0 / 3.0, 0.0};
    const ComplexSlope w = oneMinusRottCircular(x);
    return {(1.0 / w.value).real(), (-w.slope / (w.value * w.value)).real()};
}

Slope rottNusselt(double x)
{
    if (x < kSmallRatio) return {8.0, 0.0};
    const ComplexSlope w = oneMinusRottCircular(x);
    const Complex g = 0.5 - w.value, dg = -w.slope;
    const double ag = std::abs(g);
    const double dag = (std::conj(g) * dg).real() / ag;
    const double num = -(ag + g.real()), den = g.imag();
    const double s = num / den;
    const double ds = (-(dag + dg.real()) * den - num * dg.imag()) / (den * den);
    return {2.0 * s * x * x, 4.0 * s * x + 2.0 * x * x * ds};
}

} // namespace coldtip::models
