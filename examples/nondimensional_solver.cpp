// A solver written in nondimensional form, and the reference scales of its inputs.
//
// Scenario (invented for this example): a slow stream of warm air enters a duct of a drying
// oven whose walls are held at 20 °C. A 1-D explicit solver advances the nondimensional
// temperature theta = (T - T_wall) / dT along the duct,
//
//     d(theta)/dt* + d(theta)/dx* = (1/Pe) d2(theta)/dx*2,
//
// with x* = x/L, t* = t U/L and Pe = U L / alpha. The solver sees numbers only; the scales
// turn the dimensional inputs into them and the results back, once at compile time
// (`scales`) and once from input text (`runtime_scales`), and both agree.
#include <nondim/analysis.hpp>  // runtime_scales (compiled once: link nondim::compiled)
#include <nondim/solver.hpp>    // scales: standard library only, cheap in every solver file

#include <cstddef>
#include <iostream>
#include <vector>

using namespace nondim;

namespace {

/// One explicit step on a uniform grid: upwind advection, central diffusion, the inlet value
/// held at theta[0], zero gradient at the outlet. Everything here is nondimensional.
void step(std::vector<double>& theta, double dx, double dt, double inv_pe) {
  std::vector<double> next = theta;
  for (std::size_t i = 1; i + 1 < theta.size(); ++i)
    next[i] = theta[i] - dt * (theta[i] - theta[i - 1]) / dx +
              dt * inv_pe * (theta[i + 1] - 2.0 * theta[i] + theta[i - 1]) / (dx * dx);
  next.back() = next[next.size() - 2];
  theta = next;
}

}  // namespace

int main() {
  // ---- compile time: references are quantities, the exponents are fixed by the compiler
  const auto U = 2.0 * units::cm / units::s;
  const auto L = 25.0 * units::cm;
  const auto T_wall = from_celsius(20.0);
  const auto T_in = from_celsius(60.0);
  const auto s = scales(U, L, T_in - T_wall);                         // a temperature reference is a difference
  const auto alpha = 2.2e-5 * units::m2 / units::s;                   // air near 300 K (for the demo only)
  const double inv_pe = s.nondimensional(alpha);                      // alpha / (U L) = 1/Pe
  const double t_end = s.nondimensional(5.0 * units::s);              // t U / L
  const double theta_in = s.nondimensional_difference(T_in, T_wall);  // 1
  // s.nondimensional(T_in);             error: nondim: an absolute temperature ...
  // s.nondimensional(1.0 * units::kg);  error: nondim: ... they lack the base dimension shown

  // ---- run time: the same references from the text of an input file
  runtime_scales r;
  r.add("U", "2 cm/s").add("L", 25.0, "cm").add("dT", 40.0, "K");
  std::cout << "t* = " << r.scale(dims::time).nondimensional_text("t") << "\n";  // t·U/L
  std::cout << "1/Pe = " << r.nondimensional(2.2e-5, "m^2/s") << " (compile time: " << inv_pe << ")\n";
  std::vector<double> cells(51, 20.0);  // initial readings in degC, one per grid point
  cells[0] = 60.0;                      // the inlet
  std::vector<double> theta(cells.size());
  r.nondimensional_difference(cells, 20.0, "degC", theta);  // theta = (T - T_wall) / dT
  // r.nondimensional(cells, "degC", theta);   throws scales_error: an absolute temperature

  // ---- the solver, in nondimensional form
  const double dx = 1.0 / static_cast<double>(cells.size() - 1);
  const double dt = 0.4 * dx;
  for (double t = 0.0; t < t_end; t += dt) step(theta, dx, dt, inv_pe);

  // ---- back to readings in degC, the whole field in one call
  r.dimensional_point(theta, 20.0, "degC", cells);
  std::cout << "theta at the inlet " << theta.front() << " (" << theta_in << " from the compile-time scales)\n";
  std::cout << "after " << r.dimensional(t_end, "s") << " s the air at x = L/4 is at " << cells[cells.size() / 4]
            << " degC, at x = L/2 at " << cells[cells.size() / 2] << " degC\n";
  return 0;
}
