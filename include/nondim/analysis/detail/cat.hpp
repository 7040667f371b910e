#pragma once
/// \file cat.hpp
/// \brief Internals: strings built by appending only. GCC 12 at -O3 warns falsely
/// (-Wrestrict) on `"literal" + std::string(...)`, which inserts at the front; messages
/// and text forms are therefore assembled with `cat`.

#include <initializer_list>
#include <string>
#include <string_view>

namespace nondim::detail {

/// \brief The concatenation of `parts`.
inline std::string cat(std::initializer_list<std::string_view> parts) {
  std::size_t size = 0;
  for (const auto p : parts) size += p.size();
  std::string s;
  s.reserve(size);
  for (const auto p : parts) s.append(p);
  return s;
}

}  // namespace nondim::detail
