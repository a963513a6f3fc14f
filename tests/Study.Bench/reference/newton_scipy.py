#!/usr/bin/env python3
"""An independent Newton-Raphson load flow in numpy/scipy, the yardstick for Study's speed.

It reads the network file `study generate` writes (lines and banks in system per unit, pv and slack
generators, constant-power loads), builds the bus admittance matrix with scipy.sparse, and solves the
polar power-flow equations with scipy's sparse direct solver (SuperLU) on the full Jacobian, the
textbook method (e.g. Grainger and Stevenson, Power System Analysis, ch. 9). The Common Format's
four-column bus numbers cannot hold 10,000 buses, so the network is read from the same JSON file the
program reads.

    python3 newton_scipy.py FILE [--outages K]

prints one JSON object: stage times in seconds (read, build, solve from flat start), iterations, the
largest mismatch, and with --outages K the mean time of K warm-started solves, each with one line out.
"""
import json
import sys
import time

import numpy as np
import scipy.sparse as sp
import scipy.sparse.linalg as spla


def read(path):
    with open(path, encoding="utf-8") as f:
        return json.load(f)


def build(net):
    base = net["baseMva"]
    index = {b["id"]: i for i, b in enumerate(net["buses"])}
    n = len(index)
    branches = []  # (from, to, z, b, ratio)
    for line in net.get("lines", []):
        z = line["z1"]
        branches.append((index[line["from"]], index[line["to"]], complex(z["r"], z["x"]), z.get("b", 0.0), 1.0))
    for t in net.get("transformers", []):
        branches.append((index[t["hv"]], index[t["lv"]], complex(t["rPu"], t["xPu"]), t.get("bPu", 0.0), t.get("ratio", 1.0)))
    f = np.array([b[0] for b in branches])
    t = np.array([b[1] for b in branches])
    ys = 1 / np.array([b[2] for b in branches])
    bc = np.array([b[3] for b in branches])
    tap = np.array([b[4] for b in branches])
    # pi model with the off-nominal ratio at the from end
    yff = (ys + 0.5j * bc) / tap**2
    yft = -ys / tap
    ytt = ys + 0.5j * bc
    rows = np.concatenate([f, f, t, t])
    cols = np.concatenate([f, t, f, t])
    vals = np.concatenate([yff, yft, yft, ytt])
    ybus = sp.csr_matrix((vals, (rows, cols)), shape=(n, n))

    p = np.zeros(n)
    q = np.zeros(n)
    vset = np.ones(n)
    kind = np.zeros(n, dtype=int)  # 0 pq, 1 pv, 2 slack
    for g in net.get("generators", []):
        i = index[g["bus"]]
        p[i] += g.get("pMw", 0.0) / base
        kind[i] = max(kind[i], 2 if g["mode"] == "slack" else 1)
        vset[i] = g["vSet"]
    for load in net.get("loads", []):
        i = index[load["bus"]]
        p[i] -= load["pMw"] / base
        q[i] -= load["qMvar"] / base
    return ybus, p, q, vset, kind, (f, t, yff, yft, ytt)


def solve(ybus, p, q, vset, kind, v0=None, tol=1e-8, max_it=30):
    n = ybus.shape[0]
    pv = np.flatnonzero(kind == 1)
    pq = np.flatnonzero(kind == 0)
    pvpq = np.concatenate([pv, pq])
    if v0 is None:
        vm = np.where(kind > 0, vset, 1.0)
        va = np.zeros(n)
    else:
        vm, va = np.abs(v0), np.angle(v0)
    v = vm * np.exp(1j * va)
    s = p + 1j * q
    for it in range(max_it + 1):
        mis = v * np.conj(ybus @ v) - s
        f = np.concatenate([mis.real[pvpq], mis.imag[pq]])
        worst = np.max(np.abs(f)) if f.size else 0.0
        if not np.isfinite(worst):
            break
        if worst < tol:
            return v, it, worst
        if it == max_it:
            break
        # dS/dVa and dS/dVm in polar form
        ibus = ybus @ v
        diag_v = sp.diags(v)
        diag_i = sp.diags(ibus)
        diag_vn = sp.diags(v / np.abs(v))
        ds_dva = 1j * diag_v @ np.conj(diag_i - ybus @ diag_v)
        ds_dvm = diag_v @ np.conj(ybus @ diag_vn) + np.conj(diag_i) @ diag_vn
        j11 = ds_dva[pvpq][:, pvpq].real
        j12 = ds_dvm[pvpq][:, pq].real
        j21 = ds_dva[pq][:, pvpq].imag
        j22 = ds_dvm[pq][:, pq].imag
        jac = sp.bmat([[j11, j12], [j21, j22]], format="csc")
        dx = spla.spsolve(jac, -f)
        va = np.angle(v)
        vm = np.abs(v)
        va[pvpq] += dx[: pvpq.size]
        vm[pq] += dx[pvpq.size:]
        v = vm * np.exp(1j * va)
    raise SystemExit(f"no convergence, largest mismatch {worst:.3e} pu")


def main():
    path = sys.argv[1]
    outages = int(sys.argv[sys.argv.index("--outages") + 1]) if "--outages" in sys.argv else 0
    t0 = time.perf_counter()
    net = read(path)
    t1 = time.perf_counter()
    ybus, p, q, vset, kind, (f, t, yff, yft, ytt) = build(net)
    t2 = time.perf_counter()
    v, iterations, worst = solve(ybus, p, q, vset, kind)
    t3 = time.perf_counter()
    result = {"buses": ybus.shape[0], "readS": t1 - t0, "buildS": t2 - t1, "solveS": t3 - t2,
              "iterations": iterations, "mismatchPu": worst}
    if outages:
        # The first K lines, each out alone: its admittance taken from the matrix, solved warm from the intact
        # state. An outage that islands part of the network (a singular Jacobian) is not timed.
        import warnings
        warnings.simplefilter("ignore")
        lines = len(net.get("lines", []))
        taken, spent, islanded = 0, 0.0, 0
        for k in range(min(outages, lines)):
            n = ybus.shape[0]
            change = sp.csr_matrix((-np.array([yff[k], yft[k], yft[k], ytt[k]]),
                                    ([f[k], f[k], t[k], t[k]], [f[k], t[k], f[k], t[k]])), shape=(n, n))
            start = time.perf_counter()
            try:
                solve(ybus + change, p, q, vset, kind, v0=v)
            except SystemExit:
                islanded += 1
                continue
            spent += time.perf_counter() - start
            taken += 1
        result["outages"] = taken
        result["notTimed"] = islanded
        result["perOutageS"] = spent / max(taken, 1)
    print(json.dumps(result))


if __name__ == "__main__":
    main()
