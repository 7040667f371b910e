#pragma once
/// \file problem.hpp
/// \brief `similarity_problem`: what a similarity plan needs — the variables with their
/// units and values, the groups as integer exponent vectors, the dependent variable and
/// the groups that must match exactly. It does not depend on the analysis layer: an
/// analysis is one way to fill it (see `from_analysis.hpp`), a hand-written list another.

#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/dimension.hpp"
#include "error.hpp"

namespace nondim {

/// \brief One variable of a similarity problem, with its values in its own unit.
///
/// SI value = `factor * x`. Prototype and model values share the unit, so the
/// model/prototype ratio of a variable does not depend on it; the factor enters only the
/// values of the groups. An affine unit (`offset != 0`, a thermometer reading in degC or
/// degF) is refused: similarity scales by ratios, which need an absolute zero.
struct similarity_variable {
  std::string name{};
  std::string unit{};                 ///< shown in reports; may be empty
  double factor = 1.0;                ///< SI value of one `unit`; positive and finite
  double offset = 0.0;                ///< affine zero of `unit`; must be 0
  std::optional<double> prototype{};  ///< full-size value; required for every variable but the dependent one
  std::optional<double> model{};      ///< fixed model value; absent = to be found. For the
                                      ///< dependent variable: the value measured on the model
  std::optional<dimension> dim{};     ///< when given for every variable, each group is checked to be dimensionless
  /// Standard uncertainties (k = 1, GUM JCGM 100:2008) of `prototype` and `model`, in the
  /// variable's unit; uncorrelated. The scale-up factor gets one when every value it depends on has one.
  std::optional<double> prototype_uncertainty{};
  std::optional<double> model_uncertainty{};
};

/// \brief One dimensionless group: integer exponents aligned with the variables.
struct similarity_group {
  std::vector<std::int64_t> exponents{};
  std::string label{};  ///< shown in reports ("Re"); empty: the product of the variables is written out
};

/// \brief The input of `plan_similarity()`.
///
/// Every group that does not hold the dependent variable is matched (model value =
/// prototype value); the groups that hold it carry the measured value to full scale.
struct similarity_problem {
  std::vector<similarity_variable> variables;
  std::vector<similarity_group> groups;  ///< independent: n - rank of them from an analysis
  std::string dependent;                 ///< name; empty: the first variable
  std::vector<std::size_t> priority;     ///< 0-based indices of groups that must match exactly
  /// A group is matched when |ln(model / prototype)| <= tolerance (a relative difference
  /// of about `tolerance`). The default leaves room for rounding in double arithmetic.
  double tolerance = 1e-9;

  /// \brief Appends a variable; returns `*this` for chaining.
  similarity_problem& add(similarity_variable v) {
    variables.push_back(std::move(v));
    return *this;
  }
  /// \brief Appends a group; returns `*this` for chaining.
  similarity_problem& add_group(std::vector<std::int64_t> exponents, std::string label = {}) {
    groups.push_back(similarity_group{std::move(exponents), std::move(label)});
    return *this;
  }

  /// \brief The variable called `name`, to set its values.
  /// \throws similarity_error naming `name` when there is no such variable.
  similarity_variable& variable(std::string_view name) {
    for (auto& v : variables)
      if (v.name == name) return v;
    throw similarity_error(
        detail::cat("nondim: there is no variable '", std::string(name), "' in the similarity problem"),
        std::string(name));
  }
  /// \brief The 0-based index of the group labelled `label` (for `priority`).
  /// \throws similarity_error when no group, or more than one, has that label.
  [[nodiscard]] std::size_t group_index(std::string_view label) const {
    std::optional<std::size_t> found;
    for (std::size_t k = 0; k < groups.size(); ++k) {
      if (groups[k].label != label) continue;
      if (found)
        throw similarity_error(detail::cat("nondim: more than one group is labelled '", std::string(label), "'"), {},
                               k);
      found = k;
    }
    if (!found) throw similarity_error(detail::cat("nondim: no group is labelled '", std::string(label), "'"));
    return *found;
  }
};

}  // namespace nondim
