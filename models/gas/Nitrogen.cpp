#include "models/gas/Nitrogen.hpp"

namespace coldtip::models {

Nitrogen::Nitrogen()
    : LemmonJacobsenGas({.name = "nitrogen",
                         .molar_mass = 28.01348e-3,
                         .sigma = 0.3656,
                         .epsilon_k = 98.94,
                         .t_reducing = 126.192,
                         .n1 = 1.511,
                         .n2 = 2.117,
                         .t2 = -1.0,
                         .n3 = -3.332,
                         .t3 = -0.7,
                         .t_min = 63.151,
                         .t_max = 2000.0})
{}

} // namespace coldtip::models
