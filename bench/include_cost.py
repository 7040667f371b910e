#!/usr/bin/python3
"""What including each nondim entry header costs, header-only and compiled once.

For every entry header (and <Eigen/Dense>, the baseline the design measures against) it
compiles a translation unit that holds only that #include, with `-std=c++20 -O2 -c`, several
times, and prints the median CPU time of the compiler (user + system of the child, which
preemption on a shared machine does not inflate) and the ratio to <Eigen/Dense>. It does so
twice: header-only (the CMake target nondim::nondim) and with NONDIM_SEPARATE_COMPILATION
(nondim::compiled, whose headers declare only). It also times a small program that calls
analyze() and prints the groups, in both configurations, and the one source that compiles
the analysis half once (src/nondim.cpp).

  bench/include_cost.py [--runs 5] [--compilers g++,clang++]

Targets (DESIGN.md, "Compile cost"): <nondim/nondim.hpp> compiled once at most 1.5x
<Eigen/Dense>; every solver-half header under 1 s. Installs nothing.
"""

import argparse
import os
import shutil
import statistics
import sys
import tempfile

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import header_cost  # noqa: E402  (the CPU-time measure shared by the bench scripts)

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(HERE)
EIGEN = "/usr/include/eigen3"

HEADERS = ["nondim/quantity.hpp", "nondim/parse.hpp", "nondim/solver.hpp", "nondim/analysis.hpp",
           "nondim/similarity.hpp", "nondim/report.hpp", "nondim/nondim.hpp"]
SOLVER_HALF = {"nondim/quantity.hpp", "nondim/parse.hpp", "nondim/solver.hpp"}

PROGRAM = """#include <nondim/analysis.hpp>
#include <iostream>
int main() {
  nondim::problem p;
  p.add("F", "N").add("rho", "kg/m^3").add("U", "m/s").add("D", "m").add("mu", "Pa*s");
  std::cout << nondim::to_string(nondim::analyze(p)) << '\\n';
}
"""


def cpu_seconds(cmd):
    seconds, error = header_cost.cpu_time(cmd)
    if seconds is None:
        sys.exit(f"include_cost.py: compile failed: {' '.join(cmd)}\n{error}")
    return seconds


def median_time(cxx, source, flags, runs):
    cmd = [cxx, "-std=c++20", "-O2", "-I", os.path.join(ROOT, "include"), "-isystem", EIGEN, *flags, "-c",
           source, "-o", os.devnull]
    return statistics.median(cpu_seconds(cmd) for _ in range(runs))


def main():
    ap = argparse.ArgumentParser(description=__doc__, formatter_class=argparse.RawDescriptionHelpFormatter)
    ap.add_argument("--runs", type=int, default=5)
    ap.add_argument("--compilers", default="g++,clang++")
    args = ap.parse_args()
    compilers = [c for c in args.compilers.split(",") if shutil.which(c)]
    if not compilers:
        sys.exit("include_cost.py: no compiler found")
    failed = False
    with tempfile.TemporaryDirectory() as tmp:
        def unit(name, text):
            path = os.path.join(tmp, name)
            with open(path, "w") as f:
                f.write(text)
            return path

        eigen = unit("eigen_dense.cpp", "#include <Eigen/Dense>\n")
        program = unit("program.cpp", PROGRAM)
        for cxx in compilers:
            base = median_time(cxx, eigen, [], args.runs)
            print(f"{cxx}: <Eigen/Dense> alone {base:.2f} s (median of {args.runs}, CPU time)")
            print(f"  {'header':<24} {'header-only':>12} {'compiled once':>14} {'once / Eigen':>13}")
            for h in HEADERS:
                src = unit(h.replace("/", "_") + ".cpp", f"#include <{h}>\n")
                inline = median_time(cxx, src, [], args.runs)
                once = median_time(cxx, src, ["-DNONDIM_SEPARATE_COMPILATION"], args.runs)
                print(f"  <{h}>{'':<{22 - len(h)}} {inline:>10.2f} s {once:>12.2f} s {once / base:>12.2f}x")
                if h in SOLVER_HALF and once >= 1.0:
                    print(f"  !! <{h}> takes {once:.2f} s: the solver half must stay under 1 s")
                    failed = True
                if h == "nondim/nondim.hpp":
                    print(f"summary: {cxx} <nondim/nondim.hpp> compiled once / <Eigen/Dense> = {once / base:.2f} "
                          f"(target <= 1.5); header-only {inline / base:.1f}")
            inline = median_time(cxx, program, [], args.runs)
            once = median_time(cxx, program, ["-DNONDIM_SEPARATE_COMPILATION"], args.runs)
            impl = median_time(cxx, os.path.join(ROOT, "src", "nondim.cpp"), ["-DNONDIM_SEPARATE_COMPILATION"], 1)
            print(f"  a file calling analyze(): header-only {inline:.2f} s, compiled once {once:.2f} s "
                  f"(+ src/nondim.cpp once per program: {impl:.1f} s)")
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
