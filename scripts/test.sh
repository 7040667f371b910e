#!/bin/sh
# Build nondim and run its test suite (GCC, warnings as errors): the README's test command.
set -eu
cd "$(dirname "$0")/.."
scripts/install-deps.sh
cmake --workflow --preset release
