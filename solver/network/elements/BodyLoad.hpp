#pragma once
//! \file BodyLoad.hpp
//! A heat load from outside the machine on one solid node (a cold-head body), given by a
//! law of time and the node's temperature:
//!
//!   dT/dt += Q(t, T) / C(T),    Q and dQ/dT from the law                           [K/s]
//!
//! The law returns the heat with its exact temperature slope, so the Jacobian stays exact.
//! The cycle integral of Q goes to the load's own channel (an applied load entering the
//! machine from outside, for the energy balance).

#include <memory>

#include "models/numeric/Slope.hpp"
#include "solver/network/Element.hpp"

namespace coldtip {

//! Q(t, T) [W] into a body and dQ/dT [W/K] at time t [s] and body temperature T [K].
class LoadLaw {
public:
    virtual ~LoadLaw() = default;
    virtual models::Slope heat(double t, double T) const = 0;
    //! What the load is, for messages ("radiation from 300 K").
    virtual std::string describe() const = 0;
};

class BodyLoad final : public Element {
public:
    BodyLoad(int solid, std::unique_ptr<LoadLaw> law, const std::vector<SolidNode>& solids,
             int quad_load);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;
    const LoadLaw& law() const { return *m_law; }

private:
    int m_solid;
    std::unique_ptr<LoadLaw> m_law;
    const SolidNode* m_s;
    int m_quad_load;
};

} // namespace coldtip
