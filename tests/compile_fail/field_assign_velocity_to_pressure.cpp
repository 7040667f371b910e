// Assigning a velocity to an element of a pressure field.
// expect: nondim: cannot assign to a field element a quantity of another dimension
// expect: dim<nondim::spelled::L<-1>, nondim::spelled::M<1>, nondim::spelled::T<-2> ?>
// expect: dim<nondim::spelled::L<1>, nondim::spelled::T<-1> ?>
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <vector>
using namespace nondim;
int main() {
  std::vector<double> storage(3);
  const field_view<dims::pressure> p(storage.data(), storage.size());
  const auto u = 2.0 * units::m / units::s;
#ifdef NONDIM_CONTROL
  p[0] = 0.5 * (1.2 * units::kg / units::m3) * u * u;  // a dynamic pressure
#else
  p[0] = u;
#endif
  return static_cast<int>(storage[0]);
}
