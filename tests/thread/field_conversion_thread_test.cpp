// Whole-field conversions inside an OpenMP parallel loop: one unit system, stored at namespace
// scope and shared read-only by every thread, converts disjoint blocks of one field into and
// out of nondimensional numbers; the result must equal the single-threaded conversion number
// for number (run under ThreadSanitizer by the tsan preset).
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <doctest/doctest.h>

#include <cmath>
#include <cstddef>
#include <span>
#include <vector>

using namespace nondim;

namespace {
// references of our own: a water channel, 998 kg/m^3, 0.4 m/s, 0.05 m
const auto channel = scales(998.0 * units::kg / units::m3, 0.4 * units::m / units::s, 0.05 * units::m);
constexpr std::size_t cells = 20000;
constexpr std::size_t block = 1000;

std::vector<double> pressures() {
  std::vector<double> p(cells);
  for (std::size_t i = 0; i < cells; ++i) p[i] = 101325.0 + 3.0 * static_cast<double>(i);
  return p;
}
}  // namespace

TEST_SUITE("thread field conversions") {
  TEST_CASE("blocks converted by several threads equal the conversion of the whole field on one") {
    std::vector<double> p_si = pressures();
    const field_view<dims::pressure, const double> p(p_si.data(), p_si.size());
    std::vector<double> expected(cells), star(cells);
    channel.nondimensional(p, std::span<double>(expected));

    const auto blocks = static_cast<long>(cells / block);
#ifdef _OPENMP
#pragma omp parallel for schedule(static)
#endif
    for (long b = 0; b < blocks; ++b) {
      const auto first = static_cast<std::size_t>(b) * block;
      channel.nondimensional(p.subview(first, block), std::span<double>(star).subspan(first, block));
    }
    std::size_t differing = 0;
    for (std::size_t i = 0; i < cells; ++i) differing += star[i] == expected[i] ? 0U : 1U;
    CHECK(differing == 0);
    // p / (rho U^2): rho U^2 = 998 * 0.16 = 159.68 Pa (the reference's definition)
    CHECK(star[0] == doctest::Approx(101325.0 / 159.68).epsilon(1e-14));

    // and back, every thread writing its own block of one shared field
    std::vector<double> back_si(cells);
    const field_view<dims::pressure> back(back_si.data(), back_si.size());
#ifdef _OPENMP
#pragma omp parallel for schedule(static)
#endif
    for (long b = 0; b < blocks; ++b) {
      const auto first = static_cast<std::size_t>(b) * block;
      channel.dimensional(std::span<const double>(star).subspan(first, block), back.subview(first, block));
    }
    std::size_t off = 0;
    for (std::size_t i = 0; i < cells; ++i)
      off += std::abs(back_si[i] - p_si[i]) <= 2.3e-16 * p_si[i] ? 0U : 1U;  // one unit in the last place
    CHECK(off == 0);
  }

  TEST_CASE("a default unit system is coherent SI: every scale one, the numbers unchanged") {
    const reference_scales<dims::density, dims::velocity, dims::length> si;
    std::vector<double> p_si = pressures(), out(cells);
#ifdef _OPENMP
#pragma omp parallel for schedule(static)
#endif
    for (long b = 0; b < static_cast<long>(cells / block); ++b) {
      const auto first = static_cast<std::size_t>(b) * block;
      si.nondimensional(field_view<dims::pressure>(p_si.data() + first, block),
                        std::span<double>(out).subspan(first, block));
    }
    CHECK(out == p_si);
    CHECK(si.scale<dims::dynamic_viscosity>().si() == 1.0);
  }
}
