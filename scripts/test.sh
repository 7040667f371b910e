#!/bin/sh
# Build nondim and run its test suite: the README's test command. GCC 12 at -Og (optimised,
# quick to compile), warnings as errors. The packaging tests, which build nondim as an
# outside project would (installed, as a subdirectory, through pkg-config), take about two
# minutes more: `scripts/test.sh --packaging` runs them too (CI always does).
set -eu
cd "$(dirname "$0")/.."
scripts/install-deps.sh
cmake --workflow --preset check
if [ "${1:-}" = "--packaging" ]; then
  cmake --workflow --preset packaging
fi
