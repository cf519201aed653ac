"""Reference lengths and centroids of random splines, for the fixed Gauss-Legendre rule's bound.

Writes random-splines.csv beside this script. The splines are drawn by Python's own seeded
generator (random.Random(2026)): degrees 1 to 7, 2 to 12 control points, clamped knots with
random interior spacing, plane (z = 0) and space curves, non-rational and rational with weights
from 0.25 to 4; coordinates in millimetres written with six decimals, weights with four, so the
file holds every input exactly as the test reads it. Arithmetic at 32 digits (mpmath): the
B-spline basis and its derivative by the Cox-de Boor recursion (The NURBS Book, A2.2), C = A / W and
C' = (A' W - A W') / W^2, and tanh-sinh quadrature (mpmath.quad) of |C'| and C |C'| on each knot
span split in four. mpmath's own error estimate is written per row; every one is below 1e-25
relative (the script stops otherwise).

Run: python3 random_splines.py   (needs mpmath; a few minutes)
"""
import csv
import math
import os
import random
import mpmath as mp

mp.mp.dps = 32
COUNT = 28


def draw(rng, index):
    degree = 1 + index % 7
    n = degree + 1 + rng.randrange(0, 12 - degree)
    rational = index % 2 == 1
    space = index % 3 == 2
    inner = sorted(round(rng.uniform(0.05, 0.95), 4) for _ in range(n - degree - 1))
    knots = ["0"] * (degree + 1) + [f"{k:.4f}" for k in inner] + ["1"] * (degree + 1)
    pts = []
    x = y = z = 0.0
    heading = rng.uniform(0, 6.283)
    for _ in range(n):
        pts.append((f"{x:.6f}", f"{y:.6f}", f"{z:.6f}" if space else "0"))
        heading += rng.uniform(-1.2, 1.2)
        step = rng.uniform(5, 60)
        x += step * math.cos(heading)
        y += step * math.sin(heading)
        if space:
            z += rng.uniform(-20, 20)
    ws = [f"{rng.uniform(0.25, 4):.4f}" if rational else "1" for _ in range(n)]
    return f"random_{index:02d}_p{degree}{'_rational' if rational else ''}{'_space' if space else ''}", \
        degree, knots, pts, ws


def basis_funs(span, p, k, t):
    """The p + 1 non-zero B-splines N_{span-p..span, p}(t) (The NURBS Book, A2.2)."""
    n = [mp.mpf(1)] + [mp.mpf(0)] * p
    left = [mp.mpf(0)] * (p + 1)
    right = [mp.mpf(0)] * (p + 1)
    for j in range(1, p + 1):
        left[j] = t - k[span + 1 - j]
        right[j] = k[span + j] - t
        saved = mp.mpf(0)
        for r in range(j):
            temp = n[r] / (right[r + 1] + left[j - r])
            n[r] = saved + right[r + 1] * temp
            saved = left[j - r] * temp
        n[j] = saved
    return n


def curve(p, k, pts, ws, t):
    """Point and speed at t: C = A / W, C' = (A' W - A W') / W^2, with
    N'_{i,p} = p N_{i,p-1} / (k[i+p] - k[i]) - p N_{i+1,p-1} / (k[i+p+1] - k[i+1])."""
    span = max(j for j in range(p, len(pts)) if k[j] <= t and k[j] < k[j + 1])
    n = basis_funs(span, p, k, t)
    lower = basis_funs(span, p - 1, k, t) if p > 0 else []
    a = [mp.mpf(0)] * 3
    da = [mp.mpf(0)] * 3
    w = dw = mp.mpf(0)
    for j in range(p + 1):
        i = span - p + j
        # N_{i,p-1} is lower[j - 1] (zero for j = 0), N_{i+1,p-1} is lower[j] (zero for j = p)
        d = mp.mpf(0)
        if j >= 1:
            d += p * lower[j - 1] / (k[i + p] - k[i])
        if j < p:
            d -= p * lower[j] / (k[i + p + 1] - k[i + 1])
        for c in range(3):
            a[c] += n[j] * ws[i] * pts[i][c]
            da[c] += d * ws[i] * pts[i][c]
        w += n[j] * ws[i]
        dw += d * ws[i]
    pos = [a[c] / w for c in range(3)]
    der = [(da[c] * w - a[c] * dw) / (w * w) for c in range(3)]
    return pos, mp.sqrt(sum(x * x for x in der))


def main():
    rng = random.Random(2026)
    rows = []
    for index in range(COUNT):
        name, p, ks, pts, wss = draw(rng, index)
        k = [mp.mpf(x) for x in ks]
        ws = [mp.mpf(x) for x in wss]
        pp = [tuple(mp.mpf(c) for c in q) for q in pts]
        cuts = []
        for s in range(p, len(pp)):
            if k[s + 1] > k[s]:
                h = (k[s + 1] - k[s]) / 4
                cuts += [k[s] + j * h for j in range(5)]
        cuts = sorted(set(cuts))
        length = mp.mpf(0)
        m = [mp.mpf(0)] * 3
        err = mp.mpf(0)
        memo = {}

        def at(t):
            # the four integrals of a range use the same nodes: evaluate the curve once per node
            if t not in memo:
                memo[t] = curve(p, k, pp, ws, t)
            return memo[t]

        for a, b in zip(cuts, cuts[1:]):
            vl, el = mp.quad(lambda t: at(t)[1], [a, b], error=True)
            length += vl
            err += el
            for c in range(3):
                m[c] += mp.quad(lambda t: at(t)[0][c] * at(t)[1], [a, b])
        assert err / length < mp.mpf(10) ** -25, (name, err / length)
        rows.append([name, p, " ".join(ks), " ".join(" ".join(q) for q in pts), " ".join(wss),
                     mp.nstr(length, 25)] + [mp.nstr(m[c] / length, 25) for c in range(3)]
                    + [mp.nstr(err / length, 3)])
        print(rows[-1][0], rows[-1][5], rows[-1][-1], flush=True)
    here = os.environ.get("OUT_DIR") or os.path.dirname(os.path.abspath(__file__))
    with open(os.path.join(here, "random-splines.csv"), "w", newline="") as f:
        f.write("# Reference data: lengths and centroids of random splines (drawing units, mm).\n")
        f.write("# Computed by random_splines.py beside this file with mpmath at 32 digits; see its docstring.\n")
        f.write("# Columns: name, degree, knots, control points (x y z ...), weights, length, centroid x, y, z,\n")
        f.write("# mpmath's estimated relative error of the length.\n")
        wr = csv.writer(f, lineterminator="\n")
        wr.writerow(["name", "degree", "knots", "points", "weights", "length", "cx", "cy", "cz", "rel_error"])
        wr.writerows(rows)


if __name__ == "__main__":
    main()
