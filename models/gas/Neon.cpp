#include "models/gas/Neon.hpp"

namespace coldtip::models {

Neon::Neon()
    : ChapmanEnskogGas({.name = "neon",
                        .molar_mass = 20.1797e-3,
                        .sigma = 0.2789e-9,
                        .epsilon_k = 35.7,
                        .t_min = 11.0,
                        .t_max = 1500.0})
{}

} // namespace coldtip::models
