#pragma once
// Textbook dimensional-analysis problems as (name, dimension) lists, shared by the tests of the
// compile-time groups (pi_exponents) and the run-time analyze(), so the two can be checked to
// agree. The first variable of each problem is the dependent one. Only variables and their
// dimensions live here; the expected groups, with their sources, are in the tests that use them.
//
// Use at compile time:  textbook::for_each_problem([]<const auto& P>() { ... P.variables[i].dim ... });
// Use at run time:      for (const auto& p : textbook::all()) for (const auto& v : p.variables) ...
#include <nondim/quantity.hpp>

#include <array>
#include <cstddef>
#include <span>
#include <string_view>
#include <utility>

namespace textbook {

using nondim::dimension;
using nondim::rational;
namespace dims = nondim::dims;

struct variable {
  std::string_view name;
  dimension dim;
};

template <std::size_t N>
struct problem {
  std::string_view title;
  std::string_view source;  // where the problem (and its usual groups) is found
  std::array<variable, N> variables;
};

/// A problem without its size in the type, for run-time loops.
struct problem_view {
  std::string_view title;
  std::string_view source;
  std::span<const variable> variables;
};

// ---- fluid mechanics ----------------------------------------------------------------------

inline constexpr problem<5> sphere_drag{"drag on a smooth sphere",
                                        "White, Fluid Mechanics, ch. 5 (from memory)",
                                        {{{"F", dims::force},
                                          {"rho", dims::density},
                                          {"U", dims::velocity},
                                          {"D", dims::length},
                                          {"mu", dims::dynamic_viscosity}}}};

inline constexpr problem<7> pipe_pressure_drop{"pressure drop in a rough pipe",
                                               "White, Fluid Mechanics, ch. 5 and 6 (Moody chart; from memory)",
                                               {{{"dp", dims::pressure},
                                                 {"rho", dims::density},
                                                 {"U", dims::velocity},
                                                 {"D", dims::length},
                                                 {"mu", dims::dynamic_viscosity},
                                                 {"L", dims::length},
                                                 {"eps", dims::length}}}};

inline constexpr problem<6> ship_resistance{"resistance of a ship hull",
                                            "White, Fluid Mechanics, ch. 5 (Froude and Reynolds scaling; from memory)",
                                            {{{"F", dims::force},
                                              {"rho", dims::density},
                                              {"U", dims::velocity},
                                              {"L", dims::length},
                                              {"mu", dims::dynamic_viscosity},
                                              {"g", dims::acceleration}}}};

inline constexpr problem<5> vortex_shedding{"vortex shedding from a cylinder",
                                            "White, Fluid Mechanics, ch. 5 (Strouhal number; from memory)",
                                            {{{"f", dims::frequency},
                                              {"U", dims::velocity},
                                              {"D", dims::length},
                                              {"rho", dims::density},
                                              {"mu", dims::dynamic_viscosity}}}};

inline constexpr problem<6> pump_power{"power of a centrifugal pump",
                                       "White, Fluid Mechanics, ch. 11 (pump similarity rules; from memory)",
                                       {{{"P", dims::power},
                                         {"rho", dims::density},
                                         {"N", dims::frequency},
                                         {"D", dims::length},
                                         {"Q", dims::volume_flow_rate},
                                         {"mu", dims::dynamic_viscosity}}}};

inline constexpr problem<4> weir_flow{
    "flow over a rectangular weir",
    "White, Fluid Mechanics, ch. 10 (Q = C b sqrt(g) H^(3/2); from memory)",
    {{{"Q", dims::volume_flow_rate}, {"g", dims::acceleration}, {"H", dims::length}, {"b", dims::length}}}};

inline constexpr problem<4> orifice_flow{
    "discharge through an orifice",
    "White, Fluid Mechanics, ch. 6 (Q = Cd A sqrt(2 dp / rho); from memory)",
    {{{"Q", dims::volume_flow_rate}, {"dp", dims::pressure}, {"rho", dims::density}, {"d", dims::length}}}};

inline constexpr problem<4> boundary_layer{
    "laminar boundary-layer thickness on a flat plate",
    "White, Viscous Fluid Flow, ch. 4 (Blasius: delta/x = 5.0/sqrt(Re_x); from memory)",
    {{{"delta", dims::length}, {"x", dims::length}, {"U", dims::velocity}, {"nu", dims::kinematic_viscosity}}}};

inline constexpr problem<5> stokes_settling{
    "settling velocity of a small sphere",
    "White, Fluid Mechanics, ch. 7 (Stokes: V = drho g d^2 / (18 mu); from memory)",
    {{{"V", dims::velocity},
      {"d", dims::length},
      {"drho", dims::density},
      {"g", dims::acceleration},
      {"mu", dims::dynamic_viscosity}}}};

inline constexpr problem<3> deep_water_wave{
    "speed of a deep-water gravity wave",
    "Lamb, Hydrodynamics, art. 228 (c^2 = g lambda / (2 pi); from memory)",
    {{{"c", dims::velocity}, {"g", dims::acceleration}, {"lambda", dims::length}}}};

inline constexpr problem<4> sound_speed{
    "speed of sound in an ideal gas",
    "Anderson, Modern Compressible Flow, ch. 3 (a^2 = gamma p / rho; from memory)",
    {{{"c", dims::velocity}, {"gamma", dims::dimensionless}, {"p", dims::pressure}, {"rho", dims::density}}}};

inline constexpr problem<4> blast_wave{
    "radius of a strong blast wave",
    "G. I. Taylor, Proc. R. Soc. A 201 (1950) 159 (R = C (E t^2 / rho)^(1/5))",
    {{{"R", dims::length}, {"t", dims::time}, {"E", dims::energy}, {"rho", dims::density}}}};

inline constexpr problem<6> capillary_rise{
    "capillary rise in a thin tube",
    "Jurin's law, h = 4 sigma cos(theta) / (rho g d) (de Gennes, Brochard-Wyart, Quere, "
    "Capillarity and Wetting Phenomena, ch. 1; from memory)",
    {{{"h", dims::length},
      {"sigma", dims::surface_tension},
      {"rho", dims::density},
      {"g", dims::acceleration},
      {"d", dims::length},
      {"theta", dims::dimensionless}}}};

inline constexpr problem<4> drop_oscillation{
    "oscillation frequency of a free liquid drop",
    "Rayleigh, Proc. R. Soc. 29 (1879) 71 (omega^2 = l(l-1)(l+2) sigma / (rho R^3); from memory)",
    {{{"f", dims::frequency}, {"sigma", dims::surface_tension}, {"rho", dims::density}, {"R", dims::length}}}};

inline constexpr problem<4> drag_without_density{
    "drag with the fluid density forgotten (the dependent variable must repeat)",
    "common practice, no source: F's mass dimension has no other carrier",
    {{{"F", dims::force}, {"L", dims::length}, {"U", dims::velocity}, {"nu", dims::kinematic_viscosity}}}};

// ---- heat and mass transfer ---------------------------------------------------------------

inline constexpr problem<7> forced_convection{
    "forced convection from a tube in cross flow",
    "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 6 (Nu = f(Re, Pr); from memory)",
    {{{"h", dims::heat_transfer_coefficient},
      {"k", dims::thermal_conductivity},
      {"U", dims::velocity},
      {"D", dims::length},
      {"rho", dims::density},
      {"mu", dims::dynamic_viscosity},
      {"cp", dims::specific_heat_capacity}}}};

inline constexpr problem<9> natural_convection{
    "natural convection from a vertical plate",
    "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 9 (Nu = f(Gr, Pr); from memory)",
    {{{"h", dims::heat_transfer_coefficient},
      {"k", dims::thermal_conductivity},
      {"L", dims::length},
      {"g", dims::acceleration},
      {"beta", dims::thermal_expansion_coefficient},
      {"dT", dims::temperature},
      {"rho", dims::density},
      {"mu", dims::dynamic_viscosity},
      {"cp", dims::specific_heat_capacity}}}};

inline constexpr problem<6> transient_conduction{
    "transient conduction in a plane wall",
    "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 5 (theta = f(Fo, Bi); from memory)",
    {{{"theta", dims::dimensionless},
      {"t", dims::time},
      {"alpha", dims::thermal_diffusivity},
      {"L", dims::length},
      {"h", dims::heat_transfer_coefficient},
      {"k", dims::thermal_conductivity}}}};

inline constexpr problem<5> mass_transfer{
    "convective mass transfer from a plate",
    "Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ch. 6 (Sh = f(Re, Sc); from memory)",
    {{{"hm", dims::mass_transfer_coefficient},
      {"DAB", dims::mass_diffusivity},
      {"L", dims::length},
      {"U", dims::velocity},
      {"nu", dims::kinematic_viscosity}}}};

// The particle diameter is listed before the bed length: the books repeat d_p, and pi_basis,
// which sees dimensions only, takes the first of two lengths (analyze() takes d_p by its name).
inline constexpr problem<7> packed_bed{
    "pressure drop through a packed bed",
    "Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed., sec. 6.4 (the Ergun equation: "
    "dp d_p / (rho U^2 L) = f(Re_p, eps), Re_p = rho U d_p / mu; from memory)",
    {{{"dp", dims::pressure},
      {"d_p", dims::length},
      {"L", dims::length},
      {"U", dims::velocity},
      {"rho", dims::density},
      {"mu", dims::dynamic_viscosity},
      {"eps", dims::dimensionless}}}};

/// Thermal conductance, W/K: an overall conductance UA and a heat-capacity rate m c_p.
inline constexpr dimension thermal_conductance = dims::power / dims::temperature;

// C_min is listed before UA and C_max for the same reason: the books divide by C_min.
inline constexpr problem<5> heat_exchanger{
    "heat transfer rate of a heat exchanger (L, M, T only in W/K and W: rank 2)",
    "Bergman, Lavine, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 7th ed., sec. 11.4 "
    "(effectiveness-NTU: q / (C_min dT_max) = f(NTU, C_r), NTU = UA / C_min, C_r = C_min / C_max; from memory)",
    {{{"q", dims::power},
      {"C_min", thermal_conductance},
      {"UA", thermal_conductance},
      {"C_max", thermal_conductance},
      {"dT_max", dims::temperature}}}};

// ---- mechanics, gravitation, gases, electricity -------------------------------------------

inline constexpr problem<4> pendulum{
    "period of a simple pendulum (the mass drops out)",
    "Halliday, Resnick & Walker, Fundamentals of Physics, ch. 15 (T = 2 pi sqrt(L/g); from memory)",
    {{{"t", dims::time}, {"m", dims::mass}, {"L", dims::length}, {"g", dims::acceleration}}}};

inline constexpr problem<3> spring_mass{
    "natural frequency of a mass on a spring",
    "Halliday, Resnick & Walker, Fundamentals of Physics, ch. 15 (omega = sqrt(k/m); from memory)",
    {{{"omega", dims::angular_velocity}, {"k", dims::stiffness}, {"m", dims::mass}}}};

inline constexpr problem<3> spring_force{"force on a linear spring (M, L, T appear, rank 2)",
                                         "Hooke's law F = k x; DESIGN.md's rank example (common practice, no source)",
                                         {{{"F", dims::force}, {"k", dims::stiffness}, {"x", dims::length}}}};

inline constexpr problem<4> kepler_orbit{
    "period of a planetary orbit",
    "Kepler's third law in Newton's form, P^2 = 4 pi^2 a^3 / (G M) (Goldstein, Classical Mechanics, "
    "ch. 3; from memory)",
    {{{"P", dims::time}, {"a", dims::length}, {"G", dims::gravitational_constant}, {"M", dims::mass}}}};

inline constexpr problem<5> ideal_gas{
    "state of an ideal gas",
    "p V = n R T (SI Brochure 9th ed. defines R = N_A k; Cengel & Boles, Thermodynamics, ch. 3)",
    {{{"p", dims::pressure},
      {"V", dims::volume},
      {"n", dims::amount},
      {"T", dims::temperature},
      {"R", dims::molar_gas_constant}}}};

inline constexpr problem<3> rc_circuit{"time constant of an RC circuit",
                                       "tau = R C (common practice, no source)",
                                       {{{"tau", dims::time}, {"R", dims::resistance}, {"C", dims::capacitance}}}};

inline constexpr problem<4> wire_resistance{
    "resistance of a uniform wire",
    "R = rho_e L / A (Pouillet's law; common practice, no source)",
    {{{"R", dims::resistance}, {"rho_e", dims::resistivity}, {"L", dims::length}, {"A", dims::area}}}};

// ---- rational dimensions ------------------------------------------------------------------

/// Fracture toughness has the dimension of pressure times length^(1/2) (Pa m^(1/2)).
inline constexpr dimension fracture_toughness = dims::pressure * nondim::pow(dims::length, rational{1, 2});
/// Amplitude spectral density of acceleration: (m/s^2)/Hz^(1/2).
inline constexpr dimension acceleration_noise_density =
    dims::acceleration / nondim::pow(dims::frequency, rational{1, 2});

inline constexpr problem<3> crack_fracture{
    "critical stress for a crack (rational dimension: Pa m^(1/2))",
    "Anderson, Fracture Mechanics, ch. 2 (K_Ic = Y sigma_c sqrt(pi a); from memory)",
    {{{"sigma_c", dims::stress}, {"K_Ic", fracture_toughness}, {"a", dims::length}}}};

inline constexpr problem<3> accelerometer_noise{
    "rms noise of an accelerometer over a bandwidth (rational dimension: m s^-2 Hz^-1/2)",
    "white noise: rms = density * sqrt(bandwidth) (common practice, no source)",
    {{{"a_rms", dims::acceleration}, {"n_a", acceleration_noise_density}, {"B", dims::frequency}}}};

// ---- the lists ----------------------------------------------------------------------------

/// \brief Calls `f.template operator()<P>()` for every problem P (compile-time use).
template <class F>
constexpr void for_each_problem(F&& f) {
  f.template operator()<sphere_drag>();
  f.template operator()<pipe_pressure_drop>();
  f.template operator()<ship_resistance>();
  f.template operator()<vortex_shedding>();
  f.template operator()<pump_power>();
  f.template operator()<weir_flow>();
  f.template operator()<orifice_flow>();
  f.template operator()<boundary_layer>();
  f.template operator()<stokes_settling>();
  f.template operator()<deep_water_wave>();
  f.template operator()<sound_speed>();
  f.template operator()<blast_wave>();
  f.template operator()<capillary_rise>();
  f.template operator()<drop_oscillation>();
  f.template operator()<drag_without_density>();
  f.template operator()<forced_convection>();
  f.template operator()<natural_convection>();
  f.template operator()<transient_conduction>();
  f.template operator()<mass_transfer>();
  f.template operator()<packed_bed>();
  f.template operator()<heat_exchanger>();
  f.template operator()<pendulum>();
  f.template operator()<spring_mass>();
  f.template operator()<spring_force>();
  f.template operator()<kepler_orbit>();
  f.template operator()<ideal_gas>();
  f.template operator()<rc_circuit>();
  f.template operator()<wire_resistance>();
  f.template operator()<crack_fracture>();
  f.template operator()<accelerometer_noise>();
}

template <std::size_t N>
constexpr problem_view view(const problem<N>& p) {
  return {p.title, p.source, std::span<const variable>(p.variables)};
}

/// \brief Every problem, in the order of `for_each_problem` (run-time use).
inline constexpr std::array<problem_view, 30> all_problems{
    view(sphere_drag),       view(pipe_pressure_drop), view(ship_resistance),
    view(vortex_shedding),   view(pump_power),         view(weir_flow),
    view(orifice_flow),      view(boundary_layer),     view(stokes_settling),
    view(deep_water_wave),   view(sound_speed),        view(blast_wave),
    view(capillary_rise),    view(drop_oscillation),   view(drag_without_density),
    view(forced_convection), view(natural_convection), view(transient_conduction),
    view(mass_transfer),     view(packed_bed),         view(heat_exchanger),
    view(pendulum),          view(spring_mass),        view(spring_force),
    view(kepler_orbit),      view(ideal_gas),          view(rc_circuit),
    view(wire_resistance),   view(crack_fracture),     view(accelerometer_noise)};

}  // namespace textbook
