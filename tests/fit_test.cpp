// Tests of nondim/analysis/data/fit.hpp and student_t.hpp: power-law fits in the
// logarithms on spans of values. The estimates, standard errors and intervals are also
// checked against python3-statsmodels through the program (tests/data/check_fit.py).
#include <nondim/data.hpp>

#include <doctest/doctest.h>

#include <cmath>
#include <limits>
#include <random>
#include <string>
#include <vector>
#include "text_support.hpp"

using namespace nondim;

namespace {

using test_support::contains;

template <class F>
fit_error fit_error_of(F f) {
  try {
    f();
  } catch (const fit_error& e) {
    return e;
  }
  FAIL("no fit_error thrown");
  return fit_error("", fit_fault::shape);
}

/// Rows of a pipe-flow rig: Re and Pr on a log-uniform grid, Nu from Dittus-Boelter,
/// Nu = 0.023 Re^0.8 Pr^0.4 (Incropera et al., Fundamentals of Heat and Mass Transfer,
/// 6th ed., eq. 8.60, heating), times a log-normal scatter of `sigma`.
struct rig_data {
  std::vector<double> nu, re, pr;
};
rig_data dittus_boelter(std::size_t n, double sigma, unsigned seed) {
  std::mt19937 random(seed);
  std::uniform_real_distribution<double> ln_re(std::log(1e4), std::log(1e5));
  std::uniform_real_distribution<double> ln_pr(std::log(0.7), std::log(100.0));
  std::normal_distribution<double> noise(0.0, sigma);
  rig_data d;
  for (std::size_t i = 0; i < n; ++i) {
    const double re = std::exp(ln_re(random));
    const double pr = std::exp(ln_pr(random));
    d.re.push_back(re);
    d.pr.push_back(pr);
    d.nu.push_back(0.023 * std::pow(re, 0.8) * std::pow(pr, 0.4) * std::exp(noise(random)));
  }
  return d;
}

fit_input input_of(const rig_data& d) {
  return fit_input{{"Nu", d.nu}, {{"Re", d.re}, {"Pr", d.pr}}, {}, {}};
}

}  // namespace

TEST_SUITE("student_t") {
  TEST_CASE("the quantiles match the published table of Student's t") {
    // NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.6.7.2, upper critical values of
    // Student's t, column 0.025, to half a unit of the third printed decimal
    CHECK(std::abs(student_t_quantile(0.975, 1) - 12.706) <= 5e-4);
    CHECK(std::abs(student_t_quantile(0.975, 2) - 4.303) <= 5e-4);
    CHECK(std::abs(student_t_quantile(0.975, 5) - 2.571) <= 5e-4);
    CHECK(std::abs(student_t_quantile(0.975, 10) - 2.228) <= 5e-4);
    CHECK(std::abs(student_t_quantile(0.975, 30) - 2.042) <= 5e-4);
    CHECK(std::abs(student_t_quantile(0.975, 100) - 1.984) <= 5e-4);
    // the same table, column 0.005
    CHECK(std::abs(student_t_quantile(0.995, 10) - 3.169) <= 5e-4);
    CHECK(std::abs(student_t_quantile(0.995, 3) - 5.841) <= 5e-4);
  }
  TEST_CASE("the quantile inverts the distribution function in both tails and at large dof") {
    for (const double dof : {1.0, 2.0, 3.0, 7.5, 40.0, 1e6})
      for (const double p : {1e-10, 0.01, 0.3, 0.5, 0.8, 0.975, 1 - 1e-9}) {
        const double t = student_t_quantile(p, dof);
        CHECK(std::isfinite(t));
        CHECK(student_t_cdf(t, dof) == doctest::Approx(p).epsilon(1e-9));
      }
    // with a million degrees of freedom, the normal quantile 1.959964 (Abramowitz and
    // Stegun, table 26.1, from memory)
    CHECK(student_t_quantile(0.975, 1e6) == doctest::Approx(1.959966).epsilon(1e-6));
  }
  TEST_CASE("quantiles outside (0, 1) are refused") {
    CHECK_THROWS_AS((void)student_t_quantile(1.0, 3), std::domain_error);
    CHECK_THROWS_AS((void)student_t_quantile(0.5, 0), std::domain_error);
    CHECK_THROWS_AS((void)student_t_quantile(std::nan(""), 3), std::domain_error);
  }
}

TEST_SUITE("fit") {
  TEST_CASE("Dittus-Boelter data with scatter give back their exponents within the intervals") {
    const rig_data d = dittus_boelter(60, 0.03, 7);
    const fit_result r = fit_power_law(input_of(d));
    REQUIRE(r.terms.size() == 2);
    CHECK(r.n == 60);
    CHECK(r.dof == 57);
    CHECK(r.terms[0].name == "Re");
    CHECK(r.terms[0].exponent.low < 0.8);
    CHECK(r.terms[0].exponent.high > 0.8);
    CHECK(r.terms[1].exponent.low < 0.4);
    CHECK(r.terms[1].exponent.high > 0.4);
    CHECK(r.coefficient.low < 0.023);
    CHECK(r.coefficient.high > 0.023);
    // intervals of a 3 % scatter over a decade are tight
    CHECK(r.terms[0].exponent.high - r.terms[0].exponent.low < 0.1);
    CHECK(r.r2 > 0.99);
    CHECK(r.rms_relative == doctest::Approx(0.03).epsilon(0.3));
    CHECK(r.within_20 == 1.0);
    CHECK(r.predict(std::vector<double>{1e4, 1.0}) == doctest::Approx(0.023 * std::pow(1e4, 0.8)).epsilon(0.05));
  }
  TEST_CASE("cylinder data from Hilpert's correlation give back C and m with the Prandtl exponent held") {
    // Hilpert's correlation for a cylinder in crossflow, Nu = C Re^m Pr^(1/3), with
    // C = 0.193 and m = 0.618 for 4000 <= Re <= 40000 (Incropera et al., Fundamentals of
    // Heat and Mass Transfer, 6th ed., eq. 7.52 and Table 7.2, from memory); a 4 % scatter
    std::mt19937 random(23);
    std::uniform_real_distribution<double> ln_re(std::log(4000.0), std::log(40000.0));
    std::uniform_real_distribution<double> ln_pr(std::log(0.7), std::log(7.0));
    std::normal_distribution<double> noise(0.0, 0.04);
    rig_data d;
    for (int i = 0; i < 40; ++i) {
      d.re.push_back(std::exp(ln_re(random)));
      d.pr.push_back(std::exp(ln_pr(random)));
      d.nu.push_back(0.193 * std::pow(d.re.back(), 0.618) * std::cbrt(d.pr.back()) * std::exp(noise(random)));
    }
    fit_input in = input_of(d);
    in.fixed = {std::nullopt, 1.0 / 3.0};  // the Prandtl exponent as the correlation gives it
    const fit_result r = fit_power_law(in);
    REQUIRE(r.terms.size() == 2);
    CHECK(r.dof == 38);  // 40 rows, two parameters fitted (C and m)
    CHECK(r.terms[1].fixed);
    CHECK(r.terms[1].exponent.value == doctest::Approx(1.0 / 3.0));
    CHECK(r.terms[0].exponent.low < 0.618);
    CHECK(r.terms[0].exponent.high > 0.618);
    CHECK(r.coefficient.low < 0.193);
    CHECK(r.coefficient.high > 0.193);
  }
  TEST_CASE("exact data give the exponents to rounding and a zero scatter") {
    const rig_data d = dittus_boelter(10, 0.0, 3);
    const fit_result r = fit_power_law(input_of(d));
    CHECK(r.terms[0].exponent.value == doctest::Approx(0.8).epsilon(1e-10));
    CHECK(r.terms[1].exponent.value == doctest::Approx(0.4).epsilon(1e-10));
    CHECK(r.coefficient.value == doctest::Approx(0.023).epsilon(1e-9));
    CHECK(r.max_relative < 1e-10);
    CHECK(r.outliers.empty());
  }
  TEST_CASE("a group constant over the data is reported, not fitted") {
    rig_data d = dittus_boelter(20, 0.02, 11);
    for (std::size_t i = 0; i < d.pr.size(); ++i) {
      d.nu[i] *= std::pow(0.71 / d.pr[i], 0.4);
      d.pr[i] = 0.71;  // air (Incropera, table A.4, 300 K)
    }
    const fit_result r = fit_power_law(input_of(d));
    REQUIRE(r.constant.size() == 1);
    CHECK(r.constant[0].name == "Pr");
    CHECK(r.constant[0].value == doctest::Approx(0.71));
    REQUIRE(r.terms.size() == 1);
    CHECK(r.parameters == 2);
    // the constant's power is held in C: 0.023 * 0.71^0.4
    CHECK(r.coefficient.low < 0.023 * std::pow(0.71, 0.4));
    CHECK(r.coefficient.high > 0.023 * std::pow(0.71, 0.4));
  }
  TEST_CASE("a held exponent is not fitted and the others are fitted around it") {
    const rig_data d = dittus_boelter(30, 0.02, 5);
    fit_input in = input_of(d);
    in.fixed = {std::nullopt, 1.0 / 3.0};
    const fit_result r = fit_power_law(in);
    REQUIRE(r.terms.size() == 2);
    CHECK(r.terms[1].fixed);
    CHECK(r.terms[1].exponent.value == doctest::Approx(1.0 / 3.0));
    CHECK(r.terms[1].exponent.std_error == 0.0);
    CHECK(r.parameters == 2);
    // Pr^0.4 read as Pr^(1/3) leaves a poorer fit than the free one
    CHECK(r.rms_relative > fit_power_law(input_of(d)).rms_relative);
  }
  TEST_CASE("equal weights change nothing; weights pull the fit towards the sure rows") {
    const rig_data d = dittus_boelter(25, 0.05, 13);
    const std::vector<double> same(25, 0.02);
    fit_input in = input_of(d);
    in.relative_uncertainty = same;
    const fit_result weighted = fit_power_law(in);
    const fit_result plain = fit_power_law(input_of(d));
    CHECK(weighted.weighted);
    CHECK(weighted.terms[0].exponent.value == doctest::Approx(plain.terms[0].exponent.value).epsilon(1e-12));
    CHECK(weighted.terms[0].exponent.std_error == doctest::Approx(plain.terms[0].exponent.std_error).epsilon(1e-9));
    std::vector<double> u(25, 1.0);
    u[0] = 1e-4;  // row 0 is a thousand times surer than the others: the fit passes through it
    in.relative_uncertainty = u;
    const fit_result pulled = fit_power_law(in);
    CHECK(std::abs(pulled.predict(std::vector<double>{d.re[0], d.pr[0]}) / d.nu[0] - 1.0) < 1e-3);
  }
  TEST_CASE("a row far off the others is flagged, not dropped") {
    rig_data d = dittus_boelter(40, 0.02, 17);
    d.nu[12] *= 1.5;
    const fit_result r = fit_power_law(input_of(d));
    REQUIRE(r.outliers.size() == 1);
    CHECK(r.outliers[0].row == 12);
    CHECK(r.outliers[0].studentized > 3.0);
    CHECK(r.n == 40);
    CHECK(r.max_relative_row == 12);
  }
  TEST_CASE("a value without a logarithm is refused with its row and column") {
    rig_data d = dittus_boelter(10, 0.01, 1);
    for (const double bad :
         {0.0, -2.0, std::numeric_limits<double>::quiet_NaN(), std::numeric_limits<double>::infinity()}) {
      rig_data copy = d;
      copy.pr[4] = bad;
      const fit_error e = fit_error_of([&] { (void)fit_power_law(input_of(copy)); });
      CHECK(e.fault() == fit_fault::bad_value);
      CHECK(e.column() == "Pr");
      CHECK(e.row() == 4u);
      CHECK(contains(e.what(), "row 5, Pr: the value"));
    }
  }
  TEST_CASE("fewer rows than the parameters need is refused") {
    const rig_data d = dittus_boelter(3, 0.01, 1);
    const fit_error e = fit_error_of([&] { (void)fit_power_law(input_of(d)); });
    CHECK(e.fault() == fit_fault::too_few_rows);
    CHECK(contains(e.what(), "3 rows for 3 parameters"));
  }
  TEST_CASE("two proportional groups make the design singular, naming both") {
    rig_data d = dittus_boelter(10, 0.01, 1);
    for (std::size_t i = 0; i < d.pr.size(); ++i) d.pr[i] = 2.0 * std::sqrt(d.re[i]);
    const fit_error e = fit_error_of([&] { (void)fit_power_law(input_of(d)); });
    CHECK(e.fault() == fit_fault::singular_design);
    CHECK(contains(e.what(), "Re and Pr are powers of each other"));
    // three groups where one is the product of the others
    rig_data t = dittus_boelter(10, 0.01, 2);
    std::vector<double> third;
    for (std::size_t i = 0; i < t.re.size(); ++i) third.push_back(t.re[i] * t.pr[i]);
    fit_input in{{"Nu", t.nu}, {{"Re", t.re}, {"Pr", t.pr}, {"Pe", third}}, {}, {}};
    const fit_error f = fit_error_of([&] { (void)fit_power_law(in); });
    CHECK(f.fault() == fit_fault::singular_design);
    CHECK(contains(f.what(), "product of powers of the other groups"));
  }
  TEST_CASE("columns of different lengths and bad weights are refused") {
    const rig_data d = dittus_boelter(10, 0.01, 1);
    std::vector<double> short_pr(d.pr.begin(), d.pr.begin() + 5);
    fit_input in{{"Nu", d.nu}, {{"Re", d.re}, {"Pr", short_pr}}, {}, {}};
    CHECK(fit_error_of([&] { (void)fit_power_law(in); }).fault() == fit_fault::shape);
    std::vector<double> u(10, 0.01);
    u[6] = 0.0;
    fit_input w = input_of(d);
    w.relative_uncertainty = u;
    const fit_error e = fit_error_of([&] { (void)fit_power_law(w); });
    CHECK(e.row() == 6u);
    CHECK(contains(e.what(), "row 7: the relative uncertainty of Nu is 0"));
  }
}
