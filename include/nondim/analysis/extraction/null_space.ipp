#pragma once
// Definitions of null_space.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <cstdint>
#include <span>
#include <string>
#include <type_traits>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "detail/core.hpp"
#include "detail/exact.hpp"
#include "null_space.hpp"

namespace nondim {

NONDIM_ANALYSIS_INLINE null_space_basis exact_null_space(const dimension_matrix& a, exact_arithmetic arithmetic) {
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
