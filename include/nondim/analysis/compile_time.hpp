#pragma once
/// \file compile_time.hpp
/// \brief The compile-time part of the analysis, on the standard library alone:
/// dimensionless groups of a solver's variables (`pi_exponents`, `pi_groups`) and reference
/// scales for nondimensional solvers (`scales`).

#include "pi_groups.hpp"
#include "scales.hpp"
