#pragma once
/// \file analysis/runtime_scales.hpp
/// \brief Moved to <nondim/analysis/extraction/runtime_scales.hpp> in 0.2. Include
/// <nondim/analysis.hpp>; this forwarding header goes in 0.3.

#include "extraction/runtime_scales.hpp"
