#pragma once
/// \file detail/values.hpp
/// \brief Group values at a design point and regime notes as the views write them.

#include <cmath>
#include <cstddef>
#include <cstdio>
#include <optional>
#include <string>
#include <vector>

#include "../../../analysis.hpp"
#include "../../data/group_value.hpp"
#include "../../data/rounding.hpp"
#include "../../names/regimes.hpp"
#include "../options.hpp"

namespace nondim::detail {

/// The values of the groups at the options' design point (all empty without one).
inline std::vector<std::optional<nondim::group_value>> report_values(const analysis& a, const report_options& o) {
  if (o.point.empty()) return std::vector<std::optional<nondim::group_value>>(a.groups.size());
  return group_values(a, o.point);
}

/// "value 19960, standard uncertainty 410 (2.1 %)" or "value 0.0125".
inline std::string value_sentence(const nondim::group_value& v) {
  const rounded_value r = round_for_report(v.value, v.uncertainty);
  std::string s = "value " + r.value_text;
  if (v.uncertainty) {
    s += ", standard uncertainty " + r.uncertainty_text;
    if (const auto rel = v.relative_uncertainty(); rel && *rel > 0.0) {
      char buffer[32];
      std::snprintf(buffer, sizeof buffer, "%.2g", *rel * 100.0);
      s += std::string(" (") + buffer + " %)";
    }
  }
  return s;
}

/// The named number of a regime note, rounded as its group's value is (the relative
/// uncertainty of x^-1 is that of x, to first order).
inline rounded_value regime_number(const regime_note& n, const nondim::group_value& v) {
  const auto rel = v.relative_uncertainty();
  return round_for_report(n.number, rel ? std::optional<double>(*rel * std::abs(n.number)) : std::nullopt);
}

/// "2300 <= Re < 4000", "Re < 2300", "Re >= 4000".
inline std::string band_text(const regime_note& n) {
  const auto bound = [](double x) { return round_for_report(x).value_text; };
  std::string s;
  if (n.lower > 0.0) s += bound(n.lower) + " <= ";
  s += std::string(n.symbol);
  if (std::isfinite(n.upper)) s += " < " + bound(n.upper);
  if (n.lower > 0.0 && !std::isfinite(n.upper)) s = std::string(n.symbol) + " >= " + bound(n.lower);
  return s;
}

/// "; the threshold 2300 is within two standard uncertainties" when the number's interval of
/// +-2u (k = 2, about 95 % for a normal distribution, GUM 6.2-6.3) holds a bound of its band.
inline std::string near_threshold(const regime_note& n, const nondim::group_value& v) {
  const auto rel = v.relative_uncertainty();
  if (!rel) return {};
  const double reach = 2.0 * *rel * std::abs(n.number);
  const double magnitude = std::abs(n.number);
  if (n.lower > 0.0 && magnitude - n.lower <= reach)
    return "; the threshold " + round_for_report(n.lower).value_text + " is within two standard uncertainties";
  if (std::isfinite(n.upper) && n.upper - magnitude <= reach)
    return "; the threshold " + round_for_report(n.upper).value_text + " is within two standard uncertainties";
  return {};
}

/// One ASCII sentence per regime of every group with a value, in group order:
/// "Π2: Re = 19960: turbulent (Re >= 4000) for flow in a circular pipe, ...; source: ...".
/// `form` picks the group label: Π2 or Pi2.
inline std::vector<std::string> regime_sentences(const analysis& a,
                                                 const std::vector<std::optional<nondim::group_value>>& values,
                                                 text_form form = text_form::ascii) {
  std::vector<std::string> out;
  for (std::size_t k = 0; k < a.groups.size() && k < values.size(); ++k) {
    if (!values[k]) continue;
    for (const regime_note& n : regime_notes(a.groups[k].matches, values[k]->value, a.configuration))
      out.push_back((form == text_form::unicode ? "\u03a0" : "Pi") + std::to_string(k + 1) + ": " +
                    std::string(n.symbol) + " = " + regime_number(n, *values[k]).value_text + ": " +
                    std::string(n.regime) + " (" + band_text(n) + ") for " + std::string(n.configuration) +
                    near_threshold(n, *values[k]) + "; source: " + std::string(n.source));
  }
  return out;
}

}  // namespace nondim::detail
