#!/usr/bin/python3
"""Cost of including each solver-half header alone.

For every entry header of the solver half (`quantity.hpp`, `field.hpp`, `parse.hpp`, `solver.hpp`) and every
header under include/nondim/solver/, writes a translation unit holding only
`#include <nondim/...>`, compiles it with `-std=c++20 -O2 -c` with every compiler found, and
prints the median CPU time (user + system of the compiler, which preemption on a shared
machine does not inflate) of --runs compiles. `<cmath>` and `<string>` alone are measured as
references. Target (DESIGN.md, "Architecture"): every solver-half header well under 1 s;
`<nondim/field.hpp>` under 0.5 s.
With --instructions, also the instructions the compiler executes (valgrind --tool=callgrind,
children traced; deterministic, ~20 s per header and compiler).

  bench/header_cost.py [--runs 5] [--compilers g++,clang++] [--instructions] [--markdown] [--include DIR]

Installs nothing; uses only the compilers found on PATH. Exit status 1 if a header does not
compile alone or takes 1 s or more (field.hpp: 0.5 s).
"""

import argparse
import os
import resource
import shutil
import statistics
import subprocess
import sys
import tempfile

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(HERE)
INCLUDE = os.path.join(ROOT, "include")
LIMIT_S = 1.0
# Tighter targets of single headers (issue 15: the typed fields go into every kernel's file).
LIMITS_S = {"<nondim/field.hpp>": 0.5}


def headers():
    entry = ["nondim/quantity.hpp", "nondim/field.hpp", "nondim/parse.hpp", "nondim/solver.hpp"]
    inner = []
    for dirpath, _, files in os.walk(os.path.join(INCLUDE, "nondim", "solver")):
        for f in files:
            if f.endswith(".hpp"):
                inner.append(os.path.relpath(os.path.join(dirpath, f), INCLUDE))
    return [f"<{h}>" for h in entry + sorted(inner)]


def cpu_time(cmd):
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    p = subprocess.run(cmd, stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    if p.returncode != 0:
        return None, p.stderr
    return (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime), ""


def instructions(cmd, work):
    out = tempfile.mkdtemp(prefix="cg.", dir=work)
    p = subprocess.run(["valgrind", "--tool=callgrind", "--trace-children=yes",
                        "--callgrind-out-file=" + os.path.join(out, "cg.%p"), *cmd],
                       stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    total = 0
    for name in os.listdir(out):
        with open(os.path.join(out, name)) as f:
            for line in f:
                if line.startswith("totals:"):
                    total += int(line.split()[1])
                    break
    shutil.rmtree(out, ignore_errors=True)
    return total if p.returncode == 0 else None


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    ap.add_argument("--runs", type=int, default=5)
    ap.add_argument("--compilers", default="g++,clang++")
    ap.add_argument("--instructions", action="store_true", help="also count compiler instructions (callgrind)")
    ap.add_argument("--markdown", action="store_true", help="print a Markdown table")
    ap.add_argument("--include", help="nondim headers to use (an A/B against another tree); default include/")
    a = ap.parse_args()
    global INCLUDE
    if a.include:
        INCLUDE = os.path.abspath(a.include)

    found = [c for c in a.compilers.split(",") if c and shutil.which(c)]
    if not found:
        raise SystemExit("header_cost.py: no compiler found")
    if a.instructions and not shutil.which("valgrind"):
        raise SystemExit("header_cost.py: --instructions needs valgrind (Debian: apt-get install valgrind)")

    work = tempfile.mkdtemp(prefix="nondim-header-cost.")
    rows = []
    status = 0
    for h in ["<cmath>", "<string>"] + headers():
        src = os.path.join(work, "tu.cpp")
        with open(src, "w") as f:
            f.write(f"#include {h}\n")
        row = [h]
        for cxx in found:
            cmd = [cxx, "-std=c++20", "-O2", "-I" + INCLUDE, "-c", src, "-o", os.path.join(work, "tu.o")]
            times = []
            for _ in range(a.runs):
                t, err = cpu_time(cmd)
                if t is None:
                    sys.stderr.write(f"header_cost.py: {h} does not compile alone with {cxx}:\n{err}")
                    status = 1
                    break
                times.append(t)
            med = statistics.median(times) if times else float("nan")
            if h.startswith("<nondim/") and not med < LIMITS_S.get(h, LIMIT_S):
                sys.stderr.write(f"header_cost.py: {h} with {cxx}: {med:.3f} s, target < {LIMITS_S.get(h, LIMIT_S)} s\n")
                status = 1
            row.append(f"{med:.3f} s")
            if a.instructions:
                n = instructions(cmd, work)
                row.append(f"{n / 1e6:.0f} M" if n is not None else "fails")
        rows.append(row)
        if not a.markdown:
            print("  ".join(row), flush=True)

    cols = ["header"]
    for cxx in found:
        cols.append(f"{cxx} CPU")
        if a.instructions:
            cols.append(f"{cxx} instructions")
    if a.markdown:
        print("| " + " | ".join(cols) + " |")
        print("|---|" + "---:|" * (len(cols) - 1))
        for r in rows:
            print("| `" + r[0] + "` | " + " | ".join(r[1:]) + " |")
    worst = max((float(c.split()[0]) for r in rows if r[0].startswith("<nondim/") for c in r[1:] if c.endswith(" s")),
                default=float("nan"))
    print(f"summary: slowest solver-half header alone: {worst:.3f} s CPU, -O2 -c (target < {LIMIT_S:.0f} s)")
    shutil.rmtree(work, ignore_errors=True)
    return status


if __name__ == "__main__":
    sys.exit(main())
