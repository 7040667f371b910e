#pragma once
/// \file unit_parser.hpp
/// \brief `parsed_unit` and `parse_unit` (the grammar and rules are in `nondim/parse.hpp`).

#include "detail/unit_parser.hpp"
