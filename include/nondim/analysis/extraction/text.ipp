#pragma once
// Definitions of text.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <ostream>
#include <string>
#include <string_view>
#include <vector>
#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/dims.hpp"
#include "../../solver/core/format.hpp"
#include "analyze.hpp"
#include "explain.hpp"
#include "result.hpp"
#include "symbols.hpp"
#include "text.hpp"

namespace nondim {

namespace detail {

inline std::string pad_left(const std::string& s, std::size_t width) {
  const std::size_t w = display_width(s);
  return w >= width ? s : std::string(width - w, ' ').append(s);
}

inline std::string short_double(double v) {
  char buf[32];
  std::snprintf(buf, sizeof buf, "%.6g", v);
  return buf;
}

/// "lengths", "velocities": the plural of the quantity a dimension is most often, or empty.
inline std::string_view quantity_plural(const dimension& d) {
  struct entry {
    dimension dim;
    std::string_view plural;
  };
  static constexpr std::array<entry, 17> table{{{dims::length, "lengths"},
                                                {dims::velocity, "velocities"},
                                                {dims::time, "times"},
                                                {dims::mass, "masses"},
                                                {dims::temperature, "temperatures"},
                                                {dims::density, "densities"},
                                                {dims::pressure, "pressures or stresses"},
                                                {dims::dynamic_viscosity, "dynamic viscosities"},
                                                {dims::kinematic_viscosity, "diffusivities or kinematic viscosities"},
                                                {dims::force, "forces"},
                                                {dims::power, "powers or heat rates"},
                                                {dims::energy, "energies or torques"},
                                                {dims::area, "areas"},
                                                {dims::volume, "volumes"},
                                                {dims::frequency, "rates or frequencies"},
                                                {dims::acceleration, "accelerations"},
                                                {dims::volume_flow_rate, "volume flow rates"}}};
  for (const auto& e : table)
    if (e.dim == d) return e.plural;
  return {};
}

/// " (ratio of two lengths)" for a group of two variables of one dimension that no catalog
/// entry names (DESIGN.md, "Rules for the groups": a neutral description where the
/// evidence for a name is missing); empty otherwise.
inline std::string neutral_description(const pi_group& g, const std::vector<variable>& vars, text_form form) {
  if (!g.matches.empty() || g.exponents.size() != vars.size()) return {};
  std::size_t first = vars.size();
  std::size_t second = vars.size();
  for (std::size_t i = 0; i < g.exponents.size(); ++i) {
    if (g.exponents[i] == 0) continue;
    if (first == vars.size())
      first = i;
    else if (second == vars.size())
      second = i;
    else
      return {};
  }
  if (second == vars.size() || !(vars[first].dim == vars[second].dim)) return {};
  if (g.exponents[first] != -g.exponents[second] || vars[first].dim == dims::dimensionless) return {};
  const std::string_view plural = quantity_plural(vars[first].dim);
  const std::string what =
      plural.empty() ? cat("quantities of dimension ", to_string(vars[first].dim, form)) : std::string(plural);
  const std::int64_t e = g.exponents[first] < 0 ? -g.exponents[first] : g.exponents[first];
  return e == 1 ? cat(" (ratio of two ", what, ")") : cat(" (a power of the ratio of two ", what, ")");
}

/// " = Re⁻¹ (Reynolds number)" for the best match; other entries of the same form follow
/// as "; same form: C_L (lift coefficient)", not chained with "=": Nu and Bi share a form
/// but are not equal. Without a match, the neutral description when `vars` is given.
inline std::string names_suffix(const pi_group& g, text_form form, const std::vector<variable>* vars = nullptr) {
  if (g.matches.empty() && vars != nullptr) return neutral_description(g, *vars, form);
  std::string s;
  for (std::size_t k = 0; k < g.matches.size(); ++k) {
    const auto& m = g.matches[k];
    s.append(k == 0   ? " = "
             : k == 1 ? "; same form: "
                      : ", ")
        .append(m.symbol)
        .append(exponent_suffix(m.power, form))
        .append(" (")
        .append(m.name)
        .append(")");
  }
  return s;
}

/// "SVD check: rank 3, agrees with the exact rank; singular values 3.74, 2.8, 0.369 (2 more
/// below the tolerance 1.7e-15); max residual 0". Values below the tolerance are rounding
/// noise and are only counted.
inline std::string svd_line(const svd_check& c) {
  std::string s = "SVD check: rank " + std::to_string(c.rank) + (c.agrees ? ", agrees" : ", DISAGREES") +
                  " with the exact rank; singular values";
  std::size_t shown = 0;
  std::size_t below = 0;
  for (const double v : c.singular_values) {
    if (v > c.tolerance) {
      s += (shown++ ? ", " : " ") + short_double(v);
    } else {
      ++below;
    }
  }
  if (shown == 0) s += " none above the tolerance";
  if (below != 0) s += " (" + std::to_string(below) + " more below the tolerance " + short_double(c.tolerance) + ")";
  return s + "; max residual " + short_double(c.max_residual);
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string relation(const analysis& a, text_form form) {
  const auto d = a.index_of(a.dependent);
  if (!d || a.groups.empty() || a.missing_variable || a.is_repeating(a.dependent)) return {};
  if (a.groups.front().exponents.size() <= *d || a.groups.front().exponents[*d] == 0) return {};
  const auto written = [form](const pi_group& g) {
    if (g.matches.empty()) return g.text(form);
    return std::string(g.matches.front().symbol) + detail::exponent_suffix(g.matches.front().power, form);
  };
  std::string s = written(a.groups.front()) + " = f(";
  for (std::size_t k = 1; k < a.groups.size(); ++k) s += (k > 1 ? ", " : "") + written(a.groups[k]);
  return s + ")";
}

NONDIM_ANALYSIS_INLINE std::string to_string(const analysis& a, text_form form) {
  const bool uni = form == text_form::unicode;
  std::string s = "dimension matrix\n";
  const std::size_t n = a.variables.size();
  std::vector<std::string> head(n);
  std::vector<std::vector<std::string>> cells(n);
  std::vector<std::size_t> width(n, 0);
  const std::vector<std::size_t> rows = a.matrix.present_rows();
  for (std::size_t j = 0; j < n; ++j) {
    head[j] = display_name(a.variables[j].name, form);
    width[j] = detail::display_width(head[j]);
    for (std::size_t i : rows) {
      cells[j].push_back(to_string(a.matrix(i, j)));
      width[j] = std::max(width[j], detail::display_width(cells[j].back()));
    }
  }
  std::size_t label = 1;
  for (std::size_t i : rows) label = std::max(label, detail::display_width(dimension_symbol(i, form)));
  using detail::cat;
  s.append(label + 2, ' ');
  for (std::size_t j = 0; j < n; ++j) s.append("  ").append(detail::pad_left(head[j], width[j]));
  s.push_back('\n');
  for (std::size_t r = 0; r < rows.size(); ++r) {
    s.append("  ").append(detail::pad_left(std::string(dimension_symbol(rows[r], form)), label));
    for (std::size_t j = 0; j < n; ++j) s.append("  ").append(detail::pad_left(cells[j][r], width[j]));
    s.push_back('\n');
  }
  if (rows.empty()) s.append("  (every variable is dimensionless)\n");

  s.append(cat("rank ", std::to_string(a.rank), "\n"));
  if (a.deficiency.deficient) s.append(cat("  ", detail::explain_deficiency(a.rank, a.deficiency, form), "\n"));
  s.append(cat("dependent ", display_name(a.dependent, form), "\n"));
  s.append("repeating ");
  for (std::size_t k = 0; k < a.repeating.size(); ++k)
    s.append(k ? ", " : "").append(display_name(a.repeating[k], form));
  if (a.repeating.empty()) s.append("none");
  s.append(" (" + a.repeating_origin() + ")\n");

  s.append(cat("groups (", std::to_string(a.groups.size()), ")\n"));
  for (std::size_t k = 0; k < a.groups.size(); ++k)
    s.append(cat("  ", uni ? "\u03c0" : "pi", std::to_string(k + 1), " = ", a.groups[k].text(form),
                 detail::names_suffix(a.groups[k], form, &a.variables), "\n"));

  if (a.isolated.empty()) {
    s.append("isolated: none\n");
  } else {
    s.append("isolated\n");
    for (std::size_t k = 0; k < a.isolated.size(); ++k) {
      const auto j = a.index_of(a.isolated[k]);
      const std::string reason =
          j ? detail::isolation_reason(a.variables, *j, a.isolated[k] == a.dependent, form) : a.isolated_reasons[k];
      s.append(cat("  ", display_name(a.isolated[k], form), ": ", reason, "\n"));
    }
  }

  s.append(detail::svd_line(a.svd)).push_back('\n');
  for (const auto& note : a.notes)
    if (note != a.deficiency.explanation) s.append(cat("note: ", note, "\n"));
  return s;
}

}  // namespace nondim
