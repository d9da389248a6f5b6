#pragma once
//! \file Passages.hpp
//! The closure laws (models/correlations) of the passage a case file describes.

#include <memory>

#include "models/correlations/FlowPassage.hpp"
#include "solver/case/CaseDescription.hpp"

namespace coldtip {

//! Laws of an open circular tube of `diameter` [m] and wall `roughness` [m].
std::unique_ptr<models::FlowPassage> makeTubePassage(double diameter, double roughness);
//! Laws of a filled passage (slots, screen, spheres).
std::unique_ptr<models::FlowPassage> makeFilledPassage(const FillSpec& fill);

} // namespace coldtip
