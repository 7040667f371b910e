#pragma once
/// \file problem_input.hpp
/// \brief A problem as the program gets it, from NAME=UNIT arguments or a problem file,
/// with the options that override the file, and the analysis of it with messages that
/// say where a bad name came from.

#include <optional>
#include <string>
#include <vector>

#include <nondim/analysis.hpp>
#include <nondim/analysis/report/options.hpp>

#include "problem_file.hpp"

namespace nondim::tool {

struct problem_input {
  nondim::problem problem;
  nondim::options options;
  nondim::report_options report;
  std::optional<problem_file> file;  ///< when read from a file
  std::string dependent_source;      ///< where `options.dependent` came from, for messages
  std::string repeating_source;      ///< where `options.repeating` came from
};

/// \brief From `NAME=UNIT` arguments, in order.
/// \throws input_error naming the argument (a bad name, a bad unit with its column).
problem_input problem_from_arguments(const std::vector<std::string>& args);

/// \brief From a problem file.
/// \throws input_error naming the file and line.
problem_input problem_from_file(const std::string& path);

/// \brief From a problem file already read (`parse_problem_text`).
/// \throws input_error naming the file and line.
problem_input problem_from_loaded(problem_file loaded);

/// \brief `--dependent NAME` given on the command line (overrides the file).
void override_dependent(problem_input& in, const std::string& name);

/// \brief `--repeating A,B,C` given on the command line (overrides the file).
/// \throws input_error for an empty name in the list.
void override_repeating(problem_input& in, const std::string& list);

/// \brief The help text of `--configuration`, with the accepted keys.
std::string configuration_help();

/// \brief `--configuration KEY` given on the command line (overrides the file).
/// \throws input_error when KEY is not one of `regime_configurations`.
void override_configuration(problem_input& in, const std::string& key);

/// \brief The standard uncertainty, in the variable's own unit, that a `prototype_uncertainty`
/// or `model_uncertainty` key (`key`) gives for the value `x` (in that unit): a number in the
/// unit, a string with a unit ("0.5 K") or a per cent of `x` ("2 %"); empty without one.
/// \throws input_error naming the file, line and key for a bad text or a negative value.
std::optional<double> scale_uncertainty(const problem_file& f, const std::optional<file_quantity>& q,
                                        const variable& var, const std::optional<double>& x, const std::string& key);

/// \brief `analyze()` of the input.
/// \throws input_error for every `analysis_error`, saying where the name came from.
nondim::analysis analyze_input(const problem_input& in);

}  // namespace nondim::tool
