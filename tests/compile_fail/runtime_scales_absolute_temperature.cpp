// Run-time scales: an absolute temperature passed where a difference is meant is refused at
// compile time when its type says so (theta = (T - T_ref) / dT needs the reference point).
// expect: nondim: an absolute temperature \(temperature_point\) was passed where a difference is meant
// expect: Theta<1>
#include <nondim/analysis/extraction/runtime_scales.hpp>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto T_inf = from_celsius(25.0);
  const auto T = from_celsius(40.0);
  runtime_scales s;
  s.add("L", 0.1, "m").add("dT", 20.0, "K");
#ifdef NONDIM_CONTROL
  const double theta = s.nondimensional_difference(T, T_inf);
#else
  const double theta = s.nondimensional(T);
#endif
  return static_cast<int>(theta + T_inf.kelvin() * 0.0);
}
