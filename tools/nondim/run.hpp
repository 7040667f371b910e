#pragma once
/// \file run.hpp
/// \brief The whole program behind `main`: parses the command line, runs the subcommand and
/// turns every failure into an exit status, writing to the streams it is given (so that
/// tests and the argument fuzzer can run it in-process).

#include <ostream>

namespace nondim::tool {

/// \brief Runs `nondim` with `argc`/`argv` as `main` gets them; the output goes to `out`,
/// messages (one for bad input) to `err`.
/// \return 0 success, 2 bad input, 1 an internal fault; never throws.
int run(int argc, const char* const* argv, std::ostream& out, std::ostream& err) noexcept;

}  // namespace nondim::tool
