"""Reference values for ExactPairMomentsTest: tr(Mi Mj), tr((Mi Mj)^2) and the
Pesaran-Ullah-Yamagata (2008) mu_ij, v_ij from explicit L x L residual makers (numpy).

Design (rebuilt in the test): L = 24 rows, t = 0..23,
  Zi = [1, sin(t/3), t/10]           (k_i = 3)
  Zj = [1, cos(t/4)]                 (k_j = 2)
  Zc = [1, sin(t/3)] used for both   (common regression, k = 2)
Run: python3 lm_adj_traces.py (numpy 2.x).
"""
import numpy as np

L = 24
t = np.arange(L, dtype=float)
ones = np.ones(L)
Zi = np.column_stack([ones, np.sin(t / 3), t / 10])
Zj = np.column_stack([ones, np.cos(t / 4)])


def maker(Z):
    return np.eye(L) - Z @ np.linalg.pinv(Z)


def moments(Mi, Mj, d):
    A = Mi @ Mj
    tr1 = np.trace(A)
    tr2 = np.trace(A @ A)
    a2 = 3 * (((d - 8) * (d + 2) + 24) / ((d + 2) * (d - 2) * (d - 4))) ** 2
    a1 = a2 - 1 / d ** 2
    return tr1, tr2, tr1 / d, np.sqrt(tr1 ** 2 * a1 + 2 * tr2 * a2)


Mi, Mj = maker(Zi), maker(Zj)
d = np.sqrt((L - 3) * (L - 2))
print("different", *[repr(float(v)) for v in moments(Mi, Mj, d)])
Mc = maker(np.column_stack([ones, np.sin(t / 3)]))
print("common", *[repr(float(v)) for v in moments(Mc, Mc, L - 2.0)])
