// Driver for callgrind_compare.sh --kernel flux: runs one flux_kernel_* once over N cells of a
// nozzle-like flow and prints a checksum of the fluxes (so the work cannot be optimised away and
// the typed and raw forms can be compared bit for bit). Compiled once per kernel:
//   g++ -std=c++20 -O2 -DNONDIM_BENCH_KERNEL=flux_kernel_typed_views ...
// Not a *_bench.cpp: bench/CMakeLists.txt does not build it.
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <vector>

#include "flux_kernel.hpp"

#ifndef NONDIM_BENCH_KERNEL
#error "define NONDIM_BENCH_KERNEL to one of the flux_kernel_* functions"
#endif
#define NONDIM_BENCH_TEXT(x) #x
#define NONDIM_BENCH_NAME(x) NONDIM_BENCH_TEXT(x)

int main(int argc, char** argv) {
  const std::size_t n = argc > 1 ? std::strtoull(argv[1], nullptr, 10) : 100000U;
  // U of air (gamma 1.4, R 287 J/(kg K)) along a duct, the same numbers in both layouts: the
  // views forms read u[k * n + i], the state forms u[3 * i + k] (a scenario of our own).
  const double gamma = 1.4, r = 287.0;
  std::vector<double> u(3 * n), f(3 * n);
  const bool aos = std::strstr(NONDIM_BENCH_NAME(NONDIM_BENCH_KERNEL), "state") != nullptr;
  for (std::size_t i = 0; i < n; ++i) {
    const double x = static_cast<double>(i) / static_cast<double>(n);
    const double rho = 1.1 - 0.4 * x, v = 150.0 + 250.0 * x, t = 290.0 - 60.0 * x, a = 0.05 + 0.03 * x * x;
    const double e = r * t / (gamma - 1.0);
    const double c[3] = {rho * a, rho * a * v, rho * (e + 0.5 * v * v) * a};
    for (std::size_t k = 0; k < 3; ++k) (aos ? u[3 * i + k] : u[k * n + i]) = c[k];
  }
  nondim_bench::NONDIM_BENCH_KERNEL(u.data(), f.data(), n, gamma);
  // order-dependent hash of the bit patterns, cell by cell, component by component
  std::uint64_t h = 14695981039346656037ULL;
  for (std::size_t i = 0; i < n; ++i) {
    for (std::size_t k = 0; k < 3; ++k) {
      std::uint64_t bits = 0;
      std::memcpy(&bits, aos ? &f[3 * i + k] : &f[k * n + i], sizeof bits);
      h = (h ^ bits) * 1099511628211ULL;
    }
  }
  std::printf("%016llx\n", static_cast<unsigned long long>(h));
  return 0;
}
