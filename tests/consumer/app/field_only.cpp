// The part of the public contract that <nondim/field.hpp> gives on the standard library alone:
// field_view, strided_field_view, field, their elements read and written as quantities.
#include <nondim/field.hpp>

#include <vector>

int main() {
  using namespace nondim;
  std::vector<double> p_si{101325.0, 2.0e5};
  const field_view<dims::pressure> p(p_si.data(), p_si.size());
  const field_view<dims::pressure, const double> frozen = p;
  struct cell {
    double rho, u;
  };
  std::vector<cell> cells{{1.2, 3.0}, {1.1, 4.0}};
  const strided_field_view<dims::velocity> u(&cells[0].u, cells.size(), sizeof(cell) / sizeof(double));
  field<dims::density> rho(2, quantity<dims::density>::from_si(1.2));
  p[1] = 0.5 * rho[1] * u[1] * u[1];  // a dynamic pressure
  return frozen[1].si() == 0.5 * 1.2 * 4.0 * 4.0 && frozen.data() == p_si.data() ? 0 : 1;
}
