#pragma once
/// \file state.hpp
/// \brief State vectors: a typed set of components, each with its own dimension and a name
/// (a tag type), read and written per cell over the layouts solvers use.
///
/// \code
///   // the conserved variables of quasi-one-dimensional flow and their fluxes
///   struct mass_per_length : component<dims::mass / dims::length> {};          // rho A
///   struct momentum_per_length : component<dims::mass_flow_rate> {};           // rho u A
///   struct energy_per_length : component<dims::energy / dims::length> {};      // rho E A
///   using conserved = state_set<mass_per_length, momentum_per_length, energy_per_length>;
///
///   state_view<conserved, layout::soa> U(u_storage.data(), n);   // double[3][n]
///   state_view<conserved, layout::aos> V(v_storage.data(), n);   // double[n][3]
///   U[i] = U[i] - dt / dx * (F[i + 1] - F[i]);   // componentwise, every dimension checked
///   auto rho_a = U[i].get<mass_per_length>();     // or get<0>(): a field_reference
///   auto rho_a_field = U.get<mass_per_length>();  // a field_view (soa) or strided_field_view (aos)
/// \endcode
///
/// Sums and assignments need the same number of components and, position by position,
/// the same dimension (the names of the left side are kept); otherwise a `nondim:` sentence
/// names the position, the component and both dimensions. Multiplying a state by a quantity
/// multiplies the dimension of every component (dt/dx times a flux is a change of state).

#include <array>
#include <cstddef>
#include <span>
#include <string>
#include <type_traits>
#include <utility>

#include "../core/inline.hpp"
#include "../units/quantity_type.hpp"
#include "../units/spelling.hpp"
#include "errors.hpp"
#include "field_view.hpp"
#include "reference.hpp"

namespace nondim {

/// \brief Base of a component tag: `struct density : component<dims::density> {};`.
template <dimension D>
struct component {
  static constexpr dimension dim = D;
};

/// \brief A component whose dimension was multiplied by a quantity's: keeps its origin's name.
template <class Origin, dimension D>
struct scaled_component {
  using origin = Origin;
  static constexpr dimension dim = D;
};

/// \brief A type that names a component: it has a `dimension dim`.
template <class C>
concept state_component = requires {
  { C::dim } -> std::convertible_to<dimension>;
};

namespace detail {
template <class C>
struct origin_of {
  using type = C;
};
template <class O, dimension D>
struct origin_of<scaled_component<O, D>> {
  using type = O;
};

template <std::size_t I, class T, class... R>
struct nth_type {
  using type = typename nth_type<I - 1, R...>::type;
};
template <class T, class... R>
struct nth_type<0, T, R...> {
  using type = T;
};

template <std::size_t N>
consteval std::size_t first_true(const std::array<bool, N>& b) {
  for (std::size_t i = 0; i < N; ++i)
    if (b[i]) return i;
  return N;
}

/// Names a component in compile errors: its 1-based position, its tag, the dimension it has.
template <std::size_t Position, class Component, class Spelled>
struct component_at {};
/// Names a tag that is not a component of the state.
template <class Tag, class... Components>
struct not_a_component_of {};
}  // namespace detail

/// \brief The components of a state vector, in storage order.
template <state_component... C>
struct state_set {
  static_assert(sizeof...(C) > 0, "nondim: a state needs at least one component");
  static constexpr std::size_t size = sizeof...(C);
  static constexpr std::array<dimension, size> dims{C::dim...};

  /// \brief The tag of component I.
  template <std::size_t I>
  using component_type = typename detail::nth_type<I, C...>::type;

  /// \brief Position of Tag (or of a component scaled from it); `size` when absent.
  template <class Tag>
  static constexpr std::size_t index_of = detail::first_true<size>(
      {(std::is_same_v<Tag, C> || std::is_same_v<Tag, typename detail::origin_of<C>::type>)...});
};

/// \brief Layouts of a state's storage, `K` components of `n` cells.
namespace layout {
/// structure of arrays, `double[K][n]`: component k of cell i at `data[k * n + i]`
struct soa {};
/// array of structures, `double[n][K]`: component k of cell i at `data[i * K + k]`
struct aos {};
}  // namespace layout

template <class Set, class Rep = double>
class state;
template <class Set, class Layout, class Rep = double>
class state_ref;
template <class Set, class Layout, class Rep = double>
class state_view;

namespace detail {

template <class T>
struct state_traits {
  static constexpr bool is_state = false;
};
template <class S, class R>
struct state_traits<state<S, R>> {
  static constexpr bool is_state = true;
  using set = S;
  using rep = std::remove_const_t<R>;
};
template <class S, class L, class R>
struct state_traits<state_ref<S, L, R>> {
  static constexpr bool is_state = true;
  using set = S;
  using rep = std::remove_const_t<R>;
};

/// A state value or the state of one cell of a view.
template <class T>
concept state_like = state_traits<std::remove_cvref_t<T>>::is_state;

template <class T>
using set_of = typename state_traits<std::remove_cvref_t<T>>::set;
template <class T>
using state_rep = typename state_traits<std::remove_cvref_t<T>>::rep;

template <class Set, dimension Q>
struct scaled_set;
template <class... C, dimension Q>
struct scaled_set<state_set<C...>, Q> {
  using type = state_set<scaled_component<typename origin_of<C>::type, C::dim * Q>...>;
};

/// Position of the first component whose dimensions differ (size of A when none).
template <class A, class B>
consteval std::size_t first_mismatch() {
  for (std::size_t i = 0; i < A::size; ++i)
    if (A::dims[i] != B::dims[i]) return i;
  return A::size;
}

template <std::size_t KA, std::size_t KB>
struct component_counts {};

template <class A, class B>
consteval void check_counts() {
  static_assert(holds<A::size == B::size, component_counts<A::size, B::size>>,
                "nondim: cannot combine state vectors with different numbers of components (counts shown, left "
                "first)");
}

// The diagnostics name the first component whose dimensions differ: its position, both
// tags, both dimensions. (Computed in functions at namespace scope: GCC 12 crashes on these
// spellings inside a member of a class template.)
#define NONDIM_STATE_CHECK(NAME, MESSAGE)                                                                           \
  template <class A, class B>                                                                                       \
  consteval void NAME() {                                                                                           \
    check_counts<A, B>();                                                                                           \
    constexpr bool same_size = A::size == B::size;                                                                  \
    constexpr std::size_t at = same_size ? first_mismatch<A, B>() : A::size;                                        \
    constexpr std::size_t shown = at < A::size ? at : 0;                                                            \
    constexpr std::size_t shown_b = shown < B::size ? shown : 0;                                                    \
    constexpr dimension left = A::dims[shown];                                                                      \
    constexpr dimension right = B::dims[shown_b];                                                                   \
    static_assert(holds<(!same_size || at == A::size),                                                              \
                        component_at<shown + 1, typename A::template component_type<shown>, spell_named<left>>,     \
                        component_at<shown + 1, typename B::template component_type<shown_b>, spell_named<right>>>, \
                  MESSAGE);                                                                                         \
  }

NONDIM_STATE_CHECK(check_assignable,
                   "nondim: cannot assign a state from one whose component at the position shown has another "
                   "dimension (target's component first, source's second)")
NONDIM_STATE_CHECK(check_addable,
                   "nondim: cannot add or subtract state vectors whose component at the position shown differs in "
                   "dimension (left's component first, right's second)")
#undef NONDIM_STATE_CHECK

template <class Set, class Rep>
consteval void check_state_writable() noexcept {
  static_assert(holds<!std::is_const_v<Rep>, Set, Rep>,
                "nondim: cannot write through a read-only state view (Rep = const double); make the view "
                "over mutable storage");
}

template <class Set, class Tag>
consteval void check_component() {
  static_assert(holds<(Set::template index_of<Tag> < Set::size), not_a_component_of<Tag, Set>>,
                "nondim: this state has no component of the tag shown (first), see its set (second)");
}

}  // namespace detail

/// \brief The state of one cell, held by value: K numbers in coherent SI.
template <class Set, class Rep>
class state {
  static_assert(!std::is_const_v<Rep>, "nondim: a state value owns its numbers; Rep must not be const");

 public:
  using set = Set;
  using rep = Rep;
  static constexpr std::size_t size = Set::size;

  /// \brief Every component zero.
  constexpr state() noexcept = default;

  /// \brief From one quantity per component, in storage order (each dimension checked).
  template <class... Q>
  requires(sizeof...(Q) == size && sizeof...(Q) > 0 && (detail::element_operand<Q> && ...)) NONDIM_ALWAYS_INLINE
      constexpr explicit state(const Q&... q) noexcept {
    using given = state_set<component<decltype(detail::element_value(q))::dim>...>;
    detail::check_assignable<Set, given>();
    std::size_t k = 0;
    ((si_[k++] = static_cast<Rep>(detail::element_value(q).si())), ...);
  }

  /// \brief From a state of the same dimensions (the names of this set are kept).
  template <detail::state_like S>
  requires(!std::is_same_v<std::remove_cvref_t<S>, state>) NONDIM_ALWAYS_INLINE
      constexpr state(const S& o) noexcept {  // NOLINT(google-explicit-constructor)
    detail::check_assignable<Set, detail::set_of<S>>();
    if constexpr (Set::size == detail::set_of<S>::size)
      for (std::size_t k = 0; k < size; ++k) si_[k] = static_cast<Rep>(o.si(k));
  }

  /// \brief From the components' values in coherent SI.
  [[nodiscard]] NONDIM_ALWAYS_INLINE static constexpr state from_si(const std::array<Rep, size>& v) noexcept {
    state s;
    for (std::size_t k = 0; k < size; ++k) s.si_[k] = v[k];
    return s;
  }

  /// \brief Component k in coherent SI.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep si(std::size_t k) const noexcept { return si_[k]; }
  NONDIM_ALWAYS_INLINE constexpr Rep& si(std::size_t k) noexcept { return si_[k]; }

  /// \brief Component I (by position) or Tag: an element that reads and writes it.
  template <std::size_t I>
  NONDIM_ALWAYS_INLINE constexpr auto get() & noexcept {
    static_assert(I < size, "nondim: component index out of range");
    return field_reference<Set::dims[I], Rep>(si_ + I);
  }
  template <std::size_t I>
  NONDIM_ALWAYS_INLINE constexpr auto get() const& noexcept {
    static_assert(I < size, "nondim: component index out of range");
    return field_reference<Set::dims[I], const Rep>(si_ + I);
  }
  /// On a temporary: the value (a reference would dangle).
  template <std::size_t I>
  NONDIM_ALWAYS_INLINE constexpr auto get() && noexcept {
    static_assert(I < size, "nondim: component index out of range");
    return quantity<Set::dims[I], Rep>::from_si(si_[I]);
  }
  template <class Tag>
  NONDIM_ALWAYS_INLINE constexpr auto get() & noexcept {
    detail::check_component<Set, Tag>();
    return get<Set::template index_of<Tag>>();
  }
  template <class Tag>
  NONDIM_ALWAYS_INLINE constexpr auto get() const& noexcept {
    detail::check_component<Set, Tag>();
    return get<Set::template index_of<Tag>>();
  }
  template <class Tag>
  NONDIM_ALWAYS_INLINE constexpr auto get() && noexcept {
    detail::check_component<Set, Tag>();
    return std::move(*this).template get<Set::template index_of<Tag>>();
  }

  template <detail::state_like S>
  NONDIM_ALWAYS_INLINE constexpr state& operator+=(const S& o) noexcept {
    detail::check_addable<Set, detail::set_of<S>>();
    if constexpr (Set::size == detail::set_of<S>::size)
      for (std::size_t k = 0; k < size; ++k) si_[k] += o.si(k);
    return *this;
  }
  template <detail::state_like S>
  NONDIM_ALWAYS_INLINE constexpr state& operator-=(const S& o) noexcept {
    detail::check_addable<Set, detail::set_of<S>>();
    if constexpr (Set::size == detail::set_of<S>::size)
      for (std::size_t k = 0; k < size; ++k) si_[k] -= o.si(k);
    return *this;
  }

 private:
  Rep si_[size]{};
};

/// \brief The state of cell i of a `state_view`: reads as `state<Set>`, assigns from a state of
/// the same dimensions. A proxy, like `field_reference`.
template <class Set, class Layout, class Rep>
class state_ref {
  using value_rep = std::remove_const_t<Rep>;
  static constexpr bool writable = !std::is_const_v<Rep>;
  static constexpr bool soa = std::is_same_v<Layout, layout::soa>;

 public:
  using set = Set;
  using value_type = state<Set, value_rep>;
  static constexpr std::size_t size = Set::size;

  /// \brief The cell whose component 0 is at `first`; component k is `k * step` further
  /// (`step` is the number of cells for soa, ignored for aos where it is 1).
  NONDIM_ALWAYS_INLINE constexpr state_ref(Rep* first, std::size_t step) noexcept : p_(first), step_(step) {}
  state_ref(const state_ref&) = default;

  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr value_rep si(std::size_t k) const noexcept { return *at(k); }
  /// \brief A copy of the cell's state.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr value_type get() const noexcept {
    value_type s;
    for (std::size_t k = 0; k < size; ++k) s.si(k) = *at(k);
    return s;
  }

  /// \brief Component I (by position) or Tag of this cell.
  /// Each computes the address itself, with no call to another member: a debug build (-O0)
  /// pays for every inlined layer.
  template <std::size_t I>
  NONDIM_ALWAYS_INLINE constexpr auto get() const noexcept {
    static_assert(I < size, "nondim: component index out of range");
    if constexpr (soa) {
      return field_reference<Set::dims[I], Rep>(p_ + I * step_);
    } else {
      return field_reference<Set::dims[I], Rep>(p_ + I);
    }
  }
  template <class Tag>
  NONDIM_ALWAYS_INLINE constexpr auto get() const noexcept {
    detail::check_component<Set, Tag>();
    constexpr std::size_t i = Set::template index_of<Tag>;
    if constexpr (i >= size) {
      return;  // refused above
    } else if constexpr (soa) {
      return field_reference<Set::dims[i], Rep>(p_ + i * step_);
    } else {
      return field_reference<Set::dims[i], Rep>(p_ + i);
    }
  }

  /// \brief Stores a state of the same dimensions, component by component.
  template <detail::state_like S>
  NONDIM_ALWAYS_INLINE constexpr const state_ref& operator=(const S& o) const noexcept {
    detail::check_state_writable<Set, Rep>();
    detail::check_assignable<Set, detail::set_of<S>>();
    if constexpr (writable && Set::size == detail::set_of<S>::size)
      for (std::size_t k = 0; k < size; ++k) *at(k) = static_cast<value_rep>(o.si(k));
    return *this;
  }
  NONDIM_ALWAYS_INLINE constexpr const state_ref& operator=(const state_ref& o) const noexcept {
    detail::check_state_writable<Set, Rep>();
    if constexpr (writable)
      for (std::size_t k = 0; k < size; ++k) *at(k) = o.si(k);
    return *this;
  }
  template <detail::state_like S>
  NONDIM_ALWAYS_INLINE constexpr const state_ref& operator+=(const S& o) const noexcept {
    detail::check_state_writable<Set, Rep>();
    detail::check_addable<Set, detail::set_of<S>>();
    if constexpr (writable && Set::size == detail::set_of<S>::size)
      for (std::size_t k = 0; k < size; ++k) *at(k) += o.si(k);
    return *this;
  }
  template <detail::state_like S>
  NONDIM_ALWAYS_INLINE constexpr const state_ref& operator-=(const S& o) const noexcept {
    detail::check_state_writable<Set, Rep>();
    detail::check_addable<Set, detail::set_of<S>>();
    if constexpr (writable && Set::size == detail::set_of<S>::size)
      for (std::size_t k = 0; k < size; ++k) *at(k) -= o.si(k);
    return *this;
  }

 private:
  NONDIM_ALWAYS_INLINE constexpr Rep* at(std::size_t k) const noexcept {
    if constexpr (soa) {
      return p_ + k * step_;
    } else {
      return p_ + k;
    }
  }

  Rep* p_;
  std::size_t step_;
};

/// \brief A state of `Set` in every one of n cells, over storage the solver owns:
/// `layout::soa` (`double[K][n]`) or `layout::aos` (`double[n][K]`).
template <class Set, class Layout, class Rep>
class state_view {
  static_assert(std::is_same_v<Layout, layout::soa> || std::is_same_v<Layout, layout::aos>,
                "nondim: a state layout is layout::soa or layout::aos");
  static constexpr bool soa = std::is_same_v<Layout, layout::soa>;

 public:
  using set = Set;
  using layout_type = Layout;
  using rep = Rep;
  using reference = state_ref<Set, Layout, Rep>;
  static constexpr std::size_t components = Set::size;

  constexpr state_view() noexcept = default;
  /// \brief The states of `cells` cells stored from `data` (components * cells values).
  NONDIM_ALWAYS_INLINE constexpr state_view(Rep* data, std::size_t cells) noexcept : data_(data), cells_(cells) {}
  /// \brief The states held in `storage`, a whole number of cells.
  /// \throws field_size_error when its size is not a multiple of the number of components.
  explicit state_view(std::span<Rep> storage) : data_(storage.data()), cells_(storage.size() / components) {
    if (storage.size() % components != 0)
      throw field_size_error("state_view(storage): the storage is not a whole number of cells of " +
                                 std::to_string(components) + " components",
                             (cells_ + 1) * components, storage.size());
  }
  /// \brief A read-only view from a mutable one.
  template <class R2>
  requires(std::is_const_v<Rep>&& std::same_as<const R2, Rep>) NONDIM_ALWAYS_INLINE
      constexpr state_view(const state_view<Set, Layout, R2>& o) noexcept  // NOLINT(google-explicit-constructor)
      : data_(o.data()), cells_(o.size()) {}

  /// \brief Number of cells.
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr std::size_t size() const noexcept { return cells_; }
  /// \brief The storage (components * cells values in coherent SI).
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr Rep* data() const noexcept { return data_; }

  /// \brief The state of cell i (unchecked).
  NONDIM_ALWAYS_INLINE constexpr reference operator[](std::size_t i) const noexcept {
    if constexpr (soa) {
      return reference(data_ + i, cells_);
    } else {
      return reference(data_ + i * components, 1);
    }
  }

  /// \brief Component I (by position) or Tag in every cell: a `field_view` for soa, a
  /// `strided_field_view` for aos.
  template <std::size_t I>
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr auto get() const noexcept {
    static_assert(I < components, "nondim: component index out of range");
    if constexpr (soa) {
      return field_view<Set::dims[I], Rep>(data_ + I * cells_, cells_);
    } else {
      return strided_field_view<Set::dims[I], Rep>(data_ + I, cells_, components);
    }
  }
  template <class Tag>
  [[nodiscard]] NONDIM_ALWAYS_INLINE constexpr auto get() const noexcept {
    detail::check_component<Set, Tag>();
    return get<Set::template index_of<Tag>>();
  }

 private:
  Rep* data_ = nullptr;
  std::size_t cells_ = 0;
};

/// \brief Component I or Tag of a state, a cell of a view or a whole view (see their `get`).
template <std::size_t I, class S>
requires(detail::state_like<S> || requires { typename std::remove_cvref_t<S>::layout_type; }) NONDIM_ALWAYS_INLINE
    constexpr decltype(auto) get(S&& s) noexcept {
  return std::forward<S>(s).template get<I>();
}
template <class Tag, class S>
requires(detail::state_like<S> || requires { typename std::remove_cvref_t<S>::layout_type; }) NONDIM_ALWAYS_INLINE
    constexpr decltype(auto) get(S&& s) noexcept {
  return std::forward<S>(s).template get<Tag>();
}

// ---- componentwise arithmetic ------------------------------------------------------------------

template <detail::state_like A, detail::state_like B>
NONDIM_ALWAYS_INLINE constexpr auto operator+(const A& a, const B& b) noexcept {
  using SA = detail::set_of<A>;
  detail::check_addable<SA, detail::set_of<B>>();
  state<SA, detail::state_rep<A>> r;
  if constexpr (SA::size == detail::set_of<B>::size)
    for (std::size_t k = 0; k < SA::size; ++k) r.si(k) = a.si(k) + b.si(k);
  return r;
}
template <detail::state_like A, detail::state_like B>
NONDIM_ALWAYS_INLINE constexpr auto operator-(const A& a, const B& b) noexcept {
  using SA = detail::set_of<A>;
  detail::check_addable<SA, detail::set_of<B>>();
  state<SA, detail::state_rep<A>> r;
  if constexpr (SA::size == detail::set_of<B>::size)
    for (std::size_t k = 0; k < SA::size; ++k) r.si(k) = a.si(k) - b.si(k);
  return r;
}
template <detail::state_like A>
NONDIM_ALWAYS_INLINE constexpr auto operator-(const A& a) noexcept {
  state<detail::set_of<A>, detail::state_rep<A>> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = -a.si(k);
  return r;
}

/// \brief A number times a state: the same components, each scaled.
template <scalar T, detail::state_like A>
NONDIM_ALWAYS_INLINE constexpr auto operator*(T x, const A& a) noexcept {
  using R = detail::state_rep<A>;
  state<detail::set_of<A>, R> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = static_cast<R>(x) * a.si(k);
  return r;
}
template <detail::state_like A, scalar T>
NONDIM_ALWAYS_INLINE constexpr auto operator*(const A& a, T x) noexcept {
  using R = detail::state_rep<A>;
  state<detail::set_of<A>, R> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = a.si(k) * static_cast<R>(x);
  return r;
}
template <detail::state_like A, scalar T>
NONDIM_ALWAYS_INLINE constexpr auto operator/(const A& a, T x) noexcept {
  using R = detail::state_rep<A>;
  state<detail::set_of<A>, R> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = a.si(k) / static_cast<R>(x);
  return r;
}

/// \brief A quantity times a state: every component's dimension times the quantity's.
template <dimension Q, class R, detail::state_like A>
NONDIM_ALWAYS_INLINE constexpr auto operator*(const quantity<Q, R>& q, const A& a) noexcept {
  state<typename detail::scaled_set<detail::set_of<A>, Q>::type, detail::state_rep<A>> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = q.si() * a.si(k);
  return r;
}
template <detail::state_like A, dimension Q, class R>
NONDIM_ALWAYS_INLINE constexpr auto operator*(const A& a, const quantity<Q, R>& q) noexcept {
  state<typename detail::scaled_set<detail::set_of<A>, Q>::type, detail::state_rep<A>> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = a.si(k) * q.si();
  return r;
}
template <detail::state_like A, dimension Q, class R>
NONDIM_ALWAYS_INLINE constexpr auto operator/(const A& a, const quantity<Q, R>& q) noexcept {
  state<typename detail::scaled_set<detail::set_of<A>, dims::dimensionless / Q>::type, detail::state_rep<A>> r;
  for (std::size_t k = 0; k < r.size; ++k) r.si(k) = a.si(k) / q.si();
  return r;
}

}  // namespace nondim
