#pragma once
/// \file latex.hpp
/// \brief LaTeX forms: a variable name (`rho` -> `\rho`, `mu_w` -> `\mu_{w}`, `T_inf` ->
/// `T_{\mathrm{inf}}`), a group as a fraction (`\frac{F}{\rho U^{2} D^{2}}`), and a whole
/// analysis as display equations ready to paste into a document.

#include <array>
#include <cstddef>
#include <cstdint>
#include <string>
#include <string_view>

#include "../../analysis.hpp"
#include "../config.hpp"
#include "detail/names.hpp"
#include "options.hpp"

namespace nondim {

/// \brief `name` in LaTeX math: a head, then trailing digits or the part after the first
/// `_` as a subscript: `rho` -> `\rho`, `mu_w` -> `\mu_{w}`, `D_h` -> `D_{h}`, `T_inf` ->
/// `T_{\mathrm{inf}}`, `L1` -> `L_{1}`, `Delta_p` -> `\Delta_{p}`, `eps` -> `\varepsilon`.
std::string latex_name(std::string_view name);

/// \brief A group as a LaTeX fraction: the factors with positive exponents over those with
/// negative ones, the non-repeating variable first (`\frac{F}{\rho U^{2} D^{2}}`); without
/// a denominator a plain product, without a numerator `\frac{1}{...}`.
std::string latex(const pi_group& g);

/// \brief The analysis as LaTeX: one display equation per group, `\Pi_k = <fraction>`,
/// followed by `= \mathrm{Re}^{-1}` for each recognised named group, with comment lines
/// (`%`) for the title, the repeating variables and the excluded variables. Paste into a
/// document that loads amsmath (for `\text`).
std::string latex_report(const analysis& a, const report_options& o = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "latex.ipp"
#endif
