#!/bin/sh
# Build the nondim program and run its demo (the README's first quick-start command).
# Extra arguments go to `nondim demo` (e.g. --help).
set -eu
cd "$(dirname "$0")/.."
scripts/install-deps.sh
cmake --preset release >/dev/null
cmake --build --preset release --target nondim_cli >/dev/null
exec ./build/release/tools/nondim/nondim demo "$@"
