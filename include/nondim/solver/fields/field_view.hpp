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
///
/// Both are thin names of one class template, `basic_field_view<D, Rep, Strided>`, whose stride
/// is known at compile time (1, `Strided = false`) or kept at run time (`Strided = true`).

#include <cstddef>
#include <span>
#include <type_traits>

#include "../core/inline.hpp"
#include "iterator.hpp"
#include "reference.hpp"

namespace nondim {

/// \brief Values of dimension D in coherent SI units, owned by someone else, each `stride()`
/// values of Rep after the one before. Use it by its names `field_view` and `strided_field_view`.
/// \tparam D       the dimension of every element
/// \tparam Rep     the stored number type; `const double` for a read-only view
/// \tparam Strided false: consecutive values (stride 1, known at compile time); true: a
///                 stride given at run time (one member of an array of structs)
template <dimension D, class Rep, bool Strided>
class basic_field_view {
 public:
  using value_type = quantity<D, std::remove_const_t<Rep>>;
  using reference = field_reference<D, Rep>;
  using iterator = field_iterator<D, Rep, Strided>;
  using rep = Rep;
  static constexpr dimension dim = D;

  constexpr basic_field_view() noexcept = default;
  /// \brief A view of `si_values`, values in coherent SI units (explicit: raw numbers become
  /// typed only where the code says so).
  NONDIM_ALWAYS_INLINE constexpr explicit basic_field_view(std::span<Rep> si_values) noexcept requires(!Strided)
      : data_(si_values.data()), size_(si_values.size()) {}
  /// \brief A view of `count` consecutive values from `first`.
  NONDIM_ALWAYS_INLINE constexpr basic_field_view(Rep* first, std::size_t count) noexcept requires(!Strided)
      : data_(first), size_(count) {}
  /// \brief `count` values, the first at `first`, each `stride` values of Rep after the one before.
  NONDIM_ALWAYS_INLINE constexpr basic_field_view(Rep* first, std::size_t count, std::size_t stride) noexcept
      requires(Strided)
      : data_(first), size_(count), stride_(stride) {}
  /// \brief A read-only view from a mutable one.
  template <class R2>
  requires(std::is_const_v<Rep>&& std::same_as<const R2, Rep>) NONDIM_ALWAYS_INLINE constexpr basic_field_view(
      const basic_field_view<D, R2, Strided>& o) noexcept  // NOLINT(google-explicit-constructor)
      : data_(o.data()), size_(o.size()), stride_(o.stride()) {}
  /// \brief A contiguous view seen with stride 1 (so one function serves both).
  template <class R2>
  requires(Strided &&
           (std::same_as<R2, Rep> || (std::is_const_v<Rep> && std::same_as<const R2, Rep>))) NONDIM_ALWAYS_INLINE
      constexpr basic_field_view(const basic_field_view<D, R2, false>& o) noexcept  // NOLINT
      : data_(o.data()), size_(o.size()), stride_(1) {}
  /// Refused: a field of another dimension.
  template <dimension D2, class R2, bool S2>
  requires(D2 != D) constexpr basic_field_view(const basic_field_view<D2, R2, S2>&) noexcept {  // NOLINT
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot view a field as one of another dimension (target first, source second)");
  }

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::size_t size() const noexcept { return size_; }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr bool empty() const noexcept { return size_ == 0; }
  /// \brief The storage (values in coherent SI; the first element), for I/O and message passing.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep* data() const noexcept { return data_; }
  /// \brief The storage as a span of SI values (consecutive values only).
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::span<Rep> si_values() const noexcept requires(!Strided) {
    return {data_, size_};
  }
  /// \brief Distance between consecutive elements, in values of Rep: 1, known at compile time.
  [[nodiscard]] static constexpr std::size_t stride() noexcept requires(!Strided) { return 1; }
  /// \brief Distance between consecutive elements, in values of Rep.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::size_t stride() const noexcept requires(Strided) { return stride_; }

  /// \brief Element i (unchecked, as `std::span`).
  NONDIM_ALWAYS_INLINE constexpr reference operator[](std::size_t i) const noexcept {
    if constexpr (Strided) {
      return reference(data_ + i * stride_);
    } else {
      return reference(data_ + i);
    }
  }

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr iterator begin() const noexcept {
    return iterator(data_, static_cast<std::ptrdiff_t>(stride()));
  }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr iterator end() const noexcept {
    return iterator(data_ + size_ * stride(), static_cast<std::ptrdiff_t>(stride()));
  }

 private:
  /// The stride when it is kept at run time; nothing otherwise.
  struct no_stride {
    constexpr no_stride() noexcept = default;
    constexpr no_stride(std::size_t) noexcept {}  // NOLINT(google-explicit-constructor)
  };
  Rep* data_ = nullptr;
  std::size_t size_ = 0;
  [[no_unique_address]] std::conditional_t<Strided, std::size_t, no_stride> stride_ = 1;
};

/// \brief Consecutive values of dimension D in coherent SI units (stride 1, known at compile time).
template <dimension D, class Rep = double>
class field_view : public basic_field_view<D, Rep, false> {
  using base = basic_field_view<D, Rep, false>;

 public:
  using base::base;
  constexpr field_view() noexcept = default;
  NONDIM_ALWAYS_INLINE constexpr field_view(const base& v) noexcept : base(v) {}  // NOLINT(google-explicit-constructor)

  /// \brief The `count` elements from `offset` (unchecked, as `std::span::subspan`).
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr field_view subview(std::size_t offset,
                                                                  std::size_t count) const noexcept {
    return field_view(this->data() + offset, count);
  }
};

/// \brief Values of dimension D spaced `stride` values of Rep apart: one member of an array of
/// structs (`stride = sizeof(cell) / sizeof(double)`), one component of interleaved storage.
template <dimension D, class Rep = double>
class strided_field_view : public basic_field_view<D, Rep, true> {
  using base = basic_field_view<D, Rep, true>;

 public:
  using base::base;
  constexpr strided_field_view() noexcept = default;
  NONDIM_ALWAYS_INLINE constexpr strided_field_view(const base& v) noexcept  // NOLINT(google-explicit-constructor)
      : base(v) {}

  /// \brief The `count` elements from `offset` (unchecked).
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr strided_field_view subview(std::size_t offset,
                                                                          std::size_t count) const noexcept {
    return strided_field_view(this->data() + offset * this->stride(), count, this->stride());
  }
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
