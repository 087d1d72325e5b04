"""Exact rank, row dependencies and null space of integer matrices, by sympy
(Debian's python3-sympy): the reference for tests/test_row_dependence.cpp.

Input: {"cases": [{"rows": [[int, ...], ...], "leading": k,
                    "dependent": [{"row": d, "repeats": [i, ...]}, ...]}]}
Output per case: the rank of all rows and of the first k, which columns some
null-space vector moves, and for each claimed dependent row whether it with
its repeats is a circuit (dependent, and independent once any one is left out).
"""
import json
import sys

import sympy


def rank(rows, indices):
    if not indices:
        return 0
    return sympy.Matrix([rows[i] for i in indices]).rank()


def is_circuit(rows, d, repeats):
    whole = [d] + repeats
    if rank(rows, whole) != len(whole) - 1:
        return False
    return all(rank(rows, [i for i in whole if i != left]) == len(whole) - 1 for left in whole)


def check(case):
    rows = case["rows"]
    columns = len(rows[0])
    m = sympy.Matrix(rows)
    reach = [0] * columns
    for v in m.nullspace():
        for c in range(columns):
            if v[c] != 0:
                reach[c] = 1
    return {
        "rank": m.rank(),
        "leading_rank": rank(rows, list(range(case["leading"]))),
        "reach": reach,
        "circuits": [is_circuit(rows, d["row"], d["repeats"]) for d in case["dependent"]],
    }


with open(sys.argv[1]) as f:
    cases = json.load(f)["cases"]
print(json.dumps([check(c) for c in cases]))
