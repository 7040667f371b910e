#pragma once
/// \file similarity.hpp
/// \brief Similarity planning from a prototype to a scale model: `similarity_problem`,
/// `plan_similarity()`, `similarity_plan`, `to_text(similarity_plan)`.

#include "similarity/error.hpp"
#include "similarity/from_unit.hpp"
#include "similarity/plan.hpp"
#include "similarity/plan_similarity.hpp"
#include "similarity/problem.hpp"
#include "similarity/report.hpp"
