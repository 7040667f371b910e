#pragma once
/// \file plan.hpp
/// \brief `similarity_plan`: the outcome of `plan_similarity()` — status, the model value of
/// every variable, each group's prototype and model values, the variables still to fix, and
/// the factor that carries the dependent variable from model to prototype.

#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "../../solver/core/rational.hpp"

namespace nondim {

/// \brief What the plan could do.
enum class similarity_status {
  exact,           ///< every model value is determined and every independent group matches
  partial,         ///< every model value is determined, but some group cannot match (least squares)
  underdetermined  ///< some model values are still to be fixed (see `similarity_plan::free`)
};

/// \brief "exact", "partial", "underdetermined" (the JSON spelling).
[[nodiscard]] constexpr std::string_view to_string(similarity_status s) noexcept {
  switch (s) {
    case similarity_status::exact:
      return "exact";
    case similarity_status::partial:
      return "partial";
    case similarity_status::underdetermined:
      return "underdetermined";
  }
  return "unknown";
}

/// \brief Where a variable's model value comes from.
enum class model_source {
  given,         ///< fixed in the input
  found,         ///< determined by the plan
  free,          ///< still to be fixed: listed in `similarity_plan::free`
  undetermined,  ///< follows once the `free` variables are fixed
  unused,        ///< appears in no group: similarity does not constrain it
  measured,      ///< the dependent variable, measured on the model (given)
  to_measure     ///< the dependent variable, not given: to be measured on the model
};

/// \brief "given", "found", "free", "undetermined", "unused", "measured", "to measure".
[[nodiscard]] constexpr std::string_view to_string(model_source s) noexcept {
  switch (s) {
    case model_source::given:
      return "given";
    case model_source::found:
      return "found";
    case model_source::free:
      return "free";
    case model_source::undetermined:
      return "undetermined";
    case model_source::unused:
      return "unused";
    case model_source::measured:
      return "measured";
    case model_source::to_measure:
      return "to measure";
  }
  return "unknown";
}

/// \brief One variable of the plan; values in the variable's own unit.
struct variable_plan {
  std::string name;
  std::string unit;
  bool dependent = false;
  std::optional<double> prototype;  ///< given; for the dependent: predicted from the measured model value
  std::optional<double> model;      ///< given, found or measured; empty when free or undetermined
  std::optional<double> ratio;      ///< model / prototype, when both are known
  model_source source = model_source::given;
  /// Standard uncertainties (k = 1): as given; for the dependent variable's predicted
  /// prototype value, propagated from the factor's and the measured value's.
  std::optional<double> prototype_uncertainty;
  std::optional<double> model_uncertainty;
};

/// \brief One group of the plan. Group values are dimensionless (computed in SI).
///
/// For an independent group (one without the dependent variable) every field is set: its
/// ratio is unique even when some model values are still free (the least-squares residual
/// is). A group that holds the dependent variable is not matched but used to scale the
/// measured value: `prototype` and `ratio` are empty, `model` is set when the measured
/// value and the group's other model values are known, and `matched` is false.
struct group_plan {
  std::vector<std::int64_t> exponents;  ///< aligned with the variables
  std::string label;                    ///< as given; may be empty
  std::string text;                     ///< the product written out in ASCII: "rho*V*L/mu"
  bool holds_dependent = false;
  bool priority = false;  ///< listed in `similarity_problem::priority`
  std::optional<double> prototype;
  std::optional<double> model;
  std::optional<double> ratio;  ///< model / prototype
  bool matched = false;         ///< |ln ratio| <= tolerance
};

/// \brief How the dependent variable is carried from model to prototype.
///
/// With group k holding the dependent variable y with exponent e and the other variables
/// x_j with exponents e_j, equal group values on model and prototype give
///   y_p / y_m = prod_j (x_pj / x_mj)^(-e_j / e)     (`rule_exponents[j]` = -e_j / e).
/// The factor is exact when every independent group matched (complete similarity);
/// otherwise it is the factor of a model whose unmatched groups differ, an approximation.
struct dependent_plan {
  std::string name;
  std::size_t index = 0;                  ///< position among the variables
  std::vector<std::size_t> groups;        ///< indices of the groups that hold it
  std::optional<std::size_t> rule_group;  ///< the group the rule uses: the first of `groups`
  std::vector<rational> rule_exponents;   ///< exponent of (x_p / x_m) for each variable; 0 where absent
  std::optional<double>
      prototype_over_model;  ///< empty when it is in no group or a value in its group is not determined
  std::vector<std::optional<double>> factors_by_group;  ///< the factor from each group of `groups` (when known)
  /// Standard uncertainty (k = 1) of `prototype_over_model` by the law of propagation of
  /// uncertainty for uncorrelated inputs (GUM, JCGM 100:2008, eq. 10), when every value it
  /// depends on has an uncertainty; the sensitivity coefficients are those of the whole plan
  /// (a model value the plan finds moves with the values it is found from).
  std::optional<double> prototype_over_model_uncertainty;
  /// The given values the factor depends on that have no uncertainty ("g (model)"), when
  /// some others have one: why `prototype_over_model_uncertainty` is empty.
  std::vector<std::string> lacking_uncertainty;
  bool exact = false;
  std::string rule;    ///< "F_p/F_m = (rho_p/rho_m) * (V_p/V_m)^2 * (L_p/L_m)^2"
  std::string remark;  ///< why the factor is approximate or missing; empty when exact
};

/// \brief The outcome of `plan_similarity()`. Every numerical outcome is here, never thrown.
struct similarity_plan {
  similarity_status status = similarity_status::exact;
  std::vector<variable_plan> variables;  ///< in input order
  std::vector<group_plan> groups;        ///< in input order
  std::vector<std::string> free;         ///< model variables to fix to determine the rest (underdetermined)
  std::vector<std::string> unmatched;    ///< labels (or texts) of the independent groups that did not match
  dependent_plan dependent;
  bool priority_matched = true;  ///< every priority group matched (true when there are none)
  std::size_t unknowns = 0;      ///< model values to find (neither given, dependent nor unused)
  std::size_t rank = 0;          ///< rank of the independent groups' exponents over those unknowns
  double tolerance = 0.0;
  std::vector<std::string> notes;  ///< sentences worth showing the user

  /// \brief The variable called `name`, or nullptr.
  [[nodiscard]] const variable_plan* find(std::string_view name) const noexcept {
    for (const auto& v : variables)
      if (v.name == name) return &v;
    return nullptr;
  }
  /// \brief The model value of `name`, when the plan knows it (given, found or measured).
  [[nodiscard]] std::optional<double> model(std::string_view name) const noexcept {
    const auto* v = find(name);
    return v != nullptr ? v->model : std::nullopt;
  }
};

}  // namespace nondim
