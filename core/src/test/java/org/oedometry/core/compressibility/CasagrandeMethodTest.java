package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class CasagrandeMethodTest {

  private static final double CR = 0.04;
  private static final double CC = 0.40;

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName(
      "Sharp two-line curve (invented): within 1 % of the break, because the point of maximum"
          + " curvature is the corner, which lies on the virgin line")
  void sharpBreak(double breakStress) {
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0, 1e3);
    PreconsolidationEstimate est = CasagrandeMethod.estimate(c);
    assertThat(est.preconsolidationPressure().getAsDouble() / breakStress)
        .isCloseTo(1.0, within(0.01));
    // The corner is sharper than the smallest transition width the smooth fit searches.
    assertThat(est.warnings())
        .extracting(CompressibilityWarning::kind)
        .contains(WarningKind.FIT_AT_BOUND);
  }

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName(
      "Smooth transition w = 0.05 log cycle (invented): within 3.5 % of the same construction"
          + " done independently on the exact generating curve")
  void smoothBreakAgainstExactConstruction(double breakStress) {
    double w = 0.05;
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, w, 1e3);
    PreconsolidationEstimate est = CasagrandeMethod.estimate(c);
    double expected = exactConstruction(breakStress, w);
    // The tolerance is the smoothing fit's error: 10 points at a load ratio of 2 fix the shape of
    // the transition only roughly when the break falls between two points.
    assertThat(est.preconsolidationPressure().getAsDouble() / expected)
        .isCloseTo(1.0, within(0.035));
    // The construction itself lies above the break by about delta / (Cc + s_b), delta = (Cc - Cr)
    // w ln 2 the gap between the corner and the curve, s_b the bisector slope: about 0.043 log
    // cycle, +10 % (derived here from the construction's geometry).
    assertThat(est.preconsolidationPressure().getAsDouble() / breakStress).isBetween(1.0, 1.15);
    assertThat(est.warnings()).isEmpty();
  }

  @Test
  @DisplayName("Construction geometry: the result lies on the virgin line and ends the bisector")
  void constructionGeometry() {
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, 150e3, 1.0, CR, CC, 0.05, 1e3);
    PreconsolidationEstimate est = CasagrandeMethod.estimate(c);
    assertThat(est.method()).isEqualTo(PreconsolidationMethod.CASAGRANDE);
    assertThat(est.axes()).isEqualTo(PlotAxes.LOG10_STRESS_VOID_RATIO);
    ConstructionPoint result =
        est.points().stream()
            .filter(p -> p.label().equals("preconsolidation pressure on virgin line"))
            .findFirst()
            .orElseThrow();
    assertThat(Math.pow(10, result.x()))
        .isCloseTo(est.preconsolidationPressure().getAsDouble(), within(1e-6));
    // The virgin line fitted through 800, 1600 and 3200 kPa is the asymptote e = 1 - Cc (x - xb)
    // to within the softplus tail: (Cc - Cr) w ln(1 + exp(-u/w)) <= 1e-8 for u >= 0.727 there.
    assertThat(result.y()).isCloseTo(1.0 - CC * (result.x() - Math.log10(150e3)), within(1e-7));
    ConstructionLine bisector =
        est.lines().stream().filter(l -> l.label().equals("bisector")).findFirst().orElseThrow();
    assertThat(bisector.x2()).isCloseTo(result.x(), within(1e-12));
    assertThat(est.points())
        .extracting(ConstructionPoint::label)
        .contains("maximum curvature", "smooth fit");
    assertThat(est.pointsUsed()).hasSize(10);
  }

  @Test
  @DisplayName("Scaling all stresses by a constant scales sigma'_p by the same constant")
  void scaleInvariance() {
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, 150e3, 1.0, CR, CC, 0.05, 1e3);
    double[] scaled = SyntheticCurves.DOUBLING_STRESSES.clone();
    for (int i = 0; i < scaled.length; i++) {
      scaled[i] *= 7.3;
    }
    CompressionCurve d = SyntheticCurves.curve(scaled, 150e3 * 7.3, 1.0, CR, CC, 0.05, 7.3e3);
    double a = CasagrandeMethod.estimate(c).preconsolidationPressure().getAsDouble();
    double b = CasagrandeMethod.estimate(d).preconsolidationPressure().getAsDouble();
    assertThat(b / (7.3 * a)).isCloseTo(1.0, within(1e-6));
  }

  @Test
  @DisplayName("Absent with a reason: too few points, a straight line, an upward-bending curve")
  void absentCases() {
    double[] five = {50e3, 100e3, 200e3, 400e3, 800e3};
    PreconsolidationEstimate few =
        CasagrandeMethod.estimate(SyntheticCurves.curve(five, 150e3, 1.0, CR, CC, 0.05, 1e3));
    assertThat(few.preconsolidationPressure()).isEmpty();
    assertThat(few.absenceReason())
        .isEqualTo("the loading envelope has 5 points; the smooth fit and virgin line need 6");
    double[] s = SyntheticCurves.DOUBLING_STRESSES;
    double[] straight = new double[s.length];
    double[] upward = new double[s.length];
    for (int i = 0; i < s.length; i++) {
      straight[i] = 3.0 - 0.3 * Math.log10(s[i]);
      upward[i] = 1.0 + 0.5 / (i + 1);
    }
    PreconsolidationEstimate line =
        CasagrandeMethod.estimate(CompressionCurve.of(3.0, s, straight));
    assertThat(line.preconsolidationPressure()).isEmpty();
    assertThat(line.absenceReason()).startsWith("the curve shows no downward break");
    PreconsolidationEstimate up = CasagrandeMethod.estimate(CompressionCurve.of(2.0, s, upward));
    assertThat(up.preconsolidationPressure()).isEmpty();
    assertThat(up.absenceReason()).startsWith("the curve shows no downward break");
    assertThatThrownBy(() -> CasagrandeMethod.estimate(null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression curve must not be null");
  }

  /**
   * Casagrande's construction on the exact softplus curve, written independently of the library:
   * curvature from the closed-form derivatives of the generating function, located by a dense scan
   * (step 1e-6 log cycle); the virgin line is the exact asymptote.
   */
  private static double exactConstruction(double breakStress, double w) {
    double xb = Math.log10(breakStress);
    double best = xb;
    double bestK = -1;
    for (double x = xb - 0.5; x <= xb + 0.5; x += 1e-6) {
      double sig = 1 / (1 + Math.exp(-(x - xb) / w));
      double d1 = -CR - (CC - CR) * sig;
      double d2 = -(CC - CR) * sig * (1 - sig) / w;
      double k = Math.abs(d2) / Math.pow(1 + d1 * d1, 1.5);
      if (k > bestK) {
        bestK = k;
        best = x;
      }
    }
    double sig = 1 / (1 + Math.exp(-(best - xb) / w));
    double tangent = -CR - (CC - CR) * sig;
    double bisector = Math.tan(Math.atan(tangent) / 2);
    double em = SyntheticCurves.voidRatio(Math.pow(10, best), breakStress, 1.0, CR, CC, w);
    // Bisector em + bisector (x - best) meets the asymptote 1 - CC (x - xb).
    double x = (1.0 + CC * xb - em + bisector * best) / (bisector + CC);
    return Math.pow(10, x);
  }
}
