// The owner of the tests' precompiled headers (tests/CMakeLists.txt): a translation unit
// with nothing of its own.
