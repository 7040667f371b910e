# Compile SOURCE with only nondim's include directory and list every header it opens (-H).
execute_process(COMMAND ${CXX} -std=c++20 -fsyntax-only -H -I ${INCLUDE} ${SOURCE}
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE out)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "${SOURCE} does not compile with the standard library alone:\n${out}")
endif()
if(out MATCHES "(boost/|eigen3|Eigen/)")
  message(FATAL_ERROR "${SOURCE} pulls in a non-standard header: ${CMAKE_MATCH_1}")
endif()
