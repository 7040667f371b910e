// libFuzzer target: runtime_scales, references given as text. The input is a script, one
// command a line (spaces separate the fields; the last field of R, U and S is the rest of
// the line):
//   R name quantity text        add(name, "0.3 m/s")
//   U name value unit           add(name, value, unit)
//   D name si e0 e1 ... e6      add(name, dimension, si), exponents as p or p/q
//   S unit                      scale(unit)
//   E e0 e1 ... e6              scale(dimension), spans, nondimensional and dimensional
//   N value unit                nondimensional(value, unit), then dimensional back
//   F unit v1 v2 ...            the field forms in unit text, against the single values
//   T t t_ref unit              nondimensional_difference and dimensional_point, single and field
// Values are read by std::from_chars (so "nan", "inf" and "1e308" reach the library).
// README "Error model": add, scale, nondimensional and dimensional throw scales_error and,
// with unit or quantity text, unit_error; nondimensional_difference and dimensional_point
// also dimension_error. Any other type escaping is a finding; so is a broken invariant:
// a reference is its own scale, exactly; spans(d) says whether scale(d) succeeds; a field's
// cell is the single value bit for bit; a value that converts one way converts back.
#include <array>
#include <charconv>
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <cstring>
#include <exception>
#include <limits>
#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

#include <nondim/analysis.hpp>

#include "fuzz_invariants.hpp"

namespace {

using nondim_fuzz::require;

bool has_prefix(const char* what) {
  return std::string_view(what).rfind("nondim: ", 0) == 0;
}

/// The same double, NaN included (a field's cell and the single value must agree bit for bit).
bool same(double a, double b) {
  return std::memcmp(&a, &b, sizeof a) == 0 || (std::isnan(a) && std::isnan(b));
}

/// Splits off the first space-separated field of `rest`.
std::string_view next_field(std::string_view& rest) {
  while (!rest.empty() && rest.front() == ' ') rest.remove_prefix(1);
  const std::size_t end = rest.find(' ');
  const std::string_view f = rest.substr(0, end);
  rest = end == std::string_view::npos ? std::string_view{} : rest.substr(end + 1);
  return f;
}

double to_double(std::string_view s) {
  double x = 0.0;
  std::from_chars(s.data(), s.data() + s.size(), x);
  return x;
}

std::int64_t to_int(std::string_view s) {
  std::int64_t x = 0;
  std::from_chars(s.data(), s.data() + s.size(), x);
  return x;
}

/// p or p/q; a fraction the rational type refuses (zero or −2^63 denominator) reads as p.
nondim::rational to_rational(std::string_view s) {
  const std::size_t bar = s.find('/');
  const std::int64_t num = to_int(s.substr(0, bar));
  if (bar == std::string_view::npos) return nondim::rational{num};
  const std::int64_t den = to_int(s.substr(bar + 1));
  try {
    return nondim::rational{num, den};
  } catch (const std::exception&) {  // building the input, not the entry point under test
    return nondim::rational{num};
  }
}

nondim::dimension to_dimension(std::string_view& rest) {
  std::array<nondim::rational, nondim::base_dimension_count> e{};
  for (auto& x : e) x = to_rational(next_field(rest));
  return nondim::dimension{e};
}

std::vector<double> to_values(std::string_view rest) {
  std::vector<double> v;
  while (!rest.empty() && v.size() < 64) {
    const std::string_view f = next_field(rest);
    if (!f.empty()) v.push_back(to_double(f));
  }
  return v;
}

/// Runs `f`; true when it returned. The documented errors are caught and checked; with
/// `dimension_errors`, dimension_error is documented too.
template <class F>
bool documented(F&& f, bool dimension_errors = false) {
  try {
    f();
    return true;
  } catch (const nondim::scales_error& e) {
    require(has_prefix(e.what()));
    require(e.lacking_base() <= nondim::base_dimension_count);
  } catch (const nondim::unit_error& e) {
    require(has_prefix(e.what()));
  } catch (const nondim::dimension_error& e) {
    if (!dimension_errors) nondim_fuzz::undocumented(e);
    require(has_prefix(e.what()));
  } catch (const std::exception& e) {
    nondim_fuzz::undocumented(e);
  }
  return false;
}

void check_scale(const nondim::runtime_scales& s, const nondim::scale_expression& e) {
  require(e.exponents.size() == s.size() && e.names.size() == s.size());
  require(!e.text().empty() && !e.text(nondim::text_form::ascii).empty());
  require(!e.nondimensional_text("x").empty());
}

void add_checked(nondim::runtime_scales& s, const auto& add) {
  const std::size_t before = s.size();
  if (!documented(add)) {
    require(s.size() == before);  // a refused reference leaves the references as they were
    return;
  }
  require(s.size() == before + 1);
  const nondim::scale_reference& r = s.references().back();
  require(std::isfinite(r.value) && r.value > 0.0);
  // a reference is its own scale, exactly (one factor, to the power 1)
  nondim::scale_expression e;
  require(documented([&] { e = s.scale(r.dim); }));
  check_scale(s, e);
  require(e.value == r.value);
  for (std::size_t i = 0; i < s.size(); ++i) require(e.exponents[i] == nondim::rational{i + 1 == s.size() ? 1 : 0});
}

void run_line(nondim::runtime_scales& s, std::string_view line) {
  if (line.size() < 2 || line[1] != ' ') return;
  const char command = line[0];
  std::string_view rest = line.substr(2);
  switch (command) {
    case 'R': {
      const std::string name(next_field(rest));
      add_checked(s, [&] { s.add(name, rest); });
      break;
    }
    case 'U': {
      const std::string name(next_field(rest));
      const double value = to_double(next_field(rest));
      add_checked(s, [&] { s.add(name, value, rest); });
      break;
    }
    case 'D': {
      const std::string name(next_field(rest));
      const double si = to_double(next_field(rest));
      const nondim::dimension d = to_dimension(rest);
      add_checked(s, [&] { s.add(name, d, si); });
      break;
    }
    case 'S': {
      nondim::scale_expression e;
      if (documented([&] { e = s.scale(rest); })) check_scale(s, e);
      break;
    }
    case 'E': {
      const nondim::dimension d = to_dimension(rest);
      const bool spans = s.spans(d);
      nondim::scale_expression e;
      require(documented([&] { e = s.scale(d); }) == spans);
      if (!spans) break;
      check_scale(s, e);
      double x = 0.0;
      require(documented([&] { x = s.nondimensional(1.0, d); }));
      require(same(x, 1.0 / e.value));
      require(documented([&] { x = s.dimensional(1.0, d); }));
      require(same(x, e.value));
      break;
    }
    case 'N': {
      const double value = to_double(next_field(rest));
      double x = 0.0;
      if (!documented([&] { x = s.nondimensional(value, rest); })) break;
      // the same unit was accepted one way: it is accepted the other way
      require(documented([&] { (void)s.dimensional(x, rest); }));
      break;
    }
    case 'F': {
      const std::string unit(next_field(rest));
      const std::vector<double> v = to_values(rest);
      std::vector<double> out(v.size());
      if (documented([&] { s.nondimensional(std::span<const double>(v), unit, std::span<double>(out)); }))
        for (std::size_t c = 0; c < v.size(); ++c) require(same(out[c], s.nondimensional(v[c], unit)));
      if (documented([&] { s.dimensional(std::span<const double>(v), unit, std::span<double>(out)); }))
        for (std::size_t c = 0; c < v.size(); ++c) require(same(out[c], s.dimensional(v[c], unit)));
      // sizes that differ: scales_error, nothing written
      std::vector<double> shorter(v.size() / 2, 7.0);
      if (shorter.size() != v.size()) {
        require(!documented([&] { s.nondimensional(std::span<const double>(v), unit, std::span<double>(shorter)); }));
        for (const double x : shorter) require(x == 7.0);
      }
      break;
    }
    case 'T': {
      const double t = to_double(next_field(rest));
      const double t_ref = to_double(next_field(rest));
      double theta = 0.0;
      if (documented([&] { theta = s.nondimensional_difference(t, t_ref, rest); }, true)) {
        std::array<double, 1> in{t};
        std::array<double, 1> out{};
        require(documented([&] { s.nondimensional_difference(in, t_ref, rest, out); }, true));
        require(same(out[0], theta));
      }
      double reading = 0.0;
      if (documented([&] { reading = s.dimensional_point(theta, t_ref, rest); }, true)) {
        std::array<double, 1> in{theta};
        std::array<double, 1> out{};
        require(documented([&] { s.dimensional_point(in, t_ref, rest, out); }, true));
        require(same(out[0], reading));
      }
      break;
    }
    default:
      break;
  }
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  std::string_view script(reinterpret_cast<const char*>(data), size);
  nondim::runtime_scales s;
  for (int lines = 0; !script.empty() && lines < 64; ++lines) {
    const std::size_t end = script.find('\n');
    run_line(s, script.substr(0, end));
    script = end == std::string_view::npos ? std::string_view{} : script.substr(end + 1);
  }
  return 0;
}
