// The one source of a Makefile project that compiles nondim's analysis half.
#include <nondim/implementation.ipp>
