#include "solver/integrator/FastNorm.hpp"

#include <cmath>

namespace coldtip {

namespace {
sunrealtype weightedSquareSum(N_Vector x, N_Vector w)
{
    const sunindextype n = NV_LENGTH_S(x);
    const sunrealtype* xd = NV_DATA_S(x);
    const sunrealtype* wd = NV_DATA_S(w);
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
} // namespace

sunrealtype fastWrmsNorm(N_Vector x, N_Vector w)
{
    return std::sqrt(weightedSquareSum(x, w) / NV_LENGTH_S(x));
}

void installFastNorm(N_Vector v)
{
    v->ops->nvwrmsnorm = fastWrmsNorm;
    v->ops->nvwsqrsumlocal = weightedSquareSum;
}

} // namespace coldtip
