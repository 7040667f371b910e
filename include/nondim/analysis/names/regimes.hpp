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
#include <string_view>
#include <vector>

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

/// \brief The regimes of one named number in one configuration, bands in ascending order
/// (the last reaches infinity).
struct regime_rule {
  std::string_view symbol;         ///< catalog symbol: "Re"
  std::string_view configuration;  ///< "flow in a circular pipe, Re on the inner diameter"
  std::array<regime_band, regime_max_bands> bands{};
  std::size_t band_count = 0;
  std::string_view source;
};

/// \brief Every regime rule, by catalog symbol. Sources as recalled, marked so.
inline constexpr std::array regime_table{
    regime_rule{
        "Re",
        "flow in a circular pipe, Re on the mean velocity and the inner diameter",
        {regime_band{2300, "laminar"}, regime_band{4000, "transitional"}, regime_band{regime_unbounded, "turbulent"}},
        3,
        "Cengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, section 8-2 (from memory)"},
    regime_rule{
        "Re",
        "boundary layer on a flat plate, Re on the distance from the leading edge",
        {regime_band{5e5, "laminar"}, regime_band{regime_unbounded, "turbulent (past the critical Reynolds number)"}},
        2,
        "Incropera et al., Fundamentals of Heat and Mass Transfer, section 6.3 (Re_x,c = 5e5, from memory)"},
    regime_rule{"Ma",
                "gas flow",
                {regime_band{0.3, "incompressible: density changes are small"},
                 regime_band{0.8, "subsonic: compressibility matters"}, regime_band{1.2, "transonic"},
                 regime_band{3.0, "supersonic"}, regime_band{regime_unbounded, "hypersonic"}},
                5,
                "White, Fluid Mechanics, section 9.1 (from memory)"},
    regime_rule{"Bi",
                "transient conduction in a solid, Bi on its volume over its surface area",
                {regime_band{0.1, "lumped capacitance holds: the solid is nearly isothermal"},
                 regime_band{regime_unbounded, "gradients inside the solid matter: lumped capacitance does not hold"}},
                2,
                "Incropera et al., Fundamentals of Heat and Mass Transfer, section 5.1 (from memory)"},
    regime_rule{"Ra",
                "natural convection on a vertical plate, Ra on the height",
                {regime_band{1e9, "laminar"}, regime_band{regime_unbounded, "turbulent"}},
                2,
                "Incropera et al., Fundamentals of Heat and Mass Transfer, section 9.6 (Ra_x,c = 1e9, from memory)"},
    regime_rule{"Fr",
                "open-channel flow, Fr on the flow depth",
                {regime_band{1.0, "subcritical (tranquil)"}, regime_band{regime_unbounded, "supercritical (rapid)"}},
                2,
                "Cengel & Cimbala, Fluid Mechanics: Fundamentals and Applications, chapter 13 (from memory)"},
    regime_rule{"Kn",
                "gas flow, Kn on the mean free path over the flow's length scale",
                {regime_band{0.01, "continuum"}, regime_band{0.1, "slip flow"}, regime_band{10, "transitional"},
                 regime_band{regime_unbounded, "free molecular"}},
                4,
                "Karniadakis, Beskok & Aluru, Microflows and Nanoflows, chapter 1 (from memory)"},
};

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
inline std::vector<regime_note> regime_notes(const std::vector<group_match>& matches, double value) {
  std::vector<regime_note> out;
  if (!std::isfinite(value)) return out;
  for (const group_match& m : matches) {
    if (m.ambiguous || !(m.power == rational{1} || m.power == rational{-1})) continue;
    if (m.power == rational{-1} && value == 0.0) continue;
    const double number = m.power == rational{1} ? value : 1.0 / value;
    const double magnitude = std::abs(number);
    for (const regime_rule& r : regime_table) {
      if (r.symbol != m.symbol) continue;
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
