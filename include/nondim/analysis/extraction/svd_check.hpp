#pragma once
/// \file svd_check.hpp
/// \brief A floating-point cross-check of the exact analysis: Eigen's SVD of the dimension
/// matrix in double. Only its definition (svd_check.ipp)
/// uses Eigen.

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <vector>

#include "../config.hpp"
#include "matrix.hpp"
#include "pi_group.hpp"

namespace nondim {

/// \brief What the SVD of the dimension matrix (in double) says about the exact result.
///
/// A disagreement is data, not an error: it flags a matrix so ill-conditioned that a
/// floating-point null space would have given another count of groups.
struct svd_check {
  std::size_t rank = 0;                 ///< numerical rank: singular values above `tolerance`
  bool agrees = true;                   ///< `rank` equals the exact rank
  std::vector<double> singular_values;  ///< descending, min(7, n) of them
  double max_residual = 0.0;            ///< max over the groups of |A v|₂ / |v|₂
  double tolerance = 0.0;               ///< max(7, n) · ε · σ_max

  friend bool operator==(const svd_check&, const svd_check&) = default;
};

/// \brief The SVD cross-check of `groups` (exponent vectors over the columns of `a`),
/// whose exact rank is `exact_rank`.
///
/// Numerical rank: the count of singular values above max(rows, cols) · ε · σ_max, with ε
/// the double machine epsilon (the threshold LAPACK-based tools use by default, and the
/// one Eigen's rank-revealing decompositions document). Residual of a group v: the
/// Euclidean norm of A·v divided by that of v, computed in double; exact groups give 0 up
/// to the rounding of non-dyadic fractional exponents.
svd_check check_with_svd(const dimension_matrix& a, const std::vector<pi_group>& groups, std::size_t exact_rank);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "svd_check.ipp"
#endif
