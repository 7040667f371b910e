// libFuzzer target: analyze() on problems decoded from bytes. Byte 0 gives the number of
// variables (1..40), byte 1 the options (basis, arithmetic, dependent, repeating given),
// then each variable takes 7 exponents, each coded by one byte and, for fractions and
// large values, more bytes (see next_exponent). Invariants, checked independently of the
// library with boost::multiprecision::cpp_rational: the rank is the exact rank of the
// dimension matrix, there are n - rank groups, every group is exactly dimensionless, has
// integer exponents with gcd 1 and, in the classical basis, exactly one non-repeating
// variable with a positive exponent. analysis_error is the only exception allowed (README.md
// "Error model"), from problem::add and analyze(); the reports of the result throw nothing.
#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <cstring>
#include <exception>
#include <limits>
#include <numeric>
#include <span>
#include <string>
#include <vector>

#include <boost/multiprecision/cpp_int.hpp>
#include <nondim/analysis.hpp>
#include <nondim/report.hpp>

#include "fuzz_invariants.hpp"

namespace {

using big = boost::multiprecision::cpp_rational;
using nondim_fuzz::require;

using reader = nondim_fuzz::byte_reader;

// Mostly small integers (the physics), then small fractions, then values up to int64.
nondim::rational next_exponent(reader& r) {
  const std::uint8_t b = r.byte();
  if (b < 160) return nondim::rational{static_cast<std::int64_t>(b % 9) - 4};
  if (b < 224) {
    const auto num = static_cast<std::int64_t>(r.byte() % 25) - 12;
    const auto den = static_cast<std::int64_t>(r.byte() % 12) + 1;
    return nondim::rational{num, den};
  }
  if (b < 240) return nondim::rational{r.int64()};
  std::int64_t num = r.int64();
  std::int64_t den = r.int64();
  if (den == 0) den = 1;
  if (den == std::numeric_limits<std::int64_t>::min() || num == std::numeric_limits<std::int64_t>::min())
    return nondim::rational{num == std::numeric_limits<std::int64_t>::min() ? 0 : num};
  return nondim::rational{num, den};
}

// A value for a group: the IEEE 754 specials and extremes, or any bit pattern.
double next_value(reader& r) {
  static constexpr double specials[] = {0.0,
                                        -0.0,
                                        1.0,
                                        -1.0,
                                        std::numeric_limits<double>::quiet_NaN(),
                                        std::numeric_limits<double>::infinity(),
                                        -std::numeric_limits<double>::infinity(),
                                        std::numeric_limits<double>::max(),
                                        std::numeric_limits<double>::min(),
                                        std::numeric_limits<double>::denorm_min()};
  const std::uint8_t b = r.byte();
  if (b < 128) return specials[b % std::size(specials)];
  if (b < 192) return static_cast<double>(b - 160);
  const std::int64_t bits = r.int64();
  double d = 0;
  std::memcpy(&d, &bits, sizeof d);
  return d;
}

big to_big(const nondim::rational& q) {
  return big(q.num) / big(q.den);
}

// Exact rank of the 7 x n matrix, by elimination in cpp_rational.
std::size_t exact_rank(std::vector<std::vector<big>> m) {
  std::size_t rank = 0;
  const std::size_t cols = m.empty() ? 0 : m[0].size();
  for (std::size_t c = 0; c < cols && rank < m.size(); ++c) {
    std::size_t p = rank;
    while (p < m.size() && m[p][c] == 0) ++p;
    if (p == m.size()) continue;
    std::swap(m[p], m[rank]);
    for (std::size_t i = 0; i < m.size(); ++i) {
      if (i == rank || m[i][c] == 0) continue;
      const big f = m[i][c] / m[rank][c];
      for (std::size_t k = c; k < cols; ++k) m[i][k] -= f * m[rank][k];
    }
    ++rank;
  }
  return rank;
}

std::uint64_t magnitude(std::int64_t e) {
  return e < 0 ? 0 - static_cast<std::uint64_t>(e) : static_cast<std::uint64_t>(e);
}

void check(const nondim::problem& p, const nondim::options& o, const nondim::analysis& a) {
  const std::size_t n = p.size();
  std::vector<std::vector<big>> m(nondim::base_dimension_count, std::vector<big>(n));
  for (std::size_t j = 0; j < n; ++j)
    for (std::size_t i = 0; i < nondim::base_dimension_count; ++i) m[i][j] = to_big(p[j].dim[i]);
  require(a.rank == exact_rank(m));
  require(a.groups.size() == n - a.rank);
  require(a.repeating.size() == a.rank);
  for (const auto& g : a.groups) {
    require(g.exponents.size() == n);
    std::uint64_t common = 0;
    for (const std::int64_t e : g.exponents) common = std::gcd(common, magnitude(e));
    require(common == 1);  // primitive, and not the empty product
    for (std::size_t i = 0; i < nondim::base_dimension_count; ++i) {
      big sum = 0;
      for (std::size_t j = 0; j < n; ++j) sum += big(g.exponents[j]) * m[i][j];
      require(sum == 0);
    }
    if (o.form == nondim::basis::classical) {
      std::size_t outside = 0;  // non-repeating variables in the group
      for (std::size_t j = 0; j < n; ++j)
        if (g.exponents[j] != 0 && !a.is_repeating(p[j].name)) ++outside;
      require(outside == 1);
      require(g.non_repeating < n && g.exponents[g.non_repeating] > 0 && !a.is_repeating(p[g.non_repeating].name));
    }
  }
  require(!nondim::to_string(a).empty());
  // every report of the analysis: they throw nothing, whatever the exponents
  require(!nondim::text_report(a).empty() && !nondim::markdown_report(a).empty());
  require(!nondim::latex_report(a).empty() && !nondim::json_report(a).empty());
  require(!nondim::scales_text_report(a).empty() && !nondim::json_scales_report(a).empty());
  for (const auto& v : p.variables()) require(!v.unit.empty());
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  reader r(data, size);
  const std::size_t n = 1U + r.byte() % 40U;
  const std::uint8_t flags = r.byte();
  nondim::options o;
  o.form = (flags & 1U) != 0 ? nondim::basis::named : nondim::basis::classical;
  switch ((flags >> 1U) % 4U) {
    case 1:
      o.arithmetic = nondim::exact_arithmetic::int64;
      break;
    case 2:
      o.arithmetic = nondim::exact_arithmetic::multiprecision;
      break;
    default:
      break;
  }
  const std::uint8_t dependent = r.byte();
  const bool given = (flags & 8U) != 0;
  const std::uint8_t repeating_mask_seed = r.byte();

  nondim::problem p;
  for (std::size_t j = 0; j < n; ++j) {
    std::array<nondim::rational, nondim::base_dimension_count> e{};
    for (auto& x : e) x = next_exponent(r);
    try {  // README: problem::add throws analysis_error only, whatever the exponents
      p.add("v" + std::to_string(j), nondim::dimension{e});
    } catch (const std::exception& x) {
      nondim_fuzz::undocumented(x);
    }
  }
  if ((flags & 16U) != 0) o.dependent = "v" + std::to_string(dependent % n);
  if (given) {                                  // a subset of the variables, possibly a bad one
    std::uint64_t state = repeating_mask_seed;  // each variable with probability 1/4
    for (std::size_t j = 0; j < n; ++j) {
      state = state * 6364136223846793005ULL + 1442695040888963407ULL;
      if ((state >> 62U) == 0) o.repeating.push_back("v" + std::to_string(j));
    }
  }
  try {
    const nondim::analysis a = nondim::analyze(p, o);
    check(p, o, a);
    // group values from the rest of the bytes: analysis_error only, for any value
    std::vector<double> si(n);
    for (double& x : si) x = next_value(r);
    try {
      const std::vector<double> v = a.values(si);
      require(v.size() == a.groups.size());
    } catch (const nondim::analysis_error& e) {
      require(std::string(e.what()).rfind("nondim: ", 0) == 0);
    }
    if (!a.groups.empty()) {
      const std::vector<std::span<const double>> columns(n, std::span<const double>(si));
      std::vector<double> out(n);
      try {
        a.groups.front().evaluate(columns, out);
      } catch (const nondim::analysis_error& e) {
        require(std::string(e.what()).rfind("nondim: ", 0) == 0);
      }
    }
    // the elimination alone agrees with the analysis on the rank
    const nondim::null_space_basis b = nondim::exact_null_space(p.matrix(), o.arithmetic);
    require(b.rank == a.rank && b.vectors.size() == n - b.rank);
  } catch (const nondim::analysis_error& e) {
    require(std::string(e.what()).rfind("nondim: ", 0) == 0);
  } catch (const std::exception& e) {  // README: analyze and the reports throw nothing else
    nondim_fuzz::undocumented(e);
  }
  return 0;
}
