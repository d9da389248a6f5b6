#include "solver/components/Passages.hpp"

#include <stdexcept>

#include "models/correlations/OpenTube.hpp"
#include "models/correlations/PackedSpheres.hpp"
#include "models/correlations/Slots.hpp"
#include "models/correlations/WovenScreen.hpp"

namespace coldtip {

std::unique_ptr<models::FlowPassage> makeTubePassage(double diameter, double roughness)
{
    return std::make_unique<models::OpenTube>(diameter, roughness / diameter);
}

std::unique_ptr<models::FlowPassage> makeFilledPassage(const FillSpec& fill)
{
    using K = FillSpec::Kind;
    switch (fill.kind) {
    case K::Slots: return std::make_unique<models::Slots>(fill.porosity, fill.hydraulic_diameter);
    case K::Screen: {
        std::optional<double> porosity;
        if (fill.porosity > 0.0) porosity = fill.porosity;
        return std::make_unique<models::WovenScreen>(fill.mesh, fill.wire_diameter, porosity);
    }
    case K::Spheres: return std::make_unique<models::PackedSpheres>(fill.sphere_diameter, fill.porosity);
    case K::Open: break;
    }
    throw std::logic_error("a filled passage needs a fill kind");
}

} // namespace coldtip
