#pragma once
/// \file detail/names.hpp
/// \brief Helpers shared by the views: names split into head and subscript, list
/// formatting, and the named-group matches of a group in one shape for every view.

#include <cstddef>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "../../analysis.hpp"

namespace nondim::detail {

struct name_parts {
  std::string_view head;
  std::string_view subscript;  ///< empty when none
};

/// `mu_w` -> {mu, w}; `L1` -> {L, 1}; `rho` -> {rho, ""}. The same rule as `display_name`:
/// the head ends at the first `_` or digit.
inline name_parts split_name(std::string_view name) {
  std::size_t end = 0;
  while (end < name.size() && name[end] != '_' && (name[end] < '0' || name[end] > '9')) ++end;
  if (end == 0 || end == name.size()) return {name, {}};
  const std::size_t sub = name[end] == '_' ? end + 1 : end;
  return {name.substr(0, end), name.substr(sub)};
}

/// Control characters (a newline in a title) as spaces, so that a line stays one line.
inline std::string one_line(std::string_view s) {
  std::string out(s);
  for (char& c : out)
    if (static_cast<unsigned char>(c) < 0x20U) c = ' ';
  return out;
}

/// "a, b, c"; "none" when empty. Names are written as `display_name` gives them in `form`.
inline std::string comma_list(const std::vector<std::string>& names, text_form form = text_form::ascii) {
  if (names.empty()) return "none";
  std::string s;
  for (std::size_t k = 0; k < names.size(); ++k) s += (k ? ", " : "") + display_name(names[k], form);
  return s;
}

/// A recognised named group, as the views show it: the group is `symbol^power`.
struct match_view {
  std::string name;        ///< "Reynolds number"
  std::string symbol;      ///< "Re"
  rational power{1};       ///< the group equals the named group to this power
  bool ambiguous = false;  ///< another catalog entry matches the same group too
};

/// The named groups a group was recognised as: its `matches` (name, symbol, power, and
/// `ambiguous` where the catalog gives it), in the catalog's order.
template <class Group>
std::vector<match_view> matches_of(const Group& g) {
  std::vector<match_view> out;
  if constexpr (requires { g.matches.begin(); }) {
    for (const auto& m : g.matches) {
      match_view v{std::string(m.name), std::string(m.symbol), rational{m.power}, false};
      if constexpr (requires { static_cast<bool>(m.ambiguous); }) v.ambiguous = static_cast<bool>(m.ambiguous);
      out.push_back(std::move(v));
    }
  }
  return out;
}

}  // namespace nondim::detail
