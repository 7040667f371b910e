// A quasi-one-dimensional nozzle solver typed down to its kernels (examples/nozzle), run in SI
// and in nondimensional form, with a log in the engineer's units.
//
// Scenario (our own invention): air from a reservoir at 500 kPa and 600 K expands through a
// converging-diverging nozzle 0.3 m long with a 2 cm^2 throat; MacCormack's scheme marches
// to the steady subsonic-supersonic flow.
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <iostream>

#include "nozzle/demo_case.hpp"
#include "nozzle/nozzle_flow.hpp"
#include "nozzle/reference_units.hpp"

int main() {
  using namespace nondim;
  const nozzle::setup in = nozzle::demo_case(81, 3000);
  nozzle::serial comm;
  const nozzle::solution si = nozzle::run(in, nozzle::serial::partition(in.points), comm);

  // the same solver in nondimensional form: rho/rho0, V/a0, x/L, T/T0, and back to SI
  const auto s = nozzle::nozzle_scales(in);
  const nozzle::solution star =
      nozzle::run(nozzle::in_reference_units(s, in), nozzle::serial::partition(in.points), comm);
  const nozzle::solution back = nozzle::to_si(s, star);
  double largest = 0.0;
  for (std::size_t i = 0; i < si.p.size(); ++i) largest = std::max(largest, std::abs(back.p[i] / si.p[i] - 1.0));

  std::cout << "reservoir " << in_unit(in.res.p0, units::kPa) << ", " << in_unit(in.res.t0, units::K) << "; throat "
            << in_unit(in.nozzle.throat, units::cm * units::cm, "cm\u00b2") << "\n";
  std::cout << "x          p            V            T          M\n";
  for (std::size_t i = 0; i < si.x.size(); i += 10) {
    const auto p = si.p[i] * units::Pa;
    const auto v = si.v[i] * units::m / units::s;
    const auto t = si.t[i] * units::K;
    const double mach = v / sqrt(in.g.gamma * in.g.r * t);
    std::cout << in_unit(si.x[i] * units::m, units::mm) << "\t" << in_unit(p, units::kPa) << "\t"
              << in_unit(v, units::m / units::s, "m/s") << "\t" << in_unit(t, units::K) << "\t" << mach << "\n";
  }
  std::cout << "largest Courant number " << si.largest_courant << "; SI and nondimensional runs differ by at most "
            << largest << " (relative, pressure)\n";
  return largest < 1e-12 ? 0 : 1;
}
