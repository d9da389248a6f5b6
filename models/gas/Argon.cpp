#include "models/gas/Argon.hpp"

namespace coldtip::models {

Argon::Argon()
    : ChapmanEnskogGas({.name = "argon",
                        .molar_mass = 39.948e-3,
                        .sigma = 0.3432e-9,
                        .epsilon_k = 122.4,
                        .t_min = 37.0,
                        .t_max = 1500.0})
{}

} // namespace coldtip::models
