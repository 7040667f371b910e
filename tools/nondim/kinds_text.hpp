#pragma once
/// \file kinds_text.hpp
/// \brief `nondim groups --kinds`: the kinds a variable can be declared, their dimensions
/// and the conventional names that imply them.

#include <cstddef>
#include <string>

#include <nondim/analysis/names/quantity_kind.hpp>
#include <nondim/solver/core/format.hpp>

namespace nondim::tool {

/// \brief One line per kind: identifier (marked `*` when a name needs it as evidence),
/// description, SI unit of its dimension, conventional names.
inline std::string kinds_text() {
  std::string out =
      "Kinds a variable can be declared with NAME:KIND=UNIT or kind = \"KIND\" in a problem file.\n"
      "A variable whose name is listed has the kind without a declaration. Kinds marked * need\n"
      "evidence: a group is named after a number that needs one (Knudsen, Rossby, drag\n"
      "coefficient...) only when a variable's name or declared kind says so.\n\n";
  auto pad = [](std::string s, std::size_t width) {
    s.push_back(' ');
    while (s.size() < width) s.push_back(' ');
    return s;
  };
  for (const auto& k : quantity_kinds) {
    if (k.kind == quantity_kind::unspecified) continue;
    std::string id(k.id);
    if (needs_evidence(k.kind)) id += " *";
    out += pad(id, 42) + pad(std::string(k.name), 46) + pad(si_unit_string(k.dim, text_form::ascii), 14);
    out += std::string(k.names) + "\n";
  }
  return out;
}

}  // namespace nondim::tool
