#pragma once
/// \file analysis.hpp
/// \brief The analysis layer: named variables, the exact dimensionless groups, their
/// evaluation and text forms, the SVD cross-check, reference scales (compile time and run
/// time, from references read as text), the catalog of characteristic numbers and the named basis. Needs
/// Boost.Multiprecision and Eigen.

#include "parse.hpp"
#include "quantity.hpp"
#include "solver.hpp"

#include "analysis/extraction/alternatives.hpp"
#include "analysis/extraction/analyze.hpp"
#include "analysis/extraction/error.hpp"
#include "analysis/extraction/matrix.hpp"
#include "analysis/extraction/null_space.hpp"
#include "analysis/extraction/options.hpp"
#include "analysis/extraction/pi_group.hpp"
#include "analysis/extraction/problem.hpp"
#include "analysis/extraction/repeating_rule.hpp"
#include "analysis/extraction/result.hpp"
#include "analysis/extraction/runtime_scales.hpp"
#include "analysis/extraction/svd_check.hpp"
#include "analysis/extraction/symbols.hpp"
#include "analysis/extraction/text.hpp"
#include "analysis/names/catalog.hpp"
#include "analysis/names/named_basis.hpp"
#include "analysis/names/quantity_kind.hpp"
#include "analysis/names/recognize.hpp"
