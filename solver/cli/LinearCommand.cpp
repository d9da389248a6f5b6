#include <chrono>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>

#include "solver/cli/Commands.hpp"
#include "solver/output/OutputFile.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/linear/LinearAnalysis.hpp"
#include "solver/linear/LumpedModel.hpp"
#include "solver/output/LinearResult.hpp"

namespace coldtip::cli {

namespace {

struct LinearOptions {
    std::string case_path;
    std::string output;
    std::string from;
    bool lumped = false;
    bool json = false;
    bool quiet = false;
};

double deg(const Complex& z) { return std::arg(z) * 180.0 / M_PI; }

void printPorts(const MachinePhasors& m)
{
    fmt::print("{:<16} {:>6} {:>11} {:>8} {:>12} {:>9} {:>10} {:>10}\n", "component", "port",
               "|p1| [kPa]", "ph [deg]", "|U1| [cm3/s]", "U-p [deg]", "<E> [W]", "<H2> [W]");
    for (const ComponentPhasors& c : m.components)
        for (int side = 0; side < 2; ++side) {
            const PortPhasor& q = side == 0 ? c.inlet : c.outlet;
            fmt::print("{:<16} {:>6} {:>11.3f} {:>8.2f} {:>12.3f} {:>9.2f} {:>10.4f} {:>10.4f}\n",
                       side == 0 ? c.name : "", side == 0 ? "in" : "out",
                       1e-3 * std::abs(q.pressure), deg(q.pressure), 1e6 * std::abs(q.volume_flow),
                       q.flowPhaseDeg(), q.acoustic_power, q.enthalpy_flow);
        }
    const PhasorSummary& s = m.summary;
    fmt::print("acoustic power at the drive {:.4f} W, at the cold end {:.4f} W; gross cooling "
               "estimate {:.4f} W\nflow - pressure phase: cold end {:.1f} deg, pulse-tube warm end "
               "{:.1f} deg, regenerator warm end {:.1f} deg, inertance inlet {:.1f} deg\n",
               s.drive_acoustic_power_W, s.cold_end_acoustic_power_W, s.gross_cooling_W,
               s.phase_cold_end_deg, s.phase_pulse_tube_warm_end_deg,
               s.phase_regenerator_warm_end_deg, s.phase_inertance_inlet_deg);
}

void printLumped(const LumpedModel& l)
{
    fmt::print("{:<16} {:>14} {:>6} {:>14} {:>11} {:>14}\n", "component", "L [kg/m^4]", "K_L",
               "C [m^3/Pa]", "law", "R [Pa s/m^3]");
    for (const LumpedElement& e : l.elements)
        fmt::print("{:<16} {:>14.5e} {:>6.4f} {:>14.5e} {:>11} {:>14.5e}\n", e.name, e.inertance,
                   e.inertance_factor, e.compliance, e.isothermal ? "isothermal" : "adiabatic",
                   e.resistance);
}

int runLinear(const LinearOptions& opt, const RunInfo& info)
{
    const auto start = std::chrono::steady_clock::now();
    const std::string out = opt.output.empty()
        ? std::filesystem::path(opt.case_path).stem().string() + (opt.lumped ? "-lumped.h5" : "-linear.h5")
        : opt.output;
    checkOutputFile(out, {opt.case_path, opt.from});
    const CaseDescription d = input::readCaseFile(opt.case_path);
    Machine machine(d);
    std::vector<double> cell_T, solid_T;
    if (!opt.from.empty()) {
        try {
            Hdf5Reader r(opt.from);
            cell_T = r.doubles("/profile/cells/mean_gas_temperature");
            solid_T = r.doubles("/profile/solids/mean_temperature");
        } catch (const H5::Exception& e) {
            throw std::runtime_error(opt.from + ": no mean temperature profile: " + e.getDetailMsg());
        }
    }
    const std::vector<double> y_m = linearMeanState(machine, cell_T, solid_T);
    LinearSolution solution;
    LumpedModel lumped;
    MachinePhasors phasors;
    if (opt.lumped) {
        lumped = solveLumped(machine, y_m);
        phasors = lumped.phasors;
    } else {
        solution = solveLinear(machine, y_m);
        phasors = machinePhasors(machine, firstHarmonics(machine, solution));
    }
    const double wall = std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
    Hdf5Writer w(out);
    writeCaseAttributes(w, machine, info);
    writeLinear(w, machine, opt.lumped ? nullptr : &solution, phasors, opt.lumped ? &lumped : nullptr);
    w.attribute("/linear", "model", std::string(opt.lumped ? "lumped" : "distributed"));
    w.attribute("/linear", "wall_time_s", wall);
    w.commit();
    if (opt.json) {
        nlohmann::json j = toJson(phasors);
        j["case"] = d.name;
        j["model"] = opt.lumped ? "lumped" : "distributed";
        j["frequency_Hz"] = d.frequency;
        j["mean_pressure_Pa"] = opt.lumped ? lumped.elements.front().pressure : solution.p_mean.front();
        j["reference"] = "piston displacement x(t) = X sin(omega t)";
        j["result_file"] = out;
        j["wall_time_s"] = wall;
        if (opt.lumped) j["elements"] = toJson(lumped);
        std::cout << j.dump(2) << std::endl;
        return kExitSuccess;
    }
    if (opt.lumped) printLumped(lumped);
    printPorts(phasors);
    if (!opt.quiet) fmt::print(stderr, "{}: linear analysis in {:.3f} s; wrote {}\n", d.name, wall, out);
    return kExitSuccess;
}

} // namespace

void addLinearCommand(CLI::App& app, Action& action, const CommandContext& context)
{
    auto opt = std::make_shared<LinearOptions>();
    auto* cmd = app.add_subcommand("linear", "frequency-domain (phasor) analysis of a case");
    cmd->add_option("CASE", opt->case_path, "case file (YAML)")->required();
    cmd->add_option("-o,--output", opt->output, "result file (default: CASE name + -linear.h5)");
    cmd->add_option("--from", opt->from,
                    "take the mean temperatures from a converged result file (/profile)");
    cmd->add_flag("--lumped", opt->lumped, "one node per component: the RLC model");
    cmd->add_flag("--json", opt->json, "print the result as JSON on stdout");
    cmd->add_flag("--quiet", opt->quiet, "no note on stderr");
    cmd->callback([&action, opt, context] {
        action = [opt, context] { return runLinear(*opt, RunInfo{context.command_line}); };
    });
}

} // namespace coldtip::cli
