#pragma once
/// \file options.hpp
/// \brief What `analyze()` may be told: the repeating variables, the dependent variable,
/// the basis of the groups, and the exact arithmetic to use.

#include <string>
#include <vector>

namespace nondim {

/// \brief The form of the groups.
enum class basis {
  classical,  ///< one non-repeating variable per group times powers of the repeating ones
  named,      ///< re-expressed in named groups (Reynolds, Prandtl...) where possible
};

/// \brief The exact arithmetic of the elimination.
enum class exact_arithmetic {
  automatic,      ///< checked int64 rationals; on overflow the whole elimination again in cpp_rational
  int64,          ///< checked int64 rationals only; an overflow is an `analysis_error`
  multiprecision  ///< boost::multiprecision::cpp_rational from the start
};

/// \brief Options of `analyze()`.
struct options {
  std::vector<std::string> repeating;  ///< empty: chosen automatically (DESIGN.md rule)
  std::string dependent;               ///< empty: the first variable
  basis form = basis::classical;       ///< named: re-expressed in catalog groups where possible
  exact_arithmetic arithmetic = exact_arithmetic::automatic;
  /// The flow configuration whose regime thresholds reports note (a key of
  /// `regime_configurations`: "pipe_flow"); empty: the usual ones for each number.
  std::string configuration;
};

}  // namespace nondim
