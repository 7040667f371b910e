#pragma once
/// \file problem.hpp
/// \brief `problem`: the named variables of a physical problem, in the order they were added.

#include <cstddef>
#include <exception>
#include <optional>
#include <string>
#include <string_view>
#include <utility>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/dimension.hpp"
#include "../../solver/core/format.hpp"
#include "../../solver/parse/errors.hpp"
#include "../../solver/parse/unit_parser.hpp"
#include "error.hpp"
#include "matrix.hpp"

namespace nondim {

/// \brief One variable of a problem.
///
/// Values of the variable in its own unit convert to coherent SI as `factor * x + offset`.
/// A variable given by its dimension has the coherent SI unit (`unit` spelled in ASCII,
/// parseable again), factor 1 and offset 0.
struct variable {
  std::string name;
  dimension dim;
  std::string unit;     ///< the unit text as given (or the coherent SI unit)
  double factor = 1.0;  ///< SI value of one `unit`
  double offset = 0.0;  ///< affine zero (degC, degF standing alone); 0 otherwise
  /// The declared kind ("mean_free_path", see names/quantity_kind.hpp), or empty: names of
  /// groups that need a specific kind of variable rely on it.
  std::string kind;

  friend bool operator==(const variable&, const variable&) = default;
};

/// \brief Most variables a problem takes. The analysis needs time and memory that grow as
/// the square of the count (a problem of 1000 variables takes about 0.1 s, 1.5 s in the
/// named basis, on a 2-core Xeon); real problems have a few dozen.
inline constexpr std::size_t max_problem_variables = 1000;

/// \brief The variables of a problem, in the order they were added (the order of the
/// columns of the dimension matrix and of every exponent vector).
class problem {
 public:
  problem() = default;

  /// \brief Adds a variable of dimension `d` (coherent SI unit).
  /// \throws analysis_error when `name` is empty or already in the problem, or the problem
  ///         has `max_problem_variables` already.
  problem& add(std::string name, dimension d) {
    check_name(name);
    std::string unit = si_unit_string(d, text_form::ascii);
    variables_.push_back(variable{std::move(name), d, std::move(unit), 1.0, 0.0, {}});
    return *this;
  }

  /// \brief Adds a variable whose unit is the expression `unit_text` (read by `parse_unit`:
  /// `"kg/m^3"`, `"Pa*s"`, `"lbf"`, `"degC"`); its factor and offset to SI are kept, so that
  /// values can be given and reported in the variable's own unit.
  /// \throws analysis_error when `name` is empty or already in the problem, when the
  ///         problem has `max_problem_variables` already, or when the unit cannot be read; then the message names the
  ///         variable and the unit, and the `unit_error` (with its column) is nested (`std::rethrow_if_nested`) and its
  ///         column is given by `analysis_error::unit_column()`.
  problem& add(std::string name, std::string_view unit_text) {
    check_name(name);
    parsed_unit u;
    try {
      u = parse_unit(unit_text);
    } catch (const unit_error& e) {
      std::string why = e.what();
      if (why.rfind("nondim: ", 0) == 0) why.erase(0, 8);
      std::throw_with_nested(analysis_error(
          detail::cat("nondim: variable '", name, "' has a unit that cannot be read ('", unit_text, "'): ", why), name,
          e.column()));
    }
    variables_.push_back(variable{std::move(name), u.dim, std::string(unit_text), u.factor, u.offset, {}});
    return *this;
  }

  /// \brief Declares what the variable called `name` is (`kind`: an identifier or name of
  /// `quantity_kinds`, such as "mean_free_path"); recognition takes it as evidence. The kind
  /// is checked against the catalog and the variable's dimension when the problem is analysed.
  /// \throws analysis_error when there is no variable called `name`.
  problem& declare_kind(std::string_view name, std::string kind) {
    const auto i = index_of(name);
    if (!i)
      throw analysis_error(detail::cat("nondim: no variable '", name, "' to declare a kind for"), std::string(name));
    variables_[*i].kind = std::move(kind);
    return *this;
  }

  [[nodiscard]] const std::vector<variable>& variables() const noexcept { return variables_; }
  [[nodiscard]] std::size_t size() const noexcept { return variables_.size(); }
  [[nodiscard]] bool empty() const noexcept { return variables_.empty(); }
  /// \throws std::out_of_range when `i >= size()`.
  [[nodiscard]] const variable& operator[](std::size_t i) const { return variables_.at(i); }

  /// \brief Position of the variable called `name`, if there is one.
  [[nodiscard]] std::optional<std::size_t> index_of(std::string_view name) const noexcept {
    for (std::size_t i = 0; i < variables_.size(); ++i)
      if (variables_[i].name == name) return i;
    return std::nullopt;
  }

  /// \brief The names, in order.
  [[nodiscard]] std::vector<std::string> names() const {
    std::vector<std::string> n;
    n.reserve(variables_.size());
    for (const auto& v : variables_) n.push_back(v.name);
    return n;
  }

  /// \brief The 7 x n dimension matrix, one column per variable in order.
  [[nodiscard]] dimension_matrix matrix() const {
    std::vector<dimension> cols;
    cols.reserve(variables_.size());
    for (const auto& v : variables_) cols.push_back(v.dim);
    return dimension_matrix(std::move(cols));
  }

 private:
  void check_name(const std::string& name) const {
    if (name.find_first_not_of(" \t\r\n") == std::string::npos)
      throw analysis_error(
          detail::cat("nondim: variable ", std::to_string(variables_.size() + 1), " of the problem has an empty name"));
    if (index_of(name))
      throw analysis_error(detail::cat("nondim: variable '", name, "' is already in the problem"), name);
    if (variables_.size() == max_problem_variables)
      throw analysis_error(
          detail::cat("nondim: variable '", name, "' would be number ", std::to_string(max_problem_variables + 1),
                      ": a problem takes at most ", std::to_string(max_problem_variables), " variables"),
          name);
  }

  std::vector<variable> variables_;
};

}  // namespace nondim
