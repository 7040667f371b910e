// Exception contracts at the extremes: every public entry point, driven with the extremes
// of its inputs, lets only the exception types that README.md "Error model" lists for it
// escape (DESIGN.md "Bad input": whatever the input, only documented types). The extremes:
// exponents at +-(2^63 - 1) and -2^63 (the int64 range, ISO/IEC 14882 [basic.fundamental]),
// zero denominators, empty and over-long texts, the limits of the limits table, NaN and
// infinities (IEEE 754), and problems at the variable limit.
#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>
#include <cstdint>
#include <limits>
#include <map>
#include <stdexcept>
#include <string>
#include <typeinfo>
#include <vector>

#include <nondim/nondim.hpp>

#if defined(NONDIM_TEST_PROBLEM_FILE)  // the program's problem-file reader, when the program is built
#include "messages.hpp"
#include "problem_file.hpp"
#endif

using namespace nondim;

namespace {

constexpr std::int64_t max64 = std::numeric_limits<std::int64_t>::max();
constexpr std::int64_t min64 = std::numeric_limits<std::int64_t>::min();
constexpr double nan_value = std::numeric_limits<double>::quiet_NaN();
constexpr double inf_value = std::numeric_limits<double>::infinity();

enum class outcome { returned, threw_documented, threw_other };

/// Runs `f`: a return, or an exception of one of `Allowed` (exactly those types or types
/// derived from them) passes; any other type fails the test case, naming `where`.
template <class... Allowed, class F>
outcome expect_only(const std::string& where, F&& f) {
  try {
    f();
    return outcome::returned;
  } catch (const std::exception& e) {
    if ((... || (dynamic_cast<const Allowed*>(&e) != nullptr))) return outcome::threw_documented;
    FAIL_CHECK(where, ": undocumented ", std::string(typeid(e).name()), " escaped: ", std::string(e.what()));
  } catch (...) {
    FAIL_CHECK(where, ": an exception not derived from std::exception escaped");
  }
  return outcome::threw_other;
}

/// The extremes of a 64-bit exponent, and values near them.
const std::vector<std::int64_t>& extreme_integers() {
  static const std::vector<std::int64_t> v{0, 1, -1, 2, max64, -max64, min64, max64 - 1, min64 + 1, max64 / 2 + 1};
  return v;
}

/// Rationals at the extremes (every pair of the integers above that makes a rational).
std::vector<rational> extreme_rationals() {
  std::vector<rational> out;
  for (const std::int64_t n : extreme_integers())
    for (const std::int64_t d : extreme_integers()) {
      if (d == 0) continue;
      try {
        out.emplace_back(n, d);
      } catch (const rational_overflow&) {  // n/d with d = -2^63: no 64-bit lowest terms
      }
    }
  return out;
}

/// Dimensions with one extreme exponent in each base, and all seven extreme.
std::vector<dimension> extreme_dimensions() {
  std::vector<dimension> out;
  for (const rational& r : extreme_rationals()) {
    for (std::size_t i = 0; i < base_dimension_count; i += 3) {
      std::array<rational, base_dimension_count> e{};
      e[i] = r;
      out.emplace_back(e);
    }
    std::array<rational, base_dimension_count> all{};
    all.fill(r);
    out.emplace_back(all);
  }
  return out;
}

const std::vector<double>& extreme_doubles() {
  static const std::vector<double> v{0.0,
                                     -0.0,
                                     1.0,
                                     -1.0,
                                     nan_value,
                                     inf_value,
                                     -inf_value,
                                     std::numeric_limits<double>::max(),
                                     std::numeric_limits<double>::lowest(),
                                     std::numeric_limits<double>::min(),
                                     std::numeric_limits<double>::denorm_min()};
  return v;
}

/// Unit and quantity texts at the extremes of the limits table.
std::vector<std::string> extreme_texts() {
  const std::string max_exp = std::to_string(max64);
  std::vector<std::string> t{"",
                             " ",
                             "m",
                             "1",
                             std::string(max_unit_text_bytes, 'm'),
                             std::string(max_unit_text_bytes + 1, 'm'),
                             "m" + std::string(max_unit_text_bytes - 1, ' '),
                             std::string(1U << 20U, '('),
                             std::string(max_unit_nesting, '(') + "m" + std::string(max_unit_nesting, ')'),
                             std::string(max_unit_nesting + 1, '(') + "m" + std::string(max_unit_nesting + 1, ')'),
                             "m^" + max_exp,
                             "m^-" + max_exp,
                             "m^-9223372036854775808",
                             "m^9223372036854775808",
                             "m^(1/0)",
                             "m^(0/0)",
                             "m^(" + max_exp + "/" + std::to_string(max64 - 1) + ")",
                             "m^(1/" + max_exp + ")*m^(1/" + std::to_string(max64 - 1) + ")",
                             "m^" + max_exp + "*m",
                             "m^-" + max_exp + "/m",
                             "m^-" + max_exp + "/m/m",
                             "(m^" + max_exp + ")^" + max_exp,
                             "(m^-" + max_exp + ")^-1",
                             "1e308 m",
                             "1e309 m",
                             "-1e309 m",
                             "1e-400 m",
                             "nan m",
                             "inf m",
                             "NaN",
                             "1e308 km",
                             "1e308 km^" + max_exp,
                             "1e-308 nm^" + max_exp,
                             "degC",
                             "degC^2",
                             "1/degC",
                             "\xff\xfe",
                             "\xce\xbcm",
                             "m\xe2\x81\xbb\xc2\xb9",
                             std::string(4000, '9') + " m"};
  return t;
}

problem sphere_drag() {  // White, Fluid Mechanics, 7th ed., Sec. 5.3, from memory
  problem p;
  p.add("F", dims::force)
      .add("rho", dims::density)
      .add("U", dims::velocity)
      .add("D", dims::length)
      .add("mu", dims::dynamic_viscosity);
  return p;
}

/// Every documented report of an analysis: none may throw but for memory.
void every_report(const analysis& a) {
  expect_only<>("reports", [&] {
    (void)to_string(a);
    (void)to_string(a, text_form::ascii);
    (void)text_report(a);
    (void)markdown_report(a);
    (void)latex_report(a);
    (void)json_report(a);
    (void)variable_scales(a);
    (void)scales_text_report(a);
    (void)scales_markdown_report(a);
    (void)json_scales_report(a);
    for (const auto& g : a.groups) (void)latex(g);
  });
}

/// analyze() of `p` in every basis and arithmetic: analysis_error only; every report of
/// the result then throws nothing.
void analyze_every_way(const problem& p, const std::string& where) {
  for (const basis form : {basis::classical, basis::named})
    for (const exact_arithmetic arithmetic :
         {exact_arithmetic::automatic, exact_arithmetic::int64, exact_arithmetic::multiprecision}) {
      options o;
      o.form = form;
      o.arithmetic = arithmetic;
      analysis a;
      if (expect_only<analysis_error>(where, [&] { a = analyze(p, o); }) == outcome::returned) {
        every_report(a);
        std::vector<double> si(p.size());
        for (const double x : extreme_doubles()) {
          std::fill(si.begin(), si.end(), x);
          expect_only<analysis_error>(where + ": values", [&] { (void)a.values(si); });
        }
      }
    }
}

}  // namespace

TEST_SUITE("exception contracts") {
  TEST_CASE("rational: a zero denominator is a domain_error, a result past 64 bits a rational_overflow") {
    // README error model: rational arithmetic is checked, rational_overflow beyond 64 bits,
    // std::domain_error for a zero denominator.
    for (const std::int64_t n : extreme_integers()) {
      CHECK(expect_only<std::domain_error>("rational(n, 0)", [&] { (void)rational(n, 0); }) ==
            outcome::threw_documented);
      for (const std::int64_t d : extreme_integers())
        if (d != 0) expect_only<rational_overflow>("rational(n, d)", [&] { (void)rational(n, d); });
    }
    // -2^63 in the denominator has no positive 64-bit form: 1/-2^63 is refused, not wrapped
    CHECK(expect_only<rational_overflow>("1/-2^63", [] { (void)rational(1, min64); }) == outcome::threw_documented);
    const auto values = extreme_rationals();
    for (const rational& a : values) {
      expect_only<rational_overflow>("-a", [&] { (void)-a; });
      expect_only<rational_overflow>("abs", [&] { (void)abs(a); });
      expect_only<>("to_string", [&] { (void)to_string(a); });
      for (const rational& b : values) {
        expect_only<rational_overflow>("a + b", [&] { (void)(a + b); });
        expect_only<rational_overflow>("a - b", [&] { (void)(a - b); });
        expect_only<rational_overflow>("a * b", [&] { (void)(a * b); });
        expect_only<rational_overflow, std::domain_error>("a / b", [&] { (void)(a / b); });
        expect_only<>("a <=> b", [&] { (void)(a < b); });
      }
    }
    // -(-2^63) is 2^63, one past the int64 range
    CHECK(expect_only<rational_overflow>("-(-2^63)", [] { (void)-rational{min64}; }) == outcome::threw_documented);
  }

  TEST_CASE("dimension: arithmetic past 64 bits is a rational_overflow; its text forms never throw") {
    const auto dims_at_extremes = extreme_dimensions();
    for (const dimension& a : dims_at_extremes) {
      expect_only<>("to_string(dimension)", [&] {
        (void)to_string(a, text_form::ascii);
        (void)to_string(a, text_form::unicode);
      });
      // the display of the coherent SI unit works on magnitudes: -2^63 is written too
      expect_only<>("si_unit_string", [&] {
        (void)si_unit_string(a, text_form::ascii);
        (void)si_unit_string(a, text_form::unicode);
      });
      expect_only<std::out_of_range>("dimension[7]", [&] { (void)a[base_dimension_count]; });
      for (const dimension& b : {dims_at_extremes.front(), dims_at_extremes.back(), a}) {
        expect_only<rational_overflow>("a * b", [&] { (void)(a * b); });
        expect_only<rational_overflow>("a / b", [&] { (void)(a / b); });
      }
      for (const rational& r : {rational{0}, rational{max64}, rational{min64}, rational{1, max64}, rational{-1, 2}})
        expect_only<rational_overflow>("pow", [&] { (void)pow(a, r); });
    }
  }

  TEST_CASE("the SI unit string of an exponent of -2^63 is written, not an overflow") {
    // -2^63 = -9223372036854775808 (ISO/IEC 14882: the least int64); written under the
    // solidus its magnitude 2^63 is one past int64, so it is formed in uint64
    dimension d{};
    std::array<rational, base_dimension_count> e{};
    e[0] = rational{min64};
    d = dimension{e};
    CHECK(si_unit_string(d, text_form::ascii) == "1/m^9223372036854775808");
    CHECK(si_unit_string(d, text_form::unicode) ==
          "m\u207b\u2079\u00b2\u00b2\u00b3\u00b3\u2077\u00b2\u2070\u00b3\u2076\u2078\u2075\u2074\u2077\u2077\u2075"
          "\u2078\u2070\u2078");
    e[1] = rational{1, min64 + 1};  // kg^(-1/(2^63 - 1)) under the solidus too
    CHECK(si_unit_string(dimension{e}, text_form::ascii) == "1/(kg^(1/9223372036854775807)*m^9223372036854775808)");
    // past the parser's exponent limit (README limits table): a unit_error, not a wrong unit
    try {
      (void)parse_unit(si_unit_string(d, text_form::ascii));
      FAIL("read back");
    } catch (const unit_error& x) {
      CHECK(x.kind() == unit_error_kind::exponent_overflow);
    }
  }

  TEST_CASE("parse_unit, parse_quantity and convert: unit_error and dimension_error only") {
    for (const std::string& t : extreme_texts()) {
      expect_only<unit_error>("parse_unit", [&] { (void)parse_unit(t); });
      expect_only<unit_error>("parse_quantity", [&] { (void)parse_quantity(t); });
      expect_only<unit_error, dimension_error>("parse_quantity<length>",
                                               [&] { (void)parse_quantity<dims::length>(t); });
      for (const double x : extreme_doubles()) {
        expect_only<unit_error, dimension_error>("convert from", [&] { (void)convert(x, t, "m"); });
        expect_only<unit_error, dimension_error>("convert to", [&] { (void)convert(x, "ft", t); });
      }
    }
    // the limits themselves: 4096 bytes read, 4097 refused with kind too_long. The texts are
    // built by append: GCC 12 at -O2 warns falsely (-Warray-bounds) on `std::string(n, ' ') + "m"`.
    const auto spaces_then_m = [](std::size_t spaces) {
      std::string s(spaces, ' ');
      s += 'm';
      return s;
    };
    CHECK(expect_only<unit_error>("4096 bytes", [&] { (void)parse_unit(spaces_then_m(max_unit_text_bytes - 1)); }) ==
          outcome::returned);
    try {
      (void)parse_unit(spaces_then_m(max_unit_text_bytes));
      FAIL("read");
    } catch (const unit_error& x) {
      CHECK(x.kind() == unit_error_kind::too_long);
    }
  }

  TEST_CASE("problem::add at the extremes: analysis_error only, and a variable of exponent -2^63 is kept") {
    // the input the analysis fuzzer found (tests/fuzz/corpus/analyze/exponent_min_int64)
    std::array<rational, base_dimension_count> e{};
    e[0] = rational{min64};
    problem p;
    CHECK(expect_only<analysis_error>("add -2^63", [&] { p.add("x", dimension{e}); }) == outcome::returned);
    REQUIRE(p.size() == 1);
    CHECK(p[0].unit == "1/m^9223372036854775808");
    CHECK(p[0].dim[0] == rational{min64});
    p.add("L", dims::length);
    // x L^(2^63) is dimensionless, but its exponent 2^63 is past int64: refused with the
    // analysis_error of the limits table, the exact arithmetic having gone past 64 bits
    analyze_every_way(p, "analyze -2^63");
    try {
      (void)analyze(p);
      FAIL("analysed");
    } catch (const analysis_error& x) {
      CHECK(std::string(x.what()).find("9223372036854775808") != std::string::npos);
      CHECK(x.variable() == "x");
    }
    for (const dimension& d : extreme_dimensions()) {
      problem q;
      expect_only<analysis_error>("add(dimension)", [&] { q.add("a", d).add("b", dims::length).add("c", d); });
      analyze_every_way(q, "analyze extremes");
    }
    for (const std::string& t : extreme_texts()) {
      problem q;
      expect_only<analysis_error>("add(unit text)", [&] { q.add("a", t); });
    }
    // names: empty, blank, repeated; the 1001st variable
    problem q;
    CHECK(expect_only<analysis_error>("empty name", [&] { q.add("", dims::length); }) == outcome::threw_documented);
    CHECK(expect_only<analysis_error>("blank name", [&] { q.add(" \t", "m"); }) == outcome::threw_documented);
    for (std::size_t i = 0; i < max_problem_variables; ++i) q.add("v" + std::to_string(i), dims::length);
    CHECK(expect_only<analysis_error>("1001st", [&] { q.add("w", dims::length); }) == outcome::threw_documented);
    CHECK(expect_only<analysis_error>("repeated", [&] {
            problem r;
            r.add("a", "m").add("a", "m");
          }) == outcome::threw_documented);
    CHECK(expect_only<std::out_of_range>("p[size]", [&] { (void)q[q.size()]; }) == outcome::threw_documented);
  }

  TEST_CASE("analyze: analysis_error only, for bad options and for problems at the limits") {
    const problem p = sphere_drag();
    for (const std::string& name :
         {std::string{}, std::string("nope"), std::string("F"), std::string(1U << 16U, 'x')}) {
      options o;
      o.dependent = name;
      expect_only<analysis_error>("dependent", [&] { (void)analyze(p, o); });
      o.repeating = {name, name, "rho"};
      expect_only<analysis_error>("repeating", [&] { (void)analyze(p, o); });
    }
    expect_only<analysis_error>("empty problem", [] { (void)analyze(problem{}); });
    // 1000 variables of prime-power dimensions (the limit of the limits table), named basis too
    problem big;
    for (std::size_t i = 0; i < 200; ++i) {
      std::array<rational, base_dimension_count> e{};
      e[i % base_dimension_count] = rational{static_cast<std::int64_t>(i) + 1, static_cast<std::int64_t>(i % 5) + 1};
      e[(i + 1) % base_dimension_count] = rational{max64 - static_cast<std::int64_t>(i)};
      big.add("v" + std::to_string(i), dimension{e});
    }
    analyze_every_way(big, "analyze 200 extreme variables");
  }

  TEST_CASE("group values: analysis_error only, for NaN, infinities, zeros and overflow") {
    const analysis a = analyze(sphere_drag());
    for (const double x : extreme_doubles())
      for (const double y : extreme_doubles()) {
        const std::vector<double> si{x, y, 1.0, x, y};
        for (const auto& g : a.groups) {
          expect_only<analysis_error>("value", [&] { (void)g.value(si); });
          const std::map<std::string, double> named{{"F", x}, {"rho", y}, {"U", 1.0}, {"D", x}};
          expect_only<analysis_error>("value(map)", [&] { (void)g.value(named); });
          const std::vector<double> col{x, y, x};
          const std::vector<std::span<const double>> columns{col, col, col, col, col};
          std::vector<double> out(3);
          expect_only<analysis_error>("evaluate", [&] { g.evaluate(columns, out); });
          const std::vector<std::span<const double>> short_columns{col, col};
          expect_only<analysis_error>("evaluate columns", [&] { g.evaluate(short_columns, out); });
        }
        expect_only<analysis_error>("values", [&] { (void)a.values(si); });
        expect_only<analysis_error>("values wrong size", [&] { (void)a.values(std::vector<double>{x}); });
      }
  }

  TEST_CASE("runtime_scales: scales_error, unit_error and dimension_error only") {
    for (const double x : extreme_doubles()) {
      runtime_scales s;
      expect_only<scales_error>("add(d)", [&] { s.add("L_ref", dims::length, x); });
      for (const std::string& t : extreme_texts()) {
        runtime_scales r;
        expect_only<scales_error, unit_error>("add(value, unit)", [&] { r.add("r", x, t); });
        expect_only<scales_error, unit_error>("add(quantity text)", [&] { r.add("q", t); });
      }
      for (const dimension& d : extreme_dimensions()) {
        runtime_scales r;
        expect_only<scales_error>("add(extreme d)", [&] { r.add("r", d, 2.0).add("s", dims::length, 3.0); });
        expect_only<scales_error>("scale(d)", [&] { (void)r.scale(d); });
        expect_only<scales_error>("nondimensional(d)", [&] { (void)r.nondimensional(x, d); });
        expect_only<scales_error>("dimensional(d)", [&] { (void)r.dimensional(x, d); });
        expect_only<>("spans", [&] { (void)r.spans(d); });
      }
    }
    runtime_scales s;
    s.add("rho_ref", 998.2, "kg/m^3").add("U_ref", "0.3 m/s").add("L_ref", "0.1 m").add("T_ref", 300.0, "K");
    for (const std::string& t : extreme_texts())
      for (const double x : extreme_doubles()) {
        expect_only<scales_error, unit_error>("scale(text)", [&] { (void)s.scale(t); });
        expect_only<scales_error, unit_error>("nondimensional(text)", [&] { (void)s.nondimensional(x, t); });
        expect_only<scales_error, unit_error>("dimensional(text)", [&] { (void)s.dimensional(x, t); });
        expect_only<scales_error, unit_error, dimension_error>("nondimensional_difference",
                                                               [&] { (void)s.nondimensional_difference(x, x, t); });
        expect_only<scales_error, unit_error, dimension_error>("dimensional_point",
                                                               [&] { (void)s.dimensional_point(x, x, t); });
        const std::vector<double> in{x, x};
        std::vector<double> out(3);
        expect_only<scales_error, unit_error>("fields", [&] { s.nondimensional(in, t, out); });
      }
  }

  TEST_CASE("names: recognize and named_basis throw std::invalid_argument only") {
    const std::vector<group_variable> vars{{"rho", dims::density, {}},
                                           {"U", dims::velocity, {}},
                                           {"D", dims::length, {}},
                                           {"mu", dims::dynamic_viscosity, {}}};
    for (const std::int64_t e : extreme_integers()) {
      const std::vector<std::int64_t> ints{e, e, e, e == min64 ? e : -e};
      expect_only<std::invalid_argument>("recognize", [&] { (void)recognize(vars, ints); });
      const std::vector<rational> rats{rational{e}, rational{1, e == 0 || e == min64 ? 1 : e}, rational{e},
                                       rational{e}};
      expect_only<std::invalid_argument>("recognize rational", [&] { (void)recognize(vars, rats); });
      const group_recognizer r(vars);
      expect_only<std::invalid_argument>("recognizer", [&] { (void)r(ints); });
      expect_only<std::invalid_argument>("recognizer short", [&] { (void)r(std::span(ints).first(2)); });
      const std::vector<std::vector<std::int64_t>> groups{ints};
      // named_basis: a named group past 64 bits is a rational_overflow (analyze() keeps
      // the classical groups then); Re^e is dimensionless for every e and not refused
      CHECK(expect_only<std::invalid_argument, rational_overflow>(
                "named_basis", [&] { (void)named_basis(vars, groups); }) != outcome::threw_other);
      if (e != min64 && e != 0)  // -2^63 has no negation; 0 is no group
        try {
          (void)named_basis(vars, groups);
        } catch (const std::invalid_argument& x) {
          FAIL_CHECK("Re^", e, " refused: ", std::string(x.what()));
        } catch (const rational_overflow&) {
        }
      expect_only<std::invalid_argument>("named_basis index", [&] { (void)named_basis(vars, groups, 17); });
    }
  }

  TEST_CASE("plan_similarity: similarity_error only, for every extreme value and exponent") {
    for (const double x : extreme_doubles())
      for (const std::int64_t e : extreme_integers()) {
        similarity_problem p;
        p.add(make_similarity_variable("F", "N", x, std::nullopt));
        p.add(make_similarity_variable("rho", "kg/m^3", 1000.0, x));
        p.add(make_similarity_variable("U", "m/s", x, std::nullopt));
        p.add(make_similarity_variable("D", "m", 2.0, 0.1));
        p.add(make_similarity_variable("mu", "Pa*s", 1e-3, 1e-3));
        p.dependent = "F";
        p.add_group({1, -1, -2, -2, 0}, "C_F").add_group({0, 1, 1, 1, -1}, "Re").add_group({e, e, 0, e, e});
        p.priority = {1, static_cast<std::size_t>(e)};
        p.tolerance = x;
        // standard uncertainties at the extremes too: the propagation plans perturbed values
        p.variables[1].prototype_uncertainty = x;
        p.variables[3].prototype_uncertainty = 0.01;
        p.variables[3].model_uncertainty = x;
        similarity_plan plan;
        if (expect_only<similarity_error>("plan_similarity", [&] { plan = plan_similarity(p); }) == outcome::returned)
          expect_only<>("to_text", [&] { (void)to_text(plan); });
        expect_only<similarity_error>("variable()", [&] { (void)p.variable("nope"); });
        expect_only<similarity_error>("group_index()", [&] { (void)p.group_index("nope"); });
      }
    for (const std::string& t : extreme_texts())
      expect_only<unit_error>("make_similarity_variable", [&] { (void)make_similarity_variable("x", t); });
  }

  TEST_CASE("exact_null_space: analysis_error only") {
    for (const dimension& d : extreme_dimensions()) {
      const dimension_matrix m({d, dims::length, d, dims::velocity});
      for (const exact_arithmetic a :
           {exact_arithmetic::automatic, exact_arithmetic::int64, exact_arithmetic::multiprecision})
        expect_only<analysis_error>("exact_null_space", [&] { (void)exact_null_space(m, a); });
      expect_only<std::out_of_range>("matrix()", [&] { (void)m(base_dimension_count, 0); });
      expect_only<std::out_of_range>("column()", [&] { (void)m.column(4); });
    }
  }

  TEST_CASE("design point and its group values: analysis_error only, for every extreme value and uncertainty") {
    problem p = sphere_drag();
    p.add("T", "degC");
    const analysis a = analyze(p);
    for (const double x : extreme_doubles())
      for (const double u : extreme_doubles()) {
        for (std::size_t i = 0; i < p.size(); ++i) {
          expect_only<analysis_error>("in_si", [&] { (void)in_si(p[i], x, u); });
          expect_only<analysis_error>("in_si_relative", [&] { (void)in_si_relative(p[i], x, u); });
        }
        design_point point;
        expect_only<analysis_error>("design_point::set", [&] { point.set("F", measured_value{x, u}); });
        expect_only<analysis_error>("design_point::set(problem)", [&] { point.set(p, "rho", x, u); });
        expect_only<analysis_error>("design_point::set_relative", [&] { point.set_relative(p, "U", x, u); });
        expect_only<analysis_error>("design_point::set unknown", [&] { point.set(p, "nope", x, u); });
        expect_only<analysis_error>("design_point::set empty", [&] { point.set("", measured_value{x, u}); });
        for (const auto& g : a.groups)
          expect_only<analysis_error>("evaluate(point)", [&] { (void)evaluate(g, point); });
        expect_only<analysis_error>("group_values", [&] { (void)group_values(a, point); });
        const std::vector<double> xs{x, u, 1.0};
        const std::vector<double> short_span{x};
        expect_only<analysis_error>("product_uncertainty", [&] { (void)product_uncertainty(xs, xs, xs); });
        expect_only<analysis_error>("product_uncertainty sizes",
                                    [&] { (void)product_uncertainty(xs, short_span, xs); });
        expect_only<>("round_for_report", [&] { (void)round_for_report(x, u); });
      }
  }

  TEST_CASE("temperatures read from text: unit_error (temperature_error below 0 K) and dimension_error only") {
    for (const std::string& text :
         std::vector<std::string>{"", "40 degC", "-300 degC", "-1e308 degF", "1e308 K", "40 deg C", "5 m", "nan K",
                                  "-273.15 degC", "-459.68 degF", "0 degR", std::string(5000, '9')}) {
      expect_only<unit_error, dimension_error>("parse_temperature_point " + text,
                                               [&] { (void)parse_temperature_point(text); });
      expect_only<unit_error, dimension_error>("parse_temperature_difference " + text,
                                               [&] { (void)parse_temperature_difference(text); });
      expect_only<unit_error, dimension_error>("parse_quantity<temperature> " + text,
                                               [&] { (void)parse_quantity<dims::temperature>(text); });
    }
    // below absolute zero is the typed error, with the value in kelvin (SI Brochure: 0 K is absolute zero)
    CHECK_THROWS_AS((void)parse_temperature_point("-300 degC"), temperature_error);
    CHECK(expect_only<unit_error>("convert", [] { (void)convert(-300.0, "degC", "K"); }) == outcome::threw_documented);
  }

  TEST_CASE("whole-field conversions and state views: field_size_error only, nothing written") {
    const auto s = scales(1.2 * units::kg / units::m3, 10.0 * units::m / units::s, 0.5 * units::m);
    std::vector<double> storage{1.0, 2.0, 3.0};
    const field_view<dims::pressure> v{std::span<double>(storage)};
    for (const std::size_t n : {std::size_t{0}, std::size_t{2}, std::size_t{4}, std::size_t{1000}}) {
      std::vector<double> out(n, -1.0);
      CHECK(expect_only<field_size_error>("nondimensional", [&] { s.nondimensional(v, out); }) ==
            outcome::threw_documented);
      CHECK(std::all_of(out.begin(), out.end(), [](double y) { return y == -1.0; }));
      CHECK(expect_only<field_size_error>("dimensional", [&] { s.dimensional(out, v); }) == outcome::threw_documented);
      CHECK(storage == std::vector<double>{1.0, 2.0, 3.0});
    }
  }
#if defined(NONDIM_TEST_PROBLEM_FILE)
  // The program's reader of problem files (tools/nondim/problem_file.hpp): input_error only,
  // one message beginning "nondim: ", whatever the text (README: the program exits 2 with
  // one message on bad input; the schema is DESIGN.md's). TOML syntax: TOML v1.0.0.
  TEST_CASE("problem-file text: input_error only, for every extreme text, value and size") {
    const auto variable = [](const std::string& body) { return "[[variable]]\nname = \"x\"\nunit = \"m\"\n" + body; };
    std::vector<std::string> texts{
        "",
        " ",
        std::string("\0\0\0", 3),
        "\xff\xfe",
        "t\xe2\xba\x95",  // U+2E95 after a bare key: a fault of toml++ 3.3's white-space table (issue 18)
        "title = \"\xe2\xba\x95\"\n" + variable(""),
        "# \xe2\xba\x95\n" + variable(""),
        "\xe2\xba\x95 = 1\n" + variable(""),
        std::string(100000, '['),
        "a = " + std::string(100000, '[') + std::string(100000, ']'),
        "a = " + std::string(100000, '{'),
        "title = 1",
        "[[variable]]",
        variable(""),
        variable("prototype = 9223372036854775807\nmodel = -9223372036854775808"),
        variable("prototype = 9223372036854775808"),
        variable("prototype = 0x7fffffffffffffff\nmodel = 0b1"),
        variable("prototype = 1e309"),
        variable("prototype = -1e308\nmodel = 5e-324"),
        variable("prototype = nan\nmodel = inf"),
        variable("prototype = -inf"),
        variable("value = \"1e999 m\""),
        variable("value = \"nan m\"\nuncertainty = \"-inf m\""),
        variable("value = 1.0\nuncertainty = -1.0"),
        variable("value = \"" + std::string(5000, '9') + " m\""),
        variable("prototype = [1, 2]\nmodel = { a = 1 }"),
        variable("note = 1979-05-27T07:32:00Z"),
        variable("kind = \"" + std::string(5000, 'k') + "\""),
        "[[variable]]\nname = \"" + std::string(5000, 'x') + "\"\nunit = \"" + std::string(5000, 'm') + "\"\n",
        "[[variable]]\nname = \"a\\u0000b\"\nunit = \"m\"\n",
        "[[variable]]\nname = \"x\"\nunit = \"m^9223372036854775807*m\"\n",
        "[[variable]]\nname = \"x\"\nunit = \"" + std::string(max_unit_nesting + 1, '(') + "m" +
            std::string(max_unit_nesting + 1, ')') + "\"\n",
        "dependent = \"\"\nrepeating = []\n" + variable(""),
        "dependent = \"y\"\nrepeating = [\"x\", \"x\", 1]\n" + variable(""),
        "# " + std::string(nondim::tool::max_problem_file_bytes, 'c') + "\n" + variable(""),
    };
    std::string many;  // one variable past the limit of a problem
    for (std::size_t i = 0; i <= max_problem_variables; ++i)
      many += "[[variable]]\nname = \"v" + std::to_string(i) + "\"\nunit = \"m\"\n";
    texts.push_back(many);
    for (const std::string& text : texts) {
      const std::string where = "parse_problem_text of " + std::to_string(text.size()) + " bytes";
      try {
        (void)nondim::tool::parse_problem_text(text, "extreme.toml");
      } catch (const nondim::tool::input_error& e) {
        CHECK_MESSAGE(std::string(e.what()).rfind("nondim: ", 0) == 0, where, ": ", std::string(e.what()));
      } catch (const std::exception& e) {
        FAIL_CHECK(where, ": undocumented ", std::string(typeid(e).name()), " escaped: ", std::string(e.what()));
      }
    }
    // a problem past the variable limit is read; the analysis refuses its last variable
    // (problem::add: analysis_error naming it), as `nondim groups --file` does
    const nondim::tool::problem_file f = nondim::tool::parse_problem_text(many, "many.toml");
    REQUIRE(f.variables.size() == max_problem_variables + 1);
    problem p;
    CHECK(expect_only<analysis_error>("problem::add from a file", [&] {
            for (const auto& v : f.variables) p.add(v.name, v.unit);
          }) == outcome::threw_documented);
    CHECK(p.size() == max_problem_variables);
    // files: none, a directory, a device that never ends (read no further than the 1 MiB limit)
    for (const std::string path : {"", "/nonexistent/problem.toml", "/", "/dev/zero"})
      CHECK_THROWS_AS((void)nondim::tool::load_problem_file(path), nondim::tool::input_error);
  }
#endif
}
