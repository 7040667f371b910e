#pragma once
/// \file format.hpp
/// \brief Text forms of rationals and dimensions: ASCII for files and terminals that need
/// it, Unicode (superscripts, Θ, middle dot) for reports.

#include <array>
#include <cstdint>
#include <iosfwd>
#include <string>
#include <string_view>

#include "dimension.hpp"
#include "rational.hpp"

namespace nondim {

/// \brief Which characters a text form may use.
enum class text_form { ascii, unicode };

/// \brief "3", "-1/2".
inline std::string to_string(const rational& r) {
  // built by appending only: GCC 12 warns falsely (-Wrestrict) on operator+ of strings
  std::string s = std::to_string(r.num);
  if (r.den != 1) {
    s.push_back('/');
    s += std::to_string(r.den);
  }
  return s;
}

namespace detail {

inline constexpr std::array<std::string_view, base_dimension_count> dimension_symbols_unicode{"L",      "M", "T", "I",
                                                                                              "\u0398", "N", "J"};
inline constexpr std::array<std::string_view, base_dimension_count> dimension_symbols_ascii{"L",     "M", "T", "I",
                                                                                            "Theta", "N", "J"};
/// Coherent SI base unit of each base dimension, in dimension order.
inline constexpr std::array<std::string_view, base_dimension_count> base_unit_symbols{"m", "kg",  "s", "A",
                                                                                      "K", "mol", "cd"};
/// The order in which base units are written in a unit expression (kg m s A K mol cd, as the
/// SI Brochure's table 4 writes them, mass first).
inline constexpr std::array<std::size_t, base_dimension_count> unit_write_order{1, 0, 2, 3, 4, 5, 6};

inline std::string superscript_integer(std::int64_t v) {
  static constexpr std::array<std::string_view, 10> digits{"\u2070", "\u00b9", "\u00b2", "\u00b3", "\u2074",
                                                           "\u2075", "\u2076", "\u2077", "\u2078", "\u2079"};
  std::array<std::string_view, 20> reversed{};
  std::size_t count = 0;
  std::uint64_t m = v < 0 ? 0 - static_cast<std::uint64_t>(v) : static_cast<std::uint64_t>(v);
  do {
    reversed[count++] = digits[m % 10];
    m /= 10;
  } while (m != 0);
  std::string s;
  if (v < 0) s.append("\u207b");
  while (count > 0) s.append(reversed[--count]);
  return s;
}

/// Exponent suffix for `symbol^e`; empty when e == 1.
inline std::string exponent_suffix(const rational& e, text_form form) {
  std::string s;
  if (e == rational{1}) return s;
  if (e.is_integer() && form == text_form::unicode) return superscript_integer(e.num);
  if (e.is_integer()) {
    s.push_back('^');
    s += std::to_string(e.num);
    return s;
  }
  s.append("^(");
  s += to_string(e);
  s.push_back(')');
  return s;
}

/// Exponent suffix of |e| (ASCII), for a factor written under the solidus. Works on the
/// magnitude in uint64: |-2^63| is not an int64, so `-e` would overflow for that exponent.
inline std::string magnitude_suffix(const rational& e) {
  const std::uint64_t m = e.num < 0 ? 0 - static_cast<std::uint64_t>(e.num) : static_cast<std::uint64_t>(e.num);
  std::string s;
  if (m == 1 && e.den == 1) return s;
  s.append(e.den == 1 ? "^" : "^(");
  s += std::to_string(m);
  if (e.den != 1) {
    s.push_back('/');
    s += std::to_string(e.den);
    s.push_back(')');
  }
  return s;
}

}  // namespace detail

/// \brief The symbol of base dimension `i` ("L" ... "J"; Θ is "Theta" in ASCII).
inline std::string_view dimension_symbol(std::size_t i, text_form form = text_form::ascii) {
  return form == text_form::unicode ? detail::dimension_symbols_unicode.at(i) : detail::dimension_symbols_ascii.at(i);
}

/// \brief "L^-1 M T^-1" (ASCII) or "L⁻¹ M T⁻¹" (Unicode); "1" when dimensionless.
inline std::string to_string(const dimension& d, text_form form = text_form::ascii) {
  std::string s;
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    if (d[i].is_zero()) continue;
    if (!s.empty()) s += ' ';
    s += dimension_symbol(i, form);
    s += detail::exponent_suffix(d[i], form);
  }
  return s.empty() ? "1" : s;
}

/// \brief The coherent SI unit of a dimension, as an expression in base units.
///
/// Unicode: "kg·m⁻¹·s⁻¹" (a product of powers). ASCII: "kg/(m*s)" (one solidus, the
/// denominator bracketed when it has more than one factor, as SI Brochure 9th ed. 5.4.6
/// asks). Dimensionless: "1". Never throws past allocation: every exponent a `rational`
/// holds is written, -2^63 included. Both forms parse back with `parse_unit` as long as
/// every exponent lies within the parser's ±(2^63 - 1) (an exponent of -2^63 is past
/// that limit and reads as `unit_error`, kind `exponent_overflow`).
inline std::string si_unit_string(const dimension& d, text_form form = text_form::unicode) {
  if (d.is_dimensionless()) return "1";
  if (form == text_form::unicode) {
    std::string s;
    for (std::size_t i : detail::unit_write_order) {
      if (d[i].is_zero()) continue;
      if (!s.empty()) s += "\u00b7";
      s += detail::base_unit_symbols[i];
      s += detail::exponent_suffix(d[i], form);
    }
    return s;
  }
  std::string num;
  std::string den;
  std::size_t den_count = 0;
  for (std::size_t i : detail::unit_write_order) {
    const rational e = d[i];
    if (e.is_zero()) continue;
    std::string& side = e.num > 0 ? num : den;
    if (!side.empty()) side += '*';
    side += detail::base_unit_symbols[i];
    side += detail::magnitude_suffix(e);
    if (e.num < 0) ++den_count;
  }
  if (den.empty()) return num;
  std::string out;
  if (num.empty()) out.push_back('1');
  out += num;
  out.append(den_count > 1 ? "/(" : "/");
  out += den;
  if (den_count > 1) out.push_back(')');
  return out;
}

template <class CharT, class Traits>
std::basic_ostream<CharT, Traits>& operator<<(std::basic_ostream<CharT, Traits>& os, const rational& r) {
  return os << to_string(r).c_str();
}

template <class CharT, class Traits>
std::basic_ostream<CharT, Traits>& operator<<(std::basic_ostream<CharT, Traits>& os, const dimension& d) {
  return os << to_string(d).c_str();
}

}  // namespace nondim
