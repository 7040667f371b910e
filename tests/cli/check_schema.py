#!/usr/bin/python3
"""Checks the JSON objects of `nondim` against the schemas of DESIGN.md.

groups: beyond the shape, every group must be dimensionless (its exponents applied to the
variables' dimensions, in exact fractions), have primitive integer exponents, number
n - rank, and `rank` must be the rank of the dimension matrix computed independently here
(exact_rank: Gaussian elimination in Python's fractions, checked against python3-sympy by
check_schema_test.py).
"""
import json
import re
import math
import sys
from fractions import Fraction

BASES = ["L", "M", "T", "I", "Theta", "N", "J"]
# the keys a problem may name its flow configuration with (README, "Values at a design point")
CONFIGURATIONS = ("pipe_flow", "flat_plate", "cylinder_crossflow", "sphere", "vertical_plate", "open_channel")


def exact_rank(rows):
    """The rank of a matrix of Fractions (or integers) by Gaussian elimination in exact
    arithmetic. An independent check of the program's rank: textbook elimination in Python's
    fractions module shares no code with the library's elimination (C++ rationals), and is
    itself compared with sympy's Matrix.rank in check_schema_test.py. It replaces a sympy
    call per case: importing sympy took about 0.7 s of every JSON case."""
    m = [[Fraction(x) for x in row] for row in rows]
    rank = 0
    for c in range(len(m[0]) if m else 0):
        pivot = next((r for r in range(rank, len(m)) if m[r][c] != 0), None)
        if pivot is None:
            continue
        m[rank], m[pivot] = m[pivot], m[rank]
        for r in range(len(m)):
            if r != rank and m[r][c] != 0:
                f = m[r][c] / m[rank][c]
                m[r] = [x - f * y for x, y in zip(m[r], m[rank])]
        rank += 1
    return rank


def check_configuration(v, problems):
    """`configuration`, only when one was chosen: one of the keys of CONFIGURATIONS."""
    if "configuration" in v and v["configuration"] not in CONFIGURATIONS:
        problems.append("configuration: %r is not one of %s" % (v["configuration"], ", ".join(CONFIGURATIONS)))


def is_number(x):
    return isinstance(x, (int, float)) and not isinstance(x, bool)


def exponent(x, where, problems):
    """An exponent: a non-zero integer or a "p/q" string of a non-integer fraction."""
    if isinstance(x, bool):
        problems.append("%s: a boolean is not an exponent" % where)
        return None
    if isinstance(x, int):
        if x == 0:
            problems.append("%s: zero exponents must be left out" % where)
        return Fraction(x)
    if isinstance(x, str):
        try:
            p, q = x.split("/")
            f = Fraction(int(p), int(q))
        except ValueError:
            problems.append("%s: %r is not p/q" % (where, x))
            return None
        if f.denominator == 1 or "%d/%d" % (f.numerator, f.denominator) != x:
            problems.append("%s: %r must be a reduced non-integer fraction" % (where, x))
        return f
    problems.append("%s: %r is not an exponent" % (where, x))
    return None


def dimension(d, where, problems):
    if not isinstance(d, dict):
        problems.append("%s: not an object" % where)
        return {}
    out = {}
    for k, v in d.items():
        if k not in BASES:
            problems.append("%s: unknown base dimension %r" % (where, k))
            continue
        out[k] = exponent(v, "%s.%s" % (where, k), problems) or Fraction(0)
    order = [b for b in BASES if b in d]
    if list(d.keys()) != order:
        problems.append("%s: base dimensions not in the order L M T I Theta N J" % where)
    return out


def keys(obj, where, required, optional, problems):
    if not isinstance(obj, dict):
        problems.append("%s: not an object" % where)
        return False
    for k in required:
        if k not in obj:
            problems.append("%s: missing %r" % (where, k))
    for k in obj:
        if k not in required and k not in optional:
            problems.append("%s: unexpected key %r" % (where, k))
    return all(k in obj for k in required)


def check_groups(v, problems):
    if not keys(v, "root", ["title", "variables", "rank", "rank_explanation", "dependent", "basis", "repeating",
                            "repeating_origin", "groups", "isolated", "svd_check"],
                ["scales", "alternatives", "configuration"], problems):
        return
    check_configuration(v, problems)
    for k in ["title", "rank_explanation", "repeating_origin"]:
        if not isinstance(v[k], str):
            problems.append("%s: not a string" % k)
    names, dims = [], {}
    for i, var in enumerate(v["variables"]):
        w = "variables[%d]" % i
        if keys(var, w, ["name", "unit", "dimension"], ["kind"], problems):
            if not isinstance(var.get("name"), str) or not isinstance(var.get("unit"), str):
                problems.append("%s: name and unit must be strings" % w)
            # a declared kind is an identifier of the catalog's kinds (mean_free_path)
            if "kind" in var and not (isinstance(var["kind"], str) and
                                      re.fullmatch(r"[a-z][a-z_]*", var["kind"])):
                problems.append("%s: kind must be an identifier such as mean_free_path" % w)
            names.append(var.get("name"))
            dims[var.get("name")] = dimension(var.get("dimension", {}), w + ".dimension", problems)
    rank = v["rank"]
    if not isinstance(rank, int) or isinstance(rank, bool) or rank < 0:
        problems.append("rank: not a non-negative integer")
        return
    found = exact_rank([[dims[n].get(b, Fraction(0)) for n in names] for b in BASES])
    if found != rank:
        problems.append("rank %d, but the dimension matrix has rank %d" % (rank, found))
    if v["dependent"] not in names:
        problems.append("dependent: %r is not a variable" % (v["dependent"],))
    if v["basis"] not in ("classical", "named"):
        problems.append("basis: %r is neither 'classical' nor 'named'" % (v["basis"],))
    isolated = v["isolated"]
    if not isinstance(isolated, list):
        problems.append("isolated: not a list")
        isolated = []
    for i, x in enumerate(isolated):
        w = "isolated[%d]" % i
        if keys(x, w, ["name", "reason"], [], problems):
            if x["name"] not in names or not isinstance(x["reason"], str) or not x["reason"]:
                problems.append("%s: a variable of the problem with a non-empty reason" % w)
    rep = v["repeating"]
    if not isinstance(rep, list) or any(r not in names for r in rep) or len(rep) != rank:
        problems.append("repeating: must list %d variables of the problem" % rank)
    if isinstance(rep, list) and v["dependent"] in rep and v["dependent"] not in [x.get("name") for x in isolated
                                                                                  if isinstance(x, dict)]:
        if not v["repeating_origin"].startswith("given"):
            problems.append("repeating: the dependent variable repeats only when given or isolated")
    if "alternatives" in v:
        alts = v["alternatives"]
        if not isinstance(alts, list):
            problems.append("alternatives: not a list")
            alts = []
        for i, a in enumerate(alts):
            w = "alternatives[%d]" % i
            if not keys(a, w, ["repeating", "groups"], [], problems):
                continue
            sub = {"title": "", "variables": v["variables"], "rank": rank, "rank_explanation": "",
                   "dependent": v["dependent"], "basis": "classical", "repeating": a["repeating"],
                   "repeating_origin": "given", "groups": a["groups"], "isolated": [], "svd_check": v["svd_check"]}
            inner = []
            check_groups(sub, inner)
            problems.extend("%s: %s" % (w, p) for p in inner)
            if isinstance(a["repeating"], list) and v["dependent"] in a["repeating"]:
                problems.append("%s: the dependent variable is never an alternative repeating variable" % w)
    groups = v["groups"]
    if not isinstance(groups, list) or len(groups) != len(names) - rank:
        problems.append("groups: %d variables of rank %d need %d groups" % (len(names), rank, len(names) - rank))
        groups = groups if isinstance(groups, list) else []
    for i, g in enumerate(groups):
        w = "groups[%d]" % i
        if not keys(g, w, ["exponents", "text", "latex", "matches"], ["value", "uncertainty", "regimes"], problems):
            continue
        total = {b: Fraction(0) for b in BASES}
        ints = []
        for name, e in g["exponents"].items():
            if name not in names:
                problems.append("%s: %r is not a variable" % (w, name))
                continue
            f = exponent(e, "%s.exponents.%s" % (w, name), problems)
            if f is None:
                continue
            if f.denominator == 1:
                ints.append(abs(f.numerator))
            for b, x in dims[name].items():
                total[b] += f * x
        if any(x != 0 for x in total.values()):
            problems.append("%s is not dimensionless: %s" % (w, {b: str(x) for b, x in total.items() if x}))
        if ints and len(ints) == len(g["exponents"]) and math.gcd(*ints) != 1:
            problems.append("%s: exponents are not primitive (gcd %d)" % (w, math.gcd(*ints)))
        if not isinstance(g["text"], str) or not isinstance(g["latex"], str):
            problems.append("%s: text and latex must be strings" % w)
        if not isinstance(g["matches"], list):
            problems.append("%s.matches: not a list" % w)
            continue
        for k, m in enumerate(g["matches"]):
            mw = "%s.matches[%d]" % (w, k)
            if keys(m, mw, ["name", "symbol", "power"], [], problems):
                if not isinstance(m["name"], str) or not isinstance(m["symbol"], str):
                    problems.append("%s: name and symbol must be strings" % mw)
                exponent(m["power"], mw + ".power", problems)
        check_value(g, w, problems)
    s = v["svd_check"]
    if keys(s, "svd_check", ["rank", "agrees", "singular_values", "max_residual"], [], problems):
        if not isinstance(s["agrees"], bool) or s["agrees"] != (s["rank"] == rank):
            problems.append("svd_check.agrees must say whether its rank equals the exact rank")
        sv = s["singular_values"]
        if not isinstance(sv, list) or not all(is_number(x) and x >= 0 for x in sv) or sv != sorted(sv, reverse=True):
            problems.append("svd_check.singular_values: must be non-negative numbers, descending")
        if not is_number(s["max_residual"]) or s["max_residual"] < 0:
            problems.append("svd_check.max_residual: must be a non-negative number")
    if "scales" in v:
        check_scales(v["scales"], names, dims, rep if isinstance(rep, list) else [], problems)


def check_value(g, w, problems):
    """A group at a design point: `value` a number; `uncertainty` (only with a value) a
    number >= 0 with at most two significant digits (GUM 7.2.6); `regimes` (only with a
    value) objects naming one of the group's matches, with their band and source."""
    if "value" not in g:
        if "uncertainty" in g or "regimes" in g:
            problems.append("%s: uncertainty or regimes without a value" % w)
        return
    if not is_number(g["value"]):
        problems.append("%s.value: not a number" % w)
    if "uncertainty" in g:
        u = g["uncertainty"]
        if not is_number(u) or u < 0:
            problems.append("%s.uncertainty: not a number >= 0" % w)
        elif u > 0 and len(("%.15g" % u).replace(".", "").replace("-", "").split("e")[0].strip("0")) > 2:
            problems.append("%s.uncertainty: %r has more than two significant digits" % (w, u))
    symbols = [m.get("symbol") for m in g.get("matches", []) if isinstance(m, dict)]
    for k, r in enumerate(g.get("regimes", [])):
        rw = "%s.regimes[%d]" % (w, k)
        if keys(r, rw, ["symbol", "number", "regime", "bounds", "configuration", "source"], [], problems):
            if r["symbol"] not in symbols:
                problems.append("%s: %r is not one of the group's matches" % (rw, r["symbol"]))
            if not is_number(r["number"]):
                problems.append("%s.number: not a number" % rw)
            if not all(isinstance(r[k], str) and r[k] for k in ["regime", "bounds", "configuration", "source"]):
                problems.append("%s: regime, bounds, configuration and source must be non-empty strings" % rw)


def check_scales(scales, names, dims, rep, problems):
    """`groups --scales`: one entry per variable, in order; the exponents on the repeating
    variables must give the variable's dimension (exact fractions)."""
    if not isinstance(scales, list) or [s.get("name") if isinstance(s, dict) else None for s in scales] != names:
        problems.append("scales: must list every variable, in order")
        return
    for i, s in enumerate(scales):
        w = "scales[%d]" % i
        if not keys(s, w, ["name", "reference", "nondimensional", "scale", "exponents"], ["lacking"], problems):
            continue
        if s["reference"] is not (s["name"] in rep):
            problems.append("%s.reference must say whether %r is a repeating variable" % (w, s["name"]))
        if s["exponents"] is None:
            if s["scale"] is not None or s["nondimensional"] is not None:
                problems.append("%s: without exponents, scale and nondimensional must be null" % w)
            if "lacking" in s and s["lacking"] not in BASES:
                problems.append("%s.lacking: %r is not a base dimension" % (w, s["lacking"]))
            continue
        if not isinstance(s["scale"], str) or not isinstance(s["nondimensional"], str) or "lacking" in s:
            problems.append("%s: scale and nondimensional must be strings, and no 'lacking'" % w)
        if not isinstance(s["exponents"], dict):
            problems.append("%s.exponents: not an object" % w)
            continue
        total = {b: Fraction(0) for b in BASES}
        for name, e in s["exponents"].items():
            if name not in rep:
                problems.append("%s: %r is not a repeating variable" % (w, name))
                continue
            f = exponent(e, "%s.exponents.%s" % (w, name), problems)
            for b, x in dims[name].items():
                total[b] += (f or Fraction(0)) * x
        want = {b: dims[s["name"]].get(b, Fraction(0)) for b in BASES}
        if total != want:
            problems.append("%s: the scale has dimension %s, not that of %r" %
                            (w, {b: str(x) for b, x in total.items() if x}, s["name"]))


def check_dim(v, problems):
    if not keys(v, "root", ["factor", "dimension"], ["unit", "offset", "canonical"], problems):
        return
    if not is_number(v["factor"]) or v["factor"] <= 0:
        problems.append("factor: must be a positive number")
    if "offset" in v and not is_number(v["offset"]):
        problems.append("offset: must be a number")
    dimension(v["dimension"], "dimension", problems)


def check_convert(v, problems):
    """convert --format json: one object with the value given, both units, the converted
    value and the notes (a list of sentences, empty when there is nothing to say)."""
    if not keys(v, "root", ["input", "from", "to", "value", "notes"], [], problems):
        return
    for k in ("input", "value"):
        if not is_number(v[k]):
            problems.append("%s: must be a number" % k)
    for k in ("from", "to"):
        if not isinstance(v[k], str) or not v[k]:
            problems.append("%s: must be a unit expression" % k)
    if not isinstance(v["notes"], list) or not all(isinstance(n, str) and n for n in v["notes"]):
        problems.append("notes: must be a list of sentences")


def check_measured(obj, key, where, problems):
    """`key` a number or null; `key_uncertainty`, only beside a number, a number >= 0 with at
    most two significant digits (GUM 7.2.6)."""
    x = obj.get(key)
    if not (is_number(x) or x is None):
        problems.append("%s.%s: must be a number or null" % (where, key))
    u = obj.get(key + "_uncertainty")
    if u is None:
        return
    if x is None:
        problems.append("%s.%s_uncertainty: an uncertainty without a value" % (where, key))
    if not is_number(u) or u < 0:
        problems.append("%s.%s_uncertainty: not a number >= 0" % (where, key))
    elif u > 0 and len(("%.15g" % u).replace(".", "").replace("-", "").split("e")[0].strip("0")) > 2:
        problems.append("%s.%s_uncertainty: %r has more than two significant digits" % (where, key, u))


def check_scale(v, problems):
    """scale --format json: the plan's status, the model values found, the groups (a label
    where the catalog names the group, else null), the dependent variable's factor, measured
    and predicted values with their standard uncertainties, the notes, and the configuration
    when one was chosen."""
    if not keys(v, "root", ["status", "model", "free", "groups", "dependent", "notes"], ["configuration"], problems):
        return
    check_configuration(v, problems)
    if v["status"] not in ("exact", "partial", "underdetermined"):
        problems.append("status: %r" % v["status"])
    if not isinstance(v["model"], dict) or not all(is_number(x) for x in v["model"].values()):
        problems.append("model: must map names to numbers")
    if not isinstance(v["free"], list) or not all(isinstance(x, str) for x in v["free"]):
        problems.append("free: must be a list of names")
    if (v["status"] == "underdetermined") != bool(v["free"]):
        problems.append("free: must be non-empty exactly when the status is underdetermined")
    for i, g in enumerate(v["groups"] if isinstance(v["groups"], list) else []):
        w = "groups[%d]" % i
        if keys(g, w, ["label", "text", "exponents", "prototype", "model", "ratio", "matched"], [], problems):
            if not (g["label"] is None or (isinstance(g["label"], str) and g["label"])):
                problems.append("%s.label: must be a name or null" % w)
            if not isinstance(g["text"], str) or not g["text"]:
                problems.append("%s.text: must be the product written out" % w)
            for name, e in g["exponents"].items():
                exponent(e, "%s.exponents.%s" % (w, name), problems)
            for k in ("prototype", "model", "ratio"):
                if not (is_number(g[k]) or g[k] is None):
                    problems.append("%s.%s: must be a number" % (w, k))
            if not isinstance(g["matched"], bool):
                problems.append("%s.matched: must be a boolean" % w)
    d = v["dependent"]
    if keys(d, "dependent", ["name", "unit", "prototype_over_model", "exact", "rule", "measured", "predicted"],
            ["prototype_over_model_uncertainty", "measured_uncertainty", "predicted_uncertainty"], problems):
        if not isinstance(d["name"], str) or not isinstance(d["unit"], str):
            problems.append("dependent: name and unit must be strings")
        if not isinstance(d["exact"], bool):
            problems.append("dependent.exact: must be a boolean")
        if not (d["rule"] is None or isinstance(d["rule"], str)):
            problems.append("dependent.rule: must be a string or null")
        for k in ("prototype_over_model", "measured", "predicted"):
            check_measured(d, k, "dependent", problems)
        if d["predicted"] is not None and (d["measured"] is None or d["prototype_over_model"] is None):
            problems.append("dependent.predicted: needs a measured value and a factor")
    if not isinstance(v["notes"], list) or not all(isinstance(n, str) and n for n in v["notes"]):
        problems.append("notes: must be a list of sentences")


def check_interval(obj, value_key, where, problems):
    """`ci95` a [low, high] pair around obj[value_key]."""
    ci = obj.get("ci95")
    x = obj.get(value_key)
    if not (isinstance(ci, list) and len(ci) == 2 and all(is_number(c) for c in ci)):
        problems.append("%s.ci95: must be [low, high]" % where)
    elif is_number(x) and not ci[0] <= x <= ci[1]:
        problems.append("%s.ci95: %r does not hold the estimate %r" % (where, ci, x))


def check_fit(v, problems):
    """fit --format json (DESIGN.md): the fitted dependent group as C times powers of the
    others, with standard errors and 95 % intervals; R^2 of the logarithms; the relative
    deviations; the range of every group; beyond DESIGN.md, the degrees of freedom n - p,
    whether the rows were weighted, the shares within 10 % and 20 %, the flagged rows, and the
    configuration when one was chosen."""
    if not keys(v, "root", ["basis", "n", "dependent", "coefficient", "terms", "constant", "r2", "rms_relative",
                            "max_relative", "range", "dof", "weighted", "within_10", "within_20", "outliers"],
                ["configuration"], problems):
        return
    check_configuration(v, problems)
    if v["basis"] not in ("classical", "named"):
        problems.append("basis: %r is neither 'classical' nor 'named'" % (v["basis"],))
    n = v["n"]
    if not isinstance(n, int) or isinstance(n, bool) or n < 1:
        problems.append("n: not a positive integer")
        return
    symbols = []
    d = v["dependent"]
    if keys(d, "dependent", ["exponents", "symbol"], [], problems):
        for name, e in d["exponents"].items():
            exponent(e, "dependent.exponents.%s" % name, problems)
        symbols.append(d["symbol"])
    c = v["coefficient"]
    if keys(c, "coefficient", ["value", "std_error", "ci95"], [], problems):
        if not (is_number(c["value"]) and c["value"] > 0):
            problems.append("coefficient.value: must be a number > 0")
        if not (is_number(c["std_error"]) and c["std_error"] >= 0):
            problems.append("coefficient.std_error: must be a number >= 0")
        check_interval(c, "value", "coefficient", problems)
    free = 0
    for i, t in enumerate(v["terms"] if isinstance(v["terms"], list) else []):
        w = "terms[%d]" % i
        if not keys(t, w, ["exponents", "symbol", "exponent", "std_error", "ci95", "fixed"], [], problems):
            continue
        for name, e in t["exponents"].items():
            exponent(e, "%s.exponents.%s" % (w, name), problems)
        if not isinstance(t["fixed"], bool) or not is_number(t["exponent"]):
            problems.append("%s: fixed must be a boolean and exponent a number" % w)
            continue
        if not (is_number(t["std_error"]) and t["std_error"] >= 0):
            problems.append("%s.std_error: must be a number >= 0" % w)
        if t["fixed"] and t["std_error"] != 0:
            problems.append("%s: a held exponent has no standard error" % w)
        free += 0 if t["fixed"] else 1
        check_interval(t, "exponent", w, problems)
        symbols.append(t["symbol"])
    for i, k in enumerate(v["constant"] if isinstance(v["constant"], list) else []):
        w = "constant[%d]" % i
        if keys(k, w, ["exponents", "symbol", "value"], [], problems):
            if not (is_number(k["value"]) and k["value"] > 0):
                problems.append("%s.value: must be a number > 0" % w)
            symbols.append(k["symbol"])
    # p = the coefficient and the free exponents; Student's t with n - p degrees of freedom
    if v["dof"] != n - 1 - free:
        problems.append("dof: %r, but n - p = %d - %d" % (v["dof"], n, 1 + free))
    if not (is_number(v["r2"]) and v["r2"] <= 1 + 1e-12):
        problems.append("r2: must be a number <= 1")
    for k in ("rms_relative", "max_relative"):
        if not (is_number(v[k]) and v[k] >= 0):
            problems.append("%s: must be a number >= 0" % k)
    if is_number(v["rms_relative"]) and is_number(v["max_relative"]) and \
            v["max_relative"] < v["rms_relative"] * (1 - 1e-12):
        problems.append("max_relative: below rms_relative (the largest deviation is at least their rms)")
    for k in ("within_10", "within_20"):
        if not (is_number(v[k]) and 0 <= v[k] <= 1):
            problems.append("%s: must be a share in [0, 1]" % k)
    if is_number(v["within_10"]) and is_number(v["within_20"]) and v["within_10"] > v["within_20"]:
        problems.append("within_10: more than within_20")
    if not isinstance(v["weighted"], bool):
        problems.append("weighted: must be a boolean")
    rng = v["range"] if isinstance(v["range"], list) else []
    if sorted(r.get("symbol") for r in rng if isinstance(r, dict)) != sorted(symbols):
        problems.append("range: must give every group once (%r), not %r" %
                        (symbols, [r.get("symbol") for r in rng if isinstance(r, dict)]))
    for i, r in enumerate(rng):
        w = "range[%d]" % i
        if keys(r, w, ["symbol", "min", "max"], [], problems):
            if not (is_number(r["min"]) and is_number(r["max"]) and 0 < r["min"] <= r["max"]):
                problems.append("%s: must be 0 < min <= max" % w)
    for i, o in enumerate(v["outliers"] if isinstance(v["outliers"], list) else []):
        w = "outliers[%d]" % i
        if keys(o, w, ["row", "line", "studentized"], [], problems):
            if not (isinstance(o["row"], int) and 1 <= o["row"] <= n):
                problems.append("%s.row: must be a data row 1..%d" % (w, n))
            if not (isinstance(o["line"], int) and o["line"] > o["row"]):
                problems.append("%s.line: must be a file line after the header" % w)
            if not (is_number(o["studentized"]) and abs(o["studentized"]) > 3):
                problems.append("%s.studentized: a flagged row has |t| > 3" % w)


def check(schema, value):
    problems = []
    {"groups": check_groups, "dim": check_dim, "scale": check_scale, "convert": check_convert,
     "fit": check_fit}[schema](value, problems)
    return problems


if __name__ == "__main__":
    found = check(sys.argv[1], json.load(sys.stdin))
    for p in found:
        print(p)
    sys.exit(1 if found else 0)
