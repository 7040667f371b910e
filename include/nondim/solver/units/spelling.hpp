#pragma once
/// \file spelling.hpp
/// \brief Dimensions spelled as types, so that compile errors name them readably
/// (`dim<L<1>, T<-1>>`) on both GCC and Clang; `static_assert` messages cannot be computed
/// in C++20, but the types in the failed condition are printed.

#include <cstdint>
#include <type_traits>

#include "../core/dimension.hpp"
#include "../core/dims.hpp"

namespace nondim::spelled {

/// Integer exponents print as `L<-1>`, fractional ones as `L_<1, 2>`.
template <std::int64_t N>
struct L {};
template <std::int64_t N>
struct M {};
template <std::int64_t N>
struct T {};
template <std::int64_t N>
struct I {};
template <std::int64_t N>
struct Theta {};
template <std::int64_t N>
struct N_ {};
template <std::int64_t N>
struct J {};
template <std::int64_t N, std::int64_t D>
struct L_ {};
template <std::int64_t N, std::int64_t D>
struct M_ {};
template <std::int64_t N, std::int64_t D>
struct T_ {};
template <std::int64_t N, std::int64_t D>
struct I_ {};
template <std::int64_t N, std::int64_t D>
struct Theta_ {};
template <std::int64_t N, std::int64_t D>
struct N__ {};
template <std::int64_t N, std::int64_t D>
struct J_ {};

/// A dimension as a list of its non-zero powers; `dim<>` is dimensionless.
template <class... Powers>
struct dim {};

}  // namespace nondim::spelled

namespace nondim::detail {

template <class A, class B>
struct concat;
template <class... X, class... Y>
struct concat<spelled::dim<X...>, spelled::dim<Y...>> {
  using type = spelled::dim<X..., Y...>;
};

template <std::size_t I, rational R>
struct power_of {
  template <template <std::int64_t> class Int, template <std::int64_t, std::int64_t> class Frac>
  using pick = std::conditional_t<
      R.is_zero(), spelled::dim<>,
      std::conditional_t<R.is_integer(), spelled::dim<Int<R.num>>, spelled::dim<Frac<R.num, R.den>>>>;
  using type = std::conditional_t<
      I == 0, pick<spelled::L, spelled::L_>,
      std::conditional_t<
          I == 1, pick<spelled::M, spelled::M_>,
          std::conditional_t<
              I == 2, pick<spelled::T, spelled::T_>,
              std::conditional_t<I == 3, pick<spelled::I, spelled::I_>,
                                 std::conditional_t<I == 4, pick<spelled::Theta, spelled::Theta_>,
                                                    std::conditional_t<I == 5, pick<spelled::N_, spelled::N__>,
                                                                       pick<spelled::J, spelled::J_>>>>>>>;
};

template <dimension D, std::size_t I = 0>
struct spell_from {
  using type = typename concat<typename power_of<I, D.exponents[I]>::type, typename spell_from<D, I + 1>::type>::type;
};
template <dimension D>
struct spell_from<D, base_dimension_count> {
  using type = spelled::dim<>;
};

/// \brief The type that spells dimension D in compile errors.
template <dimension D>
using spell = typename spell_from<D>::type;

/// \brief Always false; its template arguments carry the dimensions into the diagnostic.
template <class... Spelled>
inline constexpr bool dimensions_involved = false;

/// \brief Always `Ok`; its other arguments carry the dimensions or arguments into the
/// diagnostic when a `static_assert` on it fails.
template <bool Ok, class... Spelled>
inline constexpr bool holds = Ok;

}  // namespace nondim::detail

/// \brief Names of quantity kinds in compile errors, beside the exponents, where a dimension
/// has a common one ("a pressure (Pa)" reads `pressure_or_stress_Pa`); several kinds that share a
/// dimension are named together.
namespace nondim::spelled::kind {
struct length_m {};
struct mass_kg {};
struct time_s {};
struct temperature_K {};
struct area_m2 {};
struct volume_m3 {};
struct velocity_m_per_s {};
struct acceleration_m_per_s2 {};
struct density_kg_per_m3 {};
struct pressure_or_stress_Pa {};
struct force_N {};
struct energy_J {};
struct power_W {};
struct mass_flow_rate_kg_per_s {};
struct mass_flux_kg_per_m2_s {};
struct dynamic_viscosity_Pa_s {};
struct kinematic_viscosity_or_diffusivity_m2_per_s {};
struct specific_heat_capacity_J_per_kg_K {};
struct thermal_conductivity_W_per_m_K {};
struct heat_transfer_coefficient_W_per_m2_K {};
struct heat_flux_W_per_m2 {};
struct frequency_or_rate_per_s {};
struct specific_energy_J_per_kg {};
struct number {};
}  // namespace nondim::spelled::kind

namespace nondim::spelled {
/// \brief A dimension's spelling with the kind it is known as: `named<kind::force_N, dim<...>>`.
template <class Kind, class Dim>
struct named {};
}  // namespace nondim::spelled

namespace nondim::detail {
template <dimension D>
struct kind_of {
  using type = void;
};
template <>
struct kind_of<dims::length> {
  using type = spelled::kind::length_m;
};
template <>
struct kind_of<dims::mass> {
  using type = spelled::kind::mass_kg;
};
template <>
struct kind_of<dims::time> {
  using type = spelled::kind::time_s;
};
template <>
struct kind_of<dims::temperature> {
  using type = spelled::kind::temperature_K;
};
template <>
struct kind_of<dims::area> {
  using type = spelled::kind::area_m2;
};
template <>
struct kind_of<dims::volume> {
  using type = spelled::kind::volume_m3;
};
template <>
struct kind_of<dims::velocity> {
  using type = spelled::kind::velocity_m_per_s;
};
template <>
struct kind_of<dims::acceleration> {
  using type = spelled::kind::acceleration_m_per_s2;
};
template <>
struct kind_of<dims::density> {
  using type = spelled::kind::density_kg_per_m3;
};
template <>
struct kind_of<dims::pressure> {
  using type = spelled::kind::pressure_or_stress_Pa;
};
template <>
struct kind_of<dims::force> {
  using type = spelled::kind::force_N;
};
template <>
struct kind_of<dims::energy> {
  using type = spelled::kind::energy_J;
};
template <>
struct kind_of<dims::power> {
  using type = spelled::kind::power_W;
};
template <>
struct kind_of<dims::mass_flow_rate> {
  using type = spelled::kind::mass_flow_rate_kg_per_s;
};
template <>
struct kind_of<dims::mass_flux> {
  using type = spelled::kind::mass_flux_kg_per_m2_s;
};
template <>
struct kind_of<dims::dynamic_viscosity> {
  using type = spelled::kind::dynamic_viscosity_Pa_s;
};
template <>
struct kind_of<dims::kinematic_viscosity> {
  using type = spelled::kind::kinematic_viscosity_or_diffusivity_m2_per_s;
};
template <>
struct kind_of<dims::specific_heat_capacity> {
  using type = spelled::kind::specific_heat_capacity_J_per_kg_K;
};
template <>
struct kind_of<dims::thermal_conductivity> {
  using type = spelled::kind::thermal_conductivity_W_per_m_K;
};
template <>
struct kind_of<dims::heat_transfer_coefficient> {
  using type = spelled::kind::heat_transfer_coefficient_W_per_m2_K;
};
template <>
struct kind_of<dims::heat_flux_density> {
  using type = spelled::kind::heat_flux_W_per_m2;
};
template <>
struct kind_of<dims::frequency> {
  using type = spelled::kind::frequency_or_rate_per_s;
};
template <>
struct kind_of<dims::specific_energy> {
  using type = spelled::kind::specific_energy_J_per_kg;
};
template <>
struct kind_of<dims::dimensionless> {
  using type = spelled::kind::number;
};

/// \brief The spelling of D, with its kind's name when D has a common one.
template <dimension D>
using spell_named = std::conditional_t<std::is_void_v<typename kind_of<D>::type>, spell<D>,
                                       spelled::named<typename kind_of<D>::type, spell<D>>>;
}  // namespace nondim::detail
