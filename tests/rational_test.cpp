// Tests of nondim/solver/core/rational.hpp: exact fractions with checked 64-bit arithmetic.
#include <nondim/solver/core/rational.hpp>

#include <doctest/doctest.h>

#include <cstdint>
#include <limits>
#include <type_traits>

using nondim::rational;

// compile-time facts (checked by the compiler, not at run time)
static_assert(std::is_trivially_copyable_v<rational>);
static_assert(rational{6, -4} == rational{-3, 2}, "reduced, denominator positive");
static_assert(rational{1, 2} + rational{1, 3} == rational{5, 6});
static_assert(rational{1, 2} * rational{2, 3} == rational{1, 3});
static_assert(rational{1, 2} / rational{1, 4} == rational{2});
static_assert(rational{-1, 2} < rational{1, 3});
static_assert(rational{0, -7} == rational{});

TEST_SUITE("rational") {
  TEST_CASE("a rational is always in lowest terms with a positive denominator") {
    const rational r{-12, -18};
    CHECK(r.num == 2);
    CHECK(r.den == 3);
    CHECK(rational{5, -10} == rational{-1, 2});
  }

  TEST_CASE("a zero denominator throws") {
    CHECK_THROWS_AS(rational(1, 0), std::domain_error);
    CHECK_THROWS_AS(rational{1} / rational{0}, std::domain_error);
  }

  TEST_CASE("arithmetic that overflows 64 bits throws instead of wrapping") {
    constexpr std::int64_t big = std::numeric_limits<std::int64_t>::max();
    CHECK_THROWS_AS(rational{big} + rational{1}, nondim::rational_overflow);
    CHECK_THROWS_AS(rational{big} * rational{2}, nondim::rational_overflow);
    CHECK_THROWS_AS(-rational{std::numeric_limits<std::int64_t>::min()}, nondim::rational_overflow);
    CHECK_THROWS_AS(rational(1, std::numeric_limits<std::int64_t>::min()), nondim::rational_overflow);
    // cross-reduction keeps representable results representable
    CHECK(rational{big, 3} * rational{3, big} == rational{1});
    CHECK(rational{1, big} + rational{1, big} == rational{2, big});
  }

  TEST_CASE("ordering is exact even where a double would round") {
    constexpr std::int64_t big = std::numeric_limits<std::int64_t>::max();
    CHECK(rational{big - 1, big} < rational{big - 2 + 1, big - 1 + 1} + rational{1, big});
    CHECK(rational{1, big} > rational{});
    CHECK(abs(rational{-3, 4}) == rational{3, 4});
  }
}
