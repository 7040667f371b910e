// Tests of nondim/solver/groups/scales.hpp: reference scales for nondimensional solvers, exponents
// fixed at compile time.
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <array>
#include <cmath>
#include <cstdint>
#include <random>
#include <type_traits>

using namespace nondim;

namespace {
template <std::size_t K>
using ks = std::array<rational, K>;

// references of the incompressible Navier-Stokes equations: density, velocity, length
using ns_scales = reference_scales<dims::density, dims::velocity, dims::length>;
// and of the energy equation: plus a temperature difference
using energy_scales = reference_scales<dims::density, dims::velocity, dims::length, dims::temperature>;
// for wall heat flux: conductivity, temperature difference, length
using wall_scales = reference_scales<dims::thermal_conductivity, dims::temperature, dims::length>;
// for free-surface flow: gravity and length
using gravity_scales = reference_scales<dims::acceleration, dims::length>;

/// Spacing between x and the next double away from zero (x > 0, normal).
double ulp_above(double x) {
  return std::nextafter(x, INFINITY) - x;
}
/// Whether a and b are equal or adjacent doubles.
bool within_one_ulp(double a, double b) {
  return a == b || std::nextafter(a, INFINITY) == b || std::nextafter(a, -INFINITY) == b;
}
}  // namespace

// White, Viscous Fluid Flow, ch. 2 and 3 (from memory): with rho, U, L as references the
// incompressible Navier-Stokes equations take p* = p/(rho U^2), t* = t U/L, u* = u/U,
// x* = x/L, and the viscous term's coefficient mu/(rho U L) = 1/Re; gravity enters as
// g L/U^2 = 1/Fr^2.
static_assert(ns_scales::exponents<dims::pressure>() == ks<3>{1, 2, 0});
static_assert(ns_scales::exponents<dims::time>() == ks<3>{0, -1, 1});
static_assert(ns_scales::exponents<dims::velocity>() == ks<3>{0, 1, 0});
static_assert(ns_scales::exponents<dims::length>() == ks<3>{0, 0, 1});
static_assert(ns_scales::exponents<dims::dynamic_viscosity>() == ks<3>{1, 1, 1});
static_assert(ns_scales::exponents<dims::kinematic_viscosity>() == ks<3>{0, 1, 1});
static_assert(ns_scales::exponents<dims::acceleration>() == ks<3>{0, 2, -1});
static_assert(ns_scales::exponents<dims::force>() == ks<3>{1, 2, 2});  // rho U^2 L^2 (drag coefficient)
static_assert(ns_scales::exponents<dims::dimensionless>() == ks<3>{0, 0, 0});
static_assert(ns_scales::spans<dims::power> && !ns_scales::spans<dims::temperature>);

// White, Viscous Fluid Flow, ch. 3, energy equation (from memory): with dT as well, the
// conduction term's coefficient k/(rho cp U L) = alpha/(U L) = 1/Pe, and cp dT/U^2 = 1/Ec
// (Eckert number Ec = U^2/(cp dT)).
static_assert(energy_scales::exponents<dims::thermal_diffusivity>() == ks<4>{0, 1, 1, 0});
static_assert(energy_scales::exponents<dims::specific_heat_capacity>() == ks<4>{0, 2, 0, -1});
static_assert(energy_scales::exponents<dims::thermal_conductivity>() == ks<4>{1, 3, 1, -1});

// Incropera & DeWitt, ch. 6 (from memory): a wall heat flux scaled by k dT/L is the Nusselt number.
static_assert(wall_scales::exponents<dims::heat_flux_density>() == ks<3>{1, 1, -1});
static_assert(wall_scales::exponents<dims::heat_transfer_coefficient>() == ks<3>{1, 0, -1});

// Rational exponents where the span needs them (White, Fluid Mechanics, ch. 10, from memory:
// the Froude number U/sqrt(g L) and the time scale sqrt(L/g) of free-surface flow).
static_assert(gravity_scales::exponents<dims::velocity>() == ks<2>{rational{1, 2}, rational{1, 2}});
static_assert(gravity_scales::exponents<dims::time>() == ks<2>{rational{-1, 2}, rational{1, 2}});
static_assert(!gravity_scales::spans<dims::mass>);

// A dimension outside the span: the base dimension the references lack is found. With only a
// velocity, a length needs L or T added (common practice, no source: L = (L/T) T).
static_assert(detail::span_solution_v<dims::length, dims::velocity>.lacking_base == 0);
static_assert(detail::span_solution_v<dims::temperature, dims::density, dims::velocity, dims::length>.lacking_base ==
              4);
// independence: mu = rho U L is the first dependent reference (index 3)
static_assert(
    detail::reference_check_v<dims::density, dims::velocity, dims::length, dims::dynamic_viscosity>.first_dependent ==
    3);
static_assert(detail::reference_check_v<dims::density, dims::velocity, dims::length>.first_dependent == 3);

// everything is constexpr: references 2 m and 4 s give a velocity scale of 0.5 m/s
static_assert(scales(2.0 * units::m, 4.0 * units::s).nondimensional(8.0 * units::m / units::s) == 16.0);
static_assert(scales(2.0 * units::m, 4.0 * units::s).scale<dims::acceleration>().si() == 0.125);

TEST_SUITE("scales") {
  TEST_CASE("incompressible Navier-Stokes: p*, t*, and the viscous coefficient 1/Re") {
    // water in a 5 cm channel at 0.3 m/s (a scenario of our own)
    const auto rho = 998.2 * units::kg / units::m3;
    const auto U = 0.3 * units::m / units::s;
    const auto L = 0.05 * units::m;
    const auto mu = 1.002e-3 * units::Pa * units::s;
    const auto s = scales(rho, U, L);
    const double r = rho.si(), u = U.si(), l = L.si();

    const auto p = 120.0 * units::Pa;
    CHECK(s.nondimensional(p) == p.si() / (r * (u * u)));  // the same operations: bit for bit
    CHECK(s.nondimensional(p) == doctest::Approx(120.0 / (998.2 * 0.09)).epsilon(1e-15));

    const auto t = 2.5 * units::s;
    CHECK(s.nondimensional(t) == t.si() / (l / u));
    CHECK(s.nondimensional(t) == doctest::Approx(2.5 * 0.3 / 0.05).epsilon(1e-15));  // t U / L = 15

    const double inv_re = s.nondimensional(mu);
    CHECK(inv_re == mu.si() / (r * u * l));
    CHECK(1.0 / inv_re == doctest::Approx(r * u * l / mu.si()).epsilon(1e-15));  // Re = rho U L / mu

    // gravity: g L / U^2 = 1/Fr^2
    const auto g = 9.80665 * units::m / (units::s * units::s);  // standard gravity (CGPM 1901)
    CHECK(s.nondimensional(g) == doctest::Approx(g.si() * l / (u * u)).epsilon(1e-15));

    // the scale itself, as a quantity of its dimension
    const auto p_ref = s.scale<dims::pressure>();
    static_assert(std::is_same_v<std::remove_cvref_t<decltype(p_ref)>, quantity<dims::pressure>>);
    CHECK(p_ref.si() == r * (u * u));
    CHECK(s.reference<1>().si() == u);
  }

  TEST_CASE("energy equation: alpha/(U L) is 1/Pe and cp dT/U^2 is 1/Ec") {
    // air at 300 K (Incropera & DeWitt, table A.4, from memory: alpha = 22.5e-6 m^2/s,
    // cp = 1007 J/(kg K)) over a 0.2 m plate at 5 m/s, 30 K hotter
    const auto rho = 1.1614 * units::kg / units::m3;
    const auto U = 5.0 * units::m / units::s;
    const auto L = 0.2 * units::m;
    const auto dT = 30.0 * units::K;
    const auto s = scales(rho, U, L, dT);
    const auto alpha = 22.5e-6 * units::m2 / units::s;
    const auto cp = 1007.0 * units::J / (units::kg * units::K);
    const double Pe = U.si() * L.si() / alpha.si();
    CHECK(1.0 / s.nondimensional(alpha) == doctest::Approx(Pe).epsilon(1e-15));
    const double Ec = U.si() * U.si() / (cp.si() * dT.si());
    CHECK(1.0 / s.nondimensional(cp) == doctest::Approx(Ec).epsilon(1e-15));
  }

  TEST_CASE("a wall heat flux scaled by k dT / L is the Nusselt number") {
    // Incropera & DeWitt, ch. 6 (from memory): q'' = h dT and Nu = h L / k.
    const auto k = 0.0263 * units::W / (units::m * units::K);
    const auto dT = 40.0 * units::K;
    const auto L = 0.5 * units::m;
    const auto h = 12.0 * units::W / (units::m2 * units::K);
    const auto s = scales(k, dT, L);
    const auto q = h * dT;
    const double Nu = h.si() * L.si() / k.si();
    CHECK(s.nondimensional(q) == doctest::Approx(Nu).epsilon(1e-15));
    CHECK(s.nondimensional(q) == q.si() / (k.si() * dT.si() / L.si()));
    CHECK(s.nondimensional(h) == doctest::Approx(Nu).epsilon(1e-15));  // h scaled by k/L
  }

  TEST_CASE("rational exponents: the Froude number U / sqrt(g L)") {
    // White, Fluid Mechanics, ch. 10 (from memory); a 2 m deep channel at 1.5 m/s
    const auto g = 9.80665 * units::m / (units::s * units::s);
    const auto h = 2.0 * units::m;
    const auto s = scales(g, h);
    const auto U = 1.5 * units::m / units::s;
    const double Fr = U.si() / std::sqrt(g.si() * h.si());
    CHECK(s.nondimensional(U) == doctest::Approx(Fr).epsilon(1e-15));
    CHECK(s.nondimensional(U) == U.si() / (std::sqrt(g.si()) * std::sqrt(h.si())));  // roots, then product
    CHECK(s.scale<dims::time>().si() == doctest::Approx(std::sqrt(h.si() / g.si())).epsilon(1e-15));
  }

  TEST_CASE("nondimensional temperatures are built from differences") {
    // theta = (T - T_ref) / dT (Incropera & DeWitt, ch. 5 and 6, from memory)
    const auto T_inf = from_celsius(25.0);
    const auto T_wall = from_celsius(45.0);
    const auto dT = T_wall - T_inf;  // a difference: 20 K
    const auto s = scales(1.2 * units::kg / units::m3, 2.0 * units::m / units::s, 0.1 * units::m, dT);
    CHECK(s.nondimensional_difference(T_wall, T_inf) == 1.0);
    CHECK(s.nondimensional_difference(T_inf, T_inf) == 0.0);
    CHECK(s.nondimensional_difference(from_celsius(35.0), T_inf) == doctest::Approx(0.5).epsilon(1e-13));
    // the inverse gives the point back: 35 C (SI Brochure 9th ed., 2.3.1: t/C = T/K - 273.15)
    CHECK(s.dimensional_point(0.5, T_inf).celsius() == doctest::Approx(35.0).epsilon(1e-13));
    CHECK(s.dimensional_point(0.5, T_inf).kelvin() == doctest::Approx(308.15).epsilon(1e-14));
    // a temperature difference itself scales by dT
    CHECK(s.nondimensional(5.0 * units::K) == 5.0 / dT.si());
  }

  TEST_CASE("round trip: exact where the scale is a power of two") {
    // IEEE 754-2019, 4.3 and 5.4.1: operations are correctly rounded, so dividing and
    // multiplying by 2^k (no overflow or underflow) is exact.
    const auto s = scales(1024.0 * units::kg / units::m3, 2.0 * units::m / units::s, 0.5 * units::m);
    REQUIRE(s.scale<dims::pressure>().si() == 4096.0);  // rho U^2 = 2^12
    REQUIRE(s.scale<dims::time>().si() == 0.25);        // L / U = 2^-2
    std::mt19937_64 gen(20240601);
    std::uniform_real_distribution<double> mantissa(1.0, 2.0);
    std::uniform_int_distribution<int> exponent(-300, 300);
    int exact = 0;
    for (int i = 0; i < 20000; ++i) {
      const double x = std::ldexp(mantissa(gen), exponent(gen));
      const auto p = quantity<dims::pressure>::from_si(x);
      const auto t = quantity<dims::time>::from_si(-x);
      exact += s.dimensional<dims::pressure>(s.nondimensional(p)) == p ? 1 : 0;
      exact += s.dimensional<dims::time>(s.nondimensional(t)) == t ? 1 : 0;
    }
    CHECK(exact == 40000);
  }

  TEST_CASE("round trip: within one unit in the last place otherwise") {
    // IEEE 754-2019, 4.3: each of x/s and y*s is rounded once; fl(fl(x/s) s) lies within one
    // ulp of x (checked here over random values, mantissas and scales)
    const auto s = scales(998.2 * units::kg / units::m3, 0.3 * units::m / units::s, 0.05 * units::m);
    const auto sg = scales(9.80665 * units::m / (units::s * units::s), 2.0 * units::m);  // rational exponents
    std::mt19937_64 gen(7);
    std::uniform_real_distribution<double> mantissa(1.0, 2.0);
    std::uniform_int_distribution<int> exponent(-200, 200);
    int within = 0;
    int exact = 0;
    for (int i = 0; i < 20000; ++i) {
      const double x = std::ldexp(mantissa(gen), exponent(gen));
      const auto p = quantity<dims::pressure>::from_si(x);
      const auto mu = quantity<dims::dynamic_viscosity>::from_si(x);
      const auto u = quantity<dims::velocity>::from_si(x);
      const double bp = s.dimensional<dims::pressure>(s.nondimensional(p)).si();
      const double bm = s.dimensional<dims::dynamic_viscosity>(s.nondimensional(mu)).si();
      const double bu = sg.dimensional<dims::velocity>(sg.nondimensional(u)).si();
      within += (within_one_ulp(bp, x) ? 1 : 0) + (within_one_ulp(bm, x) ? 1 : 0) + (within_one_ulp(bu, x) ? 1 : 0);
      exact += (bp == x ? 1 : 0) + (bm == x ? 1 : 0) + (bu == x ? 1 : 0);
    }
    CHECK(within == 60000);
    CHECK(exact > 30000);  // most come back exactly
    CHECK(ulp_above(1.0) == std::ldexp(1.0, -52));
  }

  TEST_CASE("dimensionless quantities are their own scale") {
    const auto s = scales(1.2 * units::kg / units::m3, 2.0 * units::m / units::s, 0.1 * units::m);
    const quantity<dims::dimensionless> cf = 0.0042;
    CHECK(s.nondimensional(cf) == 0.0042);
    CHECK(s.dimensional<dims::dimensionless>(0.0042).si() == cf.si());
  }
}
