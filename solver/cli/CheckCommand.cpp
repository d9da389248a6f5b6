#include <cmath>
#include <fmt/format.h>

#include "solver/cli/Commands.hpp"
#include "solver/components/Machine.hpp"
#include "solver/input/CaseReader.hpp"

namespace coldtip::cli {

namespace {

//! What an engineer works out by hand before a run, per component with gas: the gas (void)
//! volume, porosity, hydraulic diameter, wetted area 4 V / d_h (the definition of d_h,
//! d_h = 4 V_gas / A_wetted), and r_h / delta_nu, the hydraulic radius over the viscous
//! penetration depth delta_nu = sqrt(2 nu / omega) at the charge pressure and the
//! component's mean initial temperature (Swift, "Thermoacoustics", 2002, ch. 4: r_h/delta_nu
//! >> 1 is a boundary-layer duct, << 1 a capillary, where friction is nearly steady
//! Poiseuille flow). For a round tube r_h = d_h / 2 is its radius r0.
void printGeometry(const Machine& machine)
{
    const Network& net = machine.network();
    const CaseDescription& d = machine.description();
    const double omega = 2.0 * M_PI * d.frequency;
    const double R = net.gas().R;
    fmt::print("{:<18} {:>11} {:>9} {:>9} {:>12} {:>9} {:>12}\n", "component", "void [cm3]",
               "porosity", "d_h [mm]", "wetted [cm2]", "T [K]", "r_h/delta_nu");
    for (const ComponentSlice& s : net.components()) {
        if (s.first_cell < 0 || s.kind == "valve") continue;
        double volume = 0.0, T = 0.0;
        const models::FlowPassage* passage = nullptr;
        const int n = s.last_cell - s.first_cell + 1;
        for (int i = s.first_cell; i <= s.last_cell; ++i) {
            const GasCell& c = net.cells()[i];
            volume += c.volumeAt(0.0);
            T += c.initial_temperature / n;
            if (c.passage) passage = c.passage;
        }
        if (!passage) {
            fmt::print("{:<18} {:>11.4g} {:>9} {:>9} {:>12} {:>9.1f} {:>12}\n", s.name,
                       1e6 * volume, "-", "-", "-", T, "-");
            continue;
        }
        const double dh = passage->hydraulicDiameter();
        const double rho = d.gas.charge_pressure / (R * T);
        const double nu = machine.workingGas().viscosity(T, rho) / rho;
        const double delta_nu = std::sqrt(2.0 * nu / omega);
        fmt::print("{:<18} {:>11.4g} {:>9.4f} {:>9.4g} {:>12.4g} {:>9.1f} {:>12.3g}\n", s.name,
                   1e6 * volume, passage->porosity(), 1e3 * dh, 1e4 * 4.0 * volume / dh, T,
                   0.5 * dh / delta_nu);
    }

    // Swept volume and dead volume: the piston sweeps 2 A X; the gas the drive must compress
    // besides it is its clearance and the void of the machine up to the cold end.
    const MovingBoundary& p = machine.drive().piston();
    const double swept = 2.0 * p.piston_area * p.amplitude;
    const int last = machine.coldComponent() >= 0 ? machine.coldComponent()
                                                  : static_cast<int>(net.components().size()) - 1;
    double dead = 0.0;
    for (int k = 1; k <= last; ++k) {
        const ComponentSlice& s = net.components()[k];
        if (s.first_cell < 0 || s.kind == "valve" || s.kind == "volume") continue;
        for (int i = s.first_cell; i <= s.last_cell; ++i) dead += net.cells()[i].volume;
    }
    fmt::print("swept volume 2 A X = {:.4g} cm3; clearance {:.4g} cm3 ({:.3g} of the swept "
               "volume); void volume from the piston to {} {:.4g} cm3, dead-volume ratio "
               "{:.3g}\n",
               1e6 * swept, 1e6 * p.dead_volume, p.dead_volume / swept,
               machine.coldComponent() >= 0 ? "the cold exchanger's outlet"
                                            : "the end (no buffer volumes)",
               1e6 * (dead + p.dead_volume), (dead + p.dead_volume) / swept);
}

//! Kelvin per cell above which a regenerator or tube spanning a temperature difference is
//! too coarse for a cooling power to better than a few per cent. From the demo's grid study
//! (DEVELOPERS.md, "Energy and the face temperature"; tests/solver/DemoConvergenceTest.cpp):
//! 215 K over 40 / 80 / 160 cells (5.4 / 2.7 / 1.3 K per cell) gave 2.3438 / 2.4421 / 2.4810
//! W, observed order 1.34, so the Richardson-extrapolated value (Roache 1994) is 2.506 W and
//! the errors are 6.5 / 2.6 / 1.0 %: about 1 % per K per cell, and 4 K per cell is about 4 %.
constexpr double kMaxKelvinPerCell = 4.0;

//! A warning for every regenerator or tube whose initial temperature span (between its
//! neighbours' ends) is spread over too few cells. Returns the number of warnings.
int warnCoarseGrids(const Machine& machine)
{
    const Network& net = machine.network();
    int warnings = 0;
    const int n = static_cast<int>(net.components().size());
    for (int k = 1; k < n; ++k) {
        const ComponentSlice& s = net.components()[k];
        if ((s.kind != "regenerator" && s.kind != "tube") || s.first_cell < 0) continue;
        auto endTemperature = [&](int from, int step) {
            for (int j = from; j >= 0 && j < n; j += step) {
                const ComponentSlice& o = net.components()[j];
                if (o.first_cell < 0 || o.kind == "valve") continue;
                return net.cells()[step < 0 ? o.last_cell : o.first_cell].initial_temperature;
            }
            return net.cells()[step < 0 ? s.first_cell : s.last_cell].initial_temperature;
        };
        const double span = std::abs(endTemperature(k - 1, -1) - endTemperature(k + 1, +1));
        const int cells = s.last_cell - s.first_cell + 1;
        const double per_cell = span / cells;
        if (per_cell > kMaxKelvinPerCell) {
            fmt::print("warning: {} spans {:.0f} K over {} cells ({:.1f} K per cell): the grid "
                       "is too coarse for the cooling power (more than {:.0f} K per cell; in the "
                       "demo's grid study 5.4 K per cell was 6.5 % and 2.7 K per cell 2.6 % "
                       "below the grid-converged value); give it at least {} cells\n",
                       s.name, span, cells, per_cell, kMaxKelvinPerCell,
                       static_cast<int>(std::ceil(span / kMaxKelvinPerCell)));
            ++warnings;
        }
    }
    return warnings;
}

int checkCase(const std::string& case_path)
{
    const CaseDescription d = input::readCaseFile(case_path);
    Machine machine(d);
    const Network& net = machine.network();
    fmt::print("case {}: {} gas at {:.4g} MPa, {:.4g} Hz\n", d.name, d.gas.species,
               d.gas.charge_pressure * 1e-6, d.frequency);
    fmt::print("{:<18} {:<15} {:>6} {:>6} {:>6} {:>9} {:>9}  {}\n", "component", "kind", "cells",
               "faces", "solids", "x0 [mm]", "x1 [mm]", "thermal boundary");
    for (int k = 0; k < static_cast<int>(net.components().size()); ++k) {
        const ComponentSlice& s = net.components()[k];
        int faces = 0;
        for (const FlowFace& f : net.faces()) faces += f.component == k;
        const int cells = s.first_cell >= 0 ? s.last_cell - s.first_cell + 1 : 0;
        const int solids = s.first_solid >= 0 ? s.last_solid - s.first_solid + 1 : 0;
        std::string boundary = "-";
        if (s.boundary >= 0) {
            const ThermalBoundary& b = net.boundaries()[s.boundary];
            boundary = b.isothermal ? fmt::format("wall at {:.2f} K", b.temperature)
                                    : "lumped body " + net.solids()[b.solid_node].name;
        }
        std::string role;
        if (k == machine.coldComponent()) role = " (cold)";
        if (k == machine.rejectComponent()) role = " (reject)";
        if (k == machine.warmComponent()) role = " (warm)";
        fmt::print("{:<18} {:<15} {:>6} {:>6} {:>6} {:>9.1f} {:>9.1f}  {}{}\n", s.name, s.kind,
                   cells, faces, solids, 1e3 * s.x_start, 1e3 * s.x_end, boundary, role);
    }
    for (const LinkSpec& l : d.links)
        fmt::print("link {}: {} between {}.{} and {}.{}, orifice {:.3g} mm\n", l.name, l.kind,
                   l.from.component, l.from.outlet ? "outlet" : "inlet", l.to.component,
                   l.to.outlet ? "outlet" : "inlet", 1e3 * l.orifice_diameter);
    fmt::print("network: {} cells, {} faces, {} solid nodes, {} states, {} Jacobian "
               "non-zeros, {} cycle integrals; charge {:.4g} g\n",
               net.cells().size(), net.faces().size(), net.solids().size(), net.size(),
               net.pattern().nnz(), net.nQuadratures(), 1e3 * machine.chargeMass());
    printGeometry(machine);
    warnCoarseGrids(machine);
    return kExitSuccess;
}

} // namespace

void addCheckCommand(CLI::App& app, Action& action, const CommandContext&)
{
    auto path = std::make_shared<std::string>();
    auto* check = app.add_subcommand("check", "validate a case and print its network");
    check->add_option("CASE", *path, "case file (YAML)")->required();
    check->callback([&action, path] { action = [path] { return checkCase(*path); }; });
}

} // namespace coldtip::cli
