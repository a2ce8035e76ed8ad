# Reference quantiles of Student's t distribution, t_nu(P) with F_nu(t) = P, for FullCurveMethodTest.
# Tool: Python 3 with mpmath (mp.dps = 40): F_nu(t) = 1 - I_x(nu/2, 1/2)/2 with x = nu/(nu + t^2)
# (the regularized incomplete beta function, mpmath.betainc), solved by mpmath.findroot from the
# normal quantile. Run: python3 student_t_quantiles.py > student-t-quantiles.csv
import mpmath as mp

mp.mp.dps = 40


def cdf(t, nu):
    x = nu / (nu + t * t)
    return 1 - mp.betainc(mp.mpf(nu) / 2, mp.mpf(1) / 2, 0, x, regularized=True) / 2


print("degrees_of_freedom,probability,quantile")
for nu in [1, 2, 3, 5, 10, 30, 100, 1000, 8636, 100000]:
    for p in ["0.6", "0.9", "0.95", "0.975", "0.995", "0.9995"]:
        start = mp.sqrt(2) * mp.erfinv(2 * mp.mpf(p) - 1)
        root = mp.findroot(lambda t: cdf(t, nu) - mp.mpf(p), start)
        print(f"{nu},{p},{mp.nstr(root, 20)}")
