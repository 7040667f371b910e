#pragma once
/// \file spelling.hpp
/// \brief Dimensions spelled as types, so that compile errors name them readably
/// (`dim<L<1>, T<-1>>`) on both GCC and Clang; `static_assert` messages cannot be computed
/// in C++20, but the types in the failed condition are printed.

#include <cstdint>
#include <type_traits>

#include "../core/dimension.hpp"

namespace nondim::spelled {

/// Integer exponents print as `L<-1>`, fractional ones as `L_<1, 2>`.
template <std::int64_t N>
struct L {};
template <std::int64_t N>
struct M {};
template <std::int64_t N>
struct T {};
template <std::int64_t N>
struct I {};
template <std::int64_t N>
struct Theta {};
template <std::int64_t N>
struct N_ {};
template <std::int64_t N>
struct J {};
template <std::int64_t N, std::int64_t D>
struct L_ {};
template <std::int64_t N, std::int64_t D>
struct M_ {};
template <std::int64_t N, std::int64_t D>
struct T_ {};
template <std::int64_t N, std::int64_t D>
struct I_ {};
template <std::int64_t N, std::int64_t D>
struct Theta_ {};
template <std::int64_t N, std::int64_t D>
struct N__ {};
template <std::int64_t N, std::int64_t D>
struct J_ {};

/// A dimension as a list of its non-zero powers; `dim<>` is dimensionless.
template <class... Powers>
struct dim {};

}  // namespace nondim::spelled

namespace nondim::detail {

template <class A, class B>
struct concat;
template <class... X, class... Y>
struct concat<spelled::dim<X...>, spelled::dim<Y...>> {
  using type = spelled::dim<X..., Y...>;
};

template <std::size_t I, rational R>
struct power_of {
  template <template <std::int64_t> class Int, template <std::int64_t, std::int64_t> class Frac>
  using pick = std::conditional_t<
      R.is_zero(), spelled::dim<>,
      std::conditional_t<R.is_integer(), spelled::dim<Int<R.num>>, spelled::dim<Frac<R.num, R.den>>>>;
  using type = std::conditional_t<
      I == 0, pick<spelled::L, spelled::L_>,
      std::conditional_t<
          I == 1, pick<spelled::M, spelled::M_>,
          std::conditional_t<
              I == 2, pick<spelled::T, spelled::T_>,
              std::conditional_t<I == 3, pick<spelled::I, spelled::I_>,
                                 std::conditional_t<I == 4, pick<spelled::Theta, spelled::Theta_>,
                                                    std::conditional_t<I == 5, pick<spelled::N_, spelled::N__>,
                                                                       pick<spelled::J, spelled::J_>>>>>>>;
};

template <dimension D, std::size_t I = 0>
struct spell_from {
  using type = typename concat<typename power_of<I, D.exponents[I]>::type, typename spell_from<D, I + 1>::type>::type;
};
template <dimension D>
struct spell_from<D, base_dimension_count> {
  using type = spelled::dim<>;
};

/// \brief The type that spells dimension D in compile errors.
template <dimension D>
using spell = typename spell_from<D>::type;

/// \brief Always false; its template arguments carry the dimensions into the diagnostic.
template <class... Spelled>
inline constexpr bool dimensions_involved = false;

/// \brief Always `Ok`; its other arguments carry the dimensions or arguments into the
/// diagnostic when a `static_assert` on it fails.
template <bool Ok, class... Spelled>
inline constexpr bool holds = Ok;

}  // namespace nondim::detail
