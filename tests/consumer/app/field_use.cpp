// An outside program on the installed package, find_package(nondim COMPONENTS quantity) with
// Eigen3 and Boost disabled: the typed fields of <nondim/field.hpp> over the program's own
// arrays, and a whole-field conversion by reference scales. Each value is checked against the
// same formula on the raw numbers; a wrong one is named on stderr and the exit status is 1.
//
// The flow is air in a duct (a scenario of our own). Formulas: dynamic pressure rho u^2 / 2,
// mass flux rho u A, the central difference (f(x + h) - f(x - h)) / (2 h) and the pressure
// scale rho U^2 (common practice, no source).
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <cmath>
#include <cstddef>
#include <cstdio>
#include <span>
#include <vector>

namespace {

int failures = 0;

void check(bool ok, const char* what) {
  if (!ok) {
    std::fprintf(stderr, "consumer_field: wrong value: %s\n", what);
    ++failures;
  }
}

bool close(double a, double b) {
  return std::abs(a - b) <= 1e-13 * std::abs(b);
}

struct cell {  // the program's own array of structs
  double rho;  // kg/m^3
  double u;    // m/s
  double p;    // Pa
};

struct mass : nondim::component<nondim::dims::mass / nondim::dims::length> {};  // rho A
struct momentum : nondim::component<nondim::dims::mass_flow_rate> {};           // rho u A
using conserved = nondim::state_set<mass, momentum>;

}  // namespace

int main() {
  using namespace nondim;
  const std::size_t n = 5;
  std::vector<cell> cells(n);
  std::vector<double> area_si(n);  // m^2
  for (std::size_t i = 0; i < n; ++i) {
    const double x = static_cast<double>(i);
    cells[i] = {1.2 - 0.05 * x, 40.0 + 10.0 * x, 101325.0 - 800.0 * x * x};
    area_si[i] = 0.02 + 0.001 * x;
  }

  // field_view over a std::vector<double>: written as quantities, read back as the raw numbers
  const field_view<dims::area> area{std::span<double>(area_si)};
  area[4] = 25.0 * units::cm * units::cm;
  check(close(area_si[4], 25.0e-4), "field_view: 25 cm^2 stored as 2.5e-3 m^2");
  const field_view<dims::area, const double> area_read = area;
  check(area_read.data() == area_si.data() && area_read.size() == n,
        "field_view: a read-only view of the same storage");

  // strided_field_view over the array of structs, one member each
  const strided_field_view<dims::density> rho(&cells[0].rho, n, sizeof(cell) / sizeof(double));
  const auto u = member_view<dims::velocity>(std::span<cell>(cells), &cell::u);
  const auto p = member_view<dims::pressure>(std::span<const cell>(cells), &cell::p);

  // field: the dynamic pressure of every cell
  field<dims::pressure> q_dyn(n);
  for (std::size_t i = 0; i < n; ++i) q_dyn[i] = 0.5 * rho[i] * u[i] * u[i];
  for (std::size_t i = 0; i < n; ++i)
    check(close(q_dyn[i].si(), 0.5 * cells[i].rho * cells[i].u * cells[i].u), "field: rho u^2 / 2");

  // state_view over structure-of-arrays and array-of-structures storage, the same states
  std::vector<double> soa_si(2 * n), aos_si(2 * n);
  const state_view<conserved, layout::soa> u_soa(soa_si.data(), n);
  const state_view<conserved, layout::aos> u_aos(aos_si.data(), n);
  for (std::size_t i = 0; i < n; ++i) {
    const state<conserved> s(rho[i] * area[i], rho[i] * u[i] * area[i]);
    u_soa[i] = s;
    u_aos[i] = s;
  }
  for (std::size_t i = 0; i < n; ++i) {
    const double mdot = cells[i].rho * cells[i].u * area_si[i];
    check(close(soa_si[n + i], mdot), "state_view soa: component 1 of cell i at [n + i]");
    check(close(aos_si[2 * i + 1], mdot), "state_view aos: component 1 of cell i at [2 i + 1]");
    const quantity<dims::velocity> v = u_aos[i].get<momentum>() / u_soa[i].get<mass>();
    check(close(v.si(), cells[i].u), "state_view: (rho u A) / (rho A) is u");
  }

  // a typed difference: the central pressure gradient, Pa/m, on a 0.1 m grid
  const quantity<dims::length> dx = 0.1 * units::m;
  const quantity<dims::pressure / dims::length> dp_dx = central_gradient(p, 2, dx);
  check(close(dp_dx.si(), (cells[3].p - cells[1].p) / (2.0 * 0.1)), "central_gradient: (p3 - p1) / (2 dx)");

  // a whole-field conversion: the pressures over rho U^2, and back
  const auto s = scales(1.2 * units::kg / units::m3, 40.0 * units::m / units::s, 1.0 * units::m);
  std::vector<double> p_star(n);
  s.nondimensional(p, p_star);
  for (std::size_t i = 0; i < n; ++i)
    check(close(p_star[i], cells[i].p / (1.2 * 40.0 * 40.0)), "scales: p / (rho U^2) of every element");
  std::vector<double> p_back_si(n);
  s.dimensional(p_star, field_view<dims::pressure>(p_back_si.data(), n));
  for (std::size_t i = 0; i < n; ++i) check(close(p_back_si[i], cells[i].p), "scales: dimensional(nondimensional(p))");

  return failures == 0 ? 0 : 1;
}
