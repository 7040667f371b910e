#!/usr/bin/python3
"""The schema checker must reject JSON that breaks the schema of DESIGN.md, or the schema
cases prove nothing. A valid object (the drag groups F/(rho U^2 D^2) and mu/(rho U D),
White, Fluid Mechanics, 7th ed., section 5.3) passes; each broken copy must fail."""
import copy
import os
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import check_schema  # noqa: E402

good = {
    "title": "",
    "variables": [
        {"name": "F", "unit": "N", "dimension": {"L": 1, "M": 1, "T": -2}},
        {"name": "rho", "unit": "kg/m^3", "dimension": {"L": -3, "M": 1}},
        {"name": "U", "unit": "m/s", "dimension": {"L": 1, "T": -1}},
        {"name": "D", "unit": "m", "dimension": {"L": 1}},
        {"name": "mu", "unit": "Pa*s", "dimension": {"L": -1, "M": 1, "T": -1}},
    ],
    "rank": 3,
    "rank_explanation": "",
    "dependent": "F",
    "basis": "classical",
    "repeating": ["rho", "U", "D"],
    "repeating_origin": "chosen automatically",
    "isolated": [],
    "groups": [
        {"exponents": {"F": 1, "rho": -1, "U": -2, "D": -2}, "text": "", "latex": "", "matches": []},
        {"exponents": {"mu": 1, "rho": -1, "U": -1, "D": -1}, "text": "", "latex": "",
         "matches": [{"name": "Reynolds number", "symbol": "Re", "power": -1}]},
    ],
    "svd_check": {"rank": 3, "agrees": True, "singular_values": [3.7, 2.8, 0.37], "max_residual": 0.0},
}


def broken(edit):
    v = copy.deepcopy(good)
    edit(v)
    return v


cases = {
    "not dimensionless": broken(lambda v: v["groups"][0]["exponents"].update(D=-1)),
    "not primitive": broken(lambda v: v["groups"][0]["exponents"].update(F=2, rho=-2, U=-4, D=-4)),
    "zero exponent listed": broken(lambda v: v["groups"][0]["exponents"].update(mu=0)),
    "wrong rank": broken(lambda v: v.update(rank=2)),
    "missing group": broken(lambda v: v["groups"].pop()),
    "extra key": broken(lambda v: v.update(extra=1)),
    "integer as p/q": broken(lambda v: v["variables"][3]["dimension"].update(L="2/1")),
    "unreduced fraction": broken(lambda v: v["variables"][3]["dimension"].update(L="2/4")),
    "svd disagreement hidden": broken(lambda v: v["svd_check"].update(rank=2)),
    "unsorted singular values": broken(lambda v: v["svd_check"].update(singular_values=[0.37, 3.7, 2.8])),
    "match without power": broken(lambda v: v["groups"][1]["matches"][0].pop("power")),
    "unknown base": broken(lambda v: v["variables"][3]["dimension"].update(X=1)),
    "no dependent": broken(lambda v: v.pop("dependent")),
    "unknown dependent": broken(lambda v: v.update(dependent="G")),
    "unknown basis": broken(lambda v: v.update(basis="fancy")),
    "isolated without reason": broken(lambda v: v.update(isolated=[{"name": "mu", "reason": ""}])),
    "alternative not dimensionless": broken(lambda v: v.update(alternatives=[{
        "repeating": ["mu", "U", "D"],
        "groups": [{"exponents": {"F": 1, "mu": -1, "U": -1}, "text": "", "latex": "", "matches": []},
                   {"exponents": {"rho": 1, "U": 1, "D": 1, "mu": -1}, "text": "", "latex": "", "matches": []}]}])),
    "alternative repeats the dependent": broken(lambda v: v.update(alternatives=[{
        "repeating": ["F", "U", "D"],
        "groups": [{"exponents": {"rho": 1, "U": 2, "D": 2, "F": -1}, "text": "", "latex": "", "matches": []},
                   {"exponents": {"mu": 1, "U": 1, "D": 1, "F": -1}, "text": "", "latex": "", "matches": []}]}])),
}

# with `groups --scales`: p* = F/(rho U^2 D^2) and mu/(rho U D), as the groups above
scaled = copy.deepcopy(good)
scaled["scales"] = [
    {"name": "F", "reference": False, "nondimensional": "", "scale": "", "exponents": {"rho": 1, "U": 2, "D": 2}},
    {"name": "rho", "reference": True, "nondimensional": "", "scale": "", "exponents": {"rho": 1}},
    {"name": "U", "reference": True, "nondimensional": "", "scale": "", "exponents": {"U": 1}},
    {"name": "D", "reference": True, "nondimensional": "", "scale": "", "exponents": {"D": 1}},
    {"name": "mu", "reference": False, "nondimensional": "", "scale": "", "exponents": {"rho": 1, "U": 1, "D": 1}},
]


def broken_scales(edit):
    v = copy.deepcopy(scaled)
    edit(v)
    return v


cases.update({
    "scale of the wrong dimension": broken_scales(lambda v: v["scales"][0]["exponents"].update(U=1)),
    "scale on a non-repeating variable": broken_scales(lambda v: v["scales"][4]["exponents"].update(mu=1)),
    "scales out of order": broken_scales(lambda v: v["scales"].reverse()),
    "reference flag wrong": broken_scales(lambda v: v["scales"][0].update(reference=True)),
    "scale missing key": broken_scales(lambda v: v["scales"][1].pop("scale")),
})

# at a design point: 1/Re = 2.004e-5 with u = 5.7e-7 (Re = 49900, turbulent in a pipe)
valued = copy.deepcopy(good)
valued["groups"][1].update(value=2.004e-5, uncertainty=5.7e-7, regimes=[
    {"symbol": "Re", "number": 49900, "regime": "turbulent", "bounds": "Re >= 4000",
     "configuration": "flow in a circular pipe", "source": "a textbook"}])


def broken_value(edit):
    v = copy.deepcopy(valued)
    edit(v)
    return v


cases.update({
    "uncertainty without a value": broken_value(lambda v: v["groups"][1].pop("value")),
    "value not a number": broken_value(lambda v: v["groups"][1].update(value="2e-5")),
    "negative uncertainty": broken_value(lambda v: v["groups"][1].update(uncertainty=-5.7e-7)),
    "uncertainty of three digits": broken_value(lambda v: v["groups"][1].update(uncertainty=5.68e-7)),
    "regime of another number": broken_value(lambda v: v["groups"][1]["regimes"][0].update(symbol="Ma")),
    "regime without source": broken_value(lambda v: v["groups"][1]["regimes"][0].pop("source")),
})

# the configuration chosen (README: pipe_flow, flat_plate, ...), only one of those keys
configured = broken(lambda v: v.update(configuration="pipe_flow"))
cases.update({
    "unknown configuration": broken(lambda v: v.update(configuration="pipe")),
    "empty configuration": broken(lambda v: v.update(configuration="")),
    "configuration as its description": broken(lambda v: v.update(configuration="flow in a circular pipe")),
})

failures = 0
if check_schema.check("groups", configured):
    print("FAIL: the valid object with a configuration is rejected:", check_schema.check("groups", configured))
    failures += 1
if check_schema.check("groups", valued):
    print("FAIL: the valid object with values is rejected:", check_schema.check("groups", valued))
    failures += 1
if check_schema.check("groups", scaled):
    print("FAIL: the valid object with scales is rejected:", check_schema.check("groups", scaled))
    failures += 1
if check_schema.check("groups", good):
    print("FAIL: the valid object is rejected:", check_schema.check("groups", good))
    failures += 1
# with --alternatives: mu, U, D give the Stokes form F/(mu U D) and Re (White, 7th ed., 5.2)
alternative = broken(lambda v: v.update(alternatives=[{
    "repeating": ["mu", "U", "D"],
    "groups": [{"exponents": {"F": 1, "mu": -1, "U": -1, "D": -1}, "text": "", "latex": "", "matches": []},
               {"exponents": {"rho": 1, "U": 1, "D": 1, "mu": -1}, "text": "", "latex": "", "matches": []}]}]))
if check_schema.check("groups", alternative):
    print("FAIL: the valid object with alternatives is rejected:", check_schema.check("groups", alternative))
    failures += 1
for name, value in cases.items():
    if not check_schema.check("groups", value):
        print("FAIL: not rejected:", name)
        failures += 1
for name, value in {"negative factor": {"factor": -1, "dimension": {}},
                    "no dimension": {"factor": 1.0}}.items():
    if not check_schema.check("dim", value):
        print("FAIL: not rejected:", name)
        failures += 1
convert_good = {"input": 60, "from": "rpm", "to": "Hz", "value": 1, "notes": []}
convert_bad = {
    "no notes": {k: v for k, v in convert_good.items() if k != "notes"},
    "value as text": dict(convert_good, value="1"),
    "empty unit": dict(convert_good, to=""),
    "notes not sentences": dict(convert_good, notes=[1]),
    "extra key": dict(convert_good, extra=1),
}
if check_schema.check("convert", convert_good):
    print("FAIL: the valid convert object is rejected:", check_schema.check("convert", convert_good))
    failures += 1
for name, value in convert_bad.items():
    if not check_schema.check("convert", value):
        print("FAIL: not rejected:", name)
        failures += 1
# scale: the towed pod of tests/cli/problems/scale_pod_uncertain.toml (factor 1.136 +- 0.064)
scale_good = {
    "status": "exact", "model": {"U": 17.1176}, "free": [],
    "groups": [{"label": "Re^-1", "text": "mu/(rho*U*D)", "exponents": {"mu": 1, "rho": -1, "U": -1, "D": -1},
                "prototype": 1.2e-6, "model": 1.2e-6, "ratio": 1, "matched": True}],
    "dependent": {"name": "F", "unit": "N", "prototype_over_model": 1.136, "prototype_over_model_uncertainty": 0.064,
                  "exact": True, "rule": "F_p/F_m = (rho_p/rho_m)", "measured": 120, "measured_uncertainty": 1.5,
                  "predicted": 136.3, "predicted_uncertainty": 7.9},
    "notes": [],
}


def broken_scale(edit):
    v = copy.deepcopy(scale_good)
    edit(v)
    return v


scale_bad = {
    "no notes": broken_scale(lambda v: v.pop("notes")),
    "empty label": broken_scale(lambda v: v["groups"][0].update(label="")),
    "uncertainty of three digits": broken_scale(lambda v: v["dependent"].update(prototype_over_model_uncertainty=0.0643)),
    "uncertainty without a value": broken_scale(lambda v: v["dependent"].update(prototype_over_model=None)),
    "predicted without a measured value": broken_scale(lambda v: v["dependent"].update(
        measured=None, measured_uncertainty=None)),
    "negative uncertainty": broken_scale(lambda v: v["dependent"].update(predicted_uncertainty=-7.9)),
    "exact not a boolean": broken_scale(lambda v: v["dependent"].update(exact="yes")),
    "free while exact": broken_scale(lambda v: v.update(free=["U"])),
    "unknown configuration": broken_scale(lambda v: v.update(configuration="cylinder")),
}
if check_schema.check("scale", dict(scale_good, configuration="cylinder_crossflow")):
    print("FAIL: the valid scale object with a configuration is rejected")
    failures += 1
if check_schema.check("scale", scale_good):
    print("FAIL: the valid scale object is rejected:", check_schema.check("scale", scale_good))
    failures += 1
for name, value in scale_bad.items():
    if not check_schema.check("scale", value):
        print("FAIL: not rejected (scale):", name)
        failures += 1

# fit: Nu = C Re^a Pr^b with Pr held at 1/3 (made-up numbers of the right shape)
fit_good = {
    "basis": "named", "n": 10, "dependent": {"exponents": {"h": 1, "D": 1, "k": -1}, "symbol": "Nu"},
    "coefficient": {"value": 0.2, "std_error": 0.01, "ci95": [0.18, 0.22]},
    "terms": [{"exponents": {"rho": 1, "U": 1, "D": 1, "mu": -1}, "symbol": "Re", "exponent": 0.6,
               "std_error": 0.02, "ci95": [0.55, 0.65], "fixed": False},
              {"exponents": {"mu": 1, "cp": 1, "k": -1}, "symbol": "Pr", "exponent": 1 / 3, "std_error": 0,
               "ci95": [1 / 3, 1 / 3], "fixed": True}],
    "constant": [], "r2": 0.99, "rms_relative": 0.03, "max_relative": 0.06,
    "range": [{"symbol": "Nu", "min": 10, "max": 100}, {"symbol": "Re", "min": 1e3, "max": 3e4},
              {"symbol": "Pr", "min": 0.7, "max": 7}],
    "dof": 8, "weighted": False, "within_10": 0.9, "within_20": 1.0,
    "outliers": [{"row": 3, "line": 4, "studentized": 3.4}],
}


def broken_fit(edit):
    v = copy.deepcopy(fit_good)
    edit(v)
    return v


fit_bad = {
    "interval misses the estimate": broken_fit(lambda v: v["terms"][0].update(ci95=[0.61, 0.65])),
    "wrong degrees of freedom": broken_fit(lambda v: v.update(dof=7)),
    "held exponent with an error": broken_fit(lambda v: v["terms"][1].update(std_error=0.1)),
    "negative coefficient": broken_fit(lambda v: v["coefficient"].update(value=-0.2, ci95=[-0.3, -0.1])),
    "r2 above 1": broken_fit(lambda v: v.update(r2=1.5)),
    "largest below the rms": broken_fit(lambda v: v.update(max_relative=0.01)),
    "shares out of order": broken_fit(lambda v: v.update(within_10=1.0, within_20=0.9)),
    "range missing a group": broken_fit(lambda v: v["range"].pop()),
    "range upside down": broken_fit(lambda v: v["range"][1].update(min=3e4, max=1e3)),
    "outlier not flagged": broken_fit(lambda v: v["outliers"][0].update(studentized=1.2)),
    "outlier beyond the rows": broken_fit(lambda v: v["outliers"][0].update(row=11, line=12)),
    "extra key": broken_fit(lambda v: v.update(extra=1)),
    "configuration not a key": broken_fit(lambda v: v.update(configuration=3)),
}
if check_schema.check("fit", dict(fit_good, configuration="cylinder_crossflow")):
    print("FAIL: the valid fit object with a configuration is rejected")
    failures += 1
if check_schema.check("fit", fit_good):
    print("FAIL: the valid fit object is rejected:", check_schema.check("fit", fit_good))
    failures += 1
for name, value in fit_bad.items():
    if not check_schema.check("fit", value):
        print("FAIL: not rejected (fit):", name)
        failures += 1

# exact_rank, the schema's rank check, against python3-sympy's Matrix.rank (an outside
# reference, imported here once instead of in every case): dimension matrices of 7 rows with
# small integer and half-integer entries, rank-deficient ones included (a fixed random.Random state), and the
# rank-2 matrix of a heat exchanger's q, UA, C and dT (W, W/K, W/K, K: L, M, T in the fixed
# combination L^2 M T^-3; Bergman et al., Fundamentals of Heat and Mass Transfer, 7th ed., 11.4).
import random  # noqa: E402
from fractions import Fraction  # noqa: E402

import sympy  # noqa: E402

rng = random.Random(20261205)
matrices = [[[2, 2, 2, 0], [1, 1, 1, 0], [-3, -3, -3, 0], [0, 0, 0, 0], [0, -1, -1, 1], [0, 0, 0, 0], [0, 0, 0, 0]],
            [[0] * 5 for _ in range(7)]]
for _ in range(120):
    cols = rng.randint(1, 9)
    rows = [[Fraction(rng.randint(-3, 3), rng.choice([1, 1, 1, 2])) for _ in range(cols)] for _ in range(7)]
    if rng.random() < 0.5:  # a column that repeats a combination of two others
        for r in rows:
            r.append(2 * r[0] - r[-1])
    matrices.append(rows)
for m in matrices:
    want = sympy.Matrix([[sympy.Rational(x.numerator, x.denominator) if isinstance(x, Fraction) else x for x in r]
                         for r in m]).rank()
    if check_schema.exact_rank(m) != want:
        print("FAIL: exact_rank %d, sympy %d for %r" % (check_schema.exact_rank(m), want, m))
        failures += 1
if check_schema.exact_rank(matrices[0]) != 2:
    print("FAIL: the heat exchanger's matrix has rank 2")
    failures += 1

checked = len(cases) + len(convert_bad) + len(scale_bad) + len(fit_bad) + 10 + len(matrices) + 1
print("%d passed, %d failed" % (checked - failures, failures))
sys.exit(1 if failures else 0)
