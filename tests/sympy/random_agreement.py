#!/usr/bin/env python3
"""Cross-check of the compile-time basis (pi_basis) against python3-sympy on random problems.

Random dimension lists (rational exponents, dimensionless and duplicated variables,
rank-deficient sets, problems where the dependent variable must repeat) are written into a
C++ program that prints pi_basis<...>() for each; the rule of DESIGN.md is applied to the
same lists with sympy's exact rationals (classical_basis.py) and the two must agree on the
rank, the repeating variables in the order chosen, and every group's exponents.

  python3 tests/sympy/random_agreement.py --cxx g++ --include include [--count 60] [--rng 11]
"""
import argparse
import importlib.util
import os
import random
import subprocess
import sys
import tempfile

from sympy import Rational

here = os.path.dirname(os.path.abspath(__file__))
spec = importlib.util.spec_from_file_location("classical_basis", os.path.join(here, "classical_basis.py"))
reference = importlib.util.module_from_spec(spec)
spec.loader.exec_module(reference)


def random_problem(rng):
    n = rng.randint(2, 12)
    bases = rng.randint(1, 7)
    cols = []
    for _ in range(n):
        e = [Rational(0)] * 7
        for b in rng.sample(range(7), bases):
            e[b] = Rational(rng.choice([-2, -1, 1, 2, 3, 0, Rational(1, 2), Rational(-3, 2)]))
        if rng.random() < 0.15:
            e = [Rational(0)] * 7
        if rng.random() < 0.15 and cols:
            e = [2 * x for x in rng.choice(cols)]
        cols.append(e)
    return cols


def cxx_rational(x):
    return "rational{%d, %d}" % (x.p, x.q)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--cxx", default="g++")
    ap.add_argument("--include", required=True)
    ap.add_argument("--count", type=int, default=60)
    ap.add_argument("--rng", type=int, default=11, help="fixes the random problems")
    args = ap.parse_args()

    rng = random.Random(args.rng)
    problems = [random_problem(rng) for _ in range(args.count)]
    src = [
        "#include <nondim/solver.hpp>",
        "#include <cstdio>",
        "using namespace nondim;",
        "template <class B> void show(const B& b, std::size_t n) {",
        '  std::printf("%zu |", b.rank);',
        '  for (std::size_t i = 0; i < b.rank; ++i) std::printf(" %zu", b.repeating[i]);',
        '  std::printf(" |");',
        "  for (std::size_t k = 0; k < b.group_count; ++k) {",
        '    for (std::size_t j = 0; j < n; ++j) std::printf(" %lld", static_cast<long long>(b.exponents[k][j]));',
        '    std::printf(" ;");',
        "  }",
        '  std::printf("\\n");',
        "}",
        "int main() {",
    ]
    for cols in problems:
        ds = ", ".join("dimension{%s}" % ", ".join(cxx_rational(x) for x in c) for c in cols)
        src.append("  show(pi_basis<%s>(), %d);" % (ds, len(cols)))
    src.append("}")

    with tempfile.TemporaryDirectory() as tmp:
        cpp = os.path.join(tmp, "random_problems.cpp")
        exe = os.path.join(tmp, "random_problems")
        with open(cpp, "w") as f:
            f.write("\n".join(src) + "\n")
        subprocess.run([args.cxx, "-std=c++20", "-I", args.include, cpp, "-o", exe], check=True)
        lines = subprocess.run([exe], capture_output=True, text=True, check=True).stdout.strip().split("\n")

    mismatches = 0
    dependent_repeats = 0
    for cols, line in zip(problems, lines):
        rep, groups = reference.basis(cols)
        dependent_repeats += 1 if 0 in rep else 0
        expected = "%d |%s |%s" % (len(rep), "".join(" %d" % r for r in rep),
                                   "".join("".join(" %d" % e for e in g) + " ;" for g in groups))
        if expected.strip() != line.strip():
            mismatches += 1
            print("mismatch for", [[str(x) for x in c] for c in cols])
            print("  sympy:", expected)
            print("  C++:  ", line)
    print("%d random problems (%d with the dependent variable repeating): %d mismatches"
          % (len(problems), dependent_repeats, mismatches))
    return 1 if mismatches or len(lines) != len(problems) else 0


if __name__ == "__main__":
    sys.exit(main())
