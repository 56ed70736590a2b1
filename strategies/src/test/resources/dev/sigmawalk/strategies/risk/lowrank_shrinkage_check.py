"""Reference intensities for a window with fewer rows than assets (L = 20, n = 60).

Writes lowrank_window.csv (row, market, C01..C60: seeded excess returns with one market
factor) and lowrank_values.json with the Ledoit-Wolf shrinkage intensities computed pair by
pair from the papers' definitions, with numpy:

* single-index target, Ledoit & Wolf (2003, J. Empirical Finance), appendix: pi_ij, rho_ij
  (r_tij as printed there), gamma = sum (f_ij - s_ij)^2, delta = clip((pi - rho)/gamma/T, 0, 1);
* scaled identity, Ledoit & Wolf (2004, J. Multivariate Analysis), section 3: m, d^2, b-bar^2,
  b^2 = min(b-bar^2, d^2), delta = b^2/d^2.

All moments are on demeaned data with divisor T, as in the papers. Run: python3 lowrank_shrinkage_check.py
"""
import json

import numpy as np

T, N = 20, 60
rng = np.random.default_rng(20260112)
beta = rng.uniform(0.3, 1.7, N)
vol = rng.uniform(0.02, 0.08, N)
market = 0.005 + 0.045 * rng.standard_normal(T)
sector = 0.03 * rng.standard_normal(T)
load = np.where(np.arange(N) < N // 2, rng.uniform(0.5, 1.5, N), 0.0)
excess = market[:, None] * beta + sector[:, None] * load + vol * rng.standard_t(5, (T, N)) * np.sqrt(3 / 5)

with open("lowrank_window.csv", "w") as f:
    f.write("row,market," + ",".join(f"C{i + 1:02d}" for i in range(N)) + "\n")
    for t in range(T):
        f.write(f"{t + 1}," + repr(float(market[t])) + "," + ",".join(repr(float(v)) for v in excess[t]) + "\n")

x = excess - excess.mean(axis=0)
y = market - market.mean()
s = x.T @ x / T
s0 = x.T @ y / T
s00 = y @ y / T

# Single-index target, pair by pair.
f = np.outer(s0, s0) / s00
np.fill_diagonal(f, np.diag(s))
prod = x[:, :, None] * x[:, None, :]                      # T x N x N: x_ti x_tj
pi_mat = ((prod - s) ** 2).mean(axis=0)
r = ((s0[None, None, :] * s00 * x[:, :, None] + s0[None, :, None] * s00 * x[:, None, :]
      - np.outer(s0, s0)[None, :, :] * y[:, None, None]) * y[:, None, None] * prod / s00 ** 2
     - (f * s)[None, :, :])
rho_mat = r.mean(axis=0)
np.fill_diagonal(rho_mat, np.diag(pi_mat))
gamma = ((f - s) ** 2).sum()
kappa = (pi_mat.sum() - rho_mat.sum()) / gamma
delta_si = float(min(1.0, max(0.0, kappa / T)))

# Scaled identity.
m = np.trace(s) / N
d2 = np.sum((s - m * np.eye(N)) ** 2) / N
b_bar2 = sum(np.sum((np.outer(x[t], x[t]) - s) ** 2) / N for t in range(T)) / T ** 2
delta_id = float(min(b_bar2, d2) / d2)

with open("lowrank_values.json", "w") as f:
    json.dump({"T": T, "n": N,
               "ledoit_wolf_single_index_delta_pairwise": delta_si,
               "ledoit_wolf_identity_delta_pairwise": delta_id}, f, indent=1, sort_keys=True)
    f.write("\n")
print(delta_si, delta_id)
