#pragma once
// Definitions of svd_check.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <vector>

#include <Eigen/QR>
#include <Eigen/SVD>

#include "svd_check.hpp"

namespace nondim {

namespace detail {

/// Singular values of `m` (7 rows), descending. The square triangle R of a Householder QR
/// (of `m` when it has no more columns than rows, of its transpose otherwise) has the
/// singular values of `m`; a Jacobi SVD of that small square needs no QR preconditioner of
/// its own. This is the order of work JacobiSVD's preconditioner would do, with one QR
/// instantiation (shared with similarity planning) instead of the column-pivoting QR and
/// complete orthogonal decomposition the preconditioner instantiates for both shapes: the
/// SVD was most of the cost of compiling the analysis half.
template <class Matrix>
void singular_values_into(const Matrix& m, std::vector<double>& out) {
  using square = Eigen::Matrix<double, Eigen::Dynamic, Eigen::Dynamic, 0, base_dimension_count, base_dimension_count>;
  const bool wide = m.cols() > m.rows();
  const Eigen::HouseholderQR<Eigen::MatrixXd> qr(wide ? Eigen::MatrixXd(m.transpose()) : Eigen::MatrixXd(m));
  const Eigen::Index k = std::min(m.rows(), m.cols());
  const square r = qr.matrixQR().topLeftCorner(k, k).template triangularView<Eigen::Upper>();
  const auto s = Eigen::JacobiSVD<square, Eigen::NoQRPreconditioner>(r).singularValues();
  out.assign(s.data(), s.data() + s.size());
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE svd_check check_with_svd(const dimension_matrix& a, const std::vector<pi_group>& groups,
                                                std::size_t exact_rank) {
  constexpr std::size_t rows = base_dimension_count;
  const std::size_t cols = a.cols();
  // column-major with a fixed count of rows: the residual loops below have a constant trip count
  Eigen::Matrix<double, rows, Eigen::Dynamic> m(static_cast<Eigen::Index>(rows), static_cast<Eigen::Index>(cols));
  for (std::size_t j = 0; j < cols; ++j)
    for (std::size_t i = 0; i < rows; ++i) m.data()[j * rows + i] = a(i, j).to_double();

  svd_check out;
  if (cols > 0) {
    detail::singular_values_into(m, out.singular_values);
    const double largest = out.singular_values.empty() ? 0.0 : out.singular_values.front();
    out.tolerance = static_cast<double>(std::max(rows, cols)) * std::numeric_limits<double>::epsilon() * largest;
    for (const double v : out.singular_values)
      if (v > out.tolerance) ++out.rank;
  }
  out.agrees = out.rank == exact_rank;

  // |A v| / |v| per group: over the non-zero exponents only (a group in the classical form
  // has rank + 1 of them), a fixed-size column update each, without temporaries
  for (const auto& g : groups) {
    if (g.exponents.size() != cols) continue;
    double vv = 0.0;
    Eigen::Matrix<double, rows, 1> av = Eigen::Matrix<double, rows, 1>::Zero();
    for (std::size_t j = 0; j < cols; ++j) {
      const std::int64_t e = g.exponents[j];
      if (e == 0) continue;
      const double x = static_cast<double>(e);
      vv += x * x;
      av += m.col(static_cast<Eigen::Index>(j)) * x;
    }
    if (vv == 0.0) continue;
    out.max_residual = std::max(out.max_residual, std::sqrt(av.squaredNorm()) / std::sqrt(vv));
  }
  return out;
}

}  // namespace nondim
