#pragma once
/// \file reference_units.hpp
/// \brief The nozzle run in nondimensional form: every input divided by its reference scale
/// (`scales(rho0, a0, L, T0)`), so the arrays hold rho/rho0, V/a0, p/(rho0 a0^2), x/L, T/T0.
/// The typed kernels are unchanged: the references are the base units of a coherent system
/// of their own, in which a formula that is dimensionally right stays right.

#include <nondim/solver.hpp>

#include <span>
#include <vector>

#include "nozzle_flow.hpp"

namespace nozzle {

/// q expressed in the coherent units whose base units are the references of s.
template <class Scales, dimension D>
quantity<D> in_reference_units(const Scales& s, quantity<D> q) {
  return quantity<D>::from_si(s.nondimensional(q));
}

/// The references of a nozzle run: reservoir density and speed of sound, nozzle length,
/// reservoir temperature (an absolute reference: the solver's temperatures are T/T0).
inline auto nozzle_scales(const setup& in) {
  const quantity<dims::density> rho0 = in.res.p0 / (in.g.r * in.res.t0);
  const quantity<dims::velocity> a0 = sqrt(in.g.gamma * in.g.r * in.res.t0);
  return scales(rho0, a0, in.nozzle.length, in.res.t0);
}

/// The same setup in reference units.
template <class Scales>
setup in_reference_units(const Scales& s, const setup& in) {
  setup out = in;
  out.g.r = in_reference_units(s, in.g.r);  // R T0 / a0^2 = 1/gamma
  out.res.p0 = in_reference_units(s, in.res.p0);
  out.res.t0 = in_reference_units(s, in.res.t0);
  out.nozzle.length = in_reference_units(s, in.nozzle.length);
  out.nozzle.throat = in_reference_units(s, in.nozzle.throat);
  return out;
}

/// A solution in reference units back to SI, one whole-field conversion per variable.
template <class Scales>
solution to_si(const Scales& s, const solution& star) {
  solution out = star;
  const auto back = [&](const std::vector<double>& from, std::vector<double>& to, auto view_tag) {
    using view = decltype(view_tag);
    s.dimensional(std::span<const double>(from), view(std::span<double>(to)));
  };
  back(star.x, out.x, field_view<dims::length>{});
  back(star.rho, out.rho, field_view<dims::density>{});
  back(star.v, out.v, field_view<dims::velocity>{});
  back(star.p, out.p, field_view<dims::pressure>{});
  back(star.t, out.t, field_view<dims::temperature>{});
  return out;
}

}  // namespace nozzle
