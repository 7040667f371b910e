// Textbook worked examples of dimensional analysis: nondim must give the groups the books
// derive by hand with the same repeating variables. Each case names its source; "from
// memory" marks results recalled rather than re-read. The expected groups were derived by
// hand from the dimensions (SI Brochure 9th ed., tables 2 and 4), not copied from output.
#include "analysis_support.hpp"

using namespace nondim;
using test_support::check_groups;
using test_support::expected_group;

TEST_SUITE("analysis examples") {
  TEST_CASE("drag on a sphere gives the force coefficient and the Reynolds number") {
    // White, Fluid Mechanics, 7th ed., Sec. 5.3 (the case's source and groups:
    // tests/analysis_support.hpp)
    const auto& c = test_support::textbook_case_titled("drag on a sphere");
    const problem p = test_support::problem_of(c);
    const analysis a = test_support::check_textbook_case(c);
    CHECK(a.rank == 3);
    CHECK(a.isolated.empty());
    CHECK(a.svd.agrees);

    SUBCASE("with mu, V, D repeating: the Stokes form F/(mu V D) and Re") {
      // White, Fluid Mechanics, 7th ed., Sec. 5.2: at low Re the force scales as mu V D
      // (Stokes, F = 3 pi mu V D), from memory.
      const analysis b = analyze(p, test_support::repeating({"mu", "V", "D"}));
      CHECK(b.repeating == std::vector<std::string>{"mu", "V", "D"});
      check_groups(b, {expected_group{{"F", 1}, {"mu", -1}, {"V", -1}, {"D", -1}},
                       expected_group{{"rho", 1}, {"V", 1}, {"D", 1}, {"mu", -1}}});
    }
  }

  TEST_CASE("pressure drop in a rough pipe gives Euler, Reynolds, relative roughness and length ratio") {
    // White, Fluid Mechanics, 7th ed., Sec. 6.6 (Moody chart), and Munson et al., 6th ed.,
    // Sec. 8.3 with the pipe's length first (sources and groups: tests/analysis_support.hpp)
    for (const char* title : {"pressure drop in a rough pipe (White)",
                              "pressure drop in a pipe (Munson), the length before the diameter"}) {
      const analysis a = test_support::check_textbook_case(test_support::textbook_case_titled(title));
      CHECK(a.rank == 3);
    }
  }

  TEST_CASE("pump performance gives the head, power and flow coefficients and a Reynolds number") {
    // Fox & McDonald, Sec. 10.3; White, 7th ed., Sec. 11.4 (sources and groups:
    // tests/analysis_support.hpp)
    const analysis a = test_support::check_textbook_case(
        test_support::textbook_case_titled("pump performance with the angular speed"));
    CHECK(a.rank == 3);
    CHECK(a.groups[0].text() == "gH\u00b7\u03c9\u207b\u00b2\u00b7D\u207b\u00b2");  // gH·ω⁻²·D⁻²
  }

  TEST_CASE("forced convection gives Nusselt, Reynolds and Prandtl with k, mu, D, U repeating") {
    // Bergman, Lavine, Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 7th ed.,
    // Sec. 6.5: Nu = hD/k = f(Re, Pr), Pr = cp mu / k (from memory).
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("k", dims::thermal_conductivity)
        .add("D", dims::length)
        .add("U", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("cp", dims::specific_heat_capacity);
    const analysis a = analyze(p, test_support::repeating({"k", "mu", "D", "U"}));
    CHECK(a.rank == 4);
    check_groups(
        a, {expected_group{{"h", 1}, {"D", 1}, {"k", -1}}, expected_group{{"rho", 1}, {"U", 1}, {"D", 1}, {"mu", -1}},
            expected_group{{"cp", 1}, {"mu", 1}, {"k", -1}}});

    SUBCASE("chosen automatically: Stanton, 1/Re and 1/Pe") {
      // Same book, Sec. 6.7: St = h/(rho U cp) = Nu/(Re Pr), Pe = Re Pr (from memory).
      const analysis b = analyze(p);
      CHECK(b.repeating == std::vector<std::string>{"D", "U", "rho", "cp"});
      check_groups(b, {expected_group{{"h", 1}, {"rho", -1}, {"U", -1}, {"cp", -1}},
                       expected_group{{"k", 1}, {"rho", -1}, {"U", -1}, {"D", -1}, {"cp", -1}},
                       expected_group{{"mu", 1}, {"rho", -1}, {"U", -1}, {"D", -1}}});
    }
  }

  TEST_CASE("forced convection over a heated flat plate gives Nu_x, Re_x and 1/Pr") {
    // Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., Sec. 7.2:
    // Nu_x = h x / k = f(Re_x, Pr), Re_x = U x / nu, Pr = nu / alpha (from memory).
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("k", dims::thermal_conductivity)
        .add("x", dims::length)
        .add("U", dims::velocity)
        .add("nu", dims::kinematic_viscosity)
        .add("alpha", dims::thermal_diffusivity);
    const analysis a = analyze(p, test_support::repeating({"k", "x", "nu"}));
    CHECK(a.rank == 3);
    check_groups(a, {expected_group{{"h", 1}, {"x", 1}, {"k", -1}}, expected_group{{"U", 1}, {"x", 1}, {"nu", -1}},
                     expected_group{{"alpha", 1}, {"nu", -1}}});
    // M and Θ enter only through W/K (h and k): the rank is 3 of the 4 base dimensions.
    CHECK(a.deficiency.deficient);
  }

  TEST_CASE("natural convection gives Nusselt, Prandtl and Grashof, and explains the rank deficiency") {
    // Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., Sec. 9.3:
    // Nu = f(Gr, Pr), Gr = g beta (Ts - Tinf) L^3 / nu^2 (from memory). The buoyancy
    // g*beta*dT is one variable (an acceleration), as in the book's derivation.
    problem p;
    p.add("h", dims::heat_transfer_coefficient)
        .add("k", dims::thermal_conductivity)
        .add("L", dims::length)
        .add("nu", dims::kinematic_viscosity)
        .add("alpha", dims::thermal_diffusivity)
        .add("gbdT", dims::acceleration);
    const analysis a = analyze(p, test_support::repeating({"k", "L", "nu"}));
    CHECK(a.rank == 3);
    check_groups(a, {expected_group{{"h", 1}, {"L", 1}, {"k", -1}}, expected_group{{"alpha", 1}, {"nu", -1}},
                     expected_group{{"gbdT", 1}, {"L", 3}, {"nu", -2}}});
    // h and k carry M and Θ only as W/K = kg m^2 s^-3 K^-1 (SI Brochure table 4): the
    // variables span L, T and M·Θ⁻¹, so rank 3 < 4 base dimensions (derived by hand).
    CHECK(a.deficiency.deficient);
    CHECK(a.deficiency.present == std::vector<std::size_t>{0, 1, 2, 4});
    CHECK(a.deficiency.spanned == std::vector<dimension>{dims::length, dims::mass / dims::temperature, dims::time});
    CHECK(a.deficiency.combinations == std::vector<dimension>{dims::mass / dims::temperature});
    CHECK(a.deficiency.explanation.find("M and Theta appear only in the fixed combination M*Theta^-1") !=
          std::string::npos);

    SUBCASE("with rho, mu and cp in place of nu and alpha the rank is 4") {
      // Same book and section: Gr = g beta dT L^3 rho^2 / mu^2, Pr = cp mu / k (from memory).
      problem q;
      q.add("h", dims::heat_transfer_coefficient)
          .add("k", dims::thermal_conductivity)
          .add("L", dims::length)
          .add("rho", dims::density)
          .add("mu", dims::dynamic_viscosity)
          .add("cp", dims::specific_heat_capacity)
          .add("gbdT", dims::acceleration);
      const analysis b = analyze(q, test_support::repeating({"k", "L", "rho", "mu"}));
      CHECK(b.rank == 4);
      CHECK_FALSE(b.deficiency.deficient);
      check_groups(b, {expected_group{{"h", 1}, {"L", 1}, {"k", -1}}, expected_group{{"cp", 1}, {"mu", 1}, {"k", -1}},
                       expected_group{{"gbdT", 1}, {"rho", 2}, {"L", 3}, {"mu", -2}}});
    }
  }

  TEST_CASE("the pendulum: t^2 g / L, and the mass is isolated") {
    // Fox & McDonald, Introduction to Fluid Mechanics, Ch. 7 problems; period T = 2 pi sqrt(L/g)
    // (common practice, no source): the mass cannot enter any group.
    problem p;
    p.add("t", dims::time).add("L", dims::length).add("m", dims::mass).add("g", dims::acceleration);
    const analysis a = analyze(p);
    CHECK(a.rank == 3);
    CHECK(a.repeating == std::vector<std::string>{"L", "m", "g"});
    check_groups(a, {expected_group{{"t", 2}, {"g", 1}, {"L", -1}}});
    REQUIRE(a.isolated == std::vector<std::string>{"m"});
    CHECK(a.isolated_reasons[0].find("base dimension M appears in no other variable") != std::string::npos);
    CHECK_FALSE(a.missing_variable);
  }

  TEST_CASE("G. I. Taylor's blast wave: R^5 rho / (E t^2)") {
    // G. I. Taylor, "The formation of a blast wave by a very intense explosion. I",
    // Proc. R. Soc. A 201 (1950) 159-174: R = C (E t^2 / rho)^(1/5) (the case:
    // tests/analysis_support.hpp).
    const auto& taylor = test_support::textbook_case_titled("G. I. Taylor's blast wave");
    problem p = test_support::problem_of(taylor);
    const analysis a = test_support::check_textbook_case(taylor);
    CHECK(a.rank == 3);

    SUBCASE("with the ambient pressure: p0^5 t^6 / (E^2 rho^3)") {
      // Same paper: the strong-shock limit neglects p0, whose group is
      // p0 (t^6 / (E^2 rho^3))^(1/5) (from memory; exponents derived by hand).
      p.add("p0", dims::pressure);
      const analysis b = analyze(p, test_support::repeating({"E", "rho", "t"}));
      check_groups(b, {expected_group{{"R", 5}, {"rho", 1}, {"E", -1}, {"t", -2}},
                       expected_group{{"p0", 5}, {"t", 6}, {"E", -2}, {"rho", -3}}});

      // Chosen automatically, by the rule of DESIGN.md: t (one base dimension), rho (two),
      // then p0 (three, sum 4) before E (three, sum 5); so E is the non-repeating one.
      // Groups solved by hand: R rho^(1/2) t^-1 p0^(-1/2) and E rho^(3/2) t^-3 p0^(-5/2).
      const analysis c = analyze(p);
      CHECK(c.repeating == std::vector<std::string>{"rho", "t", "p0"});
      check_groups(c, {expected_group{{"R", 2}, {"rho", 1}, {"t", -2}, {"p0", -1}},
                       expected_group{{"E", 2}, {"rho", 3}, {"t", -6}, {"p0", -5}}});
    }
  }

  TEST_CASE("a ship's resistance: force coefficient, 1/Re and the inverse square Froude number") {
    // White, Fluid Mechanics, 7th ed., Sec. 5.4 (source and groups: tests/analysis_support.hpp)
    const analysis a = test_support::check_textbook_case(test_support::textbook_case_titled("a ship's resistance"));
    CHECK(a.rank == 3);
  }

  TEST_CASE("capillary rise: h/D, the Bond number and the contact angle by itself") {
    // Jurin's law h = 4 sigma cos(theta) / (rho g D), e.g. White, Fluid Mechanics, 7th ed.,
    // Sec. 1.7 (from memory): h/D = f(rho g D^2 / sigma, theta).
    problem p;
    p.add("h", dims::length)
        .add("sigma", dims::surface_tension)
        .add("rho", dims::density)
        .add("g", dims::acceleration)
        .add("D", dims::length)
        .add("theta", dims::dimensionless);
    const analysis a = analyze(p);
    CHECK(a.rank == 3);
    // the rule of DESIGN.md: D (a length), g, rho; surface tension only when nothing else
    // closes the rank, so it is the non-repeating variable of the Bond group
    CHECK(a.repeating == std::vector<std::string>{"rho", "g", "D"});
    check_groups(a, {expected_group{{"h", 1}, {"D", -1}},
                     expected_group{{"sigma", 1}, {"rho", -1}, {"g", -1}, {"D", -2}}, expected_group{{"theta", 1}}});
  }

  TEST_CASE("a heated plate cooling by convection: theta*, x*, Biot and Fourier") {
    // Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., Sec. 5.4 (plane
    // wall with convection): theta* = f(x*, Fo, Bi), Bi = hL/k, Fo = alpha t / L^2 (from memory).
    problem p;
    p.add("dT", dims::temperature)
        .add("dTi", dims::temperature)
        .add("x", dims::length)
        .add("L", dims::length)
        .add("h", dims::heat_transfer_coefficient)
        .add("k", dims::thermal_conductivity)
        .add("alpha", dims::thermal_diffusivity)
        .add("t", dims::time);
    const analysis a = analyze(p, test_support::repeating({"dTi", "L", "k", "alpha"}));
    CHECK(a.rank == 4);
    check_groups(a, {expected_group{{"dT", 1}, {"dTi", -1}}, expected_group{{"x", 1}, {"L", -1}},
                     expected_group{{"h", 1}, {"L", 1}, {"k", -1}}, expected_group{{"t", 1}, {"alpha", 1}, {"L", -2}}});

    SUBCASE("chosen automatically: dTi, x, h, t repeat") {
      // The rule of DESIGN.md applied by hand: dTi, x, L, t (one base dimension each, in
      // input order), then alpha, h, k; L and alpha add no rank.
      const analysis b = analyze(p);
      CHECK(b.repeating == std::vector<std::string>{"dTi", "x", "h", "t"});
      check_groups(b,
                   {expected_group{{"dT", 1}, {"dTi", -1}}, expected_group{{"L", 1}, {"x", -1}},
                    expected_group{{"k", 1}, {"h", -1}, {"x", -1}}, expected_group{{"alpha", 1}, {"t", 1}, {"x", -2}}});
    }
  }

  TEST_CASE("a falling droplet: Reynolds, density ratio, Laplace and Galilei numbers") {
    // Clift, Grace & Weber, Bubbles, Drops and Particles (1978), Ch. 2: terminal velocity of
    // drops in terms of Re, density ratio and property groups (from memory). With D, rho, mu
    // repeating: Re = rho V D / mu, La = sigma rho D / mu^2, Ga = g rho^2 D^3 / mu^2.
    problem p;
    p.add("V", dims::velocity)
        .add("D", dims::length)
        .add("rho_d", dims::density)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("sigma", dims::surface_tension)
        .add("g", dims::acceleration);
    const analysis a = analyze(p, test_support::repeating({"D", "rho", "mu"}));
    check_groups(a,
                 {expected_group{{"V", 1}, {"rho", 1}, {"D", 1}, {"mu", -1}}, expected_group{{"rho_d", 1}, {"rho", -1}},
                  expected_group{{"sigma", 1}, {"rho", 1}, {"D", 1}, {"mu", -2}},
                  expected_group{{"g", 1}, {"rho", 2}, {"D", 3}, {"mu", -2}}});
    CHECK(a.groups[1].text() == "\u03c1_d\u00b7\u03c1\u207b\u00b9");  // ρ_d·ρ⁻¹
  }

  TEST_CASE("an RC circuit: t/(RC), the voltage isolated, L and M tied as L^2 M") {
    // Time constant tau = R C (common practice, no source; e.g. Hayt & Kemmerly, Engineering
    // Circuit Analysis, from memory). SI Brochure 9th ed., table 4: V = kg m^2 s^-3 A^-1,
    // ohm = kg m^2 s^-3 A^-2, F = kg^-1 m^-2 s^4 A^2: length and mass only as kg m^2.
    problem p;
    p.add("t", dims::time).add("R", dims::resistance).add("C", dims::capacitance).add("V", dims::voltage);
    const analysis a = analyze(p);
    CHECK(a.rank == 3);
    CHECK(a.repeating == std::vector<std::string>{"R", "C", "V"});
    check_groups(a, {expected_group{{"t", 1}, {"R", -1}, {"C", -1}}});
    REQUIRE(a.isolated == std::vector<std::string>{"V"});
    CHECK(a.isolated_reasons[0].find("no product of powers of the other variables") != std::string::npos);
    CHECK(a.deficiency.deficient);
    CHECK(a.deficiency.combinations == std::vector<dimension>{dims::area * dims::mass});
  }

  TEST_CASE("magnetohydrodynamic duct flow: Hartmann number squared and Reynolds number") {
    // Davidson, An Introduction to Magnetohydrodynamics (2001), Sec. 5: Ha = B L sqrt(sigma/mu)
    // (from memory); B = kg s^-2 A^-1, S/m = kg^-1 m^-3 s^3 A^2 (SI Brochure table 4).
    problem p;
    p.add("B", dims::magnetic_flux_density)
        .add("L", dims::length)
        .add("sigma_e", dims::electrical_conductivity)
        .add("mu", dims::dynamic_viscosity)
        .add("rho", dims::density)
        .add("U", dims::velocity);
    const analysis a = analyze(p, test_support::repeating({"mu", "U", "L", "sigma_e"}));
    CHECK(a.rank == 4);
    check_groups(a, {expected_group{{"B", 2}, {"L", 2}, {"sigma_e", 1}, {"mu", -1}},
                     expected_group{{"rho", 1}, {"U", 1}, {"L", 1}, {"mu", -1}}});
  }

  TEST_CASE("mass transfer: Sherwood, mass-transfer Peclet and Schmidt numbers") {
    // Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., Sec. 6.7:
    // Sh = h_m D / D_AB = f(Re, Sc), Sc = mu / (rho D_AB); with D, D_AB, rho repeating the
    // velocity enters as Pe = U D / D_AB = Re Sc (from memory).
    problem p;
    p.add("h_m", dims::mass_transfer_coefficient)
        .add("D", dims::length)
        .add("U", dims::velocity)
        .add("rho", dims::density)
        .add("mu", dims::dynamic_viscosity)
        .add("D_AB", dims::mass_diffusivity);
    const analysis a = analyze(p, test_support::repeating({"D", "D_AB", "rho"}));
    check_groups(a,
                 {expected_group{{"h_m", 1}, {"D", 1}, {"D_AB", -1}}, expected_group{{"U", 1}, {"D", 1}, {"D_AB", -1}},
                  expected_group{{"mu", 1}, {"rho", -1}, {"D_AB", -1}}});

    SUBCASE("molar flux, coefficient and concentration difference (amount of substance)") {
      // Same book, Sec. 6.1, N_A'' = h_m (C_A,s - C_A,inf) (from memory): one group, and
      // rank 2 of the 3 base dimensions L, T, N. The reduced echelon form of the spanned
      // dimensions {L T^-1, N L^-3} over (L, T, N), derived by hand: L^3 N^-1, T^3 N^-1.
      problem q;
      q.add("N_A", dims::molar_flux).add("h_m", dims::mass_transfer_coefficient).add("dC", dims::amount_concentration);
      const analysis b = analyze(q);
      CHECK(b.rank == 2);
      check_groups(b, {expected_group{{"N_A", 1}, {"h_m", -1}, {"dC", -1}}});
      const dimension l3n{3, 0, 0, 0, 0, -1, 0};
      const dimension t3n{0, 0, 3, 0, 0, -1, 0};
      CHECK(b.deficiency.spanned == std::vector<dimension>{l3n, t3n});
    }
  }

  TEST_CASE("force, stiffness and displacement have rank 2: M and T only as M T^-2") {
    // DESIGN.md "Rules for the groups"; Hooke's law F = k x (common practice, no source).
    problem p;
    p.add("F", dims::force).add("k", dims::stiffness).add("x", dims::length);
    const analysis a = analyze(p);
    CHECK(a.rank == 2);
    CHECK(a.repeating == std::vector<std::string>{"k", "x"});
    check_groups(a, {expected_group{{"F", 1}, {"k", -1}, {"x", -1}}});
    CHECK(a.deficiency.combinations == std::vector<dimension>{dims::mass / (dims::time * dims::time)});
    CHECK(a.deficiency.explanation.find("M and T appear only in the fixed combination M*T^-2") != std::string::npos);
  }

  TEST_CASE("a missing variable: the period with only length and mass") {
    // The pendulum without g (Fox & McDonald, Ch. 7; common practice): time appears in no
    // other variable, so the dependent variable must repeat and no group exists.
    problem p;
    p.add("t", dims::time).add("L", dims::length).add("m", dims::mass);
    const analysis a = analyze(p);
    CHECK(a.rank == 3);
    CHECK(a.groups.empty());
    CHECK(a.missing_variable);
    CHECK(a.isolated == std::vector<std::string>{"t", "L", "m"});
    CHECK(a.isolated_reasons[0].find("a variable is missing") != std::string::npos);
  }
}
