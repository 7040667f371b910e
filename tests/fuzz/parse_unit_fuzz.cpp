// libFuzzer target: parse_unit on any bytes. Built by tests/fuzz/CMakeLists.txt with Clang
// and -fsanitize=fuzzer,address,undefined; run by tests/fuzz/run_fuzzers.sh.
#include <cstddef>
#include <cstdint>
#include <exception>
#include <string_view>

#include "fuzz_invariants.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  try {
    nondim_fuzz::check_unit(nondim::parse_unit(text));
  } catch (const nondim::unit_error& e) {
    nondim_fuzz::check_error(e, text);
  } catch (const std::exception& e) {  // README: parse_unit throws unit_error only
    nondim_fuzz::undocumented(e);
  }
  return 0;
}
