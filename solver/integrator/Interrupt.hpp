#pragma once
//! \file Interrupt.hpp
//! A request to stop (SIGINT, SIGTERM) that the integration itself honours: the CVODE
//! right-hand side checks it on every evaluation, so a run stops within one integrator
//! step wherever it is (a long Newton step, a GMRES product, a stuck cycle, a cooldown)
//! instead of at the next cycle boundary. The stop travels as an Interrupted exception,
//! carried out of the SUNDIALS callback like any other (CvodeSession.hpp), and the cycle
//! solvers turn it into an interrupted outcome that keeps what was complete.

#include <stdexcept>

namespace coldtip {

//! Thrown out of an integration when a stop was requested. Not an IntegratorError: a
//! caller that retries a failed step must not retry this.
class Interrupted : public std::runtime_error {
public:
    Interrupted() : std::runtime_error("interrupted (SIGINT or SIGTERM)") {}
};

//! Async-signal-safe: sets a lock-free flag.
void requestInterrupt() noexcept;
bool interruptRequested() noexcept;
//! Forget a request (tests that interrupt in-process).
void clearInterrupt() noexcept;
//! Throws Interrupted if a stop was requested.
void throwIfInterrupted();

} // namespace coldtip
