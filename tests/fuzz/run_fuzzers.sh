#!/bin/bash
# Build every libFuzzer target with Clang (ASan + UBSan) and run each for SECONDS on a
# copy of its seed corpus. Exits non-zero on any finding (crash, sanitizer report, leak,
# timeout) or build failure. Usage: tests/fuzz/run_fuzzers.sh SECONDS [BUILD_DIR]
set -euo pipefail
seconds=${1:?usage: run_fuzzers.sh SECONDS [BUILD_DIR]}
here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../.." && pwd)
build=${2:-$root/build/fuzz}

cmake -S "$root" -B "$build" -G Ninja -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DNONDIM_WERROR=ON -DNONDIM_BUILD_FUZZERS=ON -DNONDIM_BUILD_EXAMPLES=OFF -DNONDIM_BUILD_TOOLS=OFF >/dev/null

status=0
for source in "$here"/*_fuzz.cpp; do
  name=$(basename "$source" .cpp)
  corpus_name=${name%_fuzz}
  cmake --build "$build" --target "$name" -j 2
  work=$(mktemp -d)
  mkdir -p "$work/corpus" "$work/artifacts"
  if [ -d "$here/corpus/$corpus_name" ]; then cp -r "$here/corpus/$corpus_name/." "$work/corpus/"; fi
  echo "== $name: ${seconds} s"
  if ! "$build/tests/fuzz/$name" "$work/corpus" -max_total_time="$seconds" -max_len=512 -timeout=10 \
       -rss_limit_mb=2048 -print_final_stats=1 -artifact_prefix="$work/artifacts/" 2>"$work/log"; then
    tail -n 60 "$work/log"
    echo "!! $name found a fault; inputs kept in $work/artifacts" >&2
    status=1
    continue
  fi
  grep -E "stat::number_of_executed_units|stat::new_units_added" "$work/log" || true
  if [ -n "$(ls -A "$work/artifacts")" ]; then
    echo "!! $name left artifacts in $work/artifacts" >&2
    status=1
    continue
  fi
  rm -rf "$work"
done
exit $status
