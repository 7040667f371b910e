#pragma once
// Definitions of runtime_scales.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <cstdint>
#include <limits>
#include <optional>
#include <vector>

#include "detail/core.hpp"
#include "detail/exact.hpp"
#include "runtime_scales.hpp"

namespace nondim::detail {

/// Converts an exact result to a checked int64 rational.
inline rational to_small_rational(const rational& x) {
  return x;
}
inline rational to_small_rational(const big_rational& x) {
  const big_integer n = boost::multiprecision::numerator(x);
  const big_integer d = boost::multiprecision::denominator(x);
  const big_integer lo = std::numeric_limits<std::int64_t>::min();
  const big_integer hi = std::numeric_limits<std::int64_t>::max();
  if (n <= lo || n > hi || d > hi) throw integers_too_large{x.str()};
  return rational{n.convert_to<std::int64_t>(), d.convert_to<std::int64_t>()};
}

/// The 7 x (k + 1) matrix of the dimensions `refs` and `target`, reduced; whether `target`
/// lies in their span (the last column is no pivot).
template <class F>
bool reduce_with_target(const std::vector<dimension>& refs, const dimension& target, exact_matrix<F>& m) {
  const std::size_t k = refs.size();
  for (std::size_t b = 0; b < base_dimension_count; ++b) {
    for (std::size_t i = 0; i < k; ++i) m(b, i) = from_rational<F>(refs[i][b]);
    m(b, k) = from_rational<F>(target[b]);
  }
  const std::vector<std::size_t> pivots = reduce_to_echelon(m);
  return pivots.empty() || pivots.back() != k;
}

/// \brief The exponents k with target = product of refs[i]^k[i], for independent `refs`;
/// nullopt when `target` lies outside their span.
/// \throws integers_too_large when an exponent does not fit 64-bit rationals.
NONDIM_ANALYSIS_INLINE std::optional<std::vector<rational>> span_exponents(const std::vector<dimension>& refs,
                                                                           const dimension& target) {
  return run_exact(exact_arithmetic::automatic, [&]<class F>() -> std::optional<std::vector<rational>> {
    exact_matrix<F> m(base_dimension_count, refs.size() + 1);
    if (!reduce_with_target(refs, target, m)) return std::nullopt;
    // the references are independent: pivot row i belongs to reference i
    std::vector<rational> k(refs.size());
    for (std::size_t i = 0; i < refs.size(); ++i) k[i] = to_small_rational(m(i, refs.size()));
    return k;
  });
}

/// Whether `target` lies in the span of `refs` (which need not be independent).
NONDIM_ANALYSIS_INLINE bool in_span(const std::vector<dimension>& refs, const dimension& target) {
  return run_exact(exact_arithmetic::automatic, [&]<class F>() -> bool {
    exact_matrix<F> m(base_dimension_count, refs.size() + 1);
    return reduce_with_target(refs, target, m);
  });
}

}  // namespace nondim::detail
