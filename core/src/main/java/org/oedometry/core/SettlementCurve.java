package org.oedometry.core;

import java.util.Arrays;
import java.util.OptionalDouble;
import org.oedometry.core.internal.Checks;

/**
 * The readings of one load increment: elapsed time since the load was applied and the settlement of
 * the specimen since the start of the increment.
 *
 * <p>Conventions (binding for every method that takes a curve):
 *
 * <ul>
 *   <li>Elapsed time in s, t = 0 at the instant the load is applied; times are &ge; 0 and strictly
 *       increasing.
 *   <li>Settlement in m, measured from the specimen's height at the start of this increment (not
 *       cumulative over the test), positive for compression, negative for swelling.
 *   <li>A reading at t = 0 is allowed and kept: it is the <em>zero reading</em>, reported by {@link
 *       #zeroReading()}. The graphical constructions ignore it, since the deformation on loading
 *       (seating, apparatus, trapped air) makes it unreliable; they say so in their warnings.
 * </ul>
 *
 * <p>At least two readings are required here; each method of reduction asks for as many more as it
 * needs and says so in its own message.
 *
 * <p>Immutable and thread-safe: arrays are copied in and out. {@link #equals(Object)} compares the
 * readings exactly (bit for bit, as {@link Arrays#equals(double[], double[])}).
 */
public final class SettlementCurve {

  private final double[] elapsedSeconds;
  private final double[] settlementMetres;

  private SettlementCurve(double[] elapsedSeconds, double[] settlementMetres) {
    this.elapsedSeconds = elapsedSeconds;
    this.settlementMetres = settlementMetres;
  }

  /**
   * Creates a curve from its readings.
   *
   * @param elapsedSeconds elapsed time of each reading since the load was applied, s; finite, &ge;
   *     0, strictly increasing; copied
   * @param settlementMetres settlement at each reading since the start of the increment, m,
   *     positive for compression; finite; copied
   * @return the curve
   * @throws IllegalArgumentException if the arrays differ in length, hold fewer than 2 readings,
   *     hold a non-finite value, a negative time, or a time that is not after the one before it;
   *     the message names the index and the values
   * @throws NullPointerException if an array is null
   */
  public static SettlementCurve of(double[] elapsedSeconds, double[] settlementMetres) {
    if (elapsedSeconds == null || settlementMetres == null) {
      throw new NullPointerException("elapsedSeconds and settlementMetres must not be null");
    }
    double[] t = elapsedSeconds.clone();
    double[] s = settlementMetres.clone();
    if (t.length != s.length) {
      throw new IllegalArgumentException(
          Checks.format(
              "elapsed times (%d values) and settlements (%d values) differ in length",
              t.length, s.length));
    }
    if (t.length < 2) {
      throw new IllegalArgumentException(
          Checks.format("a settlement curve needs at least 2 readings, got %d", t.length));
    }
    for (int i = 0; i < t.length; i++) {
      if (!Double.isFinite(t[i])) {
        throw new IllegalArgumentException(
            Checks.format(
                "elapsed time at index %d (%s s) must be finite", i, Checks.number(t[i])));
      }
      if (!(t[i] >= 0)) {
        throw new IllegalArgumentException(
            Checks.format("elapsed time at index %d (%s s) must be >= 0", i, Checks.number(t[i])));
      }
      t[i] += 0.0; // -0.0 becomes +0.0, so equal curves have equal bits
      if (!Double.isFinite(s[i])) {
        throw new IllegalArgumentException(
            Checks.format("settlement at index %d (%s m) must be finite", i, Checks.number(s[i])));
      }
      if (i > 0 && !(t[i] > t[i - 1])) {
        throw new IllegalArgumentException(
            Checks.format(
                "elapsed time at index %d (%s s) is not after index %d (%s s)",
                i, Checks.number(t[i]), i - 1, Checks.number(t[i - 1])));
      }
    }
    return new SettlementCurve(t, s);
  }

  /**
   * Number of readings, the zero reading included.
   *
   * @return at least 2
   */
  public int size() {
    return elapsedSeconds.length;
  }

  /**
   * Elapsed times of all readings.
   *
   * @return a new array, s, strictly increasing
   */
  public double[] elapsedSeconds() {
    return elapsedSeconds.clone();
  }

  /**
   * Settlements of all readings.
   *
   * @return a new array, m, positive for compression, from the start of the increment
   */
  public double[] settlementMetres() {
    return settlementMetres.clone();
  }

  /**
   * Elapsed time of one reading.
   *
   * @param index 0 &le; index &lt; {@link #size()}
   * @return the elapsed time, s
   * @throws IllegalArgumentException if the index is out of range
   */
  public double elapsedSeconds(int index) {
    return elapsedSeconds[checkIndex(index)];
  }

  /**
   * Settlement at one reading.
   *
   * @param index 0 &le; index &lt; {@link #size()}
   * @return the settlement since the start of the increment, m
   * @throws IllegalArgumentException if the index is out of range
   */
  public double settlementMetres(int index) {
    return settlementMetres[checkIndex(index)];
  }

  private int checkIndex(int index) {
    if (index < 0 || index >= elapsedSeconds.length) {
      throw new IllegalArgumentException(
          Checks.format("reading index %d is outside 0..%d", index, elapsedSeconds.length - 1));
    }
    return index;
  }

  /**
   * Whether the first reading is at t = 0 (the zero reading).
   *
   * @return true if a zero reading is present
   */
  public boolean hasZeroReading() {
    return elapsedSeconds[0] == 0;
  }

  /**
   * The settlement at the zero reading (t = 0), which the constructions ignore.
   *
   * @return the settlement at t = 0 in m, or empty if the curve has no zero reading
   */
  public OptionalDouble zeroReading() {
    return hasZeroReading() ? OptionalDouble.of(settlementMetres[0]) : OptionalDouble.empty();
  }

  /**
   * Index of the first reading taken after the load was applied (t &gt; 0).
   *
   * @return 1 if the curve has a zero reading, else 0
   */
  public int firstTimedIndex() {
    return hasZeroReading() ? 1 : 0;
  }

  /**
   * Settlement at the last reading: the settlement of the whole increment, which the next increment
   * starts from.
   *
   * @return m, positive for compression
   */
  public double finalSettlementMetres() {
    return settlementMetres[settlementMetres.length - 1];
  }

  /**
   * Largest settlement reached during the increment (the lowest specimen height).
   *
   * @return m
   */
  public double maximumSettlementMetres() {
    double max = settlementMetres[0];
    for (double s : settlementMetres) {
      max = Math.max(max, s);
    }
    return max;
  }

  /**
   * Elapsed time of the last reading.
   *
   * @return s
   */
  public double durationSeconds() {
    return elapsedSeconds[elapsedSeconds.length - 1];
  }

  @Override
  public boolean equals(Object other) {
    return other instanceof SettlementCurve
        && Arrays.equals(elapsedSeconds, ((SettlementCurve) other).elapsedSeconds)
        && Arrays.equals(settlementMetres, ((SettlementCurve) other).settlementMetres);
  }

  @Override
  public int hashCode() {
    return 31 * Arrays.hashCode(elapsedSeconds) + Arrays.hashCode(settlementMetres);
  }

  /**
   * A one-line summary for JShell and test reports, e.g. {@code SettlementCurve[9 readings, t
   * 0.0..86400.0 s, final settlement 0.00125 m, zero reading kept]}.
   *
   * @return the summary
   */
  @Override
  public String toString() {
    return Checks.format(
        "SettlementCurve[%d readings, t %s..%s s, final settlement %s m%s]",
        size(),
        Checks.brief(elapsedSeconds[0]),
        Checks.brief(durationSeconds()),
        Checks.brief(finalSettlementMetres()),
        hasZeroReading() ? ", zero reading kept" : "");
  }
}
