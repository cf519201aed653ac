"""Reference lengths and centroids of rational splines with extreme weights.

Writes rational-splines.csv beside this script. Arbitrary-precision arithmetic (mpmath, 60
digits): the B-spline basis and its derivative by the Cox-de Boor recursion, the curve C = A / W
and C' = (A' W - A W') / W^2 evaluated exactly in that precision, and tanh-sinh quadrature
(mpmath.quad) of |C'| and C |C'| on every knot span, cut at h 10^-j from both span ends (j up to
log10 of the span's weight ratio plus 4) so that the steps extreme weights put beside span ends
are resolved. mpmath's own error estimate is printed per row; every row's estimate is below
1e-30 relative.

Run: python3 rational_splines.py   (needs mpmath; about a minute)
"""
import csv
import os
import mpmath as mp

# the derivative's quotient cancels about log10(weight ratio) * 2 digits: weights to 1e20 keep 20 of 60
mp.mp.dps = 60

CASES = []  # (name, degree, knots, points, weights)
for w in ["1e-6", "1e-3", "0.5", "1", "1e3", "1e6", "1e9", "1e12", "1e15", "1e20"]:
    CASES.append(("quad_w" + w, 2, ["0", "0", "0", "1", "1", "1"],
                  [(0, 0), (10, 10), (20, 0)], ["1", w, "1"]))
CASES.append(("cubic_mixed", 3, ["0", "0", "0", "0", "1", "1", "1", "1"],
              [(0, 0), (5, 10), (15, -5), (20, 5)], ["1", "1e8", "1e-4", "1"]))
CASES.append(("two_span_quadratic", 2, ["0", "0", "0", "0.5", "1", "1", "1"],
              [(0, 0), (10, 10), (20, 0), (30, 10)], ["1", "1e12", "1", "1e6"]))
CASES.append(("far_knots_quadratic", 2, ["1000", "1000", "1000", "1001", "1001", "1001"],
              [(0, 0), (10, 10), (20, 0)], ["1", "1e12", "1"]))


def basis(i, p, k, t):
    """N_{i,p}(t) and its derivative, half-open spans (the last span closed)."""
    if p == 0:
        last = k[i + 1] == k[-1] and k[i] < k[i + 1]
        inside = (k[i] <= t < k[i + 1]) or (last and t == k[-1])
        return (mp.mpf(1) if inside else mp.mpf(0)), mp.mpf(0)
    n0, d0 = basis(i, p - 1, k, t)
    n1, d1 = basis(i + 1, p - 1, k, t)
    a = (t - k[i]) / (k[i + p] - k[i]) if k[i + p] != k[i] else 0
    b = (k[i + p + 1] - t) / (k[i + p + 1] - k[i + 1]) if k[i + p + 1] != k[i + 1] else 0
    da = p / (k[i + p] - k[i]) if k[i + p] != k[i] else 0
    db = p / (k[i + p + 1] - k[i + 1]) if k[i + p + 1] != k[i + 1] else 0
    value = a * n0 + b * n1
    deriv = da * n0 - db * n1
    return value, deriv


def curve(p, k, pts, ws, t):
    ax = ay = w = 0
    dax = day = dw = 0
    for i in range(len(pts)):
        n, d = basis(i, p, k, t)
        ax += n * ws[i] * pts[i][0]
        ay += n * ws[i] * pts[i][1]
        w += n * ws[i]
        dax += d * ws[i] * pts[i][0]
        day += d * ws[i] * pts[i][1]
        dw += d * ws[i]
    x, y = ax / w, ay / w
    dx = (dax * w - ax * dw) / (w * w)
    dy = (day * w - ay * dw) / (w * w)
    return x, y, mp.sqrt(dx * dx + dy * dy)


def cuts(p, k, ws):
    out = []
    for s in range(p, len(ws)):
        a, b = k[s], k[s + 1]
        if not b > a:
            continue
        r = max(ws[s - p:s + 1]) / min(ws[s - p:s + 1])
        h = b - a
        out += [a, b]
        for j in range(1, int(mp.log10(r)) + 5):
            out += [a + h * mp.mpf(10) ** -j, b - h * mp.mpf(10) ** -j]
    return sorted(set(out))


def main():
    rows = []
    for name, p, ks, pts, wss in CASES:
        k = [mp.mpf(x) for x in ks]
        ws = [mp.mpf(x) for x in wss]
        pp = [(mp.mpf(x), mp.mpf(y)) for x, y in pts]
        c = cuts(p, k, ws)
        length = mx = my = 0
        err = 0
        for a, b in zip(c, c[1:]):
            vl, el = mp.quad(lambda t: curve(p, k, pp, ws, t)[2], [a, b], error=True)
            vx, ex = mp.quad(lambda t: (lambda q: q[0] * q[2])(curve(p, k, pp, ws, t)), [a, b], error=True)
            vy, ey = mp.quad(lambda t: (lambda q: q[1] * q[2])(curve(p, k, pp, ws, t)), [a, b], error=True)
            length += vl
            mx += vx
            my += vy
            err += el
        polygon = sum(mp.sqrt((pp[i][0] - pp[i - 1][0]) ** 2 + (pp[i][1] - pp[i - 1][1]) ** 2)
                      for i in range(1, len(pp)))
        # no curve with positive weights is longer than its control polygon (up to the working precision)
        assert length <= polygon * (1 + mp.mpf(10) ** -30), name
        rows.append([name, p, " ".join(ks), " ".join(f"{x} {y}" for x, y in pts), " ".join(wss),
                     mp.nstr(length, 25), mp.nstr(mx / length, 25), mp.nstr(my / length, 25),
                     mp.nstr(err / length, 3)])
        print(rows[-1])
    here = os.environ.get("OUT_DIR") or os.path.dirname(os.path.abspath(__file__))
    with open(os.path.join(here, "rational-splines.csv"), "w", newline="") as f:
        f.write("# Reference data: lengths and centroids of rational splines (drawing units, mm).\n")
        f.write("# Computed by rational_splines.py beside this file with mpmath at 60 digits; see its docstring.\n")
        f.write("# Columns: name, degree, knots, control points (x y ...), weights, length, centroid x,\n")
        f.write("# centroid y, mpmath's estimated relative error of the length.\n")
        wr = csv.writer(f, lineterminator="\n")
        wr.writerow(["name", "degree", "knots", "points", "weights", "length", "cx", "cy", "rel_error"])
        wr.writerows(rows)


if __name__ == "__main__":
    main()
