#pragma once
/// \file commands.hpp
/// \brief The subcommands of the program. Each `add_*` registers its options on the
/// application and returns what to run once the command line has parsed.

#include <functional>
#include <ostream>
#include <string>
#include <vector>

namespace CLI {
class App;
}

namespace nondim::tool {

/// \brief A registered subcommand: its CLI11 app and the action to run when it was given.
struct subcommand {
  CLI::App* app = nullptr;
  std::function<void(std::ostream&)> run;  ///< throws input_error for bad input
};

subcommand add_groups(CLI::App& app);
subcommand add_convert(CLI::App& app);
subcommand add_dim(CLI::App& app);
subcommand add_scale(CLI::App& app);
subcommand add_demo(CLI::App& app);
subcommand add_fit(CLI::App& app);

/// \brief Runs `nondim fit` (also for the demo): `demo` takes the built-in rig instead of files.
/// \throws input_error for bad input.
void run_fit(std::ostream& out, const std::string& file, const std::string& data, bool demo, const std::string& basis,
             const std::vector<std::string>& fixes, const std::string& format, const std::string& plot,
             const std::string& configuration);

}  // namespace nondim::tool
