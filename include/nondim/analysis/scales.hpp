#pragma once
/// \file analysis/scales.hpp
/// \brief Moved in 0.2: compile-time groups and scales belong to the solver half, on the
/// standard library alone. Include <nondim/solver.hpp>; this forwarding header goes in 0.3.

#include "../solver.hpp"
