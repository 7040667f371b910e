#pragma once
/// \file scales.hpp
/// \brief Reference scales for solvers written in nondimensional form: from a few reference
/// quantities (a density, a velocity, a length, a temperature difference) the scale of every
/// dimension in their span, with exponents fixed at compile time. Standard library only.
///
/// \code
///   const auto s = nondim::scales(rho_ref, U_ref, L_ref);   // independent dimensions
///   double p_star = s.nondimensional(p);                    // p / (rho U^2)
///   double t_star = s.nondimensional(t);                    // t U / L
///   auto   p_back = s.dimensional<dims::pressure>(p_star);  // quantity<dims::pressure>
/// \endcode
///
/// The exponents k of a dimension D = R1^k1 R2^k2 ... are found by exact rational
/// elimination during constant evaluation; they are unique because the references'
/// dimensions must be independent. They may be fractions when the span needs it:
/// with g and L as references a velocity scales as (g L)^(1/2). Integer powers are unrolled
/// multiplications; a power p/q takes the q-th root first, then the integer power p. Square
/// and cube roots of the references are taken once, when the object is made (`std::sqrt`,
/// `std::cbrt`); other roots (`std::pow`) at each call.
///
/// Cost: the object stores the references' SI values (and their square and cube roots);
/// `scale<D>()` multiplies them at each call: the same operations as the hand-written product,
/// which the optimiser hoists out of a loop just as it would the hand-written one
/// (bench/pi_groups_bench.cpp measures both). `nondimensional(q)` is `q.si() / scale`,
/// `dimensional<D>(x)` is `x * scale`: the round trip is exact when the scale is a power of
/// two, and otherwise within one unit in the last place.
///
/// Whole fields: `s.nondimensional(v, out)` and `s.dimensional(in, v)` convert a field view
/// (or a `field`) into and out of a span of numbers, the scale computed once per call.
///
/// Temperatures: a difference scales by a difference, theta = (T - T_ref) / dT, by
/// `nondimensional_difference(T, T_ref)` with the reference dT = T_wall - T_inf; an absolute
/// temperature scales by an absolute reference, T/T0 in gas dynamics, through the kelvin
/// values `scales(..., T0.absolute())` and `nondimensional(T.absolute())`. A reading
/// (`temperature_point`) passed to `nondimensional`, or given as a reference, does not compile:
/// the code must say which of the two it means.

#include <array>
#include <cstddef>
#include <cstdint>
#include <span>
#include <tuple>
#include <type_traits>
#include <utility>

#include "../fields/errors.hpp"
#include "../fields/owning_field.hpp"
#include "../units/math.hpp"
#include "../units/quantity_type.hpp"
#include "../units/spelling.hpp"
#include "../units/temperature.hpp"
#include "detail/constexpr_basis.hpp"
#include "pi_groups.hpp"

namespace nondim {

namespace detail {

template <class T>
struct is_temperature_point : std::false_type {};
template <class R>
struct is_temperature_point<temperature_point<R>> : std::true_type {};

/// Names a reference in compile errors: its 1-based position among the references and its dimension.
template <std::size_t Position, class Spelled>
struct dependent_reference {};
/// Names, in compile errors, a base dimension the references would need.
template <class Spelled>
struct references_lack {};

/// \brief Whether K reference dimensions are independent, and if not the first one that
/// is a product of powers of those before it.
struct reference_check {
  bool overflow = false;
  std::size_t first_dependent = 0;  ///< == count when independent
};

template <std::size_t K>
consteval reference_check check_references(const std::array<exponent_column, K>& refs) {
  reference_check out{false, K};
  guarded_arithmetic g;
  span_builder span;
  for (std::size_t i = 0; i < K; ++i) {
    if (!span.try_add(refs[i], g)) {
      out.first_dependent = i;
      break;
    }
  }
  out.overflow = g.overflow;
  return out;
}

/// \brief D = product of R_i^k_i: the exponents k, or where D lies outside the span.
template <std::size_t K>
struct span_solution {
  bool overflow = false;
  bool in_span = false;
  /// A base dimension the references lack for D: the first base of D that no reference
  /// carries, else the first base whose addition as a reference would put D in the span;
  /// `base_dimension_count` when no single base does.
  std::size_t lacking_base = base_dimension_count;
  std::array<rational, K> exponents{};
};

template <std::size_t K>
consteval bool in_span_of(const std::array<exponent_column, K>& refs, const exponent_column& target,
                          guarded_arithmetic& g) {
  std::array<std::array<rational, K + 1>, base_dimension_count> m{};
  for (std::size_t b = 0; b < base_dimension_count; ++b) {
    for (std::size_t i = 0; i < K; ++i) m[b][i] = refs[i][b];
    m[b][K] = target[b];
  }
  std::array<std::size_t, base_dimension_count> pivots{};
  const std::size_t r = reduce_rows(m, K + 1, pivots, g);
  return r == 0 || pivots[r - 1] != K;
}

template <std::size_t K>
consteval span_solution<K> solve_in_span(const std::array<exponent_column, K>& refs, const exponent_column& target) {
  span_solution<K> out{};
  guarded_arithmetic g;
  std::array<std::array<rational, K + 1>, base_dimension_count> m{};
  for (std::size_t b = 0; b < base_dimension_count; ++b) {
    for (std::size_t i = 0; i < K; ++i) m[b][i] = refs[i][b];
    m[b][K] = target[b];
  }
  std::array<std::size_t, base_dimension_count> pivots{};
  const std::size_t r = reduce_rows(m, K + 1, pivots, g);
  out.in_span = r == 0 || pivots[r - 1] != K;
  if (out.in_span) {
    // the references are independent, so pivot row i belongs to reference i
    for (std::size_t i = 0; i < K && i < r; ++i) out.exponents[i] = m[i][K];
  } else {
    for (std::size_t b = 0; b < base_dimension_count && out.lacking_base == base_dimension_count; ++b) {
      bool carried = false;
      for (std::size_t i = 0; i < K; ++i) carried = carried || !refs[i][b].is_zero();
      if (!target[b].is_zero() && !carried) out.lacking_base = b;
    }
    for (std::size_t b = 0; b < base_dimension_count && out.lacking_base == base_dimension_count; ++b) {
      std::array<exponent_column, K + 1> more{};
      for (std::size_t i = 0; i < K; ++i) more[i] = refs[i];
      more[K][b] = 1;
      if (in_span_of(more, target, g)) out.lacking_base = b;
    }
  }
  out.overflow = g.overflow;
  return out;
}

template <dimension... R>
inline constexpr reference_check reference_check_v =
    check_references<sizeof...(R)>(std::array<exponent_column, sizeof...(R)>{R.exponents...});

template <dimension D, dimension... R>
inline constexpr span_solution<sizeof...(R)> span_solution_v =
    solve_in_span<sizeof...(R)>(std::array<exponent_column, sizeof...(R)>{R.exponents...}, D.exponents);

/// The dimensions R... and a dimensionless one after them (so that any index up to K is valid).
template <dimension... R>
inline constexpr std::array<dimension, sizeof...(R) + 1> dimension_list{R..., dimension{}};

/// Fails with a `nondim:` message naming the first dependent reference (position, dimension).
template <dimension... R>
constexpr bool references_are_independent() {
  constexpr reference_check check = reference_check_v<R...>;
  constexpr std::size_t bad = check.overflow ? 0 : check.first_dependent;
  constexpr dimension bad_dim = dimension_list<R...>[bad];
  static_assert(holds<(check.overflow || bad == sizeof...(R)), dependent_reference<(bad + 1), spell_named<bad_dim>>>,
                "nondim: the references' dimensions must be independent; the reference at the position shown "
                "is a product of powers of those before it (drop it, or replace it by one that brings a new "
                "base dimension)");
  static_assert(holds<!check.overflow, spell<R>...>,
                "nondim: checking the references' independence overflows 64-bit rationals at compile time");
  return true;
}

/// The exponents of D on the references R..., or a `nondim:` error naming what is lacking.
/// (At namespace scope: GCC 12 crashes on these spellings inside a member of a class template.)
template <dimension D, dimension... R>
constexpr std::array<rational, sizeof...(R)> scale_exponents() {
  constexpr auto& sol = span_solution_v<D, R...>;
  constexpr std::size_t lack = sol.lacking_base;
  constexpr dimension lacking = make_base(static_cast<base_dimension>(lack < base_dimension_count ? lack : 0));
  static_assert(
      holds<(sol.in_span || lack == base_dimension_count), references_lack<spell_named<lacking>>, spell_named<D>>,
      "nondim: this dimension is outside the span of the references: they lack the base dimension "
      "shown (references_lack<...>, then the dimension asked for); add a reference that carries it");
  static_assert(holds<(sol.in_span || lack != base_dimension_count), spell_named<D>, spell_named<R>...>,
                "nondim: this dimension (first) is not a product of powers of the references (after it); no "
                "single added base dimension would make it one");
  static_assert(holds<!sol.overflow, spell<D>, spell<R>...>,
                "nondim: the exponents of this scale overflow 64-bit rationals at compile time");
  return sol.exponents;
}

template <class... Q>
consteval std::size_t first_non_reference() {
  constexpr std::array<bool, sizeof...(Q)> ok{is_quantity<std::remove_cvref_t<Q>>::value...};
  for (std::size_t i = 0; i < sizeof...(Q); ++i)
    if (!ok[i]) return i;
  return sizeof...(Q);
}

}  // namespace detail

/// \brief Reference scales of dimensions R...: what `scales(refs...)` returns.
///
/// \tparam R the references' dimensions, independent (checked here at compile time).
template <dimension... R>
class reference_scales {
 public:
  /// Number of references.
  static constexpr std::size_t size = sizeof...(R);

 private:
  static_assert(detail::references_are_independent<R...>());
  static constexpr std::array<dimension, size + 1> dims_{R..., dimension{}};

 public:
  /// \brief Whether D is a product of (possibly fractional) powers of the references.
  template <dimension D>
  static constexpr bool spans = detail::span_solution_v<D, R...>.in_span && !detail::span_solution_v<D, R...>.overflow;

  /// \brief Coherent SI: every reference is one SI unit, so every scale is 1 and a
  /// conversion leaves the numbers as they are (a solver's default before its references are known).
  constexpr reference_scales() noexcept {
    values_.fill(1.0);
    sqrt_.fill(1.0);
    cbrt_.fill(1.0);
  }

  /// \brief From the references' values in coherent SI units, in the order of R.
  /// Square and cube roots of the references are taken here, once, for scales with exponents p/2 and p/3.
  constexpr explicit reference_scales(const std::array<double, size>& si_values) noexcept : values_(si_values) {
    for (std::size_t i = 0; i < size; ++i) {
      sqrt_[i] = detail::root(values_[i], 2);
      cbrt_[i] = detail::root(values_[i], 3);
    }
  }

  /// \brief The exponents k with D = R1^k1 R2^k2 ..., exact; a compile error when D lies
  /// outside the span (naming the base dimension the references lack).
  template <dimension D>
  static constexpr std::array<rational, size> exponents() noexcept {
    return detail::scale_exponents<D, R...>();
  }

  /// \brief The reference scale of dimension D, R1^k1 R2^k2 ... of the stored values.
  template <dimension D>
  [[nodiscard]] constexpr quantity<D> scale() const noexcept {
    return quantity<D>::from_si(scale_si<D>(std::make_index_sequence<size>{}));
  }

  /// \brief q divided by the reference scale of its dimension: a number.
  template <dimension D, class Rep>
  [[nodiscard]] constexpr double nondimensional(const quantity<D, Rep>& q) const noexcept {
    return static_cast<double>(q.si()) / scale_si<D>(std::make_index_sequence<size>{});
  }

  /// Refused: an absolute temperature is a reading on a scale with an offset, not a multiple
  /// of a temperature difference.
  template <class Rep>
  double nondimensional(const temperature_point<Rep>&) const noexcept {
    static_assert(detail::holds<false, spelled::dim<spelled::Theta<1>>, Rep>,
                  "nondim: an absolute temperature (temperature_point) was passed where a difference is meant; "
                  "write s.nondimensional_difference(T, T_ref) for theta = (T - T_ref) / dT, or "
                  "s.nondimensional(T.absolute()) for T/T0 when the reference is the absolute T0.absolute()");
    return 0.0;
  }
  /// Refused: a raw number has no dimension to scale.
  template <class T>
  requires(!any_quantity<T> && !detail::is_temperature_point<std::remove_cvref_t<T>>::value) double nondimensional(
      const T&) const noexcept {
    static_assert(detail::holds<false, T>,
                  "nondim: nondimensional() takes a quantity; this argument has no dimension to scale");
    return 0.0;
  }

  /// \brief theta = (T - T_ref) / dT, with dT the reference scale of temperature.
  template <class Rep>
  [[nodiscard]] constexpr double nondimensional_difference(const temperature_point<Rep>& t,
                                                           const temperature_point<Rep>& t_ref) const noexcept {
    return nondimensional(t - t_ref);
  }

  /// \brief The quantity of dimension D whose nondimensional value is x: x times its scale.
  template <dimension D>
  [[nodiscard]] constexpr quantity<D> dimensional(double x) const noexcept {
    return quantity<D>::from_si(x * scale_si<D>(std::make_index_sequence<size>{}));
  }

  /// \brief A whole field divided by the reference scale of its dimension:
  /// out[i] = v[i] / scale, the scale computed once for the call.
  /// \param v   a `field_view`, `strided_field_view` or `field` of dimension D
  /// \param out as many numbers as v has elements
  /// \throws field_size_error when the sizes differ (nothing is written then)
  template <any_field F>
  void nondimensional(const F& v, std::span<double> out) const {
    constexpr dimension D = std::remove_cvref_t<F>::dim;
    if (out.size() != v.size())
      throw field_size_error(
          "reference_scales::nondimensional(field, out): the output span must hold one value per "
          "element of the field",
          v.size(), out.size());
    const double k = scale_si<D>(std::make_index_sequence<size>{});
    const auto* first = v.data();
    const std::size_t stride = v.stride();
    double* o = out.data();
    for (std::size_t i = 0, n = out.size(); i < n; ++i) o[i] = static_cast<double>(first[i * stride]) / k;
  }

  /// \brief A whole field from nondimensional numbers: v[i] = in[i] * scale (the inverse of
  /// `nondimensional(v, out)`), the scale computed once for the call.
  /// \param in as many numbers as v has elements
  /// \param v  a writable `field_view`, `strided_field_view` or `field` of dimension D
  /// \throws field_size_error when the sizes differ (nothing is written then)
  template <any_field F>
  void dimensional(std::span<const double> in, F&& v) const {
    using view = std::remove_cvref_t<F>;
    constexpr dimension D = view::dim;
    using rep = std::remove_pointer_t<decltype(v.data())>;
    static_assert(detail::holds<!std::is_const_v<rep>, detail::spell<D>, rep>,
                  "nondim: dimensional(in, v) writes into v; a read-only view (Rep = const double) cannot take the "
                  "values");
    if constexpr (!std::is_const_v<rep>) {
      if (in.size() != v.size())
        throw field_size_error(
            "reference_scales::dimensional(in, field): the input span must hold one value per "
            "element of the field",
            v.size(), in.size());
      const double k = scale_si<D>(std::make_index_sequence<size>{});
      rep* first = v.data();
      const std::size_t stride = v.stride();
      const double* x = in.data();
      for (std::size_t i = 0, n = in.size(); i < n; ++i) first[i * stride] = static_cast<rep>(x[i] * k);
    }
  }

  /// \brief The absolute temperature T_ref + theta dT (the inverse of `nondimensional_difference`).
  template <class Rep>
  [[nodiscard]] constexpr temperature_point<Rep> dimensional_point(double theta,
                                                                   const temperature_point<Rep>& t_ref) const noexcept {
    return t_ref + quantity<dims::temperature, Rep>::from_si(
                       static_cast<Rep>(theta * scale_si<dims::temperature>(std::make_index_sequence<size>{})));
  }

  /// \brief Reference number I as it was given (in SI).
  template <std::size_t I>
  [[nodiscard]] constexpr quantity<dims_[I]> reference() const noexcept {
    static_assert(I < size, "nondim: reference index out of range");
    return quantity<dims_[I]>::from_si(values_[I]);
  }

 private:
  template <dimension D>
  static constexpr std::array<rational, size> exponents_v = exponents<D>();

  /// (product of the positive powers, in reference order) / (product of the negative ones)
  template <dimension D, std::size_t... I>
  constexpr double scale_si(std::index_sequence<I...>) const noexcept {
    constexpr auto& k = exponents_v<D>;
    constexpr bool any_positive = ((k[I].num > 0) || ...);
    constexpr bool any_negative = ((k[I].num < 0) || ...);
    if constexpr (!any_negative) {
      return (1.0 * ... * power<detail::positive_part(k[I].num), k[I].den, I>());
    } else if constexpr (!any_positive) {
      return 1.0 / (1.0 * ... * power<detail::negative_part(k[I].num), k[I].den, I>());
    } else {
      return (1.0 * ... * power<detail::positive_part(k[I].num), k[I].den, I>()) /
             (1.0 * ... * power<detail::negative_part(k[I].num), k[I].den, I>());
    }
  }

  /// Reference I to the power P/Q (P >= 0): the stored root for Q = 2 or 3, a root taken now
  /// for other Q, then the integer power by unrolled squaring.
  template <std::int64_t P, std::int64_t Q, std::size_t I>
  constexpr double power() const noexcept {
    if constexpr (P == 0) {
      return 1.0;
    } else if constexpr (Q == 1) {
      return detail::unrolled_power<P>(values_[I]);
    } else if constexpr (Q == 2) {
      return detail::unrolled_power<P>(sqrt_[I]);
    } else if constexpr (Q == 3) {
      return detail::unrolled_power<P>(cbrt_[I]);
    } else {
      return detail::unrolled_power<P>(detail::root(values_[I], Q));
    }
  }

  std::array<double, size> values_{};
  std::array<double, size> sqrt_{};
  std::array<double, size> cbrt_{};
};

/// \brief Reference scales from reference quantities with independent dimensions.
///
/// The returned `reference_scales` offers `nondimensional(q)`, `dimensional<D>(x)`,
/// `scale<D>()`, `exponents<D>()` and, for temperatures, `nondimensional_difference(T, T_ref)`.
/// A temperature reference is a difference (`quantity<dims::temperature>`, e.g. T_wall - T_inf).
/// Dependent references and non-quantities are compile errors.
template <class... Q>
constexpr auto scales(const Q&... refs) noexcept {
  constexpr std::size_t bad = detail::first_non_reference<Q...>();
  if constexpr (bad < sizeof...(Q)) {
    using arg = std::remove_cvref_t<std::tuple_element_t<bad, std::tuple<Q...>>>;
    static_assert(detail::holds<!detail::is_temperature_point<arg>::value, detail::not_a_quantity<bad + 1, arg>>,
                  "nondim: a reference temperature for scales() is a difference (quantity<dims::temperature>, "
                  "e.g. T_wall - T_inf) for theta = (T - T_ref) / dT, or T0.absolute() (kelvin) for T/T0; not a "
                  "temperature_point reading");
    static_assert(detail::holds<detail::is_temperature_point<arg>::value, detail::not_a_quantity<bad + 1, arg>>,
                  "nondim: scales() takes reference quantities (quantity<D, Rep>) only; the argument at the "
                  "position shown is not one");
    return reference_scales<>(std::array<double, 0>{});
  } else {
    return reference_scales<std::remove_cvref_t<Q>::dim...>({static_cast<double>(refs.si())...});
  }
}

}  // namespace nondim
