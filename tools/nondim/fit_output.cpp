/// \file fit_output.cpp
/// \brief The JSON view of a fit (keys fixed by DESIGN.md) and its plot with gnuplot.

#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <string>
#include <vector>

#include <nlohmann/json.hpp>

#include "fit_data.hpp"
#include "messages.hpp"

// POSIX last: <sys/wait.h> defines macros (si_value) that clash with names in nondim's headers
#include <sys/wait.h>
#include <unistd.h>

namespace nondim::tool {

namespace {

using json = nlohmann::ordered_json;

/// A finite number, or null: a report never holds a NaN.
json number(double x) {
  return std::isfinite(x) ? json(x) : json(nullptr);
}

json exponents_of(const pi_group& g) {
  json e = json::object();
  const auto put = [&](std::size_t i) {
    if (i < g.exponents.size() && g.exponents[i] != 0) e[g.variables()[i]] = g.exponents[i];
  };
  put(g.non_repeating);
  for (std::size_t i = 0; i < g.exponents.size(); ++i)
    if (i != g.non_repeating) put(i);
  return e;
}

std::string gnuplot_number(double x) {
  char buffer[40];
  std::snprintf(buffer, sizeof buffer, "%.10g", x);
  return buffer;
}

/// Enhanced-text label: "Nu", "Π_2"; a power's caret is gnuplot's superscript.
std::string label(const std::string& utf8_symbol) {
  std::string s;
  for (const char c : utf8_symbol) {
    if (c == '^')
      s += "^{";
    else
      s.push_back(c);
  }
  if (s.find("^{") != std::string::npos) s += "}";
  if (s.rfind("\u03a0", 0) == 0) s.insert(2, "_");
  return s;
}

std::string quoted(const std::string& s) {
  std::string out = "'";
  for (const char c : s) out += c == '\'' ? std::string("''") : std::string(1, c);
  return out + "'";
}

/// The gnuplot executable: $NONDIM_GNUPLOT, else `gnuplot` on the PATH; empty when none.
std::string find_gnuplot() {
  if (const char* given = std::getenv("NONDIM_GNUPLOT"); given != nullptr)
    return ::access(given, X_OK) == 0 ? std::string(given) : std::string();
  const char* path = std::getenv("PATH");
  std::string dirs = path != nullptr ? path : "/usr/bin:/bin";
  std::size_t start = 0;
  while (start <= dirs.size()) {
    const std::size_t end = std::min(dirs.find(':', start), dirs.size());
    const std::string candidate = (end > start ? dirs.substr(start, end - start) : std::string(".")) + "/gnuplot";
    if (::access(candidate.c_str(), X_OK) == 0) return candidate;
    start = end + 1;
  }
  return {};
}

}  // namespace

std::string fit_json(const fit_report& r) {
  const fit_result& f = r.result;
  const analysis& a = r.analysis;
  json j;
  j["basis"] = a.form == basis::named ? "named" : "classical";
  j["n"] = f.n;
  j["dependent"] = {{"exponents", exponents_of(a.groups[0])}, {"symbol", r.symbols[0]}};
  j["coefficient"] = {{"value", number(f.coefficient.value)},
                      {"std_error", number(f.coefficient.std_error)},
                      {"ci95", json::array({number(f.coefficient.low), number(f.coefficient.high)})}};
  json terms = json::array();
  for (const fit_term& t : f.terms)
    terms.push_back({{"exponents", exponents_of(a.groups[t.column + 1])},
                     {"symbol", r.symbols[t.column + 1]},
                     {"exponent", number(t.exponent.value)},
                     {"std_error", number(t.exponent.std_error)},
                     {"ci95", json::array({number(t.exponent.low), number(t.exponent.high)})},
                     {"fixed", t.fixed}});
  j["terms"] = terms;
  json constant = json::array();
  for (const fit_constant& c : f.constant)
    constant.push_back({{"exponents", exponents_of(a.groups[c.column + 1])},
                        {"symbol", r.symbols[c.column + 1]},
                        {"value", number(c.value)}});
  j["constant"] = constant;
  j["r2"] = number(f.r2);
  j["rms_relative"] = number(f.rms_relative);
  j["max_relative"] = number(f.max_relative);
  json range = json::array();
  for (std::size_t g = 0; g < f.ranges.size(); ++g)
    range.push_back({{"symbol", r.symbols[g]}, {"min", number(f.ranges[g].min)}, {"max", number(f.ranges[g].max)}});
  j["range"] = range;
  // beyond the keys of DESIGN.md: the degrees of freedom, the shares, the flagged rows
  j["dof"] = f.dof;
  j["weighted"] = f.weighted;
  j["within_10"] = number(f.within_10);
  j["within_20"] = number(f.within_20);
  json outliers = json::array();
  for (const fit_outlier& o : f.outliers)
    outliers.push_back({{"row", o.row + 1}, {"line", r.lines[o.row]}, {"studentized", number(o.studentized)}});
  j["outliers"] = outliers;
  // the configuration the regime notes keep to, only when one was chosen (as `groups` writes it)
  if (!a.configuration.empty()) j["configuration"] = a.configuration;
  return j.dump(2) + "\n";
}

void fit_plot(const fit_report& r, const std::string& path) {
  namespace fs = std::filesystem;
  const fs::path picture(path);
  const std::string ext = picture.extension().string();
  std::string terminal;
  if (ext == ".svg")
    terminal = "svg size 900,650 dynamic enhanced font 'Sans,13' background rgb 'white'";
  else if (ext == ".pdf")
    terminal = "pdfcairo size 7in,5in enhanced font 'Sans,10'";
  else if (ext == ".png")
    terminal = "pngcairo size 900,650 enhanced font 'Sans,12'";
  else
    throw input_error(with_prefix("--plot '" + path + "': the picture must end in .svg, .pdf or .png"));
  const std::string gnuplot = find_gnuplot();
  if (gnuplot.empty())
    throw input_error(
        with_prefix("--plot needs gnuplot, which is not installed (Debian: apt-get install gnuplot-nox); "
                    "everything else of nondim fit works without it"));

  const fit_result& f = r.result;
  // the leading group: the first fitted one (Re in Nu = C Re^a Pr^b), else the first held one
  std::size_t lead = 0;  // f.terms.size() == 0: no group varies, x is 1
  for (std::size_t t = 0; t < f.terms.size(); ++t)
    if (!f.terms[t].fixed) {
      lead = t;
      break;
    }
  const fs::path dir = picture.has_parent_path() ? picture.parent_path() : fs::path(".");
  const std::string stem = picture.stem().string();
  const std::string data_name = stem + ".dat";
  const std::string script_name = stem + ".gp";
  std::string x_label;
  std::string y_label = label(r.symbols_utf8[0]);
  std::vector<double> x(f.n, 1.0);
  std::vector<double> y(r.groups[0]);
  double a_lead = 0.0;
  if (lead < f.terms.size()) {
    const std::size_t column = f.terms[lead].column + 1;
    x = r.groups[column];
    x_label = label(r.symbols_utf8[column]);
    a_lead = f.terms[lead].exponent.value;
  }
  for (std::size_t t = 0; t < f.terms.size(); ++t) {
    if (t == lead) continue;
    const std::size_t column = f.terms[t].column + 1;
    for (std::size_t i = 0; i < f.n; ++i) y[i] /= std::pow(r.groups[column][i], f.terms[t].exponent.value);
    y_label += " / " + label(r.symbols_utf8[column]) + "^{" +
               gnuplot_number(std::round(f.terms[t].exponent.value * 1000) / 1000) + "}";
  }
  std::vector<bool> outlier(f.n, false);
  for (const fit_outlier& o : f.outliers) outlier[o.row] = true;
  {
    std::ofstream data(dir / data_name);
    data << "# nondim fit: the data collapse of " << r.data_path << "\n# x = " << x_label << ", y = " << y_label
         << ", measured and predicted " << r.symbols[0] << ", outlier (1 = flagged)\n";
    for (std::size_t i = 0; i < f.n; ++i) {
      const double predicted = f.coefficient.value * std::pow(x[i], a_lead);
      data << gnuplot_number(x[i]) << ' ' << gnuplot_number(y[i]) << ' ' << gnuplot_number(r.groups[0][i]) << ' '
           << gnuplot_number(predicted * r.groups[0][i] / y[i]) << ' ' << (outlier[i] ? 1 : 0) << '\n';
    }
    if (!data) throw input_error(with_prefix("--plot: cannot write " + (dir / data_name).string()));
  }
  double x_min = x[0];
  double x_max = x[0];
  for (const double v : x) {
    x_min = std::min(x_min, v);
    x_max = std::max(x_max, v);
  }
  const double band = std::exp(f.t_quantile * f.residual_sd);
  std::string title = label(r.symbols_utf8[0]) + " = " + gnuplot_number(std::round(f.coefficient.value * 1e4) / 1e4);
  for (const fit_term& t : f.terms)
    title += " " + label(r.symbols_utf8[t.column + 1]) + "^{" +
             gnuplot_number(std::round(t.exponent.value * 1000) / 1000) + "}";
  {
    std::ofstream gp(dir / script_name);
    gp << "# nondim fit: the data collapse on logarithmic axes. Restyle freely, then run: gnuplot " << script_name
       << "\nset terminal " << terminal << "\nset output " << quoted(picture.filename().string())
       << "\nset encoding utf8\nset logscale xy\nset grid xtics ytics mxtics mytics lc rgb '#dddddd'\n"
       << "set key top left box opaque\nset xlabel " << quoted(x_label.empty() ? "row" : x_label) << "\nset ylabel "
       << quoted(y_label) << "\nset title "
       << quoted(title + "   (" + std::to_string(f.n) + " rows, R^2 = " + gnuplot_number(std::round(f.r2 * 1e4) / 1e4) +
                 ")")
       << "\nC = " << gnuplot_number(f.coefficient.value) << "\na = " << gnuplot_number(a_lead)
       << "\nband = " << gnuplot_number(band) << "   # exp(t * s): 95 % of the scatter about the fit\n"
       << "f(x) = C * x**a\nset xrange [" << gnuplot_number(x_min / 1.15) << ":" << gnuplot_number(x_max * 1.15)
       << "]\nset samples 200\n"
       << "plot '+' using 1:(f($1)/band):(f($1)*band) with filledcurves fc rgb '#4477aa' fs transparent solid 0.18 "
          "noborder title '95 % band', \\\n"
       << "     f(x) with lines lw 2 lc rgb '#225588' title 'fit', \\\n"
       << "     " << quoted(data_name)
       << " using 1:($5 == 0 ? $2 : 1/0) with points pt 7 ps 1.1 lc rgb '#cc4411' "
          "title 'data'";
    if (!f.outliers.empty())
      gp << ", \\\n     " << quoted(data_name)
         << " using 1:($5 == 1 ? $2 : 1/0) with points pt 6 ps 2.2 lw 2 lc rgb '#000000' title 'flagged outlier'";
    gp << "\n";
    if (!gp) throw input_error(with_prefix("--plot: cannot write " + (dir / script_name).string()));
  }
  const pid_t child = ::fork();
  if (child < 0) throw input_error(with_prefix("--plot: cannot start gnuplot"));
  if (child == 0) {
    if (::chdir(dir.c_str()) != 0) ::_exit(127);
    const char* argv[] = {gnuplot.c_str(), script_name.c_str(), nullptr};
    ::execv(gnuplot.c_str(), const_cast<char* const*>(argv));
    ::_exit(127);
  }
  int status = 0;
  while (::waitpid(child, &status, 0) < 0 && errno == EINTR) {
  }
  if (!WIFEXITED(status) || WEXITSTATUS(status) != 0)
    throw input_error(with_prefix("--plot: gnuplot could not draw " + path + " (its message is above; the script is " +
                                  (dir / script_name).string() + ")"));
}

}  // namespace nondim::tool
