// Writing through a read-only field view.
// expect: nondim: cannot write through a read-only field view
// expect: const double
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <vector>
using namespace nondim;
int main() {
  std::vector<double> storage(3);
  const field_view<dims::pressure> p(storage.data(), storage.size());
  const field_view<dims::pressure, const double> frozen = p;
#ifdef NONDIM_CONTROL
  p[0] = frozen[1];
#else
  frozen[0] = 101325.0 * units::Pa;
#endif
  return static_cast<int>(storage[0]);
}
