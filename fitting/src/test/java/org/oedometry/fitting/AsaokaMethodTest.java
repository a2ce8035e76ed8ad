package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Terzaghi;

class AsaokaMethodTest {

  static final double H = ExactCurves.DRAINAGE_PATH;

  @Test
  @DisplayName(
      "Second formula: the one-term series 1 - U = (8/pi^2) exp(-pi^2 T/4) (FACTS.md) is within"
          + " 0.04 % of Terzaghi's 1 - U from 60 % on, so b1 = exp(-pi^2 dT/4) there")
  void oneTermSolutionHoldsInTheWindow() {
    double start = Terzaghi.timeFactor(AsaokaMethod.WINDOW_START_DEGREE);
    for (double t = start; t < 2; t += 0.05) {
      double oneTerm = 8 / (Math.PI * Math.PI) * Math.exp(-Math.PI * Math.PI * t / 4);
      assertThat(oneTerm / Terzaghi.remainingFraction(t) - 1).isCloseTo(0, within(4e-4));
    }
  }

  @Test
  @DisplayName(
      "Exact dense log-spaced curves (our forward model, mpmath-checked), resampled: c_v within"
          + " 0.3 %, final settlement within 0.1 % of d_i + d_p")
  void exactLogSpaced() {
    for (double cvPerYear : new double[] {0.3, 2, 10, 60}) {
      double cv = cvPerYear / ExactCurves.YEAR;
      AsaokaResult r = AsaokaMethod.fit(ExactCurves.dense(cv, 0.02e-3), H);
      assertThat(r.cv() / cv - 1).as("%s m^2/yr", cvPerYear).isCloseTo(0, within(3e-3));
      assertThat(r.finalSettlement()).isCloseTo(0.52e-3, within(1e-3 * 0.52e-3));
      assertThat(r.resampled()).isTrue();
      assertThat(r.hasWarning(FitWarning.Kind.READINGS_RESAMPLED)).isTrue();
      assertThat(r.windowStart() * cv / (H * H))
          .isCloseTo(Terzaghi.timeFactor(AsaokaMethod.WINDOW_START_DEGREE), within(3e-3));
    }
  }

  @Test
  @DisplayName(
      "Exact equally spaced data-logger readings (10 s for 24 h) are used as they are: c_v within"
          + " 0.3 %")
  void exactEquallySpaced() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve c =
        ExactCurves.curve(
            ExactCurves.equalTimes(10, 8640), CurveParameters.of(0.01e-3, 0.5e-3, cv, 0));
    AsaokaResult r = AsaokaMethod.fit(c, H);
    assertThat(r.cv() / cv - 1).isCloseTo(0, within(3e-3));
    assertThat(r.resampled()).isFalse();
    assertThat(r.warnings()).isEmpty();
    assertThat(r.timeStep() % 10).isCloseTo(0, within(1e-9));
  }

  @Test
  @DisplayName("An instantaneous compression changes b0 only: c_v the same")
  void offsetDoesNotMatter() {
    double cv = 2 / ExactCurves.YEAR;
    double a = AsaokaMethod.fit(ExactCurves.dense(cv, 0), H).cv();
    double b = AsaokaMethod.fit(ExactCurves.dense(cv, 0.05e-3), H).cv();
    assertThat(b).isCloseTo(a, within(1e-6 * a));
  }

  @Test
  @DisplayName("Geometry: the fitted line ends on the 45-degree line at the final settlement")
  void geometry() {
    AsaokaResult r = AsaokaMethod.fit(ExactCurves.dense(2 / ExactCurves.YEAR, 0), H);
    PlotPoint end = r.fittedLine().get(1);
    assertThat(end.x()).isEqualTo(end.y()).isEqualTo(r.finalSettlement());
    assertThat(r.b0() + r.b1() * r.finalSettlement()).isCloseTo(r.finalSettlement(), within(1e-15));
    // Resampled: the pairs are consecutive sampled settlements.
    assertThat(r.asaokaPoints()).hasSize(r.sampledSettlements().size() - 1);
    assertThat(r.sampledSettlements()).hasSize(AsaokaOptions.defaults().steps() + 1);
    assertThat(r.method()).isEqualTo(CvMethod.ASAOKA);
    assertThat(r.toString()).startsWith("AsaokaResult[cv 2.00");
  }

  @Test
  @DisplayName("Incomplete curves (ending at U = 25 %, 59 %, 76 %): FitException")
  void incompleteCurve() {
    ExactCurves.refusesIncompleteCurves(c -> AsaokaMethod.fit(c, H));
  }

  @Test
  @DisplayName("Curve ending at U = 85 %: c_v found, readings-end warning")
  void endsBeforeNinety() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve c =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 1e-3, 0.7, 80), CurveParameters.of(0, 0.5e-3, cv, 0));
    AsaokaResult r = AsaokaMethod.fit(c, H);
    assertThat(r.cv() / cv - 1).isCloseTo(0, within(0.01));
    assertThat(r.hasWarning(FitWarning.Kind.READINGS_END_BEFORE_RANGE)).isTrue();
  }

  @Test
  void rejectsBadInput() {
    SettlementCurve good = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    assertThatThrownBy(() -> AsaokaMethod.fit(good, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> AsaokaMethod.fit(good, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (NaN m) must be finite and > 0");
    SettlementCurve few =
        SettlementCurve.of(
            new double[] {0, 6, 15, 30, 60, 120}, new double[] {0, 1e-5, 2e-5, 3e-5, 4e-5, 5e-5});
    assertThatThrownBy(() -> AsaokaMethod.fit(few, H))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("5 readings after t = 0 are too few for the Asaoka method (needs at least 6)");
    assertThatThrownBy(() -> AsaokaOptions.defaults().withSteps(3))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("number of time steps (3) must be in [4, 200]");
    SettlementCurve flat = SettlementCurve.of(good.elapsedSeconds(), new double[good.size()]);
    assertThatThrownBy(() -> AsaokaMethod.fit(flat, H))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("the readings do not move");
  }

  @Test
  @DisplayName("Swelling: the negated curve gives the same c_v, negated settlements, a warning")
  void swelling() {
    SettlementCurve up = ExactCurves.dense(2 / ExactCurves.YEAR, 0.01e-3);
    AsaokaResult a = AsaokaMethod.fit(up, H);
    AsaokaResult b = AsaokaMethod.fit(ExactCurves.negated(up), H);
    assertThat(b.cv()).isCloseTo(a.cv(), within(1e-12 * a.cv()));
    assertThat(b.finalSettlement()).isCloseTo(-a.finalSettlement(), within(1e-15));
    assertThat(b.hasWarning(FitWarning.Kind.SWELLING_INCREMENT)).isTrue();
  }

  @Test
  @DisplayName(
      "Secondary compression on a data logger (s = 1 % to 30 % of d_p per log cycle): either a"
          + " c_v within 10 % of the truth or a FitException, never a c_v many times too small")
  void creepNeverGivesASilentlyWrongValue() {
    double cv = 2 / ExactCurves.YEAR;
    int refused = 0;
    for (double ratio : new double[] {0.01, 0.03, 0.1, 0.3}) {
      SettlementCurve c =
          ExactCurves.curve(
              ExactCurves.equalTimes(10, 8640),
              CurveParameters.of(0.01e-3, 0.5e-3, cv, ratio * 0.5e-3));
      try {
        AsaokaResult r = AsaokaMethod.fit(c, H);
        assertThat(r.cv() / cv - 1).as("creep ratio %s", ratio).isCloseTo(0, within(0.10));
      } catch (FitException e) {
        refused++;
      }
    }
    assertThat(refused).as("the strongest creep is refused").isGreaterThanOrEqualTo(1);
  }

  @Test
  @DisplayName(
      "The usual 14-reading lab schedule (FACTS.md, from memory) has too few readings between 60 %"
          + " and 95 % to resample: FitException for every T at 24 h from 2 to 50 (exact Terzaghi"
          + " curves from the theory module, d_i 4 % of d_p, secondary 0 / 2 % of d_p per cycle)")
  void sparseLabSchedule() {
    for (double lastT : LabScheduleCurves.lastTimeFactors(2, 50, 40)) {
      for (double secondary : new double[] {0, 0.02}) {
        SettlementCurve c = LabScheduleCurves.curve(lastT, 0.04, secondary);
        assertThatThrownBy(() -> AsaokaMethod.fit(c, H))
            .as("T %s, s %s", lastT, secondary)
            .isInstanceOf(FitException.class)
            // English agreement: "1 reading lies", "2 readings lie" (never "1 readings").
            .hasMessageMatching(
                "only (1 reading lies|(0|[2-9]|[1-9]\\d+) readings lie) between 60 % and 95 %"
                    + " consolidation.*");
      }
    }
  }

  @Test
  @DisplayName(
      "Orthogonal line: its direction is the principal axis of the points' covariance (Pearson"
          + " 1901, from memory; Commons Math EigenDecomposition), for either sign of S_xy")
  void orthogonalLineIsThePrincipalAxis() {
    SplittableRandom random = new SplittableRandom(5);
    for (int k = 0; k < 200; k++) {
      int n = 3 + random.nextInt(40);
      double slope = (random.nextBoolean() ? 1 : -1) * Math.exp(4 * random.nextDouble() - 2);
      double[] x = new double[n];
      double[] y = new double[n];
      for (int i = 0; i < n; i++) {
        x[i] = 1e-3 * random.nextDouble();
        y[i] = 2e-4 + slope * x[i] + 2e-4 * (random.nextDouble() - 0.5);
      }
      double mx = java.util.Arrays.stream(x).average().orElseThrow();
      double my = java.util.Arrays.stream(y).average().orElseThrow();
      double sxx = 0;
      double syy = 0;
      double sxy = 0;
      for (int i = 0; i < n; i++) {
        sxx += (x[i] - mx) * (x[i] - mx);
        syy += (y[i] - my) * (y[i] - my);
        sxy += (x[i] - mx) * (y[i] - my);
      }
      EigenDecomposition eigen =
          new EigenDecomposition(new Array2DRowRealMatrix(new double[][] {{sxx, sxy}, {sxy, syy}}));
      int major = eigen.getRealEigenvalue(0) >= eigen.getRealEigenvalue(1) ? 0 : 1;
      double[] axis = eigen.getEigenvector(major).toArray();
      double expected = axis[1] / axis[0];
      double[] line = AsaokaMethod.orthogonalLine(x, y);
      assertThat(line[1]).as("case %d", k).isCloseTo(expected, within(1e-9 * Math.abs(expected)));
      assertThat(line[0]).isCloseTo(my - expected * mx, within(1e-9 * (Math.abs(my) + 1e-3)));
    }
    assertThat(AsaokaMethod.orthogonalLine(new double[] {1, 2, 3}, new double[] {5, 5, 5}))
        .isNull();
  }

  @Test
  @DisplayName(
      "Noisy equally spaced readings (every 10 s for 24 h; exact curves, T at 24 h 2 to 50, noise"
          + " 0.5-3 % of d_p, 200 seeded curves): every pair of readings one step apart is used and"
          + " the orthogonal line is unbiased (at most 10 refused; mean error within 2 %, median"
          + " 2.5 %, 90th percentile 10 %); ordinary least squares on the same pairs (Commons Math"
          + " SimpleRegression) is diluted: b1 low, c_v high")
  void noisyEquallySpacedReadingsAreUnbiased() {
    SplittableRandom random = new SplittableRandom(20261202L);
    double[] times = ExactCurves.equalTimes(10, 8640);
    java.util.List<Double> errors = new java.util.ArrayList<>();
    double signed = 0;
    double signedOrdinary = 0;
    int refused = 0;
    for (int k = 0; k < 200; k++) {
      double lastT = 2 * Math.pow(25, random.nextDouble());
      double cv = lastT * H * H / times[times.length - 1];
      double dp = 0.5e-3;
      double noise = dp * (0.005 + 0.025 * random.nextDouble());
      CurveParameters p = CurveParameters.of(0.02e-3, dp, cv, 0.002 * dp);
      double[] d = new double[times.length];
      org.oedometry.theory.ConsolidationCurveModel model =
          org.oedometry.theory.ConsolidationCurveModel.of(H);
      for (int i = 0; i < d.length; i++) {
        d[i] = model.settlement(times[i], p) + noise * gaussian(random);
      }
      AsaokaResult r;
      try {
        r = AsaokaMethod.fit(SettlementCurve.of(times, d), H);
      } catch (FitException e) {
        refused++;
        continue;
      }
      long stride = Math.round(r.timeStep() / 10);
      // Every reading from the window's start to one step before its end, with the one a step on.
      assertThat(r.asaokaPoints())
          .hasSize((int) ((r.sampledSettlements().size() - 2) * stride + 1));
      double error = r.cv() / cv - 1;
      errors.add(Math.abs(error));
      signed += error;
      SimpleRegression ordinary = new SimpleRegression();
      for (PlotPoint pair : r.asaokaPoints()) {
        ordinary.addData(pair.x(), pair.y());
      }
      double cvOrdinary =
          -4 * H * H * Math.log(ordinary.getSlope()) / (Math.PI * Math.PI * r.timeStep());
      signedOrdinary += cvOrdinary / cv - 1;
    }
    java.util.Collections.sort(errors);
    int found = errors.size();
    assertThat(refused).as("refused").isLessThanOrEqualTo(10);
    assertThat(signed / found).as("mean error").isCloseTo(0, within(0.02));
    assertThat(errors.get(found / 2)).as("median").isLessThan(0.025);
    assertThat(errors.get(found * 9 / 10)).as("90th percentile").isLessThan(0.10);
    assertThat(signedOrdinary / found).as("ordinary least squares, mean error").isGreaterThan(0.05);
  }

  private static double gaussian(SplittableRandom random) {
    // Box-Muller from the seeded generator, so the data are the same on every machine.
    double u = 1 - random.nextDouble();
    double v = random.nextDouble();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  }
}
