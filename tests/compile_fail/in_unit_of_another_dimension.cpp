// Writing a pressure in a unit of length for a log.
// expect: nondim: cannot write a quantity in a unit of another dimension
// expect: dim<nondim::spelled::L<-1>, nondim::spelled::M<1>, nondim::spelled::T<-2> ?>
// expect: dim<nondim::spelled::L<1> ?>
// expect: kind::pressure_or_stress_Pa.*kind::length_m
#include <iostream>
#include <nondim/quantity.hpp>
using namespace nondim;
int main() {
  const auto p = 101.325 * units::kPa;
#ifdef NONDIM_CONTROL
  std::cout << in_unit(p, units::kPa) << "\n";
#else
  std::cout << in_unit(p, units::mm) << "\n";
#endif
  return 0;
}
