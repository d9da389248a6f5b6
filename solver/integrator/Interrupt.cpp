#include "solver/integrator/Interrupt.hpp"

#include <atomic>

namespace coldtip {

namespace {
std::atomic<bool> g_requested{false};
static_assert(std::atomic<bool>::is_always_lock_free, "a signal handler may only set a lock-free flag");
} // namespace

void requestInterrupt() noexcept { g_requested.store(true, std::memory_order_relaxed); }
bool interruptRequested() noexcept { return g_requested.load(std::memory_order_relaxed); }
void clearInterrupt() noexcept { g_requested.store(false, std::memory_order_relaxed); }
void throwIfInterrupted()
{
    if (interruptRequested()) throw Interrupted();
}

} // namespace coldtip
