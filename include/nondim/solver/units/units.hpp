#pragma once
/// \file units.hpp
/// \brief `units::` constants, each read from the unit table at compile time (so the
/// parser and the constants cannot disagree on a factor).

#include <string_view>

#include "table.hpp"
#include "temperature.hpp"  // detail::table_entry
#include "unit.hpp"

namespace nondim {

namespace detail {
/// The table's factor for `symbol` (prefix rules included), checked to have dimension `d`.
/// A missing symbol or another dimension is a compile error (a throw in constant evaluation).
consteval double table_factor(std::string_view symbol, const dimension& d) {
  const symbol_position r = resolve_symbol_position(symbol);
  if (r.entry == unit_table.size()) throw "nondim: unit symbol missing from the table";
  if (unit_table[r.entry].dim != d) throw "nondim: unit symbol has another dimension in the table";
  return resolved_factor(r);
}
/// The table's unit for `symbol`, of dimension D.
template <dimension D>
consteval unit<D> table_unit(std::string_view symbol) {
  return unit<D>{table_factor(symbol, D)};
}
}  // namespace detail

/// \brief Units as constants: `2.0 * units::ft` is a length; `q / units::psi` a number.
///
/// Temperature units here are intervals (`delta_degC`, `delta_degF`, `degR`, `K`); absolute
/// Celsius and Fahrenheit readings are `temperature_point`s (`from_celsius(20.0)`).
namespace units {
using detail::table_unit;
// length
inline constexpr auto m = table_unit<dims::length>("m");
inline constexpr auto km = table_unit<dims::length>("km");
inline constexpr auto cm = table_unit<dims::length>("cm");
inline constexpr auto mm = table_unit<dims::length>("mm");
inline constexpr auto um = table_unit<dims::length>("um");
inline constexpr auto nm = table_unit<dims::length>("nm");
inline constexpr auto angstrom = table_unit<dims::length>("\u00c5");
inline constexpr auto ft = table_unit<dims::length>("ft");
inline constexpr auto in = table_unit<dims::length>("in");
inline constexpr auto yd = table_unit<dims::length>("yd");
inline constexpr auto mi = table_unit<dims::length>("mi");
inline constexpr auto nmi = table_unit<dims::length>("nmi");
inline constexpr auto mil = table_unit<dims::length>("mil");
// area and volume
inline constexpr auto m2 = m * m;
inline constexpr auto m3 = m * m * m;
inline constexpr auto ha = table_unit<dims::area>("ha");
inline constexpr auto L = table_unit<dims::volume>("L");
inline constexpr auto mL = table_unit<dims::volume>("mL");
inline constexpr auto gal = table_unit<dims::volume>("gal");
inline constexpr auto gal_imp = table_unit<dims::volume>("gal_imp");
inline constexpr auto acre = table_unit<dims::area>("acre");
inline constexpr auto gpm = table_unit<dims::volume / dims::time>("gpm");
// mass
inline constexpr auto kg = table_unit<dims::mass>("kg");
inline constexpr auto g = table_unit<dims::mass>("g");
inline constexpr auto mg = table_unit<dims::mass>("mg");
inline constexpr auto t = table_unit<dims::mass>("t");
inline constexpr auto Da = table_unit<dims::mass>("Da");
inline constexpr auto lb = table_unit<dims::mass>("lb");
inline constexpr auto lbm = table_unit<dims::mass>("lbm");
inline constexpr auto oz = table_unit<dims::mass>("oz");
inline constexpr auto slug = table_unit<dims::mass>("slug");
// time and frequency
inline constexpr auto s = table_unit<dims::time>("s");
inline constexpr auto ms = table_unit<dims::time>("ms");
inline constexpr auto us = table_unit<dims::time>("us");
inline constexpr auto ns = table_unit<dims::time>("ns");
inline constexpr auto min = table_unit<dims::time>("min");
inline constexpr auto h = table_unit<dims::time>("h");
inline constexpr auto d = table_unit<dims::time>("d");
inline constexpr auto Hz = table_unit<dims::frequency>("Hz");
inline constexpr auto kHz = table_unit<dims::frequency>("kHz");
inline constexpr auto MHz = table_unit<dims::frequency>("MHz");
/// Rotational frequency n in revolutions per minute, 1/60 s^-1 (ISO 80000-3); an angular
/// velocity is omega = 2 pi n, written in rad/s.
inline constexpr auto rpm = table_unit<dims::frequency>("rpm");
// angle (dimensionless)
inline constexpr auto rad = table_unit<dims::dimensionless>("rad");
inline constexpr auto sr = table_unit<dims::dimensionless>("sr");
inline constexpr auto deg = table_unit<dims::dimensionless>("deg");
inline constexpr auto rev = table_unit<dims::dimensionless>("rev");
// velocity
inline constexpr auto knot = table_unit<dims::velocity>("knot");
inline constexpr auto mph = table_unit<dims::velocity>("mph");
// force
inline constexpr auto N = table_unit<dims::force>("N");
inline constexpr auto mN = table_unit<dims::force>("mN");
inline constexpr auto kN = table_unit<dims::force>("kN");
inline constexpr auto MN = table_unit<dims::force>("MN");
inline constexpr auto dyn = table_unit<dims::force>("dyn");
inline constexpr auto kgf = table_unit<dims::force>("kgf");
inline constexpr auto lbf = table_unit<dims::force>("lbf");
inline constexpr auto kip = table_unit<dims::force>("kip");
// pressure
inline constexpr auto Pa = table_unit<dims::pressure>("Pa");
inline constexpr auto hPa = table_unit<dims::pressure>("hPa");
inline constexpr auto kPa = table_unit<dims::pressure>("kPa");
inline constexpr auto MPa = table_unit<dims::pressure>("MPa");
inline constexpr auto GPa = table_unit<dims::pressure>("GPa");
inline constexpr auto bar = table_unit<dims::pressure>("bar");
inline constexpr auto mbar = table_unit<dims::pressure>("mbar");
inline constexpr auto atm = table_unit<dims::pressure>("atm");
inline constexpr auto Torr = table_unit<dims::pressure>("Torr");
inline constexpr auto mmHg = table_unit<dims::pressure>("mmHg");
inline constexpr auto inHg = table_unit<dims::pressure>("inHg");
inline constexpr auto inH2O = table_unit<dims::pressure>("inH2O");
inline constexpr auto ftH2O = table_unit<dims::pressure>("ftH2O");
inline constexpr auto mmH2O = table_unit<dims::pressure>("mmH2O");
inline constexpr auto psi = table_unit<dims::pressure>("psi");
inline constexpr auto ksi = table_unit<dims::pressure>("ksi");
// energy and power
inline constexpr auto J = table_unit<dims::energy>("J");
inline constexpr auto kJ = table_unit<dims::energy>("kJ");
inline constexpr auto MJ = table_unit<dims::energy>("MJ");
inline constexpr auto eV = table_unit<dims::energy>("eV");
inline constexpr auto erg = table_unit<dims::energy>("erg");
inline constexpr auto cal = table_unit<dims::energy>("cal");
inline constexpr auto kcal = table_unit<dims::energy>("kcal");
inline constexpr auto Btu = table_unit<dims::energy>("Btu");
inline constexpr auto W = table_unit<dims::power>("W");
inline constexpr auto mW = table_unit<dims::power>("mW");
inline constexpr auto kW = table_unit<dims::power>("kW");
inline constexpr auto MW = table_unit<dims::power>("MW");
inline constexpr auto hp = table_unit<dims::power>("hp");
inline constexpr auto TR = table_unit<dims::power>("TR");
// viscosity
inline constexpr auto P = table_unit<dims::dynamic_viscosity>("P");
inline constexpr auto cP = table_unit<dims::dynamic_viscosity>("cP");
inline constexpr auto St = table_unit<dims::kinematic_viscosity>("St");
inline constexpr auto cSt = table_unit<dims::kinematic_viscosity>("cSt");
// temperature intervals
inline constexpr auto K = table_unit<dims::temperature>("K");
inline constexpr auto mK = table_unit<dims::temperature>("mK");
inline constexpr auto delta_degC = unit<dims::temperature>{detail::table_entry("degC").factor};
inline constexpr auto delta_degF = unit<dims::temperature>{detail::table_entry("degF").factor};
inline constexpr auto degR = table_unit<dims::temperature>("degR");
// amount of substance, electromagnetism, light
inline constexpr auto mol = table_unit<dims::amount>("mol");
inline constexpr auto mmol = table_unit<dims::amount>("mmol");
inline constexpr auto kmol = table_unit<dims::amount>("kmol");
inline constexpr auto lbmol = table_unit<dims::amount>("lbmol");
inline constexpr auto A = table_unit<dims::current>("A");
inline constexpr auto mA = table_unit<dims::current>("mA");
inline constexpr auto C = table_unit<dims::electric_charge>("C");
inline constexpr auto V = table_unit<dims::voltage>("V");
inline constexpr auto mV = table_unit<dims::voltage>("mV");
inline constexpr auto kV = table_unit<dims::voltage>("kV");
inline constexpr auto Ohm = table_unit<dims::resistance>("Ohm");
inline constexpr auto S = table_unit<dims::conductance>("S");
inline constexpr auto F = table_unit<dims::capacitance>("F");
inline constexpr auto uF = table_unit<dims::capacitance>("uF");
inline constexpr auto H = table_unit<dims::inductance>("H");
inline constexpr auto Wb = table_unit<dims::magnetic_flux>("Wb");
inline constexpr auto T = table_unit<dims::magnetic_flux_density>("T");
inline constexpr auto cd = table_unit<dims::luminous_intensity>("cd");
}  // namespace units

}  // namespace nondim
