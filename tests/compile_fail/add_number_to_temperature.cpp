// Adding a raw number to a temperature difference.
// expect: nondim: cannot add a raw number to a dimensional quantity
// expect: Theta<1>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto dT = 5.0 * units::K;
#ifdef NONDIM_CONTROL
  const auto t = dT + 1.0 * units::K;
#else
  const auto t = dT + 1.0;
#endif
  return static_cast<int>(t.si());
}
