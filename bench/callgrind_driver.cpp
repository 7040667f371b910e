// Driver for callgrind_compare.sh: runs one heat_kernel_* form once over N cells and prints a
// checksum of every output (so the work cannot be optimised away and the two forms can be
// compared bit for bit). Compiled once per kernel, so each binary holds exactly one kernel:
//   g++ -std=c++20 -O2 -DNONDIM_BENCH_KERNEL=heat_kernel_quantity -DNONDIM_BENCH_QUANTITY=1 ...
// Not a *_bench.cpp: bench/CMakeLists.txt does not build it.
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>

#include "heat_kernel.hpp"

#ifndef NONDIM_BENCH_KERNEL
#error "define NONDIM_BENCH_KERNEL to one of the heat_kernel_* functions"
#endif
#ifndef NONDIM_BENCH_QUANTITY
#error "define NONDIM_BENCH_QUANTITY to 1 (quantity kernel) or 0 (double kernel)"
#endif

namespace {

// Order-dependent hash of the bit patterns, so equal checksums mean bit-identical outputs.
template <class T>
std::uint64_t mix(std::uint64_t h, const T& v) {
  static_assert(sizeof(T) == sizeof(std::uint64_t));
  std::uint64_t bits = 0;
  std::memcpy(&bits, &v, sizeof bits);
  return (h ^ bits) * 1099511628211ULL;
}

}  // namespace

int main(int argc, char** argv) {
  const std::size_t n = argc > 1 ? std::strtoull(argv[1], nullptr, 10) : 100000U;
  nondim_bench::cell_data cells(n);
  std::uint64_t h = 14695981039346656037ULL;
#if NONDIM_BENCH_QUANTITY
  nondim_bench::quantity_cell_data qcells(cells);
  nondim_bench::NONDIM_BENCH_KERNEL(qcells.as_quantity());
  for (std::size_t i = 0; i < n; ++i) h = mix(mix(mix(h, qcells.q[i]), qcells.re[i]), qcells.nu[i]);
#else
  nondim_bench::NONDIM_BENCH_KERNEL(cells.as_double());
  for (std::size_t i = 0; i < n; ++i) h = mix(mix(mix(h, cells.q[i]), cells.re[i]), cells.nu[i]);
#endif
  std::printf("%016llx\n", static_cast<unsigned long long>(h));
  return 0;
}
