#pragma once
/// \file naming.hpp
/// \brief The two steps `analyze()` takes after the classical groups: the re-expression in
/// catalog groups when `basis::named` is asked for, and the list of catalog entries every
/// group matches (`pi_group::matches`), in either basis.
///
/// The classical basis stays the default: it is unique for the repeating variables and is
/// what a hand calculation gives, so it is predictable; the named basis depends on the
/// catalog and its order of preference, and is asked for explicitly.

#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <span>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/format.hpp"
#include "../extraction/error.hpp"
#include "../extraction/pi_group.hpp"
#include "../extraction/result.hpp"
#include "named_basis.hpp"
#include "quantity_kind.hpp"
#include "recognize.hpp"

namespace nondim::detail {

/// The kind a variable declares (`variable::kind`), checked: a kind of the catalog and of
/// the variable's dimension.
/// \throws analysis_error when the kind is unknown or of another dimension.
inline quantity_kind declared_kind(const variable& x) {
  if (x.kind.empty()) return quantity_kind::unspecified;
  const quantity_kind k = kind_from_key(x.kind);
  if (k == quantity_kind::unspecified)
    throw analysis_error(cat("nondim: variable '", x.name, "' declares kind '", x.kind,
                             "', which is not a kind of the catalog (see quantity_kinds)"),
                         x.name);
  if (!(kind_info(k).dim == x.dim))
    throw analysis_error(cat("nondim: variable '", x.name, "' declares kind '", x.kind, "' of dimension ",
                             to_string(kind_info(k).dim), ", but its unit has dimension ", to_string(x.dim)),
                         x.name);
  return k;
}

/// The problem's variables as recognition sees them (views into `a.variables`).
/// \throws analysis_error when a declared kind is unknown or of another dimension.
inline std::vector<group_variable> group_variables(const analysis& a) {
  std::vector<group_variable> v;
  v.reserve(a.variables.size());
  for (const auto& x : a.variables) v.push_back({x.name, x.dim, declared_kind(x)});
  return v;
}

/// Fills `matches` of every group of `a`. `chosen[k]`, when given, is the catalog entry
/// group k was chosen as in the named basis (`catalog_size`: none); that entry is listed first.
inline void attach_matches(analysis& a, std::span<const std::size_t> chosen = {}) {
  if (a.groups.empty()) return;
  const std::vector<group_variable> vars = group_variables(a);
  const group_recognizer recognise(vars);
  for (std::size_t k = 0; k < a.groups.size(); ++k) {
    std::vector<catalog_match> ms = recognise(a.groups[k].exponents);
    const std::size_t named_as = k < chosen.size() ? chosen[k] : catalog_size;
    // A match that a variable's conventional name contradicts (L/D read as a Knudsen
    // number, L being no mean free path) is noise to a reader: only consistent ones stay,
    // and the entry the named basis chose.
    std::erase_if(ms, [&](const catalog_match& m) { return !m.consistent && m.entry != named_as; });
    for (auto& m : ms) m.ambiguous = ms.size() > 1;
    if (named_as < catalog_size)
      std::stable_partition(ms.begin(), ms.end(), [&](const catalog_match& m) { return m.entry == named_as; });
    a.groups[k].matches = to_group_matches(ms);
  }
}

/// Re-expresses the classical groups of `a` in catalog groups (see named_basis.hpp) and sets
/// `a.form = basis::named`. The group written first (`non_repeating`) is the dependent
/// variable in the dependent group, the variable on the first factor of the catalog form in
/// a catalog group, and the non-repeating variable of the classical group kept otherwise.
/// When the re-expression would need exponents beyond 64 bits the classical groups stay,
/// `a.form` stays `basis::classical` and a note says so.
/// Returns the catalog entry each group was chosen as (`catalog_size`: none), for `attach_matches`.
inline std::vector<std::size_t> rename_in_catalog_groups(analysis& a) {
  const std::vector<group_variable> vars = group_variables(a);
  std::vector<std::vector<std::int64_t>> classical;
  classical.reserve(a.groups.size());
  for (const auto& g : a.groups) classical.push_back(g.exponents);
  std::size_t dependent = named_group::npos;
  std::vector<std::size_t> repeating;
  for (std::size_t i = 0; i < vars.size(); ++i) {
    if (a.variables[i].name == a.dependent) dependent = i;
    if (a.is_repeating(a.variables[i].name)) repeating.push_back(i);
  }
  std::vector<named_group> named;
  try {
    named = named_basis(vars, classical, dependent, repeating);
  } catch (const rational_overflow&) {
    // only groups with exponents near the 64-bit limit get here: keep them as they are
    a.notes.push_back("the named basis needs exponents beyond 64 bits; the groups are in the classical basis");
    return {};
  }

  std::vector<pi_group> out;
  std::vector<std::size_t> chosen;
  out.reserve(named.size());
  chosen.reserve(named.size());
  for (const auto& g : named) {
    chosen.push_back(g.entry);
    pi_group p = a.groups.empty() ? pi_group{} : a.groups.front();
    p.exponents = g.exponents;
    p.matches.clear();
    if (dependent != named_group::npos && g.exponents[dependent] != 0) {
      p.non_repeating = dependent;
    } else if (g.named()) {
      p.non_repeating = g.variables[0];  // the variable on the form's first factor: Re is written rho U D mu^-1
    } else if (!g.reduced) {
      p.non_repeating = a.groups[g.source].non_repeating;
    } else {
      p.non_repeating = 0;
      while (p.non_repeating + 1 < g.exponents.size() && g.exponents[p.non_repeating] <= 0) ++p.non_repeating;
    }
    out.push_back(std::move(p));
  }
  a.groups = std::move(out);
  a.form = basis::named;
  return chosen;
}

}  // namespace nondim::detail
