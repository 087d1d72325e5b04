"""The steady cycle of a motor-driven slider-crank with a flywheel, by scipy.

The one-degree-of-freedom equation of motion is written here from the
closed-form kinematics of the in-line slider-crank (crank r, rod l, crank
angle θ): A = r(cos θ, sin θ), B = (r cos θ + sqrt(l² − r² sin² θ), 0), the
rod's angle φ = atan2(−r sin θ, x_B − r cos θ). With the kinetic energy
½·J(θ)·θ̇² (J from sympy's derivatives of the centres of mass and of φ), a
constant force F along x on the piston and a damper c on the piston's
x-velocity, Lagrange's equation for a motor T_e = T_s(1 − ω_m/ω₀) at
ω_m = i·θ̇ through a lossless gearbox (rotor J_m at the motor shaft) with a
flywheel J_f on the crank reads

  (J + J_f + J_m·i²)·θ̈ + ½·J'·θ̇² = F·x_B' − c·x_B'²·θ̇ + i·T_e.

It is integrated in time by solve_ivp (DOP853, rtol = atol = 1e-12) for many
turns from the start speed; on the last whole turn the script reports the
speed at N evenly spaced crank angles (from the dense output), the period
and the coefficient of speed fluctuation (ω_max − ω_min)/ω_mean, ω_mean being
one turn over the period.
"""
import json
import math
import sys

import numpy as np
import sympy as sp
from scipy.integrate import solve_ivp
from scipy.optimize import brentq

p = json.load(open(sys.argv[1]))
r, l, th0 = p["r"], p["l"], p["theta0"]
m1, I1, m2, I2, m3 = p["m1"], p["I1"], p["m2"], p["I2"], p["m3"]

th = sp.symbols("theta")
ax, ay = r * sp.cos(th), r * sp.sin(th)
xb = ax + sp.sqrt(l**2 - ay**2)
phi = sp.atan2(-ay, xb - ax)
g1 = (ax / 2, ay / 2)
g2 = ((ax + xb) / 2, ay / 2)
d = lambda e: sp.diff(e, th)
J = (m1 * (d(g1[0]) ** 2 + d(g1[1]) ** 2) + I1 + m2 * (d(g2[0]) ** 2 + d(g2[1]) ** 2) + I2 * d(phi) ** 2
     + m3 * d(xb) ** 2)
J_f = sp.lambdify(th, J, "math")
dJ_f = sp.lambdify(th, d(J), "math")
xb1_f = sp.lambdify(th, d(xb), "math")

i, Ts, w0 = p["ratio"], p["stall_torque"], p["no_load"]
extra = p["flywheel"] + p["motor_inertia"] * i * i
F, c = p["force"], p["damping"]


def rhs(t, y):
    theta, w = y
    x1 = xb1_f(theta)
    torque = Ts * (1.0 - i * w / w0)
    acc = (F * x1 - c * x1 * x1 * w + i * torque - 0.5 * dJ_f(theta) * w * w) / (J_f(theta) + extra)
    return [w, acc]


turns = p["turns"]
w_start = p["start_speed"]
horizon = 1.5 * turns * 2 * math.pi / min(w_start, w0 / i * 0.3)


def done(t, y):
    return y[0] - th0 - 2 * math.pi * (turns + 1)


done.terminal = True
sol = solve_ivp(rhs, (0.0, horizon), [th0, w_start], method="DOP853", rtol=1e-12, atol=1e-12, dense_output=True,
                events=done)
assert sol.status == 1, "did not reach the turns asked for"


def time_at(angle, lo, hi):
    return brentq(lambda t: sol.sol(t)[0] - angle, lo, hi, xtol=1e-15, rtol=1e-15)


t_end = sol.t_events[0][0]
t_a = time_at(th0 + 2 * math.pi * turns, 0.0, t_end)
n = p["steps"]
speeds, times = [], []
lo = t_a
for k in range(n + 1):
    angle = th0 + 2 * math.pi * (turns + k / n)
    t = t_a if k == 0 else time_at(angle, lo, t_end)
    speeds.append(float(sol.sol(t)[1]))
    times.append(t - t_a)
    lo = t
period = times[-1]
fine = sol.sol(np.linspace(t_a, t_a + period, 200001))[1]
mean = 2 * math.pi / period
print(json.dumps({"speeds": speeds, "times": times, "period": period,
                  "fluctuation": float((fine.max() - fine.min()) / mean),
                  "start_mismatch": abs(speeds[-1] - speeds[0]) / speeds[0]}))
