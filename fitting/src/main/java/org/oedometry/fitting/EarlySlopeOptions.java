package org.oedometry.fitting;

import java.util.Objects;

/**
 * Options of {@link EarlySlopeMethod}: immutable; start from {@link #defaults()} and change with
 * the {@code with...} methods.
 *
 * <p>Defaults: d<sub>100</sub> from the rectangular hyperbola ({@link
 * PrimaryEnd#RECTANGULAR_HYPERBOLA}).
 *
 * @param primaryEnd where d<sub>100</sub>, and so the primary compression d<sub>p</sub> =
 *     d<sub>100</sub> - d<sub>0</sub>, comes from
 */
public record EarlySlopeOptions(PrimaryEnd primaryEnd) {

  /** Where the end of primary consolidation d<sub>100</sub> comes from. */
  public enum PrimaryEnd {
    /**
     * d<sub>100</sub> = M/m of {@link RectangularHyperbolaMethod}: from the 60-90 % part of the
     * curve, so little affected by secondary compression; fails (with a {@link FitException}) on a
     * curve that ends before 60 %.
     */
    RECTANGULAR_HYPERBOLA,
    /**
     * d<sub>100</sub> = the last reading: includes the secondary compression up to that reading
     * (d<sub>p</sub> too large, c<sub>v</sub> too small by the square of the ratio), and is too
     * small on a curve whose primary consolidation is not complete (c<sub>v</sub> too large).
     */
    LAST_READING
  }

  /**
   * Validates the options.
   *
   * @param primaryEnd where d<sub>100</sub> comes from; not null
   * @throws NullPointerException if null
   */
  public EarlySlopeOptions {
    Objects.requireNonNull(primaryEnd, "primaryEnd");
  }

  /**
   * The defaults listed in the class description.
   *
   * @return the default options
   */
  public static EarlySlopeOptions defaults() {
    return new EarlySlopeOptions(PrimaryEnd.RECTANGULAR_HYPERBOLA);
  }

  /**
   * A copy with another source of d<sub>100</sub>.
   *
   * @param value the source; not null
   * @return the new options
   * @throws NullPointerException if null
   */
  public EarlySlopeOptions withPrimaryEnd(PrimaryEnd value) {
    return new EarlySlopeOptions(value);
  }
}
