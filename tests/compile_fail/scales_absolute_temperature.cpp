// An absolute temperature passed where a difference is meant: theta = (T - T_ref) / dT needs
// the reference point, so nondimensional(T) is refused.
// expect: nondim: an absolute temperature \(temperature_point\) was passed where a difference is meant
// expect: Theta<1>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto T_inf = from_celsius(25.0);
  const auto T = from_celsius(40.0);
  const auto s = scales(1.2 * units::kg / units::m3, 2.0 * units::m / units::s, 0.1 * units::m, 20.0 * units::K);
#ifdef NONDIM_CONTROL
  const double theta = s.nondimensional_difference(T, T_inf);
#else
  const double theta = s.nondimensional(T);
#endif
  return static_cast<int>(theta + T_inf.kelvin() * 0.0);
}
