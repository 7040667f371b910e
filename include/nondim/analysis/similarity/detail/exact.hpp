#pragma once
/// \file exact.hpp
/// \brief Exact reduced row echelon form of small integer matrices (arbitrary-precision
/// rationals): the rank decisions of a similarity plan are exact; Eigen only solves.

#include <boost/multiprecision/cpp_int.hpp>
#include <cstddef>
#include <cstdint>
#include <utility>
#include <vector>

namespace nondim::detail {

using exact_q = boost::multiprecision::cpp_rational;

/// Reduced row echelon form: `rows[i]` has 1 at `pivots[i]` and 0 in every other pivot column.
struct similarity_echelon {
  std::size_t cols = 0;
  std::vector<std::size_t> pivots;  ///< increasing
  std::vector<std::vector<exact_q>> rows;

  [[nodiscard]] std::size_t rank() const noexcept { return pivots.size(); }
  [[nodiscard]] bool is_pivot(std::size_t c) const noexcept {
    for (auto p : pivots)
      if (p == c) return true;
    return false;
  }
};

/// \brief RREF of `m` (each row `cols` long).
inline similarity_echelon similarity_reduce(const std::vector<std::vector<std::int64_t>>& m, std::size_t cols) {
  std::vector<std::vector<exact_q>> a;
  a.reserve(m.size());
  for (const auto& row : m) {
    std::vector<exact_q> r;
    r.reserve(cols);
    for (std::size_t c = 0; c < cols; ++c) r.emplace_back(c < row.size() ? row[c] : 0);
    a.push_back(std::move(r));
  }
  similarity_echelon e;
  e.cols = cols;
  std::size_t next = 0;  // first row not yet holding a pivot
  for (std::size_t c = 0; c < cols && next < a.size(); ++c) {
    std::size_t p = next;
    while (p < a.size() && a[p][c] == 0) ++p;
    if (p == a.size()) continue;
    std::swap(a[p], a[next]);
    const exact_q lead = a[next][c];
    for (auto& x : a[next]) x /= lead;
    for (std::size_t r = 0; r < a.size(); ++r) {
      if (r == next || a[r][c] == 0) continue;
      const exact_q f = a[r][c];
      for (std::size_t k = 0; k < cols; ++k) a[r][k] -= f * a[next][k];
    }
    e.pivots.push_back(c);
    ++next;
  }
  a.resize(next);
  e.rows = std::move(a);
  return e;
}

/// \brief A basis of the null space: one vector per non-pivot column q, with 1 at q.
inline std::vector<std::vector<exact_q>> null_basis(const similarity_echelon& e) {
  std::vector<std::vector<exact_q>> basis;
  for (std::size_t q = 0; q < e.cols; ++q) {
    if (e.is_pivot(q)) continue;
    std::vector<exact_q> v(e.cols, exact_q(0));
    v[q] = 1;
    for (std::size_t i = 0; i < e.rank(); ++i) v[e.pivots[i]] = -e.rows[i][q];
    basis.push_back(std::move(v));
  }
  return basis;
}

/// \brief Whether each unknown is fixed by the rows: true when every null vector is 0
/// there (a pivot whose reduced row is 0 in every non-pivot column).
inline std::vector<bool> determined_columns(const similarity_echelon& e) {
  std::vector<bool> d(e.cols, false);
  for (std::size_t i = 0; i < e.rank(); ++i) {
    bool alone = true;
    for (std::size_t q = 0; q < e.cols && alone; ++q)
      if (!e.is_pivot(q) && e.rows[i][q] != 0) alone = false;
    d[e.pivots[i]] = alone;
  }
  return d;
}

}  // namespace nondim::detail
