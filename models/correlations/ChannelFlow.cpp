#include "models/correlations/ChannelFlow.hpp"

#include <algorithm>
#include <stdexcept>

#include "models/correlations/Gnielinski.hpp"
#include "models/correlations/TubeFriction.hpp"
#include "models/numeric/SmoothStep.hpp"

namespace coldtip::models {
namespace {

Slope blend(double laminar, const Slope& turbulent, const Slope& w)
{
    return {laminar + w.value * (turbulent.value - laminar),
            w.slope * (turbulent.value - laminar) + w.value * turbulent.slope};
}

} // namespace

void checkTransitionRange(const TransitionRange& range)
{
    if (!(range.laminar_limit > 0.0 && range.turbulent_onset > range.laminar_limit)) {
        throw std::invalid_argument(
            "transition range: need 0 < laminar_limit < turbulent_onset");
    }
}

Slope channelFrictionTimesReynolds(double Re, double laminar_fRe,
                                   double relative_roughness,
                                   const TransitionRange& range)
{
    const Slope w = smoothStep(Re, range.laminar_limit, range.turbulent_onset);
    if (w.value == 0.0) {
        return {laminar_fRe, 0.0};
    }
    const Slope f = haalandFriction(Re, relative_roughness);
    return blend(laminar_fRe, {f.value * Re, f.value + Re * f.slope}, w);
}

Slope channelNusselt(double Re, double Pr, double laminar_Nu,
                     const TransitionRange& range)
{
    const Slope w = smoothStep(Re, range.laminar_limit, range.turbulent_onset);
    if (w.value == 0.0) {
        return {laminar_Nu, 0.0};
    }
    return blend(laminar_Nu, gnielinskiNusselt(Re, Pr), w);
}

} // namespace coldtip::models
