// Every bad input to the analysis layer is an analysis_error (a std::invalid_argument)
// whose message begins "nondim:" and names the variable concerned (DESIGN.md "Bad input").
#include "analysis_support.hpp"

#include <map>
#include <stdexcept>
#include <string>
#include <vector>
#include "text_support.hpp"

using namespace nondim;
using test_support::repeating;

namespace {

/// The analysis_error thrown by `f`, or a failed check.
template <class Fn>
analysis_error caught(Fn&& f) {
  try {
    f();
  } catch (const analysis_error& e) {
    return e;
  }
  FAIL("no analysis_error thrown");
  return analysis_error("");
}

using test_support::contains;

using test_support::sphere_drag;

}  // namespace

TEST_SUITE("analysis errors") {
  TEST_CASE("analysis_error is an invalid_argument") {
    static_assert(std::is_base_of_v<std::invalid_argument, analysis_error>);  // DESIGN.md public contract
    const analysis_error e("nondim: x", "v");
    CHECK(e.variable() == "v");
  }

  TEST_CASE("an empty variable name says which variable it was") {
    problem p;
    p.add("F", dims::force);
    const auto e = caught([&] { p.add("", dims::length); });
    CHECK(contains(e.what(), "nondim: variable 2 of the problem has an empty name"));
    const auto w = caught([&] { p.add("  ", dims::length); });
    CHECK(contains(w.what(), "empty name"));
    CHECK(p.size() == 1);  // nothing was added
  }

  TEST_CASE("a duplicate variable name is named") {
    problem p;
    p.add("rho", dims::density);
    const auto e = caught([&] { p.add("rho", dims::length); });
    CHECK(contains(e.what(), "nondim: variable 'rho' is already in the problem"));
    CHECK(e.variable() == "rho");
  }

  TEST_CASE("an empty problem cannot be analysed") {
    const auto e = caught([] { (void)analyze(problem{}); });
    CHECK(contains(e.what(), "nondim: the problem has no variables"));
  }

  TEST_CASE("an unknown dependent variable is named") {
    options o;
    o.dependent = "drag";
    const auto e = caught([&] { (void)analyze(sphere_drag(), o); });
    CHECK(contains(e.what(), "the dependent variable 'drag' is not in the problem"));
    CHECK(e.variable() == "drag");
  }

  TEST_CASE("an unknown repeating variable is named") {
    const auto e = caught([] { (void)analyze(sphere_drag(), repeating({"rho", "V", "D"})); });
    CHECK(contains(e.what(), "nondim: repeating variable 'V' is not in the problem"));
    CHECK(e.variable() == "V");
  }

  TEST_CASE("a repeating variable given twice is named") {
    const auto e = caught([] { (void)analyze(sphere_drag(), repeating({"rho", "U", "rho"})); });
    CHECK(contains(e.what(), "repeating variable 'rho' is given twice"));
    CHECK(e.variable() == "rho");
  }

  TEST_CASE("a dimensionless repeating variable is named") {
    problem p = sphere_drag();
    p.add("eps_D", dims::dimensionless);
    const auto e = caught([&] { (void)analyze(p, repeating({"rho", "U", "eps_D"})); });
    CHECK(contains(e.what(), "repeating variable 'eps_D' is dimensionless"));
    CHECK(e.variable() == "eps_D");
  }

  TEST_CASE("too few or too many repeating variables: the count and the rank are given") {
    // rank 3 for M, L, T all present with rho, U, D independent (White, Sec. 5.3, from memory)
    const auto few = caught([] { (void)analyze(sphere_drag(), repeating({"rho", "U"})); });
    CHECK(contains(few.what(), "2 repeating variables given (rho, U) but the rank of the dimension matrix is 3"));
    const auto many = caught([] { (void)analyze(sphere_drag(), repeating({"rho", "U", "D", "mu"})); });
    CHECK(contains(many.what(), "4 repeating variables given (rho, U, D, mu)"));
  }

  TEST_CASE("repeating variables with dependent dimensions: the first dependent one is named with its combination") {
    // eps and d are both lengths (rough pipe, White, Fluid Mechanics, 7th ed., Sec. 6.6)
    problem p;
    p.add("dp", dims::pressure)
        .add("rho", dims::density)
        .add("V", dims::velocity)
        .add("d", dims::length)
        .add("eps", dims::length);
    const auto e = caught([&] { (void)analyze(p, repeating({"d", "eps", "rho"})); });
    CHECK(contains(e.what(), "independent dimensions, but that of 'eps' (L) is the dimension of d,"));
    CHECK(e.variable() == "eps");

    // a velocity is a length over a time (SI Brochure 9th ed., table 4: m s^-1)
    problem q;
    q.add("F", dims::force).add("D", dims::length).add("t", dims::time).add("U", dims::velocity).add("m", dims::mass);
    const auto f = caught([&] { (void)analyze(q, repeating({"D", "t", "U"})); });
    CHECK(contains(f.what(), "that of 'U' (L T^-1) is the dimension of D*t^-1"));
    CHECK(f.variable() == "U");
  }

  TEST_CASE("values for a group: a wrong count, a missing name or a short column is an error naming it") {
    const analysis a = analyze(sphere_drag());
    const pi_group& g = a.groups[0];  // F rho^-1 U^-2 D^-2
    const std::vector<double> three{1.0, 2.0, 3.0};
    CHECK(contains(caught([&] { (void)g.value(three); }).what(), "3 values given for a group of 5 variables"));
    CHECK(contains(caught([&] { (void)a.values(three); }).what(), "3 values given"));

    const std::map<std::string, double> partial{{"F", 1.0}, {"rho", 1.2}, {"D", 0.1}};
    const auto missing = caught([&] { (void)g.value(partial); });
    CHECK(contains(missing.what(), "no value for variable 'U'"));
    CHECK(missing.variable() == "U");

    std::vector<double> cells(4, 1.0);
    std::vector<double> short_column(3, 1.0);
    std::vector<double> out(4);
    std::vector<std::span<const double>> columns{cells, cells, short_column, cells, cells};
    const auto col = caught([&] { g.evaluate(columns, out); });
    CHECK(contains(col.what(), "the column of variable 'U' has 3 cells, the output 4"));
    CHECK(col.variable() == "U");
    columns.pop_back();
    CHECK(contains(caught([&] { g.evaluate(columns, out); }).what(), "4 columns given for a group of 5 variables"));
  }
}
