package org.oedometry.theory;

/**
 * The four parameters of {@link ConsolidationCurveModel}: where an increment's settlement starts,
 * how much primary consolidation it has, how fast (c<sub>v</sub>) and how steep its secondary
 * compression is.
 *
 * <p>Settlement is positive for compression. For a swelling increment the primary settlement and
 * the secondary slope are negative (or fit the magnitude of the readings).
 *
 * @param initialSettlement d<sub>i</sub>, the corrected zero: settlement at t = 0+ once the
 *     instantaneous (false) deformation is taken away, m; finite
 * @param primarySettlement d<sub>p</sub>, the primary consolidation settlement, m; finite
 * @param cv coefficient of consolidation c<sub>v</sub>, m<sup>2</sup>/s; finite and &gt; 0
 * @param secondarySlope s, the secondary compression per log<sub>10</sub> cycle of time once
 *     primary consolidation is over, m; finite
 */
public record CurveParameters(
    double initialSettlement, double primarySettlement, double cv, double secondarySlope) {

  /**
   * Validates the parameters.
   *
   * @param initialSettlement d<sub>i</sub>, m; finite
   * @param primarySettlement d<sub>p</sub>, m; finite
   * @param cv c<sub>v</sub>, m<sup>2</sup>/s; finite and &gt; 0
   * @param secondarySlope s, m per log<sub>10</sub> cycle; finite
   * @throws IllegalArgumentException if a value is NaN or infinite, or c<sub>v</sub> is not
   *     positive
   */
  public CurveParameters {
    Messages.requireFinite("initial settlement", initialSettlement, "m");
    Messages.requireFinite("primary settlement", primarySettlement, "m");
    Messages.requirePositiveFinite("cv", cv, "m^2/s");
    Messages.requireFinite("secondary slope", secondarySlope, "m per log10 cycle");
  }

  /**
   * Creates the parameters.
   *
   * @param initialSettlement d<sub>i</sub>, m; finite
   * @param primarySettlement d<sub>p</sub>, m; finite
   * @param cv c<sub>v</sub>, m<sup>2</sup>/s; finite and &gt; 0
   * @param secondarySlope s, m per log<sub>10</sub> cycle; finite
   * @return the parameters
   * @throws IllegalArgumentException if a value is NaN or infinite, or c<sub>v</sub> is not
   *     positive
   */
  public static CurveParameters of(
      double initialSettlement, double primarySettlement, double cv, double secondarySlope) {
    return new CurveParameters(initialSettlement, primarySettlement, cv, secondarySlope);
  }

  /**
   * Settlement at the end of primary consolidation, d<sub>100</sub> = d<sub>i</sub> + d<sub>p
   * </sub> (without the secondary compression that has already happened by then).
   *
   * @return d<sub>100</sub>, m
   */
  public double endOfPrimarySettlement() {
    return initialSettlement + primarySettlement;
  }
}
