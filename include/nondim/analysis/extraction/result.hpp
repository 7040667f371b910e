#pragma once
/// \file result.hpp
/// \brief `analysis`: what `analyze()` finds — rank, repeating variables, groups, isolated
/// variables, why the rank falls short of the base dimensions, and the SVD cross-check.

#include <cstddef>
#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "error.hpp"
#include "matrix.hpp"
#include "options.hpp"
#include "pi_group.hpp"
#include "problem.hpp"
#include "svd_check.hpp"

namespace nondim {

/// \brief Why the rank may be less than the count of base dimensions that appear.
///
/// `spanned` is a basis of the dimensions of the variables (every variable's dimension is a
/// product of rational powers of these): the reduced echelon form over the base
/// dimensions, each scaled to primitive integers. When the rank is short, some of them
/// combine several base dimensions (force, stiffness and displacement span L and M·T⁻²):
/// those base dimensions appear only in fixed combinations.
struct rank_deficiency {
  bool deficient = false;               ///< rank < present.size()
  std::vector<std::size_t> present;     ///< base dimensions (0..6, L M T I Θ N J) that appear
  std::vector<dimension> spanned;       ///< rank of them
  std::vector<dimension> combinations;  ///< the elements of `spanned` with more than one base dimension
  bool too_large = false;   ///< `spanned` would need exponents beyond 64 bits: it and `combinations` are empty
  std::string explanation;  ///< one ASCII sentence; empty when not deficient

  friend bool operator==(const rank_deficiency&, const rank_deficiency&) = default;
};

/// \brief The result of `analyze()`.
struct analysis {
  std::size_t rank = 0;                ///< exact rank of the dimension matrix
  std::vector<std::string> repeating;  ///< as given, or the automatic choice in input order
  std::vector<pi_group> groups;  ///< n - rank of them: the dependent variable's first, then by input position of their
                                 ///< non-repeating variable
  std::vector<std::string> isolated;  ///< variables that can appear in no group, in input order

  std::vector<std::string> isolated_reasons;  ///< one ASCII sentence per isolated variable
  std::vector<variable> variables;            ///< the problem's variables, in order
  dimension_matrix matrix;                    ///< 7 x n, columns in input order
  std::string dependent;                      ///< the dependent variable
  bool repeating_given = false;               ///< the repeating variables came from the options
  /// Every group is one non-repeating variable times powers of the repeating ones. Always
  /// so in the classical basis; in the named basis, whether the catalog groups kept to the
  /// repeating variables (when not, they were not used).
  bool repeating_kept = true;
  bool missing_variable = false;  ///< the dependent variable is isolated: the problem lacks a variable
  rank_deficiency deficiency;
  svd_check svd;
  basis form = basis::classical;   ///< the basis the groups are in
  bool multiprecision = false;     ///< the int64 elimination overflowed (or was bypassed): cpp_rational gave the result
  std::vector<std::string> notes;  ///< remarks worth showing the user (ASCII sentences)
  std::string configuration;       ///< from the options: the configuration regime notes keep to

  /// \brief The variable names, in order.
  [[nodiscard]] std::vector<std::string> names() const {
    std::vector<std::string> n;
    n.reserve(variables.size());
    for (const auto& v : variables) n.push_back(v.name);
    return n;
  }
  /// \brief Where the repeating variables came from and whether the groups use them, for
  /// reports: "given", "chosen automatically", or either followed by "; not used by the
  /// named basis, whose groups are catalog numbers" or "; kept by the named basis".
  [[nodiscard]] std::string repeating_origin() const {
    std::string s = repeating_given ? "given" : "chosen automatically";
    if (form != basis::named) return s;
    return s + (repeating_kept ? "; kept by the named basis"
                               : "; not used by the named basis, whose groups are catalog numbers");
  }
  /// \brief Position of the variable called `name`, if there is one.
  [[nodiscard]] std::optional<std::size_t> index_of(std::string_view name) const noexcept {
    for (std::size_t i = 0; i < variables.size(); ++i)
      if (variables[i].name == name) return i;
    return std::nullopt;
  }
  /// \brief Whether `name` is one of the repeating variables.
  [[nodiscard]] bool is_repeating(std::string_view name) const noexcept {
    for (const auto& r : repeating)
      if (r == name) return true;
    return false;
  }

  /// \brief Every group's value from the SI values of the variables, in order.
  /// \throws analysis_error when there is not one value per variable.
  [[nodiscard]] std::vector<double> values(std::span<const double> si_values) const {
    std::vector<double> v;
    v.reserve(groups.size());
    for (const auto& g : groups) v.push_back(g.value(si_values));
    return v;
  }
  /// \brief Every group's value from SI values by name.
  /// \throws analysis_error naming a variable without a value.
  template <class Map>
  requires requires(const Map& m, const std::string& k) {
    m.find(k) != m.end();
    static_cast<double>(m.find(k)->second);
  }
  [[nodiscard]] std::vector<double> values(const Map& si_values) const {
    std::vector<double> v;
    v.reserve(groups.size());
    for (const auto& g : groups) v.push_back(g.value(si_values));
    return v;
  }
};

}  // namespace nondim
