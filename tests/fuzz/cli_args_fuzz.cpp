// libFuzzer target: the whole `nondim` program in-process (tools/nondim/run.cpp) on a command
// line decoded from bytes: the arguments are the '\0'-separated pieces (at most 24). The
// program runs in a scratch directory holding a copy of the program tests' problem files
// (tests/cli/problems, NONDIM_CLI_PROBLEMS_DIR) so that `--file` and `scale` reach the
// analysis, the planner and the loader's errors. `fit --plot` runs /bin/true in place of
// gnuplot (NONDIM_GNUPLOT), so that the data and the script are written but nothing is drawn;
// a picture path with a directory in it is not run (it could write outside the scratch
// directory). The exit status must be 0 or 2, never 1 (an internal fault) nor a crash;
// status 2 comes with one message beginning "nondim: ".
#include <unistd.h>

#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <sstream>
#include <string>
#include <system_error>
#include <vector>

#include "fuzz_invariants.hpp"
#include "run.hpp"

namespace {

using nondim_fuzz::require;

}  // namespace

// The fuzzer's own arguments that are paths (corpus directories, files) are made absolute
// before the working directory changes.
extern "C" int LLVMFuzzerInitialize(int* argc, char*** argv) {
  static std::vector<std::string> absolute;
  static std::vector<char*> pointers;
  const std::string here = std::filesystem::current_path().string();
  for (int i = 0; i < *argc; ++i) {
    const std::string a = (*argv)[i];
    absolute.push_back(i > 0 && !a.empty() && a[0] != '-' && a[0] != '/' ? here + "/" + a : a);
  }
  for (auto& a : absolute) pointers.push_back(a.data());
  pointers.push_back(nullptr);
  *argv = pointers.data();
  static char dir[] = "/tmp/nondim_cli_fuzz_XXXXXX";
  if (mkdtemp(dir) == nullptr || chdir(dir) != 0) std::abort();
  std::atexit([] {
    std::error_code ec;
    std::filesystem::remove_all(dir, ec);
  });
  // the plot's data and script are the program's; drawing them is gnuplot's affair
  if (setenv("NONDIM_GNUPLOT", "/bin/true", 1) != 0) std::abort();
  std::error_code ec;
  std::filesystem::copy(NONDIM_CLI_PROBLEMS_DIR, dir, ec);
  if (ec) {
    std::fprintf(stderr, "cannot copy the problem files of %s: %s\n", NONDIM_CLI_PROBLEMS_DIR, ec.message().c_str());
    std::abort();
  }
  return 0;
}

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  std::vector<std::string> args{"nondim"};
  std::string piece;
  for (std::size_t i = 0; i <= size; ++i) {
    if (i == size || data[i] == 0) {
      args.push_back(piece);
      piece.clear();
      if (args.size() > 25) break;
    } else {
      piece.push_back(static_cast<char>(data[i]));
    }
  }
  if (size == 0) args.pop_back();  // no input: the program with no arguments
  // Files outside the scratch directory are not the program's input under test; device
  // files would block (a terminal, a pipe) rather than fault.
  for (const auto& a : args)
    if (a.find("/dev") != std::string::npos || a.find("/proc") != std::string::npos ||
        a.find("/sys") != std::string::npos)
      return 0;
  for (std::size_t i = 0; i < args.size(); ++i)
    if (args[i].rfind("--plot", 0) == 0 &&
        (args[i].find('/') != std::string::npos || (i + 1 < args.size() && args[i + 1].find('/') != std::string::npos)))
      return 0;
  std::vector<const char*> argv;
  for (const auto& a : args) argv.push_back(a.c_str());
  argv.push_back(nullptr);
  std::ostringstream out;
  std::ostringstream err;
  const int status = nondim::tool::run(static_cast<int>(args.size()), argv.data(), out, err);
  require(status == 0 || status == 2);
  if (status == 2) require(err.str().rfind("nondim: ", 0) == 0);
  return 0;
}
