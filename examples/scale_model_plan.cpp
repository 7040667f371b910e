// Planning a scale-model test, from prototype values to model conditions and back.
//
// Scenario (invented for this example): the drag on the intake head of a sea-water cooling
// intake, a bluff body near the free surface in a tidal current. A 1:12 model is to be
// towed in a fresh-water tank. The groups are the drag coefficient F/(rho V^2 D^2), the
// Froude number (as V^2/(g D)) and the Reynolds number rho V D / mu; the free surface makes
// the Froude number the one that must match, and the plan reports how far the Reynolds
// number falls short.
#include <nondim/quantity.hpp>
#include <nondim/similarity.hpp>

#include <iostream>

using namespace nondim;

int main() {
  similarity_problem p;
  p.dependent = "F";
  // values in each variable's own unit
  p.add({.name = "F", .unit = "N", .model = 41.0})  // drag measured on the model
      .add({.name = "rho", .unit = "kg/m^3", .prototype = 1025.0, .model = 999.0})
      .add({.name = "V", .unit = "knot", .factor = units::knot.factor, .prototype = 3.2})  // to be found
      .add({.name = "D", .unit = "m", .prototype = 6.0, .model = 0.5})
      .add({.name = "mu", .unit = "cP", .factor = units::cP.factor, .prototype = 1.2, .model = 1.1})
      .add({.name = "g", .unit = "m/s^2", .prototype = 9.81, .model = 9.81});
  p.add_group({1, -1, -2, -2, 0, 0}, "C_D").add_group({0, 0, 2, -1, 0, -1}, "Fr").add_group({0, 1, 1, 1, -1, 0}, "Re");
  p.priority = {1};  // the Froude number must match exactly

  const similarity_plan plan = plan_similarity(p);
  std::cout << to_text(plan);
  return plan.status == similarity_status::underdetermined ? 1 : 0;
}
