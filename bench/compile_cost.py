#!/usr/bin/python3
"""Compile cost of nondim quantities against the same code on raw double.

Generates two translation units of the same 300 physics expressions (varied dimensions and
units, sqrt and pow, absolute temperatures, explicit result types): one on nondim quantities,
one on double with the unit factors written as literals. Compiles each with every compiler
found (`-std=c++20 -O2 -c`) several times and prints the median compile times (CPU time of the
compiler: user + system, which preemption on a shared machine does not inflate; wall time
beside it) and their ratio. Target: at most 1.3x (DESIGN.md). It also compiles the two headers alone, so the
fixed cost of including <nondim/quantity.hpp> and the cost per expression can be told apart.
When the ratio is above 1.3, or with --profile, it prints the largest phases of -ftime-report
(GCC) or -ftime-trace totals (Clang) for the quantity unit.

  bench/compile_cost.py [--runs 5] [--expressions 300] [--compilers g++,clang++] [--keep DIR] [--profile]
                        [--instructions] [--include DIR] [--floor]

--instructions: instead of timing, count the instructions the compiler executes (valgrind
--tool=callgrind, children traced: driver, cc1plus / clang -cc1, assembler), once per unit.
Deterministic, so the figure to compare on a loaded machine; ~1 min per unit under valgrind.
--include DIR: the nondim headers to use (an A/B against another tree); default include/.
--floor: also compile the expressions on bench/typed_floor.hpp, the least a typed quantity with the
same syntax can be: its ratio against double bounds what nondim can reach.

Installs nothing; uses only the compilers found on PATH.
"""

import argparse
import json
import os
import re
import resource
import shutil
import statistics
import subprocess
import sys
import tempfile
import time

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
import header_cost  # noqa: E402  (the callgrind count shared by the bench scripts)

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(HERE)

# ---- units: for each dimension, ways to give a number that unit, as (quantity, double factor) ----
U = {
    "length": [("units::m", "1.0"), ("units::mm", "1e-3"), ("units::ft", "0.3048"), ("units::in", "0.0254"),
               ("units::cm", "1e-2")],
    "velocity": [("units::m / units::s", "1.0"), ("units::ft / units::s", "0.3048"),
                 ("units::km / units::h", "(1000.0 / 3600.0)"), ("units::knot", "(1852.0 / 3600.0)"),
                 ("units::mph", "0.44704")],
    "density": [("units::kg / units::m3", "1.0"), ("units::g / (units::cm * units::cm * units::cm)", "1000.0"),
                ("units::lb / (units::ft * units::ft * units::ft)", "16.018463373960138")],
    "dynamic_viscosity": [("units::Pa * units::s", "1.0"), ("units::cP", "1e-3"), ("units::P", "0.1")],
    "kinematic_viscosity": [("units::m2 / units::s", "1.0"), ("units::cSt", "1e-6"), ("units::St", "1e-4")],
    "pressure": [("units::Pa", "1.0"), ("units::kPa", "1e3"), ("units::bar", "1e5"), ("units::psi", "6894.757293168361"),
                 ("units::atm", "101325.0")],
    "temperature": [("units::K", "1.0"), ("units::delta_degF", "(1.0 / 1.8)"), ("units::delta_degC", "1.0"),
                    ("units::mK", "1e-3")],
    "thermal_conductivity": [("units::W / (units::m * units::K)", "1.0"),
                             ("units::Btu / (units::h * units::ft * units::degR)", "1.7307346663713912"),
                             ("units::mW / (units::m * units::K)", "1e-3")],
    "specific_heat_capacity": [("units::J / (units::kg * units::K)", "1.0"), ("units::kJ / (units::kg * units::K)", "1e3"),
                               ("units::Btu / (units::lb * units::degR)", "4186.8")],
    "heat_transfer_coefficient": [("units::W / (units::m2 * units::K)", "1.0"),
                                  ("units::kW / (units::m2 * units::K)", "1e3")],
    "force": [("units::N", "1.0"), ("units::kN", "1e3"), ("units::lbf", "4.4482216152605")],
    "power": [("units::W", "1.0"), ("units::kW", "1e3"), ("units::hp", "745.69987158227022")],
    "energy": [("units::J", "1.0"), ("units::kJ", "1e3"), ("units::Btu", "1055.05585262"), ("units::kcal", "4186.8")],
    "time": [("units::s", "1.0"), ("units::ms", "1e-3"), ("units::min", "60.0"), ("units::h", "3600.0")],
    "mass": [("units::kg", "1.0"), ("units::g", "1e-3"), ("units::lb", "0.45359237")],
    "frequency": [("units::Hz", "1.0"), ("units::rpm", "(1.0 / 60.0)"), ("units::kHz", "1e3")],
    "surface_tension": [("units::N / units::m", "1.0"), ("units::mN / units::m", "1e-3")],
    "mass_flow_rate": [("units::kg / units::s", "1.0"), ("units::lb / units::h", "(0.45359237 / 3600.0)")],
    "specific_gas_constant": [("units::J / (units::kg * units::K)", "1.0"), ("units::kJ / (units::kg * units::K)", "1e3")],
    "thermal_expansion_coefficient": [("1.0 / units::K", "1.0"), ("1.0 / units::delta_degF", "1.8")],
    "specific_energy": [("units::W / units::kg", "1.0"), ("units::mW / units::kg", "1e-3")],  # dissipation rate, per time
    "dimensionless": [("1.0", "1.0")],
}
# dissipation rate is W/kg = m^2 s^-3, not specific energy: give it its own dims expression
DIMS = {k: f"dims::{k}" for k in U}
DIMS["specific_energy"] = "dims::power / dims::mass"

# ---- formulas: (name, inputs {var: dimension}, constants, body, result dimension, result units) ----
# body uses SQRT(x), POW(x, n), POWR(x, n, m) and TP_C(x) / TP_F(x) (absolute temperature from a
# Celsius / Fahrenheit reading); they are expanded for each form.
G = ("g", "9.80665 * (units::m / (units::s * units::s))", "9.80665")
SIGMA_SB = ("sigma_sb", "5.670374419e-8 * (units::W / (units::m2 * units::K * units::K * units::K * units::K))",
            "5.670374419e-8")
PI = ("pi_", "3.141592653589793", "3.141592653589793")
FORMULAS = [
    ("reynolds", {"rho": "density", "u": "velocity", "l": "length", "mu": "dynamic_viscosity"}, [],
     "rho * u * l / mu", "dimensionless", None),
    ("prandtl", {"cp": "specific_heat_capacity", "mu": "dynamic_viscosity", "k": "thermal_conductivity"}, [],
     "cp * mu / k", "dimensionless", None),
    ("dittus_boelter", {"rho": "density", "u": "velocity", "d": "length", "mu": "dynamic_viscosity",
                        "cp": "specific_heat_capacity", "k": "thermal_conductivity"}, [],
     "0.023 * POWR(rho * u * d / mu, 4, 5) * POWR(cp * mu / k, 2, 5)", "dimensionless", None),
    ("film_coefficient", {"nu_d": "dimensionless", "k": "thermal_conductivity", "d": "length"}, [],
     "nu_d * k / d", "heat_transfer_coefficient", "heat_transfer_coefficient"),
    ("wall_heat_flux", {"h": "heat_transfer_coefficient", "tw": "temperature", "tf": "temperature"}, [],
     "h * (tw - tf)", "heat_flux_density", "W_m2"),
    ("dynamic_pressure", {"rho": "density", "u": "velocity"}, [], "0.5 * rho * u * u", "pressure", "pressure"),
    ("drag_force", {"rho": "density", "u": "velocity", "cd": "dimensionless", "l": "length"}, [],
     "0.5 * rho * POW(u, 2) * cd * (l * l)", "force", "force"),
    ("drag_power", {"f": "force", "u": "velocity"}, [], "f * u", "power", "power"),
    ("froude", {"u": "velocity", "l": "length"}, [G], "u / SQRT(g * l)", "dimensionless", None),
    ("weber", {"rho": "density", "u": "velocity", "l": "length", "s": "surface_tension"}, [],
     "rho * u * u * l / s", "dimensionless", None),
    ("grashof", {"beta": "thermal_expansion_coefficient", "dt": "temperature", "l": "length",
                 "nu": "kinematic_viscosity"}, [G],
     "g * beta * dt * POW(l, 3) / (nu * nu)", "dimensionless", None),
    ("rayleigh", {"beta": "thermal_expansion_coefficient", "dt": "temperature", "l": "length",
                  "nu": "kinematic_viscosity", "k": "thermal_conductivity", "rho": "density",
                  "cp": "specific_heat_capacity"}, [G],
     "g * beta * dt * POW(l, 3) / (nu * (k / (rho * cp)))", "dimensionless", None),
    ("thermal_diffusivity", {"k": "thermal_conductivity", "rho": "density", "cp": "specific_heat_capacity"}, [],
     "k / (rho * cp)", "kinematic_viscosity", "kinematic_viscosity"),
    ("peclet", {"u": "velocity", "l": "length", "k": "thermal_conductivity", "rho": "density",
                "cp": "specific_heat_capacity"}, [],
     "u * l * rho * cp / k", "dimensionless", None),
    ("mach", {"u": "velocity", "gamma": "dimensionless", "r": "specific_gas_constant", "t": "temperature"}, [],
     "u / SQRT(gamma * r * t)", "dimensionless", None),
    ("speed_of_sound", {"gamma": "dimensionless", "p": "pressure", "rho": "density"}, [],
     "SQRT(gamma * p / rho)", "velocity", "velocity"),
    ("kinetic_energy", {"m": "mass", "u": "velocity"}, [], "0.5 * m * u * u", "energy", "energy"),
    ("darcy_drop", {"f": "dimensionless", "l": "length", "d": "length", "rho": "density", "u": "velocity"}, [],
     "f * (l / d) * 0.5 * rho * u * u", "pressure", "pressure"),
    ("pipe_mass_flow", {"rho": "density", "u": "velocity", "d": "length"}, [PI],
     "rho * u * pi_ * d * d / 4.0", "mass_flow_rate", "mass_flow_rate"),
    ("heat_rate", {"mdot": "mass_flow_rate", "cp": "specific_heat_capacity", "dt": "temperature"}, [],
     "mdot * cp * dt", "power", "power"),
    ("strouhal", {"f": "frequency", "l": "length", "u": "velocity"}, [], "f * l / u", "dimensionless", None),
    ("biot", {"h": "heat_transfer_coefficient", "l": "length", "k": "thermal_conductivity"}, [],
     "h * l / k", "dimensionless", None),
    ("fourier", {"k": "thermal_conductivity", "rho": "density", "cp": "specific_heat_capacity", "t": "time",
                 "l": "length"}, [],
     "k / (rho * cp) * t / (l * l)", "dimensionless", None),
    ("conduction_flux", {"k": "thermal_conductivity", "dt": "temperature", "l": "length"}, [],
     "k * dt / l", "heat_flux_density", "W_m2"),
    ("radiation_flux", {"eps": "dimensionless", "t1": "temperature", "t2": "temperature"}, [SIGMA_SB],
     "sigma_sb * eps * (POW(t1, 4) - POW(t2, 4))", "heat_flux_density", "W_m2"),
    ("stokes_settling", {"rp": "density", "rf": "density", "r": "length", "mu": "dynamic_viscosity"}, [G],
     "(2.0 / 9.0) * (rp - rf) * g * r * r / mu", "velocity", "velocity"),
    ("capillary_length", {"s": "surface_tension", "rho": "density"}, [G], "SQRT(s / (rho * g))", "length", "length"),
    ("blasius_thickness", {"x": "length", "rho": "density", "u": "velocity", "mu": "dynamic_viscosity"}, [],
     "5.0 * x / SQRT(rho * u * x / mu)", "length", "length"),
    ("kolmogorov_length", {"nu": "kinematic_viscosity", "eps": "specific_energy"}, [],
     "POWR(POW(nu, 3) / eps, 1, 4)", "length", "length"),
    ("ideal_gas_density", {"p": "pressure", "r": "specific_gas_constant", "t": "temperature"}, [],
     "p / (r * t)", "density", "density"),
    ("pump_power", {"dp": "pressure", "u": "velocity", "d": "length", "eta": "dimensionless"}, [PI],
     "dp * (u * pi_ * d * d / 4.0) / eta", "power", "power"),
    ("pendulum_period", {"l": "length"}, [G, PI], "2.0 * pi_ * SQRT(l / g)", "time", "time"),
    ("celsius_fahrenheit_rise", {"c": "dimensionless", "f": "dimensionless"}, [], "TP_C(c) - TP_F(f)",
     "temperature", "temperature"),
    ("sphere_volume_radius", {"l": "length"}, [PI], "POWR(4.0 / 3.0 * pi_ * POW(l, 3), 1, 3)", "length", "length"),
]
# read-out units for results: (quantity unit, double factor)
OUT = {
    "pressure": U["pressure"], "force": U["force"], "power": U["power"], "energy": U["energy"],
    "velocity": U["velocity"], "length": U["length"], "time": U["time"], "density": U["density"],
    "mass_flow_rate": U["mass_flow_rate"], "temperature": U["temperature"][:3],
    "kinematic_viscosity": U["kinematic_viscosity"], "heat_transfer_coefficient": U["heat_transfer_coefficient"],
    "W_m2": [("units::W / units::m2", "1.0"), ("units::kW / units::m2", "1e3")],
}


def split_call(s, i):
    """s[i] == '(': return (args, index after the matching ')')."""
    depth, args, start = 0, [], i + 1
    for j in range(i, len(s)):
        c = s[j]
        if c == "(":
            depth += 1
        elif c == ")":
            depth -= 1
            if depth == 0:
                args.append(s[start:j].strip())
                return args, j + 1
        elif c == "," and depth == 1:
            args.append(s[start:j].strip())
            start = j + 1
    raise ValueError("unbalanced parentheses in " + s)


def expand(body, form):
    out, i = [], 0
    pat = re.compile(r"\b(SQRT|POWR|POW|TP_C|TP_F)\(")
    while True:
        m = pat.search(body, i)
        if not m:
            out.append(body[i:])
            return "".join(out)
        out.append(body[i:m.start()])
        args, i = split_call(body, m.end() - 1)
        args = [expand(a, form) for a in args]
        fn = m.group(1)
        if form != "double":
            out.append({"SQRT": lambda a: f"sqrt({a[0]})",
                        "POW": lambda a: f"pow<{a[1]}>({a[0]})",
                        "POWR": lambda a: f"pow<{a[1]}, {a[2]}>({a[0]})",
                        "TP_C": lambda a: f"from_celsius({a[0]})",
                        "TP_F": lambda a: f"from_fahrenheit({a[0]})"}[fn](args))
        else:
            out.append({"SQRT": lambda a: f"std::sqrt({a[0]})",
                        "POW": lambda a: f"std::pow({a[0]}, {a[1]})",
                        "POWR": lambda a: f"std::pow({a[0]}, {a[1]}.0 / {a[2]}.0)",
                        "TP_C": lambda a: f"({a[0]} + 273.15)",
                        "TP_F": lambda a: f"(({a[0]} + 459.67) / 1.8)"}[fn](args))


def generate(n, form):
    lines = ["// generated by bench/compile_cost.py: %d expressions on %s" % (n, form)]
    if form != "double":
        lines += [f"#include {HEADER[form]}", "", f"using namespace {NAMESPACE[form]};", ""]
    else:
        lines += ["#include <cmath>", ""]
    for e in range(n):
        name, inputs, consts, body, rdim, runit = FORMULAS[e % len(FORMULAS)]
        v = e // len(FORMULAS)  # variant: which units the inputs and the result are given in
        params = ", ".join(f"double {k}_" for k in inputs)
        lines.append(f"double {name}_{e}({params}) {{")
        for j, (var, dim) in enumerate(inputs.items()):
            qu, df = U[dim][(v + j) % len(U[dim])]
            if dim == "dimensionless":
                lines.append(f"  const double {var} = {var}_;")
            elif form != "double":
                lines.append(f"  const quantity<{DIMS[dim]}> {var} = {var}_ * ({qu});" if j % 2 == 0 else
                             f"  const auto {var} = {var}_ * ({qu});")
            else:
                lines.append(f"  const double {var} = {var}_ * {df};")
        for cname, cq, cd in consts:
            scale = f"{1.0 + 1e-3 * v:.4f}"  # a different constant in every variant
            lines.append(f"  const auto {cname} = {scale} * {cq};" if form != "double" else
                         f"  const double {cname} = {scale} * {cd};")
        expr = expand(body, form)
        if runit is None:
            lines.append(f"  const double res = {expr};")
            lines.append("  return res;")
        else:
            qu, df = OUT[runit][v % len(OUT[runit])]
            if form != "double":
                rd = "dims::heat_flux_density" if rdim == "heat_flux_density" else DIMS[rdim]
                lines.append(f"  const quantity<{rd}> res = {expr};")
                lines.append(f"  return res / ({qu});")
            else:
                lines.append(f"  const double res = {expr};")
                lines.append(f"  return res / {df};")
        lines.append("}")
        lines.append("")
    return "\n".join(lines) + "\n"


# what each typed form includes; "floor" is bench/typed_floor.hpp, the least a typed quantity can be
HEADER = {"quantity": "<nondim/quantity.hpp>", "floor": '"typed_floor.hpp"', "double": "<cmath>"}
NAMESPACE = {"quantity": "nondim", "floor": "nondim_floor"}


def header_only(form):
    return f"#include {HEADER[form]}\n"


INCLUDE = [os.path.join(ROOT, "include")]


def compile_cmd(cxx, src, obj, extra=()):
    return [cxx, "-std=c++20", "-O2", "-I" + INCLUDE[0], "-I" + HERE, "-c", src, "-o", obj, *extra]


def count_instructions(cxx, src, obj, work):
    """Instructions executed by the whole compile (every process), from callgrind's totals."""
    total = header_cost.instructions(compile_cmd(cxx, src, obj), work)
    if total is None:
        raise SystemExit(f"compile_cost.py: {cxx} failed under valgrind on {src}")
    return total


def compile_once(cxx, src, obj, extra=()):
    cmd = compile_cmd(cxx, src, obj, extra)
    before = resource.getrusage(resource.RUSAGE_CHILDREN)
    t0 = time.perf_counter()
    p = subprocess.run(cmd, stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    wall = time.perf_counter() - t0
    after = resource.getrusage(resource.RUSAGE_CHILDREN)
    if p.returncode != 0:
        sys.stderr.write(p.stderr)
        raise SystemExit(f"compile_cost.py: {cxx} failed on {src}")
    cpu = (after.ru_utime - before.ru_utime) + (after.ru_stime - before.ru_stime)
    return cpu, wall, p.stderr


def median_times(cxx, src, obj, runs):
    cpus, walls = [], []
    for _ in range(runs):
        c, w, _ = compile_once(cxx, src, obj)
        cpus.append(c)
        walls.append(w)
    return statistics.median(cpus), statistics.median(walls)


def profile(cxx, src, obj, work):
    print(f"  profile of the quantity unit ({cxx}):")
    if "clang" in cxx:
        _, _, _ = compile_once(cxx, src, obj, ["-ftime-trace"])
        trace = os.path.splitext(obj)[0] + ".json"
        with open(trace) as f:
            events = json.load(f)["traceEvents"]
        totals = [(e["dur"] / 1e6, e["name"]) for e in events if e.get("name", "").startswith("Total ")]
        for dur, name in sorted(totals, reverse=True)[:10]:
            print(f"    {dur:8.3f} s  {name}")
    else:
        _, _, err = compile_once(cxx, src, obj, ["-ftime-report"])
        rows = []
        for line in err.splitlines():
            # " phase parsing   :   0.47 ( 85%)   0.22 ( 96%)   0.70 ( 88%)    76M ( 88%)": usr sys wall
            m = re.match(r"\s*(.+?)\s*:\s*([\d.]+)\s*\(\s*\d+%\)\s*([\d.]+)\s*\(\s*\d+%\)", line)
            if m and not m.group(1).startswith("TOTAL"):
                rows.append((float(m.group(2)) + float(m.group(3)), m.group(1)))
        for cpu, name in sorted(rows, reverse=True)[:12]:
            print(f"    {cpu:8.3f} s  {name}")


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    ap.add_argument("--runs", type=int, default=5)
    ap.add_argument("--expressions", type=int, default=300)
    ap.add_argument("--compilers", default="g++,clang++")
    ap.add_argument("--keep", help="write the generated sources here and keep them")
    ap.add_argument("--profile", action="store_true", help="always print the compiler's time report")
    ap.add_argument("--instructions", action="store_true", help="count compiler instructions (callgrind)")
    ap.add_argument("--include", help="nondim headers to use (default: include/ of this tree)")
    ap.add_argument("--floor", action="store_true",
                    help="also compile the expressions on bench/typed_floor.hpp, the least a typed quantity can be")
    a = ap.parse_args()
    if a.include:
        INCLUDE[0] = os.path.abspath(a.include)

    compilers = [c for c in a.compilers.split(",") if c]
    found = [c for c in compilers if shutil.which(c)]
    for c in compilers:
        if c not in found:
            print(f"compile_cost.py: compiler '{c}' not found, skipped", file=sys.stderr)
    if not found:
        raise SystemExit("compile_cost.py: no compiler found")

    work = a.keep or tempfile.mkdtemp(prefix="nondim-compile-cost.")
    os.makedirs(work, exist_ok=True)
    srcs = {}
    forms = ("quantity", "double", "floor") if a.floor else ("quantity", "double")
    for form in forms:
        srcs[form] = os.path.join(work, f"expr_{form}.cpp")
        with open(srcs[form], "w") as f:
            f.write(generate(a.expressions, form))
        srcs[form + "_header"] = os.path.join(work, f"header_{form}.cpp")
        with open(srcs[form + "_header"], "w") as f:
            f.write(header_only(form))

    if a.instructions:
        if not shutil.which("valgrind"):
            raise SystemExit("compile_cost.py: --instructions needs valgrind (Debian: apt-get install valgrind)")
        print(f"{a.expressions} expressions, -std=c++20 -O2 -c, instructions executed by the compiler (callgrind), M")
        print(f"{'compiler':10s} {'quantity':>9s} {'double':>9s} {'ratio':>6s} | {'header q':>9s} {'header d':>9s}"
              f" {'M/expr q':>9s} {'M/expr d':>9s} {'ratio':>6s}")
        worst = 0.0
        for cxx in found:
            n = {key: count_instructions(cxx, src, os.path.join(work, f"{key}_{cxx.replace('+', 'x')}.o"), work) / 1e6
                 for key, src in srcs.items()}
            ratio = n["quantity"] / n["double"]
            pq = (n["quantity"] - n["quantity_header"]) / a.expressions
            pd = (n["double"] - n["double_header"]) / a.expressions
            worst = max(worst, ratio)
            print(f"{cxx:10s} {n['quantity']:9.0f} {n['double']:9.0f} {ratio:6.2f} | {n['quantity_header']:9.0f}"
                  f" {n['double_header']:9.0f} {pq:9.2f} {pd:9.2f} {pq / pd if pd > 0 else float('nan'):6.2f}")
            if a.floor:
                pf = (n["floor"] - n["floor_header"]) / a.expressions
                print(f"{'  floor':10s} {n['floor']:9.0f} {n['double']:9.0f} {n['floor'] / n['double']:6.2f} |"
                      f" {n['floor_header']:9.0f} {n['double_header']:9.0f} {pf:9.2f} {pd:9.2f}"
                      f" {pf / pd if pd > 0 else float('nan'):6.2f}")
        print(f"summary: compiler instructions quantity/double, worst compiler: {worst:.2f} (target <= 1.3)")
        if not a.keep:
            shutil.rmtree(work, ignore_errors=True)
        return

    print(f"{a.expressions} expressions, -std=c++20 -O2 -c, median of {a.runs} runs "
          "(CPU = user + system of the compiler; wall in brackets)")
    print(f"{'compiler':10s} {'quantity':>18s} {'double':>18s} {'ratio':>6s} | {'header q':>9s} {'header d':>9s}"
          f" {'ms/expr q':>9s} {'ms/expr d':>9s} {'ratio':>6s}")
    worst = 0.0
    for cxx in found:
        t = {}
        for key, src in srcs.items():
            t[key] = median_times(cxx, src, os.path.join(work, f"{key}_{cxx.replace('+', 'x')}.o"), a.runs)
        q, d = t["quantity"], t["double"]
        hq, hd = t["quantity_header"], t["double_header"]
        ratio = q[0] / d[0]
        pq = 1e3 * (q[0] - hq[0]) / a.expressions
        pd = 1e3 * (d[0] - hd[0]) / a.expressions
        worst = max(worst, ratio)
        print(f"{cxx:10s} {q[0]:7.3f} s [{q[1]:6.3f}] {d[0]:7.3f} s [{d[1]:6.3f}] {ratio:6.2f} |"
              f" {hq[0]:7.3f} s {hd[0]:7.3f} s {pq:9.3f} {pd:9.3f} {pq / pd if pd > 0 else float('nan'):6.2f}")
        if a.floor:
            f_, hf = t["floor"], t["floor_header"]
            pf = 1e3 * (f_[0] - hf[0]) / a.expressions
            print(f"{'  floor':10s} {f_[0]:7.3f} s [{f_[1]:6.3f}] {d[0]:7.3f} s [{d[1]:6.3f}] {f_[0] / d[0]:6.2f} |"
                  f" {hf[0]:7.3f} s {hd[0]:7.3f} s {pf:9.3f} {pd:9.3f} {pf / pd if pd > 0 else float('nan'):6.2f}")
        if a.profile or ratio > 1.3:
            profile(cxx, srcs["quantity"], os.path.join(work, f"profile_{cxx.replace('+', 'x')}.o"), work)
    print(f"summary: compile time quantity/double, worst compiler: {worst:.2f} (target <= 1.3)")
    if not a.keep:
        shutil.rmtree(work, ignore_errors=True)


if __name__ == "__main__":
    main()
