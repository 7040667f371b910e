/// \file run.cpp
/// \brief Dispatches to the subcommands and turns every failure into an exit status: 0
/// success, 2 bad input (one message on the error stream), 1 an internal fault.

#include "run.hpp"

#include <exception>
#include <string>
#include <string_view>
#include <vector>

#include <CLI/CLI.hpp>

#include "commands.hpp"
#include "messages.hpp"

namespace nondim::tool {

namespace {

constexpr std::string_view subcommand_list = "groups, fit, convert, dim, scale or demo";

int dispatch(int argc, const char* const* argv, std::ostream& out, std::ostream& err) {
  CLI::App app{"nondim: dimensionless groups, unit conversion and scale-model planning for engineers", "nondim"};
  app.set_version_flag("--version", std::string("nondim ") + NONDIM_VERSION_STRING);
  app.require_subcommand(1);
  app.fallthrough(false);
  app.footer("Run 'nondim SUBCOMMAND --help' for the options of each subcommand.");

  std::vector<subcommand> commands;
  commands.push_back(add_groups(app));
  commands.push_back(add_fit(app));
  commands.push_back(add_convert(app));
  commands.push_back(add_dim(app));
  commands.push_back(add_scale(app));
  commands.push_back(add_demo(app));

  // An unknown first word would otherwise reach CLI11 as an unexpected positional.
  if (argc >= 2) {
    const std::string_view first = argv[1];
    if (!first.empty() && first.front() != '-') {
      bool known = false;
      for (const auto& c : commands) known = known || c.app->check_name(std::string(first));
      if (!known)
        throw input_error(with_prefix("unknown subcommand '" + std::string(first) + "' (expected " +
                                      std::string(subcommand_list) + "; see nondim --help)"));
    }
  }

  try {
    app.parse(argc, argv);
  } catch (const CLI::CallForHelp& e) {
    return app.exit(e, out, err);
  } catch (const CLI::CallForAllHelp& e) {
    return app.exit(e, out, err);
  } catch (const CLI::CallForVersion& e) {
    return app.exit(e, out, err);
  } catch (const CLI::RequiredError& e) {
    if (argc < 2)
      throw input_error(
          with_prefix("a subcommand is required: " + std::string(subcommand_list) + " (see nondim --help)"));
    throw input_error(with_prefix(std::string(e.what()) + " (see nondim " + std::string(argv[1]) + " --help)"));
  } catch (const CLI::ParseError& e) {
    const std::string help =
        argc >= 2 && argv[1][0] != '-' ? "nondim " + std::string(argv[1]) + " --help" : "nondim --help";
    throw input_error(with_prefix(std::string(e.what()) + " (see " + help + ")"));
  }

  for (const auto& c : commands) {
    if (c.app->parsed()) {
      c.run(out);
      out.flush();
      if (!out) {
        err << "nondim: cannot write the output\n";
        return exit_internal;
      }
      return exit_ok;
    }
  }
  throw input_error(with_prefix("a subcommand is required: " + std::string(subcommand_list)));
}

}  // namespace

int run(int argc, const char* const* argv, std::ostream& out, std::ostream& err) noexcept {
  try {
    try {
      return dispatch(argc, argv, out, err);
    } catch (const input_error& e) {
      err << e.what() << '\n';
      return exit_bad_input;
    } catch (const std::exception& e) {  // the library's messages begin "nondim: " too: one prefix
      std::string_view what = e.what();
      if (what.rfind("nondim: ", 0) == 0) what.remove_prefix(8);
      err << "nondim: internal error: " << what << '\n';
      return exit_internal;
    } catch (...) {
      err << "nondim: internal error\n";
      return exit_internal;
    }
  } catch (...) {  // the error stream itself failed
    return exit_internal;
  }
}

}  // namespace nondim::tool
