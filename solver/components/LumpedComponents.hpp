#pragma once
//! \file LumpedComponents.hpp
//! Components without length: the piston drive's compression space, a buffer volume, and an
//! orifice (which has no gas of its own: the machine joins its neighbours through it).

#include "solver/components/Component.hpp"

namespace coldtip {

//! Prescribed sinusoidal piston and its compression space (one lumped cell whose volume
//! follows the piston), adiabatic or exchanging heat with a wall through a film coefficient.
class PistonDrive final : public Component {
public:
    explicit PistonDrive(const DriveSpec& drive);
    std::string kindName() const override { return "piston"; }
    void addNodes(AssemblyContext& ctx, double T_in, double T_out) override;
    void addElements(AssemblyContext& ctx) override;
    const MovingBoundary& piston() const { return *m_piston; }
    MovingBoundary& piston() { return *m_piston; }
    double anchorTemperature() const override;

private:
    DriveSpec m_drive;
    MovingBoundary* m_piston = nullptr;
};

//! Buffer (reservoir) volume: one lumped adiabatic cell.
class Volume final : public Component {
public:
    using Component::Component;
    std::string kindName() const override { return "volume"; }
    void addNodes(AssemblyContext& ctx, double T_in, double T_out) override;
    void addElements(AssemblyContext&) override {}
};

//! Orifice (needle valve) in the main path: an algebraic face between its neighbours.
class Orifice final : public Component {
public:
    using Component::Component;
    std::string kindName() const override { return "orifice"; }
    void addNodes(AssemblyContext& ctx, double, double) override { registerSlice(ctx); }
    void addElements(AssemblyContext&) override {}
    bool hasCells() const override { return false; }
    //! Discharge area C_d pi d^2 / 4 [m^2].
    double dischargeArea() const;
};

} // namespace coldtip
