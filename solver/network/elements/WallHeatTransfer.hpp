#pragma once
//! \file WallHeatTransfer.hpp
//! Convective heat exchange between the gas of one passage cell and its wall or matrix:
//!
//!   Q = h A_w (T_s - T_g),   h = Nu(Re, Pr) k / d_h,   A_w = a A_frontal l      [W]
//!
//! with a the passage's wetted area per unit volume and Re on the cell's mean face flow
//! (mean of the mass flows on its two faces, smoothed |.|). The solid side is a solid node
//! (matrix, tube wall, cold-head body: Q is taken from it) or a fixed-temperature wall.
//! In an open tube driven at a frequency, Nu follows the oscillating-flow closure of
//! PassageLaws.hpp (Rott's thermal function below the Stokes-layer transition).

#include "solver/network/Element.hpp"
#include "solver/network/elements/PassageLaws.hpp"

namespace coldtip {

class WallHeatTransfer final : public Element {
public:
    //! Heat from solid node `solid` (or, if solid < 0, from a wall at `wall_temperature`)
    //! into the gas of `cell`, whose faces are `face_in`, `face_out` (-1 if absent).
    WallHeatTransfer(int cell, int face_in, int face_out, int solid, double wall_temperature,
                     const std::vector<GasCell>& cells, const std::vector<FlowFace>& faces,
                     const std::vector<SolidNode>& solids, int quad_heat);

    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

    //! Wetted area A_w [m^2].
    double wettedArea() const { return m_area; }
    //! Critical Stokes-layer Reynolds number of the oscillating-flow transition [-].
    void setCriticalStokesReynolds(double re) { m_oscillating.critical_re_delta = re; }

    template <class S>
    S heatToGas(const GasState<S>& g, const S& mdot_in, const S& mdot_out, const S& T_s,
                const NetworkView& v) const;

private:
    template <class S> S meanFlow(const S& a, const S& b) const;

    int m_cell, m_solid;
    int m_face_in_offset = -1, m_face_out_offset = -1;
    double m_wall_temperature;
    double m_area = 0.0;
    OscillatingFlow m_oscillating; //!< inactive unless the cell is an open tube
    const GasCell* m_c;
    int m_quad_heat;
};

//! Heat exchange with a given film coefficient h between a lumped gas volume and a wall at
//! fixed temperature; the wetted area follows the compression space of a cylinder of bore D:
//!   A_w = 2 A_p + 4 V(t) / D,   Q = h A_w (T_w - T_g).
class FilmHeatTransfer final : public Element {
public:
    FilmHeatTransfer(int cell, double bore, double coefficient, double wall_temperature,
                     const std::vector<GasCell>& cells, int quad_heat);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

private:
    template <class S> S heatToGas(const GasState<S>& g) const;
    int m_cell;
    double m_bore, m_h, m_wall_temperature;
    const GasCell* m_c;
    int m_quad_heat;
};

} // namespace coldtip
