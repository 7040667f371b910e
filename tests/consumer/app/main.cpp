// An outside project using nondim's public contract (DESIGN.md), built against nondim
// installed (find_package, pkg-config) or as a subdirectory; header-only (nondim::nondim)
// or with the analysis half compiled once (NONDIM_CONSUMER_COMPILED: nondim::compiled, or
// NONDIM_SEPARATE_COMPILATION and one source that includes <nondim/implementation.ipp>).
#if defined(NONDIM_CONSUMER_COMPILED) != defined(NONDIM_SEPARATE_COMPILATION)
#error "nondim::compiled must define NONDIM_SEPARATE_COMPILATION for its users, and nondim::nondim must not"
#endif
#if defined(NONDIM_CONSUMER_NO_EIGEN) && __has_include(<Eigen/Core>)
#error "nondim::compiled must not give its users Eigen's include directory (only its one source needs it)"
#endif

#include <nondim/analysis.hpp>
#include <nondim/parse.hpp>
#include <nondim/quantity.hpp>

#include <array>
#include <cmath>
#include <cstdio>
#include <vector>

#if defined(NONDIM_CONSUMER_SECOND_UNIT)
std::size_t second_unit_group_count();  // second_unit.cpp
#endif

int main() {
  using namespace nondim;
  // quantities, units and compile-time checks
  constexpr auto rho = 1.2 * units::kg / units::m3;
  constexpr auto U = 10.0 * units::m / units::s;
  constexpr auto D = 0.1 * units::m;
  constexpr auto mu = 1.8e-5 * units::Pa * units::s;
  constexpr double Re = rho * U * D / mu;  // a dimensionless quantity converts to double
  static_assert(Re > 66666.0 && Re < 66667.0);
  constexpr quantity<dims::pressure> q = 0.5 * rho * pow<2>(U);
  static_assert(decltype(sqrt(q / rho))::dim == dims::velocity);
  const double psi = q / units::psi;
  std::printf("Re = %.0f, dynamic pressure = %.5f psi, %s\n", Re, psi, to_string(dims::pressure).c_str());
  // unit expressions at run time (nondim/parse.hpp)
  const parsed_unit h = parse_unit("Btu/(h*ft^2*degF)");  // NIST SP 811 B.8: 5.678 263 W/(m^2 K)
  const auto p = parse_quantity<dims::pressure>("14.7 psi");
  const double f = convert(100.0, "degC", "degF");  // NIST SP 811 B.9: 212 degF
  bool refused = false;
  try {
    (void)parse_unit("kg/m/s");
  } catch (const unit_error& e) {
    refused = e.column() == 5;
  }
  try {
    (void)parse_quantity<dims::length>("3 s");
    refused = false;
  } catch (const dimension_error&) {
  }
  const bool parsed = h.dim == dims::heat_transfer_coefficient && h.factor > 5.678 && h.factor < 5.679 &&
                      p.si() > 101352.0 && p.si() < 101354.0 && f > 211.999 && f < 212.001 && refused;
  // exact dimensionless groups (nondim/analysis.hpp): drag on a sphere, F/(rho U^2 D^2) and
  // mu/(rho U D) (White, Fluid Mechanics, 7th ed., Sec. 5.3, from memory)
  problem drag;
  drag.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "mm").add("mu", "Pa*s");
  options opt;
  opt.repeating = {"rho", "U", "D"};
  const analysis an = analyze(drag, opt);
  const bool grouped = an.rank == 3 && an.groups.size() == 2 && an.groups[0].exponent("U") == rational{-2} &&
                       an.groups[1].text(text_form::ascii) == "mu*rho^-1*U^-1*D^-1" && an.svd.agrees &&
                       an.isolated.empty();
  std::printf("%s", to_string(an).c_str());
  // the same basis at compile time from the argument types (pi_groups): the values agree
  // with analyze()'s to the rounding of the products; scales(rho, U, D) makes q/(rho U^2)
  // = 1/2 (the dynamic pressure over its scale; White, Viscous Fluid Flow, ch. 2, from memory)
  constexpr auto F = 3.0 * units::N;
  const std::array<double, 2> typed = pi_groups(F, rho, U, D, mu);
  const std::vector<double> si{F.si(), rho.si(), U.si(), D.si(), mu.si()};
  const std::vector<double> from_analysis = an.values(si);
  const bool agree =
      std::fabs(typed[0] / from_analysis[0] - 1.0) < 1e-15 && std::fabs(typed[1] / from_analysis[1] - 1.0) < 1e-15;
  const double q_star = scales(rho, U, D).nondimensional(q);
  const bool scaled = std::fabs(q_star - 0.5) < 1e-15;
  std::printf("pi_groups %s analyze(); q* = %.3f\n", agree ? "agrees with" : "DISAGREES with", q_star);
#if defined(NONDIM_CONSUMER_SECOND_UNIT)
  const bool second = second_unit_group_count() == 1;
#else
  const bool second = true;
#endif
  return (psi > 0.0087 && psi < 0.0088 && parsed && grouped && agree && scaled && second) ? 0 : 1;
}
