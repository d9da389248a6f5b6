#pragma once
//! \file OrificeLink.hpp
//! An algebraic face: an orifice or valve between two cells, with no inertia of its own.
//! The mass flow is the compressible isentropic-nozzle law with discharge coefficient and
//! choking (models/correlations/OrificeFlow.hpp), signed by the pressure difference; the
//! enthalpy it carries is upwinded like a momentum face's.

#include "solver/network/Element.hpp"

namespace coldtip {

class OrificeLink final : public Element {
public:
    //! Flow from cell `from` to cell `to` through an opening of discharge area C_d A [m^2].
    OrificeLink(std::string name, int from, int to, double discharge_area,
                const std::vector<GasCell>& cells, int quad_enthalpy);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

    double dischargeArea() const { return m_discharge_area; }
    void setDischargeArea(double a) { m_discharge_area = a; }

    template <class S>
    struct Result {
        S rate[4];
        S mass_flow;
        S enthalpy_flow;
    };
    template <class S>
    Result<S> compute(const GasState<S>& a, const GasState<S>& b, const NetworkView& v) const;

private:
    std::string m_name;
    int m_from, m_to;
    double m_discharge_area;
    const GasCell* m_a;
    const GasCell* m_b;
    int m_quad_h;
};

} // namespace coldtip
