#pragma once
/// \file io.hpp
/// \brief Stream output of quantities: the SI value and its coherent SI unit ("1.8e-05 kg·m⁻¹·s⁻¹").

#include <iosfwd>  // the operator is a template: <ostream> is needed only where it is used

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
