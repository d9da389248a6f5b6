#pragma once
//! \file Argon.hpp
//! Argon: ideal monatomic gas, c_p = 5R/2M, M = 39.948 g/mol, with the Chapman-Enskog
//! dilute-gas transport of ChapmanEnskogGas.hpp and Lennard-Jones parameters
//! sigma = 0.3432 nm, eps/k = 122.4 K (R. B. Bird, W. E. Stewart, E. N. Lightfoot,
//! "Transport Phenomena", 2nd ed., 2002, Table E.1; from memory). Check (from memory of
//! J. Kestin et al., J. Phys. Chem. Ref. Data 13, 229, 1984): eta(300 K) ~ 22.7 uPa s,
//! lambda(300 K) ~ 17.8 mW/(m K); this model gives 22.5 and 17.6 (-1 %).
//! Range 37-1500 K (lower end: T* = 0.3, the limit of the collision-integral fit).

#include "models/gas/ChapmanEnskogGas.hpp"

namespace coldtip::models {

class Argon final : public ChapmanEnskogGas {
public:
    Argon();
};

} // namespace coldtip::models
