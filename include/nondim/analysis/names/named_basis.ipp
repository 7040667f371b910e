#pragma once
// Definitions of named_basis.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <numeric>
#include <span>
#include <stdexcept>
#include <string>
#include <utility>
#include <vector>

#include <boost/multiprecision/cpp_int.hpp>

#include "../../solver/core/dimension.hpp"
#include "../../solver/core/rational.hpp"
#include "catalog.hpp"
#include "named_basis.hpp"
#include "quantity_kind.hpp"
#include "recognize.hpp"

namespace nondim {

namespace detail {

/// Incremental exact row echelon form: says whether a vector raises the rank.
template <class T>
class echelon {
 public:
  explicit echelon(std::size_t width) : width_(width) {}

  /// The part of `v` not in the span (all zero when `v` is in it).
  [[nodiscard]] std::vector<T> reduce(std::span<const std::int64_t> v) const {
    std::vector<T> r(width_);
    for (std::size_t i = 0; i < width_; ++i) r[i] = T(v[i]);
    for (const auto& [pivot, row] : rows_) {
      if (r[pivot] == T(0)) continue;
      const T f = r[pivot] / row[pivot];
      for (std::size_t i = 0; i < width_; ++i)
        if (!(row[i] == T(0))) r[i] -= f * row[i];
    }
    return r;
  }
  [[nodiscard]] bool in_span(std::span<const std::int64_t> v) const { return first_nonzero(reduce(v)) == width_; }
  /// Adds `v` if it raises the rank; says whether it did.
  bool add(std::span<const std::int64_t> v) {
    std::vector<T> r = reduce(v);
    const std::size_t p = first_nonzero(r);
    if (p == width_) return false;
    rows_.emplace_back(p, std::move(r));
    return true;
  }
  [[nodiscard]] std::size_t rank() const noexcept { return rows_.size(); }

 private:
  std::size_t first_nonzero(const std::vector<T>& r) const {
    for (std::size_t i = 0; i < width_; ++i)
      if (!(r[i] == T(0))) return i;
    return width_;
  }
  std::size_t width_;
  std::vector<std::pair<std::size_t, std::vector<T>>> rows_;
};

/// A catalog form mapped onto problem variables.
struct named_candidate {
  std::vector<std::int64_t> exponents;
  std::size_t entry = 0;
  std::size_t form = 0;
  rational power{1};
  int score = 0;
  std::size_t repeating = 0;  // how many of its variables are repeating ones
  std::array<std::size_t, catalog_max_factors> variables{};
};

/// Makes a rational vector a primitive integer vector; returns the factor it was scaled by.
/// \throws rational_overflow when an entry does not fit in 64 bits.
inline rational make_primitive(std::span<const rational> v, std::vector<std::int64_t>& out) {
  std::int64_t l = 1;
  for (const auto& x : v)
    if (!x.is_zero()) l = checked_mul(l / gcd_magnitude(l, x.den), x.den);
  out.assign(v.size(), 0);
  std::int64_t g = 0;
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (v[i].is_zero()) continue;
    out[i] = checked_mul(v[i].num, l / v[i].den);
    g = g == 0 ? out[i] : gcd_magnitude(g, out[i]);
  }
  if (g < 0) g = -g;
  if (g > 1)
    for (auto& x : out) x /= g;
  return rational{l, g == 0 ? 1 : g};
}

/// Makes an integer vector primitive (gcd 1), keeping its direction.
inline void make_primitive(std::vector<std::int64_t>& v) {
  std::int64_t g = 0;
  for (auto x : v)
    if (x != 0) g = g == 0 ? (x < 0 ? checked_neg(x) : x) : gcd_magnitude(g, x);
  if (g > 1)
    for (auto& x : v) x /= g;
}

inline std::size_t nonzero_count(std::span<const std::int64_t> v) noexcept {
  return static_cast<std::size_t>(std::count_if(v.begin(), v.end(), [](std::int64_t x) { return x != 0; }));
}

inline std::uint64_t magnitude_sum(std::span<const std::int64_t> v) noexcept {
  std::uint64_t s = 0;
  for (auto x : v) s += x < 0 ? 0 - static_cast<std::uint64_t>(x) : static_cast<std::uint64_t>(x);
  return s;
}

/// Most mappings of one form considered (only many variables of one dimension reach it).
inline constexpr std::size_t named_mapping_limit = 256;

/// Every consistent mapping of every catalog form onto the variables.
inline std::vector<named_candidate> enumerate_candidates(std::span<const group_variable> variables,
                                                         const std::vector<bool>& is_repeating) {
  const std::size_t n = variables.size();
  std::vector<std::uint64_t> hash(n);
  std::vector<name_profile> profile(n);
  for (std::size_t i = 0; i < n; ++i) {
    hash[i] = dimension_hash(variables[i].dim);
    profile[i] = profile_of(variables[i], hash[i]);
  }
  std::vector<named_candidate> out;
  std::vector<char> used(n, 0);
  std::array<std::size_t, catalog_max_factors> chosen{};
  std::vector<rational> v(n);

  for (const auto& sig : form_signatures) {
    const catalog_form& form = catalog[sig.entry].forms[sig.form];
    std::size_t mappings = 0;
    std::array<bool, catalog_max_factors> shares_dimension{};
    for (std::size_t a = 0; a < form.size; ++a)
      for (std::size_t b = 0; b < form.size; ++b)
        if (a != b && sig.factor_hash[a] == sig.factor_hash[b] &&
            kind_info(form.factors[a].kind).dim == kind_info(form.factors[b].kind).dim)
          shares_dimension[a] = true;
    // depth-first over the factors; each factor takes an unused variable of its dimension
    auto search = [&](auto& self, std::size_t i) -> void {
      if (mappings >= named_mapping_limit) return;
      if (i == form.size) {
        ++mappings;
        bool conflict = false;
        int score = 0;
        std::size_t rep = 0;
        std::fill(v.begin(), v.end(), rational{});
        bool unidentified = false;
        for (std::size_t f = 0; f < form.size; ++f) {
          const std::size_t var = chosen[f];
          const int s = pair_score(variables[var], profile[var], form.factors[f].kind, conflict);
          // where two factors share a dimension only names or hints tell them apart
          if (s <= 0 && shares_dimension[f]) unidentified = true;
          score += s;
          rep += is_repeating.empty() || !is_repeating[var] ? 0U : 1U;
          v[var] = form.factors[f].exponent;
        }
        if (conflict || unidentified || mixes_phases(form, variables, chosen.data())) return;
        named_candidate c;
        c.entry = sig.entry;
        c.form = sig.form;
        c.power = make_primitive(v, c.exponents);
        c.score = score;
        c.repeating = rep;
        c.variables = chosen;
        out.push_back(std::move(c));
        return;
      }
      for (std::size_t var = 0; var < n; ++var) {
        if (used[var] != 0 || hash[var] != sig.factor_hash[i] ||
            !(variables[var].dim == kind_info(form.factors[i].kind).dim))
          continue;
        used[var] = 1;
        chosen[i] = var;
        self(self, i + 1);
        used[var] = 0;
      }
    };
    search(search, 0);
  }
  return out;
}

template <class T>
std::vector<named_group> choose_named(std::span<const std::vector<std::int64_t>> classical,
                                      std::span<const named_candidate> candidates, std::size_t dependent,
                                      std::size_t width, const std::vector<bool>& same_dimension,
                                      std::span<const std::vector<std::int64_t>> phase_ratios) {
  echelon<T> given(width);
  for (const auto& g : classical) given.add(g);
  const std::size_t target = given.rank();
  if (target != classical.size())
    throw std::invalid_argument("nondim: named basis: the " + std::to_string(classical.size()) +
                                " groups given are not independent (rank " + std::to_string(target) + ")");

  echelon<T> chosen(width);
  std::vector<named_group> out;
  std::vector<bool> entry_used(catalog_size, false);
  auto contains_dependent = [&](std::span<const std::int64_t> e) { return dependent < width && e[dependent] != 0; };
  auto take_candidate = [&](const named_candidate& c) {
    if (entry_used[c.entry] || !given.in_span(c.exponents) || !chosen.add(c.exponents)) return false;
    entry_used[c.entry] = true;
    named_group g;
    g.exponents = c.exponents;
    g.entry = c.entry;
    g.form = c.form;
    g.power = c.power;
    g.variables = c.variables;
    out.push_back(std::move(g));
    return true;
  };

  // the dependent group
  bool have_dependent = false;
  if (dependent < width) {
    // a plain ratio of the dependent variable to another of its dimension (delta/x,
    // theta/theta_i) that is no catalog number is its natural normalisation: keep it
    for (std::size_t k = 0; k < classical.size() && !have_dependent; ++k) {
      const auto& g = classical[k];
      if (!contains_dependent(g) || nonzero_count(g) != 2 || (g[dependent] != 1 && g[dependent] != -1)) continue;
      std::size_t other = 0;
      while (other == dependent || g[other] == 0) ++other;
      if (g[other] != -g[dependent] || !same_dimension[other]) continue;
      const bool is_catalog = std::any_of(candidates.begin(), candidates.end(), [&](const named_candidate& c) {
        return c.exponents[dependent] != 0 && c.exponents[other] != 0 && nonzero_count(c.exponents) == 2;
      });
      if (is_catalog || !chosen.add(g)) continue;
      named_group d;
      d.exponents = g;
      d.source = k;
      out.push_back(std::move(d));
      have_dependent = true;
    }
    for (const auto& c : candidates) {
      if (have_dependent) break;
      if (contains_dependent(c.exponents) && take_candidate(c)) have_dependent = true;
    }
    if (!have_dependent)
      for (std::size_t k = 0; k < classical.size(); ++k)
        if (contains_dependent(classical[k]) && chosen.add(classical[k])) {
          named_group g;
          g.exponents = classical[k];
          g.source = k;
          out.push_back(std::move(g));
          have_dependent = true;
          break;
        }
  }

  // the given groups, freed of the dependent variable, as fillers
  struct filler {
    std::vector<std::int64_t> exponents;
    std::size_t source;
    bool reduced;
  };
  std::vector<filler> simple;
  std::vector<filler> rest;
  for (std::size_t k = 0; k < classical.size(); ++k) {
    filler f{classical[k], k, false};
    if (contains_dependent(f.exponents)) {
      if (!have_dependent) continue;  // cannot happen: the dependent group was taken from them
      const auto& d = out.front().exponents;
      const std::int64_t a = d[dependent];
      const std::int64_t b = f.exponents[dependent];
      for (std::size_t i = 0; i < width; ++i)
        f.exponents[i] = checked_sub(checked_mul(f.exponents[i], a), checked_mul(d[i], b));
      make_primitive(f.exponents);
      if (nonzero_count(f.exponents) == 0) continue;
      f.reduced = true;
    }
    (nonzero_count(f.exponents) <= 2 && !f.reduced ? simple : rest).push_back(std::move(f));
  }
  std::stable_sort(rest.begin(), rest.end(), [](const filler& a, const filler& b) {
    const auto na = nonzero_count(a.exponents);
    const auto nb = nonzero_count(b.exponents);
    if (na != nb) return na < nb;
    return magnitude_sum(a.exponents) < magnitude_sum(b.exponents);
  });
  auto take_filler = [&](const filler& f) {
    if (out.size() >= target || !chosen.add(f.exponents)) return;
    named_group g;
    g.exponents = f.exponents;
    g.source = f.source;
    g.reduced = f.reduced;
    out.push_back(std::move(g));
  };
  auto take_tier = [&](int tier) {
    for (const auto& c : candidates) {
      if (out.size() >= target) return;
      if (catalog[c.entry].tier == tier && !contains_dependent(c.exponents)) take_candidate(c);
    }
  };
  // a density (or viscosity) of one phase over the same of another stays explicit, so that
  // no catalog number has to carry the second phase (Oh with the gas density)
  for (const auto& r : phase_ratios) {
    if (out.size() >= target || contains_dependent(r) || !given.in_span(r) || !chosen.add(r)) continue;
    named_group g;
    g.exponents = r;
    g.reduced = true;
    out.push_back(std::move(g));
  }
  take_tier(1);
  for (const auto& f : simple) take_filler(f);
  take_tier(2);
  for (const auto& f : rest) take_filler(f);
  if (out.size() != target) throw std::logic_error("nondim: named basis: could not complete the basis");
  return out;
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::vector<named_group> named_basis(std::span<const group_variable> variables,
                                                            std::span<const std::vector<std::int64_t>> classical,
                                                            std::size_t dependent,
                                                            std::span<const std::size_t> repeating) {
  const std::size_t n = variables.size();
  if (dependent != named_group::npos && dependent >= n)
    throw std::invalid_argument("nondim: named basis: dependent index " + std::to_string(dependent) +
                                " is out of range for " + std::to_string(n) + " variables");
  std::vector<bool> is_repeating(n, false);
  for (auto r : repeating) {
    if (r >= n)
      throw std::invalid_argument("nondim: named basis: repeating index " + std::to_string(r) + " is out of range");
    is_repeating[r] = true;
  }
  for (std::size_t k = 0; k < classical.size(); ++k) {
    const auto& g = classical[k];
    if (g.size() != n)
      throw std::invalid_argument("nondim: named basis: group " + std::to_string(k + 1) + " has " +
                                  std::to_string(g.size()) + " exponents for " + std::to_string(n) + " variables");
    // exactly, in cpp_rational: the product of 64-bit exponents and dimensions can pass 64
    // bits for a group that is dimensionless all the same
    bool dimensionless = true;
    for (std::size_t b = 0; b < base_dimension_count && dimensionless; ++b) {
      boost::multiprecision::cpp_rational sum = 0;
      for (std::size_t i = 0; i < n; ++i) {
        const rational e = variables[i].dim[b];
        if (g[i] != 0 && !e.is_zero())
          sum += boost::multiprecision::cpp_rational(g[i]) * boost::multiprecision::cpp_rational(e.num, e.den);
      }
      dimensionless = sum == 0;
    }
    if (!dimensionless)
      throw std::invalid_argument("nondim: named basis: group " + std::to_string(k + 1) + " is not dimensionless");
  }

  std::vector<detail::named_candidate> candidates = detail::enumerate_candidates(variables, is_repeating);
  std::stable_sort(candidates.begin(), candidates.end(),
                   [](const detail::named_candidate& a, const detail::named_candidate& b) {
                     const int ta = catalog[a.entry].tier;
                     const int tb = catalog[b.entry].tier;
                     if (ta != tb) return ta < tb;
                     if (a.entry != b.entry) return a.entry < b.entry;
                     if (a.score != b.score) return a.score > b.score;
                     return a.repeating > b.repeating;
                   });

  const std::size_t d = dependent == named_group::npos ? n : dependent;
  // variables of the dependent variable's dimension
  std::vector<bool> same_dimension(n, false);
  if (d < n)
    for (std::size_t i = 0; i < n; ++i) same_dimension[i] = i != d && variables[i].dim == variables[d].dim;
  // ratios of two variables of one dimension tagged with different phases (rho_g/rho_l)
  std::vector<std::vector<std::int64_t>> phase_ratios;
  for (std::size_t i = 0; i < n; ++i)
    for (std::size_t j = i + 1; j < n; ++j) {
      const char ti = detail::phase_tag(variables[i].name);
      const char tj = detail::phase_tag(variables[j].name);
      if (ti == 0 || tj == 0 || ti == tj || !(variables[i].dim == variables[j].dim)) continue;
      std::vector<std::int64_t> r(n, 0);
      r[i] = 1;
      r[j] = -1;
      phase_ratios.push_back(std::move(r));
    }
  std::vector<named_group> out;
  try {
    out = detail::choose_named<rational>(classical, candidates, d, n, same_dimension, phase_ratios);
  } catch (const rational_overflow&) {
    out = detail::choose_named<boost::multiprecision::cpp_rational>(classical, candidates, d, n, same_dimension,
                                                                    phase_ratios);
  }
  return out;
}

}  // namespace nondim
