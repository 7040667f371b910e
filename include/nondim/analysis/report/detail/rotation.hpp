#pragma once
/// \file detail/rotation.hpp
/// \brief The factor 2π a group hides when it mixes an angular velocity in rad/s with a
/// rotational frequency in rpm or Hz: both are s⁻¹ to the dimensions, but ω = 2π n
/// (ISO 80000-3).

#include <cstddef>
#include <string>
#include <vector>

#include "../../../analysis.hpp"
#include "../../../parse.hpp"

namespace nondim::detail {

/// True when the unit text names a plane angle (rad/s, rev/min); false for rpm, Hz, 1/s and
/// for a text that cannot be read (the analysis has read it already).
inline bool unit_mentions_angle(const std::string& unit) noexcept {
  try {
    return mentions_plane_angle(unit);
  } catch (...) {
    return false;
  }
}

/// "Π2 mixes ω (rad/s) with n (rpm): ω = 2π n, a factor 2π the dimensions cannot see", or
/// empty: for group `k`, two variables of one dimension with time in it, one with a unit of
/// plane angle and one without.
inline std::string hidden_two_pi_note(const analysis& a, std::size_t k, const std::string& label, text_form form) {
  const pi_group& g = a.groups[k];
  if (g.exponents.size() != a.variables.size()) return {};
  for (std::size_t i = 0; i < g.exponents.size(); ++i) {
    const variable& x = a.variables[i];
    if (g.exponents[i] == 0 || x.dim.exponents[2] == rational{0} || !unit_mentions_angle(x.unit)) continue;
    for (std::size_t j = 0; j < g.exponents.size(); ++j) {
      const variable& y = a.variables[j];
      if (j == i || g.exponents[j] == 0 || !(y.dim == x.dim) || unit_mentions_angle(y.unit)) continue;
      return label + " mixes " + display_name(x.name, form) + " (" + x.unit + ") with " + display_name(y.name, form) +
             " (" + y.unit + "): an angular velocity is " + (form == text_form::unicode ? "2π" : "2 pi") +
             " times a rotational frequency (ISO 80000-3), a factor the dimensions cannot see; convert one of "
             "them or read the group with that factor";
    }
  }
  return {};
}

}  // namespace nondim::detail
