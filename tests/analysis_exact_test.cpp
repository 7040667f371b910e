// Exactness of the elimination: the checked int64 path, the cpp_rational path it falls back
// to on overflow, identical answers from both, refusal of exponents beyond 64 bits, and
// rational exponents in the input.
#include "analysis_support.hpp"

#include <cstdint>
#include <limits>
#include <numeric>
#include <string>

using namespace nondim;
using test_support::check_groups;
using test_support::expected_group;

namespace {

__extension__ using int128 = __int128;

int128 gcd128(int128 a, int128 b) {
  if (a < 0) a = -a;
  if (b < 0) b = -b;
  while (b != 0) {
    const int128 t = a % b;
    a = b;
    b = t;
  }
  return a;
}

bool fits_int64(int128 v) {
  return v >= std::numeric_limits<std::int64_t>::min() && v <= std::numeric_limits<std::int64_t>::max();
}

// Forty-bit entries: products of two of them overflow int64 (2^80 > 2^63).
constexpr std::int64_t a_40 = 1234567890123;
constexpr std::int64_t b_40 = 987654321017;
constexpr std::int64_t c_40 = 555555555557;
constexpr std::int64_t d_40 = 777777777781;
constexpr std::int64_t e_40 = 1111111111151;
constexpr std::int64_t f_40 = 333333333383;

/// z = x + y over L and M with huge entries: the null vector (z, x, y) = (1, -1, -1) is
/// small although the elimination passes through 80-bit products (linear algebra: z - x - y = 0
/// by construction, and x, y are independent because a d - b c != 0).
problem huge_but_small_answer() {
  problem p;
  p.add("z", dimension{a_40 + c_40, b_40 + d_40, 0})
      .add("x", dimension{a_40, b_40, 0})
      .add("y", dimension{c_40, d_40, 0});
  return p;
}

bool same_result(const analysis& l, const analysis& r) {
  return l.rank == r.rank && l.repeating == r.repeating && l.groups == r.groups && l.isolated == r.isolated &&
         l.isolated_reasons == r.isolated_reasons && l.deficiency == r.deficiency && l.svd == r.svd &&
         l.missing_variable == r.missing_variable && l.notes == r.notes;
}

}  // namespace

TEST_SUITE("analysis exact arithmetic") {
  TEST_CASE("huge entries overflow int64, and the cpp_rational path gives the small exact group") {
    REQUIRE(static_cast<int128>(a_40) * d_40 - static_cast<int128>(b_40) * c_40 != 0);  // x, y independent
    const problem p = huge_but_small_answer();
    const analysis autom = analyze(p);
    CHECK(autom.multiprecision);  // automatic fell back: the int64 run overflowed
    CHECK(autom.rank == 2);
    check_groups(autom, {expected_group{{"z", 1}, {"x", -1}, {"y", -1}}});

    options big;
    big.arithmetic = exact_arithmetic::multiprecision;
    const analysis forced = analyze(p, big);
    CHECK(forced.multiprecision);
    CHECK(same_result(autom, forced));

    options small;
    small.arithmetic = exact_arithmetic::int64;
    try {
      (void)analyze(p, small);
      FAIL("int64 arithmetic must refuse an overflowing elimination");
    } catch (const analysis_error& err) {
      CHECK(std::string(err.what()).find("overflows 64-bit integers") != std::string::npos);
    }
  }

  TEST_CASE("forcing cpp_rational gives the same analysis as int64 on textbook problems") {
    // drag on a sphere (White, Fluid Mechanics, 7th ed., Sec. 5.3, from memory) and the
    // blast wave with ambient pressure (Taylor, Proc. R. Soc. A 201, 1950)
    problem drag;
    drag.add("F", dims::force)
        .add("rho", dims::density)
        .add("U", dims::velocity)
        .add("D", dims::length)
        .add("mu", dims::dynamic_viscosity);
    problem blast;
    blast.add("R", dims::length)
        .add("E", dims::energy)
        .add("rho", dims::density)
        .add("t", dims::time)
        .add("p0", dims::pressure);
    options big;
    big.arithmetic = exact_arithmetic::multiprecision;
    for (const problem* p : {&drag, &blast}) {
      const analysis x = analyze(*p);
      const analysis y = analyze(*p, big);
      CHECK_FALSE(x.multiprecision);
      CHECK(y.multiprecision);
      CHECK(same_result(x, y));
    }
  }

  TEST_CASE("a group whose exact exponents exceed 64 bits is refused, naming its variable") {
    // The null vector of a 2 x 3 matrix is the cross product of its rows divided by the
    // gcd (linear algebra); computed here in 128 bits it does not fit in int64.
    const int128 n0 = static_cast<int128>(c_40) * f_40 - static_cast<int128>(e_40) * d_40;
    const int128 n1 = static_cast<int128>(e_40) * b_40 - static_cast<int128>(a_40) * f_40;
    const int128 n2 = static_cast<int128>(a_40) * d_40 - static_cast<int128>(c_40) * b_40;
    const int128 g = gcd128(gcd128(n0, n1), n2);
    REQUIRE(g != 0);
    CHECK_FALSE((fits_int64(n0 / g) && fits_int64(n1 / g) && fits_int64(n2 / g)));

    problem p;
    p.add("x", dimension{a_40, b_40, 0}).add("y", dimension{c_40, d_40, 0}).add("w", dimension{e_40, f_40, 0});
    try {
      (void)analyze(p, test_support::repeating({"y", "w"}));
      FAIL("exponents beyond 64 bits must be refused");
    } catch (const analysis_error& err) {
      CHECK(std::string(err.what()).find("the group of 'x' needs an exponent beyond 64 bits") != std::string::npos);
      CHECK(err.variable() == "x");
    }
    CHECK_THROWS_AS((void)exact_null_space(p.matrix()), analysis_error);
  }

  TEST_CASE("exact_null_space reads the basis off the reduced echelon form") {
    // Pendulum t, L, m, g (common practice, no source): pivots t, L, m; g t^2 / L = 1 in
    // dimension, so the null vector of the free column g is (2, -1, 0, 1).
    const dimension_matrix m({dims::time, dims::length, dims::mass, dims::acceleration});
    const null_space_basis ns = exact_null_space(m);
    CHECK(ns.rank == 3);
    CHECK(ns.pivots == std::vector<std::size_t>{0, 1, 2});
    REQUIRE(ns.vectors.size() == 1);
    CHECK(ns.vectors[0] == std::vector<std::int64_t>{2, -1, 0, 1});
    CHECK_FALSE(ns.multiprecision);
    const null_space_basis big = exact_null_space(m, exact_arithmetic::multiprecision);
    CHECK(big.multiprecision);
    CHECK(big.vectors == ns.vectors);
    CHECK(big.pivots == ns.pivots);

    const null_space_basis h = exact_null_space(huge_but_small_answer().matrix());
    CHECK(h.multiprecision);
    CHECK(h.rank == 2);
    // pivots z, x; the free column y has the positive entry: y = z / x in dimension
    CHECK(h.pivots == std::vector<std::size_t>{0, 1});
    CHECK(h.vectors == std::vector<std::vector<std::int64_t>>{{-1, 1, 1}});
  }

  TEST_CASE("rational exponents in the input give integer groups") {
    // Noise density in V/sqrt(Hz): V_rms = e_n sqrt(B) (common practice; e.g. Horowitz & Hill,
    // The Art of Electronics, 3rd ed., Ch. 8, from memory): the group is V_rms^2 / (e_n^2 B).
    problem p;
    p.add("V_rms", dims::voltage)
        .add("e_n", dims::voltage / pow(dims::frequency, rational{1, 2}))
        .add("B", dims::frequency);
    const analysis an = analyze(p, test_support::repeating({"e_n", "B"}));
    check_groups(an, {expected_group{{"V_rms", 2}, {"e_n", -2}, {"B", -1}}});
    CHECK(an.groups[0].text(text_form::ascii) == "V_rms^2*e_n^-2*B^-1");
  }

  TEST_CASE("checked rational arithmetic overflows rather than wraps") {
    // the guarantee the int64 path relies on (DESIGN.md "Algorithms": never a wrong answer)
    const rational big{std::numeric_limits<std::int64_t>::max() / 2 + 1};
    CHECK_THROWS_AS((void)(big + big), rational_overflow);
    CHECK_THROWS_AS((void)(big * rational{2}), rational_overflow);
  }
}
