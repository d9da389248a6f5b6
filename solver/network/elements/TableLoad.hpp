#pragma once
//! \file TableLoad.hpp
//! A load given as a table: of the run's time (a schedule: a detector switched on, a heater
//! stepped) or of the body's temperature (a load measured against temperature). Linear
//! interpolation between the table points, the end values held outside the table:
//!
//!   Q(x) = Q_i + (Q_{i+1} - Q_i) (x - x_i) / (x_{i+1} - x_i),   x_i <= x <= x_{i+1}
//!
//! C0 only: the slope jumps at the table points (the integrator takes a shorter step there).
//! With x the temperature the slope dQ/dT is the segment's, exact between the points.

#include <vector>

#include "solver/network/elements/BodyLoad.hpp"

namespace coldtip {

class TableLoad final : public LoadLaw {
public:
    enum class Variable { Time, Temperature };
    //! Points (x_i, Q_i), x strictly increasing [s or K], Q [W]; at least one point.
    TableLoad(Variable variable, std::vector<double> x, std::vector<double> Q);
    models::Slope heat(double t, double T) const override;
    std::string describe() const override;
    //! Q and dQ/dx of the table at x.
    models::Slope at(double x) const;

private:
    Variable m_variable;
    std::vector<double> m_x, m_Q;
};

} // namespace coldtip
