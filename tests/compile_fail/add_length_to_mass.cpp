// Adding a length to a mass.
// expect: nondim: cannot add quantities of different dimensions
// expect: L<1>
// expect: M<1>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto length = 2.0 * units::m;
#ifdef NONDIM_CONTROL
  const auto other = 1.0 * units::ft;
#else
  const auto other = 1.0 * units::kg;
#endif
  const auto sum = length + other;
  return static_cast<int>(sum.si());
}
