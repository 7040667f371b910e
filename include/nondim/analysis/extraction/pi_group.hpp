#pragma once
/// \file pi_group.hpp
/// \brief `pi_group`: one dimensionless group, a product of powers of the variables with
/// integer exponents; its text forms and its value from SI values.

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <memory>
#include <span>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/format.hpp"
#include "../../solver/core/rational.hpp"
#include "../names/recognize.hpp"
#include "error.hpp"
#include "symbols.hpp"

namespace nondim {

namespace detail {

/// x^e for e >= 0 by repeated squaring (exact for the small powers of groups).
inline double integer_power(double x, std::uint64_t e) noexcept {
  double r = 1.0;
  while (e != 0) {
    if ((e & 1U) != 0) r *= x;
    e >>= 1U;
    if (e != 0) x *= x;
  }
  return r;
}

inline std::uint64_t magnitude(std::int64_t e) noexcept {
  return e < 0 ? 0 - static_cast<std::uint64_t>(e) : static_cast<std::uint64_t>(e);
}

/// One factor x^e applied to r: a multiplication for e > 0, a division for e < 0, so that
/// the scalar and field forms of evaluation round identically.
inline double apply_factor(double r, double x, std::int64_t e) noexcept {
  return e > 0 ? r * integer_power(x, magnitude(e)) : r / integer_power(x, magnitude(e));
}

}  // namespace detail

/// \brief A dimensionless group: the product over the problem's variables of
/// `variable^exponent`.
///
/// In the classical basis it holds exactly one non-repeating variable (`non_repeating`), with a
/// positive exponent, times powers of the repeating variables; the exponents are integers
/// with gcd 1.
struct pi_group {
  std::vector<std::int64_t> exponents;  ///< aligned with the problem's variables
  std::size_t non_repeating = 0;        ///< index of the group's non-repeating variable (written first)
  /// Catalog entries the group matches, best first (see recognize.hpp); filled by analyze()
  /// in both bases. Matches that a variable's conventional name contradicts are left out
  /// (`L/D` is no Knudsen number when `L` is a length); `recognize()` lists them all.
  std::vector<group_match> matches;

  pi_group() = default;
  /// `names`: the problem's variable names, aligned with `exponents`; the groups of one
  /// analysis share one list (a copy per group was most of the cost of building the result).
  pi_group(std::vector<std::int64_t> exponents_, std::shared_ptr<const std::vector<std::string>> names,
           std::size_t non_repeating_)
      : exponents(std::move(exponents_)), non_repeating(non_repeating_), names_(std::move(names)) {}

  /// \brief The problem's variable names, aligned with `exponents`.
  [[nodiscard]] const std::vector<std::string>& variables() const noexcept {
    static const std::vector<std::string> none;
    return names_ ? *names_ : none;
  }

  /// \brief The exponent of `variable`; 0 where absent (not in the group, or not in the problem).
  [[nodiscard]] rational exponent(std::string_view variable) const {
    for (std::size_t i = 0; i < variables().size() && i < exponents.size(); ++i)
      if (variables()[i] == variable) return rational{exponents[i]};
    return rational{0};
  }

  /// \brief The group as text: Unicode `F·ρ⁻¹·U⁻²·D⁻²` or ASCII `F*rho^-1*U^-2*D^-2`.
  ///
  /// The non-repeating variable comes first, then the others in the problem's order.
  [[nodiscard]] std::string text(text_form form = text_form::unicode) const {
    std::string s;
    const auto put = [&](std::size_t i) {
      if (exponents[i] == 0) return;
      if (!s.empty()) s += form == text_form::unicode ? "\u00b7" : "*";
      s += display_name(variables()[i], form);
      s += detail::exponent_suffix(rational{exponents[i]}, form);
    };
    if (non_repeating < exponents.size()) put(non_repeating);
    for (std::size_t i = 0; i < exponents.size(); ++i)
      if (i != non_repeating) put(i);
    return s.empty() ? "1" : s;
  }

  /// \brief The value of the group from the SI values of all the variables, in order.
  /// \throws analysis_error when `si_values` does not have one value per variable; when a
  ///         value the group needs is NaN or infinite, or is 0 where the group divides by
  ///         it (naming the variable); when the value overflows a double.
  [[nodiscard]] double value(std::span<const double> si_values) const {
    if (si_values.size() != exponents.size())
      throw analysis_error(detail::cat("nondim: ", std::to_string(si_values.size()), " values given for a group of ",
                                       std::to_string(exponents.size()), " variables"));
    double r = 1.0;
    for (std::size_t i = 0; i < exponents.size(); ++i)
      if (exponents[i] != 0) r = detail::apply_factor(r, si_values[i], exponents[i]);
    check_result(r, [&](std::size_t i) { return si_values[i]; });
    return r;
  }

  /// \brief The value of the group from SI values by name (any map from names to doubles,
  /// e.g. `std::map<std::string, double>`); only the variables in the group are needed.
  /// \throws analysis_error naming the first variable of the group without a value, or
  ///         one whose value is NaN, infinite, or 0 where the group divides by it; when
  ///         the value overflows a double.
  template <class Map>
  requires requires(const Map& m, const std::string& k) {
    m.find(k) != m.end();
    static_cast<double>(m.find(k)->second);
  }
  [[nodiscard]] double value(const Map& si_values) const {
    double r = 1.0;
    for (std::size_t i = 0; i < exponents.size(); ++i) {
      if (exponents[i] == 0) continue;
      const auto it = si_values.find(variables()[i]);
      if (it == si_values.end())
        throw analysis_error(
            detail::cat("nondim: no value for variable '", variables()[i], "' of the group ", text(text_form::ascii)),
            variables()[i]);
      r = detail::apply_factor(r, static_cast<double>(it->second), exponents[i]);
    }
    check_result(r, [&](std::size_t i) { return static_cast<double>(si_values.find(variables()[i])->second); });
    return r;
  }

  /// \brief The group over a whole field: `out[c]` is its value in cell `c`.
  ///
  /// `columns` holds one column of SI cell values per variable, in the problem's order;
  /// the columns of variables not in the group are not read and may be empty. No memory is
  /// allocated; `out` may be one of the columns (each cell is read before it is written).
  /// The result in each cell is bit-for-bit that of `value()`.
  /// \throws analysis_error when the number of columns is not the number of variables, or a
  ///         column the group needs does not have `out.size()` cells (naming its variable);
  ///         as `value()` for a bad value, naming the variable and the cell (cells before it
  ///         are written).
  void evaluate(std::span<const std::span<const double>> columns, std::span<double> out) const {
    if (columns.size() != exponents.size())
      throw analysis_error(detail::cat("nondim: ", std::to_string(columns.size()), " columns given for a group of ",
                                       std::to_string(exponents.size()), " variables"));
    for (std::size_t i = 0; i < exponents.size(); ++i)
      if (exponents[i] != 0 && columns[i].size() != out.size())
        throw analysis_error(
            detail::cat("nondim: the column of variable '", variables()[i], "' has ", std::to_string(columns[i].size()),
                        " cells, the output ", std::to_string(out.size())),
            variables()[i]);
    for (std::size_t c = 0; c < out.size(); ++c) {
      double r = 1.0;
      for (std::size_t i = 0; i < exponents.size(); ++i)
        if (exponents[i] != 0) r = detail::apply_factor(r, columns[i][c], exponents[i]);
      if (!std::isfinite(r) || r == 0.0)
        check_result(
            r, [&](std::size_t i) { return columns[i][c]; }, c);
      out[c] = r;
    }
  }

  /// Equal groups: the same exponents over the same names, written the same way, with the same matches.
  friend bool operator==(const pi_group& a, const pi_group& b) {
    return a.exponents == b.exponents && a.non_repeating == b.non_repeating && a.matches == b.matches &&
           (a.names_ == b.names_ || a.variables() == b.variables());
  }

 private:
  std::shared_ptr<const std::vector<std::string>> names_;

  /// Throws when `r`, the group's value from the values `x(i)`, comes from a value that is
  /// no number (NaN, infinite, or 0 raised to a negative power), or overflows a double.
  /// Infinite values can give 0 (1/inf), so a zero result is examined too; a zero from a
  /// value 0 raised to a positive power (or an underflow) is a result.
  /// `cell`: the cell of a field, for the message (none for a single value).
  template <class Value>
  void check_result(double r, Value x, std::size_t cell = static_cast<std::size_t>(-1)) const {
    if (std::isfinite(r) && r != 0.0) return;
    const std::string where =
        cell == static_cast<std::size_t>(-1) ? std::string() : detail::cat(" in cell ", std::to_string(cell));
    for (std::size_t i = 0; i < exponents.size(); ++i) {
      if (exponents[i] == 0) continue;
      const double v = x(i);
      const char* what = std::isnan(v)                  ? " is NaN"
                         : std::isinf(v)                ? " is infinite"
                         : v == 0.0 && exponents[i] < 0 ? " is 0, and the group divides by it"
                                                        : nullptr;
      if (what != nullptr)
        throw analysis_error(detail::cat("nondim: the value of '", variables()[i], "'", where, what, " (group ",
                                         text(text_form::ascii), ")"),
                             variables()[i]);
    }
    if (!std::isfinite(r))
      throw analysis_error(detail::cat("nondim: the value of the group ", text(text_form::ascii), where,
                                       " overflows a double (", std::to_string(r), ")"));
  }
};

}  // namespace nondim
