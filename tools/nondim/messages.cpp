#include "messages.hpp"

namespace nondim::tool {

std::size_t code_points(std::string_view text) {
  std::size_t n = 0;
  for (const char c : text)
    if ((static_cast<unsigned char>(c) & 0xC0U) != 0x80U) ++n;
  return n;
}

std::string caret_block(std::string_view text, std::size_t column) {
  std::string s = "  ";
  // control characters would break the alignment of the caret: show them as '?'
  for (const char c : text) s.push_back(static_cast<unsigned char>(c) < 0x20U ? '?' : c);
  if (column == 0) return s;
  s += "\n  ";
  s.append(column - 1, ' ');
  s.push_back('^');
  return s;
}

std::string with_prefix(std::string_view message) {
  constexpr std::string_view prefix = "nondim: ";
  if (message.substr(0, prefix.size()) == prefix) return std::string(message);
  std::string s(prefix);
  s += message;
  return s;
}

}  // namespace nondim::tool
