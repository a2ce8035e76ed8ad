package org.oedometry.core.compressibility;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Locale;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The warnings of the &sigma;'<sub>p</sub> constructions about their lines and their result ({@link
 * WarningKind#TWO_POINT_LINE}, {@link WarningKind#POOR_LINE_FIT}, {@link
 * WarningKind#INTERSECTION_AWAY_FROM_BREAK}, {@link WarningKind#OUTSIDE_TESTED_RANGE}), each
 * triggered by an invented curve built for the situation and checked against a nearby curve that
 * does not have it. All curves are invented.
 */
class PreconsolidationWarningsTest {

  private static final double CR = 0.04;
  private static final double CC = 0.40;
  private static final double BREAK = 150e3;
  private static final double[] S = SyntheticCurves.DOUBLING_STRESSES;

  /** Sharp two-line e - log s' curve, break 150 kPa, e0 on the first line at 1 kPa. */
  private static CompressionCurve sharpCurve() {
    return SyntheticCurves.curve(S, BREAK, 1.0, CR, CC, 0, 1e3);
  }

  private static boolean has(PreconsolidationEstimate e, WarningKind kind) {
    return e.warnings().stream().anyMatch(w -> w.kind() == kind);
  }

  private static String message(PreconsolidationEstimate e, WarningKind kind) {
    String m =
        e.warnings().stream().filter(w -> w.kind() == kind).findFirst().orElseThrow().message();
    assertThat(m).isNotBlank().doesNotContain("NaN").doesNotContain("Infinity");
    return m;
  }

  @ParameterizedTest(name = "virgin line through the last {0} points")
  @ValueSource(ints = {2, 3})
  @DisplayName(
      "TWO_POINT_LINE exactly when the virgin line rests on two points; the result is the same"
          + " (both lines are the exact virgin line): Pacheco Silva's value for two straight lines,"
          + " log s'_p = log s'_b - (Cr/Cc)^2 (log s'_b - log s'_0) (derived in PachecoSilvaMethod)")
  void twoPointVirginLine(int points) {
    PreconsolidationEstimate est =
        PachecoSilvaMethod.estimate(
            sharpCurve(), PreconsolidationOptions.builder().virginLinePoints(points).build());
    // The last three stresses (0.8, 1.6, 3.2 MPa) lie on the virgin line: R^2 = 1, no poor fit.
    double xb = Math.log10(BREAK);
    double expected = Math.pow(10, xb - (CR / CC) * (CR / CC) * (xb - 3));
    assertThat(est.preconsolidationPressure().getAsDouble() / expected)
        .isCloseTo(1.0, within(1e-9));
    assertThat(has(est, WarningKind.TWO_POINT_LINE)).isEqualTo(points == 2);
    assertThat(has(est, WarningKind.POOR_LINE_FIT)).isFalse();
    if (points == 2) {
      assertThat(message(est, WarningKind.TWO_POINT_LINE))
          .contains("the virgin line")
          .contains("only two points");
    }
  }

  /** R^2 of the least-squares line through the points, as the squared Pearson correlation. */
  private static double pearsonSquared(double[] x, double[] y) {
    int n = x.length;
    double mx = 0;
    double my = 0;
    for (int i = 0; i < n; i++) {
      mx += x[i] / n;
      my += y[i] / n;
    }
    double sxx = 0;
    double syy = 0;
    double sxy = 0;
    for (int i = 0; i < n; i++) {
      sxx += (x[i] - mx) * (x[i] - mx);
      syy += (y[i] - my) * (y[i] - my);
      sxy += (x[i] - mx) * (y[i] - my);
    }
    return sxy * sxy / (sxx * syy);
  }

  @ParameterizedTest(name = "middle virgin point raised by {0}")
  @ValueSource(doubles = {0, 0.025, 0.035})
  @DisplayName(
      "POOR_LINE_FIT exactly when the virgin line's R^2 (computed here as the squared Pearson"
          + " correlation, and in closed form 1 / (1 + d^2 / (3 (Cc log10 2)^2)) for three points"
          + " equally spaced in log s' with the middle one raised by d) is below 0.98: d = 0.035"
          + " (R^2 0.9726) is warned, d = 0.025 (0.9858) and 0 are not")
  void poorVirginLine(double raise) {
    CompressionCurve sharp = sharpCurve();
    double[] e = new double[S.length];
    for (int i = 0; i < S.length; i++) {
      e[i] = sharp.voidRatio(i);
    }
    e[S.length - 2] += raise;
    CompressionCurve c = CompressionCurve.of(sharp.initialVoidRatio(), S, e);
    double[] x = new double[3];
    double[] y = new double[3];
    for (int k = 0; k < 3; k++) {
      x[k] = Math.log10(S[S.length - 3 + k]);
      y[k] = e[S.length - 3 + k];
    }
    double r2 = pearsonSquared(x, y);
    // Closed form (derived by hand: x = -h, 0, h, y = m x + (0, d, 0); Sxy = 2 m h^2, Sxx = 2 h^2,
    // Syy = 2 m^2 h^2 + 2 d^2 / 3).
    double mh = CC * Math.log10(2);
    assertThat(r2).isCloseTo(1 / (1 + raise * raise / (3 * mh * mh)), within(1e-12));
    PreconsolidationEstimate est = PachecoSilvaMethod.estimate(c);
    assertThat(has(est, WarningKind.POOR_LINE_FIT)).isEqualTo(r2 < 0.98);
    assertThat(has(est, WarningKind.TWO_POINT_LINE)).isFalse();
    assertThat(raise == 0.035).isEqualTo(r2 < 0.98);
    if (r2 < 0.98) {
      assertThat(message(est, WarningKind.POOR_LINE_FIT))
          .contains("the virgin line fits its 3 points with R squared")
          .contains(String.format(Locale.ROOT, "%.4f", r2));
    }
  }

  /**
   * Points exactly on two straight lines in log10(1 + e) - log10 s' (Onitsuka's axes), slopes -0.01
   * and -0.12, meeting at {@code meet} Pa with 1 + e = 3 there: the first five stresses (6.25 to
   * 100 kPa) on the early line, the last five (200 kPa to 3.2 MPa) on the late one. Where the lines
   * meet outside 100 to 200 kPa, the curve drops between the groups more steeply than the late line
   * (a shape like the collapse of a structured clay at yield).
   */
  private static CompressionCurve twoLines(double meet) {
    double xm = Math.log10(meet);
    double ym = Math.log10(3);
    double[] e = new double[S.length];
    for (int i = 0; i < S.length; i++) {
      double slope = i < 5 ? -0.01 : -0.12;
      e[i] = Math.pow(10, ym + slope * (Math.log10(S[i]) - xm)) - 1;
    }
    return CompressionCurve.of(Math.pow(10, ym + 0.01 * (xm - 3)) - 1, S, e);
  }

  @ParameterizedTest(name = "lines meet at {0} Pa")
  @ValueSource(doubles = {141e3, 100e3, 70.7e3, 9e3, 4e3})
  @DisplayName(
      "Two exact lines in log(1 + e) - log s': the construction returns where they meet (exact on"
          + " such points, BilinearVolumeMethod); INTERSECTION_AWAY_FROM_BREAK exactly when that"
          + " lies outside 100 to 200 kPa, the gap between the groups (141 kPa and the edge 100 kPa"
          + " are in it; 70.7, 9 and 4 kPa are not), and OUTSIDE_TESTED_RANGE exactly when it lies"
          + " outside the loaded 6.25 kPa to 3.2 MPa (only 4 kPa)")
  void linesMeetAwayFromTheBreakOrOutsideTheTest(double meet) {
    CompressionCurve c = twoLines(meet);
    boolean away = meet < 100e3 || meet > 200e3;
    boolean outside = meet < S[0] || meet > S[S.length - 1];
    for (PreconsolidationEstimate est :
        new PreconsolidationEstimate[] {
          BilinearVolumeMethod.onitsuka(c), BilinearVolumeMethod.butterfield(c)
        }) {
      assertThat(est.preconsolidationPressure().getAsDouble() / meet)
          .as("%s", est.method())
          .isCloseTo(1.0, within(1e-9));
      assertThat(has(est, WarningKind.INTERSECTION_AWAY_FROM_BREAK))
          .as("%s", est.method())
          .isEqualTo(away);
      assertThat(has(est, WarningKind.OUTSIDE_TESTED_RANGE))
          .as("%s", est.method())
          .isEqualTo(outside);
      assertThat(has(est, WarningKind.TWO_POINT_LINE) || has(est, WarningKind.POOR_LINE_FIT))
          .isFalse();
      if (away) {
        assertThat(message(est, WarningKind.INTERSECTION_AWAY_FROM_BREAK))
            .contains("the lines meet at")
            .contains("outside the gap 100000.0..200000.0 Pa");
      }
      if (outside) {
        assertThat(message(est, WarningKind.OUTSIDE_TESTED_RANGE))
            .contains("preconsolidation pressure")
            .contains("outside the loaded range 6250.0..3200000.0 Pa");
      }
    }
    assertThat(away).isEqualTo(meet != 141e3 && meet != 100e3);
    assertThat(outside).isEqualTo(meet == 4e3);
  }

  @org.junit.jupiter.api.Test
  @DisplayName(
      "OUTSIDE_TESTED_RANGE: a pressure that is the last or first test stress up to the rounding of"
          + " 10^log10 is inside the range; one a millionth beyond is outside")
  void rangeCheckAllowsRounding() {
    LoadingEnvelope env = LoadingEnvelope.of(sharpCurve());
    double first = S[0];
    double last = S[S.length - 1];
    // IEEE 754: 10^log10(s) need not round back to s (by hand in Python: 10**math.log10(25e3) is
    // 25000.000000000004); a construction that lands on a test stress computes it that way.
    for (double s : new double[] {first, last}) {
      java.util.List<CompressibilityWarning> warnings = new java.util.ArrayList<>();
      env.rangeWarning(Math.nextUp(Math.nextUp(s)), warnings);
      env.rangeWarning(Math.nextDown(Math.nextDown(s)), warnings);
      env.rangeWarning(Math.pow(10, Math.log10(s)), warnings);
      assertThat(warnings).as("stress %s", s).isEmpty();
    }
    java.util.List<CompressibilityWarning> beyond = new java.util.ArrayList<>();
    env.rangeWarning(last * (1 + 1e-6), beyond);
    env.rangeWarning(first * (1 - 1e-6), beyond);
    assertThat(beyond).hasSize(2).allMatch(w -> w.kind() == WarningKind.OUTSIDE_TESTED_RANGE);
  }
}
