#include "solver/components/Component.hpp"

#include <cmath>
#include <fmt/format.h>

#include "solver/components/Laws.hpp"

namespace coldtip {

void Component::registerSlice(AssemblyContext& ctx)
{
    ComponentSlice s;
    s.name = m_spec.name;
    s.kind = kindName();
    s.x_start = ctx.x;
    s.x_end = ctx.x;
    m_index = ctx.network.addComponent(s);
}

void Component::addPassageCells(AssemblyContext& ctx, int count, double length,
                                double frontal_area, const models::FlowPassage* passage,
                                double T_in, double T_out)
{
    Network& net = ctx.network;
    const double flow_area = frontal_area * passage->porosity();
    // Cell edges: uniform, or clustered towards both ends (where regenerator and pulse-tube
    // profiles are steepest) by blending with cosine spacing, weight beta.
    const double beta = m_spec.cell_clustering;
    auto edge = [&](int i) {
        const double u = double(i) / count;
        return length * ((1.0 - beta) * u + beta * 0.5 * (1.0 - std::cos(M_PI * u)));
    };
    for (int i = 0; i < count; ++i) {
        const double dx = edge(i + 1) - edge(i);
        GasCell c;
        c.name = fmt::format("{}[{}]", name(), i);
        c.component = m_index;
        c.x = ctx.x + 0.5 * (edge(i) + edge(i + 1));
        c.length = dx;
        c.frontal_area = frontal_area;
        c.flow_area = flow_area;
        c.volume = flow_area * dx;
        c.passage = passage;
        c.initial_temperature = T_in + (T_out - T_in) * (i + 0.5) / count;
        const int id = net.addCell(c);
        if (i == 0) {
            m_first_cell = id;
        } else {
            FlowFace f;
            f.name = fmt::format("{}[{}|{}]", name(), i - 1, i);
            f.from = id - 1;
            f.to = id;
            f.component = m_index;
            f.x = ctx.x + edge(i);
            m_internal_faces.push_back(net.addFace(f));
        }
        m_last_cell = id;
    }
    ctx.x += length;
    ComponentSlice& s = slice(ctx);
    s.first_cell = m_first_cell;
    s.last_cell = m_last_cell;
    s.x_end = ctx.x;
}

void Component::addSolidColumn(AssemblyContext& ctx, const std::string& what,
                               const std::vector<SolidLayer>& layers_per_length)
{
    Network& net = ctx.network;
    for (int c = m_first_cell; c <= m_last_cell; ++c) {
        const GasCell& cell = net.cells()[c];
        SolidNode node;
        node.name = fmt::format("{}[{}].{}", name(), c - m_first_cell, what);
        node.component = m_index;
        node.x = cell.x;
        node.length = cell.length;
        node.initial_temperature = cell.initial_temperature;
        for (SolidLayer layer : layers_per_length) {
            layer.mass *= cell.length; // mass per unit length -> node mass
            node.layers.push_back(layer);
        }
        const int id = net.addSolid(node);
        if (m_first_solid < 0) m_first_solid = id;
        m_last_solid = id;
    }
    ComponentSlice& s = slice(ctx);
    s.first_solid = m_first_solid;
    s.last_solid = m_last_solid;
}

void Component::addWallExchange(AssemblyContext& ctx, int solid_of_first_cell,
                                bool one_node_each, double wall_temperature)
{
    const bool external = solid_of_first_cell < 0 && m_boundary >= 0;
    const int channel = addWallHeatChannel(ctx.network, m_index, m_boundary, external);
    for (int c = m_first_cell; c <= m_last_cell; ++c) {
        int solid = solid_of_first_cell;
        if (solid >= 0 && one_node_each) solid += c - m_first_cell;
        addWallHeatTransfer(ctx.network, c, solid, wall_temperature, channel);
    }
}

void Component::addColumnConduction(AssemblyContext& ctx)
{
    for (int s = m_first_solid; s >= 0 && s < m_last_solid; ++s)
        addSolidConduction(ctx.network, s, s + 1, 0.0, -1, false);
}

void Component::addInternalFaces(AssemblyContext& ctx)
{
    for (int f : m_internal_faces) addMomentumFace(ctx.network, f);
}

int Component::addIsothermalBoundary(AssemblyContext& ctx, double temperature)
{
    ThermalBoundary b;
    b.name = name();
    b.component = m_index;
    b.isothermal = true;
    b.temperature = temperature;
    m_boundary = ctx.network.addBoundary(b);
    slice(ctx).boundary = m_boundary;
    return m_boundary;
}

} // namespace coldtip
