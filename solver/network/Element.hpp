#pragma once
//! \file Element.hpp
//! An element is one physical law that couples states of the network: a momentum face, an
//! orifice, gas-to-wall heat transfer, solid conduction, piston work, an applied load. It
//! adds its fluxes to the rates of the states it touches, its own cycle integrands to the
//! quadrature vector, and its exact local partials (dual numbers) to the Jacobian.
//!
//! Rates are in the states' own units: kg/s for m, W for E, kg/s^2 for mdot, K/s for T.

#include <string>
#include <vector>

#include "solver/network/GasCell.hpp"
#include "solver/network/GasState.hpp"
#include "solver/network/SolidNode.hpp"
#include "solver/network/Stencil.hpp"

namespace coldtip {

//! A face between two gas cells holds the mass flow from `from` to `to` (one state).
struct FlowFace {
    std::string name;   //!< "regenerator[3]|regenerator[4]"
    int from = -1;      //!< upstream cell index for positive flow
    int to = -1;        //!< downstream cell index
    int offset = -1;    //!< state index of mdot
    int component = -1; //!< component the face belongs to (the downstream one at a junction)
    double x = 0.0;     //!< axial position [m]
};

//! What an element sees during one evaluation: time, the state vector, and the gas and
//! solid states derived from it once per evaluation ("update everything, then evaluate").
template <class S>
struct LaminarTubeMomentum; // elements/PassageLaws.hpp

struct NetworkView {
    double t = 0.0;
    const double* y = nullptr;
    const std::vector<GasCell>* cells = nullptr;
    const std::vector<SolidNode>* solids = nullptr;
    const std::vector<GasState<double>>* gas = nullptr;
    const std::vector<SolidState<double>>* solid = nullptr;
    const GasProperties* properties = nullptr;
    //! Per cell, the laminar part of the oscillating-flow momentum law of open tubes
    //! (entries of other cells are unset; null in the view the Jacobian is assembled on).
    const std::vector<LaminarTubeMomentum<double>>* laminar_tube = nullptr;
    double flow_smoothing = 0.0; //!< [kg/s] scale of the smooth |mdot| and upwind switch

    const GasCell& cell(int i) const { return (*cells)[i]; }
    const SolidNode& solidNode(int i) const { return (*solids)[i]; }

    //! Gas state of cell i with its (m, E) seeded as dual inputs k0 and k0 + 1.
    template <int N>
    GasState<Dual<N>> seededGas(int i, int k0) const
    {
        const GasCell& c = cell(i);
        return gasState(Dual<N>::seed(y[c.offset], k0), Dual<N>::seed(y[c.offset + 1], k0 + 1),
                        c.volumeAt(t), *properties);
    }
    template <int N>
    SolidState<Dual<N>> seededSolid(int i, int k0) const
    {
        const SolidNode& s = solidNode(i);
        return solidState(Dual<N>::seed(y[s.offset], k0), s);
    }
};

class Element {
public:
    virtual ~Element() = default;
    //! What and where, for error messages ("wall heat transfer at regenerator[3]").
    virtual std::string describe() const = 0;
    //! Add rates to ydot and cycle integrands to quad (which may be null).
    virtual void evaluate(const NetworkView& v, double* ydot, double* quad) const = 0;
    //! Add the exact local partials to the matrix values (slots from the stencil).
    virtual void addJacobian(const NetworkView& v, double* values) const = 0;

    Stencil& stencil() { return m_stencil; }
    const Stencil& stencil() const { return m_stencil; }

protected:
    Stencil m_stencil;
};

} // namespace coldtip
