#pragma once
/// \file detail/names.hpp
/// \brief Helpers shared by the views: names split into head and subscript, one-line
/// text and list formatting.

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

#include "../../../analysis.hpp"

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

}  // namespace nondim::detail
