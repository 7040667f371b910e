#pragma once
// Helpers shared by the analysis tests: an independent exact rank (plain row echelon form
// in cpp_rational, written separately from the library's elimination) and exact checks of
// groups against expected exponents.
#include <nondim/analysis.hpp>

#include <doctest/doctest.h>

#include <boost/multiprecision/cpp_int.hpp>

#include <cstdint>
#include <map>
#include <string>
#include <utility>
#include <vector>

namespace test_support {

using big = boost::multiprecision::cpp_rational;

inline big to_big(const nondim::rational& r) {
  big x = r.num;
  return x / r.den;
}

/// Rank of the vectors `v` (all of the same length), by row echelon form over F.
template <class F>
std::size_t rank_in(std::vector<std::vector<F>> v) {
  if (v.empty()) return 0;
  const std::size_t cols = v.front().size();
  std::size_t rank = 0;
  for (std::size_t c = 0; c < cols && rank < v.size(); ++c) {
    std::size_t p = rank;
    while (p < v.size() && v[p][c] == F(0)) ++p;
    if (p == v.size()) continue;
    std::swap(v[p], v[rank]);
    for (std::size_t i = rank + 1; i < v.size(); ++i) {
      if (v[i][c] == F(0)) continue;
      const F f = v[i][c] / v[rank][c];
      for (std::size_t k = c; k < cols; ++k) v[i][k] -= f * v[rank][k];
    }
    ++rank;
  }
  return rank;
}

inline std::size_t rank_of(const std::vector<std::vector<big>>& v) {
  return rank_in(v);
}

/// Rank of a set of dimensions (as vectors of 7 exponents): in checked int64 rationals,
/// which throw rather than wrap, and in cpp_rational when they overflow.
inline std::size_t rank_of(const std::vector<nondim::dimension>& dims) {
  try {
    std::vector<std::vector<nondim::rational>> v;
    for (const auto& d : dims) v.emplace_back(d.exponents.begin(), d.exponents.end());
    return rank_in(v);
  } catch (const nondim::rational_overflow&) {
    std::vector<std::vector<big>> v;
    for (const auto& d : dims) {
      std::vector<big> row;
      for (std::size_t i = 0; i < nondim::base_dimension_count; ++i) row.push_back(to_big(d[i]));
      v.push_back(row);
    }
    return rank_in(v);
  }
}

/// The exponents of the product of powers `e` of `dims`, exactly (no overflow possible).
inline std::vector<big> product_dimension(const std::vector<nondim::dimension>& dims,
                                          const std::vector<std::int64_t>& e) {
  std::vector<big> s(nondim::base_dimension_count, big(0));
  for (std::size_t j = 0; j < dims.size(); ++j)
    for (std::size_t i = 0; i < nondim::base_dimension_count; ++i) s[i] += to_big(dims[j][i]) * e[j];
  return s;
}

inline bool exactly_dimensionless(const std::vector<nondim::dimension>& dims, const std::vector<std::int64_t>& e) {
  for (const auto& x : product_dimension(dims, e))
    if (x != 0) return false;
  return true;
}

/// Expected exponents by name; every variable not listed must have exponent 0.
using expected_group = std::map<std::string, std::int64_t>;

inline void check_group(const nondim::pi_group& g, const expected_group& want) {
  for (const auto& name : g.variables()) {
    const auto it = want.find(name);
    const std::int64_t e = it == want.end() ? 0 : it->second;
    INFO("variable " << name << " in " << g.text(nondim::text_form::ascii));
    CHECK(g.exponent(name) == nondim::rational{e});
  }
  for (const auto& entry : want) {  // no structured binding: Clang 14 cannot capture one in INFO
    const std::string& name = entry.first;
    INFO("expected variable " << name);
    CHECK(std::find(g.variables().begin(), g.variables().end(), name) != g.variables().end());
  }
}

inline void check_groups(const nondim::analysis& a, const std::vector<expected_group>& want) {
  REQUIRE(a.groups.size() == want.size());
  for (std::size_t k = 0; k < want.size(); ++k) check_group(a.groups[k], want[k]);
  for (const auto& g : a.groups) CHECK(exactly_dimensionless(a.matrix.columns(), g.exponents));
}

inline std::vector<nondim::dimension> dims_of(const nondim::problem& p) {
  return p.matrix().columns();
}

}  // namespace test_support

namespace test_support {

/// Options with the given repeating variables (GCC 12 warns on designated initialisers
/// that leave members out, so the tests build options this way).
inline nondim::options repeating(std::vector<std::string> names) {
  nondim::options o;
  o.repeating = std::move(names);
  return o;
}

/// Drag on a sphere (White, Fluid Mechanics, 7th ed., Sec. 5.3, from memory): F, rho, U, D, mu;
/// groups F/(rho U^2 D^2) and mu/(rho U D) = 1/Re.
inline nondim::problem sphere_drag() {
  nondim::problem p;
  p.add("F", nondim::dims::force)
      .add("rho", nondim::dims::density)
      .add("U", nondim::dims::velocity)
      .add("D", nondim::dims::length)
      .add("mu", nondim::dims::dynamic_viscosity);
  return p;
}

}  // namespace test_support
