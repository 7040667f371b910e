# The sources of the `nondim` program but main.cpp, in one place. tools/nondim/CMakeLists.txt
# compiles them once into the program's object libraries; tests/fuzz/CMakeLists.txt compiles
# them again with the fuzzers' instrumentation (cli_args_fuzz runs the whole program
# in-process, and libFuzzer needs its coverage and sanitizer flags on every object it steers
# by). A new source of the program is added here and nowhere else. Included, not added as a
# directory, so that a fuzz build (NONDIM_BUILD_TOOLS=OFF) has the list too.
#
# Sets, as absolute paths:
#   NONDIM_CLI_DIR                   this folder (the program's headers)
#   NONDIM_CLI_PROBLEM_FILE_SOURCES  the problem-file reader (toml++), values, messages
#   NONDIM_CLI_FIT_SOURCES           the CSV reader (libcsv) and the fit
#   NONDIM_CLI_COMMAND_SOURCES       the argument handling, the commands, the embedded demo rig
#   NONDIM_CLI_SOURCES               all three
set(NONDIM_CLI_DIR ${CMAKE_CURRENT_LIST_DIR})
set(NONDIM_CLI_PROBLEM_FILE_SOURCES problem_file.cpp messages.cpp value_text.cpp)
set(NONDIM_CLI_FIT_SOURCES csv_table.cpp fit_data.cpp fit_output.cpp)
set(NONDIM_CLI_COMMAND_SOURCES
    run.cpp
    cmd_groups.cpp
    cmd_convert.cpp
    cmd_dim.cpp
    cmd_demo.cpp
    cmd_scale.cpp
    scale_notes.cpp
    cmd_fit.cpp
    problem_input.cpp
    units_text.cpp)
list(TRANSFORM NONDIM_CLI_PROBLEM_FILE_SOURCES PREPEND ${NONDIM_CLI_DIR}/)
list(TRANSFORM NONDIM_CLI_FIT_SOURCES PREPEND ${NONDIM_CLI_DIR}/)
list(TRANSFORM NONDIM_CLI_COMMAND_SOURCES PREPEND ${NONDIM_CLI_DIR}/)

# The demo rig's problem and data, built into the program (nondim fit --demo, nondim demo):
# generated once, at one place in the build tree, whoever includes this file.
set(NONDIM_CLI_DEMO_RIG ${PROJECT_BINARY_DIR}/tools/nondim/demo_rig.cpp)
file(READ ${PROJECT_SOURCE_DIR}/examples/data/cylinder_rig.toml NONDIM_DEMO_PROBLEM)
file(READ ${PROJECT_SOURCE_DIR}/examples/data/cylinder_rig.csv NONDIM_DEMO_DATA)
set_property(DIRECTORY APPEND PROPERTY CMAKE_CONFIGURE_DEPENDS ${PROJECT_SOURCE_DIR}/examples/data/cylinder_rig.toml
                                                               ${PROJECT_SOURCE_DIR}/examples/data/cylinder_rig.csv)
configure_file(${NONDIM_CLI_DIR}/demo_rig.cpp.in ${NONDIM_CLI_DEMO_RIG} @ONLY)
list(APPEND NONDIM_CLI_COMMAND_SOURCES ${NONDIM_CLI_DEMO_RIG})

set(NONDIM_CLI_SOURCES ${NONDIM_CLI_PROBLEM_FILE_SOURCES} ${NONDIM_CLI_FIT_SOURCES} ${NONDIM_CLI_COMMAND_SOURCES})
