// The part of the public contract that <nondim/quantity.hpp> gives on the standard library alone.
#include <nondim/quantity.hpp>

int main() {
  using namespace nondim;
  constexpr rational half{1, 2};
  constexpr dimension d = pow(dims::area, half);
  static_assert(d == dims::length);
  constexpr quantity<dims::velocity> u = 2.0 * units::m / units::s;
  constexpr unit<dims::length> foot = units::ft;
  constexpr double in_feet = (u * (1.0 * units::s)) / foot;
  static_assert(in_feet > 6.56 && in_feet < 6.57);
  return sqrt(4.0 * units::m2) / units::m == 2.0 ? 0 : 1;
}
