package org.oedometry.core.compressibility;

import java.util.Locale;

/**
 * One overconsolidated branch of the compression curve (a run of consecutive increments of the same
 * class: first recompression, unloading or reloading) with its recompression or swelling index
 * C<sub>r</sub> fitted on the e &ndash; log<sub>10</sub>&sigma;' plot.
 *
 * @param kind {@link IncrementClass#RECOMPRESSION}, {@link IncrementClass#UNLOADING} or {@link
 *     IncrementClass#RELOADING}
 * @param firstIncrement first increment of the branch
 * @param lastIncrement last increment of the branch, &ge; firstIncrement
 * @param fit the index over the branch's points, or why it is absent (e.g. a single increment from
 *     zero stress has no point on a log axis)
 */
public record IndexBranch(
    IncrementClass kind, int firstIncrement, int lastIncrement, Derived<IndexFit> fit) {

  /**
   * Validates the branch.
   *
   * @param kind {@link IncrementClass#RECOMPRESSION}, {@link IncrementClass#UNLOADING} or {@link
   *     IncrementClass#RELOADING}
   * @param firstIncrement first increment of the branch
   * @param lastIncrement last increment of the branch, &ge; firstIncrement
   * @param fit the index over the branch's points, or why it is absent (e.g. a single increment
   *     from zero stress has no point on a log axis)
   * @throws IllegalArgumentException if the kind is not an overconsolidated class, the increments
   *     are out of order, or an argument is null
   */
  public IndexBranch {
    Checks.notNull("kind", kind);
    Checks.notNull("fit", fit);
    if (!kind.isOverconsolidated()) {
      throw new IllegalArgumentException("branch kind (" + kind + ") must be overconsolidated");
    }
    if (firstIncrement < 0 || lastIncrement < firstIncrement) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "branch increments (%d..%d) must be >= 0 and in order",
              firstIncrement,
              lastIncrement));
    }
  }
}
