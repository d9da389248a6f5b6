#include "solver/linear/LumpedModel.hpp"

#include <Eigen/Dense>
#include <cmath>

#include "models/correlations/OpenTube.hpp"
#include "models/correlations/OrificeFlow.hpp"
#include "solver/network/elements/OrificeLink.hpp"

namespace coldtip {

namespace {

//! Below this r0/delta_nu the Poiseuille profile holds (Womersley's L' within 1.5 % of
//! 4/3 up to alpha = 2.8; physics reference §6.5).
constexpr double kPoiseuilleRatio = 2.0;

LumpedElement elementOf(const Machine& machine, const ComponentSlice& s,
                        const std::vector<double>& y)
{
    const Network& net = machine.network();
    const GasProperties& gas = net.gas();
    LumpedElement e;
    e.name = s.name;
    e.kind = s.kind;
    if (s.first_cell < 0) return e;
    const MovingBoundary& piston = machine.drive().piston();
    double mass = 0.0, energy = 0.0;
    const GasCell& first = net.cells()[s.first_cell];
    for (int i = s.first_cell; i <= s.last_cell; ++i) {
        const GasCell& c = net.cells()[i];
        e.volume += c.piston ? piston.meanVolume() : c.volume;
        e.length += c.length;
        mass += y[c.offset];
        energy += y[c.offset + 1];
    }
    e.flow_area = first.flow_area;
    e.density = mass / e.volume;
    e.pressure = (gas.gamma - 1.0) * energy / e.volume;
    const double T = energy / (mass * gas.cv);
    e.viscosity = gas.transport->viscosity(T, e.density).value;
    const double omega = piston.omega;
    const models::FlowPassage* passage = first.passage;
    if (passage && e.length > 0.0) {
        const double dh = passage->hydraulicDiameter();
        const bool tube = dynamic_cast<const models::OpenTube*>(passage) != nullptr;
        const double delta_nu = std::sqrt(2.0 * e.viscosity / (e.density * omega));
        e.inertance_factor = tube && 0.5 * dh / delta_nu <= kPoiseuilleRatio ? 4.0 / 3.0 : 1.0;
        e.inertance = e.inertance_factor * e.density * e.length / e.flow_area;
        const double fRe = passage->frictionTimesReynolds(0.0).value;
        e.resistance = fRe * e.viscosity * e.length / (2.0 * e.flow_area * dh * dh);
        // Heat exchange with a wall or matrix: any wall-heat channel of this component.
        bool exchanges = false;
        for (const QuadratureChannel& q : net.quadratures())
            if (q.kind == QuadratureChannel::Kind::WallHeat && &net.components()[q.component] == &s)
                exchanges = true;
        const double k = gas.transport->conductivity(T, e.density).value;
        const double delta_kappa = std::sqrt(2.0 * k / (e.density * gas.cp * omega));
        e.isothermal = exchanges && 0.25 * dh < delta_kappa;
    }
    e.compliance = e.volume / ((e.isothermal ? 1.0 : gas.gamma) * e.pressure);
    return e;
}

//! Conductance d mdot/d dp [kg/(s Pa)] of an orifice element at zero pressure difference.
double orificeConductance(const OrificeLink& o, double p, double T, const GasProperties& gas)
{
    return models::orificeMassFlow(p, T, p, T, o.dischargeArea(), gas.R, gas.gamma).d_dpa;
}

} // namespace

LumpedModel solveLumped(const Machine& machine, const std::vector<double>& y)
{
    const Network& net = machine.network();
    const GasProperties& gas = net.gas();
    const auto& slices = net.components();
    const int nk = static_cast<int>(slices.size());
    LumpedModel out;
    for (const ComponentSlice& s : slices) out.elements.push_back(elementOf(machine, s, y));

    // Nodes: components with gas.
    std::vector<int> node(nk, -1);
    int nn = 0;
    for (int k = 0; k < nk; ++k)
        if (slices[k].first_cell >= 0) node[k] = nn++;
    auto componentOfCell = [&](int cell) {
        for (int k = 0; k < nk; ++k)
            if (slices[k].first_cell <= cell && cell <= slices[k].last_cell) return k;
        return -1;
    };
    const MovingBoundary& piston = machine.drive().piston();
    const double omega = piston.omega;
    const Complex iw(0.0, omega);
    auto half = [&](int k) {
        const LumpedElement& e = out.elements[k];
        return e.density > 0.0 ? (e.resistance + iw * e.inertance) / (2.0 * e.density)
                               : Complex(0.0);
    };

    // Branches (mass-flow form): a -> b with impedance Z; `orifice` its in-line orifice.
    struct Branch {
        int a, b, orifice;
        Complex Z;
    };
    std::vector<Branch> branches;
    std::vector<double> orifice_conductance(nk, 0.0);
    int previous = -1;
    for (int k = 0; k < nk; ++k) {
        const bool link = slices[k].kind == "valve";
        if (slices[k].first_cell < 0 || link) {
            // Orifices and links: find their element.
            for (const auto& el : net.elements()) {
                const auto* o = dynamic_cast<const OrificeLink*>(el.get());
                if (!o || o->describe().rfind("orifice " + slices[k].name + " (", 0) != 0) continue;
                int a = -1, b = -1;
                for (std::size_t i = 0; i < net.cells().size(); ++i) {
                    if (net.cells()[i].offset == o->stencil().input(0)) a = static_cast<int>(i);
                    if (net.cells()[i].offset == o->stencil().input(2)) b = static_cast<int>(i);
                }
                const LumpedElement& up = out.elements[componentOfCell(a)];
                const double T = up.pressure / (up.density * gas.R);
                orifice_conductance[k] = orificeConductance(*o, up.pressure, T, gas);
                out.elements[k].resistance = up.density / orifice_conductance[k];
                if (link)
                    branches.push_back({componentOfCell(a), componentOfCell(b), k,
                                        1.0 / orifice_conductance[k]});
            }
            continue;
        }
        if (previous >= 0) {
            Complex Z = half(previous) + half(k);
            int orifice = -1;
            if (previous != k - 1) {
                orifice = k - 1;
                Z += 1.0 / orifice_conductance[orifice];
            }
            branches.push_back({previous, k, orifice, Z});
        }
        previous = k;
    }

    // Nodal equations: i omega C_m p + sum of branch flows out = piston source.
    Eigen::MatrixXcd Y = Eigen::MatrixXcd::Zero(nn, nn);
    Eigen::VectorXcd src = Eigen::VectorXcd::Zero(nn);
    for (int k = 0; k < nk; ++k)
        if (node[k] >= 0) Y(node[k], node[k]) += iw * out.elements[k].density * out.elements[k].compliance;
    for (const Branch& br : branches) {
        const Complex g = 1.0 / br.Z;
        const int a = node[br.a], b = node[br.b];
        Y(a, a) += g;
        Y(b, b) += g;
        Y(a, b) -= g;
        Y(b, a) -= g;
    }
    const double x1 = piston.scale * piston.amplitude; // displacement phasor, phase 0
    const Complex U_piston = iw * piston.piston_area * x1;
    src(node[0]) = out.elements[0].density * U_piston;
    const Eigen::VectorXcd p = Y.partialPivLu().solve(src);

    // Ports.
    MachinePhasors& m = out.phasors;
    m.components.resize(nk);
    auto port = [&](const Complex& pressure, const Complex& mdot, double rho) {
        PortPhasor q;
        q.pressure = pressure;
        q.mass_flow = mdot;
        q.volume_flow = rho > 0.0 ? mdot / rho : Complex(0.0);
        q.acoustic_power = 0.5 * (q.pressure * std::conj(q.volume_flow)).real();
        return q;
    };
    for (int k = 0; k < nk; ++k) {
        m.components[k].name = slices[k].name;
        m.components[k].kind = slices[k].kind;
        if (node[k] >= 0) {
            const Complex pk = p(node[k]);
            m.components[k].inlet = k == 0 ? port(pk, out.elements[0].density * U_piston,
                                                  out.elements[0].density)
                                           : port(pk, 0.0, out.elements[k].density);
            m.components[k].outlet = port(pk, 0.0, out.elements[k].density);
        }
    }
    for (const Branch& br : branches) {
        const Complex mdot = (p(node[br.a]) - p(node[br.b])) / br.Z;
        if (slices[br.orifice >= 0 ? br.orifice : 0].kind == "valve") {
            m.components[br.orifice].inlet = port(p(node[br.a]), mdot, out.elements[br.a].density);
            m.components[br.orifice].outlet = port(p(node[br.b]), mdot, out.elements[br.a].density);
            continue;
        }
        const double rho_a = out.elements[br.a].density, rho_b = out.elements[br.b].density;
        m.components[br.a].outlet = port(p(node[br.a]) - half(br.a) * mdot, mdot, rho_a);
        m.components[br.b].inlet = port(p(node[br.b]) + half(br.b) * mdot, mdot, rho_b);
        if (br.orifice >= 0) {
            m.components[br.orifice].inlet = m.components[br.a].outlet;
            m.components[br.orifice].outlet = m.components[br.b].inlet;
        }
    }
    for (auto& c : m.components)
        c.input_impedance = std::abs(c.inlet.volume_flow) > 0.0 ? c.inlet.pressure / c.inlet.volume_flow
                                                                : Complex(INFINITY, 0.0);
    summarizePorts(machine, m);
    m.summary.gross_cooling_W = m.summary.cold_end_acoustic_power_W;
    return out;
}

} // namespace coldtip
