// A wrong-dimension argument to a function typed on its inputs.
// expect: nondim: cannot initialise or assign a quantity from one of another dimension
// expect: L<2>, nondim::spelled::T<-1>
// expect: L<-1>, nondim::spelled::M<1>, nondim::spelled::T<-1>
#include <nondim/quantity.hpp>
using namespace nondim;
// a solver input routine that wants a kinematic viscosity
double reynolds(quantity<dims::velocity> u, quantity<dims::length> l, quantity<dims::kinematic_viscosity> nu) {
  return u * l / nu;
}
int main() {
  const auto u = 1.0 * units::m / units::s;
  const auto l = 1.0 * units::m;
#ifdef NONDIM_CONTROL
  const auto nu = 1.0e-6 * units::m2 / units::s;
#else
  const auto nu = 1.0e-3 * units::Pa * units::s;  // a dynamic viscosity passed by mistake
#endif
  return static_cast<int>(reynolds(u, l, nu));
}
