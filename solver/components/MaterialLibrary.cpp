#include "solver/components/MaterialLibrary.hpp"

namespace coldtip {

const models::SolidTable& MaterialLibrary::table(const std::string& name)
{
    auto it = m_entries.find(name);
    if (it == m_entries.end()) {
        Entry e;
        e.material = models::makeSolidMaterial(name);
        e.table = std::make_unique<models::SolidTable>(*e.material);
        it = m_entries.emplace(name, std::move(e)).first;
    }
    return *it->second.table;
}

} // namespace coldtip
