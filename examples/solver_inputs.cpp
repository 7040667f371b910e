// A solver's inputs, checked at compile time.
//
// Scenario (invented for this example): forced-air cooling of a battery module. Air flows
// through a rectangular cooling channel between cell rows; the code computes the channel's
// Reynolds and Prandtl numbers, a Dittus–Boelter-form Nusselt number and the heat the air
// removes. Every input carries its dimension in its type: passing a dynamic viscosity where
// a kinematic one is meant, or adding a length to a time, does not compile. Re and Pr come
// from `pi_groups`: the exponents are worked out by the compiler from the argument types,
// so the run-time cost is the hand-written products and a wrong exponent cannot happen.
#include <nondim/solver.hpp>  // quantities and pi_groups: standard library only

#include <cmath>
#include <iostream>

using namespace nondim;

namespace {

struct air_properties {  // at the film temperature; values are for the demo only
  quantity<dims::density> rho;
  quantity<dims::dynamic_viscosity> mu;
  quantity<dims::thermal_conductivity> k;
  quantity<dims::specific_heat_capacity> cp;
};

struct channel {
  quantity<dims::length> width;
  quantity<dims::length> height;
  quantity<dims::length> length;
};

// Hydraulic diameter D_h = 4 A / P (common practice, no source).
constexpr quantity<dims::length> hydraulic_diameter(const channel& c) {
  return 4.0 * (c.width * c.height) / (2.0 * (c.width + c.height));
}

// The typed signature is the unit check: only a velocity, a length and the fluid fit here.
// pi_groups(rho, u, d, mu): rho first, so the one group is rho u d / mu = Re (not 1/Re).
constexpr double reynolds(quantity<dims::velocity> u, quantity<dims::length> d, const air_properties& air) {
  return pi_groups(air.rho, u, d, air.mu)[0];
}

// pi_groups(cp, mu, k): cp mu / k = Pr; four base dimensions, rank 2, one group.
constexpr double prandtl(const air_properties& air) {
  return pi_groups(air.cp, air.mu, air.k)[0];
}

}  // namespace

int main() {
  constexpr air_properties air{1.16 * units::kg / units::m3, 1.86e-5 * units::Pa * units::s,
                               0.0263 * units::W / (units::m * units::K), 1007.0 * units::J / (units::kg * units::K)};
  constexpr channel gap{60.0 * units::mm, 10.0 * units::mm, 0.30 * units::m};
  constexpr auto inlet_speed = 15.0 * units::m / units::s;
  const auto inlet = from_celsius(25.0);
  const auto cell_wall = from_celsius(38.0);

  constexpr auto d_h = hydraulic_diameter(gap);
  constexpr double re = reynolds(inlet_speed, d_h, air);
  constexpr double pr = prandtl(air);
  static_assert(pr > 0.6 && pr < 0.8, "air has a Prandtl number near 0.7");
  // The compile-time basis is the textbook one (Incropera et al., ch. 6, from memory):
  // Re = rho u D_h / mu and Pr = mu cp / k, to the rounding of the products.
  static_assert(re / (air.rho * inlet_speed * d_h / air.mu) - 1.0 < 1e-15 &&
                re / (air.rho * inlet_speed * d_h / air.mu) - 1.0 > -1e-15);
  static_assert(pr / (air.mu * air.cp / air.k) - 1.0 < 1e-15 && pr / (air.mu * air.cp / air.k) - 1.0 > -1e-15);

  // Dittus–Boelter form, Nu = 0.023 Re^0.8 Pr^0.4 (Incropera et al., Fundamentals of Heat
  // and Mass Transfer, eq. 8.60, from memory). Valid for Re > 10^4: the demo says so when not.
  const double nu = 0.023 * std::pow(re, 0.8) * std::pow(pr, 0.4);
  const quantity<dims::heat_transfer_coefficient> h = nu * air.k / d_h;
  const auto wetted_area = 2.0 * (gap.width + gap.height) * gap.length;
  const quantity<dims::power> heat = h * wetted_area * (cell_wall - inlet);

  std::cout << "Battery-module cooling channel (demo values)\n"
            << "  hydraulic diameter  D_h = " << d_h / units::mm << " mm\n"
            << "  Reynolds number     Re  = " << re
            << (re < 1.0e4 ? "  (below 10^4: Dittus-Boelter is outside its range)" : "") << "\n"
            << "  Prandtl number      Pr  = " << pr << "\n"
            << "  Nusselt number      Nu  = " << nu << "\n"
            << "  film coefficient    h   = " << h / (units::W / (units::m2 * units::K)) << " W/(m^2*K)  ("
            << h / (units::Btu / (units::h * pow<2>(units::ft) * units::delta_degF)) << " Btu/(h*ft^2*degF))\n"
            << "  heat removed        Q   < " << heat / units::W
            << " W per channel (wall-to-inlet difference: an upper bound)\n"
            << "Every line above was unit-checked by the compiler; none of it costs run time.\n";
  return 0;
}
