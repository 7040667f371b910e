#pragma once
/// \file value_text.hpp
/// \brief Values as the program reads them: `VALUE UNIT`, `VALUE±U UNIT`, `VALUE+-U UNIT`
/// and `VALUE±U% UNIT` after `NAME=` on the command line; `"2 %"` and `"0.5 m/s"` in
/// problem files.

#include <optional>
#include <stdexcept>
#include <string>
#include <string_view>

namespace nondim::tool {

/// \brief A malformed value; `what()` is a phrase without the "nondim:" prefix, for the
/// caller to say where.
class value_text_error : public std::runtime_error {
 public:
  explicit value_text_error(const std::string& what) : std::runtime_error(what) {}
};

/// \brief A value with its optional uncertainty (in the unit, or in per cent of the value)
/// and the unit text that follows.
struct value_text {
  double value = 0.0;
  std::optional<double> uncertainty;
  bool percent = false;  ///< `uncertainty` is in per cent of `value`
  std::string unit;      ///< "1" when no unit follows
};

/// \brief What follows `NAME=`: a unit alone (`m/s`, `1`, `1/s`: empty result) or a value
/// (`2 m/s`, `2±0.1 m/s`, `2 +- 0.1 m/s`, `2±5% m/s`, `0.71` for a pure number).
/// \throws value_text_error for a value that is not a number (`2x m/s`), an uncertainty
///         that is not one or is negative, or a `%` out of place.
std::optional<value_text> read_value_argument(std::string_view text);

/// \brief A number at the start of `text` (`2`, `-1.5e3`, `.5`), and the rest after it.
/// \throws value_text_error when `text` does not start with a finite number.
std::pair<double, std::string_view> leading_number(std::string_view text, std::string_view what);

}  // namespace nondim::tool
