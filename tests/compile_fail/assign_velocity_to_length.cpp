// Assigning a velocity to a length.
// expect: nondim: cannot initialise or assign a quantity from one of another dimension
// expect: dim<nondim::spelled::L<1> ?>
// expect: L<1>, nondim::spelled::T<-1>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
#ifdef NONDIM_CONTROL
  quantity<dims::length> x = 2.0 * units::m / units::s * (1.0 * units::s);
#else
  quantity<dims::length> x = 2.0 * units::m / units::s;
#endif
  return static_cast<int>(x.si());
}
