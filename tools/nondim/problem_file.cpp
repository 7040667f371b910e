#include "problem_file.hpp"

#include <cctype>
#include <cerrno>
#include <cmath>
#include <cstdio>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <optional>
#include <string>
#include <utility>

// header-only: see CMakeLists.txt
#define TOML_HEADER_ONLY 1
#include <toml++/toml.h>

#include <nondim/analysis/names/quantity_kind.hpp>
#include <nondim/analysis/names/regimes.hpp>
#include <nondim/solver/parse/detail/text.hpp>

#include "messages.hpp"

namespace nondim::tool {

namespace {

file_position position_of(const toml::source_region& r) {
  return {r.begin.line, r.begin.column};
}

std::string_view type_name(const toml::node& n) {
  switch (n.type()) {
    case toml::node_type::string:
      return "a string";
    case toml::node_type::integer:
      return "an integer";
    case toml::node_type::floating_point:
      return "a floating-point number";
    case toml::node_type::boolean:
      return "a boolean";
    case toml::node_type::date:
      return "a date";
    case toml::node_type::time:
      return "a time";
    case toml::node_type::date_time:
      return "a date-time";
    case toml::node_type::array:
      return "an array";
    case toml::node_type::table:
      return "a table";
    case toml::node_type::none:
      break;
  }
  return "nothing";
}

/// The code point of UTF-8 `s` at byte `i` and its length; U+FFFD and length 1 for a
/// sequence that is not well-formed UTF-8 (truncated, overlong, a surrogate, past U+10FFFF),
/// whose bytes are then left for the reader to refuse.
std::pair<char32_t, std::size_t> code_point_at(std::string_view s, std::size_t i) {
  const auto b = static_cast<unsigned char>(s[i]);
  const std::size_t len = b >= 0xF8U ? 0 : b >= 0xF0U ? 4 : b >= 0xE0U ? 3 : b >= 0xC0U ? 2 : 1;
  if (len <= 1 || i + len > s.size()) return {0xFFFD, 1};
  char32_t c = b & (0x7FU >> len);
  for (std::size_t k = 1; k < len; ++k) {
    const auto t = static_cast<unsigned char>(s[i + k]);
    if ((t & 0xC0U) != 0x80U) return {0xFFFD, 1};
    c = (c << 6U) | (t & 0x3FU);
  }
  constexpr char32_t shortest[5] = {0, 0, 0x80, 0x800, 0x10000};  // least code point of each length
  if (c < shortest[len] || c > 0x10FFFF || (c >= 0xD800 && c <= 0xDFFF)) return {0xFFFD, 1};
  return {c, len};
}

/// toml++ 3.3 classifies code points of the Basic Multilingual Plane with undefined
/// behaviour when it asks whether they are white space: its generated table reaches an
/// unreachable branch for most code points of three of its blocks (U+00A1..U+0499,
/// U+2C5E..U+3057, U+FB26..U+FEFE). Rather than keep a list of the faulty ones, which only
/// that version's table defines, every non-ASCII code point of the BMP reaches the reader
/// as a stand-in in the private-use plane 15 (U+F0000 plus the code point, four bytes of
/// UTF-8), which every classifier of the reader answers without a table: its white-space
/// table ends at U+FEFF, and the bare-key table (off in TOML 1.0) at U+EFFFF. The mapping
/// is one code point for one, so lines and columns of the reader's positions are those of
/// the file; code points past the BMP reach the reader unchanged (past its tables too).
/// TOML 1.0 gives no meaning to a non-ASCII code point outside strings and comments, so the
/// stand-ins change no valid file, and only the reader's own non-standard white space
/// (U+00A0, U+2028, U+3000...) is refused as any other stray character.
constexpr char32_t stand_in_base = 0xF0000;
constexpr char32_t stand_in_first = stand_in_base + 0x80;
constexpr char32_t stand_in_last = stand_in_base + 0xFFFF;

bool has_stand_in(char32_t c) {
  return c >= 0x80 && c <= 0xFFFF;
}

bool is_stand_in(char32_t c) {
  return c >= stand_in_first && c <= stand_in_last;
}

void append_utf8(std::string& out, char32_t c) {
  const auto byte = [&](char32_t b) { out.push_back(static_cast<char>(static_cast<unsigned char>(b))); };
  if (c < 0x80) {
    byte(c);
  } else if (c < 0x800) {
    byte(0xC0U | (c >> 6U));
    byte(0x80U | (c & 0x3FU));
  } else if (c < 0x10000) {
    byte(0xE0U | (c >> 12U));
    byte(0x80U | ((c >> 6U) & 0x3FU));
    byte(0x80U | (c & 0x3FU));
  } else {
    byte(0xF0U | (c >> 18U));
    byte(0x80U | ((c >> 12U) & 0x3FU));
    byte(0x80U | ((c >> 6U) & 0x3FU));
    byte(0x80U | (c & 0x3FU));
  }
}

/// `text` with every code point that `from` accepts replaced by `to` of it; other bytes
/// (bad UTF-8 included) unchanged.
template <class From, class To>
std::string moved(std::string_view text, From from, To to) {
  std::string out;
  out.reserve(text.size() + text.size() / 2);
  for (std::size_t i = 0; i < text.size();) {
    const auto [c, len] = code_point_at(text, i);
    if (len > 1 && from(c)) {
      append_utf8(out, to(c));
    } else {
      out.append(text.substr(i, len));
    }
    i += len;
  }
  return out;
}

constexpr std::string_view byte_order_mark = "\xEF\xBB\xBF";

/// The text the reader sees: every non-ASCII BMP code point as its stand-in, but a byte
/// order mark that starts the file, which the reader itself skips.
std::string to_reader(std::string_view text) {
  const std::size_t keep = text.substr(0, 3) == byte_order_mark ? 3 : 0;
  return std::string(text.substr(0, keep)) +
         moved(text.substr(keep), has_stand_in, [](char32_t c) { return stand_in_base + c; });
}

/// Text from the reader (a key, a string, a message) with the stand-ins moved back. The
/// reader's messages write a code point past U+007F as an escape, `\U000Fhhhh` for a
/// stand-in: that becomes `\uhhhh`, the escape of the code point of the file.
std::string from_reader(std::string_view text) {
  std::string out = moved(text, is_stand_in, [](char32_t c) { return c - stand_in_base; });
  const auto hex = [](char h) { return std::isxdigit(static_cast<unsigned char>(h)) != 0; };
  for (std::size_t at = out.find("\\U000F"); at != std::string::npos; at = out.find("\\U000F", at + 1)) {
    // `\U000F` and four hex digits: the last four are those of the BMP code point
    if (at + 10 <= out.size() && hex(out[at + 6]) && hex(out[at + 7]) && hex(out[at + 8]) && hex(out[at + 9]))
      out.replace(at, 6, "\\u");
  }
  return out;
}

struct text_fault {
  std::size_t line = 0;
  std::size_t column = 0;
  std::string what;
};

/// The first private-use code point of plane 15 in `text` (where the stand-ins live), with
/// its line and column, for the message that refuses it.
std::optional<text_fault> stand_in_fault(std::string_view t) {
  std::size_t line = 1;
  std::size_t column = 1;
  for (std::size_t i = 0; i < t.size();) {
    const auto [c, len] = code_point_at(t, i);
    if (len > 1 && c >= stand_in_base && c <= 0xFFFFF) {
      char hex[16];
      std::snprintf(hex, sizeof hex, "U+%05X", static_cast<unsigned>(c));
      return text_fault{line, column, std::string("the private-use character ") + hex + " is not supported"};
    }
    if (t[i] == '\n') {
      ++line;
      column = 1;
    } else {
      ++column;
    }
    i += len;
  }
  return std::nullopt;
}

class checker {
 public:
  checker(std::string_view text, const problem_file& out) : text_(text), out_(out) {}

  [[noreturn]] void fail(const toml::source_region& where, const std::string& what) const {
    throw input_error(with_prefix(out_.at(position_of(where)) + what));
  }

  std::string string_value(const toml::node& n, std::string_view what) const {
    const auto* s = n.as_string();
    if (s == nullptr) fail(n.source(), std::string(what) + " must be a string, not " + std::string(type_name(n)));
    return from_reader(s->get());
  }

  double number_value(const toml::node& n, std::string_view what) const {
    if (!n.is_number()) fail(n.source(), std::string(what) + " must be a number, not " + std::string(type_name(n)));
    const double v = n.is_integer() ? static_cast<double>(n.as_integer()->get()) : n.as_floating_point()->get();
    if (!std::isfinite(v)) fail(n.source(), std::string(what) + " must be a finite number");
    return v;
  }

  /// The raw text of `line` (1-based) of the file.
  std::string_view line_text(std::size_t line) const {
    std::size_t start = 0;
    for (std::size_t l = 1; l < line; ++l) {
      const std::size_t nl = text_.find('\n', start);
      if (nl == std::string_view::npos) return {};
      start = nl + 1;
    }
    const std::size_t end = text_.find('\n', start);
    return text_.substr(start, end == std::string_view::npos ? std::string_view::npos : end - start);
  }

  /// Whether the string `value` at `where` is written literally between single quote
  /// characters on one line, so that a column inside it maps onto the file.
  bool written_literally(const toml::source_region& where, const std::string& value) const {
    const std::string_view line = line_text(where.begin.line);
    std::size_t byte = 0;  // the byte where code point number `begin.column` starts
    for (std::size_t cp = 0; byte < line.size(); ++byte)
      if ((static_cast<unsigned char>(line[byte]) & 0xC0U) != 0x80U && ++cp == where.begin.column) break;
    if (byte >= line.size() || (line[byte] != '"' && line[byte] != '\'')) return false;
    const char quote = line[byte];
    const std::string_view rest = line.substr(byte + 1);
    return rest.substr(0, value.size()) == value && rest.size() > value.size() && rest[value.size()] == quote &&
           (quote == '\'' || value.find('\\') == std::string::npos);
  }

 private:
  std::string_view text_;
  const problem_file& out_;
};

void read_variable(const checker& c, const toml::table& t, std::size_t index, problem_file& out) {
  file_variable v;
  v.where = position_of(t.source());
  const std::string label = "variable " + std::to_string(index);
  bool has_name = false;
  bool has_unit = false;
  for (auto&& [key, node] : t) {
    const std::string k = from_reader(key.str());
    if (k == "name") {
      v.name = c.string_value(node, "'name' of " + label);
      if (const auto why = bad_variable_name(v.name)) c.fail(node.source(), "'name' of " + label + ": " + *why);
      has_name = true;
    } else if (k == "unit") {
      v.unit = c.string_value(node, "'unit' of " + label);
      v.unit_where = position_of(node.source());
      v.unit_where.column += 1;  // past the opening quote
      v.unit_literal = c.written_literally(node.source(), v.unit);
      v.unit_line_text = std::string(c.line_text(node.source().begin.line));
      has_unit = true;
    } else if (k == "note") {
      v.note = c.string_value(node, "'note' of " + label);
    } else if (k == "kind") {
      v.kind = c.string_value(node, "'kind' of " + label);
      v.kind_where = position_of(node.source());
      if (kind_from_key(v.kind) == quantity_kind::unspecified)
        c.fail(node.source(), "'kind' of " + label + ": '" + v.kind +
                                  "' is not a kind of the catalog (nondim groups --kinds lists them)");
    } else if (k == "prototype") {
      v.prototype = c.number_value(node, "'prototype' of " + label);
    } else if (k == "model") {
      v.model = c.number_value(node, "'model' of " + label);
    } else if (k == "value" || k == "uncertainty" || k == "prototype_uncertainty" || k == "model_uncertainty") {
      file_quantity q;
      q.where = position_of(node.source());
      if (node.is_string())
        q.text = c.string_value(node, "'" + k + "' of " + label);
      else if (node.is_number())
        q.number = c.number_value(node, "'" + k + "' of " + label);
      else
        c.fail(node.source(), "'" + k + "' of " + label + " must be a number or a string (" +
                                  (k == "value" ? "998 or \"998 kg/m^3\"" : "0.5, \"0.5 K\" or \"2 %\"") + "), not " +
                                  std::string(type_name(node)));
      (k == "value"                   ? v.value
       : k == "uncertainty"           ? v.uncertainty
       : k == "prototype_uncertainty" ? v.prototype_uncertainty
                                      : v.model_uncertainty) = std::move(q);
    } else {
      c.fail(key.source(),
             "unknown key '" + std::string(k) + "' in " + label +
                 " (a [[variable]] table takes name, unit, note, kind, value, uncertainty, prototype, model, "
                 "prototype_uncertainty, model_uncertainty)");
    }
  }
  if (!has_name) c.fail(t.source(), label + " has no 'name'");
  if (!has_unit) c.fail(t.source(), label + " ('" + v.name + "') has no 'unit' (write unit = \"1\" for a pure number)");
  if (v.uncertainty && !v.value) c.fail(t.source(), label + " ('" + v.name + "') has an 'uncertainty' but no 'value'");
  if (v.prototype_uncertainty && !v.prototype)
    throw input_error(with_prefix(out.at(v.prototype_uncertainty->where) + label + " ('" + v.name +
                                  "') has a 'prototype_uncertainty' but no 'prototype'"));
  if (v.model_uncertainty && !v.model)
    throw input_error(with_prefix(out.at(v.model_uncertainty->where) + label + " ('" + v.name +
                                  "') has a 'model_uncertainty' but no 'model'"));
  if (const file_variable* before = out.find(v.name))
    c.fail(t.source(), label + ": the name '" + v.name + "' is already used by the variable at line " +
                           std::to_string(before->where.line));
  out.variables.push_back(std::move(v));
}

}  // namespace

const file_variable* problem_file::find(std::string_view name) const {
  for (const auto& v : variables)
    if (v.name == name) return &v;
  return nullptr;
}

std::string problem_file::at(const file_position& p) const {
  if (p.line == 0) return path + ": ";
  return path + ":" + std::to_string(p.line) + ": ";
}

namespace {

/// Characters that show nothing or move the text (Unicode general category Cf, the
/// separators Zl and Zp and the spaces Zs beyond ASCII, the C1 controls): a name holding
/// one looks like another name, or like nothing (Unicode Standard, ch. 23, "Format characters";
/// the ranges are those of UnicodeData.txt for Cf, from memory).
bool invisible(char32_t cp) noexcept {
  constexpr std::pair<char32_t, char32_t> ranges[] = {
      {0x0080, 0x00A0},   {0x00AD, 0x00AD},   {0x0600, 0x0605},   {0x061C, 0x061C},   {0x06DD, 0x06DD},
      {0x070F, 0x070F},   {0x08E2, 0x08E2},   {0x1680, 0x1680},   {0x180E, 0x180E},   {0x2000, 0x200F},
      {0x2028, 0x202F},   {0x205F, 0x2064},   {0x2066, 0x206F},   {0x3000, 0x3000},   {0xFEFF, 0xFEFF},
      {0xFFF9, 0xFFFB},   {0x110BD, 0x110BD}, {0x110CD, 0x110CD}, {0x13430, 0x1343F}, {0x1BCA0, 0x1BCA3},
      {0x1D173, 0x1D17A}, {0xE0001, 0xE0001}, {0xE0020, 0xE007F},
  };
  for (const auto& [lo, hi] : ranges)
    if (cp >= lo && cp <= hi) return true;
  return false;
}

/// Signs of operations in formulas (ISO 80000-2): a name holding one reads as a formula in
/// the groups printed (`a*b`, `T-inf`).
bool operator_sign(char32_t cp) noexcept {
  switch (cp) {
    case '+':
    case '-':
    case '*':
    case '/':
    case '^':
    case '(':
    case ')':
    case '[':
    case ']':
    case '{':
    case '}':
    case 0x00B7:
    case 0x00D7:
    case 0x00F7:
    case 0x2212:
    case 0x2215:
    case 0x22C5:
    case 0x2044:
      return true;
    default:
      return false;
  }
}

std::string hex_code_point(char32_t cp) {
  char buffer[16];
  std::snprintf(buffer, sizeof buffer, "U+%04X", static_cast<unsigned>(cp));
  return buffer;
}

}  // namespace

std::optional<std::string> bad_variable_name(std::string_view name) {
  if (name.empty()) return "a variable name must not be empty";
  for (const char ch : name) {
    const auto u = static_cast<unsigned char>(ch);
    if (u < 0x20U || u == 0x7FU || ch == ' ')
      return "the variable name '" + std::string(name) + "' has white space or a control character";
    if (ch == '=' || ch == ',')
      return "the variable name '" + std::string(name) + "' has a '" + std::string(1, ch) +
             "' (names may not contain '=' or ',')";
  }
  if (const std::size_t bad = detail::first_invalid_utf8(name); bad != name.size())
    return "the variable name is not valid UTF-8 (byte " + std::to_string(bad + 1) + ")";
  for (std::size_t i = 0; i < name.size();) {
    const std::size_t n = detail::utf8_length(name, i);
    const char32_t cp = detail::utf8_decode(name, i, n);
    if (invisible(cp)) {
      std::string shown(name.substr(0, i));
      shown += "<" + hex_code_point(cp) + ">";
      shown += name.substr(i + n);
      return "the variable name '" + shown + "' has the invisible character " + hex_code_point(cp) +
             " (a format character or space that shows nothing): retype the name";
    }
    if (operator_sign(cp)) {
      std::string joined(name.substr(0, i));  // the sign as an underscore: `a*b` -> `a_b`
      joined += '_';
      joined += name.substr(i + n);
      return "the variable name '" + std::string(name) + "' has '" + std::string(name.substr(i, n)) +
             "', a sign of operation, and would read as a formula in the groups: a name is one symbol "
             "(write, for example, " +
             joined + ")";
    }
    i += n;
  }
  return std::nullopt;
}

problem_file parse_problem_text(std::string_view text, const std::string& path) {
  problem_file out;
  out.path = path;
  if (const auto f = stand_in_fault(text))
    throw input_error(
        with_prefix(out.at({f->line, f->column}) + "column " + std::to_string(f->column) + ": " + f->what));
  toml::table root;
  try {
    root = toml::parse(to_reader(text), path);
  } catch (const toml::parse_error& e) {
    throw input_error(with_prefix(out.at(position_of(e.source())) + "not valid TOML: " + from_reader(e.description())));
  }
  const checker c(text, out);
  const toml::array* variables = nullptr;
  for (auto&& [key, node] : root) {
    const std::string k = from_reader(key.str());
    if (k == "title") {
      out.title = c.string_value(node, "'title'");
    } else if (k == "dependent") {
      out.dependent = c.string_value(node, "'dependent'");
      out.dependent_where = position_of(node.source());
    } else if (k == "repeating") {
      const toml::array* a = node.as_array();
      if (a == nullptr)
        c.fail(node.source(), "'repeating' must be an array of names, not " + std::string(type_name(node)));
      out.repeating_where = position_of(node.source());
      for (const toml::node& e : *a) out.repeating.push_back(c.string_value(e, "each name in 'repeating'"));
    } else if (k == "configuration") {
      out.configuration = c.string_value(node, "'configuration'");
      out.configuration_where = position_of(node.source());
      if (!is_regime_configuration(out.configuration))
        c.fail(node.source(),
               "'configuration': '" + out.configuration +
                   "' is not a configuration of the regime table (accepted: " + regime_configuration_list() + ")");
    } else if (k == "variable") {
      variables = node.as_array();
      if (variables == nullptr)
        c.fail(node.source(),
               "'variable' must be an array of tables ([[variable]]), not " + std::string(type_name(node)));
    } else {
      c.fail(key.source(),
             "unknown key '" + std::string(k) +
                 "' (a problem file takes title, dependent, repeating, configuration and [[variable]] tables)");
    }
  }
  if (variables == nullptr || variables->empty())
    throw input_error(with_prefix(out.at({}) + "no [[variable]] tables: a problem needs at least one variable"));
  std::size_t index = 0;
  for (const toml::node& e : *variables) {
    ++index;
    const toml::table* t = e.as_table();
    if (t == nullptr)
      c.fail(e.source(), "variable " + std::to_string(index) + " must be a table, not " + std::string(type_name(e)));
    read_variable(c, *t, index, out);
  }
  return out;
}

problem_file load_problem_file(const std::string& path) {
  std::error_code ec;
  if (std::filesystem::is_directory(path, ec))
    throw input_error(with_prefix("cannot read the problem file '" + path + "': it is a directory"));
  std::ifstream in(path, std::ios::binary);
  if (!in) throw input_error(with_prefix("cannot read the problem file '" + path + "': " + std::strerror(errno)));
  // read at most one byte past the limit: a device such as /dev/zero must not fill memory
  std::string text;
  char chunk[65536];
  while (in && text.size() <= max_problem_file_bytes) {
    in.read(chunk, sizeof chunk);
    text.append(chunk, static_cast<std::size_t>(in.gcount()));
  }
  if (in.bad()) throw input_error(with_prefix("cannot read the problem file '" + path + "'"));
  if (text.size() > max_problem_file_bytes)
    throw input_error(with_prefix("the problem file '" + path + "' is larger than " +
                                  std::to_string(max_problem_file_bytes) + " bytes"));
  return parse_problem_text(text, path);
}

}  // namespace nondim::tool
