package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * Per-increment compressibility of an oedometer test: a<sub>v</sub>, m<sub>v</sub>, the increment's
 * own e &ndash; log&sigma;' slope, the mid-increment stresses and the class of each increment
 * relative to the preconsolidation pressure. See {@link IncrementCompressibility} for the formulas.
 *
 * <p>Check value [published: Venkatramaiah, Geotechnical Engineering, Example 7.1]: e from 0.70 to
 * 0.65 for 50 &rarr; 100 kPa gives a<sub>v</sub> = 0.001 m^2/kN and m<sub>v</sub> = 5.88e-4 m^2/kN.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern. Stateless and thread-safe.
 */
public final class Compressibility {

  private Compressibility() {}

  /**
   * Compressibility of every increment of a curve.
   *
   * @param curve the compression curve
   * @param preconsolidationPressure &sigma;'<sub>p</sub> used to class the increments, Pa; finite,
   *     &gt; 0 (from one of the preconsolidation methods, or a value the engineer sets)
   * @return one value per increment, in order
   * @throws IllegalArgumentException if the curve is null or the pressure is not finite and
   *     positive, or an increment's a<sub>v</sub> or e &ndash; log&sigma;' slope is beyond the
   *     double range (the message names the increment and its numbers)
   */
  public static List<IncrementCompressibility> increments(
      CompressionCurve curve, double preconsolidationPressure) {
    Checks.notNull("compression curve", curve);
    Checks.positive("preconsolidation pressure", preconsolidationPressure, " Pa");
    List<IncrementClass> classes = classify(curve, preconsolidationPressure);
    List<IncrementCompressibility> out = new ArrayList<>(curve.size());
    double e0 = curve.initialVoidRatio();
    for (int j = 0; j < curve.size(); j++) {
      double s1 = curve.startStress(j);
      double s2 = curve.stress(j);
      double e1 = curve.startVoidRatio(j);
      double e2 = curve.voidRatio(j);
      double av = representable(j, "coefficient of compressibility", -(e2 - e1) / (s2 - s1), curve);
      double mv = av / (1.0 + e1);
      OptionalDouble logMean = OptionalDouble.empty();
      OptionalDouble slope = OptionalDouble.empty();
      if (s1 > 0) {
        logMean = OptionalDouble.of(Math.sqrt(s1) * Math.sqrt(s2));
        slope =
            OptionalDouble.of(
                representable(j, "compression slope", -(e2 - e1) / log10Ratio(s1, s2), curve));
      }
      out.add(
          new IncrementCompressibility(
              j,
              s1,
              s2,
              e1,
              e2,
              (e0 - e2) / (1.0 + e0),
              av,
              mv,
              logMean,
              Checks.mean(s1, s2),
              slope,
              classes.get(j)));
    }
    return List.copyOf(out);
  }

  /**
   * log<sub>10</sub>(&sigma;'<sub>2</sub> / &sigma;'<sub>1</sub>) for positive stresses: through
   * log1p of the relative change where they are within a factor of 2 (exact difference, no
   * cancellation, so stresses a few ulps apart still give a non-zero change), otherwise the
   * difference of the logarithms (no overflow of the quotient).
   */
  private static double log10Ratio(double s1, double s2) {
    double ratio = s2 / s1;
    if (ratio > 0.5 && ratio < 2) {
      return Math.log1p((s2 - s1) / s1) / Math.log(10);
    }
    return Math.log10(s2) - Math.log10(s1);
  }

  /**
   * The value, or an IllegalArgumentException naming the increment, the quantity and the numbers it
   * comes from where it leaves the double range (stresses a few ulps apart, or void ratios and
   * stresses of very different magnitudes).
   */
  private static double representable(int j, String name, double value, CompressionCurve curve) {
    return Checks.representable(
        value,
        "increment at index %d: the %s from void ratio %s to %s over stress %s Pa to %s Pa",
        j,
        name,
        curve.startVoidRatio(j),
        curve.voidRatio(j),
        curve.startStress(j),
        curve.stress(j));
  }

  /**
   * Classes of the increments, as defined in {@link IncrementClass}.
   *
   * @param curve the curve
   * @param preconsolidationPressure Pa, &gt; 0
   * @return one class per increment
   */
  static List<IncrementClass> classify(CompressionCurve curve, double preconsolidationPressure) {
    List<IncrementClass> out = new ArrayList<>(curve.size());
    double largestSoFar = curve.seatingStress();
    for (int j = 0; j < curve.size(); j++) {
      double s1 = curve.startStress(j);
      double s2 = curve.stress(j);
      largestSoFar = Math.max(largestSoFar, s1);
      double effective = Math.max(preconsolidationPressure, largestSoFar);
      IncrementClass c;
      if (s2 < s1) {
        c = IncrementClass.UNLOADING;
      } else if (s1 >= effective) {
        c = IncrementClass.NORMALLY_CONSOLIDATED;
      } else if (s2 <= effective) {
        c = s1 < largestSoFar ? IncrementClass.RELOADING : IncrementClass.RECOMPRESSION;
      } else {
        c = IncrementClass.CROSSES_PRECONSOLIDATION;
      }
      out.add(c);
    }
    return out;
  }
}
