/// \file cmd_groups.cpp
/// \brief `nondim groups`: the dimensionless groups of a problem given as NAME=UNIT
/// arguments or in a problem file, as text, Markdown, LaTeX or JSON; with `--scales`, the
/// reference scale of every variable in the repeating variables as well.

#include <memory>
#include <ostream>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>
#include <nondim/report.hpp>

#include "commands.hpp"
#include "kinds_text.hpp"
#include "messages.hpp"
#include "problem_input.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {
struct groups_args {
  std::vector<std::string> variables;
  std::string file;
  std::string repeating;
  std::string dependent;
  std::string basis;
  std::string configuration;
  std::string format = "text";
  bool scales = false;
  bool alternatives = false;
  bool kinds = false;
};
}  // namespace

subcommand add_groups(CLI::App& app) {
  auto args = std::make_shared<groups_args>();
  CLI::App* sub = app.add_subcommand("groups", "Find the dimensionless groups of a problem (Buckingham pi, exact)");
  sub->add_option("NAME=UNIT", args->variables,
                  "The variables, dependent one first unless --dependent says otherwise: F=N rho=kg/m^3 U=m/s D=m "
                  "mu=Pa*s. NAME:KIND=UNIT declares what a variable is (lambda:mean_free_path=m; see --kinds). "
                  "'NAME=VALUE UNIT' gives a value at a design point ('U=2 m/s'), 'NAME=VALUE±U UNIT' "
                  "or 'NAME=VALUE+-U UNIT' its standard uncertainty ('U=2+-0.05 m/s', 'U=2+-2.5% m/s'); every "
                  "group whose variables all have values is printed with its value");
  sub->add_option("-f,--file", args->file, "Read the problem from a TOML problem file instead");
  sub->add_option("-r,--repeating", args->repeating,
                  "The repeating variables, comma separated (as many as the rank); default: chosen automatically");
  sub->add_option("-d,--dependent", args->dependent, "The dependent variable; default: the first");
  sub->add_option("-b,--basis", args->basis,
                  "classical: one non-repeating variable per group; named: re-expressed in named groups (Reynolds, "
                  "Prandtl...) where possible")
      ->check(CLI::IsMember({"classical", "named"}))
      ->default_str("classical");
  sub->add_option("--configuration", args->configuration, configuration_help());
  sub->add_option("--format", args->format, "Output format")
      ->check(CLI::IsMember({"text", "markdown", "latex", "json"}))
      ->default_str("text");
  sub->add_flag("-s,--scales", args->scales,
                "Also print the reference scale of every variable in the repeating variables, the form a "
                "nondimensional solver divides it by (t* = t·U/D)");
  sub->add_flag("-a,--alternatives", args->alternatives,
                "Also list the other admissible sets of repeating variables with their groups, best first by the "
                "rule (at most " +
                    std::to_string(default_alternative_count) + ")");
  sub->add_flag("--kinds", args->kinds,
                "List the kinds a variable can be declared (NAME:KIND=UNIT, or kind = \"KIND\" in a file) and the "
                "conventional names that imply them, and exit");
  sub->footer(
      "Options given on the command line override those in the file.\n"
      "Examples:\n"
      "  nondim groups F=N rho=kg/m^3 U=m/s D=m mu=Pa*s\n"
      "  nondim groups dp=Pa 'rho=998 kg/m^3' 'U=2+-0.05 m/s' 'D=25 mm' 'mu=1.0+-2% mPa*s'\n"
      "  nondim groups --file pod.toml --repeating rho,U,D --format latex\n"
      "  nondim groups --file pod.toml --scales\n"
      "  nondim groups --file pod.toml --alternatives");
  return {
      sub, [args](std::ostream& out) {
        if (args->kinds) {
          out << kinds_text();
          return;
        }
        if (!args->file.empty() && !args->variables.empty())
          throw input_error(with_prefix("give the variables either as NAME=UNIT arguments or with --file, not both"));
        problem_input in = args->file.empty() ? problem_from_arguments(args->variables) : problem_from_file(args->file);
        if (!args->dependent.empty()) override_dependent(in, args->dependent);
        if (!args->repeating.empty()) override_repeating(in, args->repeating);
        if (!args->configuration.empty()) override_configuration(in, args->configuration);
        if (!args->basis.empty()) in.options.form = args->basis == "named" ? basis::named : basis::classical;
        const analysis a = analyze_input(in);
        if (args->alternatives) {
          in.report.alternatives = alternatives(in.problem, in.options);  // valid options: analyze_input passed
        }
        try {
          (void)group_values(a, in.report.point);  // a value that no group can take (0 where it divides) is bad input
        } catch (const analysis_error& e) {
          const file_variable* fv = in.file ? in.file->find(e.variable()) : nullptr;
          const std::string where = fv != nullptr && fv->value ? in.file->at(fv->value->where)
                                    : in.file                  ? in.file->path + ": "
                                                               : std::string();
          throw input_error(with_prefix(where + std::string(bare_message(e))));
        }
        if (args->scales && args->format == "latex")
          throw input_error(with_prefix("--scales is available with --format text, markdown or json, not latex"));
        if (args->format == "json") {
          out << (args->scales ? json_scales_report(a, in.report) : json_report(a, in.report));
        } else if (args->format == "markdown") {
          out << markdown_report(a, in.report);
          if (args->scales) out << "\n" << scales_markdown_report(a);
        } else if (args->format == "latex") {
          out << latex_report(a, in.report);
        } else {
          out << text_report(a, in.report);
          if (args->scales) out << "\n" << scales_text_report(a);
        }
      }};
}

}  // namespace nondim::tool
