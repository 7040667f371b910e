// Subtracting a power from an energy (a missing time step).
// expect: nondim: cannot subtract quantities of different dimensions
// expect: T<-2>
// expect: T<-3>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto e = 10.0 * units::kJ;
  const auto p = 2.0 * units::kW;
#ifdef NONDIM_CONTROL
  const auto r = e - p * (1.0 * units::s);
#else
  const auto r = e - p;
#endif
  return static_cast<int>(r.si());
}
