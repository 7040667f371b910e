// Zero overhead, measured in wall time: the wall heat-transfer kernel of heat_kernel.hpp on
// nondim quantities and on raw double, over 10^5 and 10^6 cells, in one binary.
//
// Counters: `cell` is the time per cell. BM_kernel_ratio runs the two kernels alternately in
// every iteration (so drift of a shared machine hits both alike) and reports their times per
// cell and `ratio` = quantity / double (medians of thread CPU time). After the run, a summary
// line per size gives the ratio of the median CPU times of the separate benchmarks (all
// repetitions: pass --benchmark_repetitions=N for a median over N runs). Instruction counts (deterministic) are in
// callgrind_compare.sh; this file shows the same in time.
#include <benchmark/benchmark.h>

#include <unistd.h>
#include <algorithm>
#include <cstdio>
#include <ctime>
#include <map>
#include <string>
#include <utility>
#include <vector>

#include "heat_kernel.hpp"

namespace {

using namespace nondim_bench;

/// Cells shared by all benchmarks of one size (built once; both forms hold equal SI values).
struct fixture {
  cell_data cells;
  quantity_cell_data qcells;
  explicit fixture(std::size_t n) : cells(n), qcells(cells) {}
};

fixture& cells_of(std::size_t n) {
  static std::map<std::size_t, fixture> all;
  return all.try_emplace(n, n).first->second;
}

void per_cell(benchmark::State& state, std::size_t n) {
  state.SetItemsProcessed(state.iterations() * static_cast<benchmark::IterationCount>(n));
  state.counters["cell"] = benchmark::Counter(static_cast<double>(state.iterations()) * static_cast<double>(n),
                                              benchmark::Counter::kIsRate | benchmark::Counter::kInvert);
}

template <void (*Kernel)(const double_fields&)>
void bm_double(benchmark::State& state) {
  const auto n = static_cast<std::size_t>(state.range(0));
  auto f = cells_of(n).cells.as_double();
  for (auto _ : state) {
    Kernel(f);
    benchmark::DoNotOptimize(f.q.data());
    benchmark::ClobberMemory();  // the outputs are observed: the kernel's stores must happen
  }
  per_cell(state, n);
}

template <void (*Kernel)(const quantity_fields&)>
void bm_quantity(benchmark::State& state) {
  const auto n = static_cast<std::size_t>(state.range(0));
  auto f = cells_of(n).qcells.as_quantity();
  for (auto _ : state) {
    Kernel(f);
    benchmark::DoNotOptimize(f.q.data());
    benchmark::ClobberMemory();
  }
  per_cell(state, n);
}

/// CPU time of this thread in seconds: on a shared machine it leaves out time spent preempted.
double thread_seconds() {
  timespec ts{};
  clock_gettime(CLOCK_THREAD_CPUTIME_ID, &ts);
  return static_cast<double>(ts.tv_sec) + 1e-9 * static_cast<double>(ts.tv_nsec);
}

/// Both kernels in every iteration, timed separately (thread CPU time); the ratio is a counter.
void bm_ratio(benchmark::State& state) {
  const auto n = static_cast<std::size_t>(state.range(0));
  auto& fx = cells_of(n);
  auto fd = fx.cells.as_double();
  auto fq = fx.qcells.as_quantity();
  std::vector<double> td, tq;  // per-iteration seconds; medians resist preemption spikes
  bool quantity_first = false;
  for (auto _ : state) {
    double dt = 0.0;
    double qt = 0.0;
    for (int pass = 0; pass < 2; ++pass) {
      const bool run_quantity = (pass == 0) == quantity_first;
      const double t0 = thread_seconds();
      if (run_quantity) {
        heat_kernel_quantity(fq);
        benchmark::DoNotOptimize(fq.q.data());
      } else {
        heat_kernel_double(fd);
        benchmark::DoNotOptimize(fd.q.data());
      }
      benchmark::ClobberMemory();
      const double s = thread_seconds() - t0;
      (run_quantity ? qt : dt) = s;
    }
    quantity_first = !quantity_first;  // alternate which one runs with a warm cache
    td.push_back(dt);
    tq.push_back(qt);
    state.SetIterationTime(dt + qt);
  }
  const auto median = [](std::vector<double> v) {
    std::nth_element(v.begin(), v.begin() + static_cast<std::ptrdiff_t>(v.size() / 2), v.end());
    return v[v.size() / 2];
  };
  const double md = median(td);
  const double mq = median(tq);
  state.counters["dbl_ns_per_cell"] = 1e9 * md / static_cast<double>(n);
  state.counters["qty_ns_per_cell"] = 1e9 * mq / static_cast<double>(n);
  state.counters["ratio"] = mq / md;
}

constexpr std::int64_t small_n = 100'000;
constexpr std::int64_t large_n = 1'000'000;

BENCHMARK(bm_double<heat_kernel_double>)
    ->Name("kernel_double")
    ->Arg(small_n)
    ->Arg(large_n)
    ->Unit(benchmark::kMillisecond);
BENCHMARK(bm_quantity<heat_kernel_quantity>)
    ->Name("kernel_quantity")
    ->Arg(small_n)
    ->Arg(large_n)
    ->Unit(benchmark::kMillisecond);
BENCHMARK(bm_double<heat_kernel_double_named>)
    ->Name("kernel_double_named")
    ->Arg(small_n)
    ->Arg(large_n)
    ->Unit(benchmark::kMillisecond);
BENCHMARK(bm_quantity<heat_kernel_quantity_named>)
    ->Name("kernel_quantity_named")
    ->Arg(small_n)
    ->Arg(large_n)
    ->Unit(benchmark::kMillisecond);
BENCHMARK(bm_ratio)->Name("kernel_ratio")->Arg(small_n)->Arg(large_n)->UseManualTime()->Unit(benchmark::kMillisecond);

/// Console output as usual, and the CPU time of every run kept for the summary.
class recording_reporter : public benchmark::ConsoleReporter {
 public:
  explicit recording_reporter(OutputOptions o) : ConsoleReporter(o) {}
  void ReportRuns(const std::vector<Run>& runs) override {
    for (const auto& r : runs) {
      const std::string name = r.run_name.str();  // without the aggregate suffix
      if (r.run_type == Run::RT_Iteration && r.iterations > 0) times_[name].push_back(r.GetAdjustedCPUTime());
      if (r.run_type == Run::RT_Aggregate && r.aggregate_name == "median") medians_[name] = r.GetAdjustedCPUTime();
    }
    ConsoleReporter::ReportRuns(runs);
  }
  /// Median CPU time of the runs named `name` (all repetitions), or a negative value.
  [[nodiscard]] double median(const std::string& name) const {
    if (const auto m = medians_.find(name); m != medians_.end()) return m->second;
    const auto it = times_.find(name);
    if (it == times_.end() || it->second.empty()) return -1.0;
    auto v = it->second;
    std::sort(v.begin(), v.end());
    return v.size() % 2 == 1 ? v[v.size() / 2] : 0.5 * (v[v.size() / 2 - 1] + v[v.size() / 2]);
  }

 private:
  std::map<std::string, std::vector<double>> times_;
  std::map<std::string, double> medians_;
};

}  // namespace

int main(int argc, char** argv) {
  // The library applies --benchmark_color only to its own reporter: decide here (colour only on a
  // terminal and unless switched off), before Initialize consumes the flags.
  bool color = isatty(STDOUT_FILENO) != 0;
  for (int i = 1; i < argc; ++i) {
    const std::string a = argv[i];
    if (a == "--benchmark_color=false" || a == "--benchmark_color=no") color = false;
  }
  benchmark::Initialize(&argc, argv);
  if (benchmark::ReportUnrecognizedArguments(argc, argv)) return 1;
  recording_reporter reporter(color ? benchmark::ConsoleReporter::OO_ColorTabular
                                    : benchmark::ConsoleReporter::OO_Tabular);
  benchmark::RunSpecifiedBenchmarks(&reporter);
  benchmark::Shutdown();
  for (const char* form : {"", "_named"}) {
    for (const auto n : {small_n, large_n}) {
      const std::string arg = "/" + std::to_string(n);
      const double d = reporter.median(std::string("kernel_double") + form + arg);
      const double q = reporter.median(std::string("kernel_quantity") + form + arg);
      if (d > 0.0 && q > 0.0) {
        std::printf(
            "summary: kernel%s %7lld cells: double %.3f ns/cell, quantity %.3f ns/cell, ratio quantity/double %.3f\n",
            form, static_cast<long long>(n), 1e6 * d / static_cast<double>(n), 1e6 * q / static_cast<double>(n), q / d);
      }
    }
  }
  return 0;
}
