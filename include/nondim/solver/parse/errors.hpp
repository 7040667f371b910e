#pragma once
/// \file errors.hpp
/// \brief The exceptions of run-time unit handling: `unit_error` (a unit expression that
/// cannot be read, with the column of the fault) and `dimension_error` (a unit or quantity
/// of another dimension than the one required). Later layers include this header alone.

#include <cstddef>
#include <stdexcept>
#include <string>
#include <string_view>

#include "../core/dimension.hpp"
#include "../core/format.hpp"

namespace nondim {

/// \brief What was wrong with a unit expression (the message says it in words).
enum class unit_error_kind {
  empty_expression,        ///< "" or only spaces
  empty_factor,            ///< an operator with no left operand, two operators in a row, "()"
  dangling_operator,       ///< an operator with nothing after it ("m*", "m/", "m^")
  unknown_symbol,          ///< not a unit symbol, alias or prefix + prefixable symbol
  number_factor,           ///< a number other than 1 where a unit was expected ("1000 m")
  ambiguous_solidus,       ///< "kg/m/s", "J/kg*K" (SI Brochure 9th ed., 5.4.6)
  unbalanced_parenthesis,  ///< "(m", "m)"
  bad_exponent,            ///< "m^x", "m^2^3", "m^1."
  zero_denominator,        ///< "m^(1/0)"
  exponent_overflow,       ///< an exponent that does not fit the 64-bit rational
  factor_out_of_range,     ///< the factor to SI overflows or underflows a double ("km^400")
  invalid_utf8,            ///< bytes that are not UTF-8
  too_deep,                ///< parentheses nested deeper than `max_unit_nesting`
  too_long,                ///< text longer than `max_unit_text_bytes`
  unexpected_character,    ///< a character that has no place there ("m+s", "m,s", "m(s)")
  bad_number,              ///< the value of a quantity is not a number, or out of range
  below_absolute_zero,     ///< a temperature reading below 0 K ("-300 degC"); thrown as `temperature_error`
  ambiguous_temperature,   ///< a lone `degC`/`degF` where a point and a difference differ by the offset
};

/// \brief A unit expression (or quantity text) that cannot be read.
///
/// `what()` names the offending token and its column; `column()` is 1-based and counts
/// Unicode code points of the whole text given (for `parse_quantity`, the number included).
class unit_error : public std::invalid_argument {
 public:
  unit_error(unit_error_kind kind, std::size_t column, const std::string& message)
      : std::invalid_argument(message), kind_(kind), column_(column) {}

  /// \brief 1-based position of the fault, in code points.
  [[nodiscard]] std::size_t column() const noexcept { return column_; }
  [[nodiscard]] unit_error_kind kind() const noexcept { return kind_; }

 private:
  unit_error_kind kind_;
  std::size_t column_;
};

/// \brief A temperature reading below absolute zero (`-300 degC`, `-5 K` converted to
/// `degC`): no thermodynamic temperature is negative (SI Brochure 9th ed., 2.3.1).
/// `kelvin()` is the value it would have had; `column()` is that of the number in quantity
/// text, 0 when the value came as a number (`convert`).
class temperature_error : public unit_error {
 public:
  temperature_error(std::size_t column, double kelvin, const std::string& message)
      : unit_error(unit_error_kind::below_absolute_zero, column, message), kelvin_(kelvin) {}

  /// \brief The thermodynamic temperature the input stands for, in kelvin (below zero).
  [[nodiscard]] double kelvin() const noexcept { return kelvin_; }

 private:
  double kelvin_;
};

/// \brief A dimension other than the one required (a quantity for a typed slot, a
/// conversion between units of different dimensions). The message names both dimensions.
class dimension_error : public std::invalid_argument {
 public:
  /// \brief `what` describes the context ("`3 m/s` read as ...", "cannot convert ...").
  dimension_error(const std::string& what, const dimension& expected, const dimension& actual)
      : std::invalid_argument(what + ": expected dimension " + describe(expected) + ", got " + describe(actual)),
        expected_(expected),
        actual_(actual) {}

  [[nodiscard]] const dimension& expected() const noexcept { return expected_; }
  [[nodiscard]] const dimension& actual() const noexcept { return actual_; }

  /// "L T^-1 (m/s)": the dimension and its coherent SI unit.
  static std::string describe(const dimension& d) {
    if (d.is_dimensionless()) return "1 (dimensionless)";
    return to_string(d, text_form::ascii) + " (" + si_unit_string(d, text_form::ascii) + ")";
  }

 private:
  dimension expected_;
  dimension actual_;
};

}  // namespace nondim
