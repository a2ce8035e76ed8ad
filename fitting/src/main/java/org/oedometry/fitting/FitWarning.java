package org.oedometry.fitting;

import java.util.Objects;

/**
 * A doubt about a result that still carries a value: a kind a program can test and a message an
 * engineer can read. A warning never replaces an error: where no honest value exists the methods
 * throw {@link FitException} instead.
 *
 * @param kind what kind of doubt; not null
 * @param message the details, with the numbers involved; not blank
 */
public record FitWarning(Kind kind, String message) {

  /**
   * Largest root-mean-square departure of a construction's readings up to 70 % consolidation from
   * its own Terzaghi curve (its d<sub>0</sub>, d<sub>100</sub> and c<sub>v</sub>), as a fraction of
   * the primary compression, before {@link Kind#IMPLIED_CURVE_MISSES_READINGS} is raised: 0.04. On
   * exact curves (usual lab schedule, 10 readings a cycle, every 60 s; T at 24 h 2 to 100,
   * secondary compression up to 5 % of d<sub>p</sub> a cycle, immediate settlement up to 2 %) the
   * departure of the log-time, root-time, inflection point, rectangular hyperbola and early-slope
   * results stayed below 0.008 (0.002 but for the inflection point on the lab schedule), and none
   * of 14,000 results on exact curves with immediate settlement up to 20 % of d<sub>p</sub> and
   * secondary compression up to 10 % a cycle (T at 24 h 1 to 200) raised the warning. With reading
   * noise of 2 % of d<sub>p</sub> on the lab schedule, where the inflection point c<sub>v</sub> has
   * a median error of 10 % and a 90th percentile of 27 %, it caught 44 of 73 inflection values more
   * than 25 % off (and warned 161 of 510 others). On 4,500 noisy curves a method (noise up to 2
   * &micro;m, d<sub>p</sub> 0.05 to 0.55 mm) it left without any warning values more than 25 % off:
   * log-time 12 (17 before), root-time 6 (6), inflection point 0 (9), rectangular hyperbola 5 (5),
   * early slope 3 (4), while warning 0.1 to 0.2 % of the others (1.9 % for the inflection point).
   */
  public static final double IMPLIED_CURVE_MISFIT_LIMIT = 0.04;

  /** Kinds of warning raised by the constructions of this package. */
  public enum Kind {
    /** The reading at t = 0 was left out of the construction (it may hold a false deformation). */
    ZERO_READING_IGNORED,
    /** Settlement decreases: a swelling (unloading) increment, usually reported for information. */
    SWELLING_INCREMENT,
    /** Fewer early readings than the log-time parabola rule wants; d0 is less certain. */
    FEW_EARLY_READINGS,
    /** The log-time secondary line rests on fewer than 3 readings. */
    FEW_SECONDARY_READINGS,
    /** The log-time secondary readings span too short a time to fix the line's slope. */
    SHORT_SECONDARY_PART,
    /** The readings chosen for the root-time early line do not lie on a straight line. */
    EARLY_PART_NOT_LINEAR,
    /** The root-time choice of early readings did not settle to one set. */
    LINE_CHOICE_NOT_SETTLED,
    /** The readings keep rising well beyond the implied d100 (strong secondary compression). */
    CURVE_RISES_BEYOND_D100,
    /**
     * A fitted parameter sits on its bound: the full curve's secondary slope at 0 (no secondary
     * compression is seen). A primary settlement at its bound 0 is refused instead ({@link
     * FitException}: c<sub>v</sub> would not describe consolidation).
     */
    PARAMETER_AT_BOUND,
    /**
     * c<sub>v</sub> is uncertain: the full curve's confidence interval spans more than a factor of
     * 2; the root-time early line's slope, turned to the ends of its 95 % interval, moves
     * c<sub>v</sub> by more than a factor of {@value RootTimeMethod#SLOPE_SENSITIVITY_LIMIT} (or
     * finds no t90 at one end).
     */
    WIDE_INTERVAL,
    /**
     * The residuals run in long same-sign stretches: the model misses part of the curve (not read
     * from residuals at the rounding level of an exact curve, see the full-curve fit).
     */
    RESIDUALS_SHOW_STRUCTURE,
    /**
     * T at the last reading is below 1 for the lower end of the c<sub>v</sub> interval: primary
     * consolidation may not be complete.
     */
    PRIMARY_INCOMPLETE,
    /**
     * The full-curve fit puts more than half of primary consolidation before the first reading (U
     * above 50 % there): no reading supports the corrected zero, so d<sub>0</sub> and d<sub>p</sub>
     * are extrapolated and c<sub>v</sub> rests on the later part of primary only. (Where less than
     * 1 % of primary remains at the first reading the fit is refused.)
     */
    PRIMARY_BEFORE_FIRST_READING,
    /**
     * A reading lies further from the fitted curve than the noise of the others allows (a wild
     * reading: a misread dial, a knock, a reading taken after the next load): check it; it pulls
     * the fit. With only one or two readings more than parameters, a wild reading can drag the fit
     * so far that a clean neighbour is named too (the residual variance has one or two degrees of
     * freedom): check the named readings together.
     */
    OUTLYING_READING,
    /** Fewer than half the least-squares starts reached the best fit. */
    STARTS_DISAGREE,
    /**
     * The iterative choice of readings of a further method (the 60-90 % range of the rectangular
     * hyperbola, the early part of the early-slope method, the window of Asaoka's method, the
     * window of the inflection point) did not settle to one set; the last set was used.
     */
    READING_CHOICE_NOT_SETTLED,
    /** The straight line of a further method rests on fewer than 4 readings. */
    FEW_READINGS_IN_RANGE,
    /**
     * The readings end before the part of the curve the method rests on is complete (for example
     * before 90 % consolidation): primary consolidation may not be complete.
     */
    READINGS_END_BEFORE_RANGE,
    /**
     * The method worked on settlements interpolated between the readings rather than on the
     * readings themselves: resampled at equal time steps by a shape-preserving interpolation
     * (Asaoka's method, for readings not equally spaced), or interpolated on log time inside the
     * 60-90 % range (rectangular hyperbola, for too few readings there).
     */
    READINGS_RESAMPLED,
    /**
     * The Terzaghi curve implied by the method's own d<sub>0</sub>, d<sub>100</sub> and
     * c<sub>v</sub> misses the readings it rests on by more than a set fraction of the primary
     * compression (root mean square over the readings up to 70 % consolidation; log-time,
     * root-time, inflection point, rectangular hyperbola and early slope; {@link
     * #IMPLIED_CURVE_MISFIT_LIMIT}): noise large against the primary compression, or a misplaced
     * construction. c<sub>v</sub> is uncertain; compare other methods.
     */
    IMPLIED_CURVE_MISSES_READINGS,
    /**
     * A c<sub>v</sub> method gave no value for this increment (it threw {@link FitException} or
     * rejected the readings); the whole-test reduction records the reason and goes on.
     */
    METHOD_GAVE_NO_VALUE,
    /**
     * Two c<sub>v</sub> methods compared by the whole-test reduction (by default log-time and
     * root-time) differ by more than the factor set in its options.
     */
    METHODS_DISAGREE,
    /**
     * The primary compression ratio of the log-time construction lies outside the range the
     * whole-test reduction treats as usual.
     */
    PRIMARY_RATIO_UNUSUAL,
    /**
     * The drainage path rule needs the height at 50 % consolidation, but no construction gave
     * d<sub>0</sub> and d<sub>100</sub>: the mean height of the increment was used instead.
     */
    DRAINAGE_PATH_FALLBACK,
    /**
     * The whole-test reduction passed over a preferred method's c<sub>v</sub> for the derived
     * quantities (k, C<sub>k</sub>, the end-of-primary point) because that method's own Terzaghi
     * curve misses the readings ({@link #IMPLIED_CURVE_MISSES_READINGS}), and took the next
     * preferred method whose curve does not.
     */
    PREFERRED_METHOD_PASSED_OVER,
    /**
     * The e &ndash; log &sigma;' point of the increment should sit at the end of primary
     * consolidation, but no construction gave d<sub>100</sub>: the end of the increment was used.
     */
    END_OF_PRIMARY_NOT_KNOWN
  }

  /**
   * Creates a warning.
   *
   * @param kind what kind of doubt; not null
   * @param message the details; not blank
   * @throws IllegalArgumentException if kind is null or message is null or blank
   */
  public FitWarning {
    if (kind == null) {
      throw new IllegalArgumentException("warning kind must not be null");
    }
    if (message == null || message.isBlank()) {
      throw new IllegalArgumentException("warning message must not be blank (kind " + kind + ")");
    }
  }

  /**
   * Whether this warning is of the given kind.
   *
   * @param other a kind
   * @return true if {@link #kind()} equals it
   */
  public boolean is(Kind other) {
    return Objects.equals(kind, other);
  }
}
