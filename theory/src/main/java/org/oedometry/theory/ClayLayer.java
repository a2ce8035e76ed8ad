package org.oedometry.theory;

import java.util.Objects;

/**
 * A consolidating clay layer in the field, and its time-settlement forecast by Terzaghi's theory:
 * how a laboratory c<sub>v</sub> reaches design.
 *
 * <p>With H<sub>dr</sub> = {@link Drainage#drainagePath(double) drainage.drainagePath(thickness)}
 * and T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>, the primary consolidation settlement at
 * time t after an instantaneous, uniform load is s(t) = s<sub>ult</sub> U(T), and the time to reach
 * a degree of consolidation U is t = T(U) H<sub>dr</sub><sup>2</sup> / c<sub>v</sub>. Secondary
 * compression, construction time and layered profiles are outside this forecast.
 *
 * <p>Example (JShell; a year here is the Julian year of 365.25 days, {@link
 * #SECONDS_PER_JULIAN_YEAR}):
 *
 * <pre>{@code
 * var layer = ClayLayer.of(4.0, Drainage.DOUBLE, 0.32 / ClayLayer.SECONDS_PER_JULIAN_YEAR, 0.25);
 * layer.timeToDegree(0.9) / ClayLayer.SECONDS_PER_JULIAN_YEAR   // 10.6 years
 * layer.settlementAt(5 * ClayLayer.SECONDS_PER_JULIAN_YEAR)     // 0.17 m (U = 0.70)
 * }</pre>
 *
 * <p>Immutable and thread-safe. Results feed engineering decisions and must be reviewed by a
 * qualified engineer; local codes and standards govern.
 *
 * @param thickness layer thickness H, m; finite and &gt; 0
 * @param drainage drainage of the layer (both faces or one)
 * @param cv coefficient of consolidation c<sub>v</sub>, m<sup>2</sup>/s; finite and &gt; 0
 * @param ultimateSettlement ultimate primary consolidation settlement s<sub>ult</sub>, m; finite
 *     and &ge; 0
 */
public record ClayLayer(double thickness, Drainage drainage, double cv, double ultimateSettlement) {

  /** Seconds in a Julian year of 365.25 days, 31 557 600 s: the year used in forecasts. */
  public static final double SECONDS_PER_JULIAN_YEAR = 365.25 * 86_400.0;

  /**
   * Validates the layer.
   *
   * @param thickness layer thickness H, m; finite and &gt; 0
   * @param drainage drainage of the layer
   * @param cv coefficient of consolidation, m<sup>2</sup>/s; finite and &gt; 0
   * @param ultimateSettlement ultimate primary consolidation settlement, m; finite and &ge; 0
   * @throws IllegalArgumentException if a number is out of range or NaN
   * @throws NullPointerException if drainage is null
   */
  public ClayLayer {
    Messages.requirePositiveFinite("thickness", thickness, "m");
    Objects.requireNonNull(drainage, "drainage");
    Messages.requirePositiveFinite("cv", cv, "m^2/s");
    if (!(ultimateSettlement >= 0) || ultimateSettlement == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Messages.format(
              "ultimate settlement (%s m) must be finite and >= 0", ultimateSettlement));
    }
  }

  /**
   * Creates a layer.
   *
   * @param thickness layer thickness, m; finite and &gt; 0
   * @param drainage drainage of the layer
   * @param cv coefficient of consolidation, m<sup>2</sup>/s; finite and &gt; 0
   * @param ultimateSettlement ultimate primary consolidation settlement, m; finite and &ge; 0
   * @return the layer
   * @throws IllegalArgumentException if a number is out of range or NaN
   */
  public static ClayLayer of(
      double thickness, Drainage drainage, double cv, double ultimateSettlement) {
    return new ClayLayer(thickness, drainage, cv, ultimateSettlement);
  }

  /**
   * Drainage path of the layer.
   *
   * @return H<sub>dr</sub>, m
   */
  public double drainagePath() {
    return drainage.drainagePath(thickness);
  }

  /**
   * Time factor at a time after loading.
   *
   * <p>Computed on the significands and binary exponents of c<sub>v</sub>, t and H<sub>dr</sub>
   * separately, so that H<sub>dr</sub><sup>2</sup> or c<sub>v</sub> t cannot over- or underflow on
   * the way (a thin layer at t = 0 would otherwise give 0/0): the result is bit for bit that of the
   * plain expression wherever the plain expression stays within the normal double range.
   *
   * @param seconds time since the load was applied, s; &ge; 0 (+&infin; allowed)
   * @return T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>, dimensionless, &ge; 0; +&infin; for t
   *     = +&infin; or where T itself exceeds the largest double (U is 1 there to double precision)
   * @throws IllegalArgumentException if the time is negative or NaN
   */
  public double timeFactorAt(double seconds) {
    if (!(seconds >= 0)) {
      throw new IllegalArgumentException(
          Messages.format("time since loading (%s s) must be >= 0", seconds));
    }
    final double path = drainagePath();
    double m = significand(cv) * significand(seconds) / (significand(path) * significand(path));
    return Math.scalb(m, exponent(cv) + exponent(seconds) - 2 * exponent(path));
  }

  /**
   * Average degree of primary consolidation at a time after loading.
   *
   * @param seconds time since loading, s; &ge; 0
   * @return U in [0, 1], dimensionless
   * @throws IllegalArgumentException if the time is negative or NaN
   */
  public double degreeAt(double seconds) {
    return Terzaghi.averageDegree(timeFactorAt(seconds));
  }

  /**
   * Primary consolidation settlement at a time after loading, s<sub>ult</sub> U(T).
   *
   * @param seconds time since loading, s; &ge; 0
   * @return settlement, m, in [0, s<sub>ult</sub>]
   * @throws IllegalArgumentException if the time is negative or NaN
   */
  public double settlementAt(double seconds) {
    return ultimateSettlement * degreeAt(seconds);
  }

  /**
   * Time to reach an average degree of consolidation, T(U) H<sub>dr</sub><sup>2</sup> / c<sub>v
   * </sub>, computed on significands and exponents as {@link #timeFactorAt(double)} is, so that
   * H<sub>dr</sub><sup>2</sup> cannot overflow on the way.
   *
   * @param averageDegree U, dimensionless, 0 &le; U &lt; 1 (e.g. 0.9 for "time to 90 %")
   * @return time since loading, s; finite, &ge; 0
   * @throws IllegalArgumentException if U is outside [0, 1) or NaN, or if the time exceeds the
   *     largest double (about 5.7e300 years: c<sub>v</sub> far too small for the drainage path)
   */
  public double timeToDegree(double averageDegree) {
    double t = unboundedTimeToDegree(averageDegree);
    if (t == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Messages.format(
              "time to reach U = %s exceeds the largest double (%s s): cv (%s m^2/s) is too small"
                  + " for the drainage path (%s m)",
              averageDegree, Double.MAX_VALUE, cv, drainagePath()));
    }
    return t;
  }

  /** T(U) H<sub>dr</sub><sup>2</sup> / c<sub>v</sub>, s; +&infin; where it exceeds the range. */
  private double unboundedTimeToDegree(double averageDegree) {
    final double factor = Terzaghi.timeFactor(averageDegree);
    final double path = drainagePath();
    double m = significand(factor) * significand(path) * significand(path) / significand(cv);
    return Math.scalb(m, exponent(factor) + 2 * exponent(path) - exponent(cv));
  }

  /**
   * The binary exponent of x &ge; 0, as Math.getExponent: -1023 for 0 and subnormals, 1024 for
   * +&infin;.
   */
  private static int exponent(double x) {
    return Math.getExponent(x);
  }

  /**
   * x / 2<sup>exponent(x)</sup>, exact: in [1, 2) for normal x, (0, 1) for subnormal, 0, +&infin;.
   */
  private static double significand(double x) {
    return Math.scalb(x, -Math.getExponent(x));
  }

  /**
   * Time for the primary consolidation settlement to reach a given value.
   *
   * @param settlement settlement, m; 0 &le; s &lt; s<sub>ult</sub>
   * @return time since loading, s; finite, &ge; 0
   * @throws IllegalArgumentException if the settlement is negative, NaN, or not below the ultimate
   *     settlement (which is reached only as t &rarr; &infin;), or if the time exceeds the largest
   *     double (see {@link #timeToDegree(double)})
   */
  public double timeToSettlement(double settlement) {
    if (!(settlement >= 0 && settlement < ultimateSettlement)) {
      throw new IllegalArgumentException(
          Messages.format(
              "settlement (%s m) must be >= 0 and below the ultimate settlement (%s m)",
              settlement, ultimateSettlement));
    }
    return timeToDegree(settlement / ultimateSettlement);
  }

  /**
   * A one-line summary for JShell, with c<sub>v</sub> also in m<sup>2</sup>/yr and t<sub>50 </sub>,
   * t<sub>90</sub> in Julian years ("beyond 1.8e+308" where a value exceeds the largest double).
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Messages.format(
        "ClayLayer[thickness %.4g m, %s drainage (H_dr %.4g m), cv %.4g m^2/s (%s m^2/yr),"
            + " ultimate settlement %.4g m, t50 %s yr, t90 %s yr]",
        thickness,
        drainage == Drainage.DOUBLE ? "double" : "single",
        drainagePath(),
        cv,
        shortNumber(cv * SECONDS_PER_JULIAN_YEAR),
        ultimateSettlement,
        shortNumber(unboundedTimeToDegree(0.5) / SECONDS_PER_JULIAN_YEAR),
        shortNumber(unboundedTimeToDegree(0.9) / SECONDS_PER_JULIAN_YEAR));
  }

  /** Four significant digits, or "beyond 1.8e308" where the value left the double range. */
  private static String shortNumber(double value) {
    return Double.isFinite(value)
        ? Messages.format("%.4g", value)
        : Messages.format("beyond %.2g", Double.MAX_VALUE);
  }
}
