#pragma once
/// \file quantity_kind.hpp
/// \brief Kinds of quantity that the catalog of characteristic numbers tells apart where
/// the dimension alone cannot: fluid vs solid thermal conductivity (Nusselt vs Biot),
/// kinematic viscosity vs thermal vs mass diffusivity (Prandtl, Schmidt, Lewis), a
/// characteristic length vs a diameter vs a roughness height, and so on.
///
/// Each kind has a dimension, an optional more general kind (a diameter is a
/// characteristic length; the conductivity of a fluid is a thermal conductivity) and the
/// variable names conventional for it in the handbooks (Incropera et al.; White; Bird,
/// Stewart & Lightfoot). The names only rank matches; they never decide one.
/// Standard library only.

#include <array>
#include <cstddef>
#include <cstdint>
#include <string_view>

#include "../../solver/core/dimension.hpp"
#include "../../solver/core/dims.hpp"

namespace nondim {

/// \brief The role a variable plays in a characteristic number.
///
/// `unspecified` means "no hint". The order of the other values is the order of
/// `quantity_kinds`; it carries no meaning.
enum class quantity_kind : std::uint8_t {
  unspecified,
  // geometry
  characteristic_length,
  diameter,
  roughness,
  mean_free_path,
  curvature_radius,
  head,
  reference_area,
  // kinematics
  velocity,
  speed_of_sound,
  mass_transfer_coefficient,
  gravitational_acceleration,
  frequency,
  rotational_speed,
  angular_speed,
  rotation_rate,
  reaction_rate_constant,
  shear_rate,
  time,
  relaxation_time,
  particle_response_time,
  volume_flow_rate,
  // dynamics
  density,
  density_difference,
  particle_density,
  dynamic_viscosity,
  wall_viscosity,
  kinematic_viscosity,
  pressure_difference,
  vapour_pressure_margin,
  wall_shear_stress,
  yield_stress,
  bulk_modulus,
  drag_force,
  lift_force,
  thrust,
  torque,
  power,
  surface_tension,
  surface_tension_temperature_coefficient,
  specific_work,
  // heat
  thermal_conductivity,
  fluid_thermal_conductivity,
  solid_thermal_conductivity,
  thermal_diffusivity,
  heat_transfer_coefficient,
  specific_heat_capacity,
  thermal_expansion_coefficient,
  temperature_difference,
  latent_heat_vaporization,
  latent_heat_fusion,
  heat_rate,
  max_heat_rate,
  overall_conductance,
  heat_capacity_rate,
  min_heat_capacity_rate,
  max_heat_capacity_rate,
  // mass transfer
  mass_diffusivity,
  // electromagnetism
  electrical_conductivity,
  magnetic_flux_density,
  magnetic_permeability,
};

/// \brief What the catalog knows about a kind.
struct quantity_kind_info {
  quantity_kind kind;
  std::string_view id;     ///< "fluid_thermal_conductivity": the spelling of files and the command line
  std::string_view name;   ///< "thermal conductivity of the fluid"
  dimension dim;           ///< its dimension
  quantity_kind parent;    ///< the more general kind, or `unspecified`
  std::string_view names;  ///< conventional variable names, separated by spaces
};

/// W/K: an overall conductance UA and a heat-capacity rate ṁc_p (ISO 80000-5, thermal
/// conductance); not a heat capacity, J/K.
inline constexpr dimension thermal_conductance = dims::power / dims::temperature;

/// \brief Every kind, indexed by the value of `quantity_kind`.
///
/// Conventional names are common practice in the handbooks named above (no single
/// source); a name may belong to several kinds of the same dimension.
inline constexpr std::array quantity_kinds{
    quantity_kind_info{quantity_kind::unspecified, "unspecified", "unspecified", dims::dimensionless,
                       quantity_kind::unspecified, ""},
    // geometry
    quantity_kind_info{quantity_kind::characteristic_length, "characteristic_length", "characteristic length",
                       dims::length, quantity_kind::unspecified, "L l x D d H R r z y b w s delta δ L_c Lc l_c"},
    quantity_kind_info{quantity_kind::diameter, "diameter", "diameter", dims::length,
                       quantity_kind::characteristic_length, "D d D_h d_h Dh dh D_p d_p Dp D_i d_i"},
    quantity_kind_info{quantity_kind::roughness, "roughness", "roughness height", dims::length,
                       quantity_kind::unspecified, "eps epsilon ε e k_s ks roughness"},
    quantity_kind_info{quantity_kind::mean_free_path, "mean_free_path", "mean free path", dims::length,
                       quantity_kind::unspecified, "lambda λ l_mfp mfp lambda_m λ_m"},
    quantity_kind_info{quantity_kind::curvature_radius, "curvature_radius", "radius of curvature", dims::length,
                       quantity_kind::unspecified, "R_c Rc r_c R_curv"},
    quantity_kind_info{quantity_kind::head, "head", "head", dims::length, quantity_kind::unspecified, "H H_p H_m head"},
    quantity_kind_info{quantity_kind::reference_area, "reference_area", "reference area", dims::area,
                       quantity_kind::unspecified, "A S A_ref A_p A_f"},
    // kinematics
    quantity_kind_info{quantity_kind::velocity, "velocity", "flow speed", dims::velocity, quantity_kind::unspecified,
                       "U u V v w W U_inf u_inf U_0 U0 u_0 V_inf v_inf u_m U_m"},
    quantity_kind_info{quantity_kind::speed_of_sound, "speed_of_sound", "speed of sound", dims::velocity,
                       quantity_kind::unspecified, "c a c_s a_s c0 a0 c_0 a_0"},
    quantity_kind_info{quantity_kind::mass_transfer_coefficient, "mass_transfer_coefficient",
                       "mass transfer coefficient", dims::velocity, quantity_kind::unspecified,
                       "k_m h_m k_c h_D k_L k_G km hm kc"},
    quantity_kind_info{quantity_kind::gravitational_acceleration, "gravitational_acceleration",
                       "acceleration of free fall", dims::acceleration, quantity_kind::unspecified, "g g0 g_0 g_n"},
    quantity_kind_info{quantity_kind::frequency, "frequency", "frequency", dims::frequency, quantity_kind::unspecified,
                       "f f_s omega ω freq"},
    quantity_kind_info{quantity_kind::rotational_speed, "rotational_speed", "rotational speed", dims::frequency,
                       quantity_kind::unspecified, "n N rps n_rot"},
    quantity_kind_info{quantity_kind::angular_speed, "angular_speed", "angular speed", dims::angular_velocity,
                       quantity_kind::unspecified, "Omega Ω omega ω Omega_0 Ω_0 omega_0 ω_0 omega_r ω_r Omega_r Ω_r"},
    quantity_kind_info{quantity_kind::rotation_rate, "rotation_rate", "rotation rate of the frame",
                       dims::angular_velocity, quantity_kind::angular_speed,
                       "Omega_E Ω_E Omega_e Ω_e Omega_earth Ω_earth Omega_frame Ω_frame Omega_f Ω_f"},
    quantity_kind_info{quantity_kind::reaction_rate_constant, "reaction_rate_constant", "first-order rate constant",
                       dims::frequency, quantity_kind::unspecified, "k_r kr k_1 k1 k_rxn"},
    quantity_kind_info{quantity_kind::shear_rate, "shear_rate", "shear rate", dims::frequency,
                       quantity_kind::unspecified, "gamma_dot γ̇ shear_rate S"},
    quantity_kind_info{quantity_kind::time, "time", "time", dims::time, quantity_kind::unspecified,
                       "t time t_obs T_obs t_0 t0"},
    quantity_kind_info{quantity_kind::relaxation_time, "relaxation_time", "relaxation time", dims::time,
                       quantity_kind::unspecified, "lambda λ lambda_r λ_r lambda_1 λ_1 t_r tau_r τ_r tau τ"},
    quantity_kind_info{quantity_kind::particle_response_time, "particle_response_time", "particle response time",
                       dims::time, quantity_kind::unspecified, "tau_p τ_p t_p"},
    quantity_kind_info{quantity_kind::volume_flow_rate, "volume_flow_rate", "volume flow rate", dims::volume_flow_rate,
                       quantity_kind::unspecified, "Q V_dot Q_v q_v"},
    // dynamics
    quantity_kind_info{quantity_kind::density, "density", "density", dims::density, quantity_kind::unspecified,
                       "rho ρ rho_f ρ_f"},
    quantity_kind_info{quantity_kind::density_difference, "density_difference", "density difference", dims::density,
                       quantity_kind::unspecified, "drho Drho d_rho delta_rho Δρ rho_diff"},
    quantity_kind_info{quantity_kind::particle_density, "particle_density", "particle density", dims::density,
                       quantity_kind::unspecified, "rho_p ρ_p rho_s ρ_s rho_d ρ_d"},
    quantity_kind_info{quantity_kind::dynamic_viscosity, "dynamic_viscosity", "dynamic viscosity",
                       dims::dynamic_viscosity, quantity_kind::unspecified, "mu μ eta η mu_f μ_f"},
    quantity_kind_info{quantity_kind::wall_viscosity, "wall_viscosity", "dynamic viscosity at the wall temperature",
                       dims::dynamic_viscosity, quantity_kind::dynamic_viscosity,
                       "mu_w μ_w mu_s μ_s eta_w η_w mu_wall"},
    quantity_kind_info{quantity_kind::kinematic_viscosity, "kinematic_viscosity", "kinematic viscosity",
                       dims::kinematic_viscosity, quantity_kind::unspecified, "nu ν nu_f ν_f"},
    quantity_kind_info{quantity_kind::pressure_difference, "pressure_difference", "pressure difference", dims::pressure,
                       quantity_kind::unspecified, "dp Dp dP delta_p Δp p p_diff"},
    quantity_kind_info{quantity_kind::vapour_pressure_margin, "vapour_pressure_margin",
                       "pressure above the vapour pressure (p - p_v)", dims::pressure,
                       quantity_kind::pressure_difference, "dp_v Dp_v dpv p_pv delta_p_v Δp_v p_minus_pv"},
    quantity_kind_info{quantity_kind::wall_shear_stress, "wall_shear_stress", "wall shear stress", dims::stress,
                       quantity_kind::unspecified, "tau_w τ_w tau_0 τ_0 tau_wall"},
    quantity_kind_info{quantity_kind::yield_stress, "yield_stress", "yield stress", dims::stress,
                       quantity_kind::unspecified, "tau_y τ_y sigma_y"},
    quantity_kind_info{quantity_kind::bulk_modulus, "bulk_modulus", "bulk modulus", dims::bulk_modulus,
                       quantity_kind::unspecified, "K E_v Ev K_s E"},
    quantity_kind_info{quantity_kind::drag_force, "drag_force", "drag force", dims::force, quantity_kind::unspecified,
                       "F F_D F_d D_f drag R_T F_x"},
    quantity_kind_info{quantity_kind::lift_force, "lift_force", "lift force", dims::force, quantity_kind::unspecified,
                       "F_L F_l L_f lift F_y"},
    quantity_kind_info{quantity_kind::thrust, "thrust", "thrust", dims::force, quantity_kind::unspecified,
                       "T F_T T_p thrust"},
    quantity_kind_info{quantity_kind::torque, "torque", "torque", dims::torque, quantity_kind::unspecified,
                       "Q M tau τ T_q M_t torque"},
    quantity_kind_info{quantity_kind::power, "power", "power", dims::power, quantity_kind::unspecified,
                       "P W_dot P_s P_shaft"},
    quantity_kind_info{quantity_kind::surface_tension, "surface_tension", "surface tension", dims::surface_tension,
                       quantity_kind::unspecified, "sigma σ gamma γ"},
    quantity_kind_info{quantity_kind::surface_tension_temperature_coefficient,
                       "surface_tension_temperature_coefficient", "temperature coefficient of surface tension",
                       dims::surface_tension / dims::temperature, quantity_kind::unspecified,
                       "dsigma_dT sigma_T σ_T gamma_T dgamma_dT"},
    quantity_kind_info{quantity_kind::specific_work, "specific_work", "specific work (g H)", dims::specific_energy,
                       quantity_kind::unspecified, "gH g_H Y w_s gh"},
    // heat
    quantity_kind_info{quantity_kind::thermal_conductivity, "thermal_conductivity", "thermal conductivity",
                       dims::thermal_conductivity, quantity_kind::unspecified, "k lambda λ"},
    quantity_kind_info{quantity_kind::fluid_thermal_conductivity, "fluid_thermal_conductivity",
                       "thermal conductivity of the fluid", dims::thermal_conductivity,
                       quantity_kind::thermal_conductivity, "k k_f kf lambda λ lambda_f λ_f k_fluid"},
    quantity_kind_info{quantity_kind::solid_thermal_conductivity, "solid_thermal_conductivity",
                       "thermal conductivity of the solid", dims::thermal_conductivity,
                       quantity_kind::thermal_conductivity, "k_s ks k_w k_b lambda_s λ_s lambda_w λ_w k_solid"},
    quantity_kind_info{quantity_kind::thermal_diffusivity, "thermal_diffusivity", "thermal diffusivity",
                       dims::thermal_diffusivity, quantity_kind::unspecified, "alpha α a kappa κ alpha_f α_f"},
    quantity_kind_info{quantity_kind::heat_transfer_coefficient, "heat_transfer_coefficient",
                       "heat transfer coefficient", dims::heat_transfer_coefficient, quantity_kind::unspecified,
                       "h h_c hbar h_conv h_x"},
    quantity_kind_info{quantity_kind::specific_heat_capacity, "specific_heat_capacity", "specific heat capacity",
                       dims::specific_heat_capacity, quantity_kind::unspecified, "cp c_p c cv c_v"},
    quantity_kind_info{quantity_kind::thermal_expansion_coefficient, "thermal_expansion_coefficient",
                       "cubic expansion coefficient", dims::thermal_expansion_coefficient, quantity_kind::unspecified,
                       "beta β alpha_V α_V beta_T"},
    quantity_kind_info{quantity_kind::temperature_difference, "temperature_difference", "temperature difference",
                       dims::temperature, quantity_kind::unspecified, "dT DT ΔT delta_T dtheta theta θ T_diff"},
    quantity_kind_info{quantity_kind::latent_heat_vaporization, "latent_heat_vaporization",
                       "specific enthalpy of vaporization", dims::specific_enthalpy, quantity_kind::unspecified,
                       "h_fg hfg h_lv L_v Lv"},
    quantity_kind_info{quantity_kind::latent_heat_fusion, "latent_heat_fusion", "specific enthalpy of fusion",
                       dims::specific_enthalpy, quantity_kind::unspecified, "h_sf h_sl h_if L_f Lf"},
    quantity_kind_info{quantity_kind::heat_rate, "heat_rate", "heat transfer rate", dims::power,
                       quantity_kind::unspecified, "q Q_dot q_dot Q q_actual"},
    quantity_kind_info{quantity_kind::max_heat_rate, "max_heat_rate", "largest possible heat transfer rate",
                       dims::power, quantity_kind::unspecified, "q_max Q_max qmax Qmax"},
    quantity_kind_info{quantity_kind::overall_conductance, "overall_conductance", "overall conductance UA",
                       thermal_conductance, quantity_kind::unspecified, "UA U_A UA_total"},
    quantity_kind_info{quantity_kind::heat_capacity_rate, "heat_capacity_rate", "heat-capacity rate (ṁc_p)",
                       thermal_conductance, quantity_kind::unspecified, "C C_h C_c mcp m_dot_cp"},
    quantity_kind_info{quantity_kind::min_heat_capacity_rate, "min_heat_capacity_rate",
                       "smaller heat-capacity rate C_min", thermal_conductance, quantity_kind::heat_capacity_rate,
                       "C_min Cmin"},
    quantity_kind_info{quantity_kind::max_heat_capacity_rate, "max_heat_capacity_rate",
                       "larger heat-capacity rate C_max", thermal_conductance, quantity_kind::heat_capacity_rate,
                       "C_max Cmax"},
    // mass transfer
    quantity_kind_info{quantity_kind::mass_diffusivity, "mass_diffusivity", "diffusion coefficient",
                       dims::mass_diffusivity, quantity_kind::unspecified,
                       "D_AB D_ab Dab DAB D_m Dm D_12 D12 D_i D_eff D"},
    // electromagnetism
    quantity_kind_info{quantity_kind::electrical_conductivity, "electrical_conductivity", "electrical conductivity",
                       dims::electrical_conductivity, quantity_kind::unspecified, "sigma_e σ_e sigma σ kappa_e"},
    quantity_kind_info{quantity_kind::magnetic_flux_density, "magnetic_flux_density", "magnetic flux density",
                       dims::magnetic_flux_density, quantity_kind::unspecified, "B B0 B_0"},
    quantity_kind_info{quantity_kind::magnetic_permeability, "magnetic_permeability", "magnetic permeability",
                       dims::permeability, quantity_kind::unspecified, "mu_0 μ_0 mu0 μ0 mu_m"},
};

/// Number of kinds, `unspecified` included.
inline constexpr std::size_t quantity_kind_count = quantity_kinds.size();

/// \brief The catalog's description of `k`.
[[nodiscard]] constexpr const quantity_kind_info& kind_info(quantity_kind k) noexcept {
  return quantity_kinds[static_cast<std::size_t>(k)];
}

/// \brief True when `general` is `specific` or one of its more general kinds.
[[nodiscard]] constexpr bool is_same_or_general(quantity_kind general, quantity_kind specific) noexcept {
  for (quantity_kind k = specific; k != quantity_kind::unspecified; k = kind_info(k).parent)
    if (k == general) return true;
  return false;
}

/// \brief The kind whose name is `name` ("diameter"), or `unspecified`.
[[nodiscard]] constexpr quantity_kind kind_from_name(std::string_view name) noexcept {
  for (const auto& k : quantity_kinds)
    if (k.name == name) return k.kind;
  return quantity_kind::unspecified;
}

/// \brief The kind whose identifier or name is `key` ("mean_free_path" or "mean free path"),
/// or `unspecified`: the spelling a problem file or the command line declares a kind with.
[[nodiscard]] constexpr quantity_kind kind_from_key(std::string_view key) noexcept {
  for (const auto& k : quantity_kinds)
    if (k.id == key || k.name == key) return k.kind;
  return quantity_kind::unspecified;
}

/// \brief True for the kinds that a catalog number is named after only on evidence: a
/// variable of the kind's dimension is not taken for one of them unless its declared kind
/// or its conventional name says so (DESIGN.md, "Rules for the groups"). A ratio of two
/// lengths is no Knudsen number unless one is a mean free path; a force over ρU²L² is no
/// drag coefficient unless the force is a drag (a propeller's thrust is not); U/(ΩL) is no
/// Rossby number unless Ω is the rotation rate of the frame (a rotor's is not); gβΔT, an
/// acceleration, is not g.
[[nodiscard]] constexpr bool needs_evidence(quantity_kind k) noexcept {
  switch (k) {
    case quantity_kind::roughness:
    case quantity_kind::mean_free_path:
    case quantity_kind::curvature_radius:
    case quantity_kind::gravitational_acceleration:
    case quantity_kind::angular_speed:
    case quantity_kind::rotation_rate:
    case quantity_kind::density_difference:
    case quantity_kind::vapour_pressure_margin:
    case quantity_kind::wall_viscosity:
    case quantity_kind::drag_force:
    case quantity_kind::lift_force:
    case quantity_kind::thrust:
    case quantity_kind::torque:
    case quantity_kind::heat_rate:
    case quantity_kind::max_heat_rate:
    case quantity_kind::overall_conductance:
    case quantity_kind::heat_capacity_rate:
    case quantity_kind::min_heat_capacity_rate:
    case quantity_kind::max_heat_capacity_rate:
      return true;
    default:
      return false;
  }
}

/// \brief True for the kinds that name a second phase or body beside the fluid (a
/// particle's density, a density difference, a solid's conductivity, the viscosity at the
/// wall): an entry with such a factor is defined across two phases; the others for one.
[[nodiscard]] constexpr bool marks_second_phase(quantity_kind k) noexcept {
  switch (k) {
    case quantity_kind::particle_density:
    case quantity_kind::density_difference:
    case quantity_kind::particle_response_time:
    case quantity_kind::solid_thermal_conductivity:
    case quantity_kind::wall_viscosity:
    case quantity_kind::max_heat_capacity_rate:
    case quantity_kind::min_heat_capacity_rate:
    case quantity_kind::max_heat_rate:
      return true;
    default:
      return false;
  }
}

namespace detail {

/// True when `name` is one of the space-separated words of `list`.
constexpr bool in_name_list(std::string_view list, std::string_view name) noexcept {
  if (name.empty()) return false;
  while (!list.empty()) {
    const std::size_t end = list.find(' ');
    const std::string_view word = list.substr(0, end);
    if (word == name) return true;
    if (end == std::string_view::npos) break;
    list.remove_prefix(end + 1);
  }
  return false;
}

constexpr bool kinds_are_in_order() noexcept {
  for (std::size_t i = 0; i < quantity_kinds.size(); ++i)
    if (static_cast<std::size_t>(quantity_kinds[i].kind) != i) return false;
  return true;
}
static_assert(kinds_are_in_order(), "nondim: quantity_kinds must list the kinds in the order of the enumeration");
static_assert(quantity_kind_count <= 64, "nondim: kind masks are 64-bit; the catalog has too many kinds");

}  // namespace detail

}  // namespace nondim
