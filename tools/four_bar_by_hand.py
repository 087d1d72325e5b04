#!/usr/bin/env python3
"""A four-bar's pin forces and drive torque over one crank turn, worked the
way a designer does it by hand, in plain Python (no libraries): loop-closure
kinematics in closed form, then the free-body diagram of each body,

    ΣFx = m·aGx,  ΣFy = m·aGy,  ΣM_G = I_G·α,

with equal and opposite forces at every pin, solved together for the four
pin forces and the crank torque (nine equations, Gaussian elimination).

It serves two ends: a check of Clevis made outside it (a test compares every
step with `clevis-cli analyze --json`), and the yardstick for how much faster
the whole `clevis-cli` process is than a script a designer could write
(README, "Speed and limits").

    python3 tools/four_bar_by_hand.py               peak forces and torque
    python3 tools/four_bar_by_hand.py --steps       every step, as JSON
    python3 tools/four_bar_by_hand.py --mechanism   the same four-bar as a Clevis file

Sign conventions as in Clevis's results: a pin's force is the one its first
body exerts on its second, in global axes; the drive torque is the couple the
driver applies to the crank, counter-clockwise positive.
"""
import json
import math
import sys

# A crank-rocker of our own: pivots O and Q on the frame, crank OA, coupler AB,
# rocker QB; each body a bar with its centre of mass at mid-length.
O = (0.0, 0.0)
Q = (0.20, 0.0)
CRANK, COUPLER, ROCKER = 0.05, 0.18, 0.12  # m
MASS = {"crank": 0.30, "coupler": 0.80, "rocker": 0.60}  # kg
LENGTH = {"crank": CRANK, "coupler": COUPLER, "rocker": ROCKER}
START_DEG = 60.0  # the crank's angle at the drawn pose
RPM = 120.0
STEPS = 360
GRAVITY = 9.81  # m/s², downwards (written into the file, which would otherwise take 9.80665)
ROCKER_TORQUE = -2.0  # N·m, a constant couple on the rocker (the work it does)


def inertia(body):
    """A slender bar about its centre: m·L²/12."""
    return MASS[body] * LENGTH[body] ** 2 / 12.0


def pose(theta):
    """A and B for crank angle theta, B on the branch above the line AQ."""
    ax, ay = O[0] + CRANK * math.cos(theta), O[1] + CRANK * math.sin(theta)
    dx, dy = Q[0] - ax, Q[1] - ay
    d = math.hypot(dx, dy)
    along = (COUPLER ** 2 - ROCKER ** 2 + d * d) / (2 * d)
    h = math.sqrt(COUPLER ** 2 - along ** 2)
    mx, my = ax + along * dx / d, ay + along * dy / d
    return (ax, ay), (mx - h * dy / d, my + h * dx / d)


def solve(a, b):
    """a·x = b by Gaussian elimination with partial pivoting (a, b copied)."""
    n = len(b)
    m = [row[:] + [b[i]] for i, row in enumerate(a)]
    for c in range(n):
        p = max(range(c, n), key=lambda r: abs(m[r][c]))
        m[c], m[p] = m[p], m[c]
        for r in range(c + 1, n):
            f = m[r][c] / m[c][c]
            if f:
                for k in range(c, n + 1):
                    m[r][k] -= f * m[c][k]
    x = [0.0] * n
    for r in range(n - 1, -1, -1):
        x[r] = (m[r][n] - sum(m[r][k] * x[k] for k in range(r + 1, n))) / m[r][r]
    return x


def cross(r, f):
    return r[0] * f[1] - r[1] * f[0]


def step(t):
    w2 = RPM * 2 * math.pi / 60
    theta = math.radians(START_DEG) + w2 * t
    A, B = pose(theta)
    rOA = (A[0] - O[0], A[1] - O[1])
    rAB = (B[0] - A[0], B[1] - A[1])
    rQB = (B[0] - Q[0], B[1] - Q[1])
    # Velocities: vA + ω3 k×rAB = ω4 k×rQB.
    vA = (-w2 * rOA[1], w2 * rOA[0])
    w3, w4 = solve([[-rAB[1], rQB[1]], [rAB[0], -rQB[0]]], [-vA[0], -vA[1]])
    # Accelerations (constant crank speed): aA + α3 k×rAB − ω3² rAB = α4 k×rQB − ω4² rQB.
    aA = (-w2 * w2 * rOA[0], -w2 * w2 * rOA[1])
    rhs = [-aA[0] + w3 * w3 * rAB[0] - w4 * w4 * rQB[0], -aA[1] + w3 * w3 * rAB[1] - w4 * w4 * rQB[1]]
    a3, a4 = solve([[-rAB[1], rQB[1]], [rAB[0], -rQB[0]]], rhs)
    # Centres of mass at mid-length, and their accelerations.
    G2 = ((O[0] + A[0]) / 2, (O[1] + A[1]) / 2)
    G3 = ((A[0] + B[0]) / 2, (A[1] + B[1]) / 2)
    G4 = ((Q[0] + B[0]) / 2, (Q[1] + B[1]) / 2)
    aG2 = (aA[0] / 2, aA[1] / 2)
    aG3 = (aA[0] + (-a3 * rAB[1] - w3 * w3 * rAB[0]) / 2, aA[1] + (a3 * rAB[0] - w3 * w3 * rAB[1]) / 2)
    aG4 = ((-a4 * rQB[1] - w4 * w4 * rQB[0]) / 2, (a4 * rQB[0] - w4 * w4 * rQB[1]) / 2)
    m2, m3, m4 = MASS["crank"], MASS["coupler"], MASS["rocker"]
    # Unknowns: FO (ground on crank), FA (crank on coupler), FB (coupler on
    # rocker), FQ (ground on rocker), each x then y, and T (driver on crank).
    rows, rhs = [], []

    def equation(coefficients, value):
        row = [0.0] * 9
        for index, c in coefficients:
            row[index] += c
        rows.append(row)
        rhs.append(value)

    def moment(index, r, sign):
        """The moment about a centre of sign·F applied at r (from the centre)."""
        return [(index, -sign * r[1]), (index + 1, sign * r[0])]

    rel = lambda p, g: (p[0] - g[0], p[1] - g[1])
    # Crank: FO − FA + m2·g = m2·aG2; ΣM_G2 = 0 (constant speed).
    equation([(0, 1), (2, -1)], m2 * aG2[0])
    equation([(1, 1), (3, -1)], m2 * aG2[1] + m2 * GRAVITY)
    equation(moment(0, rel(O, G2), 1) + moment(2, rel(A, G2), -1) + [(8, 1)], 0.0)
    # Coupler: FA − FB + m3·g = m3·aG3; ΣM_G3 = I3·α3.
    equation([(2, 1), (4, -1)], m3 * aG3[0])
    equation([(3, 1), (5, -1)], m3 * aG3[1] + m3 * GRAVITY)
    equation(moment(2, rel(A, G3), 1) + moment(4, rel(B, G3), -1), inertia("coupler") * a3)
    # Rocker: FB + FQ + m4·g = m4·aG4; ΣM_G4 + the applied couple = I4·α4.
    equation([(4, 1), (6, 1)], m4 * aG4[0])
    equation([(5, 1), (7, 1)], m4 * aG4[1] + m4 * GRAVITY)
    equation(moment(4, rel(B, G4), 1) + moment(6, rel(Q, G4), 1), inertia("rocker") * a4 - ROCKER_TORQUE)
    x = solve(rows, rhs)
    return {"t": t, "O": x[0:2], "A": x[2:4], "B": x[4:6], "Q": x[6:8], "motor": x[8]}


def mechanism():
    """The four-bar as a Clevis file: bodies given by mass, centre and inertia."""
    A, B = pose(math.radians(START_DEG))
    mid = lambda p, q: [(p[0] + q[0]) / 2, (p[1] + q[1]) / 2]
    centres = {"crank": mid(O, A), "coupler": mid(A, B), "rocker": mid(Q, B)}
    return {
        "clevis": 1,
        "name": "four-bar worked by hand",
        "bodies": [{"name": n, "mass": MASS[n], "cg": centres[n], "inertia": inertia(n)} for n in MASS],
        "joints": [
            {"name": "O", "type": "pin", "bodies": ["ground", "crank"], "at": list(O)},
            {"name": "A", "type": "pin", "bodies": ["crank", "coupler"], "at": list(A)},
            {"name": "B", "type": "pin", "bodies": ["coupler", "rocker"], "at": list(B)},
            {"name": "Q", "type": "pin", "bodies": ["ground", "rocker"], "at": list(Q)},
        ],
        "drivers": [{"name": "motor", "type": "rotary", "joint": "O", "speed_rpm": RPM, "angle_deg": START_DEG}],
        "gravity": [0.0, -GRAVITY],
        "cycle": {"steps": STEPS},
        "loads": [{"type": "torque", "name": "work", "body": "rocker", "torque": ROCKER_TORQUE}],
    }


def main():
    if "--mechanism" in sys.argv:
        print(json.dumps(mechanism(), indent=2))
        return
    period = 60.0 / RPM
    steps = [step(period * k / STEPS) for k in range(STEPS + 1)]
    if "--steps" in sys.argv:
        print(json.dumps(steps))
        return
    for joint in ("O", "A", "B", "Q"):
        peak = max(steps, key=lambda s: math.hypot(*s[joint]))
        print("%s  peak |F| %.4g N at t = %.4f s" % (joint, math.hypot(*peak[joint]), peak["t"]))
    peak = max(steps, key=lambda s: abs(s["motor"]))
    print("motor  peak torque %.4g N·m at t = %.4f s" % (peak["motor"], peak["t"]))


if __name__ == "__main__":
    main()
