#!/usr/bin/env python3
"""Generate high-precision reference tables for Terzaghi's one-dimensional consolidation.

Uniform initial excess pore pressure u0, layer drained at both faces (or, equivalently, one
drained face and an impervious base at Z = 1). Z = z / H_dr, T = c_v t / H_dr^2.

Two independent representations of the exact solution are implemented:

* Fourier series, M = pi (2m + 1) / 2, m = 0, 1, 2, ...
    u/u0  = sum (2/M) sin(M Z) exp(-M^2 T)
    U     = 1 - sum (2/M^2) exp(-M^2 T)
    dU/dT = sum 2 exp(-M^2 T)
* Short-time (method of images) series, ierfc(x) = exp(-x^2)/sqrt(pi) - x erfc(x)
    U     = 2 sqrt(T/pi) + 4 sqrt(T) sum_{n>=1} (-1)^n ierfc(n / sqrt(T))
    dU/dT = (1 / sqrt(pi T)) (1 + 2 sum_{n>=1} (-1)^n exp(-n^2 / T))
    u/u0  = 1 - sum_{n>=0} (-1)^n [erfc((2n+Z)/(2 sqrt T)) + erfc((2n+2-Z)/(2 sqrt T))]

Each tabulated value comes from the representation that converges well at its T (image form
for T < 0.5, Fourier form for T >= 0.5). Wherever the other representation is also feasible
(every tabulated point with T >= 1e-6) it is evaluated too and the two must agree to 1e-35,
both absolutely and relative to the value; the script stops with an AssertionError otherwise.
The secondary representation is evaluated with extra working digits where it suffers
cancellation (image form at large T, where the result is ~exp(-pi^2 T / 4)), so that the
relative comparison is meaningful for small values as well.

Run from this folder:  python3 generate_reference.py
Output (beside this script): average_degree.csv, time_factor.csv, pore_pressure.csv.
Deterministic: fixed grids, no randomness, no timestamps.
"""

import platform
import sys
from pathlib import Path

import mpmath
from mpmath import mp, mpf

mp.dps = 50

SWITCH_T = mpf("0.5")  # primary: image form below, Fourier form at and above
FOURIER_MIN_T = mpf("1e-6")  # Fourier form also evaluated (cross-check) at T >= this
TOLERANCE = mpf("1e-35")  # required agreement of the two representations
DIGITS = 25  # significant digits written
INVERSION_RESIDUAL = mpf("1e-40")  # required relative residual of T(U) inversion

HERE = Path(__file__).resolve().parent

# Largest disagreements seen, per quantity: name -> [max absolute, max relative, comparisons]
DISAGREEMENT = {}


def _eps():
    """Truncation threshold for series terms at the current working precision."""
    return mpf(10) ** (-(mp.dps + 15))


def _ierfc(x):
    """First repeated integral of erfc, with guard digits against the cancellation."""
    extra = 2 * int(mpmath.log10(x + 2)) + 10
    with mp.workdps(mp.dps + extra):
        x = +x
        return mpmath.exp(-x * x) / mpmath.sqrt(mp.pi) - x * mpmath.erfc(x)


# ---------------------------------------------------------------- average degree U(T)


def average_fourier(t):
    """(U, 1 - U, dU/dT) from the Fourier series."""
    eps = _eps()
    complement = mpf(0)
    derivative = mpf(0)
    m = 0
    while True:
        big_m = mp.pi * (2 * m + 1) / 2
        e = mpmath.exp(-big_m * big_m * t)
        complement += 2 * e / (big_m * big_m)
        derivative += 2 * e
        if 2 * e < eps:
            break
        m += 1
    return 1 - complement, complement, derivative


def average_image(t):
    """(U, 1 - U, dU/dT) from the short-time (image) series."""
    eps = _eps()
    s = mpmath.sqrt(t)
    u = 2 * s / mpmath.sqrt(mp.pi)
    d = mpf(1)
    n = 1
    while True:
        envelope = mpmath.exp(-mpf(n) * n / t)
        if 4 * s * envelope < eps and 2 * envelope < eps:
            break
        sign = -1 if n % 2 else 1
        u += sign * 4 * s * _ierfc(n / s)
        d += sign * 2 * envelope
        n += 1
    return u, 1 - u, d / mpmath.sqrt(mp.pi * t)


def _extra_digits_image(t):
    """Digits lost by the image form to cancellation when the result is ~exp(-pi^2 T/4)."""
    if t < SWITCH_T:
        return 10
    return 10 + int(mpmath.ceil(mp.pi**2 * t / 4 / mpmath.log(10)))


def _record(name, primary, secondary):
    diff = abs(primary - secondary)
    rel = diff / abs(primary) if primary != 0 else diff
    entry = DISAGREEMENT.setdefault(name, [mpf(0), mpf(0), 0])
    entry[0] = max(entry[0], diff)
    entry[1] = max(entry[1], rel)
    entry[2] += 1
    return diff, rel


def _check(name, where, primary, secondary):
    diff, rel = _record(name, primary, secondary)
    assert diff <= TOLERANCE and rel <= TOLERANCE, (
        f"{name} at {where}: representations disagree by {mpmath.nstr(diff, 5)} "
        f"(relative {mpmath.nstr(rel, 5)}): {primary} vs {secondary}"
    )


def average_primary(t):
    """(U, 1 - U, dU/dT) from the representation that converges well at T (no check)."""
    return average_image(t) if t < SWITCH_T else average_fourier(t)


def average_checked(t):
    """Primary (U, 1 - U, dU/dT), cross-checked against the other representation."""
    primary = average_primary(t)
    if t >= FOURIER_MIN_T:
        if t < SWITCH_T:
            with mp.workdps(mp.dps + 10):
                secondary = average_fourier(t)
        else:
            with mp.workdps(mp.dps + _extra_digits_image(t)):
                secondary = average_image(t)
        for name, p, s in zip(("U", "1-U", "dU/dT"), primary, secondary):
            _check(name, f"T={t}", p, s)
    else:
        # Image corrections are below exp(-1/T) <= exp(-1e6) here: U = 2 sqrt(T/pi) exactly
        # to far beyond the working precision (a closed-form statement, checked here to
        # rounding).
        leading = 2 * mpmath.sqrt(t / mp.pi)
        assert abs(primary[0] - leading) <= mpf("1e-45") * leading, f"U at T={t}"
    return primary


# ---------------------------------------------------------------- inversion T(U)


def time_factor_for(u_target):
    """T with U(T) = u_target, by mpmath.findroot (Newton) in y = ln T on the exact function.

    For U > 0.5 the equation is written for the complement 1 - U to keep precision.
    """
    u_target = mpf(u_target)
    assert 0 < u_target < 1
    if u_target <= mpf("0.5"):
        target = u_target
        x0 = mp.pi / 4 * u_target**2

        def f(y):
            return (average_primary(mpmath.exp(y))[0] - target) / target

        def df(y):
            t = mpmath.exp(y)
            return average_primary(t)[2] * t / target

    else:
        target = 1 - u_target
        x0 = -4 / mp.pi**2 * mpmath.log(mp.pi**2 * target / 8)

        def f(y):
            return (average_primary(mpmath.exp(y))[1] - target) / target

        def df(y):
            t = mpmath.exp(y)
            return -average_primary(t)[2] * t / target

    y = mpmath.findroot(
        f, mpmath.log(x0), solver="newton", df=df, tol=mpf(10) ** (-2 * (mp.dps - 5))
    )
    t = mpmath.exp(y)
    values = average_checked(t)
    if u_target <= mpf("0.5"):
        residual = abs(values[0] - target) / target
    else:
        residual = abs(values[1] - target) / target
    assert residual <= INVERSION_RESIDUAL, f"inversion residual {residual} at U={u_target}"
    entry = DISAGREEMENT.setdefault("T(U) residual", [mpf(0), mpf(0), 0])
    entry[1] = max(entry[1], residual)
    entry[2] += 1
    return t


# ---------------------------------------------------------------- pore pressure u/u0


def pore_fourier(z, t):
    eps = _eps()
    total = mpf(0)
    m = 0
    while True:
        big_m = mp.pi * (2 * m + 1) / 2
        envelope = 2 / big_m * mpmath.exp(-big_m * big_m * t)
        total += envelope * mpmath.sin(big_m * z)
        if envelope < eps:
            break
        m += 1
    return total


def pore_image(z, t):
    eps = _eps()
    two_s = 2 * mpmath.sqrt(t)
    total = mpf(0)
    n = 0
    while True:
        if n > 0 and 2 * mpmath.exp(-mpf(n) * n / t) < eps:
            break
        term = mpmath.erfc((2 * n + z) / two_s) + mpmath.erfc((2 * n + 2 - z) / two_s)
        total += term if n % 2 == 0 else -term
        n += 1
    return 1 - total


def pore_checked(z, t):
    z = mpf(z)
    t = mpf(t)
    primary = pore_image(z, t) if t < SWITCH_T else pore_fourier(z, t)
    if t >= FOURIER_MIN_T:
        if t < SWITCH_T:
            with mp.workdps(mp.dps + 10):
                secondary = pore_fourier(z, t)
        else:
            with mp.workdps(mp.dps + _extra_digits_image(t)):
                secondary = pore_image(z, t)
    else:
        secondary = None
    if z == 0 or z == 2:
        # Drained face: u = 0 exactly (boundary condition); the series give rounding noise.
        assert abs(primary) <= mpf("1e-45"), f"u/u0 at drained face Z={z}, T={t}: {primary}"
        if secondary is not None:
            assert abs(secondary) <= mpf("1e-45"), f"u/u0 at Z={z}, T={t}: {secondary}"
        return mpf(0)
    if secondary is not None:
        _check("u/u0", f"Z={z}, T={t}", primary, secondary)
    return primary


# ---------------------------------------------------------------- published checks


def _assert_digits(name, value, expected):
    """value must round to the decimal string expected (half a unit in its last place)."""
    decimals = len(expected.split(".")[1]) if "." in expected else 0
    half_ulp = mpf(5) * mpf(10) ** (-(decimals + 1))
    assert abs(value - mpf(expected)) <= half_ulp, f"{name}: {value} vs {expected}"


def facts_checks():
    """Values from /work/shared/design/FACTS.md (Terzaghi section), to the digits given."""
    for t, u in (("0.01", "0.1128379167"), ("0.1", "0.3568234005"), ("0.5", "0.7639503307"),
                 ("1", "0.931260"), ("2", "0.994170")):
        _assert_digits(f"U({t})", average_checked(mpf(t))[0], u)
    for u, t in (("0.1", "0.0078540"), ("0.2", "0.0314159"), ("0.3", "0.0706858"),
                 ("0.4", "0.1256731"), ("0.5", "0.1967307"), ("0.6", "0.286399"),
                 ("0.7", "0.402850"), ("0.8", "0.567164"), ("0.9", "0.848085"),
                 ("0.95", "1.129007"), ("0.99", "1.781288")):
        _assert_digits(f"T({u})", time_factor_for(mpf(u)), t)
    for z, t, u in (("1", "0.2", "0.7723116"), ("1", "0.5", "0.3707774"),
                    ("1", "1", "0.1079770"), ("0.5", "0.2", "0.5531759")):
        _assert_digits(f"u/u0(Z={z}, T={t})", pore_checked(mpf(z), mpf(t)), u)
    # dU/dT against numerical differentiation of U (a third, independent route).
    for t in ("0.001", "0.05", "0.3", "0.7", "3"):
        t = mpf(t)
        numeric = mpmath.diff(lambda x: average_primary(x)[0], t)
        analytic = average_checked(t)[2]
        assert abs(numeric - analytic) <= mpf("1e-30") * analytic, f"dU/dT at T={t}"


# ---------------------------------------------------------------- output


def fmt(x):
    return mpmath.nstr(x, DIGITS, strip_zeros=False)


def header(title, formula_lines):
    tolerance = mpmath.nstr(TOLERANCE, 3)
    lines = [
        f"# {title}",
        "# Terzaghi one-dimensional consolidation, uniform initial excess pore pressure,",
        "# doubly drained layer; T = c_v t / H_dr^2, Z = z / H_dr.",
    ]
    lines += [f"# {line}" for line in formula_lines]
    lines += [
        "# Primary representation: image (short-time) series for T < 0.5, Fourier series for",
        "# T >= 0.5; series summed until terms fall below 1e-65.",
        f"# Cross-check: at every row with T >= 1e-6 the other representation was evaluated and"
        f" agreed within {tolerance}",
        "# (absolute and relative). Below T = 1e-6 only the image form is used (its correction",
        "# terms are below exp(-1e6)).",
        f"# Tool: mpmath {mpmath.__version__}, Python {platform.python_version()};"
        f" precision mp.dps = {mp.dps}; values written to {DIGITS} significant digits.",
        "# Inputs written with repr(float(x)); outputs computed at exactly that double.",
        "# Produced by: python3 generate_reference.py (run in this folder).",
    ]
    return lines


def write(name, lines):
    (HERE / name).write_text("\n".join(lines) + "\n", encoding="ascii")


def log_grid(start_exp, per_decade, stop):
    """10^(start_exp + k/per_decade) as doubles, k = 0, 1, ... while <= stop, plus stop."""
    values = []
    k = 0
    while True:
        x = mpf(10) ** (mpf(start_exp) + mpf(k) / per_decade)
        if x > stop:
            break
        values.append(float(x))
        k += 1
    values.append(float(stop))
    return values


def average_degree_table():
    ts = set(log_grid(-12, 40, 100))
    ts.update(float(mpf(x)) for x in ("0.01", "0.1", "0.5", "1", "2"))
    for u in ("0.1", "0.2", "0.3", "0.4", "0.5", "0.6", "0.7", "0.8", "0.9", "0.95", "0.99"):
        ts.add(float(time_factor_for(mpf(u))))
    lines = header(
        "Average degree of consolidation U(T), its complement 1 - U(T) and dU/dT.",
        [
            "U = 1 - sum_m (2/M^2) exp(-M^2 T), M = pi (2m+1)/2;"
            " dU/dT = sum_m 2 exp(-M^2 T);",
            "short time: U = 2 sqrt(T/pi) + 4 sqrt(T) sum_{n>=1} (-1)^n ierfc(n/sqrt(T)),"
            " dU/dT = (1 + 2 sum_{n>=1} (-1)^n exp(-n^2/T)) / sqrt(pi T).",
            "Grid: 40 points per decade 1e-12..100, the T values 0.01, 0.1, 0.5, 1, 2,"
            " and T at U = 10 %..90 %, 95 %, 99 %.",
        ],
    )
    lines.append("time_factor,average_degree,complement,derivative")
    for t in sorted(ts):
        u, c, d = average_checked(mpf(t))
        lines.append(f"{t!r},{fmt(u)},{fmt(c)},{fmt(d)}")
    write("average_degree.csv", lines)
    return len(ts)


def time_factor_table():
    us = {float(mpf(10) ** -k) for k in range(1, 9)}
    us.update(float(mpf(i) / 100) for i in range(1, 100))
    us.update(float(1 - mpf(10) ** -k) for k in range(3, 13))
    lines = header(
        "Time factor T for a given average degree of consolidation U (inverse of U(T)).",
        [
            "U = 1 - sum_m (2/M^2) exp(-M^2 T), M = pi (2m+1)/2, and its short-time form"
            " (see average_degree.csv).",
            "Inverted with mpmath.findroot (Newton, in ln T) on the exact function; the"
            " complement 1 - U is matched for U > 0.5.",
            f"Inversion residual |U(T) - U| / U (or on 1 - U) verified <="
            f" {mpmath.nstr(INVERSION_RESIDUAL, 3)}.",
            "Grid: U = 1e-8..1e-1 (decades), 0.01..0.99 step 0.01, 1 - 1e-k for k = 3..12.",
        ],
    )
    lines.append("average_degree,time_factor")
    for u in sorted(us):
        lines.append(f"{u!r},{fmt(time_factor_for(mpf(u)))}")
    write("time_factor.csv", lines)
    return len(us)


def pore_pressure_table():
    zs = ("0", "0.05", "0.1", "0.25", "0.5", "0.75", "1", "1.25", "1.5", "1.9", "2")
    points = {(float(mpf(z)), t) for z in zs for t in log_grid(-6, 10, 100)}
    points.update((float(mpf(z)), float(mpf(t)))
                  for z, t in (("1", "0.2"), ("1", "0.5"), ("1", "1"), ("0.5", "0.2")))
    lines = header(
        "Excess pore pressure ratio u/u0 at depth ratio Z (from a drained face) and time T.",
        [
            "u/u0 = sum_m (2/M) sin(M Z) exp(-M^2 T), M = pi (2m+1)/2;",
            "short time: u/u0 = 1 - sum_{n>=0} (-1)^n [erfc((2n+Z)/(2 sqrt T))"
            " + erfc((2n+2-Z)/(2 sqrt T))].",
            "Z = 0 and Z = 2 are drained faces: u/u0 = 0 exactly (the series agree to"
            " rounding).",
            "Grid: Z in {0, 0.05, 0.1, 0.25, 0.5, 0.75, 1, 1.25, 1.5, 1.9, 2} x T 10 per decade"
            " 1e-6..100,",
            "plus (Z, T) = (1, 0.2), (1, 0.5), (1, 1), (0.5, 0.2).",
        ],
    )
    lines.append("depth_ratio,time_factor,pore_pressure_ratio")
    for z, t in sorted(points):
        lines.append(f"{z!r},{t!r},{fmt(pore_checked(mpf(z), mpf(t)))}")
    write("pore_pressure.csv", lines)
    return len(points)


def main():
    facts_checks()
    rows = {
        "average_degree.csv": average_degree_table(),
        "time_factor.csv": time_factor_table(),
        "pore_pressure.csv": pore_pressure_table(),
    }
    for name, count in rows.items():
        print(f"{name}: {count} data rows")
    print("Largest disagreement between representations (absolute, relative, comparisons):")
    for name, (a, r, n) in DISAGREEMENT.items():
        print(f"  {name}: {mpmath.nstr(a, 3)}, {mpmath.nstr(r, 3)}, {n}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
