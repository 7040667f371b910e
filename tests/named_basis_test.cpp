// Tests of nondim/analysis/names/named_basis.hpp: the named basis of classic problems of fluid
// mechanics and heat and mass transfer, checked against the groups the textbooks give, and
// the basis properties (independent, exact, the same span, the dependent variable in one
// group only).
#include <nondim/analysis.hpp>
#include <nondim/analysis/names/named_basis.hpp>
#include <nondim/solver/core/dims.hpp>

#include <doctest/doctest.h>

#include "textbook_problems.hpp"

#include <algorithm>
#include <cstdint>
#include <numeric>
#include <random>
#include <stdexcept>
#include <string>
#include <vector>

using namespace nondim;

namespace {

struct spec {
  const char* name;
  dimension dim;
};

using groups = std::vector<std::vector<std::int64_t>>;

std::vector<group_variable> variables_of(const std::vector<spec>& s) {
  std::vector<group_variable> v;
  for (const auto& x : s) v.push_back({x.name, x.dim, quantity_kind::unspecified});
  return v;
}

std::size_t index_of(const std::vector<group_variable>& v, std::string_view name) {
  for (std::size_t i = 0; i < v.size(); ++i)
    if (v[i].name == name) return i;
  throw std::logic_error("test: no variable " + std::string(name));
}

// The classical groups by hand-calculation rule (each non-repeating variable times powers of
// the repeating ones, solved exactly), independent of the library's elimination.
groups classical_basis(const std::vector<group_variable>& v, const std::vector<std::string>& repeating_names) {
  std::vector<std::size_t> rep;
  for (const auto& r : repeating_names) rep.push_back(index_of(v, r));
  groups out;
  for (std::size_t j = 0; j < v.size(); ++j) {
    if (std::find(rep.begin(), rep.end(), j) != rep.end()) continue;
    // augmented 7 x (|rep| + 1) system: sum_r x_r d_r = -d_j
    const std::size_t m = rep.size();
    std::vector<std::vector<rational>> a(7, std::vector<rational>(m + 1));
    for (std::size_t b = 0; b < 7; ++b) {
      for (std::size_t c = 0; c < m; ++c) a[b][c] = v[rep[c]].dim[b];
      a[b][m] = -v[j].dim[b];
    }
    std::size_t row = 0;
    std::vector<std::size_t> pivot_col;
    for (std::size_t c = 0; c < m && row < 7; ++c) {
      std::size_t p = row;
      while (p < 7 && a[p][c].is_zero()) ++p;
      if (p == 7) throw std::logic_error("test: repeating variables are not independent");
      std::swap(a[p], a[row]);
      const rational inv = rational{1} / a[row][c];
      for (auto& x : a[row]) x *= inv;
      for (std::size_t r = 0; r < 7; ++r)
        if (r != row && !a[r][c].is_zero()) {
          const rational f = a[r][c];
          for (std::size_t k = 0; k <= m; ++k) a[r][k] -= f * a[row][k];
        }
      pivot_col.push_back(c);
      ++row;
    }
    for (std::size_t r = row; r < 7; ++r)
      if (!a[r][m].is_zero()) throw std::logic_error("test: a variable cannot be made dimensionless");
    std::vector<rational> e(v.size());
    e[j] = 1;
    for (std::size_t r = 0; r < row; ++r) e[rep[pivot_col[r]]] = a[r][m];
    std::int64_t l = 1;
    for (const auto& x : e) l = std::lcm(l, x.den);
    std::vector<std::int64_t> g;
    for (const auto& x : e) g.push_back(x.num * (l / x.den));
    out.push_back(g);
  }
  return out;
}

// Exact rank of a set of integer vectors (Gaussian elimination over rationals).
std::size_t rank_of(const groups& gs) {
  if (gs.empty()) return 0;
  std::vector<std::vector<rational>> a;
  for (const auto& g : gs) a.emplace_back(g.begin(), g.end());
  std::size_t rank = 0;
  for (std::size_t c = 0; c < a[0].size() && rank < a.size(); ++c) {
    std::size_t p = rank;
    while (p < a.size() && a[p][c].is_zero()) ++p;
    if (p == a.size()) continue;
    std::swap(a[p], a[rank]);
    for (std::size_t r = 0; r < a.size(); ++r)
      if (r != rank && !a[r][c].is_zero()) {
        const rational f = a[r][c] / a[rank][c];
        for (std::size_t k = 0; k < a[r].size(); ++k) a[r][k] -= f * a[rank][k];
      }
    ++rank;
  }
  return rank;
}

// Exact rank of a set of dimensions (as columns of the dimension matrix).
std::size_t rank_of_dims(const std::vector<dimension>& ds) {
  std::vector<std::vector<rational>> a;
  for (const auto& d : ds) a.emplace_back(d.exponents.begin(), d.exponents.end());
  std::size_t rank = 0;
  for (std::size_t c = 0; c < 7 && rank < a.size(); ++c) {
    std::size_t p = rank;
    while (p < a.size() && a[p][c].is_zero()) ++p;
    if (p == a.size()) continue;
    std::swap(a[p], a[rank]);
    for (std::size_t r = 0; r < a.size(); ++r)
      if (r != rank && !a[r][c].is_zero()) {
        const rational f = a[r][c] / a[rank][c];
        for (std::size_t k = 0; k < 7; ++k) a[r][k] -= f * a[rank][k];
      }
    ++rank;
  }
  return rank;
}

std::string label(const named_group& g) {
  return g.named() ? power_text(catalog[g.entry].symbol, g.power) : std::string("classical");
}

std::vector<std::string> labels(const std::vector<named_group>& b) {
  std::vector<std::string> out;
  for (const auto& g : b) out.push_back(label(g));
  return out;
}

bool has(const std::vector<named_group>& b, std::string_view symbol) {
  return std::any_of(b.begin(), b.end(),
                     [&](const named_group& g) { return g.named() && catalog[g.entry].symbol == symbol; });
}

const named_group& get(const std::vector<named_group>& b, std::string_view symbol) {
  for (const auto& g : b)
    if (g.named() && catalog[g.entry].symbol == symbol) return g;
  throw std::logic_error("test: no group " + std::string(symbol));
}

// The properties every named basis has: as many groups as given, each dimensionless and
// primitive, independent, spanning the same space, the dependent variable in the first only,
// and each catalog pick recognised as its entry with its power.
void check_basis(const std::vector<group_variable>& v, const groups& classical, const std::vector<named_group>& b,
                 std::size_t dependent) {
  INFO("basis: ", [&] {
    std::string s;
    for (const auto& l : labels(b)) s += l + " ";
    return s;
  }());
  REQUIRE(b.size() == classical.size());
  groups named;
  for (const auto& g : b) {
    REQUIRE(g.exponents.size() == v.size());
    dimension d{};
    std::int64_t gcd = 0;
    for (std::size_t i = 0; i < v.size(); ++i) {
      d = d * pow(v[i].dim, rational{g.exponents[i]});
      gcd = std::gcd(gcd, g.exponents[i]);
    }
    CHECK(d.is_dimensionless());
    CHECK(gcd == 1);
    named.push_back(g.exponents);
    if (g.named()) {
      const auto ms = recognize(v, g.exponents);
      const auto it = std::find_if(ms.begin(), ms.end(), [&](const catalog_match& m) { return m.entry == g.entry; });
      REQUIRE(it != ms.end());
      CHECK(it->power == g.power);
    }
  }
  CHECK(rank_of(named) == b.size());
  groups both = named;
  both.insert(both.end(), classical.begin(), classical.end());
  CHECK(rank_of(both) == classical.size());
  if (dependent != named_group::npos) {
    CHECK(b.front().exponents[dependent] != 0);
    for (std::size_t k = 1; k < b.size(); ++k) CHECK(b[k].exponents[dependent] == 0);
  }
}

std::vector<named_group> run(const std::vector<group_variable>& v, const std::vector<std::string>& repeating,
                             std::string_view dependent) {
  const groups classical = classical_basis(v, repeating);
  std::vector<std::size_t> rep;
  for (const auto& r : repeating) rep.push_back(index_of(v, r));
  const std::size_t d = index_of(v, dependent);
  auto b = named_basis(v, classical, d, rep);
  check_basis(v, classical, b, d);
  return b;
}

}  // namespace

TEST_SUITE("named basis") {
  TEST_CASE("forced convection gives Nusselt, Reynolds and Prandtl numbers") {
    // Incropera et al., ch. 6 (from memory): Nu_D = f(Re_D, Pr) for h, k, V, D, rho, mu, cp
    const auto v = variables_of({{"h", dims::heat_transfer_coefficient},
                                 {"k", dims::thermal_conductivity},
                                 {"U", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"cp", dims::specific_heat_capacity}});
    // the classical groups with D, U, rho, cp repeating are St, 1/Pe and 1/Re (Incropera et al.,
    // ch. 6, from memory); the named basis re-expresses them
    const auto b = run(v, {"U", "D", "rho", "cp"}, "h");
    CHECK(labels(b) == std::vector<std::string>{"Nu", "Re", "Pr"});
    // the same named groups from other repeating variables (k, mu, D, rho)
    const auto b2 = run(v, {"k", "D", "rho", "mu"}, "h");
    CHECK(labels(b2) == std::vector<std::string>{"Nu", "Re", "Pr"});
    for (std::size_t k = 0; k < b.size(); ++k) CHECK(b[k].exponents == b2[k].exponents);
    // Nu = h D / k exactly, h on the first factor of the form h L / k_f
    CHECK(b[0].exponents == std::vector<std::int64_t>{1, -1, 0, 1, 0, 0, 0});
    CHECK(b[0].variables[0] == 0);
    CHECK(b[0].variables[1] == 3);
    CHECK(b[0].variables[2] == 1);
  }

  TEST_CASE("natural convection gives Nusselt, Grashof and Prandtl numbers") {
    // Incropera et al., ch. 9 (from memory): Nu_L = f(Gr_L, Pr) for h, k, g, beta, dT, L, rho, mu, cp;
    // with beta and dT separate the problem has two more groups (beta dT and one more)
    const auto v = variables_of({{"h", dims::heat_transfer_coefficient},
                                 {"k", dims::thermal_conductivity},
                                 {"g", dims::acceleration},
                                 {"beta", dims::thermal_expansion_coefficient},
                                 {"dT", dims::temperature},
                                 {"L", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"cp", dims::specific_heat_capacity}});
    const auto b = run(v, {"L", "beta", "g", "rho"}, "h");
    CHECK(label(b[0]) == "Nu");
    CHECK(has(b, "Gr"));
    CHECK(has(b, "Pr"));
    // the expansion parameter beta dT stays a plain ratio (a classical group of two variables)
    const auto beta_dT = std::find_if(b.begin(), b.end(), [&](const named_group& g) {
      return !g.named() && g.exponents == std::vector<std::int64_t>{0, 0, 0, 1, 1, 0, 0, 0, 0};
    });
    CHECK(beta_dT != b.end());
  }

  TEST_CASE("a ship's resistance gives a force coefficient, Reynolds and Froude numbers") {
    // White, Fluid Mechanics, ch. 5 (from memory): C_F = f(Re, Fr) for F, V, L, rho, mu, g
    const auto v = variables_of({{"F", dims::force},
                                 {"U", dims::velocity},
                                 {"L", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"g", dims::acceleration}});
    const auto b = run(v, {"rho", "U", "L"}, "F");
    CHECK(labels(b) == std::vector<std::string>{"C_D", "Re", "Fr^2"});
    // Fr^2 = U^2/(g L) (ISO 80000-11 defines Fr = U/sqrt(gL), from memory)
    CHECK(get(b, "Fr").exponents == std::vector<std::int64_t>{0, 2, -1, 0, 0, -1});
  }

  TEST_CASE("the drag of a sphere gives the drag coefficient and the Reynolds number") {
    // White, Fluid Mechanics, ch. 5 and 7 (from memory): C_D = f(Re) for F, V, D, rho, mu
    const auto v = variables_of({{"F", dims::force},
                                 {"V", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity}});
    const auto b = run(v, {"rho", "V", "D"}, "F");
    CHECK(labels(b) == std::vector<std::string>{"C_D", "Re"});
    // at high speed the speed of sound adds the Mach number (White, ch. 5, from memory)
    const auto w = variables_of({{"F", dims::force},
                                 {"V", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"a", dims::velocity}});
    CHECK(labels(run(w, {"rho", "V", "D"}, "F")) == std::vector<std::string>{"C_D", "Re", "Ma"});
  }

  TEST_CASE("pipe flow gives a pressure group, Reynolds number, relative roughness and L/D") {
    // White, Fluid Mechanics, ch. 5-6 (from memory): dp/(rho V^2) = F(rho V d/mu, eps/d, L/d)
    const auto v = variables_of({{"dp", dims::pressure},
                                 {"rho", dims::density},
                                 {"U", dims::velocity},
                                 {"D", dims::length},
                                 {"mu", dims::dynamic_viscosity},
                                 {"eps", dims::length},
                                 {"L", dims::length}});
    const auto b = run(v, {"rho", "U", "D"}, "dp");
    CHECK((label(b[0]) == "Eu" || label(b[0]) == "f_D"));
    CHECK(has(b, "Re"));
    CHECK(get(b, "Re").exponents == std::vector<std::int64_t>{0, 1, 1, 1, -1, 0, 0});  // with D, not L
    CHECK(has(b, "eps/D"));
    // L/D stays classical: no catalog number is a ratio of a pipe's length to its diameter
    const auto l_over_d = std::find_if(b.begin(), b.end(), [&](const named_group& g) {
      return !g.named() && g.exponents == std::vector<std::int64_t>{0, 0, 0, -1, 0, 0, 1};
    });
    CHECK(l_over_d != b.end());
    CHECK(std::count_if(b.begin(), b.end(), [](const named_group& g) { return g.named(); }) == 3);
  }

  TEST_CASE("a falling droplet gives Reynolds or Weber, Bond and Ohnesorge numbers and the density ratio") {
    // common practice for drops and bubbles (from memory): terminal velocity in terms of Re (or We),
    // Eotvos (Bond) and Morton or Ohnesorge numbers, plus the density ratio
    const auto v = variables_of({{"U", dims::velocity},
                                 {"D", dims::length},
                                 {"rho_l", dims::density},
                                 {"rho_g", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"sigma", dims::surface_tension},
                                 {"g", dims::acceleration}});
    const auto b = run(v, {"D", "rho_l", "sigma"}, "U");
    CHECK((label(b[0]) == "Re" || label(b[0]) == "We"));
    CHECK(has(b, "Bo"));
    CHECK((has(b, "Oh") || has(b, "Mo")));
    const auto ratio = std::find_if(b.begin(), b.end(), [&](const named_group& g) {
      return !g.named() && (g.exponents == std::vector<std::int64_t>{0, 0, -1, 1, 0, 0, 0} ||
                            g.exponents == std::vector<std::int64_t>{0, 0, 1, -1, 0, 0, 0});
    });
    CHECK(ratio != b.end());
  }

  TEST_CASE("a heated plate transient gives the temperature ratio, Biot and Fourier numbers") {
    // Incropera et al., ch. 5 (from memory): theta/theta_i = f(x/L, Bi, Fo) for a plane wall
    const auto v = variables_of({{"theta", dims::temperature},
                                 {"theta_i", dims::temperature},
                                 {"h", dims::heat_transfer_coefficient},
                                 {"k_s", dims::thermal_conductivity},
                                 {"L", dims::length},
                                 {"alpha", dims::thermal_diffusivity},
                                 {"t", dims::time},
                                 {"x", dims::length}});
    const auto b = run(v, {"theta_i", "L", "t", "h"}, "theta");
    // the dependent group is no catalog number: theta/theta_i stays classical
    CHECK_FALSE(b[0].named());
    CHECK(b[0].exponents == std::vector<std::int64_t>{1, -1, 0, 0, 0, 0, 0, 0});
    CHECK(has(b, "Bi"));
    CHECK_FALSE(has(b, "Nu"));  // k_s names the solid's conductivity
    CHECK(has(b, "Fo"));
    CHECK(get(b, "Fo").exponents == std::vector<std::int64_t>{0, 0, 0, 0, -2, 1, 1, 0});
  }

  TEST_CASE("a pump gives head, flow and power coefficients and the Reynolds number") {
    // White, Fluid Mechanics, ch. 11 (from memory): C_H, C_P = f(C_Q, rho n D^2/mu)
    const auto v = variables_of({{"gH", dims::specific_energy},
                                 {"Q", dims::volume_flow_rate},
                                 {"n", dims::frequency},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"P", dims::power}});
    const auto b = run(v, {"n", "D", "rho"}, "gH");
    CHECK(label(b[0]) == "C_H");
    CHECK(has(b, "C_Q"));
    CHECK(has(b, "C_P"));
    CHECK(has(b, "Re"));
    CHECK(get(b, "Re").exponents == std::vector<std::int64_t>{0, 0, 1, 2, 1, -1, 0});
  }

  TEST_CASE("mass transfer gives Sherwood, Reynolds and Schmidt numbers") {
    // Incropera et al., ch. 6 (from memory): Sh_D = f(Re_D, Sc) for h_m, V, D, rho, mu, D_AB
    const auto v = variables_of({{"h_m", dims::mass_transfer_coefficient},
                                 {"U", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"D_AB", dims::mass_diffusivity}});
    const auto b = run(v, {"U", "D", "rho"}, "h_m");
    CHECK(labels(b) == std::vector<std::string>{"Sh", "Re", "Sc"});
  }

  TEST_CASE("vortex shedding gives the Strouhal and Reynolds numbers") {
    // White, Fluid Mechanics, ch. 5 (from memory): St = f(Re) for the shedding frequency of a cylinder
    const auto v = variables_of({{"f", dims::frequency},
                                 {"U", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity}});
    CHECK(labels(run(v, {"U", "D", "rho"}, "f")) == std::vector<std::string>{"Sr", "Re"});
  }

  TEST_CASE("a boundary layer keeps delta/x and names the Reynolds number on x") {
    // White, Fluid Mechanics, ch. 7 (from memory): delta/x = 5.0/Re_x^(1/2) (Blasius)
    const auto v = variables_of(
        {{"delta", dims::length}, {"U", dims::velocity}, {"x", dims::length}, {"nu", dims::kinematic_viscosity}});
    const auto b = run(v, {"x", "U"}, "delta");
    REQUIRE(b.size() == 2);
    CHECK_FALSE(b[0].named());
    CHECK(b[0].exponents == std::vector<std::int64_t>{1, 0, -1, 0});
    CHECK(label(b[1]) == "Re");
    CHECK(b[1].exponents == std::vector<std::int64_t>{0, 1, 1, -1});
  }

  TEST_CASE("capillary rise: h/d, the Bond number and the contact angle") {
    // White, Fluid Mechanics, ch. 1 (from memory): h = 4 sigma cos(theta)/(rho g d), so
    // h/d = f(rho g d^2/sigma, theta); a ratio of two neutral lengths is not taken for Kn or eps/D
    const auto v = variables_of({{"h", dims::length},
                                 {"sigma", dims::surface_tension},
                                 {"rho", dims::density},
                                 {"g", dims::acceleration},
                                 {"d", dims::length},
                                 {"theta", dims::dimensionless}});
    const auto b = run(v, {"d", "g", "sigma"}, "h");
    REQUIRE(b.size() == 3);
    CHECK_FALSE(b[0].named());
    CHECK(b[0].exponents == std::vector<std::int64_t>{1, 0, 0, 0, -1, 0});
    CHECK(has(b, "Bo"));
    CHECK_FALSE(has(b, "Kn"));
    CHECK_FALSE(has(b, "eps/D"));
    const auto angle = std::find_if(b.begin(), b.end(), [](const named_group& g) {
      return g.exponents == std::vector<std::int64_t>{0, 0, 0, 0, 0, 1};
    });
    CHECK(angle != b.end());
  }

  TEST_CASE("same-dimension numbers are named only when the names identify both quantities") {
    // Kn = lambda/L (White, ch. 1, from memory): with the names lambda and L it is named
    const auto v = variables_of({{"F", dims::force},
                                 {"U", dims::velocity},
                                 {"L", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"lambda", dims::length}});
    CHECK(has(run(v, {"rho", "U", "L"}, "F"), "Kn"));
    // with neutral names the same ratio stays classical
    const auto w = variables_of({{"F", dims::force},
                                 {"U", dims::velocity},
                                 {"L", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"l2", dims::length}});
    const auto b = run(w, {"rho", "U", "L"}, "F");
    CHECK_FALSE(has(b, "Kn"));
    CHECK_FALSE(has(b, "eps/D"));
  }

  TEST_CASE("a dependent variable among the repeating ones ends up in one group only") {
    // the same forced-convection problem with h forced into the repeating set: every classical
    // group holds h; the named basis still confines it to one (Incropera et al., ch. 6, from memory)
    const auto v = variables_of({{"h", dims::heat_transfer_coefficient},
                                 {"k", dims::thermal_conductivity},
                                 {"U", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity},
                                 {"cp", dims::specific_heat_capacity}});
    const auto b = run(v, {"h", "U", "D", "rho"}, "h");
    CHECK(labels(b) == std::vector<std::string>{"Nu", "Re", "Pr"});
  }

  TEST_CASE("without a dependent variable every group is named where it can be") {
    const auto v = variables_of({{"F", dims::force},
                                 {"V", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity}});
    const groups classical = classical_basis(v, {"rho", "V", "D"});
    const auto b = named_basis(v, classical);
    check_basis(v, classical, b, named_group::npos);
    CHECK(labels(b) == std::vector<std::string>{"Re", "C_D"});
  }

  TEST_CASE("catalog numbers outside the span of the given groups are not used") {
    // give only the viscous group of the sphere-drag problem: the basis is Re alone
    const auto v = variables_of({{"F", dims::force},
                                 {"V", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity}});
    const groups only_re{{0, -1, -1, -1, 1}};
    const auto b = named_basis(v, only_re, 0);
    REQUIRE(b.size() == 1);
    CHECK(label(b[0]) == "Re");
  }

  TEST_CASE("bad input throws std::invalid_argument") {
    const auto v = variables_of({{"F", dims::force},
                                 {"V", dims::velocity},
                                 {"D", dims::length},
                                 {"rho", dims::density},
                                 {"mu", dims::dynamic_viscosity}});
    CHECK_THROWS_AS((void)named_basis(v, groups{{1, 0, 0}}), std::invalid_argument);        // wrong length
    CHECK_THROWS_AS((void)named_basis(v, groups{{1, 0, 0, 0, 0}}), std::invalid_argument);  // not dimensionless
    CHECK_THROWS_AS((void)named_basis(v, groups{{0, -1, -1, -1, 1}, {0, 2, 2, 2, -2}}),     // dependent
                    std::invalid_argument);
    CHECK_THROWS_AS((void)named_basis(v, groups{{0, -1, -1, -1, 1}}, 7), std::invalid_argument);  // index
    const std::vector<std::size_t> bad_rep{9};
    CHECK_THROWS_AS((void)named_basis(v, groups{{0, -1, -1, -1, 1}}, 0, bad_rep), std::invalid_argument);
    CHECK(named_basis(v, groups{}).empty());
  }
  TEST_CASE("random problems built from catalog roles always give an exact basis") {
    // properties of any basis of the null space (common practice, no source), checked with the
    // test's own exact elimination over 400 random problems of 3 to 10 variables whose names and
    // dimensions are those of catalog roles
    std::mt19937 rng(20240611);
    std::uniform_int_distribution<std::size_t> pick(1, quantity_kind_count - 1);
    std::uniform_int_distribution<std::size_t> count(3, 10);
    auto column = [](const dimension& d) {
      std::vector<std::int64_t> c;
      for (std::size_t b = 0; b < 7; ++b) c.push_back(d[b].num);  // role dimensions have integer exponents
      return c;
    };
    std::size_t tested = 0;
    for (int trial = 0; trial < 400; ++trial) {
      const std::size_t n = count(rng);
      std::vector<std::string> names;
      std::vector<dimension> ds;
      for (std::size_t i = 0; i < n; ++i) {
        const auto& k = quantity_kinds[pick(rng)];
        std::string name(k.names.substr(0, k.names.find(' ')));  // appended: GCC 12 -Wrestrict false positive
        if (i % 3 != 0) {
          name.push_back('_');
          name.append(std::to_string(i));
        }
        names.push_back(name);
        ds.push_back(k.dim);
      }
      std::vector<group_variable> v;
      for (std::size_t i = 0; i < n; ++i) v.push_back({names[i], ds[i], quantity_kind::unspecified});
      // names must be distinct for index_of(); rename duplicates
      for (std::size_t i = 0; i < n; ++i)
        for (std::size_t j = 0; j < i; ++j)
          if (names[i] == names[j]) {
            names[i].push_back('_');
            names[i].append(std::to_string(i));
            names[i].push_back('x');
            v[i].name = names[i];
          }
      // repeating variables: those (other than the dependent, variable 0) that raise the rank
      groups cols;
      std::vector<std::string> repeating;
      for (std::size_t i = 1; i < n; ++i) {
        cols.push_back(column(ds[i]));
        if (rank_of(cols) > repeating.size())
          repeating.emplace_back(names[i]);
        else
          cols.pop_back();
      }
      // every variable must be expressible in the repeating ones (else it is isolated): skip such draws
      bool expressible = repeating.size() < n - 1;
      for (std::size_t i = 0; i < n && expressible; ++i) {
        groups c = cols;
        c.push_back(column(ds[i]));
        expressible = rank_of(c) == repeating.size();
      }
      if (!expressible) continue;
      INFO("trial ", trial);
      const groups classical = classical_basis(v, repeating);
      const auto b = named_basis(v, classical, 0);
      check_basis(v, classical, b, 0);
      ++tested;
    }
    CHECK(tested > 50);
  }
  TEST_CASE("every shared textbook problem gives an exact named basis") {
    // the problems of tests/textbook_problems.hpp, each with its source there; the properties
    // of a basis are common practice (no source)
    std::size_t tested = 0;
    for (const auto& p : textbook::all_problems) {
      INFO(p.title);
      std::vector<group_variable> v;
      std::vector<dimension> ds;
      for (const auto& x : p.variables) {
        v.push_back({x.name, x.dim, quantity_kind::unspecified});
        ds.push_back(x.dim);
      }
      std::vector<dimension> chosen;
      std::vector<std::string> repeating;
      for (std::size_t i = 1; i < v.size(); ++i) {
        chosen.push_back(ds[i]);
        if (rank_of_dims(chosen) > repeating.size())
          repeating.emplace_back(v[i].name);
        else
          chosen.pop_back();
      }
      if (rank_of_dims(ds) != repeating.size()) continue;  // the dependent variable would be isolated
      const groups classical = classical_basis(v, repeating);
      std::vector<std::size_t> rep;
      for (const auto& r : repeating) rep.push_back(index_of(v, r));
      const auto b = named_basis(v, classical, 0, rep);
      check_basis(v, classical, b, 0);
      ++tested;
    }
    CHECK(tested >= 20);
  }
}

namespace {

// The first match of each group of an analysis, as "Re", "Fr^2"; "-" for none.
std::vector<std::string> first_matches(const analysis& a) {
  std::vector<std::string> out;
  for (const auto& g : a.groups)
    out.push_back(g.matches.empty() ? std::string("-") : power_text(g.matches.front().symbol, g.matches.front().power));
  return out;
}

bool lists(const analysis& a, std::string_view symbol) {
  return std::any_of(a.groups.begin(), a.groups.end(),
                     [&](const pi_group& g) { return !g.matches.empty() && g.matches.front().symbol == symbol; });
}

// analyze() in the named basis, with the checks every named analysis passes: as many groups
// as the classical one, exact (the SVD agrees), independent, the same span, the dependent
// variable in the first group only.
analysis analyze_named(const problem& p, std::string dependent = {}) {
  options o;
  o.form = basis::named;
  o.dependent = dependent;
  const analysis a = analyze(p, o);
  options c = o;
  c.form = basis::classical;
  const analysis classical = analyze(p, c);
  CHECK(a.form == basis::named);
  CHECK(a.svd.agrees);
  REQUIRE(a.groups.size() == classical.groups.size());
  groups named_vectors;
  groups classical_vectors;
  for (const auto& g : a.groups) named_vectors.push_back(g.exponents);
  for (const auto& g : classical.groups) classical_vectors.push_back(g.exponents);
  CHECK(rank_of(named_vectors) == a.groups.size());
  groups both = named_vectors;
  both.insert(both.end(), classical_vectors.begin(), classical_vectors.end());
  CHECK(rank_of(both) == a.groups.size());
  const std::size_t d = *a.index_of(a.dependent);
  if (!a.missing_variable) {
    CHECK(a.groups.front().exponents[d] != 0);
    for (std::size_t k = 1; k < a.groups.size(); ++k) CHECK(a.groups[k].exponents[d] == 0);
  }
  return a;
}

}  // namespace

TEST_SUITE("named basis through analyze()") {
  TEST_CASE("forced convection, given in units: Nu, Re, Pr; the classical groups are St, 1/Pe, 1/Re") {
    // Incropera et al., ch. 6 (from memory): Nu_D = f(Re_D, Pr); with D, U, rho, cp repeating the
    // hand calculation gives h/(rho U cp) = St, k/(rho cp U D) = 1/Pe, mu/(rho U D) = 1/Re
    problem p;
    p.add("h", "W/(m^2*K)")
        .add("k", "W/(m*K)")
        .add("U", "m/s")
        .add("D", "m")
        .add("rho", "kg/m^3")
        .add("mu", "Pa*s")
        .add("cp", "J/(kg*K)");
    const analysis a = analyze_named(p);
    CHECK(first_matches(a) == std::vector<std::string>{"Nu", "Re", "Pr"});
    CHECK(a.groups[0].text(text_form::ascii) == "h*k^-1*D");
    options o;
    o.repeating = {"D", "U", "rho", "cp"};
    const analysis c = analyze(p, o);
    CHECK(c.form == basis::classical);
    CHECK(first_matches(c) == std::vector<std::string>{"St", "Pe^-1", "Re^-1"});
  }

  TEST_CASE("natural convection: Nu, Gr and Pr") {
    // Incropera et al., ch. 9 (from memory): Nu_L = f(Gr_L, Pr)
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("k", dims::thermal_conductivity)
        .add("g", dims::acceleration)
        .add("beta", dims::thermal_expansion_coefficient)
        .add("dT", dims::temperature)
        .add("L", dims::length)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("cp", dims::specific_heat_capacity);
    const analysis a = analyze_named(p);
    CHECK(first_matches(a).front() == "Nu");
    CHECK(lists(a, "Gr"));
    CHECK(lists(a, "Pr"));
  }

  TEST_CASE("a ship's resistance: force coefficient, Re, Fr^2") {
    // White, Fluid Mechanics, ch. 5 (from memory): C_F = f(Re, Fr)
    problem p;
    p.add("F", "N").add("U", "m/s").add("L", "m").add("rho", "kg/m^3").add("mu", "Pa*s").add("g", "m/s^2");
    CHECK(first_matches(analyze_named(p)) == std::vector<std::string>{"C_D", "Re", "Fr^2"});
  }

  TEST_CASE("a sphere's drag: C_D and Re") {
    // White, Fluid Mechanics, ch. 5 and 7 (from memory): C_D = f(Re)
    problem p;
    p.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "m").add("mu", "Pa*s");
    CHECK(first_matches(analyze_named(p)) == std::vector<std::string>{"C_D", "Re"});
  }

  TEST_CASE("pipe flow: a pressure group, Re, eps/D and L/D") {
    // White, Fluid Mechanics, ch. 5-6 (from memory): dp/(rho V^2) = F(Re, eps/d, L/d)
    problem p;
    p.add("dp", "Pa")
        .add("rho", "kg/m^3")
        .add("U", "m/s")
        .add("D", "m")
        .add("mu", "Pa*s")
        .add("L", "m")
        .add("eps", "m");
    const analysis a = analyze_named(p);
    const auto m = first_matches(a);
    CHECK((m[0] == "Eu" || m[0] == "f_D"));
    CHECK(lists(a, "Re"));
    CHECK(lists(a, "eps/D"));
    const auto l_over_d = std::find_if(a.groups.begin(), a.groups.end(), [&](const pi_group& g) {
      return g.exponent("L") == rational{1} && g.exponent("D") == rational{-1} && g.exponent("rho") == rational{0};
    });
    CHECK(l_over_d != a.groups.end());
  }

  TEST_CASE("a falling droplet: Re or We, Bo, Oh or Mo, and the density ratio") {
    // common practice for drops and bubbles (from memory): Re (or We), Eotvos (Bond), Morton or Ohnesorge
    problem p;
    p.add("U", "m/s")
        .add("D", "mm")
        .add("rho_l", "kg/m^3")
        .add("rho_g", "kg/m^3")
        .add("mu", "Pa*s")
        .add("sigma", "N/m")
        .add("g", "m/s^2");
    const analysis a = analyze_named(p);
    const auto m = first_matches(a);
    CHECK((m[0] == "Re" || m[0] == "We"));
    CHECK(lists(a, "Bo"));
    CHECK((lists(a, "Oh") || lists(a, "Mo")));
  }

  TEST_CASE("a spray: Weber and Ohnesorge numbers of one phase, the density ratio explicit") {
    // Lefebvre & McDonell, Atomization and Sprays, ch. 2 and 6 (from memory): the drop size of a
    // liquid sheet or jet in a gas, d32/D = f(We, Oh, rho_g/rho_l). Oh = mu_l/sqrt(rho_l sigma D)
    // is defined with the liquid's density; the gas density enters through the density ratio
    // (or a gas Weber number), never next to the liquid's viscosity in one Ohnesorge number
    problem p;
    p.add("d32", "um")
        .add("D", "mm")
        .add("U", "m/s")
        .add("rho_l", "kg/m^3")
        .add("rho_g", "kg/m^3")
        .add("mu_l", "Pa*s")
        .add("sigma", "N/m");
    for (const auto& repeating : {std::vector<std::string>{"D", "U", "rho_g"}, std::vector<std::string>{}}) {
      options o;
      o.form = basis::named;
      o.repeating = repeating;
      const analysis a = analyze(p, o);
      REQUIRE(a.groups.size() == 4);
      // the drop size over the nozzle diameter is no Knudsen number (DESIGN.md, "Rules for the groups")
      CHECK(a.groups.front().matches.empty());
      for (const auto& g : a.groups) {
        if (g.matches.empty()) continue;
        const bool liquid = g.exponent("mu_l") != rational{0} || g.exponent("rho_l") != rational{0};
        const bool gas = g.exponent("rho_g") != rational{0};
        INFO(g.text(text_form::ascii));
        CHECK_FALSE((liquid && gas));
      }
      const bool ratio = std::any_of(a.groups.begin(), a.groups.end(), [](const pi_group& g) {
        return g.exponent("rho_l") != rational{0} && g.exponent("rho_g") == -g.exponent("rho_l") &&
               g.exponent("U") == rational{0} && g.exponent("mu_l") == rational{0};
      });
      CHECK(ratio);
    }
  }

  TEST_CASE("a declared kind is evidence for a name, and is checked") {
    // White, Fluid Mechanics, ch. 1 (from memory): Kn = lambda/L; a mean free path called l_gas
    // is one only when declared
    problem p;
    p.add("l_gas", "nm").add("L", "um");
    analysis a = analyze(p);
    REQUIRE(a.groups.size() == 1);
    CHECK(a.groups[0].matches.empty());
    p.declare_kind("l_gas", "mean_free_path");
    a = analyze(p);
    REQUIRE(a.groups[0].matches.size() == 1);
    CHECK(a.groups[0].matches[0].symbol == "Kn");
    // the spelled-out name is accepted too
    problem q;
    q.add("l_gas", "nm").add("L", "um").declare_kind("l_gas", "mean free path");
    CHECK(analyze(q).groups[0].matches.at(0).symbol == "Kn");
    // a kind the catalog does not know, or of another dimension, is refused with the variable's name
    problem unknown;
    unknown.add("l_gas", "nm").add("L", "um").declare_kind("l_gas", "mean_free_paths");
    CHECK_THROWS_WITH_AS(analyze(unknown), doctest::Contains("'l_gas'"), analysis_error);
    problem wrong;
    wrong.add("l_gas", "nm").add("L", "um").declare_kind("l_gas", "density");
    CHECK_THROWS_WITH_AS(analyze(wrong), doctest::Contains("dimension"), analysis_error);
    CHECK_THROWS_AS(problem{}.declare_kind("x", "density"), analysis_error);
  }

  TEST_CASE("a heated plate transient: theta/theta_i, Bi, Fo, x/L") {
    // Incropera et al., ch. 5 (from memory): theta/theta_i = f(x/L, Bi, Fo)
    problem p;
    p.add("theta", "K")
        .add("theta_i", "K")
        .add("h", "W/(m^2*K)")
        .add("k_s", "W/(m*K)")
        .add("L", "m")
        .add("alpha", "m^2/s")
        .add("t", "s")
        .add("x", "m");
    const analysis a = analyze_named(p);
    CHECK(a.groups[0].matches.empty());
    CHECK(a.groups[0].exponent("theta") == rational{1});
    CHECK(a.groups[0].exponent("theta_i") == rational{-1});
    CHECK(lists(a, "Bi"));
    CHECK(lists(a, "Fo"));
    CHECK_FALSE(lists(a, "Nu"));
  }

  TEST_CASE("a pump: head, flow and power coefficients and Re") {
    // White, Fluid Mechanics, ch. 11 (from memory): C_H, C_P = f(C_Q, rho n D^2/mu)
    problem p;
    p.add("gH", "J/kg")
        .add("Q", "m^3/s")
        .add("n", "1/s")
        .add("D", "m")
        .add("rho", "kg/m^3")
        .add("mu", "Pa*s")
        .add("P", "W");
    const analysis a = analyze_named(p);
    CHECK(first_matches(a).front() == "C_H");
    CHECK(lists(a, "C_Q"));
    CHECK(lists(a, "C_P"));
    CHECK(lists(a, "Re"));
  }

  TEST_CASE("mass transfer: Sh, Re, Sc") {
    // Incropera et al., ch. 6 (from memory): Sh_D = f(Re_D, Sc)
    problem p;
    p.add("h_m", "m/s").add("U", "m/s").add("D", "m").add("rho", "kg/m^3").add("mu", "Pa*s").add("D_AB", "m^2/s");
    CHECK(first_matches(analyze_named(p)) == std::vector<std::string>{"Sh", "Re", "Sc"});
  }

  TEST_CASE("a boundary layer: delta/x and Re_x") {
    // White, Fluid Mechanics, ch. 7 (from memory): delta/x = 5.0/Re_x^(1/2)
    problem p;
    p.add("delta", "mm").add("U", "m/s").add("x", "m").add("nu", "m^2/s");
    const analysis a = analyze_named(p);
    REQUIRE(a.groups.size() == 2);
    CHECK(a.groups[0].exponent("delta") == rational{1});
    CHECK(a.groups[0].exponent("x") == rational{-1});
    CHECK(a.groups[0].exponent("U") == rational{0});
    // delta/x fits a Knudsen number and a relative roughness by dimension only; the names
    // delta and x (lengths, no mean free path or roughness) contradict both, so neither is listed
    CHECK(a.groups[0].matches.empty());
    CHECK(first_matches(a)[1] == "Re");
    CHECK(a.groups[1].exponent("x") == rational{1});
  }

  TEST_CASE("capillary rise: h/d, Bo and the contact angle") {
    // White, Fluid Mechanics, ch. 1 (from memory): h = 4 sigma cos(theta)/(rho g d)
    problem p;
    p.add("h", "mm").add("sigma", "N/m").add("rho", "kg/m^3").add("g", "m/s^2").add("d", "mm").add("theta", "1");
    const analysis a = analyze_named(p);
    CHECK(a.groups[0].exponent("h") == rational{1});
    CHECK(a.groups[0].exponent("d") == rational{-1});
    CHECK(lists(a, "Bo"));
  }

  TEST_CASE("the catalog entry a named group was chosen as is its first match") {
    // Nu and Bi share a form (Incropera et al., ch. 5-6, from memory): the group is still
    // marked ambiguous, and the entry chosen comes first
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("k", dims::thermal_conductivity)
        .add("U", dims::velocity)
        .add("D", dims::length)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("cp", dims::specific_heat_capacity);
    const analysis a = analyze_named(p);
    REQUIRE(a.groups[0].matches.size() == 2);
    CHECK(a.groups[0].matches[0] == group_match{"Nusselt number", "Nu", 1, true});
    CHECK(a.groups[0].matches[1].symbol == "Bi");
  }
}
