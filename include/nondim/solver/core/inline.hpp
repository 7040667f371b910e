#pragma once
/// \file inline.hpp
/// \brief `NONDIM_ALWAYS_INLINE`: marks the trivial operations of quantities (construction,
/// value access, arithmetic, comparison, conversion, unit products, math wrappers).

/// Inlined even at -O0 (debug builds pay what plain `double` pays) and stepped over by debuggers,
/// as standard library implementations mark their trivial functions; implies `inline`.
#if defined(__GNUC__) || defined(__clang__)
#define NONDIM_ALWAYS_INLINE [[gnu::always_inline, gnu::artificial]] inline
#else
#define NONDIM_ALWAYS_INLINE inline
#endif
