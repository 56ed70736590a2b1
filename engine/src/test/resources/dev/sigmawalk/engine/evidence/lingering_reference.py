# Reference value for LingeringDependenceTest: the excess of the first K sample autocorrelations
# (divisor T, about the mean) over the AR(1) sum implied by the lag-one autocorrelation, in units
# of sqrt(K/T). Computed with numpy; run: python3 lingering_reference.py
import numpy as np

rng = np.random.default_rng(20261202)
T, K = 40, 3
e = rng.standard_normal(T + 1)
u = e[1:] + 0.6 * e[:-1]            # an MA(1) series: its lag-two autocorrelation is 0, unlike an AR(1)'s
u = np.round(u, 6)
d = u - u.mean()
g0 = np.dot(d, d)
r = np.array([np.dot(d[k:], d[:-k]) / g0 for k in range(1, K + 1)])
implied = sum(r[0] ** k for k in range(1, K + 1))
z = (r.sum() - implied) / np.sqrt(K / T)
print("u =", ", ".join(repr(float(x)) for x in u))
print("r =", ", ".join(repr(float(x)) for x in r))
print("z =", repr(float(z)))
