package org.oedometry.core.compressibility;

/**
 * Hydraulic conductivity of one increment, k = c<sub>v</sub> m<sub>v</sub> &gamma;<sub>w</sub>,
 * with the void ratio at which it is plotted.
 *
 * @param index increment number, &ge; 0
 * @param meanVoidRatio (e<sub>1</sub> + e<sub>2</sub>) / 2 of the increment, dimensionless; the
 *     void ratio against which k is plotted and C<sub>k</sub> fitted (our convention: k is an
 *     average property over the increment)
 * @param cv c<sub>v</sub>, m^2/s, &gt; 0
 * @param mv m<sub>v</sub>, 1/Pa, &gt; 0
 * @param permeability k, m/s, &gt; 0
 */
public record IncrementPermeability(
    int index, double meanVoidRatio, double cv, double mv, double permeability) {

  /**
   * Validates the numbers.
   *
   * @param index increment number, &ge; 0
   * @param meanVoidRatio (e<sub>1</sub> + e<sub>2</sub>) / 2 of the increment, dimensionless; the
   *     void ratio against which k is plotted and C<sub>k</sub> fitted (our convention: k is an
   *     average property over the increment)
   * @param cv c<sub>v</sub>, m^2/s, &gt; 0
   * @param mv m<sub>v</sub>, 1/Pa, &gt; 0
   * @param permeability k, m/s, &gt; 0
   * @throws IllegalArgumentException if the index is negative or a number is out of range
   */
  public IncrementPermeability {
    if (index < 0) {
      throw new IllegalArgumentException("increment index (" + index + ") must be >= 0");
    }
    Checks.positive("mean void ratio", meanVoidRatio, "");
    Checks.positive("cv", cv, " m^2/s");
    Checks.positive("mv", mv, " 1/Pa");
    Checks.positive("permeability", permeability, " m/s");
  }
}
