/// \file cmd_convert.cpp
/// \brief `nondim convert VALUE FROM TO`: a number from one unit to another of the same
/// dimension; `degC` and `degF` standing alone are absolute temperatures.

#include <cmath>
#include <memory>
#include <ostream>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>
#include <nondim/parse.hpp>

#include "commands.hpp"
#include "json_util.hpp"
#include "messages.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {
struct convert_args {
  std::string value;
  std::string from;
  std::string to;
  std::string format = "text";
};

/// `x` rounded to the 15 significant digits a double carries, as a number again.
double rounded(double x) {
  return std::stod(readable_number(x));
}

/// The note for a conversion across rad/s and rpm (or Hz): the reading as omega = 2 pi n.
std::string rotation_note(const convert_args& a, double value, double result) {
  const bool from_angle = mentions_plane_angle(a.from);
  const double two_pi = 2.0 * detail::pi;
  const double as_rotation = from_angle ? result / two_pi : result * two_pi;
  const std::string& angle_unit = from_angle ? a.from : a.to;
  const std::string& turn_unit = from_angle ? a.to : a.from;
  return "'" + angle_unit + "' is a rate of angle and '" + turn_unit +
         "' a rate of revolutions or cycles; one revolution is 2\u03c0 rad, a factor the dimensions cannot see. "
         "Taken as \u03c9 = 2\u03c0n (ISO 80000-3), " +
         readable_number(value) + " " + a.from + " is " + readable_number(as_rotation) + " " + a.to + ".";
}
/// `convert VALUE FROM TO`, or `convert "VALUE FROM" TO` (a number and its unit in one argument, as
/// a reading is written): the second form brought to the first. Missing units are an input error
/// that shows both forms.
convert_args with_units_in_place(convert_args a) {
  if (a.to.empty()) {
    const auto space = a.value.find_first_of(" \t");
    const auto unit = space == std::string::npos ? std::string::npos : a.value.find_first_not_of(" \t", space);
    if (a.from.empty() || unit == std::string::npos)
      throw input_error(
          with_prefix("TO is required: give the value, its unit and the unit wanted (nondim convert 14.7 psi kPa, "
                      "or nondim convert '14.7 psi' kPa); see nondim convert --help"));
    a.to = a.from;
    a.from = a.value.substr(unit);
    a.value.erase(space);
  }
  return a;
}

}  // namespace

subcommand add_convert(CLI::App& app) {
  auto args = std::make_shared<convert_args>();
  CLI::App* sub = app.add_subcommand("convert", "Convert a value from one unit to another of the same dimension");
  sub->add_option("VALUE", args->value,
                  "The number to convert (negative ones too: convert -40 degC degF), or the number and its unit in "
                  "one argument ('25 degC' degF)")
      ->required();
  sub->add_option("FROM", args->from, "Its unit, e.g. psi, degC, ft/s, kg/(m*s)");
  sub->add_option("TO", args->to, "The unit wanted, of the same dimension");
  sub->add_option("--format", args->format, "Output format")
      ->check(CLI::IsMember({"text", "json"}))
      ->default_str("text");
  sub->footer(
      "degC and degF written alone are readings of a thermometer (affine: 20 degC is 68 degF), never below\n"
      "absolute zero; inside a compound unit they are temperature differences (1 degC/s is 1 K/s).\n"
      "rpm and r/min are rotational frequency (60 rpm = 1 Hz); an angular velocity is in rad/s, and a\n"
      "conversion between the two prints a note (one revolution is 2 pi rad).\n"
      "Example: nondim convert 14.7 psi kPa");
  return {sub, [args](std::ostream& out) {
            const convert_args a = with_units_in_place(*args);
            const double v = parse_number_arg(a.value, "VALUE");
            const parsed_unit from = parse_unit_arg(a.from, "the unit FROM");
            const parsed_unit to = parse_unit_arg(a.to, "the unit TO");
            if (from.dim != to.dim)
              throw input_error(with_prefix(
                  "cannot convert from '" + a.from + "' to '" + a.to + "': they have different dimensions, " +
                  dimension_error::describe(from.dim) + " and " + dimension_error::describe(to.dim)));
            double result = 0.0;
            try {
              result = convert(v, a.from, a.to);
            } catch (const temperature_error& e) {
              throw input_error(with_prefix("VALUE: " + std::string(bare_message(e))));
            }
            if (!std::isfinite(result))
              throw input_error(with_prefix("the result of converting " + a.value + " " + a.from + " to '" + a.to +
                                            "' is out of the range of a double"));
            std::vector<std::string> notes;
            if (crosses_rotational_families(a.from, a.to)) notes.push_back(rotation_note(a, v, result));
            if (a.format == "json") {
              nlohmann::ordered_json j;
              j["input"] = rounded(v);
              j["from"] = a.from;
              j["to"] = a.to;
              j["value"] = rounded(result);
              j["notes"] = notes;
              out << j.dump(2) << '\n';
              return;
            }
            out << readable_number(v) << ' ' << a.from << " = " << readable_number(result) << ' ' << a.to << '\n';
            for (const std::string& n : notes) out << "note: " << n << '\n';
          }};
}

}  // namespace nondim::tool
