// Comparing a pressure with an energy.
// expect: nondim: cannot compare quantities of different dimensions
// expect: L<-1>, nondim::spelled::M<1>, nondim::spelled::T<-2>
// expect: L<2>, nondim::spelled::M<1>, nondim::spelled::T<-2>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto p = 1.0 * units::bar;
#ifdef NONDIM_CONTROL
  const auto e = 1.0 * units::psi;
#else
  const auto e = 1.0 * units::J;
#endif
  return p < e ? 0 : 1;
}
