# Where a local polynomial of degree 5 puts the inflection of Terzaghi's exact curve: the bias that
# InflectionPointMethod's window correction removes, computed independently of the Java code.
# Tool: Python 3 with mpmath 1.3.0 (U(T) from the Fourier series, mp.dps = 30) and numpy
# (numpy.polynomial.polynomial.polyfit, least squares in double precision).
# Run: python3 inflection_window_bias.py
# Sampling as in InflectionPointMethodTest.windowCorrection (ExactCurves.logTimes): 80 readings a
# log10 cycle of T from 1e-3 to 5, c_v = 2 m^2/yr (Julian year), H_dr = 9.5 mm; x = log10(t / 1 s).
# For each half-width h the window (the readings within +/-h of the centre) is moved until the
# fitted polynomial's inflection (the zero of its second derivative nearest the centre, where the
# third is negative) lies at the centre; the bias is that centre minus the exact inflection.
# Output (used in InflectionPointMethodTest.windowCorrection):
#   h 0.4  bias -0.00323 cycle
#   h 0.8  bias -0.03571 cycle
#   h 1.0  bias -0.06505 cycle
import math

import mpmath as mp
import numpy as np
from numpy.polynomial import polynomial as P

mp.mp.dps = 30


def big(m):
    return mp.pi * (2 * m + 1) / 2


def U(T):
    return 1 - mp.nsum(lambda m: 2 / big(m) ** 2 * mp.e ** (-big(m) ** 2 * T), [0, mp.inf])


def inflection_condition(T):
    return mp.nsum(lambda m: (1 - big(m) ** 2 * T) * mp.e ** (-big(m) ** 2 * T), [0, mp.inf])


T_I = mp.findroot(inflection_condition, 0.4)
YEAR = 365.25 * 86400
H = 0.0095
CV = 2 / YEAR
first_t, last_t, per_decade = 1e-3, 5.0, 80
count = round(math.log10(last_t / first_t) * per_decade) + 1
times = [first_t * (last_t / first_t) ** (i / (count - 1)) * H * H / CV for i in range(count)]
x = np.array([math.log10(t) for t in times])
values = np.array([float(U(mp.mpf(t) * CV / (H * H))) for t in times])
x_inflection = math.log10(float(T_I) * H * H / CV)


def inflection(coefficients, half_width):
    second = P.polyder(coefficients, 2)
    third = P.polyder(coefficients, 3)
    roots = [r.real for r in P.polyroots(second) if abs(r.imag) < 1e-12 and abs(r.real) <= half_width]
    roots = [r for r in roots if P.polyval(r, third) < 0]
    return min(roots, key=abs)


for h in (0.4, 0.8, 1.0):
    centre = x_inflection
    for _ in range(100):
        inside = np.abs(x - centre) <= h
        u = x[inside] - centre
        coefficients = P.polyfit(u, values[inside], 5)
        move = inflection(coefficients, h)
        centre += move
        if abs(move) < 1e-12:
            break
    print(f"h {h}  bias {centre - x_inflection:+.5f} cycle")
