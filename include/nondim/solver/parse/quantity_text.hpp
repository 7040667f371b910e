#pragma once
/// \file quantity_text.hpp
/// \brief Quantities from text (`"1.8e-5 Pa*s"`, `"20 degC"`) and conversion of numbers
/// between units given as text.

#include <array>
#include <charconv>
#include <cmath>
#include <cstddef>
#include <limits>
#include <string>
#include <string_view>
#include <system_error>

#include "../units/quantity_type.hpp"
#include "detail/unit_parser.hpp"
#include "errors.hpp"

namespace nondim {

/// \brief A quantity read from text: its value in coherent SI units and its dimension.
struct parsed_quantity {
  double value = 0.0;  ///< in coherent SI units (kelvin for temperatures)
  dimension dim{};

  friend bool operator==(const parsed_quantity&, const parsed_quantity&) = default;
};

namespace detail {

[[noreturn]] inline void bad_number(std::string_view text, std::size_t byte, const std::string& what) {
  const std::size_t column = column_of(text, byte);
  throw unit_error(unit_error_kind::bad_number, column,
                   "nondim: in " + describe_text(text) + ", column " + std::to_string(column) + ": " + what);
}

/// `x` to 6 significant digits, for messages.
inline std::string message_number(double x) {
  std::array<char, 32> buffer{};
  const auto r = std::to_chars(buffer.data(), buffer.data() + buffer.size(), x, std::chars_format::general, 6);
  return std::string(buffer.data(), r.ptr);
}

/// Rounding left by `a + b - c` (an affine conversion): four units in the last place of
/// the largest term. A result within it is zero (491.67 degR is 0 degC, not 5.7e-14).
inline double affine_rounding(double a, double b, double c) noexcept {
  return 4.0 * std::numeric_limits<double>::epsilon() * (std::fabs(a) + std::fabs(b) + std::fabs(c));
}

/// Kelvin from a reading `scaled + offset` (`scaled` = value * factor), zero when within
/// rounding of it. \throws temperature_error below absolute zero, naming `shown`.
inline double reading_kelvin(double scaled, double offset, std::size_t column, const std::string& shown) {
  const double k = scaled + offset;
  const double tolerance = affine_rounding(scaled, offset, 0.0);
  if (std::fabs(k) <= tolerance) return 0.0;
  if (k < 0.0)
    throw temperature_error(column, k,
                            "nondim: " + shown + " is below absolute zero (it would be " + message_number(k) +
                                " K; no thermodynamic temperature is negative)");
  return k;
}

}  // namespace detail

namespace detail {

/// Quantity text split and read: the number as written, its unit, where the number began.
struct quantity_parts {
  double number = 0.0;
  parsed_unit unit{};  ///< dimensionless with factor 1 when the text has no unit
  std::size_t number_begin = 0;
};

inline quantity_parts read_quantity_parts(std::string_view text) {
  check_unit_text(text);
  std::size_t i = 0;
  const std::size_t e = text.size();
  while (i < e && classify_at(text, i, e).cls == char_class::space) i += classify_at(text, i, e).len;
  const std::size_t number_begin = i;
  bool negative = false;
  if (const auto s = classify_at(text, i, e); s.cls == char_class::minus || s.cls == char_class::plus) {
    negative = s.cls == char_class::minus;
    i += s.len;
  }
  const auto first = classify_at(text, i, e).cls;
  const bool starts_number =
      first == char_class::digit || (first == char_class::dot && classify_at(text, i + 1, e).cls == char_class::digit);
  if (!starts_number) {
    if (i == e) bad_number(text, i, "expected a number, found the end of the text");
    bad_number(text, i,
               "expected a number at the start of a quantity (\"1.8e-5 Pa*s\"), found " +
                   quote_token(text.substr(i, classify_at(text, i, e).len)));
  }
  double x = 0.0;
  const auto [end_of_number, ec] = std::from_chars(text.data() + i, text.data() + e, x, std::chars_format::general);
  const auto number_end = static_cast<std::size_t>(end_of_number - text.data());
  if (ec == std::errc::result_out_of_range)
    bad_number(text, number_begin,
               "the number " + quote_token(text.substr(number_begin, number_end - number_begin)) +
                   " is out of the range of a double");
  if (ec != std::errc{}) bad_number(text, i, "expected a number");
  if (negative) x = -x;
  // the unit: the rest of the text, or none (a dimensionless number)
  std::size_t u = number_end;
  while (u < e && classify_at(text, u, e).cls == char_class::space) u += classify_at(text, u, e).len;
  if (u == e) return {x, parsed_unit{}, number_begin};
  return {x, parse_unit_range(text, number_end, e), number_begin};
}

/// `scaled` (a value times its unit's factor) checked against the range of a double.
inline double finite_si(std::string_view text, const quantity_parts& q, double si) {
  if (!std::isfinite(si)) bad_number(text, q.number_begin, "the value in SI units is out of the range of a double");
  return si;
}

}  // namespace detail

/// \brief Read `"<number> <unit>"`: `"1.8e-5 Pa*s"`, `"3 ft"`, `"20 degC"` (293.15 K),
/// `"-40 °F"`, `"0.5"` (dimensionless). The space may be left out (`"20°C"`).
///
/// The number is a decimal with optional sign (`-`, `+` or U+2212) and exponent
/// (`1.8e-5`); no hexadecimal, `inf` or `nan`. The unit follows the rules of `parse_unit`;
/// `degC`/`degF` alone give absolute temperatures (a reading of a thermometer, in kelvin;
/// `parse_temperature_difference` reads an interval).
/// \throws unit_error (kind `bad_number` for the number; columns count the whole text);
/// temperature_error for a lone `degC`/`degF` reading below absolute zero.
inline parsed_quantity parse_quantity(std::string_view text) {
  const detail::quantity_parts q = detail::read_quantity_parts(text);
  const double scaled = detail::finite_si(text, q, q.number * q.unit.factor);
  if (q.unit.offset == 0.0) return parsed_quantity{scaled, q.unit.dim};
  return parsed_quantity{detail::reading_kelvin(scaled, q.unit.offset, detail::column_of(text, q.number_begin),
                                                "the temperature `" + std::string(text.substr(0, 80)) + "`"),
                         q.unit.dim};
}

/// \brief Read a quantity of dimension D: `parse_quantity<dims::pressure>("14.7 psi")`.
///
/// A temperature in a lone `degC` or `degF` is refused (`unit_error` of kind
/// `ambiguous_temperature`): `"40 degC"` is 313.15 K as a reading and 40 K as a difference.
/// Say which with `parse_temperature_point` or `parse_temperature_difference`
/// (<nondim/solver/parse/temperature_text.hpp>); kelvin and `degR` read as before.
/// \throws unit_error as `parse_quantity(text)`; dimension_error naming both dimensions
/// when the text has another one.
template <dimension D>
quantity<D> parse_quantity(std::string_view text) {
  const detail::quantity_parts q = detail::read_quantity_parts(text);
  if (q.unit.offset != 0.0)
    throw unit_error(unit_error_kind::ambiguous_temperature, detail::column_of(text, q.number_begin),
                     "nondim: `" + std::string(text.substr(0, 80)) +
                         "` reads as a temperature or as a temperature difference, which differ by the zero of "
                         "the scale: use parse_temperature_point for a reading (20 degC is 293.15 K) or "
                         "parse_temperature_difference for an interval (20 degC is 20 K)");
  if (q.unit.dim != D)
    throw dimension_error("nondim: `" + std::string(text.substr(0, 80)) + "` has the wrong dimension", D, q.unit.dim);
  return quantity<D>::from_si(detail::finite_si(text, q, q.number * q.unit.factor));
}

/// \brief `value` in unit `from`, expressed in unit `to`: `convert(100, "degC", "degF")` is
/// 212; `convert(1, "psi", "kPa")` is 6.894757...
///
/// Affine temperatures apply when a unit is `degC` or `degF` alone; any other unit is
/// linear (`convert(1, "degC/s", "K/s")` is 1). When either unit is affine the value is a
/// reading, which cannot be below absolute zero; a result within rounding of zero is zero
/// (`convert(491.67, "degR", "degC")` is 0, NIST SP 811 B.9).
///
/// `rpm` to `rad/s` is a factor 1/60, not 2 pi/60: a revolution count and an angle have the
/// same dimension. `crosses_rotational_families` says when a conversion does that.
/// \throws unit_error for either text; dimension_error when the dimensions differ;
/// temperature_error for an affine conversion of a value below absolute zero.
inline double convert(double value, std::string_view from, std::string_view to) {
  const parsed_unit a = parse_unit(from);
  const parsed_unit b = parse_unit(to);
  if (a.dim != b.dim)
    throw dimension_error("nondim: cannot convert from `" + std::string(from.substr(0, 80)) + "` to `" +
                              std::string(to.substr(0, 80)) + "`",
                          b.dim, a.dim);
  if (a.offset == 0.0 && b.offset == 0.0) return value * a.factor / b.factor;
  const double kelvin = detail::reading_kelvin(value * a.factor, a.offset, 0,
                                               detail::message_number(value) + " " + std::string(from.substr(0, 80)));
  const double shifted = kelvin - b.offset;
  if (std::fabs(shifted) <= detail::affine_rounding(value * a.factor, a.offset, b.offset)) return 0.0;
  return shifted / b.factor;
}

/// \brief Whether converting between `from` and `to` crosses a factor 2 pi that the
/// dimensions cannot see: one side is a rate of plane angle (`rad/s`, `deg/s`, `rev/min`)
/// and the other is not (`rpm`, `r/min`, `Hz`, `1/s`). An angular velocity is omega =
/// 2 pi n for a rotational frequency n (ISO 80000-3); `convert(60, "rpm", "rad/s")` is 1.
/// \throws unit_error for either text.
inline bool crosses_rotational_families(std::string_view from, std::string_view to) {
  const parsed_unit a = parse_unit(from);
  const parsed_unit b = parse_unit(to);
  if (a.dim != b.dim || a.dim[2] == rational{0}) return false;  // only rates (time in the dimension)
  return mentions_plane_angle(from) != mentions_plane_angle(to);
}

}  // namespace nondim
