package org.oedometry.fitting;

import java.util.List;
import org.oedometry.fitting.internal.Checks;

/**
 * What a host program needs to draw a {@link LogTimeMethod} construction, in plot coordinates x =
 * log<sub>10</sub>(t / 1 s) and y = settlement in m (the input's sign).
 *
 * @param inflectionTangent the tangent at the steepest point, drawn from the d0 level to d100
 * @param inflectionPoint where the tangent touches the curve
 * @param secondaryLine the straight line through the final (secondary) readings, drawn from d100 to
 *     the last reading
 * @param endOfPrimary intersection of the two lines: (log<sub>10</sub> t<sub>100</sub>, d100)
 * @param halfConsolidation (log<sub>10</sub> t50, d50)
 * @param parabolaPairs the t<sub>1</sub> / 4 t<sub>1</sub> pairs whose d0 values were averaged
 * @param d0Spread largest minus smallest d0 of the pairs, m, &ge; 0
 * @param secondaryFrom index in the input curve of the first reading of the secondary line
 * @param secondaryTo index in the input curve after the last reading of the secondary line
 */
public record LogTimeGeometry(
    StraightLine inflectionTangent,
    PlotPoint inflectionPoint,
    StraightLine secondaryLine,
    PlotPoint endOfPrimary,
    PlotPoint halfConsolidation,
    List<ParabolaPair> parabolaPairs,
    double d0Spread,
    int secondaryFrom,
    int secondaryTo) {

  /**
   * Creates the geometry.
   *
   * @param inflectionTangent tangent line, not null
   * @param inflectionPoint tangent point, not null
   * @param secondaryLine secondary line, not null
   * @param endOfPrimary d100 point, not null
   * @param halfConsolidation d50 point, not null
   * @param parabolaPairs at least one pair, not null (copied)
   * @param d0Spread m, finite, &ge; 0
   * @param secondaryFrom first index, &ge; 0
   * @param secondaryTo end index, &gt; secondaryFrom
   * @throws IllegalArgumentException if a value is null or out of range
   */
  public LogTimeGeometry {
    if (inflectionTangent == null
        || inflectionPoint == null
        || secondaryLine == null
        || endOfPrimary == null
        || halfConsolidation == null
        || parabolaPairs == null
        || parabolaPairs.isEmpty()) {
      throw new IllegalArgumentException("log-time geometry: every part must be given");
    }
    parabolaPairs = List.copyOf(parabolaPairs);
    if (!(d0Spread >= 0) || d0Spread == Double.POSITIVE_INFINITY) {
      throw new IllegalArgumentException(
          Checks.format("d0 spread (%s m) must be finite and >= 0", d0Spread));
    }
    if (secondaryFrom < 0 || secondaryTo <= secondaryFrom) {
      throw new IllegalArgumentException(
          Checks.format(
              "secondary readings from index %d to %d: need 0 <= from < to",
              secondaryFrom, secondaryTo));
    }
  }
}
