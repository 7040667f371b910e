#pragma once
/// \file problem_file.hpp
/// \brief Problem files (TOML, schema in DESIGN.md): a title, the optional dependent and
/// repeating variables, and `[[variable]]` tables in order, each with a name, a unit, an
/// optional note, optional value and uncertainty at a design point, and optional prototype
/// and model values. Every key outside the schema
/// and every value of the wrong type is an `input_error` naming the key, file and line.

#include <cstddef>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace nondim::tool {

/// \brief Where something is in a file (1-based; 0 when unknown).
struct file_position {
  std::size_t line = 0;
  std::size_t column = 0;
};

/// \brief A `value` or `uncertainty` key: a number in the variable's unit, or a string
/// ("998 kg/m^3", "0.5 K", "2 %") read by the program against the variable's unit.
struct file_quantity {
  std::optional<double> number;  ///< when the key holds a number
  std::string text;              ///< when it holds a string
  file_position where;           ///< the value
};

/// \brief One `[[variable]]` table.
struct file_variable {
  std::string name;
  std::string unit;
  std::string note;
  std::string kind;                                    ///< declared kind ("mean_free_path"), empty when absent
  file_position kind_where;                            ///< the kind's value
  std::optional<double> prototype;                     ///< in the variable's own unit
  std::optional<double> model;                         ///< in the variable's own unit; absent = to be found
  std::optional<file_quantity> value;                  ///< the design point
  std::optional<file_quantity> uncertainty;            ///< standard uncertainty of `value`
  std::optional<file_quantity> prototype_uncertainty;  ///< standard uncertainty of `prototype` (scale)
  std::optional<file_quantity> model_uncertainty;      ///< standard uncertainty of `model` (scale)
  file_position where;                                 ///< the table
  file_position unit_where;                            ///< the first character of the unit text inside its quotes
  bool unit_literal = true;    ///< the unit text maps 1:1 onto the file (no escapes), so columns carry over
  std::string unit_line_text;  ///< the whole line of the file that holds the unit
};

/// \brief A whole problem file.
struct problem_file {
  std::string path;  ///< as given, for messages
  std::string title;
  std::string dependent;  ///< empty when absent
  file_position dependent_where;
  std::vector<std::string> repeating;  ///< empty when absent
  file_position repeating_where;
  std::string configuration;  ///< the regime table's configuration ("pipe_flow"), empty when absent
  file_position configuration_where;
  std::vector<file_variable> variables;

  /// \brief The variable called `name`, or nullptr.
  [[nodiscard]] const file_variable* find(std::string_view name) const;
  /// \brief "PATH:LINE: " (or "PATH: " when the line is unknown), for messages.
  [[nodiscard]] std::string at(const file_position& p) const;
};

/// Problem files longer than this many bytes (1 MiB) are refused unread.
inline constexpr std::size_t max_problem_file_bytes = std::size_t{1} << 20U;

/// \brief Reads and checks the problem file at `path`.
/// \throws input_error when the file cannot be read, is longer than
///         `max_problem_file_bytes`, is not TOML, or breaks the schema.
problem_file load_problem_file(const std::string& path);

/// \brief Checks problem-file text; `path` is used in messages only.
/// \throws input_error as `load_problem_file`.
problem_file parse_problem_text(std::string_view text, const std::string& path);

/// \brief Whether `name` can name a variable on the command line and in files: not empty,
/// no white space, control character, '=' or ','; otherwise the reason.
std::optional<std::string> bad_variable_name(std::string_view name);

}  // namespace nondim::tool
