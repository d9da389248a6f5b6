#include "models/gas/PhaseBoundary.hpp"

#include "models/NameList.hpp"
#include "models/gas/WorkingGas.hpp"

#include <cmath>

namespace coldtip::models {

namespace {

// One-term Wagner coefficient of the Clausius-Clapeyron line through the critical point
// and (T0, p0): ln(p0/p_c) = (T_c/T0) a_1 (1 - T0/T_c) = a_1 (T_c/T0 - 1).
double clausiusCoefficient(double Tc, double pc, double T0, double p0)
{
    return std::log(p0 / pc) / (Tc / T0 - 1.0);
}

PhaseBoundary twoPoint(std::string_view species, double Tc, double pc, double Tt, double T0,
                       double p0, std::string_view source)
{
    return {species, Tc, pc, Tt, {clausiusCoefficient(Tc, pc, T0, p0), 0.0, 0.0, 0.0},
            {1.0, 1.0, 1.0, 1.0}, source};
}

const PhaseBoundary kBoundaries[] = {
    // Critical point: Ortiz-Vega et al., NIST IR 8474 (2023); normal boiling point 4.222 K
    // (ITS-90). The two-point line is exact at those points only; elsewhere (from memory
    // of the helium tables) it errs by some tenths of a kelvin at most down to 2.5 K.
    twoPoint("helium", 5.1953, 0.22746e6, 0.0, 4.222, 101325.0,
             "a two-point vapour-pressure line through the normal boiling point 4.222 K "
             "and the critical point 5.1953 K, 0.22746 MPa"),
    // Span, Lemmon, Jacobsen, Wagner and Yokozeki, J. Phys. Chem. Ref. Data 29, 1361
    // (2000): the ancillary vapour-pressure equation; it gives 101.33 kPa at the normal
    // boiling point 77.355 K (checked in tests/models/PhaseBoundaryTests.cpp).
    {"nitrogen", 126.192, 3.3958e6, 63.151,
     {-6.12445284, 1.26327220, -0.765910082, -1.77570564}, {1.0, 1.5, 2.5, 5.0},
     "the vapour-pressure equation of Span et al., J. Phys. Chem. Ref. Data 29, 1361 (2000)"},
    // Triple point 24.556 K, 43.368 kPa and critical point 44.4918 K, 2.6786 MPa of the
    // neon equation of Katti, Jacobsen, Stewart and Jahangiri, Adv. Cryog. Eng. 31, 1189
    // (1986) (values from memory); the line gives 103 kPa at the normal boiling point
    // 27.10 K (+1.6 %, 0.05 K).
    twoPoint("neon", 44.4918, 2.6786e6, 24.556, 24.556, 43368.0,
             "a two-point vapour-pressure line through the triple point 24.556 K and the "
             "critical point 44.4918 K, 2.6786 MPa"),
    // Tegeler, Span and Wagner, J. Phys. Chem. Ref. Data 28, 779 (1999): the ancillary
    // vapour-pressure equation; it gives 101.33 kPa at the normal boiling point 87.302 K.
    // Triple point 83.8058 K (from memory).
    {"argon", 150.687, 4.863e6, 83.8058,
     {-5.9409785, 1.3553888, -0.46497607, -1.5399043}, {1.0, 1.5, 2.0, 4.5},
     "the vapour-pressure equation of Tegeler et al., J. Phys. Chem. Ref. Data 28, 779 "
     "(1999)"},
    // Air condenses first on its dew line: 81.72 K at 101.325 kPa and the maxcondentherm
    // 132.6312 K, 3.78502 MPa (Lemmon, Jacobsen, Penoncello and Friend, J. Phys. Chem. Ref.
    // Data 29, 331 (2000); values from memory); solidification 59.75 K as in Air.hpp.
    twoPoint("air", 132.6312, 3.78502e6, 59.75, 81.72, 101325.0,
             "a two-point dew line through 81.72 K at 101.325 kPa and the maxcondentherm "
             "132.6312 K, 3.78502 MPa (Lemmon et al. 2000)"),
};

} // namespace

double PhaseBoundary::saturationPressure(double T) const
{
    if (T >= critical_temperature)
        return critical_pressure;
    const double tau = 1.0 - T / critical_temperature;
    double sum = 0.0;
    for (std::size_t i = 0; i < a.size(); ++i)
        sum += a[i] * std::pow(tau, e[i]);
    return critical_pressure * std::exp(critical_temperature / T * sum);
}

std::optional<double> PhaseBoundary::saturationTemperature(double p) const
{
    if (p >= critical_pressure)
        return std::nullopt;
    // p_sat rises monotonically from the lower end to p_c: bisect on T.
    double lo = triple_temperature > 0.0 ? triple_temperature : 0.5;
    double hi = critical_temperature;
    if (saturationPressure(lo) >= p)
        return lo;
    for (int i = 0; i < 100 && hi - lo > 1e-9 * hi; ++i) {
        const double mid = 0.5 * (lo + hi);
        (saturationPressure(mid) < p ? lo : hi) = mid;
    }
    return 0.5 * (lo + hi);
}

const PhaseBoundary& phaseBoundary(std::string_view species)
{
    for (const PhaseBoundary& b : kBoundaries)
        if (b.species == species)
            return b;
    throwUnknownName("gas species", species, knownGasSpecies());
}

} // namespace coldtip::models
