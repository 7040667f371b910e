#pragma once
/// \file too_large.hpp
/// \brief Internals: the signal that an exact result does not fit in 64 bits.

#include <string>

namespace nondim::detail {

/// Internal: a primitive integer vector that does not fit in int64 (only the
/// multiprecision path can produce one; the caller turns it into an `analysis_error`).
struct integers_too_large {
  std::string example;  ///< one of the entries that does not fit, in decimal
};

}  // namespace nondim::detail
