// A thermometer reading multiplied into a formula (p = rho R T with T in degC): one nondim:
// sentence on GCC and on Clang, not the list of every operator* tried.
// expect: nondim: an absolute temperature \(temperature_point, a thermometer reading\) cannot be multiplied
// expect: temperature_point<double>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto r = 287.0 * units::J / (units::kg * units::K);
  const auto rho = 1.2 * units::kg / units::m3;
  const auto t = from_celsius(15.0);
#ifdef NONDIM_CONTROL
  const auto p = rho * r * t.absolute();  // the thermodynamic temperature, 288.15 K
#else
  const auto p = rho * r * t;
#endif
  return static_cast<int>(p / units::kPa);
}
