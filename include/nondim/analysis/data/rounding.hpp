#pragma once
/// \file rounding.hpp
/// \brief A value as a report writes it: rounded to what the computation supports. With a
/// standard uncertainty, the uncertainty to two significant digits and the value to the
/// same decimal place (GUM, JCGM 100:2008, 7.2.6); without one, to 12 significant digits,
/// so that 3999.999999999998 (a product of inexact doubles) reads 4000.

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <optional>
#include <string>

namespace nondim {

/// \brief A value and its uncertainty rounded for a report, as text and as the doubles
/// nearest that text (for JSON).
struct rounded_value {
  std::string value_text;
  std::string uncertainty_text;  ///< empty without an uncertainty
  double value = 0.0;
  std::optional<double> uncertainty;
};

namespace detail {

/// "1.5e+07" -> "1.5e7", "2.5e-07" -> "2.5e-7": the exponent without its plus sign and leading zeros.
inline std::string tidy_exponent(std::string s) {
  const auto e = s.find('e');
  if (e == std::string::npos) return s;
  std::string mantissa = s.substr(0, e);
  std::string exp = s.substr(e + 1);
  const bool negative = !exp.empty() && exp[0] == '-';
  if (!exp.empty() && (exp[0] == '+' || exp[0] == '-')) exp.erase(0, 1);
  while (exp.size() > 1 && exp[0] == '0') exp.erase(0, 1);
  return mantissa + "e" + (negative ? "-" : "") + exp;
}

inline std::string printed(const char* format, int digits, double x) {
  char buffer[64];
  std::snprintf(buffer, sizeof buffer, format, digits, x);
  return buffer;
}

/// `x` rounded to a multiple of 10^place: fixed notation for magnitudes 1e-4 .. 1e7,
/// scientific beyond.
inline std::string at_decimal_place(double x, int place) {
  if (!std::isfinite(x)) return printed("%.*g", 12, x);  // "inf", "nan": no decimal place to round to
  const double magnitude = std::abs(x);
  const int lead = magnitude == 0.0 ? place : static_cast<int>(std::floor(std::log10(magnitude)));
  if (lead >= -4 && lead < 7) {
    if (place <= 0) return printed("%.*f", -place, x);
    const double step = std::pow(10.0, place);
    return printed("%.*f", 0, std::round(x / step) * step);
  }
  const int digits = lead - place + 1;
  if (digits < 1) return "0";
  std::string s = printed("%.*e", digits - 1, x);
  // rounding may carry into a new leading digit (9.96e9 -> 1.00e10): one digit too many
  const double back = std::abs(std::strtod(s.c_str(), nullptr));  // infinite when 1.8e308 rounds up
  if (digits > 1 && std::isfinite(back) && back > 0.0 && static_cast<int>(std::floor(std::log10(back))) > lead)
    s = printed("%.*e", digits - 2, x);
  return tidy_exponent(s);
}

}  // namespace detail

/// \brief `value` to 12 significant digits, or, with an uncertainty `u > 0`, `u` to two
/// significant digits and `value` to the same decimal place (GUM 7.2.6). An uncertainty of
/// 0 is written 0 and leaves the value at 12 digits.
inline rounded_value round_for_report(double value, std::optional<double> u = std::nullopt) {
  rounded_value r;
  if (u && *u > 0.0 && std::isfinite(*u)) {
    int place = static_cast<int>(std::floor(std::log10(*u))) - 1;
    // 0.0996 rounds to 0.10: two digits at the next place up
    if (std::round(*u / std::pow(10.0, place)) >= 100.0) ++place;
    // a double holds about 17 significant digits of the value: no more are written
    if (value != 0.0 && std::isfinite(value))
      place = std::max(place, static_cast<int>(std::floor(std::log10(std::abs(value)))) - 16);
    r.uncertainty_text = detail::at_decimal_place(*u, place);
    r.value_text = detail::at_decimal_place(value, place);
  } else {
    r.value_text = detail::tidy_exponent(detail::printed("%.*g", 12, value));
    if (u) r.uncertainty_text = "0";
  }
  r.value = std::strtod(r.value_text.c_str(), nullptr);
  if (r.value == 0.0 && !r.value_text.empty() && r.value_text[0] == '-') r.value_text.erase(0, 1);  // no "-0.00"
  r.value = std::abs(r.value) == 0.0 ? 0.0 : r.value;
  if (!r.uncertainty_text.empty()) r.uncertainty = std::strtod(r.uncertainty_text.c_str(), nullptr);
  return r;
}

}  // namespace nondim
