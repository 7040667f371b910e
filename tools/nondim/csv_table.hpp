#pragma once
/// \file csv_table.hpp
/// \brief Numeric CSV files (RFC 4180, read with libcsv): a header row of column names and
/// rows of numbers, kept column by column, with the line of every fault.

#include <cstddef>
#include <string>
#include <string_view>
#include <vector>

namespace nondim::tool {

/// \brief A CSV file of numbers: the header's names and one vector of values per column.
struct csv_numbers {
  std::string path;  ///< as given, for messages
  std::vector<std::string> header;
  std::vector<std::vector<double>> columns;  ///< columns[c][r]: data row r (0-based) of column c
  std::vector<std::size_t> lines;            ///< the file line where each data row starts (1-based)

  [[nodiscard]] std::size_t rows() const noexcept { return lines.size(); }
  /// \brief "PATH:LINE: row R, column C 'NAME': " for the data row `row` (0-based) and column `column`.
  [[nodiscard]] std::string at(std::size_t row, std::size_t column) const;
};

/// \brief Reads CSV text whose first record names the columns and whose other records
/// hold one finite number per column; `path` is used in messages only.
/// \throws input_error naming the line, row and column: a cell that is not a number,
///         an empty cell, NaN or infinity, a record with too many or too few cells, a
///         header cell that is empty or repeated, quoting that breaks RFC 4180, no header.
csv_numbers parse_csv_numbers(std::string_view text, const std::string& path);

/// \brief `parse_csv_numbers` of the file at `path`.
/// \throws input_error when the file cannot be read, or as `parse_csv_numbers`.
csv_numbers load_csv_numbers(const std::string& path);

}  // namespace nondim::tool
