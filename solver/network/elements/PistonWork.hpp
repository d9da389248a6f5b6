#pragma once
//! \file PistonWork.hpp
//! Work of a moving boundary on the gas of its cell: dE/dt = -p dV/dt, p = (gamma-1) E/V.
//! The integrand -p dV/dt is the PV power delivered to the gas.

#include "solver/network/Element.hpp"

namespace coldtip {

class PistonWork final : public Element {
public:
    PistonWork(int cell, const std::vector<GasCell>& cells, int quad_work);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

private:
    int m_cell;
    const GasCell* m_c;
    int m_quad_work;
};

//! A heat load applied from outside to a solid node (detector load on the cold head):
//! dT/dt += Q_load / C(T).
class HeatLoad final : public Element {
public:
    HeatLoad(int solid, double load, const std::vector<SolidNode>& solids, int quad_load);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;
    double load() const { return m_load; }
    void setLoad(double load) { m_load = load; }

private:
    int m_solid;
    double m_load;
    const SolidNode* m_s;
    int m_quad_load;
};

} // namespace coldtip
