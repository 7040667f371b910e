// libFuzzer target: the program's TOML problem loader (tools/nondim/problem_file.cpp) on any
// bytes, then, as `nondim groups --file` does, the units of its variables and analyze().
// Allowed outcomes: a problem that keeps the schema's promises, or an input_error (from the
// loader) / analysis_error (from the analysis) whose message begins "nondim: ".
#include <cmath>
#include <cstddef>
#include <cstdint>
#include <exception>
#include <set>
#include <string>
#include <string_view>

#include <nondim/analysis.hpp>

#include "fuzz_invariants.hpp"
#include "messages.hpp"
#include "problem_file.hpp"

namespace {

using nondim_fuzz::require;

bool has_prefix(const char* what) {
  return std::string_view(what).rfind("nondim: ", 0) == 0;
}

void check_file(const nondim::tool::problem_file& f) {
  require(!f.variables.empty());
  std::set<std::string> names;
  for (const auto& v : f.variables) {
    require(!nondim::tool::bad_variable_name(v.name).has_value());
    require(names.insert(v.name).second);
    require(v.where.line >= 1 && v.unit_where.line >= 1);
    if (v.prototype) require(std::isfinite(*v.prototype));
    if (v.model) require(std::isfinite(*v.model));
  }
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  const std::string_view text(reinterpret_cast<const char*>(data), size);
  nondim::tool::problem_file f;
  try {
    f = nondim::tool::parse_problem_text(text, "fuzz.toml");
  } catch (const nondim::tool::input_error& e) {
    require(has_prefix(e.what()));
    return 0;
  } catch (const std::exception& e) {  // the loader throws input_error only
    nondim_fuzz::undocumented(e);
  }
  check_file(f);
  nondim::problem p;
  nondim::options o;
  o.dependent = f.dependent;
  o.repeating = f.repeating;
  try {
    for (const auto& v : f.variables) p.add(v.name, v.unit);
    const nondim::analysis a = nondim::analyze(p, o);
    require(a.groups.size() == p.size() - a.rank);
  } catch (const nondim::analysis_error& e) {
    require(has_prefix(e.what()));
  } catch (const std::exception& e) {  // README: problem::add and analyze throw analysis_error only
    nondim_fuzz::undocumented(e);
  }
  return 0;
}
