#pragma once
/// \file runtime_scales.hpp
/// \brief Reference scales at run time: the same job as `scales()` (scales.hpp) for
/// references read from input files, named and given as a value with unit text.
///
/// \code
///   nondim::runtime_scales s;
///   s.add("rho_ref", 998.2, "kg/m^3").add("U_ref", "0.3 m/s").add("L_ref", 5, "cm");
///   s.scale(nondim::dims::pressure).text();        // "ρ_ref·U_ref²"
///   double p_star = s.nondimensional(120, "Pa");   // p / (rho U^2)
///   s.nondimensional(cells, "kPa", cells);         // a whole field, in place
/// \endcode
///
/// The exponents k of a dimension D = R1^k1 R2^k2 ... are found by exact rational
/// elimination (checked int64, multiprecision on overflow: analysis/detail/exact.hpp); they
/// are unique because the references' dimensions must be independent, which `add()`
/// checks. The value of a scale is computed with the same operations, in the same order, as
/// the compile-time `reference_scales` (products of the positive powers in reference order
/// over those of the negative ones; integer powers by repeated squaring; square and cube
/// roots taken once per reference), so both give the same double for the same references.
///
/// Cost: each call solves the exponents of its dimension (a 7 x (k + 1) elimination) and,
/// given unit text, parses it; a field call does that once for all its cells. In a loop over
/// single values keep `scale(d).value` instead.
///
/// Temperatures: a nondimensional temperature is built from differences,
/// theta = (T - T_ref) / dT, by `nondimensional_difference`. An absolute temperature (unit
/// text `degC` or `degF` standing alone, which `parse_unit` marks affine with its offset)
/// given as a reference or passed where a difference is meant throws `scales_error`.
///
/// Errors: `scales_error` (std::invalid_argument) for references and dimensions, naming the
/// reference or the base dimension concerned; `unit_error` for unit text that cannot be read
/// (the message names the reference); `dimension_error` for a unit of the wrong dimension.

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <limits>
#include <optional>
#include <span>
#include <stdexcept>
#include <string>
#include <string_view>
#include <type_traits>
#include <utility>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/dimension.hpp"
#include "../../solver/core/format.hpp"
#include "../../solver/core/rational.hpp"
#include "../../solver/fields/owning_field.hpp"
#include "../../solver/parse/errors.hpp"
#include "../../solver/parse/quantity_text.hpp"
#include "../../solver/parse/unit_parser.hpp"
#include "../../solver/units/math.hpp"
#include "../../solver/units/quantity_type.hpp"
#include "../../solver/units/spelling.hpp"
#include "../../solver/units/temperature.hpp"
#include "../config.hpp"
#include "detail/too_large.hpp"
#include "symbols.hpp"

namespace nondim {

/// \brief Bad reference scales: an empty or repeated name, a value that is not positive
/// and finite, references whose dimensions are not independent, a dimension outside their
/// span, an absolute temperature where a difference is meant, fields of different sizes.
///
/// `what()` is one sentence beginning `nondim:`; `reference()` names the reference concerned
/// (empty when none); `lacking_base()` is the base dimension (0..6, L M T I Θ N J) the
/// references lack for a dimension outside their span, `base_dimension_count` otherwise.
class scales_error : public std::invalid_argument {
 public:
  explicit scales_error(const std::string& what, std::string reference = {},
                        std::size_t lacking_base = base_dimension_count)
      : std::invalid_argument(what), reference_(std::move(reference)), lacking_(lacking_base) {}

  [[nodiscard]] const std::string& reference() const noexcept { return reference_; }
  [[nodiscard]] std::size_t lacking_base() const noexcept { return lacking_; }

 private:
  std::string reference_;
  std::size_t lacking_;
};

/// \brief One reference of `runtime_scales`: its name, value in coherent SI units, dimension,
/// and the unit text it was given in (empty when given as a quantity or a dimension).
struct scale_reference {
  std::string name;
  double value = 0.0;
  dimension dim{};
  std::string unit;

  friend bool operator==(const scale_reference&, const scale_reference&) = default;
};

namespace detail {

/// x^e by the same products, in the same order, as `unrolled_power<E>` (pi_groups.hpp).
inline double unrolled_power_rt(double x, std::uint64_t e) noexcept {
  if (e == 0) return 1.0;
  if (e == 1) return x;
  if (e % 2 == 0) {
    const double h = unrolled_power_rt(x, e / 2);
    return h * h;
  }
  return unrolled_power_rt(x, e - 1) * x;
}

inline std::uint64_t exponent_magnitude(std::int64_t e) noexcept {
  return e < 0 ? 0 - static_cast<std::uint64_t>(e) : static_cast<std::uint64_t>(e);
}

/// `a·b²` of the factors (names[i], e[i]) with e[i] > 0 (after `sign`), in order; empty when none.
inline std::string factor_list(const std::vector<std::string>& names, const std::vector<rational>& e, int sign,
                               text_form form) {
  std::string s;
  for (std::size_t i = 0; i < names.size() && i < e.size(); ++i) {
    const rational& k = e[i];
    if (sign > 0 ? k.num <= 0 : k.num >= 0) continue;
    if (!s.empty()) s += form == text_form::unicode ? "\u00b7" : "*";
    s += display_name(names[i], form);
    // |k| without negating k: -2^63 has no int64 negation (its magnitude is written in ASCII)
    if (k.num == std::numeric_limits<std::int64_t>::min())
      s += magnitude_suffix(k);
    else
      s += exponent_suffix(sign > 0 ? k : -k, form);
  }
  return s;
}

/// Count of factors with exponents of the given sign.
inline std::size_t factor_count(const std::vector<rational>& e, int sign) noexcept {
  return static_cast<std::size_t>(
      std::count_if(e.begin(), e.end(), [sign](const rational& k) { return sign > 0 ? k.num > 0 : k.num < 0; }));
}

/// `numerator/denominator`, brackets around a denominator of several factors, `1` for empty.
inline std::string quotient(const std::string& numerator, const std::string& denominator, bool bracket) {
  if (denominator.empty()) return numerator.empty() ? "1" : numerator;
  const std::string d = bracket ? "(" + denominator + ")" : denominator;
  return (numerator.empty() ? std::string("1") : numerator) + "/" + d;
}

/// \brief The exponents k with target = product of refs[i]^k[i], for independent `refs`;
/// nullopt when `target` lies outside their span (exact: runtime_scales.ipp).
/// \throws integers_too_large when an exponent does not fit 64-bit rationals.
std::optional<std::vector<rational>> span_exponents(const std::vector<dimension>& refs, const dimension& target);

/// Whether `target` lies in the span of `refs` (which need not be independent).
bool in_span(const std::vector<dimension>& refs, const dimension& target);

/// A base dimension the references lack for `target` (outside their span): the first base
/// of `target` no reference carries, else the first whose addition as a reference puts
/// `target` in the span; `base_dimension_count` when no single base does (as scales.hpp).
inline std::size_t lacking_base(const std::vector<dimension>& refs, const dimension& target) {
  for (std::size_t b = 0; b < base_dimension_count; ++b) {
    if (target[b].is_zero()) continue;
    bool carried = false;
    for (const auto& r : refs) carried = carried || !r[b].is_zero();
    if (!carried) return b;
  }
  for (std::size_t b = 0; b < base_dimension_count; ++b) {
    std::vector<dimension> more = refs;
    more.push_back(make_base(static_cast<base_dimension>(b)));
    if (in_span(more, target)) return b;
  }
  return base_dimension_count;
}

template <class T>
struct is_temperature_point_rt : std::false_type {};
template <class R>
struct is_temperature_point_rt<temperature_point<R>> : std::true_type {};

}  // namespace detail

/// \brief The reference scale of one dimension: its value and its expression in the references.
struct scale_expression {
  dimension dim{};
  double value = 1.0;               ///< in coherent SI units
  std::vector<rational> exponents;  ///< exact, aligned with `names`
  std::vector<std::string> names;   ///< the references' names

  /// \brief The scale in the references: Unicode `ρ_ref·U_ref²`, `L_ref/U_ref`,
  /// `k_ref·ΔT/L_ref`; ASCII `rho_ref*U_ref^2`; `1` for a dimensionless quantity.
  [[nodiscard]] std::string text(text_form form = text_form::unicode) const {
    return detail::quotient(detail::factor_list(names, exponents, 1, form),
                            detail::factor_list(names, exponents, -1, form), detail::factor_count(exponents, -1) > 1);
  }

  /// \brief The nondimensional variable `variable` over this scale: `t·U/D` for a time with
  /// references U and D, `p/(ρ·U²)` for a pressure; `variable` alone when dimensionless.
  [[nodiscard]] std::string nondimensional_text(std::string_view variable, text_form form = text_form::unicode) const {
    std::string numerator = display_name(variable, form);
    const std::string rest = detail::factor_list(names, exponents, -1, form);
    if (!rest.empty()) numerator += (form == text_form::unicode ? "\u00b7" : "*") + rest;
    return detail::quotient(numerator, detail::factor_list(names, exponents, 1, form),
                            detail::factor_count(exponents, 1) > 1);
  }
};

/// \brief Reference scales from named references given at run time.
///
/// Add the references (`add`), each with a dimension independent of those before it; then ask
/// for the scale of any dimension in their span (`scale`), or convert values and fields
/// between dimensional and nondimensional form. The object is a value: copy it freely; the
/// const members may be used from several threads at once.
class runtime_scales {
 public:
  runtime_scales() = default;

  /// \brief A reference `name` of `value` in unit `unit_text` (`add("rho_ref", 998.2, "kg/m^3")`).
  /// \throws unit_error (the message names the reference) for unit text that cannot be read;
  ///         scales_error for an empty or repeated name, a value that is not positive and
  ///         finite, an absolute temperature (`degC` or `degF` alone), or a dimension that is
  ///         not independent of the references before it (the message gives its expression in them).
  runtime_scales& add(std::string name, double value, std::string_view unit_text) {
    const parsed_unit u = read_unit(name, unit_text);
    if (u.offset != 0.0) throw absolute_reference(name, unit_text);
    return add_si(std::move(name), value * u.factor, u.dim, std::string(unit_text), value);
  }

  /// \brief A reference `name` read from quantity text (`add("U_ref", "0.3 m/s")`), as `parse_quantity`.
  /// \throws as `add(name, value, unit_text)`.
  runtime_scales& add(std::string name, std::string_view quantity_text) {
    parsed_quantity q{};
    try {
      q = parse_quantity(quantity_text);
    } catch (const unit_error& e) {
      throw unit_error(e.kind(), e.column(), detail::cat("nondim: reference '", name, "': ", strip_prefix(e.what())));
    }
    const std::string_view unit = unit_part(quantity_text);
    if (q.dim == dims::temperature && parse_unit(unit).offset != 0.0) throw absolute_reference(name, unit);
    return add_si(std::move(name), q.value, q.dim, std::string(unit), q.value);
  }

  /// \brief A reference of dimension `d` with its value in coherent SI units.
  /// \throws scales_error as `add(name, value, unit_text)`.
  runtime_scales& add(std::string name, const dimension& d, double si_value) {
    return add_si(std::move(name), si_value, d, std::string{}, si_value);
  }

  /// \brief A reference from a checked quantity (a temperature is a difference here).
  template <dimension D, class Rep>
  runtime_scales& add(std::string name, const quantity<D, Rep>& q) {
    const auto si = static_cast<double>(q.si());
    return add_si(std::move(name), si, D, std::string{}, si);
  }

  /// Refused: a reference temperature is a difference, not an absolute temperature.
  template <class Rep>
  runtime_scales& add(std::string, const temperature_point<Rep>&) {
    static_assert(detail::dimensions_involved<spelled::dim<spelled::Theta<1>>, Rep>,
                  "nondim: a reference temperature is a difference (quantity<dims::temperature>, e.g. "
                  "T_wall - T_inf), not an absolute temperature_point");
    return *this;
  }

  /// \brief Number of references.
  [[nodiscard]] std::size_t size() const noexcept { return refs_.size(); }
  /// \brief The references, in the order added.
  [[nodiscard]] const std::vector<scale_reference>& references() const noexcept { return refs_; }

  /// \brief Whether `d` is a product of (possibly fractional) powers of the references.
  [[nodiscard]] bool spans(const dimension& d) const {
    try {
      return detail::span_exponents(dims_, d).has_value();
    } catch (const detail::integers_too_large&) {
      return false;
    }
  }

  /// \brief The reference scale of dimension `d`: value and expression in the references.
  /// \throws scales_error naming the base dimension the references lack when `d` lies
  ///         outside their span (`lacking_base()` gives it).
  [[nodiscard]] scale_expression scale(const dimension& d) const {
    scale_expression e;
    e.dim = d;
    e.exponents = exponents_of(d);
    e.names.reserve(refs_.size());
    for (const auto& r : refs_) e.names.push_back(r.name);
    e.value = value_of(e.exponents);
    return e;
  }

  /// \brief The reference scale of the dimension of `unit_text` (`scale("Pa")`).
  /// \throws unit_error for unit text that cannot be read; scales_error as `scale(d)`.
  [[nodiscard]] scale_expression scale(std::string_view unit_text) const { return scale(parse_unit(unit_text).dim); }

  // ---- single values -----------------------------------------------------------------

  /// \brief `si_value` (of dimension `d`, in coherent SI units) over its reference scale.
  [[nodiscard]] double nondimensional(double si_value, const dimension& d) const {
    return cell_nondimensional(si_value, 1.0, value_of(exponents_of(d)));
  }
  /// \brief `value` in unit `unit_text` over its reference scale (`nondimensional(120, "Pa")`).
  /// \throws scales_error for an absolute temperature unit (use `nondimensional_difference`).
  [[nodiscard]] double nondimensional(double value, std::string_view unit_text) const {
    const parsed_unit u = linear_unit(unit_text, "nondimensional");
    return cell_nondimensional(value, u.factor, value_of(exponents_of(u.dim)));
  }
  /// \brief q over the reference scale of its dimension.
  template <dimension D, class Rep>
  [[nodiscard]] double nondimensional(const quantity<D, Rep>& q) const {
    return cell_nondimensional(static_cast<double>(q.si()), 1.0, value_of(exponents_of(D)));
  }
  /// Refused: an absolute temperature is not a multiple of a temperature difference.
  template <class Rep>
  double nondimensional(const temperature_point<Rep>&) const {
    static_assert(detail::dimensions_involved<spelled::dim<spelled::Theta<1>>, Rep>,
                  "nondim: an absolute temperature (temperature_point) was passed where a difference is meant; "
                  "write s.nondimensional_difference(T, T_ref) for theta = (T - T_ref) / dT");
    return 0.0;
  }

  /// \brief The SI value of dimension `d` whose nondimensional value is `x`: x times its scale.
  [[nodiscard]] double dimensional(double x, const dimension& d) const {
    return cell_dimensional(x, 1.0, value_of(exponents_of(d)));
  }
  /// \brief The value, in unit `unit_text`, whose nondimensional value is `x`.
  /// \throws scales_error for an absolute temperature unit (use `dimensional_point`).
  [[nodiscard]] double dimensional(double x, std::string_view unit_text) const {
    const parsed_unit u = linear_unit(unit_text, "dimensional");
    return cell_dimensional(x, u.factor, value_of(exponents_of(u.dim)));
  }
  /// \brief The quantity of dimension D whose nondimensional value is `x`.
  template <dimension D>
  [[nodiscard]] quantity<D> dimensional(double x) const {
    return quantity<D>::from_si(cell_dimensional(x, 1.0, value_of(exponents_of(D))));
  }

  // ---- fields: arrays of cell values, converted in one call ------------------------------

  /// \brief `out[c] = values[c] / scale` for SI cell values of dimension `d`; `out` may be
  /// `values` itself. The scale is computed once; each cell is as `nondimensional(values[c], d)`.
  /// \throws scales_error when the sizes differ or `d` lies outside the span.
  void nondimensional(std::span<const double> si_values, const dimension& d, std::span<double> out) const {
    check_sizes(si_values.size(), out.size());
    const double s = value_of(exponents_of(d));
    for (std::size_t c = 0; c < out.size(); ++c) out[c] = cell_nondimensional(si_values[c], 1.0, s);
  }
  /// \brief A typed field (`field_view`, `strided_field_view`, `field`) over the reference scale of
  /// its dimension, from references given as text: `out[c] = v[c] / scale`, the scale computed once.
  /// \throws scales_error when the sizes differ (nothing is written) or the dimension lies outside the span.
  template <any_field F>
  void nondimensional(const F& v, std::span<double> out) const {
    constexpr dimension d = std::remove_cvref_t<F>::dim;
    check_sizes(v.size(), out.size());
    const double s = value_of(exponents_of(d));
    const auto* first = v.data();
    const std::size_t stride = v.stride();
    for (std::size_t c = 0; c < out.size(); ++c)
      out[c] = cell_nondimensional(static_cast<double>(first[c * stride]), 1.0, s);
  }
  /// \brief A typed field from nondimensional numbers: `v[c] = x[c] * scale` (the inverse).
  /// \throws scales_error as `nondimensional(v, out)`.
  template <any_field F>
  void dimensional(std::span<const double> x, F&& v) const {
    constexpr dimension d = std::remove_cvref_t<F>::dim;
    using rep = std::remove_pointer_t<decltype(v.data())>;
    static_assert(detail::holds<!std::is_const_v<rep>, detail::spell<d>, rep>,
                  "nondim: dimensional(x, v) writes into v; a read-only view (Rep = const double) cannot take the "
                  "values");
    if constexpr (!std::is_const_v<rep>) {
      check_sizes(x.size(), v.size());
      const double s = value_of(exponents_of(d));
      rep* first = v.data();
      const std::size_t stride = v.stride();
      for (std::size_t c = 0; c < x.size(); ++c) first[c * stride] = static_cast<rep>(cell_dimensional(x[c], 1.0, s));
    }
  }
  /// \brief The same for cell values in unit `unit_text`; each cell as `nondimensional(values[c], unit_text)`.
  void nondimensional(std::span<const double> values, std::string_view unit_text, std::span<double> out) const {
    check_sizes(values.size(), out.size());
    const parsed_unit u = linear_unit(unit_text, "nondimensional");
    const double s = value_of(exponents_of(u.dim));
    for (std::size_t c = 0; c < out.size(); ++c) out[c] = cell_nondimensional(values[c], u.factor, s);
  }
  /// \brief `out[c] = x[c] * scale` in SI units of dimension `d`; `out` may be `x` itself.
  void dimensional(std::span<const double> x, const dimension& d, std::span<double> out) const {
    check_sizes(x.size(), out.size());
    const double s = value_of(exponents_of(d));
    for (std::size_t c = 0; c < out.size(); ++c) out[c] = cell_dimensional(x[c], 1.0, s);
  }
  /// \brief The same in unit `unit_text`; each cell as `dimensional(x[c], unit_text)`.
  void dimensional(std::span<const double> x, std::string_view unit_text, std::span<double> out) const {
    check_sizes(x.size(), out.size());
    const parsed_unit u = linear_unit(unit_text, "dimensional");
    const double s = value_of(exponents_of(u.dim));
    for (std::size_t c = 0; c < out.size(); ++c) out[c] = cell_dimensional(x[c], u.factor, s);
  }

  // ---- temperatures: only from differences ---------------------------------------------

  /// \brief theta = (T - T_ref) / dT for readings `t` and `t_ref` in unit `unit_text`
  /// (`degC`, `degF` alone are absolute scales and welcome here; so are `K`, `degR`); dT is
  /// the reference scale of temperature.
  /// \throws dimension_error when `unit_text` is not a temperature; scales_error when the
  ///         references span no temperature.
  [[nodiscard]] double nondimensional_difference(double t, double t_ref, std::string_view unit_text) const {
    const parsed_unit u = temperature_unit(unit_text);
    return cell_theta(t, u, si_reading(t_ref, u), temperature_scale());
  }
  /// \brief theta = (T - T_ref) / dT for absolute temperatures.
  template <class Rep>
  [[nodiscard]] double nondimensional_difference(const temperature_point<Rep>& t,
                                                 const temperature_point<Rep>& t_ref) const {
    return static_cast<double>((t - t_ref).si()) / temperature_scale();
  }
  /// \brief A field of readings: `out[c]` = theta of `t[c]`; `out` may be `t` itself.
  void nondimensional_difference(std::span<const double> t, double t_ref, std::string_view unit_text,
                                 std::span<double> out) const {
    check_sizes(t.size(), out.size());
    const parsed_unit u = temperature_unit(unit_text);
    const double dt = temperature_scale();
    const double ref = si_reading(t_ref, u);
    for (std::size_t c = 0; c < out.size(); ++c) out[c] = cell_theta(t[c], u, ref, dt);
  }
  /// \brief The reading, in unit `unit_text`, of T_ref + theta dT (the inverse of
  /// `nondimensional_difference`).
  [[nodiscard]] double dimensional_point(double theta, double t_ref, std::string_view unit_text) const {
    const parsed_unit u = temperature_unit(unit_text);
    return cell_reading(theta, u, si_reading(t_ref, u), temperature_scale());
  }
  /// \brief A field: `out[c]` is the reading of T_ref + theta[c] dT in unit `unit_text`;
  /// `out` may be `theta` itself. Each cell as `dimensional_point(theta[c], t_ref, unit_text)`.
  void dimensional_point(std::span<const double> theta, double t_ref, std::string_view unit_text,
                         std::span<double> out) const {
    check_sizes(theta.size(), out.size());
    const parsed_unit u = temperature_unit(unit_text);
    const double dt = temperature_scale();
    const double ref = si_reading(t_ref, u);
    for (std::size_t c = 0; c < out.size(); ++c) out[c] = cell_reading(theta[c], u, ref, dt);
  }
  /// \brief T_ref + theta dT as an absolute temperature.
  template <class Rep>
  [[nodiscard]] temperature_point<Rep> dimensional_point(double theta, const temperature_point<Rep>& t_ref) const {
    return t_ref + quantity<dims::temperature, Rep>::from_si(static_cast<Rep>(theta * temperature_scale()));
  }

 private:
  // ---- the per-cell formulas, each written once: a field's cell and the single value
  // are the same double. `factor` is the unit's size in SI units (1 for SI values, where
  // multiplying or dividing by it is exact).

  /// A value in a unit of `factor` over the scale `s`.
  static double cell_nondimensional(double value, double factor, double s) noexcept { return value * factor / s; }
  /// x times the scale `s`, in a unit of `factor`.
  static double cell_dimensional(double x, double factor, double s) noexcept { return x * s / factor; }
  /// A reading in unit `u` as an absolute temperature in K.
  static double si_reading(double t, const parsed_unit& u) noexcept { return t * u.factor + u.offset; }
  /// theta of the reading `t` in unit `u`, for the reference `ref` (in K) and the scale `dt`.
  static double cell_theta(double t, const parsed_unit& u, double ref, double dt) noexcept {
    return (si_reading(t, u) - ref) / dt;
  }
  /// The reading in unit `u` of ref + theta dt (`ref` in K).
  static double cell_reading(double theta, const parsed_unit& u, double ref, double dt) noexcept {
    return (ref + theta * dt - u.offset) / u.factor;
  }

  static std::string strip_prefix(std::string_view what) {
    constexpr std::string_view prefix = "nondim: ";
    if (what.substr(0, prefix.size()) == prefix) what.remove_prefix(prefix.size());
    return std::string(what);
  }

  static parsed_unit read_unit(const std::string& name, std::string_view unit_text) {
    try {
      return parse_unit(unit_text);
    } catch (const unit_error& e) {
      throw unit_error(e.kind(), e.column(), detail::cat("nondim: reference '", name, "': ", strip_prefix(e.what())));
    }
  }

  /// The unit of quantity text that `parse_quantity` has accepted: what follows the number.
  static std::string_view unit_part(std::string_view text) {
    std::size_t i = 0;
    const std::size_t e = text.size();
    while (i < e && detail::classify_at(text, i, e).cls == detail::char_class::space)
      i += detail::classify_at(text, i, e).len;
    if (const auto s = detail::classify_at(text, i, e);
        s.cls == detail::char_class::minus || s.cls == detail::char_class::plus)
      i += s.len;
    double x = 0.0;
    const auto end = std::from_chars(text.data() + i, text.data() + e, x, std::chars_format::general).ptr;
    std::string_view unit = text.substr(static_cast<std::size_t>(end - text.data()));
    while (!unit.empty() && (unit.front() == ' ' || unit.front() == '\t')) unit.remove_prefix(1);
    return unit.empty() ? std::string_view("1") : unit;
  }

  static scales_error absolute_reference(const std::string& name, std::string_view unit_text) {
    return scales_error(
        detail::cat("nondim: reference '", name, "' is given in `", std::string(unit_text.substr(0, 80)),
                    "`, an absolute temperature; a reference temperature is a difference "
                    "(T_wall - T_inf): give it in K, or as an interval `(degC)`"),
        name);
  }

  runtime_scales& add_si(std::string name, double si, const dimension& d, std::string unit, double given) {
    using detail::cat;
    if (name.empty()) throw scales_error("nondim: a reference needs a name");
    for (const auto& r : refs_)
      if (r.name == name) throw scales_error(cat("nondim: reference '", name, "' is given twice"), name);
    if (!std::isfinite(si) || !(si > 0.0)) {
      char buf[32];
      std::snprintf(buf, sizeof buf, "%.17g", given);
      throw scales_error(
          cat("nondim: reference '", name, "' must be positive and finite, got ", buf, unit.empty() ? "" : " ", unit),
          name);
    }
    if (d.is_dimensionless())
      throw scales_error(cat("nondim: reference '", name,
                             "' is dimensionless; a reference must bring a dimension (a dimensionless number is "
                             "its own scale)"),
                         name);
    std::optional<std::vector<rational>> k;
    try {
      k = detail::span_exponents(dims_, d);
    } catch (const detail::integers_too_large&) {
      throw scales_error(cat("nondim: reference '", name,
                             "': its exponents over the references before it do not "
                             "fit 64-bit rationals"),
                         name);
    }
    if (k) {
      std::vector<std::string> names;
      for (const auto& r : refs_) names.push_back(r.name);
      const scale_expression e{d, 1.0, *k, names};
      throw scales_error(cat("nondim: the references' dimensions must be independent, but that of '", name, "' (",
                             to_string(d), ") is the dimension of ", e.text(text_form::ascii),
                             ", made of the references before it; drop it, or replace it by one that brings a new "
                             "base dimension"),
                         name);
    }
    refs_.push_back(scale_reference{name, si, d, std::move(unit)});
    dims_.push_back(d);
    sqrt_.push_back(detail::root(si, 2));
    cbrt_.push_back(detail::root(si, 3));
    return *this;
  }

  [[nodiscard]] std::vector<rational> exponents_of(const dimension& d) const {
    using detail::cat;
    std::optional<std::vector<rational>> k;
    try {
      k = detail::span_exponents(dims_, d);
    } catch (const detail::integers_too_large& e) {
      throw scales_error(
          cat("nondim: the scale of ", to_string(d), " needs an exponent beyond 64-bit rationals (", e.example, ")"));
    }
    if (k) return *k;
    std::string list;
    for (const auto& r : refs_) list += (list.empty() ? "" : ", ") + r.name;
    if (list.empty()) list = "none";
    const std::size_t b = detail::lacking_base(dims_, d);
    if (b == base_dimension_count)
      throw scales_error(cat("nondim: the dimension ", to_string(d), " is not a product of powers of the references (",
                             list, "), and no single added base dimension would make it one"));
    throw scales_error(
        cat("nondim: the dimension ", to_string(d), " is outside the span of the references (", list,
            "): they lack the base dimension ", std::string(dimension_symbol(b)), "; add a reference that carries it"),
        {}, b);
  }

  /// (product of the positive powers, in reference order) / (product of the negative ones),
  /// as `reference_scales::scale_si`.
  [[nodiscard]] double value_of(const std::vector<rational>& k) const {
    double up = 1.0;
    double down = 1.0;
    bool any_positive = false;
    bool any_negative = false;
    for (std::size_t i = 0; i < k.size(); ++i) {
      if (k[i].num > 0) {
        up = up * power(i, k[i]);
        any_positive = true;
      } else if (k[i].num < 0) {
        down = down * power(i, k[i]);  // power() takes |k| in uint64: -k overflows for -2^63
        any_negative = true;
      }
    }
    if (!any_negative) return up;
    if (!any_positive) return 1.0 / down;
    return up / down;
  }

  /// Reference i to the power |p|/q (the sign of p is the caller's).
  [[nodiscard]] double power(std::size_t i, const rational& e) const {
    const std::uint64_t p = detail::exponent_magnitude(e.num);
    if (e.den == 1) return detail::unrolled_power_rt(refs_[i].value, p);
    if (e.den == 2) return detail::unrolled_power_rt(sqrt_[i], p);
    if (e.den == 3) return detail::unrolled_power_rt(cbrt_[i], p);
    return detail::unrolled_power_rt(detail::root(refs_[i].value, e.den), p);
  }

  [[nodiscard]] double temperature_scale() const { return value_of(exponents_of(dims::temperature)); }

  static parsed_unit linear_unit(std::string_view unit_text, const char* what) {
    const parsed_unit u = parse_unit(unit_text);
    if (u.offset != 0.0)
      throw scales_error(detail::cat(
          "nondim: `", std::string(unit_text.substr(0, 80)), "` is an absolute temperature, passed to ", what,
          "() where a difference is meant; write nondimensional_difference(T, T_ref, unit) for theta = (T - T_ref) / "
          "dT (or dimensional_point), or give a difference in K or `(degC)`"));
    return u;
  }

  static parsed_unit temperature_unit(std::string_view unit_text) {
    const parsed_unit u = parse_unit(unit_text);
    if (u.dim != dims::temperature)
      throw dimension_error("nondim: `" + std::string(unit_text.substr(0, 80)) + "` is not a unit of temperature",
                            dims::temperature, u.dim);
    return u;
  }

  static void check_sizes(std::size_t in, std::size_t out) {
    if (in != out)
      throw scales_error(detail::cat("nondim: a field of ", std::to_string(in), " cells and an output of ",
                                     std::to_string(out), " cells; they must be the same size"));
  }

  std::vector<scale_reference> refs_;
  std::vector<dimension> dims_;
  std::vector<double> sqrt_;
  std::vector<double> cbrt_;
};

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "runtime_scales.ipp"
#endif
