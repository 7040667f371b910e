#pragma once
// Definitions of fit.hpp: compiled once under NONDIM_SEPARATE_COMPILATION
// (<nondim/implementation.ipp>), inline otherwise.

#include <Eigen/Dense>
#include <algorithm>
#include <cmath>
#include <cstddef>
#include <optional>
#include <span>
#include <string>
#include <vector>

#include "../../solver/core/detail/cat.hpp"
#include "design_point.hpp"
#include "fit.hpp"
#include "student_t.hpp"

namespace nondim {

namespace detail {

inline std::string fit_column_name(const fit_column& c, std::size_t index) {
  return c.name.empty() ? detail::cat("column ", std::to_string(index + 1)) : c.name;
}

/// ln of every value of a column; throws for a value with no real logarithm.
inline void fit_logs(const fit_column& c, const std::string& name, std::vector<double>& out) {
  out.resize(c.values.size());
  for (std::size_t i = 0; i < c.values.size(); ++i) {
    const double x = c.values[i];
    if (!std::isfinite(x) || x <= 0.0)
      throw fit_error(detail::cat("nondim: row ", std::to_string(i + 1), ", ", name, ": the value ",
                                  number_for_message(x), " has no logarithm; a power-law fit needs finite values > 0"),
                      fit_fault::bad_value, name, i);
    out[i] = std::log(x);
  }
}

}  // namespace detail

NONDIM_ANALYSIS_INLINE double fit_result::predict(std::span<const double> predictor_values) const {
  if (predictor_values.size() != exponents.size())
    throw fit_error(detail::cat("nondim: ", std::to_string(predictor_values.size()), " values given for a fit of ",
                                std::to_string(exponents.size()), " groups"),
                    fit_fault::shape);
  double ln = log_coefficient.value;
  for (std::size_t j = 0; j < exponents.size(); ++j)
    if (exponents[j] != 0.0) ln += exponents[j] * std::log(predictor_values[j]);
  return std::exp(ln);
}

NONDIM_ANALYSIS_INLINE fit_result fit_power_law(const fit_input& data, const fit_options& options) {
  const std::size_t n = data.dependent.values.size();
  const std::size_t k = data.predictors.size();
  const std::string dependent_name = data.dependent.name.empty() ? "the dependent group" : data.dependent.name;
  for (std::size_t j = 0; j < k; ++j)
    if (data.predictors[j].values.size() != n)
      throw fit_error(detail::cat("nondim: ", detail::fit_column_name(data.predictors[j], j), " has ",
                                  std::to_string(data.predictors[j].values.size()), " values, ", dependent_name,
                                  " has ", std::to_string(n)),
                      fit_fault::shape, detail::fit_column_name(data.predictors[j], j));
  if (!data.fixed.empty() && data.fixed.size() != k)
    throw fit_error(detail::cat("nondim: ", std::to_string(data.fixed.size()), " held exponents given for ",
                                std::to_string(k), " groups"),
                    fit_fault::shape);
  if (!data.relative_uncertainty.empty() && data.relative_uncertainty.size() != n)
    throw fit_error(detail::cat("nondim: ", std::to_string(data.relative_uncertainty.size()),
                                " uncertainties given for ", std::to_string(n), " rows"),
                    fit_fault::shape);
  if (!(options.confidence > 0.0 && options.confidence < 1.0))
    throw fit_error("nondim: the confidence of the intervals must lie between 0 and 1", fit_fault::shape);

  fit_result r;
  r.n = n;
  r.confidence = options.confidence;
  r.weighted = !data.relative_uncertainty.empty();

  // logarithms and ranges; every value is checked before any arithmetic
  std::vector<double> ln_y;
  detail::fit_logs(data.dependent, dependent_name, ln_y);
  std::vector<std::vector<double>> ln_x(k);
  for (std::size_t j = 0; j < k; ++j)
    detail::fit_logs(data.predictors[j], detail::fit_column_name(data.predictors[j], j), ln_x[j]);
  std::vector<double> w(n, 1.0);
  if (r.weighted)
    for (std::size_t i = 0; i < n; ++i) {
      const double u = data.relative_uncertainty[i];
      if (!std::isfinite(u) || u <= 0.0)
        throw fit_error(
            detail::cat("nondim: row ", std::to_string(i + 1), ": the relative uncertainty of ", dependent_name, " is ",
                        detail::number_for_message(u), "; a weight needs a finite uncertainty > 0"),
            fit_fault::bad_value, dependent_name, i);
      w[i] = 1.0 / (u * u);
    }
  const auto range_of = [&](const fit_column& c, const std::string& name) {
    fit_range g{name, 0.0, 0.0};
    if (n > 0) {
      const auto [lo, hi] = std::minmax_element(c.values.begin(), c.values.end());
      g.min = *lo;
      g.max = *hi;
    }
    return g;
  };
  r.ranges.push_back(range_of(data.dependent, dependent_name));
  for (std::size_t j = 0; j < k; ++j)
    r.ranges.push_back(range_of(data.predictors[j], detail::fit_column_name(data.predictors[j], j)));

  // which exponents are fitted: not those of constant groups, not those held
  std::vector<std::size_t> free;
  std::vector<double> held(k, 0.0);
  r.exponents.assign(k, 0.0);
  for (std::size_t j = 0; j < k; ++j) {
    const fit_range& g = r.ranges[j + 1];
    const std::string name = detail::fit_column_name(data.predictors[j], j);
    if (n > 0 && g.max <= g.min * (1.0 + options.constant_tolerance)) {
      double mean = 0.0;
      for (const double v : ln_x[j]) mean += v;
      r.constant.push_back({name, j, std::exp(mean / static_cast<double>(n))});
    } else if (!data.fixed.empty() && data.fixed[j]) {
      if (!std::isfinite(*data.fixed[j]))
        throw fit_error(detail::cat("nondim: the exponent held for ", name, " is not a finite number"),
                        fit_fault::shape, name);
      held[j] = *data.fixed[j];
      r.exponents[j] = held[j];
    } else {
      free.push_back(j);
    }
  }
  const std::size_t p = 1 + free.size();
  r.parameters = p;
  if (n <= p)
    throw fit_error(
        detail::cat("nondim: ", std::to_string(n), " rows for ", std::to_string(p), " parameters (the coefficient and ",
                    std::to_string(free.size()), " exponents): a fit with standard errors needs at least ",
                    std::to_string(p + 1), " rows"),
        fit_fault::too_few_rows);
  r.dof = n - p;

  // the weighted design: sqrt(w) [1, ln x...] and sqrt(w) (ln y - held terms)
  Eigen::MatrixXd x(static_cast<Eigen::Index>(n), static_cast<Eigen::Index>(p));
  Eigen::VectorXd y(static_cast<Eigen::Index>(n));
  for (std::size_t i = 0; i < n; ++i) {
    const double s = std::sqrt(w[i]);
    const auto row = static_cast<Eigen::Index>(i);
    double target = ln_y[i];
    for (std::size_t j = 0; j < k; ++j)
      if (held[j] != 0.0) target -= held[j] * ln_x[j][i];
    y(row) = s * target;
    x(row, 0) = s;
    for (std::size_t c = 0; c < free.size(); ++c) x(row, static_cast<Eigen::Index>(c + 1)) = s * ln_x[free[c]][i];
  }

  Eigen::ColPivHouseholderQR<Eigen::MatrixXd> qr(x);
  qr.setThreshold(1e-10);
  if (static_cast<std::size_t>(qr.rank()) < p) {
    // name the pair of proportional groups when there is one, else the group that the others give
    for (std::size_t a = 0; a < free.size(); ++a)
      for (std::size_t b = a + 1; b < free.size(); ++b) {
        const Eigen::VectorXd ca =
            x.col(static_cast<Eigen::Index>(a + 1)).array() - x.col(static_cast<Eigen::Index>(a + 1)).mean();
        const Eigen::VectorXd cb =
            x.col(static_cast<Eigen::Index>(b + 1)).array() - x.col(static_cast<Eigen::Index>(b + 1)).mean();
        const double norms = ca.norm() * cb.norm();
        if (norms > 0.0 && std::abs(ca.dot(cb)) >= norms * (1.0 - 1e-10)) {
          const std::string na = detail::fit_column_name(data.predictors[free[a]], free[a]);
          const std::string nb = detail::fit_column_name(data.predictors[free[b]], free[b]);
          throw fit_error(
              detail::cat("nondim: ", na, " and ", nb,
                          " are powers of each other in the data (proportional in the logarithms): their "
                          "exponents cannot be told apart; vary them independently, or hold one with --fix"),
              fit_fault::singular_design, na);
        }
      }
    const auto dependent_column = static_cast<std::size_t>(qr.colsPermutation().indices()(qr.rank()));
    const std::string name =
        dependent_column == 0
            ? std::string("the coefficient")
            : detail::fit_column_name(data.predictors[free[dependent_column - 1]], free[dependent_column - 1]);
    throw fit_error(detail::cat("nondim: the design is singular: ", name,
                                " is a product of powers of the other groups in the data; its exponent cannot be "
                                "fitted (hold it with --fix, or add rows where it varies on its own)"),
                    fit_fault::singular_design, dependent_column == 0 ? std::string() : name);
  }

  const Eigen::VectorXd beta = qr.solve(y);
  const Eigen::VectorXd e = y - x * beta;
  const double ssr = e.squaredNorm();
  const double s2 = ssr / static_cast<double>(r.dof);
  r.residual_sd = std::sqrt(s2);

  // (X'X)^-1 = P R^-1 R^-T P'
  const auto pp = static_cast<Eigen::Index>(p);
  const Eigen::MatrixXd rr = qr.matrixR().topLeftCorner(pp, pp).template triangularView<Eigen::Upper>();
  const Eigen::MatrixXd r_inv = rr.template triangularView<Eigen::Upper>().solve(Eigen::MatrixXd::Identity(pp, pp));
  const Eigen::MatrixXd cov_perm = r_inv * r_inv.transpose();
  Eigen::MatrixXd cov(pp, pp);
  const auto& perm = qr.colsPermutation().indices();
  for (Eigen::Index a = 0; a < pp; ++a)
    for (Eigen::Index b = 0; b < pp; ++b) cov(perm(a), perm(b)) = cov_perm(a, b) * s2;

  r.t_quantile = student_t_quantile(0.5 + options.confidence / 2.0, static_cast<double>(r.dof));
  const auto estimate = [&](Eigen::Index c) {
    fit_estimate est;
    est.value = beta(c);
    est.std_error = std::sqrt(std::max(cov(c, c), 0.0));
    est.low = est.value - r.t_quantile * est.std_error;
    est.high = est.value + r.t_quantile * est.std_error;
    return est;
  };
  r.log_coefficient = estimate(0);
  r.coefficient.value = std::exp(r.log_coefficient.value);
  r.coefficient.std_error = r.coefficient.value * r.log_coefficient.std_error;
  r.coefficient.low = std::exp(r.log_coefficient.low);
  r.coefficient.high = std::exp(r.log_coefficient.high);
  for (std::size_t c = 0; c < free.size(); ++c) r.exponents[free[c]] = beta(static_cast<Eigen::Index>(c + 1));
  for (std::size_t j = 0; j < k; ++j) {
    const auto it = std::find(free.begin(), free.end(), j);
    const std::string name = detail::fit_column_name(data.predictors[j], j);
    if (it != free.end()) {
      r.terms.push_back({name, j, estimate(static_cast<Eigen::Index>(it - free.begin() + 1)), false});
    } else if (std::none_of(r.constant.begin(), r.constant.end(),
                            [j](const fit_constant& g) { return g.column == j; })) {
      r.terms.push_back({name, j, fit_estimate{held[j], 0.0, held[j], held[j]}, true});
    }
  }

  // R^2 about the weighted mean of ln y itself (not of ln y less the held terms)
  double sw = 0.0;
  double mean = 0.0;
  for (std::size_t i = 0; i < n; ++i) {
    sw += w[i];
    mean += w[i] * ln_y[i];
  }
  mean /= sw;
  double sst = 0.0;
  for (std::size_t i = 0; i < n; ++i) sst += w[i] * (ln_y[i] - mean) * (ln_y[i] - mean);
  r.r2 = sst > 0.0 ? 1.0 - ssr / sst : (ssr == 0.0 ? 1.0 : 0.0);

  // deviations of the prediction, unweighted: (pred - meas)/meas = exp(ln pred - ln meas) - 1
  double sum_sq = 0.0;
  std::size_t in10 = 0;
  std::size_t in20 = 0;
  for (std::size_t i = 0; i < n; ++i) {
    const double residual = e(static_cast<Eigen::Index>(i)) / std::sqrt(w[i]);  // ln meas - ln pred
    const double d = std::expm1(-residual);
    sum_sq += d * d;
    if (std::abs(d) > r.max_relative) {
      r.max_relative = std::abs(d);
      r.max_relative_row = i;
    }
    if (std::abs(d) <= 0.10) ++in10;
    if (std::abs(d) <= 0.20) ++in20;
  }
  r.rms_relative = std::sqrt(sum_sq / static_cast<double>(n));
  r.within_10 = static_cast<double>(in10) / static_cast<double>(n);
  r.within_20 = static_cast<double>(in20) / static_cast<double>(n);

  // externally studentised residuals: t_i = r_i sqrt((dof - 1)/(dof - r_i^2)),
  // r_i = e_i / (s sqrt(1 - h_i)), h_i the leverage (the row of X P R^-1, squared)
  if (r.dof > 1 && s2 > 0.0) {
    Eigen::RowVectorXd xp(pp);
    for (std::size_t i = 0; i < n; ++i) {
      const auto row = static_cast<Eigen::Index>(i);
      for (Eigen::Index a = 0; a < pp; ++a) xp(a) = x(row, perm(a));
      const double h = (xp * r_inv).squaredNorm();
      if (!(h < 1.0 - 1e-12)) continue;  // a row that fixes its own fit has no residual to judge
      const double ri = e(row) / (r.residual_sd * std::sqrt(1.0 - h));
      const double dof = static_cast<double>(r.dof);
      const double denominator = dof - ri * ri;
      if (!(denominator > 0.0)) continue;
      const double ti = ri * std::sqrt((dof - 1.0) / denominator);
      if (std::isfinite(ti) && std::abs(ti) > options.outlier_limit) r.outliers.push_back({i, ti});
    }
  }
  return r;
}

}  // namespace nondim
