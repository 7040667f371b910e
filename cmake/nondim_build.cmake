# Helpers for nondim's own build (not installed).

# nondim_uses_analysis(<out-var> <source>...)
# TRUE when one of the sources, or a header of its own folder that it includes with quotes
# (followed transitively), includes a header of the analysis half: anything under
# <nondim/analysis/...>, or the entry headers <nondim/analysis.hpp>, <nondim/similarity.hpp>,
# <nondim/data.hpp>, <nondim/report.hpp>, <nondim/nondim.hpp>, <nondim/implementation.ipp>. Such a source needs
# nondim::compiled or nondim::nondim; any other needs nondim::quantity alone.
function(nondim_uses_analysis out)
  set(pending "")
  foreach(source IN LISTS ARGN)
    get_filename_component(source "${source}" ABSOLUTE BASE_DIR "${CMAKE_CURRENT_SOURCE_DIR}")
    list(APPEND pending "${source}")
  endforeach()
  set(seen "")
  set(result FALSE)
  while(pending AND NOT result)
    list(POP_FRONT pending file)
    if(file IN_LIST seen OR NOT EXISTS "${file}")
      continue()
    endif()
    list(APPEND seen "${file}")
    get_filename_component(dir "${file}" DIRECTORY)
    file(STRINGS "${file}" lines REGEX "^[ \t]*#[ \t]*include")
    foreach(line IN LISTS lines)
      if(line MATCHES "<nondim/(analysis/|analysis\\.hpp|data\\.hpp|similarity\\.hpp|report\\.hpp|nondim\\.hpp|implementation\\.ipp)")
        set(result TRUE)
        break()
      elseif(line MATCHES "\"([^\"]+)\"" AND EXISTS "${dir}/${CMAKE_MATCH_1}")
        list(APPEND pending "${dir}/${CMAKE_MATCH_1}")
      endif()
    endforeach()
  endwhile()
  set(${out} ${result} PARENT_SCOPE)
endfunction()

# nondim_link(<target> <source>...)
# Links <target> to what its sources include: ${NONDIM_ANALYSIS_TARGET} (nondim::compiled, or
# nondim::nondim with NONDIM_HEADER_ONLY=ON) when they use the analysis half, else
# nondim::quantity (standard library only: a solver-half test that slips an analysis header
# in fails to compile or to link).
function(nondim_link target)
  # a test that computes a reference with Eigen itself links Eigen for that
  foreach(source IN LISTS ARGN)
    file(STRINGS "${source}" eigen_lines REGEX "^[ \t]*#[ \t]*include[ \t]*<Eigen/")
    if(eigen_lines)
      target_link_libraries(${target} PRIVATE Eigen3::Eigen)
      break()
    endif()
  endforeach()
  nondim_uses_analysis(analysis ${ARGN})
  if(analysis)
    target_link_libraries(${target} PRIVATE ${NONDIM_ANALYSIS_TARGET})
  else()
    target_link_libraries(${target} PRIVATE nondim::quantity)
  endif()
endfunction()
