#pragma once
/// \file analysis.hpp
/// \brief The analysis layer: named variables, the exact dimensionless groups, their
/// evaluation and text forms, the SVD cross-check, reference scales (compile time and run
/// time), the catalog of characteristic numbers and the named basis. Needs Boost.Multiprecision and Eigen.

#include "parse.hpp"
#include "quantity.hpp"

#include "analysis/analyze.hpp"
#include "analysis/catalog.hpp"
#include "analysis/compile_time.hpp"
#include "analysis/error.hpp"
#include "analysis/matrix.hpp"
#include "analysis/named_basis.hpp"
#include "analysis/naming.hpp"
#include "analysis/null_space.hpp"
#include "analysis/options.hpp"
#include "analysis/pi_group.hpp"
#include "analysis/problem.hpp"
#include "analysis/quantity_kind.hpp"
#include "analysis/recognize.hpp"
#include "analysis/result.hpp"
#include "analysis/runtime_scales.hpp"
#include "analysis/svd_check.hpp"
#include "analysis/symbols.hpp"
#include "analysis/text.hpp"
