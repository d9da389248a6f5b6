// Temporary registry lists; replaced by the factories in models/gas and models/solids.
#include "models/gas/WorkingGas.hpp"
#include "models/solids/SolidMaterial.hpp"

namespace coldtip::models {
std::vector<std::string> knownGasSpecies() { return {"helium", "nitrogen", "neon", "argon", "air"}; }
std::vector<std::string> knownSolidMaterials()
{
    return {"stainless-304", "copper", "copper-rrr50", "copper-rrr100", "copper-rrr150",
            "g10", "g10-warp", "lead"};
}
} // namespace coldtip::models
