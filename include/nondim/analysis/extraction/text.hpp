#pragma once
/// \file text.hpp
/// \brief A readable text form of a whole analysis: the dimension matrix as a table, the
/// rank, the repeating variables, the groups, the isolated variables and the SVD check.

#include <algorithm>
#include <cstddef>
#include <cstdio>
#include <ostream>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/format.hpp"
#include "../config.hpp"
#include "analyze.hpp"
#include "explain.hpp"
#include "result.hpp"
#include "symbols.hpp"

namespace nondim {

/// \brief The analysis as text, e.g. (Unicode)
///
/// ```
/// dimension matrix
///        F   ρ   U   D   μ
///   L    1  -3   1   1  -1
///   M    1   1   0   0   1
///   T   -2   0  -1   0  -1
/// rank 3
/// dependent F
/// repeating ρ, U, D (chosen automatically)
/// groups (2)
///   π1 = F·ρ⁻¹·U⁻²·D⁻² = C_D (drag coefficient)
///   π2 = μ·ρ⁻¹·U⁻¹·D⁻¹ = Re⁻¹ (Reynolds number)
/// isolated: none
/// SVD check: rank 3, agrees; singular values ...; max residual 0
/// ```
/// Only the base dimensions that appear get a row. ASCII writes `pi1`, `*`, `^-2`, names as given.
std::string to_string(const analysis& a, text_form form = text_form::unicode);

/// \brief The relation the groups state, the dependent group as a function of the others:
/// `Nu = f(Re, Pr)`, each group written as the catalog number it matches first (with its
/// power: `Re⁻¹`) or else as its product (`L·D⁻¹`). Empty when the dependent variable is in
/// no group or is a repeating one (then no group is "its" group).
std::string relation(const analysis& a, text_form form = text_form::unicode);

template <class CharT, class Traits>
std::basic_ostream<CharT, Traits>& operator<<(std::basic_ostream<CharT, Traits>& os, const analysis& a) {
  return os << to_string(a).c_str();
}

template <class CharT, class Traits>
std::basic_ostream<CharT, Traits>& operator<<(std::basic_ostream<CharT, Traits>& os, const pi_group& g) {
  return os << g.text().c_str();
}

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "text.ipp"
#endif
