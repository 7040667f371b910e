#pragma once
// Helpers shared by the analysis tests: an independent exact rank (plain row echelon form
// in cpp_rational, written separately from the library's elimination) and exact checks of
// groups against expected exponents.
#include <nondim/analysis.hpp>

#include <doctest/doctest.h>

#include <boost/multiprecision/cpp_int.hpp>

#include <cstdint>
#include <map>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

namespace test_support {

using big = boost::multiprecision::cpp_rational;

inline big to_big(const nondim::rational& r) {
  big x = r.num;
  return x / r.den;
}

/// Rank of the vectors `v` (all of the same length), by row echelon form over F.
template <class F>
std::size_t rank_in(std::vector<std::vector<F>> v) {
  if (v.empty()) return 0;
  const std::size_t cols = v.front().size();
  std::size_t rank = 0;
  for (std::size_t c = 0; c < cols && rank < v.size(); ++c) {
    std::size_t p = rank;
    while (p < v.size() && v[p][c] == F(0)) ++p;
    if (p == v.size()) continue;
    std::swap(v[p], v[rank]);
    for (std::size_t i = rank + 1; i < v.size(); ++i) {
      if (v[i][c] == F(0)) continue;
      const F f = v[i][c] / v[rank][c];
      for (std::size_t k = c; k < cols; ++k) v[i][k] -= f * v[rank][k];
    }
    ++rank;
  }
  return rank;
}

inline std::size_t rank_of(const std::vector<std::vector<big>>& v) {
  return rank_in(v);
}

/// Rank of a set of dimensions (as vectors of 7 exponents): in checked int64 rationals,
/// which throw rather than wrap, and in cpp_rational when they overflow.
inline std::size_t rank_of(const std::vector<nondim::dimension>& dims) {
  try {
    std::vector<std::vector<nondim::rational>> v;
    for (const auto& d : dims) v.emplace_back(d.exponents.begin(), d.exponents.end());
    return rank_in(v);
  } catch (const nondim::rational_overflow&) {
    std::vector<std::vector<big>> v;
    for (const auto& d : dims) {
      std::vector<big> row;
      for (std::size_t i = 0; i < nondim::base_dimension_count; ++i) row.push_back(to_big(d[i]));
      v.push_back(row);
    }
    return rank_in(v);
  }
}

/// The exponents of the product of powers `e` of `dims`, exactly (no overflow possible).
inline std::vector<big> product_dimension(const std::vector<nondim::dimension>& dims,
                                          const std::vector<std::int64_t>& e) {
  // value-initialised (zero), not copies of big(0): GCC 12 at -O2 warns falsely
  // (-Wmaybe-uninitialized) inside Boost's copy of a temporary cpp_rational
  std::vector<big> s(nondim::base_dimension_count);
  for (std::size_t j = 0; j < dims.size(); ++j)
    for (std::size_t i = 0; i < nondim::base_dimension_count; ++i) s[i] += to_big(dims[j][i]) * e[j];
  return s;
}

inline bool exactly_dimensionless(const std::vector<nondim::dimension>& dims, const std::vector<std::int64_t>& e) {
  for (const auto& x : product_dimension(dims, e))
    if (x != 0) return false;
  return true;
}

/// Expected exponents by name; every variable not listed must have exponent 0.
using expected_group = std::map<std::string, std::int64_t>;

inline void check_group(const nondim::pi_group& g, const expected_group& want) {
  for (const auto& name : g.variables()) {
    const auto it = want.find(name);
    const std::int64_t e = it == want.end() ? 0 : it->second;
    INFO("variable " << name << " in " << g.text(nondim::text_form::ascii));
    CHECK(g.exponent(name) == nondim::rational{e});
  }
  for (const auto& entry : want) {  // no structured binding: Clang 14 cannot capture one in INFO
    const std::string& name = entry.first;
    INFO("expected variable " << name);
    CHECK(std::find(g.variables().begin(), g.variables().end(), name) != g.variables().end());
  }
}

inline void check_groups(const nondim::analysis& a, const std::vector<expected_group>& want) {
  REQUIRE(a.groups.size() == want.size());
  for (std::size_t k = 0; k < want.size(); ++k) check_group(a.groups[k], want[k]);
  for (const auto& g : a.groups) CHECK(exactly_dimensionless(a.matrix.columns(), g.exponents));
}

inline std::vector<nondim::dimension> dims_of(const nondim::problem& p) {
  return p.matrix().columns();
}

}  // namespace test_support

namespace test_support {

/// Options with the given repeating variables (GCC 12 warns on designated initialisers
/// that leave members out, so the tests build options this way).
inline nondim::options repeating(std::vector<std::string> names) {
  nondim::options o;
  o.repeating = std::move(names);
  return o;
}

/// Drag on a sphere (White, Fluid Mechanics, 7th ed., Sec. 5.3, from memory): F, rho, U, D, mu;
/// groups F/(rho U^2 D^2) and mu/(rho U D) = 1/Re.
inline nondim::problem sphere_drag() {
  nondim::problem p;
  p.add("F", nondim::dims::force)
      .add("rho", nondim::dims::density)
      .add("U", nondim::dims::velocity)
      .add("D", nondim::dims::length)
      .add("mu", nondim::dims::dynamic_viscosity);
  return p;
}

}  // namespace test_support

namespace test_support {

/// One variable of a textbook problem: its name, its dimension and, when the problem
/// declares one, its kind (names/quantity_kind.hpp).
struct textbook_variable {
  std::string name;
  nondim::dimension dim;
  std::string kind{};
};

/// A textbook problem whose repeating variables the book names. The groups were derived by
/// hand from the dimensions (SI Brochure 9th ed., tables 2 and 4), not copied from output.
struct textbook_case {
  std::string title;
  std::string source;                        ///< book and section; "from memory" where recalled rather than re-read
  std::vector<textbook_variable> variables;  ///< the first is the dependent variable
  std::vector<std::string> repeating;        ///< in input order, as `analyze()` reports them
  std::vector<expected_group> groups;        ///< the dependent variable's group first
};

/// The textbook problems that the repeating rule (tests/repeating_rule_test.cpp) and the
/// worked examples (tests/analysis_examples_test.cpp) check, each with its source.
inline const std::vector<textbook_case>& textbook_cases() {
  using namespace nondim;
  const dimension per_kelvin = dimension{} / dims::temperature;
  static const std::vector<textbook_case> cases{
      {"drag on a sphere",
       "White, Fluid Mechanics, 7th ed., Sec. 5.3: F/(rho V^2 D^2) = g(rho V D / mu) (from memory)",
       {{"F", dims::force},
        {"D", dims::length},
        {"V", dims::velocity},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity}},
       {"D", "V", "rho"},
       {{{"F", 1}, {"rho", -1}, {"V", -2}, {"D", -2}}, {{"mu", 1}, {"rho", -1}, {"V", -1}, {"D", -1}}}},
      {"pressure drop in a rough pipe (White)",
       "White, Fluid Mechanics, 7th ed., Sec. 6.6 (Moody chart): dp/(rho V^2) = f(Re, eps/d, L/d); "
       "Fox & McDonald, Introduction to Fluid Mechanics, Sec. 8.7 (from memory)",
       {{"dp", dims::pressure},
        {"rho", dims::density},
        {"V", dims::velocity},
        {"d", dims::length},
        {"mu", dims::dynamic_viscosity},
        {"eps", dims::length},
        {"L", dims::length}},
       {"rho", "V", "d"},
       {{{"dp", 1}, {"rho", -1}, {"V", -2}},
        {{"mu", 1}, {"rho", -1}, {"V", -1}, {"d", -1}},
        {{"eps", 1}, {"d", -1}},
        {{"L", 1}, {"d", -1}}}},
      {"pressure drop in a pipe (Munson), the length before the diameter",
       "Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, 6th ed., Sec. 8.3: dp = F(D, l, eps, mu, V, rho) "
       "gives dp/(rho V^2) = f(rho V D/mu, l/D, eps/D) with D, V, rho repeating (from memory); the pipe's "
       "length l is listed first here, and the diameter still repeats",
       {{"dp", dims::pressure},
        {"l", dims::length},
        {"eps", dims::length},
        {"D", dims::length},
        {"mu", dims::dynamic_viscosity},
        {"V", dims::velocity},
        {"rho", dims::density}},
       {"D", "V", "rho"},
       {{{"dp", 1}, {"rho", -1}, {"V", -2}},
        {{"l", 1}, {"D", -1}},
        {{"eps", 1}, {"D", -1}},
        {{"mu", 1}, {"rho", -1}, {"V", -1}, {"D", -1}}}},
      {"pump performance with the angular speed",
       "Fox & McDonald, Introduction to Fluid Mechanics, Sec. 10.3 (pump similarity rules): gH/(omega^2 D^2), "
       "P/(rho omega^3 D^5), Q/(omega D^3), mu/(rho omega D^2); White, 7th ed., Sec. 11.4 (from memory)",
       {{"gH", dims::specific_energy},
        {"P", dims::power},
        {"Q", dims::volume_flow_rate},
        {"omega", dims::angular_velocity},
        {"D", dims::length},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity}},
       {"omega", "D", "rho"},
       {{{"gH", 1}, {"omega", -2}, {"D", -2}},
        {{"P", 1}, {"rho", -1}, {"omega", -3}, {"D", -5}},
        {{"Q", 1}, {"omega", -1}, {"D", -3}},
        {{"mu", 1}, {"rho", -1}, {"omega", -1}, {"D", -2}}}},
      {"pump performance with the rotational speed",
       "White, Fluid Mechanics, 7th ed., Sec. 11.4: C_Q = Q/(n D^3), C_H = gH/(n^2 D^2), C_P = P/(rho n^3 D^5), "
       "n the rotational speed (from memory); power first here",
       {{"P", dims::power},
        {"Q", dims::volume_flow_rate},
        {"gH", dims::specific_energy},
        {"n", dims::frequency},
        {"D", dims::length},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity}},
       {"n", "D", "rho"},
       {{{"P", 1}, {"rho", -1}, {"n", -3}, {"D", -5}},
        {{"Q", 1}, {"n", -1}, {"D", -3}},
        {{"gH", 1}, {"n", -2}, {"D", -2}},
        {{"mu", 1}, {"rho", -1}, {"n", -1}, {"D", -2}}}},
      {"a ship's resistance",
       "White, Fluid Mechanics, 7th ed., Sec. 5.4 (ship models: Froude and Reynolds scaling cannot both be met), "
       "from memory",
       {{"F", dims::force},
        {"V", dims::velocity},
        {"L", dims::length},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity},
        {"g", dims::acceleration}},
       {"V", "L", "rho"},
       {{{"F", 1}, {"rho", -1}, {"V", -2}, {"L", -2}},
        {{"mu", 1}, {"rho", -1}, {"V", -1}, {"L", -1}},
        {{"g", 1}, {"L", 1}, {"V", -2}}}},
      {"a ship's resistance with surface tension",
       "White, Fluid Mechanics, 7th ed., Sec. 5.4: F/(rho V^2 L^2) = f(Re, Fr, We) with L, V, rho repeating "
       "(from memory)",
       {{"F", dims::force},
        {"V", dims::velocity},
        {"L", dims::length},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity},
        {"g", dims::acceleration},
        {"sigma", dims::surface_tension}},
       {"V", "L", "rho"},
       {{{"F", 1}, {"rho", -1}, {"V", -2}, {"L", -2}},
        {{"mu", 1}, {"rho", -1}, {"V", -1}, {"L", -1}},
        {{"g", 1}, {"L", 1}, {"V", -2}},
        {{"sigma", 1}, {"rho", -1}, {"V", -2}, {"L", -1}}}},
      {"G. I. Taylor's blast wave",
       "G. I. Taylor, Proc. R. Soc. A 201 (1950) 159-174: R = C (E t^2 / rho)^(1/5); the rule takes E, rho, t",
       {{"R", dims::length}, {"E", dims::energy}, {"rho", dims::density}, {"t", dims::time}},
       {"E", "rho", "t"},
       {{{"R", 5}, {"rho", 1}, {"E", -1}, {"t", -2}}}},
      {"weir flow: the head, g and the density",
       "Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, 6th ed., Sec. 10.6 (weirs): Q = C b sqrt(g) "
       "H^(3/2), the flow scaled with H and g; Weber and Reynolds numbers matter only for low heads (from memory)",
       {{"Q", dims::volume_flow_rate},
        {"H", dims::length},
        {"b", dims::length},
        {"g", dims::acceleration},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity},
        {"sigma", dims::surface_tension}},
       {"H", "g", "rho"},
       {{{"Q", 2}, {"H", -5}, {"g", -1}},
        {{"b", 1}, {"H", -1}},
        {{"mu", 2}, {"H", -3}, {"g", -1}, {"rho", -2}},
        {{"sigma", 1}, {"H", -2}, {"g", -1}, {"rho", -1}}}},
      {"a spray: nozzle diameter, velocity, liquid density",
       "Lefebvre, Atomization and Sprays (1989), Ch. 6: d/D = f(We, Oh or Re, rho_g/rho_l), We = rho U^2 D / sigma "
       "(from memory); the liquid density is first, so it repeats",
       {{"d32", dims::length},
        {"D", dims::length},
        {"U", dims::velocity},
        {"rho_l", dims::density},
        {"rho_g", dims::density},
        {"mu_l", dims::dynamic_viscosity},
        {"sigma", dims::surface_tension}},
       {"D", "U", "rho_l"},
       {{{"d32", 1}, {"D", -1}},
        {{"rho_g", 1}, {"rho_l", -1}},
        {{"mu_l", 1}, {"D", -1}, {"U", -1}, {"rho_l", -1}},
        {{"sigma", 1}, {"D", -1}, {"U", -2}, {"rho_l", -1}}}},
      {"a rising bubble: d, g, the liquid density",
       "Clift, Grace & Weber, Bubbles, Drops and Particles (1978), Ch. 2: U/sqrt(g d), Eo = g drho d^2 / sigma, "
       "Mo = g mu^4 drho / (rho^2 sigma^3) (from memory); the density difference is listed before the "
       "liquid's density here, and the liquid's still repeats",
       {{"U", dims::velocity},
        {"d", dims::length},
        {"g", dims::acceleration},
        {"drho", dims::density},
        {"rho", dims::density},
        {"sigma", dims::surface_tension},
        {"mu", dims::dynamic_viscosity}},
       {"d", "g", "rho"},
       {{{"U", 2}, {"d", -1}, {"g", -1}},
        {{"drho", 1}, {"rho", -1}},
        {{"sigma", 1}, {"d", -2}, {"g", -1}, {"rho", -1}},
        {{"mu", 2}, {"d", -3}, {"g", -1}, {"rho", -2}}}},
      {"natural convection: L, g, rho and the temperature difference",
       "Bergman, Lavine, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 7th ed., Sec. 9.2: "
       "Gr = g beta dT L^3 / nu^2, beta dT a group of its own (from memory)",
       {{"h", dims::heat_transfer_coefficient},
        {"beta", per_kelvin},
        {"L", dims::length},
        {"g", dims::acceleration},
        {"dT", dims::temperature},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity},
        {"k", dims::thermal_conductivity},
        {"cp", dims::specific_heat_capacity}},
       {"L", "g", "dT", "rho"},
       {{{"h", 2}, {"dT", 2}, {"rho", -2}, {"g", -3}, {"L", -3}},
        {{"beta", 1}, {"dT", 1}},
        {{"mu", 2}, {"rho", -2}, {"g", -1}, {"L", -3}},
        {{"k", 2}, {"dT", 2}, {"rho", -2}, {"g", -3}, {"L", -5}},
        {{"cp", 1}, {"dT", 1}, {"g", -1}, {"L", -1}}}},
      {"a boundary layer without a velocity: nu repeats",
       "Schlichting, Boundary-Layer Theory, Ch. 7 (from memory): with no velocity, nu is the only variable with T; "
       "t nu / x^2 is a Fourier-number form",
       {{"t", dims::time}, {"x", dims::length}, {"nu", dims::kinematic_viscosity}},
       {"x", "nu"},
       {{{"t", 1}, {"nu", 1}, {"x", -2}}}},
      {"a packed bed: the particle diameter, not the bed length",
       "Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., Sec. 6.4 (the Ergun equation): "
       "dp d_p / (rho U^2 L) = f(Re_p, eps) with Re_p = rho U d_p / mu, so d_p repeats and L/d_p is a group "
       "(from memory)",
       {{"dp", dims::pressure},
        {"L", dims::length},
        {"d_p", dims::length},
        {"eps", dims::dimensionless},
        {"U", dims::velocity},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity}},
       {"d_p", "U", "rho"},
       {{{"dp", 1}, {"rho", -1}, {"U", -2}},
        {{"L", 1}, {"d_p", -1}},
        {{"eps", 1}},
        {{"mu", 1}, {"rho", -1}, {"U", -1}, {"d_p", -1}}}},
      {"a packed bed with declared kinds: depth of fill and grain size",
       "Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., Sec. 6.4 (from memory), as above; the names "
       "are not conventional, the declared kind of the grain size says it is a diameter",
       {{"dp", dims::pressure},
        {"depth", dims::length},
        {"grain", dims::length, "diameter"},
        {"U", dims::velocity},
        {"rho", dims::density},
        {"mu", dims::dynamic_viscosity}},
       {"grain", "U", "rho"},
       {{{"dp", 1}, {"rho", -1}, {"U", -2}},
        {{"depth", 1}, {"grain", -1}},
        {{"mu", 1}, {"rho", -1}, {"U", -1}, {"grain", -1}}}},
      {"a heat exchanger: C_min repeats, giving NTU and the capacity ratio",
       "Bergman, Lavine, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 7th ed., Sec. 11.4: "
       "epsilon = q/(C_min dT_max) = f(NTU, C_r), NTU = UA/C_min, C_r = C_min/C_max (from memory); "
       "UA is listed first, and the heat-capacity rate still repeats",
       {{"q", dims::power},
        {"UA", thermal_conductance},
        {"C_max", thermal_conductance},
        {"C_min", thermal_conductance},
        {"dT_max", dims::temperature}},
       {"C_min", "dT_max"},
       {{{"q", 1}, {"C_min", -1}, {"dT_max", -1}}, {{"UA", 1}, {"C_min", -1}}, {{"C_max", 1}, {"C_min", -1}}}},
      {"a heat exchanger with declared kinds",
       "Bergman et al., 7th ed., Sec. 11.4 (from memory), as above; the names are not conventional, the "
       "declared kinds say which is the conductance and which the smaller heat-capacity rate",
       {{"duty", dims::power},
        {"G", thermal_conductance, "overall_conductance"},
        {"Wc", thermal_conductance, "min_heat_capacity_rate"},
        {"dT_in", dims::temperature}},
       {"Wc", "dT_in"},
       {{{"duty", 1}, {"Wc", -1}, {"dT_in", -1}}, {{"G", 1}, {"Wc", -1}}}},
  };
  return cases;
}

/// The case of `textbook_cases()` titled `title`.
inline const textbook_case& textbook_case_titled(const std::string& title) {
  for (const auto& c : textbook_cases())
    if (c.title == title) return c;
  throw std::invalid_argument("no textbook case titled " + title);
}

/// The problem of case `c`, with its declared kinds.
inline nondim::problem problem_of(const textbook_case& c) {
  nondim::problem p;
  for (const auto& v : c.variables) {
    p.add(v.name, v.dim);
    if (!v.kind.empty()) p.declare_kind(v.name, v.kind);
  }
  return p;
}

/// Analyses case `c` with the rule's choice and checks the book's repeating variables and
/// groups; returns the analysis for further checks.
inline nondim::analysis check_textbook_case(const textbook_case& c) {
  INFO(c.title << " -- " << c.source);
  const nondim::analysis a = nondim::analyze(problem_of(c));
  CHECK(a.repeating == c.repeating);
  check_groups(a, c.groups);
  return a;
}

}  // namespace test_support
