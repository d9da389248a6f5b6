#pragma once
//! \file OctaveGrid.hpp
//! A quasi-logarithmic grid for property tables: every octave [x_min 2^e, x_min 2^(e+1)]
//! holds the same number of equal cells, so the relative resolution is nearly uniform
//! (what power-law properties need from 1 K to 1000 K), yet finding the cell of x takes
//! only the exponent and mantissa bits of x / x_min -- no logarithm, no search.

#include <algorithm>
#include <bit>
#include <cstdint>
#include <vector>

namespace coldtip::models {

class OctaveGrid {
public:
    //! Nodes x_min 2^e (1 + j/n), n = cells_per_octave, up to x_max, which is always the
    //! last node (the last cell is shortened, or merged into its neighbour when it would
    //! be shorter than a quarter cell). Requires 0 < x_min < x_max and n >= 1.
    OctaveGrid(double x_min, double x_max, int cells_per_octave);

    //! Number of cells (nodes - 1).
    int cellCount() const { return static_cast<int>(m_nodes.size()) - 1; }
    //! Node i, 0 <= i <= cellCount().
    double node(int i) const { return m_nodes[static_cast<std::size_t>(i)]; }
    const std::vector<double>& nodes() const { return m_nodes; }
    double minimum() const { return m_nodes.front(); }
    double maximum() const { return m_nodes.back(); }

    //! Index of the cell that holds x, for x in [minimum(), maximum()] (O(1), bit arithmetic).
    int cell(double x) const
    {
        // x / x_min = 2^e m with m in [1, 2): e from the exponent bits, m from the mantissa.
        const std::uint64_t bits = std::bit_cast<std::uint64_t>(x * m_invMin);
        const int e = static_cast<int>(bits >> 52) - 1023;
        const double m =
            std::bit_cast<double>((bits & 0x000FFFFFFFFFFFFFull) | 0x3FF0000000000000ull);
        const int j = e * m_perOctave + static_cast<int>((m - 1.0) * m_perOctave);
        return std::clamp(j, 0, m_lastCell);
    }

private:
    std::vector<double> m_nodes;
    double m_invMin = 1.0;
    int m_perOctave = 1;
    int m_lastCell = 0;
};

} // namespace coldtip::models
