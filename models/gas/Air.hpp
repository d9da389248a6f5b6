#pragma once
//! \file Air.hpp
//! Dry air as a pseudo-pure ideal diatomic gas (c_p = 7R/2M) with the dilute-gas viscosity
//! and conductivity of Lemmon & Jacobsen (2004) (see LemmonJacobsenGas.hpp):
//!   M = 28.9586 g/mol (E. W. Lemmon, R. T. Jacobsen, S. G. Penoncello, D. G. Friend,
//!   J. Phys. Chem. Ref. Data 29, 331, 2000; from memory), sigma = 0.360 nm,
//!   eps/k = 103.3 K, lambda0 = 1.308 eta0 + 1.405 tau^-1.1 - 1.036 tau^-0.3,
//!   tau = 132.6312 K / T (T_c of air, from memory).
//! Range 59.75 K (solidification of air) to 2000 K, both from memory.

#include "models/gas/LemmonJacobsenGas.hpp"

namespace coldtip::models {

class Air final : public LemmonJacobsenGas {
public:
    Air();
};

} // namespace coldtip::models
