#pragma once
/// \file solver.hpp
/// \brief The whole solver half, on the standard library alone: checked quantities and
/// units (`quantity.hpp`), unit expressions at run time (`parse.hpp`), and the groups and
/// reference scales a solver evaluates in its loops (`pi_groups`, `pi_product`, `scales`),
/// their exponents fixed by the compiler. Cheap enough for every translation unit of a solver.

#include "field.hpp"
#include "parse.hpp"
#include "quantity.hpp"
#include "solver/groups/pi_groups.hpp"
#include "solver/groups/scales.hpp"
