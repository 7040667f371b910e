#!/bin/sh
# Build nondim and run its demo: the README's first quick-start command.
set -eu
cd "$(dirname "$0")/.."
scripts/install-deps.sh
cmake --preset release >/dev/null
cmake --build --preset release --target solver_inputs >/dev/null
exec ./build/release/examples/solver_inputs "$@"
