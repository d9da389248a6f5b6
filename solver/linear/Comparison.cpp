#include "solver/linear/Comparison.hpp"

#include <cmath>

#include "solver/cycle/Harmonics.hpp"
#include "solver/linear/OrificePhasors.hpp"

namespace coldtip {

FirstHarmonics cycleHarmonics(const Machine& machine, const CycleSamples& samples, int k)
{
    const Network& net = machine.network();
    const GasProperties& gas = net.gas();
    const std::size_t n = samples.time.size(), nc = net.cells().size(), nf = net.faces().size();
    const std::vector<OrificeOnPath> orifices = networkOrifices(net);
    std::vector<std::vector<double>> p(nc, std::vector<double>(n)), T = p, rho = p;
    std::vector<std::vector<double>> mdot(nf, std::vector<double>(n));
    std::vector<std::vector<double>> orifice(orifices.size(), std::vector<double>(n));
    for (std::size_t j = 0; j < n; ++j) {
        const std::vector<double>& y = samples.state[j];
        const double t = samples.time[j];
        for (std::size_t i = 0; i < nc; ++i) {
            const GasState<double> g = gasState(y[net.cells()[i].offset], y[net.cells()[i].offset + 1],
                                                net.cells()[i].volumeAt(t), gas);
            p[i][j] = g.p;
            T[i][j] = g.T;
            rho[i][j] = g.rho;
        }
        for (std::size_t f = 0; f < nf; ++f) mdot[f][j] = y[net.faces()[f].offset];
        for (std::size_t o = 0; o < orifices.size(); ++o) {
            auto gasOf = [&](int i) {
                const GasCell& c = net.cells()[i];
                return gasState(y[c.offset], y[c.offset + 1], c.volumeAt(t), gas);
            };
            orifice[o][j] = orificeFlow(net, orifices[o], gasOf(orifices[o].from), gasOf(orifices[o].to));
        }
    }
    // x(t) = X sin(omega t) from a period boundary: the displacement's phasor is -i X.
    const Complex unit = std::pow(Complex(0.0, -1.0), k);
    FirstHarmonics h;
    h.cp = gas.cp;
    for (std::size_t i = 0; i < nc; ++i) {
        h.cell_pressure.push_back(harmonic(p[i], k) / unit);
        h.cell_temperature.push_back(harmonic(T[i], k) / unit);
        h.cell_density.push_back(cycleMean(rho[i]));
    }
    for (std::size_t f = 0; f < nf; ++f) h.face_mass_flow.push_back(harmonic(mdot[f], k) / unit);
    for (const auto& o : orifice) h.orifice_mass_flow.push_back(harmonic(o, k) / unit);
    const MovingBoundary& piston = machine.drive().piston();
    h.piston_volume_flow = k == 1 ? Complex(0.0, piston.omega) * piston.piston_area *
                                        piston.scale * piston.amplitude
                                  : Complex(0.0);
    return h;
}

void cycleMeanTemperatures(const Machine& machine, const CycleSamples& samples,
                           std::vector<double>& cell_T, std::vector<double>& solid_T)
{
    const Network& net = machine.network();
    const std::size_t n = samples.time.size();
    cell_T.assign(net.cells().size(), 0.0);
    solid_T.assign(net.solids().size(), 0.0);
    for (std::size_t j = 0; j < n; ++j) {
        const auto& y = samples.state[j];
        for (std::size_t i = 0; i < cell_T.size(); ++i) {
            const GasCell& c = net.cells()[i];
            cell_T[i] += y[c.offset + 1] / (y[c.offset] * net.gas().cv) / n;
        }
        for (std::size_t k = 0; k < solid_T.size(); ++k) solid_T[k] += y[net.solids()[k].offset] / n;
    }
}

namespace {

ComparedQuantity row(const std::string& key, double nl, double lin, double lum, bool phase)
{
    ComparedQuantity q{key, nl, lin, lum, 0.0, 0.0, phase};
    auto diff = [&](double v) {
        if (phase) return std::remainder(v - nl, 360.0);
        return nl != 0.0 ? (v - nl) / std::abs(nl) : 0.0;
    };
    q.linear_difference = diff(lin);
    q.lumped_difference = diff(lum);
    return q;
}

double coldPressure(const Machine& machine, const MachinePhasors& m)
{
    const int cold = machine.coldComponent();
    return cold >= 0 ? std::abs(m.components[cold].outlet.pressure) : 0.0;
}

} // namespace

AmplitudeComparison compareCycle(Machine& machine, const CycleSamples& samples,
                                 const CycleIntegrals& integrals)
{
    AmplitudeComparison c;
    c.scale = machine.drive().piston().scale;
    c.integrals = integrals;
    c.nonlinear = machinePhasors(machine, cycleHarmonics(machine, samples, 1));
    c.pv_power_dft_W = c.nonlinear.summary.drive_acoustic_power_W;
    c.dft_check = integrals.pv_power_W != 0.0
                      ? std::abs(c.pv_power_dft_W - integrals.pv_power_W) / std::abs(integrals.pv_power_W)
                      : 0.0;
    c.nonlinear.summary.gross_cooling_W = integrals.gross_cooling_W;

    std::vector<double> cell_T, solid_T;
    cycleMeanTemperatures(machine, samples, cell_T, solid_T);
    const std::vector<double> y_m = linearMeanState(machine, cell_T, solid_T);
    const LinearSolution lin = solveLinear(machine, y_m);
    c.linear = machinePhasors(machine, firstHarmonics(machine, lin));
    c.lumped = solveLumped(machine, y_m).phasors;

    const MachinePhasors h0 = machinePhasors(machine, cycleHarmonics(machine, samples, 0));
    const MachinePhasors h2 = machinePhasors(machine, cycleHarmonics(machine, samples, 2));
    const MachinePhasors h3 = machinePhasors(machine, cycleHarmonics(machine, samples, 3));
    for (std::size_t k = 0; k < c.nonlinear.components.size(); ++k) {
        for (int side = 0; side < 2; ++side) {
            auto pick = [&](const MachinePhasors& m) -> const PortPhasor& {
                return side == 0 ? m.components[k].inlet : m.components[k].outlet;
            };
            PortHarmonics ph;
            ph.component = c.nonlinear.components[k].name;
            ph.port = side == 0 ? "inlet" : "outlet";
            const MachinePhasors* all[4] = {&h0, &c.nonlinear, &h2, &h3};
            for (int j = 0; j < 4; ++j) {
                ph.pressure[j] = std::abs(pick(*all[j]).pressure);
                ph.mass_flow[j] = std::abs(pick(*all[j]).mass_flow);
            }
            if (ph.pressure[1] > 0.0) {
                c.max_p2_over_p1 = std::max(c.max_p2_over_p1, ph.pressure[2] / ph.pressure[1]);
                c.max_p3_over_p1 = std::max(c.max_p3_over_p1, ph.pressure[3] / ph.pressure[1]);
            }
            c.harmonics.push_back(ph);
        }
    }

    const PhasorSummary &n = c.nonlinear.summary, &l = c.linear.summary, &m = c.lumped.summary;
    c.table = {
        row("drive_pressure_amplitude_Pa", n.drive_pressure_amplitude_Pa,
            l.drive_pressure_amplitude_Pa, m.drive_pressure_amplitude_Pa, false),
        row("cold_end_pressure_amplitude_Pa", coldPressure(machine, c.nonlinear),
            coldPressure(machine, c.linear), coldPressure(machine, c.lumped), false),
        row("phase_cold_end_deg", n.phase_cold_end_deg, l.phase_cold_end_deg, m.phase_cold_end_deg, true),
        row("phase_pulse_tube_warm_end_deg", n.phase_pulse_tube_warm_end_deg,
            l.phase_pulse_tube_warm_end_deg, m.phase_pulse_tube_warm_end_deg, true),
        row("phase_inertance_inlet_deg", n.phase_inertance_inlet_deg, l.phase_inertance_inlet_deg,
            m.phase_inertance_inlet_deg, true),
        row("phase_regenerator_warm_end_deg", n.phase_regenerator_warm_end_deg,
            l.phase_regenerator_warm_end_deg, m.phase_regenerator_warm_end_deg, true),
        row("drive_acoustic_power_W", n.drive_acoustic_power_W, l.drive_acoustic_power_W,
            m.drive_acoustic_power_W, false),
        row("cold_end_acoustic_power_W", n.cold_end_acoustic_power_W, l.cold_end_acoustic_power_W,
            m.cold_end_acoustic_power_W, false),
        row("gross_cooling_W", n.gross_cooling_W, l.gross_cooling_W, m.gross_cooling_W, false),
        row("pv_power_W", integrals.pv_power_W, l.drive_acoustic_power_W, m.drive_acoustic_power_W,
            false),
    };
    return c;
}

} // namespace coldtip
