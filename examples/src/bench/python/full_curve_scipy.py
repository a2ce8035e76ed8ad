#!/usr/bin/env python3
"""Measured Python baseline for the full-curve fit (issue 5, section 5 "Performance").

A careful numpy + scipy implementation of the same fit as the Java FullCurveMethod, timed on the
same two synthetic increments as the Java FullCurveBenchmark, so that the Java timings can be set
against a baseline measured on the same machine rather than a claimed one.

Model (the same as ConsolidationCurveModel, secondary onset T_s = 2):

    d(t) = d_i + d_p U(T) + s log10(1 + T / 2),    T = c_v t / H^2

fitted in the parameters (d_i, d_p, ln c_v, s) with d_p >= 0 and s >= 0, readings weighted by the
span of log10 t each represents (mean 1), start values from a profile over 31 trial c_v with the
linear parameters solved exactly, refinement by scipy.optimize.least_squares (trust-region
reflective, analytic Jacobian), and a 95 % Student-t interval of c_v from the sandwich covariance.

The data are INVENTED (synthetic curves made from the model plus seeded Gaussian noise); they
describe no real soil or site. Run:  python3 full_curve_scipy.py   (about 20 s; exits non-zero
if a correctness check fails).
"""

import os

# One BLAS thread: the Java fit is single-threaded, and on this shared 2-core machine a second
# BLAS thread only added contention (measured). Set before numpy is imported; an explicit
# setting in the environment wins.
for _variable in ("OPENBLAS_NUM_THREADS", "OMP_NUM_THREADS", "MKL_NUM_THREADS"):
    os.environ.setdefault(_variable, "1")

import math  # noqa: E402  (after the thread settings on purpose)
import platform  # noqa: E402
import statistics  # noqa: E402
import sys  # noqa: E402
import time  # noqa: E402

import numpy as np  # noqa: E402
import scipy  # noqa: E402
from scipy.optimize import least_squares  # noqa: E402
from scipy.special import stdtrit  # noqa: E402
from scipy.stats import t as student_t  # noqa: E402

YEAR = 365.25 * 86_400.0  # s
DRAINAGE_PATH = 0.0095  # m
SECONDARY_ONSET = 2.0  # T_s of the secondary term
LN10 = math.log(10.0)
PI2_4 = math.pi**2 / 4.0

# U(T): short-time form below T = 1/36 (the first image term there is ~exp(-36) ~ 2e-16 of U),
# Fourier series above, each term kept while its exponent is below 41.5 (exp(-41.5) = 9e-19, so
# every dropped term of U and of dU/dT is below 1e-17 at T >= 1/36).
SHORT_TIME_LIMIT = 1.0 / 36.0
EXPONENT_CUTOFF = 41.5

# Fit settings, as in FullCurveMethod.
PROFILE_POINTS = 31
PROFILE_LOWEST_END_FACTOR = 0.02
PROFILE_HIGHEST_END_FACTOR = 20_000.0
LOWEST_END_FACTOR = 1e-4
HIGHEST_END_FACTOR = 1e7
MAX_STARTS = 3
PROFILE_READINGS = 300
START_RESIDUAL_FACTOR = 4.0
CONFIDENCE = 0.95
TOLERANCE = 1e-12


# ---------------------------------------------------------------------------------------------
# Terzaghi's average degree of consolidation and its rate
# ---------------------------------------------------------------------------------------------


def degree_and_rate(time_factor):
    """U(T) and dU/dT for an array of T > 0 (any shape, any order), vectorised.

    T < 1/36:  U = 2 sqrt(T/pi),  dU/dT = (1 - 2 exp(-1/T)) / sqrt(pi T)  (image terms beyond
               these are below 1e-16 of the value).
    T >= 1/36: U = 1 - sum_m 8/((2m+1)^2 pi^2) exp(-(2m+1)^2 pi^2 T/4),
               dU/dT = sum_m 2 exp(-(2m+1)^2 pi^2 T/4),
               each reading keeping only the terms its T needs (at most 13, at T = 1/36).
    """
    tf = np.asarray(time_factor, dtype=float)
    flat = tf.ravel()
    degree = np.empty_like(flat)
    rate = np.empty_like(flat)
    short = flat < SHORT_TIME_LIMIT
    if short.any():
        ts = flat[short]
        degree[short] = 2.0 * np.sqrt(ts / math.pi)
        rate[short] = (1.0 - 2.0 * np.exp(-1.0 / ts)) / np.sqrt(math.pi * ts)
    where_long = np.flatnonzero(~short)
    if where_long.size:
        x = PI2_4 * flat[where_long]  # exponent of the first term
        e = np.exp(-x)
        sum_degree = e.copy()
        sum_rate = e.copy()
        # Later terms only for the readings whose T needs them. Increasing T (the fit's case,
        # readings in time order): those readings are a prefix, found by bisection. Otherwise
        # (the profile's matrix): the set, which shrinks with m, is compacted term by term.
        if x.size < 2 or bool(np.all(x[1:] >= x[:-1])):
            k = 3
            while True:
                k2 = k * k
                count = int(np.searchsorted(x, EXPONENT_CUTOFF / k2))
                if count == 0:
                    break
                e = np.exp(-k2 * x[:count])
                sum_degree[:count] += e / k2
                sum_rate[:count] += e
                k += 2
        else:
            position = np.arange(where_long.size)
            k = 3
            while True:
                k2 = k * k
                keep = x * k2 < EXPONENT_CUTOFF
                if not keep.any():
                    break
                position = position[keep]
                x = x[keep]
                e = np.exp(-k2 * x)
                sum_degree[position] += e / k2
                sum_rate[position] += e
                k += 2
        degree[where_long] = 1.0 - (8.0 / math.pi**2) * sum_degree
        rate[where_long] = 2.0 * sum_rate
    return degree.reshape(tf.shape), rate.reshape(tf.shape)


class CurveModel:
    """d(t) and its Jacobian w.r.t. (d_i, d_p, ln c_v, s) at fixed times; caches U(T) and dU/dT
    of the last parameter vector, since least_squares asks for the residuals and the Jacobian at
    the same point separately."""

    def __init__(self, times, drainage_path=DRAINAGE_PATH):
        self.t_scaled = np.asarray(times, dtype=float) / drainage_path**2
        self._key = None

    def _evaluate(self, p):
        key = (p[2], p[0], p[1], p[3])
        if key != self._key:
            tf = math.exp(p[2]) * self.t_scaled
            degree, rate = degree_and_rate(tf)
            ratio = tf / SECONDARY_ONSET
            self._cache = (tf, degree, rate, ratio, np.log1p(ratio) / LN10)
            self._key = key
        return self._cache

    def settlement(self, p):
        _, degree, _, _, shape = self._evaluate(p)
        return p[0] + p[1] * degree + p[3] * shape

    def jacobian(self, p):
        tf, degree, rate, ratio, shape = self._evaluate(p)
        jac = np.empty((tf.size, 4))
        jac[:, 0] = 1.0
        jac[:, 1] = degree
        jac[:, 2] = p[1] * tf * rate + p[3] * ratio / ((1.0 + ratio) * LN10)
        jac[:, 3] = shape
        return jac


# ---------------------------------------------------------------------------------------------
# The fit
# ---------------------------------------------------------------------------------------------


def log_time_weights(t):
    """Span of log10 t each reading represents (half the distance to its neighbours; the ends use
    their one neighbour), normalised to mean 1, floored at 1e-6 (as FullCurveMethod.weights)."""
    log_t = np.log10(t)
    gaps = np.diff(log_t)
    before = np.concatenate(([gaps[0]], gaps))
    after = np.concatenate((gaps, [gaps[-1]]))
    w = 0.5 * (before + after)
    return np.maximum(w / w.mean(), 1e-6)


def spread_over_log_time(t, limit):
    """Indices of the first reading in each of `limit` equal bins of log10 t, plus the last
    reading (as FullCurveMethod.spreadOverLogTime); all indices when n <= limit."""
    n = t.size
    if n <= limit:
        return np.arange(n)
    log_t = np.log10(t)
    low = log_t[0]
    span = log_t[-1] - low
    bins = np.minimum(limit - 1, np.floor((log_t - low) / span * limit)).astype(np.int64)
    change = np.empty(n, dtype=bool)
    change[0] = True
    change[1:] = bins[1:] != bins[:-1]
    change[-1] = True
    return np.flatnonzero(change)[: limit + 1]


_SUBSETS = ((0, 1, 2), (0, 1), (0, 2), (0,))  # free columns of (d_i, d_p, s); others fixed at 0


def profile(t, y, w, drainage_path):
    """Profile of the weighted RSS over 31 trial c_v with (d_i, d_p, s) solved exactly under
    d_p >= 0, s >= 0 (every active set enumerated, feasible solutions only).

    Returns (log c_v [K], rss [K] with NaN where no primary settlement, linear [K, 3])."""
    path2 = drainage_path**2
    end_factors = PROFILE_LOWEST_END_FACTOR * (
        PROFILE_HIGHEST_END_FACTOR / PROFILE_LOWEST_END_FACTOR
    ) ** (np.arange(PROFILE_POINTS) / (PROFILE_POINTS - 1))
    cv = end_factors * path2 / t[-1]
    tf = cv[:, None] * (t[None, :] / path2)  # [K, n]
    degree, _ = degree_and_rate(tf)
    shape = np.log1p(tf / SECONDARY_ONSET) / LN10
    columns = np.stack((np.ones_like(degree), degree, shape), axis=2)  # [K, n, 3]
    wc = columns * w[None, :, None]
    normal = np.einsum("kni,knj->kij", wc, columns)  # [K, 3, 3]
    rhs = np.einsum("kni,n->ki", wc, y)  # [K, 3]
    best_rss = np.full(PROFILE_POINTS, np.inf)
    best_linear = np.zeros((PROFILE_POINTS, 3))
    for subset in _SUBSETS:
        idx = np.array(subset)
        a = normal[:, idx[:, None], idx[None, :]]
        b = rhs[:, idx]
        try:
            x = np.linalg.solve(a, b[..., None])[..., 0]
        except np.linalg.LinAlgError:  # a singular trial: solve one by one, skipping it
            x = np.full(b.shape, np.nan)
            for k in range(PROFILE_POINTS):
                try:
                    x[k] = np.linalg.solve(a[k], b[k])
                except np.linalg.LinAlgError:
                    pass
        linear = np.zeros((PROFILE_POINTS, 3))
        linear[:, idx] = x
        fitted = np.einsum("kni,ki->kn", columns, linear)
        rss = ((y[None, :] - fitted) ** 2 * w[None, :]).sum(axis=1)
        ok = np.isfinite(rss) & (linear[:, 1] >= 0) & (linear[:, 2] >= 0)
        better = ok & (rss < best_rss)
        best_rss[better] = rss[better]
        best_linear[better] = linear[better]
    rss = np.where(np.isfinite(best_rss) & (best_linear[:, 1] > 0), best_rss, np.nan)
    return np.log(cv), rss, best_linear


def lowest_local_minima(values, count):
    """Up to `count` lowest local minima (ends count; NaN neighbours do not block), each within a
    factor START_RESIDUAL_FACTOR of the lowest (as FullCurveMethod.lowestLocalMinima)."""
    m = len(values)
    minima = []
    for k in range(m):
        lower_left = k == 0 or not (values[k] >= values[k - 1])
        lower_right = k == m - 1 or not (values[k] > values[k + 1])
        if lower_left and lower_right and math.isfinite(values[k]):
            minima.append(k)
    minima.sort(key=lambda k: values[k])
    if minima:
        lowest = values[minima[0]]
        minima = [k for k in minima if not values[k] > START_RESIDUAL_FACTOR * lowest]
    return minima[:count]


def refine(model, y, sqrt_w, start, lower, upper):
    """One trust-region-reflective least-squares run with the analytic Jacobian."""

    def residuals(p):
        return sqrt_w * (model.settlement(p) - y)

    def jacobian(p):
        return sqrt_w[:, None] * model.jacobian(p)

    return least_squares(
        residuals,
        start,
        jac=jacobian,
        bounds=(lower, upper),
        method="trf",
        x_scale="jac",
        ftol=TOLERANCE,
        xtol=TOLERANCE,
        gtol=TOLERANCE,
        max_nfev=1000,
    )


def bounds_for(t, drainage_path):
    path2 = drainage_path**2
    lower = np.array([-np.inf, 0.0, math.log(LOWEST_END_FACTOR * path2 / t[-1]), 0.0])
    upper = np.array([np.inf, np.inf, math.log(HIGHEST_END_FACTOR * path2 / t[-1]), np.inf])
    return lower, upper


def full_curve_fit(times, settlements, drainage_path=DRAINAGE_PATH):
    """The whole fit: weights, profile, multi-start refinement, covariance and interval."""
    times = np.asarray(times, dtype=float)
    settlements = np.asarray(settlements, dtype=float)
    first = 1 if times[0] == 0.0 else 0
    t = times[first:]
    raw = settlements[first:]
    n = t.size
    if n < 6:
        raise ValueError(f"{n} readings after t = 0 are too few (needs at least 6)")
    sign = 1.0 if raw[-1] >= raw[0] else -1.0  # swelling: fit the magnitude
    y = sign * raw
    w = log_time_weights(t)
    sqrt_w = np.sqrt(w)
    lower, upper = bounds_for(t, drainage_path)

    # 1. Start values: profile on at most PROFILE_READINGS readings spread over log t.
    kept = spread_over_log_time(t, PROFILE_READINGS)
    profile_w = w if kept.size == n else log_time_weights(t[kept])
    log_cv, rss, linear = profile(t[kept], y[kept], profile_w, drainage_path)
    starts = lowest_local_minima(rss, MAX_STARTS)
    if not starts:
        raise RuntimeError("no primary consolidation is seen: no profile point has d_p > 0")

    # 2. Refinement from each start; keep the lowest cost.
    model = CurveModel(t, drainage_path)
    best = None
    nfev = 0
    reached = []
    for k in starts:
        start = np.array([linear[k, 0], linear[k, 1], log_cv[k], linear[k, 2]])
        result = refine(model, y, sqrt_w, start, lower, upper)
        nfev += result.nfev
        if result.status <= 0:
            continue
        reached.append(result.x[2])
        if best is None or result.cost < best.cost:
            best = result
    if best is None:
        raise RuntimeError("the least-squares fit failed from every start")
    p = best.x
    if p[2] <= lower[2] + 1e-9 or p[2] >= upper[2] - 1e-9:
        raise RuntimeError("c_v at the edge of the search: not determined by these readings")

    # 3. Sandwich covariance (A^-1 B A^-1, A = J'WJ, B = J'W^2J) scaled by the noise variance from
    # the unweighted residuals, widened for lag-1 autocorrelation as FullCurveMethod does.
    jac = model.jacobian(p)
    r = model.settlement(p) - y
    sum_squares = float(r @ r)
    noise_variance = sum_squares / (n - 4)
    a = jac.T @ (w[:, None] * jac)
    b = jac.T @ ((w * w)[:, None] * jac)
    a_inv = np.linalg.inv(a)
    covariance = a_inv @ b @ a_inv * noise_variance
    rho = float(r[1:] @ r[:-1]) / sum_squares if sum_squares > 0 else 0.0
    rho = min(0.95, max(0.0, rho))
    widening = (1.0 + rho) / (1.0 - rho)
    se_log_cv = math.sqrt(max(0.0, covariance[2, 2] * widening))
    # stdtrit(df, q) is the function behind scipy.stats.t.ppf(q, df), without its dispatch cost
    # (checked equal in self_checks()).
    half_width = float(stdtrit(n - 4, 0.5 + CONFIDENCE / 2)) * se_log_cv
    cv = math.exp(p[2])
    return {
        "cv": cv,
        "cv_low": math.exp(p[2] - half_width),
        "cv_high": math.exp(p[2] + half_width),
        "d0": sign * p[0],
        "d100": sign * (p[0] + p[1]),
        "secondary_slope": sign * p[3],
        "standard_errors": np.sqrt(np.maximum(0.0, np.diag(covariance) * widening)),
        "rms": math.sqrt(sum_squares / n),
        "nfev": nfev,
        "starts": len(starts),
        "at_best": sum(abs(x - p[2]) < 1e-3 for x in reached),
    }


# ---------------------------------------------------------------------------------------------
# Checks, test curves, timing
# ---------------------------------------------------------------------------------------------


def self_checks():
    """Cheap checks of U(T), dU/dT and the Jacobian against outside values / second formulas."""
    # Forward values [exact] in the project's FACTS.md (computed with mpmath from the series).
    tf = np.array([0.01, 0.1, 0.5])
    degree, _ = degree_and_rate(tf)
    expected = np.array([0.1128379167, 0.3568234005, 0.7639503307])
    assert np.all(np.abs(degree - expected) < 1e-10), degree
    # Exact time factors [exact] in FACTS.md: U(0.1967307) = 0.5, U(0.848085) = 0.9.
    degree, _ = degree_and_rate(np.array([0.1967307, 0.848085]))
    assert np.all(np.abs(degree - [0.5, 0.9]) < 1e-6), degree
    # Both forms agree where they meet, and the rate is the derivative of U (central difference).
    tf = np.array([SHORT_TIME_LIMIT * (1 - 1e-12), SHORT_TIME_LIMIT])
    degree, rate = degree_and_rate(tf)
    assert abs(degree[0] - degree[1]) < 1e-13 and abs(rate[0] - rate[1]) < 1e-10 * rate[1]
    tf = np.geomspace(1e-4, 5.0, 50)
    h = 1e-6 * tf
    up, _ = degree_and_rate(tf + h)
    down, _ = degree_and_rate(tf - h)
    _, rate = degree_and_rate(tf)
    assert np.all(np.abs((up - down) / (2 * h) - rate) < 1e-6 * rate)
    # Analytic Jacobian against central differences of the model.
    times = np.geomspace(6.0, 86_400.0, 40)
    model = CurveModel(times)
    p = np.array([0.015e-3, 0.5e-3, math.log(1.5 / YEAR), 0.02e-3])
    jac = model.jacobian(p)
    for j in range(4):
        step = 1e-6 * max(abs(p[j]), 1e-9)
        up, down = p.copy(), p.copy()
        up[j] += step
        down[j] -= step
        numeric = (CurveModel(times).settlement(up) - CurveModel(times).settlement(down)) / (
            2 * step
        )
        assert np.allclose(numeric, jac[:, j], rtol=1e-6, atol=1e-12 * max(1, abs(jac[:, j]).max()))
    assert abs(float(stdtrit(10, 0.975)) - float(student_t.ppf(0.975, 10))) < 1e-12


LAB_MINUTES = [0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440]
TRUTH = np.array([0.015e-3, 0.5e-3, math.log(1.5 / YEAR), 0.02e-3])
FIXED_START = np.array([0.0, 0.4e-3, math.log(1.0 / YEAR), 0.01e-3])


def invented_curve(readings):
    """INVENTED increment as in FullCurveBenchmark: 14-reading lab schedule or 8,640-reading
    logger (every 10 s for 24 h), 1e-6 m Gaussian noise from numpy default_rng(42)."""
    if readings == len(LAB_MINUTES):
        times = 60.0 * np.array(LAB_MINUTES)
    else:
        times = 10.0 * (np.arange(readings) + 1.0)
    clean = CurveModel(times).settlement(TRUTH)
    noise = 1e-6 * np.random.default_rng(42).standard_normal(readings)
    return times, clean + noise


def refinement_alone(times, settlements):
    """The refinement from one fixed start, unit weights (as refineAnalytic in the Java
    benchmark), same method, bounds and tolerances as in the fit."""
    model = CurveModel(times)
    lower, upper = bounds_for(times, DRAINAGE_PATH)
    return refine(model, settlements, np.ones(times.size), FIXED_START, lower, upper)


def refinement_alone_unbounded(times, settlements):
    """For reference: the same refinement with MINPACK's Levenberg-Marquardt (method 'lm', no
    bounds, as the Java benchmark's refinement passes none), the fastest scipy option here."""
    model = CurveModel(times)
    return least_squares(
        lambda p: model.settlement(p) - settlements,
        FIXED_START,
        jac=model.jacobian,
        method="lm",
        x_scale="jac",
        ftol=TOLERANCE,
        xtol=TOLERANCE,
        gtol=TOLERANCE,
    )


def measure(function, budget_seconds=6.0, least=30, most=300, floor=10):
    """Median and min wall time (ms) over repetitions after warm-up."""
    for _ in range(3):
        function()
    started = time.perf_counter()
    function()
    single = time.perf_counter() - started
    repetitions = int(min(most, max(least, budget_seconds / max(single, 1e-9))))
    if single * least > 4 * budget_seconds:  # slow: fewer, but never below `floor`
        repetitions = max(floor, int(4 * budget_seconds / single))
    samples = []
    for _ in range(repetitions):
        started = time.perf_counter()
        function()
        samples.append(1e3 * (time.perf_counter() - started))
    return statistics.median(samples), min(samples), repetitions


def main():
    print(f"python {platform.python_version()}  numpy {np.__version__}  scipy {scipy.__version__}")
    print(f"machine: {platform.machine()}, {platform.system()}; invented data, see docstring")
    self_checks()
    truth_cv = 1.5 / YEAR
    rows = []
    failures = []
    for readings in (14, 8640):
        times, settlements = invented_curve(readings)
        fit = full_curve_fit(times, settlements)
        refined = refinement_alone(times, settlements)
        fit_median, fit_min, fit_reps = measure(lambda: full_curve_fit(times, settlements))
        ref_median, ref_min, ref_reps = measure(lambda: refinement_alone(times, settlements))
        unbounded = refinement_alone_unbounded(times, settlements)
        lm_median, lm_min, _ = measure(lambda: refinement_alone_unbounded(times, settlements))
        ratio = fit["cv"] / truth_cv
        rows.append(
            (readings, fit_median, fit_min, fit_reps, ref_median, ref_min, ref_reps,
             fit["nfev"], fit["starts"], refined.nfev, ratio, lm_median, lm_min, unbounded.nfev,
             fit["cv_low"] / truth_cv, fit["cv_high"] / truth_cv)
        )
        # Correctness: c_v within a few percent of the truth, interval containing the fitted c_v,
        # and the refinement alone converging to the same c_v.
        if not abs(ratio - 1) < 0.03:
            failures.append(f"{readings} readings: fitted c_v / truth = {ratio:.4f}")
        if not fit["cv_low"] <= fit["cv"] <= fit["cv_high"]:
            failures.append(f"{readings} readings: interval does not contain the fitted c_v")
        for name, run in (("trf", refined), ("lm", unbounded)):
            if not (run.status > 0 and abs(math.exp(run.x[2]) / truth_cv - 1) < 0.03):
                failures.append(f"{readings} readings: {name} refinement from the fixed start failed")
    print()
    print("whole fit: weights, profile, trf from each start, covariance and interval (log-time"
          " weights)")
    print("refinement alone: from the fixed start, unit weights; trf with the fit's bounds, and"
          " for reference lm (MINPACK, no bounds)")
    print("readings | whole fit ms median / min (reps) | refinement trf ms median / min (reps)"
          " | refinement lm ms median / min | nfev fit (starts) | nfev trf / lm"
          " | fitted c_v / truth [95 % interval / truth]")
    for (readings, fmed, fmin, freps, rmed, rmin, rreps, nfev, starts, rnfev, ratio, lmed, lmin,
         lnfev, low, high) in rows:
        print(f"{readings:8d} | {fmed:8.2f} / {fmin:8.2f} ({freps:3d})     |"
              f" {rmed:8.2f} / {rmin:8.2f} ({rreps:3d})            |"
              f" {lmed:8.2f} / {lmin:8.2f}           | {nfev:7d} ({starts})       |"
              f" {rnfev:5d} / {lnfev:<5d} | {ratio:.4f} [{low:.4f}, {high:.4f}]")
    if failures:
        for failure in failures:
            print("CHECK FAILED:", failure, file=sys.stderr)
        sys.exit(1)
    print("checks passed: c_v within 3 % of the truth, interval contains the fitted c_v")


if __name__ == "__main__":
    main()
