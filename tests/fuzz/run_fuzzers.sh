#!/bin/bash
# Build every libFuzzer target with Clang (ASan + UBSan) and run each, one at a time, for
# SECONDS on a copy of its seed corpus. Exits non-zero on any finding (crash, sanitizer
# report, undocumented exception, leak, timeout) or build failure.
#
# Usage: tests/fuzz/run_fuzzers.sh [--merge] [--keep-findings] [--nice N] [--timeout S] [--target NAME]... SECONDS [BUILD_DIR]
#   --merge          merge the run's new coverage into tests/fuzz/corpus/NAME (libFuzzer
#                    -merge=1: only inputs that add coverage are added, existing seeds kept)
#   --keep-findings  copy every failing input into tests/fuzz/corpus/NAME as finding-<sha1>,
#                    so that the corpus test keeps failing until it is fixed (then give it a
#                    doctest beside the code it broke)
#   --target NAME    run only NAME (e.g. analyze_fuzz); may be repeated
#   --nice N         run the fuzzers (and their merges) at niceness N, on a machine shared
#                    with builds; configuring and building keep the caller's priority
#   --timeout S      an input running longer than S seconds is a finding (a timeout, or a
#                    slow unit past libFuzzer's report; default 10). The
#                    clock is the wall's: a fuzzer at niceness 19 beside builds can wait longer
#                    than that for the CPU, so give such a run a larger S (300)
# CI runs 30 s per target; before a release, `--merge --keep-findings 600` (DEVELOPERS.md).
# The last line per target gives its executions and features, and the CPU seconds the fuzzer
# had in its SECONDS of wall-clock time (on a loaded machine, far fewer); a summary ends the run.
set -euo pipefail
merge=0
keep=0
nice_level=""
timeout=10
targets=()
while [ $# -gt 0 ]; do
  case "$1" in
    --merge) merge=1; shift ;;
    --keep-findings) keep=1; shift ;;
    --target) targets+=("$2"); shift 2 ;;
    --nice) nice_level="$2"; shift 2 ;;
    --timeout) timeout="$2"; shift 2 ;;
    -h|--help) sed -n '2,23p' "$0"; exit 0 ;;
    *) break ;;
  esac
done
seconds=${1:?usage: run_fuzzers.sh [--merge] [--keep-findings] [--nice N] [--timeout S] [--target NAME]... SECONDS [BUILD_DIR]}
here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../.." && pwd)
build=${2:-$root/build/fuzz}

cmake -S "$root" -B "$build" -G Ninja -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DNONDIM_WERROR=ON -DNONDIM_BUILD_FUZZERS=ON -DNONDIM_BUILD_EXAMPLES=OFF -DNONDIM_BUILD_TOOLS=OFF >/dev/null

if [ ${#targets[@]} -eq 0 ]; then
  for source in "$here"/*_fuzz.cpp; do targets+=("$(basename "$source" .cpp)"); done
fi

# the fuzzers' own priority; the CPU time they get, where /usr/bin/time can tell
run=()
if [ -n "$nice_level" ]; then run+=(nice -n "$nice_level"); fi
timed=()
if [ -x /usr/bin/time ]; then timed=(/usr/bin/time -f "%U %S"); fi

status=0
summary=""
for name in "${targets[@]}"; do
  corpus_name=${name%_fuzz}
  seeds="$here/corpus/$corpus_name"
  cmake --build "$build" --target "$name" -j 2
  fuzzer="$build/tests/fuzz/$name"
  work=$(mktemp -d)
  mkdir -p "$work/corpus" "$work/artifacts"
  if [ -d "$seeds" ]; then cp -r "$seeds/." "$work/corpus/"; fi
  echo "== $name: ${seconds} s"
  if ! "${timed[@]}" ${timed:+-o "$work/cpu"} "${run[@]}" "$fuzzer" "$work/corpus" -max_total_time="$seconds" -max_len=512 -timeout="$timeout" -report_slow_units="$timeout" \
       -rss_limit_mb=2048 -print_final_stats=1 -artifact_prefix="$work/artifacts/" 2>"$work/log"; then
    tail -n 60 "$work/log"
    echo "!! $name found a fault; inputs kept in $work/artifacts" >&2
    status=1
  fi
  execs=$(grep -Eo "stat::number_of_executed_units: *[0-9]+" "$work/log" | grep -Eo "[0-9]+$" || echo "?")
  cov=$(grep -Eo "cov: [0-9]+ ft: [0-9]+" "$work/log" | tail -n 1 || echo "cov: ?")
  cpu="?"
  if [ -s "$work/cpu" ]; then cpu=$(awk 'END { printf "%.0f", $1 + $2 }' "$work/cpu"); fi
  grep -E "stat::number_of_executed_units|stat::new_units_added" "$work/log" || true
  echo "   CPU: ${cpu} s in ${seconds} s"
  if [ -n "$(ls -A "$work/artifacts")" ]; then
    echo "!! $name left artifacts in $work/artifacts" >&2
    status=1
    if [ $keep -eq 1 ]; then
      mkdir -p "$seeds"
      for f in "$work/artifacts"/*; do
        cp "$f" "$seeds/finding-$(sha1sum "$f" | cut -c1-16)"
      done
      echo "!! kept in $seeds as finding-*: fix the fault and give each a doctest" >&2
    fi
    summary+="$name: $execs executions, $cov, ${cpu} s CPU, FINDINGS"$'\n'
    continue
  fi
  if [ $merge -eq 1 ]; then
    before=$(ls "$seeds" | wc -l)
    # -merge=1: inputs of the run's corpus that add coverage to the seeds, minimised;
    # -use_counters=0 counts edges only, not how often each runs (else hundreds of inputs)
    "${run[@]}" "$fuzzer" -merge=1 -use_counters=0 -max_len=512 -timeout="$timeout" -rss_limit_mb=2048 "$seeds" "$work/corpus" \
      2>"$work/merge.log" ||
      { tail -n 20 "$work/merge.log"; status=1; }
    echo "   merged: $(( $(ls "$seeds" | wc -l) - before )) new inputs into $seeds"
  fi
  summary+="$name: $execs executions, $cov, ${cpu} s CPU"$'\n'
  rm -rf "$work"
done
printf '%s' "$summary"
exit $status
