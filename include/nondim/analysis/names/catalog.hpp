#pragma once
/// \file catalog.hpp
/// \brief The catalog of characteristic numbers: the dimensionless numbers of ISO 80000-11
/// (momentum transfer, heat transfer, mass transfer, constants of matter,
/// magnetohydrodynamics) and those the fluid-mechanics and heat- and mass-transfer
/// handbooks add (White, *Fluid Mechanics*; Incropera et al., *Fundamentals of Heat and
/// Mass Transfer*; Bird, Stewart & Lightfoot, *Transport Phenomena*).
///
/// Each entry is a product of powers of factors; each factor has a role (a
/// `quantity_kind`: its name, dimension and conventional variable names) and a rational
/// exponent. Pure numbers in a definition (the 2 of a drag coefficient, the 18 of a
/// Stokes number) do not change which groups match and live only in the formula text.
/// An entry may have several equivalent forms (Re = ρUL/μ = UL/ν).
///
/// Sources: "from memory" marks a definition recalled rather than read at the time of
/// writing; no clause numbers are given where they were not checked.
/// Standard library only; all data are `constexpr`.

#include <array>
#include <cstddef>
#include <cstdint>
#include <initializer_list>
#include <span>
#include <stdexcept>
#include <string_view>

#include "../../solver/core/dimension.hpp"
#include "../../solver/core/rational.hpp"
#include "quantity_kind.hpp"

namespace nondim {

/// Most factors in one form of an entry (the Rayleigh number in ρ, μ, k, cp has seven).
inline constexpr std::size_t catalog_max_factors = 8;
/// Most equivalent forms of one entry.
inline constexpr std::size_t catalog_max_forms = 4;

/// \brief One factor of a characteristic number: a role and its exponent.
struct catalog_factor {
  quantity_kind kind = quantity_kind::unspecified;
  rational exponent{};

  /// The role's name ("density").
  [[nodiscard]] constexpr std::string_view role() const noexcept { return kind_info(kind).name; }
  /// The role's dimension.
  [[nodiscard]] constexpr dimension dim() const noexcept { return kind_info(kind).dim; }
};

/// \brief One form of a characteristic number: its factors, and the formula as written.
struct catalog_form {
  std::string_view formula;  ///< "Re = ρUL/μ" (UTF-8), pure numbers included
  std::array<catalog_factor, catalog_max_factors> factors{};
  std::size_t size = 0;

  constexpr catalog_form() = default;
  /// \throws std::length_error when more than `catalog_max_factors` factors are given
  /// (a compile error in the constant catalog).
  constexpr catalog_form(std::string_view text, std::initializer_list<catalog_factor> list)
      : formula(text), size(list.size()) {
    if (list.size() > catalog_max_factors) throw std::length_error("nondim: too many factors in a catalog form");
    std::size_t i = 0;
    for (const auto& f : list) factors[i++] = f;
  }

  [[nodiscard]] constexpr std::span<const catalog_factor> view() const noexcept { return {factors.data(), size}; }
  /// The dimension of the product (dimensionless for every form of the catalog).
  [[nodiscard]] constexpr dimension product_dimension() const {
    dimension d{};
    for (std::size_t i = 0; i < size; ++i) d = d * pow(factors[i].dim(), factors[i].exponent);
    return d;
  }
};

/// \brief The part of ISO 80000-11 (or of a handbook) an entry belongs to.
enum class catalog_section : std::uint8_t {
  momentum_transfer,
  heat_transfer,
  mass_transfer,
  constants_of_matter,
  magnetohydrodynamics,
};

/// \brief A characteristic number.
///
/// `tier` 1 marks a primary number (Re, Pr, Nu...), tier 2 one that is usually read as a
/// product of primary ones (Pe = Re Pr, Ra = Gr Pr, St = Nu/(Re Pr)) or a special-purpose
/// number. The named basis prefers tier 1, then catalog order.
struct catalog_entry {
  std::string_view name;    ///< "Reynolds number"
  std::string_view symbol;  ///< "Re" (ASCII)
  catalog_section section = catalog_section::momentum_transfer;
  int tier = 1;
  std::array<catalog_form, catalog_max_forms> forms{};
  std::size_t form_count = 0;
  std::string_view source;  ///< where the definition comes from
  std::string_view note;    ///< other conventions, if any

  constexpr catalog_entry() = default;
  /// \throws std::length_error when more than `catalog_max_forms` forms are given.
  constexpr catalog_entry(std::string_view entry_name, std::string_view entry_symbol, catalog_section entry_section,
                          int entry_tier, std::initializer_list<catalog_form> list, std::string_view entry_source,
                          std::string_view entry_note = {})
      : name(entry_name),
        symbol(entry_symbol),
        section(entry_section),
        tier(entry_tier),
        form_count(list.size()),
        source(entry_source),
        note(entry_note) {
    if (list.size() > catalog_max_forms) throw std::length_error("nondim: too many forms in a catalog entry");
    std::size_t i = 0;
    for (const auto& f : list) forms[i++] = f;
  }

  [[nodiscard]] constexpr std::span<const catalog_form> view() const noexcept { return {forms.data(), form_count}; }
};

namespace detail::catalog_data {

using enum quantity_kind;
using enum catalog_section;
inline constexpr rational half{1, 2};
inline constexpr rational three_halves{3, 2};

// Order matters: within a tier, earlier entries are preferred by the named basis (and
// win ties between entries of the same form, such as Prandtl before Schmidt).
inline constexpr std::array table{
    // ---- momentum transfer ------------------------------------------------------------
    catalog_entry{
        "Reynolds number",
        "Re",
        momentum_transfer,
        1,
        {catalog_form{"Re = ρUL/μ", {{density, 1}, {velocity, 1}, {characteristic_length, 1}, {dynamic_viscosity, -1}}},
         catalog_form{"Re = UL/ν", {{velocity, 1}, {characteristic_length, 1}, {kinematic_viscosity, -1}}},
         catalog_form{"Re = ρnD²/μ", {{density, 1}, {rotational_speed, 1}, {diameter, 2}, {dynamic_viscosity, -1}}},
         catalog_form{"Re = nD²/ν", {{rotational_speed, 1}, {diameter, 2}, {kinematic_viscosity, -1}}}},
        "ISO 80000-11:2019 (Re = ρvl/η = vl/ν, from memory); rotating-machinery form ρnD²/μ: White, "
        "Fluid Mechanics, ch. 11 (from memory)"},
    catalog_entry{"Euler number",
                  "Eu",
                  momentum_transfer,
                  1,
                  {catalog_form{"Eu = Δp/(ρU²)", {{pressure_difference, 1}, {density, -1}, {velocity, -2}}}},
                  "ISO 80000-11:2019 (Eu = Δp/(ρv²), from memory); White, Fluid Mechanics, ch. 5 (from memory)"},
    catalog_entry{"Froude number",
                  "Fr",
                  momentum_transfer,
                  1,
                  {catalog_form{"Fr = U/√(gL)",
                                {{velocity, 1}, {gravitational_acceleration, -half}, {characteristic_length, -half}}}},
                  "ISO 80000-11:2019 (Fr = v/√(lg), from memory); White, Fluid Mechanics, ch. 5 (from memory)",
                  "some texts call U²/(gL) the Froude number; that group is Fr² here"},
    catalog_entry{
        "Weber number",
        "We",
        momentum_transfer,
        1,
        {catalog_form{"We = ρU²L/σ", {{density, 1}, {velocity, 2}, {characteristic_length, 1}, {surface_tension, -1}}}},
        "ISO 80000-11:2019 (We = ρv²l/γ, from memory); White, Fluid Mechanics, ch. 5 (from memory)"},
    catalog_entry{"Mach number",
                  "Ma",
                  momentum_transfer,
                  1,
                  {catalog_form{"Ma = U/c", {{velocity, 1}, {speed_of_sound, -1}}}},
                  "ISO 80000-11:2019 (Ma = v/c, from memory); White, Fluid Mechanics, ch. 9 (from memory)"},
    catalog_entry{"Strouhal number",
                  "Sr",
                  momentum_transfer,
                  1,
                  {catalog_form{"Sr = fL/U", {{frequency, 1}, {characteristic_length, 1}, {velocity, -1}}},
                   catalog_form{"Sr = L/(U t) (t a period, 1/f, or the reference time of an unsteady flow)",
                                {{characteristic_length, 1}, {velocity, -1}, {time, -1}}}},
                  "ISO 80000-11:2019 (Sr = lf/v, from memory); White, Fluid Mechanics, ch. 5 (from memory); "
                  "White, Viscous Fluid Flow, ch. 2: the coefficient L/(U t) of the unsteady term (from memory)",
                  "written St in many handbooks; ISO writes Sr to keep St for Stanton"},
    catalog_entry{"Knudsen number",
                  "Kn",
                  momentum_transfer,
                  1,
                  {catalog_form{"Kn = λ/L", {{mean_free_path, 1}, {characteristic_length, -1}}}},
                  "ISO 80000-11:2019 (Kn = λ/l, from memory); White, Fluid Mechanics, ch. 1 (from memory)"},
    catalog_entry{
        "drag coefficient",
        "C_D",
        momentum_transfer,
        1,
        {catalog_form{"C_D = 2F_D/(ρU²A)", {{drag_force, 1}, {density, -1}, {velocity, -2}, {reference_area, -1}}},
         catalog_form{"C_D ∝ F_D/(ρU²L²) (reference area ∝ L², e.g. A = πD²/4)",
                      {{drag_force, 1}, {density, -1}, {velocity, -2}, {characteristic_length, -2}}}},
        "ISO 80000-11:2019 (drag coefficient, from memory); White, Fluid Mechanics, ch. 7 (from memory)",
        "the length form is the force coefficient F/(ρU²L²), also called the Newton number"},
    catalog_entry{
        "lift coefficient",
        "C_L",
        momentum_transfer,
        1,
        {catalog_form{"C_L = 2F_L/(ρU²A)", {{lift_force, 1}, {density, -1}, {velocity, -2}, {reference_area, -1}}},
         catalog_form{"C_L ∝ F_L/(ρU²L²) (reference area ∝ L²)",
                      {{lift_force, 1}, {density, -1}, {velocity, -2}, {characteristic_length, -2}}}},
        "ISO 80000-11:2019 (lift coefficient, from memory); White, Fluid Mechanics, ch. 7 (from memory)"},
    catalog_entry{"flow coefficient",
                  "C_Q",
                  momentum_transfer,
                  1,
                  {catalog_form{"C_Q = Q/(nD³)", {{volume_flow_rate, 1}, {rotational_speed, -1}, {diameter, -3}}}},
                  "White, Fluid Mechanics, ch. 11, pump scaling laws (from memory)"},
    catalog_entry{"head coefficient",
                  "C_H",
                  momentum_transfer,
                  1,
                  {catalog_form{"C_H = gH/(n²D²)", {{specific_work, 1}, {rotational_speed, -2}, {diameter, -2}}},
                   catalog_form{"C_H = gH/(n²D²)",
                                {{gravitational_acceleration, 1}, {head, 1}, {rotational_speed, -2}, {diameter, -2}}}},
                  "White, Fluid Mechanics, ch. 11, pump scaling laws (from memory)"},
    catalog_entry{
        "power coefficient (power number)",
        "C_P",
        momentum_transfer,
        1,
        {catalog_form{"C_P = P/(ρn³D⁵)", {{power, 1}, {density, -1}, {rotational_speed, -3}, {diameter, -5}}}},
        "White, Fluid Mechanics, ch. 11 (from memory); the power number of stirred vessels has the same "
        "form (common practice, from memory)"},
    catalog_entry{
        "discharge coefficient",
        "C_d",
        momentum_transfer,
        1,
        {catalog_form{"C_d = Q/(A√(2Δp/ρ))",
                      {{volume_flow_rate, 1}, {reference_area, -1}, {pressure_difference, -half}, {density, half}}},
         catalog_form{"C_d ∝ Q/(D²√(Δp/ρ)) (A = πD²/4)",
                      {{volume_flow_rate, 1}, {diameter, -2}, {pressure_difference, -half}, {density, half}}}},
        "White, Fluid Mechanics, ch. 6, flow meters (Q = C_d A_t √(2Δp/ρ), from memory)"},
    catalog_entry{"relative roughness",
                  "eps/D",
                  momentum_transfer,
                  1,
                  {catalog_form{"ε/D", {{roughness, 1}, {diameter, -1}}}},
                  "White, Fluid Mechanics, ch. 6, Moody chart (from memory)"},
    catalog_entry{"capillary number",
                  "Ca",
                  momentum_transfer,
                  1,
                  {catalog_form{"Ca = μU/σ", {{dynamic_viscosity, 1}, {velocity, 1}, {surface_tension, -1}}}},
                  "ISO 80000-11:2019 (from memory); common practice (interfacial flows)"},
    catalog_entry{
        "Ohnesorge number",
        "Oh",
        momentum_transfer,
        1,
        {catalog_form{
            "Oh = μ/√(ρσL)",
            {{dynamic_viscosity, 1}, {density, -half}, {surface_tension, -half}, {characteristic_length, -half}}}},
        "ISO 80000-11:2019 (from memory); common practice (drop and jet break-up)",
        "Oh = √We / Re"},
    catalog_entry{
        "Bond number (Eötvös number)",
        "Bo",
        momentum_transfer,
        1,
        {catalog_form{"Bo = ΔρgL²/σ",
                      {{density_difference, 1},
                       {gravitational_acceleration, 1},
                       {characteristic_length, 2},
                       {surface_tension, -1}}},
         catalog_form{
             "Bo = ρgL²/σ",
             {{density, 1}, {gravitational_acceleration, 1}, {characteristic_length, 2}, {surface_tension, -1}}}},
        "ISO 80000-11:2019 (Eötvös number, from memory); common practice (bubbles and drops)"},
    catalog_entry{
        "Womersley number",
        "Wo",
        momentum_transfer,
        1,
        {catalog_form{"Wo = R√(ω/ν)", {{characteristic_length, 1}, {frequency, half}, {kinematic_viscosity, -half}}},
         catalog_form{"Wo = R√(ωρ/μ)",
                      {{characteristic_length, 1}, {frequency, half}, {density, half}, {dynamic_viscosity, -half}}}},
        "common practice (pulsating pipe flow), from memory"},
    catalog_entry{
        "Dean number",
        "Dn",
        momentum_transfer,
        1,
        {catalog_form{"Dn = (ρUD/μ)√(D/(2R_c))",
                      {{density, 1},
                       {velocity, 1},
                       {diameter, three_halves},
                       {dynamic_viscosity, -1},
                       {curvature_radius, -half}}},
         catalog_form{"Dn = (UD/ν)√(D/(2R_c))",
                      {{velocity, 1}, {diameter, three_halves}, {kinematic_viscosity, -1}, {curvature_radius, -half}}}},
        "ISO 80000-11:2019 (from memory); common practice (curved pipes)",
        "definitions differ by the factor √2"},
    catalog_entry{"Rossby number",
                  "Ro",
                  momentum_transfer,
                  1,
                  {catalog_form{"Ro = U/(ΩL)", {{velocity, 1}, {rotation_rate, -1}, {characteristic_length, -1}}}},
                  "ISO 80000-11:2019 (from memory); common practice (rotating flows)",
                  "often U/(fL) with the Coriolis parameter f = 2Ω sin φ"},
    catalog_entry{
        "Ekman number",
        "Ek",
        momentum_transfer,
        1,
        {catalog_form{"Ek = ν/(ΩL²)", {{kinematic_viscosity, 1}, {angular_speed, -1}, {characteristic_length, -2}}},
         catalog_form{"Ek = μ/(ρΩL²)",
                      {{dynamic_viscosity, 1}, {density, -1}, {angular_speed, -1}, {characteristic_length, -2}}}},
        "ISO 80000-11:2019 (from memory); common practice (rotating flows)",
        "some definitions carry a factor 2 in the denominator"},
    catalog_entry{"Deborah number",
                  "De",
                  momentum_transfer,
                  1,
                  {catalog_form{"De = λ/t", {{relaxation_time, 1}, {time, -1}}}},
                  "common practice (rheology), from memory"},
    catalog_entry{"Weissenberg number",
                  "Wi",
                  momentum_transfer,
                  1,
                  {catalog_form{"Wi = λγ̇", {{relaxation_time, 1}, {shear_rate, 1}}},
                   catalog_form{"Wi = λU/L", {{relaxation_time, 1}, {velocity, 1}, {characteristic_length, -1}}}},
                  "ISO 80000-11:2019 (from memory); common practice (rheology)"},
    catalog_entry{"Cauchy number",
                  "Cy",
                  momentum_transfer,
                  1,
                  {catalog_form{"Cy = ρU²/K", {{density, 1}, {velocity, 2}, {bulk_modulus, -1}}}},
                  "White, Fluid Mechanics, ch. 5 (from memory)",
                  "equals Ma² when K = ρc²"},
    // tier 2: read as products of the above, or special purpose
    catalog_entry{
        "Darcy friction factor",
        "f_D",
        momentum_transfer,
        2,
        {catalog_form{
            "f = 2ΔpD/(ρU²L)",
            {{pressure_difference, 1}, {diameter, 1}, {density, -1}, {velocity, -2}, {characteristic_length, -1}}}},
        "White, Fluid Mechanics, ch. 6 (Darcy-Weisbach, from memory); ISO 80000-11:2019 (from memory)"},
    catalog_entry{"Fanning friction factor (skin-friction coefficient)",
                  "c_f",
                  momentum_transfer,
                  2,
                  {catalog_form{"c_f = 2τ_w/(ρU²)", {{wall_shear_stress, 1}, {density, -1}, {velocity, -2}}}},
                  "White, Fluid Mechanics, ch. 6-7 (from memory); ISO 80000-11:2019, Fanning number (from memory)",
                  "a quarter of the Darcy friction factor in pipe flow"},
    catalog_entry{"pressure coefficient",
                  "C_p",
                  momentum_transfer,
                  2,
                  {catalog_form{"C_p = (p - p∞)/(½ρU²)", {{pressure_difference, 1}, {density, -1}, {velocity, -2}}}},
                  "White, Fluid Mechanics, ch. 5 (from memory)"},
    catalog_entry{
        "Galilei number",
        "Ga",
        momentum_transfer,
        2,
        {catalog_form{"Ga = gL³/ν²",
                      {{gravitational_acceleration, 1}, {characteristic_length, 3}, {kinematic_viscosity, -2}}},
         catalog_form{
             "Ga = gL³ρ²/μ²",
             {{gravitational_acceleration, 1}, {characteristic_length, 3}, {density, 2}, {dynamic_viscosity, -2}}}},
        "ISO 80000-11:2019 (from memory)"},
    catalog_entry{"Archimedes number",
                  "Ar",
                  momentum_transfer,
                  2,
                  {catalog_form{"Ar = gL³ρΔρ/μ²",
                                {{gravitational_acceleration, 1},
                                 {characteristic_length, 3},
                                 {density, 1},
                                 {density_difference, 1},
                                 {dynamic_viscosity, -2}}},
                   catalog_form{"Ar = gL³Δρ/(ρν²)",
                                {{gravitational_acceleration, 1},
                                 {characteristic_length, 3},
                                 {density_difference, 1},
                                 {density, -1},
                                 {kinematic_viscosity, -2}}}},
                  "ISO 80000-11:2019 (from memory); common practice (fluidisation, settling)"},
    catalog_entry{
        "Morton number",
        "Mo",
        momentum_transfer,
        2,
        {catalog_form{"Mo = gμ⁴Δρ/(ρ²σ³)",
                      {{gravitational_acceleration, 1},
                       {dynamic_viscosity, 4},
                       {density_difference, 1},
                       {density, -2},
                       {surface_tension, -3}}},
         catalog_form{"Mo = gμ⁴/(ρσ³) (Δρ ≈ ρ)",
                      {{gravitational_acceleration, 1}, {dynamic_viscosity, 4}, {density, -1}, {surface_tension, -3}}}},
        "ISO 80000-11:2019 (from memory); common practice (bubbles and drops)"},
    catalog_entry{
        "Taylor number",
        "Ta",
        momentum_transfer,
        2,
        {catalog_form{"Ta = 4Ω²L⁴/ν²", {{angular_speed, 2}, {characteristic_length, 4}, {kinematic_viscosity, -2}}},
         catalog_form{"Ta = 4Ω²L⁴ρ²/μ²",
                      {{angular_speed, 2}, {characteristic_length, 4}, {density, 2}, {dynamic_viscosity, -2}}}},
        "common practice (rotating layers), from memory",
        "in this form Ta = 4/Ek²; Couette-flow definitions use gap and radius"},
    catalog_entry{"Richardson number",
                  "Ri",
                  momentum_transfer,
                  2,
                  {catalog_form{"Ri = gβΔTL/U²",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 1},
                                 {velocity, -2}}},
                   catalog_form{"Ri = gΔρL/(ρU²)",
                                {{gravitational_acceleration, 1},
                                 {density_difference, 1},
                                 {characteristic_length, 1},
                                 {density, -1},
                                 {velocity, -2}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 9, Gr/Re² (from memory)"},
    catalog_entry{
        "Stokes number",
        "Stk",
        momentum_transfer,
        2,
        {catalog_form{"Stk = τ_pU/L", {{particle_response_time, 1}, {velocity, 1}, {characteristic_length, -1}}},
         catalog_form{"Stk = ρ_p d_p² U/(18μL)",
                      {{particle_density, 1},
                       {diameter, 2},
                       {velocity, 1},
                       {dynamic_viscosity, -1},
                       {characteristic_length, -1}}}},
        "common practice (particle-laden flow), from memory"},
    catalog_entry{
        "Bingham number",
        "Bn",
        momentum_transfer,
        2,
        {catalog_form{"Bn = τ_yL/(μU)",
                      {{yield_stress, 1}, {characteristic_length, 1}, {dynamic_viscosity, -1}, {velocity, -1}}}},
        "ISO 80000-11:2019 (from memory); common practice (viscoplastic flow)"},
    catalog_entry{"specific speed",
                  "N_s",
                  momentum_transfer,
                  2,
                  {catalog_form{"N_s = nQ^(1/2)/(gH)^(3/4)",
                                {{rotational_speed, 1}, {volume_flow_rate, half}, {specific_work, rational{-3, 4}}}},
                   catalog_form{"N_s = nQ^(1/2)/(gH)^(3/4)",
                                {{rotational_speed, 1},
                                 {volume_flow_rate, half},
                                 {gravitational_acceleration, rational{-3, 4}},
                                 {head, rational{-3, 4}}}}},
                  "White, Fluid Mechanics, ch. 11 (from memory)"},
    catalog_entry{
        "thrust coefficient",
        "K_T",
        momentum_transfer,
        2,
        {catalog_form{"K_T = T/(ρn²D⁴)", {{thrust, 1}, {density, -1}, {rotational_speed, -2}, {diameter, -4}}}},
        "Carlton, Marine Propellers and Propulsion, ch. 6, open-water characteristics (from memory)",
        "a thrust loading T/(ρU²D²) is another group: K_T/J²"},
    catalog_entry{
        "torque coefficient",
        "K_Q",
        momentum_transfer,
        2,
        {catalog_form{"K_Q = Q/(ρn²D⁵)", {{torque, 1}, {density, -1}, {rotational_speed, -2}, {diameter, -5}}}},
        "Carlton, Marine Propellers and Propulsion, ch. 6, open-water characteristics (from memory)"},
    catalog_entry{"advance ratio",
                  "J",
                  momentum_transfer,
                  2,
                  {catalog_form{"J = V/(nD)", {{velocity, 1}, {rotational_speed, -1}, {diameter, -1}}}},
                  "Carlton, Marine Propellers and Propulsion, ch. 6 (from memory); White, Fluid Mechanics, ch. 11 "
                  "(from memory)"},
    catalog_entry{"tip-speed ratio",
                  "TSR",
                  momentum_transfer,
                  2,
                  {catalog_form{"λ = ΩR/U", {{angular_speed, 1}, {characteristic_length, 1}, {velocity, -1}}}},
                  "Manwell, McGowan & Rogers, Wind Energy Explained, ch. 3 (from memory)",
                  "written λ in wind energy; n in rev/s gives ΩR = 2πnR"},
    catalog_entry{"cavitation number",
                  "Ca_v",
                  momentum_transfer,
                  2,
                  {catalog_form{"σ = (p - p_v)/(½ρU²)", {{vapour_pressure_margin, 1}, {density, -1}, {velocity, -2}}}},
                  "White, Fluid Mechanics, ch. 5 (σ = (p_a - p_v)/(ρV²/2), from memory)",
                  "written σ or Ca; the pressure margin p - p_v is one variable"},
    // ---- heat transfer ----------------------------------------------------------------
    catalog_entry{
        "Nusselt number",
        "Nu",
        heat_transfer,
        1,
        {catalog_form{"Nu = hL/k_f",
                      {{heat_transfer_coefficient, 1}, {characteristic_length, 1}, {fluid_thermal_conductivity, -1}}}},
        "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (from memory)"},
    catalog_entry{
        "Biot number",
        "Bi",
        heat_transfer,
        1,
        {catalog_form{"Bi = hL/k_s",
                      {{heat_transfer_coefficient, 1}, {characteristic_length, 1}, {solid_thermal_conductivity, -1}}}},
        "ISO 80000-11:2019 (from memory); Incropera et al., ch. 5 (from memory)"},
    catalog_entry{"Fourier number",
                  "Fo",
                  heat_transfer,
                  1,
                  {catalog_form{"Fo = αt/L²", {{thermal_diffusivity, 1}, {time, 1}, {characteristic_length, -2}}},
                   catalog_form{"Fo = kt/(ρc_pL²)",
                                {{thermal_conductivity, 1},
                                 {time, 1},
                                 {density, -1},
                                 {specific_heat_capacity, -1},
                                 {characteristic_length, -2}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 5 (from memory)"},
    catalog_entry{"Grashof number",
                  "Gr",
                  heat_transfer,
                  1,
                  {catalog_form{"Gr = gβΔTL³/ν²",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 3},
                                 {kinematic_viscosity, -2}}},
                   catalog_form{"Gr = gβΔTL³ρ²/μ²",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 3},
                                 {density, 2},
                                 {dynamic_viscosity, -2}}}},
                  "ISO 80000-11:2019 (Gr = l³gα_VΔT/ν², from memory); Incropera et al., ch. 9 (from memory)"},
    catalog_entry{
        "Eckert number",
        "Ec",
        heat_transfer,
        1,
        {catalog_form{"Ec = U²/(c_pΔT)", {{velocity, 2}, {specific_heat_capacity, -1}, {temperature_difference, -1}}}},
        "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (from memory)"},
    catalog_entry{
        "Jakob number",
        "Ja",
        heat_transfer,
        1,
        {catalog_form{"Ja = c_pΔT/h_fg",
                      {{specific_heat_capacity, 1}, {temperature_difference, 1}, {latent_heat_vaporization, -1}}}},
        "ISO 80000-11:2019 (from memory); Incropera et al., ch. 10 (from memory)"},
    catalog_entry{"Marangoni number",
                  "Mg",
                  heat_transfer,
                  1,
                  {catalog_form{"Mg = (dσ/dT)ΔTL/(μα)",
                                {{surface_tension_temperature_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 1},
                                 {dynamic_viscosity, -1},
                                 {thermal_diffusivity, -1}}},
                   catalog_form{"Mg = (dσ/dT)ΔTLρc_p/(μk)",
                                {{surface_tension_temperature_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 1},
                                 {density, 1},
                                 {specific_heat_capacity, 1},
                                 {dynamic_viscosity, -1},
                                 {fluid_thermal_conductivity, -1}}}},
                  "ISO 80000-11:2019 (from memory); common practice (thermocapillary flow)",
                  "the sign convention of dσ/dT varies"},
    catalog_entry{"Rayleigh number",
                  "Ra",
                  heat_transfer,
                  2,
                  {catalog_form{"Ra = gβΔTL³/(να)",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 3},
                                 {kinematic_viscosity, -1},
                                 {thermal_diffusivity, -1}}},
                   catalog_form{"Ra = gβΔTL³ρ²c_p/(μk)",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 3},
                                 {density, 2},
                                 {specific_heat_capacity, 1},
                                 {dynamic_viscosity, -1},
                                 {fluid_thermal_conductivity, -1}}},
                   catalog_form{"Ra = gβΔTL³ρ/(μα)",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 3},
                                 {density, 1},
                                 {dynamic_viscosity, -1},
                                 {thermal_diffusivity, -1}}},
                   catalog_form{"Ra = gβΔTL³ρc_p/(νk)",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {temperature_difference, 1},
                                 {characteristic_length, 3},
                                 {density, 1},
                                 {specific_heat_capacity, 1},
                                 {kinematic_viscosity, -1},
                                 {fluid_thermal_conductivity, -1}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 9 (Ra = Gr Pr, from memory)"},
    catalog_entry{"Péclet number",
                  "Pe",
                  heat_transfer,
                  2,
                  {catalog_form{"Pe = UL/α", {{velocity, 1}, {characteristic_length, 1}, {thermal_diffusivity, -1}}},
                   catalog_form{"Pe = ρc_pUL/k",
                                {{density, 1},
                                 {specific_heat_capacity, 1},
                                 {velocity, 1},
                                 {characteristic_length, 1},
                                 {fluid_thermal_conductivity, -1}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (Pe = Re Pr, from memory)"},
    catalog_entry{
        "Stanton number",
        "St",
        heat_transfer,
        2,
        {catalog_form{"St = h/(ρc_pU)",
                      {{heat_transfer_coefficient, 1}, {density, -1}, {specific_heat_capacity, -1}, {velocity, -1}}}},
        "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (St = Nu/(Re Pr), from memory)"},
    catalog_entry{
        "Brinkman number",
        "Br",
        heat_transfer,
        2,
        {catalog_form{
            "Br = μU²/(kΔT)",
            {{dynamic_viscosity, 1}, {velocity, 2}, {fluid_thermal_conductivity, -1}, {temperature_difference, -1}}}},
        "ISO 80000-11:2019 (from memory); common practice (viscous heating, Br = Ec Pr)"},
    catalog_entry{"Graetz number",
                  "Gz",
                  heat_transfer,
                  2,
                  {catalog_form{"Gz = UD²/(αL)",
                                {{velocity, 1}, {diameter, 2}, {thermal_diffusivity, -1}, {characteristic_length, -1}}},
                   catalog_form{"Gz = ρc_pUD²/(kL)",
                                {{density, 1},
                                 {specific_heat_capacity, 1},
                                 {velocity, 1},
                                 {diameter, 2},
                                 {fluid_thermal_conductivity, -1},
                                 {characteristic_length, -1}}}},
                  "Incropera et al., ch. 8 (Gz = (D/x) Re Pr, from memory); ISO 80000-11:2019 (from memory)"},
    catalog_entry{"Stefan number",
                  "Ste",
                  heat_transfer,
                  2,
                  {catalog_form{"Ste = c_pΔT/h_sf",
                                {{specific_heat_capacity, 1}, {temperature_difference, 1}, {latent_heat_fusion, -1}}}},
                  "ISO 80000-11:2019 (from memory); common practice (melting and solidification)"},
    catalog_entry{"Gebhart number (dissipation number)",
                  "Ge",
                  heat_transfer,
                  2,
                  {catalog_form{"Ge = gβL/c_p",
                                {{gravitational_acceleration, 1},
                                 {thermal_expansion_coefficient, 1},
                                 {characteristic_length, 1},
                                 {specific_heat_capacity, -1}}}},
                  "common practice (viscous dissipation in natural convection), from memory"},
    catalog_entry{"Colburn j factor (heat)",
                  "j_H",
                  heat_transfer,
                  2,
                  {catalog_form{"j_H = St Pr^(2/3) = (h/(ρc_pU))(μc_p/k)^(2/3)",
                                {{heat_transfer_coefficient, 1},
                                 {density, -1},
                                 {specific_heat_capacity, rational{-1, 3}},
                                 {velocity, -1},
                                 {dynamic_viscosity, rational{2, 3}},
                                 {fluid_thermal_conductivity, rational{-2, 3}}}}},
                  "Incropera et al., ch. 6, Chilton-Colburn analogy (from memory); ISO 80000-11:2019, j-factor "
                  "(from memory)"},
    // ---- constants of matter ----------------------------------------------------------
    catalog_entry{
        "Prandtl number",
        "Pr",
        constants_of_matter,
        1,
        {catalog_form{"Pr = ν/α", {{kinematic_viscosity, 1}, {thermal_diffusivity, -1}}},
         catalog_form{"Pr = μc_p/k",
                      {{dynamic_viscosity, 1}, {specific_heat_capacity, 1}, {fluid_thermal_conductivity, -1}}}},
        "ISO 80000-11:2019 (Pr = η c_p/λ, from memory); Incropera et al., ch. 6 (from memory)"},
    catalog_entry{"Schmidt number",
                  "Sc",
                  constants_of_matter,
                  1,
                  {catalog_form{"Sc = ν/D_AB", {{kinematic_viscosity, 1}, {mass_diffusivity, -1}}},
                   catalog_form{"Sc = μ/(ρD_AB)", {{dynamic_viscosity, 1}, {density, -1}, {mass_diffusivity, -1}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (from memory)"},
    catalog_entry{
        "Lewis number",
        "Le",
        constants_of_matter,
        1,
        {catalog_form{"Le = α/D_AB", {{thermal_diffusivity, 1}, {mass_diffusivity, -1}}},
         catalog_form{
             "Le = k/(ρc_pD_AB)",
             {{fluid_thermal_conductivity, 1}, {density, -1}, {specific_heat_capacity, -1}, {mass_diffusivity, -1}}}},
        "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (from memory)",
        "some texts define the inverse, D_AB/α"},
    catalog_entry{"heat-exchanger effectiveness",
                  "eps_HX",
                  heat_transfer,
                  2,
                  {catalog_form{"ε = q/q_max", {{heat_rate, 1}, {max_heat_rate, -1}}}},
                  "Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 11, ε-NTU method (from memory)",
                  "q_max = C_min (T_h,i - T_c,i)"},
    catalog_entry{"number of transfer units",
                  "NTU",
                  heat_transfer,
                  2,
                  {catalog_form{"NTU = UA/C_min", {{overall_conductance, 1}, {min_heat_capacity_rate, -1}}}},
                  "Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 11, ε-NTU method (from memory)"},
    catalog_entry{"heat-capacity ratio",
                  "C_r",
                  heat_transfer,
                  2,
                  {catalog_form{"C_r = C_min/C_max", {{min_heat_capacity_rate, 1}, {max_heat_capacity_rate, -1}}}},
                  "Incropera et al., Fundamentals of Heat and Mass Transfer, ch. 11, ε-NTU method (from memory)"},
    catalog_entry{"viscosity ratio (Sieder-Tate)",
                  "mu/mu_w",
                  heat_transfer,
                  2,
                  {catalog_form{"μ/μ_w", {{dynamic_viscosity, 1}, {wall_viscosity, -1}}}},
                  "Sieder & Tate (1936) correlation, as given in Incropera et al., ch. 8 (from memory)",
                  "μ at the mean fluid temperature, μ_w at the wall temperature"},
    // ---- mass transfer ----------------------------------------------------------------
    catalog_entry{"Sherwood number",
                  "Sh",
                  mass_transfer,
                  1,
                  {catalog_form{"Sh = k_mL/D_AB",
                                {{mass_transfer_coefficient, 1}, {characteristic_length, 1}, {mass_diffusivity, -1}}}},
                  "ISO 80000-11:2019 (mass-transfer Nusselt number, from memory); Incropera et al., ch. 6 (from "
                  "memory)"},
    catalog_entry{
        "Damköhler number",
        "Da",
        mass_transfer,
        1,
        {catalog_form{"Da = k_rL/U", {{reaction_rate_constant, 1}, {characteristic_length, 1}, {velocity, -1}}}},
        "common practice (chemical reaction engineering; first Damköhler number), from memory"},
    catalog_entry{"mass-transfer Péclet number",
                  "Pe_m",
                  mass_transfer,
                  2,
                  {catalog_form{"Pe_m = UL/D_AB", {{velocity, 1}, {characteristic_length, 1}, {mass_diffusivity, -1}}}},
                  "ISO 80000-11:2019 (from memory); Bird, Stewart & Lightfoot, Transport Phenomena (Pe = Re Sc, from "
                  "memory)"},
    catalog_entry{"mass-transfer Stanton number",
                  "St_m",
                  mass_transfer,
                  2,
                  {catalog_form{"St_m = k_m/U", {{mass_transfer_coefficient, 1}, {velocity, -1}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 6 (from memory)"},
    catalog_entry{"mass-transfer Fourier number",
                  "Fo_m",
                  mass_transfer,
                  2,
                  {catalog_form{"Fo_m = D_ABt/L²", {{mass_diffusivity, 1}, {time, 1}, {characteristic_length, -2}}}},
                  "ISO 80000-11:2019 (from memory); Incropera et al., ch. 14 (from memory)"},
    catalog_entry{"second Damköhler number",
                  "Da_II",
                  mass_transfer,
                  2,
                  {catalog_form{"Da_II = k_rL²/D_AB",
                                {{reaction_rate_constant, 1}, {characteristic_length, 2}, {mass_diffusivity, -1}}}},
                  "common practice (reaction with diffusion; the square of the Thiele modulus), from memory"},
    // ---- magnetohydrodynamics ---------------------------------------------------------
    catalog_entry{"Hartmann number",
                  "Ha",
                  magnetohydrodynamics,
                  1,
                  {catalog_form{"Ha = BL√(σ/μ)",
                                {{magnetic_flux_density, 1},
                                 {characteristic_length, 1},
                                 {electrical_conductivity, half},
                                 {dynamic_viscosity, -half}}}},
                  "ISO 80000-11:2019 (from memory); common practice (magnetohydrodynamics)"},
    catalog_entry{
        "magnetic Reynolds number",
        "Rm",
        magnetohydrodynamics,
        1,
        {catalog_form{
            "Rm = μ₀σUL",
            {{magnetic_permeability, 1}, {electrical_conductivity, 1}, {velocity, 1}, {characteristic_length, 1}}}},
        "ISO 80000-11:2019 (from memory); common practice (magnetohydrodynamics)"},
    catalog_entry{"Stuart number (magnetic interaction parameter)",
                  "Stu",
                  magnetohydrodynamics,
                  2,
                  {catalog_form{"N = σB²L/(ρU)",
                                {{electrical_conductivity, 1},
                                 {magnetic_flux_density, 2},
                                 {characteristic_length, 1},
                                 {density, -1},
                                 {velocity, -1}}}},
                  "ISO 80000-11:2019 (from memory); common practice (N = Ha²/Re)"},
};

}  // namespace detail::catalog_data

/// \brief Every entry of the catalog, in order of preference (see `catalog_entry::tier`).
inline constexpr const auto& catalog = detail::catalog_data::table;

/// Number of entries.
inline constexpr std::size_t catalog_size = detail::catalog_data::table.size();

/// \brief The entry whose symbol or name is `key` ("Re" or "Reynolds number"), or null.
[[nodiscard]] constexpr const catalog_entry* find_catalog_entry(std::string_view key) noexcept {
  for (const auto& e : catalog)
    if (e.symbol == key || e.name == key) return &e;
  return nullptr;
}

/// \brief Index of the entry whose symbol or name is `key`, or `catalog_size`.
[[nodiscard]] constexpr std::size_t catalog_index(std::string_view key) noexcept {
  for (std::size_t i = 0; i < catalog_size; ++i)
    if (catalog[i].symbol == key || catalog[i].name == key) return i;
  return catalog_size;
}

}  // namespace nondim
