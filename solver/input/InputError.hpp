#pragma once
//! \file InputError.hpp
//! The one error type for bad input: it says where (file, line, column, key path), what
//! was wrong and what was expected, and shows the offending line with a caret:
//!
//!     case.yaml:28:83: error: components[2].fill.wire_diameter: the unit 'kg' is a mass,
//!     not a length; expected a length in m, e.g. "20 mm"
//!        28 |     fill: {kind: screen, mesh: 400 in^-1, wire_diameter: 25 kg}
//!           |                                                          ^
//!
//! (the first line is one line; the excerpt is shortened here).
//! Later stages (network assembly) throw it too, with a SourceMark carried in the
//! CaseDescription and the case's source_text.

#include "solver/case/CaseDescription.hpp"

#include <stdexcept>
#include <string>
#include <string_view>

namespace coldtip::input {

class InputError : public std::runtime_error {
public:
    //! `mark`: where (line 0 = no position in the file, e.g. it cannot be opened; an empty
    //! path leaves out the key path); `problem`: what was wrong; `expected`: what would
    //! be right (empty: no "; expected" clause); `sourceText`: the file's text, for the
    //! excerpt (empty: no excerpt).
    //! Message: `FILE:LINE:COL: error: KEY.PATH: problem; expected WHAT`, then the line
    //! and a caret line under the column.
    InputError(SourceMark mark, std::string problem, std::string expected,
               std::string_view sourceText = {});

    const SourceMark& mark() const noexcept { return m_mark; }
    const std::string& problem() const noexcept { return m_problem; }
    const std::string& expected() const noexcept { return m_expected; }

private:
    SourceMark m_mark;
    std::string m_problem;
    std::string m_expected;
};

//! Line `line` (1-based) of `text` under a line-number gutter, and a caret line pointing
//! at byte column `column` (1-based); empty if the text has no such line.
std::string sourceExcerpt(std::string_view text, int line, int column);

} // namespace coldtip::input
