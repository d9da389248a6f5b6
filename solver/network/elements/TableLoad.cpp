#include "solver/network/elements/TableLoad.hpp"

#include <algorithm>
#include <stdexcept>

namespace coldtip {

TableLoad::TableLoad(Variable variable, std::vector<double> x, std::vector<double> Q)
    : m_variable(variable), m_x(std::move(x)), m_Q(std::move(Q))
{
    if (m_x.empty() || m_x.size() != m_Q.size())
        throw std::invalid_argument("TableLoad: points and values differ in number");
    for (std::size_t i = 1; i < m_x.size(); ++i)
        if (!(m_x[i] > m_x[i - 1]))
            throw std::invalid_argument("TableLoad: table points not increasing");
}

models::Slope TableLoad::at(double x) const
{
    if (x <= m_x.front()) return {m_Q.front(), 0.0};
    if (x >= m_x.back()) return {m_Q.back(), 0.0};
    const auto hi = std::upper_bound(m_x.begin(), m_x.end(), x) - m_x.begin();
    const auto lo = hi - 1;
    const double slope = (m_Q[hi] - m_Q[lo]) / (m_x[hi] - m_x[lo]);
    return {m_Q[lo] + slope * (x - m_x[lo]), slope};
}

models::Slope TableLoad::heat(double t, double T) const
{
    if (m_variable == Variable::Time) return {at(t).value, 0.0};
    return at(T);
}

std::string TableLoad::describe() const
{
    return m_variable == Variable::Time ? "scheduled load" : "temperature-dependent load";
}

} // namespace coldtip
