"""Reference values for the wide window (L = 20 rows, n = 45 invented assets, L < n).

Writes wide_window.csv (row, market, A01..A45: excess returns) and wide_window.txt (the
single-index residual diagnostics of Method section 8), with numpy and scipy only:
residuals from numpy.linalg.lstsq on an intercept and the market, correlations from
numpy.corrcoef, Breusch-Pagan LM = L sum rho^2 (scipy.stats.chi2.sf), Pesaran CD
(2 * scipy.stats.norm.sf(|CD|)), and the bias-adjusted LM of Pesaran, Ullah & Yamagata (2008)
with the common-regression moments mu = 1, v^2 = 2(d-1)/(d+2), d = L - 2 (scipy.stats.norm.sf).
Sectors: asset k (1-based) is in sector "S" + str(k % 4), and A07-A12 share a shock.
Run: python3 wide_window.py
"""
import numpy as np
from scipy import stats

rng = np.random.default_rng(20261202)
L, n = 20, 45
m = 0.04 * rng.standard_normal(L)
beta = 0.5 + rng.random(n)
x = np.outer(m, beta) + 0.03 * rng.standard_normal((L, n))
shock = rng.standard_normal(L)
x[:, 6:12] += 0.02 * shock[:, None]
x = np.round(x, 8)
m = np.round(m, 8)
names = [f"A{k:02d}" for k in range(1, n + 1)]

with open("wide_window.csv", "w") as f:
    f.write("row,market," + ",".join(names) + "\n")
    for t in range(L):
        f.write(str(t) + "," + repr(float(m[t])) + "," + ",".join(repr(float(v)) for v in x[t]) + "\n")

design = np.column_stack([np.ones(L), m])
coef, *_ = np.linalg.lstsq(design, x, rcond=None)
e = x - design @ coef
rho = np.corrcoef(e, rowvar=False)
iu = np.triu_indices(n, 1)
r = rho[iu]
pairs = n * (n - 1) / 2
lm = L * np.sum(r ** 2)
cd = np.sqrt(2 * L / (n * (n - 1))) * np.sum(r)
d = L - 2
v = np.sqrt(2 * (d - 1) / (d + 2))
lm_adj = np.sqrt(2 / (n * (n - 1))) * np.sum((d * r ** 2 - 1) / v)
order = sorted(range(len(r)), key=lambda k: (-r[k], iu[0][k], iu[1][k]))[:5]
sector = np.array([k % 4 for k in range(1, n + 1)])

with open("wide_window.txt", "w") as f:
    f.write(f"mean_abs {float(np.mean(np.abs(r)))!r}\n")
    f.write(f"lm {float(lm)!r}\nlm_p {float(stats.chi2.sf(lm, pairs))!r}\n")
    f.write(f"cd {float(cd)!r}\ncd_p {float(2 * stats.norm.sf(abs(cd)))!r}\n")
    f.write(f"lm_adj {float(lm_adj)!r}\nlm_adj_p {float(stats.norm.sf(lm_adj))!r}\n")
    for k in order:
        f.write(f"pair {names[iu[0][k]]} {names[iu[1][k]]} {float(r[k])!r}\n")
    for g in range(4):
        idx = np.where(sector == g)[0]
        sub = rho[np.ix_(idx, idx)][np.triu_indices(len(idx), 1)]
        f.write(f"within S{g} {float(np.mean(sub))!r}\n")
    for g in range(4):
        for h in range(g + 1, 4):
            block = rho[np.ix_(np.where(sector == g)[0], np.where(sector == h)[0])]
            f.write(f"between S{g} S{h} {float(np.mean(block))!r}\n")
    f.write(f"versions numpy {np.__version__} scipy {__import__('scipy').__version__}\n")
