cmake_minimum_required(VERSION 3.21)
# The rule that picks nondim::quantity or the analysis half for nondim's own targets
# (cmake/nondim_build.cmake), on files whose includes are known.
include(${SOURCE_DIR}/cmake/nondim_build.cmake)
set(CMAKE_CURRENT_SOURCE_DIR ${SOURCE_DIR})
foreach(expected IN ITEMS "tests/quantity_test.cpp=FALSE" "tests/parse_unit_test.cpp=FALSE"
                          "tests/pi_groups_test.cpp=FALSE" "tests/cli/problem_file_test.cpp=FALSE"
                          "tests/consumer/app/quantity_only.cpp=FALSE" "tests/catalog_test.cpp=TRUE"
                          "tests/analysis_exact_test.cpp=TRUE" "tests/report_test.cpp=TRUE"
                          "tests/runtime_scales_test.cpp=TRUE" "tests/thread/thread_safety_test.cpp=TRUE"
                          "tests/consumer/make/nondim_impl.cpp=TRUE" "src/nondim.cpp=TRUE")
  string(REPLACE "=" ";" pair "${expected}")
  list(GET pair 0 file)
  list(GET pair 1 want)
  nondim_uses_analysis(got ${SOURCE_DIR}/${file})
  if(NOT got STREQUAL want)
    message(FATAL_ERROR "${file}: uses the analysis half = ${got}, expected ${want}")
  endif()
endforeach()
message(STATUS "link choice: as expected")
