#include "solver/components/Laws.hpp"

#include "solver/network/elements/MomentumFace.hpp"
#include "solver/network/elements/OrificeLink.hpp"
#include "solver/network/elements/SolidConduction.hpp"
#include "solver/network/elements/WallHeatTransfer.hpp"

namespace coldtip {

namespace {
int channel(Network& net, const std::string& name, QuadratureChannel::Kind kind, int component,
            double x, int boundary = -1, double boundary_sign = 0.0, double external_sign = 0.0)
{
    QuadratureChannel q;
    q.name = name;
    q.kind = kind;
    q.component = component;
    q.x = x;
    q.boundary = boundary;
    q.boundary_sign = boundary >= 0 ? boundary_sign : 0.0;
    q.external_sign = external_sign;
    return net.addQuadrature(q);
}
} // namespace

int addMomentumFace(Network& net, int face)
{
    using K = QuadratureChannel::Kind;
    const FlowFace& f = net.faces().at(face);
    const int h = channel(net, f.name + ".enthalpy_flow", K::EnthalpyFlow, f.component, f.x);
    const bool junction = net.cells()[f.from].component != net.cells()[f.to].component;
    const int q = junction ? channel(net, f.name + ".gas_conduction", K::GasConduction,
                                     f.component, f.x)
                           : -1;
    const int before = facesOfCell(net, f.from).in;
    const int after = facesOfCell(net, f.to).out;
    net.addElement<MomentumFace>(f, face, before >= 0 ? net.faces()[before].from : -1,
                                 after >= 0 ? net.faces()[after].to : -1, net.cells(), h, q);
    return h;
}

int addOrifice(Network& net, const std::string& name, int component, int from, int to,
               double discharge_area, double x)
{
    using K = QuadratureChannel::Kind;
    const int h = channel(net, name + ".enthalpy_flow", K::EnthalpyFlow, component, x);
    net.addElement<OrificeLink>(name, from, to, discharge_area, net.cells(), h);
    return h;
}

CellFaces facesOfCell(const Network& net, int cell)
{
    CellFaces cf;
    const auto& faces = net.faces();
    for (int f = 0; f < static_cast<int>(faces.size()); ++f) {
        if (faces[f].to == cell) cf.in = f;
        if (faces[f].from == cell) cf.out = f;
    }
    return cf;
}

int addWallHeatChannel(Network& net, int component, int boundary, bool external)
{
    const ComponentSlice& s = net.components().at(component);
    return channel(net, s.name + ".wall_heat", QuadratureChannel::Kind::WallHeat, component,
                   0.5 * (s.x_start + s.x_end), boundary, +1.0, external ? +1.0 : 0.0);
}

void addWallHeatTransfer(Network& net, int cell, int solid, double wall_temperature, int q)
{
    const CellFaces cf = facesOfCell(net, cell);
    net.addElement<WallHeatTransfer>(cell, cf.in, cf.out, solid, wall_temperature, net.cells(),
                                     net.faces(), net.solids(), q);
}

void addSolidConduction(Network& net, int i, int j, double wall_temperature, int boundary,
                        bool external)
{
    const SolidNode& a = net.solids().at(i);
    const bool internal = j >= 0 && boundary < 0 && net.solids().at(j).component == a.component;
    const std::string to = j >= 0 ? net.solids().at(j).name : std::string("wall");
    const int q = internal ? -1
                           : channel(net, a.name + "->" + to + ".conduction",
                                     QuadratureChannel::Kind::SolidConduction, a.component, a.x,
                                     boundary, -1.0, external ? -1.0 : 0.0);
    net.addElement<SolidConduction>(i, j, wall_temperature, net.solids(), q);
}

} // namespace coldtip
