"""References for long-only minimum variance on sample matrices of fewer rows than assets.

Writes two windows in the layout row,market,C01..Cn (excess returns; the market column is not
used by the sample matrix) and the answers scipy 1.17 finds on them:

* zero_variance_window.csv (L = 10, n = 60, independent symmetric returns, no common factor):
  portfolios of zero sample variance exist within [0, 0.05]; zero_variance_min_norm.csv holds
  the one of smallest sum of squared weights, minimise 1/2 |w|^2 s.t. Xc w = 0, 1'w = 1,
  0 <= w <= 0.05, with Xc the demeaned rows, from the problem's dual by BFGS (SLSQP on the
  primal stops at feasible points of larger norm here); zero_variance_other_norm.txt holds the
  sum of squares of such a point.
* positive_variance_window.csv (L = 12, n = 40, one market factor): every long-only portfolio
  has positive sample variance; positive_variance_value.txt holds min w'Sw s.t. 1'w = 1,
  0 <= w <= 0.1, with S the sample matrix (divisor L - 1), by SLSQP.

Run: python3 semidefinite_check.py
"""
import numpy as np
from scipy.optimize import minimize


def write_window(name, market, excess):
    n = excess.shape[1]
    with open(name, "w") as f:
        f.write("row,market," + ",".join(f"C{i + 1:02d}" for i in range(n)) + "\n")
        for t in range(excess.shape[0]):
            f.write(f"{t + 1}," + repr(float(market[t])) + "," + ",".join(repr(float(v)) for v in excess[t]) + "\n")


rng = np.random.default_rng(5150)

# Zero-variance case.
L, n, cap = 10, 60, 0.05
excess = 0.05 * rng.standard_t(6, (L, n))
market = 0.04 * rng.standard_normal(L)
write_window("zero_variance_window.csv", market, excess)
xc = excess - excess.mean(axis=0)
# The projection's dual, maximise b'y - sum_i phi(s_i) with s = A'y, w = clip(s), A = [Xc; 1'],
# b = (0, 1), by scipy's BFGS (the dual is concave with a Lipschitz gradient b - A w).
A = np.vstack([xc, np.ones(n)])
b = np.r_[np.zeros(L), 1.0]


def negative_dual(y):
    s = A.T @ y
    w = np.clip(s, 0, cap)
    return -(b @ y - np.sum(s * w - 0.5 * w * w)), -(b - A @ w)


res = minimize(negative_dual, np.r_[np.zeros(L), 1 / n], jac=True, method="BFGS",
               options={"gtol": 1e-15, "maxiter": 10000})
w_dual = np.clip(A.T @ res.x, 0, cap)
assert abs(A @ w_dual - b).max() < 1e-9
np.savetxt("zero_variance_min_norm.csv", w_dual, fmt="%.17g", header="weight", comments="")
# Another zero-variance portfolio, by SLSQP on the primal (feasible to 1e-17, not of least
# norm): the least norm can be no larger than its sum of squares.
res = minimize(lambda w: 0.5 * w @ w, w_dual, jac=lambda w: w, bounds=[(0, cap)] * n,
               constraints=[{"type": "eq", "fun": lambda w: A @ w - b, "jac": lambda w: A}],
               method="SLSQP", options={"ftol": 1e-16, "maxiter": 1000})
assert res.success and abs(A @ res.x - b).max() < 1e-15, res.message
with open("zero_variance_other_norm.txt", "w") as f:
    f.write(repr(float(res.x @ res.x)) + "\n")

# Positive-variance case.
L, n, cap = 12, 40, 0.1
market = 0.005 + 0.045 * rng.standard_normal(L)
beta = rng.uniform(0.5, 1.5, n)
excess = market[:, None] * beta + 0.03 * rng.standard_normal((L, n))
write_window("positive_variance_window.csv", market, excess)
s = np.cov(excess, rowvar=False)
res = minimize(lambda w: w @ s @ w, np.full(n, 1 / n), jac=lambda w: 2 * s @ w, bounds=[(0, cap)] * n,
               constraints=[{"type": "eq", "fun": lambda w: w.sum() - 1, "jac": lambda w: np.ones((1, n))}],
               method="SLSQP", options={"ftol": 1e-16, "maxiter": 1000})
assert res.success, res.message
with open("positive_variance_value.txt", "w") as f:
    f.write(repr(float(res.fun)) + "\n")
print(res.fun)
