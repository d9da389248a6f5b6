#pragma once
//! \file SolidMaterial.hpp
//! Solid-material interface: density and temperature-dependent specific heat and thermal
//! conductivity (NIST cryogenic fits). Outside its fit range a material holds the value at
//! the nearest end of the range (it never extrapolates the fit polynomial).

#include <memory>
#include <string>
#include <string_view>
#include <vector>

namespace coldtip::models {

class SolidMaterial {
public:
    virtual ~SolidMaterial() = default;
    //! Material name as written in case files ("stainless-304").
    virtual std::string_view name() const = 0;
    //! Density at room temperature [kg/m^3].
    virtual double density() const = 0;
    //! Specific heat c_p(T) [J/(kg K)], held constant outside the fit range.
    virtual double specificHeat(double T) const = 0;
    //! Thermal conductivity k(T) [W/(m K)], held constant outside the fit range.
    virtual double conductivity(double T) const = 0;
    //! Fit range [K] (the narrower of the c_p and k ranges).
    virtual double minTemperature() const = 0;
    virtual double maxTemperature() const = 0;
};

//! Names accepted by makeSolidMaterial, in the order they are listed to users.
std::vector<std::string> knownSolidMaterials();

//! The material of that name; throws std::invalid_argument naming the known ones otherwise.
std::unique_ptr<SolidMaterial> makeSolidMaterial(std::string_view name);

} // namespace coldtip::models
