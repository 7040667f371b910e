// Values of groups from SI values: by span, by name, and over whole fields of cells, the
// last without allocating (for use inside a solver loop).
#include "analysis_support.hpp"

#include <atomic>
#include <cmath>
#include <cstdlib>
#include <limits>
#include <map>
#include <new>
#include <span>
#include <string>
#include <unordered_map>
#include <utility>
#include <vector>

namespace {
std::atomic<std::size_t> allocations{0};
}  // namespace

// Count every allocation of the test program, to show that field evaluation makes none.
[[gnu::noinline]] void* operator new(std::size_t size) {
  ++allocations;
  if (void* p = std::malloc(size == 0 ? 1 : size)) return p;
  throw std::bad_alloc();
}
// std::stable_sort takes its buffer with the nothrow form: it must come from malloc too,
// since the delete below frees (AddressSanitizer reports the mismatch otherwise).
[[gnu::noinline]] void* operator new(std::size_t size, const std::nothrow_t&) noexcept {
  ++allocations;
  return std::malloc(size == 0 ? 1 : size);
}
[[gnu::noinline]] void operator delete(void* p) noexcept {
  std::free(p);
}
[[gnu::noinline]] void operator delete(void* p, std::size_t) noexcept {
  std::free(p);
}
// The array forms too, so that every allocation and its release pair malloc with free
// (AddressSanitizer reports a sanitizer's new[] released by this free as a mismatch).
[[gnu::noinline]] void* operator new[](std::size_t size) {
  return ::operator new(size);
}
[[gnu::noinline]] void operator delete[](void* p) noexcept {
  ::operator delete(p);
}
[[gnu::noinline]] void operator delete[](void* p, std::size_t) noexcept {
  ::operator delete(p);
}

using namespace nondim;

namespace {

using test_support::sphere_drag;

}  // namespace

TEST_SUITE("analysis evaluation") {
  TEST_CASE("a group's value from SI values in order equals the hand formula") {
    // Water at about 20 °C in a 50 mm pipe at 2 m/s: Re = rho U D / mu = 998 * 2 * 0.05 / 1e-3
    // = 99800 (common practice, no source).
    const analysis a = analyze(sphere_drag());
    const std::vector<double> si{0.8, 998.0, 2.0, 0.05, 1.0e-3};
    CHECK(a.groups[1].value(si) == doctest::Approx(1.0 / 99800.0).epsilon(1e-14));
    CHECK(a.groups[0].value(si) == doctest::Approx(0.8 / (998.0 * 4.0 * 0.0025)).epsilon(1e-14));
    const std::vector<double> all = a.values(si);
    REQUIRE(all.size() == 2);
    CHECK(all[1] == a.groups[1].value(si));

    // the same from quantities of <nondim/quantity.hpp> (SI values read with .si())
    const auto rho = 998.0 * units::kg / units::m3;
    const auto U = 2.0 * units::m / units::s;
    const auto D = 5.0 * units::cm;
    const auto mu = 1.0e-3 * units::Pa * units::s;
    const double Re = rho * U * D / mu;
    CHECK(1.0 / a.groups[1].value(std::vector<double>{0.0, rho.si(), U.si(), D.si(), mu.si()}) ==
          doctest::Approx(Re).epsilon(1e-12));
  }

  TEST_CASE("a group's value by name needs only the variables it contains") {
    // Pendulum: t = 2 pi sqrt(L/g) gives t^2 g / L = 4 pi^2 (common practice, no source).
    problem p;
    p.add("t", dims::time).add("L", dims::length).add("m", dims::mass).add("g", dims::acceleration);
    const analysis a = analyze(p);
    const double pi = 3.141592653589793;
    const double L = 0.75, g = 9.80665;
    const double t = 2.0 * pi * std::sqrt(L / g);
    const std::map<std::string, double> values{{"t", t}, {"L", L}, {"g", g}};  // no mass needed
    CHECK(a.groups[0].value(values) == doctest::Approx(4.0 * pi * pi).epsilon(1e-13));
    const std::unordered_map<std::string, double> hashed(values.begin(), values.end());
    CHECK(a.groups[0].value(hashed) == a.groups[0].value(values));
    const std::map<std::string, double, std::less<>> transparent(values.begin(), values.end());
    CHECK(a.values(transparent)[0] == a.groups[0].value(values));
  }

  TEST_CASE("a group over a field of cells matches the scalar value bit for bit, without allocating") {
    const analysis a = analyze(sphere_drag());
    const std::size_t cells = 1000;
    std::vector<double> F(cells), rho(cells), U(cells), D(cells), mu(cells), out(cells);
    for (std::size_t c = 0; c < cells; ++c) {
      const double s = 1.0 + static_cast<double>(c) / 100.0;
      F[c] = 0.1 * s;
      rho[c] = 1.2 + 0.001 * s;
      U[c] = 3.0 * s;
      D[c] = 0.02 + 0.0001 * s;
      mu[c] = 1.8e-5 * (1.0 + 0.01 * s);
    }
    const std::vector<std::span<const double>> columns{F, rho, U, D, mu};
    for (const pi_group& g : a.groups) {
      const std::size_t before = allocations.load();
      g.evaluate(columns, out);
      CHECK(allocations.load() == before);  // no allocation at all, let alone per cell
      for (std::size_t c = 0; c < cells; c += 97)
        CHECK(out[c] == g.value(std::vector<double>{F[c], rho[c], U[c], D[c], mu[c]}));
    }
  }

  TEST_CASE("field evaluation may write over one of its input columns") {
    const analysis a = analyze(sphere_drag());
    std::vector<double> F{1.0, 2.0}, rho{1.0, 1.0}, U{2.0, 4.0}, D{0.5, 0.5}, mu{1.0, 1.0};
    const std::vector<double> expect{a.groups[0].value(std::vector<double>{1.0, 1.0, 2.0, 0.5, 1.0}),
                                     a.groups[0].value(std::vector<double>{2.0, 1.0, 4.0, 0.5, 1.0})};
    const std::vector<std::span<const double>> columns{F, rho, U, D, mu};
    a.groups[0].evaluate(columns, F);  // F[c] / (rho U^2 D^2) written into F
    CHECK(F == expect);
    CHECK(F[0] == doctest::Approx(1.0));  // 1 / (1 * 4 * 0.25), by hand
  }

  TEST_CASE("columns of variables absent from the group may be empty") {
    const analysis a = analyze(sphere_drag());
    std::vector<double> rho{998.0}, U{2.0}, D{0.05}, mu{1.0e-3}, out(1);
    const std::vector<std::span<const double>> columns{{}, rho, U, D, mu};
    a.groups[1].evaluate(columns, out);  // mu/(rho U D): F not read
    CHECK(out[0] == doctest::Approx(1.0 / 99800.0).epsilon(1e-14));
  }
}

namespace {
/// The message and variable of the analysis_error `f` throws ("no error" when it does not).
template <class F>
std::pair<std::string, std::string> error_of(F f) {
  try {
    (void)f();
  } catch (const analysis_error& e) {
    return {e.what(), e.variable()};
  }
  return {"no error", ""};
}
}  // namespace

TEST_SUITE("analysis evaluation") {
  TEST_CASE("NaN, infinite values and zero divisors are refused with the variable named") {
    // IEEE 754: NaN propagates through products and 1/inf is 0, so without a check a bad
    // input would come out as a plausible group value.
    const analysis a = analyze(sphere_drag());
    const double nan = std::numeric_limits<double>::quiet_NaN();
    const double inf = std::numeric_limits<double>::infinity();
    const auto at = [&](std::size_t g, std::vector<double> si) {
      return error_of([&] { return a.groups[g].value(si); });
    };
    const auto [m_nan, v_nan] = at(1, {0.8, 998.0, 2.0, 0.05, nan});
    CHECK(v_nan == "mu");
    CHECK(m_nan == "nondim: the value of 'mu' is NaN (group mu*rho^-1*U^-1*D^-1)");
    const auto [m_inf, v_inf] = at(1, {0.8, 998.0, inf, 0.05, 1e-3});  // 1/inf would give 0
    CHECK(v_inf == "U");
    CHECK(m_inf.find("'U' is infinite") != std::string::npos);
    const auto [m_zero, v_zero] = at(0, {0.8, 998.0, 2.0, 0.0, 1e-3});
    CHECK(v_zero == "D");
    CHECK(m_zero.find("'D' is 0, and the group divides by it") != std::string::npos);
    // 1e300 / (998 * 4 * 1e-300^2) exceeds the largest double, about 1.8e308 (IEEE 754 binary64)
    const auto [m_over, v_over] = at(0, {1e300, 998.0, 2.0, 1e-300, 1e-3});
    CHECK(v_over.empty());
    CHECK(m_over.find("overflows a double") != std::string::npos);
    // a zero numerator is a value (no drag), and a negative velocity is squared: both are results
    CHECK(a.groups[0].value(std::vector<double>{0.0, 998.0, 2.0, 0.05, 1e-3}) == 0.0);
    CHECK(a.groups[0].value(std::vector<double>{0.8, 998.0, -2.0, 0.05, 1e-3}) ==
          a.groups[0].value(std::vector<double>{0.8, 998.0, 2.0, 0.05, 1e-3}));
    // by name
    const std::map<std::string, double> named{{"rho", 998.0}, {"U", 2.0}, {"D", 0.05}, {"mu", nan}};
    CHECK(error_of([&] { return a.groups[1].value(named); }).second == "mu");
  }

  TEST_CASE("a bad value in a field names the variable and the cell") {
    const analysis a = analyze(sphere_drag());
    const std::vector<double> rho{998.0, 998.0, 998.0};
    const std::vector<double> U{2.0, 2.0, 2.0};
    const std::vector<double> D{0.05, 0.05, 0.05};
    const std::vector<double> mu{1e-3, 1e-3, std::numeric_limits<double>::quiet_NaN()};
    const std::vector<std::span<const double>> columns{std::span<const double>{}, rho, U, D, mu};
    std::vector<double> out(3, -1.0);
    const auto [m, v] = error_of([&] {
      a.groups[1].evaluate(columns, out);
      return 0;
    });
    CHECK(v == "mu");
    CHECK(m == "nondim: the value of 'mu' in cell 2 is NaN (group mu*rho^-1*U^-1*D^-1)");
    // Re = 998 * 2 * 0.05 / 1e-3 = 99800 (common practice, no source): cells before the fault are written
    CHECK(out[0] == doctest::Approx(1.0 / 99800.0).epsilon(1e-14));
  }
}
