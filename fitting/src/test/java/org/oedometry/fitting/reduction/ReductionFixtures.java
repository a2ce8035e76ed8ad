package org.oedometry.fitting.reduction;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.provider.Arguments;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Drainage;

/**
 * Small invented tests built from exact Terzaghi curves (no noise) on the usual lab schedule with a
 * zero reading: four loading increments 25 -> 50 -> 100 -> 200 -> 400 kPa.
 */
final class ReductionFixtures {

  static final double YEAR = 365.25 * 86_400;
  static final double[] STRESSES_KPA = {25, 50, 100, 200, 400};
  static final double[] CV_PER_YEAR = {6, 4, 2, 2.5};
  static final double[] PRIMARY_MM = {0.15, 0.45, 0.9, 0.8};

  private ReductionFixtures() {}

  /**
   * The fixture with a straight-line third increment, reduced with the default options once per
   * test run: it holds present values and absent ones with reasons.
   */
  static TestReport mixedReport() {
    return Holder.MIXED;
  }

  private static final class Holder {
    static final TestReport MIXED = TestReduction.reduce(withStraightLineIncrement(2));
  }

  static Specimen specimen() {
    return Specimen.builder()
        .initialHeight(0.020)
        .diameter(0.075)
        .specificGravity(2.70)
        .dryMass(0.1150)
        .initialWaterContent(0.38)
        .build();
  }

  /** True drainage path of increment j: half the height at 50 % primary consolidation. */
  static List<Double> truePaths(double cvScale) {
    List<Double> out = new ArrayList<>();
    build(Drainage.DOUBLE, DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION, -1, out, cvScale);
    return out;
  }

  static OedometerTest test(Drainage drainage, DrainagePathRule rule) {
    return build(drainage, rule, -1, new ArrayList<>(), 1);
  }

  /** The test with increment {@code broken} replaced by a straight line in log t. */
  static OedometerTest withStraightLineIncrement(int broken) {
    return build(
        Drainage.DOUBLE,
        DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION,
        broken,
        new ArrayList<>(),
        1);
  }

  static OedometerTest scaled(double cvScale) {
    return build(
        Drainage.DOUBLE,
        DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION,
        -1,
        new ArrayList<>(),
        cvScale);
  }

  /**
   * Labels that a writer must escape: quotes, commas, a backslash, a semicolon, non-ASCII letters,
   * a character outside the Basic Multilingual Plane, a no-break space and a zero-width joiner
   * (which {@link TestIdentifiers} accepts; it refuses U+2028), a 20 000-character sample
   * reference, and a depth whose leading number (401 digits) lies beyond the double range.
   */
  static TestIdentifiers hostileIdentifiers() {
    return TestIdentifiers.of(
        "Invented \"quoted\", project; C:\\data\\x \u00e9t\u00e9 \u65e5\u672c \ud83d\ude00",
        "BH,\"1\"\u00a0b\u200d",
        "S".repeat(20_000),
        "1" + "0".repeat(400) + ".005 m, \"top\"");
  }

  /** The report with other identifiers (the rest unchanged), so that writers see hostile labels. */
  static TestReport withIdentifiers(TestReport r, TestIdentifiers identifiers) {
    return new TestReport(
        identifiers,
        r.specimen(),
        r.drainage(),
        r.drainagePathRule(),
        r.options(),
        r.heightOfSolidsMetres(),
        r.initialVoidRatio(),
        r.seatingStressPascals(),
        r.initialDegreeOfSaturation(),
        r.finalDegreeOfSaturation(),
        r.dataWarnings(),
        r.increments(),
        r.compressionCurve(),
        r.preconsolidation(),
        r.preconsolidationForClasses(),
        r.compressionIndex(),
        r.recompressionBranches(),
        r.permeabilityChange());
  }

  /**
   * Legal tests of unusual shape, each reduced with the default options: a single increment; load,
   * unload and reload; a single swelling (unloading) increment; increments whose readings never
   * move. Exact Terzaghi curves ({@link ConsolidationCurveModel}) on the usual lab schedule.
   */
  static List<TestReport> unusualShapes() {
    return Shapes.REPORTS;
  }

  /**
   * Arguments (name, report) for parameterised report tests: the mixed report with {@link
   * #hostileIdentifiers()}, the report of {@link #phasesDisagree()}, then each of {@link
   * #unusualShapes()}.
   */
  static Stream<Arguments> unusualReports() {
    List<Arguments> out = new ArrayList<>();
    out.add(
        Arguments.of("hostile identifiers", withIdentifiers(mixedReport(), hostileIdentifiers())));
    out.add(Arguments.of("phases disagree", Phases.REPORT));
    for (int i = 0; i < SHAPE_NAMES.size(); i++) {
      out.add(Arguments.of(SHAPE_NAMES.get(i), unusualShapes().get(i)));
    }
    return out.stream();
  }

  /** The names of {@link #unusualShapes()}, in the same order. */
  static final List<String> SHAPE_NAMES =
      List.of("one increment", "load, unload, reload", "one swelling increment", "readings flat");

  /**
   * The fixture test with a specimen whose phase relations disagree (invented): 120 g of solids
   * with G<sub>s</sub> 2.70 in a 20 x 75 mm ring (e0 = 0.988 from the heights), w0 0.60 (S0 = 0.60
   * x 2.70 / 0.988 = 1.64, by hand), wf 0.25 (Sf = 0.25 x 2.70 / e<sub>f</sub>, about 0.9 after
   * some 2.4 mm of settlement) and a bulk density of 2.10 Mg/m<sup>3</sup> (e0 from density 2.70 x
   * 1.60 / 2.10 - 1 = 1.057, 3.5 % of 1 + e0 away). It carries every phase warning of {@link
   * OedometerTest#warnings()}.
   */
  static OedometerTest phasesDisagree() {
    OedometerTest base = test(Drainage.DOUBLE, DrainagePathRule.HEIGHT_AT_HALF_CONSOLIDATION);
    Specimen specimen =
        Specimen.builder()
            .initialHeight(0.020)
            .diameter(0.075)
            .specificGravity(2.70)
            .dryMass(0.120)
            .initialWaterContent(0.60)
            .finalWaterContent(0.25)
            .bulkDensity(2100)
            .build();
    return OedometerTest.builder(specimen)
        .identifiers(base.identifiers())
        .increments(base.increments())
        .build();
  }

  private static final class Phases {
    static final TestReport REPORT = TestReduction.reduce(phasesDisagree());
  }

  private static final class Shapes {
    static final List<TestReport> REPORTS =
        List.of(
            TestReduction.reduce(shape(new double[] {25, 50}, new double[] {0.15})),
            TestReduction.reduce(
                shape(
                    new double[] {25, 50, 100, 200, 400, 100, 25, 100, 400, 800},
                    new double[] {0.15, 0.45, 0.9, 0.8, -0.08, -0.06, 0.05, 0.1, 0.7})),
            TestReduction.reduce(shape(new double[] {100, 50}, new double[] {-0.05})),
            TestReduction.reduce(shape(new double[] {25, 50, 100}, new double[] {0, 0})));
  }

  /**
   * A legal test at absurdly small stresses (2e-306 to 8e-306 Pa), where m_v exceeds 1e300 per
   * pascal and cannot be written in m^2/MN.
   */
  static OedometerTest tinyStresses() {
    return shape(new double[] {2e-309, 4e-309, 8e-309}, new double[] {0.45, 0.9});
  }

  /** Increments between the stresses (kPa), primary compression (mm) each, c_v 3 m^2/yr. */
  private static OedometerTest shape(double[] stressesKpa, double[] primaryMm) {
    double[] times = ReadingSchedules.withZeroReading(ReadingSchedules.usualLab());
    List<LoadIncrement> increments = new ArrayList<>();
    double height = 0.020;
    for (int j = 0; j < primaryMm.length; j++) {
      double dp = primaryMm[j] / 1000;
      double[] d = new double[times.length];
      if (dp != 0) {
        ConsolidationCurveModel model =
            ConsolidationCurveModel.of(Drainage.DOUBLE.drainagePath(height));
        CurveParameters p = CurveParameters.of(0.05 * dp, dp, 3 / YEAR, 0.03 * dp);
        for (int k = 1; k < times.length; k++) {
          d[k] = model.settlement(times[k], p);
        }
      }
      SettlementCurve curve = SettlementCurve.of(times, d);
      increments.add(LoadIncrement.of(stressesKpa[j] * 1000, stressesKpa[j + 1] * 1000, curve));
      height -= curve.finalSettlementMetres();
    }
    return OedometerTest.builder(specimen())
        .identifiers(TestIdentifiers.of("Invented shapes, for tests", "BH-T2", "S2", "4 m"))
        .increments(increments)
        .build();
  }

  private static OedometerTest build(
      Drainage drainage, DrainagePathRule rule, int broken, List<Double> paths, double cvScale) {
    double[] times = ReadingSchedules.withZeroReading(ReadingSchedules.usualLab());
    List<LoadIncrement> increments = new ArrayList<>();
    double height = 0.020;
    for (int j = 0; j < CV_PER_YEAR.length; j++) {
      double dp = PRIMARY_MM[j] / 1000;
      double di = 0.05 * dp;
      double s = 0.03 * dp;
      double path = Drainage.DOUBLE.drainagePath(height - di - 0.5 * dp);
      paths.add(path);
      ConsolidationCurveModel model = ConsolidationCurveModel.of(path);
      CurveParameters p = CurveParameters.of(di, dp, cvScale * CV_PER_YEAR[j] / YEAR, s);
      double[] d = new double[times.length];
      for (int k = 1; k < times.length; k++) {
        d[k] =
            j == broken
                ? dp * 0.2 * Math.log10(times[k] / times[1]) + 1e-6 * k
                : model.settlement(times[k], p);
      }
      SettlementCurve curve = SettlementCurve.of(times, d);
      increments.add(LoadIncrement.of(STRESSES_KPA[j] * 1000, STRESSES_KPA[j + 1] * 1000, curve));
      height -= curve.finalSettlementMetres();
    }
    return OedometerTest.builder(specimen())
        .drainage(drainage)
        .drainagePathRule(rule)
        .identifiers(
            TestIdentifiers.of("Invented \"fixture\" project, for tests", "BH-T1", "S1", "3.5 m"))
        .increments(increments)
        .build();
  }
}
