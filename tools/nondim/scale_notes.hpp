#pragma once
/// \file scale_notes.hpp
/// \brief Notes on a similarity plan that need the analysis behind it: a group whose model
/// value falls in another regime than the prototype's (the regime table), a model speed at
/// which a gas is compressible while the problem has no speed of sound, and a model value
/// an order of magnitude from the prototype's with the group that forces it. Notes, never
/// errors.

#include <string>
#include <vector>

#include <nondim/analysis.hpp>
#include <nondim/similarity.hpp>

namespace nondim::tool {

/// Speed of sound of air as an ideal gas, c = sqrt(gamma R T) with gamma = 1.4 and
/// R = 287.05 J/(kg K) for dry air (White, Fluid Mechanics, section 9.2 and table A.4,
/// from memory); 343.2 m/s at 20 degC.
inline constexpr double air_gamma = 1.4;
inline constexpr double air_gas_constant = 287.05;  ///< J/(kg K)
inline constexpr double room_temperature = 293.15;  ///< K, when the problem has no temperature
/// Densities above this (kg/m^3) are a liquid's: the speed of sound of air says nothing.
inline constexpr double liquid_density = 100.0;

/// \brief One sentence per group (among those `a` names) whose model and prototype values
/// fall in different regimes of the same rule, with the configuration and the source.
std::vector<std::string> regime_change_notes(const similarity_plan& plan, const analysis& a);

/// \brief When no group is a Mach number and no variable is declared a speed of sound: one
/// sentence per model speed (a variable of dimension L T^-1 with a model value) above Mach
/// 0.3 in air at the model's temperature (the first variable of dimension Theta with a
/// model value, else 20 degC), unless the model's density is a liquid's.
std::vector<std::string> compressibility_notes(const similarity_plan& plan, const analysis& a);

/// A rig setting this many times the prototype's (or its inverse) is worth a note: an order
/// of magnitude is where a tunnel's speed or a rig's pressure usually stops being a setting
/// and becomes a different rig.
inline constexpr double far_ratio = 10.0;

/// \brief One sentence per rig setting the plan finds (a speed, rotational speed or
/// frequency, pressure or temperature; not given, not the dependent) that is at least
/// `far_ratio` times the prototype's or at most its inverse: how far, and which groups force
/// it (independent groups whose other variables are all given on the model). Flow rates,
/// forces and powers are left out: they follow the scale to a power and are measured, not set.
std::vector<std::string> far_setting_notes(const similarity_plan& plan, const analysis& a);

}  // namespace nondim::tool
