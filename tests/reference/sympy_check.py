#!/usr/bin/python3
"""Compares nondim's exact rank, groups and null space with sympy's on the matrices that
reference_null_spaces prints (one JSON object per line).

For every matrix: sympy's Matrix.rank() equals nondim's rank; the pivots equal those of
sympy's rref(); nondim's groups and its null-space basis have n - rank integer primitive
vectors, each annihilated by the matrix exactly, and span the same space as sympy's
nullspace() (equal reduced row echelon forms, so the order and scaling of vectors do not
matter). Exit status 0 when all agree."""
import json
import math
import subprocess
import sys

import sympy
from sympy.polys.matrices import DomainMatrix


def rows_rref(vectors, n):
    """Reduced row echelon form of the rows `vectors` over QQ. DomainMatrix gives the same
    form as Matrix.rref() (unique), much faster on the long rational rows of sympy 1.11."""
    if not vectors:
        return sympy.zeros(0, n)
    m = DomainMatrix.from_Matrix(sympy.Matrix(vectors)).convert_to(sympy.QQ)
    return m.rref()[0].to_Matrix()


def check(case):
    a = sympy.Matrix([[sympy.Rational(x) for x in row] for row in case["matrix"]])
    n = a.shape[1]
    faults = []
    rank = a.rank()
    if rank != case["rank"]:
        faults.append(f"rank {case['rank']}, sympy {rank}")
    pivots = list(a.rref()[1])
    if pivots != case["pivots"]:
        faults.append(f"pivots {case['pivots']}, sympy {pivots}")
    expected = rows_rref([list(v.T) for v in a.nullspace()], n)
    for label in ("groups", "null_space"):
        vectors = case[label]
        if len(vectors) != n - rank:
            faults.append(f"{len(vectors)} {label} vectors, expected {n - rank}")
        for v in vectors:
            if any(x != 0 for x in a * sympy.Matrix(v)):
                faults.append(f"{label} vector {v} is not in the null space")
            if math.gcd(*v) != 1:
                faults.append(f"{label} vector {v} is not primitive")
        if rows_rref(vectors, n) != expected:
            faults.append(f"{label} span another space than sympy's nullspace()")
    return faults


def main():
    program = sys.argv[1]
    count = sys.argv[2] if len(sys.argv) > 2 else "200"
    out = subprocess.run([program, count], check=True, capture_output=True, text=True).stdout
    cases = [json.loads(line) for line in out.splitlines() if line.strip()]
    bad = 0
    for case in cases:
        faults = check(case)
        if faults:
            bad += 1
            print(f"case {case['id']}: " + "; ".join(faults))
    big = sum(1 for c in cases if c["multiprecision"])
    print(f"{len(cases)} matrices, {big} through cpp_rational, {bad} disagreeing with sympy {sympy.__version__}")
    if big == 0:
        print("no matrix exercised the cpp_rational path")
        return 1
    return 1 if bad else 0


if __name__ == "__main__":
    sys.exit(main())
