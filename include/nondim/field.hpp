#pragma once
/// \file field.hpp
/// \brief Typed fields on the standard library alone: a solver's own arrays read and written
/// as quantities, no copy. `field_view` (consecutive values), `strided_field_view` (one member
/// of an array of structs), `field` (owning), state vectors (`state_set`, `state`,
/// `state_view` over structure-of-arrays and array-of-structures storage) and typed
/// differences for stencils. Brings `quantity` and `dims::` but not the unit table: include
/// `<nondim/quantity.hpp>` as well for `units::` (kept apart so this header stays cheap).

#include "solver/core/dims.hpp"
#include "solver/fields/difference.hpp"
#include "solver/fields/errors.hpp"
#include "solver/fields/field_view.hpp"
#include "solver/fields/iterator.hpp"
#include "solver/fields/owning_field.hpp"
#include "solver/fields/reference.hpp"
#include "solver/fields/state.hpp"
#include "solver/units/quantity_type.hpp"
