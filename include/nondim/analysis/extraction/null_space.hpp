#pragma once
/// \file null_space.hpp
/// \brief The exact rank and null space of a dimension matrix alone (no names, no choice
/// of repeating variables): the elimination that `analyze()` is built on.

#include <cstddef>
#include <cstdint>
#include <span>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "detail/core.hpp"
#include "detail/exact.hpp"
#include "error.hpp"
#include "matrix.hpp"
#include "options.hpp"

namespace nondim {

/// \brief Exact rank and a basis of the null space of a dimension matrix.
struct null_space_basis {
  std::size_t rank = 0;
  std::vector<std::size_t> pivots;                 ///< pivot columns of the reduced row echelon form
  std::vector<std::vector<std::int64_t>> vectors;  ///< one per non-pivot column, left to right
  bool multiprecision = false;                     ///< cpp_rational gave the result

  friend bool operator==(const null_space_basis&, const null_space_basis&) = default;
};

/// \brief The rank of `a` and the basis of its null space read off the reduced row echelon
/// form: for non-pivot column f, x_f > 0, x at the pivots, zero elsewhere, scaled to
/// primitive integers. Exact: checked int64 first, cpp_rational on overflow (as `arithmetic`
/// says).
/// \throws analysis_error when a basis vector does not fit in int64, or when
///         `exact_arithmetic::int64` was asked for and the elimination overflows.
inline null_space_basis exact_null_space(const dimension_matrix& a,
                                         exact_arithmetic arithmetic = exact_arithmetic::automatic) {
  return detail::run_exact(arithmetic, [&]<class F>() {
    const std::size_t n = a.cols();
    std::vector<std::size_t> order(n);
    for (std::size_t j = 0; j < n; ++j) order[j] = j;
    const detail::exact_matrix<F> m = detail::dimension_columns<F>(a.columns(), order);
    const auto e = detail::fraction_free_echelon(m);
    null_space_basis out;
    out.multiprecision = !std::is_same_v<F, rational>;
    out.pivots = e.pivots;
    out.rank = out.pivots.size();
    std::vector<bool> is_pivot(n, false);
    for (std::size_t p : out.pivots) is_pivot[p] = true;
    out.vectors.reserve(n - out.rank);
    for (std::size_t c = 0; c < n; ++c) {
      if (is_pivot[c]) continue;
      try {
        out.vectors.push_back(detail::echelon_null_vector(e, c, std::span<const std::size_t>(order), n));
      } catch (const detail::integers_too_large& x) {
        throw analysis_error(detail::cat("nondim: the null vector of column ", std::to_string(c + 1),
                                          " needs an exponent beyond 64 bits (", x.example, ")"));
      }
    }
    return out;
  });
}

}  // namespace nondim
