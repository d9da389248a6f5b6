#include "solver/components/PassageComponents.hpp"

#include <cmath>

#include "solver/components/Laws.hpp"
#include "solver/components/Passages.hpp"
#include "solver/network/elements/PistonWork.hpp"

namespace coldtip {

namespace {
double circleArea(double d) { return 0.25 * M_PI * d * d; }

//! A thin tube wall of `thickness` around a bore of `diameter`: cross-section [m^2].
double wallSection(double diameter, double thickness)
{
    return M_PI * (diameter + thickness) * thickness;
}

int cellsOr(int cells, int fallback) { return cells > 0 ? cells : fallback; }
} // namespace

// ---- duct --------------------------------------------------------------------------------

void Duct::addNodes(AssemblyContext& ctx, double T_in, double T_out)
{
    registerSlice(ctx);
    const auto* passage = ctx.keep(makeTubePassage(m_spec.diameter, m_spec.roughness));
    const int n = cellsOr(m_spec.cells, std::max(1, int(std::ceil(m_spec.length / 0.04))));
    if (m_spec.wall.kind == WallSpec::Kind::Isothermal) {
        T_in = T_out = m_spec.wall.temperature;
        addIsothermalBoundary(ctx, m_spec.wall.temperature);
    }
    addPassageCells(ctx, n, m_spec.length, circleArea(m_spec.diameter), passage, T_in, T_out);
}

void Duct::addElements(AssemblyContext& ctx)
{
    addInternalFaces(ctx);
    if (m_spec.wall.kind == WallSpec::Kind::Isothermal)
        addWallExchange(ctx, -1, false, m_spec.wall.temperature);
}

double Duct::anchorTemperature() const
{
    return m_spec.wall.kind == WallSpec::Kind::Isothermal ? m_spec.wall.temperature : 0.0;
}

// ---- heat exchanger ------------------------------------------------------------------------

double HeatExchanger::anchorTemperature() const
{
    if (m_spec.wall.kind == WallSpec::Kind::Isothermal) return m_spec.wall.temperature;
    return m_spec.wall.initial_temperature;
}

void HeatExchanger::addNodes(AssemblyContext& ctx, double T_in, double T_out)
{
    registerSlice(ctx);
    const auto* passage = ctx.keep(makeFilledPassage(m_spec.fill));
    const double T = anchorTemperature() > 0.0 ? anchorTemperature() : 0.5 * (T_in + T_out);
    addPassageCells(ctx, cellsOr(m_spec.cells, 2), m_spec.length,
                    circleArea(m_spec.diameter), passage, T, T);
    if (m_spec.wall.kind == WallSpec::Kind::Isothermal) {
        addIsothermalBoundary(ctx, m_spec.wall.temperature);
        return;
    }
    // Lumped body: the exchanger's metal and whatever is bolted to it, at one temperature.
    SolidNode body;
    body.name = name() + ".T_body";
    body.component = m_index;
    body.x = ctx.network.cells()[m_first_cell].x;
    body.length = 0.0;
    body.initial_temperature = T;
    body.layers.push_back({&ctx.materials.table(m_spec.wall.material), m_spec.wall.mass, 0.0});
    m_body = ctx.network.addSolid(body);
    m_head = std::make_unique<ColdHead>(m_spec.wall, name(), m_index);
    m_head->addNodes(ctx, m_body, T, body.x);
    m_first_solid = m_body;
    m_last_solid = m_head->bodyNodes().back();
    ThermalBoundary b;
    b.name = name();
    b.component = m_index;
    b.isothermal = false;
    b.solid_node = m_body;
    m_boundary = ctx.network.addBoundary(b);
    ComponentSlice& s = slice(ctx);
    s.boundary = m_boundary;
    s.first_solid = m_first_solid;
    s.last_solid = m_last_solid;
}

void HeatExchanger::addElements(AssemblyContext& ctx)
{
    addInternalFaces(ctx);
    addWallExchange(ctx, m_body, false, m_spec.wall.temperature);
    if (m_body >= 0) {
        Network& net = ctx.network;
        QuadratureChannel q;
        q.name = name() + ".applied_load";
        q.kind = QuadratureChannel::Kind::AppliedLoad;
        q.component = m_index;
        q.external_sign = +1.0;
        const int ql = net.addQuadrature(q);
        net.addElement<HeatLoad>(m_body, m_spec.wall.load, net.solids(), ql);
        m_head->addElements(ctx);
    }
}

WallContact HeatExchanger::wallContact() const
{
    WallContact w;
    w.exists = true;
    w.solid = m_body;
    w.temperature = m_spec.wall.temperature;
    return w;
}

// ---- regenerator ---------------------------------------------------------------------------

void Regenerator::addNodes(AssemblyContext& ctx, double T_in, double T_out)
{
    registerSlice(ctx);
    const auto* passage = ctx.keep(makeFilledPassage(m_spec.fill));
    const double area = circleArea(m_spec.diameter);
    addPassageCells(ctx, cellsOr(m_spec.cells, 20), m_spec.length, area, passage, T_in, T_out);
    const models::SolidTable& matrix = ctx.materials.table(m_spec.fill.material);
    const double solid_fraction = 1.0 - passage->porosity();
    std::vector<SolidLayer> layers;
    layers.push_back({&matrix, matrix.density() * solid_fraction * area,
                      m_spec.fill.conduction_degradation * solid_fraction * area});
    if (m_spec.housing) {
        const models::SolidTable& housing = ctx.materials.table(m_spec.housing->material);
        const double section = wallSection(m_spec.diameter, m_spec.housing->thickness);
        layers.push_back({&housing, housing.density() * section, section});
    }
    addSolidColumn(ctx, "T_matrix", layers);
}

void Regenerator::addElements(AssemblyContext& ctx)
{
    addInternalFaces(ctx);
    addWallExchange(ctx, m_first_solid, true, 0.0);
    addColumnConduction(ctx);
}

// ---- pulse tube ----------------------------------------------------------------------------

void Tube::addNodes(AssemblyContext& ctx, double T_in, double T_out)
{
    registerSlice(ctx);
    const auto* passage = ctx.keep(makeTubePassage(m_spec.diameter, m_spec.roughness));
    addPassageCells(ctx, cellsOr(m_spec.cells, 20), m_spec.length,
                    circleArea(m_spec.diameter), passage, T_in, T_out);
    if (m_spec.wall.kind != WallSpec::Kind::Conducting) return;
    const models::SolidTable& wall = ctx.materials.table(m_spec.wall.material);
    const double section = wallSection(m_spec.diameter, m_spec.wall.thickness);
    addSolidColumn(ctx, "T_wall", {{&wall, wall.density() * section, section}});
}

void Tube::addElements(AssemblyContext& ctx)
{
    addInternalFaces(ctx);
    if (m_first_solid < 0) return;
    addWallExchange(ctx, m_first_solid, true, 0.0);
    addColumnConduction(ctx);
}

} // namespace coldtip
