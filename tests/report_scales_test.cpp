// Tests of nondim/analysis/report/scales.hpp: the reference scale of every variable of an analysis
// in its repeating variables (`nondim groups --scales`). JSON is read back with nlohmann-json.
#include <nondim/report.hpp>

#include <doctest/doctest.h>
#include <nlohmann/json.hpp>

#include <string>
#include <vector>
#include "text_support.hpp"

using namespace nondim;

namespace {
using test_support::contains;
}  // namespace

TEST_SUITE("report scales") {
  TEST_CASE("drag: the force scales as rho U^2 D^2 and the viscosity as rho U D") {
    // White, Fluid Mechanics, 7th ed., section 5.3: F/(rho U^2 D^2) = f(rho U D / mu)
    problem p;
    p.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "m").add("mu", "Pa*s");
    const analysis a = analyze(p);
    const std::vector<variable_scale> s = variable_scales(a);
    REQUIRE(s.size() == 5);
    CHECK(s[0].has_scale);
    CHECK_FALSE(s[0].is_reference);
    CHECK(s[0].scale.exponents == std::vector<rational>{1, 2, 2});
    CHECK(s[0].scale.nondimensional_text("F", text_form::ascii) == "F/(rho*U^2*D^2)");
    CHECK(s[1].is_reference);
    CHECK(s[4].scale.exponents == std::vector<rational>{1, 1, 1});
    const std::string text = scales_text_report(a);
    CHECK(contains(text, "reference scales in the repeating variables \u03c1, U, D"));
    CHECK(contains(text, "F* = F/(\u03c1\u00b7U\u00b2\u00b7D\u00b2)"));
    CHECK(contains(text, "\u03bc* = \u03bc/(\u03c1\u00b7U\u00b7D)"));
    CHECK(contains(scales_markdown_report(a), "| F\\* = F/(\u03c1\u00b7U\u00b2\u00b7D\u00b2) |"));
  }

  TEST_CASE("a time in a pipe: t* = t U / D, and the JSON form") {
    // White, Viscous Fluid Flow, ch. 2 (from memory): t* = t U / L with L the length scale
    problem p;
    p.add("t", "s").add("rho", "kg/m^3").add("U", "m/s").add("D", "m");
    const analysis a = analyze(p);
    CHECK(contains(scales_text_report(a), "t* = t\u00b7U/D"));
    const auto j = nlohmann::json::parse(json_scales_report(a));
    REQUIRE(j.contains("scales"));
    CHECK(j["scales"][0]["nondimensional"] == "t*U/D");
    CHECK(j["scales"][0]["scale"] == "D/U");
    CHECK(j["scales"][0]["exponents"]["U"] == -1);
    CHECK(j["scales"][0]["exponents"]["D"] == 1);
    CHECK(j["scales"][2]["reference"] == true);
    // without the scales the object is json_report's, unchanged (DESIGN.md schema)
    const auto plain = nlohmann::json::parse(json_report(a));
    CHECK_FALSE(plain.contains("scales"));
    auto trimmed = j;
    trimmed.erase("scales");
    CHECK(trimmed == plain);
  }
}
