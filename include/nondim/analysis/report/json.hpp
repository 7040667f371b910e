#pragma once
/// \file json.hpp
/// \brief The analysis as JSON, in the schema of DESIGN.md (`nondim groups --format json`).
///
/// Written by hand (detail/json.hpp) so that the library needs no JSON library: strings
/// escaped per RFC 8259, numbers in the shortest decimal that reads back to the same
/// double. Only non-zero exponents are listed; an exponent that is not an integer is the
/// string "p/q".

#include <cstddef>
#include <string>
#include <utility>
#include <vector>

#include "../../analysis.hpp"
#include "../config.hpp"
#include "detail/json.hpp"
#include "latex.hpp"
#include "options.hpp"

namespace nondim {

/// \brief The analysis as one JSON object:
/// `{"variables": [{"name", "unit", "dimension"}], "rank", "repeating", "groups": [{"exponents",
/// "text", "latex", "matches": [{"name", "symbol", "power"}]}], "svd_check": {"rank", "agrees",
/// "singular_values", "max_residual"}}`, indented, ending in a newline. A group with a value at
/// the design point of `o` has `value`, `uncertainty` (when every input has one; both rounded
/// as rounding.hpp says) and `regimes` (when a named number it is has any: `symbol`,
/// `number`, `regime`, `bounds`, `configuration`, `source`). With a configuration chosen
/// (`options::configuration`), `configuration` at the top level names its key ("pipe_flow").
std::string json_report(const analysis& a, const report_options& o = {});

}  // namespace nondim

#if !defined(NONDIM_SEPARATE_COMPILATION)
#include "json.ipp"
#endif
