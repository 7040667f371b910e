// pi_groups of variables that form no dimensionless group: drag with the length scale left
// out (F, rho, U are independent, rank 3 = n).
// expect: nondim: these variables form no dimensionless group
// expect: L<1>, nondim::spelled::M<1>, nondim::spelled::T<-2>
// expect: L<-3>, nondim::spelled::M<1>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto F = 2.0 * units::N;
  const auto rho = 1.2 * units::kg / units::m3;
  const auto U = 3.0 * units::m / units::s;
#ifdef NONDIM_CONTROL
  const auto D = 0.1 * units::m;
  const auto g = pi_groups(F, rho, U, D);
#else
  const auto g = pi_groups(F, rho, U);
#endif
  return static_cast<int>(g.size());
}
