#pragma once
/// \file quantity.hpp
/// \brief The light part of nondim, on the standard library alone: `rational`,
/// `dimension`, `dims::`, `quantity`, `unit`, `units::`, absolute temperatures.
/// Cheap enough to include in every solver file.

#include "solver/core/dimension.hpp"
#include "solver/core/dims.hpp"
#include "solver/core/format.hpp"
#include "solver/core/rational.hpp"
#include "solver/units/in_unit.hpp"
#include "solver/units/io.hpp"
#include "solver/units/math.hpp"
#include "solver/units/quantity_type.hpp"
#include "solver/units/table.hpp"
#include "solver/units/temperature.hpp"
#include "solver/units/unit.hpp"
#include "solver/units/units.hpp"
