#include "solver/components/ColdHead.hpp"

#include <stdexcept>

#include "solver/network/elements/BodyLoad.hpp"
#include "solver/network/elements/PistonWork.hpp"
#include "solver/network/elements/RadiationLoad.hpp"
#include "solver/network/elements/SupportConduction.hpp"
#include "solver/network/elements/TableLoad.hpp"
#include "solver/network/elements/ThermalLink.hpp"

namespace coldtip {

ColdHead::ColdHead(const WallSpec& wall, std::string exchanger, int component)
    : m_wall(wall), m_exchanger(std::move(exchanger)), m_component(component)
{
}

void ColdHead::addNodes(AssemblyContext& ctx, int exchanger_body, double T0, double x)
{
    m_nodes.assign(1, exchanger_body);
    for (const ColdBodySpec& b : m_wall.bodies) {
        SolidNode node;
        node.name = b.name + ".T_body";
        node.component = m_component;
        node.x = x;
        node.length = 0.0;
        node.initial_temperature = b.initial_temperature > 0.0 ? b.initial_temperature : T0;
        node.layers.push_back({&ctx.materials.table(b.material), b.mass, 0.0});
        m_nodes.push_back(ctx.network.addSolid(node));
    }
}

int ColdHead::nodeOf(const std::string& name) const
{
    if (name.empty() || name == m_exchanger) return m_nodes.front();
    for (std::size_t i = 0; i < m_wall.bodies.size(); ++i)
        if (m_wall.bodies[i].name == name) return m_nodes[i + 1];
    // The case reader checks every name; an unknown one here is a bug.
    throw std::logic_error("cold head of " + m_exchanger + ": no body named " + name);
}

void ColdHead::addElements(AssemblyContext& ctx)
{
    Network& net = ctx.network;
    auto channel = [&](const std::string& name, QuadratureChannel::Kind kind, double external) {
        QuadratureChannel q;
        q.name = name;
        q.kind = kind;
        q.component = m_component;
        q.x = net.solids()[m_nodes.front()].x;
        q.external_sign = external;
        return net.addQuadrature(q);
    };
    for (std::size_t i = 0; i < m_wall.bodies.size(); ++i) {
        const ColdBodySpec& b = m_wall.bodies[i];
        Conductor c;
        if (b.link.conductance > 0.0) {
            c.conductance = b.link.conductance;
        } else {
            c.material = &ctx.materials.table(b.link.material);
            c.area_over_length = b.link.area / b.link.length;
        }
        // Internal to the machine: reported, not part of the energy balance.
        const int q = channel(b.name + ".link", QuadratureChannel::Kind::SolidConduction, 0.0);
        net.addElement<ThermalLink>(m_nodes[i + 1], nodeOf(b.link.to), c, net.solids(), q);
    }
    using K = ColdLoadSpec::Kind;
    for (const ColdLoadSpec& l : m_wall.loads) {
        const int node = nodeOf(l.on);
        const int q = channel(l.name + ".load", QuadratureChannel::Kind::AppliedLoad, +1.0);
        std::unique_ptr<LoadLaw> law;
        switch (l.kind) {
        case K::Constant: net.addElement<HeatLoad>(node, l.power, net.solids(), q); continue;
        case K::Schedule:
            law = std::make_unique<TableLoad>(TableLoad::Variable::Time, l.times, l.powers);
            break;
        case K::Table:
            law = std::make_unique<TableLoad>(TableLoad::Variable::Temperature, l.temperatures,
                                              l.powers);
            break;
        case K::Radiation:
            law = std::make_unique<RadiationLoad>(
                l.area, l.mli_emissivity > 0.0 ? l.mli_emissivity : l.emissivity,
                l.ambient_temperature);
            break;
        case K::Support:
            law = std::make_unique<SupportConduction>(ctx.materials.table(l.material), l.area,
                                                      l.length, l.count,
                                                      l.ambient_temperature);
            break;
        }
        net.addElement<BodyLoad>(node, std::move(law), net.solids(), q);
    }
}

} // namespace coldtip
