#pragma once
// Definitions of markdown.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>
#include "../../analysis.hpp"
#include "../../solver/core/detail/cat.hpp"
#include "../extraction/explain.hpp"
#include "detail/named_relation.hpp"
#include "detail/names.hpp"
#include "detail/table.hpp"
#include "detail/values.hpp"
#include "markdown.hpp"
#include "options.hpp"
#include "text.hpp"

namespace nondim {

namespace detail {

/// Text in a Markdown table cell: the characters that would start emphasis, code, links or
/// end the cell are escaped; control characters become spaces.
inline std::string markdown_escape(std::string_view s) {
  std::string out;
  for (const char c : s) {
    if (static_cast<unsigned char>(c) < 0x20U) {
      out.push_back(' ');
      continue;
    }
    if (c == '\\' || c == '*' || c == '_' || c == '|' || c == '`' || c == '<' || c == '>' || c == '[' || c == ']' ||
        c == '#')
      out.push_back('\\');
    out.push_back(c);
  }
  return out;
}

inline std::string markdown_row(const std::vector<std::string>& cells) {
  std::string s = "|";
  for (const auto& c : cells) s += " " + c + " |";
  return s + "\n";
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string markdown_report(const analysis& a, const report_options& o) {
  constexpr text_form form = text_form::unicode;
  std::string s;
  if (!o.title.empty()) s += "## " + detail::markdown_escape(o.title) + "\n\n";

  const std::vector<std::size_t> bases = a.matrix.present_rows();
  bool any_note = false;
  for (const auto& n : o.notes) any_note = any_note || !n.empty();
  std::vector<std::string> head{"variable", "unit"};
  std::vector<std::string> rule{":--", ":--"};
  for (std::size_t i : bases) {
    head.emplace_back(dimension_symbol(i, form));
    rule.emplace_back("--:");
  }
  if (any_note) {
    head.emplace_back("note");
    rule.emplace_back(":--");
  }
  s += detail::markdown_row(head) + detail::markdown_row(rule);
  for (std::size_t j = 0; j < a.variables.size(); ++j) {
    std::vector<std::string> r{detail::markdown_escape(display_name(a.variables[j].name, form)),
                               detail::markdown_escape(a.variables[j].unit)};
    for (std::size_t i : bases) r.push_back(to_string(a.matrix(i, j)));
    if (any_note) r.push_back(j < o.notes.size() ? detail::markdown_escape(o.notes[j]) : "");
    s += detail::markdown_row(r);
  }
  s += "\n";
  s += "**Rank** " + std::to_string(a.rank) + " · **dependent** " +
       detail::markdown_escape(display_name(a.dependent, form)) + " · **repeating** " +
       detail::markdown_escape(detail::comma_list(a.repeating, form)) + " (" + a.repeating_origin() + ")\n\n";
  if (a.deficiency.deficient)
    s += detail::markdown_escape(detail::explain_deficiency(a.rank, a.deficiency, form)) + "\n\n";

  const std::vector<std::optional<group_value>> values = detail::report_values(a, o);
  bool any_value = false;
  bool any_uncertainty = false;
  for (const auto& v : values) {
    any_value = any_value || v.has_value();
    any_uncertainty = any_uncertainty || (v && v->uncertainty);
  }
  std::vector<std::string> group_head{"group", "expression", "recognised as"};
  std::vector<std::string> group_rule{":--", ":--", ":--"};
  if (any_value) {
    group_head.emplace_back("value");
    group_rule.emplace_back("--:");
  }
  if (any_uncertainty) {
    group_head.emplace_back("standard uncertainty");
    group_rule.emplace_back("--:");
  }
  s += detail::markdown_row(group_head) + detail::markdown_row(group_rule);
  for (std::size_t k = 0; k < a.groups.size(); ++k) {
    std::string names;
    for (const auto& m : a.groups[k].matches)
      names +=
          detail::cat(names.empty() ? "" : "; ", m.symbol, detail::exponent_suffix(m.power, form), " (", m.name, ")");
    // without a name, the neutral description of the text report ("ratio of two lengths")
    if (names.empty()) {
      const std::string neutral = detail::neutral_description(a.groups[k], a.variables, form);
      if (neutral.size() > 3) names = neutral.substr(2, neutral.size() - 3);  // " (...)"
    }
    std::vector<std::string> row{"\u03a0" + std::to_string(k + 1), detail::markdown_escape(a.groups[k].text(form)),
                                 names.empty() ? "–" : detail::markdown_escape(names)};
    const rounded_value r = values[k] ? round_for_report(values[k]->value, values[k]->uncertainty) : rounded_value{};
    if (any_value) row.push_back(values[k] ? r.value_text : "–");
    if (any_uncertainty) row.push_back(values[k] && values[k]->uncertainty ? r.uncertainty_text : "–");
    s += detail::markdown_row(row);
  }
  s += "\n";
  // the same relation in named groups, when the catalog writes it differently (as the text report)
  if (const std::string line = detail::named_relation(a, form); !line.empty())
    s += "**In named groups:** " + detail::markdown_escape(line) + "\n\n";

  if (a.isolated.empty()) {
    s += "**Excluded:** none.\n\n";
  } else {
    s += "**Excluded** (in no group):\n\n";
    for (std::size_t k = 0; k < a.isolated.size(); ++k)
      s += "- " + detail::markdown_escape(display_name(a.isolated[k], form)) + ": " +
           detail::markdown_escape(k < a.isolated_reasons.size() ? a.isolated_reasons[k] : std::string{}) + "\n";
    s += "\n";
  }
  s += detail::markdown_escape(detail::svd_line(a.svd)) + "\n";
  for (const auto& note : a.notes)
    if (note != a.deficiency.explanation) s += "\n> **Note:** " + detail::markdown_escape(note) + "\n";
  for (const auto& note : detail::regime_sentences(a, values, form))
    s += "\n> **Note:** " + detail::markdown_escape(note) + "\n";
  if (o.alternatives) {
    if (o.alternatives->empty()) {
      s += "\n**Alternatives:** none (no other admissible repeating variables).\n";
      return s;
    }
    s += "\n**Alternatives** (other admissible repeating variables, best first by the rule):\n\n";
    for (std::size_t i = 0; i < o.alternatives->size(); ++i) {
      const analysis& x = (*o.alternatives)[i];
      s += std::to_string(i + 1) + ". repeating " + detail::markdown_escape(detail::comma_list(x.repeating, form)) +
           "\n";
      for (std::size_t k = 0; k < x.groups.size(); ++k)
        s += "   - \u03a0" + std::to_string(k + 1) + " = " +
             detail::markdown_escape(x.groups[k].text(form) + detail::names_suffix(x.groups[k], form)) + "\n";
    }
  }
  return s;
}

}  // namespace nondim
