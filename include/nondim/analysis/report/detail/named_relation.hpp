#pragma once
/// \file detail/named_relation.hpp
/// \brief The relation of a classical analysis written in named groups (`Nu = f(Re, Pr)`),
/// which every view of the groups shows when it differs from the classical basis.

#include <optional>
#include <string>
#include <vector>

#include "../../../analysis.hpp"
#include "../../names/naming.hpp"

namespace nondim::detail {

/// `a` re-expressed in catalog groups with their matches, when `a` is in the classical basis
/// and the re-expression succeeds; nullopt otherwise.
inline std::optional<analysis> in_named_groups(const analysis& a) {
  if (a.form != basis::classical) return std::nullopt;
  analysis named = a;
  const std::vector<std::size_t> chosen = rename_in_catalog_groups(named);
  if (named.form != basis::named) return std::nullopt;
  attach_matches(named, chosen);
  return named;
}

/// The relation of `a` in named groups, in `form`, when it differs from the relation of the
/// groups `a` has; empty otherwise (also when `a` states no relation).
inline std::string named_relation(const analysis& a, text_form form) {
  const std::optional<analysis> named = in_named_groups(a);
  if (!named) return {};
  std::string line = relation(*named, form);
  if (line == relation(a, form)) return {};
  return line;
}

}  // namespace nondim::detail
