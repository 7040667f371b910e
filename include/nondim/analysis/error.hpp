#pragma once
/// \file error.hpp
/// \brief `analysis_error`: bad input to a dimensional analysis (a problem, its options, or
/// values given to a group), with the variable it concerns.

#include <stdexcept>
#include <string>
#include <utility>

namespace nondim {

/// \brief Thrown for bad input to the analysis layer: an empty or duplicate variable name,
/// an unknown or unsuitable repeating variable, a dependent variable not in the problem, a
/// group whose exact exponents do not fit in 64 bits, values missing for an evaluation.
///
/// `what()` is one sentence beginning `nondim:` that names the variable; `variable()` gives
/// the name alone (empty when the fault concerns no single variable).
class analysis_error : public std::invalid_argument {
 public:
  explicit analysis_error(const std::string& what, std::string variable = {})
      : std::invalid_argument(what), variable_(std::move(variable)) {}

  /// \brief The variable the fault concerns; empty when there is none.
  [[nodiscard]] const std::string& variable() const noexcept { return variable_; }

 private:
  std::string variable_;
};

}  // namespace nondim
