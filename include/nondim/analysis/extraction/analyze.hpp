#pragma once
/// \file analyze.hpp
/// \brief `analyze()`: the exact dimensionless groups of a problem.
///
/// Steps: the dimension matrix; its exact reduced row echelon form (checked int64
/// rationals, redone in cpp_rational on overflow); the repeating variables (validated, or
/// chosen by the rule of DESIGN.md); the groups in the classical form; then, when asked,
/// the re-expression in named groups; last, the SVD cross-check of the final groups.

#include <algorithm>
#include <cstddef>
#include <memory>
#include <string>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "../../solver/core/format.hpp"
#include "../../solver/core/detail/cat.hpp"
#include "detail/core.hpp"
#include "error.hpp"
#include "../names/naming.hpp"
#include "options.hpp"
#include "pi_group.hpp"
#include "problem.hpp"
#include "result.hpp"
#include "svd_check.hpp"

namespace nondim {

namespace detail {

/// `M*T^-2` (ASCII) or `M·T⁻²` (Unicode): a dimension as a product, for sentences.
inline std::string dimension_product(const dimension& d, text_form form) {
  std::string s;
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    if (d[i].is_zero()) continue;
    if (!s.empty()) s += form == text_form::unicode ? "\u00b7" : "*";
    s += dimension_symbol(i, form);
    s += exponent_suffix(d[i], form);
  }
  return s.empty() ? "1" : s;
}

/// "a", "a and b", "a, b and c".
inline std::string spoken_list(const std::vector<std::string>& items) {
  std::string s;
  for (std::size_t i = 0; i < items.size(); ++i) {
    if (i > 0) s += i + 1 == items.size() ? " and " : ", ";
    s += items[i];
  }
  return s;
}

/// The base dimensions in which variable `j` alone has a non-zero exponent.
inline std::vector<std::string> unique_bases(const std::vector<variable>& vars, std::size_t j, text_form form) {
  std::vector<std::string> out;
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    if (vars[j].dim[i].is_zero()) continue;
    bool alone = true;
    for (std::size_t k = 0; k < vars.size() && alone; ++k)
      if (k != j && !vars[k].dim[i].is_zero()) alone = false;
    if (alone) out.emplace_back(dimension_symbol(i, form));
  }
  return out;
}

/// \brief Why variable `j` (isolated: its dimension is no product of powers of the others')
/// can appear in no group.
inline std::string isolation_reason(const std::vector<variable>& vars, std::size_t j, bool is_dependent,
                                    text_form form = text_form::ascii) {
  const std::string name = cat("'", vars[j].name, "'");
  const std::vector<std::string> alone = unique_bases(vars, j, form);
  const std::string dim = dimension_product(vars[j].dim, form);
  std::string why;
  if (!alone.empty())
    why = cat(alone.size() == 1 ? "its base dimension " : "its base dimensions ", spoken_list(alone),
               alone.size() == 1 ? " appears" : " appear", " in no other variable");
  else
    why = cat("no product of powers of the other variables has its dimension ", dim);
  if (is_dependent)
    return cat(name, " is the dependent variable, but ", why,
                ", so no group can contain it: a variable is missing from the problem",
                alone.empty() ? std::string{} : cat(" (one whose dimension involves ", spoken_list(alone), ")"));
  return cat(why, ", so no group can contain ", name,
              ": either it does not affect the result (as the mass of a pendulum) or a variable is missing");
}

/// \brief The sentence that explains a rank below the count of base dimensions present.
inline std::string explain_deficiency(std::size_t rank, const rank_deficiency& d, text_form form = text_form::ascii) {
  if (!d.deficient) return {};
  std::vector<std::string> present;
  for (std::size_t i : d.present) present.emplace_back(dimension_symbol(i, form));
  std::vector<std::string> spanned;
  for (const auto& s : d.spanned) spanned.push_back(dimension_product(s, form));
  std::vector<std::string> combos;
  std::vector<bool> involved(base_dimension_count, false);
  for (const auto& c : d.combinations) {
    combos.push_back(dimension_product(c, form));
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      if (!c[i].is_zero()) involved[i] = true;
  }
  std::vector<std::string> tied;
  for (std::size_t i = 0; i < base_dimension_count; ++i)
    if (involved[i]) tied.emplace_back(dimension_symbol(i, form));
  std::string s = cat("rank ", std::to_string(rank), " is less than the ", std::to_string(d.present.size()),
                       " base dimensions that appear (", spoken_list(present), "): ");
  if (d.too_large) return s.append("they appear only in fixed combinations whose exponents exceed 64 bits");
  s.append("every variable's dimension is a product of powers of ").append(spoken_list(spanned));
  if (!combos.empty())
    s.append(cat(", so ", spoken_list(tied), " appear only in the fixed combination", combos.size() == 1 ? " " : "s ",
                  spoken_list(combos)));
  return s;
}

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
  dims.reserve(n);
  names.reserve(n);
  for (const auto& v : vars) {
    dims.push_back(v.dim);
    names.push_back(v.name);
  }

  const detail::exact_outcome x =
      detail::run_exact(o.arithmetic, [&]<class F>() { return detail::exact_core<F>(dims, names, given, dependent); });

  analysis a;
  a.rank = x.rank;
  a.variables = vars;
  a.matrix = p.matrix();
  a.dependent = names[dependent];
  a.repeating_given = !given.empty();
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

/// \brief The dimensionless groups of `p`, exactly.
///
/// The rank is the exact rank of the dimension matrix; there are `n - rank` groups. With
/// `o.repeating` empty the repeating variables are chosen by the rule of DESIGN.md (the
/// variables other than the dependent one, by fewer base dimensions, then smaller sum of
/// |exponents|, then input order, each taken when it raises the rank; the dependent one
/// last, and then it is isolated and `missing_variable` is set). Each group is in the
/// classical form: one non-repeating variable with a positive exponent times powers of the
/// repeating ones, primitive integer exponents; groups are ordered by the input position of
/// their non-repeating variable. With `o.form == basis::named` the groups are then
/// re-expressed in catalog numbers where the null space allows (naming.hpp,
/// named_basis.hpp). In either basis every group lists the catalog entries it matches in
/// `pi_group::matches`. A numerical disagreement of the SVD check is reported in `svd`,
/// never thrown.
///
/// \throws analysis_error when the problem is empty; the dependent or a repeating variable
///         is not in the problem; a repeating variable is given twice or is dimensionless;
///         the count of repeating variables is not the rank, or their dimensions are not
///         independent (the message names the first that depends on those before it); a
///         group's exact exponents do not fit in 64 bits; `exact_arithmetic::int64` was asked
///         for and the elimination overflows.
inline analysis analyze(const problem& p, const options& o = {}) {
  analysis a = detail::classical_analysis(p, o);
  std::vector<std::size_t> chosen;  // catalog entry of each group in the named basis
  if (o.form == basis::named) chosen = detail::rename_in_catalog_groups(a);
  detail::attach_matches(a, chosen);
  a.svd = check_with_svd(a.matrix, a.groups, a.rank);
  if (!a.svd.agrees)
    a.notes.push_back(detail::cat("the SVD in double finds rank ", std::to_string(a.svd.rank), ", the exact rank is ",
                                   std::to_string(a.rank), ": the dimension matrix is numerically ill-conditioned"));
  return a;
}

}  // namespace nondim
