#pragma once
/// \file scales.hpp
/// \brief The reference scale of every variable of an analysis in terms of its repeating
/// variables (`nondim groups --scales`): what a solver written in nondimensional form
/// divides each input by, `t* = t·U/D`, `p* = p/(ρ·U²)`.

#include <cstddef>
#include <string>
#include <vector>

#include "../../analysis.hpp"
#include "../config.hpp"
#include "detail/json.hpp"
#include "detail/names.hpp"
#include "detail/table.hpp"
#include "json.hpp"
#include "markdown.hpp"

namespace nondim {

/// \brief One variable's reference scale in the repeating variables of an analysis.
struct variable_scale {
  std::string name;
  bool is_reference = false;  ///< a repeating variable: it is its own scale
  bool has_scale = false;     ///< its dimension is a product of powers of the repeating variables
  /// When `has_scale`: the exponents on the repeating variables (in the order of
  /// `analysis::repeating`) and the texts; its `value` is not meaningful here (no values).
  scale_expression scale;
  std::size_t lacking_base = base_dimension_count;  ///< when not: a base dimension they lack
};

/// \brief The reference scale of every variable of `a`, in the problem's order.
std::vector<variable_scale> variable_scales(const analysis& a);

/// \brief The scales as text, e.g. (Unicode)
///
/// ```
/// reference scales in the repeating variables ρ, U, D
///   variable  nondimensional    scale
///   F         F* = F/(ρ·U²·D²)  ρ·U²·D²
///   ρ         reference         ρ
///   μ         μ* = μ/(ρ·U·D)    ρ·U·D
/// ```
std::string scales_text_report(const analysis& a, text_form form = text_form::unicode);

/// \brief The scales as a Markdown table.
std::string scales_markdown_report(const analysis& a);

/// \brief The analysis as `json_report` gives it, with one more member, `"scales"`: per
/// variable `{"name", "reference", "nondimensional", "scale", "exponents"}` (ASCII texts, the
/// exponents on the repeating variables, only the non-zero ones); for a variable outside
/// their span `nondimensional`, `scale` and `exponents` are null and `"lacking"` names a base
/// dimension they lack. Without `--scales` the program prints `json_report` unchanged.
std::string json_scales_report(const analysis& a, const report_options& o = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "scales.ipp"
#endif
