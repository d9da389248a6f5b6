#include "models/solids/OfhcCopper.hpp"

#include <stdexcept>

namespace coldtip::models {
namespace {

NistCopperRational conductivityFit(int rrr)
{
    switch (rrr) {
    case 50:
        return {{1.8743, -0.41538, -0.6018, 0.13294, 0.26426, -0.0219, -0.051276,
                 0.0014871, 0.003723},
                4.0,
                300.0};
    case 100:
        return {{2.2154, -0.47461, -0.88068, 0.13871, 0.29505, -0.02043, -0.04831,
                 0.001281, 0.003207},
                4.0,
                300.0};
    case 150:
        return {{2.3797, -0.4918, -0.98615, 0.13942, 0.30475, -0.019713, -0.046897,
                 0.0011969, 0.0029988},
                4.0,
                300.0};
    default:
        throw std::invalid_argument("OfhcCopper: no NIST conductivity fit for RRR = " +
                                    std::to_string(rrr) + " (available: 50, 100, 150)");
    }
}

} // namespace

OfhcCopper::OfhcCopper(std::string name, int rrr)
    : m_name(std::move(name)), m_conductivity(conductivityFit(rrr))
{}

} // namespace coldtip::models
