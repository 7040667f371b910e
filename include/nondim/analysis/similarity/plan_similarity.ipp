#pragma once
// Definitions of plan_similarity.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <Eigen/Dense>
#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <optional>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "../../solver/core/rational.hpp"
#include "detail/exact.hpp"
#include "detail/text.hpp"
#include "detail/validate.hpp"
#include "error.hpp"
#include "plan.hpp"
#include "plan_similarity.hpp"
#include "problem.hpp"

namespace nondim {

namespace detail {

inline Eigen::Index eidx(std::size_t i) {
  return static_cast<Eigen::Index>(i);
}

/// Rows `rows` of the independent groups over the unknowns, in natural order.
inline std::vector<std::vector<std::int64_t>> unknown_rows(const similarity_problem& p,
                                                           const std::vector<std::size_t>& rows,
                                                           const std::vector<std::size_t>& unknown) {
  std::vector<std::vector<std::int64_t>> m;
  m.reserve(rows.size());
  for (auto k : rows) {
    std::vector<std::int64_t> r;
    r.reserve(unknown.size());
    for (auto j : unknown) r.push_back(p.groups[k].exponents[j]);
    m.push_back(std::move(r));
  }
  return m;
}

inline Eigen::MatrixXd to_matrix(const std::vector<std::vector<std::int64_t>>& m, std::size_t cols) {
  Eigen::MatrixXd a(eidx(m.size()), eidx(cols));
  for (std::size_t r = 0; r < m.size(); ++r)
    for (std::size_t c = 0; c < cols; ++c) a(eidx(r), eidx(c)) = static_cast<double>(m[r][c]);
  return a;
}

/// \brief Lexicographic least squares: minimise |A_P s - b_P|, then, among those
/// minimisers, |A_R s - b_R|, each with the least norm.
///
/// Stage one is a minimum-norm least-squares solve (complete orthogonal decomposition).
/// The minimisers of stage one are s0 + N z with N an orthonormal basis of the exact null
/// space of A_P; stage two solves (A_R N) z = b_R - A_R s0 the same way. With no priority
/// rows this is the plain minimum-norm least-squares solution of A_R s = b_R; when the
/// priority rows are consistent they hold exactly (a constrained least-squares problem).
inline Eigen::VectorXd solve_lexicographic(const std::vector<std::vector<std::int64_t>>& a_p,
                                           const Eigen::VectorXd& b_p,
                                           const std::vector<std::vector<std::int64_t>>& a_r,
                                           const Eigen::VectorXd& b_r, std::size_t unknowns) {
  const Eigen::Index f = eidx(unknowns);
  Eigen::VectorXd s0 = Eigen::VectorXd::Zero(f);
  Eigen::MatrixXd basis = Eigen::MatrixXd::Identity(f, f);
  if (!a_p.empty()) {
    const Eigen::MatrixXd ap = to_matrix(a_p, unknowns);
    s0 = ap.completeOrthogonalDecomposition().solve(b_p);
    const auto null = null_basis(similarity_reduce(a_p, unknowns));
    if (null.empty()) {
      basis.resize(f, 0);
    } else {
      Eigen::MatrixXd nb(f, eidx(null.size()));
      for (std::size_t c = 0; c < null.size(); ++c)
        for (std::size_t r = 0; r < unknowns; ++r) nb(eidx(r), eidx(c)) = null[c][r].convert_to<double>();
      // orthonormal columns spanning the same space: better conditioned for stage two
      const Eigen::HouseholderQR<Eigen::MatrixXd> qr(nb);
      basis = qr.householderQ() * Eigen::MatrixXd::Identity(f, nb.cols());
    }
  }
  if (a_r.empty() || basis.cols() == 0) return s0;
  const Eigen::MatrixXd ar = to_matrix(a_r, unknowns);
  const Eigen::MatrixXd reduced = ar * basis;
  const Eigen::VectorXd z = reduced.completeOrthogonalDecomposition().solve(b_r - ar * s0);
  return s0 + basis * z;
}

inline std::string group_name(const group_plan& g) {
  return g.label.empty() ? g.text : g.label;
}

/// The plan of `p` without uncertainties: `plan_similarity` less the propagation, which
/// calls it again on perturbed values.
inline similarity_plan plan_values(const similarity_problem& p) {
  const std::size_t d = detail::validate(p);
  const std::size_t n = p.variables.size();
  const std::size_t g = p.groups.size();
  const std::vector<std::string> names = detail::variable_names(p);
  const double tol = p.tolerance;

  similarity_plan plan;
  plan.tolerance = tol;

  // Which groups hold the dependent variable, which variables appear anywhere.
  std::vector<bool> in_group(n, false);
  std::vector<std::size_t> independent;
  std::vector<std::size_t> holding;
  for (std::size_t k = 0; k < g; ++k) {
    for (std::size_t j = 0; j < n; ++j)
      if (p.groups[k].exponents[j] != 0) in_group[j] = true;
    (p.groups[k].exponents[d] != 0 ? holding : independent).push_back(k);
  }
  std::vector<bool> is_priority(g, false);
  for (auto k : p.priority) is_priority[k] = true;

  // Known log-ratios (model value given) and the unknowns.
  std::vector<std::optional<double>> log_ratio(n);
  std::vector<std::size_t> unknown;
  for (std::size_t j = 0; j < n; ++j) {
    if (j == d) continue;
    const auto& v = p.variables[j];
    if (v.model)
      log_ratio[j] = std::log(*v.model / *v.prototype);
    else if (in_group[j])
      unknown.push_back(j);
  }
  const std::size_t f = unknown.size();
  plan.unknowns = f;

  // Exact structure, columns reversed so that the free set is the earliest variables.
  std::vector<bool> determined(f, false);
  std::vector<bool> is_free(f, false);
  {
    auto rows = detail::unknown_rows(p, independent, unknown);
    for (auto& r : rows) std::reverse(r.begin(), r.end());
    const detail::similarity_echelon e = detail::similarity_reduce(rows, f);
    plan.rank = e.rank();
    const auto det = detail::determined_columns(e);
    for (std::size_t u = 0; u < f; ++u) {
      determined[u] = det[f - 1 - u];
      is_free[u] = !e.is_pivot(f - 1 - u);
    }
  }

  // Right-hand sides: minus the part of each group the given model values fix.
  auto rhs = [&](const std::vector<std::size_t>& rows) {
    Eigen::VectorXd b(detail::eidx(rows.size()));
    for (std::size_t i = 0; i < rows.size(); ++i) {
      double sum = 0.0;
      for (std::size_t j = 0; j < n; ++j)
        if (log_ratio[j]) sum += static_cast<double>(p.groups[rows[i]].exponents[j]) * *log_ratio[j];
      b(detail::eidx(i)) = -sum;
    }
    return b;
  };
  std::vector<std::size_t> first;
  std::vector<std::size_t> rest;
  for (auto k : independent) (is_priority[k] ? first : rest).push_back(k);
  Eigen::VectorXd s = Eigen::VectorXd::Zero(detail::eidx(f));
  if (f > 0 && !independent.empty())
    s = detail::solve_lexicographic(detail::unknown_rows(p, first, unknown), rhs(first),
                                    detail::unknown_rows(p, rest, unknown), rhs(rest), f);

  // Every log-ratio the groups see (undetermined unknowns at their minimum-norm values:
  // the residual of each group is the same for every least-squares solution).
  std::vector<double> seen(n, 0.0);
  for (std::size_t j = 0; j < n; ++j)
    if (log_ratio[j]) seen[j] = *log_ratio[j];
  for (std::size_t u = 0; u < f; ++u) {
    seen[unknown[u]] = s(detail::eidx(u));
    if (determined[u]) log_ratio[unknown[u]] = s(detail::eidx(u));
  }

  // Variables.
  for (std::size_t j = 0; j < n; ++j) {
    const auto& v = p.variables[j];
    variable_plan vp;
    vp.name = v.name;
    vp.unit = v.unit;
    vp.dependent = j == d;
    if (j == d) {
      vp.model = v.model;
      vp.source = v.model ? model_source::measured : model_source::to_measure;
    } else {
      vp.prototype = v.prototype;
      if (v.model) {
        vp.model = v.model;
        vp.source = model_source::given;
      } else if (!in_group[j]) {
        vp.source = model_source::unused;
      } else {
        std::size_t u = 0;
        while (unknown[u] != j) ++u;
        if (determined[u]) {
          vp.model = *v.prototype * std::exp(*log_ratio[j]);
          vp.source = model_source::found;
        } else {
          vp.source = is_free[u] ? model_source::free : model_source::undetermined;
          if (is_free[u]) plan.free.push_back(v.name);
        }
      }
    }
    plan.variables.push_back(std::move(vp));
  }

  // Groups.
  bool all_matched = true;
  for (std::size_t k = 0; k < g; ++k) {
    const auto& e = p.groups[k].exponents;
    group_plan gp;
    gp.exponents = e;
    gp.label = p.groups[k].label;
    gp.text = detail::group_text(names, e);
    gp.holds_dependent = e[d] != 0;
    gp.priority = is_priority[k];
    if (!gp.holds_dependent) {
      double log_proto = 0.0;
      double log_r = 0.0;
      for (std::size_t j = 0; j < n; ++j) {
        if (e[j] == 0) continue;
        const auto& v = p.variables[j];
        log_proto += static_cast<double>(e[j]) * std::log(v.factor * *v.prototype);
        log_r += static_cast<double>(e[j]) * seen[j];
      }
      gp.prototype = std::exp(log_proto);
      gp.model = std::exp(log_proto + log_r);
      gp.ratio = std::exp(log_r);
      gp.matched = std::abs(log_r) <= tol;
      if (!gp.matched) {
        all_matched = false;
        plan.unmatched.push_back(detail::group_name(gp));
        if (gp.priority) plan.priority_matched = false;
      }
    } else {
      bool known = true;
      double log_model = 0.0;
      for (std::size_t j = 0; j < n && known; ++j) {
        if (e[j] == 0) continue;
        const auto& vp = plan.variables[j];
        if (!vp.model) {
          known = false;
        } else {
          log_model += static_cast<double>(e[j]) * std::log(p.variables[j].factor * *vp.model);
        }
      }
      if (known) gp.model = std::exp(log_model);
    }
    plan.groups.push_back(std::move(gp));
  }

  if (plan.rank < f)
    plan.status = similarity_status::underdetermined;
  else
    plan.status = all_matched ? similarity_status::exact : similarity_status::partial;

  // The dependent variable.
  dependent_plan& dp = plan.dependent;
  dp.name = names[d];
  dp.index = d;
  dp.groups = holding;
  dp.rule_exponents.assign(n, rational{0});
  std::vector<std::string> missing;
  if (holding.empty()) {
    dp.remark =
        detail::cat("the dependent variable ", detail::quote(dp.name),
                    " appears in no group: similarity gives no rule to carry it to full scale (the problem may lack a "
                    "variable)");
  } else {
    const std::size_t h0 = holding.front();
    dp.rule_group = h0;
    const std::int64_t ed = p.groups[h0].exponents[d];
    for (std::size_t j = 0; j < n; ++j)
      if (j != d) dp.rule_exponents[j] = rational{-p.groups[h0].exponents[j], ed};
    dp.rule = detail::rule_text(names, d, dp.rule_exponents);
    for (auto h : holding) {
      const auto& e = p.groups[h].exponents;
      double log_factor = 0.0;
      bool known = true;
      for (std::size_t j = 0; j < n; ++j) {
        if (j == d || e[j] == 0) continue;
        if (!log_ratio[j]) {
          known = false;
          if (h == h0) missing.push_back(names[j]);
          continue;
        }
        log_factor += static_cast<double>(e[j]) / static_cast<double>(e[d]) * *log_ratio[j];
      }
      dp.factors_by_group.push_back(known ? std::optional<double>{std::exp(log_factor)} : std::nullopt);
    }
    dp.prototype_over_model = dp.factors_by_group.front();
    bool agree = true;
    for (const auto& fk : dp.factors_by_group)
      agree = agree && fk && dp.prototype_over_model && std::abs(std::log(*fk / *dp.prototype_over_model)) <= tol;
    dp.exact = dp.prototype_over_model.has_value() && all_matched && agree;

    std::vector<std::string> why;
    if (!dp.prototype_over_model)
      why.push_back(detail::cat("it depends on model values still to be fixed (", detail::join(missing), ")"));
    if (!all_matched)
      why.push_back(detail::cat(
          "approximate: ", detail::join(plan.unmatched),
          (plan.unmatched.size() > 1 ? " do not match, so the similarity is partial and the scale-up leaves "
                                       "out what they govern"
                                     : " does not match, so the similarity is partial and the scale-up "
                                       "leaves out what it governs")));
    if (holding.size() > 1) {
      std::vector<std::string> texts;
      for (auto h : holding) texts.push_back(detail::group_name(plan.groups[h]));
      why.push_back(
          detail::cat(std::string(agree ? "it appears in " : "approximate: it appears in "),
                      std::to_string(holding.size()), " groups (", detail::join(texts), "); the rule uses the first",
                      (agree ? ", and the others give the same factor"
                             : ", and the others give different factors or none (write the groups so that only one "
                               "holds the dependent variable)")));
    }
    for (std::size_t i = 0; i < why.size(); ++i) {
      if (i > 0) dp.remark += "; ";
      dp.remark += why[i];
    }
  }
  auto& dv = plan.variables[d];
  if (dp.prototype_over_model && dv.model) {
    dv.prototype = *dp.prototype_over_model * *dv.model;
    dv.ratio = *dv.model / *dv.prototype;
  }
  for (std::size_t j = 0; j < n; ++j) {
    auto& vp = plan.variables[j];
    if (j != d && vp.model && vp.prototype) vp.ratio = *vp.model / *vp.prototype;
  }

  // Notes for people.
  const auto count = [](std::size_t c, const char* one, const char* many) {
    return detail::cat(std::to_string(c), " ", c == 1 ? one : many);
  };
  // An unmatched group with a model value to find was compromised by the least squares; one
  // whose model values are all given is fixed by them, whatever the plan finds.
  std::vector<std::string> compromised;
  std::vector<std::string> fixed;
  for (auto k : independent) {
    if (plan.groups[k].matched) continue;
    bool has_unknown = false;
    for (auto j : unknown) has_unknown = has_unknown || p.groups[k].exponents[j] != 0;
    (has_unknown ? compromised : fixed).push_back(detail::group_name(plan.groups[k]));
  }
  if (plan.status == similarity_status::partial && !fixed.empty())
    plan.notes.push_back(
        detail::cat(detail::join(fixed),
                    (fixed.size() == 1 ? " cannot match: every value in it is given on the model, so it is"
                                       : " cannot match: every value in them is given on the model, so they are"),
                    " fixed by those values, not compromised (change a given model value to match ",
                    (fixed.size() == 1 ? "it)" : "them)")));
  if (plan.status == similarity_status::partial && !compromised.empty())
    plan.notes.push_back(
        detail::cat(count(independent.size() - fixed.size(), "group", "groups"), " to match with ",
                    count(f, "model value", "model values"), " to find: ", detail::join(compromised),
                    (compromised.size() == 1 ? " cannot match" : " cannot all match"),
                    (p.priority.empty() ? "; the model values are a least-squares compromise in the logarithms"
                                        : "; the priority groups come first, the rest are matched as nearly as "
                                          "possible (least squares in the logarithms)")));
  if (!plan.priority_matched)
    plan.notes.push_back(
        "the priority groups cannot all match together: they are matched as nearly as possible (least squares in the "
        "logarithms), the other groups within what remains");
  if (plan.status == similarity_status::underdetermined && !plan.unmatched.empty())
    plan.notes.push_back(detail::cat(detail::join(plan.unmatched),
                                     (plan.unmatched.size() == 1 ? " cannot match" : " cannot all match"),
                                     " with the model values given, whatever the free ones are"));
  for (const auto& v : plan.variables)
    if (v.source == model_source::found && !(std::isfinite(*v.model) && *v.model > 0.0))
      plan.notes.push_back(detail::cat("the model value found for ", detail::quote(v.name),
                                       " is beyond the range of double: the plan asks for an impossible model"));
  if (plan.status == similarity_status::underdetermined)
    plan.notes.push_back(detail::cat("fix the model ", std::string(plan.free.size() == 1 ? "value of " : "values of "),
                                     detail::join(plan.free),
                                     " (or another set of as many that determines the rest) to complete the plan"));
  for (std::size_t j = 0; j < n; ++j)
    if (plan.variables[j].source == model_source::unused)
      plan.notes.push_back(
          detail::cat(detail::quote(names[j]), " appears in no group: similarity does not constrain its model value"));
  return plan;
}

/// d ln(factor) / d ln(x) for the prototype (or given model) value of variable `j`, by a
/// central difference: the factor is a product of powers of the values (the least squares
/// is linear in their logarithms), so the difference is exact but for rounding.
inline std::optional<double> log_sensitivity(const similarity_problem& p, std::size_t j, bool model) {
  constexpr double step = 1e-4;
  similarity_problem q = p;
  std::optional<double>& x = model ? q.variables[j].model : q.variables[j].prototype;
  const double x0 = *x;
  std::optional<double> up;
  std::optional<double> down;
  try {
    x = x0 * std::exp(step);
    up = plan_values(q).dependent.prototype_over_model;
    x = x0 * std::exp(-step);
    down = plan_values(q).dependent.prototype_over_model;
  } catch (const similarity_error&) {
    return std::nullopt;  // a value at the edge of double's range: no difference to take
  }
  if (!up || !down) return std::nullopt;
  return (std::log(*up) - std::log(*down)) / (2.0 * step);
}

/// The given uncertainties into the plan, and the factor's and the predicted value's by the
/// law of propagation for uncorrelated inputs in its relative form (GUM eq. 12: a product
/// of powers, with the exponents the plan's sensitivities).
inline void propagate_uncertainty(const similarity_problem& p, similarity_plan& plan) {
  const std::size_t d = plan.dependent.index;
  bool any = false;
  for (std::size_t j = 0; j < p.variables.size(); ++j) {
    const auto& v = p.variables[j];
    auto& vp = plan.variables[j];
    if (j != d) vp.prototype_uncertainty = v.prototype_uncertainty;
    if (v.model) vp.model_uncertainty = v.model_uncertainty;
    any = any || vp.prototype_uncertainty || vp.model_uncertainty;
  }
  dependent_plan& dp = plan.dependent;
  if (!any || !dp.prototype_over_model) return;

  constexpr double negligible = 1e-9;  // sensitivities are ratios of integer exponents
  double sum = 0.0;
  for (std::size_t j = 0; j < p.variables.size(); ++j) {
    if (j == d) continue;
    const auto& v = p.variables[j];
    for (const bool model : {false, true}) {
      const std::optional<double>& x = model ? v.model : v.prototype;
      if (!x) continue;
      const auto s = log_sensitivity(p, j, model);
      if (!s) return;  // no uncertainty rather than one that leaves an input out
      if (std::abs(*s) < negligible) continue;
      const std::optional<double>& u = model ? v.model_uncertainty : v.prototype_uncertainty;
      if (!u) {
        dp.lacking_uncertainty.push_back(cat(v.name, model ? " (model)" : " (prototype)"));
        continue;
      }
      const double relative = *s * *u / *x;
      sum += relative * relative;
    }
  }
  if (!dp.lacking_uncertainty.empty()) return;
  dp.prototype_over_model_uncertainty = *dp.prototype_over_model * std::sqrt(sum);
  auto& dv = plan.variables[d];
  if (dv.prototype && dv.model && dv.model_uncertainty) {
    const double measured = *dv.model_uncertainty / *dv.model;
    dv.prototype_uncertainty = std::abs(*dv.prototype) * std::sqrt(sum + measured * measured);
  }
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE similarity_plan plan_similarity(const similarity_problem& p) {
  similarity_plan plan = detail::plan_values(p);
  detail::propagate_uncertainty(p, plan);
  return plan;
}

}  // namespace nondim
