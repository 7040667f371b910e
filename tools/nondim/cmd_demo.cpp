/// \file cmd_demo.cpp
/// \brief `nondim demo`: a worked problem with no input needed, the forced-air cooling of
/// a battery pack: the variables with realistic values, the groups, their values, and
/// what they mean for the engineer sizing the fan; then a rig's measured points fitted as
/// a correlation (the same as `nondim fit --demo`).

#include <array>
#include <cmath>
#include <cstdint>
#include <limits>
#include <ostream>
#include <stdexcept>
#include <string>
#include <vector>

#include <CLI/CLI.hpp>
#include <nondim/report.hpp>

#include "commands.hpp"
#include "units_text.hpp"

namespace nondim::tool {

namespace {

struct demo_variable {
  const char* name;
  const char* unit;
  double value;  ///< in `unit`; NaN for the unknown
  const char* note;
};

// Air at 300 K and 1 atm: Incropera, DeWitt, Bergman, Lavine, Fundamentals of Heat and Mass
// Transfer, 6th ed., table A.4 (rho 1.1614 kg/m^3, mu 184.6e-7 N*s/m^2, k 26.3e-3 W/(m*K),
// cp 1.007 kJ/(kg*K)). Cell diameter of a 21700 cylindrical cell (21 mm): common practice.
constexpr std::array<demo_variable, 7> pack{{
    {"h", "W/(m^2*K)", std::numeric_limits<double>::quiet_NaN(),
     "heat transfer coefficient on the cell surface (sought)"},
    {"U", "m/s", 2.5, "air speed approaching the cells"},
    {"D", "mm", 21.0, "cell diameter (21700 cells)"},
    {"rho", "kg/m^3", 1.1614, "air density at 300 K"},
    {"mu", "Pa*s", 1.846e-5, "air viscosity at 300 K"},
    {"k", "W/(m*K)", 0.0263, "air thermal conductivity at 300 K"},
    {"cp", "J/(kg*K)", 1007.0, "air specific heat at 300 K"},
}};

std::string fixed(double x, int digits) {
  char buffer[48];
  std::snprintf(buffer, sizeof buffer, "%.*f", digits, x);
  return buffer;
}

void run_demo(std::ostream& out) {
  problem p;
  std::vector<std::vector<std::string>> rows{{"variable", "value", "unit", "note"}};
  for (const auto& v : pack) {
    p.add(v.name, v.unit);
    rows.push_back({v.name, std::isnan(v.value) ? "?" : readable_number(v.value), v.unit, v.note});
  }
  // The rule repeats D, U, rho and cp (a Stanton-number form); the named basis writes the
  // same relation as Nu = f(Re, Pr), the form of the correlation used below.
  options o;
  o.form = basis::named;
  const analysis a = analyze(p, o);

  // The demo's words below name the groups; check that the analysis gave those groups.
  const std::vector<std::vector<std::int64_t>> expected{{1, 0, 1, 0, 0, -1, 0},   // h D / k         Nusselt
                                                        {0, 1, 1, 1, -1, 0, 0},   // rho U D / mu    Reynolds
                                                        {0, 0, 0, 0, 1, -1, 1}};  // mu cp / k       Prandtl
  if (a.groups.size() != expected.size()) throw std::logic_error("demo: unexpected number of groups");
  for (std::size_t k = 0; k < expected.size(); ++k)
    if (a.groups[k].exponents != expected[k]) throw std::logic_error("demo: unexpected group " + a.groups[k].text());

  std::vector<double> si;
  for (std::size_t j = 0; j < pack.size(); ++j) si.push_back(pack[j].value * a.variables[j].factor);
  si[0] = 1.0;  // h is unknown; only groups without h are evaluated
  const double re = a.groups[1].value(si);
  const double pr = a.groups[2].value(si);
  // Hilpert's correlation for a cylinder in cross flow, Nu = C Re^m Pr^(1/3), with C = 0.683,
  // m = 0.466 for 40 < Re < 4000 (Incropera et al., 6th ed., eq. 7.52 and table 7.2).
  const double nu = 0.683 * std::pow(re, 0.466) * std::cbrt(pr);
  const double d = si[2];
  const double h = nu * si[5] / d;

  out << "nondim demo: forced-air cooling of a battery pack\n\n"
         "A fan blows air at 300 K across a row of 21700 cylindrical cells. The thermal model of the\n"
         "pack needs the heat transfer coefficient h on the cell surface, and the fan must be sized.\n"
         "Seven variables are involved:\n\n"
      << detail::aligned_table(rows,
                               {detail::align::left, detail::align::right, detail::align::left, detail::align::left}, 2)
      << "\n$ nondim groups h='W/(m^2*K)' U=m/s D=mm rho=kg/m^3 mu=Pa*s k='W/(m*K)' cp='J/(kg*K)' "
         "--basis named\n\n"
      << text_report(a)
      << "\nAt the design point\n"
         "  Pi1 = h*D/k      Nusselt number Nu: the unknown, h in dimensionless form\n"
         "  Pi2 = rho*U*D/mu Reynolds number Re = "
      << fixed(re, 0)
      << "\n"
         "  Pi3 = mu*cp/k    Prandtl number Pr = "
      << fixed(pr, 3)
      << "\n\n"
         "What it means\n"
         "  - Seven variables reduce to three groups: Nu = f(Re, Pr). One curve, measured once, serves\n"
         "    every cell diameter, air speed and air temperature; there is no need to test each.\n"
         "  - For air Pr stays near 0.71 over the whole operating range, so in practice Nu = f(Re).\n"
         "  - Re = "
      << fixed(re, 0)
      << " lies in the 40..4000 band of Hilpert's correlation for a cylinder in cross flow,\n"
         "    Nu = 0.683 Re^0.466 Pr^(1/3) (Incropera et al., 6th ed., table 7.2): Nu = "
      << fixed(nu, 1) << ", so\n    h = Nu*k/D = " << fixed(h, 1)
      << " W/(m^2*K). Cells in a bank see more turbulence; use a tube-bank correlation\n"
         "    for the rows behind the first.\n"
         "  - Doubling the fan speed doubles Re but raises h only by 2^0.466 = "
      << fixed(std::pow(2.0, 0.466), 2)
      << " times, while the fan\n"
         "    power grows as U^3 (8 times): to cool more, add flow area or fins before adding speed.\n"
         "  - A half-scale rig with air reproduces Nu only at the same Re, i.e. at twice the air speed.\n"
         "    Try: nondim groups --help, nondim dim 'W/(m^2*K)', nondim convert 2.5 m/s ft/min\n";

  out << "\nMeasured data: a heated-cylinder rig\n\n"
         "To check the correlation, 18 runs were made on a rig (invented for this demo): heated brass\n"
         "cylinders of 6, 12 and 25 mm in a small wind tunnel at 2 to 18 m/s, h measured from the heater\n"
         "power. The columns U [m/s], D (mm), h [W/(m^2*K)] are read from CSV; the air's properties\n"
         "are constants of the problem file.\n\n"
         "$ nondim fit --demo        (the same as: nondim fit --file cylinder_rig.toml cylinder_rig.csv)\n\n";
  run_fit(out, "", "", true, "named", {}, "text", "", "");
  out << "\nWhat it means\n"
         "  - Pr is the same in every run (air at one temperature): it is reported, not fitted. Its\n"
         "    exponent cannot come from this rig; hold it at the accepted 1/3 (--fix Pr=1/3) only\n"
         "    when using the correlation for another fluid, and say so.\n"
         "  - The exponent of Re lies between Hilpert's 0.466 (Re < 4000) and 0.618 (Re > 4000): one\n"
         "    power law over both bands. Fit each band on its own if the design sits in one of them.\n"
         "  - Run 9 is flagged (a loose thermocouple would do it): it stays in the fit until checked.\n"
         "  - The correlation holds only for 755 < Re < 28000 and air; outside, it is a guess.\n"
         "    Try: nondim fit --demo --plot collapse.svg (writes collapse.svg, .dat and .gp)\n";
}

}  // namespace

subcommand add_demo(CLI::App& app) {
  CLI::App* sub = app.add_subcommand("demo", "A worked example: forced-air cooling of a battery pack");
  sub->footer("Needs no files or arguments: nondim demo");
  return {sub, [](std::ostream& out) { run_demo(out); }};
}

}  // namespace nondim::tool
