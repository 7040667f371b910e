#pragma once
// Definitions of explain.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/dimension.hpp"
#include "../../solver/core/format.hpp"
#include "explain.hpp"

namespace nondim::detail {

/// `M*T^-2` (ASCII) or `M·T⁻²` (Unicode): a dimension as a product, for sentences.
inline std::string dimension_product(const dimension& d, text_form form) {
  std::string s;
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    if (d[i].is_zero()) continue;
    if (!s.empty()) s += form == text_form::unicode ? "\u00b7" : "*";
    s += dimension_symbol(i, form);
    s += exponent_suffix(d[i], form);
  }
  return s.empty() ? "1" : s;
}

/// "a", "a and b", "a, b and c".
inline std::string spoken_list(const std::vector<std::string>& items) {
  std::string s;
  for (std::size_t i = 0; i < items.size(); ++i) {
    if (i > 0) s += i + 1 == items.size() ? " and " : ", ";
    s += items[i];
  }
  return s;
}

/// The base dimensions in which variable `j` alone has a non-zero exponent.
inline std::vector<std::string> unique_bases(const std::vector<variable>& vars, std::size_t j, text_form form) {
  std::vector<std::string> out;
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    if (vars[j].dim[i].is_zero()) continue;
    bool alone = true;
    for (std::size_t k = 0; k < vars.size() && alone; ++k)
      if (k != j && !vars[k].dim[i].is_zero()) alone = false;
    if (alone) out.emplace_back(dimension_symbol(i, form));
  }
  return out;
}

/// \brief Why variable `j` (isolated: its dimension is no product of powers of the others')
/// can appear in no group.
NONDIM_ANALYSIS_INLINE std::string isolation_reason(const std::vector<variable>& vars, std::size_t j, bool is_dependent,
                                                    text_form form) {
  const std::string name = cat("'", vars[j].name, "'");
  const std::vector<std::string> alone = unique_bases(vars, j, form);
  const std::string dim = dimension_product(vars[j].dim, form);
  std::string why;
  if (!alone.empty())
    why = cat(alone.size() == 1 ? "its base dimension " : "its base dimensions ", spoken_list(alone),
              alone.size() == 1 ? " appears" : " appear", " in no other variable");
  else
    why = cat("no product of powers of the other variables has its dimension ", dim);
  if (is_dependent)
    return cat(name, " is the dependent variable, but ", why,
               ", so no group can contain it: a variable is missing from the problem",
               alone.empty() ? std::string{} : cat(" (one whose dimension involves ", spoken_list(alone), ")"));
  return cat(why, ", so no group can contain ", name,
             ": either it does not affect the result (as the mass of a pendulum) or a variable is missing");
}

/// \brief The sentence that explains a rank below the count of base dimensions present.
NONDIM_ANALYSIS_INLINE std::string explain_deficiency(std::size_t rank, const rank_deficiency& d, text_form form) {
  if (!d.deficient) return {};
  std::vector<std::string> present;
  for (std::size_t i : d.present) present.emplace_back(dimension_symbol(i, form));
  std::vector<std::string> spanned;
  for (const auto& s : d.spanned) spanned.push_back(dimension_product(s, form));
  std::vector<std::string> combos;
  std::vector<bool> involved(base_dimension_count, false);
  for (const auto& c : d.combinations) {
    combos.push_back(dimension_product(c, form));
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      if (!c[i].is_zero()) involved[i] = true;
  }
  std::vector<std::string> tied;
  for (std::size_t i = 0; i < base_dimension_count; ++i)
    if (involved[i]) tied.emplace_back(dimension_symbol(i, form));
  std::string s = cat("rank ", std::to_string(rank), " is less than the ", std::to_string(d.present.size()),
                      " base dimensions that appear (", spoken_list(present), "): ");
  if (d.too_large) return s.append("they appear only in fixed combinations whose exponents exceed 64 bits");
  s.append("every variable's dimension is a product of powers of ").append(spoken_list(spanned));
  if (!combos.empty())
    s.append(cat(", so ", spoken_list(tied), " appear only in the fixed combination", combos.size() == 1 ? " " : "s ",
                 spoken_list(combos)));
  return s;
}

}  // namespace nondim::detail
