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
#include <type_traits>
#include <utility>
#include <vector>

#include <boost/multiprecision/cpp_int.hpp>

#include "../../../solver/core/format.hpp"
#include "../../../solver/core/rational.hpp"
#include "too_large.hpp"

namespace nondim::detail {

/// The fallback field: exact rationals of unbounded size.
using big_rational = boost::multiprecision::cpp_rational;
using big_integer = boost::multiprecision::cpp_int;

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

// ---- integer rows for the elimination: checked int64 for `rational`, cpp_int for cpp_rational

/// The integer type whose rows stand for rows over F (scaled by a positive factor).
template <class F>
struct row_integer;
template <>
struct row_integer<rational> {
  using type = std::int64_t;
};
template <>
struct row_integer<big_rational> {
  using type = big_integer;
};

/// `p * x - q * y`, checked in int64 (throws `rational_overflow`), exact in cpp_int.
inline std::int64_t combine(std::int64_t p, std::int64_t x, std::int64_t q, std::int64_t y) {
  if (y == 0) return checked_mul(p, x);
  if (x == 0) return checked_neg(checked_mul(q, y));
  return checked_sub(checked_mul(p, x), checked_mul(q, y));
}
inline big_integer combine(const big_integer& p, const big_integer& x, const big_integer& q, const big_integer& y) {
  return p * x - q * y;
}
inline std::int64_t integer_gcd(std::int64_t a, std::int64_t b) {
  return gcd_magnitude(a, b);
}
inline big_integer integer_gcd(const big_integer& a, const big_integer& b) {
  return boost::multiprecision::gcd(a, b);
}
inline bool is_zero(std::int64_t x) noexcept {
  return x == 0;
}
inline bool is_zero(const big_integer& x) {
  return x.is_zero();
}
inline bool is_unit(std::int64_t x) noexcept {
  return x == 1 || x == -1;
}
inline bool is_unit(const big_integer& x) {
  return x == 1 || x == -1;
}

/// `x[k] = p * x[k] - q * y[k]` for k < n, returning a bound on the magnitudes of the new
/// entries (their bitwise or). In int64 the loop has no branch: overflow is gathered and
/// thrown (`rational_overflow`) once, after the row.
inline std::uint64_t combine_rows(std::int64_t p, std::int64_t* x, std::int64_t q, const std::int64_t* y,
                                  std::size_t n) {
  bool overflow = false;
  std::uint64_t bound = 0;
  for (std::size_t k = 0; k < n; ++k) {
    std::int64_t a{};
    std::int64_t b{};
    overflow |= __builtin_mul_overflow(p, x[k], &a);
    overflow |= __builtin_mul_overflow(q, y[k], &b);
    overflow |= __builtin_sub_overflow(a, b, &x[k]);
    bound |= x[k] < 0 ? 0 - static_cast<std::uint64_t>(x[k]) : static_cast<std::uint64_t>(x[k]);
  }
  if (overflow) throw_overflow("nondim: the exact elimination overflows 64 bits");
  return bound;
}
inline std::uint64_t combine_rows(const big_integer& p, big_integer* x, const big_integer& q, const big_integer* y,
                                  std::size_t n) {
  for (std::size_t k = 0; k < n; ++k)
    if (!x[k].is_zero() || !y[k].is_zero()) x[k] = p * x[k] - q * y[k];
  return std::numeric_limits<std::uint64_t>::max();  // no bound: always divide out the gcd
}

/// Divides the row `x` (n entries) by the gcd of its entries.
template <class I>
void make_primitive(I* x, std::size_t n) {
  I g = 0;
  for (std::size_t k = 0; k < n && !is_unit(g); ++k)
    if (!is_zero(x[k])) g = integer_gcd(g, x[k]);
  if (is_zero(g) || is_unit(g)) return;
  for (std::size_t k = 0; k < n; ++k) x[k] /= g;
}

/// Row `r` of `m` as integers: the entries times the lcm of their denominators.
inline void integer_row(const exact_matrix<rational>& m, std::size_t r, std::int64_t* out) {
  std::int64_t l = 1;
  for (std::size_t k = 0; k < m.cols; ++k)
    if (!m(r, k).is_zero() && m(r, k).den != 1) l = checked_mul(l / gcd_magnitude(l, m(r, k).den), m(r, k).den);
  for (std::size_t k = 0; k < m.cols; ++k) out[k] = l == 1 ? m(r, k).num : checked_mul(m(r, k).num, l / m(r, k).den);
}
inline void integer_row(const exact_matrix<big_rational>& m, std::size_t r, big_integer* out) {
  big_integer l = 1;
  for (std::size_t k = 0; k < m.cols; ++k)
    if (!m(r, k).is_zero()) l = boost::multiprecision::lcm(l, big_integer(boost::multiprecision::denominator(m(r, k))));
  for (std::size_t k = 0; k < m.cols; ++k)
    out[k] = boost::multiprecision::numerator(m(r, k)) * (l / boost::multiprecision::denominator(m(r, k)));
}
inline rational ratio(std::int64_t n, std::int64_t d) {
  return {n, d};
}
inline big_rational ratio(const big_integer& n, const big_integer& d) {
  big_rational x = n;
  x /= d;
  return x;
}

/// \brief The reduced row echelon form of a matrix over F, held as integers: for a row
/// `i < rank`, the reduced row is `z(i, k) / denominator`, one positive denominator for
/// all rows; rows from `rank` on are zero.
template <class I>
struct integer_echelon {
  std::size_t rows = 0;
  std::size_t cols = 0;
  std::vector<I> z;                 ///< row-major
  std::vector<std::size_t> pivots;  ///< pivot columns, left to right; their count is the rank
  I denominator = 1;

  I& operator()(std::size_t r, std::size_t c) { return z[r * cols + c]; }
  const I& operator()(std::size_t r, std::size_t c) const { return z[r * cols + c]; }
};

/// \brief The reduced row echelon form of `m` (Gauss-Jordan), as integers.
///
/// The reduced form is unique, so neither the pivot chosen in a column nor the way the
/// rows are combined changes the result. The elimination is fraction-free: each row is kept
/// as integers (the rational row times a factor) and cleared with `p * row - q * pivot_row`;
/// a row is divided by the gcd of its entries when one reaches 2^31 (cpp_int: always),
/// every row once more at the end, and then every row is brought to the lcm of the pivots.
/// Against combining rational entries this saves the gcds of every entry operation, and in
/// int64 the row update is a loop without branches. The result is the reduced form with
/// the smallest common denominator, whatever was divided out on the way. The first non-zero
/// entry of a column is the pivot. With F = rational every operation is checked in int64 and
/// throws `rational_overflow`; with F = cpp_rational the integers are cpp_int, the same steps.
template <class F>
integer_echelon<typename row_integer<F>::type> fraction_free_echelon(const exact_matrix<F>& m) {
  using I = typename row_integer<F>::type;
  integer_echelon<I> e;
  const std::size_t rows = m.rows;
  const std::size_t cols = m.cols;
  e.rows = rows;
  e.cols = cols;
  e.z.resize(rows * cols);
  for (std::size_t i = 0; i < rows; ++i) integer_row(m, i, &e.z[i * cols]);

  std::size_t r = 0;
  for (std::size_t c = 0; c < cols && r < rows; ++c) {
    std::size_t p = r;
    while (p < rows && is_zero(e(p, c))) ++p;
    if (p == rows) continue;
    if (p != r)
      for (std::size_t k = 0; k < cols; ++k) std::swap(e(p, k), e(r, k));
    const I pivot = e(r, c);
    for (std::size_t i = 0; i < rows; ++i) {
      if (i == r || is_zero(e(i, c))) continue;
      // a * row_i - b * row_r with a / b = pivot / e(i, c) in lowest terms
      const I g = integer_gcd(pivot, e(i, c));
      const I a = is_unit(g) ? pivot : I(pivot / g);
      const I b = is_unit(g) ? e(i, c) : I(e(i, c) / g);
      // A row's gcd is divided out only once an entry reaches 2^31 (and at the end): while
      // every entry is below 2^31, no product of the next step can overflow 64 bits.
      if (combine_rows(a, &e(i, 0), b, &e(r, 0), cols) >= (std::uint64_t{1} << 31U)) make_primitive(&e(i, 0), cols);
    }
    e.pivots.push_back(c);
    ++r;
  }

  // one denominator: the lcm of the pivots' magnitudes; row i is scaled by it / its pivot
  // (each row is made primitive first, so its pivot is the lcm of its reduced denominators
  // and the common one divides the determinant of the pivot columns)
  for (std::size_t i = 0; i < r; ++i) make_primitive(&e(i, 0), cols);
  I d = 1;
  for (std::size_t i = 0; i < r; ++i) {
    const I& pv = e(i, e.pivots[i]);
    const I g = integer_gcd(d, pv);
    d = combine(d / g, pv, I(0), I(0));  // d / g * pv, checked
  }
  if (d < 0) d = combine(I(-1), d, I(0), I(0));
  for (std::size_t i = 0; i < r; ++i) {
    const I f = d / e(i, e.pivots[i]);
    if (f == 1) continue;
    for (std::size_t k = 0; k < cols; ++k)
      if (!is_zero(e(i, k))) e(i, k) = combine(f, e(i, k), I(0), I(0));
  }
  e.denominator = d;
  return e;
}

/// \brief Reduces `m` in place to its reduced row echelon form (Gauss-Jordan, see
/// `fraction_free_echelon`) and returns the pivot columns, left to right; their count is
/// the rank.
template <class F>
std::vector<std::size_t> reduce_to_echelon(exact_matrix<F>& m) {
  auto e = fraction_free_echelon(m);
  const std::size_t rank = e.pivots.size();
  for (std::size_t i = 0; i < m.rows; ++i)
    for (std::size_t k = 0; k < m.cols; ++k)
      m(i, k) = i < rank && !is_zero(e(i, k)) ? ratio(e(i, k), e.denominator) : F(0);
  return e.pivots;
}

/// \brief The null vector of the free column `c` of the reduced form `e`, as primitive
/// integers with a positive entry at `c`: entry `where[c]` is 1 and entry `where[pivot r]`
/// is minus the reduced entry (r, c), scaled; `n` entries, zero elsewhere. The same vector
/// as `primitive_integer_vector` of those rationals, without their lcm: the common
/// denominator is known.
/// \throws integers_too_large (cpp_int) when an entry does not fit in int64;
///         rational_overflow (int64) when a negation does not fit.
template <class I>
std::vector<std::int64_t> echelon_null_vector(const integer_echelon<I>& e, std::size_t c,
                                              std::span<const std::size_t> where, std::size_t n) {
  I g = e.denominator;
  for (std::size_t r = 0; r < e.pivots.size() && !is_unit(g); ++r)
    if (!is_zero(e(r, c))) g = integer_gcd(g, e(r, c));
  std::vector<std::int64_t> out(n);
  const auto put = [&](std::size_t at, const I& v) {
    const I q = is_unit(g) ? v : I(v / g);
    if constexpr (std::is_same_v<I, std::int64_t>) {
      out[at] = q;
    } else {
      if (q < std::numeric_limits<std::int64_t>::min() || q > std::numeric_limits<std::int64_t>::max())
        throw integers_too_large{q.str()};
      out[at] = q.template convert_to<std::int64_t>();
    }
  };
  put(where[c], e.denominator);
  for (std::size_t r = 0; r < e.pivots.size(); ++r)
    if (!is_zero(e(r, c))) put(where[e.pivots[r]], combine(I(0), I(0), I(1), e(r, c)));  // -z(r, c)
  return out;
}

/// \brief The rational vector `v` scaled by a positive factor to integers whose gcd is 1
/// (all zeros stay zeros).
/// \throws rational_overflow (int64 field) when an intermediate does not fit;
///         integers_too_large (multiprecision field) when a result does not fit in int64.
inline std::vector<std::int64_t> primitive_integer_vector(std::span<const rational> v) {
  std::int64_t l = 1;
  for (const auto& x : v) {
    if (x.is_zero() || x.den == 1) continue;
    l = checked_mul(l / gcd_magnitude(l, x.den), x.den);
  }
  std::vector<std::int64_t> out(v.size());
  std::int64_t g = 0;
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (v[i].is_zero()) continue;
    out[i] = l == 1 ? v[i].num : checked_mul(v[i].num, l / v[i].den);
    if (g != 1) g = g == 0 ? gcd_magnitude(out[i], out[i]) : gcd_magnitude(g, out[i]);
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
