#pragma once
/// \file regimes.hpp
/// \brief Flow and heat-transfer regimes that common practice reads off the value of a
/// named number (laminar or turbulent pipe flow, compressibility above Mach 0.3, a lumped
/// model below Biot 0.1...), each with the configuration its thresholds belong to and its
/// source. A regime is a remark for the engineer, never a verdict: thresholds are
/// conventions of a configuration, and transition depends on more than one number.

#include <array>
#include <cmath>
#include <cstddef>
#include <limits>
#include <string>
#include <string_view>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../extraction/error.hpp"
#include "recognize.hpp"

namespace nondim {

/// \brief One band of a regime rule: the values from the previous band's `upper` up to
/// (not including) `upper`.
struct regime_band {
  double upper = std::numeric_limits<double>::infinity();
  std::string_view name;  ///< "laminar"
};

inline constexpr std::size_t regime_max_bands = 5;
/// The `upper` of the last band of a rule.
inline constexpr double regime_unbounded = std::numeric_limits<double>::infinity();

/// \brief A flow configuration that regime thresholds belong to, by the key a problem names
/// it with (`configuration = "pipe_flow"`).
struct regime_configuration {
  std::string_view key;          ///< "pipe_flow"
  std::string_view description;  ///< "flow in a circular pipe"
};

/// \brief The configurations a problem may name, in the order messages list them.
inline constexpr std::array regime_configurations{
    regime_configuration{"pipe_flow", "flow in a circular pipe"},
    regime_configuration{"flat_plate", "boundary layer on a flat plate"},
    regime_configuration{"cylinder_crossflow", "circular cylinder in crossflow"},
    regime_configuration{"sphere", "flow past a sphere"},
    regime_configuration{"vertical_plate", "natural convection on a vertical plate"},
    regime_configuration{"open_channel", "open-channel flow"},
};

/// \brief Whether `key` is one of `regime_configurations`.
[[nodiscard]] constexpr bool is_regime_configuration(std::string_view key) noexcept {
  for (const auto& c : regime_configurations)
    if (c.key == key) return true;
  return false;
}

/// \brief "pipe_flow, flat_plate, ...": the accepted keys, for messages.
[[nodiscard]] inline std::string regime_configuration_list() {
  std::string s;
  for (const auto& c : regime_configurations) {
    if (!s.empty()) s += ", ";
    s += c.key;
  }
  return s;
}

/// \brief When a rule is noted.
enum class regime_scope {
  any,       ///< holds in every configuration (a gas's compressibility, a solid's Biot number)
  default_,  ///< noted when no configuration is chosen, or when its own is
  chosen     ///< noted only when its configuration is chosen (too many to list for every Re)
};

/// \brief The regimes of one named number in one configuration, bands in ascending order
/// (the last reaches infinity).
struct regime_rule {
  std::string_view symbol;  ///< catalog symbol: "Re"
  std::string_view key;     ///< a `regime_configurations` key; empty for `regime_scope::any`
  regime_scope scope = regime_scope::default_;
  std::string_view configuration;  ///< "flow in a circular pipe, Re on the inner diameter"
  std::array<regime_band, regime_max_bands> bands{};
  std::size_t band_count = 0;
  std::string_view source;
};

/// \brief Every regime rule, by catalog symbol. Sources as recalled, marked so.
inline constexpr std::array regime_table{
    regime_rule{
        "Re",
        "pipe_flow",
        regime_scope::default_,
        "flow in a circular pipe, Re on the mean velocity and the inner diameter",
        {regime_band{2300, "laminar"}, regime_band{4000, "transitional"}, regime_band{regime_unbounded, "turbulent"}},
        3,
        "Cengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, section 8-2 (from memory)"},
    regime_rule{
        "Re",
        "flat_plate",
        regime_scope::default_,
        "boundary layer on a flat plate, Re on the distance from the leading edge",
        {regime_band{5e5, "laminar"}, regime_band{regime_unbounded, "turbulent (past the critical Reynolds number)"}},
        2,
        "Incropera et al., Fundamentals of Heat and Mass Transfer, section 6.3 (Re_x,c = 5e5, from memory)"},
    regime_rule{
        "Re",
        "cylinder_crossflow",
        regime_scope::chosen,
        "circular cylinder in crossflow, Re on the free-stream velocity and the diameter",
        {regime_band{5, "attached (creeping) flow"}, regime_band{40, "steady separated flow: a fixed vortex pair"},
         regime_band{2e5, "vortex shedding with a laminar boundary layer (subcritical)"},
         regime_band{regime_unbounded, "boundary-layer transition and the drag crisis (critical and beyond)"}},
        4,
        "Incropera et al., Fundamentals of Heat and Mass Transfer, section 7.4 (transition near Re_D = 2e5); "
        "White, Fluid Mechanics, section 7.6 (from memory)"},
    regime_rule{"Re",
                "sphere",
                regime_scope::chosen,
                "flow past a sphere, Re on the free-stream velocity and the diameter",
                {regime_band{1, "creeping (Stokes) flow: drag coefficient 24/Re"}, regime_band{1e3, "intermediate"},
                 regime_band{2e5, "Newton's regime: drag coefficient nearly constant, about 0.4-0.5"},
                 regime_band{regime_unbounded, "boundary-layer transition and the drag crisis (critical and beyond)"}},
                4,
                "White, Fluid Mechanics, section 7.6 (drag of a sphere, from memory)"},
    regime_rule{"Ma",
                "",
                regime_scope::any,
                "gas flow",
                {regime_band{0.3, "incompressible: density changes are small"},
                 regime_band{0.8, "subsonic: compressibility matters"}, regime_band{1.2, "transonic"},
                 regime_band{3.0, "supersonic"}, regime_band{regime_unbounded, "hypersonic"}},
                5,
                "White, Fluid Mechanics, section 9.1 (from memory)"},
    regime_rule{"Bi",
                "",
                regime_scope::any,
                "transient conduction in a solid, Bi on its volume over its surface area",
                {regime_band{0.1, "lumped capacitance holds: the solid is nearly isothermal"},
                 regime_band{regime_unbounded, "gradients inside the solid matter: lumped capacitance does not hold"}},
                2,
                "Incropera et al., Fundamentals of Heat and Mass Transfer, section 5.1 (from memory)"},
    regime_rule{"Ra",
                "vertical_plate",
                regime_scope::default_,
                "natural convection on a vertical plate, Ra on the height",
                {regime_band{1e9, "laminar"}, regime_band{regime_unbounded, "turbulent"}},
                2,
                "Incropera et al., Fundamentals of Heat and Mass Transfer, section 9.6 (Ra_x,c = 1e9, from memory)"},
    regime_rule{"Fr",
                "open_channel",
                regime_scope::default_,
                "open-channel flow, Fr on the flow depth",
                {regime_band{1.0, "subcritical (tranquil)"}, regime_band{regime_unbounded, "supercritical (rapid)"}},
                2,
                "Cengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, chapter 13 (from memory)"},
    regime_rule{"Kn",
                "",
                regime_scope::any,
                "gas flow, Kn on the mean free path over the flow's length scale",
                {regime_band{0.01, "continuum"}, regime_band{0.1, "slip flow"}, regime_band{10, "transitional"},
                 regime_band{regime_unbounded, "free molecular"}},
                4,
                "Karniadakis, Beskok & Aluru, Microflows and Nanoflows, chapter 1 (from memory)"},
};

/// \brief Whether `rule` is noted for a problem in `configuration` (empty: none chosen).
[[nodiscard]] constexpr bool regime_applies(const regime_rule& rule, std::string_view configuration) noexcept {
  switch (rule.scope) {
    case regime_scope::any:
      return true;
    case regime_scope::default_:
      return configuration.empty() || rule.key == configuration;
    case regime_scope::chosen:
      return rule.key == configuration;
  }
  return false;
}

/// \brief The regime a named number's value falls in, under one rule.
struct regime_note {
  std::string_view symbol;
  double number = 0.0;  ///< the named number's value (the group's value raised to 1/power)
  std::string_view regime;
  double lower = 0.0;  ///< the band: lower <= |number| < upper
  double upper = std::numeric_limits<double>::infinity();
  std::string_view configuration;
  std::string_view source;
};

/// \brief The regimes of a group whose value is `value`, for each of its catalog
/// `matches` that is the named number itself or its reciprocal (power 1 or -1) and not
/// ambiguous; a group that is a square or a root of a number gets none (it is not that
/// number's standard form). Bands are read on the magnitude (a flow reversed is the same flow).
/// With a `configuration` (a `regime_configurations` key) only its rules and those that hold
/// in any configuration are noted; without one, every rule of `regime_scope::default_` too.
/// \throws analysis_error when `configuration` is neither empty nor a known key.
inline std::vector<regime_note> regime_notes(const std::vector<group_match>& matches, double value,
                                             std::string_view configuration = {}) {
  if (!configuration.empty() && !is_regime_configuration(configuration))
    throw analysis_error(
        detail::cat("nondim: '", std::string(configuration),
                    "' is not a configuration of the regime table (accepted: ", regime_configuration_list(), ")"));
  std::vector<regime_note> out;
  if (!std::isfinite(value)) return out;
  for (const group_match& m : matches) {
    if (m.ambiguous || !(m.power == rational{1} || m.power == rational{-1})) continue;
    if (m.power == rational{-1} && value == 0.0) continue;
    const double number = m.power == rational{1} ? value : 1.0 / value;
    const double magnitude = std::abs(number);
    for (const regime_rule& r : regime_table) {
      if (r.symbol != m.symbol || !regime_applies(r, configuration)) continue;
      double lower = 0.0;
      for (std::size_t b = 0; b < r.band_count; ++b) {
        if (magnitude < r.bands[b].upper || b + 1 == r.band_count) {
          out.push_back(
              regime_note{m.symbol, number, r.bands[b].name, lower, r.bands[b].upper, r.configuration, r.source});
          break;
        }
        lower = r.bands[b].upper;
      }
    }
  }
  return out;
}

}  // namespace nondim
