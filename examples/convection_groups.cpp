// Exact dimensionless groups of forced convection from a heated cylinder in cross-flow.
//
// The variables are named and given with their units; nondim returns the rank, the
// repeating variables it chose, each group with integer exponents and the names it
// recognises, and the SVD cross-check. The named basis re-expresses the same null space
// in Nusselt, Reynolds and Prandtl numbers.
#include <nondim/nondim.hpp>

#include <iostream>

int main() {
  using namespace nondim;
  problem p;
  p.add("h", "W/(m^2*K)")      // film coefficient: the dependent variable (first)
      .add("k", "W/(m*K)")     // thermal conductivity of the air
      .add("U", "m/s")         // free-stream speed
      .add("D", "mm")          // cylinder diameter
      .add("rho", "kg/m^3")    // air density
      .add("mu", "Pa*s")       // dynamic viscosity
      .add("cp", "J/(kg*K)");  // specific heat capacity

  const analysis classical = analyze(p);
  std::cout << to_string(classical) << '\n';

  options named;
  named.form = basis::named;
  const analysis practitioner = analyze(p, named);
  std::cout << "named basis\n";
  for (const pi_group& g : practitioner.groups) {
    std::cout << "  " << g.text();
    if (!g.matches.empty()) std::cout << " = " << g.matches.front().symbol << " (" << g.matches.front().name << ")";
    std::cout << '\n';
  }
  return 0;
}
