package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class WorkMethodTest {

  private static final double CR = 0.04;
  private static final double CC = 0.40;

  @Test
  @DisplayName("Work W = sum of mean stress times strain increment, by hand (trapezoidal rule)")
  void workArithmetic() {
    // Invented: e0 = 1.0, points (100 kPa, 0.98), (200 kPa, 0.94), (400 kPa, 0.86),
    // (800 kPa, 0.78). Strains 0.01, 0.03, 0.07, 0.11.
    CompressionCurve c =
        CompressionCurve.of(
            1.0, new double[] {100e3, 200e3, 400e3, 800e3}, new double[] {0.98, 0.94, 0.86, 0.78});
    PreconsolidationEstimate est = WorkMethod.estimate(c);
    double[] expected = {
      50e3 * 0.01,
      50e3 * 0.01 + 150e3 * 0.02,
      50e3 * 0.01 + 150e3 * 0.02 + 300e3 * 0.04,
      50e3 * 0.01 + 150e3 * 0.02 + 300e3 * 0.04 + 600e3 * 0.04
    };
    var work = est.points().stream().filter(p -> p.label().equals("work")).toList();
    assertThat(work).hasSize(4);
    for (int i = 0; i < 4; i++) {
      assertThat(work.get(i).y()).isCloseTo(expected[i], within(1e-9));
    }
    assertThat(est.axes()).isEqualTo(PlotAxes.STRESS_WORK);
  }

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {100e3, 400e3})
  @DisplayName(
      "Sharp two-line curve, break at a test stress (invented): within 1 %, because W is two"
          + " straight lines for a constant load ratio (derived in the class documentation)")
  void sharpBreakAtTestStress(double breakStress) {
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0, 1e3);
    assertThat(WorkMethod.estimate(c).preconsolidationPressure().getAsDouble() / breakStress)
        .isCloseTo(1.0, within(0.01));
  }

  @ParameterizedTest(name = "break at {0} Pa")
  @ValueSource(doubles = {150e3, 210e3})
  @DisplayName(
      "Break between test stresses (invented): within +0 % to +7 % sharp and +0 % to +12 % for"
          + " w = 0.05 log cycle (trapezoid over the straddling increment, rounded corner)")
  void breakBetweenTestStresses(double breakStress) {
    CompressionCurve sharp =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0, 1e3);
    assertThat(WorkMethod.estimate(sharp).preconsolidationPressure().getAsDouble() / breakStress)
        .isBetween(1.0, 1.07);
    CompressionCurve smooth =
        SyntheticCurves.curve(
            SyntheticCurves.DOUBLING_STRESSES, breakStress, 1.0, CR, CC, 0.05, 1e3);
    assertThat(WorkMethod.estimate(smooth).preconsolidationPressure().getAsDouble() / breakStress)
        .isBetween(1.0, 1.12);
  }

  @Test
  @DisplayName("Absent with a reason: fewer than four loaded points, no yield")
  void absentCases() {
    PreconsolidationEstimate few =
        WorkMethod.estimate(
            CompressionCurve.of(
                1.0, 50e3, new double[] {100e3, 200e3, 400e3}, new double[] {0.9, 0.8, 0.7}));
    assertThat(few.absenceReason())
        .isEqualTo(
            "the loading envelope has 3 loaded points; two lines of at least two points need 4");
    double[] s = SyntheticCurves.DOUBLING_STRESSES;
    double[] stiffening = new double[s.length];
    for (int i = 0; i < s.length; i++) {
      stiffening[i] = 0.5 + 0.5 / (i + 1);
    }
    PreconsolidationEstimate none = WorkMethod.estimate(CompressionCurve.of(1.5, s, stiffening));
    assertThat(none.preconsolidationPressure()).isEmpty();
    assertThat(none.absenceReason()).endsWith("the curve shows no yield");
    assertThatThrownBy(() -> WorkMethod.estimate(null))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("compression curve must not be null");
  }

  @Test
  @DisplayName(
      "Regression: stresses near the top of the double range (1e307 to 1.7e308 Pa), whose sums"
          + " overflow: an estimate or an absence with a reason, no longer an"
          + " IllegalArgumentException 'slope (NaN)'")
  void stressesNearTheTopOfTheDoubleRange() {
    CompressionCurve c =
        CompressionCurve.of(
            1.0,
            new double[] {1e307, 1.2e308, 1.4e308, 1.6e308, 1.7e308},
            new double[] {0.9, 0.85, 0.7, 0.55, 0.4});
    PreconsolidationEstimate estimate = WorkMethod.estimate(c);
    assertThat(
            estimate.preconsolidationPressure().isPresent() || !estimate.absenceReason().isEmpty())
        .isTrue();
    assertThat(estimate.points()).allMatch(p -> Double.isFinite(p.x()) && Double.isFinite(p.y()));
  }

  @ParameterizedTest(name = "corner at {0} Pa")
  @ValueSource(doubles = {25e3, 50e3, 100e3, 200e3, 400e3})
  @DisplayName(
      "Regression: sharp two-line curve with its corner at a test stress (invented): the work lines"
          + " meet at the corner, which is the edge of the gap between the two groups, so no"
          + " INTERSECTION_AWAY_FROM_BREAK (it was raised by rounding, 1e-13 past the edge)")
  void cornerAtATestStressIsNotAwayFromTheBreak(double corner) {
    // Derived in the class documentation: with a constant load ratio W is a straight line in
    // sigma' along each straight part of e - log sigma', and the corner point lies on both parts,
    // so both work lines pass through it and meet there.
    CompressionCurve c =
        SyntheticCurves.curve(SyntheticCurves.DOUBLING_STRESSES, corner, 1.0, CR, CC, 0, 1e3);
    PreconsolidationEstimate est = WorkMethod.estimate(c);
    assertThat(est.preconsolidationPressure().getAsDouble() / corner).isCloseTo(1.0, within(1e-9));
    assertThat(est.warnings())
        .extracting(CompressibilityWarning::kind)
        .doesNotContain(WarningKind.INTERSECTION_AWAY_FROM_BREAK, WarningKind.OUTSIDE_TESTED_RANGE);
  }

  @ParameterizedTest(name = "C = {0}, e0 = {1}")
  @CsvSource({"0.02, 0.8", "0.02, 1.0", "0.04, 0.8", "0.04, 1.0", "0.1, 1.0", "0.1, 1.5"})
  @DisplayName(
      "Regression: one straight e - log sigma' line at a load ratio of 2 (no yield, invented): W"
          + " is exactly linear in sigma', so no split bends and sigma'_p is absent (rounding of"
          + " the line fits used to decide a bend and report a sigma'_p)")
  void straightLineShowsNoYield(double index, double e0) {
    // Derivation (trapezoidal rule of the class documentation): on e = e0 - C log10(s / 1 kPa)
    // with s_j = 2 s_(j-1), each step adds (s_(j-1) + s_j) / 2 * C log10(2) / (1 + e0) = 1.5 k
    // s_(j-1) with k = C log10(2) / (1 + e0), and s_1 + ... + s_(i-1) = s_i - s_1, so W_i = W_1 +
    // 1.5 k (s_i - s_1): every point lies on one straight line.
    double[] s = SyntheticCurves.DOUBLING_STRESSES;
    double[] e = new double[s.length];
    for (int i = 0; i < s.length; i++) {
      e[i] = e0 - index * Math.log10(s[i] / 1e3);
    }
    PreconsolidationEstimate est = WorkMethod.estimate(CompressionCurve.of(e0, s, e));
    assertThat(est.preconsolidationPressure()).isEmpty();
    assertThat(est.absenceReason()).endsWith("the curve shows no yield");
  }
}
