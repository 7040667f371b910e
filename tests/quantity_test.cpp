// Tests of nondim/quantity.hpp: compile-time dimension checking at zero run-time cost.
#include <nondim/quantity.hpp>

#include <doctest/doctest.h>

#include <cmath>
#include <sstream>
#include <type_traits>

using namespace nondim;

// zero cost: same size and copy semantics as the representation
static_assert(sizeof(quantity<dims::velocity>) == sizeof(double));
static_assert(sizeof(quantity<dims::force, float>) == sizeof(float));
static_assert(std::is_trivially_copyable_v<quantity<dims::pressure>>);
static_assert(std::is_nothrow_copy_constructible_v<quantity<dims::pressure>>);
// no implicit conversions from or to raw numbers for dimensional quantities
static_assert(std::is_convertible_v<quantity<dims::dimensionless>, double>);
static_assert(std::is_convertible_v<double, quantity<dims::dimensionless>>);

// constexpr arithmetic (common practice, no source: Re = rho U L / mu)
constexpr auto rho = 998.0 * units::kg / units::m3;
constexpr auto U = 2.0 * units::m / units::s;
constexpr auto D = 0.05 * units::m;
constexpr auto mu = 1.0e-3 * units::Pa * units::s;
constexpr double Re = rho * U * D / mu;
static_assert(Re > 99799.0 && Re < 99801.0);
static_assert(std::is_same_v<std::remove_cvref_t<decltype(rho * U * D / mu)>, quantity<dims::dimensionless>>);
static_assert(decltype(sqrt(D * D))::dim == dims::length);
static_assert(decltype(pow<1, 2>(D))::dim == pow(dims::length, rational{1, 2}));
static_assert(decltype(cbrt(D * D * D))::dim == dims::length);
static_assert(sqrt(4.0 * units::m2).si() == 2.0);
static_assert(pow<3>(2.0 * units::m).si() == 8.0);
static_assert(pow<-2>(2.0 * units::s).si() == 0.25);

TEST_SUITE("quantity") {
  TEST_CASE("products and quotients of quantities combine dimensions (SI Brochure 9th ed., table 4)") {
    const auto F = 3.0 * units::kg * (2.0 * units::m / (units::s * units::s));
    CHECK(decltype(F)::dim == dims::force);
    const auto p = (10.0 * units::N) / (2.0 * units::m2);
    CHECK(decltype(p)::dim == dims::pressure);
    CHECK(p / units::Pa == doctest::Approx(5.0));
    const auto P = (6.0 * units::J) / (2.0 * units::s);
    CHECK(decltype(P)::dim == dims::power);
    CHECK(P / units::W == doctest::Approx(3.0));
  }

  TEST_CASE("values are kept in coherent SI and read back in any unit of the same dimension") {
    const auto L = 10.0 * units::ft;  // NIST SP 811 B.8: 1 ft = 0.3048 m exactly
    CHECK(L.si() == doctest::Approx(3.048));
    CHECK(L / units::in == doctest::Approx(120.0));
    CHECK(in(L, units::m) == doctest::Approx(3.048));
    const auto v = 1.0 * units::knot;  // NIST SP 811 B.8: 1 knot = 1852/3600 m/s
    CHECK(v / (units::m / units::s) == doctest::Approx(0.5144444).epsilon(1e-7));
  }

  TEST_CASE("same-dimension addition, subtraction and comparison") {
    auto a = 1.0 * units::m;
    const auto b = 50.0 * units::cm;
    a += b;
    CHECK(a / units::m == doctest::Approx(1.5));
    a -= 2.0 * b;
    CHECK(a / units::m == doctest::Approx(0.5));
    CHECK(b < 1.0 * units::m);
    CHECK(b == 0.5 * units::m);
    CHECK(max(a, b) == b);
    CHECK(min(2.0 * units::m, b) == b);
    CHECK(abs(-b) == b);
    CHECK(hypot(3.0 * units::m, 4.0 * units::m) / units::m == doctest::Approx(5.0));
    CHECK(-b < b);
  }

  TEST_CASE("scaling by numbers keeps the dimension; dividing a number by a quantity inverts it") {
    const auto t = 4.0 * units::s;
    CHECK((t * 2) / units::s == doctest::Approx(8.0));
    CHECK((2.0f * t) / units::s == doctest::Approx(8.0));
    CHECK((t / 4) / units::s == doctest::Approx(1.0));
    const auto f = 1.0 / t;
    CHECK(decltype(f)::dim == dims::frequency);
    CHECK(f / units::Hz == doctest::Approx(0.25));
  }

  TEST_CASE("roots and powers give exact rational dimensions") {
    const auto A = 9.0 * units::m2;
    CHECK(sqrt(A) / units::m == doctest::Approx(3.0));
    const auto r = pow<1, 2>(2.0 * units::m);  // m^(1/2), as in a stress intensity factor MPa*m^0.5
    CHECK(decltype(r)::dim == pow(dims::length, rational{1, 2}));
    CHECK(r.si() == doctest::Approx(1.41421356));
    CHECK(pow<3, 2>(4.0 * units::m).si() == doctest::Approx(8.0));
    CHECK(cbrt(27.0 * units::m3) / units::m == doctest::Approx(3.0));
  }

  TEST_CASE("integer powers are plain products and other exponents cost one std::pow") {
    // x^4 by squaring is exact for small integers (common practice, no source: 3^4 = 81, 2^-5 = 1/32)
    CHECK(pow<4>(3.0 * units::m).si() == 81.0);
    CHECK(pow<-5>(2.0 * units::s).si() == 0.03125);
    static_assert(pow<4>(3.0 * units::m).si() == 81.0);
    // 32^(4/5) = (2^5)^(4/5) = 16 and 32^(2/5) = 4 (common practice, no source)
    const quantity<dims::dimensionless> x = 32.0;
    CHECK(static_cast<double>(pow<4, 5>(x)) == doctest::Approx(16.0));
    CHECK(static_cast<double>(pow<2, 5>(x)) == doctest::Approx(4.0));
    // the value a solver gets from std::pow(Re, 0.8), bit for bit (Dittus-Boelter exponent)
    const quantity<dims::dimensionless> re = 4.0e4;
    CHECK(static_cast<double>(pow<4, 5>(re)) == std::pow(4.0e4, 0.8));
    constexpr double c = pow<4, 5>(quantity<dims::dimensionless>{32.0});
    static_assert(c > 15.999999 && c < 16.000001);
    // a negative base with a non-integer exponent is a domain error of std::pow (ISO C 7.12.7.4):
    // NaN, as std::pow returns; a cube root stays real (std::cbrt, ISO C 7.12.7.1)
    CHECK(std::isnan(static_cast<double>(pow<4, 5>(quantity<dims::dimensionless>{-32.0}))));
    CHECK(cbrt(-27.0 * units::m3) / units::m == doctest::Approx(-3.0));
  }

  TEST_CASE("transcendental functions take dimensionless values") {
    const auto ratio = (2.0 * units::m) / (1.0 * units::m);
    CHECK(exp(ratio) == doctest::Approx(7.389056));
    CHECK(log(ratio) == doctest::Approx(0.693147));
    CHECK(sin(0.0 * units::rad / units::rad) == doctest::Approx(0.0));
    CHECK(atan2(1.0 * units::m, 1.0 * units::m) == doctest::Approx(0.785398));
  }

  TEST_CASE("absolute temperatures and differences are different things") {
    // SI Brochure 9th ed., 2.3.1: t/degC = T/K - 273.15
    const auto water_freezes = from_celsius(0.0);
    CHECK(water_freezes.kelvin() == doctest::Approx(273.15));
    // NIST SP 811 B.9: t/degF = 1.8 t/degC + 32
    CHECK(from_celsius(100.0).fahrenheit() == doctest::Approx(212.0));
    CHECK(from_fahrenheit(-40.0).celsius() == doctest::Approx(-40.0));
    const quantity<dims::temperature> rise = from_celsius(30.0) - from_celsius(20.0);
    CHECK(rise / units::K == doctest::Approx(10.0));
    CHECK(rise / units::delta_degF == doctest::Approx(18.0));  // NIST SP 811 B.9: 1 degF interval = 5/9 K
    CHECK((from_celsius(20.0) + rise).celsius() == doctest::Approx(30.0));
    CHECK((from_kelvin(300.0) - 10.0 * units::K).kelvin() == doctest::Approx(290.0));
    CHECK(from_celsius(20.0).absolute() / units::K == doctest::Approx(293.15));
    CHECK(from_celsius(10.0) < from_celsius(20.0));
  }

  TEST_CASE("stream output writes the SI value and its coherent unit") {
    std::ostringstream os;
    os << 1.8e-5 * units::Pa * units::s << "; " << 2.0 * units::m << "; " << (1.0 * units::m) / (4.0 * units::m);
    CHECK(os.str() == "1.8e-05 kg\u00b7m\u207b\u00b9\u00b7s\u207b\u00b9; 2 m; 0.25");
  }
}
