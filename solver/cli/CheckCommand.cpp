#include <fmt/format.h>

#include "solver/cli/Commands.hpp"
#include "solver/components/Machine.hpp"
#include "solver/input/CaseReader.hpp"

namespace coldtip::cli {

namespace {

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
