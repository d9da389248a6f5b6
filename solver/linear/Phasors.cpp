#include "solver/linear/Phasors.hpp"

#include <cmath>

#include "solver/network/elements/OrificeLink.hpp"

namespace coldtip {

double PortPhasor::flowPhaseDeg() const
{
    if (std::abs(pressure) == 0.0 || std::abs(volume_flow) == 0.0) return 0.0;
    return std::arg(volume_flow / pressure) * 180.0 / M_PI;
}

const ComponentPhasors* MachinePhasors::find(const std::string& name) const
{
    for (const auto& c : components)
        if (c.name == name) return &c;
    return nullptr;
}

namespace {

double acousticPower(const Complex& p, const Complex& U) { return 0.5 * (p * std::conj(U)).real(); }

PortPhasor port(const Complex& p, const Complex& mdot, double rho, const Complex& T, double cp)
{
    PortPhasor q;
    q.pressure = p;
    q.mass_flow = mdot;
    q.volume_flow = rho > 0.0 ? mdot / rho : Complex(0.0);
    q.acoustic_power = acousticPower(q.pressure, q.volume_flow);
    q.enthalpy_flow = 0.5 * cp * (mdot * std::conj(T)).real();
    return q;
}

//! Port at face f, with the temperature oscillation taken from `T_cell` (or the mean of
//! both sides when T_cell < 0).
PortPhasor facePort(const Network& net, const FirstHarmonics& h, int f, int T_cell = -1)
{
    const FlowFace& face = net.faces()[f];
    const Complex p = 0.5 * (h.cell_pressure[face.from] + h.cell_pressure[face.to]);
    const double rho = 0.5 * (h.cell_density[face.from] + h.cell_density[face.to]);
    const Complex T = T_cell >= 0 ? h.cell_temperature[T_cell]
                                  : 0.5 * (h.cell_temperature[face.from] +
                                           h.cell_temperature[face.to]);
    return port(p, h.face_mass_flow[f], rho, T, h.cp);
}

//! The orifice element named `name` ("orifice NAME (...)"), its index among orifices.
int orificeNamed(const Network& net, const std::string& name, int& from, int& to)
{
    int k = 0;
    for (const auto& e : net.elements()) {
        const auto* o = dynamic_cast<const OrificeLink*>(e.get());
        if (!o) continue;
        if (o->describe().rfind("orifice " + name + " (", 0) == 0) {
            for (std::size_t i = 0; i < net.cells().size(); ++i) {
                if (net.cells()[i].offset == o->stencil().input(0)) from = static_cast<int>(i);
                if (net.cells()[i].offset == o->stencil().input(2)) to = static_cast<int>(i);
            }
            return k;
        }
        ++k;
    }
    return -1;
}

int inletFace(const Network& net, const ComponentSlice& s)
{
    for (std::size_t f = 0; f < net.faces().size(); ++f)
        if (net.faces()[f].to == s.first_cell &&
            (net.faces()[f].from < s.first_cell || net.faces()[f].from > s.last_cell))
            return static_cast<int>(f);
    return -1;
}
int outletFace(const Network& net, const ComponentSlice& s)
{
    for (std::size_t f = 0; f < net.faces().size(); ++f)
        if (net.faces()[f].from == s.last_cell &&
            (net.faces()[f].to < s.first_cell || net.faces()[f].to > s.last_cell))
            return static_cast<int>(f);
    return -1;
}

//! The face a quarter of the neighbouring component's cells beyond junction face f,
//! downstream (`down`) or upstream; f itself if the neighbour is a lumped volume.
int awayFrom(const Network& net, int f, bool down)
{
    const int cell = down ? net.faces()[f].to : net.faces()[f].from;
    const ComponentSlice& s = net.components()[net.cells()[cell].component];
    const int steps = (s.last_cell - s.first_cell + 1) / 4;
    int face = f;
    for (int k = 0; k < steps; ++k) {
        const int from = down ? net.faces()[face].to : net.faces()[face].from;
        int next = -1;
        for (std::size_t g = 0; g < net.faces().size(); ++g)
            if ((down ? net.faces()[g].from : net.faces()[g].to) == from) next = static_cast<int>(g);
        if (next < 0) break;
        face = next;
    }
    return face;
}

} // namespace

SummaryRoles summaryRoles(const Machine& machine)
{
    const auto& slices = machine.network().components();
    SummaryRoles r;
    r.cold = machine.coldComponent();
    for (std::size_t k = 0; k < slices.size(); ++k) {
        const int i = static_cast<int>(k);
        if (slices[k].kind == "regenerator" && r.regenerator < 0) r.regenerator = i;
        if (slices[k].kind == "tube" && r.tube < 0 && i > r.cold) r.tube = i;
    }
    const int warm = machine.warmComponent() >= 0 ? machine.warmComponent() : r.tube;
    for (std::size_t k = warm >= 0 ? warm + 1 : slices.size(); k < slices.size(); ++k)
        if (slices[k].kind == "duct") {
            r.inertance = static_cast<int>(k);
            break;
        }
    return r;
}

void summarizePorts(const Machine& machine, MachinePhasors& m)
{
    const SummaryRoles r = summaryRoles(machine);
    PhasorSummary& s = m.summary;
    const ComponentPhasors& drive = m.components.front();
    s.drive_acoustic_power_W = drive.inlet.acoustic_power;
    s.drive_pressure_amplitude_Pa = std::abs(drive.inlet.pressure);
    if (r.cold >= 0) {
        s.cold_end_acoustic_power_W = m.components[r.cold].outlet.acoustic_power;
        s.phase_cold_end_deg = m.components[r.cold].outlet.flowPhaseDeg();
    }
    if (r.tube >= 0) s.phase_pulse_tube_warm_end_deg = m.components[r.tube].outlet.flowPhaseDeg();
    if (r.regenerator >= 0)
        s.phase_regenerator_warm_end_deg = m.components[r.regenerator].inlet.flowPhaseDeg();
    if (r.inertance >= 0) s.phase_inertance_inlet_deg = m.components[r.inertance].inlet.flowPhaseDeg();
}

MachinePhasors machinePhasors(const Machine& machine, const FirstHarmonics& h)
{
    const Network& net = machine.network();
    MachinePhasors out;
    const auto& slices = net.components();
    for (std::size_t k = 0; k < slices.size(); ++k) {
        const ComponentSlice& s = slices[k];
        ComponentPhasors c;
        c.name = s.name;
        c.kind = s.kind;
        if (s.first_cell >= 0) {
            const int fi = inletFace(net, s), fo = outletFace(net, s);
            const int a = s.first_cell, b = s.last_cell;
            if (fi >= 0) {
                c.inlet = facePort(net, h, fi);
            } else if (k == 0) {
                // The piston face: the flow the piston pushes into the compression space.
                c.inlet = port(h.cell_pressure[a], h.piston_volume_flow * h.cell_density[a],
                               h.cell_density[a], h.cell_temperature[a], h.cp);
            } else {
                c.inlet = port(h.cell_pressure[a], 0.0, h.cell_density[a], 0.0, h.cp);
            }
            if (fo >= 0)
                c.outlet = facePort(net, h, fo);
            else
                c.outlet = port(h.cell_pressure[b], 0.0, h.cell_density[b], 0.0, h.cp);
        }
        int from = -1, to = -1;
        const int o = s.first_cell < 0 ? orificeNamed(net, s.name, from, to) : -1;
        if (o >= 0) {
            const Complex mdot = h.orifice_mass_flow[o];
            c.inlet = port(h.cell_pressure[from], mdot, h.cell_density[from],
                           h.cell_temperature[from], h.cp);
            c.outlet = port(h.cell_pressure[to], mdot, h.cell_density[from],
                            h.cell_temperature[from], h.cp);
        }
        // An in-line orifice between two components feeds its neighbours' missing ports.
        if (o >= 0 && k > 0 && slices[k].kind == "orifice") {
            if (!out.components.empty() && std::abs(out.components.back().outlet.mass_flow) == 0.0)
                out.components.back().outlet = c.inlet;
        }
        if (s.first_cell >= 0 && inletFace(net, s) < 0 && k > 0 && !out.components.empty() &&
            out.components.back().kind == "orifice")
            c.inlet = out.components.back().outlet;
        c.input_impedance = std::abs(c.inlet.volume_flow) > 0.0
                                ? c.inlet.pressure / c.inlet.volume_flow
                                : Complex(INFINITY, 0.0);
        out.components.push_back(c);
    }
    summarizePorts(machine, out);
    const int cold = machine.coldComponent();
    if (cold >= 0) {
        // A quarter of the neighbour's length away from the exchanger: the discrete
        // temperature oscillation next to the kink of the mean profile at a junction swings
        // from face to face and settles within a few cells.
        const ComponentSlice& s = slices[cold];
        const int fi = inletFace(net, s), fo = outletFace(net, s);
        double in = 0.0, gone = 0.0;
        if (fi >= 0) in = facePort(net, h, awayFrom(net, fi, false)).enthalpy_flow;
        if (fo >= 0) gone = facePort(net, h, awayFrom(net, fo, true)).enthalpy_flow;
        out.summary.gross_cooling_W = gone - in;
    }
    return out;
}

} // namespace coldtip
