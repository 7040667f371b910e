// Tests of nondim/solver/groups/pi_groups.hpp: the classical basis computed at compile time, and
// group values computed with nothing but the multiplications.
//
// Expected exponents: the textbook groups cited in tests/textbook_problems.hpp, brought to the
// classical form of DESIGN.md by hand, and re-derived independently with python3-sympy by
// tests/sympy/classical_basis.py (exact rationals, same rule). Both agree for every problem.
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <array>
#include <cmath>
#include <cstdint>
#include <numeric>
#include <type_traits>
#include <utility>

#include "textbook_problems.hpp"

using namespace nondim;

namespace {

template <const auto& P>
struct problem_traits {
  template <std::size_t... I>
  static constexpr auto basis(std::index_sequence<I...>) {
    return pi_basis<P.variables[I].dim...>();
  }
  template <std::size_t... I>
  static constexpr auto exponents(std::index_sequence<I...>) {
    return pi_exponents<P.variables[I].dim...>();
  }
  static constexpr std::size_t n = P.variables.size();
};

/// pi_basis<the dimensions of P...>()
template <const auto& P>
constexpr auto basis_of() {
  return problem_traits<P>::basis(std::make_index_sequence<problem_traits<P>::n>{});
}
/// pi_exponents<the dimensions of P...>()
template <const auto& P>
constexpr auto exponents_of() {
  return problem_traits<P>::exponents(std::make_index_sequence<problem_traits<P>::n>{});
}

template <std::size_t N, std::size_t G>
using groups = std::array<std::array<std::int64_t, N>, G>;

/// The first `rank` repeating variables are `expected`, in the order the rule chose them.
template <const auto& P, std::size_t R>
constexpr bool repeating_are(const std::array<std::size_t, R>& expected) {
  const auto b = basis_of<P>();
  if (b.rank != R) return false;
  for (std::size_t i = 0; i < R; ++i)
    if (b.repeating[i] != expected[i]) return false;
  return true;
}

/// Variables flagged isolated (appearing in no group) are exactly `expected`.
template <const auto& P, std::size_t K>
constexpr bool isolated_are(const std::array<std::size_t, K>& expected) {
  const auto b = basis_of<P>();
  std::size_t count = 0;
  for (std::size_t j = 0; j < problem_traits<P>::n; ++j) count += b.isolated[j] ? 1U : 0U;
  if (count != K) return false;
  for (const std::size_t j : expected)
    if (!b.isolated[j]) return false;
  return true;
}

}  // namespace

// ---- the textbook problems, at compile time ---------------------------------------------

// Drag on a sphere (White, Fluid Mechanics, ch. 5, from memory): C_F = F/(rho U^2 D^2) and
// the Reynolds group in classical form mu/(rho U D) = 1/Re. Repeating: D, U, rho.
static_assert(exponents_of<textbook::sphere_drag>() == groups<5, 2>{{{1, -1, -2, -2, 0}, {0, -1, -1, -1, 1}}});
static_assert(repeating_are<textbook::sphere_drag>(std::array<std::size_t, 3>{3, 2, 1}));
static_assert(isolated_are<textbook::sphere_drag>(std::array<std::size_t, 0>{}));
static_assert(pi_group_count<dims::force, dims::density, dims::velocity, dims::length, dims::dynamic_viscosity> == 2);

// Rough pipe (White, ch. 6, Moody chart, from memory): Euler dp/(rho U^2), 1/Re, L/D, eps/D.
// D, L and eps tie on the key (one base dimension, |exponent| sum 1): input order picks D.
static_assert(exponents_of<textbook::pipe_pressure_drop>() ==
              groups<7, 4>{
                  {{1, -1, -2, 0, 0, 0, 0}, {0, -1, -1, -1, 1, 0, 0}, {0, 0, 0, -1, 0, 1, 0}, {0, 0, 0, -1, 0, 0, 1}}});
static_assert(repeating_are<textbook::pipe_pressure_drop>(std::array<std::size_t, 3>{3, 2, 1}));

// Ship hull (White, ch. 5, from memory): force coefficient, 1/Re, and g L/U^2 = 1/Fr^2.
static_assert(exponents_of<textbook::ship_resistance>() ==
              groups<6, 3>{{{1, -1, -2, -2, 0, 0}, {0, -1, -1, -1, 1, 0}, {0, 0, -2, 1, 0, 1}}});

// Vortex shedding (White, ch. 5, from memory): Strouhal f D/U and 1/Re. U (two base
// dimensions, |exponent| sum 2) comes before rho (two, sum 4): the second key decides.
static_assert(exponents_of<textbook::vortex_shedding>() == groups<5, 2>{{{1, -1, 1, 0, 0}, {0, -1, -1, -1, 1}}});
static_assert(repeating_are<textbook::vortex_shedding>(std::array<std::size_t, 3>{2, 1, 3}));

// Pump (White, ch. 11, from memory): power coefficient P/(rho N^3 D^5), flow coefficient
// Q/(N D^3), and mu/(rho N D^2) (an inverse Reynolds number).
static_assert(exponents_of<textbook::pump_power>() ==
              groups<6, 3>{{{1, -1, -3, -5, 0, 0}, {0, 0, -1, -3, 1, 0}, {0, -1, -1, -2, 0, 1}}});

// Weir (White, ch. 10, from memory): Q = C b g^(1/2) H^(3/2), so Q^2/(g H^5) and b/H.
static_assert(exponents_of<textbook::weir_flow>() == groups<4, 2>{{{2, -1, -5, 0}, {0, 0, -1, 1}}});

// Orifice (White, ch. 6, from memory): Q = Cd A sqrt(2 dp/rho) gives Q^2 rho/(dp d^4).
static_assert(exponents_of<textbook::orifice_flow>() == groups<4, 1>{{{2, -1, 1, -4}}});

// Blasius layer (White, Viscous Fluid Flow, ch. 4, from memory): delta/x and nu/(U x) = 1/Re_x.
static_assert(exponents_of<textbook::boundary_layer>() == groups<4, 2>{{{1, -1, 0, 0}, {0, -1, -1, 1}}});

// Stokes settling (White, ch. 7, from memory): V = drho g d^2/(18 mu) is the product of
// (V^2/(g d))^(1/2) and (mu^2/(drho^2 g d^3))^(1/2), the two classical groups.
static_assert(exponents_of<textbook::stokes_settling>() == groups<5, 2>{{{2, -1, 0, -1, 0}, {0, -3, -2, -1, 2}}});

// Deep-water wave (Lamb, Hydrodynamics, art. 228, from memory): c^2/(g lambda).
static_assert(exponents_of<textbook::deep_water_wave>() == groups<3, 1>{{{2, -1, -1}}});

// Speed of sound (Anderson, Modern Compressible Flow, ch. 3, from memory): c^2 rho/p, and the
// dimensionless gamma is a group by itself.
static_assert(exponents_of<textbook::sound_speed>() == groups<4, 2>{{{2, 0, -1, 1}, {0, 1, 0, 0}}});

// Blast wave (G. I. Taylor, Proc. R. Soc. A 201, 1950): R = C (E t^2/rho)^(1/5), so the
// primitive group is R^5 rho/(E t^2).
static_assert(exponents_of<textbook::blast_wave>() == groups<4, 1>{{{5, -2, -1, 1}}});
// The rule takes the density (a material property) before t and E.
static_assert(repeating_are<textbook::blast_wave>(std::array<std::size_t, 3>{3, 1, 2}));

// Capillary rise (Jurin's law, h = 4 sigma cos(theta)/(rho g d), from memory): h/d, the
// inverse Bond number sigma/(rho g d^2), and the contact angle by itself. Surface tension
// repeats only when nothing else closes the rank: d, g, rho repeat.
static_assert(exponents_of<textbook::capillary_rise>() ==
              groups<6, 3>{{{1, 0, 0, 0, -1, 0}, {0, 1, -1, -1, -2, 0}, {0, 0, 0, 0, 0, 1}}});
static_assert(repeating_are<textbook::capillary_rise>(std::array<std::size_t, 3>{4, 3, 2}));

// Drop oscillation (Rayleigh 1879, from memory): omega^2 rho R^3/sigma.
static_assert(exponents_of<textbook::drop_oscillation>() == groups<4, 1>{{{2, -1, 1, 3}}});

// The dependent variable repeats when the others fall short of the rank (DESIGN.md,
// Algorithms): F alone carries mass, so it is repeating, isolated, and in no group.
static_assert(exponents_of<textbook::drag_without_density>() == groups<4, 1>{{{0, -1, -1, 1}}});
static_assert(repeating_are<textbook::drag_without_density>(std::array<std::size_t, 3>{1, 2, 0}));
static_assert(basis_of<textbook::drag_without_density>().dependent_repeating);
static_assert(isolated_are<textbook::drag_without_density>(std::array<std::size_t, 1>{0}));

// Forced convection (Incropera & DeWitt, ch. 6, from memory): with D, U, rho, cp repeating the
// classical groups are the Stanton number h/(rho U cp) = Nu/(Re Pr), k/(rho U D cp) = 1/Pe,
// and mu/(rho U D) = 1/Re.
static_assert(exponents_of<textbook::forced_convection>() ==
              groups<7, 3>{{{1, 0, -1, 0, -1, 0, -1}, {0, 1, -1, -1, -1, 0, -1}, {0, 0, -1, -1, -1, 1, 0}}});
static_assert(repeating_are<textbook::forced_convection>(std::array<std::size_t, 4>{3, 2, 4, 6}));

// Natural convection (Incropera & DeWitt, ch. 9, from memory): beta dT is a group, and
// mu^2/(rho^2 g L^3) = beta dT / Gr; the others are h, k and cp against L, g, rho, dT. The
// expansion coefficient is not repeated: L, g, rho, then dT close the rank (derived by hand).
static_assert(exponents_of<textbook::natural_convection>() == groups<9, 5>{{{2, 0, -3, -3, 0, 2, -2, 0, 0},
                                                                            {0, 2, -5, -3, 0, 2, -2, 0, 0},
                                                                            {0, 0, 0, 0, 1, 1, 0, 0, 0},
                                                                            {0, 0, -3, -1, 0, 0, -2, 2, 0},
                                                                            {0, 0, -1, -1, 0, 1, 0, 0, 1}}});
static_assert(repeating_are<textbook::natural_convection>(std::array<std::size_t, 4>{2, 3, 6, 5}));

// Transient conduction (Incropera & DeWitt, ch. 5, from memory): theta = f(Fo, Bi) with the
// Fourier number alpha t/L^2 and k/(h L) = 1/Bi; the dimensionless theta is its own group.
static_assert(exponents_of<textbook::transient_conduction>() ==
              groups<6, 3>{{{1, 0, 0, 0, 0, 0}, {0, 1, 1, -2, 0, 0}, {0, 0, 0, -1, -1, 1}}});

// Mass transfer (Incropera & DeWitt, ch. 6, from memory): hm/U (mass-transfer Stanton number),
// D_AB/(U L) = 1/(Re Sc), nu/(U L) = 1/Re.
static_assert(exponents_of<textbook::mass_transfer>() ==
              groups<5, 3>{{{1, 0, 0, -1, 0}, {0, 1, -1, -1, 0}, {0, 0, -1, -1, 1}}});

// Packed bed (Bird, Stewart & Lightfoot, 2nd ed., 6.4, the Ergun equation, from memory):
// dp/(rho U^2), L/d_p and mu/(rho U d_p) = 1/Re_p, whose product dp d_p/(rho U^2 L) is the
// books' friction factor; the void fraction eps is its own group. d_p, listed first of the
// two lengths, repeats with U and rho.
static_assert(exponents_of<textbook::packed_bed>() ==
              groups<7, 4>{
                  {{1, 0, 0, -2, -1, 0, 0}, {0, -1, 1, 0, 0, 0, 0}, {0, -1, 0, -1, -1, 1, 0}, {0, 0, 0, 0, 0, 0, 1}}});
static_assert(repeating_are<textbook::packed_bed>(std::array<std::size_t, 3>{1, 3, 4}));

// Heat exchanger (Bergman et al., 7th ed., 11.4, from memory): the effectiveness
// q/(C_min dT_max), NTU = UA/C_min and C_max/C_min = 1/C_r. W and W/K carry L, M and T only
// as L^2 M T^-3, so four base dimensions give rank 2; dT_max (one base dimension) is taken
// before C_min.
static_assert(exponents_of<textbook::heat_exchanger>() ==
              groups<5, 3>{{{1, -1, 0, 0, -1}, {0, -1, 1, 0, 0}, {0, -1, 0, 1, 0}}});
static_assert(repeating_are<textbook::heat_exchanger>(std::array<std::size_t, 2>{4, 1}));
static_assert(basis_of<textbook::heat_exchanger>().rank == 2);

// Pendulum (Halliday, Resnick & Walker, ch. 15, from memory): t^2 g/L; the mass can be in no
// group and is excluded (isolated), though it is chosen as a repeating variable.
static_assert(exponents_of<textbook::pendulum>() == groups<4, 1>{{{2, 0, -1, 1}}});
static_assert(isolated_are<textbook::pendulum>(std::array<std::size_t, 1>{1}));
static_assert(!basis_of<textbook::pendulum>().dependent_repeating);

// Spring and mass (Halliday, Resnick & Walker, ch. 15, from memory): omega^2 m/k.
static_assert(exponents_of<textbook::spring_mass>() == groups<3, 1>{{{2, -1, 1}}});

// Hooke's law: M, L and T appear but the rank is 2 (DESIGN.md, Rules for the groups).
static_assert(exponents_of<textbook::spring_force>() == groups<3, 1>{{{1, -1, -1}}});
static_assert(basis_of<textbook::spring_force>().rank == 2);

// Kepler's third law (Goldstein, ch. 3, from memory): P^2 G M / a^3.
static_assert(exponents_of<textbook::kepler_orbit>() == groups<4, 1>{{{2, -3, 1, 1}}});

// Ideal gas (Cengel & Boles, ch. 3): the compressibility factor p V/(n R T); rank 4 of five
// base dimensions present, since M and T enter p and R only as M T^-2.
static_assert(exponents_of<textbook::ideal_gas>() == groups<5, 1>{{{1, 1, -1, -1, -1}}});
static_assert(basis_of<textbook::ideal_gas>().rank == 4);

// RC circuit (common practice, no source): tau/(R C).
static_assert(exponents_of<textbook::rc_circuit>() == groups<3, 1>{{{1, -1, -1}}});

// Wire (Pouillet's law R = rho_e L/A, common practice, no source): R L/rho_e and A/L^2.
static_assert(exponents_of<textbook::wire_resistance>() == groups<4, 2>{{{1, -1, 1, 0}, {0, 0, -2, 1}}});

// Rational dimensions. Crack (Anderson, Fracture Mechanics, ch. 2, from memory):
// K_Ic = Y sigma sqrt(pi a), so sigma a^(1/2)/K is a group; primitive integers: sigma^2 a/K^2.
static_assert(textbook::fracture_toughness[0] == rational{-1, 2});
static_assert(exponents_of<textbook::crack_fracture>() == groups<3, 1>{{{2, -2, 1}}});
// Accelerometer (common practice, no source): rms = density sqrt(bandwidth), a^2/(n^2 B).
static_assert(exponents_of<textbook::accelerometer_noise>() == groups<3, 1>{{{2, -2, -1}}});

// Every problem of the table: n - rank groups, each with its own non-repeating variable at a
// positive exponent and otherwise only repeating variables, in input order, gcd 1, and each
// group dimensionless (the pi theorem; Buckingham, Phys. Rev. 4 (1914) 345).
namespace {
template <const auto& P>
constexpr bool basis_is_classical() {
  constexpr auto b = basis_of<P>();
  constexpr std::size_t n = problem_traits<P>::n;
  if (b.group_count + b.rank != n) return false;
  std::array<bool, n> repeating{};
  for (std::size_t i = 0; i < b.rank; ++i) repeating[b.repeating[i]] = true;
  std::size_t last = 0;
  for (std::size_t k = 0; k < b.group_count; ++k) {
    const std::size_t v = b.group_variable[k];
    if (repeating[v] || b.exponents[k][v] <= 0) return false;
    if (k > 0 && v <= last) return false;  // ordered by input position
    last = v;
    std::int64_t g = 0;
    dimension product{};
    for (std::size_t j = 0; j < n; ++j) {
      const std::int64_t e = b.exponents[k][j];
      if (!repeating[j] && j != v && e != 0) return false;  // one non-repeating variable
      g = std::gcd(g, e);
      product = product * pow(P.variables[j].dim, rational{e});
    }
    if (g != 1 || !product.is_dimensionless()) return false;
  }
  return true;
}
}  // namespace

static_assert([] {
  bool all = true;
  textbook::for_each_problem([&]<const auto & P>() { all = all && basis_is_classical<P>(); });
  return all;
}());
static_assert(textbook::all_problems.size() >= 20);

// ---- overflow: refused, never a wrong basis ---------------------------------------------

namespace {
// p = 3037000507 and q = 3037000537 are primes with p q > 2^63 - 1 (python3-sympy nextprime)
constexpr std::int64_t p_big = 3037000507;
constexpr std::int64_t q_big = 3037000537;
constexpr dimension root_pq{rational{1, p_big}, rational{1, q_big}, 0};
constexpr dimension root_p3{rational{1, p_big}, rational{1, 3}, 0};

constexpr bool guarded_add_overflows() {
  detail::guarded_arithmetic g;
  const rational r = g.add(rational{1, p_big}, rational{1, q_big});  // denominator p q
  return g.overflow && r.is_zero();
}
constexpr bool guarded_ops_agree_with_rational() {
  detail::guarded_arithmetic g;
  const rational a{3, 7};
  const rational b{-5, 11};
  return g.add(a, b) == a + b && g.sub(a, b) == a - b && g.mul(a, b) == a * b && g.div(a, b) == a / b &&
         g.neg(a) == -a && !g.overflow;
}
}  // namespace
static_assert(guarded_add_overflows());
static_assert(guarded_ops_agree_with_rational());
// the group X^(pq) L^(-q) M^(-p) cannot be written in int64 exponents
static_assert(detail::pi_basis_v<root_pq, dims::length, dims::mass>.overflow);
// the ranking key |1/p| + |1/q| of a candidate does not fit
static_assert(detail::pi_basis_v<dims::length, root_pq, dims::mass>.overflow);
// with q = 3 it fits: X^(3p) L^(-3) M^(-p), checked by hand
static_assert(pi_exponents<root_p3, dims::length, dims::mass>() == groups<3, 1>{{{3 * p_big, -3, -p_big}}});

// ---- values of the groups ---------------------------------------------------------------

// Constant evaluation works too: a 2 N drag on a 0.1 m sphere in air at 3 m/s.
namespace {
constexpr auto F0 = 2.0 * units::N;
constexpr auto rho0 = 1.25 * units::kg / units::m3;
constexpr auto U0 = 4.0 * units::m / units::s;
constexpr auto D0 = 0.5 * units::m;
constexpr auto mu0 = 2.0e-5 * units::Pa * units::s;
}  // namespace
// hand-written: F/(rho U^2 D^2) = 2/(1.25*16*0.25) = 0.4, mu/(rho U D) = 2e-5/2.5 = 8e-6
static_assert(pi_groups(F0, rho0, U0, D0, mu0)[0] == 2.0 / (1.25 * (4.0 * 4.0) * (0.5 * 0.5)));
static_assert(pi_groups(F0, rho0, U0, D0, mu0)[1] == 2.0e-5 / (1.25 * 4.0 * 0.5));
static_assert(pi_groups(F0, rho0, U0, D0, mu0).size() == 2);

TEST_SUITE("pi_groups") {
  TEST_CASE("sphere drag: the force coefficient and the inverse Reynolds number, bit for bit") {
    // a towed sensor pod of our own invention: 0.12 m sphere in sea water at 1.7 m/s
    const auto F = 3.9 * units::N;
    const auto rho = 1025.0 * units::kg / units::m3;
    const auto U = 1.7 * units::m / units::s;
    const auto D = 0.12 * units::m;
    const auto mu = 1.08e-3 * units::Pa * units::s;
    const auto g = pi_groups(F, rho, U, D, mu);
    const double f = F.si(), r = rho.si(), u = U.si(), d = D.si(), m = mu.si();
    // White, Fluid Mechanics, ch. 5 (from memory): C = F/(rho U^2 D^2), Re = rho U D/mu.
    // The same operations in the same order, so equal to the last bit:
    CHECK(g[0] == f / (r * (u * u) * (d * d)));
    CHECK(g[1] == m / (r * u * d));
    // and, written as an engineer would, within a few ulps
    CHECK(g[0] == doctest::Approx(f / (r * u * u * d * d)).epsilon(1e-15));
    CHECK(1.0 / g[1] == doctest::Approx(r * u * d / m).epsilon(1e-15));
  }

  TEST_CASE("forced convection: Stanton, inverse Peclet and inverse Reynolds numbers") {
    // air over a 25 mm heated tube (values of our own invention, property magnitudes from
    // Incropera & DeWitt, table A.4, from memory)
    const auto h = 85.0 * units::W / (units::m2 * units::K);
    const auto k = 0.0263 * units::W / (units::m * units::K);
    const auto U = 10.0 * units::m / units::s;
    const auto D = 0.025 * units::m;
    const auto rho = 1.1614 * units::kg / units::m3;
    const auto mu = 184.6e-7 * units::Pa * units::s;
    const auto cp = 1007.0 * units::J / (units::kg * units::K);
    const auto g = pi_groups(h, k, U, D, rho, mu, cp);
    REQUIRE(g.size() == 3);
    const double hv = h.si(), kv = k.si(), uv = U.si(), dv = D.si(), rv = rho.si(), mv = mu.si(), cv = cp.si();
    CHECK(g[0] == hv / (uv * rv * cv));       // St = h/(rho U cp), positives then negatives in argument order
    CHECK(g[1] == kv / (uv * dv * rv * cv));  // 1/Pe = k/(rho U D cp)
    CHECK(g[2] == mv / (uv * dv * rv));       // 1/Re
    // Incropera & DeWitt, ch. 6 (from memory): St = Nu/(Re Pr), Pe = Re Pr
    const double Re = rv * uv * dv / mv;
    const double Pr = mv * cv / kv;
    const double Nu = hv * dv / kv;
    CHECK(g[0] == doctest::Approx(Nu / (Re * Pr)).epsilon(1e-14));
    CHECK(1.0 / g[1] == doctest::Approx(Re * Pr).epsilon(1e-14));
    CHECK(1.0 / g[2] == doctest::Approx(Re).epsilon(1e-14));
  }

  TEST_CASE("blast wave: R^5 rho/(E t^2) by unrolled squaring") {
    // G. I. Taylor (1950): R = C (E t^2/rho)^(1/5) with C close to 1 for air; a scenario of our
    // own: 1e12 J, 10 ms, rho = 1.2 kg/m^3 gives R near 103 m with C = 1
    const auto t = 0.010 * units::s;
    const auto E = 1.0e12 * units::J;
    const auto rho = 1.2 * units::kg / units::m3;
    const double r = std::pow(E.si() * t.si() * t.si() / rho.si(), 0.2);
    const auto R = r * units::m;
    const auto g = pi_groups(R, t, E, rho);
    // R^5 = ((R R)(R R)) R by squaring; same operations written out
    const double r2 = r * r;
    CHECK(g[0] == ((r2 * r2) * r) * rho.si() / ((t.si() * t.si()) * E.si()));
    CHECK(g[0] == doctest::Approx(1.0).epsilon(1e-14));  // C = 1 by construction
  }

  TEST_CASE("pendulum: the mass is excluded and does not enter the value") {
    // Halliday, Resnick & Walker, ch. 15 (from memory): T = 2 pi sqrt(L/g), so t^2 g/L = 4 pi^2
    const auto L = 0.994 * units::m;
    const auto g = 9.80665 * units::m / (units::s * units::s);  // standard gravity, SI Brochure 9th ed. (CGPM 1901)
    const double pi = 3.14159265358979323846;
    const auto t = 2.0 * pi * std::sqrt(L.si() / g.si()) * units::s;
    const auto heavy = pi_groups(t, 50.0 * units::kg, L, g);
    const auto light = pi_groups(t, 0.05 * units::kg, L, g);
    CHECK(heavy[0] == light[0]);
    CHECK(heavy[0] == (t.si() * t.si()) * g.si() / L.si());
    CHECK(heavy[0] == doctest::Approx(4.0 * pi * pi).epsilon(1e-14));
  }

  TEST_CASE("capillary rise: Jurin's law in h/d, Bond number and contact angle") {
    // water in a 1 mm glass tube at 20 C (sigma = 0.0728 N/m, CRC Handbook, from memory)
    const auto sigma = 0.0728 * units::N / units::m;
    const auto rho = 998.2 * units::kg / units::m3;
    const auto g = 9.80665 * units::m / (units::s * units::s);
    const auto d = 1.0e-3 * units::m;
    const quantity<dims::dimensionless> theta = 0.0;                                   // fully wetting
    const double h = 4.0 * sigma.si() * std::cos(0.0) / (rho.si() * g.si() * d.si());  // Jurin
    const auto v = pi_groups(h * units::m, sigma, rho, g, d, theta);
    REQUIRE(v.size() == 3);
    CHECK(v[0] == h / d.si());
    // the rule repeats d, g, rho, not sigma: the second group is 1/Bo = sigma/(rho g d^2)
    CHECK(v[1] == doctest::Approx(sigma.si() / (rho.si() * g.si() * d.si() * d.si())).epsilon(1e-15));
    CHECK(v[2] == 0.0);
    CHECK(v[0] / v[1] == doctest::Approx(4.0).epsilon(1e-14));  // (h/d) Bo = 4 cos(theta)
  }

  TEST_CASE("rational dimensions: crack under stress, Pa m^(1/2)") {
    // Anderson, Fracture Mechanics, ch. 2 (from memory): K = sigma sqrt(pi a) for a centre crack
    // in a wide plate; a 2 mm crack in a steel of 50 MPa m^(1/2)
    const auto a = 2.0e-3 * units::m;
    const auto K = quantity<textbook::fracture_toughness>::from_si(50.0e6);
    const double pi = 3.14159265358979323846;
    const double sigma_c = K.si() / std::sqrt(pi * a.si());
    const auto v = pi_groups(sigma_c * units::Pa, K, a);
    CHECK(v[0] == (sigma_c * sigma_c) * a.si() / (K.si() * K.si()));
    CHECK(v[0] == doctest::Approx(1.0 / pi).epsilon(1e-14));
  }

  TEST_CASE("a dimensionless dependent variable is a group by itself") {
    // Incropera & DeWitt, ch. 5 (from memory): theta = f(Fo, Bi)
    const quantity<dims::dimensionless> theta = 0.37;
    const auto t = 120.0 * units::s;
    const auto alpha = 1.1e-5 * units::m2 / units::s;
    const auto L = 0.02 * units::m;
    const auto h = 40.0 * units::W / (units::m2 * units::K);
    const auto k = 15.0 * units::W / (units::m * units::K);
    const auto v = pi_groups(theta, t, alpha, L, h, k);
    CHECK(v[0] == 0.37);
    CHECK(v[1] == t.si() * alpha.si() / (L.si() * L.si()));  // Fo
    CHECK(v[2] == k.si() / (L.si() * h.si()));               // 1/Bi
  }

  TEST_CASE("other representations are read as double") {
    const quantity<dims::length, float> x = quantity<dims::length, float>::from_si(0.5F);
    const auto F = 6.0 * units::N;
    const auto k = 3.0 * units::N / units::m;
    const auto v = pi_groups(F, k, x);
    static_assert(std::is_same_v<decltype(v), const std::array<double, 1>>);
    CHECK(v[0] == 6.0 / (3.0 * 0.5));  // F/(k x), Hooke's law (common practice, no source)
  }

  TEST_CASE("pi_product: a group chosen by hand, computed as pi_groups computes its own") {
    // the towed pod above; White, Fluid Mechanics, ch. 5 (from memory): Re = rho U D / mu,
    // C = F/(rho U^2 D^2); the Reynolds number is the inverse of pi_groups' second group.
    const auto F = 3.9 * units::N;
    const auto rho = 1025.0 * units::kg / units::m3;
    const auto U = 1.7 * units::m / units::s;
    const auto D = 0.12 * units::m;
    const auto mu = 1.08e-3 * units::Pa * units::s;
    const double re = pi_product<1, 1, 1, -1>(rho, U, D, mu);
    CHECK(re == rho.si() * U.si() * D.si() / mu.si());
    CHECK(pi_product<1, -1, -2, -2>(F, rho, U, D) == pi_groups(F, rho, U, D, mu)[0]);
    static_assert(pi_product<1, -1, -2, -2>(F0, rho0, U0, D0) == 2.0 / (1.25 * (4.0 * 4.0) * (0.5 * 0.5)));
    static_assert(pi_product<0>(F0) == 1.0);  // the empty product (common practice, no source)
  }
}
