// Run-time scales: a reference temperature is a difference; an absolute temperature_point
// as a reference does not compile.
// expect: nondim: a reference temperature is a difference
// expect: Theta<1>
#include <nondim/analysis/extraction/runtime_scales.hpp>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto T_inf = from_celsius(25.0);
  const auto T_wall = from_celsius(45.0);
  runtime_scales s;
#ifdef NONDIM_CONTROL
  s.add("dT", T_wall - T_inf);
#else
  s.add("dT", T_wall);
#endif
  return static_cast<int>(s.size()) + static_cast<int>(T_inf.kelvin() * 0.0);
}
