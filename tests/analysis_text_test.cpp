// Text forms of groups and of whole analyses, Greek letters for their ASCII spellings, and
// the SVD cross-check carried in the result.
#include "analysis_support.hpp"

#include <cmath>
#include <sstream>
#include <string>
#include "text_support.hpp"

using namespace nondim;

namespace {

using test_support::contains;

bool pure_ascii(const std::string& s) {
  for (const char c : s)
    if (static_cast<unsigned char>(c) >= 0x80U) return false;
  return true;
}

/// The sphere's drag with rho, U, D repeating.
analysis sphere_drag_analysis() {
  return analyze(test_support::sphere_drag(), test_support::repeating({"rho", "U", "D"}));
}

}  // namespace

TEST_SUITE("analysis text") {
  TEST_CASE("a group is written F·ρ⁻¹·U⁻²·D⁻² in Unicode and F*rho^-1*U^-2*D^-2 in ASCII") {
    // the forms DESIGN.md and the task give for the drag coefficient group
    const analysis a = sphere_drag_analysis();
    CHECK(a.groups[0].text() == "F\u00b7\u03c1\u207b\u00b9\u00b7U\u207b\u00b2\u00b7D\u207b\u00b2");
    CHECK(a.groups[0].text(text_form::ascii) == "F*rho^-1*U^-2*D^-2");
    CHECK(a.groups[1].text(text_form::ascii) == "mu*rho^-1*U^-1*D^-1");
    std::ostringstream os;
    os << a.groups[1];
    CHECK(os.str() == "\u03bc\u00b7\u03c1\u207b\u00b9\u00b7U\u207b\u00b9\u00b7D\u207b\u00b9");
  }

  TEST_CASE("conventional ASCII names of Greek letters become the letters") {
    // ISO 80000-1 / ISO 80000-4,-5,-11 use these letters as quantity symbols (rho density,
    // mu and nu viscosities, sigma surface tension, alpha diffusivity, beta expansion, omega
    // angular velocity); common practice, no source for the ASCII spellings.
    CHECK(display_name("rho") == "\u03c1");
    CHECK(display_name("mu") == "\u03bc");
    CHECK(display_name("nu") == "\u03bd");
    CHECK(display_name("sigma") == "\u03c3");
    CHECK(display_name("alpha") == "\u03b1");
    CHECK(display_name("beta") == "\u03b2");
    CHECK(display_name("omega") == "\u03c9");
    CHECK(display_name("Delta") == "\u0394");
    CHECK(display_name("rho_w") == "\u03c1_w");
    CHECK(display_name("mu2") == "\u03bc2");
    CHECK(display_name("rhoX") == "rhoX");  // not a Greek spelling followed by _ or a digit
    CHECK(display_name("muscle") == "muscle");
    CHECK(display_name("D") == "D");
    CHECK(display_name("rho", text_form::ascii) == "rho");
  }

  TEST_CASE("the whole analysis as text shows the matrix, rank, repeating, groups, isolated and SVD") {
    const analysis a = sphere_drag_analysis();
    const std::string u = to_string(a);
    CHECK(contains(u, "dimension matrix"));
    CHECK(contains(u, "  L   1  -3   1  1  -1\n"));  // F rho U D mu: L exponents (SI Brochure table 4)
    CHECK(contains(u, "  M   1   1   0  0   1\n"));
    CHECK(contains(u, "  T  -2   0  -1  0  -1\n"));
    CHECK(contains(u, "rank 3\n"));
    CHECK(contains(u, "repeating \u03c1, U, D (given)\n"));
    // F/(rho U^2 D^2) is a drag coefficient (White, Fluid Mechanics, ch. 5, from memory)
    CHECK(contains(
        u, "\u03c01 = F\u00b7\u03c1\u207b\u00b9\u00b7U\u207b\u00b2\u00b7D\u207b\u00b2 = C_D (drag coefficient)\n"));
    CHECK(contains(u, "isolated: none\n"));
    CHECK(contains(u, "SVD check: rank 3, agrees"));

    const std::string s = to_string(a, text_form::ascii);
    CHECK(pure_ascii(s));
    // mu/(rho U D) = 1/Re (White, Fluid Mechanics, ch. 5, from memory)
    CHECK(contains(s, "pi2 = mu*rho^-1*U^-1*D^-1 = Re^-1 (Reynolds number)\n"));
    std::ostringstream os;
    os << a;
    CHECK(os.str() == u);
  }

  TEST_CASE("the text of a deficient, isolating analysis explains both, in ASCII too") {
    // RC circuit (tau = R C, common practice) with the voltage, which no group can contain
    problem p;
    p.add("t", dims::time)
        .add("R", dims::resistance)
        .add("C", dims::capacitance)
        .add("V", dims::voltage)
        .add("Theta_0", dims::temperature);
    const analysis a = analyze(p);
    const std::string s = to_string(a, text_form::ascii);
    CHECK(pure_ascii(s));
    CHECK(contains(s, "rank 4 is less than the 5 base dimensions that appear (L, M, T, I and Theta)"));
    CHECK(contains(s, "L and M appear only in the fixed combination L^2*M"));
    CHECK(contains(s, "  V: no product of powers of the other variables has its dimension"));
    CHECK(contains(s, "  Theta_0: its base dimension Theta appears in no other variable"));
    const std::string u = to_string(a);
    CHECK(contains(u, "fixed combination L\u00b2\u00b7M"));
    CHECK(contains(u, "\u0398_0: its base dimension \u0398 appears"));
  }

  TEST_CASE("the SVD check gives the singular values of the dimension matrix") {
    // Pendulum matrix, columns t, L, m, g: A A^T = [[2,0,-2],[0,1,0],[-2,0,5]] with
    // eigenvalues 6, 1, 1 (by hand), so singular values sqrt(6), 1, 1 and a fourth 0.
    problem p;
    p.add("t", dims::time).add("L", dims::length).add("m", dims::mass).add("g", dims::acceleration);
    const analysis a = analyze(p);
    REQUIRE(a.svd.singular_values.size() == 4);
    CHECK(a.svd.singular_values[0] == doctest::Approx(std::sqrt(6.0)).epsilon(1e-14));
    CHECK(a.svd.singular_values[1] == doctest::Approx(1.0).epsilon(1e-14));
    CHECK(a.svd.singular_values[2] == doctest::Approx(1.0).epsilon(1e-14));
    CHECK(a.svd.singular_values[3] == doctest::Approx(0.0));
    CHECK(a.svd.rank == 3);
    CHECK(a.svd.agrees);
    CHECK(a.svd.max_residual == 0.0);  // integer exponents: A v is computed exactly
    CHECK(a.svd.tolerance == doctest::Approx(7.0 * 2.220446049250313e-16 * std::sqrt(6.0)));
  }

  TEST_CASE("a numerically singular but exactly regular matrix: the disagreement is reported, not thrown") {
    // Columns L and L·M^(1/10^18): exactly independent (rank 2), but the SVD in double sees
    // a second singular value of about 7e-19, below 7 eps sigma_max (linear algebra, by hand).
    problem p;
    p.add("x", dims::length).add("y", dimension{1, rational{1, 1'000'000'000'000'000'000}, 0});
    analysis a;
    CHECK_NOTHROW(a = analyze(p));
    CHECK(a.rank == 2);
    CHECK(a.groups.empty());
    CHECK(a.svd.rank == 1);
    CHECK_FALSE(a.svd.agrees);
    CHECK(contains(a.notes.back(), "the SVD in double finds rank 1, the exact rank is 2"));
    CHECK(contains(to_string(a), "SVD check: rank 1, DISAGREES"));
  }

  TEST_CASE("the named basis re-expresses the groups in catalog numbers") {
    // White, Fluid Mechanics, ch. 5 (from memory): C_D = f(Re) for the drag of a sphere
    problem p;
    p.add("F", dims::force)
        .add("rho", dims::density)
        .add("U", dims::velocity)
        .add("D", dims::length)
        .add("mu", dims::dynamic_viscosity);
    options o;
    o.form = basis::named;
    const analysis named = analyze(p, o);
    const analysis classical = analyze(p);
    CHECK(named.form == basis::named);
    CHECK(classical.form == basis::classical);
    REQUIRE(named.groups.size() == classical.groups.size());
    REQUIRE(!named.groups[1].matches.empty());
    CHECK(named.groups[1].matches[0].symbol == "Re");
    CHECK(named.groups[1].matches[0].power == rational{1});
    REQUIRE(!classical.groups[1].matches.empty());
    CHECK(classical.groups[1].matches[0].symbol == "Re");
    CHECK(classical.groups[1].matches[0].power == rational{-1});
  }
}
