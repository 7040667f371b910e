// A basis whose primitive integer exponents do not fit in 64 bits: X = L^(1/p) M^(1/q) with
// the primes p = 3037000507, q = 3037000537 gives the group X^(pq) L^(-q) M^(-p), pq > 2^63.
// The compile-time analysis must refuse it, never wrap.
// expect: nondim: the exact basis of these dimensions does not fit in 64-bit rationals
// expect: L_<1, 3037000507>, nondim::spelled::M_<1, 3037000537>
#include <nondim/solver.hpp>
using namespace nondim;
#ifdef NONDIM_CONTROL
inline constexpr dimension x{rational{1, 3037000507}, rational{1, 3}, 0};
#else
inline constexpr dimension x{rational{1, 3037000507}, rational{1, 3037000537}, 0};
#endif
int main() {
  constexpr auto e = pi_exponents<x, dims::length, dims::mass>();
  return static_cast<int>(e[0][0] % 7);
}
