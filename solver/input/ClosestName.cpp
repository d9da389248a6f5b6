#include "solver/input/ClosestName.hpp"

#include <algorithm>
#include <cctype>
#include <fmt/format.h>
#include <vector>

namespace coldtip::input {

int editDistance(std::string_view a, std::string_view b)
{
    const auto same = [](char x, char y) {
        return std::tolower(static_cast<unsigned char>(x)) ==
               std::tolower(static_cast<unsigned char>(y));
    };
    const std::size_t n = a.size(), m = b.size();
    // Three rows of the dynamic-programming table suffice for the transposition term.
    std::vector<int> previous2(m + 1), previous(m + 1), current(m + 1);
    for (std::size_t j = 0; j <= m; ++j)
        previous[j] = static_cast<int>(j);
    for (std::size_t i = 1; i <= n; ++i) {
        current[0] = static_cast<int>(i);
        for (std::size_t j = 1; j <= m; ++j) {
            const int cost = same(a[i - 1], b[j - 1]) ? 0 : 1;
            current[j] =
                std::min({previous[j] + 1, current[j - 1] + 1, previous[j - 1] + cost});
            if (i > 1 && j > 1 && same(a[i - 1], b[j - 2]) && same(a[i - 2], b[j - 1]))
                current[j] = std::min(current[j], previous2[j - 2] + 1);
        }
        std::swap(previous2, previous);
        std::swap(previous, current);
    }
    return previous[m];
}

std::optional<std::string> closestName(std::string_view word,
                                       std::span<const std::string> candidates)
{
    const int allowed = std::max(1, std::min(3, static_cast<int>(word.size() + 2) / 4));
    std::optional<std::string> best;
    int bestDistance = allowed + 1;
    for (const std::string& candidate : candidates) {
        const int d = editDistance(word, candidate);
        if (d < bestDistance) {
            bestDistance = d;
            best = candidate;
        }
    }
    return best;
}

std::string didYouMean(std::string_view word, std::span<const std::string> candidates)
{
    const auto best = closestName(word, candidates);
    return best ? fmt::format(" (did you mean '{}'?)", *best) : std::string();
}

} // namespace coldtip::input
