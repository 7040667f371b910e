#pragma once
/// \file typed_floor.hpp
/// \brief The least a typed quantity and a typed field view can be, as yardsticks for the
/// benchmarks; not part of the library.
///
/// A double tagged with integer exponents of the base dimensions, the operators the
/// benchmarks' expressions use, forced inline, and nothing else: no rational exponents, no
/// checks, no unit table, no exceptions, no diagnostics, no refused conversions. A view is a
/// pointer; reading an element gives a quantity by value, writing one goes through a
/// one-pointer proxy. Any type with the same user syntax (`0.5 * rho * u * u`,
/// `x_ * units::ft`, `sqrt`, `pow<N, M>`, a dimensionless quantity used as a number,
/// `f[i] = q`) costs at least this, so the ratio the floor gets against raw double bounds
/// the ratio nondim can reach:
///   - bench/compile_cost.py --floor: the 300 expressions compiled on it;
///   - bench/callgrind_compare.sh --kernel flux: the forms `floor_views` (the flux kernel on
///     these views) and `floor_values` (typed arithmetic on values loaded from raw arrays).

#include <cmath>
#include <cstddef>

#define NONDIM_FLOOR_INLINE [[gnu::always_inline]] inline

namespace nondim_floor {

struct dimension {
  int e[7]{};  // L M T I Θ N J, as in the SI
  constexpr bool operator==(const dimension&) const = default;
};
constexpr dimension operator*(dimension a, dimension b) {
  dimension r;
  for (int i = 0; i < 7; ++i) r.e[i] = a.e[i] + b.e[i];
  return r;
}
constexpr dimension operator/(dimension a, dimension b) {
  dimension r;
  for (int i = 0; i < 7; ++i) r.e[i] = a.e[i] - b.e[i];
  return r;
}
constexpr dimension scaled(dimension a, int n, int d) {
  dimension r;
  for (int i = 0; i < 7; ++i) r.e[i] = a.e[i] * n / d;
  return r;
}

template <dimension D>
struct quantity {
  double v;
};
template <>
struct quantity<dimension{}> {
  double v;
  constexpr operator double() const { return v; }
};

template <dimension A, dimension B>
NONDIM_FLOOR_INLINE constexpr quantity<A * B> operator*(quantity<A> a, quantity<B> b) {
  return {a.v * b.v};
}
template <dimension A, dimension B>
NONDIM_FLOOR_INLINE constexpr quantity<A / B> operator/(quantity<A> a, quantity<B> b) {
  return {a.v / b.v};
}
template <dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<A> operator+(quantity<A> a, quantity<A> b) {
  return {a.v + b.v};
}
template <dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<A> operator-(quantity<A> a, quantity<A> b) {
  return {a.v - b.v};
}
template <dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<A> operator*(double a, quantity<A> b) {
  return {a * b.v};
}
template <dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<A> operator*(quantity<A> a, double b) {
  return {a.v * b};
}
template <dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<A> operator/(quantity<A> a, double b) {
  return {a.v / b};
}
template <dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<dimension{} / A> operator/(double a, quantity<A> b) {
  return {a / b.v};
}

template <dimension A>
NONDIM_FLOOR_INLINE quantity<scaled(A, 1, 2)> sqrt(quantity<A> a) {
  return {std::sqrt(a.v)};
}
template <int N, dimension A>
NONDIM_FLOOR_INLINE constexpr quantity<scaled(A, N, 1)> pow(quantity<A> a) {
  double r = 1.0;
  for (int i = 0; i < N; ++i) r *= a.v;
  return {r};
}
template <int N, int M, dimension A>
NONDIM_FLOOR_INLINE quantity<scaled(A, N, M)> pow(quantity<A> a) {
  return {std::pow(a.v, double(N) / M)};
}
template <int N, int M>
NONDIM_FLOOR_INLINE double pow(double a) {
  return std::pow(a, double(N) / M);
}

struct temperature_point {
  double k;
};
NONDIM_FLOOR_INLINE constexpr temperature_point from_celsius(double c) {
  return {c + 273.15};
}
NONDIM_FLOOR_INLINE constexpr temperature_point from_fahrenheit(double f) {
  return {(f + 459.67) / 1.8};
}

namespace dims {
inline constexpr dimension dimensionless{};
inline constexpr dimension length{{1, 0, 0, 0, 0, 0, 0}};
inline constexpr dimension mass{{0, 1, 0, 0, 0, 0, 0}};
inline constexpr dimension time{{0, 0, 1, 0, 0, 0, 0}};
inline constexpr dimension temperature{{0, 0, 0, 0, 1, 0, 0}};
inline constexpr dimension velocity = length / time;
inline constexpr dimension frequency = dimensionless / time;
inline constexpr dimension area = length * length;
inline constexpr dimension volume = area * length;
inline constexpr dimension density = mass / volume;
inline constexpr dimension force = mass * velocity / time;
inline constexpr dimension pressure = force / area;
inline constexpr dimension energy = force * length;
inline constexpr dimension power = energy / time;
inline constexpr dimension dynamic_viscosity = pressure * time;
inline constexpr dimension kinematic_viscosity = area / time;
inline constexpr dimension thermal_conductivity = power / (length * temperature);
inline constexpr dimension specific_heat_capacity = energy / (mass * temperature);
inline constexpr dimension specific_gas_constant = specific_heat_capacity;
inline constexpr dimension heat_transfer_coefficient = power / (area * temperature);
inline constexpr dimension heat_flux_density = power / area;
inline constexpr dimension surface_tension = force / length;
inline constexpr dimension mass_flow_rate = mass / time;
inline constexpr dimension thermal_expansion_coefficient = dimensionless / temperature;
}  // namespace dims

NONDIM_FLOOR_INLINE constexpr quantity<dims::temperature> operator-(temperature_point a, temperature_point b) {
  return {a.k - b.k};
}

namespace units {
inline constexpr quantity<dims::length> m{1.0}, mm{1e-3}, cm{1e-2}, ft{0.3048}, in{0.0254};
inline constexpr quantity<dims::area> m2{1.0};
inline constexpr quantity<dims::volume> m3{1.0};
inline constexpr quantity<dims::time> s{1.0}, ms{1e-3}, min{60.0}, h{3600.0};
inline constexpr quantity<dims::velocity> knot{1852.0 / 3600.0}, mph{0.44704};
inline constexpr quantity<dims::length> km{1e3};
inline constexpr quantity<dims::mass> kg{1.0}, g{1e-3}, lb{0.45359237};
inline constexpr quantity<dims::pressure> Pa{1.0}, kPa{1e3}, bar{1e5}, psi{6894.757293168361}, atm{101325.0};
inline constexpr quantity<dims::dynamic_viscosity> cP{1e-3}, P{0.1};
inline constexpr quantity<dims::kinematic_viscosity> cSt{1e-6}, St{1e-4};
inline constexpr quantity<dims::temperature> K{1.0}, delta_degF{1.0 / 1.8}, delta_degC{1.0}, mK{1e-3}, degR{1.0 / 1.8};
inline constexpr quantity<dims::power> W{1.0}, mW{1e-3}, kW{1e3}, hp{745.69987158227022};
inline constexpr quantity<dims::energy> J{1.0}, kJ{1e3}, Btu{1055.05585262}, kcal{4186.8};
inline constexpr quantity<dims::force> N{1.0}, kN{1e3}, mN{1e-3}, lbf{4.4482216152605};
inline constexpr quantity<dims::frequency> Hz{1.0}, rpm{1.0 / 60.0}, kHz{1e3};
}  // namespace units

template <dimension D>
struct view_element {
  double* p;
  NONDIM_FLOOR_INLINE void operator=(quantity<D> q) const { *p = q.v; }
};
/// Read-only view: element i read as a quantity by value.
template <dimension D>
struct const_view {
  const double* p;
  NONDIM_FLOOR_INLINE quantity<D> operator[](std::size_t i) const { return {p[i]}; }
};
/// Writable view: element i as a one-pointer proxy that accepts only quantity<D>.
template <dimension D>
struct view {
  double* p;
  NONDIM_FLOOR_INLINE view_element<D> operator[](std::size_t i) const { return {p + i}; }
};

}  // namespace nondim_floor
