package org.oedometry.core.compressibility;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The loading envelope of a compression curve: the seating state (when its stress is above zero)
 * and every point whose stress exceeds all stresses applied before it. Unloading points, and
 * reloading points below an earlier maximum, are left out; this is the curve the preconsolidation
 * constructions read.
 */
final class LoadingEnvelope {

  /** Curve point numbers (-1 for the seating state). */
  final int[] ids;

  /** Effective stresses, Pa, strictly increasing. */
  final double[] stress;

  /** log10(stress / 1 Pa). */
  final double[] log10Stress;

  /** Void ratios. */
  final double[] voidRatio;

  private LoadingEnvelope(List<Integer> ids, CompressionCurve curve) {
    int n = ids.size();
    this.ids = new int[n];
    this.stress = new double[n];
    this.log10Stress = new double[n];
    this.voidRatio = new double[n];
    for (int i = 0; i < n; i++) {
      int p = ids.get(i);
      this.ids[i] = p;
      this.stress[i] = p < 0 ? curve.seatingStress() : curve.stress(p);
      this.log10Stress[i] = Math.log10(stress[i]);
      this.voidRatio[i] = p < 0 ? curve.initialVoidRatio() : curve.voidRatio(p);
    }
  }

  static LoadingEnvelope of(CompressionCurve curve) {
    List<Integer> ids = new ArrayList<>();
    double largest = curve.seatingStress();
    if (largest > 0) {
      ids.add(-1);
    }
    for (int p = 0; p < curve.size(); p++) {
      if (curve.stress(p) > largest) {
        ids.add(p);
        largest = curve.stress(p);
      }
    }
    return new LoadingEnvelope(ids, curve);
  }

  int size() {
    return ids.length;
  }

  List<Integer> idList(int from, int to) {
    List<Integer> out = new ArrayList<>(to - from);
    for (int i = from; i < to; i++) {
      out.add(ids[i]);
    }
    return out;
  }

  /** Least-squares virgin line through the last count points, in (log10 stress, e). */
  LineFit virginLine(int count) {
    return LineFit.through(log10Stress, voidRatio, size() - count, size());
  }

  /** Warnings about a fitted line. */
  static void lineWarnings(String name, LineFit line, List<CompressibilityWarning> warnings) {
    if (line.pointCount() == 2) {
      warnings.add(
          new CompressibilityWarning(
              WarningKind.TWO_POINT_LINE,
              name + " passes through only two points; its straightness is not checked"));
    } else if (line.rSquared() < 0.98) {
      warnings.add(
          new CompressibilityWarning(
              WarningKind.POOR_LINE_FIT,
              String.format(
                  Locale.ROOT,
                  "%s fits its %d points with R squared %.4f (< 0.98)",
                  name,
                  line.pointCount(),
                  line.rSquared())));
    }
  }

  /**
   * Relative tolerance of the range check: a construction that lands on the first or last test
   * stress computes it as 10 to a logarithm, which may round an ulp or two beyond it (for example
   * 10^log10(800 kPa) = 800.0000000000001 kPa); that is still on the tested range.
   */
  static final double RANGE_TOLERANCE = 1e-12;

  /** Warning when a stress lies outside the envelope's range (beyond rounding). */
  void rangeWarning(double pressure, List<CompressibilityWarning> warnings) {
    if (pressure < stress[0] * (1 - RANGE_TOLERANCE)
        || pressure > stress[size() - 1] * (1 + RANGE_TOLERANCE)) {
      warnings.add(
          new CompressibilityWarning(
              WarningKind.OUTSIDE_TESTED_RANGE,
              String.format(
                  Locale.ROOT,
                  "preconsolidation pressure %s Pa lies outside the loaded range %s..%s Pa",
                  pressure,
                  stress[0],
                  stress[size() - 1])));
    }
  }
}
