#pragma once
/// \file validate.hpp
/// \brief Checks of a similarity problem before any arithmetic: every fault becomes a
/// `similarity_error` that names the variable or group.

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "../../../solver/core/detail/cat.hpp"
#include "../../../solver/core/dimension.hpp"
#include "../../../solver/core/format.hpp"
#include "../error.hpp"
#include "../problem.hpp"
#include "exact.hpp"
#include "text.hpp"

namespace nondim::detail {

/// Largest exponent magnitude accepted: doubles hold every integer up to 2^53 exactly.
inline constexpr std::int64_t max_group_exponent = std::int64_t{1} << 53;

inline std::string quote(const std::string& s) {
  std::string q = "'";
  q += s;
  q += "'";
  return q;
}

inline std::vector<std::string> variable_names(const similarity_problem& p) {
  std::vector<std::string> names;
  names.reserve(p.variables.size());
  for (const auto& v : p.variables) names.push_back(v.name);
  return names;
}

/// "group 2 (rho*V*L/mu)" or "group 2 (Re: rho*V*L/mu)": 1-based for people.
inline std::string describe_group(const similarity_problem& p, std::size_t k) {
  std::string s = cat("group ", std::to_string(k + 1), " (");
  const auto& g = p.groups[k];
  if (!g.label.empty()) {
    s += g.label;
    s += ": ";
  }
  s += group_text(variable_names(p), g.exponents);
  s += ")";
  return s;
}

inline void check_value(const similarity_variable& v, const std::optional<double>& x, const char* which) {
  if (!x) return;
  if (std::isfinite(*x) && *x > 0.0) return;
  throw similarity_error(
      cat("nondim: the ", which, " value of ", quote(v.name),
          " must be positive and finite (similarity works with the logarithms of values), got ", format_exact(*x)),
      v.name);
}

inline void check_uncertainty(const similarity_variable& v, const std::optional<double>& u,
                              const std::optional<double>& x, const char* which) {
  if (!u) return;
  if (!x)
    throw similarity_error(
        cat("nondim: ", quote(v.name), " has an uncertainty of its ", which, " value but no ", which, " value"),
        v.name);
  if (std::isfinite(*u) && *u >= 0.0) return;
  throw similarity_error(cat("nondim: the uncertainty of the ", which, " value of ", quote(v.name),
                             " must be a finite number >= 0, got ", format_exact(*u)),
                         v.name);
}

inline void check_variables(const similarity_problem& p, std::size_t dependent) {
  for (std::size_t j = 0; j < p.variables.size(); ++j) {
    const auto& v = p.variables[j];
    const std::string unit = v.unit.empty() ? std::string{} : cat(" (unit ", quote(v.unit), ")");
    if (!(std::isfinite(v.factor) && v.factor > 0.0))
      throw similarity_error(cat("nondim: the unit factor of ", quote(v.name), unit,
                                 " must be positive and finite, got ", format_exact(v.factor)),
                             v.name);
    if (v.offset != 0.0)
      throw similarity_error(cat("nondim: ", quote(v.name), " is in an affine unit", unit, ", whose zero is offset by ",
                                 format_number(v.offset),
                                 " from the SI zero: similarity scales by ratios of values, so give it in an absolute "
                                 "unit (for a temperature, K or degR)"),
                             v.name);
    if (j == dependent) {
      if (v.prototype)
        throw similarity_error(cat("nondim: ", quote(v.name),
                                   " is the dependent variable: the model test measures it and the plan predicts its "
                                   "prototype value, so it takes no prototype value"),
                               v.name);
      check_value(v, v.model, "measured model");
      check_uncertainty(v, v.model_uncertainty, v.model, "measured model");
      check_uncertainty(v, v.prototype_uncertainty, v.prototype, "prototype");  // it has none: refused
    } else {
      if (!v.prototype)
        throw similarity_error(cat("nondim: the prototype value of ", quote(v.name),
                                   " is missing (every variable but the dependent one needs one)"),
                               v.name);
      check_value(v, v.prototype, "prototype");
      check_value(v, v.model, "model");
      check_uncertainty(v, v.prototype_uncertainty, v.prototype, "prototype");
      check_uncertainty(v, v.model_uncertainty, v.model, "model");
    }
  }
}

inline void check_groups(const similarity_problem& p) {
  const std::size_t n = p.variables.size();
  bool all_dims = true;
  for (const auto& v : p.variables) all_dims = all_dims && v.dim.has_value();
  for (std::size_t k = 0; k < p.groups.size(); ++k) {
    const auto& e = p.groups[k].exponents;
    if (e.size() != n)
      throw similarity_error(cat("nondim: group ", std::to_string(k + 1), " has ", std::to_string(e.size()),
                                 " exponents for ", std::to_string(n), " variables (one per variable, in order)"),
                             {}, k);
    bool any = false;
    for (std::size_t j = 0; j < n; ++j) {
      if (e[j] > max_group_exponent || e[j] < -max_group_exponent)
        throw similarity_error(cat("nondim: ", describe_group(p, k), ": the exponent of ", quote(p.variables[j].name),
                                   " is beyond 2^53 in magnitude"),
                               p.variables[j].name, k);
      any = any || e[j] != 0;
    }
    if (!any)
      throw similarity_error(cat("nondim: group ", std::to_string(k + 1), " has no variable (every exponent is 0)"), {},
                             k);
    if (all_dims) {
      dimension total{};
      bool overflow = false;
      try {
        for (std::size_t j = 0; j < n; ++j) total = total * pow(*p.variables[j].dim, rational{e[j]});
      } catch (const rational_overflow&) {
        overflow = true;
      }
      if (overflow)
        throw similarity_error(cat("nondim: ", describe_group(p, k), ": its dimension overflows 64-bit exponents"), {},
                               k);
      if (!total.is_dimensionless())
        throw similarity_error(
            cat("nondim: ", describe_group(p, k), " is not dimensionless: its dimension is ", to_string(total)), {}, k);
    }
  }
  // Independent groups: each must add to the rank of those before it.
  std::vector<std::vector<std::int64_t>> rows;
  for (std::size_t k = 0; k < p.groups.size(); ++k) {
    rows.push_back(p.groups[k].exponents);
    if (similarity_reduce(rows, n).rank() < rows.size())
      throw similarity_error(cat("nondim: ", describe_group(p, k),
                                 " is a product of powers of the groups before it: the groups must be independent"),
                             {}, k);
  }
}

inline void check_priority(const similarity_problem& p, std::size_t dependent) {
  const std::size_t g = p.groups.size();
  for (std::size_t i = 0; i < p.priority.size(); ++i) {
    const std::size_t k = p.priority[i];
    if (k >= g)
      throw similarity_error(cat("nondim: priority entry ", std::to_string(i + 1), " is group index ",
                                 std::to_string(k), " (0-based), but there are ", std::to_string(g), " groups"));
    for (std::size_t m = 0; m < i; ++m)
      if (p.priority[m] == k)
        throw similarity_error(cat("nondim: ", describe_group(p, k), " is listed twice in the priority list"), {}, k);
    if (p.groups[k].exponents[dependent] != 0)
      throw similarity_error(
          cat("nondim: ", describe_group(p, k), " holds the dependent variable ", quote(p.variables[dependent].name),
              ": it carries the measured value to full scale and cannot be a group to match"),
          p.variables[dependent].name, k);
  }
}

/// \brief Checks everything; returns the index of the dependent variable.
/// \throws similarity_error on the first fault found.
inline std::size_t validate(const similarity_problem& p) {
  const std::size_t n = p.variables.size();
  if (n == 0) throw similarity_error("nondim: the similarity problem has no variables");
  for (std::size_t j = 0; j < n; ++j) {
    const auto& name = p.variables[j].name;
    if (name.find_first_not_of(" \t\r\n") == std::string::npos)
      throw similarity_error(cat("nondim: variable ", std::to_string(j + 1), " has an empty name"));
    for (std::size_t i = 0; i < j; ++i)
      if (p.variables[i].name == name)
        throw similarity_error(cat("nondim: variable ", quote(name), " appears twice"), name);
  }
  if (!(std::isfinite(p.tolerance) && p.tolerance > 0.0))
    throw similarity_error(
        cat("nondim: the matching tolerance must be positive and finite, got ", format_exact(p.tolerance)));
  std::size_t dependent = 0;
  if (!p.dependent.empty()) {
    dependent = n;
    for (std::size_t j = 0; j < n; ++j)
      if (p.variables[j].name == p.dependent) dependent = j;
    if (dependent == n)
      throw similarity_error(cat("nondim: the dependent variable ", quote(p.dependent), " is not among the variables"),
                             p.dependent);
  }
  check_variables(p, dependent);
  check_groups(p);
  check_priority(p, dependent);
  return dependent;
}

}  // namespace nondim::detail
