#pragma once
/// \file matrix.hpp
/// \brief The dimension matrix of a problem: one row per base dimension (L M T I Θ N J),
/// one column per variable, exact rational entries.

#include <cstddef>
#include <utility>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "../../solver/core/rational.hpp"

namespace nondim {

/// \brief A 7 x n matrix of rational exponents: column j is the dimension of variable j,
/// row i the exponent of base dimension i (ISO 80000-1 order L M T I Θ N J).
class dimension_matrix {
 public:
  dimension_matrix() = default;
  explicit dimension_matrix(std::vector<dimension> columns) : columns_(std::move(columns)) {}

  [[nodiscard]] static constexpr std::size_t rows() noexcept { return base_dimension_count; }
  [[nodiscard]] std::size_t cols() const noexcept { return columns_.size(); }

  /// \brief The exponent of base dimension `row` in variable `col`.
  /// \throws std::out_of_range when either index is out of range.
  [[nodiscard]] rational operator()(std::size_t row, std::size_t col) const { return columns_.at(col)[row]; }
  /// \brief Column `col`: the dimension of variable `col`.
  /// \throws std::out_of_range when `col >= cols()`.
  [[nodiscard]] const dimension& column(std::size_t col) const { return columns_.at(col); }
  [[nodiscard]] const std::vector<dimension>& columns() const noexcept { return columns_; }

  /// \brief The base dimensions (row indices) with a non-zero entry in some column.
  [[nodiscard]] std::vector<std::size_t> present_rows() const {
    std::vector<std::size_t> rows;
    for (std::size_t i = 0; i < base_dimension_count; ++i) {
      for (const auto& d : columns_) {
        if (!d[i].is_zero()) {
          rows.push_back(i);
          break;
        }
      }
    }
    return rows;
  }

  friend bool operator==(const dimension_matrix&, const dimension_matrix&) = default;

 private:
  std::vector<dimension> columns_;
};

}  // namespace nondim
