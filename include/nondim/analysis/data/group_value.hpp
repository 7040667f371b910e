#pragma once
/// \file group_value.hpp
/// \brief The value of each group at a design point and its standard uncertainty by the
/// law of propagation of uncertainty for uncorrelated inputs (GUM, JCGM 100:2008, 5.1.2).

#include <optional>
#include <span>
#include <vector>

#include "../config.hpp"
#include "../extraction/pi_group.hpp"
#include "../extraction/result.hpp"
#include "design_point.hpp"

namespace nondim {

/// \brief A group's value at a design point.
struct group_value {
  double value = 0.0;
  std::optional<double> uncertainty;  ///< combined standard uncertainty u_c (k = 1), when every input has one

  /// \brief u_c / |value|; empty without an uncertainty or for a value 0.
  [[nodiscard]] std::optional<double> relative_uncertainty() const {
    if (!uncertainty || value == 0.0) return std::nullopt;
    return *uncertainty / (value < 0 ? -value : value);
  }

  friend bool operator==(const group_value&, const group_value&) = default;
};

/// \brief Combined standard uncertainty of `y = prod x_i^p_i` for uncorrelated `x_i` with
/// standard uncertainties `u_i` (GUM eq. 10 with the sensitivity coefficients
/// `c_i = dy/dx_i = p_i x_i^(p_i - 1) prod_{j != i} x_j^p_j`):
///   u_c(y)^2 = sum_i (c_i u_i)^2,
/// which for `y != 0` is eq. 12, `(u_c/|y|)^2 = sum_i (p_i u_i / x_i)^2`. A first-order
/// result: where `y` is 0 or nearly so, GUM 5.1.2 (note) asks for higher-order terms.
/// \throws analysis_error when the spans differ in length.
double product_uncertainty(std::span<const double> x, std::span<const double> u, std::span<const double> p);

/// \brief The value of `g` at `point`, with its combined standard uncertainty when every
/// variable of the group has one; empty when a variable of the group has no value.
/// \throws analysis_error as `pi_group::value` (a NaN, an infinity, a division by 0).
std::optional<group_value> evaluate(const pi_group& g, const design_point& point);

/// \brief `evaluate` for every group of `a`, in order.
std::vector<std::optional<group_value>> group_values(const analysis& a, const design_point& point);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "group_value.ipp"
#endif
