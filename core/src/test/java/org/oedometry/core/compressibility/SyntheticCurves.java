package org.oedometry.core.compressibility;

/**
 * Invented compression curves with a known break, for the preconsolidation tests. Not real data.
 *
 * <p>The curve is two straight lines on e - log10(stress): a recompression line of slope -cr and a
 * virgin line of slope -cc, meeting at (log10 breakStress, eBreak), joined by a softplus transition
 * of width w (log cycles): e(x) = eBreak - cr (x - xb) - (cc - cr) w ln(1 + exp((x - xb) / w)). As
 * w tends to 0 it becomes the sharp bilinear curve; for any w the two lines are its asymptotes and
 * they meet at the break stress. The transition is not the hyperbola the Casagrande smoothing fit
 * uses, so that test is not circular.
 */
final class SyntheticCurves {

  /** Standard load-doubling stresses, 6.25 kPa to 3200 kPa, in Pa (common practice). */
  static final double[] DOUBLING_STRESSES = {
    6.25e3, 12.5e3, 25e3, 50e3, 100e3, 200e3, 400e3, 800e3, 1600e3, 3200e3
  };

  private SyntheticCurves() {}

  static double softplus(double u, double w) {
    if (w == 0) {
      return Math.max(u, 0);
    }
    return u > 0 ? u + w * Math.log1p(Math.exp(-u / w)) : w * Math.log1p(Math.exp(u / w));
  }

  static double voidRatio(
      double stress, double breakStress, double eBreak, double cr, double cc, double w) {
    double u = Math.log10(stress) - Math.log10(breakStress);
    return eBreak - cr * u - (cc - cr) * softplus(u, w);
  }

  /**
   * The curve at the given stresses; e0 is the curve's value at initialStress (on the recompression
   * line when initialStress is well below the break), with zero seating stress.
   */
  static CompressionCurve curve(
      double[] stresses,
      double breakStress,
      double eBreak,
      double cr,
      double cc,
      double w,
      double initialStress) {
    double[] e = new double[stresses.length];
    for (int i = 0; i < e.length; i++) {
      e[i] = voidRatio(stresses[i], breakStress, eBreak, cr, cc, w);
    }
    return CompressionCurve.of(
        voidRatio(initialStress, breakStress, eBreak, cr, cc, w), stresses, e);
  }
}
