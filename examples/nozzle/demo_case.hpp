#pragma once
/// \file demo_case.hpp
/// \brief The nozzle of the examples (our own invention): air from a reservoir at 500 kPa and
/// 600 K through a nozzle 0.3 m long with a 2 cm^2 throat at 40 % of its length, area ratio
/// 2.92 at the inlet and 5.32 at the outlet.

#include <nondim/quantity.hpp>

#include <cstddef>

#include "nozzle_flow.hpp"

namespace nozzle {

inline setup demo_case(std::size_t points = 81, std::size_t steps = 3000) {
  setup in{};
  in.g = {1.4, 287.0 * units::J / (units::kg * units::K)};  // air, common practice
  in.res = {500.0 * units::kPa, 600.0 * units::K};
  in.nozzle = {0.3 * units::m, 2.0e-4 * units::m2, 12.0, 0.4};
  in.points = points;
  in.courant = 0.5;
  in.steps = steps;
  return in;
}

}  // namespace nozzle
