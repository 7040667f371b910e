// Cost of recognising groups against the catalog and of the named basis (Google Benchmark).
// Recognition runs for every group of every analyze(); the named basis once per analysis.
#include <nondim/analysis/names/named_basis.hpp>
#include <nondim/analysis/names/recognize.hpp>
#include <nondim/solver/core/dims.hpp>

#include <benchmark/benchmark.h>

#include <cstdint>
#include <vector>

namespace {

using namespace nondim;

// forced convection: h, k, U, D, rho, mu, cp (Incropera et al., ch. 6, from memory)
const std::vector<group_variable>& forced_convection() {
  static const std::vector<group_variable> v{{"h", dims::heat_transfer_coefficient},
                                             {"k", dims::thermal_conductivity},
                                             {"U", dims::velocity},
                                             {"D", dims::length},
                                             {"rho", dims::density},
                                             {"mu", dims::dynamic_viscosity},
                                             {"cp", dims::specific_heat_capacity}};
  return v;
}

void recognize_group(benchmark::State& state, std::vector<std::int64_t> exponents) {
  const auto& v = forced_convection();
  for (auto _ : state) {
    auto m = recognize(v, exponents);
    benchmark::DoNotOptimize(m.data());
  }
}

// 1/Re: one match; Nu: two (Nusselt and Biot); St: one of many same-size forms; a product
// Re Pr^2: a signature that no form has
BENCHMARK_CAPTURE(recognize_group, reynolds_inverse, std::vector<std::int64_t>{0, 0, -1, -1, -1, 1, 0});
BENCHMARK_CAPTURE(recognize_group, nusselt_or_biot, std::vector<std::int64_t>{1, -1, 0, 1, 0, 0, 0});
BENCHMARK_CAPTURE(recognize_group, prandtl, std::vector<std::int64_t>{0, -1, 0, 0, 0, 1, 1});
BENCHMARK_CAPTURE(recognize_group, stanton, std::vector<std::int64_t>{1, 0, -1, 0, -1, 0, -1});
BENCHMARK_CAPTURE(recognize_group, no_match, std::vector<std::int64_t>{0, -2, 1, 1, 1, 1, 2});

// the same groups through one recogniser, as an analysis does: names and hashes worked out once
void recognize_with_context(benchmark::State& state, std::vector<std::int64_t> exponents) {
  const group_recognizer r(forced_convection());
  for (auto _ : state) {
    auto m = r(exponents);
    benchmark::DoNotOptimize(m.data());
  }
}
BENCHMARK_CAPTURE(recognize_with_context, reynolds_inverse, std::vector<std::int64_t>{0, 0, -1, -1, -1, 1, 0});
BENCHMARK_CAPTURE(recognize_with_context, nusselt_or_biot, std::vector<std::int64_t>{1, -1, 0, 1, 0, 0, 0});
BENCHMARK_CAPTURE(recognize_with_context, no_match, std::vector<std::int64_t>{0, -2, 1, 1, 1, 1, 2});

void named_basis_forced_convection(benchmark::State& state) {
  const auto& v = forced_convection();
  // classical groups with U, D, rho, cp repeating: St, 1/Pe, 1/Re
  const std::vector<std::vector<std::int64_t>> classical{
      {1, 0, -1, 0, -1, 0, -1}, {0, 1, -1, -1, -1, 0, -1}, {0, 0, -1, -1, -1, 1, 0}};
  for (auto _ : state) {
    auto b = named_basis(v, classical, 0);
    benchmark::DoNotOptimize(b.data());
  }
}
BENCHMARK(named_basis_forced_convection);

}  // namespace
