#pragma once
//! \file PassageComponents.hpp
//! Components that are a length of passage: duct (transfer line, inertance tube), heat
//! exchanger, regenerator and pulse tube. Each is a row of gas cells joined by momentum
//! faces; they differ in what the gas exchanges heat with.

#include <memory>

#include "solver/components/ColdHead.hpp"
#include "solver/components/Component.hpp"

namespace coldtip {

//! Duct: an open tube (transfer line, inertance tube) with an adiabatic wall or a wall held
//! at a fixed temperature (a long thin tube in room air is close to isothermal).
class Duct final : public Component {
public:
    using Component::Component;
    std::string kindName() const override { return "duct"; }
    void addNodes(AssemblyContext& ctx, double T_in, double T_out) override;
    void addElements(AssemblyContext& ctx) override;
    double anchorTemperature() const override;
};

//! Heat exchanger: a filled passage whose wall is held at a temperature (aftercooler, warm
//! end) or is a lumped body of given mass and material under an applied load, with the
//! further bodies, links and loads of a cold head (ColdHead.hpp).
class HeatExchanger final : public Component {
public:
    using Component::Component;
    std::string kindName() const override { return "heat-exchanger"; }
    void addNodes(AssemblyContext& ctx, double T_in, double T_out) override;
    void addElements(AssemblyContext& ctx) override;
    double anchorTemperature() const override;
    WallContact wallContact() const override;
    //! Solid node of the lumped body, -1 for an isothermal wall.
    int bodyNode() const { return m_body; }
    //! The cold head on the lumped body (null for an isothermal wall).
    const ColdHead* coldHead() const { return m_head.get(); }

private:
    int m_body = -1;
    std::unique_ptr<ColdHead> m_head;
};

//! Regenerator: matrix (screens or spheres) with one solid node per cell, of temperature-
//! dependent heat capacity, degraded axial conduction (Lewis et al. 1998), and the optional
//! housing conducting in parallel.
class Regenerator final : public Component {
public:
    using Component::Component;
    std::string kindName() const override { return "regenerator"; }
    void addNodes(AssemblyContext& ctx, double T_in, double T_out) override;
    void addElements(AssemblyContext& ctx) override;
    bool spansTemperatures() const override { return true; }
    int endSolid(bool outlet) const override { return outlet ? m_last_solid : m_first_solid; }
};

//! Pulse tube: an open tube, adiabatic or with a conducting wall (one node per cell).
class Tube final : public Component {
public:
    using Component::Component;
    std::string kindName() const override { return "tube"; }
    void addNodes(AssemblyContext& ctx, double T_in, double T_out) override;
    void addElements(AssemblyContext& ctx) override;
    bool spansTemperatures() const override { return true; }
    int endSolid(bool outlet) const override { return outlet ? m_last_solid : m_first_solid; }
};

} // namespace coldtip
