// Tests of nondim/solver/core/dimension.hpp, dims.hpp and format.hpp.
#include <nondim/solver/core/dimension.hpp>
#include <nondim/solver/core/dims.hpp>
#include <nondim/solver/core/format.hpp>

#include <doctest/doctest.h>

#include <sstream>

using namespace nondim;

// SI Brochure 9th ed., table 4: derived units in terms of base units.
static_assert(dims::force == dimension{1, 1, -2});                        // N = kg m s^-2
static_assert(dims::pressure == dimension{-1, 1, -2});                    // Pa = kg m^-1 s^-2
static_assert(dims::energy == dimension{2, 1, -2});                       // J = kg m^2 s^-2
static_assert(dims::power == dimension{2, 1, -3});                        // W = kg m^2 s^-3
static_assert(dims::electric_charge == dimension{0, 0, 1, 1});            // C = A s
static_assert(dims::voltage == dimension{2, 1, -3, -1});                  // V = kg m^2 s^-3 A^-1
static_assert(dims::capacitance == dimension{-2, -1, 4, 2});              // F = kg^-1 m^-2 s^4 A^2
static_assert(dims::resistance == dimension{2, 1, -3, -2});               // ohm = kg m^2 s^-3 A^-2
static_assert(dims::conductance == dimension{-2, -1, 3, 2});              // S = kg^-1 m^-2 s^3 A^2
static_assert(dims::magnetic_flux == dimension{2, 1, -2, -1});            // Wb = kg m^2 s^-2 A^-1
static_assert(dims::magnetic_flux_density == dimension{0, 1, -2, -1});    // T = kg s^-2 A^-1
static_assert(dims::inductance == dimension{2, 1, -2, -2});               // H = kg m^2 s^-2 A^-2
static_assert(dims::catalytic_activity == dimension{0, 0, -1, 0, 0, 1});  // kat = mol s^-1
// SI Brochure 9th ed., table 6 (derived units whose names include special names)
static_assert(dims::dynamic_viscosity == dimension{-1, 1, -1});             // Pa s = kg m^-1 s^-1
static_assert(dims::surface_tension == dimension{0, 1, -2});                // N/m = kg s^-2
static_assert(dims::heat_flux_density == dimension{0, 1, -3});              // W/m^2 = kg s^-3
static_assert(dims::thermal_conductivity == dimension{1, 1, -3, 0, -1});    // W/(m K) = m kg s^-3 K^-1
static_assert(dims::specific_heat_capacity == dimension{2, 0, -2, 0, -1});  // J/(kg K) = m^2 s^-2 K^-1
static_assert(dims::heat_capacity == dimension{2, 1, -2, 0, -1});           // J/K
static_assert(dims::molar_energy == dimension{2, 1, -2, 0, 0, -1});         // J/mol
static_assert(dims::permittivity == dimension{-3, -1, 4, 2});               // F/m
static_assert(dims::permeability == dimension{1, 1, -2, -2});               // H/m
static_assert(dims::electric_field_strength == dimension{1, 1, -3, -1});    // V/m
// identities of the trade (common practice, no source)
static_assert(dims::kinematic_viscosity == dims::thermal_diffusivity);
static_assert(dims::thermal_diffusivity == dims::mass_diffusivity);
static_assert(dims::heat_transfer_coefficient == dims::thermal_conductivity / dims::length);
static_assert(pow(dims::area, rational{1, 2}) == dims::length);
static_assert(pow(dims::velocity, rational{-2}) == dimension{-2, 0, 2});
static_assert(dims::force / dims::force == dims::dimensionless);
static_assert(dims::dimensionless.is_dimensionless());
static_assert(dims::heat_transfer_coefficient.base_count() == 3);
static_assert(dims::pressure[2] == rational{-2});
static_assert(dims::temperature[base_dimension::temperature] == rational{1});

TEST_SUITE("dimension") {
  TEST_CASE("operator[] checks its index") {
    CHECK_THROWS_AS((void)dims::force[7], std::out_of_range);
  }

  TEST_CASE("ASCII and Unicode text forms in ISO 80000-1 order") {
    CHECK(to_string(dims::dynamic_viscosity) == "L^-1 M T^-1");
    CHECK(to_string(dims::dynamic_viscosity, text_form::unicode) == "L\u207b\u00b9 M T\u207b\u00b9");
    CHECK(to_string(dims::thermal_conductivity) == "L M T^-3 Theta^-1");
    CHECK(to_string(dims::thermal_conductivity, text_form::unicode) == "L M T\u207b\u00b3 \u0398\u207b\u00b9");
    CHECK(to_string(pow(dims::length, rational{1, 2})) == "L^(1/2)");
    CHECK(to_string(dims::dimensionless) == "1");
    CHECK(to_string(pow(dims::length, rational{12})) == "L^12");
    CHECK(to_string(pow(dims::length, rational{12}), text_form::unicode) == "L\u00b9\u00b2");
    std::ostringstream os;
    os << dims::force << " | " << rational{-3, 4};
    CHECK(os.str() == "L M T^-2 | -3/4");
  }

  TEST_CASE("coherent SI unit strings in both forms") {
    CHECK(si_unit_string(dims::dynamic_viscosity, text_form::unicode) == "kg\u00b7m\u207b\u00b9\u00b7s\u207b\u00b9");
    CHECK(si_unit_string(dims::dynamic_viscosity, text_form::ascii) == "kg/(m*s)");
    CHECK(si_unit_string(dims::frequency, text_form::ascii) == "1/s");
    CHECK(si_unit_string(dims::force, text_form::ascii) == "kg*m/s^2");
    CHECK(si_unit_string(dims::heat_transfer_coefficient, text_form::ascii) == "kg/(s^3*K)");
    CHECK(si_unit_string(pow(dims::length, rational{1, 2}), text_form::ascii) == "m^(1/2)");
    CHECK(si_unit_string(dims::dimensionless) == "1");
  }
}
