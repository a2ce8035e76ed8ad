package org.oedometry.theory;

import org.apache.commons.math3.special.Erf;

/**
 * Terzaghi's one-dimensional consolidation with a uniform initial excess pore pressure: the average
 * degree of consolidation U(T), its inverse T(U), its derivative dU/dT and the local excess pore
 * pressure ratio u/u<sub>0</sub>(Z, T).
 *
 * <p>The time factor is T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup> and the depth ratio Z = z
 * / H<sub>dr</sub>, z measured from a drained face. Assumptions of the theory: saturated and
 * homogeneous soil, vertical flow, incompressible grains and water, constant c<sub>v</sub>, a
 * linear stress-strain relation over the increment, and uniform initial excess pore pressure.
 *
 * <h2>Two representations</h2>
 *
 * With M = &pi;(2m+1)/2, the Fourier series are
 *
 * <pre>
 *   1 - U   = sum_{m&gt;=0} (2/M^2) exp(-M^2 T)
 *   dU/dT   = sum_{m&gt;=0} 2 exp(-M^2 T)
 *   u/u0    = sum_{m&gt;=0} (2/M) sin(M Z) exp(-M^2 T)
 * </pre>
 *
 * and the short-time (image) forms, obtained by the method of images (or Poisson summation), are
 *
 * <pre>
 *   U       = 2 sqrt(T/pi) + 4 sqrt(T) sum_{n&gt;=1} (-1)^n ierfc(n / sqrt T)
 *   dU/dT   = (1 + 2 sum_{n&gt;=1} (-1)^n exp(-n^2/T)) / sqrt(pi T)
 *   u/u0    = 1 - sum_{n&gt;=0} (-1)^n [erfc((2n+Z)/(2 sqrt T)) + erfc((2n+2-Z)/(2 sqrt T))]
 * </pre>
 *
 * with ierfc(x) = exp(-x<sup>2</sup>)/&radic;&pi; - x erfc(x).
 *
 * <p><b>Switch point.</b> Both forms are evaluated on either side of {@link #SHORT_TIME_LIMIT} T
 * <sub>s</sub> = 1/36. Below it the first image correction of U, 4 &radic;T ierfc(6) &asymp; 1.2 x
 * 10<sup>-18</sup> at T<sub>s</sub>, is below 0.06 units in the last place of U, so U = 2
 * &radic;(T/&pi;) holds to double precision and costs one square root; dU/dT keeps its first
 * correction (1 - 2 e<sup>-1/T</sup>), which reaches 2 ulp at T<sub>s</sub>. At and above
 * T<sub>s</sub> the Fourier terms decay like q^((2m+1)^2) with q = exp(-&pi;<sup>2</sup>T/4) &le;
 * 0.934; all of them are generated from the single exponential q by the recurrence q^((2m+3)^2) =
 * q^((2m+1)^2) q<sup>8(m+1) </sup>, q<sup>8(m+1)</sup> = q<sup>8m</sup> q<sup>8</sup>, and the sum
 * stops when a term falls below 2<sup>-56</sup> of the partial sum (at most 13 terms at
 * T<sub>s</sub>, 3 terms at T = 1, 1 term above T &asymp; 4). The pore pressure uses the same
 * switch: below it, 2 to 4 erfc terms (from Commons Math {@link Erf#erfc(double)}) of the image
 * form, each sum stopped when the erfc argument exceeds 6 (erfc(6) &lt; 2.2 x 10<sup>-17</sup>, the
 * series alternates so the truncation error is below the first omitted term); above it the Fourier
 * series with one sine a term.
 *
 * <h2>Accuracy</h2>
 *
 * Guaranteed bounds, with the largest error measured against a 50-digit mpmath table in brackets
 * (test resources, generator committed; the tests assert bounds about twice the measured ones):
 * {@link #averageDegree(double)} absolute error below 1 x 10<sup>-15</sup> for every T &ge; 0 [2.6
 * x 10<sup>-16</sup>]; {@link #remainingFraction(double)} relative error below 1 x 10<sup>-14</sup>
 * up to T = 20 [5.2 x 10<sup>-15</sup>]; {@link #averageDegreeDerivative(double)} relative error
 * below 1 x 10<sup>-14</sup> up to T = 20 [5.1 x 10<sup>-15</sup>]; {@link #timeFactor(double)}
 * relative error below 1 x 10<sup>-13</sup> for U in [10<sup>-8</sup>, 1 - 10<sup>-12</sup>] [2.0 x
 * 10<sup>-15</sup>]; {@link #porePressureRatio(double, double)} absolute error below 1 x
 * 10<sup>-13</sup> for T &ge; 10<sup>-6</sup> [4.9 x 10<sup>-16</sup>]. Relative errors of 1 - U
 * and dU/dT grow slowly with T (the exponent &pi;<sup>2</sup>T/4 carries a rounding error of its
 * own).
 *
 * <p>All methods are pure functions of their arguments: thread-safe, allocation-free and
 * deterministic. Results feed engineering decisions and must be reviewed by a qualified engineer;
 * local codes and standards govern.
 *
 * <p>References: K. Terzaghi, <i>Erdbaumechanik auf bodenphysikalischer Grundlage</i>, 1925; H. S.
 * Carslaw and J. C. Jaeger, <i>Conduction of Heat in Solids</i>, 2nd ed., 1959, &sect;3.3 (image
 * and Fourier solutions of the slab problem).
 */
public final class Terzaghi {

  /**
   * Time factor below which the short-time (image) forms are used, T<sub>s</sub> = 1/36; see the
   * class description for why this value.
   */
  public static final double SHORT_TIME_LIMIT = 1.0 / 36.0;

  /** Published rounded T at U = 50 %, 0.197, as printed in standard tables (e.g. ASTM D2435). */
  public static final double ROUNDED_TIME_FACTOR_50 = 0.197;

  /** Published rounded T at U = 90 %, 0.848, as printed in standard tables (e.g. ASTM D2435). */
  public static final double ROUNDED_TIME_FACTOR_90 = 0.848;

  private static final double PI_SQUARED_OVER_4 = Math.PI * Math.PI / 4.0;
  private static final double EIGHT_OVER_PI_SQUARED = 8.0 / (Math.PI * Math.PI);
  private static final double TWO_OVER_SQRT_PI = 2.0 / Math.sqrt(Math.PI);
  private static final double FOUR_OVER_PI = 4.0 / Math.PI;
  private static final double TWO_OVER_PI = 2.0 / Math.PI;

  /** The largest double below 1, returned for U where 1 - U is below half an ulp of 1. */
  private static final double LARGEST_BELOW_ONE = 1.0 - 0x1.0p-53;

  /** A Fourier term below this fraction of the partial sum ends the series. */
  private static final double SERIES_TOLERANCE = 0x1.0p-56;

  /**
   * Below this q = exp(-&pi;<sup>2</sup>T/4) (T &gt; 1.97) every Fourier term after the first is
   * below {@link #SERIES_TOLERANCE} of it (q<sup>8</sup> &lt; 2<sup>-56</sup>), so the series is
   * its first term (bit for bit the same as summing the series for U, 1 - U and dU/dT; within the
   * tolerance for u/u<sub>0</sub>); computing q<sup>8</sup> would otherwise run into subnormal
   * numbers for T above about 35, which are very slow on common processors.
   */
  private static final double SINGLE_TERM_LIMIT = 0x1.0p-7;

  /**
   * From this T on the exact U is so close to 1 that {@link #averageDegree(double)} returns the
   * largest double below 1 whatever the series gives: (8/&pi;<sup>2</sup>) exp(-&pi;<sup>2</sup> 16
   * /4) = 5.8 x 10<sup>-18</sup>, below 2<sup>-54</sup>, so 1 - U rounds to 1 and is held below it.
   * The exponential is not computed there. Package access for {@link ConsolidationCurveModel}.
   */
  static final double SETTLED_TIME_FACTOR = 16.0;

  /**
   * Below this T (1/38.5) the image correction of dU/dT, 2 e<sup>-1/T</sup>, is below 2<sup>-54
   * </sup>: 2 e<sup>-38.5</sup> = 3.9 x 10<sup>-17</sup> (2<sup>-54</sup> = 5.55 x
   * 10<sup>-17</sup>).
   */
  private static final double IMAGE_CORRECTION_NEGLIGIBLE = 1.0 / 38.5;

  /** erfc(x) &lt; 2.2e-17 above this argument: image terms beyond it are dropped. */
  private static final double ERFC_NEGLIGIBLE_ARGUMENT = 6.0;

  /** Newton iterations allowed in {@link #timeFactor(double)}; 3 to 6 are needed in practice. */
  private static final int MAX_NEWTON_ITERATIONS = 50;

  /** U at the switch point, 2 sqrt(T_s / pi): below it the inverse is closed form. */
  private static final double SHORT_TIME_DEGREE_LIMIT = TWO_OVER_SQRT_PI * Math.sqrt(1.0 / 36.0);

  /**
   * Exact time factor at U = 50 %, computed by {@link #timeFactor(double)}: T<sub>50</sub> =
   * 0.19673 (published rounded value {@value #ROUNDED_TIME_FACTOR_50}; using the rounded value
   * makes c<sub>v</sub> 0.137 % high).
   */
  public static final double TIME_FACTOR_50 = timeFactor(0.5);

  /**
   * Exact time factor at U = 90 %, computed by {@link #timeFactor(double)}: T<sub>90</sub> =
   * 0.84809 (published rounded value {@value #ROUNDED_TIME_FACTOR_90}).
   */
  public static final double TIME_FACTOR_90 = timeFactor(0.9);

  private Terzaghi() {}

  /**
   * Average degree of consolidation U(T) of a layer under a uniform initial excess pore pressure.
   *
   * <p>Special cases: T = 0 gives 0; T = +&infin; gives 1; below T = 1/36 the result is 2
   * &radic;(T/&pi;) exactly (to double precision); above T &asymp; 15, where the exact U is within
   * half an ulp of 1, the result is the largest double below 1, so that every finite T maps into
   * [0, 1) and {@link #timeFactor(double)} accepts it. Absolute error below 1 x 10<sup>-15</sup>;
   * use {@link #remainingFraction(double)} for the relative accuracy of 1 - U near 1.
   *
   * @param timeFactor T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>, dimensionless, &ge; 0
   *     (+&infin; allowed)
   * @return U in [0, 1) for finite T (1 for T = +&infin;), dimensionless
   * @throws IllegalArgumentException if T is negative or NaN
   */
  public static double averageDegree(double timeFactor) {
    requireTimeFactor(timeFactor);
    if (timeFactor < SHORT_TIME_LIMIT) {
      return TWO_OVER_SQRT_PI * Math.sqrt(timeFactor);
    }
    if (timeFactor == Double.POSITIVE_INFINITY) {
      return 1.0;
    }
    if (timeFactor >= SETTLED_TIME_FACTOR) {
      // The same bits as the line below, without its exponential.
      return LARGEST_BELOW_ONE;
    }
    // Above T = 15 the exact U lies within half an ulp of 1: keep the result below 1.
    return Math.min(1.0 - remainingFractionSeries(timeFactor), LARGEST_BELOW_ONE);
  }

  /**
   * Fraction of primary consolidation still to come, 1 - U(T), computed directly so that it keeps
   * its relative accuracy as U approaches 1 (1 - U = (8/&pi;<sup>2</sup>) exp(-&pi;<sup>2</sup>
   * T/4) to within 10<sup>-9</sup> relative above T = 2).
   *
   * @param timeFactor T, dimensionless, &ge; 0 (+&infin; allowed)
   * @return 1 - U in (0, 1], dimensionless; 0 only for T = +&infin; or where it underflows (T &gt;
   *     about 290)
   * @throws IllegalArgumentException if T is negative or NaN
   */
  public static double remainingFraction(double timeFactor) {
    requireTimeFactor(timeFactor);
    if (timeFactor < SHORT_TIME_LIMIT) {
      return 1.0 - TWO_OVER_SQRT_PI * Math.sqrt(timeFactor);
    }
    return remainingFractionSeries(timeFactor);
  }

  /**
   * Rate of consolidation dU/dT, the derivative of {@link #averageDegree(double)}, used by
   * least-squares fits for their analytic Jacobian (dU/dc<sub>v</sub> = (t/H<sub>dr</sub>
   * <sup>2</sup>) dU/dT). Relative error below 1 x 10<sup>-14</sup> up to T = 20.
   *
   * @param timeFactor T, dimensionless, &gt; 0 (+&infin; allowed, giving 0)
   * @return dU/dT &gt; 0 for finite T, dimensionless; behaves like 1/&radic;(&pi;T) as T &rarr; 0
   * @throws IllegalArgumentException if T is not &gt; 0 (the derivative is unbounded at T = 0) or
   *     NaN
   */
  public static double averageDegreeDerivative(double timeFactor) {
    if (!(timeFactor > 0)) {
      throw new IllegalArgumentException(
          Messages.format(
              "time factor T (%s) must be > 0 for dU/dT (unbounded at T = 0)", timeFactor));
    }
    if (timeFactor < SHORT_TIME_LIMIT) {
      return shortTimeRate(timeFactor);
    }
    if (timeFactor == Double.POSITIVE_INFINITY) {
      return 0.0;
    }
    // 2 sum q^((2m+1)^2), terms from one exponential by recurrence.
    final double q = Math.exp(-PI_SQUARED_OVER_4 * timeFactor);
    if (q < SINGLE_TERM_LIMIT) {
      return 2.0 * q;
    }
    final double q8 = q * q * q * q * q * q * q * q;
    double power = q; // q^((2m+1)^2)
    double step = q8; // q^(8(m+1))
    double sum = 0.0;
    while (power > SERIES_TOLERANCE * sum || sum == 0.0) {
      sum += power;
      power *= step;
      step *= q8;
      if (power == 0.0) {
        break;
      }
    }
    return 2.0 * sum;
  }

  /**
   * Time factor T at which the average degree of consolidation reaches U: the inverse of {@link
   * #averageDegree(double)}.
   *
   * <p>Below U = 2 &radic;(1/(36&pi;)) &asymp; 0.188 the closed form T = &pi; U<sup>2</sup>/4 is
   * exact to double precision. Above it, Newton's method on the exact function: on U(T) in the
   * variable &radic;T up to U = 0.5 (start &pi;U<sup>2</sup>/4, 1.3 % low at 60 %), and on ln(1 -
   * U(T)) above (start from the one-term series T = (4/&pi;<sup>2</sup>) ln(8 / (&pi;<sup>2</sup>
   * (1 - U)))), which keeps full relative accuracy as U approaches 1. Relative error below 1 x
   * 10<sup>-13</sup> for U in [10<sup>-8</sup>, 1 - 10<sup>-12</sup>].
   *
   * @param averageDegree U, dimensionless, 0 &le; U &lt; 1
   * @return T &ge; 0, dimensionless
   * @throws IllegalArgumentException if U is NaN, negative, or &ge; 1 (U = 1 is reached only as T
   *     &rarr; &infin;)
   */
  public static double timeFactor(double averageDegree) {
    if (!(averageDegree >= 0.0 && averageDegree < 1.0)) {
      throw new IllegalArgumentException(
          Messages.format(
              "average degree of consolidation U (%s) must be >= 0 and < 1", averageDegree));
    }
    if (averageDegree < SHORT_TIME_DEGREE_LIMIT) {
      return averageDegree * averageDegree / FOUR_OVER_PI;
    }
    if (averageDegree <= 0.5) {
      return timeFactorEarly(averageDegree);
    }
    return timeFactorLate(averageDegree);
  }

  /**
   * Excess pore pressure ratio u/u<sub>0</sub> at depth ratio Z and time factor T.
   *
   * <p>Z = z / H<sub>dr</sub> with z measured from a drained face. For a doubly drained layer Z
   * runs from 0 (top face) through 1 (mid-plane) to 2 (bottom face) and the result is symmetric
   * about Z = 1 (computed at min(Z, 2 - Z), so the symmetry is exact). For a singly drained layer
   * use 0 &le; Z &le; 1 with the impervious base at Z = 1. Limits: 0 on a drained face (Z = 0 or 2)
   * for every T; 1 inside the layer at T = 0; 0 at T = +&infin;. Absolute error below 1 x 10
   * <sup>-13</sup> for T &ge; 10<sup>-6</sup>.
   *
   * @param depthRatio Z = z / H<sub>dr</sub>, dimensionless, 0 &le; Z &le; 2
   * @param timeFactor T, dimensionless, &ge; 0 (+&infin; allowed)
   * @return u/u<sub>0</sub> in [0, 1], dimensionless
   * @throws IllegalArgumentException if Z is outside [0, 2] or NaN, or T is negative or NaN
   */
  public static double porePressureRatio(double depthRatio, double timeFactor) {
    if (!(depthRatio >= 0.0 && depthRatio <= 2.0)) {
      throw new IllegalArgumentException(
          Messages.format("depth ratio Z (%s) must be >= 0 and <= 2", depthRatio));
    }
    requireTimeFactor(timeFactor);
    final double z = Math.min(depthRatio, 2.0 - depthRatio);
    if (z == 0.0 || timeFactor == Double.POSITIVE_INFINITY) {
      return 0.0;
    }
    if (timeFactor == 0.0) {
      return 1.0;
    }
    final double ratio;
    if (timeFactor < SHORT_TIME_LIMIT) {
      ratio = porePressureImage(z, timeFactor);
    } else {
      ratio = porePressureFourier(z, timeFactor);
    }
    return Math.min(1.0, Math.max(0.0, ratio));
  }

  /**
   * dU/dT below {@link #SHORT_TIME_LIMIT}: (1 - 2 e<sup>-1/T</sup>)/&radic;(&pi;T), whose
   * correction 2 e<sup>-1/T</sup> rounds away against 1 (it is at most 2<sup>-54</sup>, half an ulp
   * below 1, and 1 - x then rounds to 1) below {@link #IMAGE_CORRECTION_NEGLIGIBLE}: the
   * exponential is then not computed, with the same bits.
   */
  private static double shortTimeRate(double timeFactor) {
    final double root = Math.sqrt(Math.PI * timeFactor);
    if (timeFactor < IMAGE_CORRECTION_NEGLIGIBLE) {
      return 1.0 / root;
    }
    return (1.0 - 2.0 * Math.exp(-1.0 / timeFactor)) / root;
  }

  /**
   * U(T) and dU/dT together, from one exponential: U is bit for bit {@link #averageDegree(double)};
   * dU/dT agrees with {@link #averageDegreeDerivative(double)} to within 2<sup>-56</sup> relative
   * (the Fourier sum stops at the same term as that of U). For the curve model, which needs both
   * for every reading.
   *
   * @param timeFactor T &gt; 0 (+&infin; allowed)
   * @param rate receives dU/dT in its first element
   * @return U(T)
   */
  static double averageDegreeAndRate(double timeFactor, double[] rate) {
    if (!(timeFactor > 0)) {
      throw new IllegalArgumentException(
          Messages.format("time factor T (%s) must be > 0 for dU/dT", timeFactor));
    }
    if (timeFactor < SHORT_TIME_LIMIT) {
      rate[0] = shortTimeRate(timeFactor);
      return TWO_OVER_SQRT_PI * Math.sqrt(timeFactor);
    }
    if (timeFactor == Double.POSITIVE_INFINITY) {
      rate[0] = 0.0;
      return 1.0;
    }
    final double q = Math.exp(-PI_SQUARED_OVER_4 * timeFactor);
    if (q < SINGLE_TERM_LIMIT) {
      rate[0] = 2.0 * q;
      return Math.min(1.0 - EIGHT_OVER_PI_SQUARED * q, LARGEST_BELOW_ONE);
    }
    final double q8 = q * q * q * q * q * q * q * q;
    double power = q;
    double step = q8;
    double sum = 0.0;
    double rateSum = 0.0;
    for (int m = 0; ; m++) {
      final double odd = 2 * m + 1;
      final double term = power / (odd * odd);
      sum += term;
      rateSum += power;
      power *= step;
      step *= q8;
      if (power == 0.0 || power < SERIES_TOLERANCE * sum) {
        break;
      }
    }
    rate[0] = 2.0 * rateSum;
    return Math.min(1.0 - EIGHT_OVER_PI_SQUARED * sum, LARGEST_BELOW_ONE);
  }

  /** 1 - U by the Fourier series, T &ge; T_s (or +infinity). */
  private static double remainingFractionSeries(double timeFactor) {
    if (timeFactor == Double.POSITIVE_INFINITY) {
      return 0.0;
    }
    final double q = Math.exp(-PI_SQUARED_OVER_4 * timeFactor);
    if (q < SINGLE_TERM_LIMIT) {
      return EIGHT_OVER_PI_SQUARED * q;
    }
    final double q8 = q * q * q * q * q * q * q * q;
    double power = q; // q^((2m+1)^2)
    double step = q8; // q^(8(m+1))
    double sum = 0.0;
    for (int m = 0; ; m++) {
      final double odd = 2 * m + 1;
      final double term = power / (odd * odd);
      sum += term;
      power *= step;
      step *= q8;
      if (power == 0.0 || power < SERIES_TOLERANCE * sum) {
        break;
      }
    }
    return EIGHT_OVER_PI_SQUARED * sum;
  }

  /** Newton on U(s^2) = U in s = sqrt(T); U in [0.188, 0.5]. */
  private static double timeFactorEarly(double averageDegree) {
    double s = averageDegree / TWO_OVER_SQRT_PI; // sqrt of pi U^2 / 4
    for (int i = 0; i < MAX_NEWTON_ITERATIONS; i++) {
      final double t = s * s;
      final double residual = averageDegree(t) - averageDegree;
      final double slope = 2.0 * s * averageDegreeDerivative(t);
      final double step = residual / slope;
      s -= step;
      if (Math.abs(step) <= 0x1.0p-52 * s) {
        break;
      }
    }
    return s * s;
  }

  /** Newton on ln(1 - U(T)) = ln(1 - U); U in (0.5, 1). */
  private static double timeFactorLate(double averageDegree) {
    final double remaining = 1.0 - averageDegree; // exact (Sterbenz)
    final double target = Math.log(remaining);
    double t = Math.log(EIGHT_OVER_PI_SQUARED / remaining) / PI_SQUARED_OVER_4;
    for (int i = 0; i < MAX_NEWTON_ITERATIONS; i++) {
      final double fraction = remainingFraction(t);
      final double residual = Math.log(fraction) - target;
      final double slope = -averageDegreeDerivative(t) / fraction;
      final double step = residual / slope;
      t -= step;
      if (Math.abs(step) <= 0x1.0p-52 * t) {
        break;
      }
    }
    return t;
  }

  /** Image form of u/u0 for 0 &lt; z &le; 1 and 0 &lt; T &lt; T_s. */
  private static double porePressureImage(double z, double timeFactor) {
    final double scale = 1.0 / (2.0 * Math.sqrt(timeFactor));
    double sum = 0.0;
    double sign = 1.0;
    for (int n = 0; ; n++) {
      final double near = (2 * n + z) * scale;
      if (near > ERFC_NEGLIGIBLE_ARGUMENT) {
        break;
      }
      final double far = (2 * n + 2 - z) * scale;
      sum += sign * (Erf.erfc(near) + Erf.erfc(far));
      sign = -sign;
    }
    return 1.0 - sum;
  }

  /** Fourier form of u/u0 for 0 &lt; z &le; 1 and T_s &le; T &lt; infinity. */
  private static double porePressureFourier(double z, double timeFactor) {
    final double q = Math.exp(-PI_SQUARED_OVER_4 * timeFactor);
    final double halfPiZ = Math.PI * z / 2.0;
    if (q < SINGLE_TERM_LIMIT) {
      return 2.0 * TWO_OVER_PI * (Math.sin(halfPiZ) * q);
    }
    final double q8 = q * q * q * q * q * q * q * q;
    double power = q;
    double step = q8;
    double sum = 0.0;
    for (int m = 0; ; m++) {
      final double odd = 2 * m + 1;
      sum += Math.sin(odd * halfPiZ) * power / odd;
      power *= step;
      step *= q8;
      if (power == 0.0 || power < SERIES_TOLERANCE * Math.abs(sum)) {
        break;
      }
    }
    return 2.0 * TWO_OVER_PI * sum;
  }

  private static void requireTimeFactor(double timeFactor) {
    if (!(timeFactor >= 0.0)) {
      throw new IllegalArgumentException(
          Messages.format("time factor T (%s) must be >= 0", timeFactor));
    }
  }
}
