package org.oedometry.core;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.oedometry.core.internal.Checks;

/**
 * Turns raw displacement-gauge readings into settlement curves: gauge zero, direction of travel,
 * unit, and an optional correction for the deformation of the apparatus.
 *
 * <p>Settlement of the specimen during increment i at a reading g:
 *
 * <pre>
 *   s = sign * (g - g_start,i) * unit  -  (c_i - c_(i-1))
 * </pre>
 *
 * where g<sub>start,i</sub> is the gauge reading at the start of the increment, sign is +1 or -1 by
 * {@link GaugeDirection}, and c<sub>i</sub> is the deflection of the apparatus (loading frame,
 * porous stones, filter paper) under the stress after increment i, as measured in a calibration
 * with a steel dummy in place of the specimen, relative to its state when the gauge zero was read
 * (c<sub>0</sub> = 0). The apparatus deflects as soon as the load goes on, so every reading under
 * the new load, the zero reading included, carries the whole correction. On unloading the apparatus
 * springs back: c<sub>i</sub> &lt; c<sub>i-1</sub> and the correction adds to the (negative)
 * settlement.
 *
 * <p>For a whole test ({@link #curves}) the gauge reading at the start of an increment is the gauge
 * zero for the first increment and the last reading of the previous increment for the others: the
 * specimen height carries over from one increment to the next.
 *
 * @param unit the unit the gauge reads in; a length unit
 * @param direction how the reading moves when the specimen compresses
 */
public record GaugeConversion(LabUnit unit, GaugeDirection direction) {

  /**
   * Validates the conversion.
   *
   * @param unit the unit the gauge reads in; a length unit
   * @param direction how the reading moves when the specimen compresses
   * @throws IllegalArgumentException if the unit is not a unit of length
   * @throws NullPointerException if an argument is null
   */
  public GaugeConversion {
    Objects.requireNonNull(unit, "unit must not be null");
    Objects.requireNonNull(direction, "direction must not be null");
    if (unit.quantity() != LabUnit.Quantity.LENGTH) {
      throw new IllegalArgumentException(
          Checks.format(
              "gauge unit (%s) must be a unit of length: %s",
              unit.headerToken(), LabUnit.headerTokens(LabUnit.Quantity.LENGTH)));
    }
  }

  /**
   * Creates a conversion.
   *
   * @param unit a length unit
   * @param direction the direction of travel on compression
   * @return the conversion
   * @throws IllegalArgumentException if the unit is not a unit of length
   * @throws NullPointerException if an argument is null
   */
  public static GaugeConversion of(LabUnit unit, GaugeDirection direction) {
    return new GaugeConversion(unit, direction);
  }

  /**
   * Gauge travel since a reference reading, as settlement (no apparatus correction).
   *
   * @param reading the gauge reading, in {@link #unit()}; finite
   * @param reference the reference reading, in {@link #unit()}; finite
   * @return m, positive for compression
   * @throws IllegalArgumentException if a reading is not finite or the travel overflows
   */
  public double travelMetres(double reading, double reference) {
    Checks.finite(reading, "gauge reading", unit.symbol());
    Checks.finite(reference, "gauge reference reading", unit.symbol());
    double travel = direction.sign() * (reading - reference);
    if (!Double.isFinite(travel)) {
      throw new IllegalArgumentException(
          Checks.format(
              "gauge travel from the reference reading (%s %s) to the reading (%s %s) is beyond"
                  + " the range of a double",
              Checks.number(reference), unit.symbol(), Checks.number(reading), unit.symbol()));
    }
    return unit.toSi(travel);
  }

  /**
   * The settlement curve of one increment.
   *
   * @param elapsedSeconds elapsed time of each reading since load application, s; see {@link
   *     SettlementCurve#of}
   * @param readings gauge readings, in {@link #unit()}; finite
   * @param readingAtStart gauge reading at the start of the increment, in {@link #unit()}; finite
   * @param apparatusDeflectionMetres change of the apparatus deflection over this increment
   *     (c<sub>i</sub> - c<sub>i-1</sub>), m, positive when the apparatus compresses; finite; 0 for
   *     no correction
   * @return the specimen's settlement curve
   * @throws IllegalArgumentException as {@link SettlementCurve#of}, or if a reading or the
   *     deflection is not finite, or a settlement would be beyond the range of a double
   * @throws NullPointerException if an array is null
   */
  public SettlementCurve curve(
      double[] elapsedSeconds,
      double[] readings,
      double readingAtStart,
      double apparatusDeflectionMetres) {
    Objects.requireNonNull(elapsedSeconds, "elapsedSeconds must not be null");
    Objects.requireNonNull(readings, "readings must not be null");
    Checks.finite(apparatusDeflectionMetres, "apparatus deflection", "m");
    double[] settlement = new double[readings.length];
    for (int i = 0; i < readings.length; i++) {
      if (!Double.isFinite(readings[i])) {
        throw new IllegalArgumentException(
            Checks.format(
                "gauge reading at index %d (%s %s) must be finite",
                i, Checks.number(readings[i]), unit.symbol()));
      }
      settlement[i] = travelMetres(readings[i], readingAtStart) - apparatusDeflectionMetres;
      if (!Double.isFinite(settlement[i])) {
        throw new IllegalArgumentException(
            Checks.format(
                "gauge reading at index %d (%s %s) less the apparatus deflection (%s m) is beyond"
                    + " the range of a double",
                i,
                Checks.number(readings[i]),
                unit.symbol(),
                Checks.number(apparatusDeflectionMetres)));
      }
    }
    return SettlementCurve.of(elapsedSeconds, settlement);
  }

  /**
   * The settlement curves of a whole test, without apparatus correction.
   *
   * @param gaugeZero gauge reading at the specimen's initial height, in {@link #unit()}; finite
   * @param elapsedSeconds for each increment, the elapsed times, s
   * @param readings for each increment, the gauge readings, in {@link #unit()}
   * @return one curve per increment, in order
   * @throws IllegalArgumentException if the lists differ in size or are empty, or as {@link
   *     #curve}, with the increment's index in the message
   * @throws NullPointerException if an argument is null
   */
  public List<SettlementCurve> curves(
      double gaugeZero, List<double[]> elapsedSeconds, List<double[]> readings) {
    return curves(gaugeZero, elapsedSeconds, readings, new double[readings.size()]);
  }

  /**
   * The settlement curves of a whole test, corrected for the deflection of the apparatus.
   *
   * @param gaugeZero gauge reading at the specimen's initial height, in {@link #unit()}; finite
   * @param elapsedSeconds for each increment, the elapsed times, s
   * @param readings for each increment, the gauge readings, in {@link #unit()}
   * @param apparatusDeflectionMetres for each increment, the calibrated deflection of the apparatus
   *     under the increment's stress after, relative to its state at the gauge zero, m; finite
   * @return one curve per increment, in order
   * @throws IllegalArgumentException if the lists and array differ in size or are empty, if a
   *     deflection is not finite or differs from the one before by more than the range of a double
   *     (the message names both), or as {@link #curve}, with the increment's index in the message
   * @throws NullPointerException if an argument is null
   */
  public List<SettlementCurve> curves(
      double gaugeZero,
      List<double[]> elapsedSeconds,
      List<double[]> readings,
      double[] apparatusDeflectionMetres) {
    Checks.finite(gaugeZero, "gauge zero", unit.symbol());
    int n = readings.size();
    if (n == 0 || elapsedSeconds.size() != n || apparatusDeflectionMetres.length != n) {
      throw new IllegalArgumentException(
          Checks.format(
              "need the same number (> 0) of time arrays (%d), reading arrays (%d) and"
                  + " apparatus deflections (%d)",
              elapsedSeconds.size(), n, apparatusDeflectionMetres.length));
    }
    List<SettlementCurve> curves = new ArrayList<>(n);
    double start = gaugeZero;
    double previousDeflection = 0;
    for (int i = 0; i < n; i++) {
      double[] r = readings.get(i);
      try {
        Checks.finite(apparatusDeflectionMetres[i], "apparatus deflection", "m");
        double change = apparatusDeflectionMetres[i] - previousDeflection;
        if (!Double.isFinite(change)) {
          throw new IllegalArgumentException(
              Checks.format(
                  "the change of the apparatus deflection from %s m (increment at index %d) to %s m"
                      + " is beyond the range of a double",
                  Checks.number(previousDeflection),
                  i - 1,
                  Checks.number(apparatusDeflectionMetres[i])));
        }
        curves.add(curve(elapsedSeconds.get(i), r, start, change));
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException("increment at index " + i + ": " + e.getMessage(), e);
      }
      start = r[r.length - 1];
      previousDeflection = apparatusDeflectionMetres[i];
    }
    return List.copyOf(curves);
  }
}
