// Exact extraction against floating point: analyze() and the exact elimination on the 28
// textbook problems of tests/textbook_problems.hpp and on random 7 x 20 and 7 x 30 dimension
// matrices, against Eigen's JacobiSVD and FullPivLU::kernel() on the same matrices; the
// elimination in checked int64 against the same elimination in cpp_rational only; and the
// growth of analyze() with the count of variables (10, 30, 100, 300).
//
//   build/bench/bench/analyze_bench   # the usual table, then the ratio lines and the growth exponents
//
// Targets (DESIGN.md, "Performance targets"): analyze() within 3x of a bare JacobiSVD of the
// same matrix; the elimination within 2x of FullPivLU's null space; checked int64 at least
// 10x faster than cpp_rational. Every benchmark of a set runs over all its matrices in one
// iteration, so the ratios compare the same work.
//
// Random matrices: entries drawn from std::mt19937_64 (its output sequence is fixed by the
// C++ standard, so the matrices are the same with every standard library), half of them 0,
// the others -3..3 without 0: exponents of the size physical quantities have.
// Before timing, main() checks every matrix: the exact rank equals FullPivLU's and the SVD's,
// every exact null vector gives A v = 0 in exact integers, and int64 and cpp_rational give
// the same null space.
#include <benchmark/benchmark.h>
#include <nondim/analysis/extraction/analyze.hpp>
#include <nondim/analysis/extraction/detail/exact.hpp>
#include <nondim/analysis/extraction/null_space.hpp>
#include <nondim/analysis/extraction/problem.hpp>

#include <Eigen/LU>
#include <Eigen/SVD>

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstdio>
#include <map>
#include <random>
#include <string>
#include <vector>

#include <time.h>

#include "textbook_problems.hpp"

using namespace nondim;

namespace {

/// One matrix in every form the benchmarks take: the problem for analyze(), the exact matrix
/// for the elimination, the double matrix for Eigen.
struct case_data {
  problem p;
  dimension_matrix exact;
  Eigen::MatrixXd dense;
};

case_data make_case(const std::vector<std::string>& names, const std::vector<dimension>& dims) {
  case_data c;
  for (std::size_t j = 0; j < dims.size(); ++j) c.p.add(names[j], dims[j]);
  c.exact = c.p.matrix();
  c.dense.resize(static_cast<Eigen::Index>(base_dimension_count), static_cast<Eigen::Index>(dims.size()));
  for (std::size_t j = 0; j < dims.size(); ++j)
    for (std::size_t i = 0; i < base_dimension_count; ++i)
      c.dense(static_cast<Eigen::Index>(i), static_cast<Eigen::Index>(j)) = dims[j][i].to_double();
  return c;
}

std::vector<case_data> textbook_cases() {
  std::vector<case_data> out;
  for (const auto& tp : textbook::all_problems) {
    std::vector<std::string> names;
    std::vector<dimension> dims;
    for (const auto& v : tp.variables) {
      names.emplace_back(v.name);
      dims.push_back(v.dim);
    }
    out.push_back(make_case(names, dims));
  }
  return out;
}

/// `count` random 7 x `n` matrices, variables x1..xn.
std::vector<case_data> random_cases(std::size_t n, std::size_t count, std::uint64_t seed) {
  std::mt19937_64 gen(seed);
  std::vector<case_data> out;
  std::vector<std::string> names;
  for (std::size_t j = 0; j < n; ++j) names.push_back("x" + std::to_string(j + 1));
  for (std::size_t k = 0; k < count; ++k) {
    std::vector<dimension> dims(n);
    for (auto& d : dims) {
      std::array<rational, base_dimension_count> e{};
      for (auto& x : e) {
        const std::uint64_t r = gen() % 12;  // 0..5: zero; 6..11: -3 -2 -1 1 2 3
        x = r < 6 ? 0 : (r < 9 ? static_cast<std::int64_t>(r) - 9 : static_cast<std::int64_t>(r) - 8);
      }
      d = dimension(e);
    }
    out.push_back(make_case(names, dims));
  }
  return out;
}

// ---- the sets ----------------------------------------------------------------------------

constexpr std::size_t random_count = 16;  // matrices per random shape
const std::vector<std::size_t> growth_sizes{10, 30, 100, 300};

std::map<std::string, std::vector<case_data>>& sets() {
  static std::map<std::string, std::vector<case_data>> s = [] {
    std::map<std::string, std::vector<case_data>> m;
    m["textbook"] = textbook_cases();
    m["random7x20"] = random_cases(20, random_count, 20261202);
    m["random7x30"] = random_cases(30, random_count, 20261203);
    for (std::size_t n : growth_sizes) m["growth" + std::to_string(n)] = random_cases(n, 1, 7000 + n);
    return m;
  }();
  return s;
}

// ---- the methods -------------------------------------------------------------------------

void run_analyze(const case_data& c) {
  analysis a = analyze(c.p);
  benchmark::DoNotOptimize(a.groups.data());
}
void run_analyze_named(const case_data& c) {
  options o;
  o.form = basis::named;
  analysis a = analyze(c.p, o);
  benchmark::DoNotOptimize(a.groups.data());
}
// singular values only, as analyze()'s own cross-check computes them
void run_svd(const case_data& c) {
  const Eigen::JacobiSVD<Eigen::MatrixXd> svd(c.dense);
  benchmark::DoNotOptimize(svd.singularValues().data());
}
// analyze()'s own SVD step alone (singular values and numerical rank, no groups to check)
void run_svd_check(const case_data& c) {
  const svd_check s = check_with_svd(c.exact, {}, 0);
  benchmark::DoNotOptimize(s.singular_values.data());
}
// with V: what a floating-point null space needs (its last columns)
void run_svd_v(const case_data& c) {
  const Eigen::JacobiSVD<Eigen::MatrixXd> svd(c.dense, Eigen::ComputeFullV);
  benchmark::DoNotOptimize(svd.matrixV().data());
}
void run_fullpivlu(const case_data& c) {
  const Eigen::FullPivLU<Eigen::MatrixXd> lu(c.dense);
  const Eigen::MatrixXd k = lu.kernel();
  benchmark::DoNotOptimize(k.data());
}
void run_elimination_int64(const case_data& c) {
  null_space_basis b = exact_null_space(c.exact, exact_arithmetic::int64);
  benchmark::DoNotOptimize(b.vectors.data());
}
void run_elimination_rational(const case_data& c) {
  null_space_basis b = exact_null_space(c.exact, exact_arithmetic::multiprecision);
  benchmark::DoNotOptimize(b.vectors.data());
}
// the reduction to echelon form alone (no conversion back to integers), in each field
template <class F>
void run_echelon(const case_data& c) {
  const std::size_t n = c.exact.cols();
  detail::exact_matrix<F> m(base_dimension_count, n);
  for (std::size_t j = 0; j < n; ++j)
    for (std::size_t i = 0; i < base_dimension_count; ++i) m(i, j) = detail::from_rational<F>(c.exact.columns()[j][i]);
  const std::vector<std::size_t> pivots = detail::reduce_to_echelon(m);
  benchmark::DoNotOptimize(pivots.data());
  benchmark::DoNotOptimize(m.a.data());
}

template <void (*Method)(const case_data&)>
void run_set(benchmark::State& state, const std::string& set) {
  const auto& cases = sets().at(set);
  for (auto _ : state)
    for (const auto& c : cases) Method(c);
  state.SetItemsProcessed(state.iterations() * static_cast<std::int64_t>(cases.size()));
}

void register_all() {
  struct method {
    const char* name;
    void (*fn)(benchmark::State&, const std::string&);
  };
  const std::vector<method> methods{
      {"analyze", run_set<run_analyze>},
      {"analyze_named", run_set<run_analyze_named>},
      {"svd", run_set<run_svd>},
      {"svd_v", run_set<run_svd_v>},
      {"svd_check", run_set<run_svd_check>},
      {"fullpivlu_kernel", run_set<run_fullpivlu>},
      {"elimination_int64", run_set<run_elimination_int64>},
      {"elimination_cpp_rational", run_set<run_elimination_rational>},
      {"echelon_int64", run_set<run_echelon<rational>>},
      {"echelon_cpp_rational", run_set<run_echelon<detail::big_rational>>},
  };
  for (const char* set : {"textbook", "random7x20", "random7x30"})
    for (const auto& m : methods)
      benchmark::RegisterBenchmark((std::string(set) + "/" + m.name).c_str(), m.fn, std::string(set))
          ->Unit(benchmark::kMicrosecond);
  for (const char* name : {"analyze", "elimination_int64", "svd"}) {
    const method* m = nullptr;
    for (const auto& x : methods)
      if (std::string(x.name) == name) m = &x;
    for (std::size_t n : growth_sizes)
      benchmark::RegisterBenchmark(("growth/" + std::string(name) + "/" + std::to_string(n)).c_str(), m->fn,
                                   "growth" + std::to_string(n))
          ->Unit(benchmark::kMicrosecond);
  }
}

// ---- checks before timing ----------------------------------------------------------------

/// A v = 0 in exact rationals.
bool annihilates(const dimension_matrix& a, const std::vector<std::int64_t>& v) {
  for (std::size_t i = 0; i < base_dimension_count; ++i) {
    rational s = 0;
    for (std::size_t j = 0; j < a.cols(); ++j) s += a(i, j) * rational(v[j]);
    if (!s.is_zero()) return false;
  }
  return true;
}

bool check_set(const std::string& set) {
  std::size_t bad = 0;
  std::size_t fallback = 0;
  for (const auto& c : sets().at(set)) {
    const null_space_basis b = exact_null_space(c.exact);
    const null_space_basis big = exact_null_space(c.exact, exact_arithmetic::multiprecision);
    if (b.multiprecision) ++fallback;
    const Eigen::FullPivLU<Eigen::MatrixXd> lu(c.dense);
    const analysis a = analyze(c.p);
    bool ok = b.vectors == big.vectors && b.rank == big.rank;
    ok = ok && static_cast<std::size_t>(lu.rank()) == b.rank && a.rank == b.rank && a.svd.agrees;
    ok = ok && b.vectors.size() == c.exact.cols() - b.rank;
    for (const auto& v : b.vectors) ok = ok && annihilates(c.exact, v);
    if (!ok) ++bad;
  }
  std::printf(
      "%-12s %2zu matrices: exact rank = FullPivLU rank = SVD rank, A v = 0 exactly, int64 = cpp_rational: %s%s\n",
      set.c_str(), sets().at(set).size(), bad == 0 ? "yes" : "NO",
      fallback > 0 ? " (some needed the cpp_rational fallback)" : "");
  return bad == 0 && fallback == 0;
}

// ---- the report --------------------------------------------------------------------------

/// Keeps the console table and remembers each benchmark's median CPU time.
class ratio_reporter : public benchmark::ConsoleReporter {
 public:
  void ReportRuns(const std::vector<Run>& runs) override {
    for (const auto& r : runs)
      if (r.run_type == Run::RT_Iteration || r.aggregate_name == "median")
        times_[r.run_name.str()] = r.GetAdjustedCPUTime();
    ConsoleReporter::ReportRuns(runs);
  }

  void print_summary() const {
    std::printf("\nratio of median CPU times (target in brackets):\n");
    for (const char* set : {"textbook", "random7x20", "random7x30"}) {
      const std::string s(set);
      line(s, "analyze", "svd", "(<= 3)");
      line(s, "analyze", "svd_v", "");
      line(s, "analyze_named", "svd", "");
      line(s, "svd_check", "svd", "");
      line(s, "elimination_int64", "fullpivlu_kernel", "(<= 2)");
      line(s, "elimination_cpp_rational", "elimination_int64", "(>= 10)");
      line(s, "echelon_cpp_rational", "echelon_int64", "");
    }
    std::printf("\nmedian CPU time per matrix, microseconds:\n");
    for (const char* set : {"textbook", "random7x20", "random7x30"}) {
      const std::string s(set);
      const double count = static_cast<double>(sets().at(s).size());
      std::string row;
      for (const char* m : {"analyze", "analyze_named", "svd", "svd_v", "svd_check", "fullpivlu_kernel",
                            "elimination_int64", "elimination_cpp_rational", "echelon_int64", "echelon_cpp_rational"}) {
        const auto t = times_.find(s + "/" + m);
        if (t == times_.end()) continue;
        char buf[96];
        std::snprintf(buf, sizeof buf, " %s %.3g", m, t->second / count);
        row += buf;
      }
      std::printf("  %-10s%s\n", set, row.c_str());
    }
    std::printf("\ngrowth with the count of variables n (median CPU time per call, microseconds):\n");
    for (const char* name : {"analyze", "elimination_int64", "svd"}) {
      std::vector<double> xs;
      std::vector<double> ys;
      std::string curve;
      for (std::size_t n : growth_sizes) {
        const auto t = times_.find("growth/" + std::string(name) + "/" + std::to_string(n));
        if (t == times_.end()) continue;
        xs.push_back(std::log(static_cast<double>(n)));
        ys.push_back(std::log(t->second));
        char buf[64];
        std::snprintf(buf, sizeof buf, " n=%zu %.3g", n, t->second);
        curve += buf;
      }
      if (xs.size() < 2) continue;
      // least-squares slope of log t against log n
      double mx = 0;
      double my = 0;
      for (std::size_t i = 0; i < xs.size(); ++i) {
        mx += xs[i];
        my += ys[i];
      }
      mx /= static_cast<double>(xs.size());
      my /= static_cast<double>(xs.size());
      double sxy = 0;
      double sxx = 0;
      for (std::size_t i = 0; i < xs.size(); ++i) {
        sxy += (xs[i] - mx) * (ys[i] - my);
        sxx += (xs[i] - mx) * (xs[i] - mx);
      }
      std::printf("summary: growth %-18s exponent %.2f (log-log slope over n = 10..300);%s\n", name, sxy / sxx,
                  curve.c_str());
    }
  }

 private:
  void line(const std::string& set, const char* a, const char* b, const char* target) const {
    const auto ta = times_.find(set + "/" + a);
    const auto tb = times_.find(set + "/" + b);
    if (ta == times_.end() || tb == times_.end()) return;
    std::printf("summary: %-10s %-24s / %-18s %7.2f %s\n", set.c_str(), a, b, ta->second / tb->second, target);
  }

  std::map<std::string, double> times_;
};

// ---- interleaved ratios --------------------------------------------------------------
// The machine is shared: Google Benchmark times one method after the other, so a change of
// load between them shows in their ratio. Here the two methods alternate (which goes first
// alternates too) in each of `rounds` rounds, each timed in thread CPU time over the whole
// set, and the median of the per-round ratios is reported.

double thread_seconds() {
  timespec ts{};
  clock_gettime(CLOCK_THREAD_CPUTIME_ID, &ts);
  return static_cast<double>(ts.tv_sec) + 1e-9 * static_cast<double>(ts.tv_nsec);
}

double time_set(void (*method)(const case_data&), const std::vector<case_data>& cases, int reps) {
  const double t0 = thread_seconds();
  for (int r = 0; r < reps; ++r)
    for (const auto& c : cases) method(c);
  return thread_seconds() - t0;
}

double interleaved_ratio(void (*a)(const case_data&), void (*b)(const case_data&), const std::vector<case_data>& cases,
                         int rounds) {
  // repetitions per round: about 2 ms of b
  int reps = 1;
  while (time_set(b, cases, reps) < 2e-3 && reps < (1 << 20)) reps *= 2;
  std::vector<double> ratios;
  for (int r = 0; r < rounds; ++r) {
    double ta = 0;
    double tb = 0;
    if (r % 2 == 0) {
      ta = time_set(a, cases, reps);
      tb = time_set(b, cases, reps);
    } else {
      tb = time_set(b, cases, reps);
      ta = time_set(a, cases, reps);
    }
    ratios.push_back(ta / tb);
  }
  std::sort(ratios.begin(), ratios.end());
  return ratios[ratios.size() / 2];
}

void print_interleaved(int rounds) {
  struct pair {
    const char* a_name;
    void (*a)(const case_data&);
    const char* b_name;
    void (*b)(const case_data&);
    const char* target;
  };
  const std::vector<pair> pairs{
      {"analyze", run_analyze, "svd", run_svd, "(<= 3)"},
      {"elimination_int64", run_elimination_int64, "fullpivlu_kernel", run_fullpivlu, "(<= 2)"},
      {"elimination_cpp_rational", run_elimination_rational, "elimination_int64", run_elimination_int64, "(>= 10)"},
      {"echelon_cpp_rational", run_echelon<detail::big_rational>, "echelon_int64", run_echelon<rational>, ""},
  };
  std::printf("\nratio interleaved, median of %d alternating rounds of thread CPU time (target in brackets):\n",
              rounds);
  for (const char* set : {"textbook", "random7x20", "random7x30"})
    for (const auto& p : pairs)
      std::printf("summary: interleaved %-10s %-24s / %-18s %7.2f %s\n", set, p.a_name, p.b_name,
                  interleaved_ratio(p.a, p.b, sets().at(set), rounds), p.target);
}

}  // namespace

int main(int argc, char** argv) {
  bool ok = true;
  for (const auto& [name, cases] : sets()) ok = check_set(name) && ok;
  register_all();
  benchmark::Initialize(&argc, argv);
  if (benchmark::ReportUnrecognizedArguments(argc, argv)) return 1;
  ratio_reporter reporter;
  benchmark::RunSpecifiedBenchmarks(&reporter);
  reporter.print_summary();
  print_interleaved(21);
  benchmark::Shutdown();
  return ok ? 0 : 1;
}
