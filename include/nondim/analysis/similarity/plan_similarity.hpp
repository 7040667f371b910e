#pragma once
/// \file plan_similarity.hpp
/// \brief `plan_similarity()`: the model values that make a prototype's groups match, by
/// linear algebra in the logarithms of the values.

#include "../config.hpp"
#include "plan.hpp"
#include "problem.hpp"

namespace nondim {

/// \brief Plans a scale-model test: finds the model values that make every independent
/// group (one without the dependent variable) take its prototype value, and the factor
/// that carries the dependent variable from model to prototype.
///
/// With r_j = ln(x_model,j / x_prototype,j), matching group k is linear:
///   sum_j e_kj r_j = 0,  i.e.  sum_{j unknown} e_kj r_j = -sum_{j given} e_kj r_j.
/// Ranks are decided exactly (rational elimination of the integer exponents); Eigen's
/// complete orthogonal decomposition solves. Outcomes, all in the result:
/// - `exact`: the unknowns are determined and every independent group matches;
/// - `partial`: the unknowns are determined but not every group can match (more groups
///   than unknowns, such as Froude and Reynolds numbers with the same water and gravity):
///   the priority groups match exactly when they can, the rest in the least-squares sense
///   of the logarithms within what remains; `priority_matched` says whether they could;
/// - `underdetermined`: model values remain to be fixed; `free` lists a set of them that,
///   once fixed, determines the rest (the earliest in input order are listed, so the later
///   variables are the ones found). Group ratios are still reported: they do not depend on
///   the free choice.
///
/// With standard uncertainties of the given values (`prototype_uncertainty`,
/// `model_uncertainty`), the factor gets one by the law of propagation for uncorrelated
/// inputs (GUM, JCGM 100:2008, eq. 10), with the sensitivities of the whole plan (a model
/// value found moves with the values it is found from), when every value the factor depends
/// on has one; otherwise `dependent_plan::lacking_uncertainty` names those without. The
/// predicted prototype value adds the measured value's uncertainty.
///
/// \throws similarity_error for bad input (see `similarity_error`); never for an outcome.
similarity_plan plan_similarity(const similarity_problem& p);

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "plan_similarity.ipp"
#endif
