#pragma once
//! \file Nitrogen.hpp
//! Nitrogen: ideal diatomic gas (c_p = 7R/2M) with the dilute-gas viscosity and
//! conductivity of Lemmon & Jacobsen (2004) (see LemmonJacobsenGas.hpp):
//!   M = 28.01348 g/mol, sigma = 0.3656 nm, eps/k = 98.94 K,
//!   lambda0 = 1.511 eta0 + 2.117 tau^-1 - 3.332 tau^-0.7,  tau = 126.192 K / T
//! (T_c = 126.192 K: R. Span, E. W. Lemmon, R. T. Jacobsen, W. Wagner, A. Yokozeki,
//! J. Phys. Chem. Ref. Data 29, 1361, 2000). Range 63.151 K (triple point, Span et al.
//! 2000) to 2000 K (upper limit from memory).

#include "models/gas/LemmonJacobsenGas.hpp"

namespace coldtip::models {

class Nitrogen final : public LemmonJacobsenGas {
public:
    Nitrogen();
};

} // namespace coldtip::models
