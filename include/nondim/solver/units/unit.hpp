#pragma once
/// \file unit.hpp
/// \brief `unit<D>`: a named scale of dimension D, as a factor to coherent SI.

#include "quantity_type.hpp"

namespace nondim {

/// \brief A unit of dimension D: `x * u` is the quantity, `q / u` the number.
template <dimension D>
struct unit {
  static constexpr dimension dim = D;
  double factor = 1.0;  ///< SI value of one unit

  friend constexpr bool operator==(const unit&, const unit&) noexcept = default;
};

template <dimension D, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, double> operator*(T x, const unit<D>& u) noexcept {
  return quantity<D, double>::from_si(static_cast<double>(x) * u.factor);
}
/// `q * unit` where q is a quantity: the product of dimensions (W * units::h).
template <dimension D1, dimension D2>
NONDIM_ALWAYS_INLINE constexpr quantity<D1 * D2, double> operator*(const quantity<D1, double>& q,
                                                                   const unit<D2>& u) noexcept {
  return quantity<D1 * D2, double>::from_si(q.si() * u.factor);
}
template <dimension D1, dimension D2>
NONDIM_ALWAYS_INLINE constexpr unit<D1 * D2> operator*(const unit<D1>& a, const unit<D2>& b) noexcept {
  return {a.factor * b.factor};
}
template <dimension D1, dimension D2>
NONDIM_ALWAYS_INLINE constexpr unit<D1 / D2> operator/(const unit<D1>& a, const unit<D2>& b) noexcept {
  return {a.factor / b.factor};
}
/// \brief A unit raised to an integer power (`pow<2>(units::ft)`).
template <int N, dimension D>
NONDIM_ALWAYS_INLINE constexpr unit<pow(D, rational{N})> pow(const unit<D>& u) noexcept {
  double f = 1.0;
  for (int i = 0; i < (N < 0 ? -N : N); ++i) f *= u.factor;
  return {N < 0 ? 1.0 / f : f};
}

/// \brief The number of units `u` in `q`: `q / units::ft`.
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr R operator/(const quantity<D, R>& q, const unit<D>& u) noexcept {
  return q.si() / static_cast<R>(u.factor);
}
/// \brief Dividing by a unit of another dimension combines them: `2.0 * units::m / units::s`.
template <dimension D1, class R, dimension D2>
requires(D1 != D2) NONDIM_ALWAYS_INLINE constexpr quantity<D1 / D2, R> operator/(const quantity<D1, R>& q,
                                                                                 const unit<D2>& u) noexcept {
  return quantity<D1 / D2, R>::from_si(q.si() / static_cast<R>(u.factor));
}
template <dimension D, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<dims::dimensionless / D, double> operator/(T x, const unit<D>& u) noexcept {
  return quantity<dims::dimensionless / D, double>::from_si(static_cast<double>(x) / u.factor);
}

/// \brief The number of units `u` in `q` (same as `q / u`).
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr R in(const quantity<D, R>& q, const unit<D>& u) noexcept {
  return q / u;
}
/// Refused: reading a quantity in a unit of another dimension.
template <dimension D1, class R, dimension D2>
requires(D1 != D2) constexpr R in(const quantity<D1, R>&, const unit<D2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: cannot read a quantity in a unit of another dimension (quantity first, unit second)");
  return R{};
}

}  // namespace nondim
