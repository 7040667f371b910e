#pragma once
/// \file pi_groups.hpp
/// \brief Dimensionless groups computed at compile time from the dimensions of a solver's
/// variables: `pi_exponents<D...>()` gives the exponents, `pi_groups(q...)` the values;
/// `pi_product<E...>(q...)` the value of one group with exponents chosen by hand.
/// Standard library only.
///
/// The basis is the classical one of the run-time `analyze()` with automatic repeating
/// variables (DESIGN.md, "Rules for the groups" and "Algorithms"), found by exact rational
/// elimination during constant evaluation:
///  - the first variable is the dependent one;
///  - repeating variables: the others, ordered as an engineer considers them: a length, then
///    a velocity, rotational speed or acceleration, then a density, then the rest by fewer
///    base dimensions and smaller sum of |exponents|, surface tension, viscosity, expansion
///    coefficients and pure numbers last; input order breaks ties; each one that raises the
///    rank is taken; only if the rank is still short is the dependent variable taken too;
///  - variables have no names or kinds here, only dimensions: among variables of one
///    dimension the first given repeats. `analyze()` prefers the one a textbook repeats (a
///    diameter over a bed length, C_min over UA; repeating_rule.hpp), so the two agree when
///    that one is given first: pass the particle diameter before the bed length;
///  - group k holds exactly one non-repeating variable, with a positive exponent, times
///    powers of the repeating ones; exponents are primitive integers (gcd 1); groups are
///    ordered by the input position of their non-repeating variable;
///  - a dimensionless variable is a group by itself; a variable whose dimension the others
///    cannot cancel appears in no group (exponent 0 everywhere, flagged `isolated`).
///
/// \code
///   // drag on a sphere: F = f(rho, U, D, mu)
///   auto [cf, inv_re] = nondim::pi_groups(F, rho, U, D, mu);   // F/(rho U^2 D^2), mu/(rho U D)
/// \endcode

#include <array>
#include <cstddef>
#include <cstdint>
#include <tuple>
#include <type_traits>
#include <utility>

#include "../units/quantity_type.hpp"
#include "../units/spelling.hpp"
#include "detail/constexpr_basis.hpp"

namespace nondim {

/// \brief The whole compile-time analysis of N variables (the data behind `pi_exponents`).
///
/// Only the first `rank` entries of `repeating` and the first `group_count` entries of
/// `group_variable` and `exponents` are meaningful. `overflow` set means the exact basis did
/// not fit in 64-bit rationals; `pi_basis` and `pi_exponents` refuse to compile then.
template <std::size_t N>
struct compile_time_basis {
  bool overflow = false;
  std::size_t rank = 0;                                    ///< exact rank of the dimension matrix
  std::size_t group_count = 0;                             ///< N - rank
  bool dependent_repeating = false;                        ///< the rank needed the dependent variable
  std::array<std::size_t, N> repeating{};                  ///< variable indices, in the order chosen
  std::array<std::size_t, N> group_variable{};             ///< the non-repeating variable of group k
  std::array<std::array<std::int64_t, N>, N> exponents{};  ///< group k's exponents, by variable
  std::array<bool, N> isolated{};                          ///< variables that appear in no group
};

namespace detail {

/// Names a bad argument in compile errors: its 1-based position and its type.
template <std::size_t Position, class T>
struct not_a_quantity {};

template <std::size_t N>
consteval compile_time_basis<N> solve_pi_basis(const std::array<exponent_column, N>& col) {
  compile_time_basis<N> out{};
  if constexpr (N != 0) {
    guarded_arithmetic g;

    // the candidates for repeating variables, in the order of the rule
    std::array<int, N> tier{};
    std::array<std::size_t, N> bases{};
    std::array<rational, N> weight{};
    for (std::size_t j = 1; j < N; ++j) {  // the dependent variable is not ranked
      tier[j] = repeating_tier_of(col[j]);
      bases[j] = nonzero_count(col[j]);
      for (const auto& e : col[j]) weight[j] = g.add(weight[j], g.abs(e));
    }
    if (g.overflow) {
      out.overflow = true;
      return out;
    }
    std::array<std::size_t, N> order{};
    std::size_t count = 0;
    for (std::size_t j = 1; j < N; ++j) {  // insertion keeps input order among equal keys
      std::size_t k = count;
      const auto before = [&](std::size_t a, std::size_t b) {  // tier, base dimensions, exponents
        if (tier[a] != tier[b]) return tier[a] < tier[b];
        if (bases[a] != bases[b]) return bases[a] < bases[b];
        return weight[a] < weight[b];
      };
      while (k > 0 && before(j, order[k - 1])) {
        order[k] = order[k - 1];
        --k;
      }
      order[k] = j;
      ++count;
    }

    span_builder span;
    std::array<bool, N> is_repeating{};
    for (std::size_t k = 0; k < count; ++k) {
      if (span.try_add(col[order[k]], g)) {
        is_repeating[order[k]] = true;
        out.repeating[out.rank++] = order[k];
      }
    }
    if (span.try_add(col[0], g)) {  // only raises the rank when the others fall short
      is_repeating[0] = true;
      out.repeating[out.rank++] = 0;
      out.dependent_repeating = true;
    }
    if (g.overflow) {
      out.overflow = true;
      return out;
    }

    // [repeating | non-repeating]: after reduction, column rank + t holds the coefficients
    // of non-repeating variable t on the repeating ones
    std::array<std::array<rational, N>, base_dimension_count> m{};
    for (std::size_t i = 0; i < out.rank; ++i)
      for (std::size_t b = 0; b < base_dimension_count; ++b) m[b][i] = col[out.repeating[i]][b];
    for (std::size_t j = 0; j < N; ++j) {
      if (is_repeating[j]) continue;
      const std::size_t c = out.rank + out.group_count;
      for (std::size_t b = 0; b < base_dimension_count; ++b) m[b][c] = col[j][b];
      out.group_variable[out.group_count++] = j;
    }
    std::array<std::size_t, base_dimension_count> pivots{};
    reduce_rows(m, N, pivots, g);

    for (std::size_t t = 0; t < out.group_count; ++t) {
      std::array<rational, N> x{};
      x[out.group_variable[t]] = 1;
      for (std::size_t i = 0; i < out.rank; ++i) x[out.repeating[i]] = g.neg(m[i][out.rank + t]);
      out.exponents[t] = primitive_integers(x, g);
    }
    for (std::size_t j = 0; j < N; ++j) {
      bool absent = true;
      for (std::size_t t = 0; t < out.group_count; ++t) absent = absent && out.exponents[t][j] == 0;
      out.isolated[j] = absent;
    }
    out.overflow = g.overflow;
  }
  return out;
}

/// The basis of the variables with dimensions D..., computed once per list of dimensions.
template <dimension... D>
inline constexpr compile_time_basis<sizeof...(D)> pi_basis_v =
    solve_pi_basis<sizeof...(D)>(std::array<exponent_column, sizeof...(D)>{D.exponents...});

template <dimension... D>
constexpr bool pi_basis_fits() {
  static_assert(holds<!pi_basis_v<D...>.overflow, spell<D>...>,
                "nondim: the exact basis of these dimensions does not fit in 64-bit rationals at compile "
                "time (an exponent or an intermediate fraction exceeds int64); it is refused, not rounded");
  return !pi_basis_v<D...>.overflow;
}

template <class... Q>
consteval std::size_t first_non_quantity() {
  constexpr std::array<bool, sizeof...(Q)> ok{is_quantity<std::remove_cvref_t<Q>>::value...};
  for (std::size_t i = 0; i < sizeof...(Q); ++i)
    if (!ok[i]) return i;
  return sizeof...(Q);
}

/// x^E for E >= 0 by squaring, unrolled at compile time (E = 2: x*x; 3: (x*x)*x; 4: (x*x)*(x*x)).
template <std::int64_t E>
constexpr double unrolled_power(double x) noexcept {
  if constexpr (E == 0) {
    return 1.0;
  } else if constexpr (E == 1) {
    return x;
  } else if constexpr (E % 2 == 0) {
    const double h = unrolled_power<E / 2>(x);
    return h * h;
  } else {
    return unrolled_power<E - 1>(x) * x;
  }
}

constexpr std::int64_t positive_part(std::int64_t e) noexcept {
  return e > 0 ? e : 0;
}
constexpr std::int64_t negative_part(std::int64_t e) noexcept {
  return e < 0 ? -e : 0;
}

/// \brief Value of group G of the constant `Exponents` over SI values `x`:
/// (product of the positive powers, left to right) / (product of the negative ones).
/// (The whole array is the template argument: Clang 14 takes no subobject as one.)
template <const auto& Exponents, std::size_t G, std::size_t... I>
constexpr double group_value(const std::array<double, sizeof...(I)>& x, std::index_sequence<I...>) noexcept {
  constexpr bool any_positive = ((Exponents[G][I] > 0) || ...);
  constexpr bool any_negative = ((Exponents[G][I] < 0) || ...);
  // multiplying by 1.0 is exact, so the unit factors of absent variables vanish when folded
  if constexpr (!any_negative) {
    return (1.0 * ... * unrolled_power<positive_part(Exponents[G][I])>(x[I]));
  } else if constexpr (!any_positive) {
    return 1.0 / (1.0 * ... * unrolled_power<negative_part(Exponents[G][I])>(x[I]));
  } else {
    return (1.0 * ... * unrolled_power<positive_part(Exponents[G][I])>(x[I])) /
           (1.0 * ... * unrolled_power<negative_part(Exponents[G][I])>(x[I]));
  }
}

/// The dimension of the product of D[i]^E[i] (overflow of the exact arithmetic flagged).
template <std::size_t N>
struct product_dimension {
  bool overflow = false;
  dimension dim{};
};
template <std::size_t N>
consteval product_dimension<N> dimension_of_product(const std::array<dimension, N>& d,
                                                    const std::array<std::int64_t, N>& e) {
  guarded_arithmetic g;
  product_dimension<N> out{};
  for (std::size_t i = 0; i < N; ++i)
    for (std::size_t b = 0; b < base_dimension_count; ++b)
      out.dim.exponents[b] = g.add(out.dim.exponents[b], g.mul(d[i].exponents[b], rational{e[i]}));
  out.overflow = g.overflow;
  return out;
}

/// Fails with a `nondim:` message showing the dimension of the product of Dims[i]^Exps[i]
/// unless it is 1. (At namespace scope, on constants: GCC 12 crashes on the spelling of a
/// computed dimension inside `pi_product`.)
template <auto Dims, auto Exps>
constexpr bool product_is_dimensionless() {
  constexpr product_dimension<Dims.size()> product = dimension_of_product(Dims, Exps);
  constexpr dimension dim = product.dim;
  static_assert(!product.overflow, "nondim: the dimension of this product overflows 64-bit rational exponents");
  static_assert(holds<(product.overflow || dim == dimension{}), spell_named<dim>>,
                "nondim: this product of powers is not dimensionless, so it is no group; its dimension is "
                "shown (dim<...>): change the exponents");
  return true;
}

/// (product of the positive powers, left to right) / (product of the negative ones) of `x`.
template <std::int64_t... E, std::size_t... I>
constexpr double chosen_group_value(const std::array<double, sizeof...(E)>& x, std::index_sequence<I...>) noexcept {
  constexpr bool any_negative = ((E < 0) || ...);
  if constexpr (!any_negative) {
    return (1.0 * ... * unrolled_power<positive_part(E)>(x[I]));
  } else {
    return (1.0 * ... * unrolled_power<positive_part(E)>(x[I])) / (1.0 * ... * unrolled_power<negative_part(E)>(x[I]));
  }
}

template <const auto& Exponents, std::size_t N, std::size_t... G>
constexpr std::array<double, sizeof...(G)> evaluate_groups(const std::array<double, N>& x,
                                                           std::index_sequence<G...>) noexcept {
  return {group_value<Exponents, G>(x, std::make_index_sequence<N>{})...};
}

}  // namespace detail

/// \brief Number of dimensionless groups of variables with dimensions D...: n - rank.
template <dimension... D>
inline constexpr std::size_t pi_group_count = detail::pi_basis_v<D...>.group_count;

/// \brief The whole compile-time analysis: rank, repeating variables, groups, isolated variables.
///
/// Zero groups are allowed here (it is data); overflow of the exact arithmetic is a compile error.
template <dimension... D>
constexpr compile_time_basis<sizeof...(D)> pi_basis() {
  detail::pi_basis_fits<D...>();
  return detail::pi_basis_v<D...>;
}

/// \brief Exponents of the classical dimensionless groups of variables with dimensions D...
/// (the first is the dependent variable), computed at compile time.
///
/// `pi_exponents<D...>()[k][j]` is the exponent of variable j in group k: integers, gcd 1,
/// exactly one non-repeating variable per group with a positive exponent, groups in input
/// order of that variable. A problem with no group (n == rank: a variable is missing) and
/// overflow of the exact arithmetic are compile errors.
template <dimension... D>
constexpr auto pi_exponents() {
  constexpr auto& basis = detail::pi_basis_v<D...>;
  detail::pi_basis_fits<D...>();
  static_assert(detail::holds<(basis.overflow || basis.group_count != 0), detail::spell<D>...>,
                "nondim: these variables form no dimensionless group (as many variables as the rank of "
                "their dimensions); a variable that carries a dimension is missing from the problem");
  constexpr std::size_t count = basis.overflow ? 0 : basis.group_count;
  std::array<std::array<std::int64_t, sizeof...(D)>, count> out{};
  for (std::size_t k = 0; k < count; ++k) out[k] = basis.exponents[k];
  return out;
}

namespace detail {
/// The exponents as a constant with static storage, so that its rows can be template arguments.
template <dimension... D>
inline constexpr auto group_exponents = pi_exponents<D...>();
}  // namespace detail

/// \brief Values of the dimensionless groups of a solver's variables; the first argument is
/// the dependent variable.
///
/// The groups are those of `pi_exponents` for the arguments' dimensions, fixed at compile
/// time; the run-time work is only the multiplications: each power is unrolled (squaring),
/// positive powers are multiplied left to right in argument order and divided by the product
/// of the negative ones, so F/(rho U^2 D^2) is `F / (rho * (U * U) * (D * D))`.
/// Arguments must be quantities (any Rep; values are taken as double).
/// \return `std::array<double, n - rank>`, in the order of `pi_exponents`.
template <class... Q>
constexpr auto pi_groups(const Q&... q) noexcept {
  constexpr std::size_t bad = detail::first_non_quantity<Q...>();
  if constexpr (bad < sizeof...(Q)) {
    static_assert(detail::holds<false, detail::not_a_quantity<bad + 1, std::tuple_element_t<bad, std::tuple<Q...>>>>,
                  "nondim: pi_groups takes quantities (quantity<D, Rep>) only; the argument at the position "
                  "shown is not one (a temperature_point must first become a difference, T - T_ref)");
    return std::array<double, 0>{};
  } else {
    constexpr auto& exponents = detail::group_exponents<std::remove_cvref_t<Q>::dim...>;
    const std::array<double, sizeof...(Q)> x{static_cast<double>(q.si())...};
    return detail::evaluate_groups<exponents>(x, std::make_index_sequence<exponents.size()>{});
  }
}

/// \brief The value of one dimensionless group whose exponents are chosen by hand, one per
/// argument, fixed at compile time: `pi_product<1, -1, -2, -2>(F, rho, U, D)` is
/// F/(rho U^2 D^2), computed as `pi_groups` computes its groups.
///
/// A product whose dimension is not 1 does not compile (the diagnostic shows its dimension),
/// nor does a count of exponents other than the count of arguments, or an argument that is
/// not a quantity.
template <std::int64_t... E, class... Q>
constexpr double pi_product(const Q&... q) noexcept {
  static_assert(sizeof...(E) == sizeof...(Q), "nondim: pi_product takes one exponent per argument");
  constexpr std::size_t bad = detail::first_non_quantity<Q...>();
  if constexpr (sizeof...(E) != sizeof...(Q)) {
    return 0.0;
  } else if constexpr (bad < sizeof...(Q)) {
    static_assert(detail::holds<false, detail::not_a_quantity<bad + 1, std::tuple_element_t<bad, std::tuple<Q...>>>>,
                  "nondim: pi_product takes quantities (quantity<D, Rep>) only; the argument at the position "
                  "shown is not one");
    return 0.0;
  } else {
    detail::product_is_dimensionless<std::array<dimension, sizeof...(Q)>{std::remove_cvref_t<Q>::dim...},
                                     std::array<std::int64_t, sizeof...(E)>{E...}>();
    const std::array<double, sizeof...(Q)> x{static_cast<double>(q.si())...};
    return detail::chosen_group_value<E...>(x, std::index_sequence_for<Q...>{});
  }
}

}  // namespace nondim
