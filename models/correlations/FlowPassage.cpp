#include "models/correlations/FlowPassage.hpp"

#include <stdexcept>
#include <string>

namespace coldtip::models {

FlowPassage::FlowPassage(double porosity, double hydraulic_diameter)
    : m_porosity(porosity), m_hydraulicDiameter(hydraulic_diameter)
{
    if (!(porosity > 0.0 && porosity <= 1.0)) {
        throw std::invalid_argument("flow passage: porosity must be in (0, 1], got " +
                                    std::to_string(porosity));
    }
    if (!(hydraulic_diameter > 0.0)) {
        throw std::invalid_argument(
            "flow passage: hydraulic diameter must be positive, got " +
            std::to_string(hydraulic_diameter) + " m");
    }
}

} // namespace coldtip::models
