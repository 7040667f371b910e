/// \file cmd_fit.cpp
/// \brief `nondim fit`: the groups of every row of a CSV file, the dependent group fitted
/// as a product of powers of the others, as text, Markdown, LaTeX or JSON, and the plot of
/// the data collapse.

#include <memory>
#include <ostream>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>

#include "commands.hpp"
#include "demo_rig.hpp"
#include "fit_data.hpp"
#include "messages.hpp"

namespace nondim::tool {

namespace {
struct fit_args {
  std::string file;
  std::string data;
  std::string basis = "named";
  std::vector<std::string> fixes;
  std::string format = "text";
  std::string plot;
  std::string configuration;
  bool demo = false;
};
}  // namespace

void run_fit(std::ostream& out, const std::string& file, const std::string& data, bool demo, const std::string& basis,
             const std::vector<std::string>& fixes, const std::string& format, const std::string& plot,
             const std::string& configuration) {
  problem_input in =
      demo ? problem_from_loaded(parse_problem_text(demo_rig_problem, "cylinder_rig.toml")) : problem_from_file(file);
  if (!configuration.empty()) override_configuration(in, configuration);
  in.options.form = basis == "classical" ? basis::classical : basis::named;
  const csv_numbers table = demo ? parse_csv_numbers(demo_rig_data, "cylinder_rig.csv") : load_csv_numbers(data);
  const fit_report r = fit_from_table(in, table, fixes);
  if (!plot.empty()) fit_plot(r, plot);
  if (format == "json")
    out << fit_json(r);
  else if (format == "markdown")
    out << fit_markdown(r);
  else if (format == "latex")
    out << fit_latex(r);
  else
    out << fit_text(r);
}

subcommand add_fit(CLI::App& app) {
  auto args = std::make_shared<fit_args>();
  CLI::App* sub = app.add_subcommand("fit", "Fit a correlation (Nu = C Re^a Pr^b) to measured data, in the groups");
  sub->add_option("-f,--file", args->file,
                  "The problem file (TOML): the variables, their units, the constants' values");
  sub->add_option("DATA", args->data,
                  "CSV file: a header naming the columns as the problem's variables, each optionally with its unit "
                  "('U [ft/s]', 'D (mm)'); one row per measurement");
  sub->add_option("-b,--basis", args->basis, "named: groups in named numbers (Nu, Re, Pr) where possible; classical")
      ->check(CLI::IsMember({"classical", "named"}))
      ->default_str("named");
  sub->add_option("--fix", args->fixes, "Hold an exponent: --fix Pr=1/3 (repeatable)");
  sub->add_option("--format", args->format, "Output format")
      ->check(CLI::IsMember({"text", "markdown", "latex", "json"}))
      ->default_str("text");
  sub->add_option("--plot", args->plot,
                  "Draw the data collapse into FILE.svg, .pdf or .png with gnuplot; the data (.dat) and the script "
                  "(.gp) are written beside it");
  sub->add_option("--configuration", args->configuration, configuration_help());
  sub->add_flag("--demo", args->demo, "Fit the built-in heated-cylinder rig instead of files");
  sub->footer(
      "Examples:\n"
      "  nondim fit --file rig.toml rig.csv\n"
      "  nondim fit --file rig.toml rig.csv --fix Pr=1/3 --plot collapse.svg\n"
      "  nondim fit --demo --plot collapse.png");
  return {sub, [args](std::ostream& out) {
            if (args->demo && (!args->file.empty() || !args->data.empty()))
              throw input_error(with_prefix("give either --demo or --file PROBLEM.toml DATA.csv, not both"));
            if (!args->demo && (args->file.empty() || args->data.empty()))
              throw input_error(
                  with_prefix("fit needs --file PROBLEM.toml and DATA.csv (or --demo); see nondim fit --help"));
            run_fit(out, args->file, args->data, args->demo, args->basis, args->fixes, args->format, args->plot,
                    args->configuration);
          }};
}

}  // namespace nondim::tool
