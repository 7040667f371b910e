#pragma once
/// \file core.hpp
/// \brief Internals: the exact part of `analyze()`, written once for both fields and run in
/// checked int64 first, again in cpp_rational when that overflows.

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <span>
#include <string>
#include <type_traits>
#include <utility>
#include <vector>

#include "../../../solver/core/detail/cat.hpp"
#include "../../../solver/core/dimension.hpp"
#include "../../../solver/core/format.hpp"
#include "../error.hpp"
#include "../options.hpp"
#include "../repeating_rule.hpp"
#include "exact.hpp"

namespace nondim::detail {

/// What the exact elimination yields; every number fits in 64 bits.
struct exact_outcome {
  std::size_t rank = 0;
  std::vector<std::size_t> repeating;  ///< input indices, in the order reported
  std::vector<std::size_t> heads;  ///< non-repeating variable of each group: the dependent one first, then ascending
  std::vector<std::vector<std::int64_t>> groups;  ///< aligned with `heads`, n entries each
  std::vector<dimension> spanning;                ///< primitive basis of the dimensions spanned
  bool spanning_too_large = false;                ///< that basis has exponents beyond 64 bits
  bool multiprecision = false;
};

/// The 7 x n matrix of `dims` with its columns in `order`.
template <class F>
exact_matrix<F> dimension_columns(const std::vector<dimension>& dims, const std::vector<std::size_t>& order) {
  exact_matrix<F> m(base_dimension_count, order.size());
  for (std::size_t j = 0; j < order.size(); ++j)
    for (std::size_t i = 0; i < base_dimension_count; ++i) m(i, j) = from_rational<F>(dims[order[j]][i]);
  return m;
}

/// ASCII product `a*b^-1` of names with F exponents (zero exponents skipped).
template <class F>
std::string product_text(const std::vector<std::string>& names, const std::vector<F>& e) {
  std::string s;
  for (std::size_t i = 0; i < names.size(); ++i) {
    if (is_zero(e[i])) continue;
    if (!s.empty()) s += '*';
    s += names[i];
    if (is_one(e[i])) continue;
    const std::string t = to_text(e[i]);
    const bool fraction = t.find('/') != std::string::npos;
    s.append(fraction ? "^(" : "^");
    s.append(t);
    if (fraction) s.push_back(')');
  }
  return s.empty() ? "1" : s;
}

/// \brief The exact part of the analysis in field F.
/// \param dims      the dimension of each variable, in input order
/// \param names     their names
/// \param given     the given repeating variables (input indices), empty for the automatic choice
/// \param dependent the index of the dependent variable
/// \param preference for the automatic choice, which variable of a dimension a textbook
///        repeats (`repeating_preference_of`), one per variable or empty
/// \throws analysis_error when the given repeating variables are not `rank` independent ones,
///         or when a result does not fit in 64 bits (multiprecision field only);
///         rational_overflow (int64 field) when an intermediate does not fit.
template <class F>
exact_outcome exact_core(const std::vector<dimension>& dims, const std::vector<std::string>& names,
                         const std::vector<std::size_t>& given, std::size_t dependent,
                         const std::vector<repeating_preference>& preference) {
  const std::size_t n = dims.size();
  exact_outcome out;
  out.multiprecision = !std::is_same_v<F, rational>;

  // Column order: the given repeating variables first; or the candidates in the order of
  // the rule (repeating_rule.hpp) with the dependent variable last. The pivot columns of
  // the reduced form are then exactly the greedy choice "take each that raises the rank",
  // in that order.
  std::vector<std::size_t> order;
  order.reserve(n);
  if (!given.empty()) {
    order = given;
    for (std::size_t j = 0; j < n; ++j)
      if (std::find(given.begin(), given.end(), j) == given.end()) order.push_back(j);
  } else {
    order = repeating_candidate_order(dims, dependent, preference);
    order.push_back(dependent);
  }

  const exact_matrix<F> m = dimension_columns<F>(dims, order);
  const auto ech = fraction_free_echelon(m);
  const std::vector<std::size_t>& pivots = ech.pivots;
  out.rank = pivots.size();

  if (!given.empty()) {
    if (given.size() != out.rank) {
      std::string list;
      for (std::size_t g : given) list.append(list.empty() ? "" : ", ").append(names[g]);
      throw analysis_error(cat("nondim: ", std::to_string(given.size()), " repeating variable",
                               given.size() == 1 ? "" : "s", " given (", list,
                               ") but the rank of the dimension matrix is ", std::to_string(out.rank), ", so ",
                               std::to_string(out.rank), " are needed"));
    }
    for (std::size_t k = 0; k < given.size(); ++k) {
      if (pivots[k] == k) continue;
      // given[k] is the first whose dimension the ones before it already span; column k
      // of the reduced form holds its exponents over them.
      std::vector<std::string> used;
      std::vector<F> used_e;
      for (std::size_t r = 0; r < k; ++r) {
        used.push_back(names[given[r]]);
        used_e.push_back(ratio(ech(r, k), ech.denominator));
      }
      const std::string& who = names[given[k]];
      throw analysis_error(cat("nondim: the repeating variables must have independent dimensions, but that of '", who,
                               "' (", to_string(dims[given[k]]), ") is the dimension of ", product_text(used, used_e),
                               ", made of the repeating variables before it"),
                           who);
    }
  }

  // Pivot columns are the repeating variables; every other column gives one group in the
  // classical form: x[free] = 1, x[pivot_i] = -R(i, free), scaled to primitive integers.
  std::vector<bool> is_pivot(n, false);
  for (std::size_t p : pivots) is_pivot[p] = true;
  if (!given.empty()) {
    out.repeating = given;
  } else {
    for (std::size_t p : pivots) out.repeating.push_back(order[p]);
    std::sort(out.repeating.begin(), out.repeating.end());
  }
  std::vector<std::pair<std::size_t, std::size_t>> free_columns;  // (input index, position)
  for (std::size_t c = 0; c < n; ++c)
    if (!is_pivot[c]) free_columns.emplace_back(order[c], c);
  std::sort(free_columns.begin(), free_columns.end());
  out.groups.reserve(free_columns.size());
  for (const auto& [head, c] : free_columns) {
    try {
      out.groups.push_back(echelon_null_vector(ech, c, std::span<const std::size_t>(order), n));
    } catch (const integers_too_large& e) {
      throw analysis_error(cat("nondim: the group of '", names[head], "' needs an exponent beyond 64 bits (", e.example,
                               "); the exact answer cannot be given as int64 exponents"),
                           names[head]);
    }
    out.heads.push_back(head);
  }
  // DESIGN.md: the group of the dependent variable comes first
  const auto dep = std::find(out.heads.begin(), out.heads.end(), dependent);
  if (dep != out.heads.end()) {
    const auto k = dep - out.heads.begin();
    std::rotate(out.heads.begin(), dep, dep + 1);
    std::rotate(out.groups.begin(), out.groups.begin() + k, out.groups.begin() + k + 1);
  }

  // The dimensions spanned: the reduced form of the transpose, whose rows are a basis of
  // the column space expressed over the base dimensions (explains rank deficiency). When
  // the rank equals the count of base dimensions present, the column space is spanned by
  // those base dimensions and that reduced form is their unit rows, in order: no second
  // elimination is needed.
  std::vector<std::size_t> present;
  for (std::size_t i = 0; i < base_dimension_count; ++i)
    if (std::any_of(dims.begin(), dims.end(), [i](const dimension& d) { return !d[i].is_zero(); }))
      present.push_back(i);
  if (present.size() == out.rank) {
    for (std::size_t i : present) {
      std::array<rational, base_dimension_count> e{};
      e[i] = 1;
      out.spanning.emplace_back(e);
    }
    return out;
  }
  exact_matrix<F> t(n, base_dimension_count);
  for (std::size_t j = 0; j < n; ++j)
    for (std::size_t i = 0; i < base_dimension_count; ++i) t(j, i) = from_rational<F>(dims[j][i]);
  const std::size_t rank_t = reduce_to_echelon(t).size();
  try {
    for (std::size_t r = 0; r < rank_t; ++r) {
      const std::vector<std::int64_t> e = primitive_integer_vector(std::span<const F>(&t(r, 0), base_dimension_count));
      out.spanning.push_back(dimension{e[0], e[1], e[2], e[3], e[4], e[5], e[6]});
    }
  } catch (const integers_too_large&) {
    // Only an explanation is lost, not a result: say so rather than refuse the analysis.
    out.spanning.clear();
    out.spanning_too_large = true;
  }
  return out;
}

/// \brief Runs `fn.template operator()<F>()` in checked int64 (`F = rational`) and, when
/// that overflows, again in cpp_rational, as `arithmetic` asks.
/// \throws analysis_error when `arithmetic` is `int64` and the int64 run overflows.
template <class Fn>
auto run_exact(exact_arithmetic arithmetic, Fn&& fn) {
  if (arithmetic == exact_arithmetic::multiprecision) return fn.template operator()<big_rational>();
  try {
    return fn.template operator()<rational>();
  } catch (const rational_overflow&) {
    if (arithmetic == exact_arithmetic::int64)
      throw analysis_error(
          "nondim: the exact elimination overflows 64-bit integers and the int64 arithmetic was asked for; "
          "use exact_arithmetic::automatic or multiprecision");
  }
  return fn.template operator()<big_rational>();
}

}  // namespace nondim::detail
