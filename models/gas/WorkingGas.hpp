#pragma once
//! \file WorkingGas.hpp
//! Working-gas interface: ideal-gas thermodynamics (constant c_p) with temperature- and
//! density-dependent transport properties. Implementations are stateless and thread-safe.
//! Outside [minTemperature(), maxTemperature()] a gas holds the transport properties at the
//! nearest end of the range (it never extrapolates a correlation); likewise above
//! maxDensity(), and a negative density is taken as zero.

#include <limits>
#include <memory>
#include <string>
#include <string_view>
#include <vector>

namespace coldtip::models {

//! Molar gas constant R [J/(mol K)] (CODATA 2018, exact by the SI definition).
inline constexpr double kMolarGasConstant = 8.314462618;

class WorkingGas {
public:
    virtual ~WorkingGas() = default;
    //! Species name as written in case files ("helium").
    virtual std::string_view name() const = 0;
    //! Molar mass M [kg/mol].
    virtual double molarMass() const = 0;
    //! Ideal-gas isobaric specific heat c_p [J/(kg K)], constant.
    virtual double cp() const = 0;
    //! Dynamic viscosity mu(T, rho) [Pa s].
    virtual double viscosity(double T, double rho) const = 0;
    //! Thermal conductivity k(T, rho) [W/(m K)].
    virtual double conductivity(double T, double rho) const = 0;
    //! Temperature range [K] over which the transport correlations are valid.
    virtual double minTemperature() const = 0;
    virtual double maxTemperature() const = 0;
    //! Density [kg/m^3] above which the transport properties are held (the correlations'
    //! density terms are not evaluated beyond it); infinite for dilute-gas models.
    virtual double maxDensity() const { return std::numeric_limits<double>::infinity(); }

    //! Specific gas constant R_s = R/M [J/(kg K)].
    double gasConstant() const { return kMolarGasConstant / molarMass(); }
    //! c_v = c_p - R_s [J/(kg K)].
    double cv() const { return cp() - gasConstant(); }
    //! gamma = c_p / c_v [-].
    double gamma() const { return cp() / cv(); }
};

//! Names accepted by makeWorkingGas, in the order they are listed to users.
std::vector<std::string> knownGasSpecies();

//! The gas of that name; throws std::invalid_argument naming the known species otherwise.
std::unique_ptr<WorkingGas> makeWorkingGas(std::string_view species);

} // namespace coldtip::models
