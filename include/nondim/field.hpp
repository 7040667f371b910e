#pragma once
/// \file field.hpp
/// \brief Typed fields on the standard library alone: a solver's own arrays read and written
/// as quantities, no copy. `field_view` (consecutive values), `strided_field_view` (one member
/// of an array of structs), `field` (owning), state vectors (`state_set`, `state`,
/// `state_view` over structure-of-arrays and array-of-structures storage) and typed
/// differences for stencils. Includes `quantity.hpp`.

#include "quantity.hpp"
#include "solver/fields/difference.hpp"
#include "solver/fields/errors.hpp"
#include "solver/fields/field_view.hpp"
#include "solver/fields/iterator.hpp"
#include "solver/fields/owning_field.hpp"
#include "solver/fields/reference.hpp"
#include "solver/fields/state.hpp"
