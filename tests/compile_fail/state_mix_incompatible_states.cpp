// Adding a state of primitive variables to one of conserved variables: the first component
// whose dimensions differ is named, with both tags.
// expect: nondim: cannot add or subtract state vectors whose component at the position shown differs
// expect: component_at<1, ?mass, nondim::spelled::dim<nondim::spelled::L<-1>, nondim::spelled::M<1> ?> ?>
// expect: component_at<1, ?density, nondim::spelled::named<.*kind::density_kg_per_m3, .*L<-3>, .*M<1> ?> ?> ?>
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <vector>
using namespace nondim;
struct mass : component<dims::mass / dims::length> {};
struct momentum : component<dims::mass_flow_rate> {};
struct energy : component<dims::energy / dims::length> {};
using conserved = state_set<mass, momentum, energy>;
struct density : component<dims::density> {};
struct velocity : component<dims::velocity> {};
struct pressure : component<dims::pressure> {};
using primitive = state_set<density, velocity, pressure>;
int main() {
  std::vector<double> u_storage(3 * 4), w_storage(3 * 4);
  const state_view<conserved, layout::soa> u(u_storage.data(), 4);
  const state_view<primitive, layout::soa> w(w_storage.data(), 4);
#ifdef NONDIM_CONTROL
  u[1] = u[0] + u[2];
#else
  u[1] = u[0] + w[0];
#endif
  return static_cast<int>(u_storage[1]);
}
