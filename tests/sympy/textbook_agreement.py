#!/usr/bin/env python3
"""Cross-check of the textbook problems (tests/textbook_problems.hpp) against python3-sympy.

classical_basis.py types every problem's dimensions in again from the SI Brochure and applies
the rule of DESIGN.md with sympy's exact rationals. This script writes a C++ program that
prints, for each problem of that list, the dimensions of its variables as the C++ header has
them and pi_basis<...>() of them; the two must agree on every dimension (a slip in either
list is caught), the rank, the repeating variables in the order chosen and every group's
exponents. Every problem of the header must be in the list.

  python3 tests/sympy/textbook_agreement.py --cxx g++ --include include --tests tests
"""
import argparse
import importlib.util
import os
import re
import sys

here = os.path.dirname(os.path.abspath(__file__))
spec = importlib.util.spec_from_file_location("classical_basis", os.path.join(here, "classical_basis.py"))
reference = importlib.util.module_from_spec(spec)
spec.loader.exec_module(reference)
sys.path.insert(0, here)
import cxx_basis  # noqa: E402  (the C++ printer shared with random_agreement.py)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--cxx", default="g++")
    ap.add_argument("--include", required=True, help="nondim's include/")
    ap.add_argument("--tests", required=True, help="the folder of textbook_problems.hpp")
    args = ap.parse_args()

    with open(os.path.join(args.tests, "textbook_problems.hpp")) as f:
        in_header = re.findall(r"inline constexpr problem<\d+> (\w+)\{", f.read())
    missing = [p for p in in_header if p not in reference.problems]
    unknown = [p for p in reference.problems if p not in in_header]

    src = cxx_basis.PREAMBLE + [
        '#include "textbook_problems.hpp"',
        "#include <utility>",
        "template <const auto& P, std::size_t... I>",
        "constexpr auto basis_of(std::index_sequence<I...>) { return pi_basis<P.variables[I].dim...>(); }",
        "template <const auto& P>",
        "void show_problem() {",
        "  for (const auto& v : P.variables) {",
        "    for (std::size_t i = 0; i < base_dimension_count; ++i)",
        '      std::printf(" %lld/%lld", static_cast<long long>(v.dim[i].num), static_cast<long long>(v.dim[i].den));',
        '    std::printf(" ;");',
        "  }",
        '  std::printf("\\n");',
        "  show(basis_of<P>(std::make_index_sequence<P.variables.size()>{}), P.variables.size());",
        "}",
        "int main() {",
    ]
    names = [p for p in reference.problems if p in in_header]
    for name in names:
        src.append("  show_problem<textbook::%s>();" % name)
    src.append("}")
    lines = cxx_basis.run(src, args.cxx, [args.include, args.tests], "textbook_problems")

    mismatches = 0
    for k, name in enumerate(names):
        cols = reference.problems[name]
        dims_line, basis_line = lines[2 * k], lines[2 * k + 1]
        typed = "".join("".join(" %d/%d" % (e.p, e.q) for e in c) + " ;" for c in cols)
        if typed.strip() != dims_line.strip():
            mismatches += 1
            print("%s: the dimensions differ\n  sympy: %s\n  C++:   %s" % (name, typed.strip(), dims_line.strip()))
            continue
        rep, groups = reference.basis(cols)
        expected = cxx_basis.expected_line(rep, groups)
        if expected.strip() != basis_line.strip():
            mismatches += 1
            print("%s: the bases differ\n  sympy: %s\n  C++:   %s" % (name, expected, basis_line))
    for p in missing:
        print("%s: in textbook_problems.hpp but not in classical_basis.py" % p)
    for p in unknown:
        print("%s: in classical_basis.py but not in textbook_problems.hpp" % p)
    print("%d textbook problems: %d mismatches, %d missing, %d unknown"
          % (len(names), mismatches, len(missing), len(unknown)))
    return 1 if mismatches or missing or unknown or len(lines) != 2 * len(names) else 0


if __name__ == "__main__":
    sys.exit(main())
