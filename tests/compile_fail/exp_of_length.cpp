// exp of a length.
// expect: nondim: exp needs a dimensionless argument
// expect: L<1>
// expect: kind::length_m
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto x = 2.0 * units::m;
#ifdef NONDIM_CONTROL
  const double y = exp(x / (1.0 * units::m));
#else
  const double y = exp(x);
#endif
  return static_cast<int>(y);
}
