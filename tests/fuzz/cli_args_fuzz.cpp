// libFuzzer target: the whole `nondim` program in-process (tools/nondim/run.cpp) on a command
// line decoded from bytes: the arguments are the '\0'-separated pieces (at most 24). The
// program runs in a scratch directory holding two problem files (problem.toml, scale.toml) so
// that `--file` and `scale` reach the analysis and the planner. The exit status must be 0 or
// 2, never 1 (an internal fault) nor a crash; status 2 comes with one message beginning
// "nondim: ".
#include <unistd.h>

#include <cstddef>
#include <cstdint>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <sstream>
#include <string>
#include <string_view>
#include <system_error>
#include <vector>

#include "fuzz_invariants.hpp"
#include "run.hpp"

namespace {

using nondim_fuzz::require;

// Drag on a towed body (the variables of White, 7th ed., section 5.3) with values for `scale`.
constexpr std::string_view problem_toml = R"(title = "Drag"
dependent = "F"
repeating = ["rho", "U", "D"]
[[variable]]
name = "F"
unit = "N"
[[variable]]
name = "rho"
unit = "kg/m^3"
prototype = 1025.0
model = 998.0
[[variable]]
name = "U"
unit = "kn"
prototype = 6.0
[[variable]]
name = "D"
unit = "cm"
prototype = 30.0
model = 10.0
[[variable]]
name = "mu"
unit = "Pa*s"
prototype = 1.08e-3
model = 1.0e-3
)";

// Ship model: Froude and Reynolds cannot both match in the same water.
constexpr std::string_view scale_toml = R"(dependent = "F"
[[variable]]
name = "F"
unit = "N"
[[variable]]
name = "L"
unit = "m"
prototype = 100.0
model = 4.0
[[variable]]
name = "U"
unit = "m/s"
prototype = 10.0
[[variable]]
name = "g"
unit = "m/s^2"
prototype = 9.81
model = 9.81
[[variable]]
name = "nu"
unit = "m^2/s"
prototype = 1.0e-6
model = 1.0e-6
)";

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
  std::ofstream("problem.toml") << problem_toml;
  std::ofstream("scale.toml") << scale_toml;
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
