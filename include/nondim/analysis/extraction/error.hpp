#pragma once
/// \file error.hpp
/// \brief `analysis_error`: bad input to a dimensional analysis (a problem, its options, or
/// values given to a group), with the variable it concerns.

#include <cstddef>
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
  explicit analysis_error(const std::string& what, std::string variable = {}, std::size_t unit_column = 0)
      : std::invalid_argument(what), variable_(std::move(variable)), unit_column_(unit_column) {}

  /// \brief The variable the fault concerns; empty when there is none.
  [[nodiscard]] const std::string& variable() const noexcept { return variable_; }
  /// \brief For a unit that cannot be read, the 1-based column (in code points) of the
  /// fault in the unit text; 0 for every other fault.
  [[nodiscard]] std::size_t unit_column() const noexcept { return unit_column_; }

 private:
  std::string variable_;
  std::size_t unit_column_ = 0;
};

}  // namespace nondim
