// The analysis half of nondim compiled once: the one source of the CMake target
// nondim::compiled, built with NONDIM_SEPARATE_COMPILATION defined.
#include <nondim/implementation.ipp>
