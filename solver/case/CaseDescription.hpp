#pragma once
//! \file CaseDescription.hpp
//! The validated content of a case file, in SI units. The case reader (solver/input/)
//! produces it; the network assembly (solver/components/) consumes it. Nothing past the
//! reader sees units or YAML; every position in the file travels along as a SourceMark so
//! that assembly errors can still point at the line that caused them.

#include <map>
#include <optional>
#include <string>
#include <vector>

namespace coldtip {

//! A place in a case file: 1-based line and column, and the key path
//! (`components[3].fill.wire_diameter`). Empty path means "the whole file".
struct SourceMark {
    std::string file;
    int line = 0;
    int column = 0;
    std::string path;
};

//! Working gas and the charge that fills the machine.
struct GasSpec {
    std::string species = "helium";  //!< one of models::knownGasSpecies()
    double charge_pressure = 0.0;    //!< [Pa] pressure when filled at charge_temperature
    double charge_temperature = 0.0; //!< [K]
    SourceMark mark;
};

//! A thermal boundary with a given temperature and film coefficient (used by the drive's
//! compression space; heat exchangers compute their own film coefficient).
struct FilmWallSpec {
    double temperature = 0.0;               //!< [K]
    double heat_transfer_coefficient = 0.0; //!< [W/(m^2 K)]
};

//! Prescribed sinusoidal piston: x(t) = amplitude sin(2 pi f t), positive into the cylinder.
//! Compression-space volume V(t) = dead_volume + A_p (amplitude - x(t)), A_p = pi bore^2/4.
struct DriveSpec {
    std::string kind = "piston";
    double bore = 0.0;        //!< [m]
    double amplitude = 0.0;   //!< [m] stroke amplitude (half the stroke)
    double dead_volume = 0.0; //!< [m^3] volume at full compression
    std::optional<FilmWallSpec> wall; //!< absent: adiabatic compression space
    SourceMark mark;
};

//! What fills a flow passage (heat exchanger or regenerator).
struct FillSpec {
    enum class Kind { Open, Slots, Screen, Spheres };
    Kind kind = Kind::Open;
    std::string material;            //!< matrix material; always set in a regenerator
    double porosity = 0.0;           //!< [-] screens: 1 - pi mesh wire / 4 if not given
    //! [m] slots: given; screens, spheres: 0 here, derived by the matrix model from the
    //! wire or sphere diameter and the porosity
    double hydraulic_diameter = 0.0;
    double mesh = 0.0;               //!< [1/m] screens: wires per unit length
    double wire_diameter = 0.0;      //!< [m] screens
    double sphere_diameter = 0.0;    //!< [m] spheres
    double conduction_degradation = 0.1; //!< [-] k_eff/((1-phi) k_s), Lewis et al. (1998);
                                         //!< screens, spheres
    SourceMark mark;
};

//! A conductive link from a cold-head body to another body or to the exchanger's own body:
//! a constant conductance (a bolted or clamped joint) or a conductor of a material, length
//! and cross-section without heat capacity of its own (a strap, a rod), whose heat flow is
//! the conductivity integral of the NIST fit, Q = (A/L) integral_{T_b}^{T_a} k dT.
struct ThermalLinkSpec {
    std::string to;           //!< body name or the exchanger's component name ("" = the exchanger)
    double conductance = 0.0; //!< [W/K] constant; 0 = from material, length, area
    std::string material;     //!< conductor material
    double length = 0.0;      //!< [m]
    double area = 0.0;        //!< [m^2] cross-section
    SourceMark mark;
};

//! A lumped body of the cold head besides the exchanger's own body (a cold block, the
//! detector mount): one temperature, heat capacity m c_p(T) of its material.
struct ColdBodySpec {
    std::string name;
    std::string material;
    double mass = 0.0;                //!< [kg]
    double initial_temperature = 0.0; //!< [K]; 0 = the exchanger body's
    ThermalLinkSpec link;
    SourceMark mark;
};

//! A heat load on a cold-head body, from outside the machine:
//!  - Constant: `power`.
//!  - Schedule: `powers` at `times` (physical time of the run), linear in between, held
//!    outside (C0 at the table points).
//!  - Table: `powers` at body `temperatures`, linear in between, held outside.
//!  - Radiation: from a surrounding surface at `ambient_temperature`,
//!    Q = sigma eps A (T_amb^4 - T^4), eps = `mli_emissivity` if given, else `emissivity`.
//!  - Support: conduction through `count` supports of `material`, `length` and `area`
//!    from `ambient_temperature`: Q = count (A/L) integral_T^{T_amb} k dT.
struct ColdLoadSpec {
    enum class Kind { Constant, Schedule, Table, Radiation, Support };
    std::string name;
    Kind kind = Kind::Constant;
    std::string on;                   //!< body name or the exchanger ("" = the exchanger)
    double power = 0.0;               //!< [W] constant
    std::vector<double> times;        //!< [s] schedule, increasing
    std::vector<double> temperatures; //!< [K] table, increasing
    std::vector<double> powers;       //!< [W] schedule or table values
    double area = 0.0;                //!< [m^2] radiating surface, support cross-section
    double emissivity = 0.0;          //!< [-] radiation: effective emissivity
    double mli_emissivity = 0.0;      //!< [-] radiation: of a multilayer blanket; 0 = none
    double ambient_temperature = 0.0; //!< [K] radiation, support; the reader fills it
    std::string material;             //!< support material
    double length = 0.0;              //!< [m] support length
    int count = 1;                    //!< supports in parallel
    SourceMark mark;
};

//! The thermal side of a component's wall.
//!  - Adiabatic: no heat exchange with the gas.
//!  - Isothermal: wall held at `temperature` (heat exchangers, ducts).
//!  - LumpedBody: one solid node of `mass` of `material`, under the applied `load`
//!    (heat exchangers: the cold head), starting at `initial_temperature`; further
//!    `bodies` linked to it and `loads` on any of them make the cold-head model.
//!  - Conducting: a wall of `material` and `thickness`, one solid node per cell, with
//!    axial conduction (pulse tube wall).
struct WallSpec {
    enum class Kind { Adiabatic, Isothermal, LumpedBody, Conducting };
    Kind kind = Kind::Adiabatic;
    double temperature = 0.0;         //!< [K] isothermal
    std::string material;             //!< lumped body, conducting wall
    double mass = 0.0;                //!< [kg] lumped body
    double load = 0.0;                //!< [W] heat applied to the lumped body
    double initial_temperature = 0.0; //!< [K] lumped body; 0 = use the initial profile
    double thickness = 0.0;           //!< [m] conducting wall
    std::vector<ColdBodySpec> bodies; //!< lumped body: further cold-head bodies
    std::vector<ColdLoadSpec> loads;  //!< lumped body: loads on the cold head
    SourceMark mark;
};

//! A regenerator's housing: a tube of `material` and `thickness` in parallel with the
//! matrix (it shares the matrix nodes' temperature and adds conduction and heat capacity).
struct HousingSpec {
    std::string material;
    double thickness = 0.0; //!< [m]
};

//! One component of the main flow path, in order from the drive outward.
struct ComponentSpec {
    enum class Kind { Duct, HeatExchanger, Regenerator, Tube, Volume, Orifice };
    std::string name;
    Kind kind = Kind::Duct;
    double length = 0.0;     //!< [m] duct, heat exchanger, regenerator, tube
    double diameter = 0.0;   //!< [m] inner (frontal) diameter
    double volume = 0.0;     //!< [m^3] volume
    int cells = 0;           //!< number of control volumes (the reader fills the default)
    //! Weight beta of cosine spacing in the cell edges x_i = L[(1-beta) u + beta (1 - cos(pi u))/2],
    //! u = i/cells: cells crowd towards both ends, where profiles are steepest.
    double cell_clustering = 0.0;
    double roughness = 0.0;  //!< [m] duct, tube: absolute wall roughness
    FillSpec fill;           //!< heat exchanger, regenerator
    WallSpec wall;           //!< see WallSpec
    std::optional<HousingSpec> housing; //!< regenerator
    double orifice_diameter = 0.0;      //!< [m] orifice
    double discharge_coefficient = 0.61;//!< [-] orifice
    std::string role;        //!< heat exchanger: "cold" | "reject" | "warm" | "" (inferred)
    SourceMark mark;
};

//! End of a component: `component.inlet` (towards the drive) or `component.outlet`.
struct PortSpec {
    std::string component;
    bool outlet = true;
};

//! A connection across the main path (double-inlet bypass valve).
struct LinkSpec {
    std::string name;
    std::string kind = "valve";
    PortSpec from;  //!< `between[0]`
    PortSpec to;    //!< `between[1]`
    double orifice_diameter = 0.0;       //!< [m]
    double discharge_coefficient = 0.61; //!< [-]
    SourceMark mark;
};

//! Periodic-steady-state controls.
struct SteadySpec {
    std::string method = "accelerated"; //!< accelerated | plain
    double heat_residual = 1e-3;       //!< [-] max |cycle heat of a solid node| / cooling power
    double energy_residual = 2e-3;     //!< [-] |energy balance error| (relative to PV power)
    double temperature_tolerance = 0.05; //!< [K] estimated distance to the steady state
    int max_cycles = 20000;
    int min_cycles = 5;
};

struct SolverSpec {
    double relative_tolerance = 1e-6;
    double absolute_tolerance_scale = 1.0; //!< multiplies the built-in absolute tolerances
    //! Multiplies, on top, the mass flows' absolute tolerance (rtol x drive mass-flow amplitude).
    double mass_flow_tolerance_scale = 1.0;
    int max_order = 2;
    long max_steps_per_cycle = 100000;
    SteadySpec steady;
};

struct OutputSpec {
    int samples_per_cycle = 96;
};

//! Initial temperature profile: the cold end starts at `cold_temperature` (0 = the cold
//! heat exchanger's wall or body temperature), the regenerator and the tube linear between
//! their neighbours.
struct InitialSpec {
    double cold_temperature = 0.0; //!< [K]
};

//! The cooldown transient (`coldtip cooldown`): from a uniform start until the cold end
//! settles or the time limit.
struct CooldownSpec {
    double start_temperature = 0.0;  //!< [K] uniform start; 0 = the reject temperature
    double time_limit = 4.0 * 3600.0; //!< [s] physical time
    std::vector<double> report_at;   //!< [K] cold-end temperatures whose times are reported
    //! [K] the cold end has settled when its estimated distance to the steady state is
    //! below this
    double settle_tolerance = 0.05;
    std::string method = "accelerated"; //!< accelerated | plain
    double relative_tolerance = 1e-4;   //!< accelerated: of the slow temperature ODE
    double settle_residual = 1e-3; //!< accelerated: cycle-to-cycle change of the averaged
                                   //!< heat flows, relative to the cooling power reference
    int max_settle_cycles = 12;    //!< accelerated: cycles per averaged heat-flow evaluation
    SourceMark mark;
};

struct CaseDescription {
    std::string name;
    std::string description;
    GasSpec gas;
    double frequency = 0.0; //!< [Hz]
    DriveSpec drive;
    std::vector<ComponentSpec> components;
    std::vector<LinkSpec> links;
    SolverSpec solver;
    OutputSpec output;
    InitialSpec initial;
    CooldownSpec cooldown;
    std::string source_path; //!< the case file as given on the command line
    std::string source_text; //!< its full text, stored in the result file
    //! Where every key and list element given in the file sits, by key path
    //! ("components[3].fill.wire_diameter", "links[0].between[1]"), so that later stages
    //! can point at any value, not only at a component.
    std::map<std::string, SourceMark> marks;
    //! One-line warnings of the reader ("FILE:LINE:COL: warning: KEY: ..."): legitimate
    //! input outside a model's published range (input/Plausibility.hpp).
    std::vector<std::string> warnings;
};

} // namespace coldtip
