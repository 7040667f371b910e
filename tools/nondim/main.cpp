/// \file main.cpp
/// \brief `nondim`: dimensional analysis, unit conversion and similarity planning from the
/// command line (run.cpp does the work).

#include <iostream>

#include "run.hpp"

int main(int argc, char** argv) {
  return nondim::tool::run(argc, argv, std::cout, std::cerr);
}
