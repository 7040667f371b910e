#pragma once
/// \file commands.hpp
/// \brief The subcommands of the program. Each `add_*` registers its options on the
/// application and returns what to run once the command line has parsed.

#include <functional>
#include <ostream>
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

}  // namespace nondim::tool
