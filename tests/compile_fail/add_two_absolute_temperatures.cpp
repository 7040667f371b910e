// Adding two absolute temperatures.
// expect: nondim: two absolute temperatures cannot be added
// expect: Theta<1>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto a = from_celsius(20.0);
#ifdef NONDIM_CONTROL
  const auto b = from_celsius(30.0) - from_celsius(25.0);
#else
  const auto b = from_celsius(30.0);
#endif
  return static_cast<int>((a + b).kelvin());
}
