#pragma once
/// \file report.hpp
/// \brief Views of an analysis for people and programs: plain text, Markdown, LaTeX and
/// JSON (the schema of DESIGN.md), and the reference scale of every variable. Builds on the
/// analysis layer only; no JSON library.

#include "analysis.hpp"

#include "report/json.hpp"
#include "report/latex.hpp"
#include "report/markdown.hpp"
#include "report/options.hpp"
#include "report/scales.hpp"
#include "report/text.hpp"
