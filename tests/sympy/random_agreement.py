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
import sys

from sympy import Rational

here = os.path.dirname(os.path.abspath(__file__))
spec = importlib.util.spec_from_file_location("classical_basis", os.path.join(here, "classical_basis.py"))
reference = importlib.util.module_from_spec(spec)
spec.loader.exec_module(reference)
sys.path.insert(0, here)
import cxx_basis  # noqa: E402  (the C++ printer shared with textbook_agreement.py)


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
    src = cxx_basis.PREAMBLE + ["int main() {"]
    for cols in problems:
        ds = ", ".join("dimension{%s}" % ", ".join(cxx_rational(x) for x in c) for c in cols)
        src.append("  show(pi_basis<%s>(), %d);" % (ds, len(cols)))
    src.append("}")

    lines = cxx_basis.run(src, args.cxx, [args.include], "random_problems")

    mismatches = 0
    dependent_repeats = 0
    for cols, line in zip(problems, lines):
        rep, groups = reference.basis(cols)
        dependent_repeats += 1 if 0 in rep else 0
        expected = cxx_basis.expected_line(rep, groups)
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
