#pragma once
/// \file quantity_type.hpp
/// \brief `quantity<D, Rep>`: a value in coherent SI units whose dimension D is part of its
/// type. Mixing dimensions is a compile error that names them; the object is exactly a `Rep`.

#include <compare>
#include <concepts>
#include <type_traits>

#include "../core/dims.hpp"
#include "../core/inline.hpp"
#include "spelling.hpp"

namespace nondim {

template <dimension D, class Rep = double>
class quantity;

namespace detail {
/// Selects the constructor that takes a value in coherent SI as it is: what the operators use,
/// one inlined layer fewer than `from_si` (a debug build pays for each layer). Not for users:
/// their way to say "this number is SI" is `from_si`.
struct si_value_tag {
  explicit si_value_tag() = default;
};
template <class T>
struct is_quantity : std::false_type {};
template <dimension D, class R>
struct is_quantity<quantity<D, R>> : std::true_type {};
}  // namespace detail

/// \brief Any `quantity<D, Rep>`.
template <class T>
concept any_quantity = detail::is_quantity<std::remove_cvref_t<T>>::value;

/// \brief A plain number that may scale a quantity.
template <class T>
concept scalar = std::is_arithmetic_v<T>;

/// \brief A physical value whose dimension is checked at compile time.
///
/// The value is kept in coherent SI units (metre, kilogram, second, ...), so arithmetic is
/// the arithmetic of `Rep` with no conversion: `sizeof(quantity<D>) == sizeof(Rep)`.
/// Make one from a unit (`2.0 * units::ft`) or from an SI value (`quantity<D>::from_si(x)`);
/// read one in a unit (`q / units::ft`, `q.in(units::ft)`) or in SI (`q.si()`).
/// \tparam D   its dimension
/// \tparam Rep the number type (double by default)
namespace detail {

/// A dimensionless quantity is a number: its conversion to `Rep` lives in this base, so that a
/// quantity of any other dimension has no conversion function that Clang would try in every
/// built-in arithmetic candidate of every operator (bench/RESULTS.md, section 2).
template <class Q, class Rep>
struct number_conversion {
  NONDIM_ALWAYS_INLINE constexpr operator Rep() const noexcept {  // NOLINT(google-explicit-constructor)
    return static_cast<const Q&>(*this).si();
  }
};

/// Refused: a dimensional value is not a number until divided by a unit. A template: Clang
/// does not count conversion templates when it decides which built-in operators to try.
template <dimension D, class Rep>
struct no_number_conversion {
  template <class T>
  requires std::is_arithmetic_v<T>
  constexpr operator T() const noexcept {  // NOLINT(google-explicit-constructor)
    static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                  "nondim: a dimensional quantity cannot become a raw number; divide it by a unit "
                  "(`q / units::m`) or read `q.si()`");
    return T{};
  }
};

template <dimension D, class Rep>
using quantity_base =
    std::conditional_t<D.is_dimensionless(), number_conversion<quantity<D, Rep>, Rep>, no_number_conversion<D, Rep>>;

}  // namespace detail

template <dimension D, class Rep>
class quantity : public detail::quantity_base<D, Rep> {
 public:
  using rep = Rep;
  static constexpr dimension dim = D;

  constexpr quantity() noexcept = default;

  /// \brief A quantity from its value in coherent SI units.
  [[nodiscard]] NONDIM_ALWAYS_INLINE static constexpr quantity from_si(Rep si_value) noexcept {
    return quantity(si_value, detail::si_value_tag{});
  }
  /// \brief A quantity from its value in coherent SI units (the operators' form of `from_si`).
  NONDIM_ALWAYS_INLINE constexpr quantity(Rep si_value, detail::si_value_tag) noexcept : value_(si_value) {}

  /// \brief A dimensionless value from a number (implicit: it is a number).
  NONDIM_ALWAYS_INLINE constexpr quantity(Rep v) noexcept  // NOLINT(google-explicit-constructor)
      requires(D.is_dimensionless())
      : value_(v) {}

  /// Refused: a raw number has no unit. Multiply it by one, or say it is SI.
  template <scalar T>
  requires(!D.is_dimensionless()) constexpr quantity(T) noexcept {  // NOLINT(google-explicit-constructor)
    static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                  "nondim: a raw number cannot become a dimensional quantity; write `x * units::m` "
                  "(its unit) or `quantity<D>::from_si(x)`");
  }

  /// \brief Converting between representations of the same dimension.
  template <class R2>
  requires(!std::same_as<R2, Rep> &&
           std::convertible_to<R2, Rep>) constexpr explicit quantity(const quantity<D, R2>& o) noexcept
      : value_(static_cast<Rep>(o.si())) {}

  /// Refused: a quantity of another dimension (the poisoned overload names both).
  template <dimension D2, class R2>
  requires(D2 != D) constexpr quantity(const quantity<D2, R2>&) noexcept {  // NOLINT(google-explicit-constructor)
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot initialise or assign a quantity from one of another dimension "
                  "(target first, source second)");
  }

  /// \brief The value in coherent SI units.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep si() const noexcept { return value_; }

  NONDIM_ALWAYS_INLINE constexpr quantity operator+() const noexcept { return *this; }
  NONDIM_ALWAYS_INLINE constexpr quantity operator-() const noexcept {
    return quantity(-value_, detail::si_value_tag{});
  }

  NONDIM_ALWAYS_INLINE constexpr quantity& operator+=(const quantity& o) noexcept {
    value_ += o.value_;
    return *this;
  }
  NONDIM_ALWAYS_INLINE constexpr quantity& operator-=(const quantity& o) noexcept {
    value_ -= o.value_;
    return *this;
  }
  template <scalar T>
  NONDIM_ALWAYS_INLINE constexpr quantity& operator*=(T s) noexcept {
    value_ *= s;
    return *this;
  }
  template <scalar T>
  NONDIM_ALWAYS_INLINE constexpr quantity& operator/=(T s) noexcept {
    value_ /= s;
    return *this;
  }
  template <dimension D2, class R2>
  requires(D2 != D) constexpr quantity& operator+=(const quantity<D2, R2>&) noexcept {
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot add a quantity of another dimension");
    return *this;
  }
  template <dimension D2, class R2>
  requires(D2 != D) constexpr quantity& operator-=(const quantity<D2, R2>&) noexcept {
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot subtract a quantity of another dimension");
    return *this;
  }

 private:
  Rep value_{};
};

// ---- same-dimension arithmetic and comparison ------------------------------------------

template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> operator+(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  return quantity<D, R>(a.si() + b.si(), detail::si_value_tag{});
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> operator-(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  return quantity<D, R>(a.si() - b.si(), detail::si_value_tag{});
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr bool operator==(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  return a.si() == b.si();
}
template <dimension D, class R>
NONDIM_ALWAYS_INLINE constexpr auto operator<=>(const quantity<D, R>& a, const quantity<D, R>& b) noexcept {
  return a.si() <=> b.si();
}

// Poisoned fallbacks: each names the two dimensions.
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr quantity<D1, R1> operator+(const quantity<D1, R1>&, const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: cannot add quantities of different dimensions");
  return {};
}
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr quantity<D1, R1> operator-(const quantity<D1, R1>&, const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: cannot subtract quantities of different dimensions");
  return {};
}
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr bool operator==(const quantity<D1, R1>&, const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: cannot compare quantities of different dimensions");
  return false;
}
template <dimension D1, class R1, dimension D2, class R2>
requires(D1 != D2) constexpr std::partial_ordering operator<=>(const quantity<D1, R1>&,
                                                               const quantity<D2, R2>&) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D1>, detail::spell_named<D2>>,
                "nondim: cannot compare quantities of different dimensions");
  return std::partial_ordering::unordered;
}

// ---- products and quotients combine dimensions ------------------------------------------

template <dimension D1, dimension D2, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D1 * D2, R> operator*(const quantity<D1, R>& a,
                                                              const quantity<D2, R>& b) noexcept {
  return quantity<D1 * D2, R>(a.si() * b.si(), detail::si_value_tag{});
}
template <dimension D1, dimension D2, class R>
NONDIM_ALWAYS_INLINE constexpr quantity<D1 / D2, R> operator/(const quantity<D1, R>& a,
                                                              const quantity<D2, R>& b) noexcept {
  return quantity<D1 / D2, R>(a.si() / b.si(), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> operator*(const quantity<D, R>& a, T s) noexcept {
  return quantity<D, R>(a.si() * static_cast<R>(s), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> operator*(T s, const quantity<D, R>& a) noexcept {
  return quantity<D, R>(static_cast<R>(s) * a.si(), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, R> operator/(const quantity<D, R>& a, T s) noexcept {
  return quantity<D, R>(a.si() / static_cast<R>(s), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<dims::dimensionless / D, R> operator/(T s, const quantity<D, R>& a) noexcept {
  return quantity<dims::dimensionless / D, R>(static_cast<R>(s) / a.si(), detail::si_value_tag{});
}

/// \brief A quantity whose type is deduced from a dimension value: `si<dims::force>(12.0)`.
template <dimension D, class Rep>
NONDIM_ALWAYS_INLINE constexpr quantity<D, Rep> si(Rep value) noexcept {
  return quantity<D, Rep>(value, detail::si_value_tag{});
}

}  // namespace nondim

namespace nondim {

// A raw number added to or compared with a dimensional quantity: refused with the dimension
// named (without these, the built-in operators would be tried and fail as an ambiguity).
template <dimension D, class R, scalar T>
requires(!D.is_dimensionless()) constexpr quantity<D, R> operator+(const quantity<D, R>&, T) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                "nondim: cannot add a raw number to a dimensional quantity; give the number a unit");
  return {};
}
template <dimension D, class R, scalar T>
requires(!D.is_dimensionless()) constexpr quantity<D, R> operator+(T, const quantity<D, R>&) noexcept {
  static_assert(detail::dimensions_involved<T, detail::spell_named<D>>,
                "nondim: cannot add a raw number to a dimensional quantity; give the number a unit");
  return {};
}
template <dimension D, class R, scalar T>
requires(!D.is_dimensionless()) constexpr quantity<D, R> operator-(const quantity<D, R>&, T) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                "nondim: cannot subtract a raw number from a dimensional quantity; give the number a unit");
  return {};
}
template <dimension D, class R, scalar T>
requires(!D.is_dimensionless()) constexpr quantity<D, R> operator-(T, const quantity<D, R>&) noexcept {
  static_assert(detail::dimensions_involved<T, detail::spell_named<D>>,
                "nondim: cannot subtract a dimensional quantity from a raw number; give the number a unit");
  return {};
}
template <dimension D, class R, scalar T>
requires(!D.is_dimensionless()) constexpr bool operator==(const quantity<D, R>&, T) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                "nondim: cannot compare a dimensional quantity with a raw number; give the number a unit");
  return false;
}
template <dimension D, class R, scalar T>
requires(!D.is_dimensionless()) constexpr std::partial_ordering operator<=>(const quantity<D, R>&, T) noexcept {
  static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                "nondim: cannot compare a dimensional quantity with a raw number; give the number a unit");
  return std::partial_ordering::unordered;
}

}  // namespace nondim
