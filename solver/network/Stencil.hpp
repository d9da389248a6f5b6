#pragma once
//! \file Stencil.hpp
//! The local sparsity of one element: which state variables it reads (inputs, in the order of
//! the dual-number seeds) and which equations it adds to (outputs), with a dependency mask.
//! The network turns every stencil into entries of one fixed sparsity pattern and hands back
//! a slot in the matrix's data array for each entry, so that assembly is a plain scatter.

#include <cstdint>
#include <stdexcept>
#include <utility>
#include <vector>

#include "solver/network/Dual.hpp"

namespace coldtip {

class Stencil {
public:
    //! Declare a state variable this element reads; returns its seed index.
    int addInput(int column)
    {
        m_inputs.push_back(column);
        if (m_inputs.size() > 32) throw std::logic_error("Stencil: more than 32 inputs");
        return static_cast<int>(m_inputs.size()) - 1;
    }
    //! Declare an equation this element adds to (-1 = none, e.g. a fixed-temperature wall).
    int addOutput(int row)
    {
        m_outputs.push_back(row);
        m_masks.push_back(0u);
        return static_cast<int>(m_outputs.size()) - 1;
    }
    //! Output `out` depends on input `in`.
    void depends(int out, int in) { m_masks.at(out) |= (1u << in); }
    void dependsOnAll(int out)
    {
        for (int k = 0; k < nInputs(); ++k) depends(out, k);
    }

    int nInputs() const { return static_cast<int>(m_inputs.size()); }
    int nOutputs() const { return static_cast<int>(m_outputs.size()); }
    int input(int k) const { return m_inputs[k]; }
    int output(int o) const { return m_outputs[o]; }

    //! (row, column) of every structural entry, in scatter order.
    std::vector<std::pair<int, int>> entries() const
    {
        std::vector<std::pair<int, int>> e;
        forEachEntry([&](int o, int k) { e.emplace_back(m_outputs[o], m_inputs[k]); });
        return e;
    }
    void setSlots(std::vector<int> slots) { m_slots = std::move(slots); }

    //! Add d(outs[o])/d(input k) into the matrix data at the entry's slot.
    template <int N>
    void scatter(const Dual<N>* outs, double* values) const
    {
        std::size_t s = 0;
        forEachEntry([&](int o, int k) { values[m_slots[s++]] += outs[o].d[k]; });
    }

private:
    template <class F>
    void forEachEntry(F&& f) const
    {
        for (int o = 0; o < nOutputs(); ++o) {
            if (m_outputs[o] < 0) continue;
            for (int k = 0; k < nInputs(); ++k)
                if (m_masks[o] & (1u << k)) f(o, k);
        }
    }

    std::vector<int> m_inputs;
    std::vector<int> m_outputs;
    std::vector<std::uint32_t> m_masks;
    std::vector<int> m_slots;
};

} // namespace coldtip
