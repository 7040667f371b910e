#pragma once
/// \file rational.hpp
/// \brief Exact fractions with checked 64-bit arithmetic, usable in constant expressions.

#include <bit>
#include <compare>
#include <cstdint>
#include <limits>
#include <numeric>
#include <stdexcept>

namespace nondim {

/// \brief Thrown when an exact rational result does not fit in 64 bits.
///
/// In a constant expression the throw makes the evaluation ill-formed, so overflow is a
/// compile error there; at run time it is this exception. Never a wrapped value.
class rational_overflow : public std::overflow_error {
 public:
  using std::overflow_error::overflow_error;
};

namespace detail {

__extension__ using int128 = __int128;  // GCC and Clang; __extension__ keeps -Wpedantic quiet

[[noreturn]] inline void throw_overflow(const char* what) {
  throw rational_overflow(what);
}

constexpr std::int64_t checked_add(std::int64_t a, std::int64_t b) {
  std::int64_t r{};
  if (__builtin_add_overflow(a, b, &r)) throw_overflow("nondim: rational addition overflows 64 bits");
  return r;
}
constexpr std::int64_t checked_sub(std::int64_t a, std::int64_t b) {
  std::int64_t r{};
  if (__builtin_sub_overflow(a, b, &r)) throw_overflow("nondim: rational subtraction overflows 64 bits");
  return r;
}
constexpr std::int64_t checked_mul(std::int64_t a, std::int64_t b) {
  std::int64_t r{};
  if (__builtin_mul_overflow(a, b, &r)) throw_overflow("nondim: rational multiplication overflows 64 bits");
  return r;
}
constexpr std::int64_t checked_neg(std::int64_t a) {
  if (a == std::numeric_limits<std::int64_t>::min()) throw_overflow("nondim: rational negation overflows 64 bits");
  return -a;
}
/// gcd of magnitudes; well defined for INT64_MIN as long as the other operand is not 0 or INT64_MIN.
constexpr std::int64_t gcd_magnitude(std::int64_t a, std::int64_t b) {
  std::uint64_t x = a < 0 ? 0 - static_cast<std::uint64_t>(a) : static_cast<std::uint64_t>(a);
  std::uint64_t y = b < 0 ? 0 - static_cast<std::uint64_t>(b) : static_cast<std::uint64_t>(b);
  // binary (Stein's) algorithm: shifts and subtractions instead of a 64-bit division per step
  if (x == 0 || y == 0) {
    x |= y;
  } else {
    const int shift = std::countr_zero(x | y);
    x >>= std::countr_zero(x);
    do {
      y >>= std::countr_zero(y);
      if (x > y) {
        const std::uint64_t t = x;
        x = y;
        y = t;
      }
      y -= x;
    } while (y != 0);
    x <<= shift;
  }
  if (x > static_cast<std::uint64_t>(std::numeric_limits<std::int64_t>::max()))
    throw_overflow("nondim: rational gcd overflows 64 bits");
  return static_cast<std::int64_t>(x);
}

}  // namespace detail

/// \brief An exact fraction `num/den`, always in lowest terms with `den > 0`.
///
/// A structural literal type, so it can be (part of) a template argument. Every operation
/// is checked: a result that does not fit in `int64_t` throws `rational_overflow`.
struct rational {
  std::int64_t num = 0;
  std::int64_t den = 1;

  constexpr rational() noexcept = default;
  constexpr rational(std::int64_t n) noexcept : num(n), den(1) {}  // NOLINT: integers are rationals
  /// \throws std::domain_error when `d == 0` (a compile error in a constant expression).
  constexpr rational(std::int64_t n, std::int64_t d) : num(n), den(d) {
    if (d == 0) throw std::domain_error("nondim: rational with a zero denominator");
    if (n == 0) {
      num = 0;
      den = 1;
      return;
    }
    const std::int64_t g = detail::gcd_magnitude(n, d);
    num = n / g;
    den = d / g;
    if (den < 0) {
      num = detail::checked_neg(num);
      den = detail::checked_neg(den);
    }
  }

  [[nodiscard]] constexpr bool is_integer() const noexcept { return den == 1; }
  [[nodiscard]] constexpr bool is_zero() const noexcept { return num == 0; }
  [[nodiscard]] constexpr double to_double() const noexcept {
    return static_cast<double>(num) / static_cast<double>(den);
  }

  friend constexpr bool operator==(const rational&, const rational&) noexcept = default;
  friend constexpr std::strong_ordering operator<=>(const rational& a, const rational& b) {
    // cross-multiply in 128 bits: exact for every pair of int64 fractions
    const detail::int128 l = static_cast<detail::int128>(a.num) * b.den;
    const detail::int128 r = static_cast<detail::int128>(b.num) * a.den;
    return l <=> r;
  }

  friend constexpr rational operator-(const rational& a) { return {detail::checked_neg(a.num), a.den}; }
  friend constexpr rational operator+(const rational& a, const rational& b) {
    if (a.den == 1 && b.den == 1) return rational(detail::checked_add(a.num, b.num));  // integers: no gcd
    // reduce by gcd of denominators first so intermediate values stay small
    const std::int64_t g = detail::gcd_magnitude(a.den, b.den);
    const std::int64_t bd = b.den / g;
    const std::int64_t ad = a.den / g;
    return {detail::checked_add(detail::checked_mul(a.num, bd), detail::checked_mul(b.num, ad)),
            detail::checked_mul(a.den, bd)};
  }
  friend constexpr rational operator-(const rational& a, const rational& b) {
    if (a.den == 1 && b.den == 1) return rational(detail::checked_sub(a.num, b.num));
    const std::int64_t g = detail::gcd_magnitude(a.den, b.den);
    const std::int64_t bd = b.den / g;
    const std::int64_t ad = a.den / g;
    return {detail::checked_sub(detail::checked_mul(a.num, bd), detail::checked_mul(b.num, ad)),
            detail::checked_mul(a.den, bd)};
  }
  friend constexpr rational operator*(const rational& a, const rational& b) {
    if (a.num == 0 || b.num == 0) return {};
    if (a.den == 1 && b.den == 1) return rational(detail::checked_mul(a.num, b.num));
    const std::int64_t g1 = detail::gcd_magnitude(a.num, b.den);
    const std::int64_t g2 = detail::gcd_magnitude(b.num, a.den);
    return {detail::checked_mul(a.num / g1, b.num / g2), detail::checked_mul(a.den / g2, b.den / g1)};
  }
  /// \throws std::domain_error on division by zero.
  friend constexpr rational operator/(const rational& a, const rational& b) {
    if (b.num == 0) throw std::domain_error("nondim: rational division by zero");
    return a * rational{b.den, b.num};
  }
  constexpr rational& operator+=(const rational& b) { return *this = *this + b; }
  constexpr rational& operator-=(const rational& b) { return *this = *this - b; }
  constexpr rational& operator*=(const rational& b) { return *this = *this * b; }
  constexpr rational& operator/=(const rational& b) { return *this = *this / b; }
};

/// \brief |r|, checked.
constexpr rational abs(const rational& r) {
  return r.num < 0 ? -r : r;
}

}  // namespace nondim
