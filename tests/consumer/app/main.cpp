// An outside project using nondim's public contract (DESIGN.md), built against nondim
// either installed (find_package) or as a subdirectory.
#include <nondim/quantity.hpp>

#include <cstdio>

int main() {
  using namespace nondim;
  // quantities, units and compile-time checks
  constexpr auto rho = 1.2 * units::kg / units::m3;
  constexpr auto U = 10.0 * units::m / units::s;
  constexpr auto D = 0.1 * units::m;
  constexpr auto mu = 1.8e-5 * units::Pa * units::s;
  constexpr double Re = rho * U * D / mu;  // a dimensionless quantity converts to double
  static_assert(Re > 66666.0 && Re < 66667.0);
  constexpr quantity<dims::pressure> q = 0.5 * rho * pow<2>(U);
  static_assert(decltype(sqrt(q / rho))::dim == dims::velocity);
  const double psi = q / units::psi;
  std::printf("Re = %.0f, dynamic pressure = %.5f psi, %s\n", Re, psi, to_string(dims::pressure).c_str());
  return (psi > 0.0087 && psi < 0.0088) ? 0 : 1;
}
