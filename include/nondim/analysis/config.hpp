#pragma once
/// \file config.hpp
/// \brief How the analysis half is compiled: header-only (the default) or compiled once.
///
/// The analysis half (exact elimination with its multiprecision fallback, the SVD check,
/// the catalog and recognition, similarity planning, reports) instantiates Eigen and
/// Boost.Multiprecision. Header-only, every translation unit that includes it pays for that
/// (about 20 s with g++ -O2). Compiled once:
///
///  - define `NONDIM_SEPARATE_COMPILATION` for every translation unit of the program (the
///    CMake target `nondim::compiled` does this, and compiles the one source below for you);
///  - compile exactly one source file that includes <nondim/implementation.ipp>.
///
/// Then the headers hold declarations only: they include neither Eigen nor Boost, and the
/// definitions come from that one translation unit. Without the macro every definition is
/// `inline` in the headers and nothing needs to be built (the CMake target `nondim::nondim`).

#if defined(NONDIM_SEPARATE_COMPILATION)
/// Definitions of the analysis half: ordinary functions, compiled in one translation unit.
#define NONDIM_ANALYSIS_INLINE
#else
/// Definitions of the analysis half: inline functions in the headers.
#define NONDIM_ANALYSIS_INLINE inline
#endif
