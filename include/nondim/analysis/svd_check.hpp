#pragma once
/// \file svd_check.hpp
/// \brief A floating-point cross-check of the exact analysis: Eigen's SVD of the dimension
/// matrix in double. Only here does the analysis layer use Eigen.

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <vector>

#include <Eigen/SVD>

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
inline svd_check check_with_svd(const dimension_matrix& a, const std::vector<pi_group>& groups,
                                std::size_t exact_rank) {
  const auto rows = static_cast<Eigen::Index>(dimension_matrix::rows());
  const auto cols = static_cast<Eigen::Index>(a.cols());
  Eigen::MatrixXd m(rows, cols);
  for (Eigen::Index j = 0; j < cols; ++j)
    for (Eigen::Index i = 0; i < rows; ++i)
      m(i, j) = a(static_cast<std::size_t>(i), static_cast<std::size_t>(j)).to_double();

  svd_check out;
  if (cols > 0) {
    const Eigen::JacobiSVD<Eigen::MatrixXd> svd(m);  // singular values only
    const Eigen::VectorXd& s = svd.singularValues();
    out.singular_values.assign(s.data(), s.data() + s.size());
    const double largest = s.size() > 0 ? s(0) : 0.0;
    out.tolerance = static_cast<double>(std::max(rows, cols)) * std::numeric_limits<double>::epsilon() * largest;
    for (const double v : out.singular_values)
      if (v > out.tolerance) ++out.rank;
  }
  out.agrees = out.rank == exact_rank;

  // |A v| / |v| per group: plain loops over the non-zero exponents (a group in the classical
  // form has rank + 1 of them), column by column, without temporaries
  for (const auto& g : groups) {
    if (static_cast<Eigen::Index>(g.exponents.size()) != cols) continue;
    double vv = 0.0;
    double av[base_dimension_count] = {};
    for (Eigen::Index j = 0; j < cols; ++j) {
      const std::int64_t e = g.exponents[static_cast<std::size_t>(j)];
      if (e == 0) continue;
      const double x = static_cast<double>(e);
      vv += x * x;
      for (Eigen::Index i = 0; i < rows; ++i) av[i] += m(i, j) * x;
    }
    if (vv == 0.0) continue;
    double aa = 0.0;
    for (const double y : av) aa += y * y;
    out.max_residual = std::max(out.max_residual, std::sqrt(aa) / std::sqrt(vv));
  }
  return out;
}

}  // namespace nondim
