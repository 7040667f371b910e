#pragma once
/// \file detail/json.hpp
/// \brief A minimal JSON value and writer for the report layer, so that the library's
/// JSON view needs no JSON library: correct string escaping (RFC 8259, section 7; invalid
/// UTF-8 replaced by U+FFFD) and numbers in the shortest form that reads back to the same
/// double (std::to_chars); non-finite numbers, which JSON cannot hold, are written null.

#include <array>
#include <charconv>
#include <cmath>
#include <cstdint>
#include <memory>
#include <string>
#include <string_view>
#include <utility>
#include <variant>
#include <vector>

namespace nondim::detail {

struct json_value;
using json_members = std::vector<std::pair<std::string, json_value>>;  ///< an object, keys in insertion order
using json_elements = std::vector<json_value>;

/// \brief null, bool, integer, double, string, array or object.
struct json_value {
  std::variant<std::nullptr_t, bool, std::int64_t, double, std::string, json_elements, json_members> v;

  json_value() : v(nullptr) {}
  json_value(bool b) : v(b) {}                                    // NOLINT: implicit by design, as in JSON libraries
  json_value(std::int64_t i) : v(i) {}                            // NOLINT
  json_value(std::size_t i) : v(static_cast<std::int64_t>(i)) {}  // NOLINT
  json_value(double d) : v(d) {}                                  // NOLINT
  json_value(std::string s) : v(std::move(s)) {}                  // NOLINT
  json_value(const char* s) : v(std::string(s)) {}                // NOLINT
  json_value(json_elements a) : v(std::move(a)) {}                // NOLINT
  json_value(json_members o) : v(std::move(o)) {}                 // NOLINT
};

/// JSON string literal for UTF-8 text `s`.
inline void write_json_string(std::string& out, std::string_view s) {
  static constexpr std::array<char, 16> hex{'0', '1', '2', '3', '4', '5', '6', '7',
                                            '8', '9', 'a', 'b', 'c', 'd', 'e', 'f'};
  out.push_back('"');
  std::size_t i = 0;
  while (i < s.size()) {
    const auto c = static_cast<unsigned char>(s[i]);
    if (c < 0x80U) {
      switch (c) {
        case '"':
          out += "\\\"";
          break;
        case '\\':
          out += "\\\\";
          break;
        case '\n':
          out += "\\n";
          break;
        case '\r':
          out += "\\r";
          break;
        case '\t':
          out += "\\t";
          break;
        case '\b':
          out += "\\b";
          break;
        case '\f':
          out += "\\f";
          break;
        default:
          if (c < 0x20U) {
            out += "\\u00";
            out.push_back(hex[c >> 4U]);
            out.push_back(hex[c & 0xFU]);
          } else {
            out.push_back(static_cast<char>(c));
          }
      }
      ++i;
      continue;
    }
    // a well-formed UTF-8 sequence (RFC 3629: no overlongs, no surrogates, <= U+10FFFF) is copied
    std::size_t len = 0;
    std::uint32_t lo = 0x80U;
    std::uint32_t hi = 0xBFU;  // allowed range of the second byte
    if (c >= 0xC2U && c <= 0xDFU) {
      len = 2;
    } else if (c >= 0xE0U && c <= 0xEFU) {
      len = 3;
      if (c == 0xE0U) lo = 0xA0U;
      if (c == 0xEDU) hi = 0x9FU;
    } else if (c >= 0xF0U && c <= 0xF4U) {
      len = 4;
      if (c == 0xF0U) lo = 0x90U;
      if (c == 0xF4U) hi = 0x8FU;
    }
    bool ok = len != 0 && i + len <= s.size();
    for (std::size_t k = 1; ok && k < len; ++k) {
      const auto b = static_cast<unsigned char>(s[i + k]);
      ok = k == 1 ? (b >= lo && b <= hi) : (b >= 0x80U && b <= 0xBFU);
    }
    if (ok) {
      out.append(s.substr(i, len));
      i += len;
    } else {
      out += "\\ufffd";
      ++i;
    }
  }
  out.push_back('"');
}

/// Shortest round-trip decimal of a finite double; null otherwise.
inline void write_json_number(std::string& out, double d) {
  if (!std::isfinite(d)) {
    out += "null";
    return;
  }
  if (d == 0.0) d = 0.0;  // -0 as 0
  std::array<char, 32> buffer{};
  const auto r = std::to_chars(buffer.data(), buffer.data() + buffer.size(), d);
  out.append(buffer.data(), r.ptr);
}

inline void write_json_compact(std::string& out, const json_value& j);

inline void write_json_compact(std::string& out, const json_value& j) {
  if (std::holds_alternative<std::nullptr_t>(j.v)) {
    out += "null";
  } else if (const bool* b = std::get_if<bool>(&j.v)) {
    out += *b ? "true" : "false";
  } else if (const std::int64_t* i = std::get_if<std::int64_t>(&j.v)) {
    out += std::to_string(*i);
  } else if (const double* d = std::get_if<double>(&j.v)) {
    write_json_number(out, *d);
  } else if (const std::string* s = std::get_if<std::string>(&j.v)) {
    write_json_string(out, *s);
  } else if (const json_elements* a = std::get_if<json_elements>(&j.v)) {
    out.push_back('[');
    for (std::size_t k = 0; k < a->size(); ++k) {
      if (k != 0) out += ", ";
      write_json_compact(out, (*a)[k]);
    }
    out.push_back(']');
  } else {
    const json_members& o = std::get<json_members>(j.v);
    out.push_back('{');
    for (std::size_t k = 0; k < o.size(); ++k) {
      if (k != 0) out += ", ";
      write_json_string(out, o[k].first);
      out += ": ";
      write_json_compact(out, o[k].second);
    }
    out.push_back('}');
  }
}

/// Indented by two spaces per level; an array or object that fits in `width` columns from
/// where it starts stays on one line (so each variable or group reads as one line).
inline void write_json_pretty(std::string& out, const json_value& j, std::size_t indent, std::size_t column,
                              std::size_t width = 100) {
  std::string flat;
  write_json_compact(flat, j);
  const bool container = std::holds_alternative<json_elements>(j.v) || std::holds_alternative<json_members>(j.v);
  if (!container || column + flat.size() <= width) {
    out += flat;
    return;
  }
  const std::string pad(indent + 2, ' ');
  if (const json_elements* a = std::get_if<json_elements>(&j.v)) {
    out += "[\n";
    for (std::size_t k = 0; k < a->size(); ++k) {
      out += pad;
      write_json_pretty(out, (*a)[k], indent + 2, indent + 2, width);
      out += k + 1 < a->size() ? ",\n" : "\n";
    }
    out += std::string(indent, ' ') + "]";
    return;
  }
  const json_members& o = std::get<json_members>(j.v);
  out += "{\n";
  for (std::size_t k = 0; k < o.size(); ++k) {
    out += pad;
    const std::size_t start = out.size();
    write_json_string(out, o[k].first);
    out += ": ";
    write_json_pretty(out, o[k].second, indent + 2, indent + 2 + (out.size() - start), width);
    out += k + 1 < o.size() ? ",\n" : "\n";
  }
  out += std::string(indent, ' ') + "}";
}

}  // namespace nondim::detail
