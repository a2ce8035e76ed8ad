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
 * <p>T U'(T) tends to &radic;(T/&pi;) as T &rarr; 0 and is 0 at T = 0. From T = 16 on, where U is
 * the largest double below 1 and T U'(T) = 2T exp(-&pi;<sup>2</sup>T/4) is below 2.3 x
 * 10<sup>-16</sup>, that term is taken as 0, so that the late readings of a data logger cost no
 * exponential: dd/dln c<sub>v</sub> is then exact to within 2.3 x 10<sup>-16</sup> d<sub>p</sub>
 * absolute. Otherwise the accuracy is that of {@link Terzaghi}: relative error of each value and
 * derivative below 10<sup>-14</sup> (plus the rounding of the sums). Immutable and thread-safe.
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

  private static final double INVERSE_LN_10 = 1.0 / Math.log(10.0);

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
   * @return T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>; +infinity where it exceeds the double
   *     range
   * @throws IllegalArgumentException if the time is negative or not finite, or c<sub>v</sub> is not
   *     finite and positive
   */
  public double timeFactor(double seconds, double cv) {
    requireTime(seconds);
    Messages.requirePositiveFinite("c_v", cv, "m^2/s");
    return seconds == 0.0 ? 0.0 : timeFactorRate(cv, drainagePath) * seconds;
  }

  /**
   * c<sub>v</sub>/H<sub>dr</sub><sup>2</sup>, per second: c<sub>v</sub>/H<sup>2</sup> where
   * H<sup>2</sup> is a normal double, otherwise (c<sub>v</sub>/H)/H, which overflows or underflows
   * only where the quotient itself does.
   */
  private static double timeFactorRate(double cv, double drainagePath) {
    final double pathSquared = drainagePath * drainagePath;
    return pathSquared >= Double.MIN_NORMAL && pathSquared < Double.POSITIVE_INFINITY
        ? cv / pathSquared
        : cv / drainagePath / drainagePath;
  }

  /**
   * Settlement at a time.
   *
   * @param seconds elapsed time since loading, s; finite and &ge; 0
   * @param parameters the curve's parameters
   * @return d(t), m
   * @throws IllegalArgumentException if the time is negative or not finite, or the rate is out of
   *     range (see {@link #curve})
   */
  public double settlement(double seconds, CurveParameters parameters) {
    return curve(parameters).settlement(seconds);
  }

  /**
   * Secondary term alone, s log<sub>10</sub>(1 + T/T<sub>s</sub>).
   *
   * @param seconds elapsed time since loading, s; finite and &ge; 0
   * @param parameters the curve's parameters
   * @return the secondary compression at that time, m
   * @throws IllegalArgumentException if the time is negative or not finite, or the rate is out of
   *     range (see {@link #curve})
   */
  public double secondarySettlement(double seconds, CurveParameters parameters) {
    final Curve curve = curve(parameters);
    requireTime(seconds);
    return curve.slope * curve.secondaryShape(seconds);
  }

  /**
   * Settlement and its gradient with respect to (d<sub>i</sub>, d<sub>p</sub>, ln c<sub>v</sub>, s)
   * at a time, written into {@code gradient}; the same bits as {@link Curve#settlementAndGradient}
   * of {@link #curve(CurveParameters)}, which is the faster way to evaluate many times at one set
   * of parameters.
   *
   * @param seconds elapsed time since loading, s; finite and &ge; 0
   * @param parameters the curve's parameters
   * @param gradient array of length &ge; {@value #PARAMETER_COUNT} that receives the four partial
   *     derivatives (m, m, m, dimensionless)
   * @return d(t), m
   * @throws IllegalArgumentException if the time is negative or not finite, the array is too short,
   *     or the rate is out of range (see {@link #curve})
   */
  public double settlementAndGradient(
      double seconds, CurveParameters parameters, double[] gradient) {
    return curve(parameters).settlementAndGradient(seconds, gradient);
  }

  /**
   * The model at fixed parameters: the constants of the formulas (c<sub>v</sub>/H<sub>dr
   * </sub><sup>2</sup>, c<sub>v</sub>/(H<sub>dr</sub><sup>2</sup> T<sub>s</sub>)) are computed
   * once, so that evaluating many readings costs one exponential, one logarithm and one division
   * each.
   *
   * @param parameters the curve's parameters
   * @return the curve
   * @throws IllegalArgumentException if the parameters are null, or c<sub>v</sub>/(H<sub>dr</sub>
   *     <sup>2</sup> T<sub>s</sub>) exceeds the double range (about 10<sup>308</sup> per second,
   *     far outside any soil)
   */
  public Curve curve(CurveParameters parameters) {
    if (parameters == null) {
      throw new IllegalArgumentException("curve parameters must not be null");
    }
    return new Curve(this, parameters);
  }

  /**
   * One increment's time-settlement curve: the model at fixed parameters ({@link
   * ConsolidationCurveModel#curve(CurveParameters)}). Formulas, units and accuracy are those of the
   * model; T = (c<sub>v</sub>/H<sub>dr</sub><sup>2</sup>) t and T/T<sub>s</sub> = (c<sub>v
   * </sub>/(H<sub>dr</sub><sup>2</sup> T<sub>s</sub>)) t are products with constants rounded once
   * (within 1.5 ulp of the exact T). Immutable and thread-safe.
   */
  public static final class Curve {
    private final ConsolidationCurveModel model;
    private final CurveParameters parameters;
    private final double initial;
    private final double primary;
    private final double slope;

    /** c_v / H_dr^2, 1/s: T = timeFactorRate t. */
    private final double timeFactorRate;

    /** c_v / (H_dr^2 T_s), 1/s: T / T_s = onsetRatioRate t. */
    private final double onsetRatioRate;

    private Curve(ConsolidationCurveModel model, CurveParameters parameters) {
      this.model = model;
      this.parameters = parameters;
      this.initial = parameters.initialSettlement();
      this.primary = parameters.primarySettlement();
      this.slope = parameters.secondarySlope();
      this.timeFactorRate = timeFactorRate(parameters.cv(), model.drainagePath());
      this.onsetRatioRate = timeFactorRate / model.secondaryOnset();
      if (onsetRatioRate == Double.POSITIVE_INFINITY) {
        throw new IllegalArgumentException(
            Messages.format(
                "c_v / (H_dr^2 T_s) = %s / (%s^2 x %s) per second exceeds the double range",
                parameters.cv(), model.drainagePath(), model.secondaryOnset()));
      }
    }

    /**
     * The model this curve belongs to.
     *
     * @return the model
     */
    public ConsolidationCurveModel model() {
      return model;
    }

    /**
     * The curve's parameters.
     *
     * @return the parameters
     */
    public CurveParameters parameters() {
      return parameters;
    }

    /**
     * Settlement at a time.
     *
     * @param seconds elapsed time since loading, s; finite and &ge; 0
     * @return d(t) = d<sub>i</sub> + d<sub>p</sub> U(T) + s log<sub>10</sub>(1 + T/T<sub>s</sub>),
     *     m
     * @throws IllegalArgumentException if the time is negative or not finite
     */
    public double settlement(double seconds) {
      requireTime(seconds);
      final double t = timeFactorRate * seconds;
      return initial + primary * Terzaghi.averageDegree(t) + slope * secondaryShape(seconds);
    }

    /** log10(1 + T / T_s) at a time already checked. */
    private double secondaryShape(double seconds) {
      final double ratio = onsetRatioRate * seconds;
      return logOnePlusOnsetRatio(seconds, ratio) * INVERSE_LN_10;
    }

    /**
     * ln(1 + T/T<sub>s</sub>) for a time already checked and its ratio T/T<sub>s</sub> = {@code
     * onsetRatioRate} t. Where that product of two finite factors overflows (times beyond about
     * 10<sup>300</sup> s) the logarithm is taken of each factor: ln c<sub>v</sub> - 2 ln H<sub>dr
     * </sub> - ln T<sub>s</sub> + ln t, which equals ln(1 + x) to double precision there (x &gt;
     * 10<sup>308</sup>), so the secondary term stays finite.
     */
    private double logOnePlusOnsetRatio(double seconds, double ratio) {
      if (ratio == Double.POSITIVE_INFINITY) {
        return Math.log(parameters.cv())
            - 2.0 * Math.log(model.drainagePath())
            - Math.log(model.secondaryOnset())
            + Math.log(seconds);
      }
      return naturalLogOnePlus(ratio);
    }

    /**
     * Settlement and its gradient with respect to (d<sub>i</sub>, d<sub>p</sub>, ln c<sub>v</sub>,
     * s) at a time, written into {@code gradient} (formulas in the description of {@link
     * ConsolidationCurveModel}).
     *
     * @param seconds elapsed time since loading, s; finite and &ge; 0
     * @param gradient array of length &ge; {@value #PARAMETER_COUNT} that receives the four partial
     *     derivatives (m, m, m, dimensionless)
     * @return d(t), m; the same bits as {@link #settlement(double)}
     * @throws IllegalArgumentException if the time is negative or not finite, or the array is too
     *     short
     */
    public double settlementAndGradient(double seconds, double[] gradient) {
      if (gradient.length < PARAMETER_COUNT) {
        throw new IllegalArgumentException(
            Messages.format(
                "gradient array length (%d) must be >= %d", gradient.length, PARAMETER_COUNT));
      }
      requireTime(seconds);
      final double t = timeFactorRate * seconds;
      final double degree;
      final double timeTimesRate;
      if (t == 0.0) {
        degree = 0.0;
        timeTimesRate = 0.0;
      } else if (t >= Terzaghi.SETTLED_TIME_FACTOR) {
        // T U'(T) = 2 T exp(-pi^2 T / 4) < 2.3e-16 here: dropped (see the class description).
        degree = Terzaghi.averageDegree(t);
        timeTimesRate = 0.0;
      } else {
        // The gradient array holds dU/dT for a moment (its first entry is set below).
        degree = Terzaghi.averageDegreeAndRate(t, gradient);
        timeTimesRate = t * gradient[0];
      }
      final double ratio = onsetRatioRate * seconds;
      final double secondaryShape = logOnePlusOnsetRatio(seconds, ratio) * INVERSE_LN_10;
      // s d log10(1 + x) / d ln c_v = s x / ((1 + x) ln 10), which is s / ln 10 where x overflows.
      final double secondaryRate =
          ratio == Double.POSITIVE_INFINITY
              ? slope * INVERSE_LN_10
              : slope * (ratio * INVERSE_LN_10) / (1.0 + ratio);
      gradient[0] = 1.0;
      gradient[1] = degree;
      gradient[2] = primary * timeTimesRate + secondaryRate;
      gradient[3] = secondaryShape;
      return initial + primary * degree + slope * secondaryShape;
    }
  }

  /**
   * ln(1 + x) for x &ge; 0, the secondary term per unit slope times ln 10. Below x = 1 it is
   * computed as ln(u) x / (u - 1) with u = 1 + x rounded (x itself when u = 1): the rounding error
   * of u cancels between ln u and u - 1, so the result is accurate to a few ulp (Goldberg 1991,
   * "What every computer scientist should know about floating-point arithmetic", ACM Computing
   * Surveys 23(1), theorem 4), while {@link Math#log} is several times faster than {@link
   * Math#log1p} on common Java runtimes. From x = 1 on, ln u itself is within 0.75 ulp of ln(1 + x)
   * (the rounding of u, at most half an ulp of u, moves ln u by at most 2<sup>-53</sup>, and ln(1 +
   * x) &ge; ln 2), so the division is saved.
   */
  static double naturalLogOnePlus(double x) {
    final double u = 1.0 + x;
    if (x >= 1.0) {
      return u == Double.POSITIVE_INFINITY ? Math.log(x) : Math.log(u);
    }
    if (u == 1.0) {
      return x;
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
