// Tests of nondim/analysis/extraction/runtime_scales.hpp: reference scales from named references given
// at run time (values with unit text, as an input file gives them).
#include <nondim/analysis/extraction/runtime_scales.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <array>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <random>
#include <string>
#include <vector>

using namespace nondim;

namespace {
/// Whether a and b are equal or adjacent doubles.
bool within_one_ulp(double a, double b) {
  return a == b || std::nextafter(a, INFINITY) == b || std::nextafter(a, -INFINITY) == b;
}
/// A value the compiler cannot fold (so that roots are taken at run time on both sides).
double opaque(double x) {
  volatile double v = x;
  return v;
}
bool mentions(const std::exception& e, const std::string& text) {
  return std::string(e.what()).find(text) != std::string::npos;
}
using ks = std::vector<rational>;
}  // namespace

TEST_SUITE("runtime_scales") {
  TEST_CASE("incompressible Navier-Stokes: p* = p/(rho U^2), t* = t U/L, the viscous coefficient 1/Re") {
    // White, Viscous Fluid Flow, ch. 2 and 3 (from memory): with rho, U, L as references
    // p* = p/(rho U^2), t* = t U/L and the viscous term's coefficient mu/(rho U L) = 1/Re.
    // Water in a 5 cm channel at 0.3 m/s (a scenario of our own).
    runtime_scales s;
    s.add("rho_ref", 998.2, "kg/m^3").add("U_ref", "0.3 m/s").add("L_ref", 5.0, "cm");
    REQUIRE(s.size() == 3);
    const double r = 998.2, u = 0.3, l = 0.05;  // SI (SI Brochure 9th ed., table 7: 1 cm = 0.01 m)
    CHECK(s.references()[2].value == 5.0 * 0.01);

    const scale_expression p = s.scale(dims::pressure);
    CHECK(p.exponents == ks{1, 2, 0});
    CHECK(p.value == r * (u * u));  // the same operations as the hand-written product
    // ISO 80000-1 (from memory): a product with a half-high dot, a quotient with a solidus
    CHECK(p.text() == "\u03c1_ref\u00b7U_ref\u00b2");
    CHECK(p.text(text_form::ascii) == "rho_ref*U_ref^2");
    CHECK(p.nondimensional_text("p") == "p/(\u03c1_ref\u00b7U_ref\u00b2)");
    CHECK(s.nondimensional(120.0, "Pa") == 120.0 / (r * (u * u)));

    const scale_expression t = s.scale("s");
    CHECK(t.exponents == ks{0, -1, 1});
    CHECK(t.text(text_form::ascii) == "L_ref/U_ref");
    CHECK(t.nondimensional_text("t", text_form::ascii) == "t*U_ref/L_ref");
    CHECK(s.nondimensional(2.5, "s") == doctest::Approx(2.5 * 0.3 / 0.05).epsilon(1e-15));  // t U / L = 15

    // the viscous coefficient: mu / (rho U L) = 1/Re
    const double mu = 1.002e-3;  // water at 20 C, Pa s (White, Fluid Mechanics, table A.1, from memory)
    CHECK(s.scale(dims::dynamic_viscosity).exponents == ks{1, 1, 1});
    CHECK(1.0 / s.nondimensional(mu, "Pa*s") == doctest::Approx(r * u * l / mu).epsilon(1e-15));
    CHECK(1.0 / s.nondimensional(quantity<dims::dynamic_viscosity>::from_si(mu)) ==
          doctest::Approx(r * u * l / mu).epsilon(1e-15));
    // gravity: g L / U^2 = 1/Fr^2
    CHECK(s.scale(dims::acceleration).exponents == ks{0, 2, -1});
    CHECK(s.nondimensional(9.80665, "m/s^2") == doctest::Approx(9.80665 * l / (u * u)).epsilon(1e-15));
    // a dimensionless quantity is its own scale
    CHECK(s.scale(dims::dimensionless).text() == "1");
    CHECK(s.nondimensional(0.0042, "1") == 0.0042);
  }

  TEST_CASE("energy equation: alpha/(U L) is 1/Pe and cp dT/U^2 is 1/Ec") {
    // White, Viscous Fluid Flow, ch. 3, energy equation (from memory): the conduction term's
    // coefficient k/(rho cp U L) = alpha/(U L) = 1/Pe; Ec = U^2/(cp dT). Air at 300 K
    // (Incropera & DeWitt, table A.4, from memory: alpha = 22.5e-6 m^2/s, cp = 1007 J/(kg K)).
    runtime_scales s;
    s.add("rho", 1.1614, "kg/m^3").add("U", 5.0, "m/s").add("L", 0.2, "m").add("dT", 30.0, "K");
    const double Pe = 5.0 * 0.2 / 22.5e-6;
    CHECK(s.scale(dims::thermal_diffusivity).exponents == ks{0, 1, 1, 0});
    CHECK(1.0 / s.nondimensional(22.5e-6, "m^2/s") == doctest::Approx(Pe).epsilon(1e-15));
    CHECK(s.scale(dims::specific_heat_capacity).exponents == ks{0, 2, 0, -1});
    CHECK(1.0 / s.nondimensional(1007.0, "J/(kg*K)") == doctest::Approx(25.0 / (1007.0 * 30.0)).epsilon(1e-15));
    CHECK(s.scale(dims::specific_heat_capacity).text(text_form::ascii) == "U^2/dT");
  }

  TEST_CASE("a wall heat flux scaled by k dT / L is the Nusselt number") {
    // Incropera & DeWitt, ch. 6 (from memory): q'' = h dT and Nu = h L / k.
    runtime_scales s;
    s.add("k", 0.0263, "W/(m*K)").add("dT", 40.0, "K").add("L", 50.0, "cm");
    const double h = 12.0;  // W/(m^2 K)
    const double Nu = h * 0.5 / 0.0263;
    const scale_expression q = s.scale("W/m^2");
    CHECK(q.exponents == ks{1, 1, -1});
    CHECK(q.text(text_form::ascii) == "k*dT/L");
    CHECK(s.nondimensional(h * 40.0, "W/m^2") == doctest::Approx(Nu).epsilon(1e-15));
    CHECK(s.nondimensional(h, "W/(m^2*K)") == doctest::Approx(Nu).epsilon(1e-15));  // h scaled by k/L
  }

  TEST_CASE("rational exponents: the Froude number U / sqrt(g h)") {
    // White, Fluid Mechanics, ch. 10 (from memory); a 2 m deep channel at 1.5 m/s
    runtime_scales s;
    s.add("g", 9.80665, "m/s^2").add("h", 2.0, "m");  // standard gravity (CGPM 1901)
    const scale_expression v = s.scale(dims::velocity);
    CHECK(v.exponents == ks{rational{1, 2}, rational{1, 2}});
    CHECK(v.text(text_form::ascii) == "g^(1/2)*h^(1/2)");
    CHECK(s.nondimensional(1.5, "m/s") == doctest::Approx(1.5 / std::sqrt(9.80665 * 2.0)).epsilon(1e-15));
    CHECK(s.scale(dims::time).exponents == ks{rational{-1, 2}, rational{1, 2}});
    CHECK(s.scale(dims::time).text(text_form::ascii) == "h^(1/2)/g^(1/2)");
  }

  TEST_CASE("compile-time and run-time scales give the same doubles") {
    // the same references both ways (values the compiler cannot fold, so that both take the
    // roots with std::sqrt and std::cbrt at run time)
    const double r = opaque(998.2), u = opaque(0.3), l = opaque(0.05), dt = opaque(17.5), g = opaque(9.80665);
    const auto ct = scales(r * units::kg / units::m3, u * units::m / units::s, l * units::m, dt * units::K);
    runtime_scales rt;
    rt.add("rho", r, "kg/m^3").add("U", u, "m/s").add("L", l, "m").add("dT", dt, "K");
    CHECK(rt.scale(dims::pressure).value == ct.scale<dims::pressure>().si());
    CHECK(rt.scale(dims::time).value == ct.scale<dims::time>().si());
    CHECK(rt.scale(dims::dynamic_viscosity).value == ct.scale<dims::dynamic_viscosity>().si());
    CHECK(rt.scale(dims::thermal_conductivity).value == ct.scale<dims::thermal_conductivity>().si());
    CHECK(rt.scale(dims::heat_flux_density).value == ct.scale<dims::heat_flux_density>().si());
    CHECK(rt.scale(dims::frequency).value == ct.scale<dims::frequency>().si());
    // exact exponents agree too
    const auto k = decltype(ct)::exponents<dims::thermal_conductivity>();
    CHECK(rt.scale(dims::thermal_conductivity).exponents == ks(k.begin(), k.end()));
    // fractional exponents: square and cube roots
    const auto cg = scales(g * units::m / (units::s * units::s), l * units::m);
    runtime_scales rg;
    rg.add("g", quantity<dims::acceleration>::from_si(g)).add("L", dims::length, l);
    CHECK(rg.scale(dims::velocity).value == cg.scale<dims::velocity>().si());
    CHECK(rg.scale(dims::time).value == cg.scale<dims::time>().si());
    const auto cv = scales(quantity<dims::volume>::from_si(l), quantity<dims::time>::from_si(u));
    runtime_scales rv;
    rv.add("V", dims::volume, l).add("t", dims::time, u);
    CHECK(rv.scale(dims::velocity).exponents == ks{rational{1, 3}, -1});
    CHECK(rv.scale(dims::velocity).value == cv.scale<dims::velocity>().si());
    // and the conversions
    const double p = opaque(1234.5);
    CHECK(rt.nondimensional(p, "Pa") == ct.nondimensional(p * units::Pa));
    CHECK(rt.dimensional<dims::pressure>(0.7) == ct.dimensional<dims::pressure>(0.7));
    CHECK(rt.nondimensional_difference(from_celsius(40.0), from_celsius(22.5)) ==
          ct.nondimensional_difference(from_celsius(40.0), from_celsius(22.5)));
  }

  TEST_CASE("round trip: exact where the scale is a power of two") {
    // IEEE 754-2019, 4.3 and 5.4.1: operations are correctly rounded, so dividing and
    // multiplying by 2^k (no overflow or underflow) is exact.
    runtime_scales s;
    s.add("rho", 1024.0, "kg/m^3").add("U", 2.0, "m/s").add("L", 0.5, "m");
    REQUIRE(s.scale(dims::pressure).value == 4096.0);  // rho U^2 = 2^12
    REQUIRE(s.scale(dims::time).value == 0.25);        // L / U = 2^-2
    std::mt19937_64 gen(20240602);
    std::uniform_real_distribution<double> mantissa(1.0, 2.0);
    std::uniform_int_distribution<int> exponent(-300, 300);
    std::vector<double> field(10000);
    for (auto& x : field) x = std::ldexp(mantissa(gen), exponent(gen));
    std::vector<double> star(field.size()), back(field.size());
    s.nondimensional(field, dims::pressure, star);
    s.dimensional(star, dims::pressure, back);
    CHECK(back == field);
    s.nondimensional(field, "s", star);
    s.dimensional(star, "s", back);
    CHECK(back == field);
    for (std::size_t c = 0; c < 1000; ++c) {
      const auto q = quantity<dims::pressure>::from_si(-field[c]);
      CHECK(s.dimensional<dims::pressure>(s.nondimensional(q)) == q);
    }
  }

  TEST_CASE("round trip: within one unit in the last place otherwise") {
    // IEEE 754-2019, 4.3: each of x/s and y*s is rounded once; fl(fl(x/s) s) lies within one
    // ulp of x
    runtime_scales s;
    s.add("rho", 998.2, "kg/m^3").add("U", 0.3, "m/s").add("L", 0.05, "m");
    runtime_scales sg;
    sg.add("g", 9.80665, "m/s^2").add("h", 2.0, "m");
    std::mt19937_64 gen(11);
    std::uniform_real_distribution<double> mantissa(1.0, 2.0);
    std::uniform_int_distribution<int> exponent(-200, 200);
    std::vector<double> field(20000);
    for (auto& x : field) x = std::ldexp(mantissa(gen), exponent(gen));
    int within = 0;
    int exact = 0;
    std::vector<double> work(field.size());
    for (const dimension& d : {dims::pressure, dims::dynamic_viscosity}) {
      s.nondimensional(field, d, work);
      s.dimensional(work, d, work);  // in place
      for (std::size_t c = 0; c < field.size(); ++c) {
        within += within_one_ulp(work[c], field[c]) ? 1 : 0;
        exact += work[c] == field[c] ? 1 : 0;
      }
    }
    sg.nondimensional(field, dims::velocity, work);
    sg.dimensional(work, dims::velocity, work);
    for (std::size_t c = 0; c < field.size(); ++c) {
      within += within_one_ulp(work[c], field[c]) ? 1 : 0;
      exact += work[c] == field[c] ? 1 : 0;
    }
    CHECK(within == 60000);
    CHECK(exact > 30000);  // most come back exactly
  }

  TEST_CASE("a field is converted in one call, cell by cell as single values") {
    runtime_scales s;
    s.add("rho", 998.2, "kg/m^3").add("U", 0.3, "m/s").add("L", 0.05, "m");
    const std::vector<double> p_kpa{0.12, -3.5, 7.25, 0.0};
    std::vector<double> out(p_kpa.size());
    s.nondimensional(p_kpa, "kPa", out);
    for (std::size_t c = 0; c < out.size(); ++c) CHECK(out[c] == s.nondimensional(p_kpa[c], "kPa"));
    // SI Brochure 9th ed., table 7: k = 10^3
    CHECK(out[2] == doctest::Approx(7250.0 / (998.2 * 0.09)).epsilon(1e-15));
    std::vector<double> back(out.size());
    s.dimensional(out, "kPa", back);
    for (std::size_t c = 0; c < out.size(); ++c) CHECK(back[c] == doctest::Approx(p_kpa[c]).epsilon(1e-15));
    std::vector<double> short_out(2);
    CHECK_THROWS_AS(s.nondimensional(p_kpa, "kPa", short_out), scales_error);
  }

  TEST_CASE("typed fields convert from references given as text, as the compile-time scales do") {
    runtime_scales r;
    r.add("rho", "998 kg/m^3").add("U", "0.4 m/s").add("L", "5 cm");
    const auto s = scales(998.0 * units::kg / units::m3, 0.4 * units::m / units::s, 5.0 * units::cm);
    struct cell {
      double p, u;
    };
    std::vector<cell> cells{{101325.0, 0.1}, {100000.0, 0.35}, {99000.0, 0.5}};
    const auto p = member_view<dims::pressure>(std::span<cell>(cells), &cell::p);  // strided
    std::vector<double> from_text(3), from_types(3);
    r.nondimensional(p, std::span<double>(from_text));
    s.nondimensional(p, std::span<double>(from_types));
    CHECK(from_text == from_types);  // the same operations in the same order (see above)
    CHECK(from_text[0] == doctest::Approx(101325.0 / (998.0 * 0.16)).epsilon(1e-14));  // p / (rho U^2)
    r.dimensional(std::span<const double>(from_text), p);
    CHECK(cells[1].p == doctest::Approx(100000.0).epsilon(1e-15));
    std::vector<double> too_short(2);
    CHECK_THROWS_AS(r.nondimensional(p, std::span<double>(too_short)), scales_error);
  }

  TEST_CASE("nondimensional temperatures are built from differences") {
    // theta = (T - T_ref) / dT (Incropera & DeWitt, ch. 5 and 6, from memory)
    runtime_scales s;
    s.add("U", 2.0, "m/s").add("L", 0.1, "m").add("dT", 20.0, "K");
    CHECK(s.nondimensional_difference(45.0, 25.0, "degC") == 1.0);
    CHECK(s.nondimensional_difference(25.0, 25.0, "degC") == 0.0);
    CHECK(s.nondimensional_difference(35.0, 25.0, "degC") == doctest::Approx(0.5).epsilon(1e-13));
    // NIST SP 811 B.9: an interval of 1 degF is 5/9 K, so 18 degF of rise is 10 K
    CHECK(s.nondimensional_difference(95.0, 77.0, "degF") == doctest::Approx(0.5).epsilon(1e-13));
    // the inverse gives the reading back (SI Brochure 9th ed., 2.3.1: t/degC = T/K - 273.15)
    CHECK(s.dimensional_point(0.5, 25.0, "degC") == doctest::Approx(35.0).epsilon(1e-13));
    CHECK(s.dimensional_point(0.5, 298.15, "K") == doctest::Approx(308.15).epsilon(1e-14));
    CHECK(s.dimensional_point(0.5, from_celsius(25.0)).celsius() == doctest::Approx(35.0).epsilon(1e-13));
    // a field of readings
    const std::vector<double> readings{25.0, 30.0, 45.0};
    std::vector<double> theta(readings.size());
    s.nondimensional_difference(readings, 25.0, "degC", theta);
    CHECK(theta[0] == 0.0);
    CHECK(theta[1] == doctest::Approx(0.25).epsilon(1e-13));
    CHECK(theta[2] == 1.0);
    std::vector<double> back(theta.size());
    s.dimensional_point(theta, 25.0, "degC", back);
    for (std::size_t c = 0; c < back.size(); ++c) {
      CHECK(back[c] == s.dimensional_point(theta[c], 25.0, "degC"));
      CHECK(back[c] == doctest::Approx(readings[c]).epsilon(1e-13));
    }
    // a temperature difference scales by dT; in a compound unit degC is an interval (DESIGN.md)
    CHECK(s.nondimensional(5.0, "K") == 0.25);
    CHECK(s.nondimensional(5.0, "(degC)") == 0.25);
    // a reference temperature difference in kelvin from two readings
    runtime_scales s2;
    s2.add("dT", from_celsius(45.0) - from_celsius(25.0));
    CHECK(s2.scale(dims::temperature).value == doctest::Approx(20.0).epsilon(1e-13));
  }

  TEST_CASE("dependent references are refused, naming the dependent one") {
    // mu = rho U L in dimension (White, Fluid Mechanics, 5.3, from memory: Re = rho U L / mu)
    runtime_scales s;
    s.add("rho_ref", 998.2, "kg/m^3").add("U_ref", 0.3, "m/s").add("L_ref", 0.05, "m");
    try {
      s.add("mu_ref", 1.0e-3, "Pa*s");
      FAIL("no error");
    } catch (const scales_error& e) {
      CHECK(e.reference() == "mu_ref");
      CHECK(mentions(e, "'mu_ref'"));
      CHECK(mentions(e, "rho_ref*U_ref*L_ref"));
    }
    CHECK(s.size() == 3);  // unchanged
    // a second length is the first length (common practice, no source)
    CHECK_THROWS_WITH_AS(s.add("D", 2.0, "cm"), doctest::Contains("'D'"), scales_error);
    // a velocity after a length and a time: U = L/t
    runtime_scales s2;
    s2.add("L", 1.0, "m").add("t", 1.0, "s");
    CHECK_THROWS_WITH_AS(s2.add("U", 1.0, "km/h"), doctest::Contains("L/t"), scales_error);
    // and the other refusals of add(): dimensionless, repeated name, not positive, bad unit
    CHECK_THROWS_AS(s2.add("Re", 1.0e5, "1"), scales_error);
    CHECK_THROWS_WITH_AS(s2.add("L", 2.0, "kg"), doctest::Contains("twice"), scales_error);
    CHECK_THROWS_WITH_AS(s2.add("m", -2.0, "kg"), doctest::Contains("positive"), scales_error);
    CHECK_THROWS_AS(s2.add("m", "-2 kg"), scales_error);
    CHECK_THROWS_WITH_AS(s2.add("m", 2.0, "kgg"), doctest::Contains("reference 'm'"), unit_error);
  }

  TEST_CASE("a dimension outside the span names the base dimension the references lack") {
    runtime_scales s;
    s.add("rho", 998.2, "kg/m^3").add("U", 0.3, "m/s").add("L", 0.05, "m");
    CHECK_FALSE(s.spans(dims::temperature));
    CHECK(s.spans(dims::power));
    try {
      (void)s.scale(dims::thermal_conductivity);
      FAIL("no error");
    } catch (const scales_error& e) {
      CHECK(e.lacking_base() == 4);  // ISO 80000-1 order L M T I Theta N J: Theta
      CHECK(mentions(e, "lack the base dimension Theta"));
    }
    CHECK_THROWS_AS((void)s.nondimensional(20.0, "K"), scales_error);
    // with only a velocity, a length needs L or T added (common practice, no source: L = (L/T) T)
    runtime_scales v;
    v.add("U", 1.0, "m/s");
    try {
      (void)v.scale("m");
      FAIL("no error");
    } catch (const scales_error& e) {
      CHECK(e.lacking_base() == 0);
      CHECK(mentions(e, "base dimension L"));
    }
    // no temperature reference: no theta either
    CHECK_THROWS_AS((void)s.nondimensional_difference(30.0, 20.0, "degC"), scales_error);
  }

  TEST_CASE("an absolute temperature where a difference is meant is an error") {
    // SI Brochure 9th ed., 2.3.1: a Celsius temperature is a reading with an offset of 273.15 K
    runtime_scales s;
    try {
      s.add("dT", 20.0, "degC");
      FAIL("no error");
    } catch (const scales_error& e) {
      CHECK(e.reference() == "dT");
      CHECK(mentions(e, "absolute temperature"));
    }
    CHECK_THROWS_AS(s.add("dT", "20 degC"), scales_error);
    CHECK_THROWS_AS(s.add("dT", "68 \u00b0F"), scales_error);
    CHECK(s.size() == 0);
    s.add("dT", 20.0, "K").add("L", 1.0, "m");
    CHECK_THROWS_WITH_AS((void)s.nondimensional(30.0, "degC"), doctest::Contains("nondimensional_difference"),
                         scales_error);
    CHECK_THROWS_AS((void)s.dimensional(0.5, "degF"), scales_error);
    std::vector<double> cells{20.0, 30.0};
    CHECK_THROWS_AS(s.nondimensional(cells, "degC", cells), scales_error);
    // a difference given in a unit of another dimension
    CHECK_THROWS_AS((void)s.nondimensional_difference(30.0, 20.0, "m"), dimension_error);
  }
}

// Found by runtime_scales_fuzz (tests/fuzz/corpus/runtime_scales/rational_negation_of_scale):
// the scale of M^(-2^63) negated its exponent, -(-2^63), which has no int64 (ISO/IEC 14882
// [basic.fundamental]) and escaped as rational_overflow from scale(). Its value is
// 1 / m_ref^(2^63): 3^(2^63) overflows to +inf and 1/inf is +0 (IEEE 754).
TEST_CASE("runtime_scales: an exponent of -2^63 gives a scale and its text, not an overflow") {
  runtime_scales s;
  s.add("L_ref", dims::length, 2.0).add("m_ref", dims::mass, 3.0);
  std::array<rational, base_dimension_count> e{};
  e[1] = rational{std::numeric_limits<std::int64_t>::min()};
  const dimension d{e};
  REQUIRE(s.spans(d));
  const scale_expression x = s.scale(d);
  CHECK(x.exponents[1] == rational{std::numeric_limits<std::int64_t>::min()});
  CHECK(x.value == 0.0);
  CHECK(x.text(text_form::ascii) == "1/m_ref^9223372036854775808");
  CHECK(x.nondimensional_text("q", text_form::ascii) == "q*m_ref^9223372036854775808");
  CHECK(!x.text(text_form::unicode).empty());
}
