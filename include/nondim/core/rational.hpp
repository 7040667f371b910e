#pragma once
/// \file core/rational.hpp
/// \brief Moved to <nondim/solver/core/rational.hpp> in 0.2 (the solver half's own folder); this
/// forwarding header goes in 0.3. Include <nondim/quantity.hpp> instead.

#include "../solver/core/rational.hpp"
