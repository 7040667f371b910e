#pragma once
/// \file difference.hpp
/// \brief Typed differences for stencils: the difference of a field between neighbouring
/// cells has the field's dimension, and over a spacing it has the gradient's
/// (`forward_gradient(p, i, dx)` is a pressure per length), so a stencil whose terms do not
/// match does not compile.
///
/// \code
///   auto dp_dx = central_gradient(p, i, dx);   // quantity<dims::pressure / dims::length>
///   auto dudt  = forward_gradient(u_history, n, dt);   // any spacing: here a time step
///   auto dF    = forward_difference(F, i);      // a state view: the difference of each component
/// \endcode
///
/// The functions read v[i - 1], v[i], v[i + 1] unchecked, as `v[i]` does; the caller keeps
/// i inside the field (the halo cells of a solver).

#include <cstddef>

#include "../core/inline.hpp"
#include "../units/quantity_type.hpp"
#include "../units/spelling.hpp"

namespace nondim {

namespace detail {
/// Something with `v[i]` whose elements subtract: a field view, a field, a state view.
template <class V>
concept indexed_field = requires(const V& v, std::size_t i) {
  v[i] - v[i];
};

template <class X>
consteval void check_spacing() {
  static_assert(holds < any_quantity<X> || indexed_field<X>, X >,
                "nondim: a grid spacing is a quantity (`dx = 0.01 * units::m`) or a field of coordinates, not a "
                "raw number");
}
}  // namespace detail

/// \brief v[i + 1] - v[i], of the field's dimension.
template <detail::indexed_field V>
NONDIM_ALWAYS_INLINE constexpr auto forward_difference(const V& v, std::size_t i) noexcept {
  return v[i + 1] - v[i];
}
/// \brief v[i] - v[i - 1].
template <detail::indexed_field V>
NONDIM_ALWAYS_INLINE constexpr auto backward_difference(const V& v, std::size_t i) noexcept {
  return v[i] - v[i - 1];
}
/// \brief v[i + 1] - v[i - 1].
template <detail::indexed_field V>
NONDIM_ALWAYS_INLINE constexpr auto central_difference(const V& v, std::size_t i) noexcept {
  return v[i + 1] - v[i - 1];
}

/// \brief (v[i + 1] - v[i]) / dx: dimension of the field over that of the spacing. `dx` is a
/// quantity (uniform spacing) or a field of coordinates (x[i + 1] - x[i]).
template <detail::indexed_field V, class X>
NONDIM_ALWAYS_INLINE constexpr auto forward_gradient(const V& v, std::size_t i, const X& dx) noexcept {
  detail::check_spacing<X>();
  if constexpr (any_quantity<X>) {
    return (v[i + 1] - v[i]) / dx;
  } else if constexpr (detail::indexed_field<X>) {
    return (v[i + 1] - v[i]) / (dx[i + 1] - dx[i]);
  } else {
    return v[i + 1] - v[i];  // unreachable: refused above
  }
}
/// \brief (v[i] - v[i - 1]) / dx (or / (x[i] - x[i - 1])).
template <detail::indexed_field V, class X>
NONDIM_ALWAYS_INLINE constexpr auto backward_gradient(const V& v, std::size_t i, const X& dx) noexcept {
  detail::check_spacing<X>();
  if constexpr (any_quantity<X>) {
    return (v[i] - v[i - 1]) / dx;
  } else if constexpr (detail::indexed_field<X>) {
    return (v[i] - v[i - 1]) / (dx[i] - dx[i - 1]);
  } else {
    return v[i] - v[i - 1];  // unreachable: refused above
  }
}
/// \brief (v[i + 1] - v[i - 1]) / (2 dx) (or / (x[i + 1] - x[i - 1])): second-order accurate
/// on a uniform grid.
template <detail::indexed_field V, class X>
NONDIM_ALWAYS_INLINE constexpr auto central_gradient(const V& v, std::size_t i, const X& dx) noexcept {
  detail::check_spacing<X>();
  if constexpr (any_quantity<X>) {
    return (v[i + 1] - v[i - 1]) / (2.0 * dx);
  } else if constexpr (detail::indexed_field<X>) {
    return (v[i + 1] - v[i - 1]) / (dx[i + 1] - dx[i - 1]);
  } else {
    return v[i + 1] - v[i - 1];  // unreachable: refused above
  }
}

}  // namespace nondim
