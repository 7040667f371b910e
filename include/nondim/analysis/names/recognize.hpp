#pragma once
/// \file recognize.hpp
/// \brief Which characteristic numbers of the catalog a dimensionless group is, and to
/// what power.
///
/// A group matches a catalog entry when the variables with a non-zero exponent map one to
/// one onto the factors of one of the entry's forms, each variable onto a factor of equal
/// dimension, with exponents proportional: group = entry^power, `power` a rational
/// (mu/(rho U D) is Re^-1; U^2/(g L) is Fr^2 because the catalog defines Fr = U/sqrt(gL)).
///
/// Dimensions decide whether a match is possible. Where several entries match (h L/k is a
/// Nusselt and a Biot number; nu/alpha, nu/D_AB and alpha/D_AB all share one form), every
/// one is listed and each is marked `ambiguous`. Kind hints and conventional variable
/// names rank the matches, and decide the factors of the kinds that need evidence
/// (`needs_evidence`: a mean free path, the rotation rate of the frame, a drag force...):
///  - a kind hint equal to the factor's kind scores 4, a hint more specific than it 3, a
///    more general hint 0; a hint of another kind of the same dimension is a contradiction;
///  - without a hint, a name listed for the factor's kind ("k_s" for the conductivity of a
///    solid) scores 2, a name listed for a more specific kind 1, for a more general kind 0
///    ("k" for the conductivity of a solid); a name listed only for other kinds of the same
///    dimension ("k_s" where the fluid's conductivity is meant) is a contradiction. Failing an exact listing, the part
///    of the name before its first `_` is tried the same way with score 1 ("rho_l" is a density);
///  - a variable on a factor whose kind needs evidence, with no hint or name of that kind
///    (or a more specific one), contradicts it: P/H of a weir is no Knudsen number;
///  - variables tagged with two different phases (`rho_l` and `mu_g`: the part after the
///    last `_` is l, g, v, liq, gas, vap...) contradict an entry defined for one phase (no
///    factor of a kind that `marks_second_phase`): Oh = μ/√(ρσL) takes μ, ρ of one fluid;
///  - a match is `consistent` when no variable contradicts its factor.
/// Matches are ordered consistent first, then by score, tier and catalog order.
///
/// Cost: every form of the catalog carries a precomputed signature (number of factors and
/// an order-independent hash of their dimensions), so a group is compared with a form by
/// two integer comparisons; only forms with the group's signature are matched factor by
/// factor. Nothing is allocated but the result.
/// Standard library only.

#include <algorithm>
#include <array>
#include <cstddef>
#include <cstdint>
#include <span>
#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

#include "../../solver/core/dimension.hpp"
#include "../../solver/core/format.hpp"
#include "../../solver/core/rational.hpp"
#include "catalog.hpp"
#include "quantity_kind.hpp"

namespace nondim {

/// \brief A variable of a problem as recognition sees it.
struct group_variable {
  std::string_view name;
  dimension dim;
  quantity_kind kind = quantity_kind::unspecified;  ///< optional hint
};

/// \brief A catalog entry that a group matches.
struct catalog_match {
  std::size_t entry = 0;   ///< index into `catalog`
  std::size_t form = 0;    ///< index into `catalog[entry].forms`
  rational power{1};       ///< group = entry^power
  bool ambiguous = false;  ///< another entry matches the same group too
  bool consistent = true;  ///< no variable's hint or name contradicts its factor
  int score = 0;           ///< agreement of hints and names with the factors
  /// `variables[i]`: index (into the variables given) of the variable on factor i of the form.
  std::array<std::size_t, catalog_max_factors> variables{};

  [[nodiscard]] constexpr const catalog_entry& info() const noexcept { return catalog[entry]; }
  [[nodiscard]] constexpr const catalog_form& form_info() const noexcept { return catalog[entry].forms[form]; }
};

/// \brief The short form of a match that an analysis carries for each group.
struct group_match {
  std::string_view name;    ///< "Reynolds number"
  std::string_view symbol;  ///< "Re"
  rational power{1};        ///< group = symbol^power
  bool ambiguous = false;   ///< another entry matches too

  friend constexpr bool operator==(const group_match&, const group_match&) noexcept = default;
};

/// \brief "Re", "Re^-1", "Fr^2", "Wo^(1/2)": a symbol raised to a power, in ASCII.
inline std::string power_text(std::string_view symbol, const rational& power) {
  return std::string(symbol) + detail::exponent_suffix(power, text_form::ascii);
}

namespace detail {

constexpr std::uint64_t mix64(std::uint64_t x) noexcept {
  // splitmix64 finaliser: spreads every input bit over the word
  x ^= x >> 30;
  x *= 0xbf58476d1ce4e5b9ULL;
  x ^= x >> 27;
  x *= 0x94d049bb133111ebULL;
  x ^= x >> 31;
  return x;
}

/// A hash of a dimension (equal dimensions, equal hashes): a weighted sum of the exponents'
/// numerators and denominators, mixed once.
constexpr std::uint64_t dimension_hash(const dimension& d) noexcept {
  constexpr std::array<std::uint64_t, 2 * base_dimension_count> weight{
      0x9e3779b97f4a7c15ULL, 0xc2b2ae3d27d4eb4fULL, 0x165667b19e3779f9ULL, 0xd6e8feb86659fd93ULL, 0xff51afd7ed558ccdULL,
      0xc4ceb9fe1a85ec53ULL, 0x27d4eb2f165667c5ULL, 0x94d049bb133111ebULL, 0xbf58476d1ce4e5b9ULL, 0x9fb21c651e98df25ULL,
      0x2127599bf4325c37ULL, 0x880355f21e6d1965ULL, 0x7fb5d329728ea185ULL, 0x81dadef4bc2dd44dULL};
  std::uint64_t h = 0;
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    h += weight[2 * i] * static_cast<std::uint64_t>(d.exponents[i].num);
    h += weight[2 * i + 1] * static_cast<std::uint64_t>(d.exponents[i].den - 1);
  }
  return mix64(h);
}

/// Order-independent: the signature of a multiset of dimensions.
constexpr std::uint64_t add_to_signature(std::uint64_t signature, std::uint64_t dim_hash) noexcept {
  return signature + mix64(dim_hash);
}

/// Signature of one form of the catalog.
struct form_signature {
  std::uint64_t hash = 0;
  std::array<std::uint64_t, catalog_max_factors> factor_hash{};
  std::uint16_t entry = 0;
  std::uint8_t form = 0;
  std::uint8_t size = 0;
};

constexpr std::size_t catalog_form_total() noexcept {
  std::size_t n = 0;
  for (const auto& e : catalog) n += e.form_count;
  return n;
}

constexpr std::array<form_signature, catalog_form_total()> make_form_signatures() {
  std::array<form_signature, catalog_form_total()> out{};
  std::size_t k = 0;
  for (std::size_t e = 0; e < catalog.size(); ++e) {
    for (std::size_t f = 0; f < catalog[e].form_count; ++f) {
      const catalog_form& form = catalog[e].forms[f];
      form_signature s{};
      s.entry = static_cast<std::uint16_t>(e);
      s.form = static_cast<std::uint8_t>(f);
      s.size = static_cast<std::uint8_t>(form.size);
      for (std::size_t i = 0; i < form.size; ++i) {
        s.factor_hash[i] = dimension_hash(form.factors[i].dim());
        s.hash = add_to_signature(s.hash, s.factor_hash[i]);
      }
      out[k++] = s;
    }
  }
  return out;
}

/// Every form's signature, computed at compile time, in catalog order.
inline constexpr auto form_signatures = make_form_signatures();

/// The same signatures grouped by number of factors (catalog order kept within a group),
/// and where each group starts: a group of m variables is compared only with forms of m factors.
constexpr std::array<form_signature, form_signatures.size()> make_signatures_by_size() {
  std::array<form_signature, form_signatures.size()> out{};
  std::size_t k = 0;
  for (std::size_t m = 0; m <= catalog_max_factors; ++m)
    for (const auto& s : form_signatures)
      if (s.size == m) out[k++] = s;
  return out;
}
inline constexpr auto signatures_by_size = make_signatures_by_size();

constexpr std::array<std::size_t, catalog_max_factors + 2> make_size_offsets() {
  std::array<std::size_t, catalog_max_factors + 2> out{};
  for (std::size_t m = 0; m <= catalog_max_factors; ++m) {
    std::size_t c = 0;
    for (const auto& s : form_signatures)
      if (s.size == m) ++c;
    out[m + 1] = out[m] + c;
  }
  return out;
}
inline constexpr auto size_offsets = make_size_offsets();

/// Hash of each kind's dimension.
constexpr std::array<std::uint64_t, quantity_kind_count> make_kind_hashes() {
  std::array<std::uint64_t, quantity_kind_count> out{};
  for (std::size_t i = 0; i < quantity_kind_count; ++i) out[i] = dimension_hash(quantity_kinds[i].dim);
  return out;
}
inline constexpr auto kind_hashes = make_kind_hashes();

/// The kinds other than `unspecified`, ordered by the hash of their dimension: the kinds of
/// one dimension are found by a binary search instead of a scan of all of them.
constexpr std::array<std::uint8_t, quantity_kind_count - 1> make_kinds_by_hash() {
  std::array<std::uint8_t, quantity_kind_count - 1> out{};
  for (std::size_t i = 1; i < quantity_kind_count; ++i) {
    std::size_t at = i - 1;  // insertion sort, stable: kinds of one hash stay in their order
    while (at > 0 && kind_hashes[out[at - 1]] > kind_hashes[i]) {
      out[at] = out[at - 1];
      --at;
    }
    out[at] = static_cast<std::uint8_t>(i);
  }
  return out;
}
inline constexpr auto kinds_by_hash = make_kinds_by_hash();

constexpr std::uint64_t kind_bit(quantity_kind k) noexcept {
  return std::uint64_t{1} << static_cast<unsigned>(k);
}

/// For each kind, the mask of itself and every more specific kind.
constexpr std::array<std::uint64_t, quantity_kind_count> make_specific_masks() {
  std::array<std::uint64_t, quantity_kind_count> out{};
  for (std::size_t g = 0; g < quantity_kind_count; ++g)
    for (std::size_t s = 0; s < quantity_kind_count; ++s)
      if (g != 0 && is_same_or_general(static_cast<quantity_kind>(g), static_cast<quantity_kind>(s)))
        out[g] |= kind_bit(static_cast<quantity_kind>(s));
  return out;
}
inline constexpr auto specific_masks = make_specific_masks();

/// For each kind, the mask of every more general kind (a thermal conductivity for the
/// conductivity of a solid): a name of a general kind fits a specific role, uninformatively.
constexpr std::array<std::uint64_t, quantity_kind_count> make_general_masks() {
  std::array<std::uint64_t, quantity_kind_count> out{};
  for (std::size_t s = 0; s < quantity_kind_count; ++s)
    for (std::size_t g = 1; g < quantity_kind_count; ++g)
      if (g != s && is_same_or_general(static_cast<quantity_kind>(g), static_cast<quantity_kind>(s)))
        out[s] |= kind_bit(static_cast<quantity_kind>(g));
  return out;
}
inline constexpr auto general_masks = make_general_masks();

/// What the name of a variable says about its kind (only kinds of its own dimension).
struct name_profile {
  std::uint64_t exact = 0;  ///< kinds whose conventional names include the name
  std::uint64_t base = 0;   ///< kinds whose names include the part before the first '_'
};

/// The conventional names of each kind, split into words at compile time.
inline constexpr std::size_t max_kind_names = 24;
struct kind_words {
  std::array<std::string_view, max_kind_names> word{};
  std::size_t size = 0;
};

constexpr std::array<kind_words, quantity_kind_count> make_kind_words() {
  std::array<kind_words, quantity_kind_count> out{};
  for (std::size_t k = 0; k < quantity_kind_count; ++k) {
    std::string_view list = quantity_kinds[k].names;
    while (!list.empty()) {
      const std::size_t end = list.find(' ');
      if (end != 0) {
        if (out[k].size == max_kind_names) throw std::length_error("nondim: too many names for one kind");
        out[k].word[out[k].size++] = list.substr(0, end);
      }
      if (end == std::string_view::npos) break;
      list.remove_prefix(end + 1);
    }
  }
  return out;
}
inline constexpr auto kind_name_words = make_kind_words();

inline bool kind_has_name(std::size_t kind, std::string_view name) noexcept {
  const kind_words& w = kind_name_words[kind];
  for (std::size_t i = 0; i < w.size; ++i)
    if (w.word[i].size() == name.size() && w.word[i] == name) return true;
  return false;
}

inline name_profile profile_of(const group_variable& v, std::uint64_t dim_hash) noexcept {
  name_profile p;
  if (v.name.empty()) return p;
  const std::size_t underscore = v.name.find('_');
  const std::string_view base =
      underscore == std::string_view::npos || underscore == 0 ? std::string_view{} : v.name.substr(0, underscore);
  const auto* k = std::lower_bound(kinds_by_hash.begin(), kinds_by_hash.end(), dim_hash,
                                   [](std::uint8_t kind, std::uint64_t h) { return kind_hashes[kind] < h; });
  for (; k != kinds_by_hash.end() && kind_hashes[*k] == dim_hash; ++k) {
    const std::size_t i = *k;
    if (!(quantity_kinds[i].dim == v.dim)) continue;
    const auto bit = kind_bit(static_cast<quantity_kind>(i));
    if (kind_has_name(i, v.name)) p.exact |= bit;
    if (!base.empty() && kind_has_name(i, base)) p.base |= bit;
  }
  return p;
}

/// Agreement of one variable with one factor's kind, before the evidence rule.
inline int pair_score_of_names(const group_variable& v, const name_profile& p, quantity_kind role,
                               bool& conflict) noexcept;

/// Agreement of one variable with one factor's kind; `conflict` set on a contradiction,
/// and when the kind needs evidence and neither hint nor name gives it.
inline int pair_score(const group_variable& v, const name_profile& p, quantity_kind role, bool& conflict) noexcept {
  const int s = pair_score_of_names(v, p, role, conflict);
  if (s <= 0 && needs_evidence(role)) conflict = true;
  return s;
}

/// The phase a variable's name is tagged with: the part after its last `_` when that is a
/// conventional phase subscript (l, g, v, liq, gas, vap...; common practice, no source),
/// folded to one letter; 0 when untagged.
inline char phase_tag(std::string_view name) noexcept {
  const std::size_t at = name.rfind('_');
  if (at == std::string_view::npos || at == 0) return 0;
  const std::string_view t = name.substr(at + 1);
  if (t == "l" || t == "L" || t == "liq" || t == "liquid") return 'l';
  if (t == "g" || t == "G" || t == "gas") return 'g';
  if (t == "v" || t == "V" || t == "vap" || t == "vapour" || t == "vapor") return 'v';
  return 0;
}

/// True when the variables mapped onto `form` carry two different phase tags and the form
/// is defined for one phase (no factor of a kind that marks a second phase).
inline bool mixes_phases(const catalog_form& form, std::span<const group_variable> variables,
                         const std::size_t* mapped) noexcept {
  char seen = 0;
  for (std::size_t i = 0; i < form.size; ++i) {
    if (marks_second_phase(form.factors[i].kind)) return false;
    const char t = phase_tag(variables[mapped[i]].name);
    if (t == 0) continue;
    if (seen != 0 && t != seen) return true;
    seen = t;
  }
  return false;
}

inline int pair_score_of_names(const group_variable& v, const name_profile& p, quantity_kind role,
                               bool& conflict) noexcept {
  if (v.kind != quantity_kind::unspecified && kind_info(v.kind).dim == v.dim) {
    if (v.kind == role) return 4;
    if (is_same_or_general(role, v.kind)) return 3;
    if (is_same_or_general(v.kind, role)) return 0;
    conflict = true;
    return 0;
  }
  const std::uint64_t bit = kind_bit(role);
  const std::uint64_t specific = specific_masks[static_cast<std::size_t>(role)];
  const std::uint64_t general = general_masks[static_cast<std::size_t>(role)];
  if (p.exact != 0) {
    if ((p.exact & bit) != 0) return 2;
    if ((p.exact & specific) != 0) return 1;
    if ((p.exact & general) == 0) conflict = true;  // "k" fits k_s; "k_f" does not
    return 0;
  }
  if (p.base != 0) {
    if ((p.base & specific) != 0) return 1;
    if ((p.base & general) == 0) conflict = true;
  }
  return 0;
}

/// The state of matching one group against the catalog.
struct recognizer {
  std::span<const group_variable> variables;
  const std::uint64_t* known_hash = nullptr;             // precomputed per variable, or null
  const name_profile* known_profile = nullptr;           // precomputed per variable, or null
  std::array<std::size_t, catalog_max_factors> index{};  // variables with a non-zero exponent
  std::array<rational, catalog_max_factors> exponent{};
  std::array<std::uint64_t, catalog_max_factors> hash{};
  std::array<name_profile, catalog_max_factors> profile{};
  bool profiled = false;
  std::size_t size = 0;

  // current search
  const catalog_form* form = nullptr;
  const form_signature* signature = nullptr;
  std::array<std::size_t, catalog_max_factors> chosen{};  // group slot on each factor
  unsigned used = 0;
  rational power{};
  // best mapping of the current entry
  bool found = false;
  catalog_match best{};

  void profile_all() noexcept {
    if (profiled) return;
    for (std::size_t j = 0; j < size; ++j)
      profile[j] = known_profile != nullptr ? known_profile[index[j]] : profile_of(variables[index[j]], hash[j]);
    profiled = true;
  }

  static bool better(const catalog_match& a, const catalog_match& b) noexcept {
    if (a.consistent != b.consistent) return a.consistent;
    if (a.score != b.score) return a.score > b.score;
    const bool ap = a.power.num > 0;
    const bool bp = b.power.num > 0;
    if (ap != bp) return ap;
    return abs(a.power) < abs(b.power);
  }

  void complete() {
    catalog_match m;
    m.entry = signature->entry;
    m.form = signature->form;
    m.power = power;
    bool conflict = false;
    int score = 0;
    for (std::size_t i = 0; i < form->size; ++i) {
      const std::size_t slot = chosen[i];
      m.variables[i] = index[slot];
      score += pair_score(variables[index[slot]], profile[slot], form->factors[i].kind, conflict);
    }
    if (mixes_phases(*form, variables, m.variables.data())) conflict = true;
    m.score = score;
    m.consistent = !conflict;
    if (!found || better(m, best)) {
      best = m;
      found = true;
    }
  }

  void search(std::size_t i) {
    if (i == form->size) {
      complete();
      return;
    }
    const catalog_factor& f = form->factors[i];
    const dimension fd = f.dim();
    for (std::size_t slot = 0; slot < size; ++slot) {
      if ((used & (1U << slot)) != 0 || hash[slot] != signature->factor_hash[i]) continue;
      if (!(variables[index[slot]].dim == fd)) continue;
      const rational& e = exponent[slot];
      if (i == 0) {
        power = e / f.exponent;
      } else if (!(power * f.exponent == e)) {
        continue;
      }
      chosen[i] = slot;
      used |= 1U << slot;
      search(i + 1);
      used &= ~(1U << slot);
    }
  }
};

}  // namespace detail

namespace detail {

template <class Exponent>
std::vector<catalog_match> recognize_impl(std::span<const group_variable> variables,
                                          std::span<const Exponent> exponents,
                                          const std::uint64_t* known_hash = nullptr,
                                          const name_profile* known_profile = nullptr) {
  if (variables.size() != exponents.size())
    throw std::invalid_argument("nondim: recognize: " + std::to_string(variables.size()) + " variables but " +
                                std::to_string(exponents.size()) + " exponents");
  std::vector<catalog_match> out;
  recognizer r;
  r.variables = variables;
  r.known_hash = known_hash;
  r.known_profile = known_profile;
  std::uint64_t signature = 0;
  for (std::size_t i = 0; i < exponents.size(); ++i) {
    if (exponents[i] == Exponent{0}) continue;
    if (r.size == catalog_max_factors) return out;  // more variables than any form has
    r.index[r.size] = i;
    r.exponent[r.size] = rational{exponents[i]};
    r.hash[r.size] = known_hash != nullptr ? known_hash[i] : dimension_hash(variables[i].dim);
    signature = add_to_signature(signature, r.hash[r.size]);
    ++r.size;
  }
  if (r.size == 0) return out;

  std::size_t current_entry = catalog_size;
  auto flush = [&] {
    if (r.found) out.push_back(r.best);
    r.found = false;
  };
  for (std::size_t k = size_offsets[r.size]; k < size_offsets[r.size + 1]; ++k) {
    const form_signature& s = signatures_by_size[k];
    if (s.entry != current_entry) {
      flush();
      current_entry = s.entry;
    }
    if (s.hash != signature) continue;
    r.profile_all();
    r.form = &catalog[s.entry].forms[s.form];
    r.signature = &s;
    r.used = 0;
    try {
      r.search(0);
    } catch (const rational_overflow&) {
      // a power beyond 64 bits: not a characteristic number anyone writes
    }
  }
  flush();

  std::sort(out.begin(), out.end(), [](const catalog_match& a, const catalog_match& b) {
    if (a.consistent != b.consistent) return a.consistent;
    if (a.score != b.score) return a.score > b.score;
    if (a.info().tier != b.info().tier) return a.info().tier < b.info().tier;
    return a.entry < b.entry;
  });
  if (out.size() > 1)
    for (auto& m : out) m.ambiguous = true;
  return out;
}

}  // namespace detail

/// \brief Every catalog entry that the group `exponents` over `variables` matches.
///
/// `exponents[i]` is the exponent of `variables[i]` (zero: absent). A group with more
/// than `catalog_max_factors` variables, or none, matches nothing. Each entry appears at
/// most once, with its best mapping (consistent, highest score, positive power, smallest
/// power). A power that does not fit in 64 bits is not reported.
/// \throws std::invalid_argument when the two spans differ in length.
[[nodiscard]] inline std::vector<catalog_match> recognize(std::span<const group_variable> variables,
                                                          std::span<const std::int64_t> exponents) {
  return detail::recognize_impl(variables, exponents);
}

/// \brief The same with rational exponents (a group written as (rho U L/mu)^(1/2)).
/// \throws std::invalid_argument when the two spans differ in length.
[[nodiscard]] inline std::vector<catalog_match> recognize(std::span<const group_variable> variables,
                                                          std::span<const rational> exponents) {
  return detail::recognize_impl(variables, exponents);
}

/// \brief Recognition of many groups over the same variables (the groups of one analysis):
/// the hashes of the variables' dimensions and what their names say are worked out once.
///
/// Keeps a view of `variables`: they must outlive the recogniser.
class group_recognizer {
 public:
  explicit group_recognizer(std::span<const group_variable> variables)
      : variables_(variables), hash_(variables.size()), profile_(variables.size()) {
    for (std::size_t i = 0; i < variables.size(); ++i) {
      hash_[i] = detail::dimension_hash(variables[i].dim);
      profile_[i] = detail::profile_of(variables[i], hash_[i]);
    }
  }
  /// \brief As `recognize(variables, exponents)`.
  /// \throws std::invalid_argument when `exponents` is not one per variable.
  [[nodiscard]] std::vector<catalog_match> operator()(std::span<const std::int64_t> exponents) const {
    return detail::recognize_impl(variables_, exponents, hash_.data(), profile_.data());
  }
  /// \brief As `recognize(variables, exponents)` with rational exponents.
  /// \throws std::invalid_argument when `exponents` is not one per variable.
  [[nodiscard]] std::vector<catalog_match> operator()(std::span<const rational> exponents) const {
    return detail::recognize_impl(variables_, exponents, hash_.data(), profile_.data());
  }
  [[nodiscard]] std::span<const group_variable> variables() const noexcept { return variables_; }

 private:
  std::span<const group_variable> variables_;
  std::vector<std::uint64_t> hash_;
  std::vector<detail::name_profile> profile_;
};

/// \brief The same, with the variables' names and dimensions given as separate spans
/// (no kind hints). Allocates the list of variables.
/// \throws std::invalid_argument when the spans differ in length.
[[nodiscard]] inline std::vector<catalog_match> recognize(std::span<const std::string> names,
                                                          std::span<const dimension> dims,
                                                          std::span<const std::int64_t> exponents) {
  if (names.size() != dims.size() || names.size() != exponents.size())
    throw std::invalid_argument("nondim: recognize: names, dimensions and exponents differ in length");
  std::vector<group_variable> vars;
  vars.reserve(names.size());
  for (std::size_t i = 0; i < names.size(); ++i) vars.push_back({names[i], dims[i], quantity_kind::unspecified});
  return recognize(std::span<const group_variable>(vars), exponents);
}

/// \brief The short form of each match, in the same order.
[[nodiscard]] inline std::vector<group_match> to_group_matches(std::span<const catalog_match> matches) {
  std::vector<group_match> out;
  out.reserve(matches.size());
  for (const auto& m : matches) out.push_back({m.info().name, m.info().symbol, m.power, m.ambiguous});
  return out;
}

}  // namespace nondim
