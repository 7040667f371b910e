#pragma once
/// \file unit_format.hpp
/// \brief Printing a parsed unit back: its coherent SI unit, or one unit as an SI quantity.

#include <array>
#include <charconv>
#include <string>

#include "../core/format.hpp"
#include "detail/unit_parser.hpp"

namespace nondim {

/// \brief The coherent SI unit of `u`'s dimension: "kg·m⁻¹·s⁻¹" (Unicode) or "kg/(m*s)"
/// (ASCII). The factor and offset are not part of it; `parse_unit` reads either form back
/// to the same dimension with factor 1.
inline std::string si_unit_string(const parsed_unit& u, text_form form = text_form::unicode) {
  return si_unit_string(u.dim, form);
}

/// \brief The shortest decimal that reads back to exactly `x` ("0.3048", "1e-06").
inline std::string shortest_decimal(double x) {
  std::array<char, 32> buffer{};
  const auto r = std::to_chars(buffer.data(), buffer.data() + buffer.size(), x);
  return std::string(buffer.data(), r.ptr);
}

/// \brief One unit as an SI quantity: `ft` is "0.3048 m", `psi` "6894.757293168361 kg·m⁻¹·s⁻²",
/// `deg` "0.017453292519943295" (dimensionless). `parse_quantity` reads it back to the same
/// factor (bit for bit) and dimension. For an affine unit (`degC` alone) the zero is added
/// as " + 273.15 K" for the reader; that form does not parse back.
inline std::string to_string(const parsed_unit& u, text_form form = text_form::unicode) {
  std::string s = shortest_decimal(u.factor);
  if (!u.dim.is_dimensionless()) s += " " + si_unit_string(u.dim, form);
  if (u.offset != 0.0) s += " + " + shortest_decimal(u.offset) + " " + si_unit_string(u.dim, form);
  return s;
}

}  // namespace nondim
