#pragma once
/// \file repeating_rule.hpp
/// \brief The order in which an engineer considers variables as repeating ones (DESIGN.md,
/// "Rules for the groups"), read from their dimensions and, among variables of one
/// dimension, from their declared kinds and names.
///
/// A characteristic length first (geometric); then a velocity, a rotational speed or an
/// acceleration such as g (kinematic); then a density (material); then the others by fewer
/// base dimensions and smaller exponents; last the properties a textbook never repeats
/// unless nothing else closes the rank: surface tension, viscosity (dynamic, or kinematic
/// with the diffusivities of its dimension), expansion coefficients, pure numbers. Input
/// order breaks ties. Taking each in this order when it raises the rank gives the
/// repeating variables of `analyze()`.
///
/// Dimensions cannot tell a packed bed's length from its particle diameter, or an overall
/// conductance UA from a heat-capacity rate (both W/K). Among variables of one dimension,
/// the one a textbook repeats (`repeating_preference`) takes the place of the first, read
/// from the same evidence the names of groups rely on: a declared kind, else a conventional
/// name (names/quantity_kind.hpp). Only one variable of a dimension can ever be repeating,
/// so this decides which one, and nothing else. The compile-time `pi_groups` sees
/// dimensions only: there input order decides among variables of one dimension.

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <span>
#include <string_view>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "../names/quantity_kind.hpp"

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

/// \brief Among variables of one dimension, how readily a textbook repeats one, best first.
enum class repeating_preference : std::uint8_t {
  textbook,  ///< a diameter (pipe, particle, hydraulic), a heat-capacity rate, C_min
  neutral,   ///< no evidence either way: a length L, a height H, a name the kinds do not list
  avoided,   ///< a roughness, mean free path, radius of curvature, UA, C_max, ρ_p, Δρ, μ_w
};

/// \brief The preference of a variable of kind `k`.
///
/// Textbooks scale a packed bed, a pipe or a particle with its diameter and give the
/// length as L/d (Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., 6.4: the Ergun
/// equation; Munson, Young & Okiishi, 6th ed., 8.3: l/D, ε/D); a heat exchanger with C_min,
/// so that NTU = UA/C_min and C_r = C_min/C_max (Bergman et al., Fundamentals of Heat and
/// Mass Transfer, 7th ed., 11.4); a particle or a bubble with the fluid's density, the
/// particle's or the difference in a ratio of its own (Clift, Grace & Weber, ch. 2); all
/// from memory.
[[nodiscard]] constexpr repeating_preference repeating_preference_of_kind(quantity_kind k) noexcept {
  switch (k) {
    case quantity_kind::max_heat_capacity_rate:  // before its more general kind
    case quantity_kind::roughness:
    case quantity_kind::mean_free_path:
    case quantity_kind::curvature_radius:
    case quantity_kind::overall_conductance:
    case quantity_kind::particle_density:
    case quantity_kind::density_difference:
    case quantity_kind::wall_viscosity:
      return repeating_preference::avoided;
    default:
      break;
  }
  if (is_same_or_general(quantity_kind::diameter, k) || is_same_or_general(quantity_kind::heat_capacity_rate, k))
    return repeating_preference::textbook;
  return repeating_preference::neutral;
}

/// \brief The preference of the variable `name` of dimension `d` with the declared kind
/// `declared` (an identifier or name of a kind, or empty): the declared kind when it has
/// dimension `d`; else the best of the kinds of dimension `d` whose conventional names
/// list `name`, failing that the part of `name` before its first `_` ("D_pipe" is a
/// diameter); else neutral.
[[nodiscard]] constexpr repeating_preference repeating_preference_of(std::string_view name, const dimension& d,
                                                                     std::string_view declared) noexcept {
  if (const quantity_kind k = kind_from_key(declared); k != quantity_kind::unspecified && kind_info(k).dim == d)
    return repeating_preference_of_kind(k);
  const std::size_t underscore = name.find('_');
  const std::string_view base =
      underscore == std::string_view::npos || underscore == 0 ? std::string_view{} : name.substr(0, underscore);
  for (const std::string_view n : {name, base}) {
    bool listed = false;
    auto best = repeating_preference::avoided;
    for (const auto& k : quantity_kinds) {
      if (k.kind == quantity_kind::unspecified || !(k.dim == d) || !detail::in_name_list(k.names, n)) continue;
      listed = true;
      best = std::min(best, repeating_preference_of_kind(k.kind));
    }
    if (listed) return best;
  }
  return repeating_preference::neutral;
}

/// \brief The variables other than `dependent`, in the order the rule considers them
/// (input indices). `dependent` may be out of range for none. `preference`, empty or one
/// per variable, reorders the variables of each dimension among the places they hold.
[[nodiscard]] inline std::vector<std::size_t> repeating_candidate_order(
    const std::vector<dimension>& dims, std::size_t dependent, std::span<const repeating_preference> preference = {}) {
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
  if (preference.size() != n) return order;
  // the places of each dimension, taken by its variables best first (input order breaks ties)
  std::vector<bool> placed(order.size(), false);
  std::vector<std::size_t> places;
  std::vector<std::size_t> same;
  for (std::size_t i = 0; i < order.size(); ++i) {
    if (placed[i]) continue;
    places.clear();
    same.clear();
    for (std::size_t k = i; k < order.size(); ++k)
      if (!placed[k] && dims[order[k]] == dims[order[i]]) {
        places.push_back(k);
        same.push_back(order[k]);
        placed[k] = true;
      }
    if (same.size() < 2) continue;
    std::stable_sort(same.begin(), same.end(),
                     [&](std::size_t a, std::size_t b) { return preference[a] < preference[b]; });
    for (std::size_t k = 0; k < places.size(); ++k) order[places[k]] = same[k];
  }
  return order;
}

}  // namespace nondim
