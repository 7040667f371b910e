#pragma once
/// \file json_util.hpp
/// \brief Pieces of the program's JSON output written with nlohmann-json (the `dim` and
/// `scale` objects); the `groups` object comes from the library's report layer.

#include <nlohmann/json.hpp>

#include <nondim/solver/core/dimension.hpp>
#include <nondim/solver/core/format.hpp>

namespace nondim::tool {

/// \brief An exponent as JSON: an integer, or the string "p/q" when it is not one.
inline nlohmann::json exponent_json(const rational& r) {
  if (r.is_integer()) return r.num;
  return to_string(r);
}

/// \brief {"L": 1, "T": -2}: the non-zero exponents, keyed by the ASCII base-dimension
/// symbols (L M T I Theta N J) in ISO 80000-1 order.
inline nlohmann::ordered_json dimension_json(const dimension& d) {
  nlohmann::ordered_json j = nlohmann::ordered_json::object();
  for (std::size_t i = 0; i < base_dimension_count; ++i)
    if (!d[i].is_zero()) j[std::string(dimension_symbol(i, text_form::ascii))] = exponent_json(d[i]);
  return j;
}

}  // namespace nondim::tool
