#include "solver/output/ResultFile.hpp"

#include <algorithm>
#include <cmath>
#include <complex>
#include <cstdint>
#include <fmt/format.h>
#include <stdexcept>

#include "solver/cycle/Harmonics.hpp"
#include "solver/input/InputError.hpp"
#include "solver/output/Hdf5File.hpp"

namespace coldtip {

namespace {

void writeGrid(Hdf5Writer& w, const Machine& machine)
{
    const Network& net = machine.network();
    std::vector<double> x, volume, flow_area, length;
    std::vector<long> component;
    std::vector<std::string> names;
    for (const GasCell& c : net.cells()) {
        x.push_back(c.x);
        volume.push_back(c.volume);
        flow_area.push_back(c.flow_area);
        length.push_back(c.length);
        component.push_back(c.component);
        names.push_back(c.name);
    }
    w.write("/grid/cells/x", x, "m");
    w.write("/grid/cells/volume", volume, "m^3");
    w.write("/grid/cells/flow_area", flow_area, "m^2");
    w.write("/grid/cells/length", length, "m");
    w.write("/grid/cells/component", component, "1");
    w.writeStrings("/grid/cells/name", names);

    x.clear(), flow_area.clear(), component.clear(), names.clear();
    for (const FlowFace& f : net.faces()) {
        x.push_back(f.x);
        component.push_back(f.component);
        names.push_back(f.name);
        flow_area.push_back(std::min(net.cells()[f.from].flow_area > 0 ? net.cells()[f.from].flow_area : 1e300,
                                     net.cells()[f.to].flow_area > 0 ? net.cells()[f.to].flow_area : 1e300));
    }
    w.write("/grid/faces/x", x, "m");
    w.write("/grid/faces/flow_area", flow_area, "m^2");
    w.write("/grid/faces/component", component, "1");
    w.writeStrings("/grid/faces/name", names);

    x.clear(), component.clear(), names.clear();
    for (const SolidNode& s : net.solids()) {
        x.push_back(s.x);
        component.push_back(s.component);
        names.push_back(s.name);
    }
    w.write("/grid/solids/x", x, "m");
    w.write("/grid/solids/component", component, "1");
    w.writeStrings("/grid/solids/name", names);

    std::vector<std::string> kinds;
    std::vector<double> x0, x1;
    names.clear();
    for (const ComponentSlice& s : net.components()) {
        names.push_back(s.name);
        kinds.push_back(s.kind);
        x0.push_back(s.x_start);
        x1.push_back(s.x_end);
    }
    w.writeStrings("/grid/components/name", names);
    w.writeStrings("/grid/components/kind", kinds);
    w.write("/grid/components/x_start", x0, "m");
    w.write("/grid/components/x_end", x1, "m");
}

//! Sampled cycle: pressure, temperature, mass flow, solid temperature, drive.
void writeCycle(Hdf5Writer& w, const Machine& machine, const CycleSamples& s)
{
    const Network& net = machine.network();
    const GasProperties& gas = net.gas();
    const std::size_t n = s.time.size(), nc = net.cells().size(), nf = net.faces().size(),
                      ns = net.solids().size();
    std::vector<double> p(n * nc), T(n * nc), mdot(n * nf), Ts(n * ns), xd(n), Vd(n);
    const MovingBoundary& piston = machine.drive().piston();
    for (std::size_t j = 0; j < n; ++j) {
        const auto& y = s.state[j];
        for (std::size_t i = 0; i < nc; ++i) {
            const GasCell& c = net.cells()[i];
            p[j * nc + i] = (gas.gamma - 1.0) * y[c.offset + 1] / c.volumeAt(s.time[j]);
            T[j * nc + i] = y[c.offset + 1] / (y[c.offset] * gas.cv);
        }
        for (std::size_t f = 0; f < nf; ++f) mdot[j * nf + f] = y[net.faces()[f].offset];
        for (std::size_t k = 0; k < ns; ++k) Ts[j * ns + k] = y[net.solids()[k].offset];
        xd[j] = piston.scale * piston.amplitude * std::sin(piston.omega * s.time[j]);
        Vd[j] = piston.volume(s.time[j]);
    }
    w.write("/cycle/time", s.time, "s");
    w.write("/cycle/pressure", p, n, nc, "Pa");
    w.write("/cycle/gas_temperature", T, n, nc, "K");
    w.write("/cycle/mass_flow", mdot, n, nf, "kg/s");
    w.write("/cycle/solid_temperature", Ts, n, ns, "K");
    w.write("/cycle/drive_position", xd, "m");
    w.write("/cycle/drive_volume", Vd, "m^3");
}

void writeHistory(Hdf5Writer& w, const Machine& machine, const std::vector<HistoryRow>& h)
{
    std::vector<long> cycle, steps, rhs, jac;
    std::vector<double> time, Tc, Qc, gross, pv, err, res, dT, distance, wall, boundary;
    for (const HistoryRow& r : h) {
        cycle.push_back(r.cycle);
        time.push_back(r.time);
        // A test rig (no cold exchanger) has no cold temperature or cooling: NaN, not 0.
        const bool cooler = machine.coldComponent() >= 0;
        Tc.push_back(cooler ? r.metrics.cold_temperature : std::nan(""));
        Qc.push_back(cooler ? r.metrics.cooling_power : std::nan(""));
        gross.push_back(cooler ? r.metrics.gross_cooling : std::nan(""));
        pv.push_back(r.metrics.pv_power);
        err.push_back(r.metrics.energy_balance_error);
        res.push_back(r.metrics.heat_residual);
        dT.push_back(r.metrics.max_temperature_change);
        distance.push_back(r.metrics.distance_estimate);
        steps.push_back(r.work.steps);
        rhs.push_back(r.work.rhs_evaluations);
        jac.push_back(r.work.jacobian_evaluations);
        wall.push_back(r.wall_time_s);
        boundary.insert(boundary.end(), r.boundary_enthalpy.begin(), r.boundary_enthalpy.end());
    }
    w.write("/history/cycle", cycle, "1");
    w.write("/history/time", time, "s");
    w.write("/history/cold_temperature", Tc, "K");
    w.write("/history/cooling_power", Qc, "W");
    w.write("/history/gross_cooling_power", gross, "W");
    w.write("/history/pv_power", pv, "W");
    w.write("/history/energy_balance_error", err, "1");
    w.write("/history/steady_residual", res, "1");
    w.write("/history/max_temperature_change", dT, "K");
    w.write("/history/distance_estimate", distance, "K");
    w.write("/history/steps", steps, "1");
    w.write("/history/rhs_evaluations", rhs, "1");
    w.write("/history/jacobian_evaluations", jac, "1");
    w.write("/history/wall_time", wall, "s");
    const std::vector<std::string> names = boundaryEnthalpyNames(machine);
    w.write("/history/boundary_enthalpy_flow", boundary, h.size(), names.size(), "W");
    w.writeStrings("/history/boundary_name", names);
}

//! Cycle averages along the machine: exact integrals for enthalpy flow, conduction and wall
//! heat; acoustic power and amplitudes from the sampled cycle.
void writeProfile(Hdf5Writer& w, const Machine& machine, const SteadyOutcome& out)
{
    using K = QuadratureChannel::Kind;
    const Network& net = machine.network();
    const auto& channels = net.quadratures();
    const auto& avg = out.last.averages;
    // Along the main path, ordered by x: a link (double-inlet valve) runs beside the path, so
    // its enthalpy flow is not a point of the path's curve; it is in /profile/links.
    auto series = [&](K kind, const std::string& path, const std::string& units) {
        std::vector<std::size_t> chosen;
        for (std::size_t i = 0; i < channels.size(); ++i)
            if (channels[i].kind == kind &&
                !(channels[i].component >= 0 && net.components()[channels[i].component].kind == "valve"))
                chosen.push_back(i);
        std::stable_sort(chosen.begin(), chosen.end(),
                         [&](std::size_t a, std::size_t b) { return channels[a].x < channels[b].x; });
        std::vector<double> x, v;
        std::vector<std::string> names;
        for (std::size_t i : chosen) {
            x.push_back(channels[i].x);
            v.push_back(avg.empty() ? std::nan("") : avg[i]);
            names.push_back(channels[i].name);
        }
        w.write(path + "/x", x, "m");
        w.write(path + "/value", v, units);
        w.writeStrings(path + "/name", names);
    };
    series(K::EnthalpyFlow, "/profile/enthalpy_flow", "W");
    series(K::GasConduction, "/profile/gas_conduction", "W");
    series(K::WallHeat, "/profile/wall_heat", "W");
    const std::vector<LinkFlow> links = linkFlows(machine, out);
    if (!links.empty()) {
        std::vector<std::string> names, from, to;
        std::vector<double> x_from, x_to, mdot, H;
        for (const LinkFlow& l : links) {
            names.push_back(l.name);
            from.push_back(l.from);
            to.push_back(l.to);
            x_from.push_back(l.x_from);
            x_to.push_back(l.x_to);
            mdot.push_back(l.mean_mass_flow);
            H.push_back(l.enthalpy_flow);
        }
        w.writeStrings("/profile/links/name", names);
        w.writeStrings("/profile/links/from", from);
        w.writeStrings("/profile/links/to", to);
        w.write("/profile/links/x_from", x_from, "m");
        w.write("/profile/links/x_to", x_to, "m");
        w.write("/profile/links/mean_mass_flow", mdot, "kg/s");
        w.write("/profile/links/enthalpy_flow", H, "W");
    }

    const CycleSamples& s = out.samples;
    const std::size_t n = s.time.size();
    if (n == 0) return;
    const GasProperties& gas = net.gas();
    // Phases relative to the piston displacement x(t) = X sin(omega t), as in /linear and
    // /compare: the samples start on a period boundary, where the displacement's first
    // harmonic is -i X (x(t) = Re[x1 e^{i omega t}]).
    const std::complex<double> displacement(0.0, -1.0);
    const std::size_t nc = net.cells().size();
    std::vector<double> T_mean(nc), p_mean(nc), p_amp(nc), p_phase(nc);
    std::vector<std::vector<double>> p(nc, std::vector<double>(n)), rho(nc, std::vector<double>(n));
    for (std::size_t i = 0; i < nc; ++i) {
        const GasCell& c = net.cells()[i];
        std::vector<double> T(n);
        for (std::size_t j = 0; j < n; ++j) {
            const auto& y = s.state[j];
            const double V = c.volumeAt(s.time[j]);
            p[i][j] = (gas.gamma - 1.0) * y[c.offset + 1] / V;
            rho[i][j] = y[c.offset] / V;
            T[j] = y[c.offset + 1] / (y[c.offset] * gas.cv);
        }
        T_mean[i] = cycleMean(T);
        p_mean[i] = cycleMean(p[i]);
        const auto p1 = harmonic(p[i], 1);
        p_amp[i] = std::abs(p1);
        p_phase[i] = std::arg(p1 / displacement) * 180.0 / M_PI;
    }
    std::vector<double> xc;
    for (const GasCell& c : net.cells()) xc.push_back(c.x);
    writeAlongX(w, "/profile/cells", xc,
                {{"mean_gas_temperature", T_mean, "K"},
                 {"mean_pressure", p_mean, "Pa"},
                 {"pressure_amplitude", p_amp, "Pa"},
                 {"pressure_phase", p_phase, "deg"}});

    const std::size_t nf = net.faces().size();
    std::vector<double> xf(nf), acoustic(nf), m_amp(nf), m_phase(nf), flow_vs_p(nf);
    for (std::size_t f = 0; f < nf; ++f) {
        const FlowFace& face = net.faces()[f];
        std::vector<double> pf(n), U(n), m(n), pU(n);
        for (std::size_t j = 0; j < n; ++j) {
            pf[j] = 0.5 * (p[face.from][j] + p[face.to][j]);
            m[j] = s.state[j][face.offset];
            U[j] = m[j] / (0.5 * (rho[face.from][j] + rho[face.to][j]));
            pU[j] = pf[j] * U[j];
        }
        xf[f] = face.x;
        acoustic[f] = cycleMean(pU) - cycleMean(pf) * cycleMean(U);
        const auto m1 = harmonic(m, 1), p1 = harmonic(pf, 1);
        m_amp[f] = std::abs(m1);
        m_phase[f] = std::arg(m1 / displacement) * 180.0 / M_PI;
        flow_vs_p[f] = std::arg(m1 / p1) * 180.0 / M_PI;
    }
    writeAlongX(w, "/profile/faces", xf,
                {{"acoustic_power", acoustic, "W"},
                 {"mass_flow_amplitude", m_amp, "kg/s"},
                 {"mass_flow_phase", m_phase, "deg"},
                 {"flow_phase_relative_to_pressure", flow_vs_p, "deg"}});

    const std::size_t ns = net.solids().size();
    std::vector<double> xs(ns), Ts(ns);
    for (std::size_t k = 0; k < ns; ++k) {
        std::vector<double> T(n);
        for (std::size_t j = 0; j < n; ++j) T[j] = s.state[j][net.solids()[k].offset];
        xs[k] = net.solids()[k].x;
        Ts[k] = cycleMean(T);
    }
    writeAlongX(w, "/profile/solids", xs, {{"mean_temperature", Ts, "K"}});
}

std::string unitsOf(const std::string& key)
{
    if (key.ends_with("_kg_s")) return "kg/s";
    if (key.ends_with("_per_s")) return "1/s";
    if (key.ends_with("_W")) return "W";
    if (key.ends_with("_K")) return "K";
    if (key.ends_with("_Hz")) return "Hz";
    if (key.ends_with("_Pa")) return "Pa";
    if (key.ends_with("_s")) return "s";
    return "1";
}

} // namespace

void writeAlongX(Hdf5Writer& w, const std::string& group, const std::vector<double>& x,
                 std::initializer_list<AlongX> series)
{
    std::vector<long> order(x.size());
    for (std::size_t i = 0; i < x.size(); ++i) order[i] = static_cast<long>(i);
    std::stable_sort(order.begin(), order.end(), [&](long a, long b) { return x[a] < x[b]; });
    auto permuted = [&](const std::vector<double>& v) {
        std::vector<double> out;
        out.reserve(order.size());
        for (long i : order) out.push_back(v[i]);
        return out;
    };
    w.write(group + "/x", permuted(x), "m");
    w.write(group + "/index", order, "1");
    for (const AlongX& s : series) w.write(group + "/" + s.name, permuted(s.values), s.units);
}

void writeCaseText(Hdf5Writer& w, const Machine& machine, const RunInfo& info)
{
    const CaseDescription& d = machine.description();
    w.attribute("/case", "text", d.source_text);
    w.attribute("/case", "path", d.source_path);
    w.attribute("/case", "name", d.name);
    w.attribute("/case", "tool_version", std::string("coldtip ") + COLDTIP_VERSION);
    w.attribute("/case", "command_line", info.command_line);
}

namespace {

//! Integrator effort as attributes of `group` (/solver: the run's; /state: up to the
//! restart point).
void writeEffort(Hdf5Writer& w, const std::string& group, const IntegratorStats& work)
{
    w.attribute(group, "steps", work.steps);
    w.attribute(group, "rhs_evaluations", work.rhs_evaluations);
    w.attribute(group, "jacobian_evaluations", work.jacobian_evaluations);
    w.attribute(group, "linear_setups", work.linear_setups);
    w.attribute(group, "error_test_failures", work.error_test_failures);
    w.attribute(group, "nonlinear_iterations", work.nonlinear_iterations);
    w.attribute(group, "nonlinear_failures", work.nonlinear_failures);
}

//! /state: where --resume continues. A finished run (converged, failed) saves its last
//! cycle's end as a fresh start (a warm start); an unfinished one (running, interrupted,
//! not converged) its restart point, from which the continuation follows the path the run
//! would have taken (RestartPoint.hpp), with the counts up to there.
void writeRestartState(Hdf5Writer& w, const Machine& machine, const SteadyOutcome& out)
{
    RestartPoint p = out.restart;
    if (out.converged || out.failed || p.state.empty()) {
        p = RestartPoint{};
        p.period_index = out.period_index;
        p.state = out.state;
        p.history_rows = out.history.size();
        p.newton_steps = out.diagnostics.newton_residual.size();
        p.newton_iterations = out.diagnostics.newton_iterations;
        p.cycle_equivalents = out.diagnostics.cycle_equivalents;
        p.work = out.diagnostics.work;
        p.wall_time_s = out.wall_time_s;
    }
    std::vector<std::string> names;
    for (int k = 0; k < machine.network().size(); ++k) names.push_back(machine.network().stateName(k));
    w.write("/state/y", p.state, "SI (see name)");
    w.writeStrings("/state/name", names);
    w.attribute("/state", "period_index", p.period_index);
    w.attribute("/state", "cycles", static_cast<long>(out.history.size()));
    w.attribute("/state", "case_hash", caseHash(machine.description()));
    w.attribute("/state", "tool_version", std::string("coldtip ") + COLDTIP_VERSION);
    w.attribute("/state", "history_rows", static_cast<long>(p.history_rows));
    w.attribute("/state", "newton_steps", static_cast<long>(p.newton_steps));
    w.attribute("/state", "newton_iterations", static_cast<long>(p.newton_iterations));
    w.attribute("/state", "cycle_equivalents", p.cycle_equivalents);
    w.attribute("/state", "wall_time_s", p.wall_time_s);
    writeEffort(w, "/state", p.work);
    const ShootingCheckpoint& c = p.shooting;
    w.attribute("/state", "newton_iteration", static_cast<long>(c.iteration));
    w.attribute("/state", "periods_per_map", static_cast<long>(c.cycles_per_map));
    w.attribute("/state", "krylov_forcing", c.forcing);
    w.attribute("/state", "previous_residual", c.previous_residual);
    w.attribute("/state", "tighten", static_cast<long>(c.tighten));
    w.attribute("/state", "accepted_correction", c.accepted_correction);
}

void writeRunResultFile(const std::string& path, const Machine& machine,
                        const SteadyOutcome& out, const RunSummary& summary, const RunInfo& info,
                        const std::function<void(Hdf5Writer&)>& more)
{
    Hdf5Writer w(path);
    const CaseDescription& d = machine.description();
    writeCaseText(w, machine, info);
    writeGrid(w, machine);
    if (!out.samples.time.empty()) writeCycle(w, machine, out.samples);
    writeHistory(w, machine, out.history);
    writeProfile(w, machine, out);

    for (const SummaryValue& v : summary.values) w.attribute("/summary", v.key, v.value);
    std::vector<SummaryValue> link_values;
    for (const LinkFlow& l : summary.links) {
        link_values.push_back({"link." + l.name + ".mean_mass_flow_kg_s", l.mean_mass_flow});
        link_values.push_back({"link." + l.name + ".enthalpy_flow_W", l.enthalpy_flow});
    }
    for (const SummaryValue& v : link_values) w.attribute("/summary", v.key, v.value);
    w.attribute("/summary", "machine", summary.machine);
    std::string notes;
    for (const std::string& n : summary.notes) notes += (notes.empty() ? "" : "\n") + n;
    if (!notes.empty()) w.attribute("/summary", "notes", notes);
    w.attribute("/summary", "case", summary.case_name);
    w.attribute("/summary", "status", summary.status);
    w.attribute("/summary", "failure", summary.failure);
    std::string units;
    for (const SummaryValue& v : summary.values) units += v.key + ":" + unitsOf(v.key) + ";";
    for (const SummaryValue& v : link_values) units += v.key + ":" + unitsOf(v.key) + ";";
    w.attribute("/summary", "units", units);

    const SolverSpec& sv = d.solver;
    w.attribute("/solver", "relative_tolerance", sv.relative_tolerance);
    w.attribute("/solver", "max_order", static_cast<long>(sv.max_order));
    w.attribute("/solver", "states", static_cast<long>(machine.network().size()));
    w.attribute("/solver", "jacobian_nonzeros", machine.network().pattern().nnz());
    w.attribute("/solver", "quadratures", static_cast<long>(machine.network().nQuadratures()));

    const SolverDiagnostics& dg = out.diagnostics;
    w.attribute("/solver", "cycle_equivalents", dg.cycle_equivalents);
    writeEffort(w, "/solver", dg.work);
    w.attribute("/solver", "method", d.solver.steady.method);
    if (dg.newton_iterations > 0) {
        // Newton steps and the dominant Floquet multipliers (modulus, argument) per step.
        std::vector<double> krylov(dg.krylov_iterations.begin(), dg.krylov_iterations.end());
        w.write("/solver/newton/residual", dg.newton_residual, "K");
        w.write("/solver/newton/krylov_iterations", krylov, "1");
        w.write("/solver/newton/correction", dg.newton_correction, "K");
        w.write("/solver/newton/periods_per_map",
                std::vector<double>(dg.periods_per_map.begin(), dg.periods_per_map.end()), "1");
        std::size_t width = 0;
        for (const auto& f : dg.floquet) width = std::max(width, f.size());
        std::vector<double> modulus(dg.floquet.size() * width, 0.0), argument(modulus.size(), 0.0);
        for (std::size_t i = 0; i < dg.floquet.size(); ++i)
            for (std::size_t j = 0; j < dg.floquet[i].size(); ++j) {
                modulus[i * width + j] = std::abs(dg.floquet[i][j]);
                argument[i * width + j] = std::arg(dg.floquet[i][j]) * 180.0 / M_PI;
            }
        w.write("/solver/newton/floquet_modulus", modulus, dg.floquet.size(), width, "1");
        w.write("/solver/newton/floquet_argument", argument, dg.floquet.size(), width, "deg");
    }
    writeRestartState(w, machine, out);
    if (more) more(w);
    w.commit();
}

} // namespace

void writeRunResult(const std::string& path, const Machine& machine, const SteadyOutcome& out,
                    const RunSummary& summary, const RunInfo& info,
                    const std::function<void(Hdf5Writer&)>& more)
{
    try {
        writeRunResultFile(path, machine, out, summary, info, more);
    } catch (const H5::Exception& e) {
        throw std::runtime_error(path + ": cannot write the result: " + e.getDetailMsg());
    }
}

std::string caseHash(const CaseDescription& d)
{
    // FNV-1a, 64 bits (Fowler, Noll and Vo; IETF draft-eastlake-fnv): stable across builds
    // and platforms, unlike std::hash.
    std::uint64_t h = 1469598103934665603ull;
    for (unsigned char c : d.source_text) {
        h ^= c;
        h *= 1099511628211ull;
    }
    return fmt::format("fnv1a64:{:016x}", h);
}

namespace {

//! A resume refused: bad input (exit 1), naming the file.
[[noreturn]] void refuseResume(const std::string& path, const std::string& problem,
                               const std::string& expected)
{
    throw input::InputError({path, 0, 0, ""}, "cannot resume from it: " + problem, expected);
}

std::vector<HistoryRow> readHistory(const Hdf5Reader& r, std::size_t rows)
{
    std::vector<HistoryRow> h;
    if (rows == 0) return h;
    auto column = [&](const char* name) {
        std::vector<double> v = r.doubles(std::string("/history/") + name);
        if (v.size() < rows)
            throw std::runtime_error(std::string("/history/") + name + " is shorter than the "
                                     "saved history");
        return v;
    };
    const auto cycle = column("cycle"), time = column("time"), Tc = column("cold_temperature"),
               Qc = column("cooling_power"), gross = column("gross_cooling_power"),
               pv = column("pv_power"), err = column("energy_balance_error"),
               res = column("steady_residual"), dT = column("max_temperature_change"),
               distance = column("distance_estimate"), steps = column("steps"),
               rhs = column("rhs_evaluations"), jac = column("jacobian_evaluations"),
               wall = column("wall_time");
    const std::vector<double> boundary = r.doubles("/history/boundary_enthalpy_flow");
    const std::size_t width = cycle.empty() ? 0 : boundary.size() / cycle.size();
    for (std::size_t i = 0; i < rows; ++i) {
        HistoryRow row;
        row.cycle = static_cast<long>(cycle[i]);
        row.time = time[i];
        row.metrics.cold_temperature = Tc[i];
        row.metrics.cooling_power = Qc[i];
        row.metrics.gross_cooling = gross[i];
        row.metrics.pv_power = pv[i];
        row.metrics.energy_balance_error = err[i];
        row.metrics.heat_residual = res[i];
        row.metrics.max_temperature_change = dT[i];
        row.metrics.distance_estimate = distance[i];
        row.work.steps = static_cast<long>(steps[i]);
        row.work.rhs_evaluations = static_cast<long>(rhs[i]);
        row.work.jacobian_evaluations = static_cast<long>(jac[i]);
        row.wall_time_s = wall[i];
        row.boundary_enthalpy.assign(boundary.begin() + i * width,
                                     boundary.begin() + (i + 1) * width);
        h.push_back(std::move(row));
    }
    return h;
}

SolverDiagnostics readDiagnostics(const Hdf5Reader& r, const RestartPoint& p)
{
    SolverDiagnostics d;
    d.cycle_equivalents = p.cycle_equivalents;
    d.work = p.work;
    d.newton_iterations = p.newton_iterations;
    const std::size_t n = p.newton_steps;
    if (n == 0) return d;
    auto first = [&](const char* name) {
        std::vector<double> v = r.doubles(std::string("/solver/newton/") + name);
        if (v.size() < n) throw std::runtime_error(std::string("/solver/newton/") + name +
                                                   " is shorter than the saved Newton steps");
        return v;
    };
    const auto res = first("residual"), krylov = first("krylov_iterations"),
               corr = first("correction"), k = first("periods_per_map");
    d.newton_residual.assign(res.begin(), res.begin() + n);
    d.newton_correction.assign(corr.begin(), corr.begin() + n);
    for (std::size_t i = 0; i < n; ++i) {
        d.krylov_iterations.push_back(static_cast<int>(krylov[i]));
        d.periods_per_map.push_back(static_cast<int>(k[i]));
    }
    const auto modulus = r.doubles("/solver/newton/floquet_modulus");
    const auto argument = r.doubles("/solver/newton/floquet_argument");
    const std::size_t rows = res.size(), width = rows ? modulus.size() / rows : 0;
    for (std::size_t i = 0; i < n; ++i) {
        std::vector<std::complex<double>> mu;
        for (std::size_t j = 0; j < width && modulus[i * width + j] > 0.0; ++j)
            mu.push_back(std::polar(modulus[i * width + j], argument[i * width + j] * M_PI / 180.0));
        d.floquet.push_back(std::move(mu));
    }
    return d;
}

} // namespace

SavedState readSavedState(const std::string& path, const Machine& machine)
{
    const Network& net = machine.network();
    try {
        Hdf5Reader r(path);
        SavedState s;
        if (!r.exists("/state/y"))
            refuseResume(path, "it holds no saved state", "a result file of `coldtip run`");
        // Tied to its case and to the tool version: a state of another case with the same
        // network would start a different problem from a foreign state.
        auto attribute = [&](const char* name) {
            return r.hasAttribute("/state", name) ? r.stringAttribute("/state", name)
                                                  : std::string();
        };
        const std::string version = attribute("tool_version"), hash = attribute("case_hash");
        const std::string this_version = std::string("coldtip ") + COLDTIP_VERSION;
        if (hash.empty())
            refuseResume(path, "its state is not tied to a case (written by an older coldtip)",
                         "a result written by " + this_version + " for this case");
        if (version != this_version)
            refuseResume(path, "it was written by " + version + ", this is " + this_version,
                         "a result written by " + this_version + " for this case");
        if (hash != caseHash(machine.description()))
            refuseResume(path,
                         "it was computed for another case (its case text differs from " +
                             machine.description().source_path + ")",
                         "the result of this case file, or another output file (-o)");
        s.state = r.doubles("/state/y");
        s.names = r.strings("/state/name");
        s.period_index = r.longAttribute("/state", "period_index");
        if (static_cast<int>(s.state.size()) != net.size())
            refuseResume(path, "its state has " + std::to_string(s.state.size()) +
                                   " variables, the case has " + std::to_string(net.size()),
                         "a result of this case");
        for (int k = 0; k < net.size(); ++k)
            if (s.names[k] != net.stateName(k))
                refuseResume(path, "its state variable " + std::to_string(k) + " is " +
                                       s.names[k] + ", the case's is " + net.stateName(k),
                             "a result of this case");
        RestartPoint& p = s.start.point;
        p.period_index = s.period_index;
        p.state = s.state;
        p.history_rows = static_cast<std::size_t>(r.longAttribute("/state", "history_rows"));
        p.newton_steps = static_cast<std::size_t>(r.longAttribute("/state", "newton_steps"));
        p.newton_iterations = static_cast<int>(r.longAttribute("/state", "newton_iterations"));
        p.cycle_equivalents = r.longAttribute("/state", "cycle_equivalents");
        p.wall_time_s = r.doubleAttribute("/state", "wall_time_s");
        p.work.steps = r.longAttribute("/state", "steps");
        p.work.rhs_evaluations = r.longAttribute("/state", "rhs_evaluations");
        p.work.jacobian_evaluations = r.longAttribute("/state", "jacobian_evaluations");
        p.work.linear_setups = r.longAttribute("/state", "linear_setups");
        p.work.error_test_failures = r.longAttribute("/state", "error_test_failures");
        p.work.nonlinear_iterations = r.longAttribute("/state", "nonlinear_iterations");
        p.work.nonlinear_failures = r.longAttribute("/state", "nonlinear_failures");
        ShootingCheckpoint& c = p.shooting;
        c.iteration = static_cast<int>(r.longAttribute("/state", "newton_iteration"));
        c.cycles_per_map = static_cast<int>(r.longAttribute("/state", "periods_per_map"));
        c.forcing = r.doubleAttribute("/state", "krylov_forcing");
        c.previous_residual = r.doubleAttribute("/state", "previous_residual");
        c.tighten = r.longAttribute("/state", "tighten") != 0;
        c.accepted_correction = r.doubleAttribute("/state", "accepted_correction");
        s.start.history = readHistory(r, p.history_rows);
        s.start.diagnostics = readDiagnostics(r, p);
        return s;
    } catch (const input::InputError&) {
        throw;
    } catch (const H5::Exception& e) {
        refuseResume(path, "cannot read its saved state: " + e.getDetailMsg(),
                     "a readable result file of `coldtip run`");
    } catch (const std::exception& e) {
        refuseResume(path, e.what(), "a readable result file of `coldtip run`");
    }
}

} // namespace coldtip
