#include "fit_data.hpp"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstdio>
#include <optional>
#include <string_view>

#include <nondim/parse.hpp>
#include <nondim/report.hpp>

#include "messages.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {

std::string trimmed(std::string_view s) {
  const auto b = s.find_first_not_of(" \t");
  if (b == std::string_view::npos) return {};
  return std::string(s.substr(b, s.find_last_not_of(" \t") - b + 1));
}

/// "U [ft/s]" -> {"U", "ft/s"}; "D (mm)" -> {"D", "mm"}; "h" -> {"h", ""}.
std::pair<std::string, std::string> split_header(std::string_view cell) {
  const std::string s = trimmed(cell);
  if (!s.empty() && (s.back() == ']' || s.back() == ')')) {
    const char open = s.back() == ']' ? '[' : '(';
    const auto at = s.find(open);
    if (at != std::string::npos && at > 0)
      return {trimmed(std::string_view(s).substr(0, at)),
              trimmed(std::string_view(s).substr(at + 1, s.size() - at - 2))};
  }
  return {s, {}};
}

/// "u(U) [ft/s]" -> {"U", "ft/s"}; "u(D)" -> {"D", ""}: a column of standard uncertainties in
/// the GUM's notation; empty for any other header.
std::optional<std::pair<std::string, std::string>> split_uncertainty_header(std::string_view cell) {
  const std::string s = trimmed(cell);
  if (s.size() < 4 || s[0] != 'u' || s[1] != '(') return std::nullopt;
  const auto close = s.find(')');
  if (close == std::string::npos) return std::nullopt;
  const std::string name = trimmed(std::string_view(s).substr(2, close - 2));
  const std::string rest = trimmed(std::string_view(s).substr(close + 1));
  if (rest.empty()) return std::pair{name, std::string()};
  const auto [empty, unit] = split_header("x " + rest);
  if (empty != "x" || unit.empty()) return std::nullopt;
  return std::pair{name, unit};
}

std::string printed(double x, int digits = 4) {
  if (!std::isfinite(x)) return "-";  // never a NaN in a report
  char buffer[48];
  std::snprintf(buffer, sizeof buffer, "%.*g", digits, x);
  return detail::tidy_exponent(buffer);
}

std::string percent(double share) {
  return printed(100.0 * share, 3) + " %";
}

/// "1/3", "0.4", "-1" as a number.
std::optional<double> exponent_value(std::string_view text) {
  const std::string s = trimmed(text);
  const auto read = [](std::string_view t, double& x) {
    if (!t.empty() && t.front() == '+') t.remove_prefix(1);
    const auto [end, ec] = std::from_chars(t.data(), t.data() + t.size(), x);
    return ec == std::errc() && end == t.data() + t.size() && !t.empty() && std::isfinite(x);
  };
  double a = 0.0;
  const auto slash = s.find('/');
  if (slash == std::string::npos) return read(s, a) ? std::optional<double>(a) : std::nullopt;
  double b = 0.0;
  if (!read(trimmed(std::string_view(s).substr(0, slash)), a) ||
      !read(trimmed(std::string_view(s).substr(slash + 1)), b) || b == 0.0)
    return std::nullopt;
  return a / b;
}

}  // namespace

fit_report fit_from_table(problem_input& in, const csv_numbers& table, const std::vector<std::string>& fixes) {
  fit_report r;
  r.title = in.report.title;
  r.data_path = table.path;
  r.analysis = analyze_input(in);
  const analysis& a = r.analysis;
  const std::size_t n = table.rows();
  r.lines = table.lines;

  // symbols of the groups
  for (std::size_t g = 0; g < a.groups.size(); ++g) {
    const pi_group& group = a.groups[g];
    if (!group.matches.empty() && !group.matches[0].ambiguous) {
      const group_match& m = group.matches[0];
      r.symbols.push_back(power_text(m.symbol, m.power));
      r.symbols_utf8.push_back(r.symbols.back());
      r.symbols_latex.push_back("\\mathrm{" + std::string(m.symbol) + "}" +
                                (m.power == rational{1} ? std::string() : "^{" + to_string(m.power) + "}"));
    } else {
      r.symbols.push_back("Pi" + std::to_string(g + 1));
      r.symbols_utf8.push_back("\u03a0" + std::to_string(g + 1));
      r.symbols_latex.push_back("\\Pi_{" + std::to_string(g + 1) + "}");
    }
  }
  if (a.groups.size() < 2)
    throw input_error(with_prefix((in.file ? in.file->path + ": " : std::string()) + "the problem has " +
                                  std::to_string(a.groups.size()) +
                                  " group(s): a fit needs the dependent group and at least one other"));

  // every variable: a column of the data, or the problem's value
  const std::size_t nv = a.variables.size();
  std::vector<std::optional<std::size_t>> column_of(nv);
  std::vector<double> column_factor(table.header.size(), 1.0);
  std::vector<double> column_offset(table.header.size(), 0.0);
  std::vector<std::optional<std::size_t>> uncertainty_column_of(nv);  // a column u(NAME)
  for (std::size_t c = 0; c < table.header.size(); ++c) {
    const auto uncertainty = split_uncertainty_header(table.header[c]);
    const auto [name, unit] = uncertainty ? *uncertainty : split_header(table.header[c]);
    const std::string where = table.path + ": header, column " + std::to_string(c + 1) + " '" + table.header[c] + "': ";
    const auto v = a.index_of(name);
    if (!v)
      throw input_error(with_prefix(where + "'" + name + "' is not a variable of the problem (its variables: " +
                                    detail::comma_list(a.names()) + ")"));
    auto& slot = uncertainty ? uncertainty_column_of[*v] : column_of[*v];
    if (slot)
      throw input_error(with_prefix(where + "the variable '" + name + "' has " +
                                    (uncertainty ? "an uncertainty column" : "a column") + " already (column " +
                                    std::to_string(*slot + 1) + ")"));
    slot = c;
    const variable& var = a.variables[*v];
    column_factor[c] = var.factor;
    column_offset[c] = var.offset;
    if (!unit.empty()) {
      parsed_unit u;
      try {
        u = parse_unit(unit);
      } catch (const unit_error& e) {
        throw input_error(with_prefix(where + "unit '" + unit + "': " + std::string(bare_message(e))));
      }
      if (u.dim != var.dim)
        throw input_error(with_prefix(where + "the unit " + unit + " has the dimension of " +
                                      si_unit_string(u.dim, text_form::ascii) + ", but '" + name + "' (unit " +
                                      var.unit + ") has that of " + si_unit_string(var.dim, text_form::ascii)));
      column_factor[c] = u.factor;
      column_offset[c] = u.offset;
    }
    if (uncertainty) column_offset[c] = 0.0;  // a width: a scale's zero does not move it (0.5 degC is 0.5 K)
  }

  // ln of every variable, per row or constant
  std::vector<std::vector<double>> ln_column(nv);
  std::vector<double> ln_constant(nv, 0.0);
  for (std::size_t v = 0; v < nv; ++v) {
    const variable& var = a.variables[v];
    bool used = false;
    for (const pi_group& g : a.groups) used = used || g.exponents[v] != 0;
    if (!used) continue;
    if (column_of[v]) {
      const std::size_t c = *column_of[v];
      ln_column[v].resize(n);
      for (std::size_t row = 0; row < n; ++row) {
        const double x = table.columns[c][row];
        const double si = column_factor[c] * x + column_offset[c];
        if (!(si > 0.0) || !std::isfinite(si))
          throw input_error(with_prefix(table.at(row, c) + "the value " + printed(x, 6) +
                                        (si == x ? "" : " (" + printed(si, 6) + " in SI)") +
                                        " is not > 0; the groups are fitted in their logarithms"));
        ln_column[v][row] = std::log(si);
      }
    } else if (const measured_value* m = in.report.point.find(var.name)) {
      if (!(m->value > 0.0))
        throw input_error(with_prefix((in.file ? in.file->path + ": " : std::string()) + "the value of '" + var.name +
                                      "' is " + printed(m->value, 6) +
                                      " in SI; the groups are fitted in their logarithms and need values > 0"));
      ln_constant[v] = std::log(m->value);
    } else {
      throw input_error(with_prefix(table.path + ": no column for the variable '" + var.name +
                                    "', and the problem file gives it no 'value' (name a column '" + var.name + " [" +
                                    var.unit + "]', or give 'value' in the problem file)"));
    }
  }

  // the groups of every row
  r.groups.assign(a.groups.size(), std::vector<double>(n, 0.0));
  for (std::size_t g = 0; g < a.groups.size(); ++g) {
    const pi_group& group = a.groups[g];
    std::vector<double>& out = r.groups[g];
    for (std::size_t v = 0; v < nv; ++v) {
      if (group.exponents[v] == 0) continue;
      const auto e = static_cast<double>(group.exponents[v]);
      if (column_of[v]) {
        for (std::size_t row = 0; row < n; ++row) out[row] += e * ln_column[v][row];
      } else {
        for (double& x : out) x += e * ln_constant[v];
      }
    }
    for (std::size_t row = 0; row < n; ++row) {
      const double value = std::exp(out[row]);
      if (!(value > 0.0) || !std::isfinite(value))
        throw input_error(with_prefix(table.at(row, table.header.size()) + "the group " + r.symbols[g] + " = " +
                                      group.text(text_form::ascii) + " is out of the range of a double"));
      out[row] = value;
    }
  }

  // the fit
  fit_input data;
  data.dependent = {r.symbols[0], r.groups[0]};
  for (std::size_t g = 1; g < a.groups.size(); ++g) data.predictors.push_back({r.symbols[g], r.groups[g]});
  data.fixed.assign(data.predictors.size(), std::nullopt);
  for (const std::string& f : fixes) {
    const auto eq = f.find('=');
    const std::string symbol = trimmed(std::string_view(f).substr(0, eq == std::string::npos ? f.size() : eq));
    const std::optional<double> x =
        eq == std::string::npos ? std::nullopt : exponent_value(std::string_view(f).substr(eq + 1));
    if (!x)
      throw input_error(with_prefix("--fix '" + f + "' is not SYMBOL=EXPONENT (write --fix Pr=1/3 or --fix Pr=0.4)"));
    std::optional<std::size_t> found;
    for (std::size_t g = 0; g < a.groups.size(); ++g)
      if (symbol == r.symbols[g] || symbol == r.symbols_utf8[g] || symbol == "Pi" + std::to_string(g + 1)) found = g;
    if (!found)
      throw input_error(with_prefix("--fix '" + f + "': no group is called '" + symbol +
                                    "' (the groups: " + detail::comma_list(r.symbols) + ")"));
    if (*found == 0)
      throw input_error(
          with_prefix("--fix '" + f + "': " + symbol + " is the dependent group; hold the exponent of another"));
    data.fixed[*found - 1] = *x;
  }
  std::vector<double> relative_u;
  {
    // weights: the relative standard uncertainty of the dependent group from its variables'
    // uncertainties, per row from a column u(NAME) or else from the problem file (GUM eq. 12,
    // uncorrelated inputs)
    const pi_group& dep = a.groups[0];
    bool any = false;
    std::vector<double> sum(n, 0.0);
    for (std::size_t v = 0; v < nv; ++v) {
      if (dep.exponents[v] == 0) continue;
      if (const auto uc = uncertainty_column_of[v]) {
        any = true;
        const auto e = static_cast<double>(dep.exponents[v]);
        const measured_value* m = in.report.point.find(a.variables[v].name);
        for (std::size_t row = 0; row < n; ++row) {
          const double u = column_factor[*uc] * table.columns[*uc][row];
          if (!(u >= 0.0) || !std::isfinite(u))
            throw input_error(with_prefix(table.at(row, *uc) + "the standard uncertainty " +
                                          printed(table.columns[*uc][row], 6) + " is not >= 0"));
          const double x = column_of[v] ? std::exp(ln_column[v][row]) : m->value;
          const double rel = u / x;
          sum[row] += e * e * rel * rel;
        }
        continue;
      }
      const measured_value* m = in.report.point.find(a.variables[v].name);
      if (m == nullptr || !m->uncertainty || *m->uncertainty == 0.0) continue;
      any = true;
      const auto e = static_cast<double>(dep.exponents[v]);
      const file_variable* fv = in.file ? in.file->find(a.variables[v].name) : nullptr;
      const bool relative =
          fv != nullptr && fv->uncertainty && !fv->uncertainty->number && trimmed(fv->uncertainty->text).ends_with('%');
      for (std::size_t row = 0; row < n; ++row) {
        const double x = column_of[v] ? std::exp(ln_column[v][row]) : m->value;
        const double rel = relative ? *m->uncertainty / m->value : *m->uncertainty / x;
        sum[row] += e * e * rel * rel;
      }
    }
    if (any) {
      relative_u.resize(n);
      for (std::size_t row = 0; row < n; ++row) relative_u[row] = std::sqrt(sum[row]);
      data.relative_uncertainty = relative_u;
    }
  }
  try {
    r.result = fit_power_law(data);
  } catch (const fit_error& e) {
    std::string where = table.path + ": ";
    if (e.row() && *e.row() < n) where = table.path + ":" + std::to_string(table.lines[*e.row()]) + ": ";
    throw input_error(with_prefix(where + std::string(bare_message(e))));
  }

  // regimes at the ends of the data's range
  for (std::size_t g = 0; g < a.groups.size(); ++g) {
    const fit_range& range = r.result.ranges[g];
    const auto low = regime_notes(a.groups[g].matches, range.min, a.configuration);
    const auto high = regime_notes(a.groups[g].matches, range.max, a.configuration);
    for (std::size_t i = 0; i < low.size() && i < high.size(); ++i) {
      if (low[i].regime == high[i].regime)
        r.regime_notes.push_back(r.symbols[g] + " " + printed(low[i].number) + " .. " + printed(high[i].number) + ": " +
                                 std::string(low[i].regime) + " throughout (" + std::string(low[i].configuration) +
                                 "; " + std::string(low[i].source) + ")");
      else
        r.regime_notes.push_back(r.symbols[g] + " " + printed(low[i].number) + " .. " + printed(high[i].number) +
                                 ": the data span more than one regime, from " + std::string(low[i].regime) + " to " +
                                 std::string(high[i].regime) + " (" + std::string(low[i].configuration) + "; " +
                                 std::string(low[i].source) + "); one power law may not serve them all");
    }
  }
  return r;
}

namespace {

/// "Nu = C · Re^a · Pr^(1/3)" with the fitted values.
std::string correlation_line(const fit_report& r, bool utf8) {
  const fit_result& f = r.result;
  std::string s = (utf8 ? r.symbols_utf8[0] : r.symbols[0]) + " = " + printed(f.coefficient.value);
  for (const fit_term& t : f.terms)
    s += (utf8 ? " \u00b7 " : " * ") + (utf8 ? r.symbols_utf8[t.column + 1] : r.symbols[t.column + 1]) + "^" +
         printed(t.exponent.value);
  return s;
}

std::string interval(const fit_estimate& e) {
  return "[" + printed(e.low) + ", " + printed(e.high) + "]";
}

std::string estimate_text(const fit_estimate& e) {
  const rounded_value v =
      round_for_report(e.value, e.std_error > 0 ? std::optional<double>(e.std_error) : std::nullopt);
  return v.value_text;
}

}  // namespace

std::string fit_text(const fit_report& r) {
  const fit_result& f = r.result;
  const analysis& a = r.analysis;
  std::string s;
  if (!r.title.empty()) s += r.title + "\n\n";
  s += "data: " + r.data_path + ", " + std::to_string(f.n) + " rows; " +
       (a.form == basis::named ? "named" : "classical") + " basis" +
       (f.weighted ? "; weighted by the uncertainty of " + r.symbols[0] : "") + "\n";
  for (std::size_t g = 0; g < a.groups.size(); ++g)
    s += "  " + r.symbols_utf8[g] + " = " + a.groups[g].text() + (g == 0 ? "   (dependent)" : "") + "\n";
  s += "\nfitted: " + correlation_line(r, true) + "\n\n";
  std::vector<std::vector<std::string>> rows{{"", "estimate", "std. error", "95 % interval"}};
  rows.push_back({"C", estimate_text(f.coefficient), printed(f.coefficient.std_error, 2), interval(f.coefficient)});
  for (const fit_term& t : f.terms)
    rows.push_back({"exponent of " + r.symbols_utf8[t.column + 1],
                    t.fixed ? printed(t.exponent.value) : estimate_text(t.exponent),
                    t.fixed ? "held" : printed(t.exponent.std_error, 2), t.fixed ? "-" : interval(t.exponent)});
  s += detail::aligned_table(rows,
                             {detail::align::left, detail::align::right, detail::align::right, detail::align::left}, 2);
  s += "  Student's t = " + printed(f.t_quantile, 5) + " with " + std::to_string(f.dof) + " degrees of freedom\n";
  for (const fit_constant& c : f.constant)
    s += "\nconstant over the data, not fitted: " + r.symbols_utf8[c.column + 1] + " = " + printed(c.value) +
         " (its power is part of C)\n";
  s += "\nquality: R\u00b2 of the logarithms " + printed(f.r2, 4) +
       "\n  relative deviation (predicted - measured)/measured: RMS " + percent(f.rms_relative) + ", largest " +
       percent(f.max_relative) + " (row " + std::to_string(f.max_relative_row + 1) + ", line " +
       std::to_string(r.lines[f.max_relative_row]) + ")\n  within \u00b110 %: " + percent(f.within_10) +
       ", within \u00b120 %: " + percent(f.within_20) + "\n";

  if (!f.outliers.empty()) {
    s += "\noutliers (|studentised residual| > 3), kept in the fit; check them:\n";
    for (const fit_outlier& o : f.outliers)
      s += "  row " + std::to_string(o.row + 1) + " (line " + std::to_string(r.lines[o.row]) +
           "): studentised residual " + printed(o.studentized, 3) + ", " + r.symbols_utf8[0] + " measured " +
           printed(r.groups[0][o.row]) + "\n";
  }
  s += "\nrange of the data (the correlation holds only inside it; do not extrapolate):\n";
  for (std::size_t g = 0; g < f.ranges.size(); ++g)
    s += "  " + r.symbols_utf8[g] + "  " + printed(f.ranges[g].min) + " .. " + printed(f.ranges[g].max) + "\n";
  for (const std::string& note : r.regime_notes) s += "note: " + note + "\n";
  return s;
}

std::string fit_markdown(const fit_report& r) {
  const fit_result& f = r.result;
  std::string s = "## " + (r.title.empty() ? std::string("Correlation fit") : r.title) + "\n\n";
  s += "Fitted on " + std::to_string(f.n) + " rows of `" + r.data_path + "`: **" + correlation_line(r, true) + "**\n\n";
  s += "| parameter | estimate | std. error | 95 % interval |\n|---|---:|---:|---|\n";
  s += "| C | " + estimate_text(f.coefficient) + " | " + printed(f.coefficient.std_error, 2) + " | " +
       interval(f.coefficient) + " |\n";
  for (const fit_term& t : f.terms)
    s += "| exponent of " + r.symbols_utf8[t.column + 1] + " | " + printed(t.exponent.value) + " | " +
         (t.fixed ? std::string("held") : printed(t.exponent.std_error, 2)) + " | " +
         (t.fixed ? "-" : interval(t.exponent)) + " |\n";
  for (const fit_constant& c : f.constant)
    s += "\nConstant over the data, not fitted: " + r.symbols_utf8[c.column + 1] + " = " + printed(c.value) + ".\n";
  s += "\nR² of the logarithms " + printed(f.r2, 4) + "; RMS relative deviation " + percent(f.rms_relative) +
       ", largest " + percent(f.max_relative) + "; within ±10 %: " + percent(f.within_10) +
       ", within ±20 %: " + percent(f.within_20) + ".\n";
  if (!f.outliers.empty()) {
    s += "\nOutliers (|studentised residual| > 3), kept in the fit:";
    for (const fit_outlier& o : f.outliers)
      s += " row " + std::to_string(o.row + 1) + " (" + printed(o.studentized, 3) + ")";
    s += ".\n";
  }
  s += "\n| group | min | max |\n|---|---:|---:|\n";
  for (std::size_t g = 0; g < f.ranges.size(); ++g)
    s += "| " + r.symbols_utf8[g] + " | " + printed(f.ranges[g].min) + " | " + printed(f.ranges[g].max) + " |\n";
  s += "\nThe correlation holds only inside this range.\n";
  for (const std::string& note : r.regime_notes) s += "\n- " + note;
  if (!r.regime_notes.empty()) s += "\n";
  return s;
}

std::string fit_latex(const fit_report& r) {
  const fit_result& f = r.result;
  std::string s = "\\begin{equation}\n  " + r.symbols_latex[0] + " = " + printed(f.coefficient.value);
  for (const fit_term& t : f.terms)
    s += "\\, " + r.symbols_latex[t.column + 1] + "^{" + printed(t.exponent.value) + "}";
  s += "\n\\end{equation}\n\\begin{tabular}{lrrl}\n  & estimate & std.\\ error & 95\\,\\% interval \\\\\n  \\hline\n";
  s += "  $C$ & " + estimate_text(f.coefficient) + " & " + printed(f.coefficient.std_error, 2) + " & " +
       interval(f.coefficient) + " \\\\\n";
  for (const fit_term& t : f.terms)
    s += "  exponent of $" + r.symbols_latex[t.column + 1] + "$ & " + printed(t.exponent.value) + " & " +
         (t.fixed ? std::string("held") : printed(t.exponent.std_error, 2)) + " & " +
         (t.fixed ? "--" : interval(t.exponent)) + " \\\\\n";
  s += "\\end{tabular}\n\n$R^2$ (logarithms) " + printed(f.r2, 4) + ", RMS relative deviation " +
       printed(100 * f.rms_relative, 3) + "\\,\\%, largest " + printed(100 * f.max_relative, 3) + "\\,\\%, on " +
       std::to_string(f.n) + " rows; valid for ";
  for (std::size_t g = 1; g < f.ranges.size(); ++g)
    s += (g > 1 ? ", " : "") + std::string("$") + printed(f.ranges[g].min) + " \\le " + r.symbols_latex[g] + " \\le " +
         printed(f.ranges[g].max) + "$";
  return s + ".\n";
}

}  // namespace nondim::tool
