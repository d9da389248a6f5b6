#pragma once
//! \file Network.hpp
//! The network owns every node (gas cells, flow faces, solid nodes) and every element (the
//! laws coupling them), assigns the state layout, and is the only thing the integrator sees:
//! a state vector, one right-hand side with its cycle integrands, and a Jacobian on a fixed
//! sparsity pattern (Cantera's reactor-network seam).
//!
//! State layout, in the order nodes were added along the flow path:
//!   cell: m [kg], E [J];  face: mdot [kg/s];  solid node: T [K].
//! Building happens in two phases: first all nodes (their offsets and geometry are then fixed),
//! then the elements, which keep references to the nodes; `finalize()` builds the pattern.

#include <memory>
#include <span>
#include <string>
#include <vector>

#include "solver/network/Element.hpp"
#include "solver/network/elements/PassageLaws.hpp"
#include "solver/network/Quadrature.hpp"

namespace coldtip {

//! One component's slice of the network, for reports and the result file.
struct ComponentSlice {
    std::string name;
    std::string kind;
    int first_cell = -1, last_cell = -1;   //!< inclusive; -1 if it has no cells
    int first_solid = -1, last_solid = -1; //!< inclusive; -1 if none
    int boundary = -1;                     //!< its thermal boundary, -1 if none
    int inlet_channel = -1;  //!< enthalpy-flow channel at its inlet (towards the drive), or -1
    int outlet_channel = -1; //!< enthalpy-flow channel at its outlet, or -1
    double x_start = 0.0, x_end = 0.0;     //!< axial extent along the main path [m]
};

//! Compressed-sparse-column pattern with every diagonal present.
struct SparsityPattern {
    int n = 0;
    std::vector<long> column_starts; //!< n + 1 entries
    std::vector<long> row_indices;   //!< nnz entries, sorted within each column
    std::vector<int> diagonal;       //!< slot of (k, k)
    long nnz() const { return static_cast<long>(row_indices.size()); }
    //! Slot of (row, col); throws if the entry is not in the pattern.
    int slot(int row, int col) const;
};

class Network {
public:
    explicit Network(GasProperties gas);
    Network(const Network&) = delete;
    Network& operator=(const Network&) = delete;

    // ---- phase 1: nodes ------------------------------------------------------------------
    int addCell(GasCell cell);
    int addFace(FlowFace face);
    int addSolid(SolidNode node);
    int addBoundary(ThermalBoundary boundary);
    int addComponent(ComponentSlice slice);
    ComponentSlice& component(int i) { return m_components.at(i); }

    // ---- phase 2: elements and cycle-integral channels ------------------------------------
    int addQuadrature(QuadratureChannel channel);
    template <class E, class... Args>
    E& addElement(Args&&... args)
    {
        m_nodes_frozen = true;
        auto e = std::make_unique<E>(std::forward<Args>(args)...);
        E& ref = *e;
        m_elements.push_back(std::move(e));
        return ref;
    }
    //! Build the sparsity pattern and hand each element its slots.
    void finalize();

    // ---- the integrator's view -------------------------------------------------------------
    int size() const { return m_n; }
    int nQuadratures() const { return static_cast<int>(m_quad.size()); }
    //! Rates ydot = f(t, y) and (if quad is not null) the cycle integrands.
    void evaluate(double t, std::span<const double> y, std::span<double> ydot,
                  double* quad) const;
    //! Jacobian values df/dy at (t, y), in the slot order of pattern().
    void jacobian(double t, std::span<const double> y, std::span<double> values) const;
    const SparsityPattern& pattern() const { return m_pattern; }

    //! Name of state k: "regenerator[12].m", "inertance[3|4].mdot", "cold-end.T_body".
    std::string stateName(int k) const;
    //! Element that owns the largest share of work for a state (for failure reports).
    std::string describeElementsOf(int k) const;

    //! Initial state: uniform pressure p0 = M R / sum(V_i / T_i) for the given total mass,
    //! every cell at its initial temperature, no flow, solids at their initial temperatures.
    std::vector<double> initialState(double total_mass) const;
    //! Absolute tolerances per state from reference scales (see DEVELOPERS.md).
    std::vector<double> absoluteTolerances(double total_mass, double relative_tolerance,
                                           double mass_flow_scale, double scale) const;
    //! Total gas mass [kg] of a state.
    double totalMass(std::span<const double> y) const;
    //! Internal energy of solid node i at temperature T, sum of m_l h_l(T) [J]; the change
    //! over a cycle is the cycle-integrated net heat into the node.
    double solidEnergy(int i, double T) const;
    //! Names of any non-finite rates (at most `limit`), empty if all are finite.
    std::vector<std::string> nonFinite(std::span<const double> ydot, int limit = 10) const;
    //! Throws RecoverableStateError if a trial state has non-positive mass, energy or solid
    //! temperature (CVODE then retries with a smaller step).
    void checkPhysical(std::span<const double> y) const;

    const GasProperties& gas() const { return m_gas; }
    const std::vector<GasCell>& cells() const { return m_cells; }
    const std::vector<FlowFace>& faces() const { return m_faces; }
    const std::vector<SolidNode>& solids() const { return m_solids; }
    const std::vector<ThermalBoundary>& boundaries() const { return m_boundaries; }
    const std::vector<ComponentSlice>& components() const { return m_components; }
    const std::vector<QuadratureChannel>& quadratures() const { return m_quad; }
    const std::vector<std::unique_ptr<Element>>& elements() const { return m_elements; }
    std::vector<std::unique_ptr<Element>>& elements() { return m_elements; }

    double flowSmoothing() const { return m_flow_smoothing; }
    void setFlowSmoothing(double eps) { m_flow_smoothing = eps; }

    //! The view elements evaluate against; gas/solid states refreshed from y, and with
    //! tube_closures the laminar tube-momentum closures of the tube cells too (their
    //! double-precision evaluations read them; the Jacobian's dual numbers do not).
    NetworkView view(double t, std::span<const double> y, bool tube_closures = true) const;

private:
    void updateStates(double t, std::span<const double> y, bool tube_closures) const;

    GasProperties m_gas;
    std::vector<GasCell> m_cells;
    std::vector<FlowFace> m_faces;
    std::vector<SolidNode> m_solids;
    std::vector<ThermalBoundary> m_boundaries;
    std::vector<ComponentSlice> m_components;
    std::vector<QuadratureChannel> m_quad;
    std::vector<std::unique_ptr<Element>> m_elements;
    SparsityPattern m_pattern;
    int m_n = 0;
    bool m_nodes_frozen = false;
    double m_flow_smoothing = 1e-9;

    enum class StateKind { Mass, Energy, MassFlow, SolidTemperature };
    struct StateInfo {
        StateKind kind;
        int node;
    };
    std::vector<StateInfo> m_state_info;

    // Derived states, refreshed by every evaluation (the network is used by one integrator
    // at a time; copies for parallel sweeps are separate networks).
    mutable std::vector<GasState<double>> m_gas_states;
    mutable std::vector<SolidState<double>> m_solid_states;
    mutable std::vector<LaminarTubeMomentum<double>> m_laminar_tube;
    std::vector<int> m_tube_cells; //!< cells with the oscillating-flow closure
    double m_drive_omega = 0.0;    //!< [rad/s]
};

//! A trial state the physics cannot accept (negative mass or temperature): recoverable.
class RecoverableStateError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

} // namespace coldtip
