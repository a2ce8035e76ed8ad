package org.oedometry.core.compressibility;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Compressibility of one load increment, from its start and end points on the compression curve.
 *
 * <ul>
 *   <li>a<sub>v</sub> = &minus;(e<sub>2</sub> &minus; e<sub>1</sub>) / (&sigma;'<sub>2</sub>
 *       &minus; &sigma;'<sub>1</sub>), in 1/Pa (= m^2/N; multiply by 1000 for m^2/kN);
 *   <li>m<sub>v</sub> = a<sub>v</sub> / (1 + e<sub>1</sub>) with e<sub>1</sub> the void ratio at
 *       the start of the increment, in 1/Pa;
 *   <li>the increment's own slope &minus;&Delta;e / &Delta;log<sub>10</sub>&sigma;'
 *       (dimensionless), which is the compression index on the virgin line and the recompression or
 *       swelling index below it;
 *   <li>the mid-increment stress at which c<sub>v</sub> and k are plotted: the logarithmic mean
 *       &radic;(&sigma;'<sub>1</sub>&sigma;'<sub>2</sub>) (the middle of the increment on a log
 *       axis, the default for plotting) and the arithmetic mean (&sigma;'<sub>1</sub> +
 *       &sigma;'<sub>2</sub>) / 2. Which of the two the sources intend is not fixed; both are
 *       given.
 * </ul>
 *
 * @param index increment number j, from 0, as in {@link CompressionCurve}
 * @param startStress &sigma;'<sub>1</sub>, Pa, &ge; 0
 * @param endStress &sigma;'<sub>2</sub>, Pa, &gt; 0
 * @param startVoidRatio e<sub>1</sub>, dimensionless
 * @param endVoidRatio e<sub>2</sub>, dimensionless
 * @param endAxialStrain cumulative axial strain at the end of the increment, dimensionless
 * @param coefficientOfCompressibility a<sub>v</sub>, 1/Pa; positive for the usual response
 *     (compression on loading, swelling on unloading)
 * @param mv coefficient of volume compressibility m<sub>v</sub>, 1/Pa
 * @param logMeanStress &radic;(&sigma;'<sub>1</sub>&sigma;'<sub>2</sub>), Pa; empty when the
 *     increment starts from zero stress
 * @param arithmeticMeanStress (&sigma;'<sub>1</sub> + &sigma;'<sub>2</sub>) / 2, Pa
 * @param compressionSlope &minus;&Delta;e / &Delta;log<sub>10</sub>&sigma;', dimensionless; empty
 *     when the increment starts from zero stress
 * @param stressHistory class of the increment relative to &sigma;'<sub>p</sub>
 */
public record IncrementCompressibility(
    int index,
    double startStress,
    double endStress,
    double startVoidRatio,
    double endVoidRatio,
    double endAxialStrain,
    double coefficientOfCompressibility,
    double mv,
    OptionalDouble logMeanStress,
    double arithmeticMeanStress,
    OptionalDouble compressionSlope,
    IncrementClass stressHistory) {

  /**
   * Validates the numbers.
   *
   * @param index increment number j, from 0, as in {@link CompressionCurve}
   * @param startStress &sigma;'<sub>1</sub>, Pa, &ge; 0
   * @param endStress &sigma;'<sub>2</sub>, Pa, &gt; 0
   * @param startVoidRatio e<sub>1</sub>, dimensionless
   * @param endVoidRatio e<sub>2</sub>, dimensionless
   * @param endAxialStrain cumulative axial strain at the end of the increment, dimensionless
   * @param coefficientOfCompressibility a<sub>v</sub>, 1/Pa; positive for the usual response
   *     (compression on loading, swelling on unloading)
   * @param mv coefficient of volume compressibility m<sub>v</sub>, 1/Pa
   * @param logMeanStress &radic;(&sigma;'<sub>1</sub>&sigma;'<sub>2</sub>), Pa; empty when the
   *     increment starts from zero stress
   * @param arithmeticMeanStress (&sigma;'<sub>1</sub> + &sigma;'<sub>2</sub>) / 2, Pa
   * @param compressionSlope &minus;&Delta;e / &Delta;log<sub>10</sub>&sigma;', dimensionless; empty
   *     when the increment starts from zero stress
   * @param stressHistory class of the increment relative to &sigma;'<sub>p</sub>
   * @throws IllegalArgumentException if a number is not finite, an optional or the class is null,
   *     or the index is negative
   */
  public IncrementCompressibility {
    if (index < 0) {
      throw new IllegalArgumentException(
          String.format(Locale.ROOT, "increment index (%d) must be >= 0", index));
    }
    Checks.nonNegative("start stress", startStress, " Pa");
    Checks.positive("end stress", endStress, " Pa");
    Checks.finite("start void ratio", startVoidRatio, "");
    Checks.finite("end void ratio", endVoidRatio, "");
    Checks.finite("end axial strain", endAxialStrain, "");
    Checks.finite("coefficient of compressibility", coefficientOfCompressibility, " 1/Pa");
    Checks.finite("mv", mv, " 1/Pa");
    Checks.notNull("log-mean stress", logMeanStress);
    Checks.positive("arithmetic mean stress", arithmeticMeanStress, " Pa");
    Checks.notNull("compression slope", compressionSlope);
    Checks.notNull("stress history", stressHistory);
  }

  /**
   * Whether the stress increases over the increment.
   *
   * @return true for loading, false for unloading
   */
  public boolean isLoading() {
    return endStress > startStress;
  }

  /**
   * Oedometer (constrained) modulus E<sub>oed</sub> = 1 / m<sub>v</sub> (FACTS: "Across
   * increments").
   *
   * @return E<sub>oed</sub> in Pa; empty when m<sub>v</sub> is not positive (the specimen did not
   *     respond in the usual sense) or its inverse is not representable
   */
  public OptionalDouble oedometerModulus() {
    double modulus = 1.0 / mv;
    return mv > 0 && Double.isFinite(modulus) ? OptionalDouble.of(modulus) : OptionalDouble.empty();
  }

  /**
   * Void ratio at the middle of the increment, (e<sub>1</sub> + e<sub>2</sub>) / 2, at which a
   * permeability derived from this increment is plotted against e.
   *
   * @return dimensionless
   */
  public double meanVoidRatio() {
    return Checks.mean(startVoidRatio, endVoidRatio);
  }
}
