// The repeating variables an engineer would choose (DESIGN.md, "Rules for the groups"): a
// length, then a velocity, rotational speed or g, then a density; surface tension,
// viscosity and expansion coefficients only when nothing else closes the rank. Each case
// is a textbook problem whose repeating variables the book names; "from memory" marks a
// book recalled rather than re-read. The groups were derived by hand from the dimensions
// (SI Brochure 9th ed., tables 2 and 4). Also: the dependent group first, the named basis
// with given repeating variables, the relation in named groups, and the alternatives.
#include "analysis_support.hpp"

#include <algorithm>
#include <string>
#include <vector>

using namespace nondim;
using test_support::check_groups;
using test_support::expected_group;

namespace {

std::vector<std::string> sorted(std::vector<std::string> v) {
  std::sort(v.begin(), v.end());
  return v;
}

}  // namespace

TEST_SUITE("repeating rule") {
  TEST_CASE("the tiers read from dimensions") {
    // DESIGN.md, "Rules for the groups" (the tiers), on the dimensions of ISO 80000-3/-4/-5.
    CHECK(repeating_tier_of(dims::length) == repeating_tier::geometric);
    CHECK(repeating_tier_of(dims::velocity) == repeating_tier::kinematic);
    CHECK(repeating_tier_of(dims::frequency) == repeating_tier::kinematic);     // rotational speed n
    CHECK(repeating_tier_of(dims::acceleration) == repeating_tier::kinematic);  // g
    CHECK(repeating_tier_of(dims::density) == repeating_tier::material);
    CHECK(repeating_tier_of(dims::surface_tension) == repeating_tier::last_resort);
    CHECK(repeating_tier_of(dims::dynamic_viscosity) == repeating_tier::last_resort);
    CHECK(repeating_tier_of(dims::kinematic_viscosity) == repeating_tier::last_resort);
    CHECK(repeating_tier_of(dimension{} / dims::temperature) == repeating_tier::last_resort);  // beta
    CHECK(repeating_tier_of(dims::dimensionless) == repeating_tier::last_resort);
    CHECK(repeating_tier_of(dims::temperature) == repeating_tier::other);
    CHECK(repeating_tier_of(dims::pressure) == repeating_tier::other);
  }

  TEST_CASE("weir flow: the head, g and the density; surface tension and viscosity in groups") {
    // Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, 6th ed., Sec. 10.6 (weirs):
    // Q = C b sqrt(g) H^(3/2), the flow scaled with H and g; Weber and Reynolds numbers
    // matter only for low heads (from memory). The former rule took sigma before rho.
    problem p;
    p.add("Q", dims::volume_flow_rate)
        .add("H", dims::length)
        .add("b", dims::length)
        .add("g", dims::acceleration)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("sigma", dims::surface_tension);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"H", "g", "rho"});
    check_groups(a, {expected_group{{"Q", 2}, {"H", -5}, {"g", -1}}, expected_group{{"b", 1}, {"H", -1}},
                     expected_group{{"mu", 2}, {"H", -3}, {"g", -1}, {"rho", -2}},
                     expected_group{{"sigma", 1}, {"H", -2}, {"g", -1}, {"rho", -1}}});
  }

  TEST_CASE("ship resistance with surface tension: L, V, rho (Froude, Reynolds, Weber)") {
    // White, Fluid Mechanics, 7th ed., Sec. 5.4: F/(rho V^2 L^2) = f(Re, Fr, We) with
    // L, V, rho repeating (from memory).
    problem p;
    p.add("F", dims::force)
        .add("V", dims::velocity)
        .add("L", dims::length)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("g", dims::acceleration)
        .add("sigma", dims::surface_tension);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"V", "L", "rho"});
    check_groups(
        a, {expected_group{{"F", 1}, {"rho", -1}, {"V", -2}, {"L", -2}},
            expected_group{{"mu", 1}, {"rho", -1}, {"V", -1}, {"L", -1}}, expected_group{{"g", 1}, {"L", 1}, {"V", -2}},
            expected_group{{"sigma", 1}, {"rho", -1}, {"V", -2}, {"L", -1}}});
  }

  TEST_CASE("a pump: D, n, rho give the flow, head and power coefficients") {
    // White, Fluid Mechanics, 7th ed., Sec. 11.4: C_Q = Q/(n D^3), C_H = gH/(n^2 D^2),
    // C_P = P/(rho n^3 D^5), with n the rotational speed (from memory). Power first here.
    problem p;
    p.add("P", dims::power)
        .add("Q", dims::volume_flow_rate)
        .add("gH", dims::specific_energy)
        .add("n", dims::frequency)
        .add("D", dims::length)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"n", "D", "rho"});
    check_groups(a, {expected_group{{"P", 1}, {"rho", -1}, {"n", -3}, {"D", -5}},
                     expected_group{{"Q", 1}, {"n", -1}, {"D", -3}}, expected_group{{"gH", 1}, {"n", -2}, {"D", -2}},
                     expected_group{{"mu", 1}, {"rho", -1}, {"n", -1}, {"D", -2}}});
  }

  TEST_CASE("a spray: nozzle diameter, velocity, liquid density; not the surface tension") {
    // Lefebvre, Atomization and Sprays (1989), Ch. 6: d/D = f(We, Oh or Re, rho_g/rho_l),
    // We = rho U^2 D / sigma (from memory). Liquid density first, so it repeats.
    problem p;
    p.add("d32", dims::length)
        .add("D", dims::length)
        .add("U", dims::velocity)
        .add("rho_l", dims::density)
        .add("rho_g", dims::density)
        .add("mu_l", dims::dynamic_viscosity)
        .add("sigma", dims::surface_tension);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"D", "U", "rho_l"});
    check_groups(a, {expected_group{{"d32", 1}, {"D", -1}}, expected_group{{"rho_g", 1}, {"rho_l", -1}},
                     expected_group{{"mu_l", 1}, {"D", -1}, {"U", -1}, {"rho_l", -1}},
                     expected_group{{"sigma", 1}, {"D", -1}, {"U", -2}, {"rho_l", -1}}});
  }

  TEST_CASE("a rising bubble: d, g, the liquid density (Froude, Eotvos, Morton forms)") {
    // Clift, Grace & Weber, Bubbles, Drops and Particles (1978), Ch. 2: U/sqrt(g d),
    // Eo = g drho d^2 / sigma, Mo = g mu^4 drho / (rho^2 sigma^3), from memory.
    problem p;
    p.add("U", dims::velocity)
        .add("d", dims::length)
        .add("g", dims::acceleration)
        .add("rho", dims::density)
        .add("drho", dims::density)
        .add("sigma", dims::surface_tension)
        .add("mu", dims::dynamic_viscosity);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"d", "g", "rho"});
    check_groups(a, {expected_group{{"U", 2}, {"d", -1}, {"g", -1}}, expected_group{{"drho", 1}, {"rho", -1}},
                     expected_group{{"sigma", 1}, {"d", -2}, {"g", -1}, {"rho", -1}},
                     expected_group{{"mu", 2}, {"d", -3}, {"g", -1}, {"rho", -2}}});
  }

  TEST_CASE("natural convection: L, g, rho and the temperature difference, not the expansion coefficient") {
    // Bergman, Lavine, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 7th ed.,
    // Sec. 9.2: Gr = g beta dT L^3 / nu^2, beta dT a group of its own (from memory). The
    // former rule took beta (one base dimension) before g and rho.
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("beta", dimension{} / dims::temperature)
        .add("L", dims::length)
        .add("g", dims::acceleration)
        .add("dT", dims::temperature)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("k", dims::thermal_conductivity)
        .add("cp", dims::specific_heat_capacity);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"L", "g", "dT", "rho"});
    CHECK_FALSE(a.is_repeating("beta"));
    CHECK(a.groups.size() == 5);
    check_groups(a,
                 {expected_group{{"h", 2}, {"dT", 2}, {"rho", -2}, {"g", -3}, {"L", -3}},
                  expected_group{{"beta", 1}, {"dT", 1}}, expected_group{{"mu", 2}, {"rho", -2}, {"g", -1}, {"L", -3}},
                  expected_group{{"k", 2}, {"dT", 2}, {"rho", -2}, {"g", -3}, {"L", -5}},
                  expected_group{{"cp", 1}, {"dT", 1}, {"g", -1}, {"L", -1}}});
  }

  TEST_CASE("pipe pressure drop: D, V, rho in the book's order") {
    // Munson, Young & Okiishi, Fundamentals of Fluid Mechanics, 6th ed., Sec. 8.3:
    // dp = F(D, l, eps, mu, V, rho) gives dp/(rho V^2) = f(rho V D/mu, l/D, eps/D) with
    // D, V, rho repeating (from memory).
    problem p;
    p.add("dp", dims::pressure)
        .add("D", dims::length)
        .add("l", dims::length)
        .add("eps", dims::length)
        .add("mu", dims::dynamic_viscosity)
        .add("V", dims::velocity)
        .add("rho", dims::density);
    const analysis a = analyze(p);
    CHECK(sorted(a.repeating) == sorted({"D", "V", "rho"}));
    check_groups(a,
                 {expected_group{{"dp", 1}, {"rho", -1}, {"V", -2}}, expected_group{{"l", 1}, {"D", -1}},
                  expected_group{{"eps", 1}, {"D", -1}}, expected_group{{"mu", 1}, {"rho", -1}, {"V", -1}, {"D", -1}}});
  }

  TEST_CASE("kinematic viscosity repeats only when nothing else closes the rank") {
    // A flat plate's boundary layer, delta = f(x, nu) (Schlichting, Boundary-Layer Theory,
    // Ch. 7, from memory): with no velocity, nu is the only variable with T.
    problem p;
    p.add("t", dims::time).add("x", dims::length).add("nu", dims::kinematic_viscosity);
    const analysis a = analyze(p);
    CHECK(a.repeating == std::vector<std::string>{"x", "nu"});
    check_groups(a, {expected_group{{"t", 1}, {"nu", 1}, {"x", -2}}});  // a Fourier-number form
  }

  TEST_CASE("the dependent variable's group comes first") {
    // DESIGN.md, "Rules for the groups": with mu as the dependent variable of the sphere's
    // drag (White, 7th ed., Sec. 5.3), 1/Re leads, then F/(rho V^2 D^2).
    problem p;
    p.add("F", dims::force)
        .add("D", dims::length)
        .add("V", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity);
    options o;
    o.dependent = "mu";
    const analysis a = analyze(p, o);
    CHECK(a.dependent == "mu");
    check_groups(a, {expected_group{{"mu", 1}, {"rho", -1}, {"V", -1}, {"D", -1}},
                     expected_group{{"F", 1}, {"rho", -1}, {"V", -2}, {"D", -2}}});
    CHECK(a.groups[0].non_repeating == 4);
  }

  TEST_CASE("the named basis says whether it kept the given repeating variables") {
    // White, Fluid Mechanics, 7th ed., Sec. 5.3: C_D = f(Re) for a sphere (from memory).
    problem p;
    p.add("F", dims::force)
        .add("D", dims::length)
        .add("V", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity);
    options o = test_support::repeating({"rho", "V", "D"});
    o.form = basis::named;
    const analysis kept = analyze(p, o);
    CHECK(kept.repeating_kept);  // C_D and Re both use rho, V, D and one other variable
    CHECK(kept.repeating_origin() == "given; kept by the named basis");

    // with mu, V, D the classical groups are the Stokes form and Re; the named basis still
    // gives C_D, whose F and rho are both non-repeating: the given set was not used
    o.repeating = {"mu", "V", "D"};
    const analysis not_kept = analyze(p, o);
    CHECK_FALSE(not_kept.repeating_kept);
    CHECK(not_kept.repeating_origin().find("given; not used by the named basis") == 0);
    o.form = basis::classical;
    CHECK(analyze(p, o).repeating_origin() == "given");
  }

  TEST_CASE("the relation in named groups: Nu = f(Re, Pr) where the classical basis gives St") {
    // Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., Secs. 6.5 and 6.7:
    // Nu = f(Re, Pr); St = Nu/(Re Pr) (from memory). The rule repeats D, U, rho, cp.
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("U", dims::velocity)
        .add("D", dims::length)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("k", dims::thermal_conductivity)
        .add("cp", dims::specific_heat_capacity);
    const analysis classical = analyze(p);
    CHECK(sorted(classical.repeating) == sorted({"D", "U", "rho", "cp"}));
    CHECK(relation(classical, text_form::ascii).rfind("St = f(", 0) == 0);
    options o;
    o.form = basis::named;
    CHECK(relation(analyze(p, o), text_form::ascii) == "Nu = f(Re, Pr)");

    // no relation when the dependent variable is isolated (the pendulum without g,
    // Fox & McDonald, Ch. 7; common practice)
    problem q;
    q.add("t", dims::time).add("L", dims::length).add("m", dims::mass);
    CHECK(relation(analyze(q)).empty());
  }

  TEST_CASE("alternatives: the other admissible repeating sets, best first by the rule") {
    // Sphere drag (White, 7th ed., Secs. 5.2-5.3, from memory): with D, V, rho chosen, the
    // others are D, V, mu (the Stokes form F/(mu V D)), D, rho, mu and V, rho, mu; every
    // triple of independent dimensions among D, V, rho, mu (derived by hand).
    problem p;
    p.add("F", dims::force)
        .add("D", dims::length)
        .add("V", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity);
    const std::vector<analysis> alts = alternatives(p);
    REQUIRE(alts.size() == 3);
    CHECK(alts[0].repeating == std::vector<std::string>{"D", "V", "mu"});
    CHECK(alts[1].repeating == std::vector<std::string>{"D", "rho", "mu"});
    CHECK(alts[2].repeating == std::vector<std::string>{"V", "rho", "mu"});
    check_groups(alts[0], {expected_group{{"F", 1}, {"mu", -1}, {"V", -1}, {"D", -1}},
                           expected_group{{"rho", 1}, {"V", 1}, {"D", 1}, {"mu", -1}}});
    CHECK(alts[0].repeating_given);
    CHECK(alts[0].form == basis::classical);
    // the second group is named: rho V D / mu is the Reynolds number (ISO 80000-11)
    REQUIRE_FALSE(alts[0].groups[1].matches.empty());
    CHECK(alts[0].groups[1].matches.front().symbol == "Re");

    CHECK(alternatives(p, {}, 1).size() == 1);
    CHECK(alternatives(p, {}, 0).empty());
    // a given set is left out in its turn, and the rule's choice comes back as the first
    const std::vector<analysis> from_stokes = alternatives(p, test_support::repeating({"mu", "V", "D"}));
    REQUIRE(from_stokes.size() == 3);
    CHECK(from_stokes[0].repeating == std::vector<std::string>{"D", "V", "rho"});
  }

  TEST_CASE("alternatives stay bounded on a large problem") {
    // 60 lengths and a time (common practice, no source): C(60, 1) x 1 sets of rank 2;
    // only the first ten by the rule come back, each an admissible set.
    problem p;
    p.add("t0", dims::time);
    for (int i = 0; i < 60; ++i) p.add("x" + std::to_string(i), dims::length);
    p.add("t1", dims::time);
    const std::vector<analysis> alts = alternatives(p);
    REQUIRE(alts.size() == default_alternative_count);
    for (const auto& x : alts) {
      CHECK(x.rank == 2);
      CHECK_FALSE(x.is_repeating("t0"));  // never the dependent variable
    }
    // the rule's order: x0 with t1 is the primary choice; then x1, t1; x2, t1; ...
    CHECK(alts[0].repeating == std::vector<std::string>{"x1", "t1"});
    CHECK(alts[9].repeating == std::vector<std::string>{"x10", "t1"});
  }
}
