// A second translation unit of the consumer that uses the analysis half: with the analysis
// compiled once, both units use the one compiled definition (no duplicate symbols).
#include <nondim/analysis.hpp>

#include <cstddef>

std::size_t second_unit_group_count() {
  // volume flow Q, diameter D, velocity U: rank 2, one group Q/(U D^2) (from memory)
  nondim::problem pipe;
  pipe.add("Q", "m^3/s").add("D", "m").add("U", "m/s");
  return nondim::analyze(pipe).groups.size();
}
