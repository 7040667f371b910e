#pragma once
/// \file in_unit.hpp
/// \brief A quantity written in a unit the engineer chose, with its symbol, for solver logs:
/// `std::cout << in_unit(p, units::kPa)` writes "101.325 kPa".
///
/// \code
///   log << "p0 = " << in_unit(p0, units::kPa) << "\n";                        // p0 = 500 kPa
///   log << "D = " << in_unit(d, units::um, text_form::ascii) << "\n";          // D = 40 um (µm in Unicode)
///   log << "h = " << in_unit(h, units::kJ / units::kg, "kJ/kg") << "\n";       // a product: say its symbol
/// \endcode
///
/// The symbol of a `units::` constant is looked up in the unit table by dimension and factor
/// (a whole symbol before a prefixed one, table order otherwise), when the text is written;
/// the units of ionizing radiation (Gy, Sv, Bq), rad and sr are never chosen.
/// A unit built from others (`units::kJ / units::kg`) has no entry of its own: give its symbol,
/// or the value is written in coherent SI with the SI unit, so that a log never lies.
/// The number goes through the stream (its precision and format flags apply).

#include <array>
#include <charconv>
#include <cstddef>
#include <ostream>
#include <string>
#include <string_view>

#include "../core/format.hpp"
#include "quantity_type.hpp"
#include "spelling.hpp"
#include "table.hpp"
#include "unit.hpp"

namespace nondim {

namespace detail {

inline bool is_ascii(std::string_view s) noexcept {
  for (const char c : s)
    if (static_cast<unsigned char>(c) > 0x7f) return false;
  return true;
}

/// Units of ionizing radiation share their dimensions with J/kg (Gy, Sv) and 1/s (Bq), the
/// radian and steradian are the number one: a solver's specific energy, rate or ratio is
/// never written in them.
inline bool written_back(std::string_view symbol) noexcept {
  return symbol != "Gy" && symbol != "Sv" && symbol != "Bq" && symbol != "rad" && symbol != "sr";
}

/// The table's symbol for a unit of dimension d and SI factor f, in the form asked for; empty
/// when no entry, prefixed or not, has exactly that factor.
inline std::string table_symbol(const dimension& d, double f, text_form form) {
  for (const unit_entry& e : unit_table)
    if (e.dim == d && e.offset == 0.0 && e.factor == f && written_back(e.symbol) &&
        (form == text_form::unicode || is_ascii(e.symbol)))
      return std::string(e.symbol);
  for (std::size_t u = 0; u < unit_table.size(); ++u) {
    const unit_entry& e = unit_table[u];
    if (e.dim != d || !e.prefixable || !written_back(e.symbol) || (form == text_form::ascii && !is_ascii(e.symbol)))
      continue;
    for (std::size_t p = 0; p < prefix_table.size(); ++p) {
      const std::string_view ps = prefix_table[p].symbol;
      // micro: "u" in ASCII, the micro sign in Unicode (the Greek mu is read, never written)
      if (form == text_form::ascii ? !is_ascii(ps) : (ps == "u" || ps == "\u03bc")) continue;
      if (resolved_factor(symbol_position{u, p}) == f) return std::string(ps) + std::string(e.symbol);
    }
  }
  return {};
}

}  // namespace detail

/// \brief A value and the symbol of its unit: what `in_unit` returns; written by `<<` and `to_string`.
struct value_in_unit {
  double value;        ///< the number of units
  std::string symbol;  ///< empty for a dimensionless number
};

/// \brief q in the unit u, with u's symbol from the unit table (see the file comment).
template <dimension D, class R>
value_in_unit in_unit(const quantity<D, R>& q, const unit<D>& u, text_form form = text_form::unicode) {
  std::string symbol = detail::table_symbol(D, u.factor, form);
  if (symbol.empty() && u.factor != 1.0) return {static_cast<double>(q.si()), si_unit_string(D, form)};
  if (symbol.empty() && !D.is_dimensionless()) symbol = si_unit_string(D, form);
  return {static_cast<double>(q.si()) / u.factor, std::move(symbol)};
}

/// \brief q in the unit u, written with the symbol given (for units built from others).
template <dimension D, class R>
value_in_unit in_unit(const quantity<D, R>& q, const unit<D>& u, std::string_view symbol) {
  return {static_cast<double>(q.si()) / u.factor, std::string(symbol)};
}

/// Refused: a unit of another dimension.
template <dimension D, class R, dimension D2, class... A>
requires(D != D2) value_in_unit in_unit(const quantity<D, R>&, const unit<D2>&, A&&...) {
  static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                "nondim: cannot write a quantity in a unit of another dimension (the quantity's dimension "
                "first, the unit's second)");
  return {};
}

template <class CharT, class Traits>
std::basic_ostream<CharT, Traits>& operator<<(std::basic_ostream<CharT, Traits>& os, const value_in_unit& v) {
  os << v.value;
  if (!v.symbol.empty()) os << ' ' << v.symbol.c_str();
  return os;
}

/// \brief "101.325 kPa": the shortest decimal that reads back to the value, a space, the symbol.
inline std::string to_string(const value_in_unit& v) {
  std::array<char, 32> buffer{};
  const auto r = std::to_chars(buffer.data(), buffer.data() + buffer.size(), v.value);
  std::string s(buffer.data(), r.ptr);
  if (!v.symbol.empty()) s += " " + v.symbol;
  return s;
}

}  // namespace nondim
