#pragma once
/// \file alternatives.hpp
/// \brief The other admissible sets of repeating variables of a problem, each with its
/// groups, best first by the rule of DESIGN.md (repeating_rule.hpp).

#include <cstddef>
#include <vector>

#include "../config.hpp"
#include "options.hpp"
#include "problem.hpp"
#include "result.hpp"

namespace nondim {

/// How many sets `alternatives()` returns unless told otherwise.
inline constexpr std::size_t default_alternative_count = 10;
/// How many partial sets `alternatives()` examines at most: the search stays short however
/// many variables the problem has (the first sets by the rule are found first).
inline constexpr std::size_t alternative_search_limit = 20000;

/// \brief The analyses of `p` with the other admissible repeating variables.
///
/// A set is admissible when it has `rank` variables of independent dimensions, none of them
/// the dependent variable or dimensionless. The sets are taken in the order of the rule:
/// with the candidates ordered as `repeating_candidate_order` gives them, sets compare by
/// their best member, then their second best, and so on; the set `analyze(p, o)` uses is
/// left out. Each is analysed with `o` and that set as `repeating`, in the classical basis
/// (a named basis spans the same groups whatever the repeating variables), so every group
/// lists the catalog numbers it matches. At most `max` sets; at most
/// `alternative_search_limit` partial sets are examined.
/// \throws analysis_error as `analyze(p, o)` does.
std::vector<analysis> alternatives(const problem& p, const options& o = {},
                                   std::size_t max = default_alternative_count);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "alternatives.ipp"
#endif
