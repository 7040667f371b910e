#include "csv_table.hpp"

#include <csv.h>

#include <charconv>
#include <cmath>
#include <filesystem>
#include <fstream>
#include <iterator>
#include <optional>
#include <sstream>

#include "messages.hpp"

namespace nondim::tool {

namespace {

/// What the libcsv callbacks build. They must not throw through the C library: the first
/// fault is kept and thrown once `csv_parse` has returned.
struct csv_state {
  csv_numbers* out = nullptr;
  std::size_t line = 1;         ///< the line the parser is in
  std::size_t record_line = 0;  ///< the line where the current record started; 0 between records
  std::size_t field = 0;        ///< cells of the current record so far
  bool header_done = false;
  std::optional<std::string> fault;
};

std::string shown(std::string_view cell) {
  std::string s(cell.substr(0, 40));
  for (char& c : s)
    if (static_cast<unsigned char>(c) < 0x20U) c = '?';
  return cell.size() > 40 ? s + "..." : s;
}

std::string position(const csv_state& st, std::size_t column) {
  const csv_numbers& t = *st.out;
  std::string s = t.path + ":" + std::to_string(st.record_line) + ": row " + std::to_string(t.lines.size() + 1);
  s += ", column " + std::to_string(column + 1);
  if (column < t.header.size()) s += " '" + t.header[column] + "'";
  return s + ": ";
}

/// A finite number filling the whole cell (`2`, `-1.5e3`, `+.5`), or the reason it is not one.
std::optional<std::string> read_number(std::string_view cell, double& x) {
  if (cell.empty()) return "the cell is empty";
  std::string_view digits = cell;
  if (digits.front() == '+') digits.remove_prefix(1);
  if (digits.empty()) return "'" + shown(cell) + "' is not a number";
  const auto [end, ec] = std::from_chars(digits.data(), digits.data() + digits.size(), x);
  if (ec == std::errc::result_out_of_range) return "'" + shown(cell) + "' is out of the range of a double";
  if (ec != std::errc() || end != digits.data() + digits.size() || (cell.front() == '+' && digits.front() == '-'))
    return "'" + shown(cell) + "' is not a number";
  if (std::isnan(x) || std::isinf(x)) return "'" + shown(cell) + "' is not a finite number";
  return std::nullopt;
}

void on_field(void* data, std::size_t length, void* state_ptr) {
  auto& st = *static_cast<csv_state*>(state_ptr);
  if (st.fault) return;
  if (st.record_line == 0) st.record_line = st.line;
  const std::string_view cell(static_cast<const char*>(data), data == nullptr ? 0 : length);
  csv_numbers& t = *st.out;
  if (!st.header_done) {
    if (cell.empty()) {
      st.fault = t.path + ":" + std::to_string(st.record_line) + ": header, column " + std::to_string(st.field + 1) +
                 ": the column has no name";
    } else {
      for (std::size_t c = 0; c < t.header.size(); ++c)
        if (t.header[c] == cell)
          st.fault = t.path + ":" + std::to_string(st.record_line) + ": header, column " +
                     std::to_string(st.field + 1) + ": '" + shown(cell) + "' is also the name of column " +
                     std::to_string(c + 1);
      t.header.emplace_back(cell);
      t.columns.emplace_back();
    }
  } else if (st.field >= t.header.size()) {
    st.fault =
        position(st, st.field) + "more cells than the " + std::to_string(t.header.size()) + " columns of the header";
  } else {
    double x = 0.0;
    if (auto why = read_number(cell, x)) {
      st.fault = position(st, st.field) + *why;
    } else {
      t.columns[st.field].push_back(x);
    }
  }
  ++st.field;
}

void on_record(int /*terminator*/, void* state_ptr) {
  auto& st = *static_cast<csv_state*>(state_ptr);
  if (st.fault) return;
  csv_numbers& t = *st.out;
  if (st.field == 0) return;  // a blank line
  if (!st.header_done) {
    st.header_done = true;
  } else if (st.field < t.header.size()) {
    st.fault = position(st, st.field) + "the row has " + std::to_string(st.field) + " cells, the header " +
               std::to_string(t.header.size());
    return;
  } else {
    t.lines.push_back(st.record_line);
  }
  st.field = 0;
  st.record_line = 0;
}

}  // namespace

std::string csv_numbers::at(std::size_t row, std::size_t column) const {
  std::string s = path + ":" + std::to_string(row < lines.size() ? lines[row] : 0) + ": row " + std::to_string(row + 1);
  if (column < header.size()) s += ", column " + std::to_string(column + 1) + " '" + header[column] + "'";
  return s + ": ";
}

csv_numbers parse_csv_numbers(std::string_view text, const std::string& path) {
  csv_numbers out;
  out.path = path;
  csv_parser parser{};
  if (csv_init(&parser, CSV_STRICT | CSV_STRICT_FINI) != 0) throw std::bad_alloc();
  csv_state st;
  st.out = &out;
  if (text.substr(0, 3) == "\xEF\xBB\xBF") text.remove_prefix(3);  // a byte-order mark some spreadsheets write
  // one line at a time, so that every record knows the line it starts on
  std::size_t start = 0;
  while (start < text.size() && !st.fault) {
    std::size_t end = text.find('\n', start);
    end = end == std::string_view::npos ? text.size() : end + 1;
    if (csv_parse(&parser, text.data() + start, end - start, on_field, on_record, &st) != end - start && !st.fault)
      st.fault = path + ":" + std::to_string(st.line) + ": not valid CSV (" + csv_strerror(csv_error(&parser)) +
                 "; a quote inside a quoted cell is written twice: \"\")";
    if (text[end - 1] == '\n') ++st.line;
    start = end;
  }
  if (!st.fault && csv_fini(&parser, on_field, on_record, &st) != 0 && !st.fault)
    st.fault = path + ":" + std::to_string(st.line) + ": not valid CSV (a quoted cell is not closed)";
  csv_free(&parser);
  if (st.fault) throw input_error(with_prefix(*st.fault));
  if (out.header.empty()) throw input_error(with_prefix(path + ": no header row naming the columns"));
  return out;
}

csv_numbers load_csv_numbers(const std::string& path) {
  std::error_code ec;
  if (std::filesystem::is_directory(path, ec))
    throw input_error(with_prefix("cannot read the data file '" + path + "': it is a directory"));
  std::ifstream in(path, std::ios::binary);
  if (!in) throw input_error(with_prefix("cannot read the data file '" + path + "'"));
  std::ostringstream buffer;
  buffer << in.rdbuf();
  if (in.bad()) throw input_error(with_prefix("cannot read the data file '" + path + "'"));
  const std::string text = buffer.str();
  return parse_csv_numbers(text, path);
}

}  // namespace nondim::tool
