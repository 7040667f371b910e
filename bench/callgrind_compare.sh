#!/usr/bin/env bash
# Instruction counts (callgrind Ir, deterministic) of a solver kernel written on nondim types and
# on raw double, at -O2 (and -O0 with --opt), with each compiler found.
#
#   bench/callgrind_compare.sh [--kernel heat|flux] [--cells N] [--compilers "g++ clang++"] [--opt "-O2 -O0"]
#                              [--include DIR] [--work DIR] [--strict]
#
# --kernel heat (default): the wall heat-transfer kernel of heat_kernel.hpp on quantities, in two
# forms (one expression for Nu; the power terms named), driver callgrind_driver.cpp.
# --kernel flux: the flux of quasi-1D flow of flux_kernel.hpp on typed fields, in two forms
# (`views`: a field_view per component over double[3][n]; `state`: state_views over double[n][3]),
# and two yardsticks on the least typed quantity of typed_floor.hpp (`floor_views`: the views
# kernel on the least typed views; `floor_values`: typed arithmetic on raw loads), each against
# the raw views kernel; driver flux_callgrind_driver.cpp.
# For every compiler and form it compiles the driver once per kernel (each binary holds one kernel),
# runs it under `valgrind --tool=callgrind --toggle-collect=<kernel>` so only the kernel and
# what it calls are counted, and prints per cell:
#   incl  Ir of the kernel and its callees (libm pow included): the cost a solver pays
#   self  Ir of the kernel's own instructions
# and the ratio typed/double, for each optimisation level of --opt (default -O2; "-O2 -O0"
# adds the debug-build figures). The target is a ratio of 1 (equal counts) at -O2 and at most 2
# at -O0 (DESIGN.md, "Performance targets"); --strict checks only the -O2 one. The checksums
# say whether both kernels produced bit-identical outputs. --strict: exit 1 if any inclusive
# count differs. --include DIR: use the nondim headers in DIR (an A/B of a library change).
# Needs valgrind; installs nothing.
set -euo pipefail

here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)
root=$(cd "$here/.." && pwd)
cells=100000
compilers="g++ clang++"
work=""
strict=0
include="$root/include"
opts="-O2"
kernel_set=heat
while [[ $# -gt 0 ]]; do
  case "$1" in
    --cells) cells=$2; shift 2 ;;
    --compilers) compilers=$2; shift 2 ;;
    --work) work=$2; shift 2 ;;
    --include) include=$(realpath "$2"); shift 2 ;;
    --opt) opts=$2; shift 2 ;;
    --strict) strict=1; shift ;;
    --kernel) kernel_set=$2; shift 2 ;;
    -h|--help) sed -n '2,25p' "$0"; exit 0 ;;
    *) echo "callgrind_compare.sh: unknown argument '$1' (see --help)" >&2; exit 2 ;;
  esac
done

for tool in valgrind callgrind_annotate; do
  if ! command -v "$tool" >/dev/null 2>&1; then
    echo "callgrind_compare.sh: '$tool' not found; install valgrind (Debian: apt-get install valgrind)" >&2
    exit 3
  fi
done
if [[ -z "$work" ]]; then
  work=$(mktemp -d "${TMPDIR:-/tmp}/nondim-callgrind.XXXXXX")
  trap 'rm -rf "$work"' EXIT
fi
mkdir -p "$work"

flags=(-std=c++20 -Wall -Wextra -Wpedantic -Wshadow -Wconversion -Wsign-conversion -Werror
       -I"$include" -I"$here")

# name of the kernel function -> 1 if it is the typed form
declare -A is_quantity=([heat_kernel_quantity]=1 [heat_kernel_double]=0
                        [heat_kernel_quantity_named]=1 [heat_kernel_double_named]=0
                        [flux_kernel_typed_views]=1 [flux_kernel_double_views]=0
                        [flux_kernel_typed_state]=1 [flux_kernel_double_state]=0
                        [flux_kernel_floor_views]=1 [flux_kernel_floor_values]=1)
case "$kernel_set" in
  heat) forms="expression named"; driver="$here/callgrind_driver.cpp" ;;
  flux) forms="views state floor_views floor_values"; driver="$here/flux_callgrind_driver.cpp" ;;
  *) echo "callgrind_compare.sh: --kernel is heat or flux, not '$kernel_set'" >&2; exit 2 ;;
esac
# kernel_name FORM TYPED(quantity|double): the function measured
kernel_name() {
  if [[ $kernel_set == heat ]]; then
    local suffix=""; [[ $1 == named ]] && suffix="_named"
    echo "heat_kernel_$2$suffix"
  else
    case "$1/$2" in
      floor_*/quantity) echo "flux_kernel_$1" ;;     # a yardstick of typed_floor.hpp
      floor_*/double) echo "flux_kernel_double_views" ;;
      */quantity) echo "flux_kernel_typed_$1" ;;
      *) echo "flux_kernel_double_$1" ;;
    esac
  fi
}

# run KERNEL BINARY: prints "incl self checksum"
measure() {
  local kernel=$1 bin=$2 out="$work/$(basename "$2").callgrind"
  local sum
  # LD_BIND_NOW: resolve pow@plt before the kernel starts, so lazy binding is not counted
  sum=$(LD_BIND_NOW=1 valgrind --tool=callgrind --toggle-collect="*::${kernel}(*" \
          --callgrind-out-file="$out" "$bin" "$cells" 2>"$out.log") \
    || { echo "callgrind_compare.sh: $bin failed under valgrind, see $out.log" >&2; exit 1; }
  local incl self
  incl=$(awk '/^totals:/ {print $2}' "$out")
  self=$(callgrind_annotate "$out" 2>/dev/null | awk -v k="::${kernel}(" 'index($0, k) {gsub(",", "", $1); print $1; exit}')
  [[ -n "$incl" && -n "$self" ]] || { echo "callgrind_compare.sh: no counts for $kernel in $out" >&2; exit 1; }
  echo "$incl $self $sum"
}

status=0
printf '%s kernel, %s cells, callgrind Ir per cell (kernel only; qty = the typed form)\n' "$kernel_set" "$cells"
printf '%-8s %-4s %-10s %10s %12s %8s %10s %10s %8s  %s\n' compiler opt form "incl(qty)" "incl(dbl)" ratio \
  "self(qty)" "self(dbl)" ratio outputs
found=0
for cxx in $compilers; do
  if ! command -v "$cxx" >/dev/null 2>&1; then
    echo "callgrind_compare.sh: compiler '$cxx' not found, skipped" >&2
    continue
  fi
  found=1
  for opt in $opts; do
    for form in $forms; do
      declare -A res=()
      for rep in quantity double; do
        kernel=$(kernel_name "$form" "$rep")
        bin="$work/${cxx//+/x}${opt}_${kernel}"
        "$cxx" "${flags[@]}" "$opt" -DNONDIM_BENCH_KERNEL="$kernel" \
          -DNONDIM_BENCH_QUANTITY="${is_quantity[$kernel]}" "$driver" -o "$bin"
        res[$rep]=$(measure "$kernel" "$bin")
      done
      read -r qi qs qsum <<<"${res[quantity]}"
      read -r di ds dsum <<<"${res[double]}"
      same="bit-identical"; [[ "$qsum" == "$dsum" ]] || same="DIFFER ($qsum vs $dsum)"
      awk -v c="$cxx" -v o="$opt" -v f="$form" -v n="$cells" -v qi="$qi" -v di="$di" -v qs="$qs" -v ds="$ds" \
        -v s="$same" 'BEGIN { printf "%-8s %-4s %-10s %10.2f %12.2f %8.4f %10.2f %10.2f %8.4f  %s\n",
                              c, o, f, qi / n, di / n, qi / di, qs / n, ds / n, qs / ds, s }'
      [[ $opt != -O2 || "$qi" == "$di" || $form == floor_* ]] || status=1  # the yardsticks are not nondim
      unset res
    done
  done
done
[[ $found == 1 ]] || { echo "callgrind_compare.sh: none of the compilers '$compilers' found" >&2; exit 3; }
if [[ $status != 0 ]]; then
  echo "note: inclusive counts at -O2 differ for at least one compiler/form (target: equal)"
  [[ $strict == 1 ]] && exit 1
fi
exit 0
