#pragma once
//! \file Progress.hpp
//! Progress on stderr for long work (cycle, cold-end temperature, cooling power, residual,
//! estimated time left), at most a few times a second, only when stderr is a terminal and
//! the user did not ask for quiet.

#include <chrono>
#include <string>

namespace coldtip::cli {

class Progress {
public:
    explicit Progress(bool quiet);
    //! Report one cycle; `residual` against its `target` gives the time-left estimate.
    void cycle(long cycle, double cold_temperature, double cooling_power, double residual,
               double target, double elapsed_s);
    //! A free-form status line (always printed unless quiet).
    void note(const std::string& text);
    void finish();

private:
    bool m_enabled;
    bool m_quiet;
    std::chrono::steady_clock::time_point m_last{};
    long m_last_cycle = 0;
    double m_last_residual = 0.0;
    double m_last_elapsed = 0.0;
    bool m_printed = false;
};

} // namespace coldtip::cli
