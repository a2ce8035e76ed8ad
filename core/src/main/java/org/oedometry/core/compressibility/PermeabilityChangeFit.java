package org.oedometry.core.compressibility;

import java.util.List;

/**
 * A fitted permeability change index.
 *
 * @param permeabilityChangeIndex C<sub>k</sub> = de / dlog<sub>10</sub>k, dimensionless; positive
 *     when k falls with e
 * @param line the fitted line, x = log<sub>10</sub>(k / 1 m/s), y = e; its R<sup>2</sup> is the
 *     fit's
 * @param increments increment numbers fitted (empty when fitted to plain points)
 */
public record PermeabilityChangeFit(
    double permeabilityChangeIndex, LineFit line, List<Integer> increments) {

  /**
   * Validates and copies.
   *
   * @param permeabilityChangeIndex C<sub>k</sub> = de / dlog<sub>10</sub>k, dimensionless; positive
   *     when k falls with e
   * @param line the fitted line, x = log<sub>10</sub>(k / 1 m/s), y = e; its R<sup>2</sup> is the
   *     fit's
   * @param increments increment numbers fitted (empty when fitted to plain points)
   * @throws IllegalArgumentException if the index is not finite or an argument is null
   */
  public PermeabilityChangeFit {
    Checks.finite("permeability change index", permeabilityChangeIndex, "");
    Checks.notNull("line", line);
    increments = List.copyOf(Checks.notNull("increments", increments));
  }

  /**
   * R<sup>2</sup> of the fit.
   *
   * @return in [0, 1]
   */
  public double rSquared() {
    return line.rSquared();
  }
}
