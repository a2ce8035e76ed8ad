# Reference quantiles, upper tails and central halves of Student's t distribution for StudentTTest (the
# tail and the central half F - 1/2 at the double nearest each quantile, the column before).
# Tool: Python 3 with mpmath (mp.dps = 50). Upper tail Q_nu(t) = P(T > t) = I_x(nu/2, 1/2)/2 with
# x = nu/(nu + t^2) (the regularized incomplete beta function, mpmath.betainc); the quantile t_nu(P)
# with F_nu(t) = P solved by mpmath.findroot in ln t from the normal quantile. P is the double
# nearest the probability named, and 1 - P is taken exactly from that double (mpmath.mpf of a
# float is exact), so that a double-precision caller asks exactly what the table answers.
# Run: python3 student_t_quantiles.py > student-t-quantiles.csv
import mpmath as mp

mp.mp.dps = 50


def upper_tail(t, nu):
    x = nu / (nu + t * t)
    return mp.betainc(mp.mpf(nu) / 2, mp.mpf(1) / 2, 0, x, regularized=True) / 2


def central_half(t, nu):
    """F(t) - 1/2 = I_y(1/2, nu/2)/2 with y = t^2/(nu + t^2)."""
    y = t * t / (nu + t * t)
    return mp.betainc(mp.mpf(1) / 2, mp.mpf(nu) / 2, 0, y, regularized=True) / 2


print("degrees_of_freedom,probability,quantile,quantile_double,upper_tail_there,central_half_there")
for nu in [1, 2, 3, 4, 5, 7, 9, 10, 11, 30, 60, 99, 100, 101, 150, 396, 999, 1000, 8636, 100000]:
    for name in ["0.5000001", "0.6", "0.9", "0.95", "0.975", "0.995", "0.9995", "0.99999",
                 "1e-7", "1e-10", "1e-14"]:
        p = float(name) if name.startswith("0.") else 1.0 - float(name)
        q = 1 - mp.mpf(p)  # exact: p is a double
        start = mp.log(mp.sqrt(2) * mp.erfinv(1 - 2 * q))
        root = mp.exp(mp.findroot(lambda u: mp.log(upper_tail(mp.exp(u), nu) / q), start))
        t_double = float(root)
        print(f"{nu},{p!r},{mp.nstr(root, 25)},{t_double!r},"
              f"{mp.nstr(upper_tail(mp.mpf(t_double), nu), 25)},"
              f"{mp.nstr(central_half(mp.mpf(t_double), nu), 25)}")
