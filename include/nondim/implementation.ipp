// nondim: the implementation of the analysis half, compiled once.
//
// Include this file from exactly one .cpp file of a program whose every translation unit
// is compiled with NONDIM_SEPARATE_COMPILATION defined (the CMake target nondim::compiled
// does both). See <nondim/analysis/config.hpp>.

#if !defined(NONDIM_SEPARATE_COMPILATION)
#error \
    "nondim: <nondim/implementation.ipp> is the compiled-once implementation; define NONDIM_SEPARATE_COMPILATION for every translation unit, or use the headers alone without including this file"
#endif

#include "nondim.hpp"

#include "analysis/data/fit.ipp"
#include "analysis/data/group_value.ipp"
#include "analysis/extraction/alternatives.ipp"
#include "analysis/extraction/analyze.ipp"
#include "analysis/extraction/explain.ipp"
#include "analysis/extraction/null_space.ipp"
#include "analysis/extraction/runtime_scales.ipp"
#include "analysis/extraction/svd_check.ipp"
#include "analysis/extraction/text.ipp"
#include "analysis/names/named_basis.ipp"
#include "analysis/report/json.ipp"
#include "analysis/report/latex.ipp"
#include "analysis/report/markdown.ipp"
#include "analysis/report/scales.ipp"
#include "analysis/report/text.ipp"
#include "analysis/similarity/plan_similarity.ipp"
#include "analysis/similarity/report.ipp"
