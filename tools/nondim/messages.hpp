#pragma once
/// \file messages.hpp
/// \brief How the program reports bad input: one message on standard error that says what
/// and where, and exit status 2. An `input_error` carries the finished message.

#include <cstddef>
#include <stdexcept>
#include <string>
#include <string_view>

namespace nondim::tool {

/// Exit status of the program (DESIGN.md: 0 success, 2 bad input, 1 internal fault).
enum exit_status : int { exit_ok = 0, exit_internal = 1, exit_bad_input = 2 };

/// \brief Bad input to the program. `what()` is the whole message, beginning "nondim: ",
/// possibly followed by the offending text and a caret line under the faulty column.
class input_error : public std::runtime_error {
 public:
  explicit input_error(const std::string& message) : std::runtime_error(message) {}
};

/// \brief `text` on one line and a caret under its `column` (1-based, in code points), both
/// indented by two spaces; `column` 0 gives the text alone.
std::string caret_block(std::string_view text, std::size_t column);

/// \brief `message` prefixed with "nondim: " unless it has that prefix already.
std::string with_prefix(std::string_view message);

/// \brief Number of Unicode code points in UTF-8 `text`.
std::size_t code_points(std::string_view text);

}  // namespace nondim::tool
