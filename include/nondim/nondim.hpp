#pragma once
/// \file nondim.hpp
/// \brief Everything nondim offers. Solver files that only need checked quantities should
/// include the cheaper <nondim/quantity.hpp>.

#include "analysis.hpp"
#include "data.hpp"
#include "field.hpp"
#include "parse.hpp"
#include "quantity.hpp"
#include "report.hpp"
#include "similarity.hpp"
