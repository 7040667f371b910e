#pragma once
// Definitions of scales.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <cstddef>
#include <string>
#include <vector>
#include "../../analysis.hpp"
#include "detail/json.hpp"
#include "detail/names.hpp"
#include "detail/table.hpp"
#include "json.hpp"
#include "markdown.hpp"
#include "scales.hpp"

namespace nondim {

NONDIM_ANALYSIS_INLINE std::vector<variable_scale> variable_scales(const analysis& a) {
  runtime_scales refs;
  for (const auto& r : a.repeating) {
    const auto j = a.index_of(r);
    if (j) refs.add(r, a.variables[*j].dim, 1.0);
  }
  std::vector<variable_scale> out;
  out.reserve(a.variables.size());
  for (const auto& v : a.variables) {
    variable_scale s;
    s.name = v.name;
    s.is_reference = a.is_repeating(v.name);
    try {
      s.scale = refs.scale(v.dim);
      s.has_scale = true;
    } catch (const scales_error& e) {
      s.lacking_base = e.lacking_base();
    }
    out.push_back(std::move(s));
  }
  return out;
}

namespace detail {

/// The three cells of a scale: name, nondimensional form (`F* = F/(ρ·U²·D²)`), scale.
inline std::vector<std::string> scale_cells(const variable_scale& s, text_form form) {
  const std::string name = display_name(s.name, form);
  if (!s.has_scale) {
    const std::string why = s.lacking_base < base_dimension_count
                                ? "the repeating variables lack " + std::string(dimension_symbol(s.lacking_base, form))
                                : std::string("not a product of powers of the repeating variables");
    return {name, "none", why};
  }
  if (s.is_reference) return {name, "reference", s.scale.text(form)};
  return {name, name + "* = " + s.scale.nondimensional_text(s.name, form), s.scale.text(form)};
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE std::string scales_text_report(const analysis& a, text_form form) {
  std::vector<std::vector<std::string>> rows{{"variable", "nondimensional", "scale"}};
  for (const auto& s : variable_scales(a)) rows.push_back(detail::scale_cells(s, form));
  return "reference scales in the repeating variables " + detail::comma_list(a.repeating, form) + "\n" +
         detail::aligned_table(rows, {detail::align::left, detail::align::left, detail::align::left}, 2);
}

NONDIM_ANALYSIS_INLINE std::string scales_markdown_report(const analysis& a) {
  constexpr text_form form = text_form::unicode;
  std::string s = "**Reference scales** in the repeating variables " +
                  detail::markdown_escape(detail::comma_list(a.repeating, form)) + ":\n\n";
  s += detail::markdown_row({"variable", "nondimensional", "scale"}) + detail::markdown_row({":--", ":--", ":--"});
  for (const auto& v : variable_scales(a)) {
    std::vector<std::string> cells = detail::scale_cells(v, form);
    for (auto& c : cells) c = detail::markdown_escape(c);
    s += detail::markdown_row(cells);
  }
  return s;
}

NONDIM_ANALYSIS_INLINE std::string json_scales_report(const analysis& a, const report_options& o) {
  using detail::json_elements;
  using detail::json_members;
  using detail::json_value;
  json_elements scales;
  for (const auto& v : variable_scales(a)) {
    json_members m{{"name", v.name}, {"reference", v.is_reference}};
    if (v.has_scale) {
      json_members exponents;
      for (std::size_t i = 0; i < v.scale.exponents.size() && i < v.scale.names.size(); ++i)
        if (!v.scale.exponents[i].is_zero())
          exponents.emplace_back(v.scale.names[i], detail::json_exponent(v.scale.exponents[i]));
      m.emplace_back("nondimensional", v.scale.nondimensional_text(v.name, text_form::ascii));
      m.emplace_back("scale", v.scale.text(text_form::ascii));
      m.emplace_back("exponents", std::move(exponents));
    } else {
      m.emplace_back("nondimensional", nullptr);
      m.emplace_back("scale", nullptr);
      m.emplace_back("exponents", nullptr);
      if (v.lacking_base < base_dimension_count)
        m.emplace_back("lacking", std::string(dimension_symbol(v.lacking_base, text_form::ascii)));
    }
    scales.emplace_back(std::move(m));
  }
  json_members root = detail::json_report_members(a, o);
  root.emplace_back("scales", std::move(scales));
  return detail::json_text(root);
}

}  // namespace nondim
