// pi_groups and scales over a field of cells against the same groups written by hand.
// The claim (DESIGN.md, issues 5 and 10): the exponents are fixed at compile time, so the run
// time is the multiplications alone; the ratio pi_groups / hand-written should be 1.
//
//   g++ -std=c++20 -O2 -Iinclude bench/pi_groups_bench.cpp -lbenchmark -lpthread -o pi_groups_bench
//   ./pi_groups_bench            # prints the usual table, then one ratio line per pair
//
// The cell values are a scenario of our own (air and water around bodies of a few cm).
// Before timing, main() checks that each pair gives bit-identical outputs on every cell.
#include <benchmark/benchmark.h>
#include <nondim/quantity.hpp>
#include <nondim/solver.hpp>

#include <cmath>
#include <cstddef>
#include <cstdio>
#include <map>
#include <random>
#include <string>
#include <vector>

using namespace nondim;

namespace {

struct field {
  std::vector<quantity<dims::force>> F;
  std::vector<quantity<dims::density>> rho;
  std::vector<quantity<dims::velocity>> U;
  std::vector<quantity<dims::length>> D;
  std::vector<quantity<dims::dynamic_viscosity>> mu;
  std::vector<quantity<dims::heat_transfer_coefficient>> h;
  std::vector<quantity<dims::thermal_conductivity>> k;
  std::vector<quantity<dims::specific_heat_capacity>> cp;
  std::vector<quantity<dims::pressure>> p;
  std::vector<double> out0, out1, out2;

  explicit field(std::size_t n) : out0(n), out1(n), out2(n) {
    std::mt19937_64 gen(42);
    std::uniform_real_distribution<double> u(0.5, 2.0);
    for (std::size_t i = 0; i < n; ++i) {
      F.push_back(quantity<dims::force>::from_si(3.0 * u(gen)));
      rho.push_back(quantity<dims::density>::from_si(1.2 * u(gen)));
      U.push_back(quantity<dims::velocity>::from_si(10.0 * u(gen)));
      D.push_back(quantity<dims::length>::from_si(0.05 * u(gen)));
      mu.push_back(quantity<dims::dynamic_viscosity>::from_si(1.8e-5 * u(gen)));
      h.push_back(quantity<dims::heat_transfer_coefficient>::from_si(80.0 * u(gen)));
      k.push_back(quantity<dims::thermal_conductivity>::from_si(0.026 * u(gen)));
      cp.push_back(quantity<dims::specific_heat_capacity>::from_si(1007.0 * u(gen)));
      p.push_back(quantity<dims::pressure>::from_si(101325.0 * u(gen)));
    }
  }
};

// ---- the kernels -------------------------------------------------------------------------

// drag on a sphere: F/(rho U^2 D^2) and mu/(rho U D)
void drag_pi_groups(field& f) {
  for (std::size_t i = 0; i < f.F.size(); ++i) {
    const auto g = pi_groups(f.F[i], f.rho[i], f.U[i], f.D[i], f.mu[i]);
    f.out0[i] = g[0];
    f.out1[i] = g[1];
  }
}
void drag_hand(field& f) {
  for (std::size_t i = 0; i < f.F.size(); ++i) {
    const double F = f.F[i].si(), r = f.rho[i].si(), U = f.U[i].si(), D = f.D[i].si(), m = f.mu[i].si();
    f.out0[i] = F / (r * (U * U) * (D * D));
    f.out1[i] = m / (r * U * D);
  }
}

// forced convection: h/(rho U cp), k/(rho U D cp), mu/(rho U D)
void convection_pi_groups(field& f) {
  for (std::size_t i = 0; i < f.F.size(); ++i) {
    const auto g = pi_groups(f.h[i], f.k[i], f.U[i], f.D[i], f.rho[i], f.mu[i], f.cp[i]);
    f.out0[i] = g[0];
    f.out1[i] = g[1];
    f.out2[i] = g[2];
  }
}
void convection_hand(field& f) {
  for (std::size_t i = 0; i < f.F.size(); ++i) {
    const double h = f.h[i].si(), k = f.k[i].si(), U = f.U[i].si(), D = f.D[i].si(), r = f.rho[i].si(),
                 m = f.mu[i].si(), c = f.cp[i].si();
    f.out0[i] = h / (U * r * c);
    f.out1[i] = k / (U * D * r * c);
    f.out2[i] = m / (U * D * r);
  }
}

// blast wave: R^5 rho / (E t^2), with D as R, U as t-like, F as E-like stand-ins of the right
// dimensions built per cell (length, time, energy, density)
void blast_pi_groups(field& f) {
  for (std::size_t i = 0; i < f.F.size(); ++i) {
    const auto t = f.D[i] / f.U[i];
    const auto E = f.F[i] * f.D[i];
    f.out0[i] = pi_groups(f.D[i], t, E, f.rho[i])[0];
  }
}
void blast_hand(field& f) {
  for (std::size_t i = 0; i < f.F.size(); ++i) {
    const double R = f.D[i].si(), t = f.D[i].si() / f.U[i].si(), E = f.F[i].si() * f.D[i].si(), r = f.rho[i].si();
    const double R2 = R * R;
    f.out0[i] = ((R2 * R2) * R) * r / ((t * t) * E);
  }
}

// scales: a pressure field made nondimensional by rho U^2 of one reference state
void pressure_scales(field& f) {
  const auto s = scales(f.rho[0], f.U[0], f.D[0]);
  for (std::size_t i = 0; i < f.p.size(); ++i) f.out0[i] = s.nondimensional(f.p[i]);
}
void pressure_hand(field& f) {
  const double r = f.rho[0].si(), U = f.U[0].si();
  for (std::size_t i = 0; i < f.p.size(); ++i) f.out0[i] = f.p[i].si() / (r * (U * U));
}

// scales with rational exponents: a velocity field over sqrt(g L) (Froude number)
void froude_scales(field& f) {
  const auto s = scales(quantity<dims::acceleration>::from_si(9.80665), f.D[0]);
  for (std::size_t i = 0; i < f.U.size(); ++i) f.out0[i] = s.nondimensional(f.U[i]);
}
void froude_hand(field& f) {
  const double c = std::sqrt(9.80665) * std::sqrt(f.D[0].si());  // hoisted by hand
  for (std::size_t i = 0; i < f.U.size(); ++i) f.out0[i] = f.U[i].si() / c;
}

// ---- benchmarks --------------------------------------------------------------------------

template <void (*Kernel)(field&)>
void run(benchmark::State& state) {
  field f(static_cast<std::size_t>(state.range(0)));
  for (auto _ : state) {
    Kernel(f);
    benchmark::DoNotOptimize(f.out0.data());
    benchmark::DoNotOptimize(f.out1.data());
    benchmark::DoNotOptimize(f.out2.data());
    benchmark::ClobberMemory();
  }
  state.SetItemsProcessed(state.iterations() * state.range(0));
}

constexpr std::int64_t small_field = 1 << 12;
constexpr std::int64_t large_field = 1 << 18;

BENCHMARK(run<drag_pi_groups>)->Name("drag/pi_groups")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<drag_hand>)->Name("drag/hand")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<convection_pi_groups>)->Name("convection/pi_groups")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<convection_hand>)->Name("convection/hand")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<blast_pi_groups>)->Name("blast/pi_groups")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<blast_hand>)->Name("blast/hand")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<pressure_scales>)->Name("pressure/scales")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<pressure_hand>)->Name("pressure/hand")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<froude_scales>)->Name("froude/scales")->Arg(small_field)->Arg(large_field);
BENCHMARK(run<froude_hand>)->Name("froude/hand")->Arg(small_field)->Arg(large_field);

/// Keeps the console table and remembers each run's time, for the ratio lines.
class ratio_reporter : public benchmark::ConsoleReporter {
 public:
  void ReportRuns(const std::vector<Run>& runs) override {
    for (const auto& r : runs)
      if (r.run_type == Run::RT_Iteration || r.aggregate_name == "median")
        times_[r.benchmark_name()] = r.GetAdjustedCPUTime();
    ConsoleReporter::ReportRuns(runs);
  }
  void print_ratios() const {
    std::printf("\nratio library / hand-written, CPU time (1.00 = equal):\n");
    for (const auto& [name, t] : times_) {
      const auto slash = name.find('/');
      const auto tail = name.substr(name.find('/', slash + 1));  // "/4096" (and any aggregate suffix)
      const std::string kind = name.substr(slash + 1, name.find('/', slash + 1) - slash - 1);
      if (kind == "hand") continue;
      const auto hand = times_.find(name.substr(0, slash) + "/hand" + tail);
      if (hand != times_.end()) std::printf("  %-36s %.3f\n", name.c_str(), t / hand->second);
    }
  }

 private:
  std::map<std::string, double> times_;
};

/// The library and the hand-written kernels must agree to the last bit before they are timed.
bool identical(void (*a)(field&), void (*b)(field&), const char* what) {
  field fa(small_field);
  field fb(small_field);
  a(fa);
  b(fb);
  const bool same = fa.out0 == fb.out0 && fa.out1 == fb.out1 && fa.out2 == fb.out2;
  std::printf("%-12s outputs bit-identical to the hand-written kernel: %s\n", what, same ? "yes" : "NO");
  return same;
}

}  // namespace

int main(int argc, char** argv) {
  bool ok = identical(drag_pi_groups, drag_hand, "drag");
  ok = identical(convection_pi_groups, convection_hand, "convection") && ok;
  ok = identical(blast_pi_groups, blast_hand, "blast") && ok;
  ok = identical(pressure_scales, pressure_hand, "pressure") && ok;
  ok = identical(froude_scales, froude_hand, "froude") && ok;
  benchmark::Initialize(&argc, argv);
  if (benchmark::ReportUnrecognizedArguments(argc, argv)) return 1;
  ratio_reporter reporter;
  benchmark::RunSpecifiedBenchmarks(&reporter);
  reporter.print_ratios();
  benchmark::Shutdown();
  return ok ? 0 : 1;
}
