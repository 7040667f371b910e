// hypot of a length and a time.
// expect: nondim: hypot needs two quantities of the same dimension
// expect: L<1>
// expect: T<1>
// expect: kind::length_m.*kind::time_s
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto x = 3.0 * units::m;
#ifdef NONDIM_CONTROL
  const auto y = 4.0 * units::m;
#else
  const auto y = 4.0 * units::s;
#endif
  return static_cast<int>(hypot(x, y).si());
}
