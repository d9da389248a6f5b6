#include "models/correlations/Slots.hpp"

#include <algorithm>

namespace coldtip::models {

Slots::Slots(double porosity, double hydraulic_diameter, TransitionRange transition)
    : FlowPassage(porosity, hydraulic_diameter), m_transition(transition)
{
    checkTransitionRange(transition);
}

Slope Slots::frictionTimesReynolds(double Re) const
{
    return channelFrictionTimesReynolds(std::max(Re, 0.0), kLaminarFrictionTimesReynolds,
                                        0.0, m_transition);
}

Slope Slots::nusselt(double Re, double Pr) const
{
    return channelNusselt(std::max(Re, 0.0), Pr, kLaminarNusselt, m_transition);
}

} // namespace coldtip::models
