package org.oedometry.core.compressibility;

import java.util.List;
import java.util.Locale;

/**
 * A compression, recompression or swelling index fitted as the slope of a straight line on the e
 * &ndash; log<sub>10</sub>&sigma;' plot, with its modified (per unit strain) form.
 *
 * <p>Index C = &minus;de / dlog<sub>10</sub>&sigma;' (positive when e falls as the stress rises);
 * modified index C / (1 + e<sub>0</sub>) with e<sub>0</sub> the initial void ratio of the specimen,
 * the strain per log cycle of stress (C<sub>c&epsilon;</sub>, C<sub>r&epsilon;</sub>).
 *
 * @param index C, dimensionless
 * @param modifiedIndex C / (1 + e<sub>0</sub>), dimensionless
 * @param initialVoidRatio the e<sub>0</sub> used, dimensionless
 * @param line the fitted line, x = log<sub>10</sub>(&sigma;' / 1 Pa), y = e
 * @param increments the increments whose end points were fitted (empty when fitted to plain points)
 */
public record IndexFit(
    double index,
    double modifiedIndex,
    double initialVoidRatio,
    LineFit line,
    List<Integer> increments) {

  /**
   * Validates and copies.
   *
   * @param index C, dimensionless
   * @param modifiedIndex C / (1 + e<sub>0</sub>), dimensionless
   * @param initialVoidRatio the e<sub>0</sub> used, dimensionless
   * @param line the fitted line, x = log<sub>10</sub>(&sigma;' / 1 Pa), y = e
   * @param increments the increments whose end points were fitted (empty when fitted to plain
   *     points)
   * @throws IllegalArgumentException if a number is not finite, or the line or list is null
   */
  public IndexFit {
    Checks.finite("index", index, "");
    Checks.finite("modified index", modifiedIndex, "");
    Checks.positive("initial void ratio", initialVoidRatio, "");
    Checks.notNull("line", line);
    increments = List.copyOf(Checks.notNull("increments", increments));
  }

  static IndexFit of(LineFit line, double initialVoidRatio, List<Integer> increments) {
    double c = -line.slope();
    return new IndexFit(c, c / (1.0 + initialVoidRatio), initialVoidRatio, line, increments);
  }

  @Override
  public String toString() {
    return String.format(
        Locale.ROOT,
        "IndexFit[index=%s, modified=%s, e0=%s, R2=%s, points=%d, increments=%s]",
        index,
        modifiedIndex,
        initialVoidRatio,
        line.rSquared(),
        line.pointCount(),
        increments);
  }
}
