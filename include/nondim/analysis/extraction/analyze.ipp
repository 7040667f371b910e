#pragma once
// Definitions of analyze.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <algorithm>
#include <cstddef>
#include <memory>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/dimension.hpp"
#include "../../solver/core/format.hpp"
#include "../names/naming.hpp"
#include "analyze.hpp"
#include "detail/core.hpp"
#include "error.hpp"
#include "explain.hpp"
#include "options.hpp"
#include "pi_group.hpp"
#include "problem.hpp"
#include "result.hpp"
#include "svd_check.hpp"

namespace nondim {

namespace detail {

/// \brief The analysis in the classical basis, without the SVD cross-check: the first
/// step of `analyze()`, on which the named re-expression builds.
inline analysis classical_analysis(const problem& p, const options& o) {
  if (p.empty()) throw analysis_error("nondim: the problem has no variables");
  const std::vector<variable>& vars = p.variables();
  const std::size_t n = vars.size();

  std::size_t dependent = 0;
  if (!o.dependent.empty()) {
    const auto d = p.index_of(o.dependent);
    if (!d)
      throw analysis_error(cat("nondim: the dependent variable '", o.dependent, "' is not in the problem"),
                           o.dependent);
    dependent = *d;
  }

  std::vector<std::size_t> given;
  for (const auto& r : o.repeating) {
    const auto j = p.index_of(r);
    if (!j) throw analysis_error(cat("nondim: repeating variable '", r, "' is not in the problem"), r);
    if (std::find(given.begin(), given.end(), *j) != given.end())
      throw analysis_error(cat("nondim: repeating variable '", r, "' is given twice"), r);
    if (vars[*j].dim.is_dimensionless())
      throw analysis_error(cat("nondim: repeating variable '", r,
                               "' is dimensionless; it cannot be repeating (it is a group by itself)"),
                           r);
    given.push_back(*j);
  }

  std::vector<dimension> dims;
  std::vector<std::string> names;
  std::vector<repeating_preference> preference;
  dims.reserve(n);
  names.reserve(n);
  preference.reserve(n);
  for (const auto& v : vars) {
    dims.push_back(v.dim);
    names.push_back(v.name);
    preference.push_back(repeating_preference_of(v.name, v.dim, v.kind));
  }

  const detail::exact_outcome x = detail::run_exact(
      o.arithmetic, [&]<class F>() { return detail::exact_core<F>(dims, names, given, dependent, preference); });

  analysis a;
  a.rank = x.rank;
  a.variables = vars;
  a.matrix = p.matrix();
  a.dependent = names[dependent];
  a.repeating_given = !given.empty();
  a.configuration = o.configuration;
  a.multiprecision = x.multiprecision;
  a.form = basis::classical;
  for (std::size_t r : x.repeating) a.repeating.push_back(names[r]);
  const auto shared_names = std::make_shared<const std::vector<std::string>>(names);
  a.groups.reserve(x.groups.size());
  for (std::size_t k = 0; k < x.groups.size(); ++k) a.groups.emplace_back(x.groups[k], shared_names, x.heads[k]);

  std::vector<bool> repeating(n, false);
  for (std::size_t r : x.repeating) repeating[r] = true;
  for (std::size_t j = 0; j < n; ++j) {
    if (!repeating[j]) continue;  // a non-repeating variable is in its own group
    const bool absent = std::all_of(x.groups.begin(), x.groups.end(), [j](const auto& g) { return g[j] == 0; });
    if (!absent) continue;
    a.isolated.push_back(names[j]);
    a.isolated_reasons.push_back(isolation_reason(vars, j, j == dependent));
    if (j == dependent) a.missing_variable = true;
  }

  a.deficiency.present = a.matrix.present_rows();
  a.deficiency.spanned = x.spanning;
  a.deficiency.too_large = x.spanning_too_large;
  for (const auto& s : x.spanning)
    if (s.base_count() > 1) a.deficiency.combinations.push_back(s);
  a.deficiency.deficient = a.rank < a.deficiency.present.size();
  a.deficiency.explanation = explain_deficiency(a.rank, a.deficiency);

  if (a.missing_variable)
    a.notes.push_back(cat("a variable is missing: the dependent variable '", a.dependent,
                          "' cannot be made dimensionless with the others"));
  if (a.repeating_given && repeating[dependent])
    a.notes.push_back(
        cat("the dependent variable '", a.dependent, "' is repeating, so it may appear in several groups"));
  if (a.deficiency.deficient) a.notes.push_back(a.deficiency.explanation);
  return a;
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE analysis analyze(const problem& p, const options& o) {
  analysis a = detail::classical_analysis(p, o);
  std::vector<std::size_t> chosen;  // catalog entry of each group in the named basis
  if (o.form == basis::named) chosen = detail::rename_in_catalog_groups(a);
  detail::attach_matches(a, chosen);
  if (a.form == basis::named) {
    // the named groups keep to the repeating variables when each still has one other variable
    a.repeating_kept = std::all_of(a.groups.begin(), a.groups.end(), [&a](const pi_group& g) {
      std::size_t others = 0;
      for (std::size_t j = 0; j < g.exponents.size(); ++j)
        if (g.exponents[j] != 0 && !a.is_repeating(a.variables[j].name)) ++others;
      return others <= 1;
    });
  }
  a.svd = check_with_svd(a.matrix, a.groups, a.rank);
  if (!a.svd.agrees)
    a.notes.push_back(detail::cat("the SVD in double finds rank ", std::to_string(a.svd.rank), ", the exact rank is ",
                                  std::to_string(a.rank), ": the dimension matrix is numerically ill-conditioned"));
  return a;
}

}  // namespace nondim
