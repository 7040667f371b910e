// A gradient over a grid spacing given as a raw number.
// expect: nondim: a grid spacing is a quantity
// expect: double
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <vector>
using namespace nondim;
int main() {
  std::vector<double> storage{1.0, 2.0, 4.0};
  const field_view<dims::pressure, const double> p(storage.data(), storage.size());
#ifdef NONDIM_CONTROL
  const auto g = central_gradient(p, 1, 0.01 * units::m);
#else
  const auto g = central_gradient(p, 1, 0.01);
#endif
  return static_cast<int>(g.si());
}
