// Time to read a typical unit expression at run time (the goal: well under 1 us for
// W/(m^2*K)). Google Benchmark; timing is never a test.
#include <nondim/parse.hpp>

#include <benchmark/benchmark.h>

#include <string_view>

namespace {

void parse(benchmark::State& state, std::string_view text) {
  for (auto _ : state) {
    std::string_view t = text;
    benchmark::DoNotOptimize(t);
    nondim::parsed_unit u = nondim::parse_unit(t);
    benchmark::DoNotOptimize(u);
  }
}

void quantity(benchmark::State& state, std::string_view text) {
  for (auto _ : state) {
    std::string_view t = text;
    benchmark::DoNotOptimize(t);
    nondim::parsed_quantity q = nondim::parse_quantity(t);
    benchmark::DoNotOptimize(q);
  }
}

}  // namespace

BENCHMARK_CAPTURE(parse, heat_transfer_coefficient, "W/(m^2*K)");
BENCHMARK_CAPTURE(parse, specific_heat_customary, "Btu/(lb*degF)");
BENCHMARK_CAPTURE(parse, viscosity_unicode, "kg\u00b7m\u207b\u00b9\u00b7s\u207b\u00b9");
BENCHMARK_CAPTURE(parse, fracture_toughness, "MPa*m^0.5");
BENCHMARK_CAPTURE(parse, single_symbol, "psi");
BENCHMARK_CAPTURE(parse, conductivity_customary, "Btu*in/(h*ft^2*degF)");
BENCHMARK_CAPTURE(quantity, viscosity_value, "1.8e-5 Pa*s");

BENCHMARK_MAIN();
