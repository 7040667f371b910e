#pragma once
/// \file fit_data.hpp
/// \brief `nondim fit` without its output: the groups of every row of a CSV file, the
/// fit of the dependent group as a product of powers of the others, and its views (text,
/// Markdown, LaTeX, JSON) and plot.

#include <optional>
#include <string>
#include <vector>

#include <nondim/data.hpp>

#include "csv_table.hpp"
#include "problem_input.hpp"

namespace nondim::tool {

/// \brief A fit and what its views need.
struct fit_report {
  std::string title;
  std::string data_path;
  nondim::analysis analysis;
  std::vector<std::string> symbols;        ///< per group, ASCII: "Nu", "Re", "Pi3"
  std::vector<std::string> symbols_utf8;   ///< per group: "Nu", "Π3"
  std::vector<std::string> symbols_latex;  ///< per group: "\mathrm{Nu}", "\Pi_{3}"
  fit_result result;
  std::vector<std::size_t> lines;           ///< file line of each data row
  std::vector<std::vector<double>> groups;  ///< groups[g][row]
  std::vector<std::string> regime_notes;    ///< sentences about the regimes the data span
};

/// \brief Reads the groups of every row and fits them.
/// \param fixes "SYMBOL=EXPONENT" (`Pr=1/3`, `Pi2=0.5`)
/// \throws input_error naming file, line, row and column.
fit_report fit_from_table(problem_input& in, const csv_numbers& table, const std::vector<std::string>& fixes);

std::string fit_text(const fit_report& r);
std::string fit_markdown(const fit_report& r);
std::string fit_latex(const fit_report& r);
std::string fit_json(const fit_report& r);

/// \brief Draws the collapse into `path` (.svg, .pdf or .png) with gnuplot, and writes the
/// data (`.dat`) and the script (`.gp`) beside it.
/// \throws input_error for another extension, when gnuplot is not installed (saying what
///         to install), or when it fails.
void fit_plot(const fit_report& r, const std::string& path);

}  // namespace nondim::tool
