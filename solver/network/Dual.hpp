#pragma once
//! \file Dual.hpp
//! Forward-mode dual numbers of fixed width. Elements write their local equations once as
//! templates on the scalar type; evaluated with `double` they give the right-hand side, with
//! `Dual<N>` (inputs seeded with unit derivatives) they give the exact local partials that the
//! Jacobian assembly scatters into the sparse matrix. Closure laws from models/ return a value
//! and its slope (models::Slope), which `chain` turns back into a dual number.

#include <array>
#include <cmath>

#include "models/numeric/Slope.hpp"

namespace coldtip {

template <int N>
struct Dual {
    double v = 0.0;
    std::array<double, N> d{};

    Dual() = default;
    Dual(double value) : v(value) {} // NOLINT: constants promote implicitly
    //! The independent variable number `k` with value `value`.
    static Dual seed(double value, int k)
    {
        Dual x(value);
        x.d[k] = 1.0;
        return x;
    }

    Dual& operator+=(const Dual& b)
    {
        v += b.v;
        for (int k = 0; k < N; ++k) d[k] += b.d[k];
        return *this;
    }
    Dual& operator-=(const Dual& b)
    {
        v -= b.v;
        for (int k = 0; k < N; ++k) d[k] -= b.d[k];
        return *this;
    }
    Dual& operator*=(const Dual& b)
    {
        for (int k = 0; k < N; ++k) d[k] = d[k] * b.v + v * b.d[k];
        v *= b.v;
        return *this;
    }
    Dual& operator/=(const Dual& b)
    {
        const double inv = 1.0 / b.v;
        const double q = v * inv;
        for (int k = 0; k < N; ++k) d[k] = (d[k] - q * b.d[k]) * inv;
        v = q;
        return *this;
    }
};

template <int N> Dual<N> operator-(Dual<N> a)
{
    a.v = -a.v;
    for (auto& x : a.d) x = -x;
    return a;
}
template <int N> Dual<N> operator+(Dual<N> a, const Dual<N>& b) { return a += b; }
template <int N> Dual<N> operator-(Dual<N> a, const Dual<N>& b) { return a -= b; }
template <int N> Dual<N> operator*(Dual<N> a, const Dual<N>& b) { return a *= b; }
template <int N> Dual<N> operator/(Dual<N> a, const Dual<N>& b) { return a /= b; }
template <int N> Dual<N> operator+(Dual<N> a, double b) { a.v += b; return a; }
template <int N> Dual<N> operator+(double b, Dual<N> a) { a.v += b; return a; }
template <int N> Dual<N> operator-(Dual<N> a, double b) { a.v -= b; return a; }
template <int N> Dual<N> operator-(double b, const Dual<N>& a) { return -a + b; }
template <int N> Dual<N> operator*(Dual<N> a, double b)
{
    a.v *= b;
    for (auto& x : a.d) x *= b;
    return a;
}
template <int N> Dual<N> operator*(double b, Dual<N> a) { return a * b; }
template <int N> Dual<N> operator/(Dual<N> a, double b) { return a * (1.0 / b); }
template <int N> Dual<N> operator/(double b, const Dual<N>& a)
{
    Dual<N> r(b / a.v);
    const double s = -r.v / a.v;
    for (int k = 0; k < N; ++k) r.d[k] = s * a.d[k];
    return r;
}

//! Value of a scalar, whether plain or dual.
inline double valueOf(double x) { return x; }
template <int N> double valueOf(const Dual<N>& x) { return x.v; }

//! f(x) for a law known by its value and slope at x.v: the chain rule.
inline double chain(const models::Slope& f, double) { return f.value; }
template <int N> Dual<N> chain(const models::Slope& f, const Dual<N>& x)
{
    Dual<N> r(f.value);
    for (int k = 0; k < N; ++k) r.d[k] = f.slope * x.d[k];
    return r;
}
//! f(T, rho) for a law known by its value and two partials.
inline double chain(const models::Slope2& f, double, double) { return f.value; }
template <int N> Dual<N> chain(const models::Slope2& f, const Dual<N>& T, const Dual<N>& rho)
{
    Dual<N> r(f.value);
    for (int k = 0; k < N; ++k) r.d[k] = f.d_dT * T.d[k] + f.d_drho * rho.d[k];
    return r;
}

template <int N> Dual<N> sqrt(const Dual<N>& a)
{
    const double s = std::sqrt(a.v);
    return chain(models::Slope{s, 0.5 / s}, a);
}
template <int N> Dual<N> exp(const Dual<N>& a)
{
    const double e = std::exp(a.v);
    return chain(models::Slope{e, e}, a);
}
template <int N> Dual<N> log(const Dual<N>& a) { return chain(models::Slope{std::log(a.v), 1.0 / a.v}, a); }
template <int N> Dual<N> tanh(const Dual<N>& a)
{
    const double t = std::tanh(a.v);
    return chain(models::Slope{t, 1.0 - t * t}, a);
}
template <int N> Dual<N> pow(const Dual<N>& a, double p)
{
    const double r = std::pow(a.v, p);
    return chain(models::Slope{r, p * r / a.v}, a);
}

//! |x| smoothed over a scale eps: sqrt(x^2 + eps^2) - eps. C-infinity, exact zero at x = 0,
//! slope continuous through flow reversal (numerics.md §4.3).
template <class S> S smoothAbs(const S& x, double eps)
{
    using std::sqrt;
    return sqrt(x * x + eps * eps) - eps;
}

//! Positive part of a flow for upwinding, smoothed over eps: (x + sqrt(x^2 + eps^2))/2.
//! The negative part is x - smoothPositive(x).
template <class S> S smoothPositive(const S& x, double eps)
{
    using std::sqrt;
    return 0.5 * (x + sqrt(x * x + eps * eps));
}

} // namespace coldtip
