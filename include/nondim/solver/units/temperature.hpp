#pragma once
/// \file temperature.hpp
/// \brief Absolute temperatures on the Celsius, Fahrenheit and kelvin scales, kept apart
/// from temperature differences.
///
/// `quantity<dims::temperature>` is a temperature *difference* (an interval: 5 K, 9 °F of
/// rise) or a kelvin value used in a formula. A reading of a thermometer, 20 °C, is a
/// `temperature_point`: subtracting two points gives a difference, adding a difference to a
/// point gives a point, and adding two points does not compile. Offsets come from the unit
/// table (SI Brochure 9th ed., 2.3.1: t/°C = T/K − 273.15; NIST SP 811 B.9: T/K = (t/°F + 459.67)/1.8).

#include "quantity_type.hpp"
#include "table.hpp"

namespace nondim {

namespace detail {
constexpr const unit_entry& table_entry(std::string_view symbol) {
  const std::size_t i = find_unit_position(symbol);
  if (i == unit_table.size())
    throw "nondim: unit symbol missing from the table";  // a compile error in constant evaluation
  return unit_table[i];
}
inline constexpr double celsius_offset = table_entry("degC").offset;
inline constexpr double fahrenheit_offset = table_entry("degF").offset;
inline constexpr double fahrenheit_factor = table_entry("degF").factor;
}  // namespace detail

/// \brief An absolute temperature (a point on the thermodynamic scale), stored in kelvin.
template <class Rep = double>
class temperature_point {
 public:
  using difference = quantity<dims::temperature, Rep>;

  constexpr temperature_point() noexcept = default;
  /// \brief From kelvin, as a quantity (an absolute value, not a difference).
  NONDIM_ALWAYS_INLINE static constexpr temperature_point from_kelvin(difference absolute) noexcept {
    return temperature_point(absolute.si());
  }
  NONDIM_ALWAYS_INLINE static constexpr temperature_point from_kelvin(Rep kelvin) noexcept {
    return temperature_point(kelvin);
  }
  NONDIM_ALWAYS_INLINE static constexpr temperature_point from_celsius(Rep c) noexcept {
    return temperature_point(c + static_cast<Rep>(detail::celsius_offset));
  }
  NONDIM_ALWAYS_INLINE static constexpr temperature_point from_fahrenheit(Rep f) noexcept {
    return temperature_point(f * static_cast<Rep>(detail::fahrenheit_factor) +
                             static_cast<Rep>(detail::fahrenheit_offset));
  }

  /// \brief The thermodynamic temperature T as a quantity in kelvin, for formulas like p = ρRT.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr difference absolute() const noexcept {
    return difference::from_si(kelvin_);
  }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep kelvin() const noexcept { return kelvin_; }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep celsius() const noexcept {
    return kelvin_ - static_cast<Rep>(detail::celsius_offset);
  }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep fahrenheit() const noexcept {
    return (kelvin_ - static_cast<Rep>(detail::fahrenheit_offset)) / static_cast<Rep>(detail::fahrenheit_factor);
  }

  NONDIM_ALWAYS_INLINE friend constexpr difference operator-(const temperature_point& a,
                                                             const temperature_point& b) noexcept {
    return difference::from_si(a.kelvin_ - b.kelvin_);
  }
  NONDIM_ALWAYS_INLINE friend constexpr temperature_point operator+(const temperature_point& a,
                                                                    const difference& d) noexcept {
    return temperature_point(a.kelvin_ + d.si());
  }
  NONDIM_ALWAYS_INLINE friend constexpr temperature_point operator+(const difference& d,
                                                                    const temperature_point& a) noexcept {
    return temperature_point(a.kelvin_ + d.si());
  }
  NONDIM_ALWAYS_INLINE friend constexpr temperature_point operator-(const temperature_point& a,
                                                                    const difference& d) noexcept {
    return temperature_point(a.kelvin_ - d.si());
  }
  friend constexpr bool operator==(const temperature_point&, const temperature_point&) noexcept = default;
  friend constexpr auto operator<=>(const temperature_point&, const temperature_point&) noexcept = default;

 private:
  NONDIM_ALWAYS_INLINE constexpr explicit temperature_point(Rep k) noexcept : kelvin_(k) {}
  Rep kelvin_{};
};

/// Refused: two absolute temperatures do not add (20 °C + 30 °C has no meaning).
template <class R>
NONDIM_ALWAYS_INLINE constexpr temperature_point<R> operator+(const temperature_point<R>&,
                                                              const temperature_point<R>&) noexcept {
  static_assert(detail::dimensions_involved<spelled::dim<spelled::Theta<1>>, spelled::dim<spelled::Theta<1>>, R>,
                "nondim: two absolute temperatures cannot be added; subtract them for a difference, or add a "
                "difference (quantity<dims::temperature>) to one");
  return {};
}

namespace detail {
template <class T>
inline constexpr bool is_reading = false;
template <class R>
inline constexpr bool is_reading<temperature_point<R>> = true;
}  // namespace detail

/// Refused: a thermometer reading multiplied or divided in a formula (`R * from_celsius(15)`).
/// One overload for every such product, so that both compilers stop at this sentence instead
/// of listing every operator* they tried.
template <class A, class B>
requires(detail::is_reading<A> || detail::is_reading<B>) constexpr A operator*(const A& a, const B&) noexcept {
  static_assert(detail::holds<false, A, B>,
                "nondim: an absolute temperature (temperature_point, a thermometer reading) cannot be multiplied "
                "or divided; in a formula such as p = rho R T use T.absolute(), the thermodynamic temperature in "
                "kelvin, or a difference T - T_ref");
  return a;
}
template <class A, class B>
requires(detail::is_reading<A> || detail::is_reading<B>) constexpr A operator/(const A& a, const B&) noexcept {
  static_assert(detail::holds<false, A, B>,
                "nondim: an absolute temperature (temperature_point, a thermometer reading) cannot be multiplied "
                "or divided; in a formula such as p = rho R T use T.absolute(), the thermodynamic temperature in "
                "kelvin, or a difference T - T_ref");
  return a;
}

/// \brief 20 °C as an absolute temperature.
NONDIM_ALWAYS_INLINE constexpr temperature_point<double> from_celsius(double c) noexcept {
  return temperature_point<double>::from_celsius(c);
}
/// \brief 68 °F as an absolute temperature.
NONDIM_ALWAYS_INLINE constexpr temperature_point<double> from_fahrenheit(double f) noexcept {
  return temperature_point<double>::from_fahrenheit(f);
}
/// \brief 293.15 K as an absolute temperature.
NONDIM_ALWAYS_INLINE constexpr temperature_point<double> from_kelvin(double k) noexcept {
  return temperature_point<double>::from_kelvin(k);
}

}  // namespace nondim
