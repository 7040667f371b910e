#include "scale_notes.hpp"

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdio>
#include <iterator>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include <nondim/analysis/names/regimes.hpp>
#include <nondim/analysis/report/detail/values.hpp>
#include <nondim/analysis/similarity/detail/text.hpp>  // format_number: values as the plan's table writes them

namespace nondim::tool {

namespace {

/// Three significant digits: a regime is read to the nearest band, not to the last digit.
std::string three_digits(double x) {
  char buffer[32];
  std::snprintf(buffer, sizeof buffer, "%.3g", x);
  return detail::tidy_exponent(buffer);
}

std::string regime_phrase(const regime_note& n) {
  return std::string(n.symbol) + " = " + three_digits(n.number) + " is " + std::string(n.regime) + " (" +
         detail::band_text(n) + ")";
}

}  // namespace

std::vector<std::string> regime_change_notes(const similarity_plan& plan, const analysis& a) {
  std::vector<std::string> out;
  for (std::size_t k = 0; k < plan.groups.size() && k < a.groups.size(); ++k) {
    const group_plan& g = plan.groups[k];
    // a matched group is in the prototype's regime by definition (a band edge must not split it by rounding)
    if (g.holds_dependent || g.matched || !g.prototype || !g.model) continue;
    const auto prototype = regime_notes(a.groups[k].matches, *g.prototype, a.configuration);
    const auto model = regime_notes(a.groups[k].matches, *g.model, a.configuration);
    for (std::size_t i = 0; i < prototype.size() && i < model.size(); ++i) {
      if (prototype[i].regime == model[i].regime) continue;
      out.push_back("group " + std::to_string(k + 1) + ": the model leaves the prototype's regime: the model's " +
                    regime_phrase(model[i]) + ", the prototype's " + regime_phrase(prototype[i]) + ", for " +
                    std::string(model[i].configuration) + "; source: " + std::string(model[i].source));
    }
  }
  return out;
}

std::vector<std::string> compressibility_notes(const similarity_plan& plan, const analysis& a) {
  std::vector<std::string> out;
  for (const auto& g : a.groups)
    for (const auto& m : g.matches)
      if (m.symbol == "Ma") return out;  // the problem has a speed of sound: its groups say it
  const dimension velocity = dims::velocity;
  const dimension density = dims::density;
  const dimension temperature = dims::temperature;
  std::optional<std::size_t> thermometer;  // the first temperature with a model value
  for (std::size_t j = 0; j < a.variables.size() && j < plan.variables.size(); ++j) {
    const variable& v = a.variables[j];
    if (v.kind == "speed_of_sound") return out;
    const auto& model = plan.variables[j].model;
    if (!model || plan.variables[j].dependent) continue;
    if (v.dim == density && v.factor * *model > liquid_density) return out;  // a liquid
    if (v.dim == temperature && !thermometer) thermometer = j;
  }
  // the speed of sound of air at the model's (or the prototype's) temperature
  const auto sound_at = [&](bool model) {
    const std::optional<double>& t =
        thermometer ? (model ? plan.variables[*thermometer].model : plan.variables[*thermometer].prototype)
                    : std::optional<double>{};
    const double kelvin = t ? a.variables[*thermometer].factor * *t : room_temperature;
    return std::sqrt(air_gamma * air_gas_constant * kelvin);
  };
  const double sound = sound_at(true);
  const std::string temperature_source =
      thermometer ? "the model's " + a.variables[*thermometer].name + " = " +
                        three_digits(a.variables[*thermometer].factor * *plan.variables[*thermometer].model) + " K"
                  : std::string("20 degC (the problem has no temperature)");
  const regime_rule* mach = nullptr;
  for (const regime_rule& r : regime_table)
    if (r.symbol == "Ma") mach = &r;
  const double limit = mach != nullptr ? mach->bands[0].upper : 0.3;
  for (std::size_t j = 0; j < a.variables.size() && j < plan.variables.size(); ++j) {
    const variable& v = a.variables[j];
    const variable_plan& vp = plan.variables[j];
    if (vp.dependent || !vp.model || v.dim != velocity) continue;
    const double ma = v.factor * *vp.model / sound;
    if (!(ma > limit)) continue;
    std::string s = "the model's " + v.name + " = " + three_digits(*vp.model) + " " + v.unit + " is Mach " +
                    three_digits(ma) + " in air at " + temperature_source + " (speed of sound " + three_digits(sound) +
                    " m/s, sqrt(1.4 * 287.05 J/(kg*K) * T)): above Ma = " + three_digits(limit) +
                    " compressibility matters, and the problem has no speed of sound, so its groups assume an "
                    "incompressible flow";
    if (vp.prototype) {
      const double prototype_ma = v.factor * *vp.prototype / sound_at(false);
      s += prototype_ma > limit ? " (the prototype's " + three_digits(prototype_ma) + " is above it too)"
                                : " (the prototype's is " + three_digits(prototype_ma) + ")";
    }
    if (mach != nullptr) s += "; source: " + std::string(mach->source);
    out.push_back(s);
  }
  return out;
}

std::vector<std::string> far_setting_notes(const similarity_plan& plan, const analysis& a) {
  const dimension settings[] = {dims::velocity, dims::frequency, dims::pressure, dims::temperature};
  std::vector<std::string> out;
  for (std::size_t j = 0; j < plan.variables.size() && j < a.variables.size(); ++j) {
    const variable_plan& v = plan.variables[j];
    if (v.dependent || v.source != model_source::found || !v.ratio || !v.prototype || !v.model) continue;
    if (std::find(std::begin(settings), std::end(settings), a.variables[j].dim) == std::end(settings)) continue;
    const double r = *v.ratio;
    if (!(r >= far_ratio || (r > 0.0 && r <= 1.0 / far_ratio))) continue;
    std::string s = "the model's " + v.name + " = " + detail::format_number(*v.model) + " " + v.unit + " is " +
                    (r >= 1.0 ? three_digits(r) + " times" : "1/" + three_digits(1.0 / r) + " of") +
                    " the prototype's " + detail::format_number(*v.prototype) + " " + v.unit;
    // the groups that fix this value alone: it is their only variable the model does not give
    std::string forcing;
    std::size_t count = 0;
    for (std::size_t k = 0; k < plan.groups.size(); ++k) {
      const group_plan& g = plan.groups[k];
      if (g.holds_dependent || j >= g.exponents.size() || g.exponents[j] == 0) continue;
      bool forces = true;
      for (std::size_t i = 0; i < g.exponents.size() && i < plan.variables.size(); ++i)
        if (i != j && g.exponents[i] != 0 && plan.variables[i].source != model_source::given) forces = false;
      if (!forces) continue;
      forcing += std::string(count++ == 0 ? "" : ", ") + "group " + std::to_string(k + 1) + " (" +
                 (g.label.empty() ? g.text : g.label) + ")";
    }
    if (count > 0) s += ", forced by " + forcing + " with the model's other values given";
    s += "; if the rig cannot reach it, give " + v.name +
         " the model value it can reach: the plan then says which groups no longer match and how the scale-up "
         "is affected (a distorted model)";
    out.push_back(s);
  }
  return out;
}

}  // namespace nondim::tool
