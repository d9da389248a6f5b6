#pragma once
//! \file Machine.hpp
//! A whole cooler assembled from a case: the drive, the components in path order, the
//! links across the path, and the network they make. The machine owns everything the
//! network's nodes point at (gas tables, materials, passages, the piston), knows which heat
//! exchangers play the cold, reject and warm roles, and holds the gas charge.

#include <memory>
#include <string>
#include <vector>

#include "models/gas/TransportTable.hpp"
#include "models/gas/WorkingGas.hpp"
#include "solver/case/CaseDescription.hpp"
#include "solver/components/Component.hpp"
#include "solver/components/LumpedComponents.hpp"
#include "solver/components/MaterialLibrary.hpp"
#include "solver/network/Network.hpp"

namespace coldtip {

class Machine {
public:
    //! Assemble the case; throws input::InputError (pointing at the component) for cases
    //! that are valid YAML but cannot be built (an orifice at the end of the path, two
    //! lumped volumes joined without a passage, ...).
    explicit Machine(const CaseDescription& description);
    Machine(const Machine&) = delete;
    Machine& operator=(const Machine&) = delete;

    const CaseDescription& description() const { return m_description; }
    Network& network() { return *m_network; }
    const Network& network() const { return *m_network; }
    const models::WorkingGas& workingGas() const { return *m_gas; }
    const std::vector<std::unique_ptr<Component>>& components() const { return m_components; }

    double frequency() const { return m_description.frequency; }
    double period() const { return 1.0 / m_description.frequency; }
    //! Total gas charge M = p_charge V_total / (R T_charge) [kg].
    double chargeMass() const { return m_charge_mass; }
    //! Amplitude of the drive's mass flow at charge density, rho A_p X omega [kg/s].
    double massFlowScale() const { return m_mass_flow_scale; }
    PistonDrive& drive() { return *m_drive; }
    const PistonDrive& drive() const { return *m_drive; }

    //! Network component indices of the heat exchangers by role (-1 if none).
    int coldComponent() const { return m_cold; }
    int rejectComponent() const { return m_reject; }
    int warmComponent() const { return m_warm; }
    //! Thermal boundaries of the cold and reject exchangers (-1 if none).
    int coldBoundary() const;
    int rejectBoundary() const;

    //! Initial state for the charge (uniform pressure, initial temperature profile).
    std::vector<double> initialState() const { return m_network->initialState(m_charge_mass); }

private:
    void assignRoles();
    void initialProfile(std::vector<double>& T_in, std::vector<double>& T_out) const;
    //! Phase 1 for every component, and a face wherever two components with gas meet.
    void joinComponents(AssemblyContext& ctx, const std::vector<double>& T_in,
                        const std::vector<double>& T_out);
    void addJunctionLaws();
    void addLinks();
    [[noreturn]] void fail(const SourceMark& mark, const std::string& problem,
                           const std::string& expected) const;

    CaseDescription m_description;
    std::unique_ptr<models::WorkingGas> m_gas;
    std::unique_ptr<models::TransportTable> m_transport;
    MaterialLibrary m_materials;
    std::vector<std::unique_ptr<models::FlowPassage>> m_passages;
    std::vector<std::unique_ptr<MovingBoundary>> m_pistons;
    std::vector<std::unique_ptr<Component>> m_components; //!< [0] is the drive
    PistonDrive* m_drive = nullptr;
    std::unique_ptr<Network> m_network;
    std::vector<int> m_junction_faces; //!< face index between components k and k+1, or -1
    double m_charge_mass = 0.0;
    double m_mass_flow_scale = 0.0;
    int m_cold = -1, m_reject = -1, m_warm = -1;
};

} // namespace coldtip
