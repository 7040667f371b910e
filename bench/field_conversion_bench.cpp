// Converting a 10^7-cell field with a unit system against a plain scaling loop.
// The claim (DESIGN.md "Performance targets", issue 15): a whole-field conversion runs at the
// speed of the loop an engineer writes by hand, within 2 %: the scale is computed once per
// call and the loop is one division per cell, bound by memory bandwidth at this size.
//
//   build/bench/bench/field_conversion_bench     # the table, then one `summary:` line per pair
//
// The pressures are a scenario of our own (a water channel, references 998 kg/m^3, 0.4 m/s,
// 0.05 m). Before timing, main() checks that each pair writes the same numbers, bit for bit.
// The four conversions are kept out of line so that callgrind counts each on its own:
//   valgrind --tool=callgrind ./field_conversion_bench --benchmark_filter=none
#include <benchmark/benchmark.h>
#include <nondim/field.hpp>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <cstddef>
#include <cstdio>
#include <map>
#include <span>
#include <string>
#include <vector>

using namespace nondim;

namespace {

constexpr std::size_t cells = 10'000'000;
const auto rho = 998.0 * units::kg / units::m3;
const auto u = 0.4 * units::m / units::s;
const auto length = 0.05 * units::m;

struct data {
  std::vector<double> p_si, star, back;
  data() : p_si(cells), star(cells), back(cells) {
    for (std::size_t i = 0; i < cells; ++i) p_si[i] = 1.0e5 + 0.5 * static_cast<double>(i % 4096);
  }
};
data& shared() {
  static data d;
  return d;
}

/// p* = p / (rho U^2) with the unit system.
[[gnu::noinline]] void to_star_scales(const data& d, std::vector<double>& out) {
  const auto s = scales(rho, u, length);
  s.nondimensional(field_view<dims::pressure, const double>(d.p_si.data(), d.p_si.size()), std::span<double>(out));
}
/// The same by hand.
[[gnu::noinline]] void to_star_hand(const data& d, std::vector<double>& out) {
  const double k = rho.si() * u.si() * u.si();
  const double* p = d.p_si.data();
  double* o = out.data();
  for (std::size_t i = 0; i < cells; ++i) o[i] = p[i] / k;
}
/// p = p* rho U^2 into a field view with the unit system.
[[gnu::noinline]] void from_star_scales(const data& d, std::vector<double>& out) {
  const auto s = scales(rho, u, length);
  s.dimensional(std::span<const double>(d.star), field_view<dims::pressure>(out.data(), out.size()));
}
[[gnu::noinline]] void from_star_hand(const data& d, std::vector<double>& out) {
  const double k = rho.si() * u.si() * u.si();
  const double* x = d.star.data();
  double* o = out.data();
  for (std::size_t i = 0; i < cells; ++i) o[i] = x[i] * k;
}

template <void (*F)(const data&, std::vector<double>&)>
void run(benchmark::State& state) {
  data& d = shared();
  std::vector<double> out(cells);
  for (auto _ : state) {
    F(d, out);
    benchmark::DoNotOptimize(out.data());
    benchmark::ClobberMemory();
  }
  state.SetBytesProcessed(static_cast<std::int64_t>(state.iterations()) *
                          static_cast<std::int64_t>(2 * cells * sizeof(double)));
}

class ratio_reporter : public benchmark::ConsoleReporter {
 public:
  void ReportRuns(const std::vector<Run>& runs) override {
    for (const auto& r : runs)
      if (r.aggregate_name == "median") times_[r.run_name.function_name] = r.GetAdjustedRealTime();
    ConsoleReporter::ReportRuns(runs);
  }
  void print_summary() const {
    for (const char* pair : {"nondimensional", "dimensional"}) {
      const auto a = times_.find(std::string(pair) + "/scales"), b = times_.find(std::string(pair) + "/hand");
      if (a == times_.end() || b == times_.end()) continue;
      std::printf("summary: field conversion %-15s scales / hand %6.3f (target <= 1.02, 10^7 cells, medians)\n", pair,
                  a->second / b->second);
    }
  }

 private:
  std::map<std::string, double> times_;
};

}  // namespace

BENCHMARK(run<to_star_scales>)->Name("nondimensional/scales")->Repetitions(7)->Unit(benchmark::kMillisecond);
BENCHMARK(run<to_star_hand>)->Name("nondimensional/hand")->Repetitions(7)->Unit(benchmark::kMillisecond);
BENCHMARK(run<from_star_scales>)->Name("dimensional/scales")->Repetitions(7)->Unit(benchmark::kMillisecond);
BENCHMARK(run<from_star_hand>)->Name("dimensional/hand")->Repetitions(7)->Unit(benchmark::kMillisecond);

int main(int argc, char** argv) {
  data& d = shared();
  std::vector<double> a(cells), b(cells);
  to_star_scales(d, a);
  to_star_hand(d, b);
  if (a != b) {
    std::fprintf(stderr, "field_conversion_bench: the conversions to p* differ\n");
    return 1;
  }
  d.star = a;
  from_star_scales(d, a);
  from_star_hand(d, b);
  if (a != b) {
    std::fprintf(stderr, "field_conversion_bench: the conversions back to p differ\n");
    return 1;
  }
  benchmark::Initialize(&argc, argv);
  ratio_reporter reporter;
  benchmark::RunSpecifiedBenchmarks(&reporter);
  reporter.print_summary();
  return 0;
}
