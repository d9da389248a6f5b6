#include "models/numeric/OctaveGrid.hpp"

#include <cmath>
#include <stdexcept>

namespace coldtip::models {

OctaveGrid::OctaveGrid(double x_min, double x_max, int cells_per_octave)
    : m_invMin(1.0 / x_min), m_perOctave(cells_per_octave)
{
    if (!(x_min > 0.0) || !(x_max > x_min) || cells_per_octave < 1) {
        throw std::invalid_argument(
            "OctaveGrid: need 0 < x_min < x_max and cells_per_octave >= 1");
    }
    const double n = cells_per_octave;
    for (int e = 0;; ++e) {
        const double base = std::ldexp(x_min, e);
        for (int j = 0; j < cells_per_octave; ++j) {
            const double x = base * (1.0 + j / n);
            if (x >= x_max) {
                // The regular cell that holds x_max is cut at x_max; a sliver is merged
                // into the previous cell so that no cell is badly shorter than its neighbours.
                const double regular = x - m_nodes.back();
                if (m_nodes.size() > 1 && x_max - m_nodes.back() < 0.25 * regular) {
                    m_nodes.back() = x_max;
                } else {
                    m_nodes.push_back(x_max);
                }
                m_lastCell = cellCount() - 1;
                return;
            }
            m_nodes.push_back(x);
        }
    }
}

} // namespace coldtip::models
