#pragma once
// Definitions of latex.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <array>
#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <string_view>
#include "../../analysis.hpp"
#include "../extraction/explain.hpp"
#include "detail/named_relation.hpp"
#include "detail/names.hpp"
#include "detail/values.hpp"
#include "latex.hpp"
#include "options.hpp"

namespace nondim {

namespace detail {

/// Greek spellings whose LaTeX macro is the spelling itself (lower case and the upper-case
/// letters that differ from Latin ones); `eps` is the usual short form of \varepsilon.
inline constexpr std::array<std::string_view, 34> latex_greek{
    "alpha", "beta",  "gamma",  "delta", "epsilon", "zeta",  "eta",     "theta", "iota", "kappa", "lambda", "mu",
    "nu",    "xi",    "pi",     "rho",   "sigma",   "tau",   "upsilon", "phi",   "chi",  "psi",   "omega",  "Gamma",
    "Delta", "Theta", "Lambda", "Xi",    "Pi",      "Sigma", "Upsilon", "Phi",   "Psi",  "Omega"};

/// Text set upright in math mode, with the characters LaTeX treats specially escaped.
inline std::string latex_upright(std::string_view s) {
  std::string out;
  for (const char c : s) {
    switch (c) {
      case '#':
      case '$':
      case '%':
      case '&':
      case '_':
      case '{':
      case '}':
        out.push_back('\\');
        out.push_back(c);
        break;
      case '\\':
        out += "\\backslash{}";
        break;
      case '~':
        out += "\\sim{}";
        break;
      case '^':
        out += "\\wedge{}";
        break;
      default:
        out.push_back(c);
    }
  }
  return out;
}

/// The Greek spelling `w` begins with, longest first ("epsilon" before "eps"), or empty.
inline std::string_view leading_greek(std::string_view w) {
  std::string_view best;
  for (const auto g : latex_greek)
    if (w.substr(0, g.size()) == g && g.size() > best.size()) best = g;
  return best;
}

inline bool is_ascii_letter(char c) {
  return (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z');
}

/// A head written as several symbols run together, typeset as separate symbols with a thin
/// space between them and the conventional spellings of the trade (common practice, no
/// source): `UA` upright (an overall conductance), `dT`, `drho`, `dp` as ΔT, Δρ, Δp,
/// `mdot` as ṁ, ² and ³ as powers. `UAdT` -> `\mathrm{UA}\,\Delta T`, `drhod²g` ->
/// `\Delta\rho\,d^{2}\,g`. Empty when the head is not made of such pieces, or none of them
/// is a conventional spelling (`time` stays one upright word, `rho` one letter).
inline std::string latex_compound(std::string_view head) {
  std::string out;
  bool conventional = false;
  std::size_t pieces = 0;
  std::size_t i = 0;
  while (i < head.size()) {
    const std::string_view rest = head.substr(i);
    std::string piece;
    std::size_t used = 0;
    if (rest.substr(0, 2) == "\xc2\xb2" || rest.substr(0, 2) == "\xc2\xb3") {  // ² ³ raise the piece before
      if (pieces == 0) return {};
      out += rest[1] == '\xb2' ? "^{2}" : "^{3}";
      conventional = true;
      i += 2;
      continue;
    }
    if (rest.substr(0, 2) == "UA") {
      piece = "\\mathrm{UA}";
      used = 2;
      conventional = true;
    } else if (rest.substr(0, 4) == "mdot") {
      piece = "\\dot{m}";
      used = 4;
      conventional = true;
    } else if (rest[0] == 'd' && rest.size() > 1 && !leading_greek(rest.substr(1)).empty()) {
      const std::string_view g = leading_greek(rest.substr(1));
      piece = "\\Delta\\" + std::string(g);
      used = 1 + g.size();
      conventional = true;
    } else if (rest[0] == 'd' && rest.size() > 1 &&
               ((rest[1] >= 'A' && rest[1] <= 'Z') ||
                std::string_view("ptxyz").find(rest[1]) != std::string_view::npos)) {
      // dT, dp, dx: a difference; lower-case letters only where Δ is the usual reading (di, do stay)
      piece = "\\Delta " + std::string(1, rest[1]);
      used = 2;
      conventional = true;
    } else if (const std::string_view g = leading_greek(rest); !g.empty()) {
      piece = "\\" + std::string(g);
      used = g.size();
    } else if (is_ascii_letter(rest[0])) {
      piece = std::string(1, rest[0]);
      used = 1;
    } else {
      return {};
    }
    if (pieces > 0) out += "\\,";
    out += piece;
    ++pieces;
    i += used;
  }
  // a run of single Latin letters only where a conventional piece shows the name is a product
  if (!conventional) return {};
  return out;
}

/// One piece of a name: a Greek spelling becomes its macro, one character stays italic,
/// `max` and `min` are the operator names, a longer word is set upright.
inline std::string latex_word(std::string_view w) {
  if (w == "max") return "\\max";
  if (w == "min") return "\\min";
  if (w == "eps") return "\\varepsilon";
  for (const auto g : latex_greek)
    if (w == g) return "\\" + std::string(g);
  if (w.size() == 1 && ((w[0] >= 'a' && w[0] <= 'z') || (w[0] >= 'A' && w[0] <= 'Z'))) return std::string(w);
  if (w.find_first_not_of("0123456789") == std::string_view::npos && !w.empty()) return std::string(w);
  return "\\mathrm{" + latex_upright(w) + "}";
}

/// `x^{e}` for the exponent e (none when e == 1); `{x}` braces keep `\rho_{w}^{2}` legal.
inline std::string latex_power(const std::string& base, const rational& e) {
  if (e == rational{1}) return base;
  // a product or difference written as one name is raised as a whole: (\Delta p)^{2}
  if (base.find("\\,") != std::string::npos || base.find("\\Delta") != std::string::npos)
    return "(" + base + ")^{" + to_string(e) + "}";
  const bool subscripted = base.find('_') != std::string::npos;
  return (subscripted ? "{" + base + "}" : base) + "^{" + to_string(e) + "}";
}

/// A catalog symbol in LaTeX math: `Re` -> `\mathrm{Re}`, `C_D` -> `C_{\mathrm{D}}`
/// (descriptive subscripts upright, ISO 80000-2), `eps/D` -> `\varepsilon/D`.
inline std::string latex_symbol(std::string_view symbol) {
  if (const auto slash = symbol.find('/'); slash != std::string_view::npos)
    return latex_symbol(symbol.substr(0, slash)) + "/" + latex_symbol(symbol.substr(slash + 1));
  const auto underscore = symbol.find('_');
  const std::string_view head = symbol.substr(0, underscore);
  std::string s = head == "eps" || head.size() == 1 ? latex_word(head) : "\\mathrm{" + latex_upright(head) + "}";
  if (underscore != std::string_view::npos) s += "_{\\mathrm{" + latex_upright(symbol.substr(underscore + 1)) + "}}";
  return s;
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string latex_name(std::string_view name) {
  const auto parts = detail::split_name(name);
  if (parts.subscript == "dot" && parts.head.size() == 1) return "\\dot{" + detail::latex_word(parts.head) + "}";
  std::string s = parts.head.size() > 1 ? detail::latex_compound(parts.head) : std::string();
  if (s.empty()) s = detail::latex_word(parts.head);
  if (!parts.subscript.empty()) s += "_{" + detail::latex_word(parts.subscript) + "}";
  return s;
}

namespace detail {

/// "1.5e-7" -> "1.5 \\times 10^{-7}"; "-2300" -> "-2300" (a minus sign in math mode).
inline std::string latex_number(const std::string& text) {
  const auto e = text.find('e');
  if (e == std::string::npos) return text;
  return text.substr(0, e) + " \\times 10^{" + text.substr(e + 1) + "}";
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string latex(const pi_group& g) {
  std::string num;
  std::string den;
  const auto put = [&](std::size_t i) {
    const std::int64_t e = g.exponents[i];
    if (e == 0) return;
    std::string& side = e > 0 ? num : den;
    if (!side.empty()) side += " ";
    side += detail::latex_power(latex_name(g.variables()[i]), rational{e > 0 ? e : -e});
  };
  if (g.non_repeating < g.exponents.size()) put(g.non_repeating);
  for (std::size_t i = 0; i < g.exponents.size() && i < g.variables().size(); ++i)
    if (i != g.non_repeating) put(i);
  if (den.empty()) return num.empty() ? "1" : num;
  return "\\frac{" + (num.empty() ? std::string("1") : num) + "}{" + den + "}";
}

namespace detail {

/// Group `g` in LaTeX as the catalog number it matches first, with its power, or else as
/// its product: the terms of `relation()`.
inline std::string latex_written(const pi_group& g) {
  if (g.matches.empty()) return latex(g);
  return latex_power(latex_symbol(g.matches.front().symbol), g.matches.front().power);
}

/// `relation(a)` in LaTeX: `\mathrm{Nu} = f(\mathrm{Re}, \mathrm{Pr})`; empty when `a`
/// states no relation.
inline std::string latex_relation(const analysis& a) {
  if (relation(a, text_form::ascii).empty()) return {};
  std::string s = latex_written(a.groups.front()) + " = f(";
  for (std::size_t k = 1; k < a.groups.size(); ++k) s += (k > 1 ? ", " : "") + latex_written(a.groups[k]);
  return s + ")";
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string latex_report(const analysis& a, const report_options& o) {
  std::string s;
  if (!o.title.empty()) s += "% " + detail::one_line(o.title) + "\n";
  s += "% dimensionless groups of " + std::to_string(a.variables.size()) + " variables, rank " +
       std::to_string(a.rank) + "; repeating: " + detail::comma_list(a.repeating) +
       (a.repeating_kept ? "" : " (not used by the named basis)") + "\n";
  // why the rank falls short of the base dimensions, as the text report says it: a comment,
  // like the report's other prose, so the equations paste into a document unchanged
  if (a.deficiency.deficient)
    s += "% " + detail::one_line(detail::explain_deficiency(a.rank, a.deficiency, text_form::ascii)) + "\n";
  const std::vector<std::optional<group_value>> values = detail::report_values(a, o);
  for (std::size_t k = 0; k < a.groups.size(); ++k) {
    s += "\\[ \\Pi_{" + std::to_string(k + 1) + "} = " + latex(a.groups[k]);
    // Only the best match goes into the equation: two entries that share a form (Nu and
    // Bi) are not equal to each other, so chaining them would state a falsehood.
    const auto& names = a.groups[k].matches;
    if (!names.empty()) s += " = " + detail::latex_power(detail::latex_symbol(names[0].symbol), names[0].power);
    if (values[k]) {
      const rounded_value r = round_for_report(values[k]->value, values[k]->uncertainty);
      s += " = " + detail::latex_number(r.value_text);
      if (values[k]->uncertainty)
        s += ", \\quad u(\\Pi_{" + std::to_string(k + 1) + "}) = " + detail::latex_number(r.uncertainty_text);
    }
    s += " \\]";
    // without a name, the neutral description of the text report ("ratio of two lengths")
    if (const std::string neutral = detail::neutral_description(a.groups[k], a.variables, text_form::ascii);
        names.empty() && neutral.size() > 3)
      s += "  % " + detail::one_line(neutral.substr(2, neutral.size() - 3));
    if (!names.empty()) {
      s += "  % " + detail::one_line(names[0].name);
      for (std::size_t m = 1; m < names.size(); ++m)
        s += (m == 1 ? "; the same form: " : ", ") + detail::one_line(names[m].name) + " (" +
             detail::one_line(names[m].symbol) + ")";
    }
    s += "\n";
  }
  // the same relation in named groups, when the catalog writes it differently (as the text report)
  if (const std::optional<analysis> named = detail::in_named_groups(a);
      named && !detail::named_relation(a, text_form::ascii).empty())
    s += "\\[ " + detail::latex_relation(*named) + " \\]  % in named groups\n";
  for (std::size_t k = 0; k < a.isolated.size(); ++k)
    s += "% excluded: " + a.isolated[k] + " (" +
         detail::one_line(k < a.isolated_reasons.size() ? a.isolated_reasons[k] : "") + ")\n";
  for (const auto& note : a.notes)
    if (note != a.deficiency.explanation) s += "% note: " + detail::one_line(note) + "\n";
  for (const auto& note : detail::regime_sentences(a, values)) s += "% note: " + detail::one_line(note) + "\n";
  if (o.alternatives) {
    if (o.alternatives->empty()) return s + "% alternatives: none (no other admissible repeating variables)\n";
    s += "% alternatives (other admissible repeating variables, best first by the rule)\n";
    for (std::size_t i = 0; i < o.alternatives->size(); ++i) {
      const analysis& x = (*o.alternatives)[i];
      s += "% " + std::to_string(i + 1) + ". repeating " + detail::comma_list(x.repeating) + "\n\\[ ";
      for (std::size_t k = 0; k < x.groups.size(); ++k) {
        s += (k > 0 ? ", \\quad " : "") + std::string("\\Pi_{") + std::to_string(k + 1) + "} = " + latex(x.groups[k]);
        if (!x.groups[k].matches.empty())
          s += " = " + detail::latex_power(detail::latex_symbol(x.groups[k].matches.front().symbol),
                                           x.groups[k].matches.front().power);
      }
      s += " \\]\n";
    }
  }
  return s;
}

}  // namespace nondim
