#pragma once
/// \file heat_kernel.hpp
/// \brief A solver-like wall heat-transfer kernel written twice: once on nondim quantities and
/// once on raw double, the same arithmetic in the same order. Shared by
/// quantity_kernel_bench.cpp (wall time) and callgrind_driver.cpp (instruction counts).
///
/// Per cell: Re = ρ u D_h / μ, Pr = c_p μ / k, Nu = 0.023 Re^0.8 Pr^0.4 (the Dittus–Boelter
/// form for a heated fluid; common practice, no source), h = Nu k / D_h, q = h (T_w − T_∞).

#include <cmath>
#include <cstddef>
#include <cstdint>
#include <span>
#include <vector>

#include <nondim/quantity.hpp>

namespace nondim_bench {

using namespace nondim;

// ---- raw double ----------------------------------------------------------------------------

struct double_fields {
  std::span<const double> rho, u, mu, k, cp, t_wall, t_fluid;  // kg/m³, m/s, Pa·s, W/(m·K), J/(kg·K), K, K
  double d_h;                                                  // m
  std::span<double> q, re, nu;                                 // W/m², 1, 1
};

[[gnu::noinline]] inline void heat_kernel_double(const double_fields& f) {
  const double d_h = f.d_h;
  const std::size_t n = f.rho.size();
  for (std::size_t i = 0; i < n; ++i) {
    const double re = f.rho[i] * f.u[i] * d_h / f.mu[i];
    const double pr = f.cp[i] * f.mu[i] / f.k[i];
    const double nu = 0.023 * std::pow(re, 0.8) * std::pow(pr, 0.4);
    const double h = nu * f.k[i] / d_h;
    f.q[i] = h * (f.t_wall[i] - f.t_fluid[i]);
    f.re[i] = re;
    f.nu[i] = nu;
  }
}

/// The same, with the two power terms named: fixes the order of the two pow calls, which in the
/// single expression above the compiler may choose differently for built-in and overloaded `*`.
[[gnu::noinline]] inline void heat_kernel_double_named(const double_fields& f) {
  const double d_h = f.d_h;
  const std::size_t n = f.rho.size();
  for (std::size_t i = 0; i < n; ++i) {
    const double re = f.rho[i] * f.u[i] * d_h / f.mu[i];
    const double pr = f.cp[i] * f.mu[i] / f.k[i];
    const double re_term = std::pow(re, 0.8);
    const double pr_term = std::pow(pr, 0.4);
    const double nu = 0.023 * re_term * pr_term;
    const double h = nu * f.k[i] / d_h;
    f.q[i] = h * (f.t_wall[i] - f.t_fluid[i]);
    f.re[i] = re;
    f.nu[i] = nu;
  }
}

// ---- nondim quantities ---------------------------------------------------------------------

struct quantity_fields {
  std::span<const quantity<dims::density>> rho;
  std::span<const quantity<dims::velocity>> u;
  std::span<const quantity<dims::dynamic_viscosity>> mu;
  std::span<const quantity<dims::thermal_conductivity>> k;
  std::span<const quantity<dims::specific_heat_capacity>> cp;
  std::span<const temperature_point<>> t_wall, t_fluid;
  quantity<dims::length> d_h;
  std::span<quantity<dims::heat_flux_density>> q;
  std::span<quantity<dims::dimensionless>> re, nu;
};

[[gnu::noinline]] inline void heat_kernel_quantity(const quantity_fields& f) {
  const auto d_h = f.d_h;
  const std::size_t n = f.rho.size();
  for (std::size_t i = 0; i < n; ++i) {
    const auto re = f.rho[i] * f.u[i] * d_h / f.mu[i];  // quantity<dimensionless>: checked at compile time
    const auto pr = f.cp[i] * f.mu[i] / f.k[i];
    const auto nu = 0.023 * pow<4, 5>(re) * pow<2, 5>(pr);
    const auto h = nu * f.k[i] / d_h;           // quantity<heat_transfer_coefficient>
    f.q[i] = h * (f.t_wall[i] - f.t_fluid[i]);  // a difference of two absolute temperatures
    f.re[i] = re;
    f.nu[i] = nu;
  }
}

[[gnu::noinline]] inline void heat_kernel_quantity_named(const quantity_fields& f) {
  const auto d_h = f.d_h;
  const std::size_t n = f.rho.size();
  for (std::size_t i = 0; i < n; ++i) {
    const auto re = f.rho[i] * f.u[i] * d_h / f.mu[i];
    const auto pr = f.cp[i] * f.mu[i] / f.k[i];
    const auto re_term = pow<4, 5>(re);
    const auto pr_term = pow<2, 5>(pr);
    const auto nu = 0.023 * re_term * pr_term;
    const auto h = nu * f.k[i] / d_h;
    f.q[i] = h * (f.t_wall[i] - f.t_fluid[i]);
    f.re[i] = re;
    f.nu[i] = nu;
  }
}

// ---- data: water in heated tubes, a deterministic spread of conditions ------------------------

/// Deterministic pseudo-random numbers in [0, 1) (64-bit LCG, Knuth's MMIX constants).
class lcg {
 public:
  explicit lcg(std::uint64_t seed) : state_(seed) {}
  double next() {
    state_ = state_ * 6364136223846793005ULL + 1442695040888963407ULL;
    return static_cast<double>(state_ >> 11U) * 0x1.0p-53;
  }

 private:
  std::uint64_t state_;
};

/// The inputs of n cells in SI, and room for the outputs (raw storage shared by both forms).
struct cell_data {
  std::vector<double> rho, u, mu, k, cp, t_wall, t_fluid, q, re, nu;
  double d_h = 0.02;  // 20 mm tube

  explicit cell_data(std::size_t n) : rho(n), u(n), mu(n), k(n), cp(n), t_wall(n), t_fluid(n), q(n), re(n), nu(n) {
    lcg r(20240611U);
    for (std::size_t i = 0; i < n; ++i) {
      rho[i] = 990.0 + 10.0 * r.next();  // liquid water near 300-320 K
      u[i] = 0.5 + 2.5 * r.next();
      mu[i] = 0.6e-3 + 0.4e-3 * r.next();
      k[i] = 0.60 + 0.04 * r.next();
      cp[i] = 4175.0 + 10.0 * r.next();
      t_fluid[i] = 295.0 + 10.0 * r.next();
      t_wall[i] = t_fluid[i] + 5.0 + 30.0 * r.next();
    }
  }

  [[nodiscard]] double_fields as_double() { return {rho, u, mu, k, cp, t_wall, t_fluid, d_h, q, re, nu}; }
};

/// The same cells held as quantities (built from the SI values, so both kernels see equal bits).
struct quantity_cell_data {
  std::vector<quantity<dims::density>> rho;
  std::vector<quantity<dims::velocity>> u;
  std::vector<quantity<dims::dynamic_viscosity>> mu;
  std::vector<quantity<dims::thermal_conductivity>> k;
  std::vector<quantity<dims::specific_heat_capacity>> cp;
  std::vector<temperature_point<>> t_wall, t_fluid;
  quantity<dims::length> d_h;
  std::vector<quantity<dims::heat_flux_density>> q;
  std::vector<quantity<dims::dimensionless>> re, nu;

  explicit quantity_cell_data(const cell_data& c)
      : rho(c.rho.size()),
        u(c.rho.size()),
        mu(c.rho.size()),
        k(c.rho.size()),
        cp(c.rho.size()),
        t_wall(c.rho.size()),
        t_fluid(c.rho.size()),
        d_h(c.d_h * units::m),
        q(c.rho.size()),
        re(c.rho.size()),
        nu(c.rho.size()) {
    for (std::size_t i = 0; i < c.rho.size(); ++i) {
      rho[i] = c.rho[i] * (units::kg / units::m3);
      u[i] = c.u[i] * (units::m / units::s);
      mu[i] = c.mu[i] * (units::Pa * units::s);
      k[i] = c.k[i] * (units::W / (units::m * units::K));
      cp[i] = c.cp[i] * (units::J / (units::kg * units::K));
      t_wall[i] = temperature_point<>::from_kelvin(c.t_wall[i]);
      t_fluid[i] = temperature_point<>::from_kelvin(c.t_fluid[i]);
    }
  }

  [[nodiscard]] quantity_fields as_quantity() { return {rho, u, mu, k, cp, t_wall, t_fluid, d_h, q, re, nu}; }
};

}  // namespace nondim_bench
