#include "solver/integrator/SerialKernels.hpp"

#include <algorithm>
#include <cmath>
#include <cstring>

namespace coldtip {

namespace {

// ---- vectors ---------------------------------------------------------------------------------
// Each operation reproduces the special cases of SUNDIALS' serial module (nvector_serial.c,
// v6.4), since they round differently: a (x + y) is not a x + a y to the last bit.

sunrealtype* data(N_Vector v) { return NV_DATA_S(v); }
sunindextype length(N_Vector v) { return NV_LENGTH_S(v); }

void linearSum(sunrealtype a, N_Vector x, sunrealtype b, N_Vector y, N_Vector z)
{
    const sunindextype n = length(x);
    const sunrealtype* xd = data(x);
    const sunrealtype* yd = data(y);
    sunrealtype* zd = data(z);
    // y <- a x + y and x <- b y + x (the serial module's axpy forms: the same values).
    if ((b == 1.0 && z == y) || (a == 1.0 && z == x)) {
        const bool into_y = b == 1.0 && z == y;
        const sunrealtype c = into_y ? a : b;
        const sunrealtype* v = into_y ? xd : yd;
        if (c == 1.0)
            for (sunindextype i = 0; i < n; ++i) zd[i] += v[i];
        else if (c == -1.0)
            for (sunindextype i = 0; i < n; ++i) zd[i] -= v[i];
        else
            for (sunindextype i = 0; i < n; ++i) zd[i] += c * v[i];
        return;
    }
    if (a == 1.0 && b == 1.0) {
        for (sunindextype i = 0; i < n; ++i) zd[i] = xd[i] + yd[i];
        return;
    }
    if ((a == 1.0 && b == -1.0) || (a == -1.0 && b == 1.0)) {
        const bool x_first = a == 1.0;
        const sunrealtype* p = x_first ? xd : yd;
        const sunrealtype* q = x_first ? yd : xd;
        for (sunindextype i = 0; i < n; ++i) zd[i] = p[i] - q[i];
        return;
    }
    if (a == 1.0 || b == 1.0) { // c v1 + v2
        const bool a_one = a == 1.0;
        const sunrealtype c = a_one ? b : a;
        const sunrealtype* v1 = a_one ? yd : xd;
        const sunrealtype* v2 = a_one ? xd : yd;
        for (sunindextype i = 0; i < n; ++i) zd[i] = (c * v1[i]) + v2[i];
        return;
    }
    if (a == -1.0 || b == -1.0) { // c v1 - v2
        const bool a_minus = a == -1.0;
        const sunrealtype c = a_minus ? b : a;
        const sunrealtype* v1 = a_minus ? yd : xd;
        const sunrealtype* v2 = a_minus ? xd : yd;
        for (sunindextype i = 0; i < n; ++i) zd[i] = (c * v1[i]) - v2[i];
        return;
    }
    if (a == b) {
        for (sunindextype i = 0; i < n; ++i) zd[i] = a * (xd[i] + yd[i]);
        return;
    }
    if (a == -b) {
        for (sunindextype i = 0; i < n; ++i) zd[i] = a * (xd[i] - yd[i]);
        return;
    }
    for (sunindextype i = 0; i < n; ++i) zd[i] = (a * xd[i]) + (b * yd[i]);
}

void scale(sunrealtype c, N_Vector x, N_Vector z)
{
    const sunindextype n = length(x);
    const sunrealtype* xd = data(x);
    sunrealtype* zd = data(z);
    for (sunindextype i = 0; i < n; ++i) zd[i] = c * xd[i]; // c = +-1 are exact
}

void constant(sunrealtype c, N_Vector z) { std::fill_n(data(z), length(z), c); }

int linearCombination(int nvec, sunrealtype* c, N_Vector* X, N_Vector z)
{
    if (nvec < 1) return -1;
    const sunindextype n = length(z);
    sunrealtype* zd = data(z);
    // z = c0 X0, then z += c_i X_i in order (for z = X0 too): the sums of SUNDIALS' generic
    // fallback (N_VScale, then N_VLinearSum per term), which CVODE used while the serial
    // module's fused operations were off; the fused version differs in rounding only, for two
    // terms with equal or opposite coefficients.
    const sunrealtype* x0 = data(X[0]);
    for (sunindextype k = 0; k < n; ++k) zd[k] = c[0] * x0[k];
    for (int i = 1; i < nvec; ++i) {
        const sunrealtype* xi = data(X[i]);
        const sunrealtype ci = c[i];
        for (sunindextype k = 0; k < n; ++k) zd[k] += ci * xi[k];
    }
    return 0;
}

int scaleAddMulti(int nvec, sunrealtype* a, N_Vector x, N_Vector* Y, N_Vector* Z)
{
    if (nvec < 1) return -1;
    const sunindextype n = length(x);
    const sunrealtype* xd = data(x);
    for (int i = 0; i < nvec; ++i) {
        const sunrealtype* yd = data(Y[i]);
        sunrealtype* zd = data(Z[i]);
        const sunrealtype ai = a[i];
        for (sunindextype k = 0; k < n; ++k) zd[k] = ai * xd[k] + yd[k];
    }
    return 0;
}

sunrealtype weightedSquareSum(N_Vector x, N_Vector w)
{
    const sunindextype n = length(x);
    const sunrealtype* xd = data(x);
    const sunrealtype* wd = data(w);
    sunrealtype s0 = 0.0, s1 = 0.0, s2 = 0.0, s3 = 0.0;
    sunindextype i = 0;
    for (; i + 4 <= n; i += 4) {
        const sunrealtype a = xd[i] * wd[i], b = xd[i + 1] * wd[i + 1];
        const sunrealtype c = xd[i + 2] * wd[i + 2], d = xd[i + 3] * wd[i + 3];
        s0 += a * a;
        s1 += b * b;
        s2 += c * c;
        s3 += d * d;
    }
    for (; i < n; ++i) s0 += (xd[i] * wd[i]) * (xd[i] * wd[i]);
    return (s0 + s1) + (s2 + s3);
}

// ---- sparse matrices (compressed sparse column or row) --------------------------------------

int zeroMatrix(SUNMatrix A)
{
    std::memset(SM_DATA_S(A), 0, sizeof(sunrealtype) * SM_NNZ_S(A));
    std::memset(SM_INDEXVALS_S(A), 0, sizeof(sunindextype) * SM_NNZ_S(A));
    std::memset(SM_INDEXPTRS_S(A), 0, sizeof(sunindextype) * (SM_NP_S(A) + 1));
    return 0;
}

//! B = A, pattern included (SUNMatCopy_Sparse; it grows B when B has too little room).
int copyMatrix(SUNMatrix A, SUNMatrix B)
{
    const sunindextype nz = SM_INDEXPTRS_S(A)[SM_NP_S(A)];
    if (SM_ROWS_S(A) != SM_ROWS_S(B) || SM_COLUMNS_S(A) != SM_COLUMNS_S(B) ||
        SM_SPARSETYPE_S(A) != SM_SPARSETYPE_S(B) || SM_NNZ_S(B) < nz)
        return SUNMatCopy_Sparse(A, B);
    std::memcpy(SM_DATA_S(B), SM_DATA_S(A), sizeof(sunrealtype) * nz);
    std::memcpy(SM_INDEXVALS_S(B), SM_INDEXVALS_S(A), sizeof(sunindextype) * nz);
    std::memset(SM_DATA_S(B) + nz, 0, sizeof(sunrealtype) * (SM_NNZ_S(B) - nz));
    std::memset(SM_INDEXVALS_S(B) + nz, 0, sizeof(sunindextype) * (SM_NNZ_S(B) - nz));
    std::memcpy(SM_INDEXPTRS_S(B), SM_INDEXPTRS_S(A), sizeof(sunindextype) * SM_NP_S(A));
    SM_INDEXPTRS_S(B)[SM_NP_S(A)] = nz;
    return 0;
}

//! A = c A + I in place when every diagonal entry is in the pattern (always so for the
//! network's Jacobian); otherwise SUNMatScaleAddI_Sparse, which inserts the missing ones.
int scaleAddIdentity(sunrealtype c, SUNMatrix A)
{
    const sunindextype np = SM_NP_S(A);
    const sunindextype inner =
        SM_SPARSETYPE_S(A) == CSC_MAT ? SM_ROWS_S(A) : SM_COLUMNS_S(A);
    const sunindextype* Ap = SM_INDEXPTRS_S(A);
    const sunindextype* Ai = SM_INDEXVALS_S(A);
    sunrealtype* Ax = SM_DATA_S(A);
    for (sunindextype j = 0; j < std::min(np, inner); ++j)
        if (!std::binary_search(Ai + Ap[j], Ai + Ap[j + 1], j))
            return SUNMatScaleAddI_Sparse(c, A);
    for (sunindextype j = 0; j < np; ++j)
        for (sunindextype p = Ap[j]; p < Ap[j + 1]; ++p)
            Ax[p] = Ai[p] == j ? c * Ax[p] + 1.0 : c * Ax[p];
    return 0;
}

SUNMatrix cloneMatrix(SUNMatrix A)
{
    SUNMatrix B = SUNMatClone_Sparse(A);
    if (B) installSparseKernels(B);
    return B;
}

} // namespace

sunrealtype fastWrmsNorm(N_Vector x, N_Vector w)
{
    return std::sqrt(weightedSquareSum(x, w) / length(x));
}

void installSerialKernels(N_Vector v)
{
    v->ops->nvlinearsum = linearSum;
    v->ops->nvscale = scale;
    v->ops->nvconst = constant;
    v->ops->nvlinearcombination = linearCombination;
    v->ops->nvscaleaddmulti = scaleAddMulti;
    v->ops->nvwrmsnorm = fastWrmsNorm;
    v->ops->nvwsqrsumlocal = weightedSquareSum;
}

void installSparseKernels(SUNMatrix A)
{
    A->ops->zero = zeroMatrix;
    A->ops->copy = copyMatrix;
    A->ops->scaleaddi = scaleAddIdentity;
    A->ops->clone = cloneMatrix;
}

} // namespace coldtip
