// A raw number among the arguments of pi_groups: its dimension is unknown.
// expect: nondim: pi_groups takes quantities
// expect: not_a_quantity<3, double>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto f = 12.0 * units::Hz;
  const auto U = 3.0 * units::m / units::s;
#ifdef NONDIM_CONTROL
  const auto D = 0.1 * units::m;
#else
  const double D = 0.1;  // the diameter in metres, without its unit
#endif
  const auto g = pi_groups(f, U, D);
  return static_cast<int>(g[0]);
}
