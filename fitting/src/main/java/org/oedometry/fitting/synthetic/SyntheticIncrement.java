package org.oedometry.fitting.synthetic;

import java.util.Locale;
import org.oedometry.theory.Terzaghi;

/**
 * The forward model of one invented load increment:
 *
 * <pre>
 *   d(0)  = initialSettlement
 *   d(t)  = initialSettlement + immediateSettlement
 *           + primarySettlement U(c_v t / H_dr^2) + creep(t)        for t &gt; 0
 *   creep = 0                                                       (CreepShape.NONE)
 *         = creepSlope log10(t / creepStart) for t &gt; creepStart, else 0  (AFTER_KINK)
 *         = creepSlope log10(1 + t / creepStart)                    (SMOOTH)
 * </pre>
 *
 * with U from {@link Terzaghi#averageDegree(double)}. A negative primary settlement models a
 * swelling increment. The immediate settlement is the "false deformation" at t = 0+ (seating,
 * apparatus): it appears in every reading after loading but not in the zero reading.
 *
 * @param initialSettlement the reading at t = 0, m, finite
 * @param immediateSettlement jump between t = 0 and t = 0+, m, finite
 * @param primarySettlement primary consolidation settlement, m, finite, not 0 (negative: swelling)
 * @param cv coefficient of consolidation, m<sup>2</sup>/s, finite, &gt; 0
 * @param drainagePath H<sub>dr</sub>, m, finite, &gt; 0
 * @param creepShape how secondary compression enters, not null
 * @param creepSlope secondary compression per log<sub>10</sub> cycle, m, finite (0 with NONE)
 * @param creepStart time scale of the creep term, s, finite, &gt; 0
 */
public record SyntheticIncrement(
    double initialSettlement,
    double immediateSettlement,
    double primarySettlement,
    double cv,
    double drainagePath,
    CreepShape creepShape,
    double creepSlope,
    double creepStart) {

  /** How secondary compression is added to the Terzaghi curve. */
  public enum CreepShape {
    /** No secondary compression. */
    NONE,
    /** Straight on log time from creepStart on, nothing before (a kink at the end of primary). */
    AFTER_KINK,
    /** creepSlope log10(1 + t / creepStart): grows smoothly from the start. */
    SMOOTH
  }

  /**
   * Creates the model.
   *
   * @param initialSettlement m, finite
   * @param immediateSettlement m, finite
   * @param primarySettlement m, finite, not 0
   * @param cv m<sup>2</sup>/s, finite, &gt; 0
   * @param drainagePath m, finite, &gt; 0
   * @param creepShape not null
   * @param creepSlope m per log10 cycle, finite
   * @param creepStart s, finite, &gt; 0
   * @throws IllegalArgumentException if a value is out of range
   */
  public SyntheticIncrement {
    requireFinite("initial settlement", initialSettlement);
    requireFinite("immediate settlement", immediateSettlement);
    requireFinite("primary settlement", primarySettlement);
    if (primarySettlement == 0.0) {
      throw new IllegalArgumentException("primary settlement (0.0 m) must not be 0");
    }
    requirePositive("c_v", cv);
    requirePositive("drainage path", drainagePath);
    if (creepShape == null) {
      throw new IllegalArgumentException("creep shape must not be null");
    }
    requireFinite("creep slope", creepSlope);
    requirePositive("creep start", creepStart);
  }

  /**
   * A pure Terzaghi increment from zero settlement, no immediate settlement, no creep.
   *
   * @param primarySettlement m, finite, not 0
   * @param cv m<sup>2</sup>/s, &gt; 0
   * @param drainagePath m, &gt; 0
   * @return the model
   * @throws IllegalArgumentException if a value is out of range
   */
  public static SyntheticIncrement terzaghi(
      double primarySettlement, double cv, double drainagePath) {
    return new SyntheticIncrement(
        0.0, 0.0, primarySettlement, cv, drainagePath, CreepShape.NONE, 0.0, 1.0);
  }

  /**
   * Time at which the time factor reaches a value, t = T H<sub>dr</sub><sup>2</sup> /
   * c<sub>v</sub>.
   *
   * @param timeFactor T, &ge; 0
   * @return t, s
   */
  public double timeAt(double timeFactor) {
    return timeFactor * drainagePath * drainagePath / cv;
  }

  /**
   * The settlement the model gives at a time.
   *
   * @param elapsedSeconds t, s, finite, &ge; 0
   * @return d(t), m
   * @throws IllegalArgumentException if t is negative, infinite or NaN
   */
  public double settlementAt(double elapsedSeconds) {
    if (!(elapsedSeconds >= 0) || elapsedSeconds == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT, "elapsed time (%s s) must be finite and >= 0", elapsedSeconds));
    }
    if (elapsedSeconds == 0.0) {
      return initialSettlement;
    }
    double u = Terzaghi.averageDegree(cv * elapsedSeconds / (drainagePath * drainagePath));
    double creep =
        switch (creepShape) {
          case NONE -> 0.0;
          case AFTER_KINK ->
              elapsedSeconds > creepStart
                  ? creepSlope * Math.log10(elapsedSeconds / creepStart)
                  : 0;
          case SMOOTH -> creepSlope * Math.log10(1.0 + elapsedSeconds / creepStart);
        };
    return initialSettlement + immediateSettlement + primarySettlement * u + creep;
  }

  private static void requireFinite(String name, double value) {
    if (!Double.isFinite(value)) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "%s (%s m) must be finite", name, value));
    }
  }

  private static void requirePositive(String name, double value) {
    if (!(value > 0) || value == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "%s (%s) must be finite and > 0", name, value));
    }
  }
}
