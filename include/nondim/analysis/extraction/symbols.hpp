#pragma once
/// \file symbols.hpp
/// \brief How variable names are written in Unicode text: the conventional ASCII spellings
/// of Greek letters (rho, mu, nu, sigma...) become the letters (ρ, μ, ν, σ...).

#include <array>
#include <cstddef>
#include <string>
#include <string_view>
#include <utility>

#include "../../solver/core/format.hpp"

namespace nondim {

namespace detail {

/// ASCII spelling -> Greek letter (ISO 80000-1 uses these letters as quantity symbols).
inline constexpr std::array<std::pair<std::string_view, std::string_view>, 35> greek_letters{{
    {"alpha", "\u03b1"}, {"beta", "\u03b2"},    {"gamma", "\u03b3"},  {"delta", "\u03b4"}, {"epsilon", "\u03b5"},
    {"eps", "\u03b5"},   {"zeta", "\u03b6"},    {"eta", "\u03b7"},    {"theta", "\u03b8"}, {"iota", "\u03b9"},
    {"kappa", "\u03ba"}, {"lambda", "\u03bb"},  {"mu", "\u03bc"},     {"nu", "\u03bd"},    {"xi", "\u03be"},
    {"pi", "\u03c0"},    {"rho", "\u03c1"},     {"sigma", "\u03c3"},  {"tau", "\u03c4"},   {"upsilon", "\u03c5"},
    {"phi", "\u03c6"},   {"chi", "\u03c7"},     {"psi", "\u03c8"},    {"omega", "\u03c9"}, {"Gamma", "\u0393"},
    {"Delta", "\u0394"}, {"Theta", "\u0398"},   {"Lambda", "\u039b"}, {"Xi", "\u039e"},    {"Pi", "\u03a0"},
    {"Sigma", "\u03a3"}, {"Upsilon", "\u03a5"}, {"Phi", "\u03a6"},    {"Psi", "\u03a8"},   {"Omega", "\u03a9"},
}};

/// Number of Unicode code points in UTF-8 text (its width in a terminal for the
/// characters nondim writes).
inline std::size_t display_width(std::string_view s) noexcept {
  std::size_t w = 0;
  for (const char c : s)
    if ((static_cast<unsigned char>(c) & 0xC0U) != 0x80U) ++w;
  return w;
}

}  // namespace detail

/// \brief `name` as written in text of the given form.
///
/// Unicode: a leading Greek spelling followed by nothing, `_` or a digit becomes the letter
/// (`rho` -> `ρ`, `mu_w` -> `μ_w`, `Delta1` -> `Δ1`); other names are unchanged. ASCII: `name`.
inline std::string display_name(std::string_view name, text_form form = text_form::unicode) {
  if (form == text_form::ascii) return std::string(name);
  std::size_t end = 0;
  while (end < name.size() && name[end] != '_' && (name[end] < '0' || name[end] > '9')) ++end;
  const std::string_view head = name.substr(0, end);
  for (const auto& [ascii, letter] : detail::greek_letters)
    if (head == ascii) return std::string(letter).append(name.substr(end));
  return std::string(name);
}

}  // namespace nondim
