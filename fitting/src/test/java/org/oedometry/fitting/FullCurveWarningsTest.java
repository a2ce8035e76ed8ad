package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

/**
 * The full-curve fit's warnings and refusals for curves its model cannot follow, each made from
 * exact Terzaghi curves ({@link ConsolidationCurveModel}, proven against mpmath in the theory
 * module) so that what is wrong with the curve is known, and each beside a nearby curve without the
 * problem, which must not be warned.
 */
class FullCurveWarningsTest {

  private static final double YEAR = FullCurveMethodTest.YEAR;
  private static final double PATH = FullCurveMethodTest.DRAINAGE_PATH;
  private static final double[] LAB = FullCurveMethodTest.labSchedule();

  /** 20 readings a log cycle from 6 s to 24 h (a dense logger-like schedule in log time). */
  private static final double[] DENSE = ReadingSchedules.logSpaced(6, 86_400, 20);

  private static double[] settlements(double[] t, CurveParameters... parts) {
    ConsolidationCurveModel model = ConsolidationCurveModel.of(PATH);
    double[] d = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      for (CurveParameters p : parts) {
        d[i] += model.settlement(t[i], p);
      }
    }
    return d;
  }

  private static FullCurveResult fit(double[] t, double[] d) {
    return FullCurveMethod.fit(SettlementCurve.of(t, d), PATH);
  }

  private static List<FitWarning.Kind> kinds(FullCurveResult r) {
    return r.warnings().stream().map(FitWarning::kind).toList();
  }

  @Test
  @DisplayName(
      "Creep against the movement (s = -2 % of d_p a cycle) puts the secondary slope on its bound"
          + " 0 (the issue's constraint s >= 0): PARAMETER_AT_BOUND; s = +1 % is recovered to 1 %"
          + " without it, and s fixed at 0 by option is no bound")
  void secondarySlopeAtItsBound() {
    double dp = 5e-4;
    FullCurveResult against =
        fit(LAB, settlements(LAB, new CurveParameters(5e-5, dp, 2 / YEAR, -0.02 * dp)));
    assertThat(against.secondarySlope()).isZero();
    assertThat(kinds(against)).contains(FitWarning.Kind.PARAMETER_AT_BOUND);
    assertThat(against.warnings())
        .filteredOn(w -> w.kind() == FitWarning.Kind.PARAMETER_AT_BOUND)
        .singleElement()
        .satisfies(w -> assertThat(w.message()).contains("secondary slope", "bound 0"));

    double s = 0.01 * dp;
    FullCurveResult with = fit(LAB, settlements(LAB, new CurveParameters(5e-5, dp, 2 / YEAR, s)));
    assertThat(with.secondarySlope()).isCloseTo(s, within(0.01 * s));
    assertThat(kinds(with)).doesNotContain(FitWarning.Kind.PARAMETER_AT_BOUND);

    FullCurveResult fixed =
        FullCurveMethod.fit(
            SettlementCurve.of(LAB, settlements(LAB, new CurveParameters(5e-5, dp, 2 / YEAR, 0))),
            PATH,
            FullCurveOptions.defaults().withSecondary(false));
    assertThat(kinds(fixed)).doesNotContain(FitWarning.Kind.PARAMETER_AT_BOUND);
  }

  @Test
  @DisplayName(
      "A small swelling primary (d_p = -5e-5 m) under settling creep (s = 3e-4 m a cycle): with d_p"
          + " and s both >= 0 in the direction of movement the primary can only sit at 0, and c_v"
          + " would rest on the secondary term's onset alone: refused, naming the reason")
  void noPrimaryIsRefused() {
    for (double[] t : new double[][] {LAB, DENSE}) {
      double[] d = settlements(t, new CurveParameters(0, -5e-5, 2 / YEAR, 3e-4));
      assertThatThrownBy(() -> fit(t, d))
          .isInstanceOf(FitException.class)
          .hasMessageContaining("no primary consolidation is seen");
    }
    // The same creep with a settling primary: no refusal, c_v to 0.1 % (exact curve).
    double[] d = settlements(LAB, new CurveParameters(0, 5e-5, 2 / YEAR, 3e-4));
    assertThat(fit(LAB, d).cv()).isCloseTo(2 / YEAR, within(1e-3 * 2 / YEAR));
  }

  @Test
  @DisplayName(
      "Exact curves with the first reading at T = 0.1, 0.5, 1 and 3 (U there 0.3568, 0.7640,"
          + " 0.9313 from FACTS.md [exact], and 1 - 8/pi^2 exp(-pi^2 T / 4) = 0.99951 by the"
          + " one-term series): refused where under 1 % of primary remains, warned"
          + " PRIMARY_BEFORE_FIRST_READING where under half remains, c_v to 0.1 % otherwise")
  void primaryBeforeTheFirstReading() {
    double first = LAB[0];
    double[] firstT = {0.1, 0.5, 1.0, 3.0};
    double[] degree = {
      0.3568234005,
      0.7639503307,
      0.931260,
      1 - 8 / (Math.PI * Math.PI) * Math.exp(-Math.PI * Math.PI * 3 / 4)
    };
    for (int k = 0; k < firstT.length; k++) {
      double remaining = 1 - degree[k];
      double cv = firstT[k] * PATH * PATH / first;
      double[] d = settlements(LAB, CurveParameters.of(1e-5, 4e-4, cv, 4e-6));
      String as = "first reading at T = " + firstT[k];
      if (remaining < FullCurveMethod.FIRST_READING_REMAINING_LIMIT) {
        assertThatThrownBy(() -> fit(LAB, d))
            .as(as)
            .isInstanceOf(FitException.class)
            .hasMessageContaining("primary consolidation was over before the first reading");
        continue;
      }
      FullCurveResult r = fit(LAB, d);
      assertThat(r.cv()).as(as).isCloseTo(cv, within(1e-3 * cv));
      boolean warned = r.hasWarning(FitWarning.Kind.PRIMARY_BEFORE_FIRST_READING);
      assertThat(warned)
          .as(as)
          .isEqualTo(remaining < FullCurveMethod.FIRST_READING_WARNING_REMAINING);
      if (warned) {
        String percent = String.format(java.util.Locale.ROOT, "U at %.1f %%", 100 * degree[k]);
        assertThat(r.warnings())
            .filteredOn(w -> w.kind() == FitWarning.Kind.PRIMARY_BEFORE_FIRST_READING)
            .singleElement()
            .satisfies(w -> assertThat(w.message()).as(as).contains(percent));
      }
    }
    // Three stages (c_v 50, 1.7 and 0.056 m^2/yr) on the lab schedule: the best fit of one stage
    // used the last 2e-12 of its tail and reported d_p = 2.6e9 m with no warning before.
    double[] d =
        settlements(
            LAB,
            CurveParameters.of(0, 4e-4, 50 / YEAR, 0),
            CurveParameters.of(0, 4e-4, 50 / 30.0 / YEAR, 0),
            CurveParameters.of(0, 4e-4, 50 / 900.0 / YEAR, 0));
    assertThatThrownBy(() -> fit(LAB, d))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("primary consolidation was over before the first reading")
        .hasMessageNotContaining("Infinity")
        .hasMessageNotContaining("NaN");
  }

  /** Runs-test z from the residuals' signs, Wald & Wolfowitz (NIST/SEMATECH 1.3.5.13, memory). */
  private static double runsZ(List<Double> residuals) {
    double n1 = 0;
    double n2 = 0;
    double runs = 0;
    int previous = 0;
    for (double r : residuals) {
      int sign = r > 0 ? 1 : r < 0 ? -1 : 0;
      if (sign == 0) {
        continue;
      }
      if (sign > 0) {
        n1++;
      } else {
        n2++;
      }
      if (sign != previous) {
        runs++;
      }
      previous = sign;
    }
    double n = n1 + n2;
    double mean = 2 * n1 * n2 / n + 1;
    double variance = 2 * n1 * n2 * (2 * n1 * n2 - n) / (n * n * (n - 1));
    return (runs - mean) / Math.sqrt(variance);
  }

  @Test
  @DisplayName(
      "Two-stage consolidation (c_v 5 and 0.05 m^2/yr, d_p 0.4 mm each), which one Terzaghi curve"
          + " cannot follow: RESIDUALS_SHOW_STRUCTURE exactly when the runs test on the returned"
          + " residuals gives z < -2.576, quoting the AR(1) widening sqrt((1 + r1) / (1 - r1)) of"
          + " their lag-1 autocorrelation; one stage with 1 um noise: no warning")
  void residualsShowStructure() {
    double[] d =
        settlements(
            DENSE,
            CurveParameters.of(0, 4e-4, 5 / YEAR, 0),
            CurveParameters.of(0, 4e-4, 0.05 / YEAR, 0));
    FullCurveResult twoStage = fit(DENSE, d);
    List<Double> r = twoStage.residuals();
    double z = runsZ(r);
    assertThat(z).isLessThan(-2.576);
    assertThat(kinds(twoStage)).contains(FitWarning.Kind.RESIDUALS_SHOW_STRUCTURE);
    // Lag-1 autocorrelation (Box & Jenkins, from memory), clipped to [0, 0.95] as documented.
    double lag = 0;
    double squares = r.get(0) * r.get(0);
    for (int i = 1; i < r.size(); i++) {
      lag += r.get(i) * r.get(i - 1);
      squares += r.get(i) * r.get(i);
    }
    double rho = Math.min(0.95, Math.max(0, lag / squares));
    String widening =
        String.format(java.util.Locale.ROOT, "%.2f", Math.sqrt((1 + rho) / (1 - rho)));
    assertThat(twoStage.warnings())
        .filteredOn(w -> w.kind() == FitWarning.Kind.RESIDUALS_SHOW_STRUCTURE)
        .singleElement()
        .satisfies(
            w ->
                assertThat(w.message())
                    .contains(String.format(java.util.Locale.ROOT, "z = %.2f", z))
                    .contains("widened by " + widening));

    SettlementCurve oneStage =
        FullCurveMethodTest.curve(
            DENSE, CurveParameters.of(2e-5, 4e-4, 2 / YEAR, 4e-6), 1e-6, new SplittableRandom(7));
    FullCurveResult clean = FullCurveMethod.fit(oneStage, PATH);
    assertThat(runsZ(clean.residuals())).isGreaterThanOrEqualTo(-2.576);
    assertThat(kinds(clean)).doesNotContain(FitWarning.Kind.RESIDUALS_SHOW_STRUCTURE);
  }

  @Test
  @DisplayName(
      "Exact curves of the model itself (ConsolidationCurveModel, 24 parameter sets on the lab and"
          + " dense schedules): residuals at the rounding level (RMS <= 1e-12 of the largest"
          + " settlement) are not read for structure, so no RESIDUALS_SHOW_STRUCTURE and an"
          + " interval that is not widened; before this rule some were warned")
  void roundingResidualsShowNoStructure() {
    int rounding = 0;
    for (double[] t : List.of(LAB, DENSE)) {
      for (double cvPerYear : new double[] {0.5, 2, 8}) {
        for (double initial : new double[] {0, 5e-5}) {
          for (double secondary : new double[] {0, 2e-5}) {
            double[] d =
                settlements(t, new CurveParameters(initial, 4e-4, cvPerYear / YEAR, secondary));
            FullCurveResult r = fit(t, d);
            double largest = 0;
            for (double value : d) {
              largest = Math.max(largest, Math.abs(value));
            }
            if (r.rootMeanSquareResidual()
                <= FullCurveMethod.ROUNDING_RESIDUAL_FRACTION * largest) {
              rounding++;
              assertThat(kinds(r))
                  .as("c_v %s m^2/yr, d_i %s, s %s", cvPerYear, initial, secondary)
                  .doesNotContain(FitWarning.Kind.RESIDUALS_SHOW_STRUCTURE);
            }
          }
        }
      }
    }
    // The exact curves are fitted to rounding (they are the model's own), so the rule is exercised.
    assertThat(rounding).isGreaterThan(20);
  }

  @Test
  @DisplayName(
      "A swelling primary under settling creep (d_p = -2e-4 m, s = 1e-4 m a cycle) leaves the"
          + " starts in different minima: STARTS_DISAGREE exactly when fewer than half of"
          + " starts() are at the best, its message quoting both counts; an exact curve: no warning")
  void startsDisagree() {
    FullCurveResult mixed =
        fit(LAB, settlements(LAB, new CurveParameters(0, -2e-4, 2 / YEAR, 1e-4)));
    assertThat(2 * mixed.startsAtBest()).isLessThan(mixed.starts());
    assertThat(mixed.warnings())
        .filteredOn(w -> w.kind() == FitWarning.Kind.STARTS_DISAGREE)
        .singleElement()
        .satisfies(
            w ->
                assertThat(w.message())
                    .contains(
                        "only "
                            + mixed.startsAtBest()
                            + " of "
                            + mixed.starts()
                            + " least-squares"));

    FullCurveResult exact =
        fit(LAB, settlements(LAB, CurveParameters.of(2e-5, 4e-4, 2 / YEAR, 4e-6)));
    assertThat(2 * exact.startsAtBest()).isGreaterThanOrEqualTo(exact.starts());
    assertThat(kinds(exact)).doesNotContain(FitWarning.Kind.STARTS_DISAGREE);
  }

  @Test
  @DisplayName(
      "A straight line in log t read 20 times a cycle (the shape of secondary compression alone,"
          + " FACTS.md log-time construction) has no primary part: the best fit runs to the fastest"
          + " c_v searched and is refused as over before the first reading")
  void straightLineInLogTimeIsRefused() {
    double[] d = new double[DENSE.length];
    for (int i = 0; i < d.length; i++) {
      d[i] = 1e-4 * Math.log10(DENSE[i]);
    }
    assertThatThrownBy(() -> fit(DENSE, d))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("primary consolidation was over before the first reading")
        .hasMessageContaining("fastest c_v searched");
  }
}
