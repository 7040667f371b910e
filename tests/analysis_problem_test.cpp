// problem: variables by unit text or by dimension, in the order added; unit errors wrapped
// with the variable's name.
#include "analysis_support.hpp"

#include <exception>
#include <string>
#include "text_support.hpp"

using namespace nondim;
using test_support::check_groups;
using test_support::expected_group;

namespace {
using test_support::contains;
}  // namespace

TEST_SUITE("analysis problem") {
  TEST_CASE("variables keep the order they were added in, with their dimension and unit") {
    problem p;
    p.add("F", dims::force).add("rho", "kg/m^3").add("U", "m/s");
    REQUIRE(p.size() == 3);
    CHECK(p.names() == std::vector<std::string>{"F", "rho", "U"});
    CHECK(p.index_of("rho") == std::optional<std::size_t>{1});
    CHECK_FALSE(p.index_of("mu").has_value());
    CHECK(p[0].unit == "kg*m/s^2");  // a dimension gets its coherent SI unit (SI Brochure table 4: N = kg m s^-2)
    CHECK(p[1].dim == dims::density);
    CHECK(p[1].unit == "kg/m^3");
    CHECK(p.matrix().column(2) == dims::velocity);
    CHECK(p.matrix().cols() == 3);
  }

  TEST_CASE("a unit's factor and offset to SI are kept per variable") {
    problem p;
    // NIST SP 811 (2008), B.8: 1 psi = 6.894757 E+03 Pa; 1 lbf = 4.448222 E+00 N;
    // degC: T/K = t/°C + 273.15 (SI Brochure 9th ed., 2.3.1)
    p.add("dp", "psi").add("F", "lbf").add("T", "degC").add("D", "mm");
    CHECK(p[0].factor == doctest::Approx(6894.757).epsilon(1e-6));
    CHECK(p[0].dim == dims::pressure);
    CHECK(p[1].factor == doctest::Approx(4.448222).epsilon(1e-6));
    CHECK(p[2].offset == doctest::Approx(273.15));
    CHECK(p[2].dim == dims::temperature);
    CHECK(p[3].factor == doctest::Approx(1e-3));
    CHECK(p[3].unit == "mm");
  }

  TEST_CASE("groups are the same whether the variables are given by unit text or by dimension") {
    // drag on a sphere (White, Fluid Mechanics, 7th ed., Sec. 5.3, from memory), in mixed units
    problem p;
    p.add("F", "lbf").add("D", "in").add("V", "ft/s").add("rho", "slug/ft^3").add("mu", "cP");
    const analysis a = analyze(p);
    check_groups(a, {expected_group{{"F", 1}, {"rho", -1}, {"V", -2}, {"D", -2}},
                     expected_group{{"mu", 1}, {"rho", -1}, {"V", -1}, {"D", -1}}});
    CHECK(a.variables[4].unit == "cP");
  }

  TEST_CASE("a unit that cannot be read names the variable and keeps the parser's column") {
    problem p;
    p.add("F", "N");
    try {
      p.add("a", "m/s/s");
      FAIL("m/s/s must be refused (SI Brochure 9th ed., 5.4.6: one solidus)");
    } catch (const analysis_error& e) {
      CHECK(contains(e.what(), "nondim: variable 'a' has a unit that cannot be read ('m/s/s')"));
      CHECK(contains(e.what(), "m/(s*s)"));  // the parser's advice is kept
      CHECK(e.variable() == "a");
      CHECK(e.unit_column() == 4);  // the second solidus
      try {
        std::rethrow_if_nested(e);
        FAIL("the unit_error must be nested");
      } catch (const unit_error& u) {
        CHECK(u.column() == 4);
      }
    }
    CHECK(p.size() == 1);

    try {
      p.add("L", "furlong");
      FAIL("furlong is not in the unit table");
    } catch (const analysis_error& e) {
      CHECK(contains(e.what(), "variable 'L'"));
      CHECK(contains(e.what(), "unknown unit symbol"));
      CHECK(e.unit_column() == 1);
    }
    try {
      p.add("x", "");
      FAIL("an empty unit must be refused");
    } catch (const analysis_error& e) {
      CHECK(contains(e.what(), "variable 'x'"));
    }
  }

  TEST_CASE("a name is checked before its unit") {
    problem p;
    p.add("F", "N");
    try {
      p.add("F", "m/s/s");
      FAIL("duplicate name");
    } catch (const analysis_error& e) {
      CHECK(contains(e.what(), "variable 'F' is already in the problem"));
      CHECK(e.unit_column() == 0);
    }
  }
}
