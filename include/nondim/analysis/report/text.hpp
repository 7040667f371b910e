#pragma once
/// \file text.hpp
/// \brief The analysis as plain text for a terminal: the dimension matrix as an aligned
/// table (a row per variable, a column per base dimension that appears), the rank, the
/// dependent and repeating variables, each group with its exponents and recognised names,
/// the excluded variables with the reason, and the SVD cross-check in one line.

#include <cstddef>
#include <string>
#include <vector>

#include "../../analysis.hpp"
#include "../config.hpp"
#include "../extraction/explain.hpp"
#include "detail/names.hpp"
#include "detail/table.hpp"
#include "options.hpp"

namespace nondim {

/// \brief The analysis as text; `form` unicode writes ρ, U⁻², Π1 and Θ, ascii writes rho,
/// U^-2, Pi1 and Theta.
std::string text_report(const analysis& a, const report_options& o = {}, text_form form = text_form::unicode);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "text.ipp"
#endif
