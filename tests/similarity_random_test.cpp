// Properties of plan_similarity over random problems, checked with Eigen independently of
// the solver: (1) when the model values hidden from the plan are determined by the groups,
// the plan recovers them (model values built from a null vector of the exponent matrix,
// Eigen's FullPivLU kernel); (2) when there are more groups than unknowns, the group
// log-ratios satisfy the normal equations of least squares, A^T (A s - b) = 0; (3) the
// priority groups of a consistent priority set match exactly and the other residuals
// are orthogonal to the null space of the priority rows.
#include <nondim/similarity.hpp>

#include <doctest/doctest.h>

#include <Eigen/Dense>
#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <optional>
#include <random>
#include <string>
#include <vector>

using namespace nondim;

namespace {

struct random_case {
  similarity_problem problem;
  Eigen::MatrixXd e;                 // independent groups x (variables but the dependent one)
  std::vector<double> truth;         // model values that match every group, by variable 1..m
  std::vector<std::size_t> unknown;  // variable indices (1..m) left for the plan to find
};

// "x3": appended, not `x_name(j)`, which trips a false GCC 12 -Wrestrict at -O3
std::string x_name(std::size_t j) {
  std::string s = "x";
  s += std::to_string(j);
  return s;
}

Eigen::Index idx(std::size_t i) {
  return static_cast<Eigen::Index>(i);
}

// m variables besides the dependent one, g independent groups over them.
std::optional<random_case> make_case(std::mt19937& rng, std::size_t m, std::size_t g, std::size_t unknowns) {
  std::uniform_int_distribution<int> exponent(-3, 3);
  std::uniform_real_distribution<double> log_value(-3.0, 3.0);
  std::uniform_real_distribution<double> coefficient(-1.0, 1.0);
  random_case c;
  c.e.resize(idx(g), idx(m));
  for (Eigen::Index k = 0; k < c.e.rows(); ++k)
    for (Eigen::Index j = 0; j < c.e.cols(); ++j) c.e(k, j) = exponent(rng);
  const Eigen::FullPivLU<Eigen::MatrixXd> lu(c.e);
  if (static_cast<std::size_t>(lu.rank()) != g) return std::nullopt;
  const Eigen::MatrixXd kernel = lu.kernel();
  Eigen::VectorXd r = Eigen::VectorXd::Zero(idx(m));
  if (g < m) {
    Eigen::VectorXd w(kernel.cols());
    for (Eigen::Index i = 0; i < w.size(); ++i) w(i) = coefficient(rng);
    r = kernel * w;
  }
  auto& p = c.problem;
  p.add(similarity_variable{.name = "y"});
  std::vector<std::size_t> order;
  for (std::size_t j = 1; j <= m; ++j) order.push_back(j);
  std::shuffle(order.begin(), order.end(), rng);
  c.unknown.assign(order.begin(), order.begin() + static_cast<std::ptrdiff_t>(unknowns));
  c.truth.assign(m + 1, 0.0);
  for (std::size_t j = 1; j <= m; ++j) {
    const double proto = std::exp(log_value(rng));
    c.truth[j] = proto * std::exp(r(idx(j - 1)));
    similarity_variable v{.name = x_name(j), .prototype = proto};
    bool hidden = false;
    for (auto u : c.unknown) hidden = hidden || u == j;
    if (!hidden) v.model = c.truth[j];
    p.add(std::move(v));
  }
  std::vector<std::int64_t> dep(m + 1, 0);
  dep[0] = 1;
  for (std::size_t j = 1; j <= m; ++j) dep[j] = exponent(rng);
  p.add_group(dep);
  for (std::size_t k = 0; k < g; ++k) {
    std::vector<std::int64_t> row(m + 1, 0);
    for (std::size_t j = 1; j <= m; ++j) row[j] = static_cast<std::int64_t>(c.e(idx(k), idx(j - 1)));
    p.add_group(row);
  }
  return c;
}

// The columns of e for the unknowns.
Eigen::MatrixXd unknown_columns(const random_case& c) {
  Eigen::MatrixXd a(c.e.rows(), idx(c.unknown.size()));
  for (std::size_t u = 0; u < c.unknown.size(); ++u) a.col(idx(u)) = c.e.col(idx(c.unknown[u] - 1));
  return a;
}

}  // namespace

TEST_SUITE("similarity random") {
  TEST_CASE("a determined plan recovers the hidden model values") {
    std::mt19937 rng(20261201);
    int checked = 0;
    for (int trial = 0; trial < 300; ++trial) {
      const std::size_t m = 3 + static_cast<std::size_t>(trial % 6);
      const std::size_t g = 1 + static_cast<std::size_t>(trial) % (m - 1);
      auto c = make_case(rng, m, g, g);
      if (!c) continue;
      const Eigen::MatrixXd a = unknown_columns(*c);
      if (Eigen::FullPivLU<Eigen::MatrixXd>(a).rank() != a.cols()) continue;  // not determined
      const auto plan = plan_similarity(c->problem);
      CHECK(plan.status == similarity_status::exact);
      for (auto j : c->unknown) {
        const auto found = plan.model(x_name(j));
        REQUIRE(found);
        CHECK(*found == doctest::Approx(c->truth[j]).epsilon(1e-8));
      }
      CHECK(plan.dependent.exact);
      ++checked;
    }
    CHECK(checked > 100);
  }

  TEST_CASE("a rank-deficient choice of unknowns is underdetermined and lists as many free values as missing") {
    std::mt19937 rng(7);
    int checked = 0;
    for (int trial = 0; trial < 300; ++trial) {
      const std::size_t m = 4 + static_cast<std::size_t>(trial % 5);
      const std::size_t g = 1 + static_cast<std::size_t>(trial) % (m - 2);
      auto c = make_case(rng, m, g, g + 1);  // one unknown more than groups
      if (!c) continue;
      bool in_some_group = true;  // a hidden variable in no group at all is unused, not free
      for (auto j : c->unknown) {
        bool any = false;
        for (const auto& grp : c->problem.groups) any = any || grp.exponents[j] != 0;
        in_some_group = in_some_group && any;
      }
      if (!in_some_group) continue;
      const Eigen::MatrixXd a = unknown_columns(*c);
      const auto rank = static_cast<std::size_t>(Eigen::FullPivLU<Eigen::MatrixXd>(a).rank());
      const auto plan = plan_similarity(c->problem);
      CHECK(plan.status == similarity_status::underdetermined);
      CHECK(plan.rank == rank);
      CHECK(plan.free.size() == c->unknown.size() - rank);
      // the hidden values are consistent: every group can match
      CHECK(plan.unmatched.empty());
      // fixing the free ones at their true values leaves a determined plan that recovers the rest
      auto fixed = c->problem;
      for (const auto& name : plan.free) fixed.variable(name).model = c->truth[std::stoul(name.substr(1))];
      const auto again = plan_similarity(fixed);
      CHECK(again.status == similarity_status::exact);
      for (auto j : c->unknown) {
        const auto found = again.model(x_name(j));
        REQUIRE(found);
        CHECK(*found == doctest::Approx(c->truth[j]).epsilon(1e-8));
      }
      ++checked;
    }
    CHECK(checked > 100);
  }

  TEST_CASE("an overdetermined plan satisfies the normal equations of least squares") {
    std::mt19937 rng(99);
    std::normal_distribution<double> noise(0.0, 0.5);
    int checked = 0;
    for (int trial = 0; trial < 300; ++trial) {
      const std::size_t m = 4 + static_cast<std::size_t>(trial % 5);
      const std::size_t g = 2 + static_cast<std::size_t>(trial) % (m - 2);
      auto c = make_case(rng, m, g, g - 1);  // fewer unknowns than groups
      if (!c) continue;
      const Eigen::MatrixXd a = unknown_columns(*c);
      if (Eigen::FullPivLU<Eigen::MatrixXd>(a).rank() != a.cols()) continue;
      // disturb the fixed model values so that the groups conflict
      for (std::size_t j = 1; j < c->problem.variables.size(); ++j)
        if (c->problem.variables[j].model) *c->problem.variables[j].model *= std::exp(noise(rng));
      const auto plan = plan_similarity(c->problem);
      CHECK(plan.status != similarity_status::underdetermined);
      Eigen::VectorXd residual(c->e.rows());
      for (Eigen::Index k = 0; k < residual.size(); ++k)
        residual(k) = std::log(*plan.groups[static_cast<std::size_t>(k) + 1].ratio);
      CHECK((a.transpose() * residual).norm() < 1e-9 * (1.0 + residual.norm()));
      ++checked;
    }
    CHECK(checked > 100);
  }

  TEST_CASE("consistent priority groups match exactly and the rest are least squares within them") {
    std::mt19937 rng(4242);
    std::normal_distribution<double> noise(0.0, 0.5);
    int checked = 0;
    for (int trial = 0; trial < 300; ++trial) {
      const std::size_t m = 5 + static_cast<std::size_t>(trial % 4);
      const std::size_t g = 3 + static_cast<std::size_t>(trial) % (m - 3);
      auto c = make_case(rng, m, g, g - 1);
      if (!c) continue;
      const Eigen::MatrixXd a = unknown_columns(*c);
      if (Eigen::FullPivLU<Eigen::MatrixXd>(a).rank() != a.cols()) continue;
      if (a.row(0).norm() == 0.0) continue;  // the priority group has no unknown: nothing to match it with
      for (std::size_t j = 1; j < c->problem.variables.size(); ++j)
        if (c->problem.variables[j].model) *c->problem.variables[j].model *= std::exp(noise(rng));
      c->problem.priority = {1};  // the first independent group (the dependent's is group 0)
      const auto plan = plan_similarity(c->problem);
      CHECK(plan.priority_matched);
      CHECK(plan.groups[1].matched);
      // Lagrange conditions: the rest's residuals are orthogonal to the null space of the priority row
      const Eigen::MatrixXd ap = a.topRows(1);
      const Eigen::MatrixXd ar = a.bottomRows(a.rows() - 1);
      const Eigen::MatrixXd n = Eigen::FullPivLU<Eigen::MatrixXd>(ap).kernel();
      Eigen::VectorXd residual(ar.rows());
      for (Eigen::Index k = 0; k < residual.size(); ++k)
        residual(k) = std::log(*plan.groups[static_cast<std::size_t>(k) + 2].ratio);
      if (n.cols() > 0 && ap.norm() > 0)
        CHECK((n.transpose() * ar.transpose() * residual).norm() < 1e-9 * (1.0 + residual.norm()));
      ++checked;
    }
    CHECK(checked > 100);
  }
}
