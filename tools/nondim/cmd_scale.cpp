/// \file cmd_scale.cpp
/// \brief `nondim scale PROBLEM.toml`: plan a scale-model test. The groups come from the
/// analysis of the file's problem; the prototype values of every variable but the
/// dependent one and the fixed model values come from the file; the plan finds the other
/// model values and the factor that carries the dependent variable to full scale.

#include <memory>
#include <ostream>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>
#include <nondim/analysis/data/rounding.hpp>
#include <nondim/similarity.hpp>

#include "commands.hpp"
#include "json_util.hpp"
#include "messages.hpp"
#include "problem_input.hpp"
#include "scale_notes.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {

struct scale_args {
  std::string file;
  std::string format = "text";
  std::string priority;
  std::string repeating;
  std::string dependent;
  std::string configuration;
};

/// "1,3" -> {0, 2}: group numbers as the text report shows them.
std::vector<std::size_t> group_numbers(const std::string& list, std::size_t count) {
  std::vector<std::size_t> out;
  std::size_t start = 0;
  while (true) {
    const std::size_t comma = list.find(',', start);
    const std::string item = list.substr(start, comma == std::string::npos ? std::string::npos : comma - start);
    std::size_t k = 0;
    bool ok = !item.empty() && item.size() < 6 && item.find_first_not_of("0123456789") == std::string::npos;
    if (ok) k = std::stoul(item);
    if (!ok || k == 0 || k > count)
      throw input_error(with_prefix("--priority '" + list + "': '" + item + "' is not a group number 1.." +
                                    std::to_string(count) + " (the numbers of the groups in the text report)"));
    out.push_back(k - 1);
    if (comma == std::string::npos) break;
    start = comma + 1;
  }
  return out;
}

/// A value rounded to what the computation supports (12 significant digits: a product of
/// inexact doubles does not print as 3999.999999999998), or null.
nlohmann::ordered_json optional_number(const std::optional<double>& x) {
  if (x) return round_for_report(*x).value;
  return nullptr;
}

/// A value with its standard uncertainty, rounded together (GUM 7.2.6), into `j[key]` and
/// `j[key + "_uncertainty"]` (the latter only when there is one).
void put_measured(nlohmann::ordered_json& j, const std::string& key, const std::optional<double>& x,
                  const std::optional<double>& u) {
  if (!x) {
    j[key] = nullptr;
    return;
  }
  const rounded_value r = round_for_report(*x, u);
  j[key] = r.value;
  if (r.uncertainty) j[key + "_uncertainty"] = *r.uncertainty;
}

/// "Re^-1" for a group the catalog names without doubt, "" otherwise: a name only where
/// the evidence supports it (an ambiguous match is left as the product).
std::string group_label(const pi_group& g) {
  for (const auto& m : g.matches)
    if (!m.ambiguous) return std::string(m.symbol) + detail::exponent_suffix(m.power, text_form::ascii);
  return {};
}

nlohmann::ordered_json plan_json(const similarity_plan& plan, const analysis& a) {
  nlohmann::ordered_json j;
  j["status"] = std::string(to_string(plan.status));
  nlohmann::ordered_json model = nlohmann::ordered_json::object();
  for (const auto& v : plan.variables)
    if (v.source == model_source::found && v.model) model[v.name] = round_for_report(*v.model).value;
  j["model"] = model;
  j["free"] = plan.free;
  nlohmann::ordered_json groups = nlohmann::ordered_json::array();
  for (std::size_t k = 0; k < plan.groups.size(); ++k) {
    const group_plan& g = plan.groups[k];
    if (g.holds_dependent) continue;  // carried by "dependent", not matched
    // the non-repeating variable first, then the problem's order, as `groups` writes them
    nlohmann::ordered_json e = nlohmann::ordered_json::object();
    const std::size_t head = k < a.groups.size() ? a.groups[k].non_repeating : 0;
    const auto put = [&](std::size_t i) {
      if (i < g.exponents.size() && i < plan.variables.size() && g.exponents[i] != 0)
        e[plan.variables[i].name] = g.exponents[i];
    };
    put(head);
    for (std::size_t i = 0; i < g.exponents.size(); ++i)
      if (i != head) put(i);
    groups.push_back({{"label", g.label.empty() ? nlohmann::ordered_json(nullptr) : nlohmann::ordered_json(g.label)},
                      {"text", g.text},
                      {"exponents", e},
                      {"prototype", optional_number(g.prototype)},
                      {"model", optional_number(g.model)},
                      {"ratio", optional_number(g.ratio)},
                      {"matched", g.matched}});
  }
  j["groups"] = groups;
  const dependent_plan& dp = plan.dependent;
  const variable_plan& dv = plan.variables[dp.index];
  nlohmann::ordered_json d;
  d["name"] = dp.name;
  d["unit"] = dv.unit;
  put_measured(d, "prototype_over_model", dp.prototype_over_model, dp.prototype_over_model_uncertainty);
  d["exact"] = dp.exact;
  d["rule"] = dp.rule.empty() ? nlohmann::ordered_json(nullptr) : nlohmann::ordered_json(dp.rule);
  put_measured(d, "measured", dv.model, dv.model_uncertainty);
  put_measured(d, "predicted", dv.prototype, dv.prototype_uncertainty);
  j["dependent"] = d;
  j["notes"] = plan.notes;
  // the configuration the regime notes keep to, only when one was chosen (as `groups` writes it)
  if (!a.configuration.empty()) j["configuration"] = a.configuration;
  return j;
}

void run_scale(const scale_args& args, std::ostream& out) {
  if (args.file.empty())
    throw input_error(
        with_prefix("a problem file PROBLEM.toml is required: nondim scale PROBLEM.toml (or --file "
                    "PROBLEM.toml); see nondim scale --help"));
  problem_input in = problem_from_file(args.file);
  if (!args.dependent.empty()) override_dependent(in, args.dependent);
  if (!args.repeating.empty()) override_repeating(in, args.repeating);
  if (!args.configuration.empty()) override_configuration(in, args.configuration);
  const analysis a = analyze_input(in);
  const problem_file& f = *in.file;

  similarity_problem sp;
  for (std::size_t j = 0; j < a.variables.size(); ++j) {
    const variable& v = a.variables[j];
    const file_variable& fv = f.variables[j];
    similarity_variable sv{v.name, v.unit, v.factor, v.offset, fv.prototype, fv.model, v.dim};
    sv.prototype_uncertainty = scale_uncertainty(f, fv.prototype_uncertainty, v, fv.prototype, "prototype_uncertainty");
    sv.model_uncertainty = scale_uncertainty(f, fv.model_uncertainty, v, fv.model, "model_uncertainty");
    sp.add(std::move(sv));
  }
  // A group the catalog names is labelled so ("Fr^-2", "Re^-1"), as `nondim groups` names it.
  for (const auto& g : a.groups) sp.add_group(g.exponents, group_label(g));
  sp.dependent = a.dependent;
  if (!args.priority.empty()) sp.priority = group_numbers(args.priority, a.groups.size());

  similarity_plan plan;
  try {
    plan = plan_similarity(sp);
  } catch (const similarity_error& e) {
    const file_variable* fv = e.variable().empty() ? nullptr : f.find(e.variable());
    throw input_error(with_prefix((fv != nullptr ? f.at(fv->where) : f.path + ": ") + std::string(bare_message(e))));
  }

  // what the groups alone do not show (regimes, compressibility, a rig an order of magnitude away), after the plan's
  // own notes
  for (auto& n : regime_change_notes(plan, a)) plan.notes.push_back(std::move(n));
  for (auto& n : compressibility_notes(plan, a)) plan.notes.push_back(std::move(n));
  for (auto& n : far_setting_notes(plan, a)) plan.notes.push_back(std::move(n));

  if (args.format == "json") {
    out << plan_json(plan, a).dump(2) << '\n';
    return;
  }
  if (!f.title.empty()) out << f.title << "\n\n";
  out << to_text(plan);
}

}  // namespace

subcommand add_scale(CLI::App& app) {
  auto args = std::make_shared<scale_args>();
  CLI::App* sub = app.add_subcommand("scale", "Plan a scale-model test from a problem file");
  // positional or -f/--file, as `groups` and `fit` take a problem file
  sub->add_option("PROBLEM.toml,-f,--file", args->file,
                  "A problem file with the prototype value of every variable but the dependent one, and the model "
                  "values that are fixed");
  sub->add_option("--format", args->format, "Output format")
      ->check(CLI::IsMember({"text", "json"}))
      ->default_str("text");
  sub->add_option("-p,--priority", args->priority,
                  "Groups that must match exactly, by number (1,3); the others match as well as they can");
  sub->add_option("-r,--repeating", args->repeating, "The repeating variables (overrides the file)");
  sub->add_option("-d,--dependent", args->dependent, "The dependent variable (overrides the file)");
  sub->add_option("--configuration", args->configuration, configuration_help());
  sub->footer(
      "A variable with `prototype` and `model` is fixed on the model (the fluid, gravity, the scale);\n"
      "one with `prototype` only is found. The dependent variable needs no prototype value: the plan\n"
      "says how to carry the value measured on the model to full scale. `prototype_uncertainty` and\n"
      "`model_uncertainty` (standard uncertainties: 0.5, \"0.5 K\" or \"2 %\") give the scale-up factor\n"
      "and the predicted value their standard uncertainties (GUM, uncorrelated inputs).\n"
      "Example: nondim scale towed_pod.toml --format json");
  return {sub, [args](std::ostream& out) { run_scale(*args, out); }};
}

}  // namespace nondim::tool
