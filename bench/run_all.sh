#!/usr/bin/env bash
# Build and run every nondim benchmark, then the instruction-count (-O2 and -O0), compile-cost and
# header-cost scripts, and print the ratios at the end. Installs nothing: fails with a message if a
# tool is missing.
#
#   bench/run_all.sh [--build-dir DIR] [--jobs N] [--min-time S] [--repetitions N] [--cells N] [--runs N]
#
#   --build-dir    CMake build directory (default build/bench, ignored by git)
#   --jobs         parallel compile jobs (default 1: the machine is shared)
#   --min-time     --benchmark_min_time per benchmark, seconds (default 0.1)
#   --repetitions  --benchmark_repetitions, medians are taken over them (default 5)
#   --cells        cells for callgrind_compare.sh, heat and flux kernels (default 100000)
#   --runs         compiles per translation unit in compile_cost.py and header_cost.py (default 5)
#
# Needs: cmake, a C++20 compiler (g++ 12 / clang++ 14), Google Benchmark (Debian libbenchmark-dev),
# valgrind, /usr/bin/python3. Logs of every step go to <build-dir>/bench-logs/.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
root=$(cd "$here/.." && pwd)
build="$root/build/bench"
jobs=1
min_time=0.1
reps=5
cells=100000
runs=5
while [[ $# -gt 0 ]]; do
  case "$1" in
    --build-dir) build=$(realpath -m "$2"); shift 2 ;;
    --jobs) jobs=$2; shift 2 ;;
    --min-time) min_time=$2; shift 2 ;;
    --repetitions) reps=$2; shift 2 ;;
    --cells) cells=$2; shift 2 ;;
    --runs) runs=$2; shift 2 ;;
    -h|--help) sed -n '2,16p' "$0"; exit 0 ;;
    *) echo "run_all.sh: unknown argument '$1' (see --help)" >&2; exit 2 ;;
  esac
done

fail() { echo "run_all.sh: $*" >&2; exit 3; }
command -v cmake >/dev/null 2>&1 || fail "cmake not found (Debian: apt-get install cmake)"
command -v valgrind >/dev/null 2>&1 || fail "valgrind not found (Debian: apt-get install valgrind)"
[[ -x /usr/bin/python3 ]] || fail "/usr/bin/python3 not found (Debian: apt-get install python3)"
# Google Benchmark: its CMake package (find_package(benchmark)) in a standard prefix
if ! compgen -G "/usr/lib/*/cmake/benchmark/benchmarkConfig.cmake" >/dev/null &&
   ! compgen -G "/usr/lib/cmake/benchmark/benchmarkConfig.cmake" >/dev/null &&
   ! compgen -G "/usr/local/lib*/cmake/benchmark/benchmarkConfig.cmake" >/dev/null &&
   [[ -z "${benchmark_DIR:-}" ]]; then
  fail "Google Benchmark not found (Debian: apt-get install libbenchmark-dev; or set benchmark_DIR)"
fi

logs="$build/bench-logs"
mkdir -p "$logs"
generator=()
command -v ninja >/dev/null 2>&1 && generator=(-G Ninja)

step() { printf '\n==== %s\n' "$1"; }

step "configure ($build, Release, benchmarks only)"
if ! cmake -S "$root" -B "$build" "${generator[@]}" -DCMAKE_BUILD_TYPE=Release -DNONDIM_BUILD_BENCH=ON \
      -DNONDIM_BUILD_TESTS=OFF -DNONDIM_BUILD_EXAMPLES=OFF -DNONDIM_BUILD_TOOLS=OFF >"$logs/configure.log" 2>&1; then
  cat "$logs/configure.log" >&2
  fail "CMake configure failed (is Google Benchmark installed? see above)"
fi

step "build"
# One target per bench/*_bench.cpp; a benchmark that does not build is reported and skipped,
# the others still run, and the script exits 1 at the end.
broken=()
benches=()
for src in "$here"/*_bench.cpp; do
  name=$(basename "$src" .cpp)
  if cmake --build "$build" --target "$name" -j"$jobs" >"$logs/build-$name.log" 2>&1; then
    benches+=("$build/bench/$name")
  else
    broken+=("$name")
    echo "run_all.sh: $name does not build, skipped (log: $logs/build-$name.log):" >&2
    grep -m3 -E 'error|Error' "$logs/build-$name.log" >&2 || true
  fi
done
[[ ${#benches[@]} -gt 0 ]] || fail "no benchmark builds, logs in $logs"

summaries=()
for exe in "${benches[@]}"; do
  name=$(basename "$exe")
  step "$name (min_time $min_time s, $reps repetitions, medians)"
  status=0
  "$exe" --benchmark_min_time="$min_time" --benchmark_repetitions="$reps" --benchmark_report_aggregates_only=true \
    --benchmark_color=false >"$logs/$name.log" 2>&1 || status=$?
  cat "$logs/$name.log"
  [[ $status == 0 ]] || broken+=("$name (exit status $status)")
  # ratio lines: `summary: ...` lines, and the indented block after a line starting "ratio"
  while IFS= read -r line; do summaries+=("$name: $line"); done < <(
    awk '/^summary:/ {print; next} /^ratio/ {inblock = 1; print; next} inblock && /^  / {print; next} {inblock = 0}' \
      "$logs/$name.log")
done

step "instruction counts (callgrind), -O2 and -O0"
"$here/callgrind_compare.sh" --cells "$cells" --opt "-O2 -O0" 2>&1 | tee "$logs/callgrind.log"
while IFS= read -r line; do summaries+=("callgrind: $line"); done < <(grep -E '^(g\+\+|clang\+\+) ' "$logs/callgrind.log" || true)
"$here/callgrind_compare.sh" --kernel flux --cells "$cells" --opt "-O2 -O0" 2>&1 | tee "$logs/callgrind_flux.log"
while IFS= read -r line; do summaries+=("callgrind flux: $line"); done < <(grep -E '^(g\+\+|clang\+\+) ' "$logs/callgrind_flux.log" || true)

step "compile cost"
/usr/bin/python3 "$here/compile_cost.py" --runs "$runs" 2>&1 | tee "$logs/compile_cost.log"
while IFS= read -r line; do summaries+=("compile: $line"); done < <(grep '^summary:' "$logs/compile_cost.log" || true)

step "compile cost of each solver-half header alone"
/usr/bin/python3 "$here/header_cost.py" --runs "$runs" --markdown 2>&1 | tee "$logs/header_cost.log" || broken+=("header_cost.py")
while IFS= read -r line; do summaries+=("headers: $line"); done < <(grep '^summary:' "$logs/header_cost.log" || true)

step "ratios"
printf '%s\n' "${summaries[@]}"
echo "(machine: $(nproc) cores, $(lscpu | sed -n 's/^Model name:[[:space:]]*//p'); logs in $logs)"
if [[ ${#broken[@]} -gt 0 ]]; then
  printf 'run_all.sh: benchmarks that did not build or failed: %s\n' "${broken[*]}" >&2
  exit 1
fi
