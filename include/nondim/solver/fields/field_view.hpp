#pragma once
/// \file field_view.hpp
/// \brief Typed views over a solver's own arrays, no copy: `field_view<D, Rep>` over
/// consecutive values in coherent SI, `strided_field_view<D, Rep>` over one member of an
/// array of structs. Elements read as `quantity<D>` and accept only a `quantity<D>`;
/// `Rep = const double` gives a read-only view; `data()` gives the storage for I/O and MPI.
///
/// \code
///   std::vector<double> p_si(n);                                  // the solver's storage, Pa
///   nondim::field_view<dims::pressure> p{std::span<double>(p_si)};
///   p[0] = 101.325 * units::kPa;                                  // p[0] = 2.0 * units::m; does not compile
///   quantity<dims::pressure> p0 = p[0];
///
///   struct cell { double rho, u, p; };                            // an array of structs
///   nondim::strided_field_view<dims::velocity> u(&cells[0].u, cells.size(), sizeof(cell) / sizeof(double));
/// \endcode

#include <cstddef>
#include <span>
#include <type_traits>

#include "../core/inline.hpp"
#include "iterator.hpp"
#include "reference.hpp"

namespace nondim {

template <dimension D, class Rep = double>
class field_view;
template <dimension D, class Rep = double>
class strided_field_view;

/// \brief Consecutive values of dimension D in coherent SI units, owned by someone else.
/// \tparam D   the dimension of every element
/// \tparam Rep the stored number type; `const double` for a read-only view
template <dimension D, class Rep>
class field_view {
 public:
  using value_type = quantity<D, std::remove_const_t<Rep>>;
  using reference = field_reference<D, Rep>;
  using iterator = field_iterator<D, Rep, false>;
  using rep = Rep;
  static constexpr dimension dim = D;

  constexpr field_view() noexcept = default;
  /// \brief A view of `si_values`, values in coherent SI units (explicit: raw numbers become
  /// typed only where the code says so).
  NONDIM_ALWAYS_INLINE constexpr explicit field_view(std::span<Rep> si_values) noexcept
      : data_(si_values.data()), size_(si_values.size()) {}
  /// \brief A view of `count` values from `first`.
  NONDIM_ALWAYS_INLINE constexpr field_view(Rep* first, std::size_t count) noexcept : data_(first), size_(count) {}
  /// \brief A read-only view from a mutable one.
  template <class R2>
  requires(std::is_const_v<Rep>&& std::same_as<const R2, Rep>) NONDIM_ALWAYS_INLINE
      constexpr field_view(const field_view<D, R2>& o) noexcept  // NOLINT(google-explicit-constructor)
      : data_(o.data()), size_(o.size()) {}
  /// Refused: a field of another dimension.
  template <dimension D2, class R2>
  requires(D2 != D) constexpr field_view(const field_view<D2, R2>&) noexcept {  // NOLINT(google-explicit-constructor)
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot view a field as one of another dimension (target first, source second)");
  }

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::size_t size() const noexcept { return size_; }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr bool empty() const noexcept { return size_ == 0; }
  /// \brief The storage (values in coherent SI), for I/O and message passing.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep* data() const noexcept { return data_; }
  /// \brief The storage as a span of SI values.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::span<Rep> si_values() const noexcept { return {data_, size_}; }
  /// \brief Distance between consecutive elements, in values of Rep: 1.
  [[nodiscard]] static constexpr std::size_t stride() noexcept { return 1; }

  /// \brief Element i (unchecked, as `std::span`).
  NONDIM_ALWAYS_INLINE constexpr reference operator[](std::size_t i) const noexcept { return reference(data_ + i); }

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr iterator begin() const noexcept { return iterator(data_); }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr iterator end() const noexcept { return iterator(data_ + size_); }

  /// \brief The `count` elements from `offset` (unchecked, as `std::span::subspan`).
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr field_view subview(std::size_t offset,
                                                                  std::size_t count) const noexcept {
    return field_view(data_ + offset, count);
  }

 private:
  Rep* data_ = nullptr;
  std::size_t size_ = 0;
};

/// \brief Values of dimension D spaced `stride` values of Rep apart: one member of an array of
/// structs (`stride = sizeof(cell) / sizeof(double)`), one component of interleaved storage.
template <dimension D, class Rep>
class strided_field_view {
 public:
  using value_type = quantity<D, std::remove_const_t<Rep>>;
  using reference = field_reference<D, Rep>;
  using iterator = field_iterator<D, Rep, true>;
  using rep = Rep;
  static constexpr dimension dim = D;

  constexpr strided_field_view() noexcept = default;
  /// \brief `count` values, the first at `first`, each `stride` values of Rep after the one before.
  NONDIM_ALWAYS_INLINE constexpr strided_field_view(Rep* first, std::size_t count, std::size_t stride) noexcept
      : data_(first), size_(count), stride_(stride) {}
  /// \brief A read-only view from a mutable one.
  template <class R2>
  requires(std::is_const_v<Rep>&& std::same_as<const R2, Rep>) NONDIM_ALWAYS_INLINE
      constexpr strided_field_view(const strided_field_view<D, R2>& o) noexcept  // NOLINT(google-explicit-constructor)
      : data_(o.data()), size_(o.size()), stride_(o.stride()) {}
  /// \brief A contiguous view seen with stride 1 (so one function serves both).
  template <class R2>
  requires(std::same_as<R2, Rep> || (std::is_const_v<Rep> && std::same_as<const R2, Rep>)) NONDIM_ALWAYS_INLINE
      constexpr strided_field_view(const field_view<D, R2>& o) noexcept  // NOLINT(google-explicit-constructor)
      : data_(o.data()), size_(o.size()), stride_(1) {}
  /// Refused: a field of another dimension.
  template <dimension D2, class R2>
  requires(D2 != D) constexpr strided_field_view(const strided_field_view<D2, R2>&) noexcept {  // NOLINT
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot view a field as one of another dimension (target first, source second)");
  }

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::size_t size() const noexcept { return size_; }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr bool empty() const noexcept { return size_ == 0; }
  /// \brief Where the first element is stored.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep* data() const noexcept { return data_; }
  /// \brief Distance between consecutive elements, in values of Rep.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::size_t stride() const noexcept { return stride_; }

  /// \brief Element i (unchecked).
  NONDIM_ALWAYS_INLINE constexpr reference operator[](std::size_t i) const noexcept {
    return reference(data_ + i * stride_);
  }

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr iterator begin() const noexcept {
    return iterator(data_, static_cast<std::ptrdiff_t>(stride_));
  }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr iterator end() const noexcept {
    return iterator(data_ + size_ * stride_, static_cast<std::ptrdiff_t>(stride_));
  }

  /// \brief The `count` elements from `offset` (unchecked).
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr strided_field_view subview(std::size_t offset,
                                                                          std::size_t count) const noexcept {
    return strided_field_view(data_ + offset * stride_, count, stride_);
  }

 private:
  Rep* data_ = nullptr;
  std::size_t size_ = 0;
  std::size_t stride_ = 1;
};

/// \brief The view of member `m` of every struct in `structs`: `member_view<dims::pressure>(cells, &cell::p)`.
/// The struct's size must be a whole number of the member's type (no padding of another size).
template <dimension D, class S, class M, class Rep>
requires std::same_as<std::remove_const_t<S>, M> NONDIM_ALWAYS_INLINE constexpr auto member_view(std::span<S> structs,
                                                                                                 Rep M::*m) noexcept {
  static_assert(sizeof(S) % sizeof(Rep) == 0,
                "nondim: member_view needs a struct whose size is a whole number of the member's type");
  using R = std::conditional_t<std::is_const_v<S>, const Rep, Rep>;
  R* first = structs.empty() ? nullptr : &(structs.data()->*m);
  return strided_field_view<D, R>(first, structs.size(), sizeof(S) / sizeof(Rep));
}

namespace detail {
template <class T>
struct is_field_view : std::false_type {};
template <dimension D, class R>
struct is_field_view<field_view<D, R>> : std::true_type {};
template <dimension D, class R>
struct is_field_view<strided_field_view<D, R>> : std::true_type {};
}  // namespace detail

/// \brief A `field_view` or `strided_field_view` of any dimension.
template <class T>
concept any_field_view = detail::is_field_view<std::remove_cvref_t<T>>::value;

}  // namespace nondim
