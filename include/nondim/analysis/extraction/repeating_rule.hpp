#pragma once
/// \file repeating_rule.hpp
/// \brief The order in which an engineer considers variables as repeating ones (DESIGN.md,
/// "Rules for the groups"), read from their dimensions alone.
///
/// A characteristic length first (geometric); then a velocity, a rotational speed or an
/// acceleration such as g (kinematic); then a density (material); then the others by fewer
/// base dimensions and smaller exponents; last the properties a textbook never repeats
/// unless nothing else closes the rank: surface tension, viscosity (dynamic, or kinematic
/// with the diffusivities of its dimension), expansion coefficients, pure numbers. Input
/// order breaks ties. Taking each in this order when it raises the rank gives the
/// repeating variables of `analyze()`.

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <vector>

#include "../../solver/core/dimension.hpp"

namespace nondim {

/// \brief The tiers of the rule, best first.
enum class repeating_tier {
  geometric,    ///< a length, L
  kinematic,    ///< a velocity L T^-1, a rotational speed T^-1, an acceleration L T^-2
  material,     ///< a density, M L^-3
  other,        ///< anything else, by fewer base dimensions and smaller exponents
  last_resort,  ///< surface tension, viscosity, diffusivity, expansion coefficient, pure number
};

/// \brief The tier of a variable of dimension `d`.
[[nodiscard]] inline repeating_tier repeating_tier_of(const dimension& d) noexcept {
  // exponents over L M T I Theta N J
  const auto is = [&d](int l, int m, int t, int theta) { return d == dimension{l, m, t, 0, theta, 0, 0}; };
  if (is(1, 0, 0, 0)) return repeating_tier::geometric;
  if (is(1, 0, -1, 0) || is(0, 0, -1, 0) || is(1, 0, -2, 0)) return repeating_tier::kinematic;
  if (is(-3, 1, 0, 0)) return repeating_tier::material;
  if (d.is_dimensionless() || is(0, 1, -2, 0) || is(-1, 1, -1, 0) || is(2, 0, -1, 0) || is(0, 0, 0, -1))
    return repeating_tier::last_resort;
  return repeating_tier::other;
}

/// \brief The variables other than `dependent`, in the order the rule considers them
/// (input indices). `dependent` may be out of range for none.
[[nodiscard]] inline std::vector<std::size_t> repeating_candidate_order(const std::vector<dimension>& dims,
                                                                        std::size_t dependent) {
  const std::size_t n = dims.size();
  std::vector<repeating_tier> tier(n);
  std::vector<std::size_t> bases(n);
  std::vector<double> weight(n);  // sum of |exponents|: only compared, so a double is exact enough
  for (std::size_t j = 0; j < n; ++j) {
    tier[j] = repeating_tier_of(dims[j]);
    bases[j] = dims[j].base_count();
    double w = 0;
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      w += std::abs(static_cast<double>(dims[j][i].num) / static_cast<double>(dims[j][i].den));
    weight[j] = w;
  }
  std::vector<std::size_t> order;
  order.reserve(n);
  for (std::size_t j = 0; j < n; ++j)
    if (j != dependent) order.push_back(j);
  std::stable_sort(order.begin(), order.end(), [&](std::size_t a, std::size_t b) {
    if (tier[a] != tier[b]) return tier[a] < tier[b];
    if (bases[a] != bases[b]) return bases[a] < bases[b];
    return weight[a] < weight[b];  // stable: input order breaks ties
  });
  return order;
}

}  // namespace nondim
