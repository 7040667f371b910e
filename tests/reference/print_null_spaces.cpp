// Prints random dimension matrices with nondim's exact rank, groups and null space, one
// JSON object per line, for sympy_check.py to verify with sympy's exact arithmetic.
// Usage: reference_null_spaces [count] (default 200 small matrices; 24 with huge entries follow).
#include <nondim/analysis.hpp>

#include <cstdint>
#include <cstdlib>
#include <iostream>
#include <random>
#include <string>
#include <vector>

namespace {

using nondim::dimension;
using nondim::rational;

std::mt19937_64 rng(0x73796d'7079ULL);

std::int64_t uniform(std::int64_t lo, std::int64_t hi) {
  return lo + static_cast<std::int64_t>(rng() % static_cast<std::uint64_t>(hi - lo + 1));
}

rational small_entry() {
  if (uniform(1, 100) <= 55) return 0;
  if (uniform(1, 100) <= 80) return uniform(-4, 4);
  return rational{uniform(-6, 6), uniform(1, 6)};
}

/// Small integer and rational entries; some rows tied to others, some columns combinations.
std::vector<dimension> small_matrix() {
  const auto n = static_cast<std::size_t>(uniform(1, 30));
  const auto rows = static_cast<std::size_t>(uniform(1, 7));
  std::vector<dimension> cols;
  for (std::size_t j = 0; j < n; ++j) {
    std::array<rational, 7> e{};
    for (std::size_t i = 0; i < rows; ++i) e[i] = small_entry();
    if (rows >= 3 && uniform(0, 3) == 0) e[rows - 1] = e[0] * rational{uniform(-3, 3), 2};  // a fixed combination
    cols.emplace_back(e);
  }
  for (std::size_t j = 1; j < n; ++j)
    if (uniform(0, 4) == 0) cols[j] = cols[j - 1] * pow(cols[0], rational{uniform(-2, 2)});
  return cols;
}

/// Forty-bit entries in a few independent columns, the others small integer combinations
/// of them: small null vectors reached through products beyond 64 bits.
std::vector<dimension> huge_matrix() {
  const auto n = static_cast<std::size_t>(uniform(3, 12));
  const auto r = static_cast<std::size_t>(uniform(2, 4));
  std::vector<dimension> cols;
  for (std::size_t j = 0; j < r; ++j) {
    std::array<rational, 7> e{};
    for (std::size_t i = 0; i < r + 1; ++i) e[i] = uniform(-(std::int64_t{1} << 40), std::int64_t{1} << 40);
    cols.emplace_back(e);
  }
  for (std::size_t j = r; j < n; ++j) {
    dimension s{};
    for (std::size_t b = 0; b < r; ++b) s = s * pow(cols[b], rational{uniform(-2, 2)});
    cols.push_back(s);
  }
  return cols;
}

std::string json_vector(const std::vector<std::int64_t>& v) {
  std::string s = "[";
  for (std::size_t i = 0; i < v.size(); ++i) {
    if (i > 0) s.push_back(',');
    s.append(std::to_string(v[i]));
  }
  s.push_back(']');
  return s;
}

void print_case(std::size_t id, const std::vector<dimension>& cols) {
  nondim::problem p;
  for (std::size_t j = 0; j < cols.size(); ++j) p.add("v" + std::to_string(j), cols[j]);
  const nondim::analysis a = nondim::analyze(p);
  const nondim::null_space_basis ns = nondim::exact_null_space(p.matrix());
  std::string s = "{\"id\":" + std::to_string(id) + ",\"matrix\":[";
  for (std::size_t i = 0; i < 7; ++i) {
    s += i ? ",[" : "[";
    for (std::size_t j = 0; j < cols.size(); ++j) {
      s.append(j ? ",\"" : "\"");
      s.append(nondim::to_string(cols[j][i]));
      s.push_back('"');
    }
    s += "]";
  }
  s += "],\"rank\":" + std::to_string(a.rank) + ",\"multiprecision\":" + (a.multiprecision ? "true" : "false");
  s += ",\"groups\":[";
  for (std::size_t k = 0; k < a.groups.size(); ++k) {
    if (k > 0) s.push_back(',');
    s.append(json_vector(a.groups[k].exponents));
  }
  s += "],\"pivots\":[";
  for (std::size_t k = 0; k < ns.pivots.size(); ++k) {
    if (k > 0) s.push_back(',');
    s.append(std::to_string(ns.pivots[k]));
  }
  s += "],\"null_space\":[";
  for (std::size_t k = 0; k < ns.vectors.size(); ++k) {
    if (k > 0) s.push_back(',');
    s.append(json_vector(ns.vectors[k]));
  }
  s += "]}";
  std::cout << s << '\n';
}

}  // namespace

int main(int argc, char** argv) {
  const std::size_t count = argc > 1 ? static_cast<std::size_t>(std::strtoul(argv[1], nullptr, 10)) : 200;
  std::size_t id = 0;
  for (std::size_t k = 0; k < count; ++k) print_case(id++, small_matrix());
  for (std::size_t k = 0; k < 24; ++k) print_case(id++, huge_matrix());
  return 0;
}
