#pragma once
/// \file nozzle_flow.hpp
/// \brief A quasi-one-dimensional Euler solver for a converging-diverging nozzle, typed down
/// to its kernels: the conserved variables, their fluxes and the source term are state
/// vectors over the solver's own `double` arrays, and every formula is checked for
/// dimensions by the compiler. Standard library and the solver half of nondim only.
///
/// Equations: the conservation form of Anderson, Computational Fluid Dynamics: The Basics
/// with Applications (1995), ch. 7 (from memory),
///   dU/dt + dF/dx = J,  U = (rho A, rho A V, rho (e + V^2/2) A),
///   F = (rho A V, rho A V^2 + p A, (rho (e + V^2/2) A + p A) V),  J = (0, p dA/dx, 0),
/// advanced by MacCormack's predictor-corrector to a steady state. Inlet: a reservoir at
/// p0, T0 (V extrapolated, T and p from the isentropic relations); outlet: supersonic, every
/// variable extrapolated.
///
/// The nozzle (our own): A(x) = A_t (1 + k (x/L - s)^2) with the throat at x = s L.
///
/// A domain is the run of points [first, first + count) of the global grid, with one halo
/// point on each side; `Comm` supplies the halo exchange and the global minimum, so one
/// code serves the serial and the distributed run.

#include <nondim/field.hpp>
#include <nondim/quantity.hpp>

#include <cmath>
#include <cstddef>
#include <vector>

namespace nozzle {

using namespace nondim;

// ---- the state vectors ---------------------------------------------------------------
struct mass : component<dims::mass / dims::length> {};      // U1 = rho A, kg/m
struct momentum : component<dims::mass_flow_rate> {};       // U2 = rho A V, kg/s
struct energy : component<dims::energy / dims::length> {};  // U3 = rho E A, J/m
using conserved = state_set<mass, momentum, energy>;

struct mass_flux : component<dims::mass_flow_rate> {};  // F1, kg/s
struct momentum_flux : component<dims::force> {};       // F2, N
struct energy_flux : component<dims::power> {};         // F3, W
using flux = state_set<mass_flux, momentum_flux, energy_flux>;

struct mass_source : component<dims::mass_flow_rate / dims::length> {};  // J1 = 0
struct pressure_force : component<dims::force / dims::length> {};        // J2 = p dA/dx
struct energy_source : component<dims::power / dims::length> {};         // J3 = 0
using source = state_set<mass_source, pressure_force, energy_source>;

using state_storage = state_view<conserved, layout::soa>;
using flux_storage = state_view<flux, layout::soa>;

// ---- inputs -------------------------------------------------------------------------
struct gas {
  double gamma;                             // ratio of specific heats
  quantity<dims::specific_gas_constant> r;  // specific gas constant
  [[nodiscard]] quantity<dims::specific_heat_capacity> cv() const { return r / (gamma - 1.0); }
  [[nodiscard]] quantity<dims::specific_heat_capacity> cp() const { return gamma * r / (gamma - 1.0); }
};

struct reservoir {
  quantity<dims::pressure> p0;     // stagnation pressure
  quantity<dims::temperature> t0;  // stagnation temperature (absolute, in kelvin, for T/T0 and p = rho R T)
};

struct shape {
  quantity<dims::length> length;  // inlet to outlet
  quantity<dims::area> throat;    // A_t
  double k;                       // A/A_t = 1 + k (x/L - s)^2
  double s;                       // throat position as a fraction of the length
  [[nodiscard]] quantity<dims::area> area(quantity<dims::length> x) const {
    const double xi = x / length - s;
    return throat * (1.0 + k * xi * xi);
  }
};

struct setup {
  gas g;
  reservoir res;
  shape nozzle;
  std::size_t points;  // grid points, inlet and outlet included
  double courant;      // Courant number of the time step
  std::size_t steps;   // time steps (a fixed count: runs compare step by step)
};

/// The part of the grid one process owns: global points [first, first + count).
struct domain {
  std::size_t first = 0;
  std::size_t count = 0;
  std::size_t points = 0;  // global
  [[nodiscard]] bool has_inlet() const { return first == 0; }
  [[nodiscard]] bool has_outlet() const { return first + count == points; }
};

/// Steady solution on the owned points, in the solver's storage units.
struct solution {
  std::vector<double> x, rho, v, p, t;
  std::size_t steps = 0;
  double largest_courant = 0.0;  // of the last step, over the whole grid
};

/// The serial run: one domain, nothing to exchange.
struct serial {
  [[nodiscard]] static domain partition(std::size_t points) { return {0, points, points}; }
  static void exchange(const state_storage&) {}
  template <dimension D>
  static quantity<D> global_min(quantity<D> q) {
    return q;
  }
  template <dimension D>
  static quantity<D> global_max(quantity<D> q) {
    return q;
  }
};

// ---- the kernels ----------------------------------------------------------------------

/// p A from the conserved variables: (gamma - 1) (U3 - U2^2 / (2 U1)).
template <class U>
quantity<dims::force> pressure_area(const U& u, const gas& g) {
  const quantity<dims::velocity> v = u.template get<momentum>() / u.template get<mass>();
  return (g.gamma - 1.0) * (u.template get<energy>() - 0.5 * u.template get<momentum>() * v);
}

/// F from U alone.
template <class U>
state<flux> flux_of(const U& u, const gas& g) {
  const auto rho_a = u.template get<mass>();
  const auto rho_a_v = u.template get<momentum>();
  const auto rho_e_a = u.template get<energy>();
  const quantity<dims::velocity> v = rho_a_v / rho_a;
  const quantity<dims::force> p_a = pressure_area(u, g);
  return state<flux>(rho_a_v, rho_a_v * v + p_a, (rho_e_a + p_a) * v);
}

/// J = (0, p dA/dx, 0).
template <class U>
state<source> source_of(const U& u, const gas& g, quantity<dims::area> a, quantity<dims::area / dims::length> da_dx) {
  const quantity<dims::pressure> p = pressure_area(u, g) / a;
  return state<source>(quantity<dims::mass_flow_rate / dims::length>{}, p * da_dx,
                       quantity<dims::power / dims::length>{});
}

/// U of a flow state at area a.
inline state<conserved> conserved_of(quantity<dims::density> rho, quantity<dims::velocity> v,
                                     quantity<dims::temperature> t, quantity<dims::area> a, const gas& g) {
  const quantity<dims::specific_energy> e = g.cv() * t;
  return state<conserved>(rho * a, rho * a * v, rho * (e + 0.5 * v * v) * a);
}

/// The speed of sound from U: a^2 = gamma p / rho.
template <class U>
quantity<dims::velocity> sound_speed(const U& u, const gas& g, quantity<dims::area> a) {
  const quantity<dims::pressure> p = pressure_area(u, g) / a;
  const quantity<dims::density> rho = u.template get<mass>() / a;
  return sqrt(g.gamma * p / rho);
}

// ---- the solver -----------------------------------------------------------------------

/// Runs the nozzle to its steady state on domain `d` (local index j = global index - first + 1;
/// j = 0 and j = count + 1 are halo points).
template <class Comm>
solution run(const setup& in, const domain& d, Comm& comm) {
  const gas& g = in.g;
  const std::size_t n = d.count + 2;
  const quantity<dims::length> dx = in.nozzle.length / static_cast<double>(in.points - 1);
  auto global = [&](std::size_t j) { return d.first + j - 1; };  // valid for j >= 1 or first > 0
  auto x_at = [&](std::size_t j) { return static_cast<double>(global(j)) * dx; };

  // the solver's own arrays: double[3][n], structure of arrays
  std::vector<double> u_store(3 * n), ubar_store(3 * n), du_store(3 * n), f_store(3 * n), a_store(n), da_store(n);
  const state_storage u(u_store.data(), n), ubar(ubar_store.data(), n), du(du_store.data(), n);
  const flux_storage f(f_store.data(), n);
  const field_view<dims::area> area(a_store.data(), n);
  const field_view<dims::area / dims::length> da_dx(da_store.data(), n);

  // geometry at every local point the grid has (halo included); dA/dx by central differences
  const std::size_t j_lo = d.has_inlet() ? 1 : 0;
  const std::size_t j_hi = d.has_outlet() ? d.count : d.count + 1;  // inclusive
  for (std::size_t j = j_lo; j <= j_hi; ++j) area[j] = in.nozzle.area(x_at(j));
  for (std::size_t j = 1; j <= d.count; ++j) {
    const std::size_t i = global(j);
    if (i == 0)
      da_dx[j] = forward_gradient(area, j, dx);
    else if (i + 1 == in.points)
      da_dx[j] = backward_gradient(area, j, dx);
    else
      da_dx[j] = central_gradient(area, j, dx);
  }

  // initial state (our own guess): density and temperature falling, velocity rising along x
  const quantity<dims::density> rho0 = in.res.p0 / (g.r * in.res.t0);
  const quantity<dims::velocity> a0 = sqrt(g.gamma * g.r * in.res.t0);
  for (std::size_t j = j_lo; j <= j_hi; ++j) {
    const double xi = x_at(j) / in.nozzle.length;
    const double tr = 1.0 - 0.6 * xi;
    u[j] = conserved_of((1.0 - 0.85 * xi) * rho0, (0.1 + 1.6 * xi) * std::sqrt(tr) * a0, tr * in.res.t0, area[j], g);
  }

  auto apply_boundaries = [&](const state_storage& w) {
    if (d.has_inlet()) {  // reservoir: V extrapolated, T and p isentropic from T0, p0
      const quantity<dims::velocity> v =
          2.0 * (w[2].get<momentum>() / w[2].get<mass>()) - w[3].get<momentum>() / w[3].get<mass>();
      const quantity<dims::temperature> t = in.res.t0 - v * v / (2.0 * g.cp());
      const quantity<dims::pressure> p = in.res.p0 * std::pow(t / in.res.t0, g.gamma / (g.gamma - 1.0));
      w[1] = conserved_of(p / (g.r * t), v, t, area[1], g);
    }
    if (d.has_outlet()) {  // supersonic: linear extrapolation of U
      const std::size_t j = d.count;
      w[j] = 2.0 * w[j - 1] - w[j - 2];
    }
  };
  // interior points of this domain: every owned point but the global ends
  const std::size_t first_inner = d.has_inlet() ? 2 : 1;
  const std::size_t last_inner = d.has_outlet() ? d.count - 1 : d.count;

  solution out;
  comm.exchange(u);
  for (std::size_t step = 0; step < in.steps; ++step) {
    // time step: the smallest dx / (|V| + a) over the whole grid
    quantity<dims::time> dt_min = dx / sound_speed(u[1], g, area[1]);
    for (std::size_t j = 1; j <= d.count; ++j) {
      const quantity<dims::velocity> v = u[j].get<momentum>() / u[j].get<mass>();
      dt_min = min(dt_min, dx / (abs(v) + sound_speed(u[j], g, area[j])));
    }
    const quantity<dims::time> dt = in.courant * comm.global_min(dt_min);

    // predictor: forward differences
    for (std::size_t j = 0; j < n; ++j)
      if ((j >= j_lo && j <= j_hi)) f[j] = flux_of(u[j], g);
    for (std::size_t j = 1; j <= d.count; ++j) ubar[j] = u[j];  // the ends keep U
    for (std::size_t j = first_inner; j <= last_inner; ++j) {
      du[j] = dt * (source_of(u[j], g, area[j], da_dx[j]) - forward_gradient(f, j, dx));
      ubar[j] = u[j] + du[j];
    }
    comm.exchange(ubar);
    // corrector: backward differences on the predicted values, then the average
    for (std::size_t j = 0; j < n; ++j)
      if ((j >= j_lo && j <= j_hi)) f[j] = flux_of(ubar[j], g);
    for (std::size_t j = first_inner; j <= last_inner; ++j) {
      const state<conserved> dubar = dt * (source_of(ubar[j], g, area[j], da_dx[j]) - backward_gradient(f, j, dx));
      u[j] = u[j] + 0.5 * (du[j] + dubar);
    }
    apply_boundaries(u);
    comm.exchange(u);
    if (step + 1 == in.steps) {  // the largest Courant number of this step, over the whole grid
      quantity<dims::velocity> fastest{};
      for (std::size_t j = 1; j <= d.count; ++j) {
        const quantity<dims::velocity> v = u[j].get<momentum>() / u[j].get<mass>();
        fastest = max(fastest, abs(v) + sound_speed(u[j], g, area[j]));
      }
      out.largest_courant = dt * comm.global_max(fastest) / dx;
    }
  }

  // the primitive variables on the owned points
  for (std::size_t j = 1; j <= d.count; ++j) {
    const quantity<dims::density> rho = u[j].get<mass>() / area[j];
    const quantity<dims::velocity> v = u[j].get<momentum>() / u[j].get<mass>();
    const quantity<dims::pressure> p = pressure_area(u[j], g) / area[j];
    out.x.push_back(x_at(j).si());
    out.rho.push_back(rho.si());
    out.v.push_back(v.si());
    out.p.push_back(p.si());
    out.t.push_back((p / (rho * g.r)).si());
  }
  out.steps = in.steps;
  return out;
}

}  // namespace nozzle
