"""The generalised inertia of an in-line slider-crank at its crank,
J(θ) = Σ m |dG/dθ|² + I (dφ/dθ)², from its closed-form geometry, differentiated
by sympy: the kinetic energy ½ J(θ) θ̇² of the whole mechanism written out
from the positions alone (an independent route to Clevis's 2·KE/θ̇²).

Input (JSON file named on the command line): r, l, crank/rod/piston masses,
crank/rod inertias about their centres, and the crank angles θ (rad).
Output: {"J": [...]} in kg·m², one per angle.
"""
import json
import sys

import sympy as sp

p = json.load(open(sys.argv[1]))
th = sp.symbols("theta")
r, l = sp.nsimplify(p["r"]), sp.nsimplify(p["l"])
A = sp.Matrix([r * sp.cos(th), r * sp.sin(th)])
B = sp.Matrix([r * sp.cos(th) + sp.sqrt(l**2 - r**2 * sp.sin(th) ** 2), 0])
crank_cg = A / 2
rod_cg = (A + B) / 2
rod_angle = sp.atan2(B[1] - A[1], B[0] - A[0])


def speed2(point):
    d = point.diff(th)
    return d.dot(d)


J = (
    p["crank_mass"] * speed2(crank_cg)
    + p["crank_inertia"]
    + p["rod_mass"] * speed2(rod_cg)
    + p["rod_inertia"] * sp.diff(rod_angle, th) ** 2
    + p["piston_mass"] * speed2(B)
)
f = sp.lambdify(th, J, "math")
print(json.dumps({"J": [float(f(t)) for t in p["theta"]]}))
