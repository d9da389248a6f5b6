#include "solver/components/LumpedComponents.hpp"

#include <cmath>

#include "solver/network/elements/PistonWork.hpp"
#include "solver/network/elements/WallHeatTransfer.hpp"

namespace coldtip {

namespace {
ComponentSpec driveSpec(const DriveSpec& drive)
{
    ComponentSpec s;
    s.name = "drive";
    s.kind = ComponentSpec::Kind::Volume;
    s.mark = drive.mark;
    return s;
}

//! One lumped cell at the current axial position.
int addLumpedCell(AssemblyContext& ctx, const std::string& name, int component, double volume,
                  double temperature, const MovingBoundary* piston)
{
    GasCell c;
    c.name = name;
    c.component = component;
    c.x = ctx.x;
    c.volume = volume;
    c.piston = piston;
    c.initial_temperature = temperature;
    return ctx.network.addCell(c);
}
} // namespace

PistonDrive::PistonDrive(const DriveSpec& drive) : Component(driveSpec(drive)), m_drive(drive) {}

double PistonDrive::anchorTemperature() const
{
    return m_drive.wall ? m_drive.wall->temperature : 0.0;
}

void PistonDrive::addNodes(AssemblyContext& ctx, double T_in, double)
{
    registerSlice(ctx);
    auto piston = std::make_unique<MovingBoundary>();
    piston->piston_area = 0.25 * M_PI * m_drive.bore * m_drive.bore;
    piston->amplitude = m_drive.amplitude;
    piston->dead_volume = m_drive.dead_volume;
    piston->omega = 2.0 * M_PI * ctx.description.frequency;
    m_piston = piston.get();
    ctx.pistons.push_back(std::move(piston));
    const double T = m_drive.wall ? m_drive.wall->temperature : T_in;
    m_first_cell = m_last_cell =
        addLumpedCell(ctx, "compression-space", m_index, m_piston->meanVolume(), T, m_piston);
    ComponentSlice& s = slice(ctx);
    s.first_cell = s.last_cell = m_first_cell;
    if (m_drive.wall) addIsothermalBoundary(ctx, m_drive.wall->temperature);
}

void PistonDrive::addElements(AssemblyContext& ctx)
{
    Network& net = ctx.network;
    QuadratureChannel w;
    w.name = "drive.pv_work";
    w.kind = QuadratureChannel::Kind::PvWork;
    w.component = m_index;
    w.external_sign = +1.0;
    net.addElement<PistonWork>(m_first_cell, net.cells(), net.addQuadrature(w));
    if (!m_drive.wall) return;
    QuadratureChannel q;
    q.name = "compression-space.wall_heat";
    q.kind = QuadratureChannel::Kind::WallHeat;
    q.component = m_index;
    q.boundary = m_boundary;
    q.boundary_sign = +1.0;
    q.external_sign = +1.0;
    net.addElement<FilmHeatTransfer>(m_first_cell, m_drive.bore,
                                     m_drive.wall->heat_transfer_coefficient,
                                     m_drive.wall->temperature, net.cells(),
                                     net.addQuadrature(q));
}

void Volume::addNodes(AssemblyContext& ctx, double T_in, double)
{
    registerSlice(ctx);
    m_first_cell = m_last_cell = addLumpedCell(ctx, name(), m_index, m_spec.volume, T_in, nullptr);
    ComponentSlice& s = slice(ctx);
    s.first_cell = s.last_cell = m_first_cell;
}

double Orifice::dischargeArea() const
{
    return m_spec.discharge_coefficient * 0.25 * M_PI * m_spec.orifice_diameter *
           m_spec.orifice_diameter;
}

} // namespace coldtip
