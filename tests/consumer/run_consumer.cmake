cmake_minimum_required(VERSION 3.21)
# Run by ctest in a scratch directory SCRATCH (emptied first):
#   cmake -DMODE=install -DSOURCE_DIR=... -DPREFIX=... -DCOMMON=... -P run_consumer.cmake
#       configure nondim with its defaults and install it without building anything (the
#       README's `cmake -S . -B b && cmake --install b --prefix P`); check what was installed
#   cmake -DMODE=cmake -DAPP_DIR=... -DCOMMON=... [-DARGS=...] [-DRUN=prog;...] -P run_consumer.cmake
#       configure the consumer project APP_DIR with COMMON and ARGS, build it, run every
#       program in RUN (none: configure only)
#   cmake -DMODE=make -DAPP_DIR=... -DPREFIX=... -DCXX=... -P run_consumer.cmake
#       plain make of APP_DIR/Makefile with pkg-config pointed at PREFIX, run the programs
file(REMOVE_RECURSE ${SCRATCH})
file(MAKE_DIRECTORY ${SCRATCH})
function(run)
  execute_process(COMMAND ${ARGN} WORKING_DIRECTORY ${SCRATCH} RESULT_VARIABLE rc OUTPUT_VARIABLE out ERROR_VARIABLE out)
  if(NOT rc EQUAL 0)
    message(FATAL_ERROR "failed: ${ARGN}\n${out}")
  endif()
endfunction()
function(expect condition)
  cmake_language(EVAL CODE "if(NOT (${condition}))\n message(FATAL_ERROR [[expected: ${condition}]])\nendif()")
endfunction()

if(MODE STREQUAL "install")
  file(REMOVE_RECURSE ${PREFIX})
  run(${CMAKE_COMMAND} -S ${SOURCE_DIR} -B ${SCRATCH}/build ${COMMON})
  run(${CMAKE_COMMAND} --install ${SCRATCH}/build --prefix ${PREFIX})
  foreach(file include/nondim/quantity.hpp include/nondim/nondim.hpp include/nondim/implementation.ipp
               include/nondim/analysis/config.hpp share/cmake/nondim/nondimConfig.cmake
               share/cmake/nondim/nondimConfigVersion.cmake share/cmake/nondim/nondimQuantityTargets.cmake
               share/cmake/nondim/nondimTargets.cmake share/pkgconfig/nondim.pc share/pkgconfig/nondim-quantity.pc)
    expect("EXISTS \"${PREFIX}/${file}\"")
  endforeach()
  # nothing was built, so neither the program nor a library is installed
  file(GLOB_RECURSE built ${SCRATCH}/build/*.o ${SCRATCH}/build/*.a)
  expect("NOT built")
  file(GLOB_RECURSE installed_binaries ${PREFIX}/bin/* ${PREFIX}/lib/*)
  expect("NOT installed_binaries")
  # the package is architecture-independent: a 32-bit consumer may use it; the major
  # version must match
  set(CMAKE_SIZEOF_VOID_P 4)
  set(PACKAGE_FIND_VERSION 0.1)
  set(PACKAGE_FIND_VERSION_MAJOR 0)
  include(${PREFIX}/share/cmake/nondim/nondimConfigVersion.cmake)
  expect("PACKAGE_VERSION_COMPATIBLE AND NOT PACKAGE_VERSION_UNSUITABLE")
  set(PACKAGE_FIND_VERSION 1.0)
  set(PACKAGE_FIND_VERSION_MAJOR 1)
  include(${PREFIX}/share/cmake/nondim/nondimConfigVersion.cmake)
  expect("NOT PACKAGE_VERSION_COMPATIBLE")
  # the pkg-config files name the prefix given to --install
  file(STRINGS ${PREFIX}/share/pkgconfig/nondim.pc pc_prefix REGEX "^prefix=")
  expect("pc_prefix STREQUAL \"prefix=${PREFIX}\"")
elseif(MODE STREQUAL "cmake")
  run(${CMAKE_COMMAND} -S ${APP_DIR} -B ${SCRATCH}/build ${COMMON} ${ARGS})
  if(RUN)
    run(${CMAKE_COMMAND} --build ${SCRATCH}/build --parallel 2)
  endif()
  foreach(program IN LISTS RUN)
    run(${SCRATCH}/build/${program})
  endforeach()
elseif(MODE STREQUAL "make")
  find_program(MAKE_PROGRAM NAMES make gmake REQUIRED)
  set(make ${MAKE_PROGRAM} -f ${APP_DIR}/Makefile -j2 CXX=${CXX} APP=${APP_DIR}/../app)
  # nondim-quantity.pc alone: pkg-config sees the scratch install and nothing else, so the
  # solver half must need no other package (Eigen's eigen3.pc is out of sight)
  run(${CMAKE_COMMAND} -E env PKG_CONFIG_LIBDIR=${PREFIX}/share/pkgconfig ${make} quantity_consumer)
  # nondim.pc: the scratch install before the system's directories (eigen3.pc)
  run(${CMAKE_COMMAND} -E env PKG_CONFIG_PATH=${PREFIX}/share/pkgconfig ${make} consumer)
  run(${SCRATCH}/quantity_consumer)
  run(${SCRATCH}/consumer)
else()
  message(FATAL_ERROR "MODE must be install, cmake or make")
endif()
message(STATUS "consumer (${MODE}) ${APP_DIR}: passed")
