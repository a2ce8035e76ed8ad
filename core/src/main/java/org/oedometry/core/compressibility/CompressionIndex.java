package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;

/**
 * Compression index C<sub>c</sub> (slope of the virgin line) and recompression / swelling indices
 * C<sub>r</sub> (overconsolidated branches), each fitted by ordinary least squares as e against
 * log<sub>10</sub>&sigma;', with their modified forms C / (1 + e<sub>0</sub>).
 *
 * <p>C<sub>c</sub> = &minus;de / dlog<sub>10</sub>&sigma;' on the virgin line; C<sub>r</sub> the
 * same on unloading and reloading branches (FACTS: "Across increments"). The virgin line is fitted
 * to the start and end points of the normally consolidated increments (see {@link IncrementClass}).
 * Scaling every stress by one constant leaves the indices unchanged. Check value [published:
 * Venkatramaiah, Geotechnical Engineering, Example 7.1]: e from 0.70 to 0.65 for 50 &rarr; 100 kPa
 * gives C<sub>c</sub> = 0.166.
 *
 * <p>Results feed engineering decisions: they must be reviewed by a qualified engineer, and local
 * codes and standards govern. Stateless and thread-safe.
 */
public final class CompressionIndex {

  private CompressionIndex() {}

  /**
   * C<sub>c</sub> fitted over the normally consolidated increments.
   *
   * @param curve the compression curve
   * @param preconsolidationPressure &sigma;'<sub>p</sub>, Pa; finite, &gt; 0
   * @return the fit, or absent with the reason (no normally consolidated increment, or its points
   *     admit no straight line: stresses so close that their logarithms are equal, or a slope
   *     beyond the double range)
   * @throws IllegalArgumentException if the curve is null or the pressure is not finite and
   *     positive
   */
  public static Derived<IndexFit> virginLine(
      CompressionCurve curve, double preconsolidationPressure) {
    Checks.notNull("compression curve", curve);
    Checks.positive("preconsolidation pressure", preconsolidationPressure, " Pa");
    List<IncrementClass> classes = Compressibility.classify(curve, preconsolidationPressure);
    List<Integer> chosen = new ArrayList<>();
    for (int j = 0; j < classes.size(); j++) {
      if (classes.get(j) == IncrementClass.NORMALLY_CONSOLIDATED) {
        chosen.add(j);
      }
    }
    if (chosen.isEmpty()) {
      return Derived.absent(
          String.format(
              Locale.ROOT,
              "no normally consolidated increment: no loading increment starts at or above the "
                  + "preconsolidation pressure (%s Pa) and the largest stress applied before it",
              preconsolidationPressure));
    }
    return fitOrReason(curve, chosen, "the normally consolidated points");
  }

  /**
   * An index fitted over increments the engineer chooses (a virgin line, or an unloading or
   * reloading branch).
   *
   * @param curve the compression curve
   * @param increments increment numbers, each in 0..size&minus;1, no repeats, none starting from
   *     zero stress
   * @return the fit over the start and end points of those increments
   * @throws IllegalArgumentException if the list is empty, an increment is out of range or
   *     repeated, an increment starts from zero stress (no point on a log axis), or the points
   *     admit no straight line (all log<sub>10</sub>&sigma;' equal, stresses a few ulps apart, or a
   *     slope beyond the double range)
   */
  public static IndexFit overIncrements(CompressionCurve curve, int... increments) {
    Checks.notNull("compression curve", curve);
    Checks.notNull("increments", increments);
    if (increments.length == 0) {
      throw new IllegalArgumentException("increments must name at least one increment (0 given)");
    }
    List<Integer> chosen = new ArrayList<>();
    TreeSet<Integer> seen = new TreeSet<>();
    for (int i = 0; i < increments.length; i++) {
      int j = increments[i];
      if (j < 0 || j >= curve.size()) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT,
                "increment at index %d (%d) is outside 0..%d",
                i,
                j,
                curve.size() - 1));
      }
      if (!seen.add(j)) {
        throw new IllegalArgumentException(
            String.format(Locale.ROOT, "increment at index %d (%d) is repeated", i, j));
      }
      if (!(curve.startStress(j) > 0)) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT,
                "increment at index %d (%d) starts from zero stress, which has no place on a log"
                    + " axis",
                i,
                j));
      }
      chosen.add(j);
    }
    return fitIncrements(curve, chosen);
  }

  /**
   * A virgin-line index fitted to plain points of increasing stress.
   *
   * @param initialVoidRatio e<sub>0</sub> for the modified index, dimensionless; finite, &gt; 0
   * @param effectiveStresses &sigma;', Pa; finite, &gt; 0, strictly increasing, at least two
   * @param voidRatios e, dimensionless; finite, &gt; 0; same length
   * @return the fit
   * @throws IllegalArgumentException if the lengths differ, fewer than two points are given, a
   *     value is out of range, or the stress does not increase (the message names the index)
   */
  public static IndexFit ofPoints(
      double initialVoidRatio, double[] effectiveStresses, double[] voidRatios) {
    Checks.positive("initial void ratio", initialVoidRatio, "");
    Checks.notNull("effective stresses", effectiveStresses);
    Checks.notNull("void ratios", voidRatios);
    Checks.sameLength(
        "effective stresses", effectiveStresses.length, "void ratios", voidRatios.length);
    if (effectiveStresses.length < 2) {
      throw new IllegalArgumentException(
          String.format(
              Locale.ROOT,
              "a virgin-line fit needs at least 2 points (%d given)",
              effectiveStresses.length));
    }
    double[] x = new double[effectiveStresses.length];
    for (int i = 0; i < x.length; i++) {
      Checks.positiveAt("effective stress", i, effectiveStresses[i], " Pa");
      Checks.positiveAt("void ratio", i, voidRatios[i], "");
      if (i > 0 && !(effectiveStresses[i] > effectiveStresses[i - 1])) {
        throw new IllegalArgumentException(
            String.format(
                Locale.ROOT,
                "effective stress at index %d (%s Pa) is not above index %d (%s Pa): a"
                    + " virgin-line fit needs increasing stress",
                i,
                effectiveStresses[i],
                i - 1,
                effectiveStresses[i - 1]));
      }
      x[i] = Math.log10(effectiveStresses[i]);
    }
    return IndexFit.of(
        LineFit.through(x, voidRatios.clone(), 0, x.length), initialVoidRatio, List.of());
  }

  /**
   * The overconsolidated branches of a curve (runs of consecutive first-recompression, unloading or
   * reloading increments), each with its index C<sub>r</sub>.
   *
   * @param curve the compression curve
   * @param preconsolidationPressure &sigma;'<sub>p</sub>, Pa; finite, &gt; 0
   * @return the branches in test order, each fit absent with the reason where its points admit no
   *     straight line; empty when there is none
   * @throws IllegalArgumentException if the curve is null or the pressure is not finite and
   *     positive
   */
  public static List<IndexBranch> branches(
      CompressionCurve curve, double preconsolidationPressure) {
    Checks.notNull("compression curve", curve);
    Checks.positive("preconsolidation pressure", preconsolidationPressure, " Pa");
    List<IncrementClass> classes = Compressibility.classify(curve, preconsolidationPressure);
    List<IndexBranch> out = new ArrayList<>();
    int j = 0;
    while (j < classes.size()) {
      IncrementClass kind = classes.get(j);
      int last = j;
      while (last + 1 < classes.size() && classes.get(last + 1) == kind) {
        last++;
      }
      if (kind.isOverconsolidated()) {
        List<Integer> members = new ArrayList<>();
        for (int k = j; k <= last; k++) {
          if (curve.startStress(k) > 0) {
            members.add(k);
          }
        }
        Derived<IndexFit> fit =
            members.isEmpty()
                ? Derived.absent(
                    "the branch is a single increment from zero stress: no two points on a log"
                        + " axis")
                : fitOrReason(curve, members, "the branch's points");
        out.add(new IndexBranch(kind, j, last, fit));
      }
      j = last + 1;
    }
    return List.copyOf(out);
  }

  /**
   * The fit over the given increments, or absent where their points admit no straight line (equal
   * logarithms of stresses a few ulps apart, or a slope beyond the double range): valid input, so
   * the reason is returned rather than thrown.
   */
  private static Derived<IndexFit> fitOrReason(
      CompressionCurve curve, List<Integer> increments, String what) {
    try {
      return Derived.of(fitIncrements(curve, increments));
    } catch (IllegalArgumentException e) {
      return Derived.absent(what + " admit no straight line: " + e.getMessage());
    }
  }

  /** Fits e against log10 stress over the start and end points of the given increments. */
  private static IndexFit fitIncrements(CompressionCurve curve, List<Integer> increments) {
    // Point p stands for curve point p; -1 for the initial (seating) state.
    TreeSet<Integer> pointIds = new TreeSet<>();
    for (int j : increments) {
      if (curve.startStress(j) > 0) {
        pointIds.add(j - 1);
      }
      pointIds.add(j);
    }
    double[] x = new double[pointIds.size()];
    double[] y = new double[pointIds.size()];
    int i = 0;
    for (int p : pointIds) {
      double stress = p < 0 ? curve.seatingStress() : curve.stress(p);
      x[i] = Math.log10(stress);
      y[i] = p < 0 ? curve.initialVoidRatio() : curve.voidRatio(p);
      i++;
    }
    return IndexFit.of(LineFit.through(x, y, 0, x.length), curve.initialVoidRatio(), increments);
  }
}
