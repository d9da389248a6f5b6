#pragma once
//! \file FastNorm.hpp
//! A faster weighted root-mean-square norm for serial N_Vectors. CVODE takes several WRMS
//! norms per step (Newton convergence, error test, step and order selection); the serial
//! module's loop is one dependent chain of additions, which the compiler may not reorder,
//! so it runs at the latency of one floating-point add per element. Four independent
//! partial sums remove that chain (the result differs from the serial one by rounding only).
//! Measured share of run time of the serial norm on the demo: 12 %.
//!
//! N_Vector operations are a public table of function pointers (sundials_nvector.h) that a
//! user may replace; clones copy the table, so installing it on the state vector is enough.

#include <nvector/nvector_serial.h>

namespace coldtip {

//! Replace the WRMS-norm operations of a serial vector (and of its future clones).
void installFastNorm(N_Vector v);

//! sqrt( sum_i (x_i w_i)^2 / n ), the operation installed.
sunrealtype fastWrmsNorm(N_Vector x, N_Vector w);

} // namespace coldtip
