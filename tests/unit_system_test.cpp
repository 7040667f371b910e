// Tests of reference_scales as a solver's unit system (nondim/solver/groups/scales.hpp):
// default coherent SI, copyable, stored in a struct or at namespace scope, and the two
// temperature rules (a difference by a difference, an absolute temperature by an absolute one).
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <span>
#include <type_traits>
#include <vector>

using namespace nondim;

namespace {
using gas_dynamics = reference_scales<dims::density, dims::velocity, dims::length, dims::temperature>;

// a unit system at namespace scope: default SI as a constant, or from references
constexpr gas_dynamics coherent_si{};
// references of our own: air at 400 kPa and 500 K in a 0.2 m duct, R = 287 J/(kg K) (common practice)
const auto t_duct = from_kelvin(500.0);
const auto rho_duct = 400.0 * units::kPa / (287.0 * units::J / (units::kg * units::K) * t_duct.absolute());
const auto duct = scales(rho_duct, 448.2 * units::m / units::s, 0.2 * units::m, t_duct.absolute());

struct solver_settings {  // a unit system stored in a struct, set after construction
  gas_dynamics units;
  int steps = 0;
};
}  // namespace

static_assert(std::is_default_constructible_v<gas_dynamics>);
static_assert(std::is_trivially_copyable_v<gas_dynamics>);
static_assert(std::is_same_v<std::remove_cv_t<decltype(duct)>, gas_dynamics>);
static_assert(coherent_si.scale<dims::pressure>().si() == 1.0);  // fixed at compile time

TEST_SUITE("unit system") {
  TEST_CASE("a default unit system is coherent SI: every scale one") {
    const gas_dynamics si;
    CHECK(si.nondimensional(101325.0 * units::Pa) == 101325.0);
    CHECK(si.scale<dims::specific_gas_constant>().si() == 1.0);
    CHECK(si.dimensional<dims::velocity>(3.5).si() == 3.5);
  }

  TEST_CASE("a unit system is copied and assigned into a solver's settings") {
    solver_settings s;
    CHECK(s.units.nondimensional(2.0 * units::m) == 2.0);
    s.units = duct;
    const solver_settings copy = s;
    // x / L with L = 0.2 m
    CHECK(copy.units.nondimensional(0.05 * units::m) == doctest::Approx(0.25).epsilon(1e-15));
    CHECK(copy.units.scale<dims::pressure>().si() == duct.scale<dims::pressure>().si());
  }

  TEST_CASE("a scale taken once out of the loop gives the same numbers as the per-call conversion") {
    // p* = p / (rho_duct a0^2): the scale is a quantity, computed once; each cell is one division
    const quantity<dims::pressure> p_ref = duct.scale<dims::pressure>();
    for (const double p : {101325.0, 4.0e5, 2.5e3}) {
      const double once = (p * units::Pa) / p_ref;
      CHECK(once == duct.nondimensional(p * units::Pa));
    }
  }

  TEST_CASE("an absolute temperature scales by an absolute reference: T/T0 through the kelvin values") {
    const auto t = from_celsius(15.0);  // 288.15 K (ISO 2533 sea level)
    CHECK(duct.nondimensional(t.absolute()) == doctest::Approx(288.15 / 500.0).epsilon(1e-15));
    // a field of temperatures in kelvin, T/T0 in one call
    std::vector<double> kelvin{500.0, 400.0, 250.0}, ratio(3);
    duct.nondimensional(field_view<dims::temperature, const double>(kelvin.data(), kelvin.size()),
                        std::span<double>(ratio));
    CHECK(ratio[0] == 1.0);
    CHECK(ratio[2] == 0.5);
  }

  TEST_CASE("a difference scales by a difference: theta = (T - T_ref) / dT") {
    const auto wall = from_celsius(20.0), inlet = from_celsius(60.0);
    const auto s = scales(0.02 * units::m / units::s, 0.25 * units::m, inlet - wall);
    CHECK(s.nondimensional_difference(from_celsius(40.0), wall) == doctest::Approx(0.5).epsilon(1e-15));
    CHECK(s.dimensional_point(0.25, wall).celsius() == doctest::Approx(30.0).epsilon(1e-13));
  }
}
