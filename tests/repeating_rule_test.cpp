// The repeating variables an engineer would choose (DESIGN.md, "Rules for the groups"): a
// length, then a velocity, rotational speed or g, then a density; surface tension,
// viscosity and expansion coefficients only when nothing else closes the rank; among
// variables of one dimension the one a textbook repeats. The textbook problems, each with
// its book, are the table of tests/analysis_support.hpp; "from memory" marks a book
// recalled rather than re-read. Also: the dependent group first, the named basis with given
// repeating variables, the relation in named groups, and the alternatives.
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

  TEST_CASE("textbook problems: the book's repeating variables and groups") {
    // The cases and their sources: test_support::textbook_cases() (tests/analysis_support.hpp).
    // Among them the ones the former rules got wrong: surface tension taken before the
    // density (weir, ship, spray, bubble), the expansion coefficient before g (natural
    // convection), a bed length before the particle diameter (packed beds), an overall
    // conductance before the heat-capacity rate (heat exchangers).
    for (const auto& c : test_support::textbook_cases()) (void)test_support::check_textbook_case(c);
  }

  TEST_CASE("among variables of one dimension, the one a textbook repeats") {
    // The kinds and their conventional names: names/quantity_kind.hpp (Incropera et al.;
    // White; Bird, Stewart & Lightfoot; common practice). Packed beds repeat the particle
    // diameter (Bird, Stewart & Lightfoot, 2nd ed., Sec. 6.4), heat exchangers C_min
    // (Bergman et al., 7th ed., Sec. 11.4), pipes D and not eps (Munson et al., 6th ed.,
    // Sec. 8.3); all from memory.
    using pref = repeating_preference;
    CHECK(repeating_preference_of("d_p", dims::length, "") == pref::textbook);
    CHECK(repeating_preference_of("D_h", dims::length, "") == pref::textbook);
    CHECK(repeating_preference_of("D", dims::length, "") == pref::textbook);       // also a characteristic length
    CHECK(repeating_preference_of("D_pipe", dims::length, "") == pref::textbook);  // the part before '_'
    CHECK(repeating_preference_of("L", dims::length, "") == pref::neutral);
    CHECK(repeating_preference_of("H", dims::length, "") == pref::neutral);  // a height or a head
    CHECK(repeating_preference_of("depth", dims::length, "") == pref::neutral);
    CHECK(repeating_preference_of("eps", dims::length, "") == pref::avoided);     // a roughness
    CHECK(repeating_preference_of("lambda", dims::length, "") == pref::avoided);  // a mean free path
    CHECK(repeating_preference_of("C_min", thermal_conductance, "") == pref::textbook);
    CHECK(repeating_preference_of("C_h", thermal_conductance, "") == pref::textbook);
    CHECK(repeating_preference_of("C_max", thermal_conductance, "") == pref::avoided);
    CHECK(repeating_preference_of("UA", thermal_conductance, "") == pref::avoided);
    CHECK(repeating_preference_of("C", dims::heat_capacity, "") == pref::neutral);  // J/K, no rate
    CHECK(repeating_preference_of("rho", dims::density, "") == pref::neutral);
    CHECK(repeating_preference_of("rho_p", dims::density, "") == pref::avoided);  // a particle's density
    CHECK(repeating_preference_of("drho", dims::density, "") == pref::avoided);
    // a name means a kind only for a variable of that kind's dimension: "D" is also a mass
    // diffusivity's name, "C" a capacitance's
    CHECK(repeating_preference_of("D", dims::mass_diffusivity, "") == pref::neutral);
    CHECK(repeating_preference_of("C", dims::capacitance, "") == pref::neutral);
    // a declared kind is the evidence, whatever the name says
    CHECK(repeating_preference_of("L", dims::length, "diameter") == pref::textbook);
    CHECK(repeating_preference_of("d_p", dims::length, "roughness") == pref::avoided);
    CHECK(repeating_preference_of("G", thermal_conductance, "smaller heat-capacity rate C_min") == pref::textbook);
    // a declared kind of another dimension is no evidence (analyze() refuses it anyway)
    CHECK(repeating_preference_of("L", dims::length, "heat_capacity_rate") == pref::neutral);
  }

  TEST_CASE("the preference orders variables of one dimension, never variables of others") {
    // DESIGN.md, "Rules for the groups": a time and a temperature tie (one base dimension,
    // exponent 1) and input order decides between them, whatever their names; of the lengths
    // the diameter takes the place of the first (common practice, no source).
    const std::vector<dimension> dims{dims::pressure, dims::length, dims::temperature, dims::time, dims::length};
    const std::vector<repeating_preference> prefs{repeating_preference::neutral, repeating_preference::avoided,
                                                  repeating_preference::neutral, repeating_preference::textbook,
                                                  repeating_preference::textbook};
    CHECK(repeating_candidate_order(dims, 0) == std::vector<std::size_t>{1, 4, 2, 3});
    CHECK(repeating_candidate_order(dims, 0, prefs) == std::vector<std::size_t>{4, 1, 2, 3});
  }

  TEST_CASE("the alternatives follow the same preference") {
    // Bergman et al., 7th ed., Sec. 11.4 (from memory): C_min and dT_max repeat; the other
    // admissible sets replace C_min by the other variables of its dimension, UA before
    // C_max (input order, both avoided); derived by hand.
    const auto& c =
        test_support::textbook_case_titled("a heat exchanger: C_min repeats, giving NTU and the capacity ratio");
    const std::vector<analysis> alts = alternatives(test_support::problem_of(c));
    REQUIRE(alts.size() == 2);
    CHECK(alts[0].repeating == std::vector<std::string>{"UA", "dT_max"});
    CHECK(alts[1].repeating == std::vector<std::string>{"C_max", "dT_max"});
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
