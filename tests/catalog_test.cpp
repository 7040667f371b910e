// Tests of nondim/analysis/names/catalog.hpp and quantity_kind.hpp: every entry of the catalog
// against its definition in ISO 80000-11:2019 or the handbook its `source` names (White,
// Fluid Mechanics; Incropera et al., Fundamentals of Heat and Mass Transfer; Bird, Stewart &
// Lightfoot, Transport Phenomena). Definitions below are from memory unless said otherwise.
#include <nondim/analysis/names/catalog.hpp>
#include <nondim/analysis/names/recognize.hpp>
#include <nondim/solver/core/dims.hpp>
#include <nondim/solver/core/format.hpp>

#include <doctest/doctest.h>

#include <algorithm>
#include <numeric>
#include <set>
#include <string>
#include <vector>

using namespace nondim;

namespace {

constexpr bool all_forms_dimensionless() {
  for (const auto& e : catalog)
    for (const auto& f : e.view())
      if (!f.product_dimension().is_dimensionless()) return false;
  return true;
}

constexpr bool all_exponents_nonzero_and_kinds_distinct() {
  for (const auto& e : catalog)
    for (const auto& f : e.view())
      for (std::size_t i = 0; i < f.size; ++i) {
        if (f.factors[i].exponent.is_zero() || f.factors[i].kind == quantity_kind::unspecified) return false;
        for (std::size_t j = i + 1; j < f.size; ++j)
          if (f.factors[i].kind == f.factors[j].kind) return false;
      }
  return true;
}

constexpr bool every_parent_has_the_same_dimension() {
  for (const auto& k : quantity_kinds)
    if (k.parent != quantity_kind::unspecified && !(kind_info(k.parent).dim == k.dim)) return false;
  return true;
}

}  // namespace

// A characteristic number is a quantity of dimension one (ISO 80000-11:2019, scope, from
// memory): the factors of every form multiply to a dimensionless product, exactly.
static_assert(all_forms_dimensionless());
static_assert(all_exponents_nonzero_and_kinds_distinct());
static_assert(every_parent_has_the_same_dimension());
static_assert(catalog_size >= 35);
static_assert(find_catalog_entry("Re") != nullptr && find_catalog_entry("Reynolds number") == find_catalog_entry("Re"));
static_assert(find_catalog_entry("no such number") == nullptr);
static_assert(is_same_or_general(quantity_kind::characteristic_length, quantity_kind::diameter));
static_assert(!is_same_or_general(quantity_kind::diameter, quantity_kind::characteristic_length));
static_assert(is_same_or_general(quantity_kind::thermal_conductivity, quantity_kind::solid_thermal_conductivity));

TEST_SUITE("catalog") {
  TEST_CASE("every form of every entry multiplies to a dimensionless product") {
    // source of each definition: the entry's `source` field (ISO 80000-11:2019 or a handbook)
    for (const auto& e : catalog)
      for (const auto& f : e.view()) {
        INFO(e.symbol, ": ", f.formula, " (", e.source, ")");
        CHECK(f.product_dimension() == dims::dimensionless);
      }
  }

  TEST_CASE("a problem built from the factors of each form is recognised as that entry with power 1") {
    // source of each definition: the entry's `source` field (ISO 80000-11:2019 or a handbook)
    for (std::size_t e = 0; e < catalog_size; ++e) {
      for (std::size_t fi = 0; fi < catalog[e].form_count; ++fi) {
        const catalog_form& f = catalog[e].forms[fi];
        INFO(catalog[e].symbol, ": ", f.formula);
        std::vector<std::string> names;
        std::vector<group_variable> vars;
        std::vector<rational> exps;
        for (const auto& factor : f.view()) names.emplace_back(factor.role());
        for (std::size_t i = 0; i < f.size; ++i) {
          vars.push_back({names[i], f.factors[i].dim(), f.factors[i].kind});
          exps.push_back(f.factors[i].exponent);
        }
        const auto matches = recognize(vars, exps);
        const auto it =
            std::find_if(matches.begin(), matches.end(), [&](const catalog_match& m) { return m.entry == e; });
        REQUIRE(it != matches.end());
        CHECK(it->power == rational{1});
        CHECK(it->form == fi);
        CHECK(it->consistent);
        // the same group with integer exponents: power = the factor that clears denominators
        std::vector<std::int64_t> ints;
        std::int64_t l = 1;
        for (const auto& x : exps) l = std::lcm(l, x.den);
        for (const auto& x : exps) ints.push_back(x.num * (l / x.den));
        const auto int_matches = recognize(vars, ints);
        const auto jt =
            std::find_if(int_matches.begin(), int_matches.end(), [&](const catalog_match& m) { return m.entry == e; });
        REQUIRE(jt != int_matches.end());
        CHECK(jt->power == rational{l});
      }
    }
  }

  TEST_CASE("textbook definitions are recognised as the catalog entry they define") {
    struct var {
      const char* name;
      dimension dim;
      rational exponent;
    };
    struct row {
      const char* symbol;
      rational power;  // the group as the textbook writes it = catalog entry^power
      std::vector<var> vars;
      const char* shares_form_with = nullptr;  // an entry of identical form that may rank first
    };
    const dimension dsigma_dT = dims::surface_tension / dims::temperature;
    const std::vector<row> rows{
        // White, Fluid Mechanics, table 5.2 (from memory): Re = rho V L / mu
        {"Re",
         1,
         {{"rho", dims::density, 1},
          {"V", dims::velocity, 1},
          {"L", dims::length, 1},
          {"mu", dims::dynamic_viscosity, -1}}},
        // Incropera et al., ch. 6 (from memory): Re_D = V D / nu
        {"Re", 1, {{"V", dims::velocity, 1}, {"D", dims::length, 1}, {"nu", dims::kinematic_viscosity, -1}}},
        // White, ch. 11 (from memory): pump Reynolds number rho n D^2 / mu
        {"Re",
         1,
         {{"rho", dims::density, 1},
          {"n", dims::frequency, 1},
          {"D", dims::length, 2},
          {"mu", dims::dynamic_viscosity, -1}}},
        // ISO 80000-11:2019 (from memory): Eu = dp / (rho v^2)
        {"Eu", 1, {{"dp", dims::pressure, 1}, {"rho", dims::density, -1}, {"v", dims::velocity, -2}}},
        // White, table 5.2 (from memory): Froude number V^2/(g L), the square of ISO's v/sqrt(l g)
        {"Fr", 2, {{"V", dims::velocity, 2}, {"g", dims::acceleration, -1}, {"L", dims::length, -1}}},
        // White, table 5.2 (from memory): We = rho V^2 L / Upsilon
        {"We",
         1,
         {{"rho", dims::density, 1},
          {"V", dims::velocity, 2},
          {"L", dims::length, 1},
          {"sigma", dims::surface_tension, -1}}},
        // White, table 5.2 (from memory): Ma = V / a
        {"Ma", 1, {{"V", dims::velocity, 1}, {"a", dims::velocity, -1}}},
        // White, table 5.2 (from memory): Strouhal omega L / V
        {"Sr", 1, {{"omega", dims::frequency, 1}, {"L", dims::length, 1}, {"V", dims::velocity, -1}}},
        // White, ch. 1 (from memory): Kn = lambda / L
        {"Kn", 1, {{"lambda", dims::length, 1}, {"L", dims::length, -1}}},
        // White, table 5.2 (from memory): drag coefficient D / (1/2 rho V^2 A)
        {"C_D",
         1,
         {{"F_D", dims::force, 1}, {"rho", dims::density, -1}, {"V", dims::velocity, -2}, {"A", dims::area, -1}}},
        // White, table 5.2 (from memory): lift coefficient L / (1/2 rho V^2 A)
        {"C_L",
         1,
         {{"F_L", dims::force, 1}, {"rho", dims::density, -1}, {"V", dims::velocity, -2}, {"A", dims::area, -1}}},
        // White, ch. 11 (from memory): C_Q = Q/(n D^3), C_H = gH/(n^2 D^2), C_P = P/(rho n^3 D^5)
        {"C_Q", 1, {{"Q", dims::volume_flow_rate, 1}, {"n", dims::frequency, -1}, {"D", dims::length, -3}}},
        {"C_H", 1, {{"gH", dims::specific_energy, 1}, {"n", dims::frequency, -2}, {"D", dims::length, -2}}},
        {"C_H",
         1,
         {{"g", dims::acceleration, 1}, {"H", dims::length, 1}, {"n", dims::frequency, -2}, {"D", dims::length, -2}}},
        {"C_P",
         1,
         {{"P", dims::power, 1}, {"rho", dims::density, -1}, {"n", dims::frequency, -3}, {"D", dims::length, -5}}},
        // White, ch. 11 (from memory): specific speed n Q^(1/2) / (gH)^(3/4); to the 4th: n^4 Q^2 / (gH)^3
        {"N_s", 4, {{"n", dims::frequency, 4}, {"Q", dims::volume_flow_rate, 2}, {"gH", dims::specific_energy, -3}}},
        // White, ch. 6, flow meters (from memory): Q = C_d A sqrt(2 dp / rho); squared: Q^2 rho / (dp d^4)
        {"C_d",
         2,
         {{"Q", dims::volume_flow_rate, 2},
          {"rho", dims::density, 1},
          {"dp", dims::pressure, -1},
          {"d", dims::length, -4}}},
        // White, table 5.2 (from memory): roughness ratio epsilon / L
        {"eps/D", 1, {{"eps", dims::length, 1}, {"D", dims::length, -1}}},
        // common practice, no source: Ca = mu U / sigma
        {"Ca", 1, {{"mu", dims::dynamic_viscosity, 1}, {"U", dims::velocity, 1}, {"sigma", dims::surface_tension, -1}}},
        // common practice (from memory): Oh = mu / sqrt(rho sigma L); squared: mu^2 / (rho sigma L)
        {"Oh",
         2,
         {{"mu", dims::dynamic_viscosity, 2},
          {"rho", dims::density, -1},
          {"sigma", dims::surface_tension, -1},
          {"L", dims::length, -1}}},
        // Incropera et al., ch. 10 (from memory): Bo = g (rho_l - rho_v) L^2 / sigma
        {"Bo",
         1,
         {{"g", dims::acceleration, 1},
          {"drho", dims::density, 1},
          {"L", dims::length, 2},
          {"sigma", dims::surface_tension, -1}}},
        // common practice (from memory): Womersley R sqrt(omega/nu); squared: R^2 omega / nu
        {"Wo", 2, {{"R", dims::length, 2}, {"omega", dims::frequency, 1}, {"nu", dims::kinematic_viscosity, -1}}},
        // common practice (from memory): Dean number Re (D/(2 R_c))^(1/2)
        {"Dn",
         1,
         {{"rho", dims::density, 1},
          {"U", dims::velocity, 1},
          {"D", dims::length, rational{3, 2}},
          {"mu", dims::dynamic_viscosity, -1},
          {"R_c", dims::length, rational{-1, 2}}}},
        // White, table 5.2 (from memory): Rossby V / (Omega L), Omega the rotation rate of the
        // Earth (a rotor's Omega makes the inverse tip-speed ratio instead; DESIGN.md)
        {"Ro", 1, {{"V", dims::velocity, 1}, {"Omega_E", dims::angular_velocity, -1}, {"L", dims::length, -1}}},
        // common practice (from memory): Ekman nu / (Omega L^2)
        {"Ek",
         1,
         {{"nu", dims::kinematic_viscosity, 1}, {"Omega", dims::angular_velocity, -1}, {"L", dims::length, -2}}},
        // common practice (from memory): Deborah lambda / t; Weissenberg lambda U / L
        {"De", 1, {{"lambda", dims::time, 1}, {"t", dims::time, -1}}},
        {"Wi", 1, {{"lambda", dims::time, 1}, {"U", dims::velocity, 1}, {"L", dims::length, -1}}},
        // White, ch. 5 (from memory): Cauchy rho V^2 / K
        {"Cy", 1, {{"rho", dims::density, 1}, {"V", dims::velocity, 2}, {"K", dims::bulk_modulus, -1}}},
        // White, ch. 6 (from memory): Darcy f = (dp/L) 2d/(rho V^2)
        {"f_D",
         1,
         {{"dp", dims::pressure, 1},
          {"d", dims::length, 1},
          {"rho", dims::density, -1},
          {"V", dims::velocity, -2},
          {"L", dims::length, -1}}},
        // White, table 5.2 (from memory): skin friction coefficient tau_wall / (rho V^2/2)
        {"c_f", 1, {{"tau_w", dims::stress, 1}, {"rho", dims::density, -1}, {"V", dims::velocity, -2}}},
        // White, table 5.2 (from memory): pressure coefficient (p - p_inf) / (rho V^2/2)
        {"C_p", 1, {{"p", dims::pressure, 1}, {"rho", dims::density, -1}, {"V", dims::velocity, -2}}, "Eu"},
        // common practice (from memory): Galilei g L^3 / nu^2; Archimedes g L^3 rho (rho_p - rho) / mu^2
        {"Ga", 1, {{"g", dims::acceleration, 1}, {"L", dims::length, 3}, {"nu", dims::kinematic_viscosity, -2}}},
        {"Ar",
         1,
         {{"g", dims::acceleration, 1},
          {"L", dims::length, 3},
          {"rho", dims::density, 1},
          {"drho", dims::density, 1},
          {"mu", dims::dynamic_viscosity, -2}}},
        // common practice (from memory): Morton g mu^4 drho / (rho^2 sigma^3)
        {"Mo",
         1,
         {{"g", dims::acceleration, 1},
          {"mu", dims::dynamic_viscosity, 4},
          {"drho", dims::density, 1},
          {"rho", dims::density, -2},
          {"sigma", dims::surface_tension, -3}}},
        // common practice (from memory): Taylor 4 Omega^2 L^4 / nu^2
        {"Ta",
         1,
         {{"Omega", dims::angular_velocity, 2}, {"L", dims::length, 4}, {"nu", dims::kinematic_viscosity, -2}},
         "Ek"},  // the same form as Ek^-2
        // Incropera et al., ch. 9 (from memory): Gr / Re^2 = g beta dT L / V^2
        {"Ri",
         1,
         {{"g", dims::acceleration, 1},
          {"beta", dims::thermal_expansion_coefficient, 1},
          {"dT", dims::temperature, 1},
          {"L", dims::length, 1},
          {"V", dims::velocity, -2}}},
        // common practice (from memory): Stokes number tau_p U / L; Bingham tau_y L / (mu U)
        {"Stk", 1, {{"tau_p", dims::time, 1}, {"U", dims::velocity, 1}, {"L", dims::length, -1}}},
        {"Bn",
         1,
         {{"tau_y", dims::stress, 1},
          {"L", dims::length, 1},
          {"mu", dims::dynamic_viscosity, -1},
          {"U", dims::velocity, -1}}},
        // Incropera et al., ch. 6 (from memory): Nu = h L / k_f
        {"Nu",
         1,
         {{"h", dims::heat_transfer_coefficient, 1}, {"L", dims::length, 1}, {"k", dims::thermal_conductivity, -1}}},
        // Incropera et al., ch. 5 (from memory): Bi = h L_c / k (of the solid)
        {"Bi",
         1,
         {{"h", dims::heat_transfer_coefficient, 1},
          {"L_c", dims::length, 1},
          {"k_s", dims::thermal_conductivity, -1}}},
        // Incropera et al., ch. 5 (from memory): Fo = alpha t / L^2
        {"Fo", 1, {{"alpha", dims::thermal_diffusivity, 1}, {"t", dims::time, 1}, {"L", dims::length, -2}}},
        // Incropera et al., ch. 5 (from memory): the same with alpha = k/(rho c_p), Fo = k t/(rho c_p L^2)
        {"Fo",
         1,
         {{"k", dims::thermal_conductivity, 1},
          {"t", dims::time, 1},
          {"rho", dims::density, -1},
          {"c_p", dims::specific_heat_capacity, -1},
          {"L", dims::length, -2}}},
        // White, table 5.2 (from memory): Grashof beta dT g L^3 rho^2 / mu^2
        {"Gr",
         1,
         {{"beta", dims::thermal_expansion_coefficient, 1},
          {"dT", dims::temperature, 1},
          {"g", dims::acceleration, 1},
          {"L", dims::length, 3},
          {"rho", dims::density, 2},
          {"mu", dims::dynamic_viscosity, -2}}},
        // White, table 5.2 (from memory): Rayleigh beta dT g L^3 rho^2 cp / (mu k)
        {"Ra",
         1,
         {{"beta", dims::thermal_expansion_coefficient, 1},
          {"dT", dims::temperature, 1},
          {"g", dims::acceleration, 1},
          {"L", dims::length, 3},
          {"rho", dims::density, 2},
          {"cp", dims::specific_heat_capacity, 1},
          {"mu", dims::dynamic_viscosity, -1},
          {"k", dims::thermal_conductivity, -1}}},
        // Incropera et al., ch. 9 (from memory): Ra = g beta dT L^3 / (nu alpha)
        {"Ra",
         1,
         {{"g", dims::acceleration, 1},
          {"beta", dims::thermal_expansion_coefficient, 1},
          {"dT", dims::temperature, 1},
          {"L", dims::length, 3},
          {"nu", dims::kinematic_viscosity, -1},
          {"alpha", dims::thermal_diffusivity, -1}}},
        // Incropera et al., ch. 6 (from memory): Ec = V^2 / (cp dT)
        {"Ec", 1, {{"V", dims::velocity, 2}, {"cp", dims::specific_heat_capacity, -1}, {"dT", dims::temperature, -1}}},
        // Incropera et al., ch. 10 (from memory): Ja = cp dT / h_fg
        {"Ja",
         1,
         {{"cp", dims::specific_heat_capacity, 1},
          {"dT", dims::temperature, 1},
          {"h_fg", dims::specific_enthalpy, -1}}},
        // common practice (from memory): Marangoni (dsigma/dT) dT L / (mu alpha)
        {"Mg",
         1,
         {{"dsigma_dT", dsigma_dT, 1},
          {"dT", dims::temperature, 1},
          {"L", dims::length, 1},
          {"mu", dims::dynamic_viscosity, -1},
          {"alpha", dims::thermal_diffusivity, -1}}},
        // Incropera et al., ch. 6 (from memory): Pe = V L / alpha; St = h / (rho V cp)
        {"Pe", 1, {{"V", dims::velocity, 1}, {"L", dims::length, 1}, {"alpha", dims::thermal_diffusivity, -1}}},
        {"St",
         1,
         {{"h", dims::heat_transfer_coefficient, 1},
          {"rho", dims::density, -1},
          {"V", dims::velocity, -1},
          {"cp", dims::specific_heat_capacity, -1}}},
        // common practice (from memory): Brinkman mu V^2 / (k dT)
        {"Br",
         1,
         {{"mu", dims::dynamic_viscosity, 1},
          {"V", dims::velocity, 2},
          {"k", dims::thermal_conductivity, -1},
          {"dT", dims::temperature, -1}}},
        // Incropera et al., ch. 8 (from memory): Gz = (D/x) Re_D Pr = u_m D^2 / (alpha x)
        {"Gz",
         1,
         {{"u_m", dims::velocity, 1},
          {"D", dims::length, 2},
          {"alpha", dims::thermal_diffusivity, -1},
          {"x", dims::length, -1}}},
        // common practice (from memory): Stefan cp dT / h_sf; Gebhart g beta L / cp
        {"Ste",
         1,
         {{"cp", dims::specific_heat_capacity, 1},
          {"dT", dims::temperature, 1},
          {"h_sf", dims::specific_enthalpy, -1}}},
        {"Ge",
         1,
         {{"g", dims::acceleration, 1},
          {"beta", dims::thermal_expansion_coefficient, 1},
          {"L", dims::length, 1},
          {"cp", dims::specific_heat_capacity, -1}}},
        // Incropera et al., ch. 6 (from memory): j_H = St Pr^(2/3)
        {"j_H",
         1,
         {{"h", dims::heat_transfer_coefficient, 1},
          {"rho", dims::density, -1},
          {"V", dims::velocity, -1},
          {"cp", dims::specific_heat_capacity, rational{-1, 3}},
          {"mu", dims::dynamic_viscosity, rational{2, 3}},
          {"k", dims::thermal_conductivity, rational{-2, 3}}}},
        // Incropera et al., ch. 6 (from memory): Pr = cp mu / k; Sc = nu / D_AB; Le = alpha / D_AB
        {"Pr",
         1,
         {{"cp", dims::specific_heat_capacity, 1},
          {"mu", dims::dynamic_viscosity, 1},
          {"k", dims::thermal_conductivity, -1}}},
        {"Sc", 1, {{"nu", dims::kinematic_viscosity, 1}, {"D_AB", dims::mass_diffusivity, -1}}},
        {"Le", 1, {{"alpha", dims::thermal_diffusivity, 1}, {"D_AB", dims::mass_diffusivity, -1}}},
        // Incropera et al., ch. 6 (from memory): Sh = h_m L / D_AB; St_m = h_m / V
        {"Sh",
         1,
         {{"h_m", dims::mass_transfer_coefficient, 1}, {"L", dims::length, 1}, {"D_AB", dims::mass_diffusivity, -1}}},
        {"St_m", 1, {{"h_m", dims::mass_transfer_coefficient, 1}, {"V", dims::velocity, -1}}},
        // Bird, Stewart & Lightfoot (from memory): Pe_AB = Re Sc = v L / D_AB
        {"Pe_m", 1, {{"v", dims::velocity, 1}, {"L", dims::length, 1}, {"D_AB", dims::mass_diffusivity, -1}}},
        // Incropera et al., ch. 14 (from memory): Fo_m = D_AB t / L^2
        {"Fo_m", 1, {{"D_AB", dims::mass_diffusivity, 1}, {"t", dims::time, 1}, {"L", dims::length, -2}}},
        // common practice (from memory): Damkoehler k_r L / U and k_r L^2 / D_AB
        {"Da", 1, {{"k_r", dims::frequency, 1}, {"L", dims::length, 1}, {"U", dims::velocity, -1}}},
        {"Da_II", 1, {{"k_r", dims::frequency, 1}, {"L", dims::length, 2}, {"D_AB", dims::mass_diffusivity, -1}}},
        // common practice (from memory): Hartmann B L sqrt(sigma/mu); squared: B^2 L^2 sigma / mu
        {"Ha",
         2,
         {{"B", dims::magnetic_flux_density, 2},
          {"L", dims::length, 2},
          {"sigma", dims::electrical_conductivity, 1},
          {"mu", dims::dynamic_viscosity, -1}}},
        // common practice (from memory): Rm = mu_0 sigma U L; Stuart sigma B^2 L / (rho U)
        {"Rm",
         1,
         {{"mu_0", dims::permeability, 1},
          {"sigma", dims::electrical_conductivity, 1},
          {"U", dims::velocity, 1},
          {"L", dims::length, 1}}},
        {"Stu",
         1,
         {{"sigma", dims::electrical_conductivity, 1},
          {"B", dims::magnetic_flux_density, 2},
          {"L", dims::length, 1},
          {"rho", dims::density, -1},
          {"U", dims::velocity, -1}}},
        // Carlton, Marine Propellers and Propulsion, ch. 6 (from memory): K_T = T/(rho n^2 D^4),
        // K_Q = Q/(rho n^2 D^5), J = V_A/(n D)
        {"K_T",
         1,
         {{"T", dims::force, 1}, {"rho", dims::density, -1}, {"n", dims::frequency, -2}, {"D", dims::length, -4}}},
        {"K_Q",
         1,
         {{"Q", dims::torque, 1}, {"rho", dims::density, -1}, {"n", dims::frequency, -2}, {"D", dims::length, -5}}},
        {"J", 1, {{"V", dims::velocity, 1}, {"n", dims::frequency, -1}, {"D", dims::length, -1}}},
        // Manwell, McGowan & Rogers, Wind Energy Explained, ch. 3 (from memory): lambda = Omega R / U
        {"TSR", 1, {{"Omega", dims::angular_velocity, 1}, {"R", dims::length, 1}, {"U", dims::velocity, -1}}},
        // White, ch. 5 (from memory): cavitation number (p_a - p_v)/(rho V^2/2), the margin one variable
        {"Ca_v", 1, {{"dp_v", dims::pressure, 1}, {"rho", dims::density, -1}, {"V", dims::velocity, -2}}},
        // Incropera et al., ch. 11 (from memory): eps = q/q_max, NTU = UA/C_min, C_r = C_min/C_max
        {"eps_HX", 1, {{"q", dims::power, 1}, {"q_max", dims::power, -1}}},
        // UA and C = m_dot c_p in W/K (ISO 80000-5, thermal conductance), not J/K
        {"NTU", 1, {{"UA", thermal_conductance, 1}, {"C_min", thermal_conductance, -1}}},
        {"C_r", 1, {{"C_min", thermal_conductance, 1}, {"C_max", thermal_conductance, -1}}},
        // Incropera et al., ch. 8 (from memory): the Sieder-Tate factor (mu/mu_s)^0.14
        {"mu/mu_w", 1, {{"mu", dims::dynamic_viscosity, 1}, {"mu_s", dims::dynamic_viscosity, -1}}},
    };
    std::set<std::string> covered;
    for (const auto& r : rows) {
      std::string text = r.symbol;
      std::vector<group_variable> vars;
      std::vector<rational> exps;
      for (const auto& v : r.vars) {
        vars.push_back({v.name, v.dim, quantity_kind::unspecified});
        exps.push_back(v.exponent);
        text += std::string(" ") + v.name + "^" + to_string(v.exponent);
      }
      INFO(text);
      const auto matches = recognize(vars, exps);
      const auto it = std::find_if(matches.begin(), matches.end(), [&](const catalog_match& m) {
        return m.info().symbol == std::string_view{r.symbol};
      });
      REQUIRE(it != matches.end());
      CHECK(it->power == r.power);
      CHECK(it->consistent);
      // the conventional names make the intended entry the first match
      REQUIRE(!matches.empty());
      if (r.shares_form_with == nullptr)
        CHECK(matches.front().info().symbol == std::string_view{r.symbol});
      else
        CHECK(matches.front().info().symbol == std::string_view{r.shares_form_with});
      covered.insert(r.symbol);
    }
    // every entry has a textbook row
    for (const auto& e : catalog) {
      INFO(e.symbol);
      CHECK(covered.count(std::string(e.symbol)) == 1);
    }
  }

  TEST_CASE("the numbers the handbooks list are all in the catalog") {
    // ISO 80000-11:2019 and White / Incropera et al. / Bird, Stewart & Lightfoot (from memory)
    for (const char* s :
         {"Re", "Eu", "Fr", "We", "Ma", "Kn", "Sr", "Gr",  "Ra",  "Pr",  "Nu",  "Bi",  "Fo",  "Pe",  "St",  "Sc",
          "Sh", "Le", "Ec", "Ri", "Bo", "Ca", "Oh", "Wo",  "Dn",  "Ar",  "Ga",  "Stk", "Gz",  "Ja",  "De",  "Cy",
          "Wi", "Ro", "Ek", "Ta", "Mg", "Da", "Ha", "C_D", "C_L", "C_p", "C_P", "C_Q", "C_H", "C_d", "f_D", "c_f"}) {
      INFO(s);
      CHECK(find_catalog_entry(s) != nullptr);
    }
  }

  TEST_CASE("symbols and names are unique and every entry cites a source") {
    std::set<std::string_view> symbols;
    std::set<std::string_view> names;
    for (const auto& e : catalog) {
      INFO(e.symbol);
      CHECK(symbols.insert(e.symbol).second);
      CHECK(names.insert(e.name).second);
      CHECK(!e.source.empty());
      CHECK(e.form_count >= 1);
      CHECK((e.tier == 1 || e.tier == 2));
      CHECK(catalog_index(e.symbol) < catalog_size);
    }
  }

  TEST_CASE("the forms of one entry differ in the roles of their factors") {
    // two identical forms would be a duplicate (common practice, no source)
    for (const auto& e : catalog)
      for (std::size_t a = 0; a < e.form_count; ++a)
        for (std::size_t b = a + 1; b < e.form_count; ++b) {
          INFO(e.symbol, " forms ", a, " and ", b);
          std::multiset<std::pair<int, std::string>> da;
          std::multiset<std::pair<int, std::string>> db;
          for (const auto& f : e.forms[a].view()) da.insert({static_cast<int>(f.kind), to_string(f.exponent)});
          for (const auto& f : e.forms[b].view()) db.insert({static_cast<int>(f.kind), to_string(f.exponent)});
          CHECK(da != db);
        }
  }

  TEST_CASE("kinds that the dimension alone cannot tell apart share a dimension") {
    // the pairs that make characteristic numbers ambiguous (Incropera et al., ch. 5-6, from memory)
    CHECK(kind_info(quantity_kind::fluid_thermal_conductivity).dim ==
          kind_info(quantity_kind::solid_thermal_conductivity).dim);
    CHECK(kind_info(quantity_kind::kinematic_viscosity).dim == kind_info(quantity_kind::thermal_diffusivity).dim);
    CHECK(kind_info(quantity_kind::thermal_diffusivity).dim == kind_info(quantity_kind::mass_diffusivity).dim);
    CHECK(kind_info(quantity_kind::characteristic_length).dim == kind_info(quantity_kind::diameter).dim);
    // SI Brochure 9th ed., table 4: W/(m K) and m^2/s
    CHECK(kind_info(quantity_kind::solid_thermal_conductivity).dim == dims::thermal_conductivity);
    CHECK(kind_info(quantity_kind::mass_diffusivity).dim == dimension{2, 0, -1});
    for (const auto& k : quantity_kinds) {
      INFO(k.name);
      CHECK(kind_from_name(k.name) == k.kind);
      if (k.kind != quantity_kind::unspecified) CHECK(!k.names.empty());
    }
  }
}
