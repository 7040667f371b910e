// Converting nondimensional numbers back into a read-only view.
// expect: nondim: dimensional\(in, v\) writes into v
// expect: const double
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>
#include <vector>
using namespace nondim;
int main() {
  const auto s = scales(1000.0 * units::kg / units::m3, 2.0 * units::m / units::s, 0.1 * units::m);
  std::vector<double> storage(3), in{1.0, 2.0, 3.0};
#ifdef NONDIM_CONTROL
  const field_view<dims::pressure> p(storage.data(), storage.size());
#else
  const field_view<dims::pressure, const double> p(storage.data(), storage.size());
#endif
  s.dimensional(in, p);
  return static_cast<int>(storage[0]);
}
