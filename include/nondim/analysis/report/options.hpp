#pragma once
/// \file options.hpp
/// \brief What a report may be told besides the analysis: a title, a note per variable and
/// the values of a design point.

#include <optional>
#include <string>
#include <vector>

#include "../data/design_point.hpp"
#include "../extraction/result.hpp"

namespace nondim {

/// \brief Extra text for the views of an analysis (all optional).
struct report_options {
  std::string title;               ///< a heading; empty for none
  std::vector<std::string> notes;  ///< aligned with the analysis' variables ("drag", "free-stream speed"); may be empty
  /// Values of the variables (SI): every group whose variables all have one is reported
  /// with its value, its standard uncertainty when they all have one too, and the regimes
  /// of the named numbers it is (regimes.hpp).
  design_point point{};
  /// The analyses with other repeating variables (`alternatives()`): listed after the
  /// groups when present (an empty list says that there are none).
  std::optional<std::vector<analysis>> alternatives{};
};

}  // namespace nondim
