#pragma once
// A helper shared by the tests that read reports and messages by phrase.
#include <string_view>

namespace test_support {

/// Whether `text` contains `part` (a report or message is checked by its phrases, not whole).
inline bool contains(std::string_view text, std::string_view part) {
  return text.find(part) != std::string_view::npos;
}

}  // namespace test_support
