#pragma once
// Definitions of report.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <algorithm>
#include <cstddef>
#include <optional>
#include <string>
#include <vector>
#include "../../solver/core/detail/cat.hpp"
#include "../data/rounding.hpp"
#include "detail/text.hpp"
#include "plan.hpp"
#include "report.hpp"

namespace nondim {

namespace detail {

inline std::string cell(const std::optional<double>& x) {
  return x ? format_number(*x) : std::string("-");
}

/// "1.1357 (standard uncertainty 0.0023)" rounded as the GUM asks (7.2.6), as `groups`
/// writes values; "1.13568" without an uncertainty.
inline std::string with_uncertainty(double x, const std::optional<double>& u, const std::string& unit = {}) {
  if (!u) return cat(format_number(x), unit);
  const rounded_value r = round_for_report(x, u);
  return cat(r.value_text, unit, " (standard uncertainty ", r.uncertainty_text, unit, ")");
}

/// Columns padded to their widest cell, two spaces apart, each line indented by two.
inline std::string table(const std::vector<std::vector<std::string>>& rows) {
  std::vector<std::size_t> width;
  for (const auto& r : rows) {
    if (width.size() < r.size()) width.resize(r.size(), 0);
    for (std::size_t c = 0; c < r.size(); ++c) width[c] = std::max(width[c], r[c].size());
  }
  std::string s;
  for (const auto& r : rows) {
    std::string line = "  ";
    for (std::size_t c = 0; c < r.size(); ++c) {
      line += r[c];
      if (c + 1 < r.size()) line.append(width[c] - r[c].size() + 2, ' ');
    }
    s += line;
    s.push_back('\n');
  }
  return s;
}

inline std::string status_line(const similarity_plan& plan) {
  switch (plan.status) {
    case similarity_status::exact:
      return "exact (every group without the dependent variable matches)";
    case similarity_status::partial:
      return "partial (some groups cannot match)";
    case similarity_status::underdetermined: {
      std::string s = "underdetermined (model values still to fix: ";
      for (std::size_t i = 0; i < plan.free.size(); ++i) {
        if (i > 0) s += ", ";
        s += plan.free[i];
      }
      s += ")";
      return s;
    }
  }
  return "unknown";
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string to_text(const similarity_plan& plan) {
  std::string s = detail::cat("Similarity plan: ", detail::status_line(plan), "\n\n");

  s += "Variables (values in each variable's unit)\n";
  std::vector<std::vector<std::string>> rows{
      {"variable", "unit", "prototype", "model", "model/prototype", "model value"}};
  for (const auto& v : plan.variables) {
    std::string source(to_string(v.source));
    if (v.dependent) source += " (dependent)";
    rows.push_back({v.name, v.unit.empty() ? "-" : v.unit, detail::cell(v.prototype), detail::cell(v.model),
                    detail::cell(v.ratio), source});
  }
  s += detail::table(rows);

  s += "\nGroups (dimensionless)\n";
  rows.clear();
  rows.push_back({"#", "group", "prototype", "model", "model/prototype", "matched"});
  for (std::size_t k = 0; k < plan.groups.size(); ++k) {
    const auto& g = plan.groups[k];
    std::string name = g.label.empty() ? g.text : detail::cat(g.label, " = ", g.text);
    std::string matched = g.holds_dependent ? detail::cat("holds ", plan.dependent.name, " (scale-up)")
                                            : std::string(g.matched ? "yes" : "NO");
    if (g.priority) matched += " (priority)";
    rows.push_back({std::to_string(k + 1), name, detail::cell(g.prototype), detail::cell(g.model),
                    detail::cell(g.ratio), matched});
  }
  s += detail::table(rows);

  const auto& dp = plan.dependent;
  s += detail::cat("\nScale-up of ", dp.name, "\n");
  if (dp.rule_group) {
    s += detail::cat("  from group ", std::to_string(*dp.rule_group + 1), ": ", dp.rule);
    if (dp.prototype_over_model)
      s += detail::cat(" = ", detail::with_uncertainty(*dp.prototype_over_model, dp.prototype_over_model_uncertainty));
    s += dp.exact ? " (exact)\n" : " (approximate)\n";
    const auto& dv = plan.variables[dp.index];
    if (dv.model && dv.prototype) {
      const std::string unit = dv.unit.empty() ? std::string{} : detail::cat(" ", dv.unit);
      s += detail::cat("  predicted prototype ", dp.name, " = ",
                       detail::with_uncertainty(*dv.prototype, dv.prototype_uncertainty, unit),
                       " from the measured model value ",
                       detail::with_uncertainty(*dv.model, dv.model_uncertainty, unit), "\n");
    }
    if (dp.prototype_over_model_uncertainty)
      s += "  standard uncertainties (k = 1) by the law of propagation for uncorrelated inputs (GUM, JCGM 100)\n";
    if (!dp.lacking_uncertainty.empty())
      s += detail::cat("  no uncertainty for the factor: ", detail::join(dp.lacking_uncertainty),
                       (dp.lacking_uncertainty.size() == 1 ? " has" : " have"),
                       " none (give 0 for a value taken as exact)\n");
  } else {
    s += "  none\n";
  }
  if (!dp.remark.empty()) s += detail::cat("  ", dp.remark, "\n");

  if (!plan.notes.empty()) {
    s += "\nNotes\n";
    for (const auto& n : plan.notes) s += detail::cat("  - ", n, "\n");
  }

  s += "\nCautions\n";
  s += "  - Matching the groups is necessary, not sufficient: surface roughness, laminar-turbulent transition,\n"
       "    free-surface and compressibility effects, and the instrumentation of a small model can make model\n"
       "    and prototype differ even when every group listed matches.\n";
  if (!plan.unmatched.empty())
    s += detail::cat(
        "  - Partial similarity: ", detail::join(plan.unmatched), plan.unmatched.size() == 1 ? " differs" : " differ",
        " between model and prototype. The effects they govern must be\n"
        "    corrected for separately (for a towed ship model, a skin-friction correction is common practice)\n"
        "    or bounded by tests at more than one scale; the scale-up above does not include them.\n");
  s += "  - Results that set loads or safety margins are reviewed under the applicable local codes and licensed\n"
       "    engineering practice.\n";
  return s;
}

}  // namespace nondim
