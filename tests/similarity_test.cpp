// Tests of nondim/similarity: planning a scale-model test from a prototype.
// Groups are written from their textbook definitions (drag coefficient F/(rho V^2 L^2),
// Reynolds number rho V L / mu, Froude number V/sqrt(g L) as V^2/(g L), Mach number V/c,
// the turbomachine flow, head and power coefficients), and every expected value comes from
// the textbook scaling formula it states, evaluated here independently of the solver.
#include <nondim/quantity.hpp>
#include <nondim/similarity.hpp>
#include <nondim/solver/groups/pi_groups.hpp>

#include <doctest/doctest.h>
#include <Eigen/Dense>  // the reference solution of one check is computed independently here

#include <cmath>
#include <cstdint>
#include <limits>
#include <optional>
#include <string>
#include <vector>

using namespace nondim;

namespace {

similarity_variable var(std::string name, std::string unit, double factor, std::optional<double> prototype,
                        std::optional<double> model = std::nullopt) {
  similarity_variable v;
  v.name = std::move(name);
  v.unit = std::move(unit);
  v.factor = factor;
  v.prototype = prototype;
  v.model = model;
  return v;
}

bool close(double a, double b, double rel = 1e-12) {
  return a == doctest::Approx(b).epsilon(rel);
}

// Fluid properties, from memory of the usual handbook tables (any consistent values would
// do: the checks compare the solver with the scaling formulas on the same numbers).
constexpr double rho_air_20C = 1.204;      // kg/m^3, air at 20 degC and 1 atm
constexpr double mu_air_20C = 1.825e-5;    // Pa s
constexpr double rho_water_20C = 998.2;    // kg/m^3
constexpr double mu_water_20C = 1.002e-3;  // Pa s
constexpr double rho_sea_15C = 1025.9;     // kg/m^3, sea water, 35 g/kg salinity
constexpr double mu_sea_15C = 1.22e-3;     // Pa s
constexpr double rho_fresh_15C = 999.1;    // kg/m^3, towing-tank fresh water
constexpr double mu_fresh_15C = 1.138e-3;  // Pa s
constexpr double g_n = 9.80665;            // m/s^2, standard acceleration of gravity (CGPM 1901; NIST SP 811)
constexpr double rho_isa_0 = 1.225;        // kg/m^3, ISA sea level
constexpr double mu_isa_0 = 1.789e-5;      // Pa s, ISA sea level
constexpr double a_isa_0 = 340.29;         // m/s, ISA sea level speed of sound

// Drag on a body: F, rho, V, L, mu. Groups: drag coefficient F/(rho V^2 L^2) and Reynolds
// number rho V L / mu (White, Fluid Mechanics, ch. 5; Fox & McDonald, ch. 7: from memory).
similarity_problem drag_problem() {
  similarity_problem p;
  p.dependent = "F";
  p.add(var("F", "N", 1.0, std::nullopt))
      .add(var("rho", "kg/m^3", 1.0, rho_air_20C, rho_water_20C))
      .add(var("V", "m/s", 1.0, 20.0))
      .add(var("L", "ft", units::ft.factor, 4.0, 1.0))
      .add(var("mu", "cP", units::cP.factor, mu_air_20C / 1e-3, mu_water_20C / 1e-3));
  p.add_group({1, -1, -2, -2, 0}, "C_D").add_group({0, 1, 1, 1, -1}, "Re");
  return p;
}

// Ship resistance: R, rho, V, L, mu, g. Groups: resistance coefficient, Froude number
// squared V^2/(g L) (integer exponents), Reynolds number.
similarity_problem ship_problem() {
  similarity_problem p;
  p.dependent = "R";
  p.add(var("R", "N", 1.0, std::nullopt))
      .add(var("rho", "kg/m^3", 1.0, rho_sea_15C, rho_fresh_15C))
      .add(var("V", "m/s", 1.0, 7.5))
      .add(var("L", "m", 1.0, 135.0, 4.5))  // 1:30 model
      .add(var("mu", "Pa*s", 1.0, mu_sea_15C, mu_fresh_15C))
      .add(var("g", "m/s^2", 1.0, g_n, g_n));
  p.add_group({1, -1, -2, -2, 0, 0}, "C_R").add_group({0, 0, 2, -1, 0, -1}, "Fr").add_group({0, 1, 1, 1, -1, 0}, "Re");
  return p;
}

// Aerodynamic force at speed: F, rho, V, L, mu, c. Groups: force coefficient, Reynolds
// number, Mach number V/c.
similarity_problem tunnel_problem() {
  similarity_problem p;
  p.dependent = "F";
  p.add(var("F", "N", 1.0, std::nullopt))
      .add(var("rho", "kg/m^3", 1.0, rho_isa_0, rho_isa_0))
      .add(var("V", "m/s", 1.0, 150.0))
      .add(var("L", "m", 1.0, 2.4, 0.3))  // 1:8 model
      .add(var("mu", "Pa*s", 1.0, mu_isa_0, mu_isa_0))
      .add(var("c", "m/s", 1.0, a_isa_0, a_isa_0));
  p.add_group({1, -1, -2, -2, 0, 0}, "C_F").add_group({0, 1, 1, 1, -1, 0}, "Re").add_group({0, 0, 1, 0, 0, -1}, "Ma");
  return p;
}

const group_plan& group(const similarity_plan& plan, const std::string& label) {
  for (const auto& g : plan.groups)
    if (g.label == label) return g;
  FAIL("no group " << label);
  return plan.groups.front();
}

// Every bad value names the variable, in what() and in variable().
void check_names(const similarity_problem& p, const std::string& name, const std::string& fragment) {
  bool thrown = false;
  try {
    (void)plan_similarity(p);
  } catch (const similarity_error& e) {
    thrown = true;
    CHECK(e.variable() == name);
    const std::string what = e.what();
    CHECK(what.rfind("nondim: ", 0) == 0);
    std::string quoted = "'";  // appended: `"'" + name` trips a false GCC 12 -Wrestrict at -O3
    quoted += name;
    quoted += "'";
    CHECK(what.find(quoted) != std::string::npos);
    CHECK_MESSAGE(what.find(fragment) != std::string::npos, what);
  }
  CHECK(thrown);
}

}  // namespace

TEST_SUITE("similarity") {
  TEST_CASE("a Reynolds-matched model in another fluid runs at V_m = V_p (rho_p/rho_m)(mu_m/mu_p)(L_p/L_m)") {
    const auto plan = plan_similarity(drag_problem());
    CHECK(plan.status == similarity_status::exact);
    CHECK(plan.unknowns == 1);
    CHECK(plan.rank == 1);
    CHECK(plan.free.empty());
    CHECK(plan.unmatched.empty());
    // White, Fluid Mechanics, sec. 5.5 / Fox & McDonald sec. 7.5 (from memory): equal Reynolds numbers.
    const double vm = 20.0 * (rho_air_20C / rho_water_20C) * (mu_water_20C / mu_air_20C) * (4.0 / 1.0);
    REQUIRE(plan.model("V"));
    CHECK(close(*plan.model("V"), vm));
    CHECK(plan.find("V")->source == model_source::found);
    CHECK(close(*plan.find("V")->ratio, vm / 20.0));
    CHECK(plan.find("rho")->source == model_source::given);

    // Group values are dimensionless, computed in SI: L in ft (0.3048 m, NIST SP 811 B.8),
    // mu in cP (1e-3 Pa s, NIST SP 811 B.8).
    const auto& re = group(plan, "Re");
    CHECK(close(*re.prototype, rho_air_20C * 20.0 * (4.0 * 0.3048) / mu_air_20C));
    CHECK(close(*re.model, *re.prototype));
    CHECK(re.matched);
    CHECK(re.text == "rho*V*L/mu");

    // Equal drag coefficients: F_p/F_m = (rho_p/rho_m)(V_p/V_m)^2(L_p/L_m)^2 (same sources).
    const auto& dep = plan.dependent;
    CHECK(dep.name == "F");
    CHECK(dep.exact);
    CHECK(dep.remark.empty());
    REQUIRE(dep.prototype_over_model);
    const double fp_over_fm = (rho_air_20C / rho_water_20C) * std::pow(20.0 / vm, 2) * std::pow(4.0, 2);
    CHECK(close(*dep.prototype_over_model, fp_over_fm));
    CHECK(dep.rule_exponents == std::vector<rational>{0, 1, 2, 2, 0});
    CHECK(dep.rule == "F_p/F_m = (rho_p/rho_m) * (V_p/V_m)^2 * (L_p/L_m)^2");
    CHECK(group(plan, "C_D").holds_dependent);
    CHECK_FALSE(group(plan, "C_D").prototype);
  }

  TEST_CASE("a measured model value is carried to the prototype by the scale-up factor") {
    auto p = drag_problem();
    p.variables[0].model = 12.5;  // N, measured on the model (an invented reading)
    const auto plan = plan_similarity(p);
    const double vm = 20.0 * (rho_air_20C / rho_water_20C) * (mu_water_20C / mu_air_20C) * 4.0;
    const double fp_over_fm = (rho_air_20C / rho_water_20C) * std::pow(20.0 / vm, 2) * 16.0;
    const auto* f = plan.find("F");
    REQUIRE(f->prototype);
    CHECK(f->source == model_source::measured);
    CHECK(close(*f->prototype, 12.5 * fp_over_fm));
    // the drag coefficient of the model: F/(rho V^2 L^2) in SI (L in ft, NIST SP 811 B.8)
    const auto& cd = group(plan, "C_D");
    REQUIRE(cd.model);
    CHECK(close(*cd.model, 12.5 / (rho_water_20C * vm * vm * 0.3048 * 0.3048)));
  }

  TEST_CASE("checked dimensions accept the textbook groups") {
    auto p = drag_problem();
    p.variables[0].dim = dims::force;
    p.variables[1].dim = dims::density;
    p.variables[2].dim = dims::velocity;
    p.variables[3].dim = dims::length;
    p.variables[4].dim = dims::dynamic_viscosity;
    CHECK(plan_similarity(p).status == similarity_status::exact);
  }

  TEST_CASE("a Froude-scaled ship model runs at V_m = V_p sqrt(L_m/L_p) and reports the Reynolds mismatch") {
    auto p = ship_problem();
    p.priority = {1};  // Fr
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::partial);
    CHECK(plan.priority_matched);
    // Froude scaling (White sec. 5.5; Fox & McDonald sec. 7.6, from memory).
    const double vm = 7.5 * std::sqrt(4.5 / 135.0);
    CHECK(close(*plan.model("V"), vm));
    CHECK(group(plan, "Fr").matched);
    CHECK(group(plan, "Fr").priority);
    // The Reynolds number of the model falls short: Re_m/Re_p = (rho_m/rho_p)(V_m/V_p)(L_m/L_p)(mu_p/mu_m).
    const auto& re = group(plan, "Re");
    CHECK_FALSE(re.matched);
    const double re_ratio = (rho_fresh_15C / rho_sea_15C) * (vm / 7.5) * (4.5 / 135.0) * (mu_sea_15C / mu_fresh_15C);
    CHECK(close(*re.ratio, re_ratio));
    CHECK(*re.ratio < 0.01);  // a 1:30 model: Re lower by about 30^1.5 (common practice, no source)
    CHECK(plan.unmatched == std::vector<std::string>{"Re"});
    // Resistance by Froude's law: R_p/R_m = (rho_p/rho_m) lambda^3, here marked approximate
    // (the frictional part scales with Re, not with Fr).
    const auto& dep = plan.dependent;
    REQUIRE(dep.prototype_over_model);
    CHECK(close(*dep.prototype_over_model, (rho_sea_15C / rho_fresh_15C) * std::pow(30.0, 3), 1e-10));
    CHECK_FALSE(dep.exact);
    CHECK(dep.remark.find("Re") != std::string::npos);
    const std::string text = to_text(plan);
    CHECK(text.find("partial") != std::string::npos);
    CHECK(text.find("skin-friction correction") != std::string::npos);
  }

  TEST_CASE("the scale-up factor of a Froude model has the GUM uncertainty of (rho_p/rho_m) lambda^3 (g_p/g_m)") {
    // Froude's law with V_m = V_p sqrt(L_m g_m / (L_p g_p)) gives R_p/R_m = (rho_p/rho_m)
    // (L_p/L_m)^3 (g_p/g_m) (White sec. 5.5, from memory); by GUM eq. 12 its relative standard
    // uncertainty is sqrt(u_rho_p^2 + u_rho_m^2 + 9 u_L_p^2 + 9 u_L_m^2 + u_g_p^2 + u_g_m^2) in
    // relative terms (JCGM 100:2008, 5.1.6: a product of powers). V_p drops out: it needs none.
    auto p = ship_problem();
    p.priority = {1};  // Fr
    p.variables[1].prototype_uncertainty = 2.0;
    p.variables[1].model_uncertainty = 0.5;
    p.variables[3].prototype_uncertainty = 0.5;
    p.variables[3].model_uncertainty = 0.005;
    p.variables[4].prototype_uncertainty = 0.02e-3;
    p.variables[4].model_uncertainty = 0.02e-3;
    p.variables[5].prototype_uncertainty = 0.001;
    p.variables[5].model_uncertainty = 0.001;
    p.variables[0].model = 52.0;
    p.variables[0].model_uncertainty = 0.4;
    const auto plan = plan_similarity(p);
    const double rel =
        std::sqrt(std::pow(2.0 / rho_sea_15C, 2) + std::pow(0.5 / rho_fresh_15C, 2) + 9 * std::pow(0.5 / 135.0, 2) +
                  9 * std::pow(0.005 / 4.5, 2) + 2 * std::pow(0.001 / g_n, 2));
    const double factor = (rho_sea_15C / rho_fresh_15C) * std::pow(30.0, 3);
    REQUIRE(plan.dependent.prototype_over_model_uncertainty);
    CHECK(close(*plan.dependent.prototype_over_model_uncertainty, factor * rel, 1e-8));
    CHECK(plan.dependent.lacking_uncertainty.empty());  // mu matters to no factor: Re is not matched
    // the predicted resistance adds the measured value's own: u(R_p)/R_p = sqrt(rel^2 + (0.4/52)^2)
    const auto& r_plan = *plan.find("R");
    REQUIRE(r_plan.prototype_uncertainty);
    CHECK(close(*r_plan.prototype_uncertainty, factor * 52.0 * std::sqrt(rel * rel + std::pow(0.4 / 52.0, 2)), 1e-8));
    CHECK(close(*plan.find("rho")->prototype_uncertainty, 2.0));
    CHECK(to_text(plan).find("(standard uncertainty ") != std::string::npos);
  }

  TEST_CASE("a factor that depends on a value without an uncertainty gets none, and says which") {
    auto p = ship_problem();
    p.priority = {1};
    p.variables[1].prototype_uncertainty = 2.0;  // rho_p only
    const auto plan = plan_similarity(p);
    CHECK_FALSE(plan.dependent.prototype_over_model_uncertainty);
    CHECK(plan.dependent.lacking_uncertainty ==
          std::vector<std::string>{"rho (model)", "L (prototype)", "L (model)", "g (prototype)", "g (model)"});
    CHECK(to_text(plan).find("no uncertainty for the factor: rho (model), L (prototype)") != std::string::npos);
    // none given at all: nothing to say
    const auto bare = plan_similarity(ship_problem());
    CHECK(bare.dependent.lacking_uncertainty.empty());
    CHECK_FALSE(bare.dependent.prototype_over_model_uncertainty);
  }

  TEST_CASE("an uncertainty without its value, negative or not finite is refused with the variable named") {
    auto p = ship_problem();
    p.variables[2].model_uncertainty = 0.1;  // V has no model value
    check_names(p, "V", "uncertainty of its model value but no model value");
    p = ship_problem();
    p.variables[1].prototype_uncertainty = -1.0;
    check_names(p, "rho", "must be a finite number >= 0");
    p = ship_problem();
    p.variables[1].model_uncertainty = std::numeric_limits<double>::infinity();
    check_names(p, "rho", "must be a finite number >= 0");
    p = ship_problem();
    p.variables[0].prototype_uncertainty = 1.0;  // the dependent variable has no prototype value
    check_names(p, "R", "uncertainty of its prototype value but no prototype value");
  }

  TEST_CASE("a group of given values alone is fixed, not a least-squares compromise") {
    // every model value given (the ship at its Froude speed): Re cannot match, and nothing was fitted
    auto p = ship_problem();
    p.variables[2].model = 7.5 * std::sqrt(4.5 / 135.0);
    const auto fixed = plan_similarity(p);
    REQUIRE(fixed.status == similarity_status::partial);
    for (const auto& n : fixed.notes) CHECK_MESSAGE(n.find("least-squares compromise") == std::string::npos, n);
    bool said = false;
    for (const auto& n : fixed.notes)
      said = said || n.find("Re cannot match: every value in it is given") != std::string::npos;
    CHECK(said);
    // the speed to find: Fr and Re share the mismatch, a compromise
    const auto shared = plan_similarity(ship_problem());
    bool compromise = false;
    for (const auto& n : shared.notes)
      compromise = compromise || n.find("least-squares compromise") != std::string::npos;
    CHECK(compromise);
  }

  TEST_CASE("without a priority list the conflicting groups share the mismatch in the least-squares sense") {
    const auto p = ship_problem();
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::partial);
    CHECK(plan.unmatched == std::vector<std::string>{"Fr", "Re"});
    // Normal equations by hand, s = ln(V_m/V_p): Fr's log-ratio is 2s - a with
    // a = ln(g_m/g_p) + ln(L_m/L_p); Re's is s - c with c = ln(mu_m/mu_p) - ln(rho_m/rho_p)
    // - ln(L_m/L_p). Minimising (2s - a)^2 + (s - c)^2 gives s = (2a + c)/5.
    const double a = std::log(4.5 / 135.0);
    const double c =
        std::log(mu_fresh_15C / mu_sea_15C) - std::log(rho_fresh_15C / rho_sea_15C) - std::log(4.5 / 135.0);
    const double s = (2.0 * a + c) / 5.0;
    CHECK(close(*plan.model("V"), 7.5 * std::exp(s)));
    CHECK(close(std::log(*group(plan, "Fr").ratio), 2.0 * s - a, 1e-10));
    CHECK(close(std::log(*group(plan, "Re").ratio), s - c, 1e-10));
  }

  TEST_CASE("groups from the compile-time classical basis give the same Froude plan") {
    // pi_exponents chooses L, V, rho as repeating variables and gives R/(rho V^2 L^2),
    // mu/(rho V L) = 1/Re and g L/V^2 = 1/Fr^2: another basis of the same groups, so the
    // plan must not change (Froude scaling, White sec. 5.5, from memory).
    constexpr auto e = pi_exponents<dims::force, dims::density, dims::velocity, dims::length, dims::dynamic_viscosity,
                                    dims::acceleration>();
    static_assert(e.size() == 3);
    auto p = ship_problem();
    p.groups.clear();
    std::size_t froude = e.size();
    for (std::size_t k = 0; k < e.size(); ++k) {
      p.add_group(std::vector<std::int64_t>(e[k].begin(), e[k].end()));
      if (e[k][5] != 0) froude = k;
    }
    REQUIRE(froude < e.size());
    p.priority = {froude};
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::partial);
    CHECK(close(*plan.model("V"), 7.5 * std::sqrt(4.5 / 135.0)));
    CHECK(close(*plan.dependent.prototype_over_model, (rho_sea_15C / rho_fresh_15C) * std::pow(30.0, 3), 1e-10));
    CHECK(plan.unmatched.size() == 1);
  }

  TEST_CASE("the priority list decides which group matches") {
    auto p = ship_problem();
    p.priority = {2};  // Re
    const auto plan = plan_similarity(p);
    // Equal Reynolds numbers: V_m = V_p (rho_p/rho_m)(mu_m/mu_p)(L_p/L_m) (White sec. 5.5, from memory).
    const double vm = 7.5 * (rho_sea_15C / rho_fresh_15C) * (mu_fresh_15C / mu_sea_15C) * 30.0;
    CHECK(close(*plan.model("V"), vm));
    CHECK(group(plan, "Re").matched);
    CHECK_FALSE(group(plan, "Fr").matched);
    // Fr_m/Fr_p = (V_m/V_p)^2 (L_p/L_m) with the same gravity
    CHECK(close(*group(plan, "Fr").ratio, std::pow(vm / 7.5, 2) * 30.0));
    CHECK(plan.priority_matched);
    CHECK(plan.unmatched == std::vector<std::string>{"Fr"});
  }

  TEST_CASE("priority groups that cannot match together are reported") {
    auto p = ship_problem();
    p.priority = {1, 2};
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::partial);
    CHECK_FALSE(plan.priority_matched);
    bool noted = false;
    for (const auto& n : plan.notes) noted = noted || n.find("priority groups cannot all match") != std::string::npos;
    CHECK(noted);
    // with every group a priority the solve is the plain least squares of the previous case
    const auto plain = plan_similarity(ship_problem());
    CHECK(close(*plan.model("V"), *plain.model("V"), 1e-10));
  }

  TEST_CASE("a wind tunnel cannot match Mach and Reynolds numbers in the same air at a smaller scale") {
    auto p = tunnel_problem();
    p.priority = {2};  // Ma
    auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::partial);
    // Equal Mach numbers in the same air: V_m = V_p c_m/c_p = V_p; then Re_m/Re_p = L_m/L_p.
    CHECK(close(*plan.model("V"), 150.0));
    CHECK(close(*group(plan, "Re").ratio, 0.3 / 2.4));
    CHECK(plan.unmatched == std::vector<std::string>{"Re"});

    p.priority = {1};  // Re
    plan = plan_similarity(p);
    // Equal Reynolds numbers: V_m = V_p L_p/L_m = 8 V_p, so Ma_m/Ma_p = 8: supersonic.
    CHECK(close(*plan.model("V"), 1200.0));
    CHECK(close(*group(plan, "Ma").ratio, 8.0));
    CHECK(plan.unmatched == std::vector<std::string>{"Ma"});
  }

  TEST_CASE("a pressurised tunnel matches both by raising the density") {
    // Common practice, no source: at the same temperature (same mu and c) a denser gas
    // recovers the Reynolds number at the prototype Mach number: rho_m = rho_p L_p/L_m.
    auto p = tunnel_problem();
    p.variables[1].model.reset();
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::exact);
    CHECK(close(*plan.model("V"), 150.0));
    CHECK(close(*plan.model("rho"), rho_isa_0 * 8.0));
    CHECK(plan.dependent.exact);
    // F_p/F_m = (rho_p/rho_m)(V_p/V_m)^2 (L_p/L_m)^2 = (1/8)(1)(64) = 8
    CHECK(close(*plan.dependent.prototype_over_model, 8.0));
  }

  TEST_CASE("pump affinity laws: flow, head and power coefficients matched at another speed and diameter") {
    // Affinity laws (White, Fluid Mechanics, ch. 11; Karassik, Pump Handbook, from memory):
    // Q ~ N D^3, gH ~ N^2 D^2, P ~ rho N^3 D^5 at equal flow, head and power coefficients.
    similarity_problem p;
    p.dependent = "P";
    p.add(var("P", "kW", 1e3, std::nullopt, 9.0))
        .add(var("Q", "m^3/h", 1.0 / 3600.0, 540.0))
        .add(var("gH", "J/kg", 1.0, 32.0 * g_n))  // 32 m of head
        .add(var("N", "rpm", units::rpm.factor, 1450.0, 2900.0))
        .add(var("D", "mm", 1e-3, 400.0, 250.0))
        .add(var("rho", "kg/m^3", 1.0, rho_water_20C, rho_water_20C));
    p.add_group({1, 0, 0, -3, -5, -1}, "C_P")
        .add_group({0, 1, 0, -1, -3, 0}, "C_Q")
        .add_group({0, 0, 1, -2, -2, 0}, "C_H");
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::exact);
    const double n_ratio = 2900.0 / 1450.0;
    const double d_ratio = 250.0 / 400.0;
    CHECK(close(*plan.model("Q"), 540.0 * n_ratio * std::pow(d_ratio, 3)));
    CHECK(close(*plan.model("gH"), 32.0 * g_n * n_ratio * n_ratio * d_ratio * d_ratio));
    // P_p/P_m = (rho_p/rho_m)(N_p/N_m)^3 (D_p/D_m)^5
    const double p_factor = std::pow(1.0 / n_ratio, 3) * std::pow(1.0 / d_ratio, 5);
    CHECK(close(*plan.dependent.prototype_over_model, p_factor));
    CHECK(close(*plan.find("P")->prototype, 9.0 * p_factor));
    CHECK(plan.dependent.rule == "P_p/P_m = (N_p/N_m)^3 * (D_p/D_m)^5 * (rho_p/rho_m)");
    // flow coefficient Q/(n D^3) in SI with n the rotational frequency in r/s (ISO 80000-3;
    // White, Fluid Mechanics, 7th ed., section 11.4, from memory: C_Q = Q/(n D^3), n in r/s): rpm is 1/60 s^-1
    const double n = 1450.0 / 60.0;
    CHECK(close(*group(plan, "C_Q").prototype, (540.0 / 3600.0) / (n * std::pow(0.4, 3))));
  }

  TEST_CASE("variables made from unit text carry factors and dimensions from the parser") {
    // The pump of the previous case, every unit read from text: the factors are those of
    // the unit table (ISO 80000-3 for rpm: a rotational frequency, 1/60 s^-1; SI Brochure
    // 9th ed. for h, kW and mm), and the dimensions let the groups be checked.
    similarity_problem p;
    p.dependent = "P";
    p.add(make_similarity_variable("P", "kW", std::nullopt, 9.0))
        .add(make_similarity_variable("Q", "m^3/h", 540.0))
        .add(make_similarity_variable("gH", "J/kg", 32.0 * g_n))
        .add(make_similarity_variable("N", "rpm", 1450.0, 2900.0))
        .add(make_similarity_variable("D", "mm", 400.0, 250.0))
        .add(make_similarity_variable("rho", "kg/m^3", rho_water_20C, rho_water_20C));
    CHECK(p.variables[1].factor == doctest::Approx(1.0 / 3600.0).epsilon(1e-15));
    CHECK(p.variables[1].dim == dims::volume / dims::time);
    p.add_group({1, 0, 0, -3, -5, -1}, "C_P")
        .add_group({0, 1, 0, -1, -3, 0}, "C_Q")
        .add_group({0, 0, 1, -2, -2, 0}, "C_H");
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::exact);
    CHECK(close(*plan.model("Q"), 540.0 * 2.0 * std::pow(250.0 / 400.0, 3)));
    const double n = 1450.0 / 60.0;  // r/s
    CHECK(close(*group(plan, "C_Q").prototype, (540.0 / 3600.0) / (n * std::pow(0.4, 3))));
    // a head coefficient written with the wrong power of D is caught
    p.groups[2].exponents = {0, 0, 1, -2, -1, 0};
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("is not dimensionless"), similarity_error);
    // a bad unit text is the parser's error, with its column
    CHECK_THROWS_AS(make_similarity_variable("x", "kg/m/s", 1.0), unit_error);
    // a thermometer reading is accepted as a variable but refused for scaling
    similarity_problem t;
    t.add(make_similarity_variable("q", "W/m^2")).add(make_similarity_variable("T", "degC", 80.0, 40.0));
    t.add_group({1, 0});
    CHECK(t.variables[1].offset == 273.15);  // SI Brochure 9th ed., 2.3.1: t/degC = T/K - 273.15
    CHECK_THROWS_WITH_AS(plan_similarity(t), doctest::Contains("'T' is in an affine unit"), similarity_error);
  }

  TEST_CASE("fan laws: the same fan at a lower speed in warmer air") {
    // Fan laws (ASHRAE Handbook, HVAC Systems and Equipment, Fans chapter, from memory):
    // Q ~ N D^3, dp ~ rho N^2 D^2, P ~ rho N^3 D^5.
    similarity_problem p;
    p.dependent = "P";
    p.add(var("P", "W", 1.0, std::nullopt))
        .add(var("Q", "m^3/s", 1.0, 2.5))
        .add(var("dp", "Pa", 1.0, 600.0))
        .add(var("N", "rpm", units::rpm.factor, 1800.0, 1440.0))
        .add(var("D", "m", 1.0, 0.63, 0.63))
        .add(var("rho", "kg/m^3", 1.0, 1.20, 0.95));
    p.add_group({1, 0, 0, -3, -5, -1}).add_group({0, 1, 0, -1, -3, 0}).add_group({0, 0, 1, -2, -2, -1});
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::exact);
    CHECK(close(*plan.model("Q"), 2.5 * 1440.0 / 1800.0));
    CHECK(close(*plan.model("dp"), 600.0 * (0.95 / 1.20) * std::pow(1440.0 / 1800.0, 2)));
    CHECK(close(*plan.dependent.prototype_over_model, (1.20 / 0.95) * std::pow(1800.0 / 1440.0, 3)));
    CHECK(plan.groups[2].text == "dp/(N^2*D^2*rho)");
  }

  TEST_CASE("an underdetermined plan lists the model values still to fix") {
    auto p = drag_problem();
    p.variables[3].model.reset();  // L free as well as V
    auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::underdetermined);
    CHECK(plan.unknowns == 2);
    CHECK(plan.rank == 1);
    CHECK(plan.free == std::vector<std::string>{"V"});
    CHECK(plan.find("V")->source == model_source::free);
    CHECK(plan.find("L")->source == model_source::undetermined);
    CHECK_FALSE(plan.model("V"));
    CHECK_FALSE(plan.model("L"));
    // Reynolds matching is still possible whatever V is chosen
    CHECK(group(plan, "Re").matched);
    CHECK_FALSE(plan.dependent.prototype_over_model);
    CHECK(plan.dependent.remark.find("still to be fixed") != std::string::npos);
    CHECK(to_text(plan).find("model values still to fix: V") != std::string::npos);

    // Fixing what was listed determines the rest: L_m = L_p (rho_p/rho_m)(mu_m/mu_p)(V_p/V_m).
    p.variables[2].model = 4.0;
    plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::exact);
    CHECK(close(*plan.model("L"), 4.0 * (rho_air_20C / rho_water_20C) * (mu_water_20C / mu_air_20C) * (20.0 / 4.0)));
  }

  TEST_CASE("a partly determined plan reports what it found and what is free") {
    // Mach fixes V_m = V_p c_m/c_p; Reynolds ties rho and L together.
    auto p = tunnel_problem();
    p.variables[1].model.reset();
    p.variables[3].model.reset();
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::underdetermined);
    CHECK(plan.free == std::vector<std::string>{"rho"});
    CHECK(plan.find("V")->source == model_source::found);
    CHECK(close(*plan.model("V"), 150.0));
    CHECK(plan.find("L")->source == model_source::undetermined);
    CHECK(group(plan, "Ma").matched);
    CHECK(group(plan, "Re").matched);
  }

  TEST_CASE("an underdetermined plan still reports a group that cannot match") {
    // The model speed is fixed below the Mach-matched one (V_m = V_p c_m/c_p, same air):
    // Ma cannot match whatever the density and size of the model.
    auto p = tunnel_problem();
    p.variables[1].model.reset();
    p.variables[2].model = 100.0;
    p.variables[3].model.reset();
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::underdetermined);
    CHECK(plan.unmatched == std::vector<std::string>{"Ma"});
    CHECK(close(*group(plan, "Ma").ratio, 100.0 / 150.0));
    CHECK(group(plan, "Re").matched);
    bool noted = false;
    for (const auto& n : plan.notes) noted = noted || n.find("Ma cannot match") != std::string::npos;
    CHECK(noted);
  }

  TEST_CASE("a model value beyond the range of double is reported, not thrown") {
    // x = y^1000 with y 10 times the prototype's: x would be 10^1000 times larger.
    similarity_problem p;
    p.add(var("F", "", 1.0, std::nullopt)).add(var("x", "", 1.0, 1.0)).add(var("y", "", 1.0, 1.0, 10.0));
    p.add_group({1, 1, 0}).add_group({0, 1, -1000});
    const auto plan = plan_similarity(p);
    CHECK(plan.status == similarity_status::exact);
    CHECK(std::isinf(*plan.model("x")));
    bool noted = false;
    for (const auto& n : plan.notes) noted = noted || n.find("beyond the range of double") != std::string::npos;
    CHECK(noted);
  }

  TEST_CASE("variables that appear only beside the dependent variable must be fixed") {
    // With no viscosity, drag on a body has the one group F/(rho V^2 L^2): nothing to match,
    // every model value is free (White sec. 5.3 style reasoning, common practice).
    similarity_problem p;
    p.add(var("F", "N", 1.0, std::nullopt))
        .add(var("rho", "kg/m^3", 1.0, 1.2))
        .add(var("V", "m/s", 1.0, 10.0))
        .add(var("L", "m", 1.0, 2.0));
    p.add_group({1, -1, -2, -2});
    const auto plan = plan_similarity(p);
    CHECK(plan.dependent.name == "F");  // the first variable when none is named
    CHECK(plan.status == similarity_status::underdetermined);
    CHECK(plan.free == std::vector<std::string>{"rho", "V", "L"});
    CHECK(plan.rank == 0);
  }

  TEST_CASE("a test with every model value fixed is checked rather than planned") {
    auto p = ship_problem();
    p.variables[2].model = 7.5 * std::sqrt(4.5 / 135.0);  // Froude speed
    const auto plan = plan_similarity(p);
    CHECK(plan.unknowns == 0);
    CHECK(plan.status == similarity_status::partial);
    CHECK(group(plan, "Fr").matched);
    CHECK_FALSE(group(plan, "Re").matched);
    // Same fluid, same scale: complete similarity (every ratio 1).
    auto q = drag_problem();
    q.variables[1].model = rho_air_20C;
    q.variables[2].model = 20.0;
    q.variables[3].model = 4.0;
    q.variables[4].model = mu_air_20C / 1e-3;
    const auto same = plan_similarity(q);
    CHECK(same.status == similarity_status::exact);
    CHECK(close(*same.dependent.prototype_over_model, 1.0));
  }

  TEST_CASE("a variable in no group is unused and a dependent variable in no group has no rule") {
    similarity_problem p;
    p.dependent = "T";
    p.add(var("F", "N", 1.0, 3.0))
        .add(var("rho", "kg/m^3", 1.0, 1.2, 1.2))
        .add(var("V", "m/s", 1.0, 10.0))
        .add(var("L", "m", 1.0, 2.0, 0.5))
        .add(var("T", "K", 1.0, std::nullopt));
    p.add_group({1, -1, -2, -2, 0});
    const auto plan = plan_similarity(p);
    CHECK(plan.find("T")->dependent);
    CHECK(plan.dependent.groups.empty());
    CHECK_FALSE(plan.dependent.rule_group);
    CHECK_FALSE(plan.dependent.prototype_over_model);
    CHECK_FALSE(plan.dependent.exact);
    CHECK(plan.dependent.remark.find("appears in no group") != std::string::npos);
    // F, rho, V, L: one group, F free-or-found; nothing fixes V and F together
    CHECK(plan.status == similarity_status::underdetermined);

    similarity_problem q = p;
    q.dependent = "F";
    q.variables[0].prototype.reset();
    q.variables[4].prototype = 300.0;
    const auto unused = plan_similarity(q);
    CHECK(unused.find("T")->source == model_source::unused);
    CHECK(unused.free == std::vector<std::string>{"V"});
  }

  TEST_CASE("a dependent variable in several groups is exact only when the groups agree") {
    // F/(rho V^2 L^2) and F/(mu V L): their quotient is Re^-1, an independent combination
    // (White sec. 5.3, alternative forms of the drag groups, from memory).
    similarity_problem p;
    p.add(var("F", "N", 1.0, std::nullopt))
        .add(var("rho", "kg/m^3", 1.0, rho_air_20C, rho_water_20C))
        .add(var("V", "m/s", 1.0, 20.0))
        .add(var("L", "m", 1.0, 1.2, 0.3))
        .add(var("mu", "Pa*s", 1.0, mu_air_20C, mu_water_20C));
    p.add_group({1, -1, -2, -2, 0}).add_group({1, 0, -1, -1, -1});
    // V at the Reynolds-matched speed (White sec. 5.5): both groups give the same factor
    const double vm = 20.0 * (rho_air_20C / rho_water_20C) * (mu_water_20C / mu_air_20C) * 4.0;
    p.variables[2].model = vm;
    auto plan = plan_similarity(p);
    CHECK(plan.dependent.groups == std::vector<std::size_t>{0, 1});
    REQUIRE(plan.dependent.factors_by_group.size() == 2);
    CHECK(close(*plan.dependent.factors_by_group[0], *plan.dependent.factors_by_group[1], 1e-10));
    CHECK(plan.dependent.exact);
    CHECK(plan.dependent.remark.find("appears in 2 groups") != std::string::npos);

    p.variables[2].model = 2.0 * vm;
    plan = plan_similarity(p);
    CHECK_FALSE(plan.dependent.exact);
    CHECK(plan.dependent.remark.find("different factors") != std::string::npos);
    // F/(mu V L) scales by (mu_p/mu_m)(V_p/V_m)(L_p/L_m)
    CHECK(close(*plan.dependent.factors_by_group[1], (mu_air_20C / mu_water_20C) * (20.0 / (2.0 * vm)) * 4.0));
  }

  TEST_CASE("the constrained least squares agrees with Eigen's solution of the KKT system") {
    // Seven unknown model values, six groups to match, two of them with priority: the
    // priority rows hold exactly and the rest minimise |A_R s - b_R|; the same optimum is
    // the solution of [A_R^T A_R, A_P^T; A_P, 0] [s; l] = [A_R^T b_R; b_P] (Lagrange
    // conditions), solved here by Eigen's FullPivLU.
    const std::vector<std::vector<std::int64_t>> rows{
        {0, 1, -1, 2, 0, 0, 1, -1, 0, 1, 0}, {0, 0, 2, 1, -1, 0, 0, 1, 1, 0, 0},  {0, 1, 0, 0, 1, -2, 1, 0, 0, 0, 1},
        {0, -1, 1, 0, 0, 1, 0, 2, 0, -1, 0}, {0, 0, 0, 1, 1, 1, -1, 0, 0, 1, 2},  {0, 2, -1, 0, 0, 0, 0, -1, 1, 0, 1},
        {0, 0, 1, 1, 0, 1, 1, 1, 0, 1, 0},   {0, 1, 1, 0, -1, 0, 0, 0, 2, 0, -1}, {0, 0, 0, 0, 1, 1, 0, 1, 0, 0, 1}};
    similarity_problem p;
    const std::vector<double> proto{0, 2.0, 0.5, 3.0, 1.5, 7.0, 0.2, 4.0, 1.1, 9.0, 0.7};
    const std::vector<std::optional<double>> model{std::nullopt, 1.0,          std::nullopt, 2.5,
                                                   std::nullopt, std::nullopt, std::nullopt, 0.9,
                                                   std::nullopt, std::nullopt, std::nullopt};
    p.add(var("y", "", 1.0, std::nullopt));
    for (std::size_t j = 1; j < proto.size(); ++j)
      p.add(var(std::string("x").append(std::to_string(j)), "", 1.0, proto[j], model[j]));
    p.add_group({1, 1, 0, 0, 0, 0, 0, 0, 0, 0, 0});
    for (std::size_t k = 0; k < 6; ++k) p.add_group(rows[k]);
    p.priority = {1, 4};
    const auto plan = plan_similarity(p);
    CHECK(plan.priority_matched);
    CHECK(plan.groups[1].matched);
    CHECK(plan.groups[4].matched);

    // the same problem by Lagrange multipliers
    std::vector<std::size_t> unknown;
    for (std::size_t j = 1; j < proto.size(); ++j)
      if (!model[j]) unknown.push_back(j);
    REQUIRE(plan.rank == 6);
    // underdetermined (7 unknowns, rank 6): compare the group ratios, which are the same
    // for every solution
    CHECK(plan.status == similarity_status::underdetermined);
    const auto f = static_cast<Eigen::Index>(unknown.size());
    auto fill = [&](const std::vector<std::size_t>& ks, Eigen::MatrixXd& a, Eigen::VectorXd& b) {
      a.resize(static_cast<Eigen::Index>(ks.size()), f);
      b.resize(static_cast<Eigen::Index>(ks.size()));
      for (std::size_t i = 0; i < ks.size(); ++i) {
        double known = 0;
        for (std::size_t j = 1; j < proto.size(); ++j)
          if (model[j]) known += static_cast<double>(rows[ks[i]][j]) * std::log(*model[j] / proto[j]);
        b(static_cast<Eigen::Index>(i)) = -known;
        for (std::size_t u = 0; u < unknown.size(); ++u)
          a(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(u)) = static_cast<double>(rows[ks[i]][unknown[u]]);
      }
    };
    Eigen::MatrixXd ap, ar;
    Eigen::VectorXd bp, br;
    fill({0, 3}, ap, bp);        // groups 1 and 4 of the problem are rows 0 and 3
    fill({1, 2, 4, 5}, ar, br);  // the others
    const Eigen::Index m = ap.rows();
    Eigen::MatrixXd kkt = Eigen::MatrixXd::Zero(f + m, f + m);
    kkt.topLeftCorner(f, f) = ar.transpose() * ar;
    kkt.topRightCorner(f, m) = ap.transpose();
    kkt.bottomLeftCorner(m, f) = ap;
    Eigen::VectorXd rhs(f + m);
    rhs << ar.transpose() * br, bp;
    // singular (rank-deficient in s) but consistent: any solution gives the same residuals
    const Eigen::VectorXd sol = kkt.fullPivLu().solve(rhs);
    REQUIRE((kkt * sol - rhs).norm() < 1e-9);
    const Eigen::VectorXd s = sol.head(f);
    const Eigen::VectorXd res_r = ar * s - br;
    CHECK((ap * s - bp).norm() < 1e-9);
    CHECK(std::log(*plan.groups[2].ratio) == doctest::Approx(res_r(0)).epsilon(1e-9));
    CHECK(std::log(*plan.groups[3].ratio) == doctest::Approx(res_r(1)).epsilon(1e-9));
    CHECK(std::log(*plan.groups[5].ratio) == doctest::Approx(res_r(2)).epsilon(1e-9));
    CHECK(std::log(*plan.groups[6].ratio) == doctest::Approx(res_r(3)).epsilon(1e-9));
  }

  TEST_CASE("the text report shows the tables, the scale-up rule and the cautions") {
    auto p = ship_problem();
    p.priority = {1};
    const std::string text = to_text(plan_similarity(p));
    CHECK(text.find("Similarity plan: partial") != std::string::npos);
    CHECK(text.find("variable  unit") != std::string::npos);
    CHECK(text.find("model/prototype") != std::string::npos);
    CHECK(text.find("Fr = V^2/(L*g)") != std::string::npos);
    CHECK(text.find("yes (priority)") != std::string::npos);
    CHECK(text.find("NO") != std::string::npos);
    CHECK(text.find("R_p/R_m = (rho_p/rho_m) * (V_p/V_m)^2 * (L_p/L_m)^2") != std::string::npos);
    CHECK(text.find("(approximate)") != std::string::npos);
    CHECK(text.find("necessary, not sufficient") != std::string::npos);
    CHECK(text.find("roughness") != std::string::npos);
    CHECK(text.find("compressibility") != std::string::npos);
    CHECK(text.find("instrumentation") != std::string::npos);
    CHECK(text.find("local codes and licensed") != std::string::npos);
    const std::string exact = to_text(plan_similarity(drag_problem()));
    CHECK(exact.find("(exact)") != std::string::npos);
    CHECK(exact.find("Partial similarity") == std::string::npos);
  }

  TEST_CASE("status and source names are the JSON spellings") {
    static_assert(to_string(similarity_status::exact) == "exact");
    static_assert(to_string(similarity_status::partial) == "partial");
    static_assert(to_string(similarity_status::underdetermined) == "underdetermined");
    static_assert(to_string(model_source::found) == "found");
    CHECK(to_string(model_source::free) == "free");
  }
}

TEST_SUITE("similarity errors") {
  TEST_CASE("zero, negative, NaN and infinite values are refused with the variable named") {
    const double bad[] = {0.0,
                          -2.0,
                          std::numeric_limits<double>::quiet_NaN(),
                          std::numeric_limits<double>::infinity(),
                          -std::numeric_limits<double>::infinity(),
                          -0.0};
    for (double x : bad) {
      auto p = drag_problem();
      p.variables[2].prototype = x;
      check_names(p, "V", "prototype value of 'V' must be positive and finite");
      p = drag_problem();
      p.variables[3].model = x;
      check_names(p, "L", "model value of 'L' must be positive and finite");
      p = drag_problem();
      p.variables[0].model = x;
      check_names(p, "F", "measured model value of 'F'");
      p = drag_problem();
      p.variables[4].factor = x;
      check_names(p, "mu", "unit factor of 'mu'");
    }
  }

  TEST_CASE("a missing prototype value is refused with the variable named") {
    auto p = drag_problem();
    p.variables[1].prototype.reset();
    check_names(p, "rho", "prototype value of 'rho' is missing");
  }

  TEST_CASE("an affine unit is refused for scaling") {
    const auto* degc = find_unit_entry("degC");
    REQUIRE(degc != nullptr);
    similarity_problem p;
    p.add(var("q", "W/m^2", 1.0, std::nullopt)).add(var("T", "degC", degc->factor, 80.0, 40.0));
    p.variables[1].offset = degc->offset;  // 273.15 K (SI Brochure 9th ed., 2.3.1)
    p.add_group({1, 0});
    check_names(p, "T", "affine unit");
  }

  TEST_CASE("the dependent variable takes no prototype value and must exist") {
    auto p = drag_problem();
    p.variables[0].prototype = 3.0;
    check_names(p, "F", "is the dependent variable");
    auto q = drag_problem();
    q.dependent = std::string("D");  // not `= "D"` after a reassignment: a false GCC 12 -Wrestrict at -O3
    check_names(q, "D", "is not among the variables");
  }

  TEST_CASE("duplicate and empty names are refused") {
    auto p = drag_problem();
    p.variables[4].name = "rho";
    check_names(p, "rho", "appears twice");
    p = drag_problem();
    p.variables[2].name = " ";
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("variable 3 has an empty name"), similarity_error);
    CHECK_THROWS_AS(plan_similarity(similarity_problem{}), similarity_error);
  }

  TEST_CASE("malformed groups are refused with the group named") {
    auto p = drag_problem();
    p.groups[1].exponents.pop_back();
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("group 2 has 4 exponents for 5 variables"),
                         similarity_error);
    p = drag_problem();
    p.groups[1].exponents.assign(5, 0);
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("group 2 has no variable"), similarity_error);
    p = drag_problem();
    p.add_group({0, 2, 2, 2, -2}, "Re^2");
    try {
      (void)plan_similarity(p);
      FAIL("dependent groups accepted");
    } catch (const similarity_error& e) {
      CHECK(e.group() == std::optional<std::size_t>{2});
      CHECK(std::string(e.what()).find("group 3 (Re^2: rho^2*V^2*L^2/mu^2)") != std::string::npos);
      CHECK(std::string(e.what()).find("must be independent") != std::string::npos);
    }
    p = drag_problem();
    p.groups[1].exponents[3] = std::int64_t{1} << 60;
    check_names(p, "L", "beyond 2^53");
  }

  TEST_CASE("a group that is not dimensionless is refused when dimensions are given") {
    auto p = drag_problem();
    p.variables[0].dim = dims::force;
    p.variables[1].dim = dims::density;
    p.variables[2].dim = dims::velocity;
    p.variables[3].dim = dims::length;
    p.variables[4].dim = dims::dynamic_viscosity;
    p.groups[1].exponents = {0, 1, 1, 2, -1};  // rho V L^2 / mu has the dimension of a length
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("is not dimensionless: its dimension is L"),
                         similarity_error);
  }

  TEST_CASE("a bad priority list or tolerance is refused") {
    auto p = drag_problem();
    p.priority = {5};
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("there are 2 groups"), similarity_error);
    p.priority = {1, 1};
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("listed twice"), similarity_error);
    p.priority = {0};
    check_names(p, "F", "holds the dependent variable");
    p = drag_problem();
    p.tolerance = 0.0;
    CHECK_THROWS_WITH_AS(plan_similarity(p), doctest::Contains("tolerance"), similarity_error);
    p.tolerance = std::numeric_limits<double>::quiet_NaN();
    CHECK_THROWS_AS(plan_similarity(p), similarity_error);
  }

  TEST_CASE("variables and groups are found by name and label") {
    auto p = ship_problem();
    p.variable("V").model = 1.0;
    CHECK(p.variables[2].model == std::optional<double>{1.0});
    CHECK(p.group_index("Re") == 2);
    p.priority = {p.group_index("Fr")};
    CHECK(p.priority == std::vector<std::size_t>{1});
    try {
      (void)p.variable("nu");
      FAIL("unknown variable accepted");
    } catch (const similarity_error& e) {
      CHECK(e.variable() == "nu");
    }
    CHECK_THROWS_WITH_AS((void)p.group_index("We"), doctest::Contains("no group is labelled 'We'"), similarity_error);
    p.groups[0].label = "Re";
    CHECK_THROWS_WITH_AS((void)p.group_index("Re"), doctest::Contains("more than one"), similarity_error);
  }

  TEST_CASE("similarity_error is an invalid_argument") {
    static_assert(std::is_base_of_v<std::invalid_argument, similarity_error>);
    CHECK_THROWS_AS(plan_similarity(similarity_problem{}), std::invalid_argument);
  }

  // Found by similarity_fuzz (tests/fuzz/corpus/similarity/exponent_min_int64): a group with
  // an exponent of -2^63 was written out for the message that refuses it by negating the
  // exponent, which has no int64 (ISO/IEC 14882 [basic.fundamental]; UBSan). The message
  // names the group with the magnitude 2^63 = 9223372036854775808.
  TEST_CASE("an exponent of -2^63 is refused with the group written out, not negated") {
    similarity_problem p;
    p.add(make_similarity_variable("F", "N")).add(make_similarity_variable("x", "m", 1.0));
    p.add(make_similarity_variable("y", "m", 2.0));
    p.dependent = "F";
    p.add_group({0, std::numeric_limits<std::int64_t>::min(), 1});
    try {
      (void)plan_similarity(p);
      FAIL("plan_similarity accepted an exponent beyond 2^53");
    } catch (const similarity_error& e) {
      CHECK(std::string(e.what()).find("y/x^9223372036854775808") != std::string::npos);
      CHECK(e.variable() == "x");
      CHECK(e.group() == std::optional<std::size_t>{0});
    }
  }
}
