package org.oedometry.examples.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.PreconsolidationMethod;
import org.oedometry.examples.demo.DemoTestGenerator.IncrementTruth;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FitWarning;
import org.oedometry.fitting.FullCurveOptions;
import org.oedometry.fitting.reduction.IncrementReport;
import org.oedometry.fitting.reduction.MethodOutcome;
import org.oedometry.fitting.reduction.ReductionOptions;
import org.oedometry.fitting.reduction.TestReduction;
import org.oedometry.fitting.reduction.TestReport;

/**
 * End to end: the whole invented demo test reduced with the default options (except the full-curve
 * secondary onset, see {@link #OPTIONS}), each reported quantity checked against the generator's
 * truth or a calculation made here by hand, never against a copy of the output. The demo is reduced
 * once.
 */
class DemoReductionTest {

  /** Julian year, s. */
  private static final double YEAR = 365.25 * 86_400;

  private static final OedometerTest TEST = DemoTestGenerator.generate();
  private static final List<IncrementTruth> TRUTH = DemoTestGenerator.truth();

  /**
   * The default options except the full-curve fit's secondary onset: T_s = 1, the generator's own
   * model, d(t) = d_i + d_p U(T) + s log10(1 + T) (DemoTestGenerator Javadoc), so that the
   * full-curve c_v can be held to the 5 % of DemoTestGeneratorTest.
   */
  private static final ReductionOptions OPTIONS =
      ReductionOptions.builder()
          .fullCurveOptions(FullCurveOptions.defaults().withSecondaryOnset(1.0))
          .build();

  private static final TestReport REPORT = TestReduction.reduce(TEST, OPTIONS);

  /** H_s = M_s / (G_s rho_w A) (FACTS), from the generator's constants. */
  private static double solidsHeight() {
    double area = Math.PI / 4 * DemoTestGenerator.DIAMETER * DemoTestGenerator.DIAMETER;
    return DemoTestGenerator.DRY_MASS / (DemoTestGenerator.SPECIFIC_GRAVITY * 1000 * area);
  }

  @Test
  @DisplayName(
      "H_dr of every increment within 0.2 % of the generator's (half the height at 50 % primary"
          + " consolidation), found by one fixed-point step on the log-time d50")
  void drainagePathsMatchTheGenerator() {
    for (int j = 0; j < TRUTH.size(); j++) {
      double used = REPORT.increments().get(j).drainagePath().drainagePathMetres();
      assertThat(used / TRUTH.get(j).drainagePathMetres() - 1)
          .as("increment %d", j + 1)
          .isCloseTo(0, within(0.002));
    }
  }

  /**
   * Tolerances: full-curve 5 % (the model the data were generated from, as in
   * DemoTestGeneratorTest); log-time 15 %: on 14 readings with 1 um noise LogTimeMethod's 90th
   * percentile error is 4 % and secondary compression moves d100 by up to +5.4 % (its Javadoc), and
   * the reloading increment 10 has only 0.3 mm of settlement; root-time 25 %: its early line on
   * this schedule rests on 4 to 5 readings and several increments carry a "curve rises beyond d100"
   * warning (secondary compression of a few per cent of primary per cycle).
   */
  @Test
  @DisplayName(
      "c_v per increment against the generator's truth: full-curve within 5 %, log-time within 15"
          + " %, root-time within 30 %")
  void cvMatchesTheTruth() {
    for (int j = 0; j < TRUTH.size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      double truth = TRUTH.get(j).parameters().cv();
      assertThat(inc.cv(CvMethod.FULL_CURVE).getAsDouble() / truth - 1)
          .as("full-curve, increment %d", j + 1)
          .isCloseTo(0, within(0.05));
      assertThat(inc.cv(CvMethod.LOG_TIME).getAsDouble() / truth - 1)
          .as("log-time, increment %d", j + 1)
          .isCloseTo(0, within(0.15));
      assertThat(inc.cv(CvMethod.ROOT_TIME).getAsDouble() / truth - 1)
          .as("root-time, increment %d", j + 1)
          .isCloseTo(0, within(0.30));
      assertThat(inc.preferredMethod()).contains(CvMethod.LOG_TIME);
    }
  }

  @Test
  @DisplayName(
      "e0 = H0 G_s rho_w A / M_s - 1 by hand (FACTS), and the generator's chosen 1.05 to the"
          + " rounding of the dry mass to 0.01 g")
  void initialVoidRatio() {
    double byHand = DemoTestGenerator.INITIAL_HEIGHT / solidsHeight() - 1;
    assertThat(REPORT.initialVoidRatio()).isCloseTo(byHand, within(1e-12));
    assertThat(REPORT.initialVoidRatio())
        .isCloseTo(DemoTestGenerator.INITIAL_VOID_RATIO, within(1e-4));
  }

  @Test
  @DisplayName(
      "C_c within 5 % of the generator's 0.35; C_r of first recompression within 10 % of 0.05;"
          + " every sigma'_p within -10 %/+12 % of the 80 kPa break (band derived in"
          + " DemoTestGeneratorTest)")
  void compressibilityMatchesTheGenerator() {
    assertThat(REPORT.compressionIndex().value().orElseThrow().index())
        .isCloseTo(DemoTestGenerator.COMPRESSION_INDEX, within(0.05 * 0.35));
    // The unloading and reloading branches start from 24 h states (generator Javadoc), so on an
    // end-of-primary curve their slopes are not the generator's C_r; first recompression is.
    IndexBranch first = REPORT.recompressionBranches().get(0);
    assertThat(first.kind()).isEqualTo(IncrementClass.RECOMPRESSION);
    assertThat(first.fit().value().orElseThrow().index())
        .isCloseTo(DemoTestGenerator.RECOMPRESSION_INDEX, within(0.005));
    for (PreconsolidationMethod m : PreconsolidationMethod.values()) {
      assertThat(REPORT.preconsolidationPressure(m).getAsDouble())
          .as(m.name())
          .isBetween(0.90 * 80e3, 1.12 * 80e3);
    }
  }

  @Test
  @DisplayName(
      "Classes follow the loading the generator applied around sigma'_p = 80 kPa: OC to 50 kPa,"
          + " across at 50-100, NC to 800, unloading, reloading, NC at 1600")
  void incrementClasses() {
    List<IncrementClass> expected =
        List.of(
            IncrementClass.RECOMPRESSION,
            IncrementClass.RECOMPRESSION,
            IncrementClass.RECOMPRESSION,
            IncrementClass.CROSSES_PRECONSOLIDATION,
            IncrementClass.NORMALLY_CONSOLIDATED,
            IncrementClass.NORMALLY_CONSOLIDATED,
            IncrementClass.NORMALLY_CONSOLIDATED,
            IncrementClass.UNLOADING,
            IncrementClass.UNLOADING,
            IncrementClass.RELOADING,
            IncrementClass.RELOADING,
            IncrementClass.NORMALLY_CONSOLIDATED);
    for (int j = 0; j < expected.size(); j++) {
      assertThat(REPORT.increments().get(j).stressHistory().value()).contains(expected.get(j));
    }
    assertThat(REPORT.increments().get(7).hasWarning(FitWarning.Kind.SWELLING_INCREMENT)).isTrue();
  }

  @Test
  @DisplayName(
      "k recomputed by hand in lab units: k [m/s] = 3.109e-10 c_v [m2/yr] m_v [m2/MN] (FACTS), m_v"
          + " = 1000 (e1 - e2) / ((1 + e1) delta sigma [kPa]) with e = (H_start - d100) / H_s - 1")
  void permeabilityByHand() {
    double hs = solidsHeight();
    double previousE = DemoTestGenerator.INITIAL_HEIGHT / hs - 1;
    for (int j = 0; j < REPORT.increments().size(); j++) {
      IncrementReport inc = REPORT.increments().get(j);
      double e2 = (TEST.heightAtStartMetres(j) - inc.d100().getAsDouble()) / hs - 1;
      double deltaKpa = (inc.stressAfterPascals() - inc.stressBeforePascals()) / 1000;
      double mvLab = 1000 * (previousE - e2) / ((1 + previousE) * deltaKpa);
      assertThat(inc.mv().getAsDouble() * 1e6).isCloseTo(mvLab, within(1e-9 * Math.abs(mvLab)));
      for (MethodOutcome o : inc.methods()) {
        if (o.cv().isPresent() && mvLab > 0) {
          double k = o.permeability().value().orElseThrow();
          double byHand = 3.109e-10 * o.cv().getAsDouble() * YEAR * mvLab;
          assertThat(k)
              .as("increment %d %s", j + 1, o.method())
              .isCloseTo(byHand, within(2e-4 * k));
        }
      }
      previousE = e2;
    }
  }

  @Test
  @DisplayName(
      "C_k by an independent least-squares slope of mean e on log10 k over the NC increments,"
          + " and within the published sanity range around 0.5 e0 (Tavenas et al. 1983: 0.25-1 e0"
          + " taken as a loose band)")
  void permeabilityChangeIndexByHand() {
    List<double[]> points = new ArrayList<>();
    for (IncrementReport inc : REPORT.increments()) {
      if (inc.stressHistory().value().orElseThrow() == IncrementClass.NORMALLY_CONSOLIDATED) {
        var c = inc.compressibility().value().orElseThrow();
        points.add(
            new double[] {
              Math.log10(inc.permeability().getAsDouble()),
              0.5 * (c.startVoidRatio() + c.endVoidRatio())
            });
      }
    }
    assertThat(points).hasSize(4);
    double mx = points.stream().mapToDouble(p -> p[0]).average().orElseThrow();
    double my = points.stream().mapToDouble(p -> p[1]).average().orElseThrow();
    double sxy = points.stream().mapToDouble(p -> (p[0] - mx) * (p[1] - my)).sum();
    double sxx = points.stream().mapToDouble(p -> (p[0] - mx) * (p[0] - mx)).sum();
    double ck = REPORT.permeabilityChange().value().orElseThrow().permeabilityChangeIndex();
    assertThat(ck).isCloseTo(sxy / sxx, within(1e-9));
    assertThat(ck / REPORT.initialVoidRatio()).isBetween(0.25, 1.0);
  }

  @Test
  @DisplayName(
      "C_alpha/C_c of the NC increments within Mesri's 0.04 +/- 0.01 (from memory; the generator"
          + " used 0.04)")
  void secondaryCompressionRatio() {
    int checked = 0;
    for (IncrementReport inc : REPORT.increments()) {
      var sc = inc.secondaryCompression().value().orElseThrow();
      if (sc.mesriRatio().value().isPresent()) {
        assertThat(sc.mesriRatio().value().get()).isBetween(0.03, 0.05);
        checked++;
      }
    }
    assertThat(checked).isEqualTo(4);
  }

  @Test
  @DisplayName(
      "Methods that cannot reduce an increment (too few readings in their range) leave a reason,"
          + " and the report and all its renderings are complete")
  void failingMethodsDoNotSinkTheReport() {
    long absent =
        REPORT.increments().stream()
            .flatMap(i -> i.methods().stream())
            .filter(o -> o.estimate().isEmpty())
            .peek(o -> assertThat(o.failureReason()).isNotBlank())
            .count();
    assertThat(absent).isPositive();
    assertThat(REPORT.toText().lines().filter(l -> l.matches("^\\d+ .*")).count()).isEqualTo(12);
    assertThat(REPORT.toCsv().lines().count()).isEqualTo(13);
    assertThat(REPORT.toJson()).contains("\"number\": 12");
    assertThat(REPORT.toAgs4()).contains("\"GROUP\",\"CONS\"");
  }
}
