#pragma once
/// \file unit_parser.hpp
/// \brief The unit-expression parser: one pass, left to right, over a text already checked
/// to be UTF-8 and short enough. Recursion only for parentheses, bounded by
/// `max_unit_nesting`; no allocation unless an error is being reported.

#include <array>
#include <cfloat>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <limits>
#include <string>
#include <string_view>
#include <vector>

#include "../../core/dimension.hpp"
#include "../../core/rational.hpp"
#include "../../units/table.hpp"
#include "../errors.hpp"
#include "suggest.hpp"
#include "text.hpp"

namespace nondim {

/// \brief A unit read from text: SI value = `factor * x + offset`, of dimension `dim`.
///
/// `offset` is non-zero only for `degC` and `degF` standing alone (absolute temperatures).
struct parsed_unit {
  double factor = 1.0;
  double offset = 0.0;
  dimension dim{};

  friend bool operator==(const parsed_unit&, const parsed_unit&) = default;
};

/// \brief Longest text `parse_unit` and `parse_quantity` accept, in bytes.
inline constexpr std::size_t max_unit_text_bytes = 4096;
/// \brief Deepest nesting of parentheses in a unit expression.
inline constexpr std::size_t max_unit_nesting = 32;

namespace detail {

/// A factor or group being read: exponents, a power of ten kept apart (so prefixed metric
/// units stay exact: cm^3 is exactly 1e-6) and the rest of the factor to SI.
struct unit_value {
  std::array<rational, base_dimension_count> exps{};
  std::int64_t decade = 0;
  double scale = 1.0;
};

[[noreturn]] inline void exponent_overflows() {
  throw rational_overflow("nondim: exponent overflows 64 bits");
}

// Exponent arithmetic with an integer fast path. INT64_MIN is refused as well, so every
// exponent can be negated (printing a denominator needs that).
inline rational exponent_product(const rational& a, const rational& b) {
  if (a.den == 1 && b.den == 1) {
    std::int64_t r = 0;
    if (__builtin_mul_overflow(a.num, b.num, &r) || r == std::numeric_limits<std::int64_t>::min()) exponent_overflows();
    return rational{r};
  }
  const rational r = a * b;
  if (r.num == std::numeric_limits<std::int64_t>::min()) exponent_overflows();
  return r;
}
inline rational exponent_sum(const rational& a, const rational& b, bool subtract) {
  if (a.den == 1 && b.den == 1) {
    std::int64_t r = 0;
    const bool over = subtract ? __builtin_sub_overflow(a.num, b.num, &r) : __builtin_add_overflow(a.num, b.num, &r);
    if (over || r == std::numeric_limits<std::int64_t>::min()) exponent_overflows();
    return rational{r};
  }
  const rational r = subtract ? a - b : a + b;
  if (r.num == std::numeric_limits<std::int64_t>::min()) exponent_overflows();
  return r;
}

/// Powers of ten beyond this, at any step of a product, leave the range of a double.
inline constexpr std::int64_t widest_decade = 308;

/// s^p for a positive factor s.
inline double raise(double s, const rational& p) {
  if (s == 1.0) return 1.0;
  if (p.den != 1) return std::pow(s, p.to_double());
  switch (p.num) {
    case 0:
      return 1.0;
    case 1:
      return s;
    case 2:
      return s * s;
    case 3:
      return s * s * s;
    case -1:
      return 1.0 / s;
    case -2:
      return 1.0 / (s * s);
    case -3:
      return 1.0 / (s * s * s);
    default:
      return std::pow(s, static_cast<double>(p.num));
  }
}

/// A factor to SI that a double holds without loss of range.
inline bool usable_factor(double f) noexcept {
  return std::isfinite(f) && f >= DBL_MIN;
}

/// Text of an expression for a message: shown when short and printable.
inline std::string describe_text(std::string_view text) {
  if (text.size() > 80) return "the unit expression";
  for (const char c : text)
    if (static_cast<unsigned char>(c) < 0x20U || c == 0x7F) return "the unit expression";
  std::string quoted(1, '`');  // appended, not operator+: GCC 12 -Wrestrict false positive
  quoted.append(text);
  quoted.push_back('`');
  return quoted;
}

inline std::string trimmed(std::string_view t) {
  while (!t.empty() && (t.back() == ' ' || t.back() == '\t')) t.remove_suffix(1);
  return std::string(t);
}

/// A unit of plane angle: the radian and the units defined from it (degree, revolution).
inline bool is_plane_angle(const unit_entry& e) noexcept {
  return e.symbol == "rad" || e.symbol == "deg" || e.symbol == "rev";
}

class unit_parser {
 public:
  /// Parse bytes [begin, end) of `text`; columns in errors count from the start of `text`.
  unit_parser(std::string_view text, std::size_t begin, std::size_t end) noexcept
      : text_(text), begin_(begin), pos_(begin), end_(end), fault_(begin) {}

  /// Whether a symbol of plane angle (`rad`, `deg`, `rev`) was read.
  [[nodiscard]] bool plane_angle_seen() const noexcept { return plane_angle_; }

  parsed_unit parse() {
    unit_value acc;
    try {
      parse_group(acc, 0, 0);
    } catch (const rational_overflow&) {
      fail(unit_error_kind::exponent_overflow, fault_,
           "the exponents overflow the 64-bit rational arithmetic (numerators and denominators up to 2^63 - 1)");
    }
    if (at(pos_).cls == char_class::close) fail(unit_error_kind::unbalanced_parenthesis, pos_, "unmatched `)`");
    return finish(acc);
  }

 private:
  std::string_view text_;
  std::size_t begin_;
  std::size_t pos_;
  std::size_t end_;
  std::size_t fault_;  // where an overflow inside rational arithmetic is reported
  bool plane_angle_ = false;

  [[nodiscard]] char_info at(std::size_t i) const noexcept { return classify_at(text_, i, end_); }
  [[nodiscard]] std::string_view span(std::size_t b, std::size_t e) const noexcept { return text_.substr(b, e - b); }
  static constexpr bool starts_factor(char_class c) noexcept {
    return c == char_class::letter || c == char_class::digit || c == char_class::open;
  }
  [[nodiscard]] bool double_star(std::size_t i) const noexcept {
    return i + 1 < end_ && text_[i] == '*' && text_[i + 1] == '*';
  }

  bool skip_spaces() noexcept {
    bool any = false;
    for (char_info c = at(pos_); c.cls == char_class::space; c = at(pos_)) {
      pos_ += c.len;
      any = true;
    }
    return any;
  }

  [[noreturn]] void fail(unit_error_kind kind, std::size_t byte, const std::string& what) const {
    const std::size_t column = column_of(text_, byte);
    throw unit_error(kind, column,
                     "nondim: in " + describe_text(text_) + ", column " + std::to_string(column) + ": " + what);
  }

  /// The token at byte i, for messages: a symbol or number, or one character.
  [[nodiscard]] std::string_view token_at(std::size_t i) const noexcept {
    const char_info c = at(i);
    if (c.cls == char_class::end) return {};
    std::size_t e = i + c.len;
    if (c.cls == char_class::letter || c.cls == char_class::digit)
      for (char_info d = at(e); d.cls == char_class::letter || d.cls == char_class::digit; d = at(e)) e += d.len;
    return span(i, e);
  }

  [[noreturn]] void unexpected(std::size_t i) const {
    const std::string_view t = token_at(i);
    std::string why;
    if (t == "-" || t == "\u2212") {
      why = "`-` is not a unit operator (a negative power is written `s^-1`)";
    } else if (t == "+") {
      why = "`+` is not a unit operator (units do not add)";
    } else if (t == "." || t == ",") {
      why = quote_token(t) + " is not a product sign: write `*`, `\u00b7` or a space";
    } else if (t == "\u00d7") {
      why = "`\u00d7` multiplies numbers, not units: write `*` or `\u00b7`";
    } else if (at(i).cls == char_class::superscript) {
      why = "a superscript power must follow its unit or `)` directly";
    } else {
      why = "unexpected character " + quote_token(t);
    }
    fail(unit_error_kind::unexpected_character, i, why);
  }

  /// A group starts with something that is not a factor.
  [[noreturn]] void bad_start(std::size_t depth, std::size_t open) const {
    const char_info c = at(pos_);
    switch (c.cls) {
      case char_class::end:
        if (depth == 0)
          fail(unit_error_kind::empty_expression, pos_, "empty unit expression (a dimensionless unit is written `1`)");
        fail(unit_error_kind::unbalanced_parenthesis, open, "`(` is never closed");
      case char_class::close:
        if (depth == 0) fail(unit_error_kind::unbalanced_parenthesis, pos_, "unmatched `)`");
        fail(unit_error_kind::empty_factor, open, "empty parentheses `()`");
      case char_class::solidus:
        fail(unit_error_kind::empty_factor, pos_, "`/` has no numerator (a reciprocal is written `1/s`)");
      case char_class::times:
      case char_class::caret:
        fail(unit_error_kind::empty_factor, pos_, quote_token(span(pos_, pos_ + c.len)) + " has no left operand");
      case char_class::superscript:
        fail(unit_error_kind::empty_factor, pos_, "a superscript power has no unit before it");
      default:
        unexpected(pos_);
    }
  }

  /// After a binary operator at `op`: the next thing must start a factor.
  void expect_operand(std::size_t op, std::size_t op_len) {
    skip_spaces();
    const char_info c = at(pos_);
    if (starts_factor(c.cls)) return;
    const std::string op_text = quote_token(span(op, op + op_len));
    if (c.cls == char_class::end || c.cls == char_class::close)
      fail(unit_error_kind::dangling_operator, op, op_text + " has nothing after it");
    if (c.cls == char_class::times || c.cls == char_class::solidus || c.cls == char_class::caret ||
        c.cls == char_class::superscript)
      fail(unit_error_kind::empty_factor, pos_,
           "empty factor between " + op_text + " and " + quote_token(span(pos_, pos_ + c.len)));
    unexpected(pos_);
  }

  /// A group: factors joined by products, at most one solidus (ISO 80000-1), up to the
  /// end of the range or a `)` (left for the caller). `open` is where its `(` is.
  void parse_group(unit_value& acc, std::size_t depth, std::size_t open) {
    skip_spaces();
    const std::size_t group_begin = pos_;
    if (!starts_factor(at(pos_).cls)) bad_start(depth, open);
    bool denominator = false;
    std::size_t slash = 0;
    for (;;) {
      const std::size_t factor_begin = pos_;
      unit_value f;
      parse_factor(f, depth);
      const std::size_t factor_end = pos_;
      combine(acc, f, denominator, factor_begin);
      const bool spaced = skip_spaces();
      const char_info c = at(pos_);
      switch (c.cls) {
        case char_class::end:
        case char_class::close:
          return;
        case char_class::times: {
          if (denominator) ambiguous_solidus(group_begin, slash, factor_begin, factor_end, depth);
          const std::size_t op = pos_;
          pos_ += c.len;
          expect_operand(op, c.len);
          continue;
        }
        case char_class::solidus:
          if (denominator) ambiguous_solidus(group_begin, slash, factor_begin, factor_end, depth);
          denominator = true;
          slash = pos_;
          pos_ += c.len;
          expect_operand(slash, c.len);
          continue;
        case char_class::letter:
        case char_class::digit:
        case char_class::open:
          if (!spaced)
            fail(unit_error_kind::unexpected_character, pos_,
                 "missing operator between " + quote_token(span(factor_begin, factor_end)) + " and " +
                     quote_token(token_at(pos_)) + ": write `*`, `\u00b7` or a space");
          if (denominator) ambiguous_solidus(group_begin, slash, factor_begin, factor_end, depth);
          continue;  // a space is a product
        default:
          unexpected(pos_);
      }
    }
  }

  void parse_factor(unit_value& f, std::size_t depth) {
    const std::size_t factor_begin = pos_;
    const char_info c = at(pos_);
    if (c.cls == char_class::letter) {
      parse_symbol(f);
    } else if (c.cls == char_class::digit) {
      parse_number(f);
    } else {  // '(' (callers checked)
      if (depth + 1 > max_unit_nesting)
        fail(unit_error_kind::too_deep, pos_,
             "parentheses nested deeper than " + std::to_string(max_unit_nesting) + " levels");
      const std::size_t open = pos_;
      ++pos_;
      parse_group(f, depth + 1, open);
      if (at(pos_).cls != char_class::close) fail(unit_error_kind::unbalanced_parenthesis, open, "`(` is never closed");
      ++pos_;
    }
    parse_power(f, factor_begin);
  }

  /// End of the run of symbol characters from byte `i`.
  [[nodiscard]] std::size_t symbol_end(std::size_t i) const noexcept {
    for (char_info c = at(i); c.cls == char_class::letter || c.cls == char_class::digit; c = at(i)) i += c.len;
    return i;
  }

  void parse_symbol(unit_value& f) {
    const std::size_t b = pos_;
    pos_ = symbol_end(pos_);
    std::string_view symbol = span(b, pos_);
    // a symbol written with a solidus in the table (`r/min`) is one symbol; a power after
    // it would be read as (r/min)^n by some and r/min^n by others, so it is refused
    if (at(pos_).cls == char_class::solidus && at(pos_ + 1).cls == char_class::letter) {
      const std::size_t e = symbol_end(pos_ + 1);
      if (find_unit_entry(span(b, e)) != nullptr) {
        symbol = span(b, e);
        pos_ = e;
        std::size_t k = pos_;
        while (at(k).cls == char_class::space) k += at(k).len;
        if (at(k).cls == char_class::caret || at(k).cls == char_class::superscript || double_star(k))
          fail(unit_error_kind::bad_exponent, k,
               "a power after " + quote_token(symbol) + " is ambiguous: bracket it, as in `(" + std::string(symbol) +
                   ")^2`");
      }
    }
    // `deg C` reads as degree times coulomb, `deg F` as degree times farad: never meant
    if (symbol == "deg" || symbol == "\u00b0") {
      std::size_t k = pos_;
      while (at(k).cls == char_class::space) k += at(k).len;
      if (k > pos_ && (text_.substr(k, 1) == "C" || text_.substr(k, 1) == "F") && symbol_end(k) == k + 1)
        fail(unit_error_kind::unknown_symbol, b,
             "`" + std::string(symbol) + " " + std::string(text_.substr(k, 1)) +
                 "` is not a temperature unit (it reads as an angle times a " +
                 (text_[k] == 'C' ? "coulomb" : "farad") + "); write `deg" + std::string(text_.substr(k, 1)) +
                 "` without the space");
    }
    const auto r = resolve_unit_symbol(symbol);
    if (!r)
      fail(unit_error_kind::unknown_symbol, b,
           "unknown unit symbol " + quote_token(symbol) + unknown_symbol_hint(symbol));
    const unit_entry& e = *r->entry;
    if (is_plane_angle(e)) plane_angle_ = true;
    f.exps = e.dim.exponents;
    const int prefix = r->prefix != nullptr ? r->prefix->exponent : 0;
    if (e.decade != no_decade) {
      f.decade = e.decade + prefix;
    } else {
      f.decade = prefix;
      f.scale = e.factor;
    }
  }

  /// Only the number 1 stands as a factor (`1/s`); any other number is refused.
  void parse_number(unit_value&) {
    const std::size_t b = pos_;
    const auto digits = [this] {
      while (at(pos_).cls == char_class::digit) ++pos_;
    };
    digits();
    if (at(pos_).cls == char_class::dot && at(pos_ + 1).cls == char_class::digit) {
      ++pos_;
      digits();
    }
    if (pos_ < end_ && (text_[pos_] == 'e' || text_[pos_] == 'E')) {
      std::size_t k = pos_ + 1;
      if (at(k).cls == char_class::minus || at(k).cls == char_class::plus) k += at(k).len;
      if (at(k).cls == char_class::digit) {
        pos_ = k;
        digits();
      }
    }
    const std::string_view number = span(b, pos_);
    if (number == "1") return;
    std::string why = "a number is not a unit: " + quote_token(number) +
                      "; a unit expression holds units only (the value is given apart from it) and scales are written "
                      "as SI prefixes (`km`, `mPa`)";
    std::size_t k = b;  // "m^2/3": a fraction meant as the power
    while (k > begin_ && (text_[k - 1] == ' ' || text_[k - 1] == '\t')) --k;
    if (k > begin_ && text_[k - 1] == '/' && k >= begin_ + 2 && text_[k - 2] >= '0' && text_[k - 2] <= '9')
      why += "; a fractional power is written `^(p/q)`";
    fail(unit_error_kind::number_factor, b, why);
  }

  /// `^e`, `**e` or superscripts after a factor; a second power is refused.
  void parse_power(unit_value& f, std::size_t factor_begin) {
    const std::size_t save = pos_;
    std::size_t op = pos_;
    rational p{1};
    if (at(pos_).cls == char_class::superscript) {
      p = read_superscripts();
    } else {
      skip_spaces();
      op = pos_;
      if (at(pos_).cls == char_class::caret) {
        pos_ += 1;
      } else if (double_star(pos_)) {
        pos_ += 2;
      } else {
        pos_ = save;
        return;
      }
      skip_spaces();
      p = read_exponent(op);
    }
    const std::size_t after = pos_;
    const bool superscript_next = at(pos_).cls == char_class::superscript;
    skip_spaces();
    if (superscript_next || at(pos_).cls == char_class::caret || double_star(pos_))
      fail(unit_error_kind::bad_exponent, superscript_next ? after : pos_,
           "a power cannot follow a power: bracket the first, as in `(" + std::string(span(factor_begin, after)) +
               ")^n`");
    pos_ = after;
    apply_power(f, p, op);
  }

  rational read_superscripts() {
    const std::size_t b = pos_;
    bool negative = false;
    const char_info s = at(pos_);
    if (s.value < 0) {
      negative = s.value == -1;
      pos_ += s.len;
    }
    std::int64_t n = 0;
    bool any = false;
    for (char_info c = at(pos_); c.cls == char_class::superscript && c.value >= 0; c = at(pos_)) {
      if (__builtin_mul_overflow(n, 10, &n) || __builtin_add_overflow(n, c.value, &n))
        fail(unit_error_kind::exponent_overflow, b, "the superscript exponent does not fit 64 bits");
      any = true;
      pos_ += c.len;
    }
    if (!any) fail(unit_error_kind::bad_exponent, b, "a superscript sign with no superscript digit after it");
    return rational{negative ? -n : n};
  }

  /// After `^` or `**` at `op`: an integer, a decimal, or `(p/q)`, each signed.
  rational read_exponent(std::size_t op) {
    const char_info c = at(pos_);
    const std::string_view op_text = span(op, op + (text_[op] == '^' ? 1 : 2));
    if (c.cls == char_class::end || c.cls == char_class::close)
      fail(unit_error_kind::dangling_operator, op, quote_token(op_text) + " has no exponent after it");
    if (c.cls != char_class::open) return read_decimal(op_text);
    const std::size_t open = pos_;
    ++pos_;
    skip_spaces();
    const rational num = read_decimal(op_text);
    skip_spaces();
    rational den{1};
    if (at(pos_).cls == char_class::solidus) {
      ++pos_;
      skip_spaces();
      const std::size_t den_begin = pos_;
      den = read_decimal(op_text);
      if (den.is_zero()) {
        std::size_t e = pos_;
        while (at(e).cls != char_class::end && at(e).cls != char_class::close) e += at(e).len;
        if (at(e).cls == char_class::close) ++e;
        fail(unit_error_kind::zero_denominator, den_begin,
             "zero denominator in the exponent " + quote_token(span(open, e)));
      }
      skip_spaces();
    }
    const char_info d = at(pos_);
    if (d.cls == char_class::end)
      fail(unit_error_kind::unbalanced_parenthesis, open, "`(` of the exponent is never closed");
    if (d.cls != char_class::close)
      fail(unit_error_kind::bad_exponent, pos_,
           "expected `)` to close the exponent, found " + quote_token(token_at(pos_)));
    ++pos_;
    fault_ = op;
    return num / den;
  }

  /// A signed integer or exact decimal: `-2`, `0.5` (1/2), `0.333` (333/1000).
  rational read_decimal(std::string_view op_text) {
    const std::size_t b = pos_;
    bool negative = false;
    if (const char_info s = at(pos_); s.cls == char_class::minus || s.cls == char_class::plus) {
      negative = s.cls == char_class::minus;
      pos_ += s.len;
    }
    if (at(pos_).cls != char_class::digit) {
      if (at(pos_).cls == char_class::end)
        fail(unit_error_kind::dangling_operator, b, quote_token(op_text) + " has an unfinished exponent");
      fail(unit_error_kind::bad_exponent, pos_,
           "expected an exponent after " + quote_token(op_text) +
               " (an integer, a decimal such as `0.5`, or `(1/2)`), found " + quote_token(token_at(pos_)));
    }
    std::int64_t num = 0;
    std::int64_t den = 1;
    const auto too_long = [&] {
      std::size_t e = pos_;
      while (at(e).cls == char_class::digit || at(e).cls == char_class::dot) ++e;
      fail(unit_error_kind::exponent_overflow, b,
           "the exponent " + quote_token(span(b, e)) + " does not fit a 64-bit rational");
    };
    for (; at(pos_).cls == char_class::digit; ++pos_)
      if (__builtin_mul_overflow(num, 10, &num) || __builtin_add_overflow(num, text_[pos_] - '0', &num)) too_long();
    if (at(pos_).cls == char_class::dot) {
      if (at(pos_ + 1).cls != char_class::digit)
        fail(unit_error_kind::bad_exponent, pos_, "a decimal exponent needs a digit after `.`");
      ++pos_;
      const std::size_t frac_begin = pos_;
      while (at(pos_).cls == char_class::digit) ++pos_;
      std::size_t frac_end = pos_;
      while (frac_end > frac_begin && text_[frac_end - 1] == '0') --frac_end;  // 0.50 is 1/2
      for (std::size_t k = frac_begin; k < frac_end; ++k)
        if (__builtin_mul_overflow(num, 10, &num) || __builtin_add_overflow(num, text_[k] - '0', &num) ||
            __builtin_mul_overflow(den, 10, &den))
          too_long();
    }
    return rational{negative ? -num : num, den};
  }

  void apply_power(unit_value& f, const rational& p, std::size_t op) {
    if (p == rational{1}) return;
    fault_ = op;
    for (auto& e : f.exps)
      if (!e.is_zero()) e = exponent_product(e, p);
    double scale = raise(f.scale, p);
    if (f.decade != 0) {
      const rational d = exponent_product(rational{f.decade}, p);
      if (d.is_integer()) {
        f.decade = d.num;
      } else {  // (mm)^(1/2): the power of ten leaves the exact part
        scale *= std::pow(10.0, d.to_double());
        f.decade = 0;
      }
    }
    if (!usable_factor(scale) || f.decade > widest_decade || f.decade < -widest_decade)
      fail(unit_error_kind::factor_out_of_range, op, "the factor to SI of this power is out of the range of a double");
    f.scale = scale;
  }

  void combine(unit_value& acc, const unit_value& f, bool divide, std::size_t at_byte) {
    fault_ = at_byte;
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      if (!f.exps[i].is_zero()) acc.exps[i] = exponent_sum(acc.exps[i], f.exps[i], divide);
    if (f.decade != 0) {
      acc.decade = exponent_sum(rational{acc.decade}, rational{f.decade}, divide).num;
      if (acc.decade > widest_decade || acc.decade < -widest_decade)
        fail(unit_error_kind::factor_out_of_range, at_byte,
             "the factor to SI of the expression up to here is out of the range of a double");
    }
    if (f.scale != 1.0) {
      acc.scale = divide ? acc.scale / f.scale : acc.scale * f.scale;
      if (!usable_factor(acc.scale))
        fail(unit_error_kind::factor_out_of_range, at_byte,
             "the factor to SI of the expression up to here is out of the range of a double");
    }
  }

  parsed_unit finish(const unit_value& acc) const {
    std::int64_t d = acc.decade;
    double f = acc.scale;
    if (d > widest_decade || d < -widest_decade)
      fail(unit_error_kind::factor_out_of_range, begin_, "the factor to SI is out of the range of a double");
    for (; d > pow10_max; d -= pow10_max) f *= pow10(pow10_max);
    for (; d < pow10_min; d -= pow10_min) f *= pow10(pow10_min);
    f *= pow10(static_cast<int>(d));
    if (!usable_factor(f))
      fail(unit_error_kind::factor_out_of_range, begin_, "the factor to SI is out of the range of a double");
    return parsed_unit{f, 0.0, dimension{acc.exps}};
  }

  /// `kg/m/s`, `J/kg*K`: say what to write instead, bracketing everything after the solidus.
  [[noreturn]] void ambiguous_solidus(std::size_t group_begin, std::size_t slash, std::size_t den_begin,
                                      std::size_t den_end, std::size_t depth) {
    const std::size_t op = pos_;
    const char_info oc = at(op);
    std::string what = oc.cls == char_class::solidus ? "a second solidus `/`"
                       : oc.cls == char_class::times ? quote_token(span(op, op + oc.len)) + " after a solidus"
                                                     : "a product after a solidus";
    std::vector<std::string_view> parts{span(den_begin, den_end)};
    bool complete = true;
    try {
      for (;;) {
        char_info c = at(pos_);
        if (c.cls == char_class::times || c.cls == char_class::solidus) {
          pos_ += c.len;
          skip_spaces();
        }
        const std::size_t b = pos_;
        if (!starts_factor(at(pos_).cls)) {
          complete = false;
          break;
        }
        unit_value scratch;
        parse_factor(scratch, depth);
        parts.push_back(span(b, pos_));
        const bool spaced = skip_spaces();
        c = at(pos_);
        if (c.cls == char_class::end || c.cls == char_class::close) break;
        if (c.cls == char_class::times || c.cls == char_class::solidus || (spaced && starts_factor(c.cls))) continue;
        complete = false;
        break;
      }
    } catch (const std::exception&) {
      complete = false;
    }
    const std::string numerator = trimmed(span(group_begin, slash));
    std::string denominator;
    for (const auto& p : parts) {
      if (!denominator.empty()) denominator.push_back('*');
      denominator.append(p);
    }
    // appended piece by piece, not operator+: GCC 12 -Wrestrict false positive at -O3
    what.append(" is ambiguous (SI Brochure 9th ed., 5.4.6; ISO 80000-1): ");
    what.append(complete ? "write `" : "bracket the whole denominator, as in `");
    what.append(numerator);
    what.append("/(");
    if (complete) {
      what.append(denominator);
      what.append(")`");
    } else {
      what.append(parts[0]);
      what.append("*...)`");
    }
    fail(unit_error_kind::ambiguous_solidus, op, what);
  }
};

/// Length and encoding checks shared by every entry point.
inline void check_unit_text(std::string_view text) {
  if (text.size() > max_unit_text_bytes) {
    const std::size_t column = column_of(text, max_unit_text_bytes);
    throw unit_error(unit_error_kind::too_long, column,
                     "nondim: the text is longer than " + std::to_string(max_unit_text_bytes) + " bytes (column " +
                         std::to_string(column) + " is past the limit)");
  }
  const std::size_t bad = first_invalid_utf8(text);
  if (bad != text.size()) {
    static constexpr std::string_view hex = "0123456789ABCDEF";
    const unsigned b = byte_at(text, bad);
    const std::size_t column = column_of(text, bad);
    throw unit_error(
        unit_error_kind::invalid_utf8, column,
        "nondim: invalid UTF-8 at column " + std::to_string(column) + " (byte 0x" + hex[b >> 4U] + hex[b & 0xFU] + ")");
  }
}

/// Parse bytes [b, e) of a checked text. A lone affine symbol (degC, °C, degF ...) keeps its
/// offset; any other expression is linear.
inline parsed_unit parse_unit_range(std::string_view text, std::size_t b, std::size_t e) {
  while (b < e && classify_at(text, b, e).cls == char_class::space) b += classify_at(text, b, e).len;
  std::size_t t = e;  // trailing spaces, one code point at a time
  while (t > b) {
    std::size_t k = t - 1;
    while (k > b && (byte_at(text, k) & 0xC0U) == 0x80U) --k;
    if (classify_at(text, k, t).cls != char_class::space) break;
    t = k;
  }
  if (const unit_entry* u = find_unit_entry(text.substr(b, t - b)); u != nullptr && t > b)
    return parsed_unit{u->factor, u->offset, u->dim};
  return unit_parser(text, b, e).parse();
}

}  // namespace detail

/// \brief Read a unit expression: `W/(m^2*K)`, `Btu/(lb*degF)`, `kg·m⁻¹·s⁻¹`, `MPa*m^0.5`.
///
/// SI value = `factor * x + offset`. Grammar, symbol resolution and limits: see
/// `parse.hpp`. Time is linear in the length of the text.
/// \throws unit_error with the column of the fault (see `unit_error_kind`).
inline parsed_unit parse_unit(std::string_view text) {
  detail::check_unit_text(text);
  return detail::parse_unit_range(text, 0, text.size());
}

/// \brief Whether the unit expression `text` has a symbol of plane angle (`rad`, `deg`,
/// `°`, `rev`) among its factors: `rad/s` and `rev/min` do, `rpm`, `Hz` and `1/s` do not.
/// \throws unit_error as `parse_unit`.
inline bool mentions_plane_angle(std::string_view text) {
  detail::check_unit_text(text);
  std::size_t b = 0;
  std::size_t t = text.size();
  while (b < t && (text[b] == ' ' || text[b] == '\t')) ++b;
  while (t > b && (text[t - 1] == ' ' || text[t - 1] == '\t')) --t;
  if (const unit_entry* u = find_unit_entry(text.substr(b, t - b)); u != nullptr && t > b)
    return detail::is_plane_angle(*u);
  detail::unit_parser p(text, 0, text.size());
  (void)p.parse();
  return p.plane_angle_seen();
}

}  // namespace nondim
