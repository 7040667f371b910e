// Tests of the whole-field conversions of nondim/solver/groups/scales.hpp:
// s.nondimensional(view, out) and s.dimensional(in, view).
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <cmath>
#include <cstddef>
#include <span>
#include <stdexcept>
#include <string>
#include <vector>

using namespace nondim;

namespace {
// Water in a 5 cm channel at 0.3 m/s (a scenario of our own); with rho, U, L as references a
// pressure scales as rho U^2 and a time as L / U (White, Viscous Fluid Flow, ch. 2, from memory).
const auto rho_ref = 998.2 * units::kg / units::m3;
const auto u_ref = 0.3 * units::m / units::s;
const auto l_ref = 0.05 * units::m;

struct probe {
  double p;  // Pa
  double u;  // m/s
};
}  // namespace

TEST_SUITE("scales on fields") {
  TEST_CASE("a pressure field divided by rho U^2, element by element as the scalar form does") {
    const auto s = scales(rho_ref, u_ref, l_ref);
    std::vector<double> p_si{120.0, -35.5, 0.0, 1.0e5, 2.5e-3};
    const field_view<dims::pressure, const double> p{std::span<const double>(p_si)};
    std::vector<double> out(p.size());
    s.nondimensional(p, out);
    const double scale = rho_ref.si() * (u_ref.si() * u_ref.si());
    for (std::size_t i = 0; i < p.size(); ++i) {
      CHECK(out[i] == s.nondimensional(p[i].get()));                              // the scalar form, bit for bit
      CHECK(out[i] == doctest::Approx(p_si[i] / (998.2 * 0.09)).epsilon(1e-15));  // p / (rho U^2)
      CHECK(out[i] == p_si[i] / scale);
    }
  }

  TEST_CASE("round trip: nondimensional then dimensional gives the field back within one unit in the last place") {
    const auto s = scales(rho_ref, u_ref, l_ref);
    field<dims::time> t(6);
    for (std::size_t i = 0; i < t.size(); ++i) t[i] = (0.125 + 3.7 * static_cast<double>(i)) * units::s;
    std::vector<double> t_star(t.size());
    s.nondimensional(t, t_star);  // t U / L
    CHECK(t_star[1] == doctest::Approx(3.825 * 0.3 / 0.05).epsilon(1e-15));
    field<dims::time> back(t.size());
    s.dimensional(t_star, back);
    for (std::size_t i = 0; i < t.size(); ++i) {
      const double a = t[i].si(), b = back[i].si();
      CHECK((a == b || std::nextafter(a, 2 * a) == b || std::nextafter(a, 0.0) == b));
      CHECK(back[i] == s.dimensional<dims::time>(t_star[i]));  // the scalar form, bit for bit
    }
    // a scale that is a power of two round-trips exactly (scales.hpp): L = 0.5 m, U = 2 m/s
    const auto exact = scales(0.5 * units::m, 2.0 * units::m / units::s);
    exact.nondimensional(t, t_star);
    exact.dimensional(t_star, back.view());
    for (std::size_t i = 0; i < t.size(); ++i) CHECK(back[i] == t[i]);
  }

  TEST_CASE("strided views convert in and out: one member of an array of structs") {
    const auto s = scales(rho_ref, u_ref, l_ref);
    std::vector<probe> probes{{100.0, 0.1}, {200.0, 0.2}, {300.0, 0.6}};
    const auto u = member_view<dims::velocity>(std::span<probe>(probes), &probe::u);
    std::vector<double> u_star(probes.size());
    s.nondimensional(u, u_star);
    CHECK(u_star[0] == 0.1 / 0.3);
    CHECK(u_star[2] == 0.6 / 0.3);
    const std::vector<double> doubled{2.0, 4.0, 6.0};
    s.dimensional(doubled, u);
    CHECK(probes[0].u == 2.0 * 0.3);
    CHECK(probes[2].u == 6.0 * 0.3);
    CHECK(probes[1].p == 200.0);  // the other member is untouched
  }

  TEST_CASE("spans of another size throw field_size_error naming both sizes, and nothing is written") {
    const auto s = scales(rho_ref, u_ref, l_ref);
    std::vector<double> p_si{1.0, 2.0, 3.0};
    const field_view<dims::pressure> p{std::span<double>(p_si)};
    std::vector<double> short_out(2, -1.0);
    CHECK_THROWS_AS(s.nondimensional(p, short_out), field_size_error);
    CHECK(short_out == std::vector<double>{-1.0, -1.0});
    try {
      s.nondimensional(p, short_out);
      FAIL("no exception");
    } catch (const field_size_error& e) {
      CHECK(e.expected() == 3);
      CHECK(e.actual() == 2);
      const std::string what = e.what();
      CHECK(what.find("nondimensional") != std::string::npos);
      CHECK(what.find("expected 3 values, got 2") != std::string::npos);
    }
    const std::vector<double> long_in(4, 1.0);
    CHECK_THROWS_AS(s.dimensional(long_in, p), field_size_error);
    CHECK(p_si == std::vector<double>{1.0, 2.0, 3.0});
    try {
      s.dimensional(long_in, p);
      FAIL("no exception");
    } catch (const std::length_error& e) {  // a field_size_error is a std::length_error
      CHECK(std::string(e.what()).find("expected 3 values, got 4") != std::string::npos);
    }
  }

  TEST_CASE("temperature differences scale by the reference difference") {
    // theta = (T - T_ref) / dT for a field of differences (Incropera & DeWitt, ch. 6, from memory)
    const auto dt_ref = 40.0 * units::K;
    const auto s = scales(0.1 * units::m, dt_ref);
    std::vector<double> dt_si{0.0, 10.0, 40.0, -20.0};
    const field_view<dims::temperature, const double> dt{std::span<const double>(dt_si)};
    std::vector<double> theta(dt.size());
    s.nondimensional(dt, theta);
    CHECK(theta == std::vector<double>{0.0, 0.25, 1.0, -0.5});
  }
}
