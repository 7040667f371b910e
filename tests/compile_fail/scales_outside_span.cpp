// A quantity whose dimension is outside the span of the references: with rho, U, L alone a
// heat flux per kelvin (a heat-transfer coefficient) needs a temperature reference.
// expect: nondim: this dimension is outside the span of the references
// expect: references_lack<nondim::spelled::named<nondim::spelled::kind::temperature_K, .*Theta<1> ?> ?> ?>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto s = scales(998.0 * units::kg / units::m3, 0.3 * units::m / units::s, 0.05 * units::m);
#ifdef NONDIM_CONTROL
  const auto q = 150.0 * units::W / units::m2;  // a heat flux is rho U^3
#else
  const auto q = 150.0 * units::W / (units::m2 * units::K);
#endif
  return static_cast<int>(s.nondimensional(q));
}
