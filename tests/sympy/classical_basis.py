#!/usr/bin/env python3
"""Independent reference for the classical pi-group basis of tests/textbook_problems.hpp,
computed with python3-sympy (exact rationals) by the rule of DESIGN.md:

  repeating variables: the non-dependent variables ordered by tier (a length; a velocity,
  rotational speed or acceleration; a density; the others; surface tension, viscosity,
  expansion coefficient and pure numbers last), then fewer base dimensions, then smaller
  sum of |exponents|, then input order; take each that raises the rank; only if the
  rank is still short take the dependent (first) variable too.  Group k: one non-repeating
  variable (exponent > 0) times powers of the repeating ones, primitive integers, in input
  order of the non-repeating variable.

The dimensions are typed in here again from the SI Brochure (9th ed., tables 2-4) rather than
read from the C++ header, so that a slip in one is caught by the other: textbook_agreement.py
(ctest sympy.textbook_basis) compares both the dimensions and the bases with pi_basis, and
random_agreement.py the bases of random problems. Run alone, it prints the bases:
  python3 tests/sympy/classical_basis.py
"""
from functools import reduce
from math import gcd
from sympy import Matrix, Rational, ilcm

# exponents of L M T I Theta N J
def d(L=0, M=0, T=0, I=0, Th=0, N=0, J=0):
    return [Rational(x) for x in (L, M, T, I, Th, N, J)]

length = d(L=1); mass = d(M=1); time = d(T=1); temp = d(Th=1); one = d()
velocity = d(L=1, T=-1); accel = d(L=1, T=-2); force = d(L=1, M=1, T=-2)
pressure = d(L=-1, M=1, T=-2); density = d(L=-3, M=1); mu = d(L=-1, M=1, T=-1)
nu = d(L=2, T=-1); freq = d(T=-1); power = d(L=2, M=1, T=-3); energy = d(L=2, M=1, T=-2)
flow = d(L=3, T=-1); sigma = d(M=1, T=-2); h_conv = d(M=1, T=-3, Th=-1)
k_cond = d(L=1, M=1, T=-3, Th=-1); cp = d(L=2, T=-2, Th=-1); beta = d(Th=-1)
G = d(L=3, M=-1, T=-2); volume = d(L=3); amount = d(N=1); R_molar = d(L=2, M=1, T=-2, Th=-1, N=-1)
ohm = d(L=2, M=1, T=-3, I=-2); farad = d(L=-2, M=-1, T=4, I=2); ohm_m = d(L=3, M=1, T=-3, I=-2)
area = d(L=2)
conductance = d(L=2, M=1, T=-3, Th=-1)  # W/K: UA, a heat-capacity rate m c_p
K_Ic = d(L=Rational(-1, 2), M=1, T=-2)
noise = d(L=1, T=Rational(-3, 2))

problems = {  # the names of tests/textbook_problems.hpp
    "sphere_drag": [force, density, velocity, length, mu],
    "pipe_pressure_drop": [pressure, density, velocity, length, mu, length, length],
    "ship_resistance": [force, density, velocity, length, mu, accel],
    "vortex_shedding": [freq, velocity, length, density, mu],
    "pump_power": [power, density, freq, length, flow, mu],
    "weir_flow": [flow, accel, length, length],
    "orifice_flow": [flow, pressure, density, length],
    "boundary_layer": [length, length, velocity, nu],
    "stokes_settling": [velocity, length, density, accel, mu],
    "deep_water_wave": [velocity, accel, length],
    "sound_speed": [velocity, one, pressure, density],
    "blast_wave": [length, time, energy, density],
    "capillary_rise": [length, sigma, density, accel, length, one],
    "drop_oscillation": [freq, sigma, density, length],
    "drag_without_density": [force, length, velocity, nu],
    "forced_convection": [h_conv, k_cond, velocity, length, density, mu, cp],
    "natural_convection": [h_conv, k_cond, length, accel, beta, temp, density, mu, cp],
    "transient_conduction": [one, time, nu, length, h_conv, k_cond],
    "mass_transfer": [velocity, nu, length, velocity, nu],
    "packed_bed": [pressure, length, length, velocity, density, mu, one],
    "heat_exchanger": [power, conductance, conductance, conductance, temp],
    "pendulum": [time, mass, length, accel],
    "spring_mass": [freq, sigma, mass],
    "spring_force": [force, sigma, length],
    "kepler_orbit": [time, length, G, mass],
    "ideal_gas": [pressure, volume, amount, temp, R_molar],
    "rc_circuit": [time, ohm, farad],
    "wire_resistance": [ohm, ohm_m, length, area],
    "crack_fracture": [pressure, K_Ic, length],
    "accelerometer_noise": [accel, noise, freq],
}

def rank(cols):
    return Matrix.hstack(*[Matrix(c) for c in cols]).rank() if cols else 0

def tier(c):
    """DESIGN.md, "Rules for the groups": the tier of a dimension in the choice of repeating
    variables (lower first)."""
    if c == length:
        return 0
    if c in (velocity, freq, accel):
        return 1
    if c == density:
        return 2
    if c in (one, sigma, mu, nu, beta):
        return 4
    return 3

def basis(cols):
    n = len(cols)
    key = lambda j: (tier(cols[j]), sum(1 for e in cols[j] if e != 0), sum(abs(e) for e in cols[j]), j)
    rep = []
    for j in sorted(range(1, n), key=key):
        if rank([cols[i] for i in rep] + [cols[j]]) > len(rep):
            rep.append(j)
    if rank([cols[i] for i in rep] + [cols[0]]) > len(rep):
        rep.append(0)
    A = Matrix.hstack(*[Matrix(cols[i]) for i in rep]) if rep else None
    groups = []
    for j in range(n):
        if j in rep:
            continue
        if A is None:  # every variable is dimensionless
            x = []
        else:
            # A x = -col_j, exact (A has full column rank)
            x = (A.T * A).inv() * A.T * (-Matrix(cols[j]))
            assert A * x == -Matrix(cols[j])
        v = [Rational(0)] * n
        v[j] = Rational(1)
        for i, r in enumerate(rep):
            v[r] = x[i]
        l = reduce(ilcm, [e.q for e in v], 1)
        ints = [int(e * l) for e in v]
        g = reduce(gcd, ints)
        groups.append([e // g for e in ints])
    return rep, groups

if __name__ == "__main__":
    for name, cols in problems.items():
        rep, groups = basis(cols)
        print(f"{name}: rank {len(rep)}, repeating {rep}, groups {groups}")
