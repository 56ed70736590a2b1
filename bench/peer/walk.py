#!/usr/bin/env python3
"""A second, independent implementation of the end-to-end timing study, in numpy and scipy.

It walks forward long-only minimum variance under three risk models (the single-index model,
the sample covariance and Ledoit-Wolf shrinkage toward the single-index target) over every
window length, with the conventions of DEVELOPERS.md's Method section, and writes
weights.csv and returns.csv with sigmawalk's columns. It exists to measure sigmawalk's speed
against, and to check its weights from outside it: see DEVELOPERS.md, "A numpy yardstick".

    python3 bench/peer/walk.py DATA --frequency daily --windows 500,1000 --every 21 \
        --bounds 0,0.02 --cost-bps 10 --out OUT

Where the work goes, per window length L over n assets (w = n + 1 columns with the market):
  * rolling shifted sums s = sum d_t, D = sum d_t d_t' (d = excess return minus a fixed shift),
    moved by one BLAS product of the k new and k dropped rows per rebalance, 4 k w^2 flops;
  * for the Ledoit-Wolf (2003) intensity: per-asset rolling power sums, O(k w) per move; two
    products of the window's L x w rows with a vector, O(L w); one read of D (its squared norm);
  * the single-index problem in closed form up to two unknowns, O(n) per round;
  * a primal-dual active-set solve for each dense model, warm-started from that path's previous
    active set: a Cholesky factor of the free block and O(n m) products per step, two or three
    steps per rebalance.
No n x n matrix is ever copied or formed besides D itself.
"""

import argparse
import multiprocessing
import os
import sys
import time


def _jobs_from_argv(argv):
    """The --jobs value, read before numpy loads (see below); the parser checks it properly later."""
    for k, a in enumerate(argv):
        if a == "--jobs" and k + 1 < len(argv):
            return argv[k + 1]
        if a.startswith("--jobs="):
            return a.split("=", 1)[1]
    return str(os.cpu_count() or 1)


# Window lengths run in parallel worker processes, one BLAS thread each: the rank-2k updates of
# the rolling sums are too thin for two BLAS threads to share well, and a process per window
# keeps every core busy with its own window. The thread count must be fixed before numpy loads.
if __name__ == "__main__" and _jobs_from_argv(sys.argv) != "1":
    os.environ.setdefault("OPENBLAS_NUM_THREADS", "1")

import numpy as np  # noqa: E402
from scipy.linalg import blas, cho_factor, cho_solve, LinAlgError  # noqa: E402

STRATEGIES = ("index-minvar", "sample-minvar", "shrunk-minvar")
LOWER, FREE, UPPER = 0, 1, 2
# Solver tolerances of Method §5's exact solution: a bound is released when its multiplier is
# below -DROP times the gradient's size; the final KKT residual must be below KKT.
DROP = 1e-12
KKT = 1e-9
MAX_PDAS_STEPS = 25
# Ledoit-Wolf: a target within this relative squared distance of S counts as S itself (delta 0).
SAME_AS_SAMPLE = 1e-24


def fail(message):
    """Stops on bad input with the message and exit status 2, as sigmawalk does."""
    print(message, file=sys.stderr)
    sys.exit(2)


# ----------------------------------------------------------------------------------------------
# Reading (Method §1)

def parse_rows(lines):
    """The values of CSV lines with the first field (the date) left out; an empty cell (no return
    that period) becomes NaN."""
    flat = b",".join(line[line.index(b",") + 1:] for line in lines)
    # ",," twice: the first pass leaves every other cell of a run of empty cells.
    flat = flat.replace(b",,", b",nan,").replace(b",,", b",nan,")
    if flat.startswith(b","):
        flat = b"nan" + flat
    if flat.endswith(b","):
        flat += b"nan"
    try:
        return np.fromstring(flat, sep=",")
    except ValueError:
        return None


_LINES = []  # the lines being parsed, shared with forked workers


def _parse_part(bounds):
    return parse_rows(_LINES[bounds[0]:bounds[1]])


def read_table(path, jobs=1):
    """A CSV of dates by columns: (header names, dates as strings, values with NaN for empty),
    parsed by `jobs` processes in row blocks."""
    try:
        with open(path, "rb") as f:
            raw = f.read()
    except OSError as e:
        fail(f"{path}: cannot be read ({e.strerror})")
    if b"\r" in raw:
        raw = raw.replace(b"\r", b"")
    header, body = raw.split(b"\n", 1)
    names = header.decode().strip().split(",")[1:]
    lines = [line for line in body.split(b"\n") if line]
    dates = [line[:line.index(b",")].decode() for line in lines]
    if jobs > 1 and len(lines) >= 1000:
        # Row blocks: this process parses the first while jobs - 1 forked workers parse the rest.
        _LINES[:] = lines
        cuts = np.linspace(0, len(lines), jobs + 1).astype(int)
        with multiprocessing.get_context("fork").Pool(jobs - 1) as pool:
            rest = pool.map_async(_parse_part, list(zip(cuts[1:-1], cuts[2:])))
            first = _parse_part((cuts[0], cuts[1]))
            parts = [first] + rest.get()
            values = None if any(part is None for part in parts) else np.concatenate(parts)
        _LINES.clear()
    else:
        values = parse_rows(lines)
    if values is None:
        fail(f"{path}: a cell is not a number (this reader takes the sample generator's files)")
    if values.size != len(lines) * len(names):
        fail(f"{path}: expected {len(names)} values on each of {len(lines)} rows, read {values.size}")
    return names, dates, values.reshape(len(lines), len(names))


def read_panel(folder, frequency, jobs=1):
    assets, dates, r = read_table(os.path.join(folder, f"assets-{frequency}.csv"), jobs)
    series = []
    for role in ("market", "riskfree"):
        _, other, values = read_table(os.path.join(folder, f"{role}-{frequency}.csv"))
        if other != dates:
            fail(f"{role}-{frequency}.csv: its dates differ from the assets' dates")
        series.append(values[:, 0])
    return assets, dates, r, series[0], series[1]


# ----------------------------------------------------------------------------------------------
# Timeline and eligibility (Method §2)

def schedule(rows, windows, every):
    """Rebalance rows tau_0, tau_0 + k, ... with tau_0 = L_max - 1, each leaving a row to hold."""
    tau0 = max(windows) - 1
    last = rows - 1
    if tau0 >= last - 1:
        fail(f"the longest window ({max(windows)} rows) needs at least {max(windows) + 2} rows")
    return np.arange(tau0, last, every), last


def prefix_counts(flags):
    """counts[t, i] = number of rows before t where flags[., i] holds (one leading row of zeros)."""
    counts = np.zeros((flags.shape[0] + 1, flags.shape[1]), dtype=np.int32)
    counts[1:] = flags
    # In place on int32: much faster than a cumulative sum that converts from bool as it goes.
    np.cumsum(counts[1:], axis=0, out=counts[1:])
    return counts


def changed(values):
    """flags[t, i] = values[t, i] differs from values[t - 1, i] (exactly; the first row counts as a change)."""
    flags = np.ones(values.shape, dtype=bool)
    np.not_equal(values[1:], values[:-1], out=flags[1:])
    return flags


class Eligibility:
    """Assets with a return in every row of the window whose return and excess return both vary
    there (a constant series has no risk to estimate and is left out). Both tests are differences
    of prefix counts, O(n) per window: of missing returns, and of rows whose value differs from
    the row before (compared exactly)."""

    def __init__(self, r, excess):
        self.missing = prefix_counts(np.isnan(r))
        self.raw_changes = prefix_counts(changed(r))
        self.excess_changes = prefix_counts(changed(excess))

    def at(self, tau, length):
        """Boolean mask over the panel's columns for the window of rows tau-L+1..tau."""
        first = tau - length + 1
        complete = self.missing[tau + 1] == self.missing[first]
        # Changes within rows first+1..tau: none means the series is constant in the window.
        raw_varies = self.raw_changes[tau + 1] > self.raw_changes[first + 1]
        excess_varies = self.excess_changes[tau + 1] > self.excess_changes[first + 1]
        return complete & raw_varies & excess_varies


# ----------------------------------------------------------------------------------------------
# Rolling window sums (Method §3 moments, divisor L - 1)

class Deviations:
    """d_t = z_t - c for every row, with z the excess returns of every asset and the market as the
    last column, and c a fixed per-column shift: the column means over the first window of the
    longest length (present values only; 0 for a column with none). With d close to zero-mean in
    every window, s/L stays small and D - s s'/L does not cancel. A missing return gives d = 0:
    such an asset is not eligible in that window, so its sums are never used. Computed once and
    shared, read-only, by every window length."""

    def __init__(self, z, first, last):
        """z: the excess returns, overwritten with the deviations (no second copy of the panel)."""
        window = z[first:last + 1]
        present = ~np.isnan(window)
        shift = np.where(present, window, 0.0).sum(axis=0) / np.maximum(1, present.sum(axis=0))
        z -= shift
        self.d = np.nan_to_num(z, copy=False, nan=0.0)
        # Per-row sums of d^2 over the asset columns, for the intensity's q_t.
        self.row_squares = np.einsum("ij,ij->i", self.d[:, :-1], self.d[:, :-1])


class RollingSums:
    """Sums over rows tau-L+1..tau of the deviations d_t (see Deviations):
      s = sum d_t, D = sum d_t d_t' (w x w, both triangles, Fortran order for BLAS),
    and per column the power sums the Ledoit-Wolf intensity needs, with e = the market's d:
      p2 = sum d^2, p3 = sum d^3, p4 = sum d^4, q2 = sum e d^2, q3 = sum e d^3,
      t1 = sum e^2 d, t2 = sum e^2 d^2.
    A move of k rows adds the new rows and removes the dropped ones: one dgemm of the 2k rows,
    D += [new; old]' [new; -old]. The sums are never rebuilt: after the 143 moves of the large
    benchmark case the centred sums of the eligible columns of the 250-row window differ from a
    fresh build by a few units of rounding (at most 5e-15 relative to sqrt(C_ii C_jj))."""

    def __init__(self, deviations, length, first_tau):
        self.d = deviations.d
        self.row_squares = deviations.row_squares
        self.length = length
        first = first_tau - length + 1
        w = self.d.shape[1]
        self.sum = np.zeros(w)
        self.cross = np.zeros((w, w), order="F")
        self.powers = np.zeros((7, w))
        self._add(self.d[first:first_tau + 1], np.ones(length))
        self.tau = first_tau

    def _add(self, rows, signs):
        signed = rows * signs[:, None]
        # D += rows' signed, handed to BLAS as the Fortran-order views rows' and signed' (no copy;
        # about a fifth faster than the transposed-first form with its copies).
        self.cross = blas.dgemm(1.0, rows.T, signed.T, beta=1.0, c=self.cross, trans_b=1, overwrite_c=1)
        self.sum += signed.sum(axis=0)
        e = rows[:, -1]
        sq = rows * rows
        cube = sq * rows
        weights = np.stack([signs, signs * e, signs * e * e])  # 3 x rows
        by_sq = weights @ sq        # sum sgn d^2, sum sgn e d^2, sum sgn e^2 d^2
        by_cube = weights[:2] @ cube  # sum sgn d^3, sum sgn e d^3
        self.powers[0] += by_sq[0]
        self.powers[1] += by_cube[0]
        self.powers[2] += signs @ (sq * sq)
        self.powers[3] += by_sq[1]
        self.powers[4] += by_cube[1]
        self.powers[5] += weights[2] @ rows
        self.powers[6] += by_sq[2]

    def move_to(self, tau):
        step = tau - self.tau
        if step <= 0:
            return
        if 2 * step > self.length:
            raise ValueError("a move longer than half the window")
        new = self.d[self.tau + 1:tau + 1]
        old = self.d[self.tau - self.length + 1:tau - self.length + 1]
        self._add(np.vstack([new, old]), np.concatenate([np.ones(step), -np.ones(step)]))
        self.tau = tau

    def window(self):
        return self.d[self.tau - self.length + 1:self.tau + 1]


class Moments:
    """The window's centred moments from the rolling sums, in units of C = (L - 1) S (weights and
    the shrinkage intensity do not depend on the scale): C = D - s s'/L, never formed; products
    with C go through D and a rank-one correction."""

    def __init__(self, sums, mask):
        self.sums = sums
        self.L = sums.length
        self.mask = mask
        self.cols = np.flatnonzero(mask)
        s = sums.sum
        self.s = s
        D = sums.cross
        m = s.size - 1
        self.m = m
        diag = np.diagonal(D)
        self.diag = diag[:m] - s[:m] * s[:m] / self.L           # C_ii
        self.cov_m = D[:m, m] - s[:m] * s[m] / self.L           # C_im
        self.var_m = D[m, m] - s[m] * s[m] / self.L             # C_mm

    def times(self, idx, w):
        """(C v)_E for v = w on columns idx, 0 elsewhere: O(w |idx|)."""
        D = self.sums.cross
        g = D[:, idx] @ w - self.s * (self.s[idx] @ w) / self.L
        return g[:self.m]

    def block(self, idx):
        """C restricted to rows and columns idx."""
        D = self.sums.cross
        sub = D[np.ix_(idx, idx)]
        return sub - np.outer(self.s[idx], self.s[idx]) / self.L


# ----------------------------------------------------------------------------------------------
# Single-index model (Method §3; Sharpe 1963) and its long-only solution in closed form

def single_index(mom):
    """beta_i = C_im / C_mm and d_i = C_ii - beta_i^2 C_mm (floored at 0), on the eligible assets."""
    cols = mom.cols
    beta = mom.cov_m[cols] / mom.var_m
    resid = np.maximum(0.0, mom.diag[cols] - beta * beta * mom.var_m)
    return beta, resid


def two_by_two(s, beta, d, free, pinned_sum, pinned_exposure):
    """Level a = nu and slope c = s beta'w of a partition (Method §5 with Sigma = s bb' + diag(d)):
    with A0 = sum_F 1/d, A1 = sum_F b/d, A2 = sum_F b^2/d over the free weights,
    c = s (a A1 + M_B) / (1 + s A2) and a = (1 - S_B + s A1 M_B / k) / (A0 - s A1^2 / k)."""
    inv = 1.0 / d[free]
    bf = beta[free]
    a0 = inv.sum()
    a1 = (bf * inv).sum()
    a2 = (bf * bf * inv).sum()
    if a0 == 0:
        return None
    k = 1.0 + s * a2
    level = (1.0 - pinned_sum + s * a1 * pinned_exposure / k) / (a0 - s * a1 * a1 / k)
    slope = s * (level * a1 + pinned_exposure) / k
    return level, slope


def partition_levels(s, beta, d, hi, side):
    free = side == FREE
    capped = side == UPPER
    pinned_sum = hi * capped.sum()
    pinned_exposure = hi * beta[capped].sum()
    return two_by_two(s, beta, d, free, pinned_sum, pinned_exposure)


def classify(beta, d, hi, level, slope):
    raw = (level - slope * beta) / d
    side = np.full(beta.size, FREE, dtype=np.int8)
    side[raw <= 0.0] = LOWER
    side[raw >= hi] = UPPER
    return side


def single_index_weights(s, beta, d, hi):
    """min w'(s bb' + diag(d))w s.t. sum w = 1, 0 <= w <= hi. Every weight is
    clamp((a - c b_i)/d_i, 0, hi); the partition iteration (a semismooth Newton method on the
    two unknowns a and c) starts from all weights free and stops when the partition reproduces
    itself. Bisection on c (the exposure map is monotone) takes over if it does not settle."""
    n = beta.size
    hi = min(hi, 1.0)
    side = np.full(n, FREE, dtype=np.int8)
    for _ in range(50):
        levels = partition_levels(s, beta, d, hi, side)
        if levels is None:
            break
        nxt = classify(beta, d, hi, *levels)
        if np.array_equal(nxt, side):
            return weights_from_partition(s, beta, d, hi, side)
        side = nxt
    return single_index_bisection(s, beta, d, hi)


def weights_from_partition(s, beta, d, hi, side):
    levels = partition_levels(s, beta, d, hi, side)
    w = np.where(side == UPPER, hi, 0.0)
    free = side == FREE
    w[free] = np.clip((levels[0] - levels[1] * beta[free]) / d[free], 0.0, hi)
    return w


def single_index_bisection(s, beta, d, hi):
    def level(c):
        lo_a, hi_a = (c * beta).min() - 1.0, (c * beta + hi * d).max() + 1.0
        for _ in range(200):
            mid = 0.5 * (lo_a + hi_a)
            if mid <= lo_a or mid >= hi_a:
                break
            if np.clip((mid - c * beta) / d, 0.0, hi).sum() < 1.0:
                lo_a = mid
            else:
                hi_a = mid
        return 0.5 * (lo_a + hi_a)

    lo_c, hi_c = s * np.minimum(0.0, beta * hi).sum(), s * np.maximum(0.0, beta * hi).sum()
    for _ in range(200):
        mid = 0.5 * (lo_c + hi_c)
        if mid <= lo_c or mid >= hi_c:
            break
        w = np.clip((level(mid) - mid * beta) / d, 0.0, hi)
        if s * (beta @ w) - mid > 0:
            lo_c = mid
        else:
            hi_c = mid
    c = 0.5 * (lo_c + hi_c)
    return weights_from_partition(s, beta, d, hi, classify(beta, d, hi, level(c), c))


# ----------------------------------------------------------------------------------------------
# Ledoit & Wolf (2003, J. Empirical Finance) intensity toward the single-index target

def shrinkage_intensity(mom, beta_e):
    """delta = max(0, min(1, kappa/L)), kappa = (pi - rho)/gamma, on the demeaned window with
    divisor-L moments (Method §3). The one O(n^2) sum, ||S||^2, is a dot product of D with
    itself; the rest comes from the rolling power sums and two products of the window's rows
    with a vector, O(L n):
      pi   = 1/L sum_t (sum_i xt_ti^2)^2 - sum_ij s_ij^2,
      rho  = sum_i pi_ii + sum_{i!=j} rho_ij, with the paper's appendix summed over i != j:
             sum_{i!=j} rho_ij = (2/s00) 1/L sum_t yt_t sum_i xt_ti^2 (c_t - s_i0 xt_ti)
                               - 1/s00^2 1/L sum_t yt_t^2 (c_t^2 - sum_i s_i0^2 xt_ti^2)
                               - sum_{i!=j} f_ij s_ij,   c_t = sum_j s_j0 xt_tj,
      gamma = sum_{i!=j} (f_ij - s_ij)^2, f_ij = s00 b_i b_j."""
    sums = mom.sums
    L = mom.L
    cols = mom.cols
    m = mom.m
    s = mom.s
    delta_mean = s / L                       # x_bar - shift, per column
    D = sums.cross

    # Sums over C_EE (units of C): ||C_EE||^2 by excluding the ineligible columns X from ||C_AA||^2.
    excluded = np.flatnonzero(~mom.mask)
    flat = D.ravel(order="K")
    norm_d = flat @ flat                     # sum over all w x w entries of D^2
    # ||D_AA||^2: drop the market's row and column.
    norm_d -= 2.0 * (D[:, m] @ D[:, m]) - D[m, m] ** 2
    if excluded.size:
        dx = D[:m, excluded]
        norm_d -= 2.0 * np.einsum("ij,ij->", dx, dx) - np.einsum("ij,ij->", dx[excluded], dx[excluded])
    cmm = mom.var_m
    # The window's rows times two vectors on the eligible assets: a_i = s_i0 (divisor L, equal
    # to b_i C_mm / L) and dm_i = x_bar_i - shift_i = s_i / L (0 off the eligible set).
    a = np.zeros(m + 1)
    a[cols] = mom.cov_m[cols] / L
    dm = np.zeros(m + 1)
    dm[cols] = delta_mean[cols]
    win = sums.window()
    # Two matrix-vector products rather than one product with an L x 2 matrix: BLAS is much
    # faster on the former.
    wa = win @ a
    wd = win @ dm
    # Quadratic forms in D_EE from the same products, as D = W'W over the window's rows W:
    # b'D b = |W b|^2 with b = a L / C_mm, and s_E'D s_E = |W s_E|^2 = L^2 |W dm|^2.
    beta_d_beta = (wa @ wa) * (L / cmm) ** 2
    # ||C_EE||^2 = ||D_EE||^2 - 2/L s_E'D_EE s_E + (s_E's_E)^2/L^2, with s_E = L dm
    norm_c = norm_d - 2.0 * L * (wd @ wd) + (L * (dm @ dm)) ** 2
    beta_c_beta = beta_d_beta - (s[cols] @ beta_e) ** 2 / L
    cii = mom.diag[cols]
    diag_sq = cii @ cii
    b2 = beta_e * beta_e
    off_products = cmm * (beta_c_beta - b2 @ cii)                 # sum_{i!=j} f_ij c_ij
    gamma_c = (norm_c - diag_sq) - 2.0 * off_products + cmm * cmm * ((b2.sum()) ** 2 - b2 @ b2)

    # Row sums over the centred window xt = d - delta_mean, yt = e_t - delta_m.
    c_t = wa - a @ delta_mean
    rows = sums.row_squares[sums.tau - L + 1:sums.tau + 1]
    if excluded.size:
        wx = win[:, excluded]
        rows = rows - np.einsum("ij,ij->i", wx, wx)
    q_t = rows - 2.0 * wd + dm @ dm
    y_t = win[:, m] - delta_mean[m]

    # Per-asset centred sums from the power sums (binomial expansion around the window mean).
    p1 = s[cols]
    p2, p3, p4, q2, q3, t1, t2 = (sums.powers[k, cols] for k in range(7))
    dl = delta_mean[cols]
    e1 = s[m]
    e2 = D[m, m]
    q1 = D[cols, m]
    eps = delta_mean[m]
    central3 = p3 - 3 * dl * p2 + 3 * dl * dl * p1 - L * dl ** 3
    central4 = p4 - 4 * dl * p3 + 6 * dl * dl * p2 - 4 * dl ** 3 * p1 + L * dl ** 4
    e_central3 = q3 - 3 * dl * q2 + 3 * dl * dl * q1 - dl ** 3 * e1
    market_cubes = e_central3 - eps * central3                             # sum_t yt xt^3
    e2_d2 = t2 - 2 * dl * t1 + dl * dl * e2                                # sum e^2 (d - dl)^2
    e_d2 = q2 - 2 * dl * q1 + dl * dl * e1                                 # sum e (d - dl)^2
    centred2 = mom.diag[cols]                                              # sum (d - dl)^2
    market_squares = e2_d2 - 2 * eps * e_d2 + eps * eps * centred2         # sum_t yt^2 xt^2

    ae = a[cols]
    cross = y_t @ (c_t * q_t) - ae @ market_cubes
    market = (y_t * y_t) @ (c_t * c_t) - (ae * ae) @ market_squares
    squared_norms = q_t @ q_t
    fourth = central4.sum()

    # Divisor-L moments: s_ij = C_ij / L.
    s00 = cmm / L
    norm_s = norm_c / L ** 2
    pi = squared_norms / L - norm_s
    pi_diag = fourth / L - diag_sq / L ** 2
    rho_off = 2.0 / s00 * cross / L - market / (s00 * s00 * L) - off_products / L ** 2
    gamma = gamma_c / L ** 2
    if not gamma > SAME_AS_SAMPLE * norm_s:
        return 0.0
    return float(max(0.0, min(1.0, (pi - (pi_diag + rho_off)) / gamma / L)))


# ----------------------------------------------------------------------------------------------
# The dense box QP: primal-dual active set (Hintermueller, Ito & Kunisch 2002), Method §5

class DenseModel:
    """Q = (1 - delta) C + delta (C_mm b b' + diag(dres)) on the eligible assets (delta = 0: the
    sample matrix; otherwise Ledoit-Wolf shrinkage toward the single index, whose target has
    the sample variances on its diagonal, C_mm b_i^2 + dres_i = C_ii). Only products with a few
    columns and blocks of the free weights are ever taken."""

    def __init__(self, mom, delta, beta, resid):
        self.mom = mom
        self.delta = delta
        self.beta = beta
        self.resid = resid
        self.cols = mom.cols

    def times(self, idx, w):
        """Q v over the eligible assets for v = w on eligible positions idx."""
        g = self.mom.times(self.cols[idx], w)[self.cols]
        if self.delta == 0.0:
            return g
        target = self.mom.var_m * self.beta * (self.beta[idx] @ w)
        target[idx] += self.resid[idx] * w
        return (1.0 - self.delta) * g + self.delta * target

    def block(self, idx):
        q = self.mom.block(self.cols[idx])
        if self.delta == 0.0:
            return q
        b = self.beta[idx]
        target = self.mom.var_m * np.outer(b, b)
        target[np.diag_indices_from(target)] += self.resid[idx]
        return (1.0 - self.delta) * q + self.delta * target


def solve_partition(model, side, hi):
    """The free weights of the equality-constrained subproblem with the others at their bounds:
    Q_FF w_F = nu 1 - Q_FU hi, 1'w_F = 1 - hi |U|, by one Cholesky factor of Q_FF and the
    Schur complement nu = (1 - hi|U| - 1'Q_FF^-1 r) / 1'Q_FF^-1 1. Returns (w, nu, Q w), or None
    when no weight is free or Q_FF is not positive definite."""
    free = np.flatnonzero(side == FREE)
    upper = np.flatnonzero(side == UPPER)
    if free.size == 0:
        return None
    pinned = model.times(upper, np.full(upper.size, hi)) if upper.size else np.zeros(side.size)
    r = -pinned[free]
    try:
        factor = cho_factor(model.block(free), lower=False, check_finite=False)
    except LinAlgError:
        return None
    sol = cho_solve(factor, np.stack([r, np.ones(free.size)], axis=1), check_finite=False)
    nu = (1.0 - hi * upper.size - sol[:, 0].sum()) / sol[:, 1].sum()
    w = np.where(side == UPPER, hi, 0.0)
    w[free] = sol[:, 0] + nu * sol[:, 1]
    # The gradient Q w, reusing the capped weights' part.
    g = pinned + model.times(free, w[free])
    return w, nu, g


def gradient(model, w):
    nz = np.flatnonzero(w)
    return model.times(nz, w[nz])


def kkt_residual(w, g, hi):
    """Largest violation of the KKT conditions of Method §5 relative to the gradient's size:
    some nu with g_i = nu on free weights, g_i >= nu at 0 and g_i <= nu at hi."""
    floor = g[w > 0.0].max(initial=-np.inf)
    ceiling = g[w < hi].min(initial=np.inf)
    scale = max(np.abs(g).max(), 1e-300)
    primal = max(abs(w.sum() - 1.0), max(0.0, -w.min()), max(0.0, (w - hi).max()))
    return max(primal, max(0.0, floor - ceiling) / (2.0 * scale))


def pdas(model, guess, hi):
    """From a guessed partition: solve the subproblem, compute every multiplier z_i = g_i - nu,
    then pin every free weight beyond a bound and release every pinned weight whose multiplier
    has the wrong sign, all at once; stop when the partition reproduces itself. None when it
    cycles, exceeds its step limit or meets a singular free block."""
    side = guess.copy()
    seen = set()
    for _ in range(MAX_PDAS_STEPS):
        key = side.tobytes()
        if key in seen:
            return None
        seen.add(key)
        solved = solve_partition(model, side, hi)
        if solved is None:
            return None
        w, nu, g = solved
        z = g - nu
        tol = DROP * max(np.abs(g).max(), 1e-300)
        nxt = side.copy()
        free = side == FREE
        nxt[free & (w < 0.0)] = LOWER
        nxt[free & (w > hi)] = UPPER
        nxt[(side == LOWER) & (z < -tol)] = FREE
        nxt[(side == UPPER) & (z > tol)] = FREE
        if np.array_equal(nxt, side):
            if kkt_residual(w, g, hi) <= KKT:
                return w, side
            return None
        side = nxt
    return None


def primal_active_set(model, start, hi):
    """The exact fallback (Nocedal & Wright, Numerical Optimization, 2nd ed., Algorithm 16.3) from
    a feasible point: step to the subproblem's minimiser on the current free set, stopping at the
    first bound in the way; at a subproblem minimiser release the pinned weight with the most
    negative multiplier, or stop when there is none."""
    w = start.copy()
    side = np.where(w <= 0.0, LOWER, np.where(w >= hi, UPPER, FREE)).astype(np.int8)
    for _ in range(10_000):
        solved = solve_partition(model, side, hi) if (side == FREE).any() else None
        target = solved[0] if solved is not None else w
        step = target - w
        free = np.flatnonzero(side == FREE)
        if free.size and np.abs(step[free]).max() > 1e-15:
            sf = step[free]
            wf = w[free]
            ratios = np.full(free.size, np.inf)
            down = sf < 0
            up = sf > 0
            ratios[down] = -wf[down] / sf[down]
            ratios[up] = (hi - wf[up]) / sf[up]
            k = int(np.argmin(ratios))
            alpha = min(1.0, ratios[k])
            w = w + alpha * step
            if alpha < 1.0:
                i = free[k]
                side[i] = LOWER if sf[k] < 0 else UPPER
                w[i] = 0.0 if sf[k] < 0 else hi
                continue
            w[free] = target[free]
        g = gradient(model, w)
        if free.size:
            nu = g[free].mean()
        else:
            # A vertex: any nu between the capped weights' largest gradient and the zero weights'
            # smallest satisfies the KKT conditions; the midpoint shows the worse violation.
            nu = 0.5 * (g[side == LOWER].min(initial=np.inf) + g[side == UPPER].max(initial=-np.inf))
        z = np.where(side == LOWER, g - nu, np.where(side == UPPER, nu - g, 0.0))
        worst = int(np.argmin(z))
        if z[worst] >= -DROP * max(np.abs(g).max(), 1e-300):
            if kkt_residual(w, g, hi) > KKT:
                raise ArithmeticError(f"KKT residual {kkt_residual(w, g, hi)} after the primal loop")
            return w, side
        side[worst] = FREE
    raise ArithmeticError("primal active-set loop did not finish")


def dense_min_variance(model, guess, feasible, hi):
    """The exact optimum (Method §5): PDAS from the guess, else the primal loop from a feasible point."""
    solved = pdas(model, guess, hi)
    if solved is not None:
        return solved, False
    return primal_active_set(model, feasible, hi), True


def sides_of(w, hi):
    return np.where(w <= 0.0, LOWER, np.where(w >= hi, UPPER, FREE)).astype(np.int8)


# ----------------------------------------------------------------------------------------------
# Holding-period accounting (Method §6)

class Book:
    """Weights by panel column; drift, turnover against the drifted weights, cost on the first
    held row; a held asset without a return earns 0 that row."""

    def __init__(self, n, cost_bps):
        self.h = np.zeros(n)
        self.rate = cost_bps / 10_000.0
        self.cash = True

    def rebalance(self, cols, w):
        new = np.zeros_like(self.h)
        new[cols] = w
        turnover = np.abs(new - self.h).sum()
        self.h = new
        self.cash = False
        return self.rate * turnover

    def hold(self, r_rows, rf_rows, cost):
        """Gross and net returns over the held rows r_rows (k x n, NaN for no return): with
        h_i <- h_i (1 + r_i) / (1 + R), the portfolio's return of row t is the growth of
        sum_i h_i prod_{s<=t}(1 + r_si) from row t-1 to row t."""
        if self.cash:
            gross = rf_rows.copy()
        else:
            held = np.flatnonzero(self.h)
            growth = np.cumprod(1.0 + np.nan_to_num(r_rows[:, held], nan=0.0), axis=0)
            start = self.h[held].sum()
            value = np.concatenate([[start], growth @ self.h[held]])
            gross = np.diff(value) / value[:-1]
            self.h[held] = self.h[held] * growth[-1] * (start / value[-1])
        net = gross.copy()
        net[0] -= cost
        return gross, net


# ----------------------------------------------------------------------------------------------
# The walk

def walk_window(length, taus, last, r, rf, deviations, elig, hi, cost_bps, dates, assets):
    """Every rebalance of one window length: the weights.csv and returns.csv rows of the three
    strategies (formatted here, so parallel workers also share the formatting) and timings."""
    stats = dict.fromkeys(("moments", "single_index", "intensity", "dense_qp", "books_and_rows"), 0.0)
    stats["fallbacks"] = 0
    n = r.shape[1]
    sums = RollingSums(deviations, length, taus[0])
    books = [Book(n, cost_bps) for _ in STRATEGIES]
    previous = [None, None]         # per dense path: sides by panel column
    # Row endings "asset,weight\n" made once for the two weights most assets take (0 and the cap).
    at_zero = np.array([f"{a},{0.0!r}\n" for a in assets], dtype=object)
    at_cap = np.array([f"{a},{hi!r}\n" for a in assets], dtype=object)
    weights = {name: [] for name in STRATEGIES}
    returns = {name: [] for name in STRATEGIES}
    for j, tau in enumerate(taus):
        t0 = time.perf_counter()
        sums.move_to(tau)
        mask = elig.at(tau, length)
        mom = Moments(sums, mask)
        cols = mom.cols
        beta, resid = single_index(mom)
        t1 = time.perf_counter()
        w_si = single_index_weights(mom.var_m, beta, resid, hi)
        t2 = time.perf_counter()
        delta = shrinkage_intensity(mom, beta)
        t3 = time.perf_counter()
        chosen = [w_si]
        for k, d in enumerate((0.0, delta)):
            # Warm start: the path's previous active set, an asset new to the window at 0; at the
            # first rebalance, the single-index solution's partition of the same window.
            if previous[k] is None:
                guess = sides_of(w_si, hi)
            else:
                guess = previous[k][cols]
            (w, side), fell_back = dense_min_variance(DenseModel(mom, d, beta, resid), guess, w_si, hi)
            stats["fallbacks"] += fell_back
            full = np.full(n, LOWER, dtype=np.int8)
            full[cols] = side
            previous[k] = full
            chosen.append(w)
        t4 = time.perf_counter()
        stats["moments"] += t1 - t0
        stats["single_index"] += t2 - t1
        stats["intensity"] += t3 - t2
        stats["dense_qp"] += t4 - t3
        end = taus[j + 1] if j + 1 < len(taus) else last
        for k, name in enumerate(STRATEGIES):
            weights[name].append(weight_rows(f"{dates[tau]},{name},{length},", cols, chosen[k], hi, assets,
                                             at_zero, at_cap))
            cost = books[k].rebalance(cols, chosen[k])
            gross, net = books[k].hold(r[tau + 1:end + 1], rf[tau + 1:end + 1], cost)
            returns[name].append("".join(f"{dates[t]},{name},{length},{g!r},{v!r}\n"
                                         for t, g, v in zip(range(tau + 1, end + 1), gross.tolist(), net.tolist())))
        stats["books_and_rows"] += time.perf_counter() - t4
    return ({name: "".join(weights[name]) for name in STRATEGIES},
            {name: "".join(returns[name]) for name in STRATEGIES}, stats)


def weight_rows(prefix, cols, w, hi, assets, at_zero, at_cap):
    """The weights.csv rows of one rebalance: prefix + "asset,weight\n" for every eligible asset."""
    tails = np.where(w == 0.0, at_zero[cols], at_cap[cols])
    for k in np.flatnonzero((w != 0.0) & (w != hi)):
        tails[k] = f"{assets[cols[k]]},{float(w[k])!r}\n"
    return prefix + prefix.join(tails.tolist())


# The panel and the study, shared with forked workers (read-only; set once before the pool starts).
_STUDY = {}


def _walk_one(length):
    st = _STUDY
    return walk_window(length, st["taus"], st["last"], st["r"], st["rf"], st["deviations"], st["elig"], st["hi"],
                       st["cost_bps"], st["dates"], st["assets"])


def write_outputs(out, dates, windows, results, market, first_held):
    """weights.csv and returns.csv: every window, strategy by strategy, in the study's order."""
    os.makedirs(out, exist_ok=True)
    with open(os.path.join(out, "weights.csv"), "w") as f:
        f.write("date,strategy,window,asset,weight\n")
        for length in windows:
            for name in STRATEGIES:
                f.write(results[length][0][name])
    with open(os.path.join(out, "returns.csv"), "w") as f:
        f.write("date,strategy,window,gross_return,net_return\n")
        for length in windows:
            for name in STRATEGIES:
                f.write(results[length][1][name])
        # The market as the benchmark row (Method §5): gross = net = its own return.
        f.write("".join(f"{dates[t]},market,,{v!r},{v!r}\n"
                        for t, v in zip(range(first_held, len(dates)), market[first_held:].tolist())))


def main(argv=None):
    p = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    p.add_argument("data", help="folder the sample generator wrote")
    p.add_argument("--frequency", default="daily", choices=("daily", "monthly"))
    p.add_argument("--windows", required=True, help="window lengths, comma-separated")
    p.add_argument("--every", type=int, required=True, help="rebalance every N rows")
    p.add_argument("--bounds", default="0,0.02", help="LO,HI weight bounds (LO must be 0)")
    p.add_argument("--cost-bps", type=float, default=10.0)
    p.add_argument("--out", required=True, help="output folder")
    p.add_argument("--jobs", type=int, default=os.cpu_count() or 1,
                   help="worker processes, one window length each at a time (default: all cores)")
    args = p.parse_args(argv)
    if args.jobs < 1:
        fail(f"--jobs ({args.jobs}) must be >= 1")
    windows = [int(v) for v in args.windows.split(",")]
    lo, hi = (float(v) for v in args.bounds.split(","))
    if lo != 0.0 or not 0.0 < hi:
        fail("bounds: this implementation solves the long-only problem, 0 <= w <= HI")

    stats = dict.fromkeys(("read", "prepare", "walk", "write"), 0.0)
    t = time.perf_counter()
    assets, dates, r, market, rf = read_panel(args.data, args.frequency, args.jobs)
    stats["read"] = time.perf_counter() - t
    if hi * r.shape[1] < 1.0:
        fail(f"bounds: {r.shape[1]} assets at most {hi} each cannot sum to 1")
    taus, last = schedule(len(dates), windows, args.every)
    first_used = taus[0] - max(windows) + 1
    for role, series in (("market", market), ("riskfree", rf)):
        gaps = np.flatnonzero(np.isnan(series[first_used:]))
        if gaps.size:
            fail(f"{role}-{args.frequency}.csv: no value on {dates[first_used + gaps[0]]}; it must be"
                     f" complete from {dates[first_used]} on (Method §1)")
    t = time.perf_counter()
    # Method §1: excess returns of the assets, the market's last.
    z = np.empty((r.shape[0], r.shape[1] + 1))
    np.subtract(r, rf[:, None], out=z[:, :-1])
    z[:, -1] = market - rf
    elig = Eligibility(r, z[:, :-1])
    deviations = Deviations(z, first_used, taus[0])   # takes z over
    del z
    stats["prepare"] = time.perf_counter() - t
    t = time.perf_counter()
    _STUDY.update(taus=taus, last=last, r=r, rf=rf, deviations=deviations, elig=elig, hi=hi, cost_bps=args.cost_bps, dates=dates,
                  assets=assets)
    # Longest windows first: they cost the most, so the pool ends with the short ones.
    order = sorted(windows, reverse=True)
    jobs = min(args.jobs, len(windows))
    if jobs > 1:
        with multiprocessing.get_context("fork").Pool(jobs) as pool:
            done = pool.map(_walk_one, order, chunksize=1)
    else:
        done = [_walk_one(length) for length in order]
    results = dict(zip(order, done))
    stats["walk"] = time.perf_counter() - t
    for length in windows:
        for key, value in results[length][2].items():
            stats[key] = stats.get(key, 0) + value
    t = time.perf_counter()
    write_outputs(args.out, dates, windows, results, market, taus[0] + 1)
    stats["write"] = time.perf_counter() - t
    phases = ", ".join(f"{k} {stats[k]:.2f}" for k in ("read", "prepare", "walk", "write"))
    inside = ", ".join(f"{k} {stats[k]:.2f}" for k in ("moments", "single_index", "intensity", "dense_qp",
                                                           "books_and_rows"))
    print(f"walk.py: phases (s) {phases}; inside the walk, summed over windows (s) {inside};"
          f" fallbacks to the primal loop {stats['fallbacks']}", file=sys.stderr)


if __name__ == "__main__":
    main()
