#pragma once
/// \file demo_rig.hpp
/// \brief The demo's invented rig, built into the program so that `nondim fit --demo` and
/// `nondim demo` work from any directory: a problem file and its measured points
/// (examples/data/cylinder_rig.toml and .csv, embedded at configure time).

namespace nondim::tool {

extern const char* const demo_rig_problem;  ///< cylinder_rig.toml
extern const char* const demo_rig_data;     ///< cylinder_rig.csv

}  // namespace nondim::tool
