#pragma once
/// \file text.hpp
/// \brief UTF-8 validation, code-point columns and the character classes of the unit
/// grammar. Internal to the parser.

#include <array>
#include <cstddef>
#include <cstdint>
#include <string>
#include <string_view>

namespace nondim::detail {

constexpr unsigned byte_at(std::string_view s, std::size_t i) noexcept {
  return static_cast<unsigned char>(s[i]);
}

/// Length of the well-formed UTF-8 sequence that starts at byte `i`, or 0 when it is not
/// one (stray continuation, overlong form, surrogate, beyond U+10FFFF, truncated).
constexpr std::size_t utf8_length(std::string_view s, std::size_t i) noexcept {
  const unsigned b0 = byte_at(s, i);
  if (b0 < 0x80U) return 1;
  std::size_t n = 0;
  if (b0 >= 0xC2U && b0 <= 0xDFU) {
    n = 2;
  } else if (b0 >= 0xE0U && b0 <= 0xEFU) {
    n = 3;
  } else if (b0 >= 0xF0U && b0 <= 0xF4U) {
    n = 4;
  } else {
    return 0;
  }
  if (s.size() - i < n) return 0;
  for (std::size_t k = 1; k < n; ++k)
    if ((byte_at(s, i + k) & 0xC0U) != 0x80U) return 0;
  const unsigned b1 = byte_at(s, i + 1);
  if (b0 == 0xE0U && b1 < 0xA0U) return 0;  // overlong
  if (b0 == 0xEDU && b1 > 0x9FU) return 0;  // UTF-16 surrogate
  if (b0 == 0xF0U && b1 < 0x90U) return 0;  // overlong
  if (b0 == 0xF4U && b1 > 0x8FU) return 0;  // beyond U+10FFFF
  return n;
}

/// The code point of the well-formed sequence of `n` bytes at `i`.
constexpr char32_t utf8_decode(std::string_view s, std::size_t i, std::size_t n) noexcept {
  const unsigned b0 = byte_at(s, i);
  if (n == 1) return b0;
  unsigned cp = b0 & (n == 2 ? 0x1FU : n == 3 ? 0x0FU : 0x07U);
  for (std::size_t k = 1; k < n; ++k) cp = (cp << 6U) | (byte_at(s, i + k) & 0x3FU);
  return cp;
}

/// Byte offset of the first ill-formed sequence, or `s.size()` when all of `s` is UTF-8.
constexpr std::size_t first_invalid_utf8(std::string_view s) noexcept {
  std::size_t i = 0;
  while (i < s.size()) {
    if (byte_at(s, i) < 0x80U) {
      ++i;
      continue;
    }
    const std::size_t n = utf8_length(s, i);
    if (n == 0) return i;
    i += n;
  }
  return s.size();
}

/// 1-based column (in code points) of byte `at`: lead bytes before it, plus one.
constexpr std::size_t column_of(std::string_view s, std::size_t at) noexcept {
  std::size_t c = 1;
  for (std::size_t i = 0; i < at && i < s.size(); ++i)
    if ((byte_at(s, i) & 0xC0U) != 0x80U) ++c;
  return c;
}

/// What a character is to the unit grammar.
enum class char_class : std::uint8_t {
  end,          ///< past the end of the range
  space,        ///< ASCII white space, no-break and thin spaces: a product between factors
  letter,       ///< starts or continues a unit symbol (and `%`)
  digit,        ///< ASCII digit: a number, or inside a symbol after its first character
  times,        ///< '*', U+00B7 middle dot, U+22C5 dot operator
  solidus,      ///< '/'
  caret,        ///< '^'
  open,         ///< '('
  close,        ///< ')'
  superscript,  ///< ⁰¹²³⁴⁵⁶⁷⁸⁹ ⁺ ⁻
  minus,        ///< '-' or U+2212 (only inside exponents)
  plus,         ///< '+' (only inside exponents)
  dot,          ///< '.' (only inside decimal exponents)
  other,        ///< has no place in a unit expression
};

struct char_info {  // small enough to travel in a register
  char_class cls;
  std::uint8_t len;   ///< bytes
  std::int8_t value;  ///< superscript digit 0..9, -1 for ⁻, -2 for ⁺; otherwise 0
};

constexpr std::array<char_class, 128> make_ascii_classes() {
  std::array<char_class, 128> t{};
  for (auto& c : t) c = char_class::other;
  for (unsigned char c = 'a'; c <= 'z'; ++c) t[c] = char_class::letter;
  for (unsigned char c = 'A'; c <= 'Z'; ++c) t[c] = char_class::letter;
  for (unsigned char c = '0'; c <= '9'; ++c) t[c] = char_class::digit;
  t['_'] = char_class::letter;
  t['%'] = char_class::letter;  // the percent symbol (SI Brochure 9th ed., 5.4.7)
  t[' '] = t['\t'] = t['\n'] = t['\r'] = t['\v'] = t['\f'] = char_class::space;
  t['*'] = char_class::times;
  t['/'] = char_class::solidus;
  t['^'] = char_class::caret;
  t['('] = char_class::open;
  t[')'] = char_class::close;
  t['-'] = char_class::minus;
  t['+'] = char_class::plus;
  t['.'] = char_class::dot;
  return t;
}
inline constexpr auto ascii_classes = make_ascii_classes();

constexpr char_info classify_code_point(char32_t cp, std::uint8_t len) noexcept {
  switch (cp) {
    case 0x00B7:  // middle dot
    case 0x22C5:  // dot operator
      return {char_class::times, len, 0};
    case 0x00A0:  // no-break space
    case 0x2009:  // thin space (SI Brochure 9th ed., 5.4.3 writes the number-unit space thin)
    case 0x202F:  // narrow no-break space
      return {char_class::space, len, 0};
    case 0x2212:  // minus sign
      return {char_class::minus, len, 0};
    case 0x2070:
      return {char_class::superscript, len, 0};
    case 0x00B9:
      return {char_class::superscript, len, 1};
    case 0x00B2:
      return {char_class::superscript, len, 2};
    case 0x00B3:
      return {char_class::superscript, len, 3};
    case 0x207A:
      return {char_class::superscript, len, -2};
    case 0x207B:
      return {char_class::superscript, len, -1};
    case 0x00D7:  // multiplication sign: for numbers, not units (ISO 80000-1)
    case 0x2215:  // division slash
    case 0x2044:  // fraction slash
      return {char_class::other, len, 0};
    default:
      break;
  }
  if (cp >= 0x2074 && cp <= 0x2079) return {char_class::superscript, len, static_cast<std::int8_t>(cp - 0x2070)};
  if (cp >= 0x2000 && cp <= 0x200A) return {char_class::space, len, 0};
  if (cp < 0xA0) return {char_class::other, len, 0};  // C1 controls
  return {char_class::letter, len, 0};                // µ, μ, Ω, Å, °, ℃ ... (a symbol decides)
}

/// The class of a non-ASCII character (kept out of line: the ASCII path is the hot one).
[[gnu::noinline]] inline char_info classify_non_ascii(std::string_view s, std::size_t i) noexcept {
  const std::size_t n = utf8_length(s, i);
  return classify_code_point(utf8_decode(s, i, n), static_cast<std::uint8_t>(n));
}

/// The class of the character at byte `i` of a text already checked to be UTF-8.
[[gnu::always_inline]] inline char_info classify_at(std::string_view s, std::size_t i, std::size_t end) noexcept {
  if (i >= end) return {char_class::end, 0, 0};
  const unsigned b = byte_at(s, i);
  if (b < 0x80U) [[likely]]
    return {ascii_classes[b], 1, 0};
  return classify_non_ascii(s, i);
}

/// A token quoted for a message: control characters as U+XXXX, long tokens cut.
inline std::string quote_token(std::string_view t) {
  constexpr std::size_t max_shown = 24;  // code points
  std::string out = "`";
  std::size_t shown = 0;
  std::size_t i = 0;
  while (i < t.size()) {
    if (shown == max_shown) {
      out += "...";
      break;
    }
    static constexpr std::string_view hex = "0123456789ABCDEF";
    const std::size_t n = utf8_length(t, i);
    if (n == 0) {  // not reached for validated text; never copy a broken byte into a message
      out += "0x";
      out += hex[(byte_at(t, i) >> 4U) & 0xFU];
      out += hex[byte_at(t, i) & 0xFU];
      ++i;
      ++shown;
      continue;
    }
    const char32_t cp = utf8_decode(t, i, n);
    if (cp < 0x20 || cp == 0x7F || (cp >= 0x80 && cp < 0xA0)) {
      out += "U+00";
      out += hex[(cp >> 4U) & 0xFU];
      out += hex[cp & 0xFU];
    } else {
      out += t.substr(i, n);
    }
    i += n;
    ++shown;
  }
  return out + "`";
}

}  // namespace nondim::detail
