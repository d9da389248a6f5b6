#pragma once
//! \file MaterialLibrary.hpp
//! The solid materials one machine uses, each with its fast property table, created on
//! first use by name and kept alive as long as the network that points at them.

#include <map>
#include <memory>
#include <string>

#include "models/solids/SolidMaterial.hpp"
#include "models/solids/SolidTable.hpp"

namespace coldtip {

class MaterialLibrary {
public:
    //! Table of the named material (throws std::invalid_argument for an unknown name).
    const models::SolidTable& table(const std::string& name);

private:
    struct Entry {
        std::unique_ptr<models::SolidMaterial> material;
        std::unique_ptr<models::SolidTable> table;
    };
    std::map<std::string, Entry> m_entries;
};

} // namespace coldtip
