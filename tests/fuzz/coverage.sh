#!/bin/bash
# Line coverage of the fuzz corpora: builds the libFuzzer targets with Clang's source-based
# coverage (-fprofile-instr-generate -fcoverage-mapping, on top of the fuzzers' ASan and
# UBSan), runs each over its corpus in tests/fuzz/corpus/ once (-runs=0: no mutation), and
# prints the lines covered per layer: solver/core, solver/units, solver/parse, the analysis
# half (include/nondim/analysis) and the program (tools/nondim), from llvm-cov's per-file
# summary. Usage: tests/fuzz/coverage.sh [BUILD_DIR] (default build/fuzz-coverage).
# With --files, also every file's figure. The report per file: BUILD_DIR/coverage/report.txt.
set -euo pipefail
files=0
if [ "${1:-}" = "--files" ]; then files=1; shift; fi
here=$(cd "$(dirname "$0")" && pwd)
root=$(cd "$here/../.." && pwd)
build=${1:-$root/build/fuzz-coverage}
version=$(clang++ --version | grep -Eo "version [0-9]+" | grep -Eo "[0-9]+")
profdata=$(command -v "llvm-profdata-$version" || command -v llvm-profdata)
cov=$(command -v "llvm-cov-$version" || command -v llvm-cov)
flags="-fprofile-instr-generate -fcoverage-mapping"

cmake -S "$root" -B "$build" -G Ninja -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DNONDIM_BUILD_FUZZERS=ON -DNONDIM_BUILD_EXAMPLES=OFF -DNONDIM_BUILD_TOOLS=OFF \
  -DCMAKE_CXX_FLAGS="$flags" -DCMAKE_EXE_LINKER_FLAGS="$flags" >/dev/null

out="$build/coverage"
rm -rf "$out"
mkdir -p "$out"
objects=()
for source in "$here"/*_fuzz.cpp; do
  name=$(basename "$source" .cpp)
  cmake --build "$build" --target "$name" -j 2 >/dev/null
  fuzzer="$build/tests/fuzz/$name"
  inputs=$(ls "$here/corpus/${name%_fuzz}" | wc -l)
  LLVM_PROFILE_FILE="$out/$name.profraw" "$fuzzer" -runs=0 "$here/corpus/${name%_fuzz}" 2>"$out/$name.log"
  echo "$name: $inputs corpus inputs"
  if [ ${#objects[@]} -eq 0 ]; then objects+=("$fuzzer"); else objects+=(-object "$fuzzer"); fi
done
"$profdata" merge -sparse "$out"/*.profraw -o "$out/all.profdata"
"$cov" report -instr-profile "$out/all.profdata" "${objects[@]}" "$root/include" "$root/tools" >"$out/report.txt"
"$cov" export -summary-only -instr-profile "$out/all.profdata" "${objects[@]}" "$root/include" "$root/tools" \
  >"$out/summary.json"
python3 - "$out/summary.json" "$root" "$files" <<'EOF'
import json, sys
data = json.load(open(sys.argv[1]))
root = sys.argv[2].rstrip("/") + "/"
layers = [("solver/core", "include/nondim/solver/core/"), ("solver/units", "include/nondim/solver/units/"),
          ("solver/parse", "include/nondim/solver/parse/"), ("analysis", "include/nondim/analysis/"),
          ("tool", "tools/nondim/")]
totals = {name: [0, 0] for name, _ in layers}
rows = []
for f in data["data"][0]["files"]:
    path = f["filename"].replace(root, "")
    lines = f["summary"]["lines"]
    for name, prefix in layers:
        if path.startswith(prefix):
            totals[name][0] += lines["covered"]
            totals[name][1] += lines["count"]
            rows.append((path, lines["covered"], lines["count"]))
print("line coverage of the fuzz corpora, per layer:")
for name, _ in layers:
    covered, count = totals[name]
    if count:
        print(f"  {name:13s} {covered:6d} / {count:6d} lines  {100.0 * covered / count:5.1f} %")
if sys.argv[3] == "1":
    for path, covered, count in sorted(rows):
        print(f"    {path:70s} {covered:5d} / {count:5d}  {100.0 * covered / max(count, 1):5.1f} %")
EOF
