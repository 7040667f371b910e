// libFuzzer target: similarity planning (plan_similarity, to_text) on problems decoded from
// bytes. Byte 0 gives the number of variables (1..8), byte 1 the number of groups (0..8),
// byte 2 the options (dimensions, dependent variable, tolerance), byte 3 the dependent
// variable; then each variable takes a unit (from a table, as text from the input, or a
// raw factor and offset), its prototype and model values (the IEEE 754 specials and
// extremes or any bit pattern); each group its exponents (mostly small, or any int64) and
// a label; the rest a priority list (indices possibly out of range or repeated).
// README "Error model": plan_similarity, similarity_problem::variable and group_index throw
// similarity_error only, make_similarity_variable unit_error only, to_text nothing.
// Invariants of a plan: one entry per variable and group in input order, given model
// values kept, a status that agrees with the rank and the unmatched groups.
#include <algorithm>
#include <cstddef>
#include <cstdint>
#include <cstring>
#include <exception>
#include <limits>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include <nondim/similarity.hpp>

#include "fuzz_invariants.hpp"

namespace {

using nondim_fuzz::require;

bool has_prefix(const char* what) {
  return std::string_view(what).rfind("nondim: ", 0) == 0;
}

using reader = nondim_fuzz::byte_reader;

/// Mostly ordinary positive values, then the specials and extremes, then any bit pattern.
double next_value(reader& r) {
  static constexpr double specials[] = {0.0,
                                        -0.0,
                                        -1.0,
                                        std::numeric_limits<double>::quiet_NaN(),
                                        std::numeric_limits<double>::infinity(),
                                        -std::numeric_limits<double>::infinity(),
                                        std::numeric_limits<double>::max(),
                                        std::numeric_limits<double>::min(),
                                        std::numeric_limits<double>::denorm_min(),
                                        1e-300,
                                        1e300};
  const std::uint8_t b = r.byte();
  if (b < 160) return 0.25 * static_cast<double>(b % 40 + 1);
  if (b < 224) return specials[b % std::size(specials)];
  const std::uint64_t bits = r.bits64();
  double d = 0;
  std::memcpy(&d, &bits, sizeof d);
  return d;
}

std::optional<double> next_optional(reader& r, bool present) {
  if (!present) return std::nullopt;
  return next_value(r);
}

/// Small exponents (the physics), then larger ones, then any int64 (beyond 2^53 refused).
std::int64_t next_exponent(reader& r) {
  const std::uint8_t b = r.byte();
  if (b < 200) return static_cast<std::int64_t>(b % 7) - 3;
  if (b < 240) return static_cast<std::int64_t>(r.byte()) - 128;
  return r.int64();
}

constexpr const char* units[] = {"m", "m/s", "kg/m^3", "Pa*s", "N", "m/s^2", "K", "degC", "W/(m*K)", "1", "Pa", "s"};
constexpr const char* labels[] = {"", "Re", "Fr", "Re", "Eu", "Ma", "Nu"};

/// Runs `f`; true when it returned. similarity_error is checked; anything else is a finding.
template <class F>
bool documented(F&& f) {
  try {
    f();
    return true;
  } catch (const nondim::similarity_error& e) {
    require(has_prefix(e.what()));
  } catch (const std::exception& e) {
    nondim_fuzz::undocumented(e);
  }
  return false;
}

void check_plan(const nondim::similarity_problem& p, const nondim::similarity_plan& plan) {
  require(plan.variables.size() == p.variables.size());
  require(plan.groups.size() == p.groups.size());
  for (std::size_t j = 0; j < p.variables.size(); ++j) {
    const auto& v = plan.variables[j];
    require(v.name == p.variables[j].name);
    if (!v.dependent && p.variables[j].model) require(v.model == p.variables[j].model);
    if (v.dependent) require(v.name == plan.dependent.name && plan.dependent.index == j);
  }
  for (std::size_t k = 0; k < p.groups.size(); ++k) require(plan.groups[k].exponents == p.groups[k].exponents);
  require(plan.rank <= plan.unknowns);
  switch (plan.status) {
    case nondim::similarity_status::underdetermined:
      require(plan.rank < plan.unknowns && !plan.free.empty());
      break;
    case nondim::similarity_status::exact:
      require(plan.unmatched.empty() && plan.free.empty());
      break;
    case nondim::similarity_status::partial:
      require(!plan.unmatched.empty() && plan.free.empty());
      break;
  }
  if (plan.dependent.exact) require(plan.unmatched.empty() && plan.dependent.prototype_over_model.has_value());
  require(!nondim::to_text(plan).empty());  // README: to_text throws nothing
}

}  // namespace

extern "C" int LLVMFuzzerTestOneInput(const std::uint8_t* data, std::size_t size) {
  reader r(data, size);
  const std::size_t n = 1U + r.byte() % 8U;
  const std::size_t m = r.byte() % 9U;
  const std::uint8_t flags = r.byte();
  const std::uint8_t dependent = r.byte();

  nondim::similarity_problem p;
  for (std::size_t j = 0; j < n; ++j) {
    const std::uint8_t how = r.byte();
    const std::uint8_t presence = r.byte();
    const std::string name = (presence & 8U) != 0 ? "v0" : "v" + std::to_string(j);  // a repeated name, at times
    nondim::similarity_variable v;
    if (how < 200 || how >= 240) {
      // unit text: from the table, or up to 24 bytes of the input
      const std::string unit = how < 200 ? std::string(units[how % std::size(units)]) : r.text(how % 24U);
      try {
        v = nondim::make_similarity_variable(name, unit);
      } catch (const nondim::unit_error& e) {
        require(has_prefix(e.what()));
        continue;
      } catch (const std::exception& e) {  // README: make_similarity_variable throws unit_error only
        nondim_fuzz::undocumented(e);
      }
      if ((flags & 1U) != 0) v.dim.reset();  // no dimension check for this variable
    } else {
      v.name = name;
      v.factor = (how & 1U) != 0 ? next_value(r) : 1.0;
      v.offset = (how & 2U) != 0 ? next_value(r) : 0.0;
    }
    v.prototype = next_optional(r, (presence & 1U) != 0 || (presence & 4U) == 0);
    v.model = next_optional(r, (presence & 2U) != 0);
    p.add(std::move(v));
  }
  for (std::size_t k = 0; k < m; ++k) {
    const std::uint8_t shape = r.byte();
    std::vector<std::int64_t> e(shape < 240 ? p.variables.size() : shape % 10U);  // a wrong length, at times
    for (auto& x : e) x = next_exponent(r);
    p.add_group(std::move(e), labels[shape % std::size(labels)]);
  }
  switch ((flags >> 1U) % 4U) {
    case 1:  // the dependent variable by name
      if (!p.variables.empty()) p.dependent = p.variables[dependent % p.variables.size()].name;
      break;
    case 2:  // a name that is not there
      p.dependent = "w";
      break;
    default:  // the first variable
      break;
  }
  switch ((flags >> 3U) % 4U) {
    case 1:
      p.tolerance = next_value(r);
      break;
    case 2:
      p.tolerance = 1e-3;
      break;
    default:
      break;
  }
  const std::size_t priorities = r.byte() % 4U;
  for (std::size_t i = 0; i < priorities; ++i) p.priority.push_back(r.byte() % (m + 2U));

  nondim::similarity_plan plan;
  if (documented([&] { plan = nondim::plan_similarity(p); })) check_plan(p, plan);
  // the look-ups: similarity_error when there is no such variable or group
  (void)documented([&] { require(p.variable("v1").name == "v1"); });
  (void)documented([&] { require(p.groups[p.group_index("Re")].label == "Re"); });
  return 0;
}
