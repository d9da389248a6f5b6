#pragma once
//! \file SerialKernels.hpp
//! Compiled replacements for the serial N_Vector and compressed-sparse-column SUNMatrix
//! operations that CVODE calls at every step.
//!
//! Debian 12's SUNDIALS 6.4.1 libraries are built without optimisation (their loops keep
//! every index and pointer in memory: about 20 instructions per element for y += x). On the
//! demo, CVODE's vector and matrix operations were 30 % of all instructions executed, more
//! than the KLU solves. N_Vector and SUNMatrix operations are public tables of function
//! pointers that a user may replace (sundials_nvector.h, sundials_matrix.h; CVODES user
//! guide v6.4, "Description of the NVECTOR module"); clones copy the table. The kernels here
//! do the same arithmetic in the same order as the operations CVODE called before (the
//! serial and sparse modules' own, special cases included; for the fused operations, which
//! the serial module leaves off, SUNDIALS' generic fallbacks), so results are identical to
//! the last bit (tests/solver/SerialKernelsTest.cpp); the WRMS norm alone sums in four
//! partial sums (rounding-level differences) to break the dependent chain of additions.

#include <nvector/nvector_serial.h>
#include <sunmatrix/sunmatrix_sparse.h>

namespace coldtip {

//! Install the compiled vector operations on a serial vector (and so on its future clones):
//! linear sum, scale, constant, the fused linear combination and scale-add-multi, and the
//! WRMS norm.
void installSerialKernels(N_Vector v);

//! Install the compiled copy, zero, scale-add-identity and clone operations on a CSC sparse
//! matrix (clones, such as CVODE's saved Jacobian, get them too).
void installSparseKernels(SUNMatrix A);

//! sqrt( sum_i (x_i w_i)^2 / n ), the norm installed.
sunrealtype fastWrmsNorm(N_Vector x, N_Vector w);

} // namespace coldtip
