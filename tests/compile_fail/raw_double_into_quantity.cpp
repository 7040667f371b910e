// A raw double into a dimensional quantity.
// expect: nondim: a raw number cannot become a dimensional quantity
// expect: L<1>
// expect: kind::length_m
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
#ifdef NONDIM_CONTROL
  quantity<dims::length> x = 2.0 * units::m;
#else
  quantity<dims::length> x = 2.0;
#endif
  return static_cast<int>(x.si());
}
