// Tests of nondim/field.hpp: typed views over a solver's own arrays (field_view,
// strided_field_view, field), their elements, iterators and typed differences.
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>

#include <doctest/doctest.h>

#include <algorithm>
#include <array>
#include <cstddef>
#include <iterator>
#include <numeric>
#include <span>
#include <type_traits>
#include <vector>

using namespace nondim;

namespace {
using pressure_view = field_view<dims::pressure>;
using density_view = field_view<dims::density>;

// An array of structs as a solver keeps it (common practice, no source).
struct cell {
  double rho;  // kg/m^3
  double u;    // m/s
  double p;    // Pa
  double t;    // K
};

// ISO 2533 standard atmosphere at sea level (from memory): p = 101325 Pa, rho = 1.225 kg/m^3,
// T = 288.15 K, R = 287.05287 J/(kg K).
constexpr double isa_p = 101325.0;
constexpr double isa_rho = 1.225;
constexpr double isa_t = 288.15;
constexpr double isa_r = 287.05287;
}  // namespace

// What the elements are: a proxy that reads as the quantity of the field's dimension.
static_assert(std::is_same_v<decltype(std::declval<pressure_view>()[0]), field_reference<dims::pressure>>);
static_assert(std::is_same_v<pressure_view::value_type, quantity<dims::pressure>>);
static_assert(std::is_convertible_v<field_reference<dims::pressure>, quantity<dims::pressure>>);
// Arithmetic on elements: p / rho is a specific energy, rho u^2 a pressure (common practice, no source).
static_assert(std::is_same_v<decltype(std::declval<pressure_view>()[0] / std::declval<density_view>()[0]),
                             quantity<dims::specific_energy>>);
static_assert(std::is_same_v<decltype(std::declval<density_view>()[0] * std::declval<field_view<dims::velocity>>()[0] *
                                      std::declval<field_view<dims::velocity>>()[0]),
                             quantity<dims::pressure>>);
// Read-only views hand out const storage; a mutable view converts to a read-only one, not back.
static_assert(std::is_same_v<decltype(std::declval<field_view<dims::pressure, const double>>().data()), const double*>);
static_assert(std::is_convertible_v<pressure_view, field_view<dims::pressure, const double>>);
static_assert(!std::is_convertible_v<field_view<dims::pressure, const double>, pressure_view>);
static_assert(
    std::is_convertible_v<strided_field_view<dims::pressure>, strided_field_view<dims::pressure, const double>>);
static_assert(std::is_convertible_v<pressure_view, strided_field_view<dims::pressure, const double>>);
// Iterators are random access, usable by the standard algorithms.
static_assert(std::random_access_iterator<pressure_view::iterator>);
static_assert(std::random_access_iterator<strided_field_view<dims::pressure, const double>::iterator>);
static_assert(std::indirectly_writable<pressure_view::iterator, quantity<dims::pressure>>);
static_assert(std::sortable<pressure_view::iterator>);
// A contiguous view is a pointer and a size; the stride of a contiguous view is known at compile time.
static_assert(sizeof(pressure_view) == sizeof(double*) + sizeof(std::size_t));
static_assert(pressure_view::stride() == 1);
// Typed differences: dp/dx is a pressure per length, du/dt an acceleration.
static_assert(std::is_same_v<decltype(central_gradient(std::declval<pressure_view>(), 1, quantity<dims::length>{})),
                             quantity<dims::pressure / dims::length>>);
static_assert(
    std::is_same_v<decltype(forward_gradient(std::declval<field_view<dims::velocity>>(), 1, quantity<dims::time>{})),
                   quantity<dims::acceleration>>);
static_assert(std::is_same_v<decltype(forward_difference(std::declval<pressure_view>(), 1)), quantity<dims::pressure>>);

TEST_SUITE("fields") {
  TEST_CASE("a field view reads and writes the solver's own array in coherent SI, no copy") {
    std::vector<double> storage(4, 0.0);
    const pressure_view p{std::span<double>(storage)};
    CHECK(p.size() == 4);
    CHECK(p.data() == storage.data());  // the same memory
    CHECK_FALSE(p.empty());

    // 1 kPa = 1000 Pa, 1 bar = 100 kPa (SI Brochure 9th ed., tables 5 and 8); 1 psi =
    // 6894.757 Pa (NIST SP 811, appendix B.8)
    p[0] = 2.5 * units::kPa;
    p[1] = 1.0 * units::bar;
    p[2] = 1.0 * units::psi;
    p[3] = p[0];
    CHECK(storage[0] == 2500.0);
    CHECK(storage[1] == 100000.0);
    CHECK(storage[2] == doctest::Approx(6894.757).epsilon(1e-7));
    CHECK(storage[3] == 2500.0);

    const quantity<dims::pressure> read = p[1];
    CHECK(read.si() == 100000.0);
    CHECK(p[1].get() == read);
    CHECK(p[1].si() == 100000.0);
    CHECK(p[1] / units::kPa == 100.0);

    // writes through the storage are seen by the view
    storage[0] = 7.0;
    CHECK(p[0].si() == 7.0);

    // compound assignment follows the quantity's rules
    p[0] += 3.0 * units::Pa;
    p[0] *= 2.0;
    CHECK(storage[0] == 20.0);
    p[0] -= p[3];
    CHECK(storage[0] == 20.0 - 2500.0);
    p[0] /= -4.0;
    CHECK(storage[0] == (2500.0 - 20.0) / 4.0);

    // a pointer and a count make the same view; subview is a window on it
    const pressure_view q(storage.data() + 1, 3);
    CHECK(q[0].si() == 100000.0);
    CHECK(p.subview(2, 2).data() == storage.data() + 2);
    CHECK(p.subview(2, 2).size() == 2);
    CHECK(p.si_values().data() == storage.data());
  }

  TEST_CASE("element arithmetic gives quantities of the right dimension: p = rho R T of the standard atmosphere") {
    std::vector<double> rho_si{isa_rho, 0.5 * isa_rho}, t_si{isa_t, isa_t}, p_si(2);
    const field_view<dims::density, const double> rho(rho_si.data(), 2);
    const field_view<dims::temperature, const double> t(t_si.data(), 2);
    const pressure_view p{std::span<double>(p_si)};
    const auto r = isa_r * units::J / (units::kg * units::K);
    for (std::size_t i = 0; i < p.size(); ++i) p[i] = rho[i] * r * t[i];
    // ISO 2533: 1.225 * 287.05287 * 288.15 = 101325 Pa to the 4 digits of rho
    CHECK(p[0] / units::Pa == doctest::Approx(isa_p).epsilon(1e-5));
    CHECK(p[1] / units::Pa == doctest::Approx(isa_p / 2.0).epsilon(1e-5));
    // the same operations on doubles, bit for bit
    CHECK(p_si[0] == rho_si[0] * r.si() * t_si[0]);
    // comparisons between elements and with quantities
    CHECK(p[1] < p[0]);
    CHECK(p[0] == p[0]);
    CHECK(p[0] > 1.0 * units::bar);
    CHECK(-p[0] < 0.0 * units::Pa);
    // a dimensionless element is a number
    std::vector<double> mach_si{0.3};
    const field_view<dims::dimensionless> mach(mach_si.data(), 1);
    const double m = mach[0];
    CHECK(m == 0.3);
    CHECK(mach[0] + 1.0 == 1.3);
  }

  TEST_CASE("a read-only view reads what a mutable view wrote") {
    std::vector<double> storage{1.0, 2.0, 3.0};
    const pressure_view p{std::span<double>(storage)};
    const field_view<dims::pressure, const double> c = p;
    p[1] = 5.0 * units::Pa;
    CHECK(c[1].si() == 5.0);
    CHECK(c.data() == storage.data());
    const std::vector<double> frozen{4.0, 8.0};
    const field_view<dims::pressure, const double> f{std::span<const double>(frozen)};
    CHECK(f[1] / units::Pa == 8.0);
    // an element of a read-only view may be copied into a writable one
    p[0] = f[1];
    CHECK(storage[0] == 8.0);
  }

  TEST_CASE("a strided view reads and writes one member of an array of structs") {
    std::vector<cell> cells(3);
    for (std::size_t i = 0; i < cells.size(); ++i) {
      cells[i] = {isa_rho, 10.0 * static_cast<double>(i), isa_p, isa_t};
    }
    constexpr std::size_t stride = sizeof(cell) / sizeof(double);
    static_assert(stride == 4);
    const strided_field_view<dims::velocity> u(&cells[0].u, cells.size(), stride);
    const strided_field_view<dims::pressure> p(&cells[0].p, cells.size(), stride);
    CHECK(u.size() == 3);
    CHECK(u.stride() == 4);
    CHECK(u.data() == &cells[0].u);
    CHECK(u[2] / (units::m / units::s) == 20.0);

    // 1 knot = 1852/3600 m/s (SI Brochure 9th ed., table 8)
    u[1] = 1.0 * units::knot;
    CHECK(cells[1].u == doctest::Approx(1852.0 / 3600.0).epsilon(1e-15));
    p[2] = 1.0 * units::atm;  // 101325 Pa exactly (CGPM 1954)
    CHECK(cells[2].p == 101325.0);
    // neighbours untouched
    CHECK(cells[1].rho == isa_rho);
    CHECK(cells[1].p == isa_p);
    CHECK(cells[2].u == 20.0);

    // member_view computes the first address and the stride from the member pointer
    const auto t = member_view<dims::temperature>(std::span<cell>(cells), &cell::t);
    static_assert(std::is_same_v<std::remove_const_t<decltype(t)>, strided_field_view<dims::temperature>>);
    CHECK(t.data() == &cells[0].t);
    CHECK(t.stride() == stride);
    const std::vector<cell>& frozen = cells;
    const auto rho = member_view<dims::density>(std::span<const cell>(frozen), &cell::rho);
    static_assert(std::is_same_v<std::remove_const_t<decltype(rho)>, strided_field_view<dims::density, const double>>);
    // p = rho R T per cell, strided views on both sides
    for (std::size_t i = 0; i < 3; ++i) p[i] = rho[i] * (isa_r * units::J / (units::kg * units::K)) * t[i];
    CHECK(cells[0].p == doctest::Approx(isa_p).epsilon(1e-5));
    // a subview keeps the stride
    CHECK(p.subview(1, 2)[1].address() == &cells[2].p);
  }

  TEST_CASE("iterators work with the standard algorithms, contiguous and strided") {
    std::vector<double> storage{3.0, 1.0, 2.0, 5.0, 4.0};
    const pressure_view p{std::span<double>(storage)};
    CHECK(std::distance(p.begin(), p.end()) == 5);
    CHECK(p.end() - p.begin() == 5);
    CHECK(p.begin()[3].si() == 5.0);
    CHECK(*(p.begin() + 4) == 4.0 * units::Pa);

    const auto sum = std::accumulate(p.begin(), p.end(), quantity<dims::pressure>{});
    CHECK(sum / units::Pa == 15.0);
    CHECK(*std::max_element(p.begin(), p.end()) == 5.0 * units::Pa);
    CHECK(std::count_if(p.begin(), p.end(), [](quantity<dims::pressure> x) { return x > 2.5 * units::Pa; }) == 3);

    std::sort(p.begin(), p.end());
    CHECK(storage == std::vector<double>{1.0, 2.0, 3.0, 4.0, 5.0});
    std::reverse(p.begin(), p.end());
    CHECK(storage == std::vector<double>{5.0, 4.0, 3.0, 2.0, 1.0});
    std::fill(p.begin() + 3, p.end(), 9.0 * units::Pa);
    CHECK(storage == std::vector<double>{5.0, 4.0, 3.0, 9.0, 9.0});

    // strided source (one member of structs), contiguous destination
    std::vector<cell> cells{{1.0, 2.0, 3.0, 4.0}, {5.0, 6.0, 7.0, 8.0}};
    const auto cp = member_view<dims::pressure>(std::span<cell>(cells), &cell::p);
    std::copy(cp.begin(), cp.end(), p.begin());
    CHECK(storage[0] == 3.0);
    CHECK(storage[1] == 7.0);
    // and back, through transform: dynamic pressure rho u^2 / 2 into p of each struct
    const auto rho = member_view<dims::density>(std::span<cell>(cells), &cell::rho);
    const auto u = member_view<dims::velocity>(std::span<cell>(cells), &cell::u);
    std::transform(rho.begin(), rho.end(), u.begin(), cp.begin(),
                   [](quantity<dims::density> r, quantity<dims::velocity> v) { return 0.5 * r * v * v; });
    CHECK(cells[0].p == 0.5 * 1.0 * 2.0 * 2.0);
    CHECK(cells[1].p == 0.5 * 5.0 * 6.0 * 6.0);
    // strided iterators step by the stride and compare in both directions
    auto it = cp.begin();
    ++it;
    CHECK(it.base() == &cells[1].p);
    CHECK(it - cp.begin() == 1);
    CHECK(cp.begin() < it);
    --it;
    CHECK(it == cp.begin());
    // a read-only iterator from a mutable one
    const field_view<dims::pressure, const double>::iterator ci = p.begin();
    CHECK(ci.base() == storage.data());
  }

  TEST_CASE("a field owns its values and hands out views") {
    field<dims::velocity> u(4);
    CHECK(u.size() == 4);
    CHECK(u[3].si() == 0.0);
    u[1] = 3.0 * units::m / units::s;
    const auto v = u.view();
    CHECK(v.data() == u.data());
    CHECK(v[1].si() == 3.0);
    const field<dims::velocity>& cu = u;
    const field_view<dims::velocity, const double> cv = cu;  // read-only from a const field
    CHECK(cv[1].si() == 3.0);
    field<dims::temperature> t(3, 300.0 * units::K);
    CHECK(std::all_of(t.begin(), t.end(), [](quantity<dims::temperature> x) { return x == 300.0 * units::K; }));
    t.resize(5);
    CHECK(t.size() == 5);
    CHECK(t[4].si() == 0.0);
    CHECK(t[0].si() == 300.0);
  }

  TEST_CASE("typed differences: exact for a linear field, central differences exact for a quadratic") {
    // A one-sided difference is exact for a linear function, the central difference for a
    // quadratic one (Taylor series; LeVeque, Finite Difference Methods for ODEs and PDEs, ch. 1,
    // from memory). Values are multiples of powers of two, so the arithmetic is exact.
    const std::size_t n = 6;
    const double dx_si = 0.25;
    const auto dx = dx_si * units::m;
    std::vector<double> lin(n), quad(n), x_si(n);
    for (std::size_t i = 0; i < n; ++i) {
      const double x = dx_si * static_cast<double>(i);
      x_si[i] = x;
      lin[i] = 1000.0 + 64.0 * x;  // p = p0 + G x, G = 64 Pa/m
      quad[i] = 8.0 * x * x;       // p = a x^2, dp/dx = 2 a x
    }
    const field_view<dims::pressure, const double> p_lin(lin.data(), n), p_quad(quad.data(), n);
    const field_view<dims::length, const double> x(x_si.data(), n);
    for (std::size_t i = 1; i + 1 < n; ++i) {
      CHECK(forward_gradient(p_lin, i, dx).si() == 64.0);
      CHECK(backward_gradient(p_lin, i, dx).si() == 64.0);
      CHECK(central_gradient(p_lin, i, dx).si() == 64.0);
      CHECK(central_gradient(p_quad, i, dx).si() == 16.0 * x_si[i]);
      // a field of coordinates gives the spacing
      CHECK(central_gradient(p_quad, i, x).si() == 16.0 * x_si[i]);
      CHECK(forward_gradient(p_lin, i, x).si() == 64.0);
      CHECK(backward_gradient(p_lin, i, x).si() == 64.0);
      CHECK(forward_difference(p_lin, i) / units::Pa == 16.0);
      CHECK(backward_difference(p_lin, i) / units::Pa == 16.0);
      CHECK(central_difference(p_lin, i) / units::Pa == 32.0);
    }
    // the one-sided differences of the quadratic carry the first-order error a dx
    // (forward: 2 a x + a dx)
    CHECK(forward_gradient(p_quad, 2, dx).si() == 16.0 * x_si[2] + 8.0 * dx_si);
    CHECK(backward_gradient(p_quad, 2, dx).si() == 16.0 * x_si[2] - 8.0 * dx_si);
    // a strided field works the same
    std::vector<cell> cells(3);
    for (std::size_t i = 0; i < 3; ++i) cells[i].p = lin[i];
    const auto ps = member_view<dims::pressure>(std::span<cell>(cells), &cell::p);
    CHECK(central_gradient(ps, 1, dx).si() == 64.0);
  }
}
