#pragma once
/// \file io.hpp
/// \brief Stream output of quantities: the SI value and its coherent SI unit ("1.8e-05 kg·m⁻¹·s⁻¹").

// <ostream>, not <iosfwd>: without the standard inserters declared, `os << q.si()` would
// pick another overload through a conversion instead of printing the double.
#include <ostream>

#include "../core/format.hpp"
#include "quantity_type.hpp"

namespace nondim {

template <class CharT, class Traits, dimension D, class R>
std::basic_ostream<CharT, Traits>& operator<<(std::basic_ostream<CharT, Traits>& os, const quantity<D, R>& q) {
  os << q.si();
  if constexpr (!D.is_dimensionless()) os << ' ' << si_unit_string(D, text_form::unicode).c_str();
  return os;
}

}  // namespace nondim
