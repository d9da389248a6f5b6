#include "models/correlations/RottFunctions.hpp"

#include <algorithm>
#include <array>
#include <cmath>
#include <vector>

#include "models/numeric/CubicHermite.hpp"

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

namespace {

Slope exactResistanceFactor(double x)
{
    if (x < kSmallRatio) return {1.0, 0.0};
    const ComplexSlope w = oneMinusRottCircular(x);
    const Complex q = kI * x * x / (4.0 * w.value);
    const Complex dq = kI * (2.0 * x / (4.0 * w.value) - x * x * w.slope / (4.0 * w.value * w.value));
    return {q.real(), dq.real()};
}

Slope exactInertanceFactor(double x)
{
    if (x < kSmallRatio) return {4.0 / 3.0, 0.0};
    const ComplexSlope w = oneMinusRottCircular(x);
    return {(1.0 / w.value).real(), (-w.slope / (w.value * w.value)).real()};
}

Slope exactNusselt(double x)
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

//! A law of x tabulated on a uniform grid in ln x with its exact values and slopes at the
//! nodes and cubic Hermite cells between them (C1; the slope returned is the interpolant's
//! own, so the Jacobian is exact for the law as evaluated). The engine evaluates these laws
//! in every face and wall of an open tube at every right-hand side; the Bessel recurrence
//! costs about 50 complex divisions, the table a few multiplications. With 64 nodes per
//! decade the interpolation error is below 1e-9 relative (h^4/384 max|f^(4)|). Above
//! the table the exact law is evaluated.
class LogTable {
public:
    LogTable(Slope (*law)(double), double x_min, double x_max, int per_decade) : m_law(law)
    {
        m_u0 = std::log(x_min);
        m_h = std::log(10.0) / per_decade;
        const int n = static_cast<int>(std::ceil((std::log(x_max) - m_u0) / m_h));
        m_u1 = m_u0 + n * m_h;
        for (int i = 0; i <= n; ++i) {
            const double x = std::exp(m_u0 + i * m_h);
            const Slope f = law(x);
            m_value.push_back(f.value);
            m_slope.push_back(f.slope * x * m_h); // d/du times the cell width
        }
    }
    //! Where x falls: below the table, above it, or in cell i at fraction t.
    struct Place {
        enum class Where { Below, Inside, Above } where;
        int i = 0;
        double t = 0.0;
    };
    Place locate(double x) const
    {
        if (!(x > 0.0)) return {Place::Where::Below};
        const double u = std::log(x);
        if (u <= m_u0) return {Place::Where::Below};
        if (u >= m_u1) return {Place::Where::Above};
        const double q = (u - m_u0) / m_h;
        const int i = std::min(static_cast<int>(q), static_cast<int>(m_value.size()) - 2);
        return {Place::Where::Inside, i, q - i};
    }
    Slope at(const Place& p, double x) const
    {
        // Below the table the laws sit at their x -> 0 limits to within 1e-9 (their first
        // correction is of order x^4), where the exact forms lose digits to cancellation.
        if (p.where == Place::Where::Below) return {m_value.front(), 0.0};
        if (p.where == Place::Where::Above) return m_law(x);
        const int i = p.i;
        const Cubic c = Cubic::hermite(m_value[i], m_value[i + 1], m_slope[i], m_slope[i + 1]);
        return {c.value(p.t), c.slope(p.t) / (m_h * x)};
    }
    Slope operator()(double x) const { return at(locate(x), x); }

private:
    Slope (*m_law)(double);
    double m_u0 = 0.0, m_u1 = 0.0, m_h = 1.0;
    std::vector<double> m_value, m_slope;
};

constexpr double kTableMin = 1e-2, kTableMax = 1e4;
constexpr int kNodesPerDecade = 64;

} // namespace

namespace {

const LogTable& resistanceTable()
{
    static const LogTable table(exactResistanceFactor, kTableMin, kTableMax, kNodesPerDecade);
    return table;
}

const LogTable& inertanceTable()
{
    static const LogTable table(exactInertanceFactor, kTableMin, kTableMax, kNodesPerDecade);
    return table;
}

} // namespace

Slope womersleyResistanceFactor(double x) { return resistanceTable()(x); }

Slope womersleyInertanceFactor(double x) { return inertanceTable()(x); }

WomersleyFactors womersleyFactors(double x)
{
    // Both tables share their grid, so one logarithm places x in both.
    const LogTable::Place place = resistanceTable().locate(x);
    return {resistanceTable().at(place, x), inertanceTable().at(place, x)};
}

Slope rottNusselt(double x)
{
    static const LogTable table(exactNusselt, kTableMin, kTableMax, kNodesPerDecade);
    return table(x);
}

} // namespace coldtip::models
