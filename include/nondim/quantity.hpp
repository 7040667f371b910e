#pragma once
/// \file quantity.hpp
/// \brief The light part of nondim, on the standard library alone: `rational`,
/// `dimension`, `dims::`, `quantity`, `unit`, `units::`, absolute temperatures.
/// Cheap enough to include in every solver file.

#include "core/dimension.hpp"
#include "core/dims.hpp"
#include "core/format.hpp"
#include "core/rational.hpp"
#include "units/io.hpp"
#include "units/math.hpp"
#include "units/quantity_type.hpp"
#include "units/table.hpp"
#include "units/temperature.hpp"
#include "units/unit.hpp"
#include "units/units.hpp"
