#pragma once
//! \file CubicHermite.hpp
//! Cubic Hermite interpolation on one cell, in the local coordinate t in [0, 1]: the cubic
//! that takes given values and slopes at both ends. Adjacent cells that share a node value
//! and node slope join with continuous value and first derivative (C1). The tensor
//! product of two of them is the bicubic Hermite patch (value, both slopes and the cross
//! derivative at the four corners). Error for smooth data: h^4 max|f''''| / 384
//! (C. de Boor, "A Practical Guide to Splines", 1978, ch. IV).

#include <array>

namespace coldtip::models {

//! p(t) = c[0] + c[1] t + c[2] t^2 + c[3] t^3 on one cell.
struct Cubic {
    std::array<double, 4> c{};

    //! From end values f0, f1 and end slopes d0, d1 already multiplied by the cell width.
    static Cubic hermite(double f0, double f1, double d0, double d1)
    {
        return {{f0, d0, 3.0 * (f1 - f0) - 2.0 * d0 - d1, 2.0 * (f0 - f1) + d0 + d1}};
    }
    double value(double t) const { return c[0] + t * (c[1] + t * (c[2] + t * c[3])); }
    //! dp/dt.
    double slope(double t) const { return c[1] + t * (2.0 * c[2] + 3.0 * t * c[3]); }
    //! Integral of p from 0 to t.
    double integral(double t) const
    {
        return t * (c[0] + t * (c[1] / 2.0 + t * (c[2] / 3.0 + t * c[3] / 4.0)));
    }
};

//! Corner data of a bicubic Hermite patch, slopes already multiplied by the cell widths:
//! f[k][l], ft, fu, ftu at corner (t, u) = (k, l), k, l in {0, 1}.
struct HermiteCorners {
    double f[2][2]{};
    double ft[2][2]{};
    double fu[2][2]{};
    double ftu[2][2]{};
};

//! p(t, u) = sum_ij a[4 i + j] t^i u^j, the bicubic Hermite patch of the corner data.
inline std::array<double, 16> bicubicHermite(const HermiteCorners& d)
{
    // Rows: coefficients of the Hermite basis h00, h10, h01, h11 in powers of t.
    static constexpr double basis[4][4] = {{1.0, 0.0, -3.0, 2.0},
                                           {0.0, 1.0, -2.0, 1.0},
                                           {0.0, 0.0, 3.0, -2.0},
                                           {0.0, 0.0, -1.0, 1.0}};
    // Basis order (value at 0, slope at 0, value at 1, slope at 1) in both directions.
    double g[4][4];
    for (int k = 0; k < 2; ++k) {
        for (int l = 0; l < 2; ++l) {
            g[2 * k][2 * l] = d.f[k][l];
            g[2 * k + 1][2 * l] = d.ft[k][l];
            g[2 * k][2 * l + 1] = d.fu[k][l];
            g[2 * k + 1][2 * l + 1] = d.ftu[k][l];
        }
    }
    std::array<double, 16> a{};
    for (int i = 0; i < 4; ++i) {
        for (int j = 0; j < 4; ++j) {
            double sum = 0.0;
            for (int k = 0; k < 4; ++k) {
                for (int l = 0; l < 4; ++l) {
                    sum += basis[k][i] * g[k][l] * basis[l][j];
                }
            }
            a[static_cast<std::size_t>(4 * i + j)] = sum;
        }
    }
    return a;
}

} // namespace coldtip::models
