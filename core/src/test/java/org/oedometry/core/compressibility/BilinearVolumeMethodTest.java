package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class BilinearVolumeMethodTest {

  private static final double CR = 0.04;
  private static final double CC = 0.40;

  /** Points exactly on two lines in log10(1 + e) - log10 s' meeting at the break (invented). */
  private static CompressionCurve bilinearInLogVolume(double breakStress) {
    double[] s = SyntheticCurves.DOUBLING_STRESSES;
    double[] e = new double[s.length];
    double xb = Math.log10(breakStress);
    double yb = Math.log10(2.0);
    for (int i = 0; i < s.length; i++) {
      double u = Math.log10(s[i]) - xb;
      double y = u < 0 ? yb - 0.01 * u : yb - 0.12 * u;
      e[i] = Math.pow(10, y) - 1;
    }
    return CompressionCurve.of(Math.pow(10, yb + 0.01 * (xb - 3)) - 1, s, e);
  }

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName("Points on two straight lines in log(1 + e) - log s' (invented): the break exactly")
  void exactOnBilinearPoints(double breakStress) {
    CompressionCurve c = bilinearInLogVolume(breakStress);
    assertThat(BilinearVolumeMethod.onitsuka(c).preconsolidationPressure().getAsDouble())
        .isCloseTo(breakStress, within(breakStress * 1e-9));
    assertThat(BilinearVolumeMethod.butterfield(c).preconsolidationPressure().getAsDouble())
        .isCloseTo(breakStress, within(breakStress * 1e-9));
  }

  @Test
  @DisplayName(
      "Two-line points plus a last point one ulp above the highest stress (equal log s'): the"
          + " split whose late group has no line is skipped, the break is still exact")
  void pointOneUlpAboveTheLast() {
    CompressionCurve c = bilinearInLogVolume(150e3);
    int n = c.size();
    double[] s = new double[n + 1];
    double[] e = new double[n + 1];
    for (int i = 0; i < n; i++) {
      s[i] = c.stress(i);
      e[i] = c.voidRatio(i);
    }
    s[n] = Math.nextUp(s[n - 1]);
    e[n] = Math.nextDown(e[n - 1]);
    CompressionCurve extended = CompressionCurve.of(c.initialVoidRatio(), s, e);
    // Expected: the break of the two lines the points were built on (exact, to rounding).
    assertThat(BilinearVolumeMethod.onitsuka(extended).preconsolidationPressure().getAsDouble())
        .isCloseTo(150e3, within(150e3 * 1e-9));
    assertThat(BilinearVolumeMethod.butterfield(extended).preconsolidationPressure().getAsDouble())
        .isCloseTo(150e3, within(150e3 * 1e-9));
  }

  @ParameterizedTest(name = "break at {0} Pa, w = 0.05")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName(
      "Butterfield ln(1+e)-ln s' and Onitsuka log(1+e)-log s' give the same s'_p for the same"
          + " points (FACTS consistency test: the log base cancels)")
  void butterfieldEqualsOnitsuka(double breakStress) {
    CompressionCurve c =
        SyntheticCurves.curve(
            SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0.05, 1e3);
    double ln = BilinearVolumeMethod.butterfield(c).preconsolidationPressure().getAsDouble();
    double log10 = BilinearVolumeMethod.onitsuka(c).preconsolidationPressure().getAsDouble();
    assertThat(ln / log10).isCloseTo(1.0, within(1e-12));
  }

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName(
      "Two lines in e - log s' with a smooth transition w = 0.05 (invented): s'_p between 1.0 and"
          + " 1.3 times the break")
  void onEvsLogCurve(double breakStress) {
    // Why the bias is upward: a straight virgin line in e - log s' is concave in log(1 + e), so
    // the late line fitted to it is flatter than the curve just after the break and meets the
    // early line further right; the more so the further the late points extend.
    CompressionCurve c =
        SyntheticCurves.curve(
            SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0.05, 1e3);
    PreconsolidationEstimate est = BilinearVolumeMethod.onitsuka(c);
    assertThat(est.preconsolidationPressure().getAsDouble() / breakStress).isBetween(1.0, 1.3);
    assertThat(est.axes()).isEqualTo(PlotAxes.LOG10_STRESS_LOG10_ONE_PLUS_VOID_RATIO);
    assertThat(est.lines())
        .extracting(ConstructionLine::label)
        .containsExactly("early line", "late line");
    ConstructionPoint p = est.points().get(0);
    assertThat(Math.pow(10, p.x()))
        .isCloseTo(est.preconsolidationPressure().getAsDouble(), within(1e-6));
  }

  @Test
  @DisplayName("Absent with a reason: fewer than four points, no steeper later line")
  void absentCases() {
    PreconsolidationEstimate few =
        BilinearVolumeMethod.butterfield(
            CompressionCurve.of(
                1.0, new double[] {100e3, 200e3, 400e3}, new double[] {0.9, 0.8, 0.7}));
    assertThat(few.preconsolidationPressure()).isEmpty();
    assertThat(few.absenceReason())
        .isEqualTo("the loading envelope has 3 points; two lines of at least two points need 4");
    double[] s = SyntheticCurves.DOUBLING_STRESSES;
    double[] flattening = new double[s.length];
    for (int i = 0; i < s.length; i++) {
      flattening[i] = 0.5 + 0.5 / (i + 1);
    }
    PreconsolidationEstimate none =
        BilinearVolumeMethod.onitsuka(CompressionCurve.of(1.5, s, flattening));
    assertThat(none.preconsolidationPressure()).isEmpty();
    assertThat(none.absenceReason()).endsWith("the curve shows no yield");
    assertThatThrownBy(() -> BilinearVolumeMethod.onitsuka(null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression curve must not be null");
  }

  @Test
  @DisplayName("Unloading and reloading points below the previous maximum are not used")
  void envelopeOnly() {
    double[] s = {6.25e3, 12.5e3, 25e3, 50e3, 100e3, 200e3, 50e3, 200e3, 400e3, 800e3, 1600e3};
    double[] e = new double[s.length];
    for (int i = 0; i < s.length; i++) {
      e[i] = SyntheticCurves.voidRatio(s[i], 150e3, 1.0, CR, CC, 0.05);
    }
    e[6] += 0.02;
    e[7] += 0.005;
    PreconsolidationEstimate est = BilinearVolumeMethod.onitsuka(CompressionCurve.of(1.2, s, e));
    assertThat(est.pointsUsed()).containsExactly(0, 1, 2, 3, 4, 5, 8, 9, 10);
  }

  @ParameterizedTest(name = "corner at {0} Pa")
  @ValueSource(doubles = {25e3, 50e3, 100e3, 200e3, 400e3, 800e3})
  @DisplayName(
      "Regression: points on two straight lines in log(1 + e) - log s' whose corner is a test"
          + " stress: the lines meet at that point, the edge of the gap between the groups, so no"
          + " INTERSECTION_AWAY_FROM_BREAK (it was raised by rounding, 1e-15 past the edge)")
  void cornerAtATestStressIsNotAwayFromTheBreak(double corner) {
    // The corner point lies on both lines (built so), so both fitted lines pass through it.
    CompressionCurve c = bilinearInLogVolume(corner);
    for (PreconsolidationEstimate est :
        new PreconsolidationEstimate[] {
          BilinearVolumeMethod.onitsuka(c), BilinearVolumeMethod.butterfield(c)
        }) {
      assertThat(est.preconsolidationPressure().getAsDouble() / corner)
          .as("%s", est.method())
          .isCloseTo(1.0, within(1e-9));
      assertThat(est.warnings())
          .extracting(CompressibilityWarning::kind)
          .as("%s", est.method())
          .doesNotContain(WarningKind.INTERSECTION_AWAY_FROM_BREAK);
    }
  }
}
