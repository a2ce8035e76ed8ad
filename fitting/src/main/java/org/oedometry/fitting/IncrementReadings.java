package org.oedometry.fitting;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.Checks;

/**
 * The timed readings (t &gt; 0) of one increment, turned to the direction of movement, as the
 * further c<sub>v</sub> methods use them: settlement counted from the start of the increment (the
 * convention of {@link SettlementCurve}), times the sign of the movement so that a swelling
 * increment is treated by its magnitude. Records the warnings that preparation raises.
 */
final class IncrementReadings {

  /** Elapsed times, s, all &gt; 0, increasing. */
  final double[] times;

  /** Settlements times {@link #sign}, m: increasing on the whole. */
  final double[] movement;

  /** +1 for compression, -1 for swelling. */
  final double sign;

  /** Warnings raised while preparing (zero reading left out, swelling). */
  final List<FitWarning> warnings;

  private IncrementReadings(
      double[] times, double[] movement, double sign, List<FitWarning> warnings) {
    this.times = times;
    this.movement = movement;
    this.sign = sign;
    this.warnings = warnings;
  }

  /**
   * Prepares the readings.
   *
   * @param curve the curve; not null
   * @param drainagePathMetres checked to be finite and &gt; 0
   * @param minimum readings after t = 0 the method needs
   * @param method the method's name for messages
   * @throws IllegalArgumentException if the curve is null, the drainage path is invalid or there
   *     are too few readings
   * @throws FitException if the readings do not move, or the last reading equals the first (no net
   *     movement: +0 and -0 count as equal)
   */
  static IncrementReadings of(
      SettlementCurve curve, double drainagePathMetres, int minimum, String method) {
    Checks.requireDrainagePath(drainagePathMetres);
    if (curve == null) {
      throw new IllegalArgumentException("curve must not be null");
    }
    double[] allTimes = curve.elapsedSeconds();
    double[] allSettlements = curve.settlementMetres();
    int first = curve.firstTimedIndex();
    int n = allTimes.length - first;
    if (n < minimum) {
      throw new IllegalArgumentException(
          Checks.format(
              "%d readings after t = 0 are too few for the %s method (needs at least %d)",
              n, method, minimum));
    }
    double[] t = Arrays.copyOfRange(allTimes, first, allTimes.length);
    double[] d = Arrays.copyOfRange(allSettlements, first, allSettlements.length);
    double lowest = Arrays.stream(d).min().orElseThrow();
    double highest = Arrays.stream(d).max().orElseThrow();
    if (!(highest > lowest)) {
      throw new FitException(
          "the readings do not move (every settlement is "
              + d[0]
              + " m): there is no consolidation to analyse");
    }
    if (d[n - 1] == d[0]) {
      // Movement in between but none from the first reading to the last: noise or a rebound,
      // no consolidation (the log-time and root-time constructions refuse it alike).
      throw new FitException(
          Checks.format(
              "the last reading (%s m) is where the first one was: no net movement, so there is no"
                  + " consolidation to analyse",
              d[n - 1]));
    }
    List<FitWarning> warnings = new ArrayList<>();
    if (first == 1) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.ZERO_READING_IGNORED,
              Checks.format(
                  "the reading at t = 0 (%s m) was left out; settlement is counted from the start"
                      + " of the increment",
                  allSettlements[0])));
    }
    double sign = d[n - 1] >= d[0] ? 1.0 : -1.0;
    if (sign < 0) {
      warnings.add(
          new FitWarning(
              FitWarning.Kind.SWELLING_INCREMENT,
              "settlement decreases (swelling): the method used the magnitude of the movement;"
                  + " swelling c_v is usually reported for information only"));
      for (int i = 0; i < n; i++) {
        d[i] = -d[i];
      }
    }
    return new IncrementReadings(t, d, sign, warnings);
  }

  /** Number of readings. */
  int size() {
    return times.length;
  }

  /** Elapsed time of the last reading, s. */
  double lastTime() {
    return times[times.length - 1];
  }

  /**
   * The binary exponent of the largest |movement| ({@link Math#getExponent}): dividing the movement
   * by 2 to this power brings its largest value into [1, 2) (or near it, for subnormal readings),
   * so that a method's sums and quotients stay within the double range for settlements of any
   * magnitude.
   *
   * @return the exponent, -1023 to 1023
   */
  int movementExponent() {
    double largest = 0;
    for (double value : movement) {
      largest = Math.max(largest, Math.abs(value));
    }
    return Math.getExponent(largest);
  }

  /**
   * The movement times 2<sup>-exponent</sup>, a new array: exact (a power of 2) wherever the result
   * is a normal double, as it is for the exponent of {@link #movementExponent}, so that results
   * computed on it and multiplied by 2<sup>exponent</sup> are those of the movement itself.
   *
   * @param exponent the power of 2 to divide by; 0 gives a copy
   * @return the scaled movement
   */
  double[] scaledMovement(int exponent) {
    double[] scaled = new double[movement.length];
    for (int i = 0; i < scaled.length; i++) {
      scaled[i] = Math.scalb(movement[i], -exponent);
    }
    return scaled;
  }

  /**
   * A settlement computed on the movement scaled by 2<sup>-exponent</sup>, back in metres for a
   * message: formatted with the given template where it is a finite double in metres, else in
   * decimal notation beyond the double range ({@link #decimal}; no infinity in messages).
   *
   * @param scaled the scaled value
   * @param exponent the power of 2 the movement was divided by
   * @param template a {@link String#format} template for one double, as {@code "%s"}
   * @return the text, without the unit
   */
  static String metresText(double scaled, int exponent, String template) {
    double value = Math.scalb(scaled, exponent);
    return Double.isFinite(value) ? Checks.format(template, value) : decimal(scaled, exponent);
  }

  /**
   * A value given as scaled times 2<sup>exponent</sup>, in decimal notation to 4 digits even where
   * it lies beyond the double range, as "1.462e+375" (from log<sub>10</sub> of the two factors).
   *
   * @param scaled a finite value
   * @param exponent its power of 2
   * @return the text
   */
  static String decimal(double scaled, int exponent) {
    if (scaled == 0) {
      return "0";
    }
    double log = Math.log10(Math.abs(scaled)) + exponent * Math.log10(2);
    double power = Math.floor(log);
    double mantissa = Math.copySign(Math.pow(10, log - power), scaled);
    if (Math.abs(mantissa) >= 9.9995) {
      mantissa /= 10;
      power += 1;
    }
    return Checks.format("%.4fe%+d", mantissa, (long) power).replaceFirst("\\.?0+e", "e");
  }

  /**
   * A settlement (or a slope in metres per unit of time) computed on the movement scaled by
   * 2<sup>-exponent</sup>, back in metres: exact (a power of 2) wherever the result is a normal
   * double.
   *
   * @param scaled the scaled value
   * @param exponent the power of 2 the movement was divided by
   * @param what the quantity's name for the message
   * @param unit its unit for the message, as "m"
   * @return the value in metres
   * @throws FitException if the value in metres is beyond the double range
   */
  static double inMetres(double scaled, int exponent, String what, String unit) {
    double value = Math.scalb(scaled, exponent);
    if (!Double.isFinite(value)) {
      throw new FitException(
          Checks.format(
              "%s (%s %s) is beyond the range of double precision",
              what, decimal(scaled, exponent), unit));
    }
    return value;
  }
}
