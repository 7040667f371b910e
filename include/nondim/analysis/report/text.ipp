#pragma once
// Definitions of text.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <string>
#include <vector>
#include "../../analysis.hpp"
#include "../extraction/explain.hpp"
#include "../extraction/text.hpp"
#include "../names/naming.hpp"
#include "detail/named_relation.hpp"
#include "detail/names.hpp"
#include "detail/rotation.hpp"
#include "detail/table.hpp"
#include "detail/values.hpp"
#include "options.hpp"
#include "text.hpp"

namespace nondim {

NONDIM_ANALYSIS_INLINE std::string text_report(const analysis& a, const report_options& o, text_form form) {
  const bool uni = form == text_form::unicode;
  std::string s;
  if (!o.title.empty()) s += detail::one_line(o.title) + "\n\n";

  const std::vector<std::size_t> bases = a.matrix.present_rows();
  bool any_note = false;
  for (const auto& n : o.notes) any_note = any_note || !n.empty();
  std::vector<std::vector<std::string>> rows;
  std::vector<detail::align> how{detail::align::left, detail::align::left};
  rows.push_back({"variable", "unit"});
  for (std::size_t i : bases) {
    rows[0].emplace_back(dimension_symbol(i, form));
    how.push_back(detail::align::right);
  }
  if (any_note) {
    rows[0].emplace_back("note");
    how.push_back(detail::align::left);
  }
  for (std::size_t j = 0; j < a.variables.size(); ++j) {
    std::vector<std::string> r{display_name(a.variables[j].name, form), detail::one_line(a.variables[j].unit)};
    for (std::size_t i : bases) r.push_back(to_string(a.matrix(i, j)));
    if (any_note) r.push_back(j < o.notes.size() ? detail::one_line(o.notes[j]) : "");
    rows.push_back(std::move(r));
  }
  s += "dimension matrix\n" + detail::aligned_table(rows, how, 2);
  if (bases.empty()) s += "  (every variable is dimensionless)\n";

  s += "rank " + std::to_string(a.rank) + "\n";
  if (a.deficiency.deficient) s += "  " + detail::explain_deficiency(a.rank, a.deficiency, form) + "\n";
  s += "dependent " + display_name(a.dependent, form) + "\n";
  s += "repeating " + detail::comma_list(a.repeating, form) + " (" + a.repeating_origin() + ")\n";

  const std::vector<std::optional<group_value>> values = detail::report_values(a, o);
  s += "groups (" + std::to_string(a.groups.size()) + ")\n";
  for (std::size_t k = 0; k < a.groups.size(); ++k) {
    const std::string label = (uni ? "\u03a0" : "Pi") + std::to_string(k + 1);
    s += "  " + label + " = " + a.groups[k].text(form) + detail::names_suffix(a.groups[k], form, &a.variables) + "\n";
    if (values[k])
      s += "  " + std::string(label.size() - (uni ? 1 : 0), ' ') + "   " + detail::value_sentence(*values[k]) + "\n";
  }

  // the same relation in named groups, when the catalog writes it differently
  if (const std::string line = detail::named_relation(a, form); !line.empty()) s += "in named groups: " + line + "\n";

  if (a.isolated.empty()) {
    s += "excluded: none\n";
  } else {
    s += "excluded (in no group)\n";
    for (std::size_t k = 0; k < a.isolated.size(); ++k)
      s += "  " + display_name(a.isolated[k], form) + ": " +
           (k < a.isolated_reasons.size() ? a.isolated_reasons[k] : std::string{}) + "\n";
  }
  s += detail::svd_line(a.svd) + "\n";
  for (const auto& note : a.notes)
    if (note != a.deficiency.explanation) s += "note: " + note + "\n";
  for (const auto& note : detail::regime_sentences(a, values, form)) s += "note: " + note + "\n";
  for (std::size_t k = 0; k < a.groups.size(); ++k)
    if (const std::string n = detail::hidden_two_pi_note(a, k, (uni ? "\u03a0" : "Pi") + std::to_string(k + 1), form);
        !n.empty())
      s += "note: " + n + "\n";
  if (o.alternatives) {
    if (o.alternatives->empty())
      s += "alternatives: none (no other admissible repeating variables)\n";
    else
      s += "alternatives (other admissible repeating variables, best first by the rule)\n";
    for (std::size_t i = 0; i < o.alternatives->size(); ++i) {
      const analysis& x = (*o.alternatives)[i];
      s += "  " + std::to_string(i + 1) + ". repeating " + detail::comma_list(x.repeating, form) + "\n";
      for (std::size_t k = 0; k < x.groups.size(); ++k)
        s += "     " + std::string(uni ? "\u03a0" : "Pi") + std::to_string(k + 1) + " = " + x.groups[k].text(form) +
             detail::names_suffix(x.groups[k], form) + "\n";
    }
  }
  return s;
}

}  // namespace nondim
