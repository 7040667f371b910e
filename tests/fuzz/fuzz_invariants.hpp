#pragma once
// What every fuzz target checks beyond "no crash": a parsed unit has a usable factor and
// prints to forms that read back to the same dimension (and, for linear units, the same
// factor bit for bit); an error has a column inside the text.
#include <nondim/parse.hpp>

#include <cfloat>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <cstring>
#include <exception>
#include <string>
#include <string_view>
#include <typeinfo>

namespace nondim_fuzz {

/// The fuzzer's bytes read in order; past the end every byte reads as 0.
class byte_reader {
 public:
  byte_reader(const std::uint8_t* data, std::size_t size) : data_(data), size_(size) {}
  std::uint8_t byte() { return pos_ < size_ ? data_[pos_++] : 0; }
  std::uint64_t bits64() {
    std::uint64_t u = 0;
    for (int i = 0; i < 8; ++i) u = (u << 8U) | byte();
    return u;
  }
  std::int64_t int64() {
    const std::uint64_t u = bits64();
    std::int64_t s = 0;
    std::memcpy(&s, &u, sizeof s);
    return s;
  }
  /// Up to n bytes, fewer at the end of the input.
  std::string text(std::size_t n) {
    std::string s;
    while (s.size() < n && pos_ < size_) s += static_cast<char>(data_[pos_++]);
    return s;
  }
  [[nodiscard]] bool done() const { return pos_ >= size_; }

 private:
  const std::uint8_t* data_;
  std::size_t size_;
  std::size_t pos_ = 0;
};

inline void require(bool ok) {
  if (!ok) __builtin_trap();
}

/// An exception that README.md "Error model" does not list for the entry point under test:
/// a finding. Named on standard error, then a trap (the fuzzer keeps the input).
[[noreturn]] inline void undocumented(const std::exception& e) {
  std::fprintf(stderr, "undocumented exception %s: %s\n", typeid(e).name(), e.what());
  __builtin_trap();
}

inline std::size_t code_points(std::string_view s) {
  std::size_t n = 0;
  for (const char c : s) n += (static_cast<unsigned char>(c) & 0xC0U) != 0x80U ? 1U : 0U;
  return n;
}

inline void check_error(const nondim::unit_error& e, std::string_view text) {
  require(e.column() >= 1);
  require(e.column() <= code_points(text) + 1);
  require(e.what()[0] != '\0');
}

inline void check_unit(const nondim::parsed_unit& u) {
  require(std::isfinite(u.factor) && u.factor >= DBL_MIN);
  require(std::isfinite(u.offset));
  for (const nondim::text_form form : {nondim::text_form::unicode, nondim::text_form::ascii}) {
    const auto si = nondim::parse_unit(nondim::si_unit_string(u, form));
    require(si.dim == u.dim && si.factor == 1.0 && si.offset == 0.0);
    if (u.offset == 0.0) {
      const auto q = nondim::parse_quantity(nondim::to_string(u, form));
      require(q.dim == u.dim && q.value == u.factor);
    }
  }
}

}  // namespace nondim_fuzz
