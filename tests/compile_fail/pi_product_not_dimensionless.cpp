// A product of powers that is not dimensionless, given to pi_product as a group: F/(rho U^2 D)
// is a length (F/(rho U^2 D^2) is the drag coefficient; White, 7th ed., 5.3, from memory).
// expect: nondim: this product of powers is not dimensionless
// expect: dim<nondim::spelled::L<1> ?>
// expect: kind::length_m
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto F = 2.0 * units::N;
  const auto rho = 1.2 * units::kg / units::m3;
  const auto U = 3.0 * units::m / units::s;
  const auto D = 0.1 * units::m;
#ifdef NONDIM_CONTROL
  const double g = pi_product<1, -1, -2, -2>(F, rho, U, D);
#else
  const double g = pi_product<1, -1, -2, -1>(F, rho, U, D);
#endif
  return static_cast<int>(g);
}
