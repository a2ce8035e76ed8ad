package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.internal.WeightedLeastSquares;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

/**
 * Recovery of known parameters from curves made with our own forward model ({@link
 * ConsolidationCurveModel}), whose accuracy is proven against mpmath in the theory module.
 */
class FullCurveMethodTest {

  static final double YEAR = 365.25 * 86_400;
  static final double DRAINAGE_PATH = 0.0095;

  /** Usual lab schedule in minutes (FACTS.md, from memory): 0.1 min to 24 h. */
  static final double[] LAB_MINUTES = {0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440};

  static double[] labSchedule() {
    double[] t = new double[LAB_MINUTES.length];
    for (int i = 0; i < t.length; i++) {
      t[i] = 60 * LAB_MINUTES[i];
    }
    return t;
  }

  static double[] loggerSchedule() {
    double[] t = new double[8640];
    for (int i = 0; i < t.length; i++) {
      t[i] = 10.0 * (i + 1);
    }
    return t;
  }

  static SettlementCurve curve(
      double[] times, CurveParameters truth, double noise, SplittableRandom random) {
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    double[] d = new double[times.length];
    for (int i = 0; i < times.length; i++) {
      d[i] = model.settlement(times[i], truth) + (noise == 0 ? 0 : noise * gaussian(random));
    }
    return SettlementCurve.of(times, d);
  }

  static double gaussian(SplittableRandom random) {
    // Box-Muller from the seeded generator, so the data are the same on every machine.
    double u = 1 - random.nextDouble();
    double v = random.nextDouble();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  }

  @Test
  @DisplayName(
      "A reading at t = 0 is left out with a warning, as in the constructions (it may hold the"
          + " false deformation): the fit is the same bit for bit as without it")
  void zeroReadingLeftOutWithWarning() {
    CurveParameters truth = CurveParameters.of(0.020e-3, 0.600e-3, 2 / YEAR, 0.030e-3);
    SettlementCurve without = curve(labSchedule(), truth, 1e-6, new SplittableRandom(5));
    double[] t = new double[without.size() + 1];
    double[] d = new double[without.size() + 1];
    System.arraycopy(without.elapsedSeconds(), 0, t, 1, without.size());
    System.arraycopy(without.settlementMetres(), 0, d, 1, without.size());
    // A zero reading far from d_i: a large false deformation would pull any fit that used it.
    d[0] = -0.5e-3;
    FullCurveResult withZero = FullCurveMethod.fit(SettlementCurve.of(t, d), DRAINAGE_PATH);
    FullCurveResult plain = FullCurveMethod.fit(without, DRAINAGE_PATH);
    assertThat(withZero.warnings())
        .filteredOn(w -> w.kind() == FitWarning.Kind.ZERO_READING_IGNORED)
        .singleElement()
        .satisfies(w -> assertThat(w.message()).contains("-5.0E-4 m").contains("t = 0"));
    assertThat(plain.warnings()).noneMatch(w -> w.kind() == FitWarning.Kind.ZERO_READING_IGNORED);
    assertThat(withZero.cv()).isEqualTo(plain.cv());
    assertThat(withZero.d0()).isEqualTo(plain.d0());
    assertThat(withZero.residuals()).isEqualTo(plain.residuals());
  }

  @Test
  @DisplayName(
      "Settlements of extreme magnitude (1e-150 to 1e150 m, a unit mistake) give the c_v of the same"
          + " curve in metres, with d0, d100, s, residuals and their errors scaled: the fit divides"
          + " them by a power of 2 [scaling the data scales a least-squares fit: invariance]")
  void extremeSettlementMagnitudes() {
    CurveParameters truth = CurveParameters.of(0.020e-3, 0.600e-3, 2 / YEAR, 0.030e-3);
    SettlementCurve metres = curve(labSchedule(), truth, 1e-6, new SplittableRandom(9));
    FullCurveResult base = FullCurveMethod.fit(metres, DRAINAGE_PATH);
    for (double factor : new double[] {0x1p-500, 0x1p500, 1e-150, 1e150, -1e-150}) {
      double[] d = metres.settlementMetres();
      for (int i = 0; i < d.length; i++) {
        d[i] *= factor;
      }
      FullCurveResult r =
          FullCurveMethod.fit(SettlementCurve.of(metres.elapsedSeconds(), d), DRAINAGE_PATH);
      // A power of 2 scales every number exactly; a power of 10 rounds the readings once.
      boolean powerOfTwo = factor == Math.scalb(Math.signum(factor), Math.getExponent(factor));
      double tolerance = powerOfTwo ? 1e-12 : 1e-6;
      assertThat(r.cv() / base.cv()).as("c_v, factor %s", factor).isCloseTo(1, within(tolerance));
      assertThat(r.cvHigh() / base.cvHigh()).isCloseTo(1, within(tolerance));
      assertThat(r.d0() / (factor * base.d0())).isCloseTo(1, within(1e-6));
      assertThat(r.d100() / (factor * base.d100())).isCloseTo(1, within(1e-6));
      assertThat(r.secondarySlope() / (factor * base.secondarySlope())).isCloseTo(1, within(1e-6));
      assertThat(r.rootMeanSquareResidual() / (Math.abs(factor) * base.rootMeanSquareResidual()))
          .isCloseTo(1, within(1e-6));
      assertThat(r.standardErrors().get(1) / (Math.abs(factor) * base.standardErrors().get(1)))
          .isCloseTo(1, within(1e-6));
      assertThat(r.residuals().get(5) / (factor * base.residuals().get(5)))
          .isCloseTo(1, within(1e-4));
      assertThat(r.fittedCurve().get(50).y() / (factor * base.fittedCurve().get(50).y()))
          .isCloseTo(1, within(1e-6));
    }
  }

  @Test
  @DisplayName("Noise-free lab schedule: c_v within 0.1 %, d_i within 0.1 % of d_p, s within 1 %")
  void recoversExactParameters() {
    for (double cvPerYear : new double[] {0.5, 2, 8, 30}) {
      CurveParameters truth = CurveParameters.of(0.020e-3, 0.600e-3, cvPerYear / YEAR, 0.030e-3);
      FullCurveResult r = FullCurveMethod.fit(curve(labSchedule(), truth, 0, null), DRAINAGE_PATH);
      assertThat(r.cv() / truth.cv() - 1)
          .as("c_v error at %s m^2/yr", cvPerYear)
          .isCloseTo(0, within(0.001));
      assertThat(r.d0() - truth.initialSettlement()).isCloseTo(0, within(0.001 * 0.6e-3));
      assertThat(r.secondarySlope() / truth.secondarySlope() - 1).isCloseTo(0, within(0.01));
      assertThat(r.cvLow()).isLessThanOrEqualTo(r.cv());
      assertThat(r.cvHigh()).isGreaterThanOrEqualTo(r.cv());
    }
  }

  @Test
  @DisplayName("Swelling: the negated curve gives the same c_v and negated settlements")
  void swelling() {
    CurveParameters truth = CurveParameters.of(0.010e-3, 0.300e-3, 3 / YEAR, 0.010e-3);
    SettlementCurve compression = curve(labSchedule(), truth, 0, null);
    double[] negated = compression.settlementMetres();
    for (int i = 0; i < negated.length; i++) {
      negated[i] = -negated[i];
    }
    FullCurveResult up = FullCurveMethod.fit(compression, DRAINAGE_PATH);
    FullCurveResult down =
        FullCurveMethod.fit(
            SettlementCurve.of(compression.elapsedSeconds(), negated), DRAINAGE_PATH);
    assertThat(down.cv()).isCloseTo(up.cv(), within(1e-9 * up.cv()));
    assertThat(down.d100()).isCloseTo(-up.d100(), within(1e-12));
    assertThat(down.hasWarning(FitWarning.Kind.SWELLING_INCREMENT)).isTrue();
  }

  @Test
  @DisplayName(
      "Coverage: 1 um noise on a data-logger schedule, the 95 % interval holds the true"
          + " c_v in at least 90 % of 200 seeded repetitions (the count is written to"
          + " target/full-curve-coverage.md)")
  void coverageOnLoggerSchedule() throws IOException {
    CurveParameters truth = CurveParameters.of(0.015e-3, 0.500e-3, 1.5 / YEAR, 0.020e-3);
    SplittableRandom random = new SplittableRandom(20261201L);
    int covered = 0;
    int repetitions = 200;
    for (int k = 0; k < repetitions; k++) {
      FullCurveResult r =
          FullCurveMethod.fit(curve(loggerSchedule(), truth, 1e-6, random), DRAINAGE_PATH);
      if (r.cvLow() <= truth.cv() && truth.cv() <= r.cvHigh()) {
        covered++;
      }
    }
    assertThat(covered).as("repetitions covering the true c_v").isGreaterThanOrEqualTo(180);
    Path out = Path.of("target", "full-curve-coverage.md");
    Files.createDirectories(out.getParent());
    Files.writeString(
        out,
        "Coverage of the 95 % interval, 1 um noise, 8,640-reading data-logger schedule: "
            + covered
            + " of "
            + repetitions
            + " seeded repetitions\n",
        StandardCharsets.UTF_8);
  }

  @Test
  @DisplayName(
      "Many readings (grouped search, then refinement on every reading): c_v, d_i, d_p and s"
          + " within 0.01 standard errors of Levenberg-Marquardt over all 8,640 readings, and the"
          + " standard error of ln c_v between 0.99 and 1.1 times the reference sandwich error [plain Commons Math Levenberg-Marquardt on"
          + " every reading as reference]")
  void groupedFitMatchesFitOnEveryReading() {
    SplittableRandom random = new SplittableRandom(77);
    for (double cvPerYear : new double[] {0.3, 1.5, 6}) {
      CurveParameters truth = CurveParameters.of(0.015e-3, 0.500e-3, cvPerYear / YEAR, 0.020e-3);
      SettlementCurve curve = curve(loggerSchedule(), truth, 1e-6, random);
      FullCurveResult fit = FullCurveMethod.fit(curve, DRAINAGE_PATH);
      WeightedLeastSquares.Solution reference =
          assertWithinHundredthOfStandardError(
              cvPerYear + " m^2/yr", curve, FullCurveOptions.defaults(), fit, truth.cv());
      // The result's error of ln c_v is the sandwich form, widened by AR(1) for correlated
      // residuals (these are independent, so by at most a few per cent).
      double sandwich = Math.sqrt(reference.equalNoiseCovariance()[2][2]);
      double resultError =
          Math.log(fit.cvHigh() / fit.cv())
              / new org.apache.commons.math3.distribution.TDistribution(null, 8640 - 4)
                  .inverseCumulativeProbability(0.975);
      assertThat(resultError).isBetween(0.99 * sandwich, 1.1 * sandwich);
    }
  }

  @Test
  @DisplayName(
      "Many readings, every option: with a zero reading, swelling, unit weights, no secondary"
          + " term or another secondary onset, the grouped fit is within 0.01 standard errors of"
          + " Levenberg-Marquardt on every reading [plain Commons Math Levenberg-Marquardt on every"
          + " reading as reference]")
  void groupedFitMatchesFitOnEveryReadingForEveryOption() {
    SplittableRandom random = new SplittableRandom(91);
    CurveParameters truth = CurveParameters.of(0.012e-3, 0.400e-3, 2.5 / YEAR, 0.015e-3);
    double[] logger = loggerSchedule();
    SettlementCurve plainCurve = curve(logger, truth, 1e-6, random);
    double[] withZeroTimes = new double[logger.length + 1];
    double[] withZeroSettlements = new double[logger.length + 1];
    System.arraycopy(logger, 0, withZeroTimes, 1, logger.length);
    System.arraycopy(plainCurve.settlementMetres(), 0, withZeroSettlements, 1, logger.length);
    withZeroSettlements[0] = 0.004e-3;
    double[] swelling = plainCurve.settlementMetres();
    for (int i = 0; i < swelling.length; i++) {
      swelling[i] = -swelling[i];
    }
    record Case(String name, SettlementCurve curve, FullCurveOptions options) {}
    FullCurveOptions defaults = FullCurveOptions.defaults();
    List<Case> cases =
        List.of(
            new Case(
                "zero reading", SettlementCurve.of(withZeroTimes, withZeroSettlements), defaults),
            new Case("swelling", SettlementCurve.of(logger, swelling), defaults),
            new Case(
                "unit weights",
                plainCurve,
                defaults.withWeights(FullCurveOptions.ReadingWeights.UNIT)),
            new Case("no secondary term", plainCurve, defaults.withSecondary(false)),
            new Case("secondary onset 1", plainCurve, defaults.withSecondaryOnset(1.0)));
    for (Case c : cases) {
      FullCurveResult fit = FullCurveMethod.fit(c.curve(), DRAINAGE_PATH, c.options());
      assertWithinHundredthOfStandardError(c.name(), c.curve(), c.options(), fit, truth.cv());
    }
  }

  /**
   * The reference for the grouped fit: plain Levenberg-Marquardt (Commons Math through {@link
   * WeightedLeastSquares#solve}) on every reading after t = 0, in the fitting sign, with the
   * method's weights, and the same comparison of the method's result against it: every parameter
   * within 0.01 standard errors.
   *
   * @return the reference solution
   */
  static WeightedLeastSquares.Solution assertWithinHundredthOfStandardError(
      String what,
      SettlementCurve curve,
      FullCurveOptions options,
      FullCurveResult fit,
      double cv) {
    double[] all = curve.elapsedSeconds();
    double[] allSettlements = curve.settlementMetres();
    int first = all[0] == 0 ? 1 : 0;
    double[] t = java.util.Arrays.copyOfRange(all, first, all.length);
    double[] y = java.util.Arrays.copyOfRange(allSettlements, first, allSettlements.length);
    double sign = y[y.length - 1] >= y[0] ? 1 : -1;
    for (int i = 0; i < y.length; i++) {
      y[i] *= sign;
    }
    double[] w = FullCurveMethod.weights(t, options.weights());
    ConsolidationCurveModel model =
        new ConsolidationCurveModel(DRAINAGE_PATH, options.secondaryOnset());
    int p = options.fitSecondary() ? 4 : 3;
    double[] start =
        p == 4
            ? new double[] {0, 0.3e-3, Math.log(cv), 0.01e-3}
            : new double[] {0, 0.3e-3, Math.log(cv)};
    WeightedLeastSquares.Solution reference =
        WeightedLeastSquares.withDefaults()
            .solve(
                ((WeightedLeastSquares.PointModel)
                        (i, q, g) -> {
                          double[] full = new double[4];
                          double value =
                              model.settlementAndGradient(
                                  t[i],
                                  CurveParameters.of(
                                      q[0], q[1], Math.exp(q[2]), p == 4 ? q[3] : 0.0),
                                  full);
                          System.arraycopy(full, 0, g, 0, p);
                          return value;
                        })
                    .asModel(),
                y,
                w,
                start,
                null);
    double[] q = reference.parameters();
    double[] se = reference.standardErrors();
    double[] fitted = {
      sign * fit.d0(),
      sign * (fit.d100() - fit.d0()),
      Math.log(fit.cv()),
      sign * fit.secondarySlope()
    };
    for (int j = 0; j < p; j++) {
      assertThat(Math.abs(fitted[j] - q[j]))
          .as("%s: parameter %d against %s standard errors", what, j, se[j])
          .isLessThanOrEqualTo(0.01 * se[j] + 1e-12 * Math.abs(q[j]));
    }
    assertThat(fit.residuals()).as(what).hasSize(t.length);
    return reference;
  }

  @Test
  @DisplayName(
      "Noise-free data-logger schedule (8,640 readings, grouped search): c_v within 0.1 %, d_i"
          + " within 0.1 % of d_p, s within 1 %")
  void recoversExactParametersFromManyReadings() {
    for (double cvPerYear : new double[] {0.3, 1.5, 6}) {
      CurveParameters truth = CurveParameters.of(0.015e-3, 0.500e-3, cvPerYear / YEAR, 0.020e-3);
      FullCurveResult r =
          FullCurveMethod.fit(curve(loggerSchedule(), truth, 0, null), DRAINAGE_PATH);
      assertThat(r.cv() / truth.cv() - 1).as("c_v at %s", cvPerYear).isCloseTo(0, within(0.001));
      assertThat(r.d0() - truth.initialSettlement()).isCloseTo(0, within(0.001 * 0.5e-3));
      assertThat(r.secondarySlope() / truth.secondarySlope() - 1).isCloseTo(0, within(0.01));
      assertThat(r.residuals()).hasSize(8640);
    }
  }

  @Test
  @DisplayName(
      "ln(a/b) by 2 atanh((a - b)/(a + b)) for close readings: within 4 ulp of StrictMath.log(a/b)"
          + " rounded, for ratios from 1 + 1e-12 to 1e6 [java.lang.StrictMath (fdlibm) as"
          + " reference]")
  void logRatioAgainstStrictMath() {
    SplittableRandom random = new SplittableRandom(11);
    double worst = 0;
    for (int k = 0; k < 200_000; k++) {
      double b = Math.pow(10, random.nextDouble(-3, 7));
      // Ratios log-uniform from 1 + 1e-12 to 1e6, and dense ones near the series limit.
      double excess =
          k % 2 == 0 ? Math.pow(10, random.nextDouble(-12, 6)) : random.nextDouble(0.10, 0.16);
      double a = b * (1 + excess);
      if (!(a > b)) {
        continue;
      }
      // Reference: log1p of (a - b)/b computed to 34 digits, then rounded (within 1.5 ulp).
      double reference = StrictMath.log1p(exactRelativeDifference(a, b));
      worst =
          Math.max(
              worst, Math.abs(FullCurveMethod.logRatio(a, b) - reference) / Math.ulp(reference));
    }
    assertThat(worst).as("largest error in ulp").isLessThanOrEqualTo(4);
  }

  /** (a - b)/b to 34 significant digits, rounded to a double. */
  private static double exactRelativeDifference(double a, double b) {
    return new java.math.BigDecimal(a)
        .subtract(new java.math.BigDecimal(b))
        .divide(new java.math.BigDecimal(b), java.math.MathContext.DECIMAL128)
        .doubleValue();
  }

  @Test
  @DisplayName(
      "Default weights: each reading's span of log t, half the distance to its neighbours,"
          + " normalised to a mean of 1 (the definition, with StrictMath.log1p of the exact relative"
          + " difference of the neighbours' times)")
  void weightsAreLogTimeSpans() {
    double[][] schedules = {
      ReadingSchedules.usualLab(),
      ReadingSchedules.uniform(10, 86_400),
      ReadingSchedules.logSpaced(1, 86_400, 200),
      {1, 2, 3, 1000, 1001, 5000}
    };
    for (double[] t : schedules) {
      int n = t.length;
      double[] span = new double[n];
      double sum = 0;
      for (int i = 0; i < n; i++) {
        int low = Math.max(0, i - 1);
        int high = Math.min(n - 1, i + 1);
        // ln(t_high / t_low) without the cancellation of a difference of two logarithms.
        double width = StrictMath.log1p(exactRelativeDifference(t[high], t[low]));
        span[i] = i == 0 || i == n - 1 ? width : width / 2;
        sum += span[i];
      }
      double[] w = FullCurveMethod.weights(t, FullCurveOptions.ReadingWeights.LOG_TIME_BALANCE);
      for (int i = 0; i < n; i++) {
        double expected = Math.max(1e-6, span[i] / (sum / n));
        assertThat(w[i]).as("weight %d of %d", i, n).isCloseTo(expected, within(1e-12 * expected));
      }
    }
  }

  @Test
  @DisplayName(
      "Runs test: z = (R - mu) / sigma with mu = 2 n1 n2 / n + 1 and sigma^2 = 2 n1 n2 (2 n1 n2 -"
          + " n) / (n^2 (n - 1)), zeros skipped [Wald & Wolfowitz 1940; NIST/SEMATECH e-Handbook"
          + " 1.3.5.13, from memory]")
  void runsTestFollowsTheTextbookFormula() {
    // Signs + + - - - + - + + 0 - - + + + - (the zero is skipped): 8 runs, 8 positive, 7 negative.
    double[] residuals = {1, 2, -1, -3, -2, 4, -1, 2, 3, 0, -2, -1, 1, 5, 2, -4};
    double n1 = 8;
    double n2 = 7;
    double n = n1 + n2;
    double mean = 2 * n1 * n2 / n + 1;
    double variance = 2 * n1 * n2 * (2 * n1 * n2 - n) / (n * n * (n - 1));
    assertThat(FullCurveMethod.runsTestZ(residuals))
        .isCloseTo((8 - mean) / Math.sqrt(variance), within(1e-12));
    double[] alternating = new double[20];
    for (int i = 0; i < alternating.length; i++) {
      alternating[i] = i % 2 == 0 ? 1 : -1;
    }
    // 20 runs of 10 + 10 against a mean of 11 and a variance of 4.74: z = 4.1.
    assertThat(FullCurveMethod.runsTestZ(alternating)).isGreaterThan(3);
    assertThat(FullCurveMethod.runsTestZ(new double[] {1, 1, 1, -1})).isZero();
    // Without the zero (and with -0.0, which is no sign either) the count must be the same.
    double[] noZero = {1, 2, -1, -3, -2, 4, -1, 2, 3, -2, -1, 1, 5, 2, -4};
    double[] negativeZero = {1, 2, -1, -3, -2, 4, -1, 2, 3, -0.0, -2, -1, 1, 5, 2, -4};
    assertThat(FullCurveMethod.runsTestZ(noZero)).isEqualTo(FullCurveMethod.runsTestZ(residuals));
    assertThat(FullCurveMethod.runsTestZ(negativeZero))
        .isEqualTo(FullCurveMethod.runsTestZ(residuals));
  }

  @Test
  @DisplayName(
      "Many readings bunched in time (a logger that ran for a minute at the start and a minute at"
          + " the end, most log-time bins empty): c_v of exact data within 0.1 %, a residual for"
          + " every reading")
  void bunchedLoggerReadings() {
    CurveParameters truth = CurveParameters.of(0.015e-3, 0.500e-3, 1.5 / YEAR, 0.020e-3);
    double[] times = new double[1200];
    for (int i = 0; i < 600; i++) {
      times[i] = 6.0 + 0.1 * i;
      times[600 + i] = 86_400.0 + 0.1 * i;
    }
    FullCurveResult r = FullCurveMethod.fit(curve(times, truth, 0, null), DRAINAGE_PATH);
    assertThat(r.cv() / truth.cv() - 1).isCloseTo(0, within(0.001));
    assertThat(r.residuals()).hasSize(1200);
  }

  @Test
  @DisplayName(
      "Exact curves stopped early (T at the last reading 0.01 to 0.1, U below 36 %): refused, and"
          + " the message says why [Terzaghi's early-time form U = 2 sqrt(T / pi), textbook, from"
          + " memory: the readings fix d_p sqrt(c_v), not c_v]")
  void curveStoppedEarlyIsRefusedWithTheReason() {
    double[] t = labSchedule();
    double lastTime = t[t.length - 1];
    for (double lastTimeFactor : new double[] {0.01, 0.03, 0.1}) {
      double cv = lastTimeFactor * DRAINAGE_PATH * DRAINAGE_PATH / lastTime;
      SettlementCurve early = curve(t, CurveParameters.of(0.02e-3, 0.5e-3, cv, 0.01e-3), 0, null);
      assertThatThrownBy(() -> FullCurveMethod.fit(early, DRAINAGE_PATH))
          .as("T at the last reading %s", lastTimeFactor)
          .isInstanceOf(FitException.class)
          .hasMessageContaining("primary consolidation seems far from complete")
          .hasMessageContaining("fix only d_p sqrt(c_v), not c_v");
    }
  }

  @Test
  void rejectsBadInput() {
    SettlementCurve few =
        SettlementCurve.of(
            new double[] {0, 6, 15, 30, 60}, new double[] {0, 1e-5, 2e-5, 3e-5, 4e-5});
    assertThatThrownBy(() -> FullCurveMethod.fit(few, DRAINAGE_PATH))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "4 readings after t = 0 are too few for the full-curve fit of 4 parameters (needs at"
                + " least 6)");
    SettlementCurve flat = SettlementCurve.of(labSchedule(), new double[LAB_MINUTES.length]);
    assertThatThrownBy(() -> FullCurveMethod.fit(flat, DRAINAGE_PATH))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("the readings do not move");
    SettlementCurve good = curve(labSchedule(), CurveParameters.of(0, 1e-4, 1e-8, 0), 0, null);
    assertThatThrownBy(() -> FullCurveMethod.fit(good, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> FullCurveMethod.fit(good, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (NaN m) must be finite and > 0");
  }

  @Test
  @DisplayName(
      "6 readings (30 min to 24 h) of an exact curve (ConsolidationCurveModel, c_v 20 H_dr^2 / 24"
          + " h) with the second reading 1 m off: the c_v interval runs over some 400 decades and"
          + " covers every c_v searched: refused, with a message that quotes no infinity"
          + " (ARCHITECTURE.md: no NaN or infinity leaves the library; the class description's"
          + " refusal rule)")
  void intervalOverEveryCvSearchedIsRefused() {
    double[] t = {1800, 3600, 7200, 14400, 28800, 86400};
    double cv = 20 * DRAINAGE_PATH * DRAINAGE_PATH / 86_400;
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    CurveParameters truth = CurveParameters.of(0, 1e-3, cv, 1e-5);
    double[] d = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      d[i] = model.settlement(t[i], truth);
    }
    d[1] = 1.0;
    assertThatThrownBy(() -> FullCurveMethod.fit(SettlementCurve.of(t, d), DRAINAGE_PATH))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("c_v is not determined by these readings")
        .hasMessageContaining("covers every c_v searched")
        .hasMessageNotContaining("Infinity")
        .hasMessageNotContaining("NaN");
  }

  @Test
  @DisplayName(
      "Drainage path at the ends of the double range (lab curve from ConsolidationCurveModel):"
          + " H_dr = 1e150 m gives c_v scaled by (H_dr / 9.5 mm)^2 to 1e-9 (T = c_v t / H_dr^2,"
          + " Terzaghi); H_dr = 1e160 m and 1e-160 m, where H_dr^2 leaves the range of doubles, a"
          + " FitException, no longer the theory module's IllegalArgumentException 'cv (Infinity"
          + " m^2/s)' from inside the fit")
  void drainagePathAtTheEndsOfTheDoubleRange() {
    double cv = 20 * DRAINAGE_PATH * DRAINAGE_PATH / 86_400;
    ConsolidationCurveModel model = ConsolidationCurveModel.of(DRAINAGE_PATH);
    CurveParameters truth = CurveParameters.of(0, 1e-3, cv, 1e-5);
    double[] t = labSchedule();
    double[] d = new double[t.length];
    for (int i = 0; i < t.length; i++) {
      d[i] = model.settlement(t[i], truth);
    }
    SettlementCurve curve = SettlementCurve.of(t, d);
    double reference = FullCurveMethod.fit(curve, DRAINAGE_PATH).cv();
    double scale = 1e150 / DRAINAGE_PATH;
    assertThat(FullCurveMethod.fit(curve, 1e150).cv() / (reference * scale * scale))
        .isCloseTo(1, within(1e-9));
    for (double path : new double[] {1e160, 1e-160}) {
      assertThatThrownBy(() -> FullCurveMethod.fit(curve, path))
          .as("H_dr %s m", path)
          .isInstanceOf(FitException.class)
          .hasMessageContaining("outside the range of double-precision numbers")
          .hasMessageNotContaining("Infinity");
    }
  }

  @Test
  @DisplayName(
      "Noisy lab curves (ConsolidationCurveModel plus 0.06 to 2 mm of Gaussian noise on 0.6 mm"
          + " primary): every interval wider than a factor of 2 gets a WIDE_INTERVAL warning that"
          + " quotes its finite ratio; an interval that is not refused misses one end of the c_v"
          + " searched (T at the last reading 1e-4 to 1e7, class description), so its ratio stays"
          + " below (1e7 / 1e-4)^2 = 1e22; refusals quote no infinity")
  void wideIntervalQuotesAFiniteFactor() {
    CurveParameters truth = CurveParameters.of(0.020e-3, 0.600e-3, 2 / YEAR, 0.030e-3);
    int wide = 0;
    for (double noise : new double[] {60e-6, 0.2e-3, 0.6e-3, 2e-3}) {
      for (int seed = 1; seed <= 6; seed++) {
        SettlementCurve c = curve(labSchedule(), truth, noise, new SplittableRandom(seed));
        FullCurveResult r;
        try {
          r = FullCurveMethod.fit(c, DRAINAGE_PATH);
        } catch (FitException e) {
          assertThat(e.getMessage()).doesNotContain("Infinity").doesNotContain("NaN");
          continue;
        }
        double spread = r.cvHigh() / r.cvLow();
        List<String> messages =
            r.warnings().stream()
                .filter(w -> w.kind() == FitWarning.Kind.WIDE_INTERVAL)
                .map(FitWarning::message)
                .toList();
        if (spread > 2) {
          wide++;
          assertThat(spread).as("noise %s, seed %d", noise, seed).isLessThan(1e22);
          assertThat(messages)
              .singleElement()
              .asString()
              .contains(String.format(java.util.Locale.ROOT, "a factor of %.3g (", spread))
              .doesNotContain("Infinity")
              .doesNotContain("NaN")
              .doesNotContain("more than");
        } else {
          assertThat(messages).isEmpty();
        }
      }
    }
    assertThat(wide).as("curves with a wide interval").isGreaterThan(10);
  }
}
