// Tests of nondim/parse: quantities from text, conversions, absolute temperatures.
#include <nondim/parse.hpp>
#include <nondim/quantity.hpp>

#include <doctest/doctest.h>

#include <string>

using namespace nondim;

TEST_SUITE("parse_quantity") {
  TEST_CASE("degC and degF standing alone are absolute temperatures") {
    // SI Brochure 9th ed., 2.3.1: t/degC = T/K - 273.15, so 0 degC = 273.15 K
    for (const char* text : {"degC", "\u00b0C", "\u2103", "  degC  "}) {
      CAPTURE(text);
      const parsed_unit c = parse_unit(text);
      CHECK(c.factor == 1.0);
      CHECK(c.offset == 273.15);
      CHECK(c.dim == dims::temperature);
    }
    // NIST SP 811 (2008) B.9: T/K = (t/degF + 459.67)/1.8
    for (const char* text : {"degF", "\u00b0F", "\u2109"}) {
      CAPTURE(text);
      const parsed_unit f = parse_unit(text);
      CHECK(f.factor == doctest::Approx(1.0 / 1.8).epsilon(1e-15));
      CHECK(f.offset == doctest::Approx(459.67 / 1.8).epsilon(1e-15));
    }
  }

  TEST_CASE("inside a compound unit degC and degF are intervals; K and degR are never affine") {
    // SI Brochure 9th ed., 2.3.1: a Celsius temperature difference equals the kelvin difference
    CHECK(parse_unit("degC/s").offset == 0.0);
    CHECK(parse_unit("degC/s").factor == 1.0);
    CHECK(parse_unit("(degC)").offset == 0.0);
    CHECK(parse_unit("degC^1").offset == 0.0);
    CHECK(parse_unit("\u00b0C\u00b7m").offset == 0.0);
    // NIST SP 811 B.9: a Fahrenheit interval is 5/9 K
    CHECK(parse_unit("degF*h/Btu").offset == 0.0);
    CHECK(parse_unit("(degF)").factor == doctest::Approx(5.0 / 9.0).epsilon(1e-15));
    CHECK(parse_unit("K").offset == 0.0);
    CHECK(parse_unit("degR").offset == 0.0);
    CHECK(parse_unit("degR").factor == doctest::Approx(5.0 / 9.0).epsilon(1e-15));  // NIST SP 811 B.9
    CHECK(parse_unit("\u00b0R").offset == 0.0);
  }

  TEST_CASE("convert handles absolute temperatures both ways") {
    // NIST SP 811 (2008) B.9: t/degF = 1.8 t/degC + 32
    CHECK(convert(100.0, "degC", "degF") == doctest::Approx(212.0).epsilon(1e-13));
    CHECK(convert(0.0, "degC", "degF") == doctest::Approx(32.0).epsilon(1e-13));
    CHECK(convert(-40.0, "degC", "degF") == doctest::Approx(-40.0).epsilon(1e-13));
    CHECK(convert(212.0, "\u00b0F", "\u00b0C") == doctest::Approx(100.0).epsilon(1e-13));
    // SI Brochure 9th ed., 2.3.1: 0 degC = 273.15 K
    CHECK(convert(0.0, "degC", "K") == 273.15);
    CHECK(convert(273.15, "K", "degC") == 0.0);
    // NIST SP 811 B.9: T/K = (t/degF + 459.67)/1.8; 68 degF = 293.15 K
    CHECK(convert(68.0, "degF", "K") == doctest::Approx(293.15).epsilon(1e-13));
    CHECK(convert(0.0, "degF", "degR") == doctest::Approx(459.67).epsilon(1e-13));
    // intervals: a rate of 1 degC/s is 1 K/s and 1.8 degF/s
    CHECK(convert(1.0, "degC/s", "K/s") == 1.0);
    CHECK(convert(1.0, "degC/s", "degF/s") == doctest::Approx(1.8).epsilon(1e-15));
  }

  TEST_CASE("convert scales numbers between units of one dimension") {
    CHECK(convert(1.0, "psi", "kPa") ==
          doctest::Approx(6.894757).epsilon(5e-8));  // NIST SP 811 B.9: psi to kPa, 6.894 757
    CHECK(convert(1.0, "mi/h", "km/h") == doctest::Approx(1.609344).epsilon(1e-15));  // NIST SP 811 B.8, exact
    CHECK(convert(1.0, "lbf*ft", "N*m") == doctest::Approx(1.355818).epsilon(5e-7));  // NIST SP 811 B.8
    CHECK(convert(1.0, "atm", "bar") == 1.01325);                                     // NIST SP 811 B.8, exact
    // NIST SP 811 B.8: Btu_IT/(h ft^2 degF) = 5.678 263 E+00 W/(m^2 K)
    CHECK(convert(1.0, "Btu/(h*ft^2*degF)", "W/(m^2*K)") == doctest::Approx(5.678263).epsilon(1e-7));
    CHECK(convert(2.5, "m", "m") == 2.5);
  }

  TEST_CASE("convert refuses units of different dimensions and names both") {
    CHECK_THROWS_AS(convert(1.0, "m", "s"), dimension_error);
    try {
      (void)convert(1.0, "m/s", "Pa");
      FAIL("no exception");
    } catch (const dimension_error& e) {
      const std::string what = e.what();
      CHECK(what.find("L T^-1") != std::string::npos);       // dimension of m/s
      CHECK(what.find("L^-1 M T^-2") != std::string::npos);  // dimension of Pa (ISO 80000-1 order)
      CHECK(e.expected() == dims::pressure);
      CHECK(e.actual() == dims::velocity);
    }
    CHECK_THROWS_AS(convert(1.0, "degC", "m"), dimension_error);
    CHECK_THROWS_AS(convert(1.0, "kg/m/s", "Pa*s"), unit_error);
  }

  TEST_CASE("a quantity from text has its SI value and dimension") {
    // dynamic viscosity of air near 300 K, about 1.8e-5 Pa s (common practice, no source)
    const parsed_quantity mu = parse_quantity("1.8e-5 Pa*s");
    CHECK(mu.value == 1.8e-5);
    CHECK(mu.dim == dims::dynamic_viscosity);
    CHECK(parse_quantity("3 ft").value == doctest::Approx(0.9144).epsilon(1e-15));  // NIST SP 811 B.8, exact
    CHECK(parse_quantity("14.7 psi").value == doctest::Approx(14.7 * 6894.757).epsilon(1e-7));
    CHECK(parse_quantity("-2.5e3 mm").value == doctest::Approx(-2.5).epsilon(1e-15));
    CHECK(parse_quantity("+1 km").value == 1000.0);
    CHECK(parse_quantity("\u22121 km").value == -1000.0);  // U+2212 minus sign
    CHECK(parse_quantity(".5 m").value == 0.5);
    CHECK(parse_quantity("5m").value == 5.0);
    CHECK(parse_quantity("2\u2009kg").value == 2.0);        // thin space (SI Brochure 9th ed., 5.4.3)
    const parsed_quantity pure = parse_quantity(" 0.71 ");  // a Prandtl number, dimensionless
    CHECK(pure.value == 0.71);
    CHECK(pure.dim == dims::dimensionless);
  }

  TEST_CASE("a temperature alone is absolute, inside a compound unit an interval") {
    // SI Brochure 9th ed., 2.3.1: T = t + 273.15 K
    CHECK(parse_quantity("20 degC").value == doctest::Approx(293.15).epsilon(1e-15));
    CHECK(parse_quantity("20\u00b0C").value == doctest::Approx(293.15).epsilon(1e-15));
    CHECK(parse_quantity("-40 \u00b0F").value == doctest::Approx(233.15).epsilon(1e-13));  // -40 degF = -40 degC
    CHECK(parse_quantity("300 K").value == 300.0);
    CHECK(parse_quantity("5 degC/min").value == doctest::Approx(5.0 / 60.0).epsilon(1e-15));
  }

  TEST_CASE("a lone degC or degF is read as a point or a difference only when asked") {
    // SI Brochure 9th ed., 2.3.1: t/degC = T/K - 273.15, and a Celsius interval equals a
    // kelvin interval; NIST SP 811 B.9: T/K = (t/degF + 459.67)/1.8, a Fahrenheit interval 5/9 K
    try {
      (void)parse_quantity<dims::temperature>("40 degC");
      FAIL("the ambiguous reading was accepted");
    } catch (const unit_error& e) {
      CHECK(e.kind() == unit_error_kind::ambiguous_temperature);
      CHECK(e.column() == 1);
      CHECK(std::string(e.what()).find("parse_temperature_point") != std::string::npos);
      CHECK(std::string(e.what()).find("parse_temperature_difference") != std::string::npos);
    }
    CHECK_THROWS_AS((void)parse_quantity<dims::temperature>("68 \u00b0F"), unit_error);
    CHECK(parse_quantity<dims::temperature>("5 degR").si() == doctest::Approx(25.0 / 9.0).epsilon(1e-15));
    CHECK(parse_temperature_point("40 degC").kelvin() == doctest::Approx(313.15).epsilon(1e-15));
    CHECK(parse_temperature_point("40 degC").celsius() == doctest::Approx(40.0).epsilon(1e-13));
    CHECK(parse_temperature_point("212 degF").kelvin() == doctest::Approx(373.15).epsilon(1e-15));
    CHECK(parse_temperature_point("300 K").kelvin() == 300.0);
    CHECK(parse_temperature_point("491.67 degR").kelvin() == doctest::Approx(273.15).epsilon(1e-15));
    CHECK(parse_temperature_difference("40 degC").si() == 40.0);
    CHECK(parse_temperature_difference("9 degF").si() == doctest::Approx(5.0).epsilon(1e-15));
    CHECK(parse_temperature_difference("-3 K").si() == -3.0);
    CHECK_THROWS_AS((void)parse_temperature_point("3 m"), dimension_error);
    CHECK_THROWS_AS((void)parse_temperature_difference("3 Pa"), dimension_error);
  }

  TEST_CASE("a temperature reading below absolute zero is an error that names it") {
    // SI Brochure 9th ed., 2.3.1: the thermodynamic temperature is not negative; -300 degC is -26.85 K
    try {
      (void)parse_quantity("x -300 degC");
      FAIL("no exception");
    } catch (const unit_error& e) {
      CHECK(e.kind() == unit_error_kind::bad_number);
    }
    try {
      (void)parse_quantity("  -300 degC");
      FAIL("no exception");
    } catch (const temperature_error& e) {
      CHECK(e.kind() == unit_error_kind::below_absolute_zero);
      CHECK(e.column() == 3);
      CHECK(e.kelvin() == doctest::Approx(-26.85).epsilon(1e-12));
      CHECK(std::string(e.what()).find("-300 degC") != std::string::npos);
      CHECK(std::string(e.what()).find("-26.85 K") != std::string::npos);
    }
    CHECK_THROWS_AS((void)parse_temperature_point("-1 K"), temperature_error);
    CHECK_THROWS_AS((void)parse_temperature_point("-460 degF"), temperature_error);  // -459.67 degF is 0 K
    CHECK_THROWS_AS((void)convert(-300.0, "degC", "K"), temperature_error);
    CHECK_THROWS_AS((void)convert(-1.0, "K", "degC"), temperature_error);
    // absolute zero itself is allowed and lands on zero exactly (NIST SP 811 B.9: 0 K = -459.67 degF)
    CHECK(parse_temperature_point("-273.15 degC").kelvin() == 0.0);
    CHECK(parse_temperature_point("-459.67 degF").kelvin() == 0.0);
    CHECK(convert(-459.67, "degF", "K") == 0.0);
    // a difference may be negative: nothing is checked for linear units
    CHECK(convert(-300.0, "degC/s", "K/s") == -300.0);
    CHECK(parse_temperature_difference("-300 degC").si() == -300.0);
  }

  TEST_CASE("a converted reading within rounding of zero is zero") {
    // NIST SP 811 B.9: T/K = (t/degF + 459.67)/1.8 = T/degR / 1.8; 491.67 degR = 273.15 K = 0 degC,
    // 32 degF = 0 degC (common practice)
    CHECK(convert(491.67, "degR", "degC") == 0.0);
    CHECK(convert(32.0, "degF", "degC") == 0.0);
    CHECK(convert(273.15, "K", "degC") == 0.0);
    CHECK(convert(0.0, "degC", "degF") == doctest::Approx(32.0).epsilon(1e-15));
    CHECK(convert(100.0, "degC", "degF") == doctest::Approx(212.0).epsilon(1e-15));
  }

  TEST_CASE("a conversion between angular velocity and rotational frequency is flagged") {
    // ISO 80000-3: omega = 2 pi n; one revolution is 2 pi rad (NIST SP 811 B.8), a factor the
    // dimensions cannot see: 60 r/min is 1 Hz, 2 pi rad/s
    CHECK(convert(60.0, "rpm", "Hz") == doctest::Approx(1.0).epsilon(1e-15));
    CHECK(convert(60.0, "r/min", "1/s") == doctest::Approx(1.0).epsilon(1e-15));
    CHECK(crosses_rotational_families("rpm", "rad/s"));
    CHECK(crosses_rotational_families("rad/s", "Hz"));
    CHECK(crosses_rotational_families("rev/min", "rpm"));
    CHECK(crosses_rotational_families("deg/s", "1/s"));
    CHECK(crosses_rotational_families("rad/s^2", "rpm/s"));
    CHECK_FALSE(crosses_rotational_families("rpm", "Hz"));
    CHECK_FALSE(crosses_rotational_families("rad/s", "deg/s"));
    CHECK_FALSE(crosses_rotational_families("rev/min", "rad/s"));
    CHECK_FALSE(crosses_rotational_families("rad", "1"));  // an angle, not a rate
    CHECK_FALSE(crosses_rotational_families("m/s", "km/h"));
    CHECK(mentions_plane_angle("\u00b0/s"));
    CHECK_FALSE(mentions_plane_angle("r/min"));
  }

  TEST_CASE("the typed form returns a quantity or names both dimensions") {
    const auto p = parse_quantity<dims::pressure>("1 atm");
    CHECK(p.si() == 101325.0);  // NIST SP 811 B.8: 1.013 25 E+05 Pa exactly
    const auto k = parse_quantity<dims::thermal_conductivity>("0.6 W/(m*K)");  // water, common practice
    CHECK(k.si() == 0.6);
    const auto T = parse_quantity<dims::temperature>("273.15 K");  // kelvin is one reading
    CHECK(T.si() == 273.15);
    CHECK_THROWS_AS((void)parse_quantity<dims::length>("3 s"), dimension_error);
    try {
      (void)parse_quantity<dims::velocity>("3 Pa");
      FAIL("no exception");
    } catch (const dimension_error& e) {
      const std::string what = e.what();
      CHECK(what.find("L T^-1 (m/s)") != std::string::npos);
      CHECK(what.find("L^-1 M T^-2 (kg/(m*s^2))") != std::string::npos);
    }
  }

  TEST_CASE("a bad number is a unit_error with its column") {
    const auto column_of = [](const char* text) {
      try {
        (void)parse_quantity(text);
      } catch (const unit_error& e) {
        CHECK(e.kind() == unit_error_kind::bad_number);
        return e.column();
      }
      return std::size_t{0};
    };
    CHECK(column_of("abc m") == 1);
    CHECK(column_of("  x") == 3);
    CHECK(column_of("") == 1);
    CHECK(column_of("1e999 m") == 1);
    CHECK(column_of("nan m") == 1);
    CHECK(column_of("inf") == 1);
    CHECK(column_of("- 3 m") == 2);
    CHECK(column_of("1e300 Qm^10") == 1);  // 1e600 m^10 does not fit a double
  }

  TEST_CASE("errors in the unit of a quantity count columns from the start of the text") {
    try {
      (void)parse_quantity("20 kpa");
      FAIL("no exception");
    } catch (const unit_error& e) {
      CHECK(e.kind() == unit_error_kind::unknown_symbol);
      CHECK(e.column() == 4);
      CHECK(std::string(e.what()).find("kPa") != std::string::npos);
    }
    try {
      (void)parse_quantity("\u00b5 1.5 J/kg*K");
      FAIL("no exception");
    } catch (const unit_error& e) {
      CHECK(e.kind() == unit_error_kind::bad_number);
      CHECK(e.column() == 1);
    }
    try {
      (void)parse_quantity("1.5 \u00b5J/kg*K");  // code points: 1 . 5 space µ J / k g * -> column 10
      FAIL("no exception");
    } catch (const unit_error& e) {
      CHECK(e.kind() == unit_error_kind::ambiguous_solidus);
      CHECK(e.column() == 10);
    }
  }
}
