#pragma once
//! \file Harmonics.hpp
//! Harmonics of a periodic signal sampled at n equal intervals over one period:
//!   X_k = (2/n) sum_j x_j exp(-i k 2 pi j / n),  x(t) ~ X_0/2 + sum_k Re[X_k exp(i k omega t)]
//! (the discrete Fourier transform; exact for harmonics below n/2). Time is measured from the
//! first sample, so phases are relative to the start of the sampled cycle.

#include <complex>
#include <vector>

namespace coldtip {

//! Complex amplitude of harmonic k (k >= 1) of samples x; the mean for k = 0.
inline std::complex<double> harmonic(const std::vector<double>& x, int k)
{
    const std::size_t n = x.size();
    std::complex<double> sum = 0.0;
    for (std::size_t j = 0; j < n; ++j)
        sum += x[j] * std::polar(1.0, -2.0 * M_PI * k * static_cast<double>(j) / n);
    return k == 0 ? sum / static_cast<double>(n) : 2.0 * sum / static_cast<double>(n);
}

//! Mean over the cycle of samples x (periodic trapezoid rule = plain mean).
inline double cycleMean(const std::vector<double>& x)
{
    double s = 0.0;
    for (double v : x) s += v;
    return x.empty() ? 0.0 : s / x.size();
}

} // namespace coldtip
