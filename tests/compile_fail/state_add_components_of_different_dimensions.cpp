// Adding the mass and the energy per unit length of one cell of a state vector.
// expect: nondim: cannot add quantities of different dimensions
// expect: dim<nondim::spelled::L<-1>, nondim::spelled::M<1> ?>
// expect: dim<nondim::spelled::L<1>, nondim::spelled::M<1>, nondim::spelled::T<-2> ?>
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <vector>
using namespace nondim;
struct mass : component<dims::mass / dims::length> {};
struct momentum : component<dims::mass_flow_rate> {};
struct energy : component<dims::energy / dims::length> {};
using conserved = state_set<mass, momentum, energy>;
int main() {
  std::vector<double> storage(3 * 4);
  const state_view<conserved, layout::aos> u(storage.data(), 4);
#ifdef NONDIM_CONTROL
  const auto sum = u[0].get<mass>() + u[1].get<mass>();
#else
  const auto sum = u[0].get<mass>() + u[0].get<energy>();
#endif
  return static_cast<int>(sum.si());
}
