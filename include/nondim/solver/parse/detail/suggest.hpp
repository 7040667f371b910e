#pragma once
/// \file suggest.hpp
/// \brief Hints for an unknown unit symbol: what the user probably meant. Cold path only.

#include <array>
#include <cstddef>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "../../units/table.hpp"

namespace nondim::detail {

constexpr char ascii_lower(char c) noexcept {
  return c >= 'A' && c <= 'Z' ? static_cast<char>(c - 'A' + 'a') : c;
}

constexpr bool equal_ignoring_case(std::string_view a, std::string_view b) noexcept {
  if (a.size() != b.size()) return false;
  for (std::size_t i = 0; i < a.size(); ++i)
    if (ascii_lower(a[i]) != ascii_lower(b[i])) return false;
  return true;
}

/// Optimal string alignment distance is at most 1 (one substitution, insertion, deletion or
/// swap of neighbours).
constexpr bool within_one_edit(std::string_view a, std::string_view b) noexcept {
  if (a.size() > b.size()) std::swap(a, b);
  if (b.size() - a.size() > 1) return false;
  std::size_t i = 0;
  while (i < a.size() && a[i] == b[i]) ++i;
  if (i == a.size()) return true;  // equal, or one appended character
  if (a.size() == b.size()) {
    if (a.substr(i + 1) == b.substr(i + 1)) return true;  // one substitution
    return i + 1 < a.size() && a[i] == b[i + 1] && a[i + 1] == b[i] && a.substr(i + 2) == b.substr(i + 2);
  }
  return a.substr(i) == b.substr(i + 1);  // one insertion
}

/// Words people write for units, and what to write instead (the end of the message).
inline constexpr std::array<std::pair<std::string_view, std::string_view>, 21> unit_word_hints{{
    {"sec", "; write `s`"},
    {"secs", "; write `s`"},
    {"hr", "; write `h`"},
    {"hrs", "; write `h`"},
    {"mins", "; write `min`"},
    {"lbs", "; write `lb`"},
    {"liter", "; write `L`"},
    {"litre", "; write `L`"},
    {"micron", "; write `um`"},
    {"mile", "; write `mi` (`mil` is a thousandth of an inch)"},
    {"miles", "; write `mi` (`mil` is a thousandth of an inch)"},
    {"degK", "; write `K`"},
    {"\u00b0K", "; write `K`"},
    {"kph", "; write `km/h`"},
    {"cfm", "; write `ft^3/min`"},
    {"psia", "; write `psi` (absolute pressures need no mark)"},
    {"psig",
     "; a gauge pressure is relative to the local atmosphere, which a unit cannot carry: write the "
     "absolute pressure in `psi` (gauge plus atmospheric)"},
    {"barg",
     "; a gauge pressure is relative to the local atmosphere, which a unit cannot carry: write the "
     "absolute pressure in `bar` (gauge plus atmospheric)"},
    {"ohm", "; write `Ohm`"},
    {"rps", "; write `1/s` for revolutions per second (a rotational frequency) or `rad/s` for an angular velocity"},
    {"ton", "; write `t` (tonne) or `TR` (ton of refrigeration): `ton` alone is ambiguous"},
}};

/// A hint for `token`, which names no unit: "; did you mean `kPa`?" or empty.
inline std::string unknown_symbol_hint(std::string_view token) {
  if (token.empty() || token.size() > 64) return {};
  for (const auto& [word, hint] : unit_word_hints)
    if (token == word) return std::string(hint);
  for (const auto& p : prefix_table)
    if (token == p.symbol)
      return "; `" + std::string(token) + "` is an SI prefix (10^" + std::to_string(p.exponent) +
             "): write it on its unit, as in `" + std::string(token) + "m`";
  // m2 -> m^2
  std::size_t digits_from = token.size();
  while (digits_from > 0 && token[digits_from - 1] >= '0' && token[digits_from - 1] <= '9') --digits_from;
  if (digits_from > 0 && digits_from < token.size() && resolve_unit_symbol(token.substr(0, digits_from)))
    return "; a power is written `" + std::string(token.substr(0, digits_from)) + "^" +
           std::string(token.substr(digits_from)) + "`";
  // a prefix on a unit that takes none, or on the kilogram
  for (const auto& p : prefix_table) {
    if (token.size() <= p.symbol.size() || token.substr(0, p.symbol.size()) != p.symbol) continue;
    const std::string_view rest = token.substr(p.symbol.size());
    if (rest == "kg") return "; the kilogram takes its prefixes on `g` (`mg`, `Mg`), never on `kg`";
    if (const unit_entry* e = find_unit_entry(rest); e != nullptr && !e->prefixable)
      return "; `" + std::string(rest) + "` (" + std::string(e->name) + ") takes no SI prefix";
  }
  // wrong case: whole symbols, then prefix + prefixable symbol
  std::vector<std::string> candidates;
  const auto add = [&candidates](std::string c) {
    for (const auto& k : candidates)
      if (k == c) return;
    if (candidates.size() < 3) candidates.push_back(std::move(c));
  };
  for (const auto& e : unit_table)
    if (equal_ignoring_case(e.symbol, token)) add(std::string(e.symbol));
  for (const auto& a : unit_aliases)
    if (equal_ignoring_case(a.alias, token)) add(std::string(a.alias));
  for (const auto& p : prefix_table) {
    if (token.size() <= p.symbol.size() || !equal_ignoring_case(token.substr(0, p.symbol.size()), p.symbol)) continue;
    const std::string_view rest = token.substr(p.symbol.size());
    for (const auto& k : symbol_index) {
      if (!unit_table[k.entry].prefixable || !equal_ignoring_case(k.key, rest)) continue;
      add(std::string(p.symbol) + std::string(k.key));
    }
  }
  // one typing slip
  if (candidates.empty() && token.size() >= 3)  // shorter tokens are one edit from too many symbols
    for (const auto& k : symbol_index)
      if (within_one_edit(k.key, token)) add(std::string(k.key));
  // two symbols written together: Pas is Pa*s (longest first symbol first)
  std::string product;
  for (std::size_t cut = token.size() - 1; cut > 0 && product.empty(); --cut)
    if (resolve_unit_symbol(token.substr(0, cut)) && resolve_unit_symbol(token.substr(cut)))
      product = std::string(token.substr(0, cut)) + "*" + std::string(token.substr(cut));
  if (candidates.empty() && product.empty()) return {};
  if (candidates.empty()) return "; a product is written with `*`, `\u00b7` or a space: `" + product + "`";
  std::string hint = "; did you mean `" + candidates[0] + "`";
  for (std::size_t i = 1; i < candidates.size(); ++i)
    hint += (i + 1 == candidates.size() ? " or `" : ", `") + candidates[i] + "`";
  if (!product.empty()) hint += ", or the product `" + product + "`";
  return hint + "?";
}

}  // namespace nondim::detail
