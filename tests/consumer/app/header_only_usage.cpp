// nondim::nondim through add_subdirectory: header-only use, checked through what the target
// gives its users (C++20, nondim's, Eigen's and Boost's headers, no NONDIM_SEPARATE_COMPILATION).
// The analysis half is compiled header-only in consumer.find_package.all.
#if defined(NONDIM_SEPARATE_COMPILATION)
#error "nondim::nondim is header-only: it must not define NONDIM_SEPARATE_COMPILATION"
#endif
#if !__has_include(<nondim/nondim.hpp>) || !__has_include(<nondim/implementation.ipp>)
#error "nondim::nondim must give nondim's include directory"
#endif
#if !__has_include(<Eigen/SVD>)
#error "nondim::nondim must give Eigen's include directory"
#endif
#if !__has_include(<boost/multiprecision/cpp_int.hpp>)
#error "nondim::nondim must give Boost's include directory"
#endif

#include <nondim/quantity.hpp>

static_assert(__cplusplus >= 202002L, "nondim::nondim must require C++20");

int main() {
  using namespace nondim;
  // 1 ft = 0.3048 m exactly (NIST SP 811 B.8)
  return (1.0 * units::ft) / units::m == 0.3048 ? 0 : 1;
}
