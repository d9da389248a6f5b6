#include "models/gas/Air.hpp"

namespace coldtip::models {

Air::Air()
    : LemmonJacobsenGas({.name = "air",
                         .molar_mass = 28.9586e-3,
                         .sigma = 0.360,
                         .epsilon_k = 103.3,
                         .t_reducing = 132.6312,
                         .n1 = 1.308,
                         .n2 = 1.405,
                         .t2 = -1.1,
                         .n3 = -1.036,
                         .t3 = -0.3,
                         .t_min = 59.75,
                         .t_max = 2000.0})
{}

} // namespace coldtip::models
