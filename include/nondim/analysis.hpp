#pragma once
/// \file analysis.hpp
/// \brief The analysis layer: named variables, the exact dimensionless groups, their
/// evaluation and text forms, the SVD cross-check. Needs Boost.Multiprecision and Eigen.

#include "parse.hpp"
#include "quantity.hpp"

#include "analysis/analyze.hpp"
#include "analysis/compile_time.hpp"
#include "analysis/error.hpp"
#include "analysis/matrix.hpp"
#include "analysis/null_space.hpp"
#include "analysis/options.hpp"
#include "analysis/pi_group.hpp"
#include "analysis/problem.hpp"
#include "analysis/result.hpp"
#include "analysis/svd_check.hpp"
#include "analysis/symbols.hpp"
#include "analysis/text.hpp"
