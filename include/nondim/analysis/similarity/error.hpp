#pragma once
/// \file error.hpp
/// \brief `similarity_error`: bad input to a similarity plan, with the variable or group it
/// concerns.

#include <cstddef>
#include <optional>
#include <stdexcept>
#include <string>
#include <utility>

namespace nondim {

/// \brief Thrown for bad input to `plan_similarity()`: a value that is missing, zero,
/// negative, NaN or infinite (similarity works on logarithms), an affine unit, a bad unit
/// factor, an unknown or misplaced dependent variable, a group of the wrong length or not
/// dimensionless, groups that are not independent, a bad priority list or tolerance.
///
/// `what()` is one sentence beginning `nondim:` that names the variable or group;
/// `variable()` gives the variable's name alone (empty when the fault concerns none) and
/// `group()` the 0-based group index (empty when the fault concerns no single group).
/// A legitimate numerical outcome (a group that cannot match, a plan with values still to
/// fix) is never an exception: it is data in `similarity_plan`.
class similarity_error : public std::invalid_argument {
 public:
  explicit similarity_error(const std::string& what, std::string variable = {},
                            std::optional<std::size_t> group = std::nullopt)
      : std::invalid_argument(what), variable_(std::move(variable)), group_(group) {}

  /// \brief The variable the fault concerns; empty when there is none.
  [[nodiscard]] const std::string& variable() const noexcept { return variable_; }
  /// \brief The 0-based index of the group the fault concerns, if one.
  [[nodiscard]] std::optional<std::size_t> group() const noexcept { return group_; }

 private:
  std::string variable_;
  std::optional<std::size_t> group_;
};

}  // namespace nondim
