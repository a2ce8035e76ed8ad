package org.oedometry.theory;

/**
 * One load increment's settlement against time: Terzaghi's primary consolidation plus a secondary
 * compression term, with its analytic Jacobian for least-squares fitting.
 *
 * <pre>
 *   d(t) = d_i + d_p U(T) + s log10(1 + T / T_s),      T = c_v t / H_dr^2
 * </pre>
 *
 * <p><b>The secondary term.</b> s log<sub>10</sub>(1 + T/T<sub>s</sub>) with a fixed onset time
 * factor T<sub>s</sub> ({@link #DEFAULT_SECONDARY_ONSET} = 2, where U = 99.4 %). It (a) vanishes
 * early: it grows like s T / (T<sub>s</sub> ln 10), so at T = 0.05 (U = 25 %) it is 1.1 % of s; (b)
 * becomes a straight line of slope s per log<sub>10</sub> cycle of time once primary consolidation
 * is over: s log<sub>10</sub>(T/T<sub>s</sub>) + O(T<sub>s</sub>/T), within 0.042 s of the line at
 * T = 10 T<sub>s</sub>; (c) is smooth (analytic in T &ge; 0); (d) adds one parameter, s, its onset
 * being tied to the primary time scale H<sub>dr</sub><sup>2</sup>/c<sub>v </sub>, so that the model
 * keeps the scaling of Terzaghi's theory: scaling time by k scales c<sub>v </sub> by 1/k and leaves
 * d<sub>i</sub>, d<sub>p</sub>, s unchanged. Secondary compression is usually taken to follow the
 * end of primary consolidation, which the log-time construction puts near T = 1.1 (where the
 * inflection tangent reaches U = 100 %); T<sub>s</sub> = 2 starts the term just after it. Between
 * the two candidates we considered, T<sub>s</sub> = 1 and 2, the varied synthetic study of the
 * full-curve fit (creep starting with a kink at T = 1 to 2, smooth creep, pure Terzaghi, swelling)
 * chose 2: pooled median c<sub>v</sub> error 0.98 % against 1.13 %. It can be changed per model.
 *
 * <p><b>Parameters</b> ({@link CurveParameters}): d<sub>i</sub> (the corrected zero, what the
 * graphical d<sub>0</sub> estimates), d<sub>p</sub>, c<sub>v</sub>, s. The Jacobian is taken with
 * respect to (d<sub>i</sub>, d<sub>p</sub>, ln c<sub>v</sub>, s): fitting ln c<sub>v</sub> keeps
 * c<sub>v</sub> positive.
 *
 * <pre>
 *   dd/dd_i     = 1
 *   dd/dd_p     = U(T)
 *   dd/dln c_v  = d_p T U'(T) + s (T / T_s) / ((1 + T / T_s) ln 10)
 *   dd/ds       = log10(1 + T / T_s)
 * </pre>
 *
 * <p>T U'(T) tends to &radic;(T/&pi;) as T &rarr; 0 and is 0 at T = 0. Accuracy is that of {@link
 * Terzaghi}: relative error of each value and derivative below 10<sup>-14</sup> (plus the rounding
 * of the sums). Immutable and thread-safe.
 *
 * @param drainagePath H<sub>dr</sub>, m; finite and &gt; 0
 * @param secondaryOnset T<sub>s</sub>, the time factor at which the secondary term reaches
 *     log<sub>10</sub>2 s; finite and &gt; 0
 */
public record ConsolidationCurveModel(double drainagePath, double secondaryOnset) {

  /** Default onset time factor of the secondary term, T<sub>s</sub> = 2 (U = 99.4 %). */
  public static final double DEFAULT_SECONDARY_ONSET = 2.0;

  /** Number of fitted parameters, in the order d_i, d_p, ln c_v, s. */
  public static final int PARAMETER_COUNT = 4;

  private static final double LN_10 = Math.log(10.0);

  /**
   * Validates the model.
   *
   * @param drainagePath H<sub>dr</sub>, m; finite and &gt; 0
   * @param secondaryOnset T<sub>s</sub>; finite and &gt; 0
   * @throws IllegalArgumentException if either is not finite and positive
   */
  public ConsolidationCurveModel {
    Messages.requirePositiveFinite("drainage path", drainagePath, "m");
    Messages.requirePositiveFinite("secondary onset time factor", secondaryOnset, "");
  }

  /**
   * The model with the default secondary onset T<sub>s</sub> = {@value #DEFAULT_SECONDARY_ONSET}.
   *
   * @param drainagePath H<sub>dr</sub>, m; finite and &gt; 0
   * @return the model
   * @throws IllegalArgumentException if the drainage path is not finite and positive
   */
  public static ConsolidationCurveModel of(double drainagePath) {
    return new ConsolidationCurveModel(drainagePath, DEFAULT_SECONDARY_ONSET);
  }

  /**
   * Time factor of a time for a given c<sub>v</sub>.
   *
   * @param seconds elapsed time since loading, s; &ge; 0
   * @param cv c<sub>v</sub>, m<sup>2</sup>/s; &gt; 0
   * @return T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>
   * @throws IllegalArgumentException if the time is negative or not finite
   */
  public double timeFactor(double seconds, double cv) {
    requireTime(seconds);
    return cv * seconds / (drainagePath * drainagePath);
  }

  /**
   * Settlement at a time.
   *
   * @param seconds elapsed time since loading, s; finite and &ge; 0
   * @param parameters the curve's parameters
   * @return d(t), m
   * @throws IllegalArgumentException if the time is negative or not finite
   */
  public double settlement(double seconds, CurveParameters parameters) {
    final double t = timeFactor(seconds, parameters.cv());
    return parameters.initialSettlement()
        + parameters.primarySettlement() * Terzaghi.averageDegree(t)
        + parameters.secondarySlope() * secondaryShape(t);
  }

  /**
   * Secondary term alone, s log<sub>10</sub>(1 + T/T<sub>s</sub>).
   *
   * @param seconds elapsed time since loading, s; finite and &ge; 0
   * @param parameters the curve's parameters
   * @return the secondary compression at that time, m
   * @throws IllegalArgumentException if the time is negative or not finite
   */
  public double secondarySettlement(double seconds, CurveParameters parameters) {
    final double t = timeFactor(seconds, parameters.cv());
    return parameters.secondarySlope() * secondaryShape(t);
  }

  /**
   * Settlement and its gradient with respect to (d<sub>i</sub>, d<sub>p</sub>, ln c<sub>v</sub>, s)
   * at a time, written into {@code gradient}.
   *
   * @param seconds elapsed time since loading, s; finite and &ge; 0
   * @param parameters the curve's parameters
   * @param gradient array of length &ge; {@value #PARAMETER_COUNT} that receives the four partial
   *     derivatives (m, m, m, dimensionless)
   * @return d(t), m
   * @throws IllegalArgumentException if the time is negative or not finite, or the array is too
   *     short
   */
  public double settlementAndGradient(
      double seconds, CurveParameters parameters, double[] gradient) {
    if (gradient.length < PARAMETER_COUNT) {
      throw new IllegalArgumentException(
          Messages.format(
              "gradient array length (%d) must be >= %d", gradient.length, PARAMETER_COUNT));
    }
    final double t = timeFactor(seconds, parameters.cv());
    final double degree;
    final double timeTimesRate;
    if (t == 0.0) {
      degree = 0.0;
      timeTimesRate = 0.0;
    } else {
      // The gradient array holds dU/dT for a moment (its first entry is set below).
      degree = Terzaghi.averageDegreeAndRate(t, gradient);
      timeTimesRate = t * gradient[0];
    }
    final double ratio = t / secondaryOnset;
    final double onePlusRatio = 1.0 + ratio;
    final double secondaryShape = naturalLogOnePlus(ratio) / LN_10;
    gradient[0] = 1.0;
    gradient[1] = degree;
    gradient[2] =
        parameters.primarySettlement() * timeTimesRate
            + parameters.secondarySlope() * ratio / (onePlusRatio * LN_10);
    gradient[3] = secondaryShape;
    return parameters.initialSettlement()
        + parameters.primarySettlement() * degree
        + parameters.secondarySlope() * secondaryShape;
  }

  /**
   * log10(1 + T / T_s), the secondary term per unit slope. ln(1 + x) is computed as ln(u) x / (u -
   * 1) with u = 1 + x rounded (x itself when u = 1): the rounding error of u cancels between ln u
   * and u - 1, so the result is accurate to a few ulp for every x &ge; 0 (Goldberg 1991, "What
   * every computer scientist should know about floating-point arithmetic", ACM Computing Surveys
   * 23(1), theorem 4), while {@link Math#log} is several times faster than {@link Math#log1p} on
   * common Java runtimes.
   */
  private double secondaryShape(double timeFactor) {
    return naturalLogOnePlus(timeFactor / secondaryOnset) / LN_10;
  }

  /** ln(1 + x) for x &ge; 0 by Goldberg's theorem 4 (see {@link #secondaryShape}). */
  static double naturalLogOnePlus(double x) {
    final double u = 1.0 + x;
    if (u == 1.0) {
      return x;
    }
    if (u == Double.POSITIVE_INFINITY) {
      return Math.log(x);
    }
    return Math.log(u) * (x / (u - 1.0));
  }

  private static void requireTime(double seconds) {
    if (!(seconds >= 0) || seconds == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Messages.format("elapsed time (%s s) must be finite and >= 0", seconds));
    }
  }
}
