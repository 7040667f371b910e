#pragma once
/// \file report.hpp
/// \brief `to_text(similarity_plan)`: the plan as a report for people — variables, groups,
/// the scale-up rule and the cautions.

#include <algorithm>
#include <cstddef>
#include <optional>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../config.hpp"
#include "detail/text.hpp"
#include "plan.hpp"

namespace nondim {

/// \brief The plan as plain text (UTF-8 only where names or units have it): a status line,
/// a table of variables (prototype, model, model/prototype, in each variable's unit), a
/// table of groups (prototype, model, model/prototype, matched), the scale-up rule for the
/// dependent variable, notes, and the cautions of similarity testing.
std::string to_text(const similarity_plan& plan);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "report.ipp"
#endif
