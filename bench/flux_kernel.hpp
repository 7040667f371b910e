#pragma once
/// \file flux_kernel.hpp
/// \brief The flux of quasi-one-dimensional flow in conservation form, F(U) per cell, written
/// on raw double arrays and on nondim's typed fields, the same arithmetic in the same order.
/// Used by flux_callgrind_driver.cpp (instruction counts, callgrind_compare.sh --kernel flux).
///
///   U = (rho A, rho A V, rho E A),  F = (rho A V, rho A V^2 + p A, (rho E A + p A) V),
///   V = U2 / U1,  p A = (gamma - 1) (U3 - U2 V / 2)
/// (Anderson, Computational Fluid Dynamics: The Basics with Applications, 1995, ch. 7, from memory).
///
/// Two forms, each on raw double and typed: `views`, a structure of arrays (`double[3][n]`)
/// read and written through one `field_view` per component; `state`, an array of structures
/// (`double[n][3]`) read and written through `state_view`s a cell at a time. Two yardsticks
/// on the least typed quantity (typed_floor.hpp), compared with the raw `views` kernel:
/// `floor_views`, the same kernel on the least typed views; `floor_values`, typed arithmetic
/// on values loaded from the raw arrays (no views at all). Every kernel takes plain
/// pointers, so its name demangles and callgrind can select it.

#include <cstddef>

#include <nondim/field.hpp>

#include "../examples/nozzle/nozzle_flow.hpp"
#include "typed_floor.hpp"

namespace nondim_bench {

// the conserved variables and their fluxes, as the typed nozzle solver declares them
namespace flow = ::nozzle;

// ---- structure of arrays, u[k * n + i] -------------------------------------------------------

[[gnu::noinline]] inline void flux_kernel_double_views(const double* u, double* f, std::size_t n, double gamma) {
  for (std::size_t i = 0; i < n; ++i) {
    const double rho_a = u[i], rho_a_v = u[n + i], rho_e_a = u[2 * n + i];
    const double v = rho_a_v / rho_a;
    const double p_a = (gamma - 1.0) * (rho_e_a - 0.5 * rho_a_v * v);
    f[i] = rho_a_v;
    f[n + i] = rho_a_v * v + p_a;
    f[2 * n + i] = (rho_e_a + p_a) * v;
  }
}

[[gnu::noinline]] inline void flux_kernel_typed_views(const double* u, double* f, std::size_t n, double gamma) {
  using namespace nondim;
  const field_view<dims::mass / dims::length, const double> rho_a(u, n);
  const field_view<dims::mass_flow_rate, const double> rho_a_v(u + n, n);
  const field_view<dims::energy / dims::length, const double> rho_e_a(u + 2 * n, n);
  const field_view<dims::mass_flow_rate> f1(f, n);
  const field_view<dims::force> f2(f + n, n);
  const field_view<dims::power> f3(f + 2 * n, n);
  for (std::size_t i = 0; i < n; ++i) {
    const quantity<dims::velocity> v = rho_a_v[i] / rho_a[i];
    const quantity<dims::force> p_a = (gamma - 1.0) * (rho_e_a[i] - 0.5 * rho_a_v[i] * v);
    f1[i] = rho_a_v[i];
    f2[i] = rho_a_v[i] * v + p_a;
    f3[i] = (rho_e_a[i] + p_a) * v;
  }
}

// ---- the yardsticks: the least typed views and quantities (typed_floor.hpp) -------------------

namespace floor_dims {
using namespace nondim_floor::dims;
inline constexpr nondim_floor::dimension per_length = dimensionless / length;
inline constexpr nondim_floor::dimension mass_per_length = mass * per_length;
inline constexpr nondim_floor::dimension energy_per_length = energy * per_length;
}  // namespace floor_dims

[[gnu::noinline]] inline void flux_kernel_floor_views(const double* u, double* f, std::size_t n, double gamma) {
  using namespace nondim_floor;
  const const_view<floor_dims::mass_per_length> rho_a{u};
  const const_view<dims::mass_flow_rate> rho_a_v{u + n};
  const const_view<floor_dims::energy_per_length> rho_e_a{u + 2 * n};
  const view<dims::mass_flow_rate> f1{f};
  const view<dims::force> f2{f + n};
  const view<dims::power> f3{f + 2 * n};
  for (std::size_t i = 0; i < n; ++i) {
    const quantity<dims::velocity> v = rho_a_v[i] / rho_a[i];
    const quantity<dims::force> p_a = (gamma - 1.0) * (rho_e_a[i] - 0.5 * rho_a_v[i] * v);
    f1[i] = rho_a_v[i];
    f2[i] = rho_a_v[i] * v + p_a;
    f3[i] = (rho_e_a[i] + p_a) * v;
  }
}

[[gnu::noinline]] inline void flux_kernel_floor_values(const double* u, double* f, std::size_t n, double gamma) {
  using namespace nondim_floor;
  using mass_per_length = quantity<floor_dims::mass_per_length>;
  using mass_flow = quantity<dims::mass_flow_rate>;
  using energy_per_length = quantity<floor_dims::energy_per_length>;
  for (std::size_t i = 0; i < n; ++i) {
    const quantity<dims::velocity> v = mass_flow{u[n + i]} / mass_per_length{u[i]};
    const quantity<dims::force> p_a = (gamma - 1.0) * (energy_per_length{u[2 * n + i]} - 0.5 * mass_flow{u[n + i]} * v);
    f[i] = u[n + i];
    f[n + i] = (mass_flow{u[n + i]} * v + p_a).v;
    f[2 * n + i] = ((energy_per_length{u[2 * n + i]} + p_a) * v).v;
  }
}

// ---- array of structures, u[3 * i + k] -------------------------------------------------------

[[gnu::noinline]] inline void flux_kernel_double_state(const double* u, double* f, std::size_t n, double gamma) {
  for (std::size_t i = 0; i < n; ++i) {
    const double* c = u + 3 * i;
    double* o = f + 3 * i;
    const double v = c[1] / c[0];
    const double p_a = (gamma - 1.0) * (c[2] - 0.5 * c[1] * v);
    o[0] = c[1];
    o[1] = c[1] * v + p_a;
    o[2] = (c[2] + p_a) * v;
  }
}

[[gnu::noinline]] inline void flux_kernel_typed_state(const double* u, double* f, std::size_t n, double gamma) {
  using namespace nondim;
  const state_view<flow::conserved, layout::aos, const double> uu(u, n);
  const state_view<flow::flux, layout::aos> ff(f, n);
  for (std::size_t i = 0; i < n; ++i) {
    const auto c = uu[i];
    const auto o = ff[i];
    const quantity<dims::velocity> v = c.get<flow::momentum>() / c.get<flow::mass>();
    const quantity<dims::force> p_a = (gamma - 1.0) * (c.get<flow::energy>() - 0.5 * c.get<flow::momentum>() * v);
    o.get<flow::mass_flux>() = c.get<flow::momentum>();
    o.get<flow::momentum_flux>() = c.get<flow::momentum>() * v + p_a;
    o.get<flow::energy_flux>() = (c.get<flow::energy>() + p_a) * v;
  }
}

}  // namespace nondim_bench
