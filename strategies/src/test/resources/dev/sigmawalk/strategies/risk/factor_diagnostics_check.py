"""Residual diagnostics of the multi-index (sector) and principal-components models on window.csv.

Independent of the Java code: forms the L x n residual matrix explicitly with numpy 2.4
(numpy.linalg.lstsq per asset on [1, market, own-sector mean]; for principal components the
projection on the k leading eigenvectors of numpy.linalg.eigh), the correlations with
numpy.corrcoef, and the exact moments of Pesaran, Ullah & Yamagata (2008, Econometrics
Journal 11, Section 3) from the explicit L x L residual makers M_i = I - Z_i pinv(Z_i):
mu_ij = tr(M_i M_j)/d_ij, v_ij^2 = tr(M_i M_j)^2 a1 + 2 tr((M_i M_j)^2) a2, with
d_ij = sqrt((L - k_i)(L - k_j)) (the paper's T - k when the counts agree).

Run: python3 factor_diagnostics_check.py  (writes factor_diagnostics_reference.csv here)
"""
import math
import numpy as np

names = open("window.csv").readline().strip().split(",")[2:]
data = np.loadtxt("window.csv", delimiter=",", skiprows=1)
m = data[:, 1]
x = data[:, 2:]
L, n = x.shape
sector = [0] * 4 + [1] * 4 + [2] * 4


def moments(mi, mj, d):
    a = mi @ mj
    t1 = np.trace(a)
    t2 = np.trace(a @ a)
    ratio = ((d - 8) * (d + 2) + 24) / ((d + 2) * (d - 2) * (d - 4))
    a2 = 3 * ratio ** 2
    a1 = a2 - 1 / d ** 2
    return t1 / d, math.sqrt(t1 ** 2 * a1 + 2 * t2 * a2)


def diagnostics(e, makers, ks):
    rho = np.corrcoef(e, rowvar=False)
    iu = np.triu_indices(n, 1)
    r = rho[iu]
    cd = math.sqrt(2 * L / (n * (n - 1))) * r.sum()
    total = 0.0
    for i, j in zip(*iu):
        d = math.sqrt((L - ks[i]) * (L - ks[j]))
        mu, v = moments(makers[i], makers[j], d)
        total += (d * rho[i, j] ** 2 - mu) / v
    lm = math.sqrt(2 / (n * (n - 1))) * total
    within = [np.mean([rho[i, j] for i, j in zip(*iu) if sector[i] == sector[j] == s]) for s in range(3)]
    between = [np.mean([rho[i, j] for i, j in zip(*iu) if {sector[i], sector[j]} == {a, b}])
               for a, b in ((0, 1), (0, 2), (1, 2))]
    return [np.abs(r).mean(), lm, cd] + within + between


rows = []
means = np.column_stack([x[:, [i for i in range(n) if sector[i] == s]].mean(axis=1) for s in range(3)])
e = np.empty_like(x)
makers = []
for i in range(n):
    z = np.column_stack([np.ones(L), m, means[:, sector[i]]])
    b = np.linalg.lstsq(z, x[:, i], rcond=None)[0]
    e[:, i] = x[:, i] - z @ b
    makers.append(np.eye(L) - z @ np.linalg.pinv(z))
rows.append(["multi-index:sectors"] + diagnostics(e, makers, [3] * n))

k = 2
xc = x - x.mean(axis=0)
lam, v = np.linalg.eigh(np.cov(x, rowvar=False))
vk = v[:, np.argsort(lam)[::-1][:k]]
e = xc - xc @ vk @ vk.T
z = np.column_stack([np.ones(L), xc @ vk])
maker = np.eye(L) - z @ np.linalg.pinv(z)
rows.append(["principal-components:2"] + diagnostics(e, [maker] * n, [k + 1] * n))

with open("factor_diagnostics_reference.csv", "w") as fh:
    fh.write("model,mean_abs_residual_corr,lm_adj_stat,cd_stat,within_first,within_second,within_third,"
             "between_first_second,between_first_third,between_second_third\n")
    for r in rows:
        fh.write(",".join([r[0]] + [repr(float(v)) for v in r[1:]]) + "\n")
