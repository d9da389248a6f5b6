#pragma once
//! \file Neon.hpp
//! Neon: ideal monatomic gas, c_p = 5R/2M, M = 20.1797 g/mol, with the Chapman-Enskog
//! dilute-gas transport of ChapmanEnskogGas.hpp and Lennard-Jones parameters
//! sigma = 0.2789 nm, eps/k = 35.7 K (R. B. Bird, W. E. Stewart, E. N. Lightfoot,
//! "Transport Phenomena", 2nd ed., 2002, Table E.1; from memory). Check (from memory of
//! J. Kestin et al., J. Phys. Chem. Ref. Data 13, 229, 1984): eta(300 K) ~ 31.8 uPa s,
//! lambda(300 K) ~ 49 mW/(m K); this model gives 31.5 and 48.7 (-1 %).
//! Range 11-1500 K (lower end: T* = 0.3, the limit of the collision-integral fit).

#include "models/gas/ChapmanEnskogGas.hpp"

namespace coldtip::models {

class Neon final : public ChapmanEnskogGas {
public:
    Neon();
};

} // namespace coldtip::models
