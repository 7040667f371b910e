# Compile SOURCE (with DEFINES) with only nondim's include directory and list every header it
# opens (-H): none may come from Boost or Eigen.
set(flags)
foreach(d IN LISTS DEFINES)
  list(APPEND flags -D${d})
endforeach()
execute_process(COMMAND ${CXX} -x c++ -std=c++20 -fsyntax-only -H ${flags} -I ${INCLUDE} ${SOURCE}
                RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE out)
if(NOT rc EQUAL 0)
  message(FATAL_ERROR "${SOURCE} does not compile with the standard library alone:\n${out}")
endif()
if(out MATCHES "(boost/|eigen3|Eigen/)")
  message(FATAL_ERROR "${SOURCE} pulls in a non-standard header: ${CMAKE_MATCH_1}")
endif()
