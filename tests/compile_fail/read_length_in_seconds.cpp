// Reading a length in a unit of time.
// expect: nondim: cannot read a quantity in a unit of another dimension
// expect: L<1>
// expect: T<1>
// expect: kind::length_m.*kind::time_s
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto x = 3.0 * units::ft;
#ifdef NONDIM_CONTROL
  const double v = in(x, units::m);
#else
  const double v = in(x, units::s);
#endif
  return static_cast<int>(v);
}
