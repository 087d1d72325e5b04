#!/usr/bin/env python3
"""Internal loads of one bar at one step, by symbolic integration (sympy).

Input (JSON file named on the command line): the bar's first end A, unit
vector e, length L; the body's centre G, its acceleration a_G, rate omega and
angular acceleration alpha; gravity g; the mass spread along the bar (mass,
stations from..to, offset d along n, rotary inertia J about the slices' own
centres); point masses; the concentrated loads (point, force, couple) other
than weight; and the stations x.

Method, independent of the solver's closed forms: each mass element
dm = mu ds at P(s) = A + s e + d n carries dm (g - a(P)), with the rigid-body
acceleration a(P) = a_G + alpha (P - G)^perp - omega^2 (P - G), and the couple
-(J/l) alpha ds. The near part (stations up to x) is cut free; the far part
acts on it with N e - V n and couple M, so by d'Alembert
  N = -F.e,  V = F.n,  M = -(moment of the near part's loads about the cut),
with F the sum of the near part's loads. sympy integrates exactly (the
inputs are turned into exact rationals first).
Output: {"sympy": version, "stations": [[x, N, V, M], ...]}.
"""
import json
import sys

import sympy as sp


def R(v):
    return sp.Rational(v)


def vec(v):
    return sp.Matrix([R(v[0]), R(v[1])])


def perp(v):
    return sp.Matrix([-v[1], v[0]])


def cross(a, b):
    return a[0] * b[1] - a[1] * b[0]


def main():
    data = json.load(open(sys.argv[1]))
    A, e, L = vec(data["a"]), vec(data["e"]), R(data["length"])
    n = perp(e)
    G, aG = vec(data["g_centre"]), vec(data["a_centre"])
    w, al = R(data["omega"]), R(data["alpha"])
    grav = vec(data["gravity"])
    sp_ = data["spread"]
    m, lo, hi, d, J = (R(sp_[k]) for k in ("mass", "from", "to", "offset", "rotary"))

    def accel(P):
        return aG + al * perp(P - G) - w**2 * (P - G)

    # Concentrated loads moved to the foot of their point (clamped to the ends).
    loads = []

    def add(P, F, C):
        s = min(max((P - A).dot(e), 0), L)
        if abs(s) < sp.Rational(1, 10**9) * L:
            s = 0
        if abs(s - L) < sp.Rational(1, 10**9) * L:
            s = L
        loads.append((s, P, F, C))

    for it in data["items"]:
        add(vec(it["at"]), vec(it["force"]), R(it["couple"]))
    for pm in data["point_masses"]:
        P = vec(pm["at"])
        add(P, R(pm["mass"]) * (grav - accel(P)), 0)
    s = sp.Symbol("s", real=True)
    if hi <= lo and m > 0:
        P = A + lo * e + d * n
        add(P, m * (grav - accel(P)), -J * al)

    rows = []
    for xv in data["stations"]:
        x = R(xv)
        last = x == L
        X = A + x * e
        F = sp.zeros(2, 1)
        Mx = 0
        for (si, P, Fi, Ci) in loads:
            if (si < L) if last else (si <= x):
                F += Fi
                Mx += Ci + cross(P - X, Fi)
        if hi > lo:
            mu = m / (hi - lo)
            P = A + s * e + d * n
            q = mu * (grav - accel(P))
            top = min(x, hi)
            if top > lo:
                F += q.integrate((s, lo, top))
                Mx += sp.integrate(cross(P - X, q) - J / (hi - lo) * al, (s, lo, top))
        rows.append([float(x), float(-F.dot(e)), float(F.dot(n)), float(-Mx)])
    print(json.dumps({"sympy": sp.__version__, "stations": rows}))


if __name__ == "__main__":
    main()
