#pragma once
/// \file constexpr_basis.hpp
/// \brief Exact linear algebra on dimension exponents for constant evaluation: the
/// compile-time half of the pi theorem (`pi_exponents`, `pi_groups`) and of reference
/// scales (`scales`). Standard library only.
///
/// Everything here works on plain arrays of `rational` inside `consteval` functions
/// (GCC 12 rejects some loops that fill named `dimension` locals in namespace-scope
/// initialisers). Overflow of the 64-bit rationals is not thrown here: it is recorded
/// in a flag so that the caller can fail a `static_assert` whose message starts
/// `nondim:` instead of an anonymous "not a constant expression". Either way it is a
/// compile error, never a wrong basis.

#include <array>
#include <cstddef>
#include <cstdint>
#include <limits>

#include "../../core/dimension.hpp"
#include "../../core/rational.hpp"

namespace nondim::detail {

/// The exponents of one dimension, L M T I Θ N J, as a column of the dimension matrix.
using exponent_column = std::array<rational, base_dimension_count>;

/// \brief `nondim::rational` arithmetic that sets `overflow` instead of throwing.
///
/// Each operation first checks, step by step as `rational` computes it, that no
/// intermediate leaves `int64_t`; only then does it call `rational`'s own operator (which
/// then cannot throw). After an overflow the results are zero and must not be used: the
/// callers test the flag and report it.
struct guarded_arithmetic {
  bool overflow = false;

  static constexpr bool mul_fits(std::int64_t a, std::int64_t b) noexcept {
    std::int64_t r{};
    return !__builtin_mul_overflow(a, b, &r);
  }
  static constexpr bool add_fits(std::int64_t a, std::int64_t b) noexcept {
    std::int64_t r{};
    return !__builtin_add_overflow(a, b, &r);
  }
  static constexpr bool sub_fits(std::int64_t a, std::int64_t b) noexcept {
    std::int64_t r{};
    return !__builtin_sub_overflow(a, b, &r);
  }
  /// Both operands of `rational` are reduced with positive denominators, so gcd never throws here.
  static constexpr std::int64_t gcd(std::int64_t a, std::int64_t b) noexcept {
    std::uint64_t x = a < 0 ? 0 - static_cast<std::uint64_t>(a) : static_cast<std::uint64_t>(a);
    std::uint64_t y = b < 0 ? 0 - static_cast<std::uint64_t>(b) : static_cast<std::uint64_t>(b);
    while (y != 0) {
      const std::uint64_t t = x % y;
      x = y;
      y = t;
    }
    return static_cast<std::int64_t>(x);
  }

  constexpr rational fail() noexcept {
    overflow = true;
    return {};
  }

  constexpr rational add(const rational& a, const rational& b) noexcept {
    if (overflow) return {};
    const std::int64_t g = gcd(a.den, b.den);
    const std::int64_t bd = b.den / g;
    const std::int64_t ad = a.den / g;
    std::int64_t x{};
    std::int64_t y{};
    if (__builtin_mul_overflow(a.num, bd, &x) || __builtin_mul_overflow(b.num, ad, &y) || !add_fits(x, y) ||
        !mul_fits(a.den, bd))
      return fail();
    return a + b;
  }
  constexpr rational sub(const rational& a, const rational& b) noexcept {
    if (overflow) return {};
    const std::int64_t g = gcd(a.den, b.den);
    const std::int64_t bd = b.den / g;
    const std::int64_t ad = a.den / g;
    std::int64_t x{};
    std::int64_t y{};
    if (__builtin_mul_overflow(a.num, bd, &x) || __builtin_mul_overflow(b.num, ad, &y) || !sub_fits(x, y) ||
        !mul_fits(a.den, bd))
      return fail();
    return a - b;
  }
  constexpr rational mul(const rational& a, const rational& b) noexcept {
    if (overflow) return {};
    if (a.num == 0 || b.num == 0) return {};
    const std::int64_t g1 = gcd(a.num, b.den);
    const std::int64_t g2 = gcd(b.num, a.den);
    if (!mul_fits(a.num / g1, b.num / g2) || !mul_fits(a.den / g2, b.den / g1)) return fail();
    return a * b;
  }
  /// `b` must not be zero (the callers divide by pivots only).
  constexpr rational div(const rational& a, const rational& b) noexcept {
    if (overflow) return {};
    if (b.num == 0 || b.num == std::numeric_limits<std::int64_t>::min()) return fail();
    // rational{b.den, b.num} is already in lowest terms; the sign moves to the numerator
    const rational inverse = b.num < 0 ? rational{-b.den, -b.num} : rational{b.den, b.num};
    return mul(a, inverse);
  }
  constexpr rational neg(const rational& a) noexcept {
    if (overflow) return {};
    if (a.num == std::numeric_limits<std::int64_t>::min()) return fail();
    return -a;
  }
  constexpr rational abs(const rational& a) noexcept { return a.num < 0 ? neg(a) : a; }
};

/// \brief Reduced row echelon form, in place, of the first `cols` columns of a
/// `base_dimension_count` x C matrix (rows are base dimensions, columns variables).
/// \return the rank; `pivot_col[k]` is the column of the k-th pivot (pivot rows are 0..rank-1).
///
/// Pivots are taken left to right, so a column is a pivot column exactly when it is not a
/// combination of the columns before it.
template <std::size_t C>
constexpr std::size_t reduce_rows(std::array<std::array<rational, C>, base_dimension_count>& m, std::size_t cols,
                                  std::array<std::size_t, base_dimension_count>& pivot_col,
                                  guarded_arithmetic& g) noexcept {
  std::size_t rank = 0;
  for (std::size_t c = 0; c < cols && rank < base_dimension_count; ++c) {
    std::size_t p = rank;
    while (p < base_dimension_count && m[p][c].is_zero()) ++p;
    if (p == base_dimension_count) continue;
    if (p != rank) {
      for (std::size_t j = 0; j < cols; ++j) {
        const rational t = m[p][j];
        m[p][j] = m[rank][j];
        m[rank][j] = t;
      }
    }
    const rational lead = m[rank][c];
    for (std::size_t j = c; j < cols; ++j) m[rank][j] = g.div(m[rank][j], lead);
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
      if (i == rank || m[i][c].is_zero()) continue;
      const rational f = m[i][c];
      for (std::size_t j = c; j < cols; ++j) m[i][j] = g.sub(m[i][j], g.mul(f, m[rank][j]));
    }
    if (g.overflow) return rank;
    pivot_col[rank] = c;
    ++rank;
  }
  return rank;
}

/// \brief An echelon basis of a growing set of exponent columns: tells whether one more
/// column raises the rank (the rule for choosing repeating variables).
struct span_builder {
  std::array<exponent_column, base_dimension_count> rows{};  // each normalised to 1 at its pivot
  std::array<std::size_t, base_dimension_count> pivot{};
  std::size_t rank = 0;

  /// \brief Adds `v` when it is independent of the columns added so far.
  /// \return whether the rank rose.
  constexpr bool try_add(exponent_column v, guarded_arithmetic& g) noexcept {
    for (std::size_t k = 0; k < rank; ++k) {
      const rational c = v[pivot[k]];
      if (c.is_zero()) continue;
      for (std::size_t i = 0; i < base_dimension_count; ++i) v[i] = g.sub(v[i], g.mul(c, rows[k][i]));
    }
    std::size_t p = 0;
    while (p < base_dimension_count && v[p].is_zero()) ++p;
    if (p == base_dimension_count || g.overflow || rank == base_dimension_count) return false;
    const rational lead = v[p];
    for (auto& e : v) e = g.div(e, lead);
    rows[rank] = v;
    pivot[rank] = p;
    ++rank;
    return true;
  }
};

/// \brief The tier of a column in the rule for repeating variables (DESIGN.md, "Rules for
/// the groups"): 0 a length; 1 a velocity, rotational speed or acceleration; 2 a density;
/// 3 anything else; 4 surface tension, viscosity (dynamic or kinematic), an expansion
/// coefficient or a pure number, taken only when nothing else closes the rank.
constexpr int repeating_tier_of(const exponent_column& c) noexcept {
  // exponents over L M T I Theta N J
  const auto is = [&c](std::int64_t l, std::int64_t m, std::int64_t t, std::int64_t theta) {
    const std::int64_t want[base_dimension_count] = {l, m, t, 0, theta, 0, 0};
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      if (!(c[i] == rational{want[i]})) return false;
    return true;
  };
  if (is(1, 0, 0, 0)) return 0;
  if (is(1, 0, -1, 0) || is(0, 0, -1, 0) || is(1, 0, -2, 0)) return 1;
  if (is(-3, 1, 0, 0)) return 2;
  if (is(0, 0, 0, 0) || is(0, 1, -2, 0) || is(-1, 1, -1, 0) || is(2, 0, -1, 0) || is(0, 0, 0, -1)) return 4;
  return 3;
}

/// Number of base dimensions with a non-zero exponent.
constexpr std::size_t nonzero_count(const exponent_column& c) noexcept {
  std::size_t n = 0;
  for (const auto& e : c) n += e.is_zero() ? 0U : 1U;
  return n;
}

/// \brief Integers proportional to `x` with gcd 1 and the same signs (x must not be all zero).
template <std::size_t N>
constexpr std::array<std::int64_t, N> primitive_integers(const std::array<rational, N>& x,
                                                         guarded_arithmetic& g) noexcept {
  std::array<std::int64_t, N> out{};
  std::int64_t l = 1;  // lcm of the denominators
  for (const auto& e : x) {
    const std::int64_t q = l / guarded_arithmetic::gcd(l, e.den);
    if (!guarded_arithmetic::mul_fits(q, e.den)) {
      g.overflow = true;
      return out;
    }
    l = q * e.den;
  }
  std::int64_t common = 0;
  for (std::size_t i = 0; i < N; ++i) {
    const std::int64_t f = l / x[i].den;
    // INT64_MIN is refused too: the vector's gcd and any negation of it must stay representable
    if (!guarded_arithmetic::mul_fits(x[i].num, f) || x[i].num * f == std::numeric_limits<std::int64_t>::min()) {
      g.overflow = true;
      return out;
    }
    out[i] = x[i].num * f;
    common = guarded_arithmetic::gcd(common, out[i]);
  }
  if (common > 1)
    for (auto& e : out) e /= common;
  return out;
}

}  // namespace nondim::detail
