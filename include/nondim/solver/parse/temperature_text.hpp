#pragma once
/// \file temperature_text.hpp
/// \brief Temperatures from text, read as what they are: a reading of a thermometer (a
/// point) or an interval (a difference). `"40 degC"` is 313.15 K as the first and 40 K as
/// the second; `parse_quantity<dims::temperature>` refuses to guess between them.

#include <string>
#include <string_view>

#include "../units/temperature.hpp"
#include "quantity_text.hpp"

namespace nondim {

/// \brief A reading: `"20 degC"` (293.15 K), `"68 °F"`, `"293.15 K"`, `"527.67 degR"`.
/// \throws unit_error as `parse_quantity`; dimension_error when the text is not a
/// temperature; temperature_error below absolute zero (`"-300 degC"`, `"-1 K"`).
inline temperature_point<double> parse_temperature_point(std::string_view text) {
  const detail::quantity_parts q = detail::read_quantity_parts(text);
  if (q.unit.dim != dims::temperature)
    throw dimension_error("nondim: `" + std::string(text.substr(0, 80)) + "` is not a temperature", dims::temperature,
                          q.unit.dim);
  const double scaled = detail::finite_si(text, q, q.number * q.unit.factor);
  return from_kelvin(detail::reading_kelvin(scaled, q.unit.offset, detail::column_of(text, q.number_begin),
                                            "the temperature `" + std::string(text.substr(0, 80)) + "`"));
}

/// \brief An interval: `"5 degC"` and `"5 K"` are 5 K, `"9 degF"` is 5 K (NIST SP 811 B.9:
/// a Fahrenheit interval is 5/9 K). Negative differences are allowed.
/// \throws unit_error as `parse_quantity`; dimension_error when the text is not a temperature.
inline quantity<dims::temperature> parse_temperature_difference(std::string_view text) {
  const detail::quantity_parts q = detail::read_quantity_parts(text);
  if (q.unit.dim != dims::temperature)
    throw dimension_error("nondim: `" + std::string(text.substr(0, 80)) + "` is not a temperature difference",
                          dims::temperature, q.unit.dim);
  return quantity<dims::temperature>::from_si(detail::finite_si(text, q, q.number * q.unit.factor));
}

}  // namespace nondim
