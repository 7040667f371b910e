#pragma once
/// \file owning_field.hpp
/// \brief `field<D, Rep>`: n values of dimension D that the field owns (a `std::vector` of
/// SI values inside), with the element access of the views and `view()` for the kernels.

#include <cstddef>
#include <type_traits>
#include <vector>

#include "../core/inline.hpp"
#include "field_view.hpp"

namespace nondim {

/// \brief Owns n values of dimension D in coherent SI units.
template <dimension D, class Rep = double>
class field {
  static_assert(!std::is_const_v<Rep>, "nondim: a field owns its values; make a read-only view of it instead");

 public:
  using value_type = quantity<D, Rep>;
  using reference = field_reference<D, Rep>;
  using const_reference = field_reference<D, const Rep>;
  using iterator = field_iterator<D, Rep, false>;
  using const_iterator = field_iterator<D, const Rep, false>;
  using rep = Rep;
  static constexpr dimension dim = D;

  field() = default;
  /// \brief n values, zero.
  explicit field(std::size_t n) : values_(n) {}
  /// \brief n values, each `init`.
  field(std::size_t n, const value_type& init) : values_(n, init.si()) {}

  [[nodiscard]] NONDIM_ALWAYS_INLINE std::size_t size() const noexcept { return values_.size(); }
  [[nodiscard]] NONDIM_ALWAYS_INLINE bool empty() const noexcept { return values_.empty(); }
  [[nodiscard]] NONDIM_ALWAYS_INLINE Rep* data() noexcept { return values_.data(); }
  [[nodiscard]] NONDIM_ALWAYS_INLINE const Rep* data() const noexcept { return values_.data(); }
  /// \brief Distance between consecutive elements, in values of Rep: 1.
  [[nodiscard]] static constexpr std::size_t stride() noexcept { return 1; }

  NONDIM_ALWAYS_INLINE reference operator[](std::size_t i) noexcept { return reference(values_.data() + i); }
  NONDIM_ALWAYS_INLINE const_reference operator[](std::size_t i) const noexcept {
    return const_reference(values_.data() + i);
  }

  [[nodiscard]] iterator begin() noexcept { return iterator(values_.data()); }
  [[nodiscard]] iterator end() noexcept { return iterator(values_.data() + values_.size()); }
  [[nodiscard]] const_iterator begin() const noexcept { return const_iterator(values_.data()); }
  [[nodiscard]] const_iterator end() const noexcept { return const_iterator(values_.data() + values_.size()); }

  /// \brief A view of the values (valid until the field is resized or destroyed).
  [[nodiscard]] NONDIM_ALWAYS_INLINE field_view<D, Rep> view() noexcept { return {values_.data(), values_.size()}; }
  [[nodiscard]] NONDIM_ALWAYS_INLINE field_view<D, const Rep> view() const noexcept {
    return {values_.data(), values_.size()};
  }
  NONDIM_ALWAYS_INLINE operator field_view<D, Rep>() noexcept { return view(); }  // NOLINT(google-explicit-constructor)
  NONDIM_ALWAYS_INLINE operator field_view<D, const Rep>() const noexcept {       // NOLINT(google-explicit-constructor)
    return view();
  }

  /// \brief Changes the number of values (new ones are zero); views made before are invalid.
  void resize(std::size_t n) { values_.resize(n); }

 private:
  std::vector<Rep> values_;
};

namespace detail {
template <class T>
struct is_owning_field : std::false_type {};
template <dimension D, class R>
struct is_owning_field<field<D, R>> : std::true_type {};
}  // namespace detail

/// \brief A field view (contiguous or strided) or a `field`, of any dimension.
template <class T>
concept any_field = any_field_view<T> || detail::is_owning_field<std::remove_cvref_t<T>>::value;

}  // namespace nondim
