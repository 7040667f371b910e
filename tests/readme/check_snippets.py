#!/usr/bin/python3
"""README code that cites a compiled example must be in it, so that it cannot rot.

  check_snippets.py README.md SOURCE_DIR

For every ```cpp block of the README whose preceding paragraph names a file
`examples/<name>.cpp` (or a header under examples/, `examples/nozzle/nozzle_flow.hpp`), each non-blank line of the block (leading and trailing space
stripped) must be a line of that file. Blocks that name no example are not checked.
"""
import os
import re
import sys


def main():
    readme, root = sys.argv[1], sys.argv[2]
    text = open(readme, encoding="utf-8").read()
    failures, checked = 0, 0
    for m in re.finditer(r"((?:[^\n]*\n){1,8}?)```cpp\n(.*?)```", text, re.S):
        before, code = m.group(1), m.group(2)
        cited = re.findall(r"`(examples/[A-Za-z0-9_/]+\.(?:cpp|hpp))`", before)
        if not cited:
            continue
        path = os.path.join(root, cited[-1])
        lines = {l.strip() for l in open(path, encoding="utf-8")}
        checked += 1
        for line in code.splitlines():
            if line.strip() and line.strip() not in lines:
                print("FAIL: %s: not in %s: %s" % (readme, cited[-1], line.strip()))
                failures += 1
    if checked == 0:
        print("FAIL: no README block cites an example")
        failures += 1
    print("%d block(s) checked, %d line(s) missing" % (checked, failures))
    sys.exit(1 if failures else 0)


main()
