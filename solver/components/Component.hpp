#pragma once
//! \file Component.hpp
//! A physical component of the cooler (duct, heat exchanger, regenerator, pulse tube, buffer
//! volume, orifice, drive). It owns its slice of the network: it adds its gas cells, internal
//! faces and solid nodes (phase 1), then the laws that act on them (phase 2). The machine
//! assembly joins neighbouring components with faces and lets their solids conduct into each
//! other's walls.

#include <memory>
#include <string>
#include <vector>

#include "models/correlations/FlowPassage.hpp"
#include "solver/case/CaseDescription.hpp"
#include "solver/components/MaterialLibrary.hpp"
#include "solver/network/Network.hpp"

namespace coldtip {

//! Shared services of one assembly: the network being built, the gas, the materials, and
//! ownership of the passages and moving boundaries the network's nodes point at.
struct AssemblyContext {
    Network& network;
    const CaseDescription& description;
    MaterialLibrary& materials;
    std::vector<std::unique_ptr<models::FlowPassage>>& passages;
    std::vector<std::unique_ptr<MovingBoundary>>& pistons;
    double x = 0.0; //!< running axial position along the main path [m]

    const models::FlowPassage* keep(std::unique_ptr<models::FlowPassage> p)
    {
        passages.push_back(std::move(p));
        return passages.back().get();
    }
};

//! The wall a neighbour's solid can conduct into: a solid node, or a fixed temperature.
struct WallContact {
    int solid = -1;           //!< solid node, or -1
    double temperature = 0.0; //!< [K] when solid < 0 and isothermal
    bool exists = false;
};

class Component {
public:
    explicit Component(ComponentSpec spec) : m_spec(std::move(spec)) {}
    virtual ~Component() = default;
    Component(const Component&) = delete;
    Component& operator=(const Component&) = delete;

    const ComponentSpec& spec() const { return m_spec; }
    const std::string& name() const { return m_spec.name; }
    //! Index of the component's slice in the network.
    int index() const { return m_index; }
    virtual std::string kindName() const = 0;

    //! Phase 1: cells, internal faces, solid nodes. `T_in`, `T_out` are the initial gas
    //! temperatures at the inlet and outlet ends [K].
    virtual void addNodes(AssemblyContext& ctx, double T_in, double T_out) = 0;
    //! Phase 2: the component's own laws.
    virtual void addElements(AssemblyContext& ctx) = 0;

    //! Whether the component has gas cells (an orifice has none).
    virtual bool hasCells() const { return m_first_cell >= 0; }
    int inletCell() const { return m_first_cell; }
    int outletCell() const { return m_last_cell; }
    int inletFace() const { return m_inlet_face; }
    int outletFace() const { return m_outlet_face; }
    void setInletFace(int f) { m_inlet_face = f; }
    void setOutletFace(int f) { m_outlet_face = f; }

    //! A fixed wall temperature this component imposes [K], 0 if none (sets the initial
    //! temperature profile of its neighbours).
    virtual double anchorTemperature() const { return 0.0; }
    //! Whether its initial gas temperature varies linearly between its neighbours'
    //! (regenerator, pulse tube) rather than taking the nearest one.
    virtual bool spansTemperatures() const { return false; }
    //! The wall that a neighbour's solid end conducts into (heat exchangers).
    virtual WallContact wallContact() const { return {}; }
    //! Solid node at the inlet/outlet end that conducts into a neighbour's wall, -1 if none.
    virtual int endSolid(bool /*outlet*/) const { return -1; }
    //! The thermal boundary of this component (isothermal wall or body), -1 if none.
    int boundary() const { return m_boundary; }

protected:
    //! Add `count` passage cells of equal length along [ctx.x, ctx.x + length), joined by
    //! internal momentum faces, with the initial temperature linear from T_in to T_out.
    void addPassageCells(AssemblyContext& ctx, int count, double length, double frontal_area,
                         const models::FlowPassage* passage, double T_in, double T_out);
    //! One solid node per passage cell (regenerator matrix, tube wall) with these layers per
    //! unit length; returns nothing, the range is kept in the slice.
    void addSolidColumn(AssemblyContext& ctx, const std::string& what,
                        const std::vector<SolidLayer>& layers_per_length);
    //! Phase 2 helpers: convective exchange of every cell with its own solid node (column)
    //! or with one node / a fixed wall; axial conduction along the column.
    void addWallExchange(AssemblyContext& ctx, int solid_of_first_cell, bool one_node_each,
                         double wall_temperature);
    void addColumnConduction(AssemblyContext& ctx);
    //! Momentum laws on the faces between this component's own cells.
    void addInternalFaces(AssemblyContext& ctx);
    int addIsothermalBoundary(AssemblyContext& ctx, double temperature);
    //! Create the component's slice in the network (first thing addNodes does).
    void registerSlice(AssemblyContext& ctx);
    ComponentSlice& slice(AssemblyContext& ctx) { return ctx.network.component(m_index); }

    ComponentSpec m_spec;
    int m_index = -1;
    int m_first_cell = -1, m_last_cell = -1;
    int m_first_solid = -1, m_last_solid = -1;
    int m_inlet_face = -1, m_outlet_face = -1;
    int m_boundary = -1;
    std::vector<int> m_internal_faces;
};

//! The component for one entry of the case's component list.
std::unique_ptr<Component> makeComponent(const ComponentSpec& spec);

} // namespace coldtip
