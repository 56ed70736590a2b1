"""Independent recomputation of Ledoit & Wolf (2020) analytical nonlinear shrinkage.

Reads window.csv (columns row,market,A01..A12; the market column is not an asset) and
wide_window.csv (row,B01..B40), applies the estimator of Ledoit & Wolf (2020, Annals of
Statistics 48(5)) with the Epanechnikov kernel, and writes the matrices to
nonlinear_shrinkage_numpy_cov.csv and nonlinear_shrinkage_wide_numpy_cov.csv.

Written separately from the Java code, vectorised with numpy 2.4: numpy.linalg.eigh for the
eigendecomposition of S = X'X/N (X demeaned, N = T - 1), the kernel's Hilbert transform in
closed form for |x| <= 4 sqrt(5) and by its power series in u = sqrt(5)/x beyond (where the
closed form cancels), and the null-eigenvalue formula of the paper's section 4.5 when n > N.

Run: python3 nonlinear_shrinkage_check.py  (in this folder)
"""
import numpy as np

R5 = np.sqrt(5.0)


def hilbert_kernel(x):
    x = np.asarray(x, dtype=float)
    out = np.empty_like(x)
    far = np.abs(x) > 4 * R5
    near = ~far
    xn = x[near]
    with np.errstate(divide="ignore", invalid="ignore"):
        logs = np.log(np.abs((R5 - xn) / (R5 + xn)))
    closed = -3 * xn / (10 * np.pi) + 3 / (4 * R5 * np.pi) * (1 - xn ** 2 / 5) * logs
    closed = np.where(np.abs(xn) == R5, -3 * xn / (10 * np.pi), closed)
    out[near] = closed
    u = R5 / x[far]
    k = np.arange(1, 40)
    terms = u[:, None] ** (2 * k - 1) / (4 * k ** 2 - 1)
    out[far] = -3 / (R5 * np.pi) * terms.sum(axis=1)
    return out


def kernel(x):
    return 3 / (4 * R5) * np.maximum(1 - x ** 2 / 5, 0)


def shrink(x):
    t, n = x.shape
    x = x - x.mean(axis=0)
    big_n = t - 1
    s = x.T @ x / big_n
    lam, u = np.linalg.eigh(s)
    order = np.argsort(lam)[::-1]
    lam, u = lam[order], u[:, order]
    m = min(n, big_n)
    lam_m = lam[:m]
    h = big_n ** (-1 / 3)
    hj = h * lam_m
    diff = (lam_m[:, None] - lam_m[None, :]) / hj[None, :]
    f = (kernel(diff) / hj[None, :]).mean(axis=1)
    hil = (hilbert_kernel(diff) / hj[None, :]).mean(axis=1)
    c = n / big_n
    if n <= big_n:
        d = lam_m / ((np.pi * c * lam_m * f) ** 2 + (1 - c - np.pi * c * lam_m * hil) ** 2)
        return u @ np.diag(d) @ u.T
    d = lam_m / (np.pi ** 2 * lam_m ** 2 * (f ** 2 + hil ** 2))
    h0 = (1 / np.pi) * (3 / (10 * h ** 2) + 3 / (4 * R5 * h) * (1 - 1 / (5 * h ** 2))
                        * np.log((1 + R5 * h) / (1 - R5 * h))) * np.mean(1 / lam_m)
    d0 = 1 / (np.pi * ((n - big_n) / big_n) * h0)
    full = np.concatenate([d, np.full(n - m, d0)])
    return u @ np.diag(full) @ u.T


def read(name, skip):
    with open(name) as fh:
        header = fh.readline().strip().split(",")
    data = np.loadtxt(name, delimiter=",", skiprows=1)
    return header[skip:], data[:, skip:]


def write(name, assets, sigma):
    with open(name, "w") as fh:
        fh.write("asset," + ",".join(assets) + "\n")
        for a, row in zip(assets, sigma):
            fh.write(a + "," + ",".join(repr(float(v)) for v in row) + "\n")


if __name__ == "__main__":
    assets, x = read("window.csv", 2)
    write("nonlinear_shrinkage_numpy_cov.csv", assets, shrink(x))
    wide_assets, w = read("wide_window.csv", 1)
    write("nonlinear_shrinkage_wide_numpy_cov.csv", wide_assets, shrink(w))
