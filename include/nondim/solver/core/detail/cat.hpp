#pragma once
/// \file cat.hpp
/// \brief Internals: `cat(pieces...)`, one string from pieces, by appending. Messages and
/// text forms are built this way rather than with `"text" + std::string(...)`, whose
/// insert-at-front GCC 12 flags falsely with -Wrestrict at -O3.

#include <string>
#include <string_view>

namespace nondim::detail {

/// \brief The concatenation of `pieces` (anything a `std::string_view` can be made from).
template <class... Pieces>
std::string cat(const Pieces&... pieces) {
  std::string s;
  s.reserve((std::string_view(pieces).size() + ... + std::size_t{0}));
  (s.append(std::string_view(pieces)), ...);
  return s;
}

}  // namespace nondim::detail
