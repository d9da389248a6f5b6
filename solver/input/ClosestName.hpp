#pragma once
//! \file ClosestName.hpp
//! "Did you mean" for misspelt keys, kinds, materials and component names.

#include <optional>
#include <span>
#include <string>
#include <string_view>

namespace coldtip::input {

//! Optimal-string-alignment distance between `a` and `b`: the fewest single-character
//! insertions, deletions, substitutions and transpositions of neighbours that turn one
//! into the other (F. J. Damerau, "A technique for computer detection and correction of
//! spelling errors", Comm. ACM 7(3), 1964), compared without regard to ASCII case.
int editDistance(std::string_view a, std::string_view b);

//! The candidate nearest to `word`, if it is close: at most max(1, min(3, (n + 2) / 4))
//! edits for a word of n characters, so that short words are not "corrected" at random.
std::optional<std::string> closestName(std::string_view word,
                                       std::span<const std::string> candidates);

//! " (did you mean 'x'?)" for the closest candidate, or "" if none is close.
std::string didYouMean(std::string_view word, std::span<const std::string> candidates);

} // namespace coldtip::input
