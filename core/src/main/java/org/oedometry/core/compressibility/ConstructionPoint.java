package org.oedometry.core.compressibility;

/**
 * A marked point of a graphical construction, in the coordinates of the construction's {@link
 * PlotAxes}.
 *
 * @param label what the point is, in plain words (e.g. "maximum curvature")
 * @param x abscissa; finite
 * @param y ordinate; finite
 */
public record ConstructionPoint(String label, double x, double y) {

  /**
   * Validates the point.
   *
   * @param label what the point is, in plain words (e.g. "maximum curvature")
   * @param x abscissa; finite
   * @param y ordinate; finite
   * @throws IllegalArgumentException if the label is null or a coordinate is not finite
   */
  public ConstructionPoint {
    Checks.notNull("label", label);
    Checks.finite("x of " + label, x, "");
    Checks.finite("y of " + label, y, "");
  }
}
