// The resource bounds of the library, each with a clear error past it: the length and the
// nesting depth of a unit expression, the number of variables of a problem, and exponents
// beyond 64 bits (computed exactly through cpp_rational where the answer fits, refused with a
// message where it does not; never wrapped).
#include <doctest/doctest.h>

#include <cstdint>
#include <string>
#include <vector>

#include <nondim/analysis.hpp>
#include <nondim/parse.hpp>

using namespace nondim;

namespace {

unit_error_kind kind_of(const std::string& text) {
  try {
    (void)parse_unit(text);
  } catch (const unit_error& e) {
    return e.kind();
  }
  FAIL("no error for a text of " << text.size() << " bytes");
  return unit_error_kind::bad_number;
}

std::string message_of_unit(const std::string& text) {
  try {
    (void)parse_unit(text);
  } catch (const unit_error& e) {
    return e.what();
  }
  return "no error";
}

/// The product of the variables' dimensions raised to the group's exponents (exact).
dimension dimension_of(const pi_group& g, const problem& p) {
  dimension d{};
  for (std::size_t j = 0; j < p.size(); ++j) d = d * pow(p[j].dim, rational{g.exponents[j]});
  return d;
}

// Primes just above sqrt(2^63) = 3037000499.98: their product exceeds the int64 range.
constexpr std::int64_t p1 = 3037000507;
constexpr std::int64_t p2 = 3037000537;
constexpr std::int64_t p3 = 3037000549;

}  // namespace

TEST_SUITE("limits") {
  TEST_CASE("a unit expression is read up to the documented length and refused past it") {
    // README and unit_parser.hpp: max_unit_text_bytes = 4096. "m*" repeated is a product of
    // metres whose exponent is the count of factors (common practice, no source).
    std::string at_limit;
    while (at_limit.size() + 2 < max_unit_text_bytes) at_limit += "m*";
    at_limit += "m";
    REQUIRE(at_limit.size() <= max_unit_text_bytes);
    CHECK(parse_unit(at_limit).dim == pow(dims::length, rational{static_cast<std::int64_t>(at_limit.size() / 2 + 1)}));
    const std::string past(max_unit_text_bytes + 1, 'm');
    CHECK(kind_of(past) == unit_error_kind::too_long);
    CHECK(message_of_unit(past).find("longer than 4096 bytes") != std::string::npos);
  }

  TEST_CASE("parentheses are read up to the documented depth and refused past it") {
    // README and unit_parser.hpp: max_unit_nesting = 32 levels.
    const auto nested = [](std::size_t depth) { return std::string(depth, '(') + "m" + std::string(depth, ')'); };
    CHECK(parse_unit(nested(max_unit_nesting)).dim == dims::length);
    CHECK(kind_of(nested(max_unit_nesting + 1)) == unit_error_kind::too_deep);
    CHECK(message_of_unit(nested(max_unit_nesting + 1)).find("nested deeper than 32 levels") != std::string::npos);
  }

  TEST_CASE("an exponent past 64 bits in a unit expression is refused, never wrapped") {
    // 2^63 - 1 = 9223372036854775807 is the largest int64 (ISO C++ [basic.fundamental]);
    // one more metre would wrap to -2^63.
    CHECK(parse_unit("m^9223372036854775807").dim == pow(dims::length, rational{INT64_MAX}));
    CHECK(kind_of("m^9223372036854775807*m") == unit_error_kind::exponent_overflow);
    CHECK(kind_of("m^9223372036854775808") == unit_error_kind::exponent_overflow);
    CHECK(kind_of("(m^3037000500)^3037000500") == unit_error_kind::exponent_overflow);
  }

  TEST_CASE("a problem takes the documented number of variables and refuses one more") {
    problem p;
    for (std::size_t j = 0; j < max_problem_variables; ++j) p.add("x" + std::to_string(j), dims::length);
    CHECK(p.size() == 1000);  // problem.hpp, README: at most 1000 variables
    try {
      p.add("one_more", dims::length);
      FAIL("no error");
    } catch (const analysis_error& e) {
      CHECK(e.variable() == "one_more");
      CHECK(std::string(e.what()) ==
            "nondim: variable 'one_more' would be number 1001: a problem takes at most 1000 variables");
    }
  }

  TEST_CASE("a problem of 300 variables finishes with n - rank exact groups") {
    // Buckingham's theorem (Buckingham, Phys. Rev. 4, 1914): n variables whose dimension
    // matrix has rank r give n - r independent groups. The variables cycle through ten
    // dimensions of fluid mechanics (ISO 80000-4, -11) in L, M, T: rank 3, 297 groups.
    const std::vector<dimension> kinds{dims::force,  dims::density,           dims::velocity,
                                       dims::length, dims::dynamic_viscosity, dims::pressure,
                                       dims::time,   dims::acceleration,      dims::kinematic_viscosity,
                                       dims::power};
    problem p;
    for (std::size_t j = 0; j < 300; ++j) p.add("q" + std::to_string(j), kinds[j % kinds.size()]);
    for (const basis form : {basis::classical, basis::named}) {
      options o;
      o.form = form;
      const analysis a = analyze(p, o);
      CHECK(a.rank == 3);
      CHECK(a.groups.size() == 297);
      for (const auto& g : a.groups) CHECK(dimension_of(g, p).is_dimensionless());
      CHECK(a.svd.agrees);
    }
  }

  TEST_CASE("an elimination that overflows 64 bits is redone exactly in cpp_rational") {
    // a, b, c have exponents 1/p1, 1/p2, 1/p3 in rotated order: reducing their 3x3 block
    // needs denominators near p1 p2 p3 > 2^63. d has the dimension of a, so the one group is
    // a/d (or its inverse) exactly: a quotient of equal dimensions (common practice, no source).
    const dimension va{rational{1, p1}, rational{1, p2}, rational{1, p3}};
    const dimension vb{rational{1, p2}, rational{1, p3}, rational{1, p1}};
    const dimension vc{rational{1, p3}, rational{1, p1}, rational{1, p2}};
    problem p;
    p.add("a", va).add("b", vb).add("c", vc).add("d", va);
    const analysis a = analyze(p);
    CHECK(a.multiprecision);
    CHECK(a.rank == 3);
    REQUIRE(a.groups.size() == 1);
    CHECK(dimension_of(a.groups[0], p).is_dimensionless());
    CHECK(a.groups[0].exponent("a") == -a.groups[0].exponent("d"));
    CHECK(abs(a.groups[0].exponent("a")) == rational{1});
    CHECK(a.groups[0].exponent("b") == rational{0});
    // the same with int64 arithmetic only: refused with a message, not rounded
    options o;
    o.arithmetic = exact_arithmetic::int64;
    try {
      (void)analyze(p, o);
      FAIL("no error");
    } catch (const analysis_error& e) {
      CHECK(std::string(e.what()).find("overflows 64-bit integers") != std::string::npos);
    }
  }

  TEST_CASE("a group whose exact exponents exceed 64 bits is refused with a message") {
    // x = L^(1/p1) M^(1/p2): the only group is x^(p1 p2) L^(-p2) M^(-p1), and
    // p1 p2 = 9223372170628272259 > 2^63 - 1 (exact arithmetic, checked with python3).
    problem p;
    p.add("x", dimension{rational{1, p1}, rational{1, p2}, 0}).add("L", dims::length).add("M", dims::mass);
    try {
      (void)analyze(p);
      FAIL("no error");
    } catch (const analysis_error& e) {
      CHECK(e.variable() == "x");
      CHECK(std::string(e.what()).find("9223372170628272259") != std::string::npos);
    }
  }
}
