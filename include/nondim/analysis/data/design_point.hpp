#pragma once
/// \file design_point.hpp
/// \brief `design_point`: the values of a problem's variables at one operating point, in
/// coherent SI, each with its standard uncertainty when known (GUM, JCGM 100:2008, 2.3.1).

#include <cmath>
#include <cstddef>
#include <functional>
#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <utility>

#include "../../solver/core/detail/cat.hpp"
#include "../extraction/error.hpp"
#include "../extraction/problem.hpp"

namespace nondim {

/// \brief A value in coherent SI and its standard uncertainty (k = 1), when known.
struct measured_value {
  double value = 0.0;
  std::optional<double> uncertainty;  ///< standard uncertainty in coherent SI, >= 0

  friend bool operator==(const measured_value&, const measured_value&) = default;
};

namespace detail {

inline std::string number_for_message(double x) {
  if (std::isnan(x)) return "NaN";
  if (std::isinf(x)) return x > 0 ? "infinity" : "-infinity";
  return std::to_string(x);
}

/// Throws unless `m` is a finite value with a finite, non-negative uncertainty.
inline void check_measured(const std::string& name, const measured_value& m) {
  if (!std::isfinite(m.value))
    throw analysis_error(
        detail::cat("nondim: the value of '", name, "' must be a finite number, not ", number_for_message(m.value)),
        name);
  if (m.uncertainty && (!std::isfinite(*m.uncertainty) || *m.uncertainty < 0.0))
    throw analysis_error(detail::cat("nondim: the uncertainty of '", name, "' must be a finite number >= 0, not ",
                                     number_for_message(*m.uncertainty)),
                         name);
}

}  // namespace detail

/// \brief A value `x` and standard uncertainty `u` given in the unit of `v`, in coherent SI:
/// `factor * x + offset` and `factor * u`. An uncertainty is a width, not a position on
/// the scale, so an affine zero (degC, degF) does not move it: 0.5 degC is 0.5 K.
/// \throws analysis_error naming the variable when either is not finite or `u < 0`.
inline measured_value in_si(const variable& v, double x, std::optional<double> u = std::nullopt) {
  detail::check_measured(v.name, measured_value{x, u});
  measured_value m{v.factor * x + v.offset, std::nullopt};
  if (u) m.uncertainty = v.factor * *u;
  detail::check_measured(v.name, m);  // a huge factor can overflow
  return m;
}

/// \brief A value `x` in the unit of `v` with a relative standard uncertainty of `percent`
/// per cent of it (`u = |x| percent / 100`), in coherent SI.
/// \throws analysis_error naming the variable when `x` or `percent` is not finite, `percent`
///         is negative, or the unit is affine (a per cent of a Celsius or Fahrenheit
///         reading depends on where the scale puts its zero: give the uncertainty in the unit).
inline measured_value in_si_relative(const variable& v, double x, double percent) {
  if (v.offset != 0.0)
    throw analysis_error(
        detail::cat("nondim: the uncertainty of '", v.name, "' is given in per cent of a value in ", v.unit,
                    ", whose zero is not absolute; give it in the unit instead (0.5 for 0.5 ", v.unit, ")"),
        v.name);
  if (!std::isfinite(percent) || percent < 0.0)
    throw analysis_error(detail::cat("nondim: the uncertainty of '", v.name, "' must be a finite per cent >= 0, not ",
                                     detail::number_for_message(percent)),
                         v.name);
  return in_si(v, x, std::abs(x) * percent / 100.0);
}

/// \brief The values of some of a problem's variables, by name, in coherent SI.
///
/// A group whose variables all have a value here has a value (`evaluate`, `group_values`);
/// it has an uncertainty when they all have one too.
class design_point {
 public:
  design_point() = default;

  /// \brief Sets the value of `name` (coherent SI); a value set before is replaced.
  /// \throws analysis_error when the name is empty, the value is not finite, or the
  ///         uncertainty is not finite or negative.
  design_point& set(std::string name, measured_value m) {
    if (name.empty()) throw analysis_error("nondim: a value of a design point needs the name of its variable");
    detail::check_measured(name, m);
    values_.insert_or_assign(std::move(name), m);
    return *this;
  }

  /// \brief Sets the value of the variable `name` of `p` from a value and standard
  /// uncertainty in that variable's own unit (see `in_si`).
  /// \throws analysis_error when `p` has no variable `name`, or as `in_si`.
  design_point& set(const problem& p, std::string_view name, double x, std::optional<double> u = std::nullopt) {
    const variable& v = variable_of(p, name);
    return set(v.name, in_si(v, x, u));
  }

  /// \brief As `set(p, name, x)` with a relative standard uncertainty in per cent of `x`.
  /// \throws analysis_error as `in_si_relative`, or when `p` has no variable `name`.
  design_point& set_relative(const problem& p, std::string_view name, double x, double percent) {
    const variable& v = variable_of(p, name);
    return set(v.name, in_si_relative(v, x, percent));
  }

  /// \brief The value of `name`, or null.
  [[nodiscard]] const measured_value* find(std::string_view name) const {
    const auto it = values_.find(name);
    return it == values_.end() ? nullptr : &it->second;
  }
  [[nodiscard]] bool empty() const noexcept { return values_.empty(); }
  [[nodiscard]] std::size_t size() const noexcept { return values_.size(); }
  /// \brief Every value, by name.
  [[nodiscard]] const std::map<std::string, measured_value, std::less<>>& values() const noexcept { return values_; }

 private:
  static const variable& variable_of(const problem& p, std::string_view name) {
    const auto i = p.index_of(name);
    if (!i)
      throw analysis_error(
          detail::cat("nondim: a value is given for '", name, "', which is not a variable of the problem"),
          std::string(name));
    return p[*i];
  }

  std::map<std::string, measured_value, std::less<>> values_;
};

}  // namespace nondim
