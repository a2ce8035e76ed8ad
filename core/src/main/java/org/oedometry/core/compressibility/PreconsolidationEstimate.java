package org.oedometry.core.compressibility;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The result of one preconsolidation-pressure construction: &sigma;'<sub>p</sub> (or why the
 * construction does not apply to the curve), the points and lines a host program needs to draw the
 * construction, the curve points it used, and warnings.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern.
 *
 * @param method the construction and its reference
 * @param preconsolidationPressure &sigma;'<sub>p</sub>, Pa; empty when the construction does not
 *     apply, otherwise finite and &gt; 0
 * @param absenceReason why &sigma;'<sub>p</sub> is absent; the empty string when present
 * @param axes the coordinates of {@code points} and {@code lines}
 * @param points marked points of the construction
 * @param lines lines of the construction
 * @param pointsUsed curve point numbers the construction used (&minus;1 stands for the seating
 *     state)
 * @param warnings warnings, empty when there is nothing to say
 */
public record PreconsolidationEstimate(
    PreconsolidationMethod method,
    OptionalDouble preconsolidationPressure,
    String absenceReason,
    PlotAxes axes,
    List<ConstructionPoint> points,
    List<ConstructionLine> lines,
    List<Integer> pointsUsed,
    List<CompressibilityWarning> warnings) {

  /**
   * Validates and copies.
   *
   * @param method the construction and its reference
   * @param preconsolidationPressure &sigma;'<sub>p</sub>, Pa; empty when the construction does not
   *     apply, otherwise finite and &gt; 0
   * @param absenceReason why &sigma;'<sub>p</sub> is absent; the empty string when present
   * @param axes the coordinates of {@code points} and {@code lines}
   * @param points marked points of the construction
   * @param lines lines of the construction
   * @param pointsUsed curve point numbers the construction used (&minus;1 stands for the seating
   *     state)
   * @param warnings warnings, empty when there is nothing to say
   * @throws IllegalArgumentException if an argument is null, the pressure is not finite and
   *     positive, or the pressure and reason are both given or both missing
   */
  public PreconsolidationEstimate {
    Checks.notNull("method", method);
    Checks.notNull("preconsolidation pressure", preconsolidationPressure);
    Checks.notNull("absence reason", absenceReason);
    Checks.notNull("axes", axes);
    points = List.copyOf(Checks.notNull("points", points));
    lines = List.copyOf(Checks.notNull("lines", lines));
    pointsUsed = List.copyOf(Checks.notNull("points used", pointsUsed));
    warnings = List.copyOf(Checks.notNull("warnings", warnings));
    if (preconsolidationPressure.isPresent()) {
      Checks.positive("preconsolidation pressure", preconsolidationPressure.getAsDouble(), " Pa");
    }
    if (preconsolidationPressure.isPresent() == !absenceReason.isEmpty()) {
      throw new IllegalArgumentException(
          "an estimate needs either a pressure or a non-empty absence reason, not both");
    }
  }

  static PreconsolidationEstimate found(
      PreconsolidationMethod method,
      double pressure,
      PlotAxes axes,
      List<ConstructionPoint> points,
      List<ConstructionLine> lines,
      List<Integer> pointsUsed,
      List<CompressibilityWarning> warnings) {
    return new PreconsolidationEstimate(
        method, OptionalDouble.of(pressure), "", axes, points, lines, pointsUsed, warnings);
  }

  static PreconsolidationEstimate absent(
      PreconsolidationMethod method,
      String reason,
      PlotAxes axes,
      List<ConstructionPoint> points,
      List<ConstructionLine> lines,
      List<Integer> pointsUsed,
      List<CompressibilityWarning> warnings) {
    return new PreconsolidationEstimate(
        method, OptionalDouble.empty(), reason, axes, points, lines, pointsUsed, warnings);
  }

  @Override
  public String toString() {
    return String.format(
        Locale.ROOT,
        "PreconsolidationEstimate[%s: %s, %d points, %d lines, used %s, warnings %s]",
        method,
        preconsolidationPressure.isPresent()
            ? preconsolidationPressure.getAsDouble() + " Pa"
            : "absent (" + absenceReason + ")",
        points.size(),
        lines.size(),
        pointsUsed,
        warnings);
  }
}
