"""Independent hand-method solution of a loaded four-bar with python3-sympy.

Reads a JSON description (drawn pin positions, mass properties, gravity, the
crank's motion, a point force on the coupler, a torque on the rocker and the
times wanted) and prints, for each time, the link rotations and their rates,
the four pin reactions and the crank torque as JSON on stdout.

Nothing here comes from the C++ solver: the loop closure is solved with
nsolve, velocities and accelerations by differentiating it in time, and the
forces from the free-body diagram of each link (three Newton-Euler equations
per link, equal and opposite pin forces): nine linear equations in the four
pins' two force components and the crank torque.

Conventions, the same as the program's: angles counter-clockwise, link
rotations measured from the drawn pose, a pin's reaction is the force its
first-listed body exerts on its second (O2: ground on crank, A: crank on
coupler, B: coupler on rocker, O4: ground on rocker), the torque is the
motor's on the crank.
"""

import json
import sys

import sympy as sp

DIGITS = 30


def number(x):
    return sp.Float(x, DIGITS)


def vector(xy):
    return sp.Matrix([number(xy[0]), number(xy[1])])


def rotation(phi):
    return sp.Matrix([[sp.cos(phi), -sp.sin(phi)], [sp.sin(phi), sp.cos(phi)]])


def cross(a, b):
    return a[0] * b[1] - a[1] * b[0]


def solve(spec):
    t = sp.Symbol("t", real=True)
    phi3, phi4 = sp.Function("phi3")(t), sp.Function("phi4")(t)
    phi2 = number(spec["crank"]["speed"]) * t + number(spec["crank"]["accel"]) * t**2 / 2

    pins = {name: vector(xy) for name, xy in spec["pins"].items()}
    o2, a0, b0, o4 = pins["O2"], pins["A"], pins["B"], pins["O4"]
    crank, coupler, rocker = spec["bodies"]

    # Positions at time t, each link turned about a pin from the drawn pose.
    a = o2 + rotation(phi2) * (a0 - o2)
    b_by_coupler = a + rotation(phi3) * (b0 - a0)
    b_by_rocker = o4 + rotation(phi4) * (b0 - o4)
    loop = b_by_coupler - b_by_rocker

    g2 = o2 + rotation(phi2) * (vector(crank["cg"]) - o2)
    g3 = a + rotation(phi3) * (vector(coupler["cg"]) - a0)
    g4 = o4 + rotation(phi4) * (vector(rocker["cg"]) - o4)
    p = a + rotation(phi3) * (vector(spec["force"]["at"]) - a0)

    x3, x4, v3, v4, w3, w4 = sp.symbols("x3 x4 v3 v4 w3 w4", real=True)

    def at_state(expr, tk, state):
        """Replace φ3, φ4 and their derivatives by numbers, then t."""
        expr = expr.subs({phi3.diff(t, 2): state[4], phi4.diff(t, 2): state[5]})
        expr = expr.subs({phi3.diff(t): state[2], phi4.diff(t): state[3]})
        expr = expr.subs({phi3: state[0], phi4: state[1]})
        return expr.subs(t, tk).evalf(DIGITS)

    loop_d1 = loop.diff(t)
    loop_d2 = loop.diff(t, 2)
    accel = {name: e.diff(t, 2) for name, e in (("g2", g2), ("g3", g3), ("g4", g4))}

    # Follow the drawn branch: march from the drawn pose in small steps of
    # time, each position solve starting from the last.
    loop_at_pose = [e.subs({phi3: x3, phi4: x4}) for e in loop]
    times = [number(x) for x in spec["times"]]
    march = int(spec.get("march_steps", 200))
    end = max(times)
    guess = [number(0), number(0)]
    t_now = number(0)
    results = []
    targets = sorted(set(times))
    for tk in targets:
        while True:
            step = min(end / march, tk - t_now)
            t_next = t_now + step if step > 0 else tk
            equations = [e.subs(t, t_next) for e in loop_at_pose]
            root = sp.nsolve(equations, [x3, x4], guess, prec=DIGITS)
            guess = [root[0], root[1]]
            t_now = t_next
            if t_now >= tk:
                break
        pos = [guess[0], guess[1], 0, 0, 0, 0]
        residual = max(abs(at_state(e, tk, pos)) for e in loop)
        if residual > 1e-20:
            raise RuntimeError(f"loop closure not met at t = {tk}: {residual}")

        # Velocities: d/dt of the loop closure is linear in φ̇3, φ̇4.
        rate_eqs = [at_state(e, tk, [pos[0], pos[1], v3, v4, 0, 0]) for e in loop_d1]
        rates = sp.solve(rate_eqs, [v3, v4], dict=True)[0]
        # Accelerations: d²/dt² of the loop closure is linear in φ̈3, φ̈4.
        state = [pos[0], pos[1], rates[v3], rates[v4], w3, w4]
        acc_eqs = [at_state(e, tk, state) for e in loop_d2]
        accs = sp.solve(acc_eqs, [w3, w4], dict=True)[0]
        state = [pos[0], pos[1], rates[v3], rates[v4], accs[w3], accs[w4]]

        def now(expr):
            return at_state(expr, tk, state)

        A, B = now(a), now(b_by_rocker)
        G2, G3, G4, P = now(g2), now(g3), now(g4), now(p)
        aG2, aG3, aG4 = now(accel["g2"]), now(accel["g3"]), now(accel["g4"])
        alpha2 = number(spec["crank"]["accel"])
        alpha3, alpha4 = state[4], state[5]

        # Unknowns: pin forces (first body on second) and the crank torque.
        fo2 = sp.Matrix(sp.symbols("fo2x fo2y"))
        fa = sp.Matrix(sp.symbols("fax fay"))
        fb = sp.Matrix(sp.symbols("fbx fby"))
        fo4 = sp.Matrix(sp.symbols("fo4x fo4y"))
        torque = sp.Symbol("T")
        gravity = vector(spec["gravity"])
        load = vector(spec["force"]["force"])
        m2, m3, m4 = (number(body["mass"]) for body in (crank, coupler, rocker))
        i2, i3, i4 = (number(body["inertia"]) for body in (crank, coupler, rocker))
        tau4 = number(spec["rocker_torque"])

        equations = []
        # Crank: O2 (ground on crank), A (coupler on crank = −F_A), motor torque.
        equations += list(fo2 - fa + m2 * gravity - m2 * aG2)
        equations.append(cross(o2 - G2, fo2) + cross(A - G2, -fa) + torque - i2 * alpha2)
        # Coupler: A (crank on coupler), B (rocker on coupler = −F_B), the load.
        equations += list(fa - fb + m3 * gravity + load - m3 * aG3)
        equations.append(cross(A - G3, fa) + cross(B - G3, -fb) + cross(P - G3, load) - i3 * alpha3)
        # Rocker: B (coupler on rocker), O4 (ground on rocker), the applied torque.
        equations += list(fb + fo4 + m4 * gravity - m4 * aG4)
        equations.append(cross(B - G4, fb) + cross(o4 - G4, fo4) + tau4 - i4 * alpha4)

        unknowns = list(fo2) + list(fa) + list(fb) + list(fo4) + [torque]
        matrix, rhs = sp.linear_eq_to_matrix(equations, unknowns)
        solution = matrix.LUsolve(rhs)
        values = [float(v) for v in solution]
        results.append({
            "t": float(tk),
            "phi": [float(phi2.subs(t, tk)), float(state[0]), float(state[1])],
            "rates": [float(phi2.diff(t).subs(t, tk)), float(state[2]), float(state[3])],
            "reactions": {"O2": values[0:2], "A": values[2:4], "B": values[4:6], "O4": values[6:8]},
            "torque": values[8],
        })
    return results


def main():
    if len(sys.argv) != 2:
        sys.exit("usage: sympy_four_bar.py INPUT.json")
    with open(sys.argv[1], encoding="utf-8") as f:
        spec = json.load(f)
    print(json.dumps({"sympy": sp.__version__, "steps": solve(spec)}))


if __name__ == "__main__":
    main()
