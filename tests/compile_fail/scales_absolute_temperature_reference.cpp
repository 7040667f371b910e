// An absolute temperature given as a reference scale: a scale is a difference (dT).
// expect: nondim: a reference temperature for scales\(\) is a difference
// expect: not_a_quantity<2, nondim::temperature_point<double> ?>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
using namespace nondim;
int main() {
  const auto T_inf = from_celsius(25.0);
  const auto T_wall = from_celsius(45.0);
#ifdef NONDIM_CONTROL
  const auto s = scales(0.1 * units::m, T_wall - T_inf);
#else
  const auto s = scales(0.1 * units::m, T_wall);
#endif
  return static_cast<int>(s.nondimensional(1.0 * units::m));
}
