# Reference constants of the further c_v methods, from Terzaghi's exact Fourier series.
# Tool: Python 3 with mpmath 1.3.0, mp.dps = 30. Run: python3 further_constants.py
# Output (used in InflectionPointMethodTest and RectangularHyperbolaMethodTest):
#   T60 0.286399311746525812296669463606   T90 0.848085408046025543348887240002
#   rectangular hyperbola, U uniform over 60-90 %: M 0.820644736233343365526084540081
#                                                  C 0.244087790253974910580606505781
#   (for comparison: T uniform M 0.821158916042763787 C 0.243809887374188805;
#    U at 1 % steps M 0.821438770419611616 C 0.243695112535404703)
#   inflection of U against ln T: T_I 0.404176434311852942437663794758
#                                 U_I 0.700980207288844596861753960983
#                                 slope per log10 cycle 0.686844947688048871449223658312
import mpmath as mp

mp.mp.dps = 30


def big(m):
    return mp.pi * (2 * m + 1) / 2


def U(T):
    return 1 - mp.nsum(lambda m: 2 / big(m) ** 2 * mp.e ** (-big(m) ** 2 * T), [0, mp.inf])


def dU(T):
    return 2 * mp.nsum(lambda m: mp.e ** (-big(m) ** 2 * T), [0, mp.inf])


def T_of(u):
    return mp.findroot(lambda T: U(T) - u, 0.5)


T60, T90 = T_of(0.6), T_of(0.9)
print("T60", T60, "T90", T90)


def line_over(weight_integral):
    S0 = weight_integral(lambda T: 1)
    S1 = weight_integral(lambda T: T)
    S2 = weight_integral(lambda T: T * T)
    Y0 = weight_integral(lambda T: T / U(T))
    Y1 = weight_integral(lambda T: T * T / U(T))
    det = S0 * S2 - S1 * S1
    return (S0 * Y1 - S1 * Y0) / det, (S2 * Y0 - S1 * Y1) / det


print("U uniform M, C", line_over(lambda f: mp.quad(lambda u: f(T_of(u)), [0.6, 0.9])))
print("T uniform M, C", line_over(lambda f: mp.quad(f, [T60, T90])))
print("U 1 % steps M, C",
      line_over(lambda f: sum(f(T_of(mp.mpf(60 + k) / 100)) for k in range(31))))

# Inflection of U against x = ln T: d/dT [T U'(T)] = 0.
TI = mp.findroot(lambda T: mp.diff(lambda x: x * dU(x), T), 0.4)
print("T_I", TI, "U_I", U(TI), "slope per log10 cycle", mp.log(10) * TI * dU(TI))
