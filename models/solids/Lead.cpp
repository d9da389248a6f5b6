#include "models/solids/Lead.hpp"

#include <algorithm>

#include "models/solids/DebyeHeatCapacity.hpp"

namespace coldtip::models {

double Lead::specificHeat(double T) const
{
    return debyeHeatCapacity(std::clamp(T, minTemperature(), maxTemperature()), 105.0,
                             207.2e-3);
}

} // namespace coldtip::models
