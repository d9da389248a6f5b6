#pragma once
//! \file Plausibility.hpp
//! Whether a case that reads correctly describes a machine coldtip's models can mean: its
//! gas must stay a gas at every temperature given (the gas models are ideal gases), and
//! property fits used outside their published ranges are reported. Run by the case reader
//! after every key has been read, so that the messages point at the key.

#include "solver/case/CaseDescription.hpp"

#include <string>
#include <vector>

namespace coldtip::input {

//! Throws InputError at the key of a temperature at which the working gas would condense
//! (below its saturation temperature at the charge pressure) or freeze (below its triple
//! point). Returns one-line warnings ("FILE:LINE:COL: warning: KEY: ...") for what is
//! legitimate but outside a model's published range: a gas below its critical temperature
//! (real-gas effects the ideal gas leaves out), a gas or solid property fit used outside
//! its temperature range (its values are held at the end of the range), a screen porosity
//! outside the range its correlation was measured on.
std::vector<std::string> checkPlausible(const CaseDescription& c);

} // namespace coldtip::input
