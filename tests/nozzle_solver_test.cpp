// Tests of the typed nozzle solver of examples/nozzle: the SI run and the run in reference
// units (nondimensional form) agree to round-off, and the steady flow is the isentropic one.
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>
#include <cstddef>

#include "../examples/nozzle/demo_case.hpp"
#include "../examples/nozzle/reference_units.hpp"

namespace {

// Isentropic area-Mach relation, Anderson, Modern Compressible Flow (3rd ed.), eq. 5.20
// (from memory): (A/A*)^2 = (1/M^2) [2/(g+1) (1 + (g-1)/2 M^2)]^((g+1)/(g-1)).
double area_ratio(double m, double g) {
  return std::sqrt(std::pow(2.0 / (g + 1.0) * (1.0 + 0.5 * (g - 1.0) * m * m), (g + 1.0) / (g - 1.0))) / m;
}
/// M from A/A* on the subsonic or supersonic branch, by bisection (A/A* is monotonic on each).
double mach_of(double ratio, double g, bool supersonic) {
  double lo = supersonic ? 1.0 : 1e-6, hi = supersonic ? 20.0 : 1.0;
  for (int k = 0; k < 200; ++k) {
    const double mid = 0.5 * (lo + hi);
    const bool above = area_ratio(mid, g) > ratio;
    // subsonic: A/A* falls as M rises; supersonic: it rises
    if (above == supersonic)
      hi = mid;
    else
      lo = mid;
  }
  return 0.5 * (lo + hi);
}

/// Largest deviation of the computed Mach number from the isentropic one (throat point excluded:
/// there the relation has infinite slope dM/d(A/A*)).
double mach_error(const nozzle::setup& in, const nozzle::solution& r) {
  const double g = in.g.gamma, rg = in.g.r.si();
  double worst = 0.0;
  for (std::size_t i = 0; i < r.x.size(); ++i) {
    const double xi = r.x[i] / in.nozzle.length.si();
    if (std::abs(xi - in.nozzle.s) < 0.05) continue;
    const double ratio = 1.0 + in.nozzle.k * (xi - in.nozzle.s) * (xi - in.nozzle.s);
    const double exact = mach_of(ratio, g, xi > in.nozzle.s);
    const double computed = r.v[i] / std::sqrt(g * rg * r.t[i]);
    worst = std::max(worst, std::abs(computed - exact) / exact);
  }
  return worst;
}

double largest_relative_difference(const std::vector<double>& a, const std::vector<double>& b) {
  double worst = 0.0;
  for (std::size_t i = 0; i < a.size(); ++i) worst = std::max(worst, std::abs(a[i] - b[i]) / std::abs(a[i]));
  return worst;
}

}  // namespace

TEST_SUITE("nozzle solver") {
  TEST_CASE("the SI run and the run in reference units agree to round-off") {
    const nozzle::setup in = nozzle::demo_case(81, 3000);
    nozzle::serial comm;
    const auto si = nozzle::run(in, nozzle::serial::partition(in.points), comm);
    const auto s = nozzle::nozzle_scales(in);
    const auto star = nozzle::run(nozzle::in_reference_units(s, in), nozzle::serial::partition(in.points), comm);
    // in reference units the inlet temperature is T/T0 and the gas constant R T0 / a0^2 = 1/gamma
    CHECK(star.t.front() < 1.0);
    CHECK(nozzle::in_reference_units(s, in).g.r.si() == doctest::Approx(1.0 / in.g.gamma).epsilon(1e-15));
    const auto back = nozzle::to_si(s, star);
    REQUIRE(back.x.size() == si.x.size());
    // the same operations on numbers of other magnitudes: the roundings differ, nothing else
    CHECK(largest_relative_difference(si.x, back.x) < 1e-14);
    CHECK(largest_relative_difference(si.rho, back.rho) < 1e-12);
    CHECK(largest_relative_difference(si.v, back.v) < 1e-12);
    CHECK(largest_relative_difference(si.p, back.p) < 1e-12);
    CHECK(largest_relative_difference(si.t, back.t) < 1e-12);
    CHECK(star.largest_courant == doctest::Approx(si.largest_courant).epsilon(1e-12));
  }

  TEST_CASE("the steady flow follows the isentropic area-Mach relation within the truncation error") {
    nozzle::serial comm;
    const nozzle::setup coarse = nozzle::demo_case(41, 3000);
    const nozzle::setup fine = nozzle::demo_case(81, 6000);
    const auto rc = nozzle::run(coarse, nozzle::serial::partition(coarse.points), comm);
    const auto rf = nozzle::run(fine, nozzle::serial::partition(fine.points), comm);
    const double ec = mach_error(coarse, rc), ef = mach_error(fine, rf);
    MESSAGE("largest relative Mach error: ", ec, " (41 points), ", ef, " (81 points)");
    CHECK(ef < 0.01);
    // a truncation error: it falls with the grid spacing, at least by the factor four that
    // MacCormack's second order gives on halving dx (near the throat the coarse grid does worse)
    CHECK(ec / ef > 4.0);
    // mass flow: choked, mdot = p0 A_t sqrt(g / (R T0)) (2/(g+1))^((g+1)/(2(g-1))),
    // Anderson, Modern Compressible Flow, eq. 5.21 (from memory)
    const double g = fine.g.gamma;
    const double mdot = fine.res.p0.si() * fine.nozzle.throat.si() * std::sqrt(g / (fine.g.r.si() * fine.res.t0.si())) *
                        std::pow(2.0 / (g + 1.0), (g + 1.0) / (2.0 * (g - 1.0)));
    for (std::size_t i = 0; i < rf.x.size(); ++i) {
      const double a = fine.nozzle.area(rf.x[i] * nondim::units::m).si();
      CHECK(rf.rho[i] * rf.v[i] * a == doctest::Approx(mdot).epsilon(0.005));
    }
  }
}
