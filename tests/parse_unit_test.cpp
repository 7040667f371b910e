// Tests of nondim/parse: unit expressions read at run time, checked against published factors.
//
// NIST SP 811 (2008) Appendix B.8 (alphabetical) and B.9 (by kind of quantity) print each
// factor to 7 significant digits, exact ones in bold; a row below gives the entry, the
// factor as printed and its digit count, and is compared to half a unit in the last printed
// digit. "exact" rows (bold in NIST, or exact in the SI Brochure) are compared to 1e-14
// relative. The digits were transcribed from the published tables from memory and each was
// re-derived with python3 (fractions) from the exact definitions of NIST SP 811 B.8
// (1 ft = 0.3048 m, 1 lb = 0.453 592 37 kg, g_n = 9.806 65 m/s^2, Btu_IT = 1055.055 852 62 J,
// 1 degF interval = 5/9 K); all agree to the printed digits.
#include <nondim/parse.hpp>
#include <nondim/quantity.hpp>

#include <doctest/doctest.h>

#include <cmath>
#include <string>
#include <string_view>

using namespace nondim;

namespace {

struct published {
  std::string_view expr;
  double value;  // SI value of one unit, as printed
  int digits;    // significant digits printed; 0 = exact
  dimension dim;
  std::string_view source;
};

bool agrees(double actual, const published& p) {
  if (p.digits == 0) return std::abs(actual - p.value) <= 1e-14 * std::abs(p.value);
  const double exponent = std::floor(std::log10(std::abs(p.value)));
  const double half_unit = 0.5 * std::pow(10.0, exponent - (p.digits - 1));
  return std::abs(actual - p.value) <= half_unit * (1.0 + 1e-9);
}

using namespace nondim::dims;
constexpr dimension area_density = mass / area;

// clang-format off
const published table[] = {
    // ---- length, area, volume
    {"ft", 3.048e-01, 0, length, "NIST SP 811 B.8: foot, 3.048 E-01 m (exact)"},
    {"in", 2.54e-02, 0, length, "NIST SP 811 B.8: inch, 2.54 E-02 m (exact)"},
    {"yd", 9.144e-01, 0, length, "NIST SP 811 B.8: yard, 9.144 E-01 m (exact)"},
    {"mi", 1.609344e+03, 0, length, "NIST SP 811 B.8: mile (international), 1.609 344 E+03 m (exact)"},
    {"nmi", 1.852e+03, 0, length, "NIST SP 811 B.8: nautical mile, 1.852 E+03 m (exact)"},
    {"mil", 2.54e-05, 0, length, "NIST SP 811 B.8: mil (0.001 in), 2.54 E-05 m (exact)"},
    {"ft^2", 9.290304e-02, 0, area, "NIST SP 811 B.8: square foot, 9.290 304 E-02 m^2 (exact)"},
    {"in\u00b2", 6.4516e-04, 0, area, "NIST SP 811 B.8: square inch, 6.4516 E-04 m^2 (exact)"},
    {"yd^2", 8.361274e-01, 7, area, "NIST SP 811 B.8: square yard, 8.361 274 E-01 m^2"},
    {"mi**2", 2.589988e+06, 7, area, "NIST SP 811 B.8: square mile, 2.589 988 E+06 m^2"},
    {"ft^3", 2.831685e-02, 7, volume, "NIST SP 811 B.8: cubic foot, 2.831 685 E-02 m^3"},
    {"in\u00b3", 1.638706e-05, 7, volume, "NIST SP 811 B.8: cubic inch, 1.638 706 E-05 m^3"},
    {"yd^3", 7.645549e-01, 7, volume, "NIST SP 811 B.8: cubic yard, 7.645 549 E-01 m^3"},
    {"gal", 3.785412e-03, 7, volume, "NIST SP 811 B.8: gallon (U.S.), 3.785 412 E-03 m^3"},
    // ---- flow, velocity, acceleration, diffusivity
    {"ft^3/min", 4.719474e-04, 7, volume_flow_rate, "NIST SP 811 B.8: cubic foot per minute, 4.719 474 E-04 m^3/s"},
    {"ft^3/s", 2.831685e-02, 7, volume_flow_rate, "NIST SP 811 B.8: cubic foot per second, 2.831 685 E-02 m^3/s"},
    {"gal/min", 6.309020e-05, 7, volume_flow_rate, "NIST SP 811 B.8: gallon (U.S.) per minute, 6.309 020 E-05 m^3/s"},
    {"gal/d", 4.381264e-08, 7, volume_flow_rate, "NIST SP 811 B.8: gallon (U.S.) per day, 4.381 264 E-08 m^3/s"},
    {"ft/h", 8.466667e-05, 7, velocity, "NIST SP 811 B.8: foot per hour, 8.466 667 E-05 m/s"},
    {"ft/min", 5.08e-03, 0, velocity, "NIST SP 811 B.8: foot per minute, 5.08 E-03 m/s (exact)"},
    {"ft/s^2", 3.048e-01, 0, acceleration, "NIST SP 811 B.8: foot per second squared, 3.048 E-01 m/s^2 (exact)"},
    {"in/s", 2.54e-02, 0, velocity, "NIST SP 811 B.8: inch per second, 2.54 E-02 m/s (exact)"},
    {"km/h", 2.777778e-01, 7, velocity, "NIST SP 811 B.8: kilometer per hour, 2.777 778 E-01 m/s"},
    {"mph", 4.4704e-01, 0, velocity, "NIST SP 811 B.8: mile per hour, 4.4704 E-01 m/s (exact)"},
    {"mi/h", 4.4704e-01, 0, velocity, "NIST SP 811 B.8: mile per hour, 4.4704 E-01 m/s (exact)"},
    {"knot", 5.144444e-01, 7, velocity, "NIST SP 811 B.8: knot (nautical mile per hour), 5.144 444 E-01 m/s"},
    {"ft^2/h", 2.58064e-05, 0, kinematic_viscosity, "NIST SP 811 B.8: square foot per hour, 2.580 64 E-05 m^2/s (exact)"},
    {"ft\u00b2\u00b7s\u207b\u00b9", 9.290304e-02, 0, kinematic_viscosity, "NIST SP 811 B.8: square foot per second, 9.290 304 E-02 m^2/s (exact)"},
    // ---- mass, density, mass flow
    {"lb", 4.5359237e-01, 0, mass, "NIST SP 811 B.8: pound (avoirdupois), 4.535 923 7 E-01 kg (exact)"},
    {"oz", 2.834952e-02, 7, mass, "NIST SP 811 B.8: ounce (avoirdupois), 2.834 952 E-02 kg"},
    {"gr", 6.479891e-05, 0, mass, "NIST SP 811 B.8: grain, 6.479 891 E-05 kg (exact)"},
    {"slug", 1.459390e+01, 7, mass, "NIST SP 811 B.8: slug, 1.459 390 E+01 kg"},
    {"lb/ft^3", 1.601846e+01, 7, density, "NIST SP 811 B.8: pound per cubic foot, 1.601 846 E+01 kg/m^3"},
    {"lb/in^3", 2.767990e+04, 7, density, "NIST SP 811 B.8: pound per cubic inch, 2.767 990 E+04 kg/m^3"},
    {"oz/in^3", 1.729994e+03, 7, density, "NIST SP 811 B.8: ounce (avoirdupois) per cubic inch, 1.729 994 E+03 kg/m^3"},
    {"slug/ft^3", 5.153788e+02, 7, density, "NIST SP 811 B.8: slug per cubic foot, 5.153 788 E+02 kg/m^3"},
    {"g/cm^3", 1.0e+03, 0, density, "NIST SP 811 B.8: gram per cubic centimeter, 1.0 E+03 kg/m^3 (exact)"},
    {"lb/ft^2", 4.882428e+00, 7, area_density, "NIST SP 811 B.8: pound per square foot, 4.882 428 E+00 kg/m^2"},
    {"lb/h", 1.259979e-04, 7, mass_flow_rate, "NIST SP 811 B.8: pound per hour, 1.259 979 E-04 kg/s"},
    {"lb/min", 7.559873e-03, 7, mass_flow_rate, "NIST SP 811 B.8: pound per minute, 7.559 873 E-03 kg/s"},
    {"lb/s", 4.535924e-01, 7, mass_flow_rate, "NIST SP 811 B.8: pound per second, 4.535 924 E-01 kg/s"},
    // ---- force, torque, stiffness
    {"lbf", 4.448222e+00, 7, force, "NIST SP 811 B.8: pound-force, 4.448 222 E+00 N"},
    {"kip", 4.448222e+03, 7, force, "NIST SP 811 B.8: kip (1 kip = 1000 lbf), 4.448 222 E+03 N"},
    {"pdl", 1.382550e-01, 7, force, "NIST SP 811 B.8: poundal, 1.382 550 E-01 N"},
    {"kgf", 9.80665e+00, 0, force, "NIST SP 811 B.8: kilogram-force, 9.806 65 E+00 N (exact)"},
    {"dyn", 1.0e-05, 0, force, "NIST SP 811 B.8: dyne, 1.0 E-05 N (exact)"},
    {"lbf*ft", 1.355818e+00, 7, energy, "NIST SP 811 B.8: pound-force foot, 1.355 818 E+00 N m"},
    {"lbf in", 1.129848e-01, 7, energy, "NIST SP 811 B.8: pound-force inch, 1.129 848 E-01 N m"},
    {"kgf\u00b7m", 9.80665e+00, 0, energy, "NIST SP 811 B.8: kilogram-force meter, 9.806 65 E+00 N m (exact)"},
    {"dyn*cm", 1.0e-07, 0, energy, "NIST SP 811 B.8: dyne centimeter, 1.0 E-07 N m (exact)"},
    {"lbf/ft", 1.459390e+01, 7, surface_tension, "NIST SP 811 B.8: pound-force per foot, 1.459 390 E+01 N/m"},
    {"lbf/in", 1.751268e+02, 7, surface_tension, "NIST SP 811 B.8: pound-force per inch, 1.751 268 E+02 N/m"},
    // ---- pressure, stress
    {"psi", 6.894757e+03, 7, pressure, "NIST SP 811 B.8: pound-force per square inch (psi), 6.894 757 E+03 Pa"},
    {"lbf/in^2", 6.894757e+03, 7, pressure, "NIST SP 811 B.8: pound-force per square inch, 6.894 757 E+03 Pa"},
    {"ksi", 6.894757e+06, 7, pressure, "NIST SP 811 B.8: kip per square inch (ksi), 6.894 757 E+06 Pa"},
    {"lbf/ft^2", 4.788026e+01, 7, pressure, "NIST SP 811 B.8: pound-force per square foot, 4.788 026 E+01 Pa"},
    {"kgf/cm^2", 9.80665e+04, 0, pressure, "NIST SP 811 B.8: kilogram-force per square centimeter, 9.806 65 E+04 Pa (exact)"},
    {"kgf/mm^2", 9.80665e+06, 0, pressure, "NIST SP 811 B.8: kilogram-force per square millimeter, 9.806 65 E+06 Pa (exact)"},
    {"dyn/cm^2", 1.0e-01, 0, pressure, "NIST SP 811 B.8: dyne per square centimeter, 1.0 E-01 Pa (exact)"},
    {"atm", 1.01325e+05, 0, pressure, "NIST SP 811 B.8: atmosphere, standard, 1.013 25 E+05 Pa (exact)"},
    {"bar", 1.0e+05, 0, pressure, "NIST SP 811 B.8: bar, 1.0 E+05 Pa (exact)"},
    {"mbar", 1.0e+02, 0, pressure, "NIST SP 811 B.8: millibar, 1.0 E+02 Pa (exact)"},
    {"Torr", 1.333224e+02, 7, pressure, "NIST SP 811 B.8: torr (Torr), 1.333 224 E+02 Pa"},
    {"mmHg", 1.333224e+02, 7, pressure, "NIST SP 811 B.8: millimeter of mercury, conventional, 1.333 224 E+02 Pa"},
    {"inHg", 3.386389e+03, 7, pressure, "NIST SP 811 B.8: inch of mercury, conventional, 3.386 389 E+03 Pa"},
    {"inH2O", 2.490889e+02, 7, pressure, "NIST SP 811 B.8: inch of water, conventional, 2.490 889 E+02 Pa"},
    {"ftH2O", 2.989067e+03, 7, pressure, "NIST SP 811 B.8: foot of water, conventional, 2.989 067 E+03 Pa"},
    {"mmH2O", 9.80665e+00, 0, pressure, "NIST SP 811 B.8: millimeter of water, conventional, 9.806 65 E+00 Pa (exact)"},
    {"mmH\u2082O", 9.80665e+00, 0, pressure, "NIST SP 811 B.8: millimeter of water, conventional (subscript two)"},
    // ---- volume, flow, area, mass
    {"gpm", 6.309020e-05, 7, volume / dims::time, "NIST SP 811 B.8: gallon (U.S.) per minute (gpm), 6.309 020 E-05 m^3/s"},
    {"gal_imp", 4.54609e-03, 0, volume, "NIST SP 811 B.8: gallon [Canadian and U.K. (Imperial)], 4.546 09 E-03 m^3 (exact)"},
    {"acre", 4.0468564224e+03, 0, area, "NIST SP 811 B.8: acre = 43 560 ft^2, on the international foot (0.3048 m)"},
    {"tonne", 1.0e+03, 0, mass, "SI Brochure 9th ed., table 8: tonne, 1 t = 10^3 kg"},
    // ---- viscosity
    {"cP", 1.0e-03, 0, dynamic_viscosity, "NIST SP 811 B.8: centipoise, 1.0 E-03 Pa s (exact)"},
    {"P", 1.0e-01, 0, dynamic_viscosity, "NIST SP 811 B.8: poise, 1.0 E-01 Pa s (exact)"},
    {"lb/(ft*s)", 1.488164e+00, 7, dynamic_viscosity, "NIST SP 811 B.8: pound per foot second, 1.488 164 E+00 Pa s"},
    {"lb/(ft*h)", 4.133789e-04, 7, dynamic_viscosity, "NIST SP 811 B.8: pound per foot hour, 4.133 789 E-04 Pa s"},
    {"lbf*s/ft^2", 4.788026e+01, 7, dynamic_viscosity, "NIST SP 811 B.8: pound-force second per square foot, 4.788 026 E+01 Pa s"},
    {"lbf*s/in^2", 6.894757e+03, 7, dynamic_viscosity, "NIST SP 811 B.8: pound-force second per square inch, 6.894 757 E+03 Pa s"},
    {"slug/(ft*s)", 4.788026e+01, 7, dynamic_viscosity, "NIST SP 811 B.8: slug per foot second, 4.788 026 E+01 Pa s"},
    {"St", 1.0e-04, 0, kinematic_viscosity, "NIST SP 811 B.8: stokes, 1.0 E-04 m^2/s (exact)"},
    {"cSt", 1.0e-06, 0, kinematic_viscosity, "NIST SP 811 B.8: centistokes, 1.0 E-06 m^2/s (exact)"},
    // ---- energy, power
    {"Btu", 1.055056e+03, 7, energy, "NIST SP 811 B.8: British thermal unit_IT, 1.055 056 E+03 J"},
    {"cal", 4.1868e+00, 0, energy, "NIST SP 811 B.8: calorie_IT, 4.1868 E+00 J (exact)"},
    {"cal_th", 4.184e+00, 0, energy, "NIST SP 811 B.8: calorie_th, 4.184 E+00 J (exact)"},
    {"kcal", 4.1868e+03, 0, energy, "NIST SP 811 B.8: kilocalorie_IT, 4.1868 E+03 J (exact)"},
    {"erg", 1.0e-07, 0, energy, "NIST SP 811 B.8: erg, 1.0 E-07 J (exact)"},
    {"eV", 1.602177e-19, 7, energy, "NIST SP 811 B.8: electronvolt, 1.602 177 E-19 J"},
    {"kWh", 3.6e+06, 0, energy, "NIST SP 811 B.8: kilowatt hour, 3.6 E+06 J (exact)"},
    {"W*h", 3.6e+03, 0, energy, "NIST SP 811 B.8: watt hour, 3.6 E+03 J (exact)"},
    {"ft*lbf/s", 1.355818e+00, 7, power, "NIST SP 811 B.8: foot pound-force per second, 1.355 818 E+00 W"},
    {"ft*lbf/min", 2.259697e-02, 7, power, "NIST SP 811 B.8: foot pound-force per minute, 2.259 697 E-02 W"},
    {"ft*lbf/h", 3.766161e-04, 7, power, "NIST SP 811 B.8: foot pound-force per hour, 3.766 161 E-04 W"},
    {"hp", 7.456999e+02, 7, power, "NIST SP 811 B.8: horsepower (550 ft lbf/s), 7.456 999 E+02 W"},
    {"Btu/h", 2.930711e-01, 7, power, "NIST SP 811 B.8: British thermal unit_IT per hour, 2.930 711 E-01 W"},
    {"Btu/s", 1.055056e+03, 7, power, "NIST SP 811 B.8: British thermal unit_IT per second, 1.055 056 E+03 W"},
    {"erg/s", 1.0e-07, 0, power, "NIST SP 811 B.8: erg per second, 1.0 E-07 W (exact)"},
    {"TR", 3.516853e+03, 7, power, "NIST SP 811 B.8: ton of refrigeration (12 000 Btu_IT/h), 3.516 853 E+03 W"},
    // ---- heat transfer
    {"W/cm^2", 1.0e+04, 0, heat_flux_density, "NIST SP 811 B.8: watt per square centimeter, 1.0 E+04 W/m^2 (exact)"},
    {"W/in^2", 1.550003e+03, 7, heat_flux_density, "NIST SP 811 B.8: watt per square inch, 1.550 003 E+03 W/m^2"},
    {"Btu/(h*ft^2)", 3.154591e+00, 7, heat_flux_density, "NIST SP 811 B.8: Btu_IT per square foot hour, 3.154 591 E+00 W/m^2"},
    {"Btu/(h*ft^2*degF)", 5.678263e+00, 7, heat_transfer_coefficient, "NIST SP 811 B.8: Btu_IT per hour square foot degree Fahrenheit, 5.678 263 E+00 W/(m^2 K)"},
    {"Btu\u00b7in/(h\u00b7ft\u00b2\u00b7\u00b0F)", 1.442279e-01, 7, thermal_conductivity, "NIST SP 811 B.8: Btu_IT inch per hour square foot degree Fahrenheit, 1.442 279 E-01 W/(m K)"},
    {"Btu*ft/(h*ft^2*degF)", 1.730735e+00, 7, thermal_conductivity, "NIST SP 811 B.8: Btu_IT foot per hour square foot degree Fahrenheit, 1.730 735 E+00 W/(m K)"},
    {"Btu/(lb*degF)", 4.1868e+03, 0, specific_heat_capacity, "NIST SP 811 B.8: Btu_IT per pound degree Fahrenheit, 4.1868 E+03 J/(kg K) (exact)"},
    {"Btu/(lb*degR)", 4.1868e+03, 0, specific_heat_capacity, "NIST SP 811 B.8: Btu_IT per pound degree Rankine, 4.1868 E+03 J/(kg K) (exact)"},
    {"Btu/lb", 2.326e+03, 0, specific_energy, "NIST SP 811 B.8: Btu_IT per pound, 2.326 E+03 J/kg (exact)"},
    {"Btu/ft^3", 3.725895e+04, 7, energy_density, "NIST SP 811 B.8: Btu_IT per cubic foot, 3.725 895 E+04 J/m^3"},
    {"cal_th/(g*degC)", 4.184e+03, 0, specific_heat_capacity, "NIST SP 811 B.8: calorie_th per gram degree Celsius, 4.184 E+03 J/(kg K) (exact)"},
    {"degF*h/Btu", 1.895634e+00, 7, thermal_resistance, "NIST SP 811 B.8: degree Fahrenheit hour per Btu_IT, 1.895 634 E+00 K/W"},
    {"degF*h*ft^2/Btu", 1.761102e-01, 7, thermal_insulance, "NIST SP 811 B.8: degree Fahrenheit hour square foot per Btu_IT, 1.761 102 E-01 m^2 K/W"},
    {"\u00b0F s/Btu", 5.265651e-04, 7, thermal_resistance, "NIST SP 811 B.8: degree Fahrenheit second per Btu_IT, 5.265 651 E-04 K/W"},
    // ---- angle and rotation
    {"deg", 1.745329e-02, 7, dimensionless, "NIST SP 811 B.8: degree (angle), 1.745 329 E-02 rad"},
    // rpm is a rotational frequency, 1/60 s^-1 (ISO 80000-3, n in r/min); NIST SP 811 B.8
    // prints revolution per minute as 1.047 198 E-01 rad/s, the angular velocity 2 pi n,
    // which is what a revolution (2 pi rad) per minute gives
    {"rpm", 1.0 / 60.0, 0, frequency, "ISO 80000-3: rotational frequency, 1 r/min = 1/60 s^-1"},
    {"r/min", 1.0 / 60.0, 0, frequency, "ISO 80000-3: rotational frequency, r/min"},
    {"rev/min", 1.047198e-01, 7, frequency, "NIST SP 811 B.8: revolution per minute, 1.047 198 E-01 rad/s"},
    // ---- ratios
    {"%", 1.0e-02, 0, dimensionless, "SI Brochure 9th ed., 5.4.7: % stands for 0.01"},
    {"ppm", 1.0e-06, 0, dimensionless, "common practice, no source: part per million, 10^-6"},
    // ---- SI Brochure 9th ed.: coherent derived units in base units (table 4)
    {"N", 1.0, 0, mass * length / (dims::time * dims::time), "SI Brochure 9th ed., table 4: N = kg m s^-2"},
    {"Pa", 1.0, 0, mass / (length * dims::time * dims::time), "SI Brochure 9th ed., table 4: Pa = kg m^-1 s^-2"},
    {"J", 1.0, 0, mass * area / (dims::time * dims::time), "SI Brochure 9th ed., table 4: J = kg m^2 s^-2"},
    {"W", 1.0, 0, mass * area / pow(dims::time, 3), "SI Brochure 9th ed., table 4: W = kg m^2 s^-3"},
    {"C", 1.0, 0, current * dims::time, "SI Brochure 9th ed., table 4: C = A s"},
    {"V", 1.0, 0, mass * area / (pow(dims::time, 3) * current), "SI Brochure 9th ed., table 4: V = kg m^2 s^-3 A^-1"},
    {"F", 1.0, 0, pow(dims::time, 4) * current * current / (mass * area), "SI Brochure 9th ed., table 4: F = kg^-1 m^-2 s^4 A^2"},
    {"\u03a9", 1.0, 0, mass * area / (pow(dims::time, 3) * current * current), "SI Brochure 9th ed., table 4: ohm = kg m^2 s^-3 A^-2"},
    {"S", 1.0, 0, pow(dims::time, 3) * current * current / (mass * area), "SI Brochure 9th ed., table 4: S = kg^-1 m^-2 s^3 A^2"},
    {"Wb", 1.0, 0, mass * area / (dims::time * dims::time * current), "SI Brochure 9th ed., table 4: Wb = kg m^2 s^-2 A^-1"},
    {"T", 1.0, 0, mass / (dims::time * dims::time * current), "SI Brochure 9th ed., table 4: T = kg s^-2 A^-1"},
    {"H", 1.0, 0, mass * area / (dims::time * dims::time * current * current), "SI Brochure 9th ed., table 4: H = kg m^2 s^-2 A^-2"},
    {"Hz", 1.0, 0, dimensionless / dims::time, "SI Brochure 9th ed., table 4: Hz = s^-1"},
    {"Gy", 1.0, 0, area / (dims::time * dims::time), "SI Brochure 9th ed., table 4: Gy = m^2 s^-2"},
    {"kat", 1.0, 0, amount / dims::time, "SI Brochure 9th ed., table 4: kat = mol s^-1"},
    // coherent derived units of table 5/6 written as expressions
    {"Pa*s", 1.0, 0, mass / (length * dims::time), "SI Brochure 9th ed., table 6: dynamic viscosity, Pa s = kg m^-1 s^-1"},
    {"kg\u00b7m\u207b\u00b9\u00b7s\u207b\u00b9", 1.0, 0, dynamic_viscosity, "SI Brochure 9th ed., table 6: dynamic viscosity in base units"},
    {"N/m", 1.0, 0, mass / (dims::time * dims::time), "SI Brochure 9th ed., table 6: surface tension, N/m = kg s^-2"},
    {"W/m^2", 1.0, 0, mass / pow(dims::time, 3), "SI Brochure 9th ed., table 6: heat flux density, W/m^2 = kg s^-3"},
    {"J/(kg*K)", 1.0, 0, area / (dims::time * dims::time * temperature), "SI Brochure 9th ed., table 6: specific heat capacity, m^2 s^-2 K^-1"},
    {"W/(m*K)", 1.0, 0, mass * length / (pow(dims::time, 3) * temperature), "SI Brochure 9th ed., table 6: thermal conductivity, kg m s^-3 K^-1"},
    {"W/(m^2*K)", 1.0, 0, mass / (pow(dims::time, 3) * temperature), "SI Brochure 9th ed., table 6: heat transfer coefficient (W m^-2 K^-1)"},
    {"J/mol", 1.0, 0, mass * area / (dims::time * dims::time * amount), "SI Brochure 9th ed., table 6: molar energy, kg m^2 s^-2 mol^-1"},
    {"J/(mol K)", 1.0, 0, molar_heat_capacity, "SI Brochure 9th ed., table 6: molar heat capacity, J mol^-1 K^-1"},
    {"V/m", 1.0, 0, electric_field_strength, "SI Brochure 9th ed., table 6: electric field strength, V/m"},
    {"A/m^2", 1.0, 0, current_density, "SI Brochure 9th ed., table 5: current density, A m^-2"},
    {"cd/m^2", 1.0, 0, luminance, "SI Brochure 9th ed., table 5: luminance, cd m^-2"},
    {"1/s", 1.0, 0, frequency, "SI Brochure 9th ed., 5.4.6: a reciprocal written with the number 1"},
    // ---- SI Brochure 9th ed., table 8: non-SI units accepted for use with the SI
    {"min", 60.0, 0, dims::time, "SI Brochure 9th ed., table 8: 1 min = 60 s"},
    {"h", 3600.0, 0, dims::time, "SI Brochure 9th ed., table 8: 1 h = 3600 s"},
    {"d", 86400.0, 0, dims::time, "SI Brochure 9th ed., table 8: 1 d = 86 400 s"},
    {"au", 149597870700.0, 0, length, "SI Brochure 9th ed., table 8: 1 au = 149 597 870 700 m"},
    {"ha", 1.0e4, 0, area, "SI Brochure 9th ed., table 8: 1 ha = 10^4 m^2"},
    {"L", 1.0e-3, 0, volume, "SI Brochure 9th ed., table 8: 1 L = 10^-3 m^3"},
    {"mL", 1.0e-6, 0, volume, "SI Brochure 9th ed., table 8 and table 7: 1 mL = 10^-6 m^3"},
    {"t", 1.0e3, 0, mass, "SI Brochure 9th ed., table 8: 1 t = 10^3 kg"},
    {"Da", 1.66053906660e-27, 0, mass, "SI Brochure 9th ed., table 8: 1 Da = 1.660 539 066 60(50) x 10^-27 kg"},
    {"eV", 1.602176634e-19, 0, energy, "SI Brochure 9th ed., table 8: 1 eV = 1.602 176 634 x 10^-19 J (exact)"},
    // ---- SI Brochure 9th ed., table 7: prefixes; 3.2: the kilogram takes its prefixes on the gram
    {"km", 1.0e3, 0, length, "SI Brochure 9th ed., table 7: kilo = 10^3"},
    {"\u00b5m", 1.0e-6, 0, length, "SI Brochure 9th ed., table 7: micro = 10^-6 (micro sign U+00B5)"},
    {"\u03bcs", 1.0e-6, 0, dims::time, "SI Brochure 9th ed., table 7: micro = 10^-6 (Greek mu U+03BC)"},
    {"um", 1.0e-6, 0, length, "SI Brochure 9th ed., table 7: micro = 10^-6 (u, common practice, no source)"},
    {"ns", 1.0e-9, 0, dims::time, "SI Brochure 9th ed., table 7: nano = 10^-9"},
    {"GPa", 1.0e9, 0, pressure, "SI Brochure 9th ed., table 7: giga = 10^9"},
    {"mg", 1.0e-6, 0, mass, "SI Brochure 9th ed., 3.2: 1 mg = 10^-6 kg, not 1 ukg"},
    {"cm^3", 1.0e-6, 0, volume, "SI Brochure 9th ed., 3.2: a prefix is part of its symbol, cm^3 = (10^-2 m)^3"},
    {"mm\u00b2", 1.0e-6, 0, area, "SI Brochure 9th ed., 3.2: mm^2 = (10^-3 m)^2"},
    {"kJ/(kg*K)", 1.0e3, 0, specific_heat_capacity, "SI Brochure 9th ed., table 7: kilo = 10^3"},
    {"MW", 1.0e6, 0, power, "SI Brochure 9th ed., table 7: mega = 10^6"},
    {"daN", 10.0, 0, force, "SI Brochure 9th ed., table 7: deca = 10^1 (symbol da)"},
    {"hPa", 100.0, 0, pressure, "SI Brochure 9th ed., table 7: hecto = 10^2"},
    {"Qm", 1.0e30, 0, length, "SI Brochure 9th ed. (2022 addendum), quetta = 10^30"},
};
// clang-format on

}  // namespace

TEST_SUITE("parse_unit") {
  TEST_CASE("the table holds at least 80 published expressions") {
    CHECK(std::size(table) >= 80);
  }

  TEST_CASE("every published expression parses to its factor and dimension") {
    for (const auto& p : table) {
      CAPTURE(p.expr);
      CAPTURE(p.source);
      const parsed_unit u = parse_unit(p.expr);
      CHECK(agrees(u.factor, p));
      CHECK(u.dim == p.dim);
      CHECK(u.offset == 0.0);
    }
  }

  TEST_CASE("parse, print, parse gives the same factor and dimension for every table entry") {
    for (const auto& p : table) {
      CAPTURE(p.expr);
      const parsed_unit u = parse_unit(p.expr);
      for (const text_form form : {text_form::unicode, text_form::ascii}) {
        // one unit as an SI quantity: the factor comes back bit for bit
        const std::string q = to_string(u, form);
        CAPTURE(q);
        const parsed_quantity back = parse_quantity(q);
        CHECK(back.value == u.factor);
        CHECK(back.dim == u.dim);
        // the coherent SI unit alone: same dimension, factor 1
        const std::string si = si_unit_string(u, form);
        CAPTURE(si);
        const parsed_unit again = parse_unit(si);
        CHECK(again.dim == u.dim);
        CHECK(again.factor == 1.0);
      }
    }
  }

  TEST_CASE("the printed SI forms are the ones of the SI Brochure") {
    // SI Brochure 9th ed., table 6: dynamic viscosity in base units is kg m^-1 s^-1
    const parsed_unit mu = parse_unit("Pa*s");
    CHECK(si_unit_string(mu, text_form::unicode) == "kg\u00b7m\u207b\u00b9\u00b7s\u207b\u00b9");
    CHECK(si_unit_string(mu, text_form::ascii) == "kg/(m*s)");
    // SI Brochure 9th ed., table 6: heat transfer coefficient W m^-2 K^-1 = kg s^-3 K^-1
    CHECK(si_unit_string(parse_unit("W/(m^2*K)"), text_form::ascii) == "kg/(s^3*K)");
    CHECK(to_string(parse_unit("ft")) == "0.3048 m");  // NIST SP 811 B.8: foot = 0.3048 m exactly
    CHECK(to_string(parse_unit("1")) == "1");
  }

  TEST_CASE("the parser and the compile-time constants read the same table") {
    // one table, no second copy of a factor: the same double, bit for bit
    CHECK(parse_unit("psi").factor == units::psi.factor);
    CHECK(parse_unit("kcal").factor == units::kcal.factor);
    CHECK(parse_unit("mbar").factor == units::mbar.factor);
    CHECK(parse_unit("\u00b5m").factor == units::um.factor);
    CHECK(parse_unit("Btu").factor == units::Btu.factor);
    CHECK(parse_unit("cSt").factor == units::cSt.factor);
    for (const auto& e : unit_table) {
      CAPTURE(e.symbol);
      const parsed_unit u = parse_unit(e.symbol);
      CHECK(u.factor == e.factor);
      CHECK(u.dim == e.dim);
    }
  }

  TEST_CASE("a whole symbol wins over prefix + symbol") {
    // SI Brochure 9th ed., table 8 (min, h, d, ha) and table 4 (Pa, cd); NIST SP 811 (mi, ft, P)
    CHECK(parse_unit("min").factor == 60.0);
    CHECK(parse_unit("min").dim == dims::time);
    CHECK(parse_unit("Pa").dim == dims::pressure);
    CHECK(parse_unit("cd").dim == dims::luminous_intensity);
    CHECK(parse_unit("h").factor == 3600.0);
    CHECK(parse_unit("ha").dim == dims::area);
    CHECK(parse_unit("mi").factor == 1609.344);
    CHECK(parse_unit("ft").dim == dims::length);
    CHECK(parse_unit("P").dim == dims::dynamic_viscosity);
    CHECK(parse_unit("dam").factor == 10.0);  // da before d (SI Brochure 9th ed., table 7)
    CHECK(parse_unit("mcd").factor == doctest::Approx(1e-3));
    CHECK(parse_unit("kg").factor == 1.0);  // SI Brochure 9th ed., 3.2: k + g
    CHECK(parse_unit("Mg").factor == 1000.0);
  }

  TEST_CASE("products may be written with *, middle dot, dot operator or spaces") {
    // SI Brochure 9th ed., 5.4.6: N m or N·m
    for (const char* text : {"N*m", "N\u00b7m", "N\u22c5m", "N m", "N  m", "N\u2009m", " N * m ", "N\tm"}) {
      CAPTURE(text);
      CHECK(parse_unit(text).dim == dims::energy);
    }
  }

  TEST_CASE("exponents stay exact rationals") {
    // common practice, no source: a decimal exponent is the exact fraction it spells
    CHECK(parse_unit("m^0.5").dim[0] == rational{1, 2});
    CHECK(parse_unit("m^0.333").dim[0] == rational{333, 1000});
    CHECK(parse_unit("m^0.50000000000000000000000").dim[0] == rational{1, 2});
    CHECK(parse_unit("m^(1/2)").dim[0] == rational{1, 2});
    CHECK(parse_unit("m^(2/4)").dim[0] == rational{1, 2});
    CHECK(parse_unit("m^( -1 / 3 )").dim[0] == rational{-1, 3});
    CHECK(parse_unit("m^(1.5/2)").dim[0] == rational{3, 4});
    CHECK(parse_unit("m^-1.5").dim[0] == rational{-3, 2});
    CHECK(parse_unit("m^+2").dim[0] == rational{2});
    CHECK(parse_unit("m^\u22121").dim[0] == rational{-1});  // U+2212 minus sign
    CHECK(parse_unit("m**-2").dim[0] == rational{-2});
    CHECK(parse_unit("m\u00b9\u00b2").dim[0] == rational{12});
    CHECK(parse_unit("s\u207b\u00b2").dim[2] == rational{-2});
    CHECK(parse_unit("s\u207a\u00b2").dim[2] == rational{2});
    CHECK(parse_unit("m^0").dim == dims::dimensionless);
    CHECK(parse_unit("(m/s)^2").dim == dims::velocity * dims::velocity);
    CHECK(parse_unit("(m/s)\u00b2").dim == dims::velocity * dims::velocity);
    CHECK(parse_unit("((kg/m)^3)^(1/3)").dim == dims::mass / dims::length);
  }

  TEST_CASE("a fractional power of a prefixed unit keeps the exact part of its factor") {
    // fracture toughness: NIST SP 811 B.8 psi = 6.894 757 E+03 Pa and in = 0.0254 m give
    // 1 ksi in^(1/2) = 6.894757e6 * sqrt(0.0254) Pa m^(1/2) = 1.098843e6 (python3)
    const parsed_unit k = parse_unit("ksi*in^0.5");
    CHECK(k.factor == doctest::Approx(1.098843e6).epsilon(1e-6));
    CHECK(k.dim == dims::pressure * pow(dims::length, rational{1, 2}));
    // SI Brochure 9th ed., table 7: MPa = 10^6 Pa; (mm)^(1/2) = 10^-1.5 m^(1/2)
    CHECK(parse_unit("MPa*m^0.5").factor == 1.0e6);
    CHECK(parse_unit("mm^0.5").factor == doctest::Approx(std::sqrt(1e-3)).epsilon(1e-15));
  }

  TEST_CASE("parentheses may nest to the documented limit") {
    // built by appending: GCC 12 -O2 warns falsely (-Warray-bounds) on the operator+ chain
    std::string deep(max_unit_nesting, '(');
    deep += "m";
    deep.append(max_unit_nesting, ')');
    CHECK(parse_unit(deep).dim == dims::length);
  }

  TEST_CASE("the longest accepted text parses") {
    std::string text = "m";
    while (text.size() + 4 <= max_unit_text_bytes) text += "*m^0";
    CHECK(text.size() <= max_unit_text_bytes);
    CHECK(parse_unit(text).dim == dims::length);
  }
}
