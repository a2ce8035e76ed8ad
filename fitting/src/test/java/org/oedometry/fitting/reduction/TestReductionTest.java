package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.LoadDirection;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.core.compressibility.IncrementCompressibility;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;
import org.oedometry.fitting.LogTimeMethod;
import org.oedometry.fitting.LogTimeResult;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Drainage;

class TestReductionTest {

  private static final OedometerTest DOUBLE_HALF =
      ReductionFixtures.test(Drainage.DOUBLE, DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION);
  private static final ReductionOptions FAST =
      ReductionOptions.builder()
          .methods(List.of(CvMethod.LOG_TIME, CvMethod.ROOT_TIME, CvMethod.FULL_CURVE))
          .build();
  private static final TestReport REPORT = TestReduction.reduce(DOUBLE_HALF, FAST);

  @Test
  @DisplayName(
      "Single drainage doubles H_dr, so every c_v is 4 times the double-drainage one (T H_dr^2 /"
          + " t, FACTS: 'a factor of 4 on c_v')")
  void singleDrainageGivesFourTimesTheCv() {
    TestReport single =
        TestReduction.reduce(
            ReductionFixtures.test(Drainage.SINGLE, DrainagePathRule.START_HEIGHT), FAST);
    TestReport dbl =
        TestReduction.reduce(
            ReductionFixtures.test(Drainage.DOUBLE, DrainagePathRule.START_HEIGHT), FAST);
    for (int j = 0; j < dbl.increments().size(); j++) {
      IncrementReport s = single.increments().get(j);
      IncrementReport d = dbl.increments().get(j);
      assertThat(s.drainagePath().drainagePathMetres())
          .isEqualTo(2 * d.drainagePath().drainagePathMetres());
      assertThat(d.drainagePath().drainagePathMetres())
          .isEqualTo(DOUBLE_HALF.heightAtStartMetres(j) / 2);
      for (CvMethod m : List.of(CvMethod.LOG_TIME, CvMethod.ROOT_TIME)) {
        assertThat(s.cv(m).getAsDouble() / d.cv(m).getAsDouble())
            .as("increment %d, %s", j, m)
            .isCloseTo(4.0, within(1e-9));
      }
      assertThat(s.cv(CvMethod.FULL_CURVE).getAsDouble() / d.cv(CvMethod.FULL_CURVE).getAsDouble())
          .isCloseTo(4.0, within(1e-4));
    }
  }

  @Test
  @DisplayName(
      "Height at 50 %: H_dr = (H_start - (d0 + d100)/2) / 2 from a log-time fit, and the reported"
          + " log-time c_v is a direct refit with that H_dr (one fixed-point step)")
  void halfConsolidationRuleTakesOneFixedPointStep() {
    for (int j = 0; j < REPORT.increments().size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      LogTimeResult log = inc.logTime().orElseThrow();
      double expected = (DOUBLE_HALF.heightAtStartMetres(j) - 0.5 * (log.d0() + log.d100())) / 2;
      assertThat(inc.drainagePath().drainagePathMetres()).isCloseTo(expected, within(1e-15));
      assertThat(inc.drainagePath().rule())
          .isEqualTo(DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION);
      assertThat(inc.drainagePath().explanation()).contains("one fixed-point step");
      double direct = LogTimeMethod.fit(DOUBLE_HALF.increments().get(j).curve(), expected).cv();
      assertThat(log.cv()).isEqualTo(direct);
      assertThat(log.drainagePath()).isEqualTo(expected);
    }
  }

  @Test
  @DisplayName(
      "Exact Terzaghi curves: H_dr within 0.5 % of the generating path and log-time c_v within 3"
          + " % of the generating c_v (LogTimeMethod's stated accuracy on the 14-reading schedule)")
  void recoversTheGeneratingParameters() {
    List<Double> paths = ReductionFixtures.truePaths(1);
    for (int j = 0; j < REPORT.increments().size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      assertThat(inc.drainagePath().drainagePathMetres() / paths.get(j) - 1)
          .isCloseTo(0, within(0.005));
      double cvPerYear = inc.cv(CvMethod.LOG_TIME).getAsDouble() * ReductionFixtures.YEAR;
      assertThat(cvPerYear / ReductionFixtures.CV_PER_YEAR[j] - 1)
          .as("increment %d", j)
          .isCloseTo(0, within(0.03));
    }
  }

  @Test
  @DisplayName(
      "An increment whose curve has no inflection: log-time gives no value with its reason, the"
          + " other increments are complete and every rendering still works")
  void oneFailingIncrementDoesNotSinkTheReport() {
    TestReport r = TestReduction.reduce(ReductionFixtures.withStraightLineIncrement(2), FAST);
    IncrementReport broken = r.increments().get(2);
    MethodOutcome log = broken.outcome(CvMethod.LOG_TIME).orElseThrow();
    assertThat(log.estimate()).isEmpty();
    assertThat(log.failureReason()).isNotBlank();
    assertThat(log.permeability().isPresent()).isFalse();
    assertThat(broken.warnings())
        .anySatisfy(
            w -> {
              assertThat(w.kind()).isEqualTo(FitWarning.Kind.METHOD_GAVE_NO_VALUE);
              assertThat(w.method()).contains(CvMethod.LOG_TIME);
              assertThat(w.message()).contains(log.failureReason());
            });
    for (int j : new int[] {0, 1, 3}) {
      assertThat(r.increments().get(j).cv(CvMethod.LOG_TIME)).isPresent();
      assertThat(r.increments().get(j).permeability()).isPresent();
    }
    assertThat(r.toText()).contains(log.failureReason());
    assertThat(r.toCsv()).isNotBlank();
    assertThat(r.toJson()).contains("\"failure_reason\"");
    assertThat(r.toAgs4()).contains("\"GROUP\",\"CONS\"");
  }

  @Test
  @DisplayName(
      "An increment with too few readings for any method: every method gives its reason, H_dr and"
          + " the e - log sigma' point fall back, with typed warnings")
  void incrementNoMethodCanReduce() {
    OedometerTest good = DOUBLE_HALF;
    List<LoadIncrement> increments = new java.util.ArrayList<>(good.increments());
    LoadIncrement last = increments.get(3);
    increments.set(
        3,
        LoadIncrement.of(
            last.stressBeforePascals(),
            last.stressAfterPascals(),
            SettlementCurve.of(new double[] {0, 60, 600}, new double[] {0, 2e-4, 4e-4})));
    TestReport r = TestReduction.reduce(good.toBuilder().increments(increments).build(), FAST);
    IncrementReport inc = r.increments().get(3);
    assertThat(inc.methods()).allSatisfy(m -> assertThat(m.failureReason()).isNotBlank());
    assertThat(inc.preferredMethod()).isEmpty();
    assertThat(inc.permeability()).isEmpty();
    assertThat(inc.drainagePath().fellBack()).isTrue();
    assertThat(inc.drainagePath().rule()).isEqualTo(DrainagePathRule.MEAN_HEIGHT);
    assertThat(inc.drainagePath().drainagePathMetres())
        .isCloseTo((good.heightAtStartMetres(3) + inc.heightAtEndMetres()) / 4, within(1e-15));
    assertThat(inc.hasWarning(FitWarning.Kind.DRAINAGE_PATH_FALLBACK)).isTrue();
    assertThat(inc.hasWarning(FitWarning.Kind.END_OF_PRIMARY_NOT_KNOWN)).isTrue();
    assertThat(inc.deformationBasis()).isEqualTo(DeformationBasis.END_OF_INCREMENT);
    assertThat(r.increments().get(2).deformationBasis()).isEqualTo(DeformationBasis.END_OF_PRIMARY);
  }

  @Test
  @DisplayName(
      "k = c_v m_v gamma_w for every method: k [m/s] = 3.109e-10 c_v [m2/yr] m_v [m2/MN] (FACTS,"
          + " exact arithmetic, rounded to 4 figures) and scales with gamma_w")
  void permeabilityFollowsTheFormula() {
    TestReport heavy =
        TestReduction.reduce(DOUBLE_HALF, FAST.toBuilder().waterUnitWeight(10_000).build());
    for (int j = 0; j < REPORT.increments().size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      IncrementCompressibility c = inc.compressibility().value().orElseThrow();
      // m_v by hand from the reported void ratios and stresses, in m2/MN (FACTS formula).
      double mvByHand =
          1000
              * (c.startVoidRatio() - c.endVoidRatio())
              / ((1 + c.startVoidRatio())
                  * (inc.stressAfterPascals() - inc.stressBeforePascals())
                  / 1000);
      assertThat(c.mv() * 1e6).isCloseTo(mvByHand, within(1e-9 * mvByHand));
      for (MethodOutcome o : inc.methods()) {
        if (o.cv().isEmpty()) {
          continue;
        }
        double cvPerYear = o.cv().getAsDouble() * ReductionFixtures.YEAR;
        double k = o.permeability().value().orElseThrow();
        assertThat(k).isCloseTo(3.109e-10 * cvPerYear * mvByHand, within(2e-4 * k));
        double kHeavy =
            heavy
                .increments()
                .get(j)
                .outcome(o.method())
                .orElseThrow()
                .permeability()
                .value()
                .get();
        assertThat(kHeavy / k).isCloseTo(10_000 / 9810.0, within(1e-12));
      }
    }
  }

  @Test
  @DisplayName(
      "End-of-increment basis: each point's void ratio is that of the last reading,"
          + " e = H / H_s - 1 (FACTS)")
  void endOfIncrementBasisUsesTheLastReading() {
    TestReport r =
        TestReduction.reduce(
            DOUBLE_HALF,
            FAST.toBuilder().deformationBasis(DeformationBasis.END_OF_INCREMENT).build());
    for (int j = 0; j < r.increments().size(); j++) {
      double byHand = DOUBLE_HALF.heightAtEndMetres(j) / DOUBLE_HALF.heightOfSolidsMetres() - 1;
      assertThat(r.increments().get(j).compressibility().value().orElseThrow().endVoidRatio())
          .isCloseTo(byHand, within(1e-12));
      assertThat(r.increments().get(j).deformationBasis())
          .isEqualTo(DeformationBasis.END_OF_INCREMENT);
    }
    // End of primary: e at H_start - d100 of the preferred (log-time) construction.
    for (int j = 0; j < REPORT.increments().size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      double byHand =
          (DOUBLE_HALF.heightAtStartMetres(j) - inc.d100().getAsDouble())
                  / DOUBLE_HALF.heightOfSolidsMetres()
              - 1;
      assertThat(inc.compressibility().value().orElseThrow().endVoidRatio())
          .isCloseTo(byHand, within(1e-12));
    }
  }

  @Test
  @DisplayName(
      "Methods disagree: warned exactly when root-time / log-time c_v (computed here) exceeds the"
          + " factor, either way")
  void disagreementFollowsTheFactor() {
    for (double factor : new double[] {1.0001, 1.01, 1.5}) {
      TestReport r =
          TestReduction.reduce(DOUBLE_HALF, FAST.toBuilder().disagreementFactor(factor).build());
      for (IncrementReport inc : r.increments()) {
        double ratio =
            inc.cv(CvMethod.ROOT_TIME).getAsDouble() / inc.cv(CvMethod.LOG_TIME).getAsDouble();
        boolean expected = Math.max(ratio, 1 / ratio) > factor;
        assertThat(inc.hasWarning(FitWarning.Kind.METHODS_DISAGREE))
            .as("factor %s, ratio %s", factor, ratio)
            .isEqualTo(expected);
      }
    }
  }

  @Test
  @DisplayName("reduceAll gives the reports of reduce, in input order")
  void batchIsDeterministicAndOrdered() {
    List<OedometerTest> tests =
        List.of(
            ReductionFixtures.scaled(1),
            ReductionFixtures.scaled(0.5),
            ReductionFixtures.scaled(2),
            ReductionFixtures.scaled(1));
    List<TestReport> batch = TestReduction.reduceAll(tests, FAST);
    assertThat(batch).hasSize(4);
    for (int i = 0; i < tests.size(); i++) {
      assertThat(batch.get(i)).isEqualTo(TestReduction.reduce(tests.get(i), FAST));
    }
    assertThat(batch.get(0)).isEqualTo(batch.get(3));
    assertThat(batch.get(1)).isNotEqualTo(batch.get(2));
    // Without options: the default options, as reduce(test) uses them.
    List<TestReport> defaults = TestReduction.reduceAll(tests.subList(0, 2));
    assertThat(defaults)
        .containsExactly(TestReduction.reduce(tests.get(0)), TestReduction.reduce(tests.get(1)));
  }

  @Test
  @DisplayName(
      "The default options run all seven methods and report each, present or with a reason")
  void defaultsRunEveryMethod() {
    TestReport r = TestReduction.reduce(DOUBLE_HALF);
    assertThat(r.options()).isEqualTo(ReductionOptions.defaults());
    for (IncrementReport inc : r.increments()) {
      assertThat(inc.methods())
          .extracting(MethodOutcome::method)
          .containsExactly(CvMethod.values());
      assertThat(inc.methods())
          .allSatisfy(
              m -> assertThat(m.estimate().isPresent()).isEqualTo(m.failureReason().isBlank()));
    }
  }

  @Test
  @DisplayName(
      "Unusual legal tests reduce without an exception (one increment; load, unload, reload;"
          + " swelling; flat readings), with what the class documents: one row per increment, one"
          + " swelling warning per unloading increment, a method without a value has its reason"
          + " and a METHOD_GAVE_NO_VALUE warning")
  void unusualShapesReduce() {
    List<TestReport> reports = ReductionFixtures.unusualShapes();
    int[] increments = {1, 9, 1, 2};
    for (int i = 0; i < reports.size(); i++) {
      TestReport r = reports.get(i);
      assertThat(r.increments()).as(ReductionFixtures.SHAPE_NAMES.get(i)).hasSize(increments[i]);
      for (IncrementReport inc : r.increments()) {
        long swelling =
            inc.warnings().stream()
                .filter(w -> w.kind() == FitWarning.Kind.SWELLING_INCREMENT)
                .count();
        assertThat(swelling).isEqualTo(inc.direction() == LoadDirection.UNLOADING ? 1 : 0);
        for (MethodOutcome m : inc.methods()) {
          if (m.estimate().isEmpty()) {
            assertThat(m.failureReason()).isNotBlank();
            assertThat(inc.warnings())
                .anySatisfy(
                    w -> {
                      assertThat(w.kind()).isEqualTo(FitWarning.Kind.METHOD_GAVE_NO_VALUE);
                      assertThat(w.method()).contains(m.method());
                    });
          }
        }
      }
    }
    // Readings that never move: no method can find a c_v (there is no consolidation to time).
    for (IncrementReport inc : reports.get(3).increments()) {
      assertThat(inc.methods()).allSatisfy(m -> assertThat(m.estimate()).isEmpty());
    }
  }

  @Test
  @DisplayName(
      "The report carries the test's data warnings and degrees of saturation unchanged; a test"
          + " with consistent phases has none")
  void dataWarningsAndSaturation() {
    OedometerTest t = ReductionFixtures.phasesDisagree();
    TestReport r = TestReduction.reduce(t, FAST);
    assertThat(r.dataWarnings()).isEqualTo(t.warnings()).isNotEmpty();
    assertThat(r.initialDegreeOfSaturation()).isEqualTo(t.initialDegreeOfSaturation()).isPresent();
    assertThat(r.finalDegreeOfSaturation()).isEqualTo(t.finalDegreeOfSaturation()).isPresent();
    assertThat(REPORT.dataWarnings()).isEmpty();
    assertThat(REPORT.finalDegreeOfSaturation()).isEmpty();
  }

  private static final double PRIMARY = 0.5e-3;

  /**
   * One loading increment (100 to 200 kPa) of an exact Terzaghi curve with T = 10 at 24 h on the
   * usual lab schedule (ConsolidationCurveModel, theory module, checked against mpmath there):
   * primary 0.5 mm, an instantaneous compression and a secondary slope in multiples of it, and a
   * zero reading (the reading before loading) at {@code zero} times the primary compression.
   */
  private static OedometerTest oneIncrement(double zero, double initial, double secondary) {
    double[] times = ReadingSchedules.withZeroReading(ReadingSchedules.usualLab());
    double dp = PRIMARY;
    double path = Drainage.DOUBLE.drainagePath(ReductionFixtures.specimen().initialHeightMetres());
    ConsolidationCurveModel model = ConsolidationCurveModel.of(path);
    double cv = 10 * path * path / times[times.length - 1];
    CurveParameters p = CurveParameters.of(initial * dp, dp, cv, secondary * dp);
    double[] d = new double[times.length];
    d[0] = zero * dp;
    for (int k = 1; k < times.length; k++) {
      d[k] = model.settlement(times[k], p);
    }
    return OedometerTest.builder(ReductionFixtures.specimen())
        .identifiers(TestIdentifiers.of("Invented primary ratios, for tests", "BH-T3", "S3", "5 m"))
        .increments(List.of(LoadIncrement.of(100e3, 200e3, SettlementCurve.of(times, d))))
        .build();
  }

  @ParameterizedTest(name = "zero reading {0} dp, instantaneous {1} dp")
  @CsvSource({"0, 1.5", "0, 0.5", "0, 0.05", "0.4, 0.05"})
  @DisplayName(
      "PRIMARY_RATIO_UNUSUAL exactly when the primary ratio r_p = 10 (d0 - d90) / (9 (ds - df))"
          + " (FACTS.md, Craig [memory]), computed here from the generating curve, lies outside the"
          + " documented default 0.5 to 1.0: a large instantaneous compression (0.40) and a late"
          + " zero reading (1.49) are warned, 0.66 and 0.93 are not")
  void primaryRatioOutsideTheUsualRange(double zero, double initial) {
    double secondary = 0.03;
    OedometerTest test = oneIncrement(zero, initial, secondary);
    TestReport r =
        TestReduction.reduce(
            test,
            ReductionOptions.builder()
                .methods(List.of(CvMethod.LOG_TIME, CvMethod.ROOT_TIME))
                .build());
    IncrementReport inc = r.increments().get(0);
    // Textbook ratio on dial readings, which fall as the specimen compresses (dial = -settlement):
    // ds before loading, d0 the corrected zero (the instantaneous compression), d90 = d0 + 0.9
    // dp, df the last reading (T = 10: U = 1 to 1e-10; secondary term s log10(1 + 10 / 2) of the
    // model).
    double ds = -zero * PRIMARY;
    double d0 = -initial * PRIMARY;
    double d90 = -(initial + 0.9) * PRIMARY;
    double df = -(initial + 1 + secondary * Math.log10(1 + 10 / 2.0)) * PRIMARY;
    double rp = 10 * (d0 - d90) / (9 * (ds - df));
    // The construction estimates d0 and d100: within 3 % of the textbook value here.
    LogTimeResult log = inc.logTime().orElseThrow();
    assertThat(log.primaryRatio().getAsDouble() / rp - 1).isCloseTo(0, within(0.03));
    ReductionOptions defaults = ReductionOptions.defaults();
    assertThat(defaults.primaryRatioLow()).isEqualTo(0.5);
    assertThat(defaults.primaryRatioHigh()).isEqualTo(1.0);
    boolean unusual = rp < 0.5 || rp > 1.0;
    // The four cases straddle both ends of the range, each at least 0.06 from it.
    assertThat(Math.min(Math.abs(rp - 0.5), Math.abs(rp - 1.0))).isGreaterThan(0.06);
    assertThat(inc.hasWarning(FitWarning.Kind.PRIMARY_RATIO_UNUSUAL)).isEqualTo(unusual);
    if (unusual) {
      ReductionWarning w =
          inc.warnings().stream()
              .filter(x -> x.kind() == FitWarning.Kind.PRIMARY_RATIO_UNUSUAL)
              .findFirst()
              .orElseThrow();
      assertThat(w.method()).isEmpty();
      assertThat(w.message())
          .contains("primary compression ratio")
          .contains("0.50 to 1.00")
          .doesNotContain("NaN")
          .doesNotContain("Infinity");
      java.util.regex.Matcher m =
          java.util.regex.Pattern.compile("ratio (\\d+\\.\\d{3}) lies").matcher(w.message());
      assertThat(m.find()).as(w.message()).isTrue();
      assertThat(Double.parseDouble(m.group(1)) / rp - 1).isCloseTo(0, within(0.03));
    }
  }
}
