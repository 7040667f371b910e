// The run-time analyze() and the compile-time pi_basis() implement the same rules of
// DESIGN.md independently (one in Boost cpp_rational-backed run-time code, one in
// constant evaluation): on every textbook problem of tests/textbook_problems.hpp (each with
// its source there) they must give the same rank, repeating variables, groups and isolated
// variables.
#include "analysis_support.hpp"
#include "textbook_problems.hpp"

#include <algorithm>
#include <string>
#include <utility>
#include <vector>

using namespace nondim;

namespace {

template <const auto& P, std::size_t... I>
constexpr auto basis_of(std::index_sequence<I...>) {
  return pi_basis<P.variables[I].dim...>();
}

std::size_t compared = 0;

template <const auto& P>
void compare() {
  constexpr std::size_t n = P.variables.size();
  constexpr auto basis = basis_of<P>(std::make_index_sequence<n>{});
  problem p;
  for (const auto& v : P.variables) p.add(std::string(v.name), v.dim);
  const analysis a = analyze(p);
  INFO(P.title << " (" << P.source << ")");
  CHECK(a.rank == basis.rank);
  std::vector<std::string> repeating;
  for (std::size_t k = 0; k < basis.rank; ++k) repeating.emplace_back(P.variables[basis.repeating[k]].name);
  std::vector<std::string> mine = a.repeating;
  std::sort(repeating.begin(), repeating.end());
  std::sort(mine.begin(), mine.end());
  CHECK(mine == repeating);
  REQUIRE(a.groups.size() == basis.group_count);
  for (std::size_t k = 0; k < basis.group_count; ++k) {
    CHECK(a.groups[k].non_repeating == basis.group_variable[k]);
    for (std::size_t j = 0; j < n; ++j) CHECK(a.groups[k].exponents[j] == basis.exponents[k][j]);
  }
  for (std::size_t j = 0; j < n; ++j) {
    const bool listed = std::find(a.isolated.begin(), a.isolated.end(), P.variables[j].name) != a.isolated.end();
    CHECK(listed == basis.isolated[j]);
  }
  CHECK(a.missing_variable == basis.dependent_repeating);
  ++compared;
}

}  // namespace

TEST_SUITE("analysis compile time") {
  TEST_CASE("analyze() and pi_basis() agree on every shared textbook problem") {
    textbook::for_each_problem([]<const auto & P>() { compare<P>(); });
    CHECK(compared == textbook::all_problems.size());
  }

  TEST_CASE("of two variables of one dimension, pi_basis() takes the first, analyze() the one a textbook repeats") {
    // A packed bed (Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., 6.4, the Ergun
    // equation, from memory): the books repeat the particle diameter d_p, not the bed length
    // L. pi_basis() sees dimensions only (pi_groups.hpp): it agrees with analyze() when d_p is
    // listed before L, and takes L when L is listed first.
    constexpr auto basis =
        pi_basis<dims::pressure, dims::length, dims::length, dims::velocity, dims::density, dims::dynamic_viscosity>();
    const auto repeats = [](const auto& b, std::size_t j) {
      for (std::size_t k = 0; k < b.rank; ++k)
        if (b.repeating[k] == j) return true;
      return false;
    };
    problem first;
    first.add("dp", dims::pressure)
        .add("d_p", dims::length)
        .add("L", dims::length)
        .add("U", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity);
    CHECK(repeats(basis, 1));  // d_p, listed first
    CHECK_FALSE(repeats(basis, 2));
    CHECK(analyze(first).is_repeating("d_p"));

    problem second;
    second.add("dp", dims::pressure)
        .add("L", dims::length)
        .add("d_p", dims::length)
        .add("U", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity);
    CHECK(repeats(basis, 1));  // the same dimensions: now L, listed first
    CHECK(analyze(second).is_repeating("d_p"));
    CHECK_FALSE(analyze(second).is_repeating("L"));
  }
}
