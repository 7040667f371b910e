/// \file cmd_convert.cpp
/// \brief `nondim convert VALUE FROM TO`: a number from one unit to another of the same
/// dimension; `degC` and `degF` standing alone are absolute temperatures.

#include <cmath>
#include <memory>
#include <ostream>
#include <string>

#include <CLI/CLI.hpp>
#include <nondim/parse.hpp>

#include "commands.hpp"
#include "messages.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {
struct convert_args {
  std::string value;
  std::string from;
  std::string to;
};
}  // namespace

subcommand add_convert(CLI::App& app) {
  auto args = std::make_shared<convert_args>();
  CLI::App* sub = app.add_subcommand("convert", "Convert a value from one unit to another of the same dimension");
  sub->add_option("VALUE", args->value, "The number to convert (negative ones too: convert -40 degC degF)")->required();
  sub->add_option("FROM", args->from, "Its unit, e.g. psi, degC, ft/s, kg/(m*s)")->required();
  sub->add_option("TO", args->to, "The unit wanted, of the same dimension")->required();
  sub->footer(
      "degC and degF written alone are readings of a thermometer (affine: 20 degC is 68 degF); inside a\n"
      "compound unit they are temperature differences (1 degC/s is 1 K/s).\n"
      "Example: nondim convert 14.7 psi kPa");
  return {
      sub, [args](std::ostream& out) {
        const double v = parse_number_arg(args->value, "VALUE");
        const parsed_unit from = parse_unit_arg(args->from, "the unit FROM");
        const parsed_unit to = parse_unit_arg(args->to, "the unit TO");
        if (from.dim != to.dim)
          throw input_error(with_prefix("cannot convert from '" + args->from + "' to '" + args->to +
                                        "': they have different dimensions, " + dimension_error::describe(from.dim) +
                                        " and " + dimension_error::describe(to.dim)));
        const double result = convert(v, args->from, args->to);
        if (!std::isfinite(result))
          throw input_error(with_prefix("the result of converting " + args->value + " " + args->from + " to '" +
                                        args->to + "' is out of the range of a double"));
        out << readable_number(v) << ' ' << args->from << " = " << readable_number(result) << ' ' << args->to << '\n';
      }};
}

}  // namespace nondim::tool
