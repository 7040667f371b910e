// Tests of nondim/solver/fields/state.hpp: state vectors whose components have their own
// dimensions, over structure-of-arrays and array-of-structures storage. The example is the
// conservation form of quasi-one-dimensional nozzle flow.
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <array>
#include <cmath>
#include <cstddef>
#include <span>
#include <string>
#include <type_traits>
#include <vector>

#include "../examples/nozzle/nozzle_flow.hpp"

using namespace nondim;

// Anderson, Computational Fluid Dynamics: The Basics with Applications (1995), ch. 7,
// quasi-one-dimensional nozzle flow in conservation form (from memory):
//   dU/dt + dF/dx = J,  U = (rho A, rho A V, rho (e + V^2/2) A),
//   F = (rho A V, rho A V^2 + p A, rho (e + V^2/2) A V + p A V),  J = (0, p dA/dx, 0).
// The conserved variables U (mass, momentum, energy) and the fluxes F (mass_flux,
// momentum_flux, energy_flux) are the example solver's own.
namespace nozzle {
struct density : component<dims::density> {};
struct velocity : component<dims::velocity> {};
struct pressure : component<dims::pressure> {};
using primitive = state_set<density, velocity, pressure>;

/// F from U alone: p A = (gamma - 1) (U3 - U2^2 / (2 U1)), V = U2 / U1.
template <class S>
state<flux> flux_of(const S& u, double gamma) {
  const auto rho_a = u.template get<mass>();
  const auto rho_a_v = u.template get<momentum>();
  const auto rho_e_a = u.template get<energy>();
  const quantity<dims::velocity> v = rho_a_v / rho_a;
  const quantity<dims::force> p_a = (gamma - 1.0) * (rho_e_a - 0.5 * rho_a_v * v);
  return state<flux>(rho_a_v, rho_a_v * v + p_a, (rho_e_a + p_a) * v);
}

/// The same on raw doubles, the same operations in the same order.
std::array<double, 3> flux_of(const std::array<double, 3>& u, double gamma) {
  const double v = u[1] / u[0];
  const double p_a = (gamma - 1.0) * (u[2] - 0.5 * u[1] * v);
  return {u[1], u[1] * v + p_a, (u[2] + p_a) * v};
}

/// A flow state of our own: air (gamma = 1.4, R = 287 J/(kg K)) in a duct.
struct flow {
  double rho, v, t, a;  // kg/m^3, m/s, K, m^2
};
constexpr double gamma_air = 1.4;
constexpr double r_air = 287.0;

double pressure_of(const flow& f) {
  return f.rho * r_air * f.t;
}
double internal_energy_of(const flow& f) {
  return r_air * f.t / (gamma_air - 1.0);
}  // e = cv T

/// U by Anderson's definitions.
std::array<double, 3> conserved_of(const flow& f) {
  const double e = internal_energy_of(f);
  return {f.rho * f.a, f.rho * f.a * f.v, f.rho * (e + 0.5 * f.v * f.v) * f.a};
}
/// F by Anderson's definitions.
std::array<double, 3> textbook_flux_of(const flow& f) {
  const double e = internal_energy_of(f), p = pressure_of(f);
  return {f.rho * f.a * f.v, f.rho * f.a * f.v * f.v + p * f.a,
          f.rho * (e + 0.5 * f.v * f.v) * f.a * f.v + p * f.a * f.v};
}

std::vector<flow> duct(std::size_t n) {
  std::vector<flow> cells(n);
  for (std::size_t i = 0; i < n; ++i) {
    const double x = static_cast<double>(i) / static_cast<double>(n);
    cells[i] = {1.1 - 0.4 * x, 150.0 + 250.0 * x, 290.0 - 60.0 * x, 0.05 + 0.03 * x * x};
  }
  return cells;
}

/// Stores U of each cell into a view, whatever its layout.
template <class View>
void fill(const View& u, const std::vector<flow>& cells) {
  for (std::size_t i = 0; i < cells.size(); ++i) {
    const auto c = conserved_of(cells[i]);
    u[i] = state<conserved>::from_si(c);
  }
}
}  // namespace nozzle

using nozzle::conserved;
using nozzle::flux;

// The set: dimensions, positions by tag, the tags by position.
static_assert(conserved::size == 3);
static_assert(conserved::dims[1] == dims::mass_flow_rate);
static_assert(conserved::index_of<nozzle::energy> == 2);
static_assert(conserved::index_of<nozzle::pressure> == 3);  // absent
static_assert(std::is_same_v<conserved::component_type<1>, nozzle::momentum>);
// dt/dx times a flux has the dimensions of the conserved variables, position by position,
// and keeps the names of the flux.
using change = decltype(quantity<dims::time / dims::length>{} * std::declval<state<flux>>());
static_assert(change::set::dims == conserved::dims);
static_assert(change::set::index_of<nozzle::momentum_flux> == 1);
// The component views: contiguous for soa, strided for aos.
static_assert(std::is_same_v<decltype(state_view<conserved, layout::soa>().get<nozzle::energy>()),
                             field_view<dims::energy / dims::length>>);
static_assert(std::is_same_v<decltype(state_view<conserved, layout::aos, const double>().get<0>()),
                             strided_field_view<dims::mass / dims::length, const double>>);
// A cell's component is an element of that component's dimension.
static_assert(std::is_same_v<decltype(state_view<conserved, layout::aos>()[0].get<nozzle::momentum>()),
                             field_reference<dims::mass_flow_rate>>);
static_assert(std::is_same_v<decltype(state<conserved>().get<2>()), quantity<dims::energy / dims::length>>);
// A state value is its numbers, nothing more.
static_assert(sizeof(state<conserved>) == 3 * sizeof(double));
// gradients of a state: every component over a length
static_assert(decltype(forward_gradient(std::declval<state_view<flux, layout::soa>>(), 0,
                                        quantity<dims::length>{}))::set::dims[1] == dims::force / dims::length);

TEST_SUITE("state vectors") {
  TEST_CASE("soa and aos views address double[3][n] and double[n][3] as laid out by hand") {
    constexpr std::size_t n = 4;
    double soa[3][n] = {};  // NOLINT(modernize-avoid-c-arrays): the layout a solver uses
    double aos[n][3] = {};  // NOLINT(modernize-avoid-c-arrays)
    const state_view<conserved, layout::soa> u(&soa[0][0], n);
    const state_view<conserved, layout::aos> w(&aos[0][0], n);
    CHECK(u.size() == n);
    CHECK(w.size() == n);
    for (std::size_t i = 0; i < n; ++i) {
      const double x = static_cast<double>(i);
      const state<conserved> s(x * units::kg / units::m, (10.0 + x) * units::kg / units::s,
                               (100.0 + x) * units::J / units::m);
      u[i] = s;
      w[i] = s;
    }
    for (std::size_t i = 0; i < n; ++i) {
      const double x = static_cast<double>(i);
      CHECK(soa[0][i] == x);
      CHECK(soa[1][i] == 10.0 + x);
      CHECK(soa[2][i] == 100.0 + x);
      CHECK(aos[i][0] == x);
      CHECK(aos[i][1] == 10.0 + x);
      CHECK(aos[i][2] == 100.0 + x);
    }
    // a component of every cell
    const auto e_soa = u.get<nozzle::energy>();
    const auto e_aos = w.get<nozzle::energy>();
    CHECK(e_soa.data() == &soa[2][0]);
    CHECK(e_aos.data() == &aos[0][2]);
    CHECK(e_aos.stride() == 3);
    CHECK(e_aos[3].si() == 103.0);
    e_aos[1] = 7.0 * units::J / units::m;
    CHECK(aos[1][2] == 7.0);
    // a component of one cell, by tag or position, and the free get
    u[2].get<nozzle::momentum>() = 42.0 * units::kg / units::s;
    CHECK(soa[1][2] == 42.0);
    CHECK(get<1>(u[2]).si() == 42.0);
    CHECK(get<nozzle::mass>(w).size() == n);
    // storage given as a span: a whole number of cells
    std::vector<double> storage(12);
    const state_view<conserved, layout::aos> s{std::span<double>(storage)};
    CHECK(s.size() == 4);
    std::vector<double> ragged(10);
    using soa_view = state_view<conserved, layout::soa>;
    CHECK_THROWS_AS(soa_view{std::span<double>(ragged)}, field_size_error);
    try {
      soa_view{std::span<double>(ragged)};
      FAIL("no exception");
    } catch (const field_size_error& e) {
      CHECK(e.expected() == 12);
      CHECK(e.actual() == 10);
      CHECK(std::string(e.what()).find("12") != std::string::npos);
      CHECK(std::string(e.what()).find("10") != std::string::npos);
    }
    // a read-only view of the same storage
    const state_view<conserved, layout::soa, const double> c = u;
    CHECK(c[2].get<1>().si() == 42.0);
    const state<conserved> copy = c[2];
    CHECK(copy.si(1) == 42.0);
  }

  TEST_CASE("the flux from the conserved variables matches the textbook conservation form") {
    const auto cells = nozzle::duct(6);
    std::vector<double> soa(3 * cells.size()), aos(3 * cells.size());
    const state_view<conserved, layout::soa> u(soa.data(), cells.size());
    const state_view<conserved, layout::aos> w(aos.data(), cells.size());
    nozzle::fill(u, cells);
    nozzle::fill(w, cells);
    for (std::size_t i = 0; i < cells.size(); ++i) {
      const auto expected = nozzle::textbook_flux_of(cells[i]);
      const state<flux> fu = nozzle::flux_of(u[i], nozzle::gamma_air);
      const state<flux> fw = nozzle::flux_of(w[i], nozzle::gamma_air);
      for (std::size_t k = 0; k < 3; ++k) {
        CHECK(fu.si(k) == doctest::Approx(expected[k]).epsilon(1e-13));
        CHECK(fw.si(k) == fu.si(k));  // both layouts, bit for bit
      }
      // and bit for bit the raw-double form of the same operations
      const auto raw = nozzle::flux_of(nozzle::conserved_of(cells[i]), nozzle::gamma_air);
      for (std::size_t k = 0; k < 3; ++k) CHECK(fu.si(k) == raw[k]);
      // the named components read as quantities of their dimensions
      const quantity<dims::force> f2 = fu.get<nozzle::momentum_flux>();
      CHECK(f2.si() == fu.si(1));
    }
  }

  TEST_CASE("the nondimensional momentum flux is rho' A' V'^2 + p' A' / gamma") {
    // Anderson (1995), ch. 7, nondimensional conservation form (from memory): with rho' =
    // rho/rho0, V' = V/a0, p' = p/p0, p0 = rho0 R T0, a0^2 = gamma R T0, A' = A/A*, the momentum
    // flux is F2' = rho' A' V'^2 + (1/gamma) p' A'. References rho0, a0 and L = sqrt(A*) scale a
    // force by rho0 a0^2 L^2 = gamma p0 A*, which is that form.
    const double rho0 = 1.2, t0 = 300.0, a_star = 0.04;
    const double a0 = std::sqrt(nozzle::gamma_air * nozzle::r_air * t0);
    const double p0 = rho0 * nozzle::r_air * t0;
    const auto s = scales(rho0 * units::kg / units::m3, a0 * units::m / units::s, std::sqrt(a_star) * units::m);

    const auto cells = nozzle::duct(5);
    std::vector<double> f_aos(3 * cells.size());
    const state_view<flux, layout::aos> f(f_aos.data(), cells.size());
    for (std::size_t i = 0; i < cells.size(); ++i) {
      f[i] = nozzle::flux_of(state<conserved>::from_si(nozzle::conserved_of(cells[i])), nozzle::gamma_air);
    }
    std::vector<double> f2_star(cells.size());
    s.nondimensional(f.get<nozzle::momentum_flux>(), f2_star);  // a strided component
    for (std::size_t i = 0; i < cells.size(); ++i) {
      const auto& c = cells[i];
      const double rho_p = c.rho / rho0, v_p = c.v / a0, p_p = nozzle::pressure_of(c) / p0, a_p = c.a / a_star;
      CHECK(f2_star[i] == doctest::Approx(rho_p * a_p * v_p * v_p + p_p * a_p / nozzle::gamma_air).epsilon(1e-13));
    }
  }

  TEST_CASE("an explicit step U - dt/dx (F[i+1] - F[i]) on both layouts conserves and equals raw arithmetic") {
    const auto cells = nozzle::duct(8);
    const std::size_t n = cells.size();
    const auto dt = 2.0e-6 * units::s;
    const auto dx = 0.01 * units::m;
    for (const bool aos_layout : {false, true}) {
      CAPTURE(aos_layout);
      std::vector<double> u_store(3 * n), f_store(3 * n), next_store(3 * n);
      auto run = [&](auto u, auto f, auto next) {
        nozzle::fill(u, cells);
        for (std::size_t i = 0; i < n; ++i) f[i] = nozzle::flux_of(u[i], nozzle::gamma_air);
        next[0] = u[0];
        next[n - 1] = u[n - 1];
        for (std::size_t i = 1; i + 1 < n; ++i) next[i] = u[i] - dt / dx * (f[i + 1] - f[i]);
        // the difference helper gives the same change
        for (std::size_t i = 1; i + 1 < n; ++i) {
          const state<conserved> again = u[i] - dt * forward_gradient(f, i, dx);
          const state<conserved> now = next[i];
          for (std::size_t k = 0; k < 3; ++k) CHECK(again.si(k) == doctest::Approx(now.si(k)).epsilon(1e-15));
        }
        // finite-volume conservation (common practice, no source): the interior total changes
        // by the fluxes through its two ends only, -dt/dx (F[n-1] - F[1])
        for (std::size_t k = 0; k < 3; ++k) {
          double change = 0.0, scale = 0.0;
          for (std::size_t i = 1; i + 1 < n; ++i) {
            change += next[i].si(k) - u[i].si(k);
            scale += std::abs(u[i].si(k));
          }
          const double ends = -(dt / dx).si() * (f[n - 1].si(k) - f[1].si(k));
          CHECK(change == doctest::Approx(ends).epsilon(1e-9).scale(scale));
        }
        // raw arithmetic on the same numbers, in the same order
        for (std::size_t i = 1; i + 1 < n; ++i) {
          for (std::size_t k = 0; k < 3; ++k) {
            const double raw = u[i].si(k) - (dt / dx).si() * (f[i + 1].si(k) - f[i].si(k));
            CHECK(next[i].si(k) == raw);
          }
        }
      };
      if (aos_layout) {
        run(state_view<conserved, layout::aos>(u_store.data(), n), state_view<flux, layout::aos>(f_store.data(), n),
            state_view<conserved, layout::aos>(next_store.data(), n));
      } else {
        run(state_view<conserved, layout::soa>(u_store.data(), n), state_view<flux, layout::soa>(f_store.data(), n),
            state_view<conserved, layout::soa>(next_store.data(), n));
      }
    }
  }

  TEST_CASE("state values: construction from quantities, components by tag and position, arithmetic") {
    state<conserved> a(2.0 * units::kg / units::m, 3.0 * units::kg / units::s, 5.0 * units::J / units::m);
    const state<conserved> b = state<conserved>::from_si({1.0, 1.0, 1.0});
    CHECK(a.get<nozzle::mass>().si() == 2.0);
    CHECK(a.get<1>().si() == 3.0);
    a.get<nozzle::energy>() = 6.0 * units::J / units::m;
    CHECK(a.si(2) == 6.0);
    a += b;
    CHECK(a.si(0) == 3.0);
    a -= 2.0 * b;
    CHECK(a.si(0) == 1.0);
    CHECK(a.si(2) == 5.0);
    const auto c = (a + b) / 2.0;
    CHECK(c.si(1) == 1.5);
    const auto d = -(a - b) * 4.0;
    CHECK(d.si(2) == -16.0);
    // a state times a velocity: every component's dimension times a velocity
    const auto moved = a * (2.0 * units::m / units::s);
    static_assert(decltype(moved)::set::dims[0] == dims::mass_flow_rate);
    CHECK(moved.si(0) == 2.0);
    const auto back = moved / (2.0 * units::m / units::s);
    static_assert(decltype(back)::set::dims == conserved::dims);
    CHECK(back.si(0) == 1.0);
    // a state of equal dimensions under other names converts; the names of the target are kept
    const state<flux> f = state<flux>::from_si({1.0, 2.0, 3.0});
    const auto rate = (0.5 * units::s / units::m) * f;
    const state<conserved> as_conserved = rate;
    CHECK(as_conserved.si(2) == 1.5);
    // an element of a field scales a state too
    std::vector<double> dt_si{0.5};
    const field_view<dims::time / dims::length> dt_dx(dt_si.data(), 1);
    const state<conserved> e = dt_dx[0] * f;
    CHECK(e.si(1) == 1.0);
  }
}
