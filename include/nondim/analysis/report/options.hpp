#pragma once
/// \file options.hpp
/// \brief What a report may be told besides the analysis: a title and a note per variable.

#include <string>
#include <vector>

namespace nondim {

/// \brief Extra text for the views of an analysis (all optional).
struct report_options {
  std::string title;               ///< a heading; empty for none
  std::vector<std::string> notes;  ///< aligned with the analysis' variables ("drag", "free-stream speed"); may be empty
};

}  // namespace nondim
