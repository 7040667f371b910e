#pragma once
/// \file dimension.hpp
/// \brief The dimension of a quantity: rational exponents of the seven SI base dimensions.

#include <array>
#include <cstddef>
#include <stdexcept>

#include "rational.hpp"

namespace nondim {

/// Number of base dimensions (ISO 80000-1 / SI Brochure 9th ed., 2.3.3).
inline constexpr std::size_t base_dimension_count = 7;

/// \brief Index of each base dimension, in the order of ISO 80000-1: L M T I Θ N J.
enum class base_dimension : std::size_t {
  length = 0,
  mass = 1,
  time = 2,
  current = 3,
  temperature = 4,
  amount = 5,
  luminous_intensity = 6
};

/// \brief Exponents of L M T I Θ N J, each an exact rational.
///
/// A structural literal type: `quantity<D>` takes it as a template argument. The members
/// are public only because template arguments require it; use `operator[]`.
/// Every operation is written as a single return expression so that GCC 12 accepts it in
/// namespace-scope `inline constexpr` initialisers.
struct dimension {
  std::array<rational, base_dimension_count> exponents{};

  constexpr dimension() noexcept = default;
  constexpr explicit dimension(const std::array<rational, base_dimension_count>& e) noexcept : exponents(e) {}
  /// Exponents in ISO 80000-1 order: L M T I Θ N J.
  constexpr dimension(rational l, rational m, rational t, rational i = 0, rational th = 0, rational n = 0,
                      rational j = 0) noexcept
      : exponents{l, m, t, i, th, n, j} {}

  /// \brief The exponent of base dimension `i` (0..6 in L M T I Θ N J order).
  /// \throws std::out_of_range when `i > 6`.
  [[nodiscard]] constexpr rational operator[](std::size_t i) const {
    if (i >= base_dimension_count) throw std::out_of_range("nondim: base dimension index must be 0..6");
    return exponents[i];
  }
  [[nodiscard]] constexpr rational operator[](base_dimension b) const { return (*this)[static_cast<std::size_t>(b)]; }

  /// A loop over the exponents, the same test as `*this == dimension{}` (every one 0/1)
  /// without building one: it is evaluated in the constraints of every quantity
  /// constructor and conversion.
  [[nodiscard]] constexpr bool is_dimensionless() const noexcept {
    const rational* x = exponents.data();
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      if (x[i].num != 0 || x[i].den != 1) return false;
    return true;
  }
  /// Number of base dimensions with a non-zero exponent.
  [[nodiscard]] constexpr std::size_t base_count() const noexcept {
    std::size_t c = 0;
    for (const auto& e : exponents) c += e.is_zero() ? 0U : 1U;
    return c;
  }

  /// Written out, not defaulted: the defaulted form goes through `std::array`'s `==` and
  /// `std::equal`, slower to evaluate as a constant, and every `requires(D1 != D2)` of the
  /// quantity operators and every `units::` constant's table check is one.
  friend constexpr bool operator==(const dimension& a, const dimension& b) noexcept {
    const rational* x = a.exponents.data();
    const rational* y = b.exponents.data();
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      if (x[i].num != y[i].num || x[i].den != y[i].den) return false;
    return true;
  }

  friend constexpr dimension operator*(const dimension& a, const dimension& b) {
    const auto& x = a.exponents;
    const auto& y = b.exponents;
    return dimension{x[0] + y[0], x[1] + y[1], x[2] + y[2], x[3] + y[3], x[4] + y[4], x[5] + y[5], x[6] + y[6]};
  }
  friend constexpr dimension operator/(const dimension& a, const dimension& b) {
    const auto& x = a.exponents;
    const auto& y = b.exponents;
    return dimension{x[0] - y[0], x[1] - y[1], x[2] - y[2], x[3] - y[3], x[4] - y[4], x[5] - y[5], x[6] - y[6]};
  }
};

/// \brief `d` raised to the rational power `p` (each exponent times `p`, exactly).
constexpr dimension pow(const dimension& d, const rational& p) {
  const auto& x = d.exponents;
  return dimension{x[0] * p, x[1] * p, x[2] * p, x[3] * p, x[4] * p, x[5] * p, x[6] * p};
}

/// \brief A base dimension as a `dimension` with exponent 1.
constexpr dimension make_base(base_dimension b) {
  const auto i = static_cast<std::size_t>(b);
  return dimension{i == 0 ? 1 : 0, i == 1 ? 1 : 0, i == 2 ? 1 : 0, i == 3 ? 1 : 0,
                   i == 4 ? 1 : 0, i == 5 ? 1 : 0, i == 6 ? 1 : 0};
}

}  // namespace nondim
