#pragma once
//! \file CaseReader.hpp
//! Reads a case file (YAML, DESIGN.md §6) into a validated CaseDescription in SI units.
//! Every key is declared (KeyTable.hpp); quantities take units (UnitConverter.hpp); any
//! problem is an InputError pointing at the place in the file (InputError.hpp). The
//! reader writes no file; readCaseFile prints the case's warnings (Plausibility.hpp) to
//! stderr, one line each.

#include "solver/case/CaseDescription.hpp"
#include "solver/input/InputError.hpp"

#include <string>

namespace coldtip::input {

//! The case in file `path`. Throws InputError if the file does not exist, cannot be read,
//! is empty, is not YAML, or does not describe a valid case; prints its warnings to stderr.
CaseDescription readCaseFile(const std::string& path);

//! The case written in `text`; `pathForMessages` names it in errors and in
//! CaseDescription::source_path. Throws InputError; warnings are left in
//! CaseDescription::warnings.
CaseDescription parseCaseText(const std::string& text,
                              const std::string& pathForMessages);

} // namespace coldtip::input
