package org.oedometry.core.compressibility;

import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The numbers one load increment contributes to the compression curve: the effective stress it
 * applies and the specimen settlement at its end and, when known, at the end of primary
 * consolidation.
 *
 * <p>Settlements are cumulative from the start of the test, in metres, positive for compression.
 * The end-of-primary settlement normally comes from a c_v construction (its d100).
 *
 * @param effectiveStress vertical effective stress at the end of the increment, Pa; finite, &gt; 0
 * @param endOfIncrementSettlement settlement at the end of the increment, m; finite
 * @param endOfPrimarySettlement settlement at the end of primary consolidation, m; empty when not
 *     known, otherwise finite
 */
public record IncrementDeformation(
    double effectiveStress,
    double endOfIncrementSettlement,
    OptionalDouble endOfPrimarySettlement) {

  /**
   * Validates the numbers.
   *
   * @param effectiveStress vertical effective stress at the end of the increment, Pa; finite, &gt;
   *     0
   * @param endOfIncrementSettlement settlement at the end of the increment, m; finite
   * @param endOfPrimarySettlement settlement at the end of primary consolidation, m; empty when not
   *     known, otherwise finite
   * @throws IllegalArgumentException if a number is out of range or the optional is null
   */
  public IncrementDeformation {
    Checks.positive("effective stress", effectiveStress, " Pa");
    Checks.finite("end-of-increment settlement", endOfIncrementSettlement, " m");
    Checks.notNull("end-of-primary settlement", endOfPrimarySettlement);
    if (endOfPrimarySettlement.isPresent()) {
      Checks.finite("end-of-primary settlement", endOfPrimarySettlement.getAsDouble(), " m");
    }
  }

  /**
   * An increment with its end-of-increment settlement only.
   *
   * @param effectiveStress Pa; finite, &gt; 0
   * @param endOfIncrementSettlement m; finite
   * @return the value
   * @throws IllegalArgumentException if a number is out of range
   */
  public static IncrementDeformation of(double effectiveStress, double endOfIncrementSettlement) {
    return new IncrementDeformation(
        effectiveStress, endOfIncrementSettlement, OptionalDouble.empty());
  }

  /**
   * An increment with both settlements.
   *
   * @param effectiveStress Pa; finite, &gt; 0
   * @param endOfIncrementSettlement m; finite
   * @param endOfPrimarySettlement m; finite
   * @return the value
   * @throws IllegalArgumentException if a number is out of range
   */
  public static IncrementDeformation of(
      double effectiveStress, double endOfIncrementSettlement, double endOfPrimarySettlement) {
    return new IncrementDeformation(
        effectiveStress, endOfIncrementSettlement, OptionalDouble.of(endOfPrimarySettlement));
  }

  /**
   * The settlement the basis selects.
   *
   * @param basis which settlement to use
   * @param index position of this increment, for the error message
   * @return settlement, m
   * @throws IllegalArgumentException if the end-of-primary settlement is asked for but unknown
   */
  double settlement(DeformationBasis basis, int index) {
    if (basis == DeformationBasis.END_OF_INCREMENT) {
      return endOfIncrementSettlement;
    }
    if (endOfPrimarySettlement.isEmpty()) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "end-of-primary settlement at index %d (stress %s Pa) is not known",
              index,
              effectiveStress));
    }
    return endOfPrimarySettlement.getAsDouble();
  }
}
