package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class PachecoSilvaMethodTest {

  private static final double CR = 0.04;
  private static final double CC = 0.40;

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName(
      "Sharp two-line curve (invented): log10 s'_p = xb - (Cr/Cc)^2 (xb - x0), the closed form of"
          + " the construction on two straight lines (derived by hand from the construction)")
  void sharpBreakClosedForm(double breakStress) {
    // e0 lies on the recompression line at 1 kPa, so x0 = 3 (log10 of 1000 Pa).
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0, 1e3);
    PreconsolidationEstimate est = PachecoSilvaMethod.estimate(c);
    double xb = Math.log10(breakStress);
    double expected = Math.pow(10, xb - (CR / CC) * (CR / CC) * (xb - 3));
    assertThat(est.preconsolidationPressure().getAsDouble() / expected)
        .isCloseTo(1.0, within(1e-12));
    // With Cr/Cc = 0.1 the construction is low by 1 % of a log cycle per log cycle of (xb - x0):
    // here 4.5 % to 5.2 %.
    assertThat(est.preconsolidationPressure().getAsDouble() / breakStress).isBetween(0.94, 0.96);
  }

  @Test
  @DisplayName(
      "Flat recompression line (Cr = 0, invented) with the break at a test stress: the break"
          + " exactly (A, B and C coincide at the corner)")
  void flatRecompression() {
    // With the break between two test stresses the straight chord between them cuts the corner,
    // B falls below A and the result moves right; the closed form above then does not apply.
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, 100e3, 1.0, 0, CC, 0, 1e3);
    assertThat(PachecoSilvaMethod.estimate(c).preconsolidationPressure().getAsDouble())
        .isCloseTo(100e3, within(1e-6));
  }

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 150e3, 210e3})
  @DisplayName(
      "Smooth transition w = 0.05 log cycle (invented): within 6 % of the break (closed-form"
          + " bias -5 % plus the rounding of the corner, which raises point B)")
  void smoothBreak(double breakStress) {
    CompressionCurve c =
        SyntheticCurves.curve(
            SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0.05, 1e3);
    PreconsolidationEstimate est = PachecoSilvaMethod.estimate(c);
    assertThat(est.preconsolidationPressure().getAsDouble() / breakStress)
        .isCloseTo(1.0, within(0.06));
    assertThat(est.warnings()).isEmpty();
  }

  @Test
  @DisplayName("Construction geometry: A at e0 on the virgin line, B below it, C level with B")
  void constructionGeometry() {
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, 150e3, 1.0, CR, CC, 0, 1e3);
    PreconsolidationEstimate est = PachecoSilvaMethod.estimate(c);
    assertThat(est.points()).hasSize(3);
    ConstructionPoint a = est.points().get(0);
    ConstructionPoint b = est.points().get(1);
    ConstructionPoint p = est.points().get(2);
    assertThat(a.y()).isEqualTo(c.initialVoidRatio());
    assertThat(b.x()).isEqualTo(a.x());
    assertThat(b.y()).isLessThan(a.y());
    assertThat(p.y()).isEqualTo(b.y());
    assertThat(Math.pow(10, p.x()))
        .isCloseTo(est.preconsolidationPressure().getAsDouble(), within(1e-6));
    assertThat(est.lines())
        .extracting(ConstructionLine::label)
        .containsExactly(
            "virgin line",
            "initial void ratio",
            "vertical to the curve",
            "horizontal to the virgin line");
  }

  @Test
  @DisplayName("Absent with a reason: too few points, virgin line not falling, A before the data")
  void absentCases() {
    PreconsolidationEstimate few =
        PachecoSilvaMethod.estimate(
            CompressionCurve.of(
                1.0, new double[] {100e3, 200e3, 400e3}, new double[] {0.9, 0.8, 0.7}));
    assertThat(few.absenceReason())
        .isEqualTo(
            "the loading envelope has 3 points; the construction needs 3 for the virgin line and"
                + " at least one before it");
    PreconsolidationEstimate rising =
        PachecoSilvaMethod.estimate(
            CompressionCurve.of(
                1.0,
                new double[] {50e3, 100e3, 200e3, 400e3},
                new double[] {0.9, 0.91, 0.92, 0.93}));
    assertThat(rising.preconsolidationPressure()).isEmpty();
    assertThat(rising.absenceReason()).startsWith("the virgin line does not fall with stress");
    // Loading starts at 100 kPa: A (at 90.8 kPa for a break at 150 kPa) lies before the data.
    double[] late = {100e3, 200e3, 400e3, 800e3, 1600e3};
    PreconsolidationEstimate early =
        PachecoSilvaMethod.estimate(SyntheticCurves.curve(late, 150e3, 1.0, CR, CC, 0, 1e3));
    assertThat(early.preconsolidationPressure()).isEmpty();
    assertThat(early.absenceReason()).contains("outside the loaded range");
    assertThatThrownBy(() -> PachecoSilvaMethod.estimate(null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression curve must not be null");
  }

  @Test
  @DisplayName(
      "Virgin line through two points one ulp apart in stress (equal log10 s'): absent with a"
          + " reason, not an exception (the Javadoc's @throws names only null arguments)")
  void virginPointsWithEqualLogarithms() {
    double[] s = {50e3, 100e3, 200e3, 400e3, Math.nextUp(400e3)};
    PreconsolidationEstimate p =
        PachecoSilvaMethod.estimate(
            CompressionCurve.of(1.0, s, new double[] {0.99, 0.98, 0.9, 0.8, 0.79}),
            new PreconsolidationOptions(2));
    assertThat(p.preconsolidationPressure()).isEmpty();
    assertThat(p.absenceReason()).startsWith("the virgin-line points admit no straight line: ");
  }

  @Test
  @DisplayName("Options: the virgin line through more points changes nothing on exact data")
  void options() {
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, 150e3, 1.0, CR, CC, 0, 1e3);
    double three = PachecoSilvaMethod.estimate(c).preconsolidationPressure().getAsDouble();
    double four =
        PachecoSilvaMethod.estimate(
                c, PreconsolidationOptions.builder().virginLinePoints(4).build())
            .preconsolidationPressure()
            .getAsDouble();
    assertThat(four / three).isCloseTo(1.0, within(1e-12));
    assertThat(PreconsolidationOptions.defaults().virginLinePoints()).isEqualTo(3);
    assertThatThrownBy(() -> PreconsolidationOptions.builder().virginLinePoints(1).build())
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("virgin line points (1) must be >= 2");
  }

  @Test
  @DisplayName(
      "Void ratios near the top of the double range (e0 = 1.5e308, virgin line slope -5e305 per"
          + " cycle at stresses near 1e-307 Pa, invented): e0 minus the intercept overflows, the"
          + " abscissa is taken term by term and the estimate is absent (outside the loaded range)"
          + " with finite geometry, not an exception")
  void abscissaBeyondTheDoubleRange() {
    // Virgin line e = b + m log10(s') with m = -5e305, b = -6e307: e0 - b = 2.1e308 overflows,
    // e0/m - b/m = -420 does not.
    double slope = -5e305;
    double intercept = -6e307;
    double[] stresses = {3e-308, 6e-308, 1.2e-307, 2.4e-307};
    double[] voidRatios = new double[stresses.length];
    voidRatios[0] = 1.45e308;
    for (int j = 1; j < stresses.length; j++) {
      voidRatios[j] = intercept + slope * Math.log10(stresses[j]);
    }
    CompressionCurve c = CompressionCurve.of(1.5e308, 2.5e-308, stresses, voidRatios);
    PreconsolidationEstimate est = PachecoSilvaMethod.estimate(c);
    assertThat(est.preconsolidationPressure()).isEmpty();
    assertThat(est.absenceReason()).contains("outside the loaded range");
    for (ConstructionPoint p : est.points()) {
      assertThat(List.of(p.x(), p.y())).allMatch(Double::isFinite);
    }
  }

  @Test
  @DisplayName(
      "A virgin line almost flat (slope -1e-10 per cycle) with e0 = 1.7e308 (invented): the virgin"
          + " line reaches e0 only beyond the range of numbers, absent with that reason")
  void virginLineReachesTheInitialVoidRatioBeyondTheDoubleRange() {
    double[] stresses = {1, 2, 4, 8};
    double[] voidRatios = {1.5e308, 1.0, 1.0 - 3.0103e-11, 1.0 - 6.0206e-11};
    CompressionCurve c = CompressionCurve.of(1.7e308, 0.5, stresses, voidRatios);
    PreconsolidationEstimate est = PachecoSilvaMethod.estimate(c);
    assertThat(est.preconsolidationPressure()).isEmpty();
    assertThat(est.absenceReason()).contains("only beyond the range of numbers");
    assertThat(est.lines()).isNotEmpty();
    for (ConstructionLine line : est.lines()) {
      assertThat(List.of(line.x1(), line.y1(), line.x2(), line.y2())).allMatch(Double::isFinite);
    }
  }

  @Test
  @DisplayName(
      "Abscissa where a line reaches y: (y - b)/m, and term by term where y - b overflows; checked"
          + " against exact BigDecimal arithmetic (second formula)")
  void abscissaAt() {
    // Line through (-307.2, 0.936e308) and (-306.6, 0.933e308): slope -5e305, intercept -6e307.
    double[] x = {-307.2, -306.6};
    double[] y = {-6e307 + -5e305 * x[0], -6e307 + -5e305 * x[1]};
    LineFit line = LineFit.through(x, y, 0, 2);
    for (double target : new double[] {0.935e308, 1.5e308, 1.7e308}) {
      java.math.BigDecimal exact =
          new java.math.BigDecimal(target)
              .subtract(new java.math.BigDecimal(line.intercept()))
              .divide(new java.math.BigDecimal(line.slope()), java.math.MathContext.DECIMAL64);
      assertThat(PachecoSilvaMethod.abscissaAt(line, target))
          .as("y = %s", target)
          .isCloseTo(exact.doubleValue(), within(1e-12 * Math.abs(exact.doubleValue())));
    }
  }

  @Test
  @DisplayName(
      "A virgin line falling by a few ulp reaches e0 only at 10^(1e13) Pa: the reason quotes the"
          + " power of ten, not Infinity (found by the whole-reduction fuzz)")
  void farIntersectionQuotedAsPowerOfTen() {
    // ARCHITECTURE.md: no NaN or infinity in any result or message. Invented points: e0 = 0.80,
    // the loading points at 0.81 falling by one ulp (2^-53 * 2^0 ~ 1.1e-16) per doubling.
    double[] stresses = {10e3, 20e3, 40e3, 80e3, 160e3};
    double[] e = new double[stresses.length];
    e[0] = 0.81;
    for (int i = 1; i < e.length; i++) {
      e[i] = Math.nextDown(e[i - 1]);
    }
    PreconsolidationEstimate est =
        PachecoSilvaMethod.estimate(CompressionCurve.of(0.80, stresses, e));
    assertThat(est.preconsolidationPressure()).isEmpty();
    assertThat(est.absenceReason())
        .contains("reaches the initial void ratio 0.8 at 10^")
        .doesNotContain("Infinity")
        .doesNotContain("NaN");
  }
}
