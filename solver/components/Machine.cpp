#include "solver/components/Machine.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>

#include "solver/components/Laws.hpp"
#include "solver/components/PassageComponents.hpp"
#include "solver/input/InputError.hpp"

namespace coldtip {

std::unique_ptr<Component> makeComponent(const ComponentSpec& spec)
{
    using K = ComponentSpec::Kind;
    switch (spec.kind) {
    case K::Duct: return std::make_unique<Duct>(spec);
    case K::HeatExchanger: return std::make_unique<HeatExchanger>(spec);
    case K::Regenerator: return std::make_unique<Regenerator>(spec);
    case K::Tube: return std::make_unique<Tube>(spec);
    case K::Volume: return std::make_unique<Volume>(spec);
    case K::Orifice: return std::make_unique<Orifice>(spec);
    }
    throw std::logic_error("unknown component kind");
}

void Machine::fail(const SourceMark& mark, const std::string& problem,
                   const std::string& expected) const
{
    throw input::InputError(mark, problem, expected, m_description.source_text);
}

Machine::Machine(const CaseDescription& description) : m_description(description)
{
    const CaseDescription& d = m_description;
    m_gas = models::makeWorkingGas(d.gas.species);

    // A lumped cold body without its own start temperature starts at the case's initial cold
    // temperature, or else at the charge temperature.
    auto drive = std::make_unique<PistonDrive>(d.drive);
    m_drive = drive.get();
    m_components.push_back(std::move(drive));
    for (const ComponentSpec& spec : d.components) m_components.push_back(makeComponent(spec));
    assignRoles();
    for (std::size_t k = 1; k < m_components.size(); ++k) {
        ComponentSpec& spec = m_description.components[k - 1];
        if (spec.kind == ComponentSpec::Kind::HeatExchanger &&
            spec.wall.kind == WallSpec::Kind::LumpedBody && spec.wall.initial_temperature <= 0.0) {
            const bool cold = static_cast<int>(k) == m_cold && d.initial.cold_temperature > 0.0;
            spec.wall.initial_temperature =
                cold ? d.initial.cold_temperature : d.gas.charge_temperature;
            m_components[k] = makeComponent(spec);
        }
    }

    // Path topology a network cannot represent.
    for (std::size_t k = 1; k < m_components.size(); ++k) {
        const Component& c = *m_components[k];
        if (c.spec().kind != ComponentSpec::Kind::Orifice) continue;
        if (k + 1 >= m_components.size())
            fail(c.spec().mark, "orifice '" + c.name() + "' ends the flow path",
                 "an orifice between two components with gas (e.g. warm-end -> orifice -> "
                 "reservoir)");
        if (m_components[k + 1]->spec().kind == ComponentSpec::Kind::Orifice)
            fail(c.spec().mark, "two orifices in a row", "one orifice between two components");
    }

    std::vector<double> T_in, T_out;
    initialProfile(T_in, T_out);
    double T_low = d.gas.charge_temperature;
    for (double T : T_in) T_low = std::min(T_low, T);
    for (double T : T_out) T_low = std::min(T_low, T);
    const double R = m_gas->gasConstant();
    const double T_min = std::max(m_gas->minTemperature(), 2.0);
    const double T_max = std::max(m_gas->maxTemperature(), 1000.0);
    // Densities up to four times the charge density at the coldest point cover pressure
    // ratios to 2 and cold ends well below their start (the table clamps beyond).
    const double rho_max = 4.0 * d.gas.charge_pressure / (R * std::max(0.5 * T_low, T_min));
    m_transport = std::make_unique<models::TransportTable>(*m_gas, T_min, T_max, rho_max);
    GasProperties gp;
    gp.R = R;
    gp.cp = m_gas->cp();
    gp.cv = m_gas->cv();
    gp.gamma = m_gas->gamma();
    gp.transport = m_transport.get();
    m_network = std::make_unique<Network>(gp);

    AssemblyContext ctx{*m_network, m_description, m_materials, m_passages, m_pistons};
    joinComponents(ctx, T_in, T_out);
    for (std::size_t k = 0; k < m_components.size(); ++k)
        m_components[k]->addElements(ctx);
    addJunctionLaws();
    addLinks();
    m_network->finalize();

    double volume = 0.0;
    for (const GasCell& c : m_network->cells()) volume += c.volumeAt(0.0);
    m_charge_mass = d.gas.charge_pressure * volume / (R * d.gas.charge_temperature);
    const MovingBoundary& p = m_drive->piston();
    const double rho_charge = d.gas.charge_pressure / (R * d.gas.charge_temperature);
    m_mass_flow_scale = rho_charge * p.piston_area * p.amplitude * p.omega;
    // The smooth |mdot| and upwind switch act below 1e-4 of the drive's flow amplitude.
    m_network->setFlowSmoothing(1e-4 * m_mass_flow_scale);
}

void Machine::assignRoles()
{
    using K = ComponentSpec::Kind;
    const int n = static_cast<int>(m_components.size());
    auto isHx = [&](int k) { return m_components[k]->spec().kind == K::HeatExchanger; };
    for (int k = 1; k < n; ++k) {
        const std::string& role = m_components[k]->spec().role;
        if (role == "cold") m_cold = k;
        if (role == "reject") m_reject = k;
        if (role == "warm") m_warm = k;
    }
    int regen = -1;
    for (int k = 1; k < n && regen < 0; ++k)
        if (m_components[k]->spec().kind == K::Regenerator) regen = k;
    if (regen < 0) return;
    if (m_reject < 0)
        for (int k = regen - 1; k >= 1 && m_reject < 0; --k)
            if (isHx(k)) m_reject = k;
    if (m_cold < 0)
        for (int k = regen + 1; k < n && m_cold < 0; ++k)
            if (isHx(k)) m_cold = k;
    if (m_warm < 0 && m_cold >= 0) {
        int tube = -1;
        for (int k = m_cold + 1; k < n && tube < 0; ++k)
            if (m_components[k]->spec().kind == K::Tube) tube = k;
        for (int k = tube + 1; tube >= 0 && k < n && m_warm < 0; ++k)
            if (isHx(k)) m_warm = k;
    }
}

void Machine::initialProfile(std::vector<double>& T_in, std::vector<double>& T_out) const
{
    const int n = static_cast<int>(m_components.size());
    std::vector<double> anchor(n);
    for (int k = 0; k < n; ++k) anchor[k] = m_components[k]->anchorTemperature();
    T_in.assign(n, m_description.gas.charge_temperature);
    T_out = T_in;
    for (int k = 0; k < n; ++k) {
        if (anchor[k] > 0.0) {
            T_in[k] = T_out[k] = anchor[k];
            continue;
        }
        double up = 0.0, down = 0.0;
        for (int j = k - 1; j >= 0 && up <= 0.0; --j) up = anchor[j];
        for (int j = k + 1; j < n && down <= 0.0; ++j) down = anchor[j];
        if (up <= 0.0) up = down;
        if (down <= 0.0) down = up;
        if (up <= 0.0) continue; // no anchor anywhere: charge temperature
        T_in[k] = up;
        T_out[k] = m_components[k]->spansTemperatures() ? down : up;
    }
}

void Machine::joinComponents(AssemblyContext& ctx, const std::vector<double>& T_in,
                             const std::vector<double>& T_out)
{
    const int n = static_cast<int>(m_components.size());
    m_junction_faces.assign(n, -1);
    int previous = -1; // last component with gas
    for (int k = 0; k < n; ++k) {
        Component& c = *m_components[k];
        c.addNodes(ctx, T_in[k], T_out[k]);
        if (!c.hasCells()) continue;
        if (previous >= 0 && previous == k - 1) {
            const Component& p = *m_components[previous];
            const GasCell& a = m_network->cells()[p.outletCell()];
            const GasCell& b = m_network->cells()[c.inletCell()];
            if (a.length <= 0.0 && b.length <= 0.0)
                fail(c.spec().mark,
                     "'" + p.name() + "' and '" + c.name() + "' are both lumped volumes joined "
                     "directly",
                     "a duct, heat exchanger or orifice between two lumped volumes");
            FlowFace f;
            f.name = a.name + "|" + b.name;
            f.from = p.outletCell();
            f.to = c.inletCell();
            f.component = c.index();
            f.x = m_network->component(c.index()).x_start;
            m_junction_faces[k] = m_network->addFace(f);
        }
        previous = k;
    }
}

void Machine::addJunctionLaws()
{
    Network& net = *m_network;
    const int n = static_cast<int>(m_components.size());
    for (int k = 1; k < n; ++k) {
        Component& c = *m_components[k];
        Component& p = *m_components[k - 1];
        ComponentSlice& cs = net.component(c.index());
        ComponentSlice& ps = net.component(p.index());
        if (m_junction_faces[k] >= 0) {
            const int h = addMomentumFace(net, m_junction_faces[k]);
            cs.inlet_channel = ps.outlet_channel = h;
        } else if (c.spec().kind == ComponentSpec::Kind::Orifice) {
            const Component& next = *m_components[k + 1];
            const Orifice& o = static_cast<const Orifice&>(c);
            const int h = addOrifice(net, c.name(), c.index(), p.outletCell(), next.inletCell(),
                                     o.dischargeArea(), cs.x_start);
            ps.outlet_channel = cs.inlet_channel = cs.outlet_channel = h;
            net.component(next.index()).inlet_channel = h;
        }
        if (!c.hasCells() || !p.hasCells()) continue;
        // Solid ends conduct into a neighbour's wall or into its solid end.
        const int p_end = p.endSolid(true), c_end = c.endSolid(false);
        const WallContact p_wall = p.wallContact(), c_wall = c.wallContact();
        auto toWall = [&](int solid, const WallContact& wall, const Component& owner) {
            const bool external = wall.solid < 0;
            addSolidConduction(net, solid, wall.solid, wall.temperature, owner.boundary(),
                               external);
        };
        if (p_end >= 0 && c_wall.exists) toWall(p_end, c_wall, c);
        if (c_end >= 0 && p_wall.exists) toWall(c_end, p_wall, p);
        if (p_end >= 0 && c_end >= 0) addSolidConduction(net, p_end, c_end, 0.0, -1, false);
    }
}

void Machine::addLinks()
{
    Network& net = *m_network;
    for (const LinkSpec& link : m_description.links) {
        auto cellOf = [&](const PortSpec& port) {
            for (const auto& c : m_components)
                if (c->name() == port.component) {
                    if (!c->hasCells())
                        fail(link.mark, "link '" + link.name + "' ends at orifice '" +
                                            port.component + "', which holds no gas",
                             "a port of a component with gas");
                    return port.outlet ? c->outletCell() : c->inletCell();
                }
            fail(link.mark, "link '" + link.name + "' names unknown component '" +
                                port.component + "'",
                 "the name of a component");
        };
        const int a = cellOf(link.from), b = cellOf(link.to);
        const double area =
            link.discharge_coefficient * 0.25 * M_PI * link.orifice_diameter * link.orifice_diameter;
        // A link sits where it connects: from the cell it leaves to the cell it enters (it is
        // not a piece of the main path, so it has no x range of its own there).
        ComponentSlice s;
        s.name = link.name;
        s.kind = "valve";
        s.x_start = net.cells()[a].x;
        s.x_end = net.cells()[b].x;
        const int index = net.addComponent(s);
        const double x = 0.5 * (net.cells()[a].x + net.cells()[b].x);
        const int h = addOrifice(net, link.name, index, a, b, area, x);
        net.component(index).inlet_channel = net.component(index).outlet_channel = h;
    }
}

int Machine::coldBoundary() const
{
    return m_cold >= 0 ? m_components[m_cold]->boundary() : -1;
}
int Machine::rejectBoundary() const
{
    return m_reject >= 0 ? m_components[m_reject]->boundary() : -1;
}

} // namespace coldtip
