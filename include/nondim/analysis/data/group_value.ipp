#pragma once
// Definitions of group_value.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cmath>
#include <cstddef>
#include <map>
#include <optional>
#include <span>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "group_value.hpp"

namespace nondim {

NONDIM_ANALYSIS_INLINE double product_uncertainty(std::span<const double> x, std::span<const double> u,
                                                  std::span<const double> p) {
  if (x.size() != u.size() || x.size() != p.size())
    throw analysis_error(detail::cat("nondim: ", std::to_string(x.size()), " values, ", std::to_string(u.size()),
                                     " uncertainties and ", std::to_string(p.size()), " exponents given"));
  double sum = 0.0;
  for (std::size_t i = 0; i < x.size(); ++i) {
    if (p[i] == 0.0 || u[i] == 0.0) continue;
    // c_i from its definition, so that an input at 0 (y = 0) needs no division by it
    double c = p[i] * std::pow(x[i], p[i] - 1.0);
    for (std::size_t j = 0; j < x.size(); ++j)
      if (j != i && p[j] != 0.0) c *= std::pow(x[j], p[j]);
    sum += (c * u[i]) * (c * u[i]);
  }
  return std::sqrt(sum);
}

NONDIM_ANALYSIS_INLINE std::optional<group_value> evaluate(const pi_group& g, const design_point& point) {
  const auto& names = g.variables();
  std::map<std::string, double, std::less<>> values;
  std::vector<double> x;
  std::vector<double> u;
  std::vector<double> p;
  bool every_uncertainty = true;
  for (std::size_t i = 0; i < g.exponents.size() && i < names.size(); ++i) {
    if (g.exponents[i] == 0) continue;
    const measured_value* m = point.find(names[i]);
    if (m == nullptr) return std::nullopt;
    values.emplace(names[i], m->value);
    x.push_back(m->value);
    u.push_back(m->uncertainty.value_or(0.0));
    p.push_back(static_cast<double>(g.exponents[i]));
    every_uncertainty = every_uncertainty && m->uncertainty.has_value();
  }
  group_value out;
  out.value = g.value(values);  // the checked evaluation: names the variable of a bad value
  if (every_uncertainty) out.uncertainty = product_uncertainty(x, u, p);
  return out;
}

NONDIM_ANALYSIS_INLINE std::vector<std::optional<group_value>> group_values(const analysis& a,
                                                                            const design_point& point) {
  std::vector<std::optional<group_value>> out;
  out.reserve(a.groups.size());
  for (const auto& g : a.groups) out.push_back(evaluate(g, point));
  return out;
}

}  // namespace nondim
