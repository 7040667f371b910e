#pragma once
// Definitions of json.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <string>
#include <string_view>
#include <utility>
#include <vector>
#include "../../analysis.hpp"
#include "detail/json.hpp"
#include "detail/values.hpp"
#include "json.hpp"
#include "latex.hpp"

namespace nondim {

namespace detail {

inline json_value json_exponent(const rational& r) {
  if (r.is_integer()) return json_value(r.num);
  return json_value(to_string(r));
}

/// {"L": 1, "T": -2}: keys are the ASCII base-dimension symbols (L M T I Theta N J).
inline json_value json_dimension(const dimension& d) {
  json_members m;
  for (std::size_t i = 0; i < base_dimension_count; ++i)
    if (!d[i].is_zero()) m.emplace_back(std::string(dimension_symbol(i, text_form::ascii)), json_exponent(d[i]));
  return m;
}

inline json_value json_group(const pi_group& g, const std::optional<nondim::group_value>& value = std::nullopt,
                             std::string_view configuration = {}) {
  json_members exponents;
  // the non-repeating variable first, then the problem's order: as the text form reads
  const auto put = [&](std::size_t i) {
    if (i < g.exponents.size() && i < g.variables().size() && g.exponents[i] != 0)
      exponents.emplace_back(g.variables()[i], json_value(g.exponents[i]));
  };
  put(g.non_repeating);
  for (std::size_t i = 0; i < g.exponents.size(); ++i)
    if (i != g.non_repeating) put(i);
  json_elements matches;
  for (const auto& m : g.matches)
    matches.emplace_back(json_members{
        {"name", std::string(m.name)}, {"symbol", std::string(m.symbol)}, {"power", json_exponent(m.power)}});
  json_members out{{"exponents", std::move(exponents)},
                   {"text", g.text(text_form::ascii)},
                   {"latex", latex(g)},
                   {"matches", std::move(matches)}};
  if (value) {
    const rounded_value r = round_for_report(value->value, value->uncertainty);
    out.emplace_back("value", r.value);
    if (r.uncertainty) out.emplace_back("uncertainty", *r.uncertainty);
    json_elements regimes;
    for (const regime_note& n : regime_notes(g.matches, value->value, configuration))
      regimes.emplace_back(json_members{{"symbol", std::string(n.symbol)},
                                        {"number", regime_number(n, *value).value},
                                        {"regime", std::string(n.regime)},
                                        {"bounds", band_text(n)},
                                        {"configuration", std::string(n.configuration)},
                                        {"source", std::string(n.source)}});
    if (!regimes.empty()) out.emplace_back("regimes", std::move(regimes));
  }
  return out;
}

}  // namespace detail

namespace detail {

/// The members of the `json_report` object, in order.
inline json_members json_report_members(const analysis& a, const report_options& o = {}) {
  json_elements variables;
  for (const auto& v : a.variables) {
    json_members m{{"name", v.name}, {"unit", v.unit}, {"dimension", json_dimension(v.dim)}};
    // a declared kind, in its identifier spelling ("mean free path" is written mean_free_path)
    if (const quantity_kind k = kind_from_key(v.kind); k != quantity_kind::unspecified)
      m.emplace_back("kind", std::string(kind_info(k).id));
    variables.emplace_back(std::move(m));
  }
  json_elements repeating;
  for (const auto& r : a.repeating) repeating.emplace_back(r);
  json_elements groups;
  const std::vector<std::optional<nondim::group_value>> values = report_values(a, o);
  for (std::size_t k = 0; k < a.groups.size(); ++k)
    groups.push_back(json_group(a.groups[k], values[k], a.configuration));
  json_elements singular;
  for (const double v : a.svd.singular_values) singular.emplace_back(v);
  json_elements isolated;
  for (std::size_t k = 0; k < a.isolated.size(); ++k)
    isolated.emplace_back(json_members{
        {"name", a.isolated[k]}, {"reason", k < a.isolated_reasons.size() ? a.isolated_reasons[k] : std::string()}});
  json_members out{{"title", o.title},
                   {"variables", std::move(variables)},
                   {"rank", a.rank},
                   {"rank_explanation", a.deficiency.explanation},
                   {"dependent", a.dependent},
                   {"basis", std::string(a.form == basis::named ? "named" : "classical")},
                   {"repeating", std::move(repeating)},
                   {"repeating_origin", a.repeating_origin()},
                   {"groups", std::move(groups)},
                   {"isolated", std::move(isolated)},
                   {"svd_check", json_members{{"rank", a.svd.rank},
                                              {"agrees", a.svd.agrees},
                                              {"singular_values", std::move(singular)},
                                              {"max_residual", a.svd.max_residual}}}};
  // the configuration the regime notes keep to, only when one was chosen (as `alternatives`)
  if (!a.configuration.empty()) out.emplace_back("configuration", a.configuration);
  if (o.alternatives) {
    json_elements alts;
    for (const analysis& x : *o.alternatives) {
      json_elements rep;
      for (const auto& r : x.repeating) rep.emplace_back(r);
      json_elements gs;
      for (const auto& g : x.groups) gs.push_back(json_group(g));
      alts.emplace_back(json_members{{"repeating", std::move(rep)}, {"groups", std::move(gs)}});
    }
    out.emplace_back("alternatives", std::move(alts));
  }
  return out;
}

inline std::string json_text(const json_value& root) {
  std::string out;
  write_json_pretty(out, root, 0, 0);
  out.push_back('\n');
  return out;
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string json_report(const analysis& a, const report_options& o) {
  return detail::json_text(detail::json_report_members(a, o));
}

}  // namespace nondim
