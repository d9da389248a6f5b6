#pragma once
//! \file G10.hpp
//! G-10 CR glass-epoxy laminate, NIST cryogenic fits (NistCryogenicFit.hpp,
//! log-polynomial):
//!   k normal to the cloth, a..h = -4.1236, 13.788, -26.068, 26.272, -14.663, 4.4954,
//!        -0.6905, 0.0397; 10-300 K
//!   k in the warp direction, a..i = -2.64827, 8.80228, -24.8998, 41.1625, -39.8754,
//!        23.1778, -7.95635, 1.48806, -0.11701; 10-300 K (range from memory)
//!   c_p, a..h = -2.4083, 7.6006, -8.2982, 7.3301, -4.2386, 1.4294, -0.24396, 0.015236;
//!        4-300 K
//! Check: k(77 K) = 0.2800 (normal), 0.3858 (warp) W/(m K); c_p(77 K) = 239.4 J/(kg K).
//! Density 1850 kg/m^3 (typical 1850-1900; from memory).

#include "models/solids/NistCryogenicFit.hpp"
#include "models/solids/SolidMaterial.hpp"

namespace coldtip::models {

class G10 final : public SolidMaterial {
public:
    //! Heat flow normal to the glass cloth ("g10") or along the warp fibres ("g10-warp").
    enum class Direction { Normal, Warp };
    explicit G10(Direction direction) : m_direction(direction) {}
    std::string_view name() const override
    {
        return m_direction == Direction::Normal ? "g10" : "g10-warp";
    }
    //! 1850 kg/m^3.
    double density() const override { return 1850.0; }
    //! c_p(T) [J/(kg K)], NIST fit, held outside 4-300 K.
    double specificHeat(double T) const override { return kSpecificHeat(T); }
    //! k(T) [W/(m K)] in the chosen direction, NIST fit, held outside 10-300 K.
    double conductivity(double T) const override
    {
        return m_direction == Direction::Normal ? kNormal(T) : kWarp(T);
    }
    double minTemperature() const override { return 10.0; }
    double maxTemperature() const override { return 300.0; }

private:
    static constexpr NistLogPolynomial kNormal{
        {-4.1236, 13.788, -26.068, 26.272, -14.663, 4.4954, -0.6905, 0.0397, 0.0},
        10.0,
        300.0};
    static constexpr NistLogPolynomial kWarp{{-2.64827, 8.80228, -24.8998, 41.1625,
                                              -39.8754, 23.1778, -7.95635, 1.48806,
                                              -0.11701},
                                             10.0,
                                             300.0};
    static constexpr NistLogPolynomial kSpecificHeat{
        {-2.4083, 7.6006, -8.2982, 7.3301, -4.2386, 1.4294, -0.24396, 0.015236, 0.0},
        4.0,
        300.0};
    Direction m_direction;
};

} // namespace coldtip::models
