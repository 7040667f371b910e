#pragma once
/// \file report.hpp
/// \brief Views of an analysis for people and programs: plain text, Markdown, LaTeX and
/// JSON (the schema of DESIGN.md), and the reference scale of every variable. Builds on the
/// analysis layer only; no JSON library.

#include "analysis.hpp"
#include "data.hpp"

#include "analysis/report/json.hpp"
#include "analysis/report/latex.hpp"
#include "analysis/report/markdown.hpp"
#include "analysis/report/options.hpp"
#include "analysis/report/scales.hpp"
#include "analysis/report/text.hpp"
