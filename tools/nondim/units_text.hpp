#pragma once
/// \file units_text.hpp
/// \brief Unit expressions and numbers from the command line and from problem files, with
/// messages that point at the fault: the expression again and a caret under its column.

#include <string>
#include <string_view>

#include <nondim/parse.hpp>

namespace nondim::tool {

/// \brief Parses `text`; `what` says where it came from ("the unit FROM", "variable 'U'").
/// \throws input_error "nondim: <what>: <parser message>" and the expression with a caret.
parsed_unit parse_unit_arg(std::string_view text, std::string_view what);

/// \brief The whole of `text` as a finite double (decimal, optional sign and exponent).
/// \throws input_error naming `what`.
double parse_number_arg(std::string_view text, std::string_view what);

/// \brief `x` with at most 15 significant digits (what a double carries reliably), so
/// that 211.99999999999997 prints as 212: for reading, never for computing.
std::string readable_number(double x);

/// \brief The message of a library exception without its leading "nondim: ".
std::string_view bare_message(const std::exception& e);

}  // namespace nondim::tool
