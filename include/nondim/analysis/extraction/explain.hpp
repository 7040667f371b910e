#pragma once
/// \file explain.hpp
/// \brief Internals: the sentences that explain an isolated variable and a rank deficiency,
/// shared by `analyze()` and the text views.

#include <cstddef>
#include <string>
#include <vector>

#include "../../solver/core/format.hpp"
#include "../config.hpp"
#include "problem.hpp"
#include "result.hpp"

namespace nondim::detail {

/// \brief Why variable `j` (isolated: its dimension is no product of powers of the others')
/// can appear in no group.
std::string isolation_reason(const std::vector<variable>& vars, std::size_t j, bool is_dependent,
                             text_form form = text_form::ascii);

/// \brief The sentence that explains a rank below the count of base dimensions present.
std::string explain_deficiency(std::size_t rank, const rank_deficiency& d, text_form form = text_form::ascii);

}  // namespace nondim::detail

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "explain.ipp"
#endif
