// The compiled vector and sparse-matrix operations installed on CVODE's vectors and
// matrices (integrator/SerialKernels.hpp) against SUNDIALS' own serial and sparse modules,
// called directly: the same results to the last bit for every special case of the
// coefficients and every aliasing of the arguments CVODE uses. Reference: the SUNDIALS
// v6.4 NVECTOR_SERIAL and SUNMATRIX_SPARSE implementations (Hindmarsh et al., "SUNDIALS:
// Suite of nonlinear and differential/algebraic equation solvers", ACM TOMS 31, 363, 2005).
#include <catch2/catch.hpp>

#include <cstring>
#include <memory>
#include <random>
#include <vector>

#include <sundials/sundials_context.h>

#include "solver/integrator/SerialKernels.hpp"

using namespace coldtip;

namespace {

constexpr sunindextype kLength = 37; // odd: the kernels' remainder loops run too

struct Context {
    SUNContext ctx = nullptr;
    Context() { REQUIRE(SUNContext_Create(nullptr, &ctx) == 0); }
    ~Context() { SUNContext_Free(&ctx); }
};

struct VectorDeleter {
    void operator()(N_Vector v) const { N_VDestroy(v); }
};
using Vector = std::unique_ptr<std::remove_pointer_t<N_Vector>, VectorDeleter>;

//! Two vectors with the same random contents: one with SUNDIALS' operations, one with ours.
struct Pair {
    Vector plain, fast;
};

Pair randomPair(SUNContext ctx, unsigned seed)
{
    std::mt19937 rng(seed);
    std::uniform_real_distribution<double> u(-3.0, 3.0);
    Pair p{Vector(N_VNew_Serial(kLength, ctx)), Vector(N_VNew_Serial(kLength, ctx))};
    installSerialKernels(p.fast.get());
    for (sunindextype i = 0; i < kLength; ++i)
        NV_Ith_S(p.plain.get(), i) = NV_Ith_S(p.fast.get(), i) = u(rng) / 7.0;
    return p;
}

bool sameBits(N_Vector a, N_Vector b)
{
    return std::memcmp(NV_DATA_S(a), NV_DATA_S(b), sizeof(sunrealtype) * kLength) == 0;
}

const std::vector<double> kCoefficients{1.0, -1.0, 0.0, 0.3, -0.3, 2.5, 1.0 / 3.0};

} // namespace

TEST_CASE("compiled linear sum matches SUNDIALS' serial N_VLinearSum to the last bit")
{
    Context c;
    for (double a : kCoefficients)
        for (double b : kCoefficients)
            for (int alias = 0; alias < 3; ++alias) { // z separate, z = x, z = y
                Pair x = randomPair(c.ctx, 1), y = randomPair(c.ctx, 2), z = randomPair(c.ctx, 3);
                N_Vector zp = alias == 1 ? x.plain.get() : alias == 2 ? y.plain.get() : z.plain.get();
                N_Vector zf = alias == 1 ? x.fast.get() : alias == 2 ? y.fast.get() : z.fast.get();
                N_VLinearSum_Serial(a, x.plain.get(), b, y.plain.get(), zp);
                N_VLinearSum(a, x.fast.get(), b, y.fast.get(), zf);
                INFO("a = " << a << ", b = " << b << ", alias " << alias);
                CHECK(sameBits(zp, zf));
            }
}

TEST_CASE("compiled scale, constant and fused operations match SUNDIALS' serial module")
{
    Context c;
    for (double a : kCoefficients) {
        Pair x = randomPair(c.ctx, 4), z = randomPair(c.ctx, 5);
        N_VScale_Serial(a, x.plain.get(), z.plain.get());
        N_VScale(a, x.fast.get(), z.fast.get());
        CHECK(sameBits(z.plain.get(), z.fast.get()));
        N_VScale_Serial(a, x.plain.get(), x.plain.get());
        N_VScale(a, x.fast.get(), x.fast.get());
        CHECK(sameBits(x.plain.get(), x.fast.get()));
        N_VConst_Serial(a, z.plain.get());
        N_VConst(a, z.fast.get());
        CHECK(sameBits(z.plain.get(), z.fast.get()));
    }

    // z = sum c_i X_i for 1 to 4 terms, z separate, z = X_0 and z = X_1; coefficients with
    // c0 = +-c1, where the fused serial version would round differently. The reference is
    // what CVODE ran before the kernels: SUNDIALS' generic fallback (N_VScale, then
    // N_VLinearSum per term), which N_VLinearCombination takes on a plain serial vector.
    const std::vector<std::vector<double>> coefficient_sets{
        {1.0, 0.25, -1.0, 3.0}, {-0.7, 0.25, -1.0, 3.0}, {0.3, 0.3, 1.0, -2.0}, {0.3, -0.3, 0.5, 0.5}};
    for (int nvec = 1; nvec <= 4; ++nvec)
        for (int alias = 0; alias < 3; ++alias)
            for (auto coef : coefficient_sets) {
                if (alias == 2 && nvec < 2) continue;
                std::vector<Pair> X;
                for (int i = 0; i < nvec; ++i) X.push_back(randomPair(c.ctx, 10 + i));
                Pair z = randomPair(c.ctx, 20);
                std::vector<N_Vector> Xp, Xf;
                for (auto& p : X) {
                    Xp.push_back(p.plain.get());
                    Xf.push_back(p.fast.get());
                }
                N_Vector zp = alias ? Xp[alias - 1] : z.plain.get();
                N_Vector zf = alias ? Xf[alias - 1] : z.fast.get();
                REQUIRE(N_VLinearCombination(nvec, coef.data(), Xp.data(), zp) == 0);
                REQUIRE(N_VLinearCombination(nvec, coef.data(), Xf.data(), zf) == 0);
                INFO("linear combination of " << nvec << ", alias " << alias << ", c0 " << coef[0]
                                              << ", c1 " << coef[1]);
                CHECK(sameBits(zp, zf));
            }

    // Z_i = a_i x + Y_i: Z separate, Z = Y, and Z_0 = x.
    for (int nvec = 1; nvec <= 3; ++nvec)
        for (int alias = 0; alias < 3; ++alias) {
            Pair x = randomPair(c.ctx, 30);
            std::vector<Pair> Y, Z;
            std::vector<N_Vector> Yp, Yf, Zp, Zf;
            for (int i = 0; i < nvec; ++i) {
                Y.push_back(randomPair(c.ctx, 31 + i));
                Z.push_back(randomPair(c.ctx, 40 + i));
                Yp.push_back(Y.back().plain.get());
                Yf.push_back(Y.back().fast.get());
                Zp.push_back(alias == 1 ? Yp.back() : Z.back().plain.get());
                Zf.push_back(alias == 1 ? Yf.back() : Z.back().fast.get());
            }
            if (alias == 2) {
                Zp[0] = x.plain.get();
                Zf[0] = x.fast.get();
            }
            std::vector<double> a{1.0, -0.4, 2.0};
            REQUIRE(N_VScaleAddMulti(nvec, a.data(), x.plain.get(), Yp.data(), Zp.data()) == 0);
            REQUIRE(N_VScaleAddMulti(nvec, a.data(), x.fast.get(), Yf.data(), Zf.data()) == 0);
            for (int i = 0; i < nvec; ++i) CHECK(sameBits(Zp[i], Zf[i]));
        }

    // z = x = y: linear sums of a vector with itself.
    for (double a : kCoefficients)
        for (double b : kCoefficients) {
            Pair x = randomPair(c.ctx, 60);
            N_VLinearSum_Serial(a, x.plain.get(), b, x.plain.get(), x.plain.get());
            N_VLinearSum(a, x.fast.get(), b, x.fast.get(), x.fast.get());
            CHECK(sameBits(x.plain.get(), x.fast.get()));
        }
}

TEST_CASE("fast WRMS norm agrees with SUNDIALS' serial norm to rounding")
{
    Context c;
    Pair x = randomPair(c.ctx, 50), w = randomPair(c.ctx, 51);
    const double plain = N_VWrmsNorm_Serial(x.plain.get(), w.plain.get());
    CHECK(N_VWrmsNorm(x.fast.get(), w.fast.get()) == Approx(plain).epsilon(1e-14));
}

TEST_CASE("compiled sparse copy, zero and scale-add-identity match SUNDIALS' sparse module")
{
    Context c;
    // A 5x5 tridiagonal CSC pattern; the second matrix lacks the diagonal of column 3, so
    // scale-add-identity must fall back to SUNDIALS' version, which inserts it.
    for (bool full_diagonal : {true, false}) {
        auto build = [&](bool fast) {
            SUNMatrix A = SUNSparseMatrix(5, 5, 14, CSC_MAT, c.ctx);
            if (fast) installSparseKernels(A);
            sunindextype* p = SM_INDEXPTRS_S(A);
            sunindextype* r = SM_INDEXVALS_S(A);
            double* v = SM_DATA_S(A);
            sunindextype nz = 0;
            for (sunindextype j = 0; j < 5; ++j) {
                p[j] = nz;
                for (sunindextype i = std::max<sunindextype>(0, j - 1); i <= std::min<sunindextype>(4, j + 1); ++i) {
                    if (i == j && j == 3 && !full_diagonal) continue;
                    r[nz] = i;
                    v[nz++] = 0.1 * (i + 1) - 0.37 * j;
                }
            }
            p[5] = nz;
            return A;
        };
        SUNMatrix plain = build(false), fast = build(true);
        REQUIRE(SUNMatScaleAddI_Sparse(-0.3, plain) == 0);
        REQUIRE(SUNMatScaleAddI(-0.3, fast) == 0);
        const sunindextype nz = SM_INDEXPTRS_S(plain)[5];
        REQUIRE(SM_INDEXPTRS_S(fast)[5] == nz);
        CHECK(std::memcmp(SM_DATA_S(plain), SM_DATA_S(fast), sizeof(double) * nz) == 0);
        CHECK(std::memcmp(SM_INDEXVALS_S(plain), SM_INDEXVALS_S(fast), sizeof(sunindextype) * nz) == 0);

        SUNMatrix clone = SUNMatClone(fast); // carries the compiled operations
        REQUIRE(clone->ops->copy == fast->ops->copy);
        REQUIRE(clone->ops->zero == fast->ops->zero);
        REQUIRE(clone->ops->scaleaddi == fast->ops->scaleaddi);
        REQUIRE(clone->ops->clone == fast->ops->clone);
        REQUIRE(SUNMatCopy(fast, clone) == 0);
        CHECK(std::memcmp(SM_INDEXPTRS_S(clone), SM_INDEXPTRS_S(plain), sizeof(sunindextype) * 6) == 0);
        CHECK(std::memcmp(SM_DATA_S(clone), SM_DATA_S(plain), sizeof(double) * nz) == 0);
        REQUIRE(SUNMatZero(clone) == 0);
        for (sunindextype k = 0; k < SM_NNZ_S(clone); ++k) CHECK(SM_DATA_S(clone)[k] == 0.0);
        CHECK(SM_INDEXPTRS_S(clone)[5] == 0);
        SUNMatDestroy(clone);

        // Into a matrix with too little room: SUNDIALS' copy, which grows it.
        SUNMatrix small = SUNSparseMatrix(5, 5, 4, CSC_MAT, c.ctx);
        installSparseKernels(small);
        REQUIRE(SUNMatCopy(fast, small) == 0);
        REQUIRE(SM_NNZ_S(small) >= nz);
        CHECK(std::memcmp(SM_DATA_S(small), SM_DATA_S(plain), sizeof(double) * nz) == 0);
        CHECK(std::memcmp(SM_INDEXVALS_S(small), SM_INDEXVALS_S(plain), sizeof(sunindextype) * nz) == 0);
        SUNMatDestroy(small);
        SUNMatDestroy(plain);
        SUNMatDestroy(fast);
    }
}
