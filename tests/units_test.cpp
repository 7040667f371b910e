// Tests of nondim/units: every factor checked against its published value.
// NIST SP 811 (2008) Appendix B.8 prints factors to 7 significant digits (exact ones in
// bold); the tolerance of each check matches the digits printed.
#include <nondim/parse.hpp>
#include <nondim/quantity.hpp>

#include <doctest/doctest.h>

#include <string_view>

using namespace nondim;

namespace {
// relative agreement to the 7 digits NIST SP 811 prints
bool close7(double a, double b) {
  return a == doctest::Approx(b).epsilon(5e-7);
}
}  // namespace

// Exact definitions are exact in the table (no rounding beyond the double itself).
static_assert(units::ft.factor == 0.3048);      // NIST SP 811 B.8: foot = 3.048 E-01 (exact)
static_assert(units::in.factor == 0.0254);      // NIST SP 811 B.8: inch = 2.54 E-02 (exact)
static_assert(units::lb.factor == 0.45359237);  // NIST SP 811 B.8: pound (avoirdupois) = 4.535 923 7 E-01 (exact)
static_assert(units::kg.factor == 1.0);         // SI Brochure 9th ed., table 2: the kilogram is the base unit
static_assert(units::mg.factor == 1.0e-6);      // SI Brochure 9th ed., 3: prefixes on the gram; exact decade
static_assert(units::km.factor == 1.0e3);
static_assert(units::atm.factor == 101325.0);       // NIST SP 811 B.8: atmosphere, standard = 1.013 25 E+05 (exact)
static_assert(units::bar.factor == 1.0e5);          // SI Brochure 9th ed., table 8 note / NIST B.8: bar = 1.0 E+05
static_assert(units::min.factor == 60.0);           // SI Brochure 9th ed., table 8
static_assert(units::h.factor == 3600.0);           // SI Brochure 9th ed., table 8
static_assert(units::d.factor == 86400.0);          // SI Brochure 9th ed., table 8
static_assert(units::L.factor == 1.0e-3);           // SI Brochure 9th ed., table 8: 1 L = 1 dm^3
static_assert(units::t.factor == 1.0e3);            // SI Brochure 9th ed., table 8: 1 t = 10^3 kg
static_assert(units::Btu.factor == 1055.05585262);  // NIST SP 811 B.8: Btu_IT = 1.055 056 E+03 (exact 1055.055 852 62)
static_assert(units::cal.factor == 4.1868);         // NIST SP 811 B.8: calorie_IT = 4.1868 E+00 (exact)
static_assert(units::cP.factor == 1.0e-3);          // NIST SP 811 B.8: centipoise = 1.0 E-03 Pa s
static_assert(units::cSt.factor == 1.0e-6);         // NIST SP 811 B.8: centistokes = 1.0 E-06 m^2/s

TEST_SUITE("units") {
  TEST_CASE("customary units match NIST SP 811 Appendix B.8") {
    CHECK(close7(units::yd.factor, 9.144e-1));       // yard = 9.144 E-01 (exact)
    CHECK(close7(units::mi.factor, 1.609344e3));     // mile (international) = 1.609 344 E+03 (exact)
    CHECK(close7(units::nmi.factor, 1.852e3));       // nautical mile = 1.852 E+03 (exact)
    CHECK(close7(units::mil.factor, 2.54e-5));       // mil = 2.54 E-05 (exact)
    CHECK(close7(units::oz.factor, 2.834952e-2));    // ounce (avoirdupois) = 2.834 952 E-02
    CHECK(close7(units::slug.factor, 1.459390e1));   // slug = 1.459 390 E+01
    CHECK(close7(units::lbf.factor, 4.448222));      // pound-force = 4.448 222 E+00
    CHECK(close7(units::kip.factor, 4.448222e3));    // kip = 4.448 222 E+03
    CHECK(close7(units::kgf.factor, 9.80665));       // kilogram-force = 9.806 65 E+00 (exact)
    CHECK(close7(units::dyn.factor, 1.0e-5));        // dyne = 1.0 E-05 (exact)
    CHECK(close7(units::psi.factor, 6.894757e3));    // pound-force per square inch = 6.894 757 E+03
    CHECK(close7(units::ksi.factor, 6.894757e6));    // kip per square inch = 6.894 757 E+06
    CHECK(close7(units::Torr.factor, 1.333224e2));   // torr = 1.333 224 E+02
    CHECK(close7(units::mmHg.factor, 1.333224e2));   // millimeter of mercury, conventional = 1.333 224 E+02
    CHECK(close7(units::inHg.factor, 3.386389e3));   // inch of mercury, conventional = 3.386 389 E+03
    CHECK(close7(units::inH2O.factor, 2.490889e2));  // inch of water, conventional = 2.490 889 E+02
    CHECK(close7(units::hp.factor, 7.456999e2));     // horsepower (550 ft lbf/s) = 7.456 999 E+02
    CHECK(close7(units::TR.factor, 3.516853e3));     // ton of refrigeration (12 000 Btu_IT/h) = 3.516 853 E+03
    CHECK(close7(units::gal.factor, 3.785412e-3));   // gallon (U.S.) = 3.785 412 E-03
    CHECK(close7(units::knot.factor, 5.144444e-1));  // knot = 5.144 444 E-01
    CHECK(close7(units::mph.factor, 4.4704e-1));     // mile per hour = 4.4704 E-01 (exact)
    CHECK(close7(units::erg.factor, 1.0e-7));        // erg = 1.0 E-07 (exact)
    CHECK(close7(units::kcal.factor, 4.1868e3));     // kilocalorie_IT = 4.1868 E+03 (exact)
    CHECK(close7(units::P.factor, 1.0e-1));          // poise = 1.0 E-01 (exact)
    CHECK(close7(units::St.factor, 1.0e-4));         // stokes = 1.0 E-04 (exact)
    // revolution per minute = 1.047 198 E-01 rad/s: the angular velocity of one revolution
    // (2 pi rad, B.8) per minute; nondim's rpm is the rotational frequency n = omega/(2 pi)
    // (ISO 80000-3), so the published factor is 2 pi times rpm
    CHECK(close7(2.0 * detail::pi * units::rpm.factor, 1.047198e-1));
    CHECK(close7((units::rev / units::min).factor, 1.047198e-1));
    CHECK(close7(units::angstrom.factor, 1.0e-10));    // angstrom = 1.0 E-10 (exact)
    CHECK(close7(units::eV.factor, 1.602176634e-19));  // SI Brochure 9th ed., table 8: electronvolt (exact since 2019)
    CHECK(close7(units::Da.factor, 1.66053906660e-27));  // SI Brochure 9th ed., table 8: dalton
    CHECK(close7(units::deg.factor, 1.745329e-2));       // NIST SP 811 B.8: degree (angle) = 1.745 329 E-02 rad
    CHECK(close7(units::degR.factor, 5.0 / 9.0));        // NIST SP 811 B.9: T/K = (T/degR)/1.8
    CHECK(close7(units::delta_degF.factor, 5.0 / 9.0));  // NIST SP 811 B.9: a Fahrenheit interval is 5/9 K
  }

  TEST_CASE("exact definitions hold exactly, in the table and in conversions (NIST SP 811 (2008) B.8)") {
    // B.8: foot = 3.048 E-01 m, pound = 4.535 923 7 E-01 kg, pound-force = lb * g_n (exact);
    // standard gravity 9.806 65 m/s^2 (SI Brochure 9th ed. / 3rd CGPM 1901)
    CHECK(units::ft.factor == 0.3048);
    CHECK(units::lbf.factor == 0.45359237 * 9.80665);
    // psi = lbf/in^2, gallon (U.S.) = 231 in^3, gpm = gal/min
    CHECK(units::psi.factor == units::lbf.factor / (0.0254 * 0.0254));
    CHECK(units::gal.factor == 231.0 * 0.0254 * 0.0254 * 0.0254);
    CHECK(units::gpm.factor == units::gal.factor / 60.0);
    // gallon [Canadian and U.K. (Imperial)] = 4.546 09 E-03 m^3 (exact)
    CHECK(units::gal_imp.factor == 4.54609e-3);
    // inch of mercury, conventional: 25.4 conventional mmHg; millimeter of mercury,
    // conventional = 13.5951 g/cm^3 * 1 mm * g_n = 133.322 387 415 Pa (B.8 footnote)
    CHECK(units::mmHg.factor == 133.322387415);
    CHECK(units::inHg.factor == 25.4 * units::mmHg.factor);
    CHECK(convert(1.0, "inHg", "mmHg") == 25.4);
    CHECK(convert(25.4, "mmHg", "inHg") == 1.0);
    CHECK(units::inHg.factor == doctest::Approx(3386.388640341).epsilon(1e-15));
    // conventional water (1000 kg/m^3 under g_n): mmH2O = 9.806 65 E+00 Pa (exact),
    // inH2O = 25.4 mmH2O, ftH2O = 12 inH2O
    CHECK(units::mmH2O.factor == 9.80665);
    CHECK(convert(1.0, "inH2O", "mmH2O") == doctest::Approx(25.4).epsilon(1e-15));
    CHECK(convert(1.0, "ftH2O", "inH2O") == doctest::Approx(12.0).epsilon(1e-15));
    // acre = 43 560 ft^2 on the international foot: 4046.856 422 4 m^2 (B.8 prints 4.046 873
    // E+03 for the retired US survey foot, 1200/3937 m)
    CHECK(units::acre.factor == doctest::Approx(4046.8564224).epsilon(1e-15));
    CHECK(convert(1.0, "acre", "ft^2") == doctest::Approx(43560.0).epsilon(1e-15));
    // SI Brochure 9th ed., table 8: 1 t = 10^3 kg, spelled `t` or `tonne`
    CHECK(convert(1.0, "tonne", "kg") == 1000.0);
  }

  TEST_CASE("compound customary units follow from their parts (NIST SP 811 Appendix B.8)") {
    // British thermal unit_IT per hour square foot degree Fahrenheit = 5.678 263 E+00 W/(m^2 K)
    CHECK(close7((units::Btu / (units::h * units::ft * units::ft * units::delta_degF)).factor, 5.678263));
    // British thermal unit_IT per pound degree Fahrenheit = 4.1868 E+03 J/(kg K) (exact)
    CHECK(close7((units::Btu / (units::lb * units::delta_degF)).factor, 4.1868e3));
    // Btu_IT per hour foot degree Fahrenheit = 1.730 735 E+00 W/(m K)
    CHECK(close7((units::Btu / (units::h * units::ft * units::delta_degF)).factor, 1.730735));
    // foot pound-force = 1.355 818 E+00 J
    CHECK(close7((units::ft * units::lbf).factor, 1.355818));
    // pound per cubic foot = 1.601 846 E+01 kg/m^3
    CHECK(close7((units::lb / pow<3>(units::ft)).factor, 1.601846e1));
    // foot squared per second = 9.290 304 E-02 m^2/s (exact)
    CHECK(close7((pow<2>(units::ft) / units::s).factor, 9.290304e-2));
    // pound-force second per square foot = 4.788 026 E+01 Pa s
    CHECK(close7((units::lbf * units::s / pow<2>(units::ft)).factor, 4.788026e1));
  }

  TEST_CASE("the whole table: unique symbols, prefixable flags, exact decades") {
    for (std::size_t i = 0; i < unit_table.size(); ++i) {
      CAPTURE(unit_table[i].symbol);
      CHECK(unit_table[i].factor > 0.0);
      CHECK(!unit_table[i].source.empty());
      if (unit_table[i].decade != detail::no_decade) CHECK(unit_table[i].factor == detail::pow10(unit_table[i].decade));
      for (std::size_t j = i + 1; j < unit_table.size(); ++j) CHECK(unit_table[i].symbol != unit_table[j].symbol);
      for (const auto& a : unit_aliases) CHECK(a.alias != unit_table[i].symbol);
    }
    for (const auto& a : unit_aliases) {
      CAPTURE(a.alias);
      CHECK(find_unit_entry(a.symbol) != nullptr);
    }
  }

  TEST_CASE("symbol resolution: whole symbols win over prefix + symbol") {
    // SI Brochure 9th ed., 3: prefix symbols attach to unit symbols; these whole symbols win
    CHECK(resolve_unit_symbol("min")->entry->name == std::string_view{"minute"});
    CHECK(resolve_unit_symbol("Pa")->entry->name == std::string_view{"pascal"});
    CHECK(resolve_unit_symbol("cd")->entry->name == std::string_view{"candela"});
    CHECK(resolve_unit_symbol("h")->entry->name == std::string_view{"hour"});
    CHECK(resolve_unit_symbol("mi")->entry->name == std::string_view{"mile (international)"});
    CHECK(resolve_unit_symbol("P")->entry->name == std::string_view{"poise"});
    // prefixed SI and metric units
    CHECK(resolve_unit_symbol("dam")->factor == 10.0);  // "da" is tried before "d"
    CHECK(resolve_unit_symbol("mmol")->factor == 1.0e-3);
    CHECK(resolve_unit_symbol("\u00b5m")->factor == 1.0e-6);  // micro sign
    CHECK(resolve_unit_symbol("\u03bcs")->factor == 1.0e-6);  // Greek mu
    CHECK(resolve_unit_symbol("Qm")->factor == 1.0e30);       // 2022 prefixes (27th CGPM)
    CHECK(resolve_unit_symbol("qg")->factor == doctest::Approx(1.0e-33));
    CHECK(resolve_unit_symbol("mL")->factor == doctest::Approx(1.0e-6));
    // customary units take no prefix
    CHECK(!resolve_unit_symbol("kft"));
    CHECK(!resolve_unit_symbol("mpsi"));
    CHECK(!resolve_unit_symbol("kdegC"));
    CHECK(!resolve_unit_symbol("kkg"));
    CHECK(!resolve_unit_symbol(""));
  }

  TEST_CASE("units make quantities and read them back") {
    const auto p = 14.7 * units::psi;
    CHECK(p / units::kPa == doctest::Approx(101.35).epsilon(1e-4));
    const auto mu = 1.0 * units::cP;  // water near 20 degC, common practice, no source
    CHECK(mu / (units::Pa * units::s) == doctest::Approx(1.0e-3));
    const auto e = (2.0 * units::kW) * units::h;
    CHECK(decltype(e)::dim == dims::energy);
    CHECK(e / units::MJ == doctest::Approx(7.2));
    CHECK((1.0 / units::s).si() == 1.0);
  }
}
