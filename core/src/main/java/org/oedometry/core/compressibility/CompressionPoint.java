package org.oedometry.core.compressibility;

/**
 * One point of a compression curve: an effective stress and the void ratio the specimen reached
 * under it.
 *
 * @param effectiveStress vertical effective stress &sigma;', Pa; finite, &gt; 0
 * @param voidRatio void ratio e, dimensionless; finite, &gt; 0
 */
public record CompressionPoint(double effectiveStress, double voidRatio) {

  /**
   * Validates the point.
   *
   * @param effectiveStress vertical effective stress &sigma;', Pa; finite, &gt; 0
   * @param voidRatio void ratio e, dimensionless; finite, &gt; 0
   * @throws IllegalArgumentException if a number is not finite and positive
   */
  public CompressionPoint {
    Checks.positive("effective stress", effectiveStress, " Pa");
    Checks.positive("void ratio", voidRatio, "");
  }

  /**
   * log<sub>10</sub> of the effective stress in Pa, the abscissa of an e &ndash; log &sigma;' plot.
   *
   * @return log<sub>10</sub>(&sigma;' / 1 Pa)
   */
  public double log10Stress() {
    return Math.log10(effectiveStress);
  }
}
