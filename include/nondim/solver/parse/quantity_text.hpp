#pragma once
/// \file quantity_text.hpp
/// \brief Quantities from text (`"1.8e-5 Pa*s"`, `"20 degC"`) and conversion of numbers
/// between units given as text.

#include <charconv>
#include <cmath>
#include <cstddef>
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

}  // namespace detail

/// \brief Read `"<number> <unit>"`: `"1.8e-5 Pa*s"`, `"3 ft"`, `"20 degC"` (293.15 K),
/// `"-40 °F"`, `"0.5"` (dimensionless). The space may be left out (`"20°C"`).
///
/// The number is a decimal with optional sign (`-`, `+` or U+2212) and exponent
/// (`1.8e-5`); no hexadecimal, `inf` or `nan`. The unit follows the rules of `parse_unit`;
/// `degC`/`degF` alone give absolute temperatures.
/// \throws unit_error (kind `bad_number` for the number; columns count the whole text).
inline parsed_quantity parse_quantity(std::string_view text) {
  detail::check_unit_text(text);
  std::size_t i = 0;
  const std::size_t e = text.size();
  while (i < e && detail::classify_at(text, i, e).cls == detail::char_class::space)
    i += detail::classify_at(text, i, e).len;
  const std::size_t number_begin = i;
  bool negative = false;
  if (const auto s = detail::classify_at(text, i, e);
      s.cls == detail::char_class::minus || s.cls == detail::char_class::plus) {
    negative = s.cls == detail::char_class::minus;
    i += s.len;
  }
  const auto first = detail::classify_at(text, i, e).cls;
  const bool starts_number =
      first == detail::char_class::digit ||
      (first == detail::char_class::dot && detail::classify_at(text, i + 1, e).cls == detail::char_class::digit);
  if (!starts_number) {
    if (i == e) detail::bad_number(text, i, "expected a number, found the end of the text");
    detail::bad_number(text, i,
                       "expected a number at the start of a quantity (\"1.8e-5 Pa*s\"), found " +
                           detail::quote_token(text.substr(i, detail::classify_at(text, i, e).len)));
  }
  double x = 0.0;
  const auto [end_of_number, ec] = std::from_chars(text.data() + i, text.data() + e, x, std::chars_format::general);
  const auto number_end = static_cast<std::size_t>(end_of_number - text.data());
  if (ec == std::errc::result_out_of_range)
    detail::bad_number(text, number_begin,
                       "the number " + detail::quote_token(text.substr(number_begin, number_end - number_begin)) +
                           " is out of the range of a double");
  if (ec != std::errc{}) detail::bad_number(text, i, "expected a number");
  if (negative) x = -x;
  // the unit: the rest of the text, or none (a dimensionless number)
  std::size_t u = number_end;
  while (u < e && detail::classify_at(text, u, e).cls == detail::char_class::space)
    u += detail::classify_at(text, u, e).len;
  if (u == e) return parsed_quantity{x, dimension{}};
  const parsed_unit unit = detail::parse_unit_range(text, number_end, e);
  const double si = x * unit.factor + unit.offset;
  if (!std::isfinite(si))
    detail::bad_number(text, number_begin, "the value in SI units is out of the range of a double");
  return parsed_quantity{si, unit.dim};
}

/// \brief Read a quantity of dimension D: `parse_quantity<dims::pressure>("14.7 psi")`.
/// \throws unit_error as `parse_quantity(text)`; dimension_error naming both dimensions
/// when the text has another one.
template <dimension D>
quantity<D> parse_quantity(std::string_view text) {
  const parsed_quantity q = parse_quantity(text);
  if (q.dim != D)
    throw dimension_error("nondim: `" + std::string(text.substr(0, 80)) + "` has the wrong dimension", D, q.dim);
  return quantity<D>::from_si(q.value);
}

/// \brief `value` in unit `from`, expressed in unit `to`: `convert(100, "degC", "degF")` is
/// 212; `convert(1, "psi", "kPa")` is 6.894757...
///
/// Affine temperatures apply when a unit is `degC` or `degF` alone; any other unit is
/// linear (`convert(1, "degC/s", "K/s")` is 1).
/// \throws unit_error for either text; dimension_error when the dimensions differ.
inline double convert(double value, std::string_view from, std::string_view to) {
  const parsed_unit a = parse_unit(from);
  const parsed_unit b = parse_unit(to);
  if (a.dim != b.dim)
    throw dimension_error("nondim: cannot convert from `" + std::string(from.substr(0, 80)) + "` to `" +
                              std::string(to.substr(0, 80)) + "`",
                          b.dim, a.dim);
  return (value * a.factor + a.offset - b.offset) / b.factor;
}

}  // namespace nondim
