// Tests of nondim/data: values at a design point, their conversion to SI, the groups'
// values and standard uncertainties (GUM, JCGM 100:2008), rounding for reports, and the
// regimes of named numbers. The program's propagation is also checked against
// python3-uncertainties (tests/data/check_uncertainties.py).
#include <nondim/data.hpp>
#include <nondim/report.hpp>

#include <doctest/doctest.h>
#include <nlohmann/json.hpp>

#include <array>
#include <cmath>
#include <limits>
#include <optional>
#include <string>
#include <vector>
#include "text_support.hpp"

using namespace nondim;

namespace {
using test_support::contains;
// The message of the analysis_error `f` throws ("" when it throws none).
template <class F>
std::string error_of(F f) {
  try {
    f();
  } catch (const analysis_error& e) {
    return e.what();
  }
  return "";
}
}  // namespace

TEST_SUITE("data") {
  TEST_CASE("a value and uncertainty in a variable's unit are converted to SI, the uncertainty by the factor alone") {
    problem p;
    p.add("D", "mm").add("T", "degC").add("Tf", "degF");
    design_point d;
    d.set(p, "D", 25, 0.05).set(p, "T", 20, 0.5).set(p, "Tf", 68, 0.9);
    // mm = 1e-3 m (SI Brochure, table 7)
    CHECK(d.find("D")->value == doctest::Approx(0.025).epsilon(1e-15));
    CHECK(*d.find("D")->uncertainty == doctest::Approx(5e-5).epsilon(1e-15));
    // t/degC = T/K - 273.15 (SI Brochure 2.3.1): 20 degC = 293.15 K, and a difference of
    // 0.5 degC is 0.5 K; degF: 68 degF = 20 degC, a difference of 0.9 degF = 0.5 K (NIST SP 811, B.9)
    CHECK(d.find("T")->value == doctest::Approx(293.15).epsilon(1e-15));
    CHECK(*d.find("T")->uncertainty == doctest::Approx(0.5).epsilon(1e-15));
    CHECK(d.find("Tf")->value == doctest::Approx(293.15).epsilon(1e-14));
    CHECK(*d.find("Tf")->uncertainty == doctest::Approx(0.5).epsilon(1e-14));
    CHECK(d.find("missing") == nullptr);
  }

  TEST_CASE("a relative uncertainty is a per cent of the value, refused for a scale with a relative zero") {
    problem p;
    p.add("U", "ft/s").add("T", "degC");
    design_point d;
    d.set_relative(p, "U", -10, 2);  // 2 % of |-10 ft/s| = 0.2 ft/s = 0.06096 m/s (ft = 0.3048 m, NIST SP 811 B.8)
    CHECK(*d.find("U")->uncertainty == doctest::Approx(0.06096).epsilon(1e-14));
    const std::string m = error_of([&] { d.set_relative(p, "T", 20, 1); });
    CHECK(contains(m, "'T'"));
    CHECK(contains(m, "per cent"));
  }

  TEST_CASE("bad values are refused with the variable's name") {
    problem p;
    p.add("U", "m/s");
    design_point d;
    CHECK(contains(error_of([&] { d.set(p, "U", 2, -0.1); }), "uncertainty of 'U'"));
    CHECK(contains(error_of([&] { d.set(p, "U", std::numeric_limits<double>::quiet_NaN()); }), "value of 'U'"));
    CHECK(contains(error_of([&] { d.set(p, "U", 2, std::numeric_limits<double>::infinity()); }), "'U'"));
    CHECK(contains(error_of([&] { d.set(p, "V", 2); }), "'V', which is not a variable"));
    CHECK(contains(error_of([&] { d.set_relative(p, "U", 2, -1); }), "'U'"));
    CHECK(error_of([&] { d.set(p, "U", 2, 0.0); }).empty());  // an exact value is allowed
  }

  TEST_CASE("a product of powers takes relative uncertainties in quadrature weighted by the exponents") {
    // y = x1^2 x2 / x3: JCGM 100:2008 eq. 12, (u_c/y)^2 = sum (p_i u_i / x_i)^2
    const std::array<double, 3> x{3.0, 5.0, 2.0};
    const std::array<double, 3> u{0.03, 0.1, 0.01};
    const std::array<double, 3> p{2.0, 1.0, -1.0};
    const double y = 3.0 * 3.0 * 5.0 / 2.0;
    const double rel = std::sqrt(std::pow(2 * 0.03 / 3, 2) + std::pow(0.1 / 5, 2) + std::pow(0.01 / 2, 2));
    CHECK(product_uncertainty(x, u, p) == doctest::Approx(y * rel).epsilon(1e-13));
  }

  TEST_CASE("the sensitivity coefficients are the partial derivatives (eq. 10), also at an input of 0") {
    // GUM 5.1.3 allows c_i by numerical differentiation: central differences here
    const std::array<double, 4> x{1.7, 0.3, 12.0, 2.5};
    const std::array<double, 4> u{0.02, 0.004, 0.3, 0.01};
    const std::array<double, 4> p{3.0, -2.0, 1.0, -1.0};
    const auto f = [&](std::array<double, 4> v) {
      double r = 1;
      for (std::size_t i = 0; i < 4; ++i) r *= std::pow(v[i], p[i]);
      return r;
    };
    double sum = 0;
    for (std::size_t i = 0; i < 4; ++i) {
      auto hi = x;
      auto lo = x;
      const double h = x[i] * 1e-6;
      hi[i] += h;
      lo[i] -= h;
      const double c = (f(hi) - f(lo)) / (2 * h);
      sum += c * c * u[i] * u[i];
    }
    CHECK(product_uncertainty(x, u, p) == doctest::Approx(std::sqrt(sum)).epsilon(1e-8));
    // y = x1 x2 at x1 = 0: c_1 = x2, c_2 = x1 = 0, so u_c = |x2| u(x1) (eq. 10)
    const std::array<double, 2> x0{0.0, -4.0};
    const std::array<double, 2> u0{0.1, 0.5};
    const std::array<double, 2> p0{1.0, 1.0};
    CHECK(product_uncertainty(x0, u0, p0) == doctest::Approx(0.4));
    const std::array<double, 1> one{1.0};
    CHECK(contains(error_of([&] { (void)product_uncertainty(x0, one, p0); }), "2 values, 1 uncertainties"));
  }

  TEST_CASE("groups have values where every variable has one, and uncertainties where every one has one") {
    // Pipe flow: dp/(rho U^2), mu/(rho U D), L/D (Munson et al., 6th ed., section 8.3)
    problem p;
    p.add("dp", "kPa").add("rho", "kg/m^3").add("U", "m/s").add("D", "mm").add("mu", "mPa*s").add("L", "m");
    const analysis a = analyze(p);
    design_point d;
    d.set(p, "rho", 998, 0.5).set(p, "U", 2.0, 0.04).set(p, "D", 25, 0.05).set(p, "mu", 1.0, 0.02).set(p, "L", 10);
    const auto v = group_values(a, d);
    REQUIRE(v.size() == 3);
    CHECK_FALSE(v[0]);  // dp has no value
    REQUIRE(v[1]);
    // 1/Re = mu/(rho U D) = 0.001 / (998 * 2 * 0.025) (by hand)
    CHECK(v[1]->value == doctest::Approx(1.0 / 49900).epsilon(1e-14));
    // eq. 12 by hand: sqrt((0.5/998)^2 + 0.02^2 + (0.05/25)^2 + 0.02^2) = 0.0283593
    REQUIRE(v[1]->uncertainty);
    CHECK(*v[1]->relative_uncertainty() == doctest::Approx(0.0283593).epsilon(1e-5));
    REQUIRE(v[2]);
    CHECK(v[2]->value == doctest::Approx(400));
    CHECK_FALSE(v[2]->uncertainty);  // L has none
    // a value that the group divides by cannot be 0: the variable is named
    design_point zero = d;
    zero.set(p, "U", 0.0);
    CHECK(contains(error_of([&] { (void)group_values(a, zero); }), "'U'"));
  }

  TEST_CASE("rounding a value that is not finite, or at the end of the double range, writes it without rounding") {
    // IEEE 754: infinities and NaN have no decimal place; found by the exception-contract
    // test under UBSan (a conversion of log10(inf) to int)
    const double inf = std::numeric_limits<double>::infinity();
    CHECK(round_for_report(inf, 1.0).value_text == "inf");
    CHECK(round_for_report(-inf, 0.5).value_text == "-inf");
    CHECK(round_for_report(std::numeric_limits<double>::quiet_NaN(), 1.0).value_text == "nan");
    // the largest double (1.797...e308) to the place of an uncertainty of 1e306 rounds up
    // past it: the text keeps the digits it could write
    CHECK(round_for_report(std::numeric_limits<double>::max(), 1e306).value_text.find("e308") != std::string::npos);
  }

  TEST_CASE("values are rounded to what the computation supports") {
    // no uncertainty: 12 significant digits (a product of doubles is not exact)
    CHECK(round_for_report(3999.999999999998).value_text == "4000");
    CHECK(round_for_report(3999.999999999998).value == 4000.0);
    CHECK(round_for_report(2.0040080160320641e-05).value_text == "2.00400801603e-5");
    // GUM 7.2.2: "m_s = 100,021 47 g with u_c = 0,35 mg"
    const rounded_value g = round_for_report(100.021473, 0.000347);
    CHECK(g.value_text == "100.02147");
    CHECK(g.uncertainty_text == "0.00035");
    // GUM 7.2.6: at most two significant digits of the uncertainty, the value to match
    CHECK(round_for_report(49913.2, 1415.6).value_text == "49900");
    CHECK(round_for_report(49913.2, 1415.6).uncertainty_text == "1400");
    CHECK(round_for_report(1.23456, 0.0996).uncertainty_text == "0.10");
    CHECK(round_for_report(1.23456, 0.0996).value_text == "1.23");
    CHECK(round_for_report(2.004008e-5, 5.68e-7).value_text == "2.004e-5");
    CHECK(round_for_report(2.004008e-5, 5.68e-7).uncertainty_text == "5.7e-7");
    CHECK(round_for_report(-0.0004, 0.02).value_text == "0.000");  // no "-0.000"
  }

  TEST_CASE("regimes are noted for a named number and its reciprocal, not for its powers") {
    const group_match re{"Reynolds number", "Re", rational{1}};
    const group_match re_inverse{"Reynolds number", "Re", rational{-1}};
    // pipe flow: laminar below 2300, turbulent above 4000 (Cengel & Cimbala, section 8-2, from memory)
    auto n = regime_notes({re}, 1000);
    REQUIRE(n.size() == 2);  // the pipe and the flat plate
    CHECK(n[0].regime == "laminar");
    CHECK(n[0].upper == 2300);
    n = regime_notes({re_inverse}, 1.0 / 3000);
    CHECK(n[0].number == doctest::Approx(3000));
    CHECK(n[0].regime == "transitional");
    n = regime_notes({re}, 1e6);
    CHECK(n[0].regime == "turbulent");
    CHECK(n[1].regime.substr(0, 9) == "turbulent");  // past Re_x,c = 5e5 (Incropera, section 6.3, from memory)
    // Mach 0.3: compressibility (White, section 9.1, from memory)
    CHECK(regime_notes({group_match{"Mach number", "Ma", rational{1}}}, 0.29)[0].regime.substr(0, 14) ==
          "incompressible");
    CHECK(regime_notes({group_match{"Mach number", "Ma", rational{1}}}, 0.5)[0].regime.substr(0, 8) == "subsonic");
    // Biot 0.1: lumped capacitance (Incropera, section 5.1, from memory)
    CHECK(regime_notes({group_match{"Biot number", "Bi", rational{1}}}, 0.05)[0].regime.substr(0, 6) == "lumped");
    // Fr^2 = U^2/(gL) is not the Froude number's standard form; an ambiguous match says nothing
    CHECK(regime_notes({group_match{"Froude number", "Fr", rational{2}}}, 4.0).empty());
    CHECK(regime_notes({group_match{"Reynolds number", "Re", rational{1}, true}}, 1000).empty());
    CHECK(regime_notes({re}, std::numeric_limits<double>::quiet_NaN()).empty());
  }

  TEST_CASE("every regime rule has ascending bands, a configuration and a source") {
    for (const regime_rule& r : regime_table) {
      CHECK(find_catalog_entry(r.symbol) != nullptr);
      CHECK_FALSE(r.configuration.empty());
      CHECK_FALSE(r.source.empty());
      REQUIRE(r.band_count >= 2);
      for (std::size_t b = 1; b < r.band_count; ++b) CHECK(r.bands[b].upper > r.bands[b - 1].upper);
      CHECK(std::isinf(r.bands[r.band_count - 1].upper));
    }
  }

  TEST_CASE("a configuration keeps the notes to its own thresholds") {
    const group_match re{"Reynolds number", "Re", rational{1}};
    const auto configurations = [](const std::vector<regime_note>& notes) {
      std::vector<std::string> out;
      for (const auto& n : notes) out.emplace_back(n.configuration.substr(0, n.configuration.find(',')));
      return out;
    };
    // none chosen: the usual pipe and flat plate, not the cylinder's or the sphere's bands
    CHECK(configurations(regime_notes({re}, 5e4)) ==
          std::vector<std::string>{"flow in a circular pipe", "boundary layer on a flat plate"});
    CHECK(configurations(regime_notes({re}, 5e4, "pipe_flow")) == std::vector<std::string>{"flow in a circular pipe"});
    // a cylinder in crossflow: transition of the boundary layer near Re_D = 2e5 (Incropera et
    // al., section 7.4); below it vortex shedding with a laminar boundary layer
    const auto cylinder = regime_notes({re}, 5e4, "cylinder_crossflow");
    REQUIRE(cylinder.size() == 1);
    CHECK(cylinder[0].regime.substr(0, 15) == "vortex shedding");
    CHECK(regime_notes({re}, 3e5, "cylinder_crossflow")[0].regime.substr(0, 25) == "boundary-layer transition");
    // a sphere: Stokes flow below Re = 1, Newton's regime 1e3 .. 2e5 (White, section 7.6, from memory)
    CHECK(regime_notes({re}, 0.1, "sphere")[0].regime.substr(0, 8) == "creeping");
    CHECK(regime_notes({re}, 5e4, "sphere")[0].regime.substr(0, 15) == "Newton's regime");
    // a rule of any configuration stays: Mach 0.5 in a pipe is still compressible
    CHECK(regime_notes({group_match{"Mach number", "Ma", rational{1}}}, 0.5, "pipe_flow").size() == 1);
    // another configuration's number says nothing: Ra on a vertical plate is not a sphere's
    CHECK(regime_notes({group_match{"Rayleigh number", "Ra", rational{1}}}, 1e10, "sphere").empty());
    CHECK(regime_notes({group_match{"Rayleigh number", "Ra", rational{1}}}, 1e10, "vertical_plate").size() == 1);
    CHECK_THROWS_AS((void)regime_notes({re}, 5e4, "pipe"), analysis_error);
    CHECK(is_regime_configuration("open_channel"));
    CHECK_FALSE(is_regime_configuration("Pipe_Flow"));
    CHECK(regime_configuration_list().find("pipe_flow, flat_plate, cylinder_crossflow, sphere") == 0);
    // every rule's key is a configuration, and only the rules of any configuration have none
    for (const regime_rule& r : regime_table)
      CHECK((r.scope == regime_scope::any ? r.key.empty() : is_regime_configuration(r.key)));
  }

  TEST_CASE("the analysis carries its configuration into the reports") {
    problem p;
    p.add("dp", "Pa").add("rho", "kg/m^3").add("U", "m/s").add("D", "mm").add("mu", "mPa*s");
    options o;
    o.configuration = "sphere";
    const analysis a = analyze(p, o);
    CHECK(a.configuration == "sphere");
    report_options r;
    r.point.set(p, "rho", 998).set(p, "U", 2).set(p, "D", 25).set(p, "mu", 1);
    // Re = 998 * 2 * 0.025 / 0.001 = 49900: Newton's regime of a sphere (White, 7.6, from memory)
    const std::string text = text_report(a, r);
    CHECK(contains(text, "Newton's regime"));
    CHECK_FALSE(contains(text, "circular pipe"));
    CHECK(contains(json_report(a, r), "flow past a sphere"));
  }

  TEST_CASE("the reports show values, uncertainties and regime notes at a design point") {
    // Mach number of a gas flow: U/c (ISO 80000-11)
    problem p;
    p.add("U", "m/s").add("c", "m/s");
    const analysis a = analyze(p);
    report_options o;
    o.point.set(p, "U", 120, 2).set(p, "c", 343, 1);
    const std::string text = text_report(a, o);
    // 120/343 = 0.349854; u = 0.349854 * sqrt((2/120)^2 + (1/343)^2) = 0.0059 (eq. 12, by hand)
    CHECK(contains(text, "value 0.3499, standard uncertainty 0.0059 (1.7 %)"));
    CHECK(contains(text, "note: \u03a01: Ma = 0.3499: subsonic: compressibility matters (0.3 <= Ma < 0.8)"));
    const auto j = nlohmann::json::parse(json_report(a, o));
    CHECK(j["groups"][0]["value"] == 0.3499);
    CHECK(j["groups"][0]["uncertainty"] == 0.0059);
    CHECK(j["groups"][0]["regimes"][0]["regime"] == "subsonic: compressibility matters");
    CHECK(contains(markdown_report(a, o), "| 0.3499 | 0.0059 |"));
    CHECK(contains(latex_report(a, o), "= 0.3499, \\quad u(\\Pi_{1}) = 0.0059"));
    // Mach 0.31 +- 0.01: the threshold 0.3 lies within 2u (k = 2, GUM 6.2), and the note says so
    report_options near;
    near.point.set(p, "U", 0.31 * 343, 0.01 * 343).set(p, "c", 343, 0.0);
    CHECK(contains(text_report(a, near), "the threshold 0.3 is within two standard uncertainties"));
    CHECK_FALSE(contains(text, "within two standard uncertainties"));
    // without a design point, nothing changes
    CHECK_FALSE(contains(text_report(a), "standard uncertainty"));
    CHECK_FALSE(contains(text_report(a), "note: "));
    CHECK_FALSE(nlohmann::json::parse(json_report(a))["groups"][0].contains("value"));
  }
}
