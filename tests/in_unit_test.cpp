// Tests of nondim/solver/units/in_unit.hpp: quantities written in a chosen unit with its symbol.
#include <nondim/quantity.hpp>

#include <doctest/doctest.h>

#include <iomanip>
#include <sstream>
#include <string>

using namespace nondim;

namespace {
template <class V>
std::string streamed(const V& v) {
  std::ostringstream os;
  os << v;
  return os.str();
}
}  // namespace

TEST_SUITE("in_unit") {
  TEST_CASE("a quantity is written as a number of the chosen unit and its symbol") {
    // standard atmosphere 101 325 Pa (ISO 2533, common practice)
    const auto p = 101325.0 * units::Pa;
    CHECK(to_string(in_unit(p, units::kPa)) == "101.325 kPa");
    CHECK(streamed(in_unit(p, units::kPa)) == "101.325 kPa");
    CHECK(to_string(in_unit(p, units::bar)) == "1.01325 bar");
    // 1 psi = 6.894757e3 Pa, NIST SP 811 B.8: 101325 Pa is 14.6959... psi
    CHECK(in_unit(p, units::psi).symbol == "psi");
    CHECK(in_unit(p, units::psi).value == doctest::Approx(14.6959).epsilon(1e-5));
    CHECK(to_string(in_unit(2.5 * units::m, units::mm)) == "2500 mm");
  }

  TEST_CASE("ASCII and Unicode forms differ only where the symbol does") {
    const auto d = 40.0 * units::um;
    CHECK(to_string(in_unit(d, units::um, text_form::ascii)) == "40 um");
    CHECK(to_string(in_unit(d, units::um)) == "40 \u00b5m");  // SI Brochure: micro sign
  }

  TEST_CASE("the stream's precision applies to the number") {
    std::ostringstream os;
    os << std::setprecision(3) << in_unit(101325.0 * units::Pa, units::kPa);
    CHECK(os.str() == "101 kPa");
  }

  TEST_CASE("a unit built from others takes the symbol given, or the value is written in coherent SI") {
    const auto h = 2.5e5 * units::J / units::kg;
    CHECK(to_string(in_unit(h, units::kJ / units::kg, "kJ/kg")) == "250 kJ/kg");
    // no table entry has this factor: never a number of one unit beside the symbol of another
    CHECK(to_string(in_unit(h, units::kJ / units::kg, text_form::ascii)) == "250000 m^2/s^2");
  }

  TEST_CASE("a specific energy is never written in grays, a rate never in becquerels") {
    // Gy = J/kg and Bq = 1/s share their dimensions (SI Brochure 9th ed., table 4)
    CHECK(in_unit(3.0 * units::J / units::kg, units::J / units::kg).symbol != "Gy");
    CHECK(in_unit(3.0 / units::s, units::Hz).symbol == "Hz");
  }

  TEST_CASE("dimensionless numbers are written without a symbol") {
    const quantity<dims::dimensionless> m{2.5};
    CHECK(to_string(in_unit(m, unit<dims::dimensionless>{})) == "2.5");
  }
}
