#pragma once
/// \file reference.hpp
/// \brief `field_reference<D, Rep>`: one element of a typed field, a pointer to a value in
/// coherent SI that reads as `quantity<D>` and accepts only a `quantity<D>`. What
/// `v[i]` and `*it` of the field views return.
///
/// A proxy, as `std::vector<bool>::reference` is: `auto x = v[i]` keeps a reference to the
/// element; write `quantity<D> x = v[i]` (or `v[i].get()`) for a copy of the value.

#include <compare>
#include <concepts>
#include <type_traits>

#include "../core/inline.hpp"
#include "../units/quantity_type.hpp"
#include "../units/spelling.hpp"

namespace nondim {

template <dimension D, class Rep = double>
class field_reference;

namespace detail {

template <class T>
struct is_field_reference : std::false_type {};
template <dimension D, class R>
struct is_field_reference<field_reference<D, R>> : std::true_type {};

template <class T>
concept field_element = is_field_reference<std::remove_cvref_t<T>>::value;

/// An operand of element arithmetic: an element, a quantity or a plain number.
template <class T>
concept element_operand = field_element<T> || any_quantity<T> || scalar<std::remove_cvref_t<T>>;

/// Refuses a write through a read-only view (consteval: no code, even at -O0).
template <dimension D, class Rep>
consteval void check_writable() noexcept {
  static_assert(holds<!std::is_const_v<Rep>, spell<D>, Rep>,
                "nondim: cannot write through a read-only field view (Rep = const double); make the view "
                "over mutable storage");
}

/// At least one of the operands is an element.
template <class A, class B>
concept element_pair = field_element<A> || field_element<B>;

/// The quantity an element reads as; any other operand as it is.
template <class T>
NONDIM_ALWAYS_INLINE constexpr auto element_value(const T& x) noexcept {
  if constexpr (field_element<T>) {
    return x.get();
  } else {
    return x;
  }
}

}  // namespace detail

/// \brief One element of a field of dimension D: reads as `quantity<D>`, assigns from one.
///
/// \tparam D   the field's dimension
/// \tparam Rep the stored number type; `const double` for an element of a read-only view
template <dimension D, class Rep>
class field_reference {
  using value_rep = std::remove_const_t<Rep>;
  static constexpr bool writable = !std::is_const_v<Rep>;

 public:
  using value_type = quantity<D, value_rep>;
  static constexpr dimension dim = D;

  /// \brief The element stored at `si_value` (coherent SI).
  NONDIM_ALWAYS_INLINE constexpr explicit field_reference(Rep* si_value) noexcept : p_(si_value) {}
  field_reference(const field_reference&) = default;

  /// \brief The element's value.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr value_type get() const noexcept {
    return value_type(*p_, detail::si_value_tag{});
  }
  NONDIM_ALWAYS_INLINE constexpr operator value_type() const noexcept {  // NOLINT(google-explicit-constructor)
    return value_type(*p_, detail::si_value_tag{});
  }
  /// \brief The element's value in coherent SI.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr value_rep si() const noexcept { return *p_; }
  /// \brief Where the element is stored.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep* address() const noexcept { return p_; }

  /// A dimensionless element is a number.
  NONDIM_ALWAYS_INLINE constexpr operator value_rep() const noexcept  // NOLINT(google-explicit-constructor)
      requires(D.is_dimensionless()) {
    return *p_;
  }

  /// Refused: reading an element as a quantity of another dimension.
  template <dimension D2, class R2>
  requires(D2 != D) constexpr operator quantity<D2, R2>() const noexcept {  // NOLINT(google-explicit-constructor)
    static_assert(detail::dimensions_involved<detail::spell_named<D2>, detail::spell_named<D>>,
                  "nondim: cannot read a field element as a quantity of another dimension (target first, "
                  "field second)");
    return {};
  }
  /// Refused: a dimensional element is not a raw number.
  template <scalar T>
  requires(!D.is_dimensionless()) constexpr operator T() const noexcept {  // NOLINT(google-explicit-constructor)
    static_assert(detail::dimensions_involved<detail::spell_named<D>, T>,
                  "nondim: a field element of a dimensional field cannot become a raw number; divide it by a "
                  "unit (`v[i] / units::Pa`) or read `v[i].si()`");
    return T{};
  }

  // ---- writing ---------------------------------------------------------------------------

  /// \brief Stores q (same dimension only).
  NONDIM_ALWAYS_INLINE constexpr const field_reference& operator=(
      const value_type& q) const noexcept requires writable {
    *p_ = q.si();
    return *this;
  }
  /// \brief Copies the value of another element (not a rebinding).
  NONDIM_ALWAYS_INLINE constexpr const field_reference& operator=(
      const field_reference& o) const noexcept requires writable {
    *p_ = *o.p_;
    return *this;
  }
  /// \brief Copies the value of an element of a read-only view of the same dimension.
  template <class R2>
  requires(writable && !std::same_as<R2, Rep> &&
           std::convertible_to<std::remove_const_t<R2>, value_rep>) NONDIM_ALWAYS_INLINE
      constexpr const field_reference&
      operator=(const field_reference<D, R2>& o) const noexcept {
    *p_ = static_cast<value_rep>(o.si());
    return *this;
  }

  /// Refused: a quantity of another dimension.
  template <dimension D2, class R2>
  requires(writable&& D2 != D) constexpr const field_reference& operator=(const quantity<D2, R2>&) const noexcept {
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot assign to a field element a quantity of another dimension (field first, value "
                  "second)");
    return *this;
  }
  /// Refused: an element of a field of another dimension.
  template <dimension D2, class R2>
  requires(writable&& D2 != D) constexpr const field_reference& operator=(
      const field_reference<D2, R2>&) const noexcept {
    static_assert(detail::dimensions_involved<detail::spell_named<D>, detail::spell_named<D2>>,
                  "nondim: cannot assign to a field element an element of a field of another dimension (target "
                  "first, source second)");
    return *this;
  }
  /// Refused: writing through a read-only view.
  template <class T>
  requires(!writable) constexpr const field_reference& operator=(const T&) const noexcept {
    static_assert(detail::dimensions_involved<detail::spell<D>, Rep>,
                  "nondim: cannot write through a read-only field view (Rep = const double); make the view "
                  "over mutable storage");
    return *this;
  }

  /// \brief `v[i] += q`, `-=`, `*= x`, `/= x`: the quantity's own rules (and diagnostics) apply.
  template <detail::element_operand Q>
  NONDIM_ALWAYS_INLINE constexpr const field_reference& operator+=(const Q& q) const noexcept {
    detail::check_writable<D, Rep>();
    if constexpr (writable) *p_ = (get() += detail::element_value(q)).si();
    return *this;
  }
  template <detail::element_operand Q>
  NONDIM_ALWAYS_INLINE constexpr const field_reference& operator-=(const Q& q) const noexcept {
    detail::check_writable<D, Rep>();
    if constexpr (writable) *p_ = (get() -= detail::element_value(q)).si();
    return *this;
  }
  template <detail::element_operand Q>
  NONDIM_ALWAYS_INLINE constexpr const field_reference& operator*=(const Q& q) const noexcept {
    detail::check_writable<D, Rep>();
    if constexpr (writable) *p_ = (get() *= detail::element_value(q)).si();
    return *this;
  }
  template <detail::element_operand Q>
  NONDIM_ALWAYS_INLINE constexpr const field_reference& operator/=(const Q& q) const noexcept {
    detail::check_writable<D, Rep>();
    if constexpr (writable) *p_ = (get() /= detail::element_value(q)).si();
    return *this;
  }

  NONDIM_ALWAYS_INLINE constexpr value_type operator+() const noexcept { return get(); }
  NONDIM_ALWAYS_INLINE constexpr value_type operator-() const noexcept { return -get(); }

  /// \brief Exchanges the values of two elements (what `std::sort` and `std::swap_ranges` use).
  friend constexpr void swap(field_reference a, field_reference b) noexcept requires writable {
    const value_rep t = *a.p_;
    *a.p_ = *b.p_;
    *b.p_ = t;
  }

 private:
  Rep* p_;
};

// ---- arithmetic and comparison: the element's quantity takes part ----------------------------
// Each forwards to the operators of quantities (and of units and states), so a mismatch ends in
// their `nondim:` sentence. The element test comes first in each constraint: it keeps these
// templates out of every other comparison in the namespace (`dimension == dimension`).

template <class A, class B>
requires detail::element_pair<A, B> && requires(const A& a, const B& b) {
  detail::element_value(a) + detail::element_value(b);
}
NONDIM_ALWAYS_INLINE constexpr auto operator+(const A& a, const B& b) noexcept {
  return detail::element_value(a) + detail::element_value(b);
}
template <class A, class B>
requires detail::element_pair<A, B> && requires(const A& a, const B& b) {
  detail::element_value(a) - detail::element_value(b);
}
NONDIM_ALWAYS_INLINE constexpr auto operator-(const A& a, const B& b) noexcept {
  return detail::element_value(a) - detail::element_value(b);
}
template <class A, class B>
requires detail::element_pair<A, B> && requires(const A& a, const B& b) {
  detail::element_value(a) * detail::element_value(b);
}
NONDIM_ALWAYS_INLINE constexpr auto operator*(const A& a, const B& b) noexcept {
  return detail::element_value(a) * detail::element_value(b);
}
template <class A, class B>
requires detail::element_pair<A, B> && requires(const A& a, const B& b) {
  detail::element_value(a) / detail::element_value(b);
}
NONDIM_ALWAYS_INLINE constexpr auto operator/(const A& a, const B& b) noexcept {
  return detail::element_value(a) / detail::element_value(b);
}
template <class A, class B>
requires detail::element_pair<A, B> && requires(const A& a, const B& b) {
  detail::element_value(a) == detail::element_value(b);
}
NONDIM_ALWAYS_INLINE constexpr auto operator==(const A& a, const B& b) noexcept {
  return detail::element_value(a) == detail::element_value(b);
}
template <class A, class B>
requires detail::element_pair<A, B> && requires(const A& a, const B& b) {
  detail::element_value(a) <=> detail::element_value(b);
}
NONDIM_ALWAYS_INLINE constexpr auto operator<=>(const A& a, const B& b) noexcept {
  return detail::element_value(a) <=> detail::element_value(b);
}

// ---- direct forms of the common cases -------------------------------------------------------
// The same results as above, computed on the stored values in one step: a debug build (-O0)
// pays for every inlined layer, and these have the fewest. Mismatched sums do not match them
// and take the forwarding forms above, with their diagnostics.

namespace detail {
template <class R1, class R2>
concept same_rep = std::same_as<std::remove_const_t<R1>, std::remove_const_t<R2>>;
}  // namespace detail

template <dimension D1, class R1, dimension D2, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D1 * D2, std::remove_const_t<R1>> operator*(
    field_reference<D1, R1> a, field_reference<D2, R2> b) noexcept {
  return quantity<D1 * D2, std::remove_const_t<R1>>(a.si() * b.si(), detail::si_value_tag{});
}
template <dimension D1, class R1, dimension D2, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D1 / D2, std::remove_const_t<R1>> operator/(
    field_reference<D1, R1> a, field_reference<D2, R2> b) noexcept {
  return quantity<D1 / D2, std::remove_const_t<R1>>(a.si() / b.si(), detail::si_value_tag{});
}
template <dimension D1, class R1, dimension D2, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D1 * D2, R2> operator*(
    field_reference<D1, R1> a, const quantity<D2, R2>& b) noexcept {
  return quantity<D1 * D2, R2>(a.si() * b.si(), detail::si_value_tag{});
}
template <dimension D1, class R1, dimension D2, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D1 / D2, R2> operator/(
    field_reference<D1, R1> a, const quantity<D2, R2>& b) noexcept {
  return quantity<D1 / D2, R2>(a.si() / b.si(), detail::si_value_tag{});
}
template <dimension D1, class R1, dimension D2, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D1 * D2, R1> operator*(
    quantity<D1, R1> a, field_reference<D2, R2> b) noexcept {
  return quantity<D1 * D2, R1>(a.si() * b.si(), detail::si_value_tag{});
}
template <dimension D1, class R1, dimension D2, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D1 / D2, R1> operator/(
    quantity<D1, R1> a, field_reference<D2, R2> b) noexcept {
  return quantity<D1 / D2, R1>(a.si() / b.si(), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, std::remove_const_t<R>> operator*(T x, field_reference<D, R> a) noexcept {
  using V = std::remove_const_t<R>;
  return quantity<D, V>(static_cast<V>(x) * a.si(), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, std::remove_const_t<R>> operator*(field_reference<D, R> a, T x) noexcept {
  using V = std::remove_const_t<R>;
  return quantity<D, V>(a.si() * static_cast<V>(x), detail::si_value_tag{});
}
template <dimension D, class R, scalar T>
NONDIM_ALWAYS_INLINE constexpr quantity<D, std::remove_const_t<R>> operator/(field_reference<D, R> a, T x) noexcept {
  using V = std::remove_const_t<R>;
  return quantity<D, V>(a.si() / static_cast<V>(x), detail::si_value_tag{});
}
template <dimension D, class R1, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D, std::remove_const_t<R1>> operator+(
    field_reference<D, R1> a, field_reference<D, R2> b) noexcept {
  return quantity<D, std::remove_const_t<R1>>(a.si() + b.si(), detail::si_value_tag{});
}
template <dimension D, class R1, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D, std::remove_const_t<R1>> operator-(
    field_reference<D, R1> a, field_reference<D, R2> b) noexcept {
  return quantity<D, std::remove_const_t<R1>>(a.si() - b.si(), detail::si_value_tag{});
}
template <dimension D, class R1, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D, R2> operator+(
    field_reference<D, R1> a, const quantity<D, R2>& b) noexcept {
  return quantity<D, R2>(a.si() + b.si(), detail::si_value_tag{});
}
template <dimension D, class R1, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D, R2> operator-(
    field_reference<D, R1> a, const quantity<D, R2>& b) noexcept {
  return quantity<D, R2>(a.si() - b.si(), detail::si_value_tag{});
}
template <dimension D, class R1, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D, R1> operator+(
    quantity<D, R1> a, field_reference<D, R2> b) noexcept {
  return quantity<D, R1>(a.si() + b.si(), detail::si_value_tag{});
}
template <dimension D, class R1, class R2>
requires detail::same_rep<R1, R2> NONDIM_ALWAYS_INLINE constexpr quantity<D, R1> operator-(
    quantity<D, R1> a, field_reference<D, R2> b) noexcept {
  return quantity<D, R1>(a.si() - b.si(), detail::si_value_tag{});
}

}  // namespace nondim
