#pragma once
/// \file iterator.hpp
/// \brief `field_iterator`: the random-access iterator of the field views. Dereferenced it
/// gives a `field_reference` (a proxy, as `std::vector<bool>`'s iterators do), so the
/// standard algorithms read and write quantities.

#include <compare>
#include <cstddef>
#include <iterator>
#include <type_traits>

#include "../core/inline.hpp"
#include "reference.hpp"

namespace nondim {

/// \brief Random-access iterator over the elements of a field view.
/// \tparam Strided false: consecutive values (stride 1, known at compile time); true: a
///         run-time stride, counted in values of Rep.
template <dimension D, class Rep, bool Strided>
class field_iterator {
 public:
  using iterator_concept = std::random_access_iterator_tag;
  using iterator_category = std::random_access_iterator_tag;
  using value_type = quantity<D, std::remove_const_t<Rep>>;
  using difference_type = std::ptrdiff_t;
  using reference = field_reference<D, Rep>;
  using pointer = void;

  constexpr field_iterator() noexcept = default;
  NONDIM_ALWAYS_INLINE constexpr explicit field_iterator(Rep* p, std::ptrdiff_t stride = 1) noexcept
      : p_(p), stride_(stride) {}
  /// \brief A read-only iterator from a mutable one.
  template <class R2>
  requires(std::is_const_v<Rep>&& std::same_as<const R2, Rep>) NONDIM_ALWAYS_INLINE
      constexpr field_iterator(const field_iterator<D, R2, Strided>& o) noexcept  // NOLINT(google-explicit-constructor)
      : p_(o.base()), stride_(o.stride()) {}

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep* base() const noexcept { return p_; }
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::ptrdiff_t stride() const noexcept { return step(); }

  NONDIM_ALWAYS_INLINE constexpr reference operator*() const noexcept { return reference(p_); }
  NONDIM_ALWAYS_INLINE constexpr reference operator[](difference_type n) const noexcept {
    return reference(p_ + n * step());
  }

  NONDIM_ALWAYS_INLINE constexpr field_iterator& operator++() noexcept {
    p_ += step();
    return *this;
  }
  NONDIM_ALWAYS_INLINE constexpr field_iterator operator++(int) noexcept {
    field_iterator t = *this;
    p_ += step();
    return t;
  }
  NONDIM_ALWAYS_INLINE constexpr field_iterator& operator--() noexcept {
    p_ -= step();
    return *this;
  }
  NONDIM_ALWAYS_INLINE constexpr field_iterator operator--(int) noexcept {
    field_iterator t = *this;
    p_ -= step();
    return t;
  }
  NONDIM_ALWAYS_INLINE constexpr field_iterator& operator+=(difference_type n) noexcept {
    p_ += n * step();
    return *this;
  }
  NONDIM_ALWAYS_INLINE constexpr field_iterator& operator-=(difference_type n) noexcept {
    p_ -= n * step();
    return *this;
  }
  NONDIM_ALWAYS_INLINE friend constexpr field_iterator operator+(field_iterator it, difference_type n) noexcept {
    return it += n;
  }
  NONDIM_ALWAYS_INLINE friend constexpr field_iterator operator+(difference_type n, field_iterator it) noexcept {
    return it += n;
  }
  NONDIM_ALWAYS_INLINE friend constexpr field_iterator operator-(field_iterator it, difference_type n) noexcept {
    return it -= n;
  }
  NONDIM_ALWAYS_INLINE friend constexpr difference_type operator-(const field_iterator& a,
                                                                  const field_iterator& b) noexcept {
    return (a.p_ - b.p_) / a.step();
  }
  NONDIM_ALWAYS_INLINE friend constexpr bool operator==(const field_iterator& a, const field_iterator& b) noexcept {
    return a.p_ == b.p_;
  }
  NONDIM_ALWAYS_INLINE friend constexpr std::strong_ordering operator<=>(const field_iterator& a,
                                                                         const field_iterator& b) noexcept {
    // a negative stride walks memory backwards
    return a.step() < 0 ? b.p_ <=> a.p_ : a.p_ <=> b.p_;
  }

 private:
  NONDIM_ALWAYS_INLINE constexpr std::ptrdiff_t step() const noexcept {
    if constexpr (Strided) {
      return stride_;
    } else {
      return 1;
    }
  }

  Rep* p_ = nullptr;
  std::ptrdiff_t stride_ = 1;  ///< unused when not Strided
};

}  // namespace nondim
