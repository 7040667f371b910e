#pragma once
/// \file similarity.hpp
/// \brief Similarity planning from a prototype to a scale model: `similarity_problem`,
/// `plan_similarity()`, `similarity_plan`, `to_text(similarity_plan)`.

#include "analysis/similarity/error.hpp"
#include "analysis/similarity/from_unit.hpp"
#include "analysis/similarity/plan.hpp"
#include "analysis/similarity/plan_similarity.hpp"
#include "analysis/similarity/problem.hpp"
#include "analysis/similarity/report.hpp"
