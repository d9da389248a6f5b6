#include "solver/output/LinearResult.hpp"

#include <cmath>

namespace coldtip {

namespace {

double deg(const Complex& z) { return std::arg(z) * 180.0 / M_PI; }

std::vector<std::pair<std::string, double>> summaryValues(const PhasorSummary& s)
{
    return {{"gross_cooling_W", s.gross_cooling_W},
            {"drive_acoustic_power_W", s.drive_acoustic_power_W},
            {"cold_end_acoustic_power_W", s.cold_end_acoustic_power_W},
            {"drive_pressure_amplitude_Pa", s.drive_pressure_amplitude_Pa},
            {"phase_cold_end_deg", s.phase_cold_end_deg},
            {"phase_pulse_tube_warm_end_deg", s.phase_pulse_tube_warm_end_deg},
            {"phase_regenerator_warm_end_deg", s.phase_regenerator_warm_end_deg},
            {"phase_inertance_inlet_deg", s.phase_inertance_inlet_deg}};
}

nlohmann::json summaryJson(const PhasorSummary& s)
{
    nlohmann::json j = nlohmann::json::object();
    for (const auto& [key, value] : summaryValues(s)) j[key] = value;
    return j;
}

//! `name` and `kind` datasets under `group` for a list of things that have both.
template <class Named>
void writeNames(Hdf5Writer& w, const std::string& group, const std::vector<Named>& items)
{
    std::vector<std::string> names, kinds;
    for (const Named& c : items) {
        names.push_back(c.name);
        kinds.push_back(c.kind);
    }
    w.writeStrings(group + "/name", names);
    w.writeStrings(group + "/kind", kinds);
}

//! A finite number or null (JSON has no infinity: a closed end's impedance).
nlohmann::json finite(double v) { return std::isfinite(v) ? nlohmann::json(v) : nlohmann::json(); }

} // namespace

nlohmann::json toJson(const PortPhasor& q)
{
    return {{"pressure_amplitude_Pa", std::abs(q.pressure)},
            {"pressure_phase_deg", deg(q.pressure)},
            {"mass_flow_amplitude_kg_s", std::abs(q.mass_flow)},
            {"mass_flow_phase_deg", deg(q.mass_flow)},
            {"volume_flow_amplitude_m3_s", std::abs(q.volume_flow)},
            {"volume_flow_phase_deg", deg(q.volume_flow)},
            {"flow_phase_deg", q.flowPhaseDeg()},
            {"acoustic_power_W", q.acoustic_power},
            {"enthalpy_flow_W", q.enthalpy_flow}};
}

nlohmann::json toJson(const MachinePhasors& m)
{
    nlohmann::json components = nlohmann::json::object();
    for (const ComponentPhasors& c : m.components) {
        const Complex& z = c.input_impedance;
        components[c.name] = {{"kind", c.kind},
                              {"inlet", toJson(c.inlet)},
                              {"outlet", toJson(c.outlet)},
                              {"input_impedance_Pa_s_m3",
                               {{"real", finite(z.real())},
                                {"imag", finite(z.imag())},
                                {"magnitude", finite(std::abs(z))},
                                {"phase_deg", std::isfinite(z.real()) ? deg(z) : 0.0}}}};
    }
    return {{"components", components}, {"summary", summaryJson(m.summary)}};
}

nlohmann::json toJson(const LumpedModel& lumped)
{
    nlohmann::json out = nlohmann::json::object();
    for (const LumpedElement& e : lumped.elements)
        out[e.name] = {{"kind", e.kind},
                       {"inertance_kg_m4", e.inertance},
                       {"inertance_factor", e.inertance_factor},
                       {"compliance_m3_Pa", e.compliance},
                       {"compliance_law", e.isothermal ? "isothermal" : "adiabatic"},
                       {"resistance_Pa_s_m3", e.resistance},
                       {"gas_volume_m3", e.volume},
                       {"mean_density_kg_m3", e.density},
                       {"mean_pressure_Pa", e.pressure},
                       {"viscosity_Pa_s", e.viscosity}};
    return out;
}

nlohmann::json toJson(const Comparison& c)
{
    nlohmann::json runs = nlohmann::json::array();
    for (const AmplitudeComparison& a : c.amplitudes) {
        nlohmann::json table = nlohmann::json::object(), differences = nlohmann::json::object();
        for (const ComparedQuantity& q : a.table) {
            table[q.key] = {{"nonlinear", q.nonlinear}, {"linear", q.linear}, {"lumped", q.lumped}};
            differences[q.key] = {{"linear", q.linear_difference},
                                  {"lumped", q.lumped_difference},
                                  {"kind", q.phase ? "difference_deg" : "relative"}};
        }
        nlohmann::json harmonics = nlohmann::json::object();
        for (const PortHarmonics& h : a.harmonics) {
            const double p1 = h.pressure[1];
            harmonics[h.component][h.port] = {
                {"mean_pressure_Pa", h.pressure[0]},
                {"pressure_amplitudes_Pa", {h.pressure[1], h.pressure[2], h.pressure[3]}},
                {"mean_mass_flow_kg_s", h.mass_flow[0]},
                {"mass_flow_amplitudes_kg_s", {h.mass_flow[1], h.mass_flow[2], h.mass_flow[3]}},
                {"p2_over_p1", p1 > 0.0 ? h.pressure[2] / p1 : 0.0},
                {"p3_over_p1", p1 > 0.0 ? h.pressure[3] / p1 : 0.0}};
        }
        const nlohmann::json nl = toJson(a.nonlinear), lin = toJson(a.linear), lum = toJson(a.lumped);
        nlohmann::json components = nlohmann::json::object();
        for (const auto& [name, value] : nl["components"].items())
            components[name] = {{"nonlinear", value},
                                {"linear", lin["components"][name]},
                                {"lumped", lum["components"][name]}};
        runs.push_back({{"amplitude_scale", a.scale},
                        {"components", components},
                        {"nonlinear", nl},
                        {"linear", lin},
                        {"lumped", lum},
                        {"table", table},
                        {"relative_differences", differences},
                        {"harmonics", harmonics},
                        {"max_p2_over_p1", a.max_p2_over_p1},
                        {"max_p3_over_p1", a.max_p3_over_p1},
                        {"dft_check", {{"pv_power_exact_W", a.integrals.pv_power_W},
                                       {"pv_power_dft_W", a.pv_power_dft_W},
                                       {"relative_difference", a.dft_check}}},
                        {"converged", a.integrals.converged},
                        {"cycles", a.integrals.cycles},
                        {"wall_time_s", a.integrals.wall_time_s}});
    }
    nlohmann::json out = {{"case", c.case_name}, {"frequency_Hz", c.frequency_Hz}, {"runs", runs}};
    // The first run's view at the top level (the contract of the issue: components,
    // nonlinear, linear, lumped, summary quantities and relative differences).
    if (!runs.empty())
        for (const char* key : {"amplitude_scale", "components", "nonlinear", "linear", "lumped",
                                "table", "relative_differences", "max_p2_over_p1",
                                "max_p3_over_p1", "dft_check"})
            out[key] = runs[0][key];
    return out;
}

void writeCaseAttributes(Hdf5Writer& w, const Machine& machine, const RunInfo& info)
{
    const CaseDescription& d = machine.description();
    writeCaseText(w, machine, info);
    // What a reader of any coldtip file expects (postprocess/coldtip_result.py): the case's
    // name and frequency in /summary and the components in /grid.
    w.attribute("/summary", "case", d.name);
    w.attribute("/summary", "status", std::string("frequency-domain"));
    w.attribute("/summary", "frequency_Hz", d.frequency);
    writeNames(w, "/grid/components", machine.network().components());
}

void writePhasors(Hdf5Writer& w, const std::string& group, const MachinePhasors& m)
{
    const std::string g = group + "/components";
    writeNames(w, g, m.components);
    for (int side = 0; side < 2; ++side) {
        const std::string prefix = side == 0 ? "" : "outlet_";
        std::vector<double> pa, pp, ma, mp, ua, up, fp, ac, en;
        for (const auto& c : m.components) {
            const PortPhasor& q = side == 0 ? c.inlet : c.outlet;
            pa.push_back(std::abs(q.pressure));
            pp.push_back(deg(q.pressure));
            ma.push_back(std::abs(q.mass_flow));
            mp.push_back(deg(q.mass_flow));
            ua.push_back(std::abs(q.volume_flow));
            up.push_back(deg(q.volume_flow));
            fp.push_back(q.flowPhaseDeg());
            ac.push_back(q.acoustic_power);
            en.push_back(q.enthalpy_flow);
        }
        w.write(g + "/" + prefix + "pressure_amplitude", pa, "Pa");
        w.write(g + "/" + prefix + "pressure_phase", pp, "deg");
        w.write(g + "/" + prefix + "mass_flow_amplitude", ma, "kg/s");
        w.write(g + "/" + prefix + "mass_flow_phase", mp, "deg");
        w.write(g + "/" + prefix + "volume_flow_amplitude", ua, "m^3/s");
        w.write(g + "/" + prefix + "volume_flow_phase", up, "deg");
        w.write(g + "/" + prefix + "flow_phase", fp, "deg");
        w.write(g + "/" + prefix + "acoustic_power", ac, "W");
        w.write(g + "/" + prefix + "enthalpy_flow", en, "W");
    }
    std::vector<double> zr, zi;
    for (const auto& c : m.components) {
        zr.push_back(std::isfinite(c.input_impedance.real()) ? c.input_impedance.real() : NAN);
        zi.push_back(std::isfinite(c.input_impedance.imag()) ? c.input_impedance.imag() : NAN);
    }
    w.write(g + "/input_impedance_real", zr, "Pa s/m^3");
    w.write(g + "/input_impedance_imag", zi, "Pa s/m^3");
    for (const auto& [key, value] : summaryValues(m.summary))
        w.attribute(group + "/summary", key, value);
}

void writeLinear(Hdf5Writer& w, const Machine& machine, const LinearSolution* s,
                 const MachinePhasors& phasors, const LumpedModel* lumped)
{
    writePhasors(w, "/linear", phasors);
    w.attribute("/linear", "frequency_Hz", machine.frequency());
    w.attribute("/linear", "reference", std::string("piston displacement x(t) = X sin(omega t)"));
    if (s) {
        const Network& net = machine.network();
        const Complex unit = s->displacement / std::abs(s->displacement);
        std::vector<double> x, pa, pp, ta, tp, tm, pm;
        for (std::size_t i = 0; i < net.cells().size(); ++i) {
            x.push_back(net.cells()[i].x);
            pa.push_back(std::abs(s->pressure[i]));
            pp.push_back(deg(s->pressure[i] / unit));
            ta.push_back(std::abs(s->temperature[i]));
            tp.push_back(deg(s->temperature[i] / unit));
            tm.push_back(s->T_mean[i]);
            pm.push_back(s->p_mean[i]);
        }
        // Ordered by x, with each node's row in /grid (ResultFile.hpp, writeAlongX).
        writeAlongX(w, "/linear/cells", x,
                    {{"mean_pressure", pm, "Pa"},
                     {"mean_temperature", tm, "K"},
                     {"pressure_amplitude", pa, "Pa"},
                     {"pressure_phase", pp, "deg"},
                     {"temperature_amplitude", ta, "K"},
                     {"temperature_phase", tp, "deg"}});
        std::vector<double> xf, ma, mp, ua, up, fp, ac, en;
        for (std::size_t f = 0; f < net.faces().size(); ++f) {
            const FlowFace& face = net.faces()[f];
            const Complex p = 0.5 * (s->pressure[face.from] + s->pressure[face.to]);
            const Complex T = 0.5 * (s->temperature[face.from] + s->temperature[face.to]);
            const Complex m = s->mass_flow[f];
            const Complex U = m / (0.5 * (s->rho_mean[face.from] + s->rho_mean[face.to]));
            xf.push_back(face.x);
            ma.push_back(std::abs(m));
            mp.push_back(deg(m / unit));
            ua.push_back(std::abs(U));
            up.push_back(deg(U / unit));
            fp.push_back(std::abs(p) > 0.0 ? deg(U / p) : 0.0);
            ac.push_back(0.5 * (p * std::conj(U)).real());
            en.push_back(0.5 * net.gas().cp * (m * std::conj(T)).real());
        }
        writeAlongX(w, "/linear/faces", xf,
                    {{"mass_flow_amplitude", ma, "kg/s"},
                     {"mass_flow_phase", mp, "deg"},
                     {"volume_flow_amplitude", ua, "m^3/s"},
                     {"volume_flow_phase", up, "deg"},
                     {"flow_phase_relative_to_pressure", fp, "deg"},
                     {"acoustic_power", ac, "W"},
                     {"enthalpy_flow", en, "W"}});
    }
    if (lumped) {
        std::vector<double> L, C, R, K;
        std::vector<std::string> law;
        for (const LumpedElement& e : lumped->elements) {
            L.push_back(e.inertance);
            C.push_back(e.compliance);
            R.push_back(e.resistance);
            K.push_back(e.inertance_factor);
            law.push_back(e.isothermal ? "isothermal" : "adiabatic");
        }
        w.write("/linear/lumped/inertance", L, "kg/m^4");
        w.write("/linear/lumped/inertance_factor", K, "1");
        w.write("/linear/lumped/compliance", C, "m^3/Pa");
        w.write("/linear/lumped/resistance", R, "Pa s/m^3");
        w.writeStrings("/linear/lumped/compliance_law", law);
    }
}

void writeComparison(Hdf5Writer& w, const Comparison& c)
{
    w.attribute("/compare", "frequency_Hz", c.frequency_Hz);
    std::vector<double> scales;
    for (std::size_t k = 0; k < c.amplitudes.size(); ++k) {
        const AmplitudeComparison& a = c.amplitudes[k];
        scales.push_back(a.scale);
        const std::string g = "/compare/run" + std::to_string(k);
        w.attribute(g, "amplitude_scale", a.scale);
        writePhasors(w, g + "/nonlinear", a.nonlinear);
        writePhasors(w, g + "/linear", a.linear);
        writePhasors(w, g + "/lumped", a.lumped);
        std::vector<std::string> keys;
        std::vector<double> nl, lin, lum, dl, dm;
        for (const ComparedQuantity& q : a.table) {
            keys.push_back(q.key);
            nl.push_back(q.nonlinear);
            lin.push_back(q.linear);
            lum.push_back(q.lumped);
            dl.push_back(q.linear_difference);
            dm.push_back(q.lumped_difference);
        }
        w.writeStrings(g + "/table/key", keys);
        w.write(g + "/table/nonlinear", nl, "see key");
        w.write(g + "/table/linear", lin, "see key");
        w.write(g + "/table/lumped", lum, "see key");
        w.write(g + "/table/linear_difference", dl, "1 or deg");
        w.write(g + "/table/lumped_difference", dm, "1 or deg");
        std::vector<std::string> ports;
        std::vector<double> ph, mh;
        for (const PortHarmonics& h : a.harmonics) {
            ports.push_back(h.component + "." + h.port);
            ph.insert(ph.end(), h.pressure, h.pressure + 4);
            mh.insert(mh.end(), h.mass_flow, h.mass_flow + 4);
        }
        w.writeStrings(g + "/harmonics/port", ports);
        w.write(g + "/harmonics/pressure", ph, ports.size(), 4, "Pa");
        w.write(g + "/harmonics/mass_flow", mh, ports.size(), 4, "kg/s");
        w.attribute(g, "pv_power_exact_W", a.integrals.pv_power_W);
        w.attribute(g, "pv_power_dft_W", a.pv_power_dft_W);
        w.attribute(g, "dft_check", a.dft_check);
        w.attribute(g, "max_p2_over_p1", a.max_p2_over_p1);
        w.attribute(g, "max_p3_over_p1", a.max_p3_over_p1);
    }
    w.write("/compare/amplitude_scale", scales, "1");
}

} // namespace coldtip
