// The registry of working gases: the names case files may use, in the order users see them.
#include "models/NameList.hpp"
#include "models/gas/Air.hpp"
#include "models/gas/Argon.hpp"
#include "models/gas/Helium.hpp"
#include "models/gas/Neon.hpp"
#include "models/gas/Nitrogen.hpp"

namespace coldtip::models {

std::vector<std::string> knownGasSpecies()
{
    return {"helium", "nitrogen", "neon", "argon", "air"};
}

std::unique_ptr<WorkingGas> makeWorkingGas(std::string_view species)
{
    if (species == "helium") {
        return std::make_unique<Helium>();
    }
    if (species == "nitrogen") {
        return std::make_unique<Nitrogen>();
    }
    if (species == "neon") {
        return std::make_unique<Neon>();
    }
    if (species == "argon") {
        return std::make_unique<Argon>();
    }
    if (species == "air") {
        return std::make_unique<Air>();
    }
    throwUnknownName("gas species", species, knownGasSpecies());
}

} // namespace coldtip::models
