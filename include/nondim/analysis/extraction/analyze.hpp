#pragma once
/// \file analyze.hpp
/// \brief `analyze()`: the exact dimensionless groups of a problem.
///
/// Steps: the dimension matrix; its exact reduced row echelon form (checked int64
/// rationals, redone in cpp_rational on overflow); the repeating variables (validated, or
/// chosen by the rule of DESIGN.md); the groups in the classical form; then, when asked,
/// the re-expression in named groups; last, the SVD cross-check of the final groups.

#include "../config.hpp"
#include "options.hpp"
#include "problem.hpp"
#include "result.hpp"

namespace nondim {

/// \brief The dimensionless groups of `p`, exactly.
///
/// The rank is the exact rank of the dimension matrix; there are `n - rank` groups. With
/// `o.repeating` empty the repeating variables are chosen by the rule of DESIGN.md
/// (repeating_rule.hpp: a length, then a velocity, rotational speed or g, then a density,
/// then the others by fewer base dimensions and smaller exponents, surface tension,
/// viscosity and expansion coefficients last; input order breaks ties; each taken when it
/// raises the rank; the dependent one last, and then it is isolated and `missing_variable`
/// is set). Each group is in the classical form: one non-repeating variable with a
/// positive exponent times powers of the repeating ones, primitive integer exponents; the
/// group of the dependent variable first, the others by the input position of their
/// non-repeating variable. In the named basis `repeating_kept` says whether the named
/// groups kept to the repeating variables. With `o.form == basis::named` the groups are then
/// re-expressed in catalog numbers where the null space allows (naming.hpp,
/// named_basis.hpp). In either basis every group lists the catalog entries it matches in
/// `pi_group::matches`. A numerical disagreement of the SVD check is reported in `svd`,
/// never thrown.
///
/// \throws analysis_error when the problem is empty; the dependent or a repeating variable
///         is not in the problem; a repeating variable is given twice or is dimensionless;
///         the count of repeating variables is not the rank, or their dimensions are not
///         independent (the message names the first that depends on those before it); a
///         group's exact exponents do not fit in 64 bits; `exact_arithmetic::int64` was asked
///         for and the elimination overflows.
analysis analyze(const problem& p, const options& o = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "analyze.ipp"
#endif
