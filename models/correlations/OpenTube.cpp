#include "models/correlations/OpenTube.hpp"

#include <algorithm>
#include <stdexcept>

namespace coldtip::models {

OpenTube::OpenTube(double diameter, double relative_roughness, TransitionRange transition)
    : FlowPassage(1.0, diameter), m_roughness(relative_roughness),
      m_transition(transition)
{
    checkTransitionRange(transition);
    if (!(relative_roughness >= 0.0)) {
        throw std::invalid_argument("open tube: relative roughness must be >= 0");
    }
}

Slope OpenTube::frictionTimesReynolds(double Re) const
{
    return channelFrictionTimesReynolds(std::max(Re, 0.0), kLaminarFrictionTimesReynolds,
                                        m_roughness, m_transition);
}

Slope OpenTube::nusselt(double Re, double Pr) const
{
    return channelNusselt(std::max(Re, 0.0), Pr, kLaminarNusselt, m_transition);
}

} // namespace coldtip::models
