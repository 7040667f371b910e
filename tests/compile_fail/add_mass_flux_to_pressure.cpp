// A dynamic pressure written with one velocity too few, rho u instead of rho u^2: the
// diagnostic names both kinds (a pressure, a mass flux) beside the exponents.
// expect: nondim: cannot add quantities of different dimensions
// expect: named<nondim::spelled::kind::pressure_or_stress_Pa, nondim::spelled::dim<nondim::spelled::L<-1>
// expect: named<nondim::spelled::kind::mass_flux_kg_per_m2_s, nondim::spelled::dim<nondim::spelled::L<-2>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto p = 101.325 * units::kPa;
  const auto u = 3.0 * units::m / units::s;
  const auto rho = 1.2 * units::kg / units::m3;
#ifdef NONDIM_CONTROL
  const auto p_total = p + 0.5 * rho * u * u;  // static plus dynamic pressure
#else
  const auto p_total = p + 0.5 * rho * u;
#endif
  return static_cast<int>(p_total / units::kPa);
}
