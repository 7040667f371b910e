#pragma once
/// \file markdown.hpp
/// \brief The analysis as Markdown for a test plan or report: the dimension matrix and the
/// groups as tables, the rank, repeating and excluded variables and the SVD check as text.

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

#include "../../analysis.hpp"
#include "../../solver/core/detail/cat.hpp"
#include "../config.hpp"
#include "../extraction/explain.hpp"
#include "detail/names.hpp"
#include "detail/table.hpp"
#include "options.hpp"
#include "text.hpp"

namespace nondim {

/// \brief The analysis as GitHub-flavoured Markdown (Unicode symbols: ρ, U⁻², Π1).
std::string markdown_report(const analysis& a, const report_options& o = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "markdown.ipp"
#endif
