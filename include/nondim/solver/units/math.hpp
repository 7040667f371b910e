#pragma once
/// \file math.hpp
/// \brief Functions of quantities: powers and roots with exact rational dimensions;
/// transcendental functions only of dimensionless values.

#include <cmath>
#include <limits>
#include <type_traits>

#include "quantity_type.hpp"

namespace nondim {

namespace detail {

/// x^n by squaring (exact in the same cases as repeated multiplication).
template <class R>
NONDIM_ALWAYS_INLINE constexpr R ipow(R x, std::int64_t n) noexcept {
  const bool inv = n < 0;
  std::uint64_t m = inv ? 0 - static_cast<std::uint64_t>(n) : static_cast<std::uint64_t>(n);
  R r = 1;
  while (m != 0) {
    if ((m & 1U) != 0) r *= x;
    x *= x;
    m >>= 1U;
  }
  return inv ? R{1} / r : r;
}

/// r * x^M by the same squaring as `ipow`, unrolled at compile time: GCC 12 at -O2 keeps the
/// loop form for M >= 4 (a counted loop per call), which a hand-written x*x*x*x does not pay.
template <std::uint64_t M, class R>
NONDIM_ALWAYS_INLINE constexpr R upow(R r, R x) noexcept {
  if constexpr (M == 0) {
    return r;
  } else if constexpr ((M & 1U) != 0) {
    return upow<(M >> 1U)>(r * x, x * x);
  } else {
    return upow<(M >> 1U)>(r, x * x);
  }
}
/// x^N for a compile-time N; the same products, in the same order, as `ipow(x, N)`.
template <std::int64_t N, class R>
NONDIM_ALWAYS_INLINE constexpr R ipow(R x) noexcept {
  if constexpr (N < 0) {
    return R{1} / upow<0 - static_cast<std::uint64_t>(N)>(R{1}, x);
  } else {
    return upow<static_cast<std::uint64_t>(N)>(R{1}, x);
  }
}

/// m-th root by Newton's method, for constant evaluation where <cmath> is not constexpr.
template <class R>
constexpr R const_root(R x, std::int64_t m) noexcept {
  if (x != x || x == R{0} || x == std::numeric_limits<R>::infinity()) return x;
  if (x < R{0}) {
    if (m % 2 == 1) return -const_root(-x, m);
    return std::numeric_limits<R>::quiet_NaN();
  }
  R y = x > R{1} ? x : R{1};
  for (int i = 0; i < 2000; ++i) {
    const R next = ((static_cast<R>(m) - 1) * y + x / ipow(y, m - 1)) / static_cast<R>(m);
    if (next >= y) break;  // monotone from above: stop when it stops falling
    y = next;
  }
  return y;
}

template <class R>
NONDIM_ALWAYS_INLINE constexpr R root(R x, std::int64_t m) noexcept {
  if (__builtin_is_constant_evaluated()) return const_root(x, m);
  if (m == 2) return std::sqrt(x);
  if (m == 3) return std::cbrt(x);
  if (x < R{0} && m % 2 == 1) return -std::pow(-x, R{1} / static_cast<R>(m));
  return std::pow(x, R{1} / static_cast<R>(m));
}

}  // namespace detail

/// \brief q^(N/M), the dimension raised exactly: `pow<1, 2>(area)` is a length.
///
/// The value costs what the same expression on `Rep` costs: an integer power is unrolled
/// multiplication; a half or a third power is `std::sqrt` or `std::cbrt` (a negative base has
/// a real cube root), then multiplication; any other exponent is one `std::pow(x, N / M)`, as
/// a solver writes `std::pow(Re, 0.8)`, so a negative base gives NaN there, like `std::pow`.
template <std::int64_t N, std::int64_t M = 1, dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<pow(D, rational{N, M}), R> pow(const quantity<D, R>& q) noexcept {
  constexpr rational p{N, M};
  using result = quantity<pow(D, p), R>;
  const R x = q.si();
  if constexpr (p.den == 1) {
    return result::from_si(detail::ipow<p.num>(x));
  } else if constexpr (p.den <= 3) {
    return result::from_si(detail::ipow<p.num>(detail::root(x, p.den)));
  } else {
    if (__builtin_is_constant_evaluated()) {
      if (x < R{0}) return result::from_si(std::numeric_limits<R>::quiet_NaN());
      return result::from_si(detail::ipow<p.num>(detail::const_root(x, p.den)));
    }
    return result::from_si(std::pow(x, static_cast<R>(p.num) / static_cast<R>(p.den)));
  }
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr auto sqrt(const quantity<D, R>& q) noexcept {
  return pow<1, 2>(q);
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr auto cbrt(const quantity<D, R>& q) noexcept {
  return pow<1, 3>(q);
}

template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> abs(const quantity<D, R>& q) noexcept {
  return quantity<D, R>::from_si(q.si() < R{0} ? -q.si() : q.si());
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> min(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  return b < a ? b : a;
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> max(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  return a < b ? b : a;
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> hypot(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  if (__builtin_is_constant_evaluated())
    return quantity<D, R>::from_si(detail::const_root(a.si() * a.si() + b.si() * b.si(), 2));
  return quantity<D, R>::from_si(std::hypot(a.si(), b.si()));
}
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr quantity<D1, R1> hypot(const quantity<D1, R1>&, const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: hypot needs two quantities of the same dimension");
  return {};
}
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr quantity<D1, R1> min(const quantity<D1, R1>&, const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: min needs two quantities of the same dimension");
  return {};
}
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr quantity<D1, R1> max(const quantity<D1, R1>&, const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: max needs two quantities of the same dimension");
  return {};
}

// Transcendental functions: a dimensionless argument, or a compile error naming the dimension.
#define NONDIM_DIMENSIONLESS_FUNCTION(fn)                                                               \
  template <class R>                                                                                    \
  NONDIM_ALWAYS_INLINE R fn(const quantity<dims::dimensionless, R>& q) noexcept {                       \
    return std::fn(q.si());                                                                             \
  }                                                                                                     \
  template <dimension D, class R>                                                                       \
  requires(!D.is_dimensionless()) inline R fn(const quantity<D, R>&) noexcept {                         \
    static_assert(detail::dimensions_involved<detail::spell_named<D>>,                                  \
                  "nondim: " #fn " needs a dimensionless argument; divide by a reference scale first"); \
    return R{};                                                                                         \
  }
NONDIM_DIMENSIONLESS_FUNCTION(exp)
NONDIM_DIMENSIONLESS_FUNCTION(log)
NONDIM_DIMENSIONLESS_FUNCTION(log10)
NONDIM_DIMENSIONLESS_FUNCTION(log2)
NONDIM_DIMENSIONLESS_FUNCTION(expm1)
NONDIM_DIMENSIONLESS_FUNCTION(log1p)
NONDIM_DIMENSIONLESS_FUNCTION(sin)
NONDIM_DIMENSIONLESS_FUNCTION(cos)
NONDIM_DIMENSIONLESS_FUNCTION(tan)
NONDIM_DIMENSIONLESS_FUNCTION(asin)
NONDIM_DIMENSIONLESS_FUNCTION(acos)
NONDIM_DIMENSIONLESS_FUNCTION(atan)
NONDIM_DIMENSIONLESS_FUNCTION(sinh)
NONDIM_DIMENSIONLESS_FUNCTION(cosh)
NONDIM_DIMENSIONLESS_FUNCTION(tanh)
NONDIM_DIMENSIONLESS_FUNCTION(erf)
#undef NONDIM_DIMENSIONLESS_FUNCTION

/// \brief atan2 of two quantities of the same dimension (the angle of a vector).
template <dimension D, class R>
NONDIM_ALWAYS_INLINE R atan2(const quantity<D, R>& y, const quantity<D, R>& x) noexcept {
  return std::atan2(y.si(), x.si());
}

}  // namespace nondim
