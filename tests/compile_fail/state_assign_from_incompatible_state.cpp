// Storing a change of state where the conserved variables go: dt times a flux difference is a
// mass (kg), not a mass per length (kg/m), until divided by dx.
// expect: nondim: cannot assign a state from one whose component at the position shown has another dimension
// expect: component_at<1, ?mass, nondim::spelled::dim<nondim::spelled::L<-1>, nondim::spelled::M<1> ?> ?>
// expect: component_at<1, nondim::scaled_component<mass_flux,
// expect: nondim::spelled::dim<nondim::spelled::M<1> ?> ?> ?>
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <vector>
using namespace nondim;
struct mass : component<dims::mass / dims::length> {};
struct momentum : component<dims::mass_flow_rate> {};
struct energy : component<dims::energy / dims::length> {};
using conserved = state_set<mass, momentum, energy>;
struct mass_flux : component<dims::mass_flow_rate> {};
struct momentum_flux : component<dims::force> {};
struct energy_flux : component<dims::power> {};
using flux = state_set<mass_flux, momentum_flux, energy_flux>;
int main() {
  std::vector<double> u_storage(3 * 4), f_storage(3 * 4);
  const state_view<conserved, layout::aos> u(u_storage.data(), 4);
  const state_view<flux, layout::aos> f(f_storage.data(), 4);
  const auto dt = 1.0e-5 * units::s;
  const auto dx = 0.01 * units::m;
#ifdef NONDIM_CONTROL
  u[1] = dt / dx * (f[2] - f[1]);
#else
  u[1] = dt * (f[2] - f[1]);
  (void)dx;
#endif
  return static_cast<int>(u_storage[1]);
}
