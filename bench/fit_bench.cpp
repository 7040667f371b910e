// nondim fit at scale: 10^6 rows of 7 columns (the dependent group and six others), read
// from a CSV file with the program's reader (libcsv), then fitted as a power law in the
// logarithms. Target (issue 17): reading and fitting within 3x of reading alone; memory
// linear in the rows. Prints `summary: fit/read = R` for bench/run_all.sh.
#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdio>
#include <filesystem>
#include <fstream>
#include <random>
#include <string>
#include <vector>

#include <nondim/data.hpp>

#include "csv_table.hpp"

namespace {

double seconds_since(std::chrono::steady_clock::time_point t0) {
  return std::chrono::duration<double>(std::chrono::steady_clock::now() - t0).count();
}

}  // namespace

int main(int argc, char** argv) {
  // a row count may be given; run_all.sh's --benchmark_* options are ignored
  std::size_t rows = 1000000;
  for (int i = 1; i < argc; ++i)
    if (argv[i][0] != '-') rows = std::stoul(argv[i]);
  const std::string path = (std::filesystem::temp_directory_path() / "nondim_fit_bench.csv").string();
  {
    std::mt19937_64 random(42);
    std::uniform_real_distribution<double> ln_x(0.0, 8.0);
    std::normal_distribution<double> noise(0.0, 0.05);
    std::ofstream out(path);
    out << "Pi0,Pi1 [1],Pi2,Pi3,Pi4,Pi5,Pi6\n";
    const double a[6] = {0.8, 0.33, -0.2, 0.1, 0.05, -0.4};
    char cell[32];
    for (std::size_t i = 0; i < rows; ++i) {
      double x[6];
      double ln_y = std::log(0.023) + noise(random);
      for (int j = 0; j < 6; ++j) {
        x[j] = std::exp(ln_x(random));
        ln_y += a[j] * std::log(x[j]);
      }
      std::snprintf(cell, sizeof cell, "%.6g", std::exp(ln_y));
      out << cell;
      for (const double v : x) {
        std::snprintf(cell, sizeof cell, ",%.6g", v);
        out << cell;
      }
      out << '\n';
    }
  }
  double read_best = 1e300;
  double fit_best = 1e300;
  for (int repeat = 0; repeat < 3; ++repeat) {
    auto t0 = std::chrono::steady_clock::now();
    const nondim::tool::csv_numbers table = nondim::tool::load_csv_numbers(path);
    read_best = std::min(read_best, seconds_since(t0));
    t0 = std::chrono::steady_clock::now();
    nondim::fit_input in;
    in.dependent = {table.header[0], table.columns[0]};
    for (std::size_t c = 1; c < table.columns.size(); ++c) in.predictors.push_back({table.header[c], table.columns[c]});
    const nondim::fit_result r = nondim::fit_power_law(in);
    fit_best = std::min(fit_best, seconds_since(t0));
    if (repeat == 0)
      std::printf("%zu rows x 7 columns: exponent of Pi1 %.4f (0.8), R^2 %.4f\n", r.n, r.terms[0].exponent.value, r.r2);
  }
  std::filesystem::remove(path);
  std::printf("read CSV: %.3f s; fit: %.3f s; read + fit: %.3f s (best of 3)\n", read_best, fit_best,
              read_best + fit_best);
  std::printf("summary: fit/read = %.2f ((read + fit)/read = %.2f, target <= 3)\n", fit_best / read_best,
              (read_best + fit_best) / read_best);
  return 0;
}
