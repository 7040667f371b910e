#pragma once
/// \file table.hpp
/// \brief The one table of unit symbols, prefixes and factors. The compile-time constants in
/// `units::` and the run-time parser both read it; no factor is written anywhere else.
///
/// Symbol resolution (documented in the README, "Unit expressions"):
///  1. an alias is replaced by its canonical symbol (`l` -> `L`, `lbm` -> `lb`, `°C` -> `degC`);
///  2. a whole symbol wins over prefix + symbol (`min`, `Pa`, `cd`, `h`, `mi`, `ft`, `P`);
///  3. otherwise the longest prefix whose remainder is a prefixable unit (`da` before `d`);
///     prefixes apply to SI units and the metric units marked `prefixable`, never to
///     customary units; the kilogram takes its prefixes on `g`.

#include <array>
#include <cstdint>
#include <optional>
#include <string_view>

#include "../core/dims.hpp"

namespace nondim {

/// \brief One unit symbol: SI value = factor * x (+ offset when it stands alone and is affine).
struct unit_entry {
  std::string_view symbol;
  std::string_view name;
  double factor;  ///< to coherent SI
  dimension dim;
  bool prefixable;  ///< takes SI prefixes
  int decade;       ///< factor == 10^decade exactly; `no_decade` otherwise (keeps prefixed factors exact)
  double offset;    ///< affine zero in kelvin (degC, degF); 0 for every other unit
  std::string_view source;
};

/// \brief An SI prefix (SI Brochure 9th ed., table 7, with the 2022 additions R r Q q).
struct prefix_entry {
  std::string_view symbol;
  int exponent;  ///< power of ten
};

namespace detail {

inline constexpr int no_decade = 1000;
inline constexpr int pow10_min = -40;
inline constexpr int pow10_max = 40;
/// Correctly rounded powers of ten (decimal literals are rounded by the compiler once).
inline constexpr std::array<double, pow10_max - pow10_min + 1> pow10_table{
    1e-40, 1e-39, 1e-38, 1e-37, 1e-36, 1e-35, 1e-34, 1e-33, 1e-32, 1e-31, 1e-30, 1e-29, 1e-28, 1e-27,
    1e-26, 1e-25, 1e-24, 1e-23, 1e-22, 1e-21, 1e-20, 1e-19, 1e-18, 1e-17, 1e-16, 1e-15, 1e-14, 1e-13,
    1e-12, 1e-11, 1e-10, 1e-9,  1e-8,  1e-7,  1e-6,  1e-5,  1e-4,  1e-3,  1e-2,  1e-1,  1e0,   1e1,
    1e2,   1e3,   1e4,   1e5,   1e6,   1e7,   1e8,   1e9,   1e10,  1e11,  1e12,  1e13,  1e14,  1e15,
    1e16,  1e17,  1e18,  1e19,  1e20,  1e21,  1e22,  1e23,  1e24,  1e25,  1e26,  1e27,  1e28,  1e29,
    1e30,  1e31,  1e32,  1e33,  1e34,  1e35,  1e36,  1e37,  1e38,  1e39,  1e40};
constexpr double pow10(int e) {
  return pow10_table.at(static_cast<std::size_t>(e - pow10_min));
}

// Exact definitions shared by several entries (NIST SP 811 (2008) Appendix B.8).
inline constexpr double foot = 0.3048;
inline constexpr double inch = 0.0254;
inline constexpr double pound_mass = 0.45359237;
inline constexpr double standard_gravity = 9.80665;                   // SI Brochure 9th ed. / CGPM 1901
inline constexpr double pound_force = pound_mass * standard_gravity;  // 4.4482216152605 N
inline constexpr double btu_it = 1055.05585262;
inline constexpr double us_gallon = 231.0 * inch * inch * inch;  // 231 in^3 (B.8: 3.785 412 E-03 m^3)
// Conventional mercury: 13.5951 g/cm^3 under standard gravity, so 1 mmHg = 13595.1 kg/m^3 *
// 0.001 m * 9.80665 m/s^2 = 133.322 387 415 Pa exactly (NIST SP 811 B.8 footnote on
// conventional mercury and water, from memory); the decimal below is that exact value.
inline constexpr double mm_mercury = 133.322387415;
// Conventional water: 1000 kg/m^3 under standard gravity (NIST SP 811 B.8, footnote).
inline constexpr double water_column_per_metre = 1000.0 * standard_gravity;
inline constexpr double pi = 3.141592653589793238462643383279502884;

using namespace nondim::dims;

constexpr unit_entry si(std::string_view s, std::string_view n, dimension d, std::string_view src) {
  return {s, n, 1.0, d, true, 0, 0.0, src};
}
constexpr unit_entry metric(std::string_view s, std::string_view n, int decade, dimension d, std::string_view src) {
  return {s, n, pow10(decade), d, true, decade, 0.0, src};
}
constexpr unit_entry plain(std::string_view s, std::string_view n, double f, dimension d, std::string_view src) {
  return {s, n, f, d, false, no_decade, 0.0, src};
}

inline constexpr std::string_view brochure_t2 = "SI Brochure 9th ed., table 2";
inline constexpr std::string_view brochure_t4 = "SI Brochure 9th ed., table 4";
inline constexpr std::string_view brochure_t8 = "SI Brochure 9th ed., table 8";
inline constexpr std::string_view nist_b8 = "NIST SP 811 (2008), Appendix B.8";
inline constexpr std::string_view nist_b9 = "NIST SP 811 (2008), Appendix B.9";

}  // namespace detail

/// \brief Every unit symbol nondim knows. Order is irrelevant; symbols are unique.
inline constexpr std::array unit_table{
    // SI base units (SI Brochure 9th ed., table 2); the kilogram is "k" + "g".
    detail::si("m", "metre", dims::length, detail::brochure_t2),
    detail::metric("g", "gram", -3, dims::mass, detail::brochure_t2),
    detail::si("s", "second", dims::time, detail::brochure_t2),
    detail::si("A", "ampere", dims::current, detail::brochure_t2),
    detail::si("K", "kelvin", dims::temperature, detail::brochure_t2),
    detail::si("mol", "mole", dims::amount, detail::brochure_t2),
    detail::si("cd", "candela", dims::luminous_intensity, detail::brochure_t2),
    // SI derived units with special names (table 4)
    detail::si("rad", "radian", dims::dimensionless, detail::brochure_t4),
    detail::si("sr", "steradian", dims::dimensionless, detail::brochure_t4),
    detail::si("Hz", "hertz", dims::frequency, detail::brochure_t4),
    detail::si("N", "newton", dims::force, detail::brochure_t4),
    detail::si("Pa", "pascal", dims::pressure, detail::brochure_t4),
    detail::si("J", "joule", dims::energy, detail::brochure_t4),
    detail::si("W", "watt", dims::power, detail::brochure_t4),
    // watt hour (kWh, MWh): NIST SP 811 (2008) B.9, "kilowatt hour: 3.6 E+06 J"
    unit_entry{"Wh", "watt hour", 3600.0, dims::energy, true, detail::no_decade, 0.0, detail::nist_b9},
    detail::si("C", "coulomb", dims::electric_charge, detail::brochure_t4),
    detail::si("V", "volt", dims::voltage, detail::brochure_t4),
    detail::si("F", "farad", dims::capacitance, detail::brochure_t4),
    detail::si("\u03a9", "ohm", dims::resistance, detail::brochure_t4),
    detail::si("S", "siemens", dims::conductance, detail::brochure_t4),
    detail::si("Wb", "weber", dims::magnetic_flux, detail::brochure_t4),
    detail::si("T", "tesla", dims::magnetic_flux_density, detail::brochure_t4),
    detail::si("H", "henry", dims::inductance, detail::brochure_t4),
    detail::si("lm", "lumen", dims::luminous_intensity, detail::brochure_t4),
    detail::si("lx", "lux", dims::luminance, detail::brochure_t4),
    detail::si("Bq", "becquerel", dims::frequency, detail::brochure_t4),
    detail::si("Gy", "gray", dims::specific_energy, detail::brochure_t4),
    detail::si("Sv", "sievert", dims::specific_energy, detail::brochure_t4),
    detail::si("kat", "katal", dims::catalytic_activity, detail::brochure_t4),
    // Celsius: affine when it stands alone, an interval of 1 K inside a compound unit (table 4)
    unit_entry{"degC", "degree Celsius", 1.0, dims::temperature, false, 0, 273.15, detail::brochure_t4},
    // non-SI units accepted for use with the SI (table 8)
    detail::plain("min", "minute", 60.0, dims::time, detail::brochure_t8),
    detail::plain("h", "hour", 3600.0, dims::time, detail::brochure_t8),
    detail::plain("d", "day", 86400.0, dims::time, detail::brochure_t8),
    detail::plain("au", "astronomical unit", 149597870700.0, dims::length, detail::brochure_t8),
    detail::plain("deg", "degree (plane angle)", detail::pi / 180.0, dims::dimensionless, detail::brochure_t8),
    detail::plain("ha", "hectare", 1.0e4, dims::area, detail::brochure_t8),
    detail::metric("L", "litre", -3, dims::volume, detail::brochure_t8),
    detail::metric("t", "tonne", 3, dims::mass, detail::brochure_t8),
    unit_entry{"Da", "dalton", 1.66053906660e-27, dims::mass, true, detail::no_decade, 0.0, detail::brochure_t8},
    unit_entry{"eV", "electronvolt", 1.602176634e-19, dims::energy, true, detail::no_decade, 0.0, detail::brochure_t8},
    // other metric units common in handbooks: take prefixes (mbar, kcal, cP, cSt)
    detail::metric("bar", "bar", 5, dims::pressure, detail::nist_b8),
    detail::metric("P", "poise", -1, dims::dynamic_viscosity, detail::nist_b8),
    detail::metric("St", "stokes", -4, dims::kinematic_viscosity, detail::nist_b8),
    detail::metric("dyn", "dyne", -5, dims::force, detail::nist_b8),
    detail::metric("erg", "erg", -7, dims::energy, detail::nist_b8),
    unit_entry{"cal", "calorie (International Table)", 4.1868, dims::energy, true, detail::no_decade, 0.0,
               detail::nist_b8},
    unit_entry{"cal_th", "calorie (thermochemical)", 4.184, dims::energy, true, detail::no_decade, 0.0,
               detail::nist_b8},
    detail::plain("\u00c5", "angstrom", 1.0e-10, dims::length, detail::nist_b8),
    detail::plain("kgf", "kilogram-force", detail::standard_gravity, dims::force, detail::nist_b8),
    detail::plain("atm", "standard atmosphere", 101325.0, dims::pressure, detail::nist_b8),
    detail::plain("Torr", "torr", 101325.0 / 760.0, dims::pressure, detail::nist_b8),
    detail::plain("mmHg", "millimetre of mercury, conventional", detail::mm_mercury, dims::pressure, detail::nist_b8),
    detail::plain("nmi", "nautical mile", 1852.0, dims::length, detail::nist_b8),
    detail::plain("knot", "knot", 1852.0 / 3600.0, dims::velocity, detail::nist_b8),
    // Rotational frequency n (ISO 80000-3: revolutions per unit time, unit 1/s,
    // r/min in practice): the n of pump and propeller coefficients. An angular velocity
    // (omega = 2 pi n) is written in rad/s; `convert` says when a conversion crosses the two.
    detail::plain("rpm", "revolution per minute (rotational frequency)", 1.0 / 60.0, dims::frequency,
                  "ISO 80000-3, rotational frequency; NIST SP 811 (2008) B.8 (r/min)"),
    detail::plain("rev", "revolution (plane angle, 2 pi rad)", 2.0 * detail::pi, dims::dimensionless, detail::nist_b8),
    // ratios: % is the number 0.01 (SI Brochure 9th ed., 5.4.7); ppm is 10^-6, an abbreviation
    // the Brochure discourages but engineers write
    detail::plain("%", "percent", 1.0e-2, dims::dimensionless, "SI Brochure 9th ed., 5.4.7"),
    detail::plain("ppm", "part per million", 1.0e-6, dims::dimensionless, "common practice, no source"),
    // US customary and imperial units, never prefixed (NIST SP 811 Appendix B.8)
    detail::plain("ft", "foot", detail::foot, dims::length, detail::nist_b8),
    detail::plain("in", "inch", detail::inch, dims::length, detail::nist_b8),
    detail::plain("yd", "yard", 3.0 * detail::foot, dims::length, detail::nist_b8),
    detail::plain("mi", "mile (international)", 5280.0 * detail::foot, dims::length, detail::nist_b8),
    detail::plain("mil", "mil (0.001 in)", detail::inch / 1000.0, dims::length, detail::nist_b8),
    detail::plain("lb", "pound (avoirdupois)", detail::pound_mass, dims::mass, detail::nist_b8),
    detail::plain("oz", "ounce (avoirdupois)", detail::pound_mass / 16.0, dims::mass, detail::nist_b8),
    detail::plain("gr", "grain", detail::pound_mass / 7000.0, dims::mass, detail::nist_b8),
    detail::plain("slug", "slug", detail::pound_force / detail::foot, dims::mass, detail::nist_b8),
    detail::plain("lbf", "pound-force", detail::pound_force, dims::force, detail::nist_b8),
    detail::plain("kip", "kip (1000 lbf)", 1000.0 * detail::pound_force, dims::force, detail::nist_b8),
    detail::plain("pdl", "poundal", detail::pound_mass* detail::foot, dims::force, detail::nist_b8),
    detail::plain("psi", "pound-force per square inch", detail::pound_force / (detail::inch * detail::inch),
                  dims::pressure, detail::nist_b8),
    detail::plain("ksi", "kip per square inch", 1000.0 * detail::pound_force / (detail::inch * detail::inch),
                  dims::pressure, detail::nist_b8),
    // conventional inch of mercury: exactly 25.4 conventional mmHg (B.8: 3.386 389 E+03 Pa)
    detail::plain("inHg", "inch of mercury, conventional", 25.4 * detail::mm_mercury, dims::pressure, detail::nist_b8),
    // conventional water columns (B.8: inH2O 2.490 889 E+02, ftH2O 2.989 067 E+03, mmH2O 9.806 65 E+00 Pa)
    detail::plain("inH2O", "inch of water, conventional", detail::inch* detail::water_column_per_metre, dims::pressure,
                  detail::nist_b8),
    detail::plain("ftH2O", "foot of water, conventional", detail::foot* detail::water_column_per_metre, dims::pressure,
                  detail::nist_b8),
    detail::plain("mmH2O", "millimetre of water, conventional", 1.0e-3 * detail::water_column_per_metre, dims::pressure,
                  detail::nist_b8),
    detail::plain("Btu", "British thermal unit (International Table)", detail::btu_it, dims::energy, detail::nist_b8),
    detail::plain("hp", "horsepower (550 ft lbf/s)", 550.0 * detail::foot * detail::pound_force, dims::power,
                  detail::nist_b8),
    detail::plain("TR", "ton of refrigeration (12000 Btu/h)", 12000.0 * detail::btu_it / 3600.0, dims::power,
                  detail::nist_b8),
    detail::plain("gal", "gallon (US liquid)", detail::us_gallon, dims::volume, detail::nist_b8),
    // gallon per minute (B.8: 6.309 020 E-05 m^3/s)
    detail::plain("gpm", "gallon (US) per minute", detail::us_gallon / 60.0, dims::volume / dims::time,
                  detail::nist_b8),
    // imperial gallon: 4.546 09 L exactly (B.8: gallon [Canadian and U.K. (Imperial)] = 4.546 09 E-03 m^3)
    detail::plain("gal_imp", "gallon (imperial)", 4.54609e-3, dims::volume, detail::nist_b8),
    // acre of 43 560 ft^2 on the international foot (B.8 lists 4.046 873 E+03 m^2 on the US
    // survey foot, which the United States retired at the end of 2022): 4046.856 422 4 m^2
    detail::plain("acre", "acre (international foot)", 43560.0 * detail::foot * detail::foot, dims::area,
                  detail::nist_b8),
    detail::plain("mph", "mile per hour", 5280.0 * detail::foot / 3600.0, dims::velocity, detail::nist_b8),
    detail::plain("lbmol", "pound-mole", 1000.0 * detail::pound_mass, dims::amount, "common practice, no source"),
    // Fahrenheit and Rankine: degF affine alone, an interval inside a compound unit; degR never affine
    unit_entry{"degF", "degree Fahrenheit", 5.0 / 9.0, dims::temperature, false, detail::no_decade, 459.67 * 5.0 / 9.0,
               detail::nist_b9},
    detail::plain("degR", "degree Rankine", 5.0 / 9.0, dims::temperature, detail::nist_b9),
};

/// \brief Other spellings of table symbols.
struct unit_alias {
  std::string_view alias;
  std::string_view symbol;
};
inline constexpr std::array unit_aliases{
    unit_alias{"l", "L"},
    unit_alias{"lbm", "lb"},
    unit_alias{"Ohm", "\u03a9"},
    unit_alias{"\u2126", "\u03a9"},
    unit_alias{"\u00b0C", "degC"},
    unit_alias{"\u2103", "degC"},
    unit_alias{"\u00b0F", "degF"},
    unit_alias{"\u2109", "degF"},
    unit_alias{"\u00b0R", "degR"},
    unit_alias{"\u00b0", "deg"},
    unit_alias{"kn", "knot"},
    unit_alias{"kt", "knot"},
    unit_alias{"BTU", "Btu"},
    unit_alias{"torr", "Torr"},
    unit_alias{"\u212b", "\u00c5"},
    unit_alias{"r/min", "rpm"},
    unit_alias{"tonne", "t"},
    unit_alias{"mmH\u2082O", "mmH2O"},
    unit_alias{"inH\u2082O", "inH2O"},
    unit_alias{"ftH\u2082O", "ftH2O"},
};

/// \brief SI prefixes, longest symbol first where one is a prefix of another ("da" before "d").
inline constexpr std::array prefix_table{
    prefix_entry{"Q", 30},      prefix_entry{"R", 27},      prefix_entry{"Y", 24},  prefix_entry{"Z", 21},
    prefix_entry{"E", 18},      prefix_entry{"P", 15},      prefix_entry{"T", 12},  prefix_entry{"G", 9},
    prefix_entry{"M", 6},       prefix_entry{"k", 3},       prefix_entry{"h", 2},   prefix_entry{"da", 1},
    prefix_entry{"d", -1},      prefix_entry{"c", -2},      prefix_entry{"m", -3},  prefix_entry{"u", -6},
    prefix_entry{"\u00b5", -6}, prefix_entry{"\u03bc", -6}, prefix_entry{"n", -9},  prefix_entry{"p", -12},
    prefix_entry{"f", -15},     prefix_entry{"a", -18},     prefix_entry{"z", -21}, prefix_entry{"y", -24},
    prefix_entry{"r", -27},     prefix_entry{"q", -30},
};

/// \brief A symbol resolved against the table: which entry, which prefix, the SI factor.
struct resolved_symbol {
  const unit_entry* entry;
  const prefix_entry* prefix;  ///< null when unprefixed
  double factor;               ///< entry factor times the prefix, exact for decade units
};

namespace detail {

/// One key of the symbol index: a table symbol or an alias, and the entry it names.
struct symbol_key {
  std::string_view key;
  std::size_t entry;
};

constexpr std::size_t table_position(std::string_view symbol) {
  for (std::size_t i = 0; i < unit_table.size(); ++i)
    if (unit_table[i].symbol == symbol) return i;
  throw "nondim: an alias names a symbol missing from the unit table";  // a compile error
}

/// `a < b` in the order of `std::string_view` (bytes as unsigned char, a prefix first), on
/// raw characters: constant evaluation of string_view's `compare` made sorting the index
/// cost a sixth of the whole of <nondim/quantity.hpp>.
constexpr bool key_less(std::string_view a, std::string_view b) noexcept {
  const char* x = a.data();
  const char* y = b.data();
  const std::size_t n = a.size() < b.size() ? a.size() : b.size();
  for (std::size_t i = 0; i < n; ++i)
    if (x[i] != y[i]) return static_cast<unsigned char>(x[i]) < static_cast<unsigned char>(y[i]);
  return a.size() < b.size();
}

/// Every symbol and alias, sorted, so a lookup is a binary search (a few comparisons of
/// short strings) instead of a scan. Built once at compile time; a duplicate key is a
/// compile error, so "symbols are unique" is checked, not assumed. Sorted by first byte
/// (counting), then by insertion within each first byte: a few hundred comparisons.
constexpr std::array<symbol_key, unit_table.size() + unit_aliases.size()> make_symbol_index() {
  constexpr std::size_t n = unit_table.size() + unit_aliases.size();
  std::array<symbol_key, n> keys{};
  for (std::size_t i = 0; i < unit_table.size(); ++i) keys[i] = symbol_key{unit_table[i].symbol, i};
  for (std::size_t i = 0; i < unit_aliases.size(); ++i)
    keys[unit_table.size() + i] = symbol_key{unit_aliases[i].alias, table_position(unit_aliases[i].symbol)};
  std::array<std::size_t, 257> start{};
  for (const symbol_key& k : keys) {
    if (k.key.empty()) throw "nondim: an empty unit symbol or alias in the unit table";
    ++start[static_cast<unsigned char>(k.key[0]) + 1U];
  }
  for (std::size_t b = 1; b < start.size(); ++b) start[b] += start[b - 1];
  std::array<symbol_key, n> index{};
  std::array<std::size_t, 256> next{};
  for (const symbol_key& k : keys) {
    const auto b = static_cast<unsigned char>(k.key[0]);
    std::size_t j = start[b] + next[b]++;
    for (; j > start[b] && key_less(k.key, index[j - 1].key); --j) index[j] = index[j - 1];
    index[j] = k;
  }
  for (std::size_t i = 1; i < n; ++i)
    if (!key_less(index[i - 1].key, index[i].key))
      throw "nondim: a unit symbol or alias appears twice in the unit table";
  return index;
}

inline constexpr auto symbol_index = make_symbol_index();

/// For each first byte, the range of `symbol_index` whose keys start with it (the index is
/// sorted, so they are contiguous): a lookup compares a handful of keys at most.
struct symbol_bucket {
  std::uint16_t begin;
  std::uint16_t end;
};
constexpr std::array<symbol_bucket, 256> make_symbol_buckets() {
  std::array<symbol_bucket, 256> buckets{};
  for (std::size_t i = symbol_index.size(); i-- > 0;) {
    const auto b = static_cast<unsigned char>(symbol_index[i].key[0]);
    if (buckets[b].end == 0) buckets[b].end = static_cast<std::uint16_t>(i + 1);
    buckets[b].begin = static_cast<std::uint16_t>(i);
  }
  return buckets;
}
inline constexpr auto symbol_buckets = make_symbol_buckets();

}  // namespace detail

namespace detail {
/// `a == b` on raw characters, for the reason `key_less` is written so.
constexpr bool key_equal(std::string_view a, std::string_view b) noexcept {
  if (a.size() != b.size()) return false;
  const char* x = a.data();
  const char* y = b.data();
  for (std::size_t i = 0; i < a.size(); ++i)
    if (x[i] != y[i]) return false;
  return true;
}
}  // namespace detail

/// \brief Position in `unit_table` of the entry with exactly this symbol (after aliases), or
/// `unit_table.size()` when there is none.
///
/// Compile-time callers use positions, not pointers: GCC 12 with -fsanitize=undefined
/// cannot compare the address of a table element with null in a constant expression.
constexpr std::size_t find_unit_position(std::string_view symbol) noexcept {
  if (symbol.empty()) return unit_table.size();
  const detail::symbol_bucket b = detail::symbol_buckets[static_cast<unsigned char>(symbol[0])];
  for (std::size_t i = b.begin; i < b.end; ++i)
    if (detail::key_equal(detail::symbol_index[i].key, symbol)) return detail::symbol_index[i].entry;
  return unit_table.size();
}

/// \brief The table entry with exactly this symbol (after aliases), or null.
constexpr const unit_entry* find_unit_entry(std::string_view symbol) noexcept {
  const std::size_t i = find_unit_position(symbol);
  return i < unit_table.size() ? &unit_table[i] : nullptr;
}

namespace detail {

/// A symbol resolved to positions: `entry == unit_table.size()` when unknown, `prefix ==
/// prefix_table.size()` when unprefixed. Positions, not `std::optional`, so that the
/// `units::` constants (about 150 constant evaluations in every file that includes
/// <nondim/quantity.hpp>) do not go through optional's constructors.
struct symbol_position {
  std::size_t entry;
  std::size_t prefix;
};

/// The rules at the top of this file.
constexpr symbol_position resolve_symbol_position(std::string_view symbol) noexcept {
  if (const std::size_t e = find_unit_position(symbol); e < unit_table.size()) return {e, prefix_table.size()};
  std::size_t best = prefix_table.size();
  std::size_t best_unit = unit_table.size();
  for (std::size_t i = 0; i < prefix_table.size(); ++i) {
    const std::string_view p = prefix_table[i].symbol;
    if (symbol.size() <= p.size() || symbol[0] != p[0] || !key_equal(symbol.substr(0, p.size()), p)) continue;
    const std::size_t u = find_unit_position(symbol.substr(p.size()));
    if (u == unit_table.size() || !unit_table[u].prefixable) continue;
    if (best == prefix_table.size() || p.size() > prefix_table[best].symbol.size()) {
      best = i;
      best_unit = u;
    }
  }
  return {best_unit, best};
}

/// The SI factor of a resolved symbol: exact for decade units (one power of ten).
constexpr double resolved_factor(const symbol_position& r) noexcept {
  const unit_entry& unit = unit_table[r.entry];
  if (r.prefix == prefix_table.size()) return unit.factor;
  const prefix_entry& prefix = prefix_table[r.prefix];
  return unit.decade != no_decade ? pow10(unit.decade + prefix.exponent) : unit.factor * pow10(prefix.exponent);
}

}  // namespace detail

/// \brief Resolve a symbol by the rules at the top of this file; empty when unknown.
constexpr std::optional<resolved_symbol> resolve_unit_symbol(std::string_view symbol) noexcept {
  const detail::symbol_position r = detail::resolve_symbol_position(symbol);
  if (r.entry == unit_table.size()) return std::nullopt;
  return resolved_symbol{&unit_table[r.entry], r.prefix == prefix_table.size() ? nullptr : &prefix_table[r.prefix],
                         detail::resolved_factor(r)};
}

}  // namespace nondim
