#pragma once
/// \file named_basis.hpp
/// \brief Re-expression of a basis of dimensionless groups in the characteristic numbers of
/// the catalog, where the null space allows it.
///
/// Given the variables of a problem and a basis of its dimensionless groups (the
/// classical basis of `analyze()`), `named_basis()` returns another exact basis of the same
/// space, `classical.size()` independent groups, in which as many groups as possible are
/// catalog numbers and the dependent variable appears in exactly one group:
///
///  1. Candidates: every mapping of the factors of every catalog form onto distinct problem
///     variables of equal dimensions whose product lies in the span of the given groups
///     (always, when the given groups span the whole null space), in which no variable
///     contradicts its factor (see recognize.hpp for what contradicts: a kind that needs
///     evidence without it, two phases in an entry defined for one), and in which every
///     variable on a factor that shares its dimension with another factor of the form is
///     identified by its name or hint (lambda/L is a Knudsen number, a ratio of two lengths
///     with neutral names is not). Each becomes a primitive integer exponent vector
///     `entry^power`, power > 0.
///  2. The dependent group: when the given group of the dependent variable is its ratio to
///     another variable of the same dimension (delta/x, theta/theta_i) and no candidate, that
///     group, unchanged; otherwise the first candidate containing the dependent variable, in
///     the order below; if there is none, the first given group containing it, unchanged.
///  3. The others, without the dependent variable, taken greedily while the exact rank of
///     the chosen set rises, in this order: ratios of one property of two phases (two
///     variables of one dimension whose names carry different phase tags, rho_g/rho_l: see
///     `detail::phase_tag`), kept explicit so that no single-phase number takes the second
///     phase; tier-1 catalog numbers; given groups of at most
///     two variables (simple ratios such as L/D); tier-2 catalog numbers; the other given
///     groups, fewest variables first. Candidates are ordered by catalog order, then by
///     the agreement of names and hints with the factors, then by the number of repeating
///     variables they use, then by input order. Each catalog entry is used at most once.
///     Given groups that contain the dependent variable are first freed of it by
///     subtracting a multiple of the dependent group.
///
/// The result lists the dependent group first, then the others in the order chosen.
/// Rank decisions are exact: checked 64-bit rationals, redone in
/// `boost::multiprecision::cpp_rational` on overflow.

#include <array>
#include <cstddef>
#include <cstdint>
#include <span>
#include <string>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "../config.hpp"
#include "recognize.hpp"

namespace nondim {

/// \brief One group of a named basis.
struct named_group {
  std::vector<std::int64_t> exponents;  ///< primitive, aligned with the variables
  std::size_t entry = catalog_size;     ///< catalog entry it was chosen as; `catalog_size`: not a catalog pick
  std::size_t form = 0;                 ///< form of that entry
  rational power{1};                    ///< exponents = entry^power (catalog picks only)
  /// Index of the given group it comes from (`npos` for a catalog pick). `reduced` says it
  /// was freed of the dependent variable and so differs from that group, or (with `source`
  /// `npos`) is a ratio of two phases' properties built by the named basis (rho_g/rho_l).
  std::size_t source = npos;
  bool reduced = false;
  /// Catalog picks: the variable on each factor of the form, in the form's order.
  std::array<std::size_t, catalog_max_factors> variables{};

  static constexpr std::size_t npos = static_cast<std::size_t>(-1);
  [[nodiscard]] bool named() const noexcept { return entry < catalog_size; }
};

/// \brief The named basis of the space spanned by `classical`.
///
/// \param variables the problem's variables (names, dimensions, optional kind hints)
/// \param classical independent dimensionless groups, each aligned with `variables`
///        (normally the classical basis of `analyze()`, which spans the whole null space)
/// \param dependent index of the dependent variable, or `named_group::npos` for none
/// \param repeating indices of the repeating variables (used only to break ties)
/// \returns `classical.size()` independent primitive groups spanning the same space; the
///          dependent variable, when it occurs in the span, appears in the first group only.
/// \throws std::invalid_argument when a group's length differs from the number of
///         variables, a group is not dimensionless, the groups are not independent, or an
///         index is out of range; rational_overflow when an exponent of a named group
///         does not fit in 64 bits (`analyze()` then keeps the classical groups).
[[nodiscard]] std::vector<named_group> named_basis(std::span<const group_variable> variables,
                                                   std::span<const std::vector<std::int64_t>> classical,
                                                   std::size_t dependent = named_group::npos,
                                                   std::span<const std::size_t> repeating = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "named_basis.ipp"
#endif
