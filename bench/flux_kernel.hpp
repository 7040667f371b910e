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
/// (`double[n][3]`) read and written through `state_view`s a cell at a time. Every kernel
/// takes plain pointers, so its name demangles and callgrind can select it.

#include <cstddef>

#include <nondim/field.hpp>

namespace nondim_bench {

namespace flow {
using namespace nondim;
struct mass : component<dims::mass / dims::length> {};
struct momentum : component<dims::mass_flow_rate> {};
struct energy : component<dims::energy / dims::length> {};
using conserved = state_set<mass, momentum, energy>;
struct mass_flux : component<dims::mass_flow_rate> {};
struct momentum_flux : component<dims::force> {};
struct energy_flux : component<dims::power> {};
using flux = state_set<mass_flux, momentum_flux, energy_flux>;
}  // namespace flow

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
