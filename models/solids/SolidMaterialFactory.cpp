// The registry of solid materials: the names case files may use, in the order users see them.
#include "models/NameList.hpp"
#include "models/solids/G10.hpp"
#include "models/solids/Lead.hpp"
#include "models/solids/OfhcCopper.hpp"
#include "models/solids/Stainless304.hpp"

namespace coldtip::models {

std::vector<std::string> knownSolidMaterials()
{
    return {"stainless-304", "copper", "copper-rrr50", "copper-rrr100",
            "copper-rrr150", "g10",    "g10-warp",     "lead"};
}

std::unique_ptr<SolidMaterial> makeSolidMaterial(std::string_view name)
{
    if (name == "stainless-304") {
        return std::make_unique<Stainless304>();
    }
    if (name == "copper") {
        return std::make_unique<OfhcCopper>("copper", 100);
    }
    for (const int rrr : {50, 100, 150}) {
        const std::string listed = "copper-rrr" + std::to_string(rrr);
        if (name == listed) {
            return std::make_unique<OfhcCopper>(listed, rrr);
        }
    }
    if (name == "g10") {
        return std::make_unique<G10>(G10::Direction::Normal);
    }
    if (name == "g10-warp") {
        return std::make_unique<G10>(G10::Direction::Warp);
    }
    if (name == "lead") {
        return std::make_unique<Lead>();
    }
    throwUnknownName("solid material", name, knownSolidMaterials());
}

} // namespace coldtip::models
