// Several threads parse unit expressions and analyse problems at once; every result must
// equal the one computed on a single thread (run under ThreadSanitizer by the tsan preset).
#include <nondim/nondim.hpp>

#include <doctest/doctest.h>

#include <atomic>
#include <string_view>
#include <thread>
#include <vector>

using namespace nondim;

namespace {
constexpr std::string_view expressions[] = {"W/(m^2*K)", "Btu/(lb*degF)", "kg\u00b7m\u207b\u00b9\u00b7s\u207b\u00b9",
                                            "MPa*m^0.5", "degC",          "psi",
                                            "cSt",       "J/(mol*K)",     "1/s"};
constexpr int threads = 4;
constexpr int rounds = 2000;
}  // namespace

TEST_SUITE("thread safety") {
  TEST_CASE("parse_unit gives the same answer from several threads at once") {
    std::vector<parsed_unit> expected;
    for (auto e : expressions) expected.push_back(parse_unit(e));
    std::atomic<int> mismatches{0};
    std::vector<std::thread> pool;
    for (int t = 0; t < threads; ++t)
      pool.emplace_back([&] {
        for (int r = 0; r < rounds; ++r)
          for (std::size_t i = 0; i < std::size(expressions); ++i) {
            const parsed_unit u = parse_unit(expressions[i]);
            if (u.factor != expected[i].factor || u.offset != expected[i].offset || u.dim != expected[i].dim)
              ++mismatches;
          }
      });
    for (auto& th : pool) th.join();
    CHECK(mismatches.load() == 0);
  }

  TEST_CASE("errors are thrown independently in each thread") {
    std::atomic<int> caught{0};
    std::vector<std::thread> pool;
    for (int t = 0; t < threads; ++t)
      pool.emplace_back([&] {
        for (int r = 0; r < 200; ++r) {
          try {
            (void)parse_unit("kg/m/s");
          } catch (const unit_error& e) {
            if (e.column() == 5) ++caught;
          }
        }
      });
    for (auto& th : pool) th.join();
    CHECK(caught.load() == threads * 200);  // SI Brochure 9th ed., 5.4.6: a second solidus is refused
  }

  TEST_CASE("analyze gives the same groups from several threads at once") {
    // drag on a sphere (White, Fluid Mechanics, ch. 5, from memory): F/(rho U^2 D^2) and Re
    problem p;
    p.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "m").add("mu", "Pa*s");
    const analysis expected = analyze(p);
    REQUIRE(expected.groups.size() == 2);
    std::atomic<int> mismatches{0};
    std::vector<std::thread> pool;
    for (int t = 0; t < threads; ++t)
      pool.emplace_back([&] {
        for (int r = 0; r < 200; ++r) {
          const analysis a = analyze(p);
          if (a.rank != expected.rank || a.repeating != expected.repeating) ++mismatches;
          for (std::size_t g = 0; g < a.groups.size(); ++g)
            if (a.groups[g].exponents != expected.groups[g].exponents) ++mismatches;
        }
      });
    for (auto& th : pool) th.join();
    CHECK(mismatches.load() == 0);
  }
}
