#pragma once
/// \file detail/table.hpp
/// \brief A text table with aligned columns (widths in code points), and short numbers.

#include <algorithm>
#include <cstddef>
#include <cstdio>
#include <string>
#include <vector>

#include "../../../analysis.hpp"

namespace nondim::detail {

enum class align { left, right };

/// Rows of cells; every column as wide as its widest cell, two spaces between columns,
/// the whole indented by `indent` spaces; trailing spaces removed.
inline std::string aligned_table(const std::vector<std::vector<std::string>>& rows, const std::vector<align>& how,
                                 std::size_t indent) {
  std::vector<std::size_t> width(how.size(), 0);
  for (const auto& r : rows)
    for (std::size_t c = 0; c < r.size() && c < width.size(); ++c) width[c] = std::max(width[c], display_width(r[c]));
  std::string s;
  for (const auto& r : rows) {
    std::string line(indent, ' ');
    for (std::size_t c = 0; c < r.size() && c < width.size(); ++c) {
      if (c != 0) line += "  ";
      const std::string fill(width[c] - display_width(r[c]), ' ');
      line += how[c] == align::right ? fill + r[c] : r[c] + fill;
    }
    while (!line.empty() && line.back() == ' ') line.pop_back();
    s += line + "\n";
  }
  return s;
}

/// Six significant digits, for the SVD line (a summary for people, not data).
inline std::string six_digits(double v) {
  char buffer[32];
  std::snprintf(buffer, sizeof buffer, "%.6g", v);
  return buffer;
}

}  // namespace nondim::detail
