#pragma once
//! \file Phasors.hpp
//! The machine seen through first harmonics at its component boundaries: pressure, mass
//! flow and volume flow phasors at every component's inlet and outlet, the acoustic power
//! <E> = 1/2 Re[p1 conj(U1)] and the second-order enthalpy flow there, the input impedance,
//! and the designer's summary (cooling estimate, acoustic power at the drive and the cold
//! end, flow-pressure phases at the ends of regenerator and pulse tube). The linear
//! solution, the DFT of a nonlinear cycle and the lumped model all end up here, so the
//! three are reported by one code path. Phases are relative to the piston displacement
//! x(t) = X sin(omega t) (the volume it sweeps into the cylinder), flow positive away
//! from the drive.

#include <complex>
#include <string>
#include <vector>

#include "solver/components/Machine.hpp"

namespace coldtip {

using Complex = std::complex<double>;

struct PortPhasor {
    Complex pressure;            //!< p1 [Pa]
    Complex mass_flow;           //!< mdot1 [kg/s]
    Complex volume_flow;         //!< U1 [m^3/s]
    double acoustic_power = 0.0; //!< 1/2 Re[p1 conj(U1)] [W]
    double enthalpy_flow = 0.0;  //!< time-averaged enthalpy flow [W]
    //! Phase of flow relative to the local pressure, arg(U1/p1) [deg], positive = leads.
    double flowPhaseDeg() const;
};

struct ComponentPhasors {
    std::string name, kind;
    PortPhasor inlet, outlet;
    Complex input_impedance; //!< p1/U1 at the inlet [Pa s/m^3]
};

//! Designer's summary. Phases arg(U1/p1) [deg].
struct PhasorSummary {
    double gross_cooling_W = 0.0;
    double drive_acoustic_power_W = 0.0;
    double cold_end_acoustic_power_W = 0.0;
    double phase_cold_end_deg = 0.0;
    double phase_pulse_tube_warm_end_deg = 0.0;
    double phase_regenerator_warm_end_deg = 0.0;
    double phase_inertance_inlet_deg = 0.0;
    double drive_pressure_amplitude_Pa = 0.0;
};

struct MachinePhasors {
    std::vector<ComponentPhasors> components;
    PhasorSummary summary;
    const ComponentPhasors* find(const std::string& name) const;
};

//! First harmonics of every cell and face (linear solution or DFT of a cycle), already
//! referred to the piston displacement.
struct FirstHarmonics {
    std::vector<Complex> cell_pressure;    //!< [Pa]
    std::vector<Complex> cell_temperature; //!< [K]
    std::vector<double> cell_density;      //!< mean [kg/m^3]
    std::vector<Complex> face_mass_flow;   //!< [kg/s]
    std::vector<Complex> orifice_mass_flow; //!< per OrificeLink, in element order [kg/s]
    Complex piston_volume_flow;            //!< into the gas, -dV1/dt [m^3/s]
    double cp = 0.0;                       //!< [J/(kg K)]
};

//! Port phasors of every component (network slices, links included) and the summary; the
//! enthalpy flow at a face is the second-order c_p/2 Re[mdot1 conj(T1)] with T1 the mean of
//! the two cells beside it. The gross cooling estimate is the difference of that enthalpy
//! flow across the cold exchanger, taken a quarter of each neighbour's length away from it
//! (in an adiabatic pulse tube it equals the acoustic power there, zero at an ideal
//! regenerator's end; physics reference §7.1-7.2).
MachinePhasors machinePhasors(const Machine& machine, const FirstHarmonics& h);

//! Component index (network slice) of the roles the summary names, -1 if absent.
struct SummaryRoles {
    int regenerator = -1, cold = -1, tube = -1, inertance = -1;
};
SummaryRoles summaryRoles(const Machine& machine);

//! Fill the summary's acoustic powers and phases from the ports (gross cooling untouched).
void summarizePorts(const Machine& machine, MachinePhasors& m);

} // namespace coldtip
