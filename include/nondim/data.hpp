#pragma once
/// \file data.hpp
/// \brief The data layer: values of a problem's variables at a design point with their
/// standard uncertainties, the groups' values and uncertainties (GUM, JCGM 100:2008), their
/// rounding for reports, and the regimes of named numbers.

#include "analysis.hpp"

#include "analysis/data/design_point.hpp"
#include "analysis/data/fit.hpp"
#include "analysis/data/group_value.hpp"
#include "analysis/data/rounding.hpp"
#include "analysis/data/student_t.hpp"
#include "analysis/names/regimes.hpp"
