#include "value_text.hpp"

#include <charconv>
#include <cmath>
#include <system_error>
#include <utility>

namespace nondim::tool {

namespace {

bool is_space(char c) {
  return c == ' ' || c == '\t';
}

std::string_view skip_spaces(std::string_view s) {
  while (!s.empty() && is_space(s.front())) s.remove_prefix(1);
  return s;
}

std::string_view trim_end(std::string_view s) {
  while (!s.empty() && is_space(s.back())) s.remove_suffix(1);
  return s;
}

/// The length of a "±", "+-" or "+/-" at the start of `s`; 0 when none.
std::size_t plus_minus(std::string_view s) {
  if (s.substr(0, 2) == "\u00b1") return 2;
  if (s.substr(0, 2) == "+-") return 2;
  if (s.substr(0, 3) == "+/-") return 3;
  return 0;
}

bool starts_number(std::string_view s) {
  if (!s.empty() && (s.front() == '-' || s.front() == '+')) s.remove_prefix(1);
  if (!s.empty() && s.front() == '.') s.remove_prefix(1);
  return !s.empty() && s.front() >= '0' && s.front() <= '9';
}

/// The first token: up to white space, a "±" (or "+-", "+/-" after the first character) or a '%'.
std::string_view first_token(std::string_view s) {
  std::size_t i = 0;
  while (i < s.size() && !is_space(s[i]) && s[i] != '%' && (i == 0 || plus_minus(s.substr(i)) == 0)) ++i;
  return s.substr(0, i);
}

}  // namespace

std::pair<double, std::string_view> leading_number(std::string_view text, std::string_view what) {
  const std::string_view s = skip_spaces(text);
  if (!starts_number(s))
    throw value_text_error(std::string(what) + " '" + std::string(trim_end(s)) + "' is not a number");
  const std::string_view token = first_token(s);
  std::string_view digits = token;
  const bool negative = !digits.empty() && digits.front() == '-';
  if (!digits.empty() && (digits.front() == '-' || digits.front() == '+')) digits.remove_prefix(1);
  double x = 0.0;
  const auto [end, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), x);
  if (ec == std::errc::result_out_of_range || (ec == std::errc{} && !std::isfinite(x)))
    throw value_text_error(std::string(what) + " '" + std::string(token) + "' is out of the range of a double");
  if (ec != std::errc{} || end != digits.data() + digits.size())
    throw value_text_error(std::string(what) + " '" + std::string(token) + "' is not a number");
  return {negative ? -x : x, s.substr(token.size())};
}

std::optional<value_text> read_value_argument(std::string_view text) {
  const std::string_view s = skip_spaces(text);
  if (!starts_number(s)) return std::nullopt;
  const std::string_view token = first_token(s);
  const std::string_view after = s.substr(token.size());
  // "1" alone is the unit of a pure number; "1/s" and "1/(m*s)" are units too
  if (token == "1" && skip_spaces(after).empty()) return std::nullopt;
  if (token.size() > 1 && token.front() == '1' && (token[1] == '/' || token[1] == '*' || token[1] == '^'))
    return std::nullopt;
  value_text v;
  auto [x, rest] = leading_number(s, "the value");
  v.value = x;
  rest = skip_spaces(rest);
  if (!rest.empty() && rest.front() == '%')
    throw value_text_error("'%' after the value: write the uncertainty in per cent after '\u00b1' (2\u00b15% m/s)");
  if (const std::size_t pm = plus_minus(rest); pm != 0) {
    rest = skip_spaces(rest.substr(pm));
    if (rest.empty() || (!starts_number(rest)))
      throw value_text_error("expected an uncertainty after '\u00b1', found " +
                             (rest.empty() ? std::string("the end") : "'" + std::string(trim_end(rest)) + "'"));
    auto [u, after_u] = leading_number(rest, "the uncertainty");
    if (u < 0.0)
      throw value_text_error("the uncertainty " + std::string(first_token(rest)) +
                             " is negative (a standard uncertainty is >= 0)");
    v.uncertainty = u;
    rest = skip_spaces(after_u);
    if (!rest.empty() && rest.front() == '%') {
      v.percent = true;
      rest = skip_spaces(rest.substr(1));
      if (!rest.empty() && rest.front() == '%') throw value_text_error("'%' given twice");
    }
  }
  rest = trim_end(rest);
  if (!rest.empty() && plus_minus(rest) != 0) throw value_text_error("a second uncertainty");
  v.unit = rest.empty() ? "1" : std::string(rest);
  return v;
}

}  // namespace nondim::tool
