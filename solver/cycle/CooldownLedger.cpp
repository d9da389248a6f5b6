#include "solver/cycle/CooldownLedger.hpp"

#include <stdexcept>

namespace coldtip {

CooldownLedger::CooldownLedger(const Machine& machine) : m_machine(machine)
{
    const Network& net = machine.network();
    const int cold = machine.coldBoundary();
    if (cold < 0 || net.boundaries()[cold].isothermal)
        throw std::invalid_argument(
            "a cooldown needs the cold exchanger's wall as a lumped body (wall: {material, "
            "mass, ...}), not held at a temperature");
    const int component = net.boundaries()[cold].component;
    m_bodies.push_back(net.boundaries()[cold].solid_node);
    for (int i = 0; i < static_cast<int>(net.solids().size()); ++i)
        if (net.solids()[i].component == component && i != m_bodies.front())
            m_bodies.push_back(i);
    const auto& channels = net.quadratures();
    for (int q = 0; q < static_cast<int>(channels.size()); ++q)
        if (channels[q].kind == QuadratureChannel::Kind::AppliedLoad &&
            channels[q].component == component)
            m_loads.push_back(q);
}

std::vector<std::string> CooldownLedger::bodyNames() const
{
    std::vector<std::string> names;
    for (int b : m_bodies) names.push_back(m_machine.network().solids()[b].name);
    return names;
}

std::vector<std::string> CooldownLedger::loadNames() const
{
    std::vector<std::string> names;
    for (int q : m_loads) names.push_back(m_machine.network().quadratures()[q].name);
    return names;
}

double CooldownLedger::bodyEnergy(std::span<const double> y) const
{
    const Network& net = m_machine.network();
    double U = 0.0;
    for (int b : m_bodies) U += net.solidEnergy(b, y[net.solids()[b].offset]);
    return U;
}

CooldownRow CooldownLedger::row(double t, std::span<const double> y,
                                const CycleRecord& cycle) const
{
    const Network& net = m_machine.network();
    const CycleMetrics m = cycleMetrics(m_machine, cycle);
    CooldownRow r;
    r.time = t;
    for (int b : m_bodies) r.body_temperatures.push_back(y[net.solids()[b].offset]);
    r.cold_temperature = r.body_temperatures.front();
    r.pv_power = m.pv_power;
    r.gross_cooling = m.gross_cooling;
    r.cooling = m.cooling_power;
    r.net_cooling = r.cooling;
    for (int q : m_loads) {
        r.loads.push_back(cycle.averages[q]);
        r.net_cooling -= cycle.averages[q];
    }
    return r;
}

} // namespace coldtip
