#!/usr/bin/python3
"""Group values and standard uncertainties of `nondim groups --format json` against
python3-uncertainties (Debian), which propagates uncorrelated standard uncertainties to
first order (GUM, JCGM 100:2008, eq. 10) by automatic differentiation: an outside check of
the program's propagation and of its conversions of the inputs to SI.

Each case gives the variables as the command line takes them and the same inputs in SI,
converted here with the factors of the SI Brochure (9th ed., table 7: prefixes) and of NIST
SP 811 (appendix B.8: ft = 0.3048 m, lbm = 0.45359237 kg). The program's values are rounded
(GUM 7.2.6: the uncertainty to two significant digits, the value to the same place), so
each is compared within half a unit of its last digit.

Exit status 77 (skipped by ctest) when the module is missing: install python3-uncertainties.
"""
import json
import math
import subprocess
import sys

try:
    from uncertainties import ufloat
except ImportError:
    print("SKIPPED: the Python module 'uncertainties' is missing (Debian: apt-get install python3-uncertainties)")
    sys.exit(77)

program = sys.argv[1]

MM = 1e-3     # SI Brochure, table 7 (milli)
UM = 1e-6     # micro
MPA_S = 1e-3  # mPa*s
FT = 0.3048   # NIST SP 811, B.8
LBM = 0.45359237

# (arguments, {name: ufloat in SI or float without uncertainty})
cases = [
    # a coolant line (invented): Re^-1, L/D, eps/D
    (["dp=Pa", "rho=998±0.5 kg/m^3", "U=2.0±2% m/s", "D=25±0.05 mm", "mu=1.0+-2% mPa*s", "L=10±0.01 m",
      "eps=50±5 um"],
     {"rho": ufloat(998, 0.5), "U": ufloat(2.0, 0.04), "D": ufloat(25 * MM, 0.05 * MM),
      "mu": ufloat(1.0 * MPA_S, 0.02 * MPA_S), "L": ufloat(10, 0.01), "eps": ufloat(50 * UM, 5 * UM)}),
    # a heated plate in customary units (invented): powers up to 5 (a local g with its uncertainty)
    (["h=W/(m^2*K)", "g=9.81±0.01 m/s^2", "beta=0.00343±0.00002 1/K", "dT=30±0.4 K", "L=1.5±0.01 ft",
      "rho=0.075±0.001 lbm/ft^3", "mu=1.8e-5±3% Pa*s", "k=0.026±0.0005 W/(m*K)"],
     {"g": ufloat(9.81, 0.01), "beta": ufloat(0.00343, 0.00002), "dT": ufloat(30, 0.4), "L": ufloat(1.5 * FT, 0.01 * FT),
      "rho": ufloat(0.075 * LBM / FT**3, 0.001 * LBM / FT**3), "mu": ufloat(1.8e-5, 0.03 * 1.8e-5),
      "k": ufloat(0.026, 0.0005)}),
    # a temperature in degC: its uncertainty is a difference, 0.2 degC = 0.2 K (SI Brochure 2.3.1)
    (["q=W/m^2", "T=20±0.2 degC", "Tw=350±0.5 K", "k=W/(m*K)", "L=0.1 m"],
     {"T": ufloat(293.15, 0.2), "Tw": ufloat(350, 0.5), "L": 0.1}),
    # values without uncertainties: 12 significant digits, no uncertainty
    (["U=250 ft/s", "c=343.2 m/s"], {"U": 250 * FT, "c": 343.2}),
]

failures = 0
checked = 0
for args, si in cases:
    p = subprocess.run([program, "groups"] + args + ["--format", "json"], capture_output=True, text=True)
    if p.returncode != 0:
        print("FAIL: nondim groups %s: exit %d: %s" % (" ".join(args), p.returncode, p.stderr))
        failures += 1
        continue
    report = json.loads(p.stdout)
    for k, g in enumerate(report["groups"]):
        names = list(g["exponents"])
        if not all(n in si for n in names):
            if "value" in g:
                print("FAIL: group %d (%s) has a value, but not every variable has one" % (k + 1, g["text"]))
                failures += 1
            continue
        ref = 1.0
        for n, e in g["exponents"].items():
            ref = ref * si[n] ** e
        has_u = all(hasattr(si[n], "std_dev") for n in names)
        value = getattr(ref, "nominal_value", ref)
        if "value" not in g:
            print("FAIL: group %d (%s) has no value" % (k + 1, g["text"]))
            failures += 1
            continue
        if has_u:
            u = ref.std_dev
            place = math.floor(math.log10(u)) - 1
            half = 0.5 * 10.0**place * 1.001
            ok = abs(g["value"] - value) <= half and "uncertainty" in g and abs(g["uncertainty"] - u) <= half
            print("%s group %d %-40s value %.10g (ref %.10g), u %s (ref %.6g)" % (
                "ok  " if ok else "FAIL", k + 1, g["text"], g["value"], value, g.get("uncertainty"), u))
        else:
            ok = math.isclose(g["value"], value, rel_tol=1e-11) and "uncertainty" not in g
            print("%s group %d %-40s value %.12g (ref %.12g), no uncertainty" % (
                "ok  " if ok else "FAIL", k + 1, g["text"], g["value"], value))
        checked += 1
        failures += 0 if ok else 1

if checked < 8:
    print("FAIL: only %d groups checked" % checked)
    failures += 1

# The scale-up factor of `nondim scale` and the predicted prototype value: the textbook
# scaling rules written with ufloats, so that python3-uncertainties differentiates the whole
# plan (the model speed found from the other values included). Each problem is written here
# with the values given to the program (invented tests).
import os  # noqa: E402
import tempfile  # noqa: E402

KN = 1852.0 / 3600.0  # NIST SP 811, B.8: 1 kn = 1852 m/h


def scale_case(toml_text, args):
    with tempfile.TemporaryDirectory() as d:
        path = os.path.join(d, "p.toml")
        with open(path, "w") as f:
            f.write(toml_text)
        p = subprocess.run([program, "scale", path, "--format", "json"] + args, capture_output=True, text=True)
    if p.returncode != 0:
        print("FAIL: nondim scale: exit %d: %s" % (p.returncode, p.stderr))
        return None
    return json.loads(p.stdout)["dependent"]


def within_half_digit(what, got, got_u, ref):
    """The program's value and uncertainty rounded as GUM 7.2.6 asks: within half a unit of the last digit."""
    place = math.floor(math.log10(ref.std_dev)) - 1
    half = 0.5 * 10.0**place * 1.001
    ok = got_u is not None and abs(got - ref.nominal_value) <= half and abs(got_u - ref.std_dev) <= half
    print("%s %-44s %s +- %s (ref %.6g +- %.4g)" % ("ok  " if ok else "FAIL", what, got, got_u, ref.nominal_value,
                                                   ref.std_dev))
    return ok


# Reynolds matching in another fluid (Munson, Young, Okiishi, 6th ed., 7.9): V_m from the
# Reynolds number, then F_p/F_m from the drag coefficient.
rho_p, rho_m = ufloat(1025, 2.0), ufloat(998, 0.5)
mu_p, mu_m = ufloat(1.08e-3, 0.02 * 1.08e-3), ufloat(1.0e-3, 0.02e-3)
D_p, D_m = ufloat(0.30, 0.001), ufloat(0.10, 0.0005)
U_p = ufloat(6 * KN, 0.1 * KN)
F_m = ufloat(120, 1.5)
U_m = U_p * (rho_p / rho_m) * (mu_m / mu_p) * (D_p / D_m)
factor = (rho_p / rho_m) * (U_p / U_m) ** 2 * (D_p / D_m) ** 2
pod = """dependent = "F"
[[variable]]
name = "F"
unit = "N"
model = 120.0
model_uncertainty = 1.5
[[variable]]
name = "rho"
unit = "kg/m^3"
prototype = 1025
prototype_uncertainty = 2.0
model = 998
model_uncertainty = "0.5 kg/m^3"
[[variable]]
name = "U"
unit = "kn"
prototype = 6
prototype_uncertainty = 0.1
[[variable]]
name = "D"
unit = "cm"
prototype = 30
prototype_uncertainty = "1 mm"
model = 10
model_uncertainty = "0.5 mm"
[[variable]]
name = "mu"
unit = "mPa*s"
prototype = 1.08
prototype_uncertainty = "2 %"
model = 1.0
model_uncertainty = "0.02 mPa*s"
"""
d = scale_case(pod, [])
if d is None:
    failures += 1
else:
    failures += 0 if within_half_digit("pod: F_p/F_m", d["prototype_over_model"],
                                       d.get("prototype_over_model_uncertainty"), factor) else 1
    failures += 0 if within_half_digit("pod: predicted F_p", d["predicted"], d.get("predicted_uncertainty"),
                                       factor * F_m) else 1

# Froude matching first on a 1:25 ship model (Munson, 6th ed., 7.9.2): V_m from the Froude
# number, the Reynolds number left unmatched; R_p/R_m from the resistance coefficient.
rho_p, rho_m = ufloat(1025, 3.0), ufloat(999, 1.0)
L_p, L_m = ufloat(100, 0.2), ufloat(4.0, 0.004)
g_p, g_m = ufloat(9.81, 0.005), ufloat(9.806, 0.002)
V_p = ufloat(10, 0.1)
R_m = ufloat(0.052, 0.0004)
V_m = V_p * (L_m * g_m / (L_p * g_p)) ** 0.5
factor = (rho_p / rho_m) * (V_p / V_m) ** 2 * (L_p / L_m) ** 2
ship = """dependent = "R"
repeating = ["rho", "U", "L"]
[[variable]]
name = "R"
unit = "kN"
model = 0.052
model_uncertainty = 0.0004
[[variable]]
name = "rho"
unit = "kg/m^3"
prototype = 1025
prototype_uncertainty = 3
model = 999
model_uncertainty = 1
[[variable]]
name = "U"
unit = "m/s"
prototype = 10
prototype_uncertainty = "1 %"
[[variable]]
name = "L"
unit = "m"
prototype = 100
prototype_uncertainty = 0.2
model = 4
model_uncertainty = "4 mm"
[[variable]]
name = "g"
unit = "m/s^2"
prototype = 9.81
prototype_uncertainty = 0.005
model = 9.806
model_uncertainty = 0.002
[[variable]]
name = "mu"
unit = "Pa*s"
prototype = 1.08e-3
model = 1.0e-3
"""
d = scale_case(ship, ["--priority", "2"])
if d is None:
    failures += 1
else:
    failures += 0 if within_half_digit("ship: R_p/R_m", d["prototype_over_model"],
                                       d.get("prototype_over_model_uncertainty"), factor) else 1
    failures += 0 if within_half_digit("ship: predicted R_p", d["predicted"], d.get("predicted_uncertainty"),
                                       factor * R_m) else 1
sys.exit(1 if failures else 0)
