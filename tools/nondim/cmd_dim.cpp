/// \file cmd_dim.cpp
/// \brief `nondim dim UNIT`: the dimension of a unit expression, its factor to coherent SI
/// and its canonical form in SI base units.

#include <memory>
#include <ostream>
#include <string>

#include <CLI/CLI.hpp>
#include <nondim/parse.hpp>

#include "commands.hpp"
#include "json_util.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {
struct dim_args {
  std::string unit;
  std::string format = "text";
};
}  // namespace

subcommand add_dim(CLI::App& app) {
  auto args = std::make_shared<dim_args>();
  CLI::App* sub = app.add_subcommand("dim", "Show the dimension, SI factor and canonical form of a unit");
  sub->add_option("UNIT", args->unit, "A unit expression, e.g. psi, kg/(m*s), W/(m^2*K), degF")->required();
  sub->add_option("--format", args->format, "Output format")
      ->check(CLI::IsMember({"text", "json"}))
      ->default_str("text");
  sub->footer("Example: nondim dim 'Btu/(h*ft^2*degF)'");
  return {sub, [args](std::ostream& out) {
            const parsed_unit u = parse_unit_arg(args->unit, "the unit");
            if (args->format == "json") {
              nlohmann::ordered_json j;
              j["unit"] = args->unit;
              j["factor"] = u.factor;
              j["offset"] = u.offset;
              j["dimension"] = dimension_json(u.dim);
              j["canonical"] = si_unit_string(u.dim, text_form::ascii);
              out << j.dump(2) << '\n';
              return;
            }
            const std::string canonical = si_unit_string(u.dim, text_form::unicode);
            out << "unit       " << args->unit << '\n';
            out << "dimension  " << to_string(u.dim, text_form::unicode)
                << (u.dim.is_dimensionless() ? " (dimensionless)" : "") << '\n';
            out << "factor     " << shortest_decimal(u.factor) << "  (1 " << args->unit << " = "
                << shortest_decimal(u.factor) << (u.dim.is_dimensionless() ? "" : " " + canonical) << ")\n";
            if (u.offset != 0.0)
              out << "offset     " << shortest_decimal(u.offset) << ' ' << canonical
                  << "  (an absolute temperature: SI value = factor * x + offset)\n";
            out << "canonical  " << canonical << '\n';
          }};
}

}  // namespace nondim::tool
