#pragma once
/// \file text.hpp
/// \brief ASCII text pieces of a similarity plan: numbers, groups written out, the
/// scale-up rule.

#include <cstdint>
#include <cstdio>
#include <string>
#include <vector>

#include "../../../solver/core/format.hpp"
#include "../../../solver/core/rational.hpp"

namespace nondim::detail {

/// Six significant digits, as a table shows them ("%.6g").
inline std::string format_number(double x) {
  char buf[32];
  std::snprintf(buf, sizeof buf, "%.6g", x);
  return buf;
}

/// Full precision, for error messages that quote the value given.
inline std::string format_exact(double x) {
  char buf[40];
  std::snprintf(buf, sizeof buf, "%.17g", x);
  return buf;
}

inline void append_power(std::string& s, const std::string& base, const rational& e) {
  s += base;
  if (e == rational{1}) return;
  s.push_back('^');
  if (e.den == 1) {
    s += std::to_string(e.num);
  } else {
    s.push_back('(');
    s += to_string(e);
    s.push_back(')');
  }
}

/// "rho*V*L/mu", "F/(rho*V^2*L^2)", "1/(g*L)": positive exponents above, negative below.
inline std::string group_text(const std::vector<std::string>& names, const std::vector<std::int64_t>& exponents) {
  std::string top;
  std::string bottom;
  std::size_t below = 0;
  for (std::size_t j = 0; j < exponents.size() && j < names.size(); ++j) {
    const std::int64_t e = exponents[j];
    if (e == 0) continue;
    std::string& side = e > 0 ? top : bottom;
    if (!side.empty()) side.push_back('*');
    // the magnitude in unsigned arithmetic: -2^63 has no int64 negation (a group that
    // plan_similarity refuses is still written out in the message that refuses it)
    const std::uint64_t m = e > 0 ? static_cast<std::uint64_t>(e) : 0 - static_cast<std::uint64_t>(e);
    side += names[j];
    if (m != 1) side += "^" + std::to_string(m);
    if (e < 0) ++below;
  }
  if (top.empty()) top.push_back('1');  // not `= "1"`: a false GCC 12 -Wrestrict at -O3
  if (bottom.empty()) return top;
  std::string s = top;
  s.push_back('/');
  if (below > 1) {
    s.push_back('(');
    s += bottom;
    s.push_back(')');
  } else {
    s += bottom;
  }
  return s;
}

/// "F_p/F_m = (rho_p/rho_m) * (V_p/V_m)^2 * (mu_m/mu_p)": a negative exponent flips the ratio.
inline std::string rule_text(const std::vector<std::string>& names, std::size_t dependent,
                             const std::vector<rational>& exponents) {
  std::string s = names[dependent];
  s += "_p/";
  s += names[dependent];
  s += "_m =";
  bool any = false;
  for (std::size_t j = 0; j < exponents.size() && j < names.size(); ++j) {
    const rational& e = exponents[j];
    if (e.is_zero()) continue;
    const bool up = e > rational{0};
    s += any ? " * " : " ";
    std::string ratio = "(";
    ratio += names[j];
    ratio += up ? "_p/" : "_m/";
    ratio += names[j];
    ratio += up ? "_m)" : "_p)";
    append_power(s, ratio, up ? e : -e);
    any = true;
  }
  if (!any) s += " 1";
  return s;
}

inline std::string join(const std::vector<std::string>& items) {
  std::string s;
  for (std::size_t i = 0; i < items.size(); ++i) {
    if (i > 0) s += i + 1 == items.size() ? " and " : ", ";
    s += items[i];
  }
  return s;
}

}  // namespace nondim::detail
