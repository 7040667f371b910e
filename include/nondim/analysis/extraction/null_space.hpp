#pragma once
/// \file null_space.hpp
/// \brief The exact rank and null space of a dimension matrix alone (no names, no choice
/// of repeating variables): the elimination that `analyze()` is built on.

#include <cstddef>
#include <cstdint>
#include <span>
#include <string>
#include <vector>

#include "../config.hpp"
#include "error.hpp"
#include "matrix.hpp"
#include "options.hpp"

namespace nondim {

/// \brief Exact rank and a basis of the null space of a dimension matrix.
struct null_space_basis {
  std::size_t rank = 0;
  std::vector<std::size_t> pivots;                 ///< pivot columns of the reduced row echelon form
  std::vector<std::vector<std::int64_t>> vectors;  ///< one per non-pivot column, left to right
  bool multiprecision = false;                     ///< cpp_rational gave the result

  friend bool operator==(const null_space_basis&, const null_space_basis&) = default;
};

/// \brief The rank of `a` and the basis of its null space read off the reduced row echelon
/// form: for non-pivot column f, x_f > 0, x at the pivots, zero elsewhere, scaled to
/// primitive integers. Exact: checked int64 first, cpp_rational on overflow (as `arithmetic`
/// says).
/// \throws analysis_error when a basis vector does not fit in int64, or when
///         `exact_arithmetic::int64` was asked for and the elimination overflows.
null_space_basis exact_null_space(const dimension_matrix& a, exact_arithmetic arithmetic = exact_arithmetic::automatic);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "null_space.ipp"
#endif
