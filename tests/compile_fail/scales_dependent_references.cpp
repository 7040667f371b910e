// Reference quantities whose dimensions are dependent: a viscosity is rho U L, so with rho, U
// and L already given it fixes nothing new. The error names the fourth reference.
// expect: nondim: the references' dimensions must be independent
// expect: dependent_reference<4, nondim::spelled::named<nondim::spelled::kind::dynamic_viscosity_Pa_s, .*L<-1>, .*T<-1>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto rho = 998.0 * units::kg / units::m3;
  const auto U = 0.3 * units::m / units::s;
  const auto L = 0.05 * units::m;
#ifdef NONDIM_CONTROL
  const auto fourth = 20.0 * units::K;  // a temperature difference brings a new base dimension
#else
  const auto fourth = 1.0e-3 * units::Pa * units::s;
#endif
  const auto s = scales(rho, U, L, fourth);
  return static_cast<int>(s.nondimensional(120.0 * units::Pa));
}
