#pragma once
//! \file NistCryogenicFit.hpp
//! The two fit forms of the NIST cryogenic material property pages (E. D. Marquardt,
//! J. P. Le, R. Radebaugh, "Cryogenic Material Properties Database", Proc. 11th Int.
//! Cryocooler Conf., 2000; per-material pages at trc.nist.gov/cryogenics/materials,
//! coefficients as transcribed in at least two independent open-source codes).
//! The polynomials diverge outside their ranges, so both forms hold the value at the
//! nearest end of the range instead of extrapolating.

#include <array>

namespace coldtip::models {

//! log10 y = a + b X + c X^2 + ... + i X^8,  X = log10(T / 1 K); y = k [W/(m K)] or
//! c_p [J/(kg K)]. Coefficients a..i in order.
struct NistLogPolynomial {
    std::array<double, 9> coefficients{};
    double t_min = 0.0; //!< [K]
    double t_max = 0.0; //!< [K]

    //! y(T), T clamped to [t_min, t_max].
    double operator()(double T) const;
};

//! OFHC copper conductivity, rational in sqrt(T):
//! log10 k = (a + c T^0.5 + e T + g T^1.5 + i T^2) / (1 + b T^0.5 + d T + f T^1.5 + h T^2),
//! k in W/(m K). Coefficients a..i in order.
struct NistCopperRational {
    std::array<double, 9> coefficients{};
    double t_min = 0.0; //!< [K]
    double t_max = 0.0; //!< [K]

    //! k(T), T clamped to [t_min, t_max].
    double operator()(double T) const;
};

} // namespace coldtip::models
