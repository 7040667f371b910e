#pragma once
// Definitions of alternatives.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <algorithm>
#include <cstddef>
#include <string>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "alternatives.hpp"
#include "analyze.hpp"
#include "detail/core.hpp"
#include "repeating_rule.hpp"

namespace nondim {

namespace detail {

/// The exact rank of the dimensions of `set` (input indices into `dims`).
inline std::size_t exact_rank(const std::vector<dimension>& dims, const std::vector<std::size_t>& set) {
  return run_exact(exact_arithmetic::automatic, [&]<class F>() {
    exact_matrix<F> m = dimension_columns<F>(dims, set);
    return reduce_to_echelon(m).size();
  });
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::vector<analysis> alternatives(const problem& p, const options& o, std::size_t max) {
  const analysis first = analyze(p, o);
  std::vector<analysis> out;
  if (max == 0 || first.rank == 0) return out;
  const std::vector<variable>& vars = p.variables();
  std::vector<dimension> dims;
  std::vector<repeating_preference> preference;
  dims.reserve(vars.size());
  preference.reserve(vars.size());
  for (const auto& v : vars) {
    dims.push_back(v.dim);
    preference.push_back(repeating_preference_of(v.name, v.dim, v.kind));
  }
  const std::size_t dependent = *first.index_of(first.dependent);
  std::vector<std::size_t> candidates;
  for (std::size_t j : repeating_candidate_order(dims, dependent, preference))
    if (!dims[j].is_dimensionless()) candidates.push_back(j);

  std::vector<std::size_t> taken;  // the primary set, sorted, to leave out
  for (const auto& r : first.repeating) taken.push_back(*first.index_of(r));
  std::sort(taken.begin(), taken.end());

  // depth first over positions in the candidate order: the sets come out in the order of
  // the rule; a partial set whose dimensions are dependent is not extended
  std::vector<std::vector<std::size_t>> sets;
  std::vector<std::size_t> set;
  std::size_t examined = 0;
  const std::size_t k = first.rank;
  const auto search = [&](const auto& self, std::size_t from) -> void {
    if (sets.size() >= max || examined >= alternative_search_limit) return;
    if (set.size() == k) {
      std::vector<std::size_t> sorted = set;
      std::sort(sorted.begin(), sorted.end());
      if (sorted != taken) sets.push_back(sorted);
      return;
    }
    for (std::size_t c = from; c + (k - set.size()) <= candidates.size(); ++c) {
      if (sets.size() >= max || examined >= alternative_search_limit) return;
      set.push_back(candidates[c]);
      ++examined;
      if (detail::exact_rank(dims, set) == set.size()) self(self, c + 1);
      set.pop_back();
    }
  };
  search(search, 0);

  options each = o;
  each.form = basis::classical;
  for (const auto& s : sets) {
    each.repeating.clear();
    for (std::size_t j : s) each.repeating.push_back(vars[j].name);
    out.push_back(analyze(p, each));
  }
  return out;
}

}  // namespace nondim
