#pragma once
//! \file NameList.hpp
//! The error of a registry (gases, solids) asked for a name it does not know.

#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

namespace coldtip::models {

//! Throws std::invalid_argument "unknown <what> '<name>'; known: a, b, c".
[[noreturn]] inline void throwUnknownName(std::string_view what, std::string_view name,
                                          const std::vector<std::string>& known)
{
    std::string list;
    for (const auto& s : known) {
        list += (list.empty() ? "" : ", ") + s;
    }
    throw std::invalid_argument("unknown " + std::string(what) + " '" +
                                std::string(name) + "'; known: " + list);
}

} // namespace coldtip::models
