#pragma once
/// \file fit.hpp
/// \brief Correlation fits on spans of values: the dependent group as a product of powers
/// of the others, `Π₀ = C · Π₁^a₁ · … · Πₖ^aₖ`, by linear least squares in the logarithms,
/// with standard errors, confidence intervals (Student's t), the spread of the data about
/// the fit, the range of every group and outliers flagged by studentised residuals.
///
/// No file format here: the program reads CSV files into spans and calls `fit_power_law`.

#include <cstddef>
#include <optional>
#include <span>
#include <string>
#include <utility>
#include <vector>

#include "../config.hpp"
#include "../extraction/error.hpp"

namespace nondim {

/// \brief What made a fit impossible.
enum class fit_fault {
  shape,           ///< columns of different lengths, or options that do not match the columns
  bad_value,       ///< a value that is zero, negative, NaN or infinite (it has no logarithm)
  too_few_rows,    ///< no more rows than parameters: no residual to estimate the scatter from
  singular_design  ///< a group is a product of powers of the others in the data (two proportional groups)
};

/// \brief A fit that cannot be made from its data: `what()` is one sentence beginning
/// `nondim:` that says what and where (row and column); `variable()` is the column's name.
class fit_error : public analysis_error {
 public:
  fit_error(const std::string& what, fit_fault fault, std::string column = {},
            std::optional<std::size_t> row = std::nullopt)
      : analysis_error(what, std::move(column)), fault_(fault), row_(row) {}

  [[nodiscard]] fit_fault fault() const noexcept { return fault_; }
  /// \brief The column the fault concerns (its name); empty when none does.
  [[nodiscard]] const std::string& column() const noexcept { return variable(); }
  /// \brief The 0-based index of the row the fault concerns, when one does.
  [[nodiscard]] std::optional<std::size_t> row() const noexcept { return row_; }

 private:
  fit_fault fault_;
  std::optional<std::size_t> row_;
};

/// \brief One column of data: a group's values over the rows, and its name for reports.
struct fit_column {
  std::string name;
  std::span<const double> values;
};

/// \brief The data of a fit: the dependent group and the others, all of the same length.
struct fit_input {
  fit_column dependent;
  std::vector<fit_column> predictors;
  /// Per predictor: an exponent held at this value (`--fix Pr=1/3`), or empty to fit it.
  /// Empty, or one entry per predictor.
  std::vector<std::optional<double>> fixed;
  /// Per row: the relative standard uncertainty u(Π₀)/Π₀ of the dependent group, which is
  /// the standard uncertainty of ln Π₀; the rows are then weighted by 1/u². Empty: unweighted.
  std::span<const double> relative_uncertainty;
};

/// \brief Settings of a fit.
struct fit_options {
  double confidence = 0.95;  ///< of the intervals
  /// |externally studentised residual| above which a row is flagged (common practice, no
  /// source: 3 is the usual rule of thumb for a residual of a normal sample)
  double outlier_limit = 3.0;
  /// A column whose largest value exceeds its smallest by no more than this relative
  /// amount is constant over the data: it is reported, not fitted.
  double constant_tolerance = 1e-9;
};

/// \brief An estimate with its standard error and confidence interval.
struct fit_estimate {
  double value = 0.0;
  double std_error = 0.0;
  double low = 0.0;   ///< lower end of the confidence interval
  double high = 0.0;  ///< upper end
};

/// \brief The exponent of one group that varies over the data (fitted or held).
struct fit_term {
  std::string name;
  std::size_t column = 0;  ///< index into `fit_input::predictors`
  fit_estimate exponent;   ///< a held exponent has standard error 0 and the interval [a, a]
  bool fixed = false;
};

/// \brief A group constant over the data: its value (the mean of its logarithm), not fitted.
struct fit_constant {
  std::string name;
  std::size_t column = 0;
  double value = 0.0;
};

/// \brief The smallest and largest value of a group in the data.
struct fit_range {
  std::string name;
  double min = 0.0;
  double max = 0.0;
};

/// \brief A flagged row: its 0-based index and externally studentised residual.
struct fit_outlier {
  std::size_t row = 0;
  double studentized = 0.0;
};

/// \brief The result of `fit_power_law`.
struct fit_result {
  std::size_t n = 0;           ///< rows
  std::size_t parameters = 0;  ///< ln C and the fitted exponents
  std::size_t dof = 0;         ///< n - parameters
  bool weighted = false;
  double confidence = 0.95;
  double t_quantile = 0.0;  ///< Student's t at (1 + confidence)/2 with `dof` degrees of freedom

  fit_estimate log_coefficient;  ///< ln C, with a symmetric interval
  fit_estimate coefficient;      ///< C = exp(ln C); std_error by the delta method, interval exp of ln C's
  std::vector<fit_term> terms;   ///< the groups that vary, in the input's order
  std::vector<fit_constant> constant;
  std::vector<double> exponents;  ///< per predictor: its exponent, 0 for a constant group

  double r2 = 0.0;            ///< of the fit in the logarithms, about the (weighted) mean of ln Π₀
  double residual_sd = 0.0;   ///< standard deviation of the (weighted) residuals in ln Π₀
  double rms_relative = 0.0;  ///< root mean square of (predicted − measured)/measured
  double max_relative = 0.0;  ///< largest |predicted − measured|/measured
  std::size_t max_relative_row = 0;
  double within_10 = 0.0;  ///< share of rows with |relative deviation| <= 10 %
  double within_20 = 0.0;  ///< the same for 20 %

  std::vector<fit_range> ranges;  ///< the dependent group first, then every predictor
  std::vector<fit_outlier> outliers;

  /// \brief C · Π Πᵢ^aᵢ for the values of every predictor (constant ones are ignored: C
  /// holds them).
  [[nodiscard]] double predict(std::span<const double> predictor_values) const;
};

/// \brief Fits `Π₀ = C · Π₁^a₁ · … · Πₖ^aₖ` by least squares on `ln Π₀ = ln C + Σ aᵢ ln Πᵢ`
/// (weighted by 1/u² with the rows' relative uncertainties), through a column-pivoting
/// Householder QR. Standard errors from the residual variance s² = Σ w e² / (n − p);
/// intervals est ± t s.e. with Student's t at n − p degrees of freedom.
/// \throws fit_error naming row and column: a value ≤ 0, NaN or infinite (fault
///         `bad_value`); no more rows than parameters (`too_few_rows`); groups that are
///         products of powers of each other in the data (`singular_design`); columns of
///         different lengths (`shape`).
fit_result fit_power_law(const fit_input& data, const fit_options& options = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "fit.ipp"
#endif
