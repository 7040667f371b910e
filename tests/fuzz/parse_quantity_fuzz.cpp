// libFuzzer target: parse_quantity and convert on any bytes (the text is split at the first
// '|' into a quantity and a unit for convert).
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <exception>
#include <string_view>

#include "fuzz_invariants.hpp"

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view all(reinterpret_cast<const char*>(data), size);
  const std::size_t bar = all.find('|');
  const std::string_view text = all.substr(0, bar);
  try {
    const nondim::parsed_quantity q = nondim::parse_quantity(text);
    nondim_fuzz::require(std::isfinite(q.value));
  } catch (const nondim::unit_error& e) {
    nondim_fuzz::check_error(e, text);
  } catch (const std::exception& e) {  // README: parse_quantity throws unit_error only
    nondim_fuzz::undocumented(e);
  }
  if (bar != std::string_view::npos) {
    const std::string_view to = all.substr(bar + 1);
    try {
      const double same = nondim::convert(1.5, to, to);  // a round trip through SI
      nondim_fuzz::require(std::abs(same - 1.5) < 1e-9);
      (void)nondim::convert(1.5, "m", to);
    } catch (const nondim::unit_error& e) {
      nondim_fuzz::check_error(e, to);
    } catch (const nondim::dimension_error&) {
    } catch (const std::exception& e) {  // README: convert throws unit_error and dimension_error only
      nondim_fuzz::undocumented(e);
    }
  }
  return 0;
}
