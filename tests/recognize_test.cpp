// Tests of nondim/analysis/names/recognize.hpp: powers of characteristic numbers, ambiguity, and
// the ranking by kind hints and conventional names.
#include <nondim/analysis/names/recognize.hpp>
#include <nondim/solver/core/dims.hpp>

#include <doctest/doctest.h>

#include <array>
#include <cstdint>
#include <limits>
#include <stdexcept>
#include <string>
#include <string_view>
#include <vector>

using namespace nondim;

namespace {

using exps = std::vector<std::int64_t>;

std::vector<std::string> symbols(const std::vector<catalog_match>& ms) {
  std::vector<std::string> out;
  for (const auto& m : ms) out.emplace_back(m.info().symbol);
  return out;
}

const catalog_match* find(const std::vector<catalog_match>& ms, std::string_view symbol) {
  for (const auto& m : ms)
    if (m.info().symbol == symbol) return &m;
  return nullptr;
}

}  // namespace

TEST_SUITE("recognize") {
  TEST_CASE("the viscous group of the drag problem is the reciprocal Reynolds number") {
    // White, Fluid Mechanics, ch. 5 (from memory): with rho, V, D repeating, mu/(rho V D) = 1/Re
    const std::vector<group_variable> v{{"F", dims::force},
                                        {"rho", dims::density},
                                        {"V", dims::velocity},
                                        {"D", dims::length},
                                        {"mu", dims::dynamic_viscosity}};
    const auto ms = recognize(v, exps{0, -1, -1, -1, 1});
    REQUIRE(ms.size() == 1);
    CHECK(ms[0].info().symbol == "Re");
    CHECK(ms[0].power == rational{-1});
    CHECK_FALSE(ms[0].ambiguous);
    CHECK(ms[0].consistent);
    CHECK(power_text(ms[0].info().symbol, ms[0].power) == "Re^-1");
    // the force group F/(rho V^2 D^2) is the force coefficient (White, ch. 5, from memory)
    const auto f = recognize(v, exps{1, -1, -2, -2, 0});
    REQUIRE(!f.empty());
    CHECK(f[0].info().symbol == "C_D");
    CHECK(f[0].power == rational{1});
  }

  TEST_CASE("a square root of the Reynolds number is Re^(1/2)") {
    // boundary-layer scalings use Re^(1/2) (White, ch. 7, delta/x ~ Re_x^(-1/2), from memory)
    const std::vector<group_variable> v{
        {"rho", dims::density}, {"U", dims::velocity}, {"x", dims::length}, {"mu", dims::dynamic_viscosity}};
    const std::vector<rational> half_re{rational{1, 2}, rational{1, 2}, rational{1, 2}, rational{-1, 2}};
    const auto ms = recognize(v, half_re);
    REQUIRE(ms.size() == 1);
    CHECK(ms[0].power == rational{1, 2});
    CHECK(power_text("Re", ms[0].power) == "Re^(1/2)");
    const std::vector<rational> minus_half{rational{-1, 2}, rational{-1, 2}, rational{-1, 2}, rational{1, 2}};
    CHECK(recognize(v, minus_half)[0].power == rational{-1, 2});
    // with integer exponents: Omega L^2 / nu is the square root of the Taylor number 4 Omega^2 L^4/nu^2
    // and the reciprocal Ekman number (common practice, from memory)
    const std::vector<group_variable> r{
        {"Omega", dims::angular_velocity}, {"L", dims::length}, {"nu", dims::kinematic_viscosity}};
    const auto t = recognize(r, exps{1, 2, -1});
    REQUIRE(find(t, "Ta") != nullptr);
    CHECK(find(t, "Ta")->power == rational{1, 2});
    REQUIRE(find(t, "Ek") != nullptr);
    CHECK(find(t, "Ek")->power == rational{-1});
    CHECK(t[0].ambiguous);
  }

  TEST_CASE("the Froude number comes squared or to the power one depending on the definition") {
    // ISO 80000-11:2019: Fr = v/sqrt(l g) (from memory); White, table 5.2: Fr = V^2/(g L) (from memory)
    const std::vector<group_variable> v{{"V", dims::velocity}, {"g", dims::acceleration}, {"L", dims::length}};
    const auto white = recognize(v, exps{2, -1, -1});
    REQUIRE(white.size() == 1);
    CHECK(white[0].info().symbol == "Fr");
    CHECK(white[0].power == rational{2});
    const auto inverse = recognize(v, exps{-2, 1, 1});
    CHECK(inverse[0].power == rational{-2});
    const std::vector<rational> iso{1, rational{-1, 2}, rational{-1, 2}};
    CHECK(recognize(v, iso)[0].power == rational{1});
  }

  TEST_CASE("Nusselt and Biot share a form: both are listed, ambiguous, ranked by the conductivity's name") {
    // Incropera et al., ch. 5 and 6 (from memory): Nu = hL/k_f, Bi = hL/k_s
    std::vector<group_variable> v{
        {"h", dims::heat_transfer_coefficient}, {"L", dims::length}, {"k", dims::thermal_conductivity}};
    auto ms = recognize(v, exps{1, 1, -1});
    REQUIRE(ms.size() == 2);
    CHECK(symbols(ms) == std::vector<std::string>{"Nu", "Bi"});
    CHECK(ms[0].ambiguous);
    CHECK(ms[1].ambiguous);
    CHECK(ms[0].consistent);
    // plain "k" names either conductivity (Incropera et al. write k for the solid in ch. 5,
    // Bi = hL/k, and for the fluid in ch. 6, from memory): Nu ranks first, Bi stays listed
    CHECK(ms[1].consistent);
    CHECK(ms[0].score > ms[1].score);

    v[2].name = "k_s";
    ms = recognize(v, exps{1, 1, -1});
    CHECK(symbols(ms) == std::vector<std::string>{"Bi", "Nu"});
    CHECK(ms[0].ambiguous);

    v[2].name = "k_f";
    CHECK(symbols(recognize(v, exps{1, 1, -1})) == std::vector<std::string>{"Nu", "Bi"});

    // an unknown name: both consistent; catalog order decides
    v[2].name = "conductivity";
    ms = recognize(v, exps{1, 1, -1});
    CHECK(symbols(ms) == std::vector<std::string>{"Nu", "Bi"});
    CHECK(ms[0].consistent);
    CHECK(ms[1].consistent);

    // a kind hint outranks the name
    v[2].name = "k";
    v[2].kind = quantity_kind::solid_thermal_conductivity;
    ms = recognize(v, exps{1, 1, -1});
    CHECK(symbols(ms) == std::vector<std::string>{"Bi", "Nu"});
    CHECK(ms[0].ambiguous);

    // inverse group k/(hL)
    v[2].kind = quantity_kind::unspecified;
    ms = recognize(v, exps{-1, -1, 1});
    CHECK(ms[0].power == rational{-1});
  }

  TEST_CASE("Prandtl, Schmidt and Lewis share a form: all three are listed, ranked by the names") {
    // Incropera et al., ch. 6 (from memory): Pr = nu/alpha, Sc = nu/D_AB, Le = alpha/D_AB
    std::vector<group_variable> v{{"nu", dims::kinematic_viscosity}, {"alpha", dims::thermal_diffusivity}};
    auto ms = recognize(v, exps{1, -1});
    REQUIRE(ms.size() == 3);
    CHECK(ms[0].info().symbol == "Pr");
    CHECK(ms[0].power == rational{1});
    CHECK(ms[0].consistent);
    for (const auto& m : ms) CHECK(m.ambiguous);
    CHECK_FALSE(find(ms, "Sc")->consistent);
    CHECK_FALSE(find(ms, "Le")->consistent);

    v[1].name = "D_AB";
    ms = recognize(v, exps{1, -1});
    CHECK(ms[0].info().symbol == "Sc");
    CHECK(ms[0].power == rational{1});

    v[0].name = "alpha";
    ms = recognize(v, exps{1, -1});
    CHECK(ms[0].info().symbol == "Le");

    // D_AB/alpha: Lewis number to the power -1 (some texts define Le that way)
    ms = recognize(v, exps{-1, 1});
    CHECK(ms[0].info().symbol == "Le");
    CHECK(ms[0].power == rational{-1});

    // neutral names: every entry consistent, each with its best orientation
    v[0].name = "d1";
    v[1].name = "d2";
    ms = recognize(v, exps{1, -1});
    REQUIRE(ms.size() == 3);
    for (const auto& m : ms) {
      CHECK(m.consistent);
      CHECK(m.power == rational{1});
    }
    CHECK(ms[0].info().symbol == "Pr");  // tier, then catalog order

    // kind hints decide the ranking
    v[0].kind = quantity_kind::thermal_diffusivity;
    v[1].kind = quantity_kind::mass_diffusivity;
    ms = recognize(v, exps{1, -1});
    CHECK(ms[0].info().symbol == "Le");
    CHECK(ms[0].score == 8);
  }

  TEST_CASE("ratios of two velocities: Mach number or mass-transfer Stanton number by the names") {
    // White, ch. 9: Ma = V/a; Incropera et al., ch. 6: St_m = h_m/V (from memory)
    std::vector<group_variable> v{{"U", dims::velocity}, {"c", dims::velocity}};
    auto ms = recognize(v, exps{1, -1});
    REQUIRE(ms.size() == 2);
    CHECK(ms[0].info().symbol == "Ma");
    CHECK(ms[0].power == rational{1});
    // with the exponents swapped the mapping is kept (c stays the speed of sound): Ma^-1
    ms = recognize(v, exps{-1, 1});
    CHECK(ms[0].info().symbol == "Ma");
    CHECK(ms[0].power == rational{-1});
    v[1].name = "h_m";
    ms = recognize(v, exps{-1, 1});
    CHECK(ms[0].info().symbol == "St_m");
    CHECK(ms[0].power == rational{1});
  }

  TEST_CASE("Strouhal and Damkoehler numbers share a form and are told apart by the names") {
    // White, table 5.2: St = omega L/V; common practice: Da = k_r L/U (from memory); a rotation
    // rate has the same dimension, so f D/U is also an inverse Rossby number U/(Omega L), a
    // tip-speed ratio Omega R/U and an advance ratio J = V/(n D) (Carlton, ch. 6, from memory)
    std::vector<group_variable> v{{"f", dims::frequency}, {"D", dims::length}, {"U", dims::velocity}};
    auto ms = recognize(v, exps{1, 1, -1});
    REQUIRE(ms.size() == 5);
    CHECK_FALSE(find(ms, "J")->consistent);
    CHECK_FALSE(find(ms, "TSR")->consistent);
    CHECK(ms[0].info().symbol == "Sr");
    CHECK(ms[0].consistent);
    REQUIRE(find(ms, "Ro") != nullptr);
    CHECK(find(ms, "Ro")->power == rational{-1});
    CHECK_FALSE(find(ms, "Ro")->consistent);
    CHECK_FALSE(find(ms, "Da")->consistent);
    v[0].name = "k_r";
    ms = recognize(v, exps{1, 1, -1});
    CHECK(ms[0].info().symbol == "Da");
    CHECK_FALSE(find(ms, "Sr")->consistent);
    v[0].name = "Omega_E";  // the rotation rate of the Earth
    ms = recognize(v, exps{-1, -1, 1});
    CHECK(ms[0].info().symbol == "Ro");
    CHECK(ms[0].power == rational{1});
    CHECK(ms[0].consistent);
  }

  TEST_CASE("a rotor's tip-speed ratio is no Rossby number") {
    // Manwell, McGowan & Rogers, Wind Energy Explained, ch. 3 (from memory): lambda = Omega R/U
    // of a wind turbine; the Rossby number U/(Omega L) needs the rotation rate of the frame
    // (DESIGN.md, "Rules for the groups"), which neither the name nor a declared kind gives here
    std::vector<group_variable> v{{"Omega", dims::angular_velocity}, {"R", dims::length}, {"U", dims::velocity}};
    auto ms = recognize(v, exps{1, 1, -1});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "TSR");
    CHECK(ms[0].consistent);
    REQUIRE(find(ms, "Ro") != nullptr);
    CHECK_FALSE(find(ms, "Ro")->consistent);
    // a declared kind is evidence: the same group over the rotation rate of the frame is Ro^-1
    v[0].kind = quantity_kind::rotation_rate;
    ms = recognize(v, exps{1, 1, -1});
    CHECK(ms[0].info().symbol == "Ro");
    CHECK(ms[0].power == rational{-1});
    CHECK(ms[0].consistent);
  }

  TEST_CASE("a ratio of two lengths is a Knudsen number only when one is a mean free path") {
    // Weir height over head P/H (White, Fluid Mechanics, ch. 10, sharp-crested weirs, from
    // memory), depth ratio y2/y1 of a hydraulic jump (White, ch. 10, from memory), drop size over
    // nozzle diameter d32/D (common practice for sprays, no source) and an aspect ratio b/c:
    // none is Kn = lambda/L (White, ch. 1, from memory)
    const std::array<std::array<std::string_view, 2>, 4> pairs{{{"P", "H"}, {"y2", "y1"}, {"d32", "D"}, {"b", "c"}}};
    for (const auto& p : pairs) {
      INFO(p[0], "/", p[1]);
      const std::vector<group_variable> v{{p[0], dims::length}, {p[1], dims::length}};
      const auto ms = recognize(v, exps{1, -1});
      for (const auto& m : ms) CHECK_FALSE(m.consistent);
    }
    // the name or a declared kind is evidence
    std::vector<group_variable> v{{"lambda", dims::length}, {"L", dims::length}};
    auto ms = recognize(v, exps{1, -1});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "Kn");
    CHECK(ms[0].consistent);
    v[0] = {"l_gas", dims::length, quantity_kind::mean_free_path};
    ms = recognize(v, exps{1, -1});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "Kn");
    CHECK(ms[0].consistent);
  }

  TEST_CASE("a propeller's thrust loading is no drag coefficient") {
    // Carlton, Marine Propellers and Propulsion, ch. 6 (from memory): the thrust loading
    // T/(rho V^2 D^2) of a propeller has the form of the force coefficient F/(rho U^2 L^2) but T
    // is a thrust, not a drag; the thrust coefficient is K_T = T/(rho n^2 D^4)
    const std::vector<group_variable> v{
        {"T", dims::force}, {"rho", dims::density}, {"V", dims::velocity}, {"D", dims::length}, {"n", dims::frequency}};
    auto ms = recognize(v, exps{1, -1, -2, -2, 0});
    for (const auto& m : ms) CHECK_FALSE(m.consistent);
    REQUIRE(find(ms, "C_D") != nullptr);
    ms = recognize(v, exps{1, -1, 0, -4, -2});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "K_T");
    CHECK(ms[0].consistent);
    // a drag named as such keeps its name (White, table 5.2, from memory)
    const std::vector<group_variable> drag{
        {"F_D", dims::force}, {"rho", dims::density}, {"V", dims::velocity}, {"D", dims::length}};
    ms = recognize(drag, exps{1, -1, -2, -2});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "C_D");
    CHECK(ms[0].consistent);
  }

  TEST_CASE("a buoyancy group given as one variable is no Galilei number") {
    // natural convection, Gr = g beta dT L^3/nu^2 (Incropera et al., ch. 9, from memory) with
    // g beta dT given as one acceleration gbdT: not Ga = g L^3/nu^2 (ISO 80000-11, from memory)
    std::vector<group_variable> v{{"gbdT", dims::acceleration}, {"L", dims::length}, {"nu", dims::kinematic_viscosity}};
    auto ms = recognize(v, exps{1, 3, -2});
    for (const auto& m : ms) CHECK_FALSE(m.consistent);
    REQUIRE(find(ms, "Ga") != nullptr);
    v[0].name = "g";
    ms = recognize(v, exps{1, 3, -2});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "Ga");
    CHECK(ms[0].consistent);
  }

  TEST_CASE("an entry defined for one phase does not take variables of two") {
    // Ohnesorge number Oh = mu/sqrt(rho sigma L) of a liquid jet (common practice, drop and
    // jet break-up, from memory): mu and rho of the liquid; with the gas density it is no Oh
    std::vector<group_variable> v{{"mu_l", dims::dynamic_viscosity},
                                  {"rho_g", dims::density},
                                  {"sigma", dims::surface_tension},
                                  {"D", dims::length}};
    auto ms = recognize(v, exps{2, -1, -1, -1});
    REQUIRE(find(ms, "Oh") != nullptr);
    CHECK_FALSE(find(ms, "Oh")->consistent);
    v[1].name = "rho_l";
    ms = recognize(v, exps{2, -1, -1, -1});
    REQUIRE(!ms.empty());
    CHECK(ms[0].info().symbol == "Oh");
    CHECK(ms[0].consistent);
  }

  TEST_CASE("a name suffix keeps the base name's kind") {
    // Incropera et al., ch. 10 (from memory): Bo = g (rho_l - rho_v) L^2 / sigma; with rho_l the
    // density form is consistent, the density-difference form contradicts the name
    const std::vector<group_variable> v{
        {"rho_l", dims::density}, {"g", dims::acceleration}, {"D", dims::length}, {"sigma", dims::surface_tension}};
    const auto ms = recognize(v, exps{1, 1, 2, -1});
    REQUIRE(ms.size() == 1);
    CHECK(ms[0].info().symbol == "Bo");
    CHECK(ms[0].consistent);
    CHECK(ms[0].form_info().factors[0].kind == quantity_kind::density);
    CHECK(ms[0].variables[0] == 0);
  }

  TEST_CASE("groups that are no characteristic number match nothing") {
    // temperature ratio theta/theta_i (Incropera et al., ch. 5, from memory): not in the catalog
    const std::vector<group_variable> v{{"theta", dims::temperature}, {"theta_i", dims::temperature}};
    CHECK(recognize(v, exps{1, -1}).empty());
    // a product of two catalog numbers (Re Pr^2) is none of them (common practice, no source)
    const std::vector<group_variable> w{{"rho", dims::density},
                                        {"U", dims::velocity},
                                        {"D", dims::length},
                                        {"mu", dims::dynamic_viscosity},
                                        {"cp", dims::specific_heat_capacity},
                                        {"k", dims::thermal_conductivity}};
    CHECK(recognize(w, exps{1, 1, 1, 1, 2, -2}).empty());
    // the empty group, and a dimensionless variable on its own
    CHECK(recognize(w, exps{0, 0, 0, 0, 0, 0}).empty());
    const std::vector<group_variable> a{{"angle", dims::dimensionless}};
    CHECK(recognize(a, exps{1}).empty());
    // Pe = Re Pr in the rho, cp, k form is one entry (Incropera et al., ch. 6, from memory)
    const auto pe = recognize(w, exps{1, 1, 1, 0, 1, -1});
    REQUIRE(!pe.empty());
    CHECK(pe[0].info().symbol == "Pe");
  }

  TEST_CASE("exponents that are not proportional do not match") {
    // rho U^2 L / mu is not a power of Re (common practice, no source)
    const std::vector<group_variable> v{
        {"rho", dims::density}, {"U", dims::velocity}, {"L", dims::length}, {"mu", dims::dynamic_viscosity}};
    CHECK(recognize(v, exps{1, 2, 1, -1}).empty());
  }

  TEST_CASE("bad input: lengths that differ throw, extreme exponents do not crash") {
    const std::vector<group_variable> v{{"U", dims::velocity}, {"c", dims::velocity}};
    CHECK_THROWS_AS((void)recognize(v, exps{1}), std::invalid_argument);
    const std::vector<std::string> names{"U"};
    const std::vector<dimension> ds{dims::velocity, dims::velocity};
    CHECK_THROWS_AS((void)recognize(names, ds, exps{1, -1}), std::invalid_argument);
    const auto big = std::numeric_limits<std::int64_t>::max();
    const auto low = std::numeric_limits<std::int64_t>::min();
    CHECK_NOTHROW((void)recognize(v, exps{big, -big}));
    CHECK_NOTHROW((void)recognize(v, exps{low, low}));
    CHECK(recognize(v, exps{big, -big}).at(0).power == rational{big});
    // more variables than any form has
    std::vector<group_variable> many(12, group_variable{"x", dims::length});
    CHECK(recognize(many, exps(12, 1)).empty());
  }

  TEST_CASE("the short form carries name, symbol, power and ambiguity") {
    const std::vector<group_variable> v{
        {"h", dims::heat_transfer_coefficient}, {"L", dims::length}, {"k", dims::thermal_conductivity}};
    const auto ms = recognize(v, exps{1, 1, -1});
    const auto gm = to_group_matches(ms);
    REQUIRE(gm.size() == 2);
    CHECK(gm[0] == group_match{"Nusselt number", "Nu", 1, true});
    CHECK(gm[1] == group_match{"Biot number", "Bi", 1, true});
  }
  TEST_CASE("one recogniser for many groups gives the same matches as recognize()") {
    // the groups of forced convection (Incropera et al., ch. 6, from memory): Nu, 1/Re, Pr, St
    const std::vector<group_variable> v{{"h", dims::heat_transfer_coefficient},
                                        {"k", dims::thermal_conductivity},
                                        {"U", dims::velocity},
                                        {"D", dims::length},
                                        {"rho", dims::density},
                                        {"mu", dims::dynamic_viscosity},
                                        {"cp", dims::specific_heat_capacity}};
    const group_recognizer r(v);
    for (const exps& e : {exps{1, -1, 0, 1, 0, 0, 0}, exps{0, 0, -1, -1, -1, 1, 0}, exps{0, -1, 0, 0, 0, 1, 1},
                          exps{1, 0, -1, 0, -1, 0, -1}, exps{0, -2, 1, 1, 1, 1, 2}}) {
      const auto a = recognize(v, e);
      const auto b = r(e);
      REQUIRE(a.size() == b.size());
      for (std::size_t i = 0; i < a.size(); ++i) {
        CHECK(a[i].entry == b[i].entry);
        CHECK(a[i].power == b[i].power);
        CHECK(a[i].score == b[i].score);
        CHECK(a[i].variables == b[i].variables);
      }
    }
    CHECK(symbols(r(exps{1, 0, -1, 0, -1, 0, -1})) == std::vector<std::string>{"St"});
    CHECK_THROWS_AS((void)r(exps{1, 2}), std::invalid_argument);
  }
}
