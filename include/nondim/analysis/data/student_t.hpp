#pragma once
/// \file student_t.hpp
/// \brief Student's t distribution: its distribution function through the regularized
/// incomplete beta function, and its quantiles by safeguarded Newton steps, for the
/// confidence intervals of fitted parameters.

#include <cmath>
#include <limits>
#include <stdexcept>
#include <string>

namespace nondim {

namespace detail {

/// Continued fraction of the incomplete beta function (the modified Lentz method; the
/// expansion of Abramowitz and Stegun 26.5.8), valid for x < (a + 1) / (a + b + 2).
inline double beta_continued_fraction(double a, double b, double x) {
  constexpr double tiny = 1e-300;
  constexpr double eps = 1e-16;
  double c = 1.0;
  double d = 1.0 - (a + b) * x / (a + 1.0);
  if (std::abs(d) < tiny) d = tiny;
  d = 1.0 / d;
  double h = d;
  for (int m = 1; m <= 10000; ++m) {
    const double m2 = 2.0 * m;
    double aa = m * (b - m) * x / ((a + m2 - 1.0) * (a + m2));
    d = 1.0 + aa * d;
    if (std::abs(d) < tiny) d = tiny;
    c = 1.0 + aa / c;
    if (std::abs(c) < tiny) c = tiny;
    d = 1.0 / d;
    h *= d * c;
    aa = -(a + m) * (a + b + m) * x / ((a + m2) * (a + m2 + 1.0));
    d = 1.0 + aa * d;
    if (std::abs(d) < tiny) d = tiny;
    c = 1.0 + aa / c;
    if (std::abs(c) < tiny) c = tiny;
    d = 1.0 / d;
    const double step = d * c;
    h *= step;
    if (std::abs(step - 1.0) < eps) break;
  }
  return h;
}

}  // namespace detail

/// \brief The regularized incomplete beta function I_x(a, b) for a, b > 0 and 0 <= x <= 1.
/// \throws std::domain_error outside that domain.
inline double regularized_incomplete_beta(double a, double b, double x) {
  if (!(a > 0.0) || !(b > 0.0) || !(x >= 0.0 && x <= 1.0) || !std::isfinite(a) || !std::isfinite(b))
    throw std::domain_error("nondim: the incomplete beta function needs a > 0, b > 0 and 0 <= x <= 1");
  if (x == 0.0 || x == 1.0) return x;
  const double log_front = std::lgamma(a + b) - std::lgamma(a) - std::lgamma(b) + a * std::log(x) + b * std::log1p(-x);
  const double front = std::exp(log_front);
  // the continued fraction converges fast only on one side; the other by symmetry
  if (x < (a + 1.0) / (a + b + 2.0)) return front * detail::beta_continued_fraction(a, b, x) / a;
  return 1.0 - front * detail::beta_continued_fraction(b, a, 1.0 - x) / b;
}

/// \brief P(T <= t) for Student's t with `dof` > 0 degrees of freedom:
/// for t < 0, I_{dof/(dof+t^2)}(dof/2, 1/2) / 2.
inline double student_t_cdf(double t, double dof) {
  if (std::isnan(t)) throw std::domain_error("nondim: the t distribution at NaN");
  if (std::isinf(t)) return t > 0 ? 1.0 : 0.0;
  const double tail = 0.5 * regularized_incomplete_beta(dof / 2.0, 0.5, dof / (dof + t * t));
  return t < 0 ? tail : 1.0 - tail;
}

/// \brief The quantile t_p of Student's t with `dof` > 0 degrees of freedom: P(T <= t_p) = p.
///
/// Exact closed forms for 1 and 2 degrees of freedom; otherwise Newton steps on the
/// distribution function from a normal start, each kept inside a bracket that bisection
/// narrows, so that it converges for every p in (0, 1).
/// \throws std::domain_error unless 0 < p < 1 and dof > 0.
inline double student_t_quantile(double p, double dof) {
  if (!(p > 0.0 && p < 1.0) || !(dof > 0.0) || !std::isfinite(dof))
    throw std::domain_error("nondim: a t quantile needs 0 < p < 1 and degrees of freedom > 0");
  constexpr double pi = 3.14159265358979323846;
  if (dof == 1.0) return std::tan(pi * (p - 0.5));
  if (dof == 2.0) return (2.0 * p - 1.0) / std::sqrt(2.0 * p * (1.0 - p));
  if (p == 0.5) return 0.0;
  // the distribution is symmetric: solve in the upper tail
  const bool lower = p < 0.5;
  const double q = lower ? 1.0 - p : p;
  double low = 0.0;
  double high = 1.0;
  while (student_t_cdf(high, dof) < q) {
    low = high;
    high *= 2.0;
    if (high > 1e300) return lower ? -high : high;
  }
  // a start from the normal quantile (a rational approximation is enough for a start)
  const double w = std::sqrt(-2.0 * std::log(1.0 - q));
  double t =
      w - (2.515517 + 0.802853 * w + 0.010328 * w * w) / (1.0 + 1.432788 * w + 0.189269 * w * w + 0.001308 * w * w * w);
  if (!(t > low && t < high)) t = 0.5 * (low + high);
  const double log_norm = std::lgamma((dof + 1.0) / 2.0) - std::lgamma(dof / 2.0) - 0.5 * std::log(dof * pi);
  for (int i = 0; i < 200; ++i) {
    const double f = student_t_cdf(t, dof) - q;
    if (f == 0.0) break;
    if (f < 0.0)
      low = t;
    else
      high = t;
    const double density = std::exp(log_norm - (dof + 1.0) / 2.0 * std::log1p(t * t / dof));
    double next = t - f / density;
    if (!(next > low && next < high)) next = 0.5 * (low + high);  // Newton left the bracket: bisect
    if (std::abs(next - t) <= 1e-15 * std::abs(t) || high - low <= 1e-15 * high) {
      t = next;
      break;
    }
    t = next;
  }
  return lower ? -t : t;
}

}  // namespace nondim
