"""Shared by the sympy cross-checks: a C++ program that prints pi_basis<...>() of dimension
lists, and the same line computed from classical_basis.py's (rep, groups), for comparison.

Each line: "rank | repeating variables in the order chosen | exponents of each group ;".
"""
import os
import subprocess
import tempfile

# C++ that prints one basis per call of show(basis, n)
PREAMBLE = [
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
]


def run(src_lines, cxx, include_dirs, name):
    """Compiles and runs the program; returns its output lines."""
    with tempfile.TemporaryDirectory() as tmp:
        cpp = os.path.join(tmp, name + ".cpp")
        exe = os.path.join(tmp, name)
        with open(cpp, "w") as f:
            f.write("\n".join(src_lines) + "\n")
        flags = [a for d in include_dirs for a in ("-I", d)]
        subprocess.run([cxx, "-std=c++20", *flags, cpp, "-o", exe], check=True)
        return subprocess.run([exe], capture_output=True, text=True, check=True).stdout.strip().split("\n")


def expected_line(rep, groups):
    return "%d |%s |%s" % (len(rep), "".join(" %d" % r for r in rep),
                           "".join("".join(" %d" % e for e in g) + " ;" for g in groups))
