#include "units_text.hpp"

#include <charconv>
#include <cmath>
#include <cstdio>
#include <system_error>

#include "messages.hpp"

namespace nondim::tool {

std::string_view bare_message(const std::exception& e) {
  std::string_view m = e.what();
  constexpr std::string_view prefix = "nondim: ";
  if (m.substr(0, prefix.size()) == prefix) m.remove_prefix(prefix.size());
  return m;
}

parsed_unit parse_unit_arg(std::string_view text, std::string_view what) {
  try {
    return parse_unit(text);
  } catch (const unit_error& e) {
    std::string m = with_prefix(std::string(what) + ": " + std::string(bare_message(e)));
    if (text.size() <= 200) m += "\n" + caret_block(text, e.column());
    throw input_error(m);
  }
}

double parse_number_arg(std::string_view text, std::string_view what) {
  std::string_view t = text;
  if (!t.empty() && t.front() == '+') t.remove_prefix(1);  // from_chars takes no '+'
  const bool decimal_characters = t.find_first_not_of("0123456789.eE+-") == std::string_view::npos;
  double x = 0.0;
  const auto [end, ec] = std::from_chars(t.data(), t.data() + t.size(), x, std::chars_format::general);
  if (t.empty() || !decimal_characters || ec == std::errc::invalid_argument || end != t.data() + t.size())
    throw input_error(with_prefix(std::string(what) + " '" + std::string(text) +
                                  "' is not a number (write a decimal such as 20, -40, 1.5e5)"));
  if (ec == std::errc::result_out_of_range || !std::isfinite(x))
    throw input_error(with_prefix(std::string(what) + " '" + std::string(text) + "' is out of the range of a double"));
  return x;
}

std::string readable_number(double x) {
  char buffer[40];
  std::snprintf(buffer, sizeof buffer, "%.15g", x);
  std::string s(buffer);
  if (s == "-0") s = "0";
  return s;
}

}  // namespace nondim::tool
