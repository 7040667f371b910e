#!/usr/bin/python3
"""Runs the nondim program once and checks what it did.

  run_case.py --program PATH [--cwd DIR] [--status N] [--golden FILE --compare text|json]
              [--schema groups|dim|scale|convert|fit] [--stderr REGEX ...] [--stdout REGEX ...] -- ARGS...

- the exit status must be --status (default 0);
- with --golden, standard output is compared with the file: exactly (text) or as parsed
  JSON values (json: key order and number spelling aside, 1e5 == 100000.0, doubles
  within 1e-9 relative);
- with --schema, standard output must be one JSON object of that schema (check_schema.py);
- a failing run (status != 0) must print nothing on standard output and ONE message on
  standard error: starting "nondim: ", no second "nondim:" line, no C++ or CLI11 dump;
  each --stderr REGEX must be found in it (what and where);
- a successful run must print nothing on standard error.
Setting NONDIM_UPDATE_GOLDEN=1 rewrites the golden file from the output instead (then
check the new file by hand against its source before committing it).
"""
import argparse
import json
import os
import re
import subprocess
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import check_schema  # noqa: E402


def same_json(a, b):
    """Equal JSON values; numbers within 1e-9 relative or 1e-12 absolute (SVD results in
    double may differ in the last bits between compilers and optimisation levels)."""
    num = (int, float)
    if isinstance(a, bool) or isinstance(b, bool):
        return a is b
    if isinstance(a, num) and isinstance(b, num):
        return abs(a - b) <= max(1e-12, 1e-9 * max(abs(a), abs(b)))
    if isinstance(a, dict) and isinstance(b, dict):
        return a.keys() == b.keys() and all(same_json(a[k], b[k]) for k in a)
    if isinstance(a, list) and isinstance(b, list):
        return len(a) == len(b) and all(same_json(x, y) for x, y in zip(a, b))
    return a == b


def fail(msg, out="", err=""):
    print("FAIL: " + msg)
    if out:
        print("--- stdout\n" + out)
    if err:
        print("--- stderr\n" + err)
    sys.exit(1)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--program", required=True)
    ap.add_argument("--cwd", default=None)
    ap.add_argument("--status", type=int, default=0)
    ap.add_argument("--golden")
    ap.add_argument("--compare", choices=["text", "json"], default="text")
    ap.add_argument("--schema", choices=["groups", "dim", "scale", "convert", "fit"])
    ap.add_argument("--stderr", action="append", default=[])
    ap.add_argument("--stdout", action="append", default=[])
    ap.add_argument("--json-value", action="append", default=[],
                    help="PATH=VALUE[~RELTOL]: the JSON output at PATH (keys and list indices joined by '.')"
                         " equals VALUE: a number within RELTOL (default 1e-6), else the JSON literal")
    ap.add_argument("args", nargs=argparse.REMAINDER)
    a = ap.parse_args()
    args = a.args[1:] if a.args and a.args[0] == "--" else a.args

    env = dict(os.environ, LC_ALL="C.UTF-8")
    try:
        p = subprocess.run([a.program] + args, cwd=a.cwd, capture_output=True, timeout=60, env=env)
    except subprocess.TimeoutExpired:
        fail("the program did not finish in 60 s")
    out = p.stdout.decode("utf-8", errors="replace")
    err = p.stderr.decode("utf-8", errors="replace")

    if p.returncode != a.status:
        fail("exit status %d, expected %d" % (p.returncode, a.status), out, err)

    if a.status != 0:
        if out:
            fail("a failing run printed on standard output", out, err)
        if not err.startswith("nondim: "):
            fail("the message does not start with 'nondim: '", out, err)
        lines = err.rstrip("\n").split("\n")
        if sum(1 for l in lines if l.startswith("nondim:")) != 1 or len(lines) > 3:
            fail("more than one message on standard error", out, err)
        for bad in ("terminate called", "what():", "CLI11", "Run with --help", "Aborted"):
            if bad in err:
                fail("standard error carries a dump (%r)" % bad, out, err)
    elif err:
        fail("a successful run printed on standard error", out, err)

    for rx in a.stderr:
        if not re.search(rx, err):
            fail("standard error lacks /%s/" % rx, out, err)
    for rx in a.stdout:
        if not re.search(rx, out):
            fail("standard output lacks /%s/" % rx, out, err)

    if a.schema:
        try:
            value = json.loads(out)
        except json.JSONDecodeError as e:
            fail("the output is not JSON: %s" % e, out, err)
        problems = check_schema.check(a.schema, value)
        if problems:
            fail("schema %s: %s" % (a.schema, "; ".join(problems)), out, err)

    if a.json_value:
        try:
            value = json.loads(out)
        except json.JSONDecodeError as e:
            fail("the output is not JSON: %s" % e, out, err)
        for spec in a.json_value:
            path, want = spec.split("=", 1)
            tol = 1e-6
            if "~" in want:
                want, t = want.split("~")
                tol = float(t)
            node = value
            try:
                for part in path.split("."):
                    node = node[int(part)] if isinstance(node, list) else node[part]
            except (KeyError, IndexError, ValueError, TypeError):
                fail("the JSON output has no %s" % path, out, err)
            expected = json.loads(want)
            if isinstance(expected, (int, float)) and not isinstance(expected, bool):
                ok = isinstance(node, (int, float)) and not isinstance(node, bool) and \
                    abs(node - expected) <= tol * max(abs(expected), 1e-300)
            else:
                ok = node == expected
            if not ok:
                fail("%s is %r, expected %s" % (path, node, spec.split("=", 1)[1]), out, err)

    if a.golden:
        if os.environ.get("NONDIM_UPDATE_GOLDEN") == "1":
            with open(a.golden, "w", encoding="utf-8") as f:
                f.write(out)
            print("updated " + a.golden)
            return
        with open(a.golden, encoding="utf-8") as f:
            expected = f.read()
        if a.compare == "json":
            if not same_json(json.loads(out), json.loads(expected)):
                fail("JSON differs from %s" % a.golden, out, err)
        elif out != expected:
            import difflib
            diff = "".join(difflib.unified_diff(expected.splitlines(True), out.splitlines(True),
                                                a.golden, "output"))
            fail("output differs from %s\n%s" % (a.golden, diff))
    print("ok")


if __name__ == "__main__":
    main()
