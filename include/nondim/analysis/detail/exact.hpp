#pragma once
/// \file exact.hpp
/// \brief Internals of the exact elimination: the two scalar fields (checked int64
/// `rational` and `cpp_rational`), Gauss-Jordan reduction to the reduced row echelon form,
/// and scaling of rational vectors to primitive integer vectors.

#include <cstddef>
#include <cstdint>
#include <limits>
#include <span>
#include <string>
#include <utility>
#include <vector>

#include <boost/multiprecision/cpp_int.hpp>

#include "../../core/format.hpp"
#include "../../core/rational.hpp"

namespace nondim::detail {

/// The fallback field: exact rationals of unbounded size.
using big_rational = boost::multiprecision::cpp_rational;
using big_integer = boost::multiprecision::cpp_int;

/// Internal: a primitive integer vector that does not fit in int64 (only the
/// multiprecision path can produce one; the caller turns it into an `analysis_error`).
struct integers_too_large {
  std::string example;  ///< one of the entries that does not fit, in decimal
};

// ---- the field operations the elimination needs, for both fields -----------------------

template <class F>
F from_rational(const rational& r);
template <>
inline rational from_rational<rational>(const rational& r) {
  return r;
}
template <>
inline big_rational from_rational<big_rational>(const rational& r) {
  big_rational x = r.num;
  x /= r.den;
  return x;
}

inline bool is_zero(const rational& x) noexcept {
  return x.is_zero();
}
inline bool is_zero(const big_rational& x) {
  return x.is_zero();
}
inline bool is_negative(const rational& x) noexcept {
  return x.num < 0;
}
inline bool is_negative(const big_rational& x) {
  return x.sign() < 0;
}
inline bool is_one(const rational& x) noexcept {
  return x.num == 1 && x.den == 1;
}
inline bool is_one(const big_rational& x) {
  return x == 1;
}

inline std::string to_text(const rational& x) {
  return to_string(x);
}
inline std::string to_text(const big_rational& x) {
  return x.str();
}

/// \brief A dense row-major matrix over F.
template <class F>
struct exact_matrix {
  std::size_t rows = 0;
  std::size_t cols = 0;
  std::vector<F> a;

  exact_matrix(std::size_t r, std::size_t c) : rows(r), cols(c), a(r * c) {}
  F& operator()(std::size_t r, std::size_t c) { return a[r * cols + c]; }
  const F& operator()(std::size_t r, std::size_t c) const { return a[r * cols + c]; }
};

/// \brief Reduces `m` in place to its reduced row echelon form (Gauss-Jordan) and returns
/// the pivot columns, left to right; their count is the rank.
///
/// The reduced form is unique, so the pivot chosen in a column does not change the result:
/// the first non-zero entry is taken. Zero entries are skipped (dimension matrices are
/// sparse). With F = rational every operation is checked and throws `rational_overflow`.
template <class F>
std::vector<std::size_t> reduce_to_echelon(exact_matrix<F>& m) {
  std::vector<std::size_t> pivots;
  std::size_t r = 0;
  for (std::size_t c = 0; c < m.cols && r < m.rows; ++c) {
    std::size_t p = r;
    while (p < m.rows && is_zero(m(p, c))) ++p;
    if (p == m.rows) continue;
    if (p != r)
      for (std::size_t k = c; k < m.cols; ++k) std::swap(m(p, k), m(r, k));
    if (!is_one(m(r, c))) {
      const F inv = F(1) / m(r, c);
      for (std::size_t k = c + 1; k < m.cols; ++k)
        if (!is_zero(m(r, k))) m(r, k) *= inv;
      m(r, c) = F(1);
    }
    for (std::size_t i = 0; i < m.rows; ++i) {
      if (i == r || is_zero(m(i, c))) continue;
      const F f = m(i, c);
      for (std::size_t k = c + 1; k < m.cols; ++k)
        if (!is_zero(m(r, k))) m(i, k) -= f * m(r, k);
      m(i, c) = F(0);
    }
    pivots.push_back(c);
    ++r;
  }
  return pivots;
}

/// \brief The rational vector `v` scaled by a positive factor to integers whose gcd is 1
/// (all zeros stay zeros).
/// \throws rational_overflow (int64 field) when an intermediate does not fit;
///         integers_too_large (multiprecision field) when a result does not fit in int64.
inline std::vector<std::int64_t> primitive_integer_vector(std::span<const rational> v) {
  std::int64_t l = 1;
  for (const auto& x : v) {
    if (x.is_zero()) continue;
    l = checked_mul(l / gcd_magnitude(l, x.den), x.den);
  }
  std::vector<std::int64_t> out(v.size());
  std::int64_t g = 0;
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (v[i].is_zero()) continue;
    out[i] = checked_mul(v[i].num, l / v[i].den);
    g = g == 0 ? gcd_magnitude(out[i], out[i]) : gcd_magnitude(g, out[i]);
  }
  if (g > 1)
    for (auto& e : out) e /= g;
  return out;
}

inline std::vector<std::int64_t> primitive_integer_vector(std::span<const big_rational> v) {
  big_integer l = 1;
  for (const auto& x : v) {
    if (x.is_zero()) continue;
    l = boost::multiprecision::lcm(l, big_integer(boost::multiprecision::denominator(x)));
  }
  std::vector<big_integer> ints(v.size());
  big_integer g = 0;
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (v[i].is_zero()) continue;
    ints[i] = boost::multiprecision::numerator(v[i]) * (l / boost::multiprecision::denominator(v[i]));
    g = g == 0 ? big_integer(abs(ints[i])) : big_integer(boost::multiprecision::gcd(g, ints[i]));
  }
  std::vector<std::int64_t> out(v.size());
  const big_integer lo = std::numeric_limits<std::int64_t>::min();
  const big_integer hi = std::numeric_limits<std::int64_t>::max();
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (g > 1) ints[i] /= g;
    if (ints[i] < lo || ints[i] > hi) throw integers_too_large{ints[i].str()};
    out[i] = ints[i].convert_to<std::int64_t>();
  }
  return out;
}

}  // namespace nondim::detail
