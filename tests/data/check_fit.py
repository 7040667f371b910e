#!/usr/bin/env python3
"""nondim fit against python3-statsmodels on the same numbers: estimates, standard errors
and 95 % intervals of an ordinary and a weighted least-squares fit in the logarithms, the
R^2, the externally studentised residuals of the flagged rows; and data generated from the
Dittus-Boelter correlation, Nu = 0.023 Re^0.8 Pr^0.4 (Incropera, DeWitt, Bergman, Lavine,
Fundamentals of Heat and Mass Transfer, 6th ed., eq. 8.60), recovered within the intervals.
Usage: check_fit.py NONDIM. Exit 77 (skipped) without numpy or statsmodels."""
import json
import os
import subprocess
import sys
import tempfile

try:
    import numpy as np
    import statsmodels.api as sm
except ImportError as e:  # CI installs python3-statsmodels
    print(f"skipped: {e}")
    sys.exit(77)

program = sys.argv[1]
failures = []


def close(what, got, want, rel=1e-7):
    if not abs(got - want) <= rel * max(abs(want), 1e-300):
        failures.append(f"{what}: nondim {got!r}, statsmodels {want!r}")


def run_fit(directory, rows, uncertainty=None, extra=(), row_uncertainty=None):
    problem = os.path.join(directory, "p.toml")
    with open(problem, "w") as f:
        f.write('dependent = "Nu"\n')
        for name in ("Nu", "Re", "Pr"):
            f.write(f'[[variable]]\nname = "{name}"\nunit = "1"\n')
            if name == "Nu" and uncertainty is not None:
                f.write(f'value = 1\nuncertainty = {uncertainty}\n')
    data = os.path.join(directory, "d.csv")
    with open(data, "w") as f:
        if row_uncertainty is None:
            f.write("Nu,Re,Pr\n")
            for nu, re, pr in rows:
                f.write(f"{nu!r},{re!r},{pr!r}\n")
        else:  # a column u(Nu): each row's standard uncertainty of Nu (GUM notation)
            f.write("Nu,Re,Pr,u(Nu) [1]\n")
            for (nu, re, pr), u in zip(rows, row_uncertainty):
                f.write(f"{nu!r},{re!r},{pr!r},{u!r}\n")
    out = subprocess.run([program, "fit", "--file", problem, data, "--basis", "classical", "--format", "json", *extra],
                         capture_output=True, text=True, check=True)
    return json.loads(out.stdout)


def compare(name, got, model, X):
    res = model.fit()
    ci = res.conf_int(0.05)
    close(f"{name}: ln C", np.log(got["coefficient"]["value"]), res.params[0])
    close(f"{name}: C std error", got["coefficient"]["std_error"], np.exp(res.params[0]) * res.bse[0])
    close(f"{name}: C interval low", np.log(got["coefficient"]["ci95"][0]), ci[0][0])
    close(f"{name}: C interval high", np.log(got["coefficient"]["ci95"][1]), ci[0][1])
    for k, term in enumerate(got["terms"]):
        close(f"{name}: exponent {k}", term["exponent"], res.params[k + 1])
        close(f"{name}: std error {k}", term["std_error"], res.bse[k + 1])
        close(f"{name}: interval {k} low", term["ci95"][0], ci[k + 1][0])
        close(f"{name}: interval {k} high", term["ci95"][1], ci[k + 1][1])
    close(f"{name}: R^2", got["r2"], res.rsquared)
    # WLS is OLS on the whitened rows sqrt(w) y, sqrt(w) X: the residuals studentised there
    t = sm.OLS(model.wendog, model.wexog).fit().get_influence().resid_studentized_external
    flagged = sorted(o["row"] - 1 for o in got["outliers"])
    if flagged != sorted(int(i) for i in np.nonzero(np.abs(t) > 3)[0]):
        failures.append(f"{name}: flagged rows {flagged}, statsmodels |t| > 3 at {np.nonzero(np.abs(t) > 3)[0]}")
    for o in got["outliers"]:
        close(f"{name}: studentised residual of row {o['row']}", o["studentized"], t[o["row"] - 1])
    return res


rng = np.random.default_rng(20261205)
with tempfile.TemporaryDirectory() as d:
    for n in (5, 12, 60, 200):  # 2 .. 197 degrees of freedom: the t quantile across its range
        re = np.exp(rng.uniform(np.log(1e4), np.log(1e5), n))
        pr = np.exp(rng.uniform(np.log(0.7), np.log(100), n))
        nu = 0.023 * re**0.8 * pr**0.4 * np.exp(rng.normal(0, 0.05, n))
        if n == 60:
            nu[17] *= 1.6  # one row far off: flagged by both
        got = run_fit(d, zip(nu, re, pr))
        X = sm.add_constant(np.column_stack([np.log(re), np.log(pr)]))
        res = compare(f"OLS n={n}", got, sm.OLS(np.log(nu), X), X)
        if got["n"] != n:
            failures.append(f"n: {got['n']} != {n}")
        if n == 200:
            # Dittus-Boelter's exponents and coefficient within three standard errors (a 95 %
            # interval misses the truth one time in twenty; three standard errors one in 370)
            for k, want in ((0, 0.8), (1, 0.4)):
                term = got["terms"][k]
                if not abs(term["exponent"] - want) < 3 * term["std_error"]:
                    failures.append(f"Dittus-Boelter exponent {want}: {term['exponent']} +- {term['std_error']}")
            c = got["coefficient"]
            if not abs(np.log(c["value"] / 0.023)) < 3 * c["std_error"] / c["value"]:
                failures.append(f"Dittus-Boelter C = 0.023: {c['value']} +- {c['std_error']}")
    # weighted: an absolute standard uncertainty of 2 on Nu gives u(ln Nu) = 2/Nu per row
    n = 40
    re = np.exp(rng.uniform(np.log(1e4), np.log(1e5), n))
    pr = np.exp(rng.uniform(np.log(0.7), np.log(100), n))
    nu = 0.023 * re**0.8 * pr**0.4 * np.exp(rng.normal(0, 2.0 / (0.023 * re**0.8 * pr**0.4)))
    got = run_fit(d, zip(nu, re, pr), uncertainty=2)
    if not got["weighted"]:
        failures.append("the fit with an uncertainty on Nu is not weighted")
    X = sm.add_constant(np.column_stack([np.log(re), np.log(pr)]))
    compare("WLS", got, sm.WLS(np.log(nu), X, weights=(nu / 2.0) ** 2), X)
    # weighted row by row: a column u(Nu) of 1 % to 8 % of each Nu gives u(ln Nu) = u/Nu per row;
    # the file's uncertainty of Nu (2) gives way to the column
    share = rng.uniform(0.01, 0.08, n)
    nu_rows = 0.023 * re**0.8 * pr**0.4 * np.exp(rng.normal(0, share))
    got = run_fit(d, zip(nu_rows, re, pr), uncertainty=2, row_uncertainty=share * nu_rows)
    if not got["weighted"]:
        failures.append("the fit with a column u(Nu) is not weighted")
    compare("WLS by rows", got, sm.WLS(np.log(nu_rows), X, weights=1.0 / share**2), X)
    # a held exponent: ln Nu - ln Pr / 3 fitted on ln Re (statsmodels with the offset moved over)
    got = run_fit(d, zip(nu, re, pr), extra=("--fix", "Pi3=1/3"))
    res = sm.OLS(np.log(nu) - np.log(pr) / 3, sm.add_constant(np.log(re))).fit()
    close("held: exponent of Re", got["terms"][0]["exponent"], res.params[1])
    close("held: std error of Re", got["terms"][0]["std_error"], res.bse[1])
    if not got["terms"][1]["fixed"] or got["terms"][1]["exponent"] != 1 / 3:
        failures.append(f"held exponent: {got['terms'][1]}")

for f in failures:
    print("FAIL", f)
print(f"{len(failures)} failures")
sys.exit(1 if failures else 0)
