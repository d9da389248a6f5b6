#pragma once
//! \file SolidConduction.hpp
//! Axial (Fourier) conduction between two solid nodes through their half lengths in series,
//!
//!   Q = (T_i - T_j) / (l_i/(kA)_i + l_j/(kA)_j),   l = half the node length      [W]
//!
//! where (kA) = sum over the node's layers of k(T) times the effective cross-section (the
//! matrix layer's already carries the degradation factor of stacked screens, Lewis et al.
//! 1998). A lumped body or a fixed-temperature wall adds no resistance of its own.

#include "solver/network/Element.hpp"

namespace coldtip {

class SolidConduction final : public Element {
public:
    //! From node `i` to node `j`; j < 0 means a wall held at `wall_temperature`; quadrature
    //! channel of the heat flow (-1: none).
    SolidConduction(int i, int j, double wall_temperature, const std::vector<SolidNode>& solids,
                    int quad_heat);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

    template <class S>
    S heatFlow(const SolidState<S>& a, const SolidState<S>* b) const;

private:
    int m_i, m_j;
    double m_wall_temperature;
    const SolidNode* m_a;
    const SolidNode* m_b = nullptr;
    int m_quad_heat;
};

} // namespace coldtip
