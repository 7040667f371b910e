#pragma once
/// \file errors.hpp
/// \brief `field_size_error`: two spans that must hold as many values as each other do not
/// (a field and the buffer it is converted into, a state's storage that is not a whole
/// number of cells). The message names both sizes and the operation.

#include <cstddef>
#include <stdexcept>
#include <string>

namespace nondim {

/// \brief Sizes that must agree and do not; `what()` names the operation and both sizes.
class field_size_error : public std::length_error {
 public:
  /// \param where    the operation ("scales::nondimensional(field, out)")
  /// \param expected the size the operation needs (the field's, usually)
  /// \param actual   the size it was given
  field_size_error(const std::string& where, std::size_t expected, std::size_t actual)
      : std::length_error(where + ": expected " + std::to_string(expected) + " values, got " + std::to_string(actual)),
        expected_(expected),
        actual_(actual) {}

  [[nodiscard]] std::size_t expected() const noexcept { return expected_; }
  [[nodiscard]] std::size_t actual() const noexcept { return actual_; }

 private:
  std::size_t expected_;
  std::size_t actual_;
};

}  // namespace nondim
