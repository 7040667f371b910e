#pragma once
/// \file from_unit.hpp
/// \brief `make_similarity_variable`: a similarity variable from a unit written as text.

#include <optional>
#include <string>
#include <string_view>
#include <utility>

#include "../../solver/parse/unit_parser.hpp"
#include "problem.hpp"

namespace nondim {

/// \brief A variable whose unit is read by `parse_unit`: its factor, offset and dimension
/// come from the text, so groups are checked to be dimensionless when every variable is
/// made this way. An affine unit (`degC` standing alone) is accepted here and refused by
/// `plan_similarity()` with a `similarity_error` that names the variable.
/// \throws unit_error when `unit_text` is not a unit expression (with the column).
inline similarity_variable make_similarity_variable(std::string name, std::string_view unit_text,
                                                    std::optional<double> prototype = std::nullopt,
                                                    std::optional<double> model = std::nullopt) {
  const parsed_unit u = parse_unit(unit_text);
  similarity_variable v;
  v.name = std::move(name);
  v.unit = std::string(unit_text);
  v.factor = u.factor;
  v.offset = u.offset;
  v.prototype = prototype;
  v.model = model;
  v.dim = u.dim;
  return v;
}

}  // namespace nondim
