#include "problem_input.hpp"

#include <algorithm>
#include <cmath>
#include <optional>
#include <string_view>
#include <utility>

#include <nondim/analysis/names/quantity_kind.hpp>
#include <nondim/analysis/names/regimes.hpp>
#include <nondim/data.hpp>
#include <nondim/parse.hpp>

#include "messages.hpp"
#include "units_text.hpp"
#include "value_text.hpp"

namespace nondim::tool {

namespace {

/// "nondim: <what>: <parser message>" and the file line with a caret under the fault.
[[noreturn]] void bad_file_unit(const problem_file& f, const file_variable& v, const unit_error& e) {
  std::string m =
      with_prefix(f.at(v.unit_where) + "unit of variable '" + v.name + "': " + std::string(bare_message(e)));
  if (v.unit_literal && v.unit_line_text.size() <= 200)
    m += "\n" + caret_block(v.unit_line_text, v.unit_where.column + e.column() - 1);
  else if (v.unit.size() <= 200)
    m += "\n" + caret_block(v.unit, e.column());
  throw input_error(m);
}

/// The variable already in `p` whose name is written like `name` in reports (`rho` and
/// `ρ` both print as ρ), or empty.
std::string same_symbol_as(const nondim::problem& p, const std::string& name) {
  const std::string shown = display_name(name);
  for (const auto& v : p.variables())
    if (display_name(v.name) == shown) return v.name;
  return {};
}

/// "; the problem takes at most 1000 variables" when `p` is full, else empty.
std::string too_many_variables(const nondim::problem& p) {
  if (p.size() < max_problem_variables) return {};
  return "more than " + std::to_string(max_problem_variables) +
         " variables (the analysis grows as the square of their number; real problems have a few dozen)";
}

/// `p.add`, with any refusal of the library as bad input that says where (`where` ends in
/// ": "): the checks above come first, this keeps a new check of the library from reaching
/// the user as an internal error.
void add_variable(nondim::problem& p, const std::string& name, const std::string& unit, const std::string& where) {
  try {
    p.add(name, unit);
  } catch (const analysis_error& e) {
    throw input_error(with_prefix(where + std::string(bare_message(e))));
  }
}

/// Declares `kind` for the variable just added to `p`, refusing a kind of the catalog whose
/// dimension is not the variable's (`where` ends in ": ").
void declare_kind(nondim::problem& p, const std::string& kind, const std::string& where) {
  if (kind.empty()) return;
  const variable& var = p[p.size() - 1];
  const quantity_kind k = kind_from_key(kind);
  if (k == quantity_kind::unspecified)
    throw input_error(with_prefix(where + "variable '" + var.name + "': '" + kind +
                                  "' is not a kind of the catalog (nondim groups --kinds lists them)"));
  if (kind_info(k).dim != var.dim)
    throw input_error(with_prefix(where + "variable '" + var.name + "' is declared a " +
                                  std::string(kind_info(k).name) + " (" +
                                  si_unit_string(kind_info(k).dim, text_form::ascii) + "), but its unit " + var.unit +
                                  " has the dimension of " + si_unit_string(var.dim, text_form::ascii)));
  p.declare_kind(var.name, kind);
}

/// A number and unit read from a problem-file string: the unit's factor and offset, or the
/// variable's when no unit follows.
struct number_in_unit {
  double number = 0.0;
  double factor = 1.0;
  double offset = 0.0;
};

number_in_unit file_number(const problem_file& f, const file_quantity& q, const variable& var, const std::string& key) {
  const std::string where = f.at(q.where) + "'" + key + "' of variable '" + var.name + "': ";
  if (q.number) return {*q.number, var.factor, var.offset};
  try {
    const auto [x, rest] = leading_number(q.text, key == "value" ? "the value" : "the uncertainty");
    std::string_view unit = rest;
    while (!unit.empty() && (unit.front() == ' ' || unit.front() == '\t')) unit.remove_prefix(1);
    while (!unit.empty() && (unit.back() == ' ' || unit.back() == '\t')) unit.remove_suffix(1);
    if (unit.empty()) return {x, var.factor, var.offset};
    parsed_unit u;
    try {
      u = parse_unit(unit);
    } catch (const unit_error& e) {
      throw input_error(with_prefix(where + "unit '" + std::string(unit) + "': " + std::string(bare_message(e))));
    }
    if (u.dim != var.dim)
      throw input_error(with_prefix(where + "'" + q.text + "' has the dimension of " +
                                    si_unit_string(u.dim, text_form::ascii) + ", but the variable's unit " + var.unit +
                                    " has that of " + si_unit_string(var.dim, text_form::ascii)));
    return {x, u.factor, u.offset};
  } catch (const value_text_error& e) {
    throw input_error(with_prefix(where + e.what()));
  }
}

/// The design-point value of `var` from its `value` and `uncertainty` keys.
measured_value file_measured(const problem_file& f, const file_variable& fv, const variable& var) {
  const number_in_unit v = file_number(f, *fv.value, var, "value");
  measured_value m{v.factor * v.number + v.offset, std::nullopt};
  if (fv.uncertainty) {
    const file_quantity& q = *fv.uncertainty;
    const std::string where = f.at(q.where) + "'uncertainty' of variable '" + var.name + "': ";
    std::string_view text = q.text;
    while (!text.empty() && (text.back() == ' ' || text.back() == '\t')) text.remove_suffix(1);
    if (q.number == std::nullopt && !text.empty() && text.back() == '%') {
      double percent = 0.0;
      try {
        const auto [x, rest] = leading_number(text.substr(0, text.size() - 1), "the per cent");
        if (rest.find_first_not_of(" \t") != std::string_view::npos)
          throw value_text_error("'" + q.text + "' is not a per cent (write \"2 %\")");
        percent = x;
      } catch (const value_text_error& e) {
        throw input_error(with_prefix(where + e.what()));
      }
      if (v.offset != 0.0)
        throw input_error(with_prefix(where + "a per cent of a value on a scale with a relative zero (" + var.unit +
                                      ") means nothing; give the uncertainty in the unit (\"0.5\")"));
      if (percent < 0.0) throw input_error(with_prefix(where + "'" + q.text + "' is negative"));
      m.uncertainty = std::abs(v.number) * percent / 100.0 * v.factor;
    } else {
      const number_in_unit u = file_number(f, q, var, "uncertainty");
      if (u.number < 0.0)
        throw input_error(with_prefix(where + "a standard uncertainty is >= 0, not " +
                                      (q.number ? round_for_report(*q.number).value_text : q.text)));
      m.uncertainty = u.number * u.factor;  // a width: the scale's zero does not move it
    }
  }
  try {
    design_point check;
    check.set(var.name, m);
  } catch (const analysis_error& e) {
    throw input_error(with_prefix(f.at(fv.value->where) + std::string(bare_message(e))));
  }
  return m;
}

std::string trim(std::string_view s) {
  const auto b = s.find_first_not_of(" \t");
  if (b == std::string_view::npos) return {};
  const auto e = s.find_last_not_of(" \t");
  return std::string(s.substr(b, e - b + 1));
}

}  // namespace

problem_input problem_from_arguments(const std::vector<std::string>& args) {
  problem_input in;
  if (args.empty())
    throw input_error(
        with_prefix("no variables: give them as NAME=UNIT (F=N rho=kg/m^3 ...) or with --file PROBLEM.toml"));
  std::size_t index = 0;
  for (const std::string& a : args) {
    ++index;
    const std::string where = "argument " + std::to_string(index) + " '" + a + "'";
    const auto eq = a.find('=');
    if (eq == std::string::npos && a.size() > 5 && a.ends_with(".toml"))  // a problem file given without --file
      throw input_error(with_prefix(where + " is not NAME=UNIT; to read a problem file, write --file " + a));
    if (eq == std::string::npos)
      throw input_error(
          with_prefix(where + " is not NAME=UNIT (write, for example, rho=kg/m^3; U=1 for a pure number)"));
    std::string name = a.substr(0, eq);
    std::string kind;  // NAME:KIND=UNIT declares a kind
    if (const auto colon = name.find(':'); colon != std::string::npos) {
      kind = name.substr(colon + 1);
      name.erase(colon);
      if (kind.empty())
        throw input_error(
            with_prefix(where + ": an empty kind after ':' (write, for example, lambda:mean_free_path=m)"));
    }
    std::string unit = a.substr(eq + 1);
    std::optional<value_text> value;
    try {
      value = read_value_argument(unit);
    } catch (const value_text_error& e) {
      throw input_error(with_prefix(where + ": variable '" + name + "': " + e.what()));
    }
    if (value) unit = value->unit;
    if (const auto why = bad_variable_name(name)) throw input_error(with_prefix(where + ": " + *why));
    if (in.problem.index_of(name))
      throw input_error(with_prefix(where + ": the variable '" + name + "' is given twice"));
    if (const std::string other = same_symbol_as(in.problem, name); !other.empty())
      throw input_error(with_prefix(where + ": the variables '" + other + "' and '" + name + "' are both written " +
                                    display_name(name) + " in the groups; rename one"));
    if (const std::string why = too_many_variables(in.problem); !why.empty())
      throw input_error(with_prefix(where + ": " + why));
    try {
      (void)parse_unit(unit);
    } catch (const unit_error& e) {
      std::string m = with_prefix(where + ": unit of '" + name + "': " + std::string(bare_message(e)));
      const std::size_t unit_at = value ? a.rfind(unit) : eq + 1;
      if (a.size() <= 200 && unit_at != std::string::npos)
        m += "\n" + caret_block(a, code_points(std::string_view(a).substr(0, unit_at)) + e.column());
      throw input_error(m);
    }
    add_variable(in.problem, name, unit, where + ": ");
    declare_kind(in.problem, kind, where + ": ");
    in.report.notes.emplace_back();
    if (value) {
      const variable& var = in.problem[in.problem.size() - 1];
      try {
        in.report.point.set(var.name, value->percent ? in_si_relative(var, value->value, *value->uncertainty)
                                                     : in_si(var, value->value, value->uncertainty));
      } catch (const analysis_error& e) {
        throw input_error(with_prefix(where + ": " + std::string(bare_message(e))));
      }
    }
  }
  return in;
}

problem_input problem_from_file(const std::string& path) {
  return problem_from_loaded(load_problem_file(path));
}

problem_input problem_from_loaded(problem_file loaded) {
  problem_input in;
  in.file = std::move(loaded);
  const problem_file& f = *in.file;
  for (const file_variable& v : f.variables) {
    const std::string line = f.at(v.where);
    if (const std::string other = same_symbol_as(in.problem, v.name); !other.empty())
      throw input_error(with_prefix(line + "the variables '" + other + "' and '" + v.name + "' are both written " +
                                    display_name(v.name) + " in the groups; rename one"));
    if (const std::string why = too_many_variables(in.problem); !why.empty())
      throw input_error(with_prefix(line + "variable '" + v.name + "': " + why));
    try {
      (void)parse_unit(v.unit);
    } catch (const unit_error& e) {
      bad_file_unit(f, v, e);
    }
    add_variable(in.problem, v.name, v.unit, line);
    declare_kind(in.problem, v.kind, f.at(v.kind_where));
    in.report.notes.push_back(v.note);
    if (v.value) {
      const variable& var = in.problem[in.problem.size() - 1];
      in.report.point.set(var.name, file_measured(f, v, var));
    }
  }
  in.report.title = f.title;
  in.options.dependent = f.dependent;
  in.dependent_source = f.at(f.dependent_where) + "'dependent'";
  in.options.repeating = f.repeating;
  in.repeating_source = f.at(f.repeating_where) + "'repeating'";
  in.options.configuration = f.configuration;
  return in;
}

std::string configuration_help() {
  return "The flow configuration whose regime thresholds the notes use (overrides the file's configuration): " +
         regime_configuration_list() + "; default: the usual ones for each number";
}

void override_configuration(problem_input& in, const std::string& key) {
  const std::string k = trim(key);
  if (!is_regime_configuration(k))
    throw input_error(with_prefix("--configuration '" + k + "' is not a configuration of the regime table (accepted: " +
                                  regime_configuration_list() + ")"));
  in.options.configuration = k;
}

std::optional<double> scale_uncertainty(const problem_file& f, const std::optional<file_quantity>& q,
                                        const variable& var, const std::optional<double>& x, const std::string& key) {
  if (!q || !x) return std::nullopt;
  const std::string where = f.at(q->where) + "'" + key + "' of variable '" + var.name + "': ";
  std::string_view text = q->text;
  while (!text.empty() && (text.back() == ' ' || text.back() == '\t')) text.remove_suffix(1);
  double u = 0.0;
  if (!q->number && !text.empty() && text.back() == '%') {
    try {
      const auto [percent, rest] = leading_number(text.substr(0, text.size() - 1), "the per cent");
      if (rest.find_first_not_of(" \t") != std::string_view::npos)
        throw value_text_error("'" + q->text + "' is not a per cent (write \"2 %\")");
      u = std::abs(*x) * percent / 100.0;
    } catch (const value_text_error& e) {
      throw input_error(with_prefix(where + e.what()));
    }
  } else {
    const number_in_unit n = file_number(f, *q, var, "uncertainty");
    u = n.number * n.factor / var.factor;  // a width: in the variable's unit, no offset
  }
  if (!(std::isfinite(u) && u >= 0.0))
    throw input_error(with_prefix(where + "a standard uncertainty is a finite number >= 0, not " +
                                  (q->number ? round_for_report(*q->number).value_text : q->text)));
  return u;
}

void override_dependent(problem_input& in, const std::string& name) {
  in.options.dependent = trim(name);
  in.dependent_source = "--dependent";
  if (in.options.dependent.empty()) throw input_error(with_prefix("--dependent: the name is empty"));
}

void override_repeating(problem_input& in, const std::string& list) {
  in.options.repeating.clear();
  in.repeating_source = "--repeating";
  std::size_t start = 0;
  while (true) {
    const std::size_t comma = list.find(',', start);
    const std::string item =
        trim(std::string_view(list).substr(start, comma == std::string::npos ? std::string::npos : comma - start));
    if (item.empty())
      throw input_error(
          with_prefix("--repeating '" + list + "': an empty name in the list (write --repeating rho,U,D)"));
    in.options.repeating.push_back(item);
    if (comma == std::string::npos) break;
    start = comma + 1;
  }
}

nondim::analysis analyze_input(const problem_input& in) {
  try {
    return analyze(in.problem, in.options);
  } catch (const analysis_error& e) {
    const std::string& v = e.variable();
    std::string where;
    if (!v.empty() && v == in.options.dependent && !in.problem.index_of(v)) {
      where = in.dependent_source + ": ";
    } else if (!in.options.repeating.empty() &&
               (v.empty() ||
                std::find(in.options.repeating.begin(), in.options.repeating.end(), v) != in.options.repeating.end())) {
      where = in.repeating_source + ": ";
    } else if (in.file) {
      where = in.file->path + ": ";
    }
    std::string hint;  // `ρ` given for a variable named `rho`, or the other way round
    if (!v.empty() && !in.problem.index_of(v))
      if (const std::string other = same_symbol_as(in.problem, v); !other.empty())
        hint = " (did you mean '" + other + "'?)";
    throw input_error(with_prefix(where + std::string(bare_message(e)) + hint));
  }
}

}  // namespace nondim::tool
