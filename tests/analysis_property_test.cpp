// Properties of the groups over 1200 random dimension matrices (up to 7 x 30, small integer
// and rational entries, rank-deficient ones included; fixed seed). The properties are those
// of DESIGN.md "Rules for the groups"; every check uses an independent exact rank (plain
// row echelon form in cpp_rational, tests/analysis_support.hpp) or exact cpp_rational sums.
#include "analysis_support.hpp"

#include <algorithm>
#include <cstdint>
#include <numeric>
#include <random>
#include <string>
#include <vector>

using namespace nondim;
using test_support::big;
using test_support::rank_of;
using test_support::to_big;

namespace {

struct random_case {
  std::vector<dimension> dims;
  std::size_t dependent = 0;
  std::vector<std::size_t> given;  // empty: automatic
};

class generator {
 public:
  explicit generator(std::uint64_t seed) : rng_(seed) {}

  std::int64_t uniform(std::int64_t lo, std::int64_t hi) {  // inclusive
    return lo + static_cast<std::int64_t>(rng_() % static_cast<std::uint64_t>(hi - lo + 1));
  }
  bool chance(int percent) { return uniform(1, 100) <= percent; }

  rational entry() {
    if (chance(80)) {
      std::int64_t v = 0;
      while (v == 0) v = uniform(-4, 4);
      return v;
    }
    std::int64_t p = 0;
    while (p == 0) p = uniform(-5, 5);
    return rational{p, uniform(2, 5)};
  }

  random_case make(std::size_t index) {
    random_case rc;
    const std::size_t kind = index % 5;
    const auto n = static_cast<std::size_t>(kind == 4 ? uniform(1, 7) : uniform(1, 30));
    std::vector<std::size_t> rows{0, 1, 2, 3, 4, 5, 6};
    std::shuffle(rows.begin(), rows.end(), rng_);
    rows.resize(static_cast<std::size_t>(uniform(1, 7)));
    for (std::size_t j = 0; j < n; ++j) {
      std::array<rational, base_dimension_count> e{};
      for (std::size_t r : rows)
        if (chance(45)) e[r] = entry();
      rc.dims.emplace_back(e);
    }
    if (kind == 1 && rows.size() >= 2) {
      // a fixed combination: row rows[1] is a rational multiple of row rows[0]
      const rational k = entry();
      for (auto& d : rc.dims) {
        auto e = d.exponents;
        e[rows[1]] = e[rows[0]] * k;
        d = dimension(e);
      }
    }
    if (kind == 2 && n >= 3) {
      // later columns are small integer combinations of the first few
      const std::size_t basis =
          static_cast<std::size_t>(uniform(1, static_cast<std::int64_t>(std::min<std::size_t>(n - 1, 4))));
      for (std::size_t j = basis; j < n; ++j) {
        if (!chance(70)) continue;
        dimension s{};
        for (std::size_t b = 0; b < basis; ++b) s = s * pow(rc.dims[b], rational{uniform(-2, 2)});
        rc.dims[j] = s;
      }
    }
    if (kind == 3) {
      // dimensionless inputs and repeated dimensions
      for (std::size_t j = 0; j < n; ++j) {
        if (chance(15))
          rc.dims[j] = dimension{};
        else if (j > 0 && chance(15))
          rc.dims[j] = rc.dims[static_cast<std::size_t>(uniform(0, static_cast<std::int64_t>(j) - 1))];
      }
    }
    rc.dependent = static_cast<std::size_t>(uniform(0, static_cast<std::int64_t>(n) - 1));
    if (chance(35)) {
      // a random valid repeating set: shuffle, keep each column that raises the rank
      std::vector<std::size_t> idx(n);
      std::iota(idx.begin(), idx.end(), 0U);
      std::shuffle(idx.begin(), idx.end(), rng_);
      std::vector<dimension> chosen;
      for (std::size_t j : idx) {
        chosen.push_back(rc.dims[j]);
        if (rank_of(chosen) == chosen.size())
          rc.given.push_back(j);
        else
          chosen.pop_back();
      }
    }
    return rc;
  }

 private:
  std::mt19937_64 rng_;
};

problem to_problem(const random_case& rc) {
  problem p;
  for (std::size_t j = 0; j < rc.dims.size(); ++j) p.add("v" + std::to_string(j), rc.dims[j]);
  return p;
}

big abs_sum(const dimension& d) {
  big s = 0;
  for (std::size_t i = 0; i < base_dimension_count; ++i) s += abs(to_big(d[i]));
  return s;
}

/// DESIGN.md's tiers ("Rules for the groups"), restated independently of the library: a
/// length; a velocity, rotational speed or acceleration; a density; the others; surface
/// tension, viscosity (dynamic or kinematic), expansion coefficient and pure numbers last.
int tier(const dimension& d) {
  if (d == dims::length) return 0;
  if (d == dims::velocity || d == dims::frequency || d == dims::acceleration) return 1;
  if (d == dims::density) return 2;
  if (d.is_dimensionless() || d == dims::surface_tension || d == dims::dynamic_viscosity ||
      d == dims::kinematic_viscosity || d == dimension{} / dims::temperature)
    return 4;
  return 3;
}

/// DESIGN.md's rule for the automatic choice, restated independently of the library.
std::vector<std::size_t> automatic_choice(const std::vector<dimension>& dims, std::size_t dependent) {
  std::vector<std::size_t> order;
  for (std::size_t j = 0; j < dims.size(); ++j)
    if (j != dependent) order.push_back(j);
  std::stable_sort(order.begin(), order.end(), [&](std::size_t x, std::size_t y) {
    if (tier(dims[x]) != tier(dims[y])) return tier(dims[x]) < tier(dims[y]);
    if (dims[x].base_count() != dims[y].base_count()) return dims[x].base_count() < dims[y].base_count();
    return abs_sum(dims[x]) < abs_sum(dims[y]);
  });
  order.push_back(dependent);
  std::vector<std::size_t> taken;
  std::vector<dimension> chosen;
  for (std::size_t j : order) {
    chosen.push_back(dims[j]);
    if (rank_of(chosen) == chosen.size())
      taken.push_back(j);
    else
      chosen.pop_back();
  }
  std::sort(taken.begin(), taken.end());
  return taken;
}

}  // namespace

TEST_SUITE("analysis properties") {
  TEST_CASE("1200 random dimension matrices: exact, dimensionless, independent, primitive, classical groups") {
    generator gen(0x5eed'2024'0607ULL);
    std::size_t deficient = 0, with_isolated = 0, with_given = 0, with_dimensionless = 0, with_rational = 0,
                largest = 0, no_groups = 0;
    options big_options;
    big_options.arithmetic = exact_arithmetic::multiprecision;
    for (std::size_t index = 0; index < 1200; ++index) {
      const random_case rc = gen.make(index);
      const problem p = to_problem(rc);
      const std::vector<std::string> names = p.names();
      options o;
      o.dependent = names[rc.dependent];
      for (std::size_t g : rc.given) o.repeating.push_back(names[g]);
      INFO("case " << index << ", " << rc.dims.size() << " variables");
      const analysis a = analyze(p, o);
      const std::size_t n = rc.dims.size();
      const std::size_t rank = rank_of(rc.dims);

      // rank and count
      REQUIRE(a.rank == rank);
      REQUIRE(a.groups.size() == n - rank);
      REQUIRE(a.repeating.size() == rank);

      // repeating: independent; as given, or DESIGN.md's automatic rule
      std::vector<std::size_t> rep;
      std::vector<dimension> rep_dims;
      for (const auto& r : a.repeating) {
        rep.push_back(*p.index_of(r));
        rep_dims.push_back(rc.dims[rep.back()]);
      }
      CHECK(rank_of(rep_dims) == rank);
      if (rc.given.empty())
        CHECK(rep == automatic_choice(rc.dims, rc.dependent));
      else
        CHECK(rep == rc.given);

      // every group: dimensionless exactly, primitive, classical form, ordered by its variable
      std::vector<std::vector<big>> vectors;
      std::vector<std::size_t> heads;
      for (std::size_t k = 0; k < a.groups.size(); ++k) {
        const pi_group& g = a.groups[k];
        REQUIRE(g.exponents.size() == n);
        CHECK(test_support::exactly_dimensionless(rc.dims, g.exponents));
        std::int64_t gcd = 0;
        for (auto e : g.exponents) gcd = std::gcd(gcd, e);
        CHECK(gcd == 1);
        std::size_t non_repeating = 0;
        for (std::size_t j = 0; j < n; ++j)
          if (g.exponents[j] != 0 && std::find(rep.begin(), rep.end(), j) == rep.end()) ++non_repeating;
        CHECK(non_repeating == 1);
        CHECK(std::find(rep.begin(), rep.end(), g.non_repeating) == rep.end());
        CHECK(g.exponents[g.non_repeating] > 0);
        heads.push_back(g.non_repeating);
        std::vector<big> v;
        for (auto e : g.exponents) v.emplace_back(e);
        vectors.push_back(v);
      }
      CHECK(rank_of(vectors) == a.groups.size());  // independent
      // the dependent variable's group first (DESIGN.md), the others by input position
      const auto dep = std::find(heads.begin(), heads.end(), rc.dependent);
      if (dep != heads.end()) {
        CHECK(dep == heads.begin());
        heads.erase(dep);
      }
      CHECK(std::is_sorted(heads.begin(), heads.end()));
      CHECK(std::adjacent_find(heads.begin(), heads.end()) == heads.end());

      // isolated: exactly the variables whose dimension the others cannot cancel
      for (std::size_t j = 0; j < n; ++j) {
        std::vector<dimension> others;
        for (std::size_t k = 0; k < n; ++k)
          if (k != j) others.push_back(rc.dims[k]);
        const bool cannot_cancel = rank_of(others) < rank;
        const bool listed = std::find(a.isolated.begin(), a.isolated.end(), names[j]) != a.isolated.end();
        CHECK(listed == cannot_cancel);
        bool in_some_group = false;
        for (const auto& g : a.groups) in_some_group = in_some_group || g.exponents[j] != 0;
        CHECK(in_some_group == !listed);
      }
      CHECK(a.isolated_reasons.size() == a.isolated.size());
      CHECK(a.missing_variable ==
            (std::find(a.isolated.begin(), a.isolated.end(), names[rc.dependent]) != a.isolated.end()));

      // deficiency: the spanned dimensions are a basis of the columns' span
      CHECK(a.deficiency.spanned.size() == rank);
      std::vector<dimension> both = rc.dims;
      both.insert(both.end(), a.deficiency.spanned.begin(), a.deficiency.spanned.end());
      CHECK(rank_of(both) == rank);
      CHECK(a.deficiency.deficient == (rank < a.matrix.present_rows().size()));

      // SVD agrees on these well-conditioned matrices; exact groups leave no residual
      CHECK(a.svd.agrees);
      CHECK(a.svd.max_residual < 1e-12);

      // identical answer from cpp_rational alone (every fourth case, to keep the test short)
      if (index % 4 == 0) {
        const analysis b = analyze(p, [&] {
          options q = o;
          q.arithmetic = exact_arithmetic::multiprecision;
          return q;
        }());
        CHECK(b.rank == a.rank);
        CHECK(b.repeating == a.repeating);
        CHECK(b.groups == a.groups);
        CHECK(b.isolated == a.isolated);
        CHECK(b.deficiency == a.deficiency);
      }

      deficient += a.deficiency.deficient ? 1U : 0U;
      with_isolated += a.isolated.empty() ? 0U : 1U;
      with_given += rc.given.empty() ? 0U : 1U;
      no_groups += a.groups.empty() ? 1U : 0U;
      largest = std::max(largest, n);
      bool dimless = false, frac = false;
      for (const auto& d : rc.dims) {
        dimless = dimless || d.is_dimensionless();
        for (std::size_t i = 0; i < base_dimension_count; ++i) frac = frac || !d[i].is_integer();
      }
      with_dimensionless += dimless ? 1U : 0U;
      with_rational += frac ? 1U : 0U;
    }
    // the sample covers what it claims to (counts depend only on the fixed seed)
    MESSAGE("deficient " << deficient << ", isolated " << with_isolated << ", given " << with_given
                         << ", dimensionless " << with_dimensionless << ", rational " << with_rational << ", no groups "
                         << no_groups);
    CHECK(deficient >= 100);
    CHECK(with_isolated >= 100);
    CHECK(with_given >= 300);
    CHECK(with_dimensionless >= 100);
    CHECK(with_rational >= 500);
    CHECK(no_groups >= 10);
    CHECK(largest == 30);
  }
}
