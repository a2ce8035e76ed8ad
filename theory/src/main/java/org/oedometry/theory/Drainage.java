package org.oedometry.theory;

/**
 * Drainage of a consolidating layer: through both faces or through one.
 *
 * <p>The drainage path H<sub>dr</sub> is the longest distance a drop of pore water travels to a
 * drained face: half the thickness for double drainage, the whole thickness for single drainage.
 * The time factor is T = c<sub>v</sub> t / H<sub>dr</sub><sup>2</sup>, so a mistaken drainage
 * condition changes c<sub>v</sub> (or a forecast time) by a factor of 4.
 *
 * <p>Thread-safe and immutable, as every enum.
 */
public enum Drainage {
  /** Drained at the top and bottom faces (the usual oedometer set-up): H<sub>dr</sub> = H / 2. */
  DOUBLE(2),
  /** Drained at one face only, the other impervious: H<sub>dr</sub> = H. */
  SINGLE(1);

  private final int drainedFaces;

  Drainage(int drainedFaces) {
    this.drainedFaces = drainedFaces;
  }

  /**
   * Number of drained faces.
   *
   * @return 2 for {@link #DOUBLE}, 1 for {@link #SINGLE}
   */
  public int drainedFaces() {
    return drainedFaces;
  }

  /**
   * Drainage path for a layer or specimen of the given thickness.
   *
   * <p>H / 2 is rounded to the nearest double, as every division is, except at the smallest
   * positive double ({@link Double#MIN_VALUE}, 4.9 x 10<sup>-324</sup> m): half of it lies exactly
   * between 0 and {@link Double#MIN_VALUE}, and the division would round it to 0; the drainage path
   * is then {@link Double#MIN_VALUE}, so that a positive thickness always gives a positive drainage
   * path.
   *
   * @param thicknessMetres thickness H of the layer or specimen, m; finite and &gt; 0
   * @return H<sub>dr</sub> in m, finite and &gt; 0: H / 2 for {@link #DOUBLE}, H for {@link
   *     #SINGLE}
   * @throws IllegalArgumentException if the thickness is not finite and positive
   */
  public double drainagePath(double thicknessMetres) {
    Messages.requirePositiveFinite("thickness", thicknessMetres, "m");
    // Only H = Double.MIN_VALUE halves to 0 (round half to even); every other positive H does not.
    return Math.max(thicknessMetres / drainedFaces, Double.MIN_VALUE);
  }
}
