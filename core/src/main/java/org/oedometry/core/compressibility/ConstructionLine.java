package org.oedometry.core.compressibility;

/**
 * A straight segment of a graphical construction, from (x1, y1) to (x2, y2) in the coordinates of
 * the construction's {@link PlotAxes}. A host program may extend it; the end points span the part
 * the construction uses.
 *
 * @param label what the line is, in plain words (e.g. "virgin line")
 * @param x1 abscissa of the first end; finite
 * @param y1 ordinate of the first end; finite
 * @param x2 abscissa of the second end; finite
 * @param y2 ordinate of the second end; finite
 */
public record ConstructionLine(String label, double x1, double y1, double x2, double y2) {

  /**
   * Validates the segment.
   *
   * @param label what the line is, in plain words (e.g. "virgin line")
   * @param x1 abscissa of the first end; finite
   * @param y1 ordinate of the first end; finite
   * @param x2 abscissa of the second end; finite
   * @param y2 ordinate of the second end; finite
   * @throws IllegalArgumentException if the label is null or a coordinate is not finite
   */
  public ConstructionLine {
    Checks.notNull("label", label);
    Checks.finite("x1 of " + label, x1, "");
    Checks.finite("y1 of " + label, y1, "");
    Checks.finite("x2 of " + label, x2, "");
    Checks.finite("y2 of " + label, y2, "");
  }

  static ConstructionLine along(String label, LineFit line, double fromX, double toX) {
    return new ConstructionLine(
        label, fromX, ordinate(label, line, fromX), toX, ordinate(label, line, toX));
  }

  /**
   * The line's ordinate at x, or an IllegalArgumentException naming the line where it overflows.
   */
  private static double ordinate(String label, LineFit line, double x) {
    return Checks.representable(
        line.valueAt(x),
        "the %s (slope %s, intercept %s) at abscissa %s",
        label,
        line.slope(),
        line.intercept(),
        x);
  }
}
