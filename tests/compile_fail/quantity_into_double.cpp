// A dimensional quantity into a double.
// expect: nondim: a dimensional quantity cannot become a raw number
// expect: M<1>, nondim::spelled::T<-3>, nondim::spelled::Theta<-1>
// expect: kind::heat_transfer_coefficient_W_per_m2_K
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto h = 25.0 * units::W / (units::m2 * units::K);
#ifdef NONDIM_CONTROL
  const double x = h / (units::W / (units::m2 * units::K));
#else
  const double x = h;
#endif
  return static_cast<int>(x);
}
