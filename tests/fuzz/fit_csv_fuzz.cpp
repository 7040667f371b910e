// libFuzzer target: the program's CSV reader (tools/nondim/csv_table.cpp, libcsv) on any
// bytes, then, as `nondim fit` does with the groups of the rows, the power-law fit of the
// first column on the others. Allowed outcomes: a table whose columns all have one finite
// value per row, then a fit with no NaN in it, or an input_error / fit_error whose message
// begins "nondim: ".
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <string_view>

#include <nondim/data.hpp>

#include "csv_table.hpp"
#include "fuzz_invariants.hpp"
#include "messages.hpp"

namespace {

using nondim_fuzz::require;

bool has_prefix(const char* what) {
  return std::string_view(what).rfind("nondim: ", 0) == 0;
}

void check_estimate(const nondim::fit_estimate& e) {
  require(!std::isnan(e.value) && !std::isnan(e.std_error) && !std::isnan(e.low) && !std::isnan(e.high));
  require(e.std_error >= 0.0);
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  nondim::tool::csv_numbers table;
  try {
    table = nondim::tool::parse_csv_numbers(text, "fuzz.csv");
  } catch (const nondim::tool::input_error& e) {
    require(has_prefix(e.what()));
    return 0;
  }
  require(!table.header.empty());
  require(table.columns.size() == table.header.size());
  for (const auto& column : table.columns) {
    require(column.size() == table.rows());
    for (const double x : column) require(std::isfinite(x));
  }
  if (table.columns.size() < 2) return 0;
  nondim::fit_input in;
  in.dependent = {table.header[0], table.columns[0]};
  for (std::size_t c = 1; c < table.columns.size(); ++c) in.predictors.push_back({table.header[c], table.columns[c]});
  try {
    const nondim::fit_result r = nondim::fit_power_law(in);
    require(r.n == table.rows() && r.dof + r.parameters == r.n && r.dof >= 1);
    check_estimate(r.log_coefficient);
    for (const auto& t : r.terms) check_estimate(t.exponent);
    require(!std::isnan(r.r2) && !std::isnan(r.rms_relative) && !std::isnan(r.max_relative));
    require(r.within_10 >= 0.0 && r.within_10 <= r.within_20 && r.within_20 <= 1.0);
    for (const auto& o : r.outliers) require(o.row < r.n && std::isfinite(o.studentized));
  } catch (const nondim::fit_error& e) {
    require(has_prefix(e.what()));
    if (e.row()) require(*e.row() < table.rows());
  }
  return 0;
}
