// Tests of nondim/parse: every kind of bad unit expression is a unit_error that names the
// offending token and its 1-based column in code points. Expected columns are counted by
// hand from the text of each case.
#include <nondim/parse.hpp>

#include <doctest/doctest.h>

#include <string>

using namespace nondim;

namespace {

struct failure {
  unit_error_kind kind;
  std::size_t column;
  std::string message;
};

failure fault_of(const std::string& text) {
  try {
    (void)parse_unit(text);
  } catch (const unit_error& e) {
    return {e.kind(), e.column(), e.what()};
  }
  return {unit_error_kind::bad_number, 0, "no error"};
}

void check_fault(const std::string& text, unit_error_kind kind, std::size_t column, const std::string& needle = {}) {
  CAPTURE(text);
  const failure f = fault_of(text);
  CAPTURE(f.message);
  CHECK(f.kind == kind);
  CHECK(f.column == column);
  CHECK(f.message.find("column " + std::to_string(column)) != std::string::npos);
  if (!needle.empty()) CHECK(f.message.find(needle) != std::string::npos);
}

}  // namespace

TEST_SUITE("parse_errors") {
  TEST_CASE("unit_error is an invalid_argument") {
    CHECK_THROWS_AS(parse_unit("furlong"), std::invalid_argument);
    CHECK_THROWS_AS(parse_unit("furlong"), unit_error);
  }

  TEST_CASE("empty expressions and empty factors") {
    check_fault("", unit_error_kind::empty_expression, 1);
    check_fault("   ", unit_error_kind::empty_expression, 4);
    check_fault("()", unit_error_kind::empty_factor, 1, "()");
    check_fault("m*( )", unit_error_kind::empty_factor, 3);
    check_fault("m*/s", unit_error_kind::empty_factor, 3, "`*` and `/`");
    check_fault("*m", unit_error_kind::empty_factor, 1, "`*`");
    check_fault("/s", unit_error_kind::empty_factor, 1, "1/s");
    check_fault("^2", unit_error_kind::empty_factor, 1);
    check_fault("\u00b2", unit_error_kind::empty_factor, 1);
    check_fault("m\u00b7\u00b7s", unit_error_kind::empty_factor, 3);
  }

  TEST_CASE("dangling operators") {
    check_fault("m*", unit_error_kind::dangling_operator, 2, "`*`");
    check_fault("kg/", unit_error_kind::dangling_operator, 3, "`/`");
    check_fault("m^", unit_error_kind::dangling_operator, 2, "`^`");
    check_fault("m**", unit_error_kind::dangling_operator, 2, "`**`");
    check_fault("(m/)", unit_error_kind::dangling_operator, 3);
    check_fault("m^-", unit_error_kind::dangling_operator, 3);
    check_fault("m \u00b7 ", unit_error_kind::dangling_operator, 3);
  }

  TEST_CASE("unknown symbols, with a suggestion when one is close") {
    check_fault("furlong", unit_error_kind::unknown_symbol, 1, "`furlong`");
    check_fault("kpa", unit_error_kind::unknown_symbol, 1, "did you mean `kPa`");
    check_fault("W/(m^2*k)", unit_error_kind::unknown_symbol, 8, "`k` is an SI prefix");
    check_fault("KG", unit_error_kind::unknown_symbol, 1, "`kg`");
    check_fault("hz", unit_error_kind::unknown_symbol, 1, "`Hz`");
    check_fault("degc", unit_error_kind::unknown_symbol, 1, "`degC`");
    check_fault("m2", unit_error_kind::unknown_symbol, 1, "`m^2`");
    check_fault("Pas", unit_error_kind::unknown_symbol, 1, "`Pa*s`");
    check_fault("kft", unit_error_kind::unknown_symbol, 1, "takes no SI prefix");
    check_fault("mdegC", unit_error_kind::unknown_symbol, 1, "takes no SI prefix");
    check_fault("mkg", unit_error_kind::unknown_symbol, 1, "on `g`");
    check_fault("sec", unit_error_kind::unknown_symbol, 1, "`s`");
    check_fault("N\u00b7m\u00b7Kelvin", unit_error_kind::unknown_symbol, 5, "`Kelvin`");
  }

  TEST_CASE("hints that point the right way (common practice, no source)") {
    // `mile` is one edit from `mil` (a thousandth of an inch, NIST SP 811 B.8); the mile is `mi`
    check_fault("mile", unit_error_kind::unknown_symbol, 1, "write `mi`");
    CHECK(fault_of("mile").message.find("did you mean `mil`") == std::string::npos);
    // a gauge pressure needs the atmosphere it is measured from: no unit converts it
    check_fault("psig", unit_error_kind::unknown_symbol, 1, "gauge pressure");
    CHECK(fault_of("psig").message.find("psi*g") == std::string::npos);
    // `deg C` would be an angle times a coulomb (SI Brochure 9th ed., table 4: C)
    check_fault("deg C", unit_error_kind::unknown_symbol, 1, "write `degC`");
    check_fault("J/(kg*deg F)", unit_error_kind::unknown_symbol, 7, "write `degF`");
    check_fault("\u00b0 C", unit_error_kind::unknown_symbol, 1, "write `degC`");
    // `r/min` is a unit (ISO 80000-3), not the prefix ronto on nothing; a power after it is refused
    CHECK(parse_unit("r/min").factor == 1.0 / 60.0);
    CHECK(parse_unit("m^3/(r/min)").factor == 60.0);
    check_fault("r/min^2", unit_error_kind::bad_exponent, 6, "(r/min)^2");
    // `ppm` is a unit now, no longer one edit from `rpm`
    CHECK(parse_unit("ppm").factor == 1.0e-6);
  }

  TEST_CASE("a number other than 1 is refused with a hint") {
    // the hint speaks of values and units, never of a C++ function: program users read it too
    check_fault("1000 m", unit_error_kind::number_factor, 1, "units only");
    CHECK(fault_of("1000 m").message.find("parse_quantity") == std::string::npos);
    check_fault("2*m", unit_error_kind::number_factor, 1, "prefixes");
    check_fault("m*10", unit_error_kind::number_factor, 3, "`10`");
    check_fault("1.0/s", unit_error_kind::number_factor, 1, "`1.0`");
    check_fault("1e3 m", unit_error_kind::number_factor, 1, "`1e3`");
    check_fault("m^2/3", unit_error_kind::number_factor, 5, "^(p/q)");
  }

  TEST_CASE("a second solidus or a product after it shows the bracketed form") {
    // SI Brochure 9th ed., 5.4.6 and ISO 80000-1: kg/m/s and J/kg*K are ambiguous
    check_fault("kg/m/s", unit_error_kind::ambiguous_solidus, 5, "write `kg/(m*s)`");
    check_fault("J/kg*K", unit_error_kind::ambiguous_solidus, 5, "write `J/(kg*K)`");
    check_fault("J/kg K", unit_error_kind::ambiguous_solidus, 6, "write `J/(kg*K)`");
    check_fault("W/m^2*K", unit_error_kind::ambiguous_solidus, 6, "write `W/(m^2*K)`");
    check_fault("W / m\u00b2 / K", unit_error_kind::ambiguous_solidus, 8, "write `W/(m\u00b2*K)`");
    check_fault("1/m/s", unit_error_kind::ambiguous_solidus, 4, "write `1/(m*s)`");
    check_fault("(kg/m/s)^2", unit_error_kind::ambiguous_solidus, 6, "write `kg/(m*s)`");
    check_fault("\u00b5m/s/K", unit_error_kind::ambiguous_solidus, 5, "`\u00b5m/(s*K)`");  // µ is one column
    check_fault("kg/m/furlong", unit_error_kind::ambiguous_solidus, 5, "bracket the whole denominator");
  }

  TEST_CASE("unbalanced parentheses") {
    check_fault("(m", unit_error_kind::unbalanced_parenthesis, 1, "`(`");
    check_fault("m)", unit_error_kind::unbalanced_parenthesis, 2, "`)`");
    check_fault("((m)", unit_error_kind::unbalanced_parenthesis, 1);
    check_fault("(m))", unit_error_kind::unbalanced_parenthesis, 4);
    check_fault("kg/(m*s", unit_error_kind::unbalanced_parenthesis, 4);
    check_fault("m^(1/2", unit_error_kind::unbalanced_parenthesis, 3);
  }

  TEST_CASE("bad exponents") {
    check_fault("m^x", unit_error_kind::bad_exponent, 3, "`x`");
    check_fault("m^2^3", unit_error_kind::bad_exponent, 4, "(m^2)");
    check_fault("m\u00b2^3", unit_error_kind::bad_exponent, 3);
    check_fault("m^1.", unit_error_kind::bad_exponent, 4, "`.`");
    check_fault("m^(1/2]", unit_error_kind::bad_exponent, 7);
    check_fault("m\u207b", unit_error_kind::bad_exponent, 2);
    check_fault("m^--1", unit_error_kind::bad_exponent, 4);
  }

  TEST_CASE("a zero denominator in an exponent") {
    check_fault("m^(1/0)", unit_error_kind::zero_denominator, 6, "`(1/0)`");
    check_fault("s^( 3 / 0.00 )", unit_error_kind::zero_denominator, 9);
  }

  TEST_CASE("exponents that overflow the 64-bit rational") {
    check_fault("m^99999999999999999999", unit_error_kind::exponent_overflow, 3, "`99999999999999999999`");
    check_fault("m^0.1234567890123456789012", unit_error_kind::exponent_overflow, 3);
    // 2^63 - 1 fits; one more m overflows at the second factor (column 23)
    check_fault("m^9223372036854775807*m", unit_error_kind::exponent_overflow, 23);
    // 2^62 squared overflows at the power (column 24)
    check_fault("(m^4611686018427387904)^2", unit_error_kind::exponent_overflow, 24);
    // -2^63 is refused too, so every exponent can be negated when printed
    check_fault("m^-9223372036854775807/m", unit_error_kind::exponent_overflow, 24);
    check_fault(
        "m\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079\u2079"
        "\u2079\u2079\u2079\u2079\u2079",
        unit_error_kind::exponent_overflow, 2);
    // a large fraction that still reduces is fine
    CHECK(parse_unit("m^(9223372036854775806/9223372036854775806)").dim == dims::length);
  }

  TEST_CASE("a factor beyond the range of a double") {
    check_fault("km^400", unit_error_kind::factor_out_of_range, 3);
    check_fault("ft^-1000", unit_error_kind::factor_out_of_range, 3);
    check_fault("Qm^10*Qm^1", unit_error_kind::factor_out_of_range, 7);
  }

  TEST_CASE("invalid UTF-8") {
    check_fault("m\xff", unit_error_kind::invalid_utf8, 2, "0xFF");
    check_fault("\xc0\xaf", unit_error_kind::invalid_utf8, 1);             // overlong '/'
    check_fault("\u00b5m\xc2", unit_error_kind::invalid_utf8, 3);          // truncated after µm
    check_fault("m\u00b7\xed\xa0\x80", unit_error_kind::invalid_utf8, 3);  // a UTF-16 surrogate
    check_fault("\xf4\x90\x80\x80", unit_error_kind::invalid_utf8, 1);     // beyond U+10FFFF
    check_fault("\x80", unit_error_kind::invalid_utf8, 1);
  }

  TEST_CASE("nesting deeper than the documented limit") {
    // built by appending: GCC 12 at -O2 reports -Warray-bounds falsely inside std::string's
    // operator+ when it inlines it here
    std::string text(max_unit_nesting + 1, '(');
    text += 'm';
    text.append(max_unit_nesting + 1, ')');
    check_fault(text, unit_error_kind::too_deep, max_unit_nesting + 1, "32");
    // a very deep text ends quickly at the limit, without deep recursion
    check_fault(std::string(4000, '('), unit_error_kind::too_deep, max_unit_nesting + 1);
  }

  TEST_CASE("text longer than the documented limit") {
    std::string text(max_unit_text_bytes + 1, 'm');
    check_fault(text, unit_error_kind::too_long, max_unit_text_bytes + 1, "4096");
    CHECK_THROWS_AS(parse_quantity("1 " + text), unit_error);
  }

  TEST_CASE("characters with no place in a unit expression") {
    check_fault("m+s", unit_error_kind::unexpected_character, 2, "`+`");
    check_fault("m-s", unit_error_kind::unexpected_character, 2, "s^-1");
    check_fault("m.s", unit_error_kind::unexpected_character, 2, "product");
    check_fault("m(s)", unit_error_kind::unexpected_character, 2, "missing operator");
    check_fault("m^2s", unit_error_kind::unexpected_character, 4, "missing operator");
    check_fault("m#", unit_error_kind::unexpected_character, 2, "`#`");
    check_fault("m\u00d7s", unit_error_kind::unexpected_character, 2, "`*`");
    check_fault("m s\u00b2 \u00b3", unit_error_kind::unexpected_character, 6, "superscript");
    check_fault(std::string("m\0s", 3), unit_error_kind::unexpected_character, 2, "U+0000");
  }

  TEST_CASE("a long malformed text fails at its first fault") {
    // linear scan: a 4 kB text of factors with one fault at its end
    std::string text = "m";
    while (text.size() < 4000) text += "*m";
    text += "*";
    const failure f = fault_of(text);
    CHECK(f.kind == unit_error_kind::dangling_operator);
    CHECK(f.column == text.size());
  }
}
