package org.oedometry.examples.demo;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.LoadDirection;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.compressibility.BilinearVolumeMethod;
import org.oedometry.core.compressibility.CasagrandeMethod;
import org.oedometry.core.compressibility.CompressionCurve;
import org.oedometry.core.compressibility.CompressionIndex;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.core.compressibility.IncrementClass;
import org.oedometry.core.compressibility.IncrementDeformation;
import org.oedometry.core.compressibility.IndexBranch;
import org.oedometry.core.compressibility.IndexFit;
import org.oedometry.core.compressibility.PachecoSilvaMethod;
import org.oedometry.core.compressibility.PreconsolidationEstimate;
import org.oedometry.core.compressibility.SecondaryCompression;
import org.oedometry.core.compressibility.SecondaryCompressionResult;
import org.oedometry.core.compressibility.SpecimenPhases;
import org.oedometry.core.compressibility.WorkMethod;
import org.oedometry.core.io.CsvTables;
import org.oedometry.core.io.OedometerTestCsvReader;
import org.oedometry.examples.demo.DemoTestGenerator.IncrementTruth;
import org.oedometry.fitting.FullCurveMethod;
import org.oedometry.fitting.FullCurveOptions;
import org.oedometry.fitting.FullCurveResult;
import org.oedometry.theory.ConsolidationCurveModel;

/**
 * The invented demo test: the committed files match the generator, the test has the shape issue 3
 * asks for, and the library's own derivation recovers the parameters it was built with.
 */
class DemoTestGeneratorTest {

  private static final OedometerTest TEST = DemoTestGenerator.generate();
  private static final List<IncrementTruth> TRUTH = DemoTestGenerator.truth();

  private static String resource(String file) throws IOException {
    String name = "/" + DemoTestGenerator.RESOURCE_DIRECTORY + "/" + file;
    try (InputStream in = DemoTestGeneratorTest.class.getResourceAsStream(name)) {
      assertThat(in).as("class path resource %s", name).isNotNull();
      // Normalise line ends in case a checkout converted them.
      return new String(in.readAllBytes(), StandardCharsets.UTF_8).replace("\r\n", "\n");
    }
  }

  private static CsvTables committed() throws IOException {
    return new CsvTables(
        resource(CsvTables.PROPERTIES_FILE),
        resource(CsvTables.INCREMENTS_FILE),
        resource(CsvTables.READINGS_FILE));
  }

  @Test
  @DisplayName("The committed CSV files are exactly what the committed generator writes")
  void committedFilesMatchTheGenerator() throws IOException {
    CsvTables committed = committed();
    assertThat(OedometerTestCsvReader.parse(committed)).isEqualTo(TEST);
    CsvTables generated = DemoTestGenerator.tables();
    assertThat(committed.properties()).isEqualTo(generated.properties());
    assertThat(committed.increments()).isEqualTo(generated.increments());
    assertThat(committed.readings()).isEqualTo(generated.readings());
    assertThat(DemoTestGenerator.generate()).as("same bits on every call").isEqualTo(TEST);
  }

  @Test
  @DisplayName(
      "The demo specimen's phases agree: w_f is the water a saturated final state holds (S e = w"
          + " G_s) to its 0.1 % rounding, and the test carries no data warning")
  void phasesAgree() {
    double wf = TEST.specimen().finalWaterContent().getAsDouble();
    // Water filling the final voids, by volumes: (H_f - H_s) A rho_w over the dry mass.
    double area = TEST.specimen().areaSquareMetres();
    double water = (TEST.finalHeightMetres() - TEST.heightOfSolidsMetres()) * area * 1000;
    assertThat(wf)
        .isCloseTo(water / TEST.specimen().dryMassKilograms().getAsDouble(), within(5e-4));
    assertThat(TEST.finalDegreeOfSaturation().getAsDouble()).isCloseTo(1.0, within(5e-4 / wf));
    assertThat(TEST.warnings()).isEmpty();
  }

  @Test
  @DisplayName("Every file and the identifiers say the data are invented")
  void marksTheDataInvented() throws IOException {
    CsvTables committed = committed();
    for (String text :
        List.of(committed.properties(), committed.increments(), committed.readings())) {
      assertThat(text).startsWith("# INVENTED, FOR DEMONSTRATION");
    }
    assertThat(TEST.identifiers().project()).contains("(invented)");
    assertThat(TEST.identifiers().borehole()).isEqualTo("BH-D1");
    assertThat(TEST.identifiers().sample()).isEqualTo("U4");
    assertThat(TEST.identifiers().depth()).isEqualTo("6.2 m");
  }

  @Test
  @DisplayName(
      "Issue 3 section 5: >= 9 increments, two unloading, reloading, the lab schedule and one"
          + " logger increment of 10 s readings over 24 h")
  void hasTheShapeTheIssueAsksFor() {
    List<LoadIncrement> increments = TEST.increments();
    assertThat(increments).hasSizeGreaterThanOrEqualTo(9);
    assertThat(increments.stream().filter(i -> i.direction() == LoadDirection.UNLOADING))
        .hasSizeGreaterThanOrEqualTo(2);
    // Reloading: a loading increment that ends at or below a stress applied earlier.
    int reloading = 0;
    double largest = increments.get(0).stressBeforePascals();
    for (LoadIncrement increment : increments) {
      if (increment.direction() == LoadDirection.LOADING
          && increment.stressAfterPascals() <= largest) {
        reloading++;
      }
      largest = Math.max(largest, increment.stressAfterPascals());
    }
    assertThat(reloading).isGreaterThanOrEqualTo(1);
    // Usual elapsed times (FACTS "Reading schedules", from memory): 0.1 min to 24 h, in s.
    double[] schedule = {
      0, 6, 15, 30, 60, 120, 240, 480, 900, 1800, 3600, 7200, 14_400, 28_800, 86_400
    };
    for (int j = 0; j < increments.size(); j++) {
      SettlementCurve curve = increments.get(j).curve();
      assertThat(curve.zeroReading()).hasValue(0.0);
      if (j == DemoTestGenerator.LOGGER_INCREMENT) {
        assertThat(curve.size()).isEqualTo(8_641); // zero reading + 24 h / 10 s
        for (int k = 0; k < curve.size(); k++) {
          assertThat(curve.elapsedSeconds(k)).isEqualTo(10.0 * k);
        }
        assertThat(increments.get(j).direction()).isEqualTo(LoadDirection.LOADING);
        assertThat(increments.get(j).stressBeforePascals())
            .isGreaterThan(DemoTestGenerator.PRECONSOLIDATION_PRESSURE);
      } else {
        assertThat(curve.elapsedSeconds()).containsExactly(schedule);
      }
    }
  }

  @Test
  @DisplayName("Readings scatter about the forward model by the stated noise, on the stated grid")
  void noiseAndResolutionAreAsStated() {
    for (int j = 0; j < TEST.increments().size(); j++) {
      boolean logger = j == DemoTestGenerator.LOGGER_INCREMENT;
      SettlementCurve curve = TEST.increments().get(j).curve();
      IncrementTruth truth = TRUTH.get(j);
      ConsolidationCurveModel model =
          new ConsolidationCurveModel(
              truth.drainagePathMetres(), DemoTestGenerator.SECONDARY_ONSET);
      double sum = 0;
      double largest = 0;
      for (int k = 1; k < curve.size(); k++) {
        double residual =
            curve.settlementMetres(k)
                - model.settlement(curve.elapsedSeconds(k), truth.parameters());
        sum += residual * residual;
        largest = Math.max(largest, Math.abs(residual));
        double steps = curve.settlementMetres(k) * (logger ? 1e7 : 1e6);
        assertThat(steps).isCloseTo(Math.rint(steps), within(1e-6));
      }
      double rms = Math.sqrt(sum / (curve.size() - 1));
      if (logger) {
        // 8640 draws of sd 0.5 um, plus rounding to 0.1 um: rms within a few per cent of 0.5 um.
        assertThat(rms).isBetween(0.47e-6, 0.53e-6);
      } else {
        assertThat(largest).isLessThan(5e-6); // 14 draws of sd 1 um, rounded to 1 um
      }
    }
  }

  @Test
  @DisplayName(
      "End-of-primary void ratios lie on the chosen e - log sigma' curve: hand values from the"
          + " asymptotes e0 - Cr log(sp / 5 kPa) - Cc log(s / sp) far above sigma'_p")
  void endOfPrimaryVoidRatiosAreConsistent() {
    double hs = TEST.heightOfSolidsMetres();
    // Hand arithmetic: 1.05 - 0.05 log10(80 / 5) - 0.35 log10(1600 / 80) = 0.534434; the softplus
    // rounding is exp(-26) of that far from the break.
    int j = TEST.increments().size() - 1;
    double endOfPrimaryHeight =
        TEST.heightAtStartMetres(j) - TRUTH.get(j).parameters().endOfPrimarySettlement();
    double hand = 1.05 - 0.05 * Math.log10(80.0 / 5) - 0.35 * Math.log10(1600.0 / 80);
    assertThat(endOfPrimaryHeight / hs - 1).isCloseTo(hand, within(2e-4));
    // Dry mass rounded to 0.01 g moves e0 by less than 1e-4 from the chosen 1.05.
    assertThat(TEST.initialVoidRatio())
        .isCloseTo(DemoTestGenerator.INITIAL_VOID_RATIO, within(1e-4));
    // Saturated specimen: S0 = w0 Gs / e0 = 0.390 * 2.68 / 1.05 = 0.995 (standard phase relation).
    assertThat(TEST.initialDegreeOfSaturation()).hasValueCloseTo(0.995, within(0.002));
  }

  @Test
  @DisplayName(
      "The library's derivation recovers C_c within 10 %, C_r within 15 % and C_alpha / C_c"
          + " within Mesri's 0.04 +/- 0.01 (from memory)")
  void derivationRecoversTheChosenParameters() {
    CompressionCurve curve = CompressionCurve.fromTest(TEST);
    double sigmaP = CasagrandeMethod.estimate(curve).preconsolidationPressure().orElseThrow();
    IndexFit cc = CompressionIndex.virginLine(curve, sigmaP).value().orElseThrow();
    assertThat(cc.index())
        .isCloseTo(
            DemoTestGenerator.COMPRESSION_INDEX, within(0.1 * DemoTestGenerator.COMPRESSION_INDEX));
    List<IndexBranch> branches = CompressionIndex.branches(curve, sigmaP);
    IndexBranch unloading =
        branches.stream()
            .filter(b -> b.kind() == IncrementClass.UNLOADING)
            .findFirst()
            .orElseThrow();
    IndexBranch reloading =
        branches.stream()
            .filter(b -> b.kind() == IncrementClass.RELOADING)
            .findFirst()
            .orElseThrow();
    for (IndexBranch branch : List.of(unloading, reloading)) {
      assertThat(branch.fit().value().orElseThrow().index())
          .isCloseTo(
              DemoTestGenerator.RECOMPRESSION_INDEX,
              within(0.15 * DemoTestGenerator.RECOMPRESSION_INDEX));
    }

    // Secondary slope of the logger increment: least-squares line of settlement on log10 t from
    // 4 h to 24 h (T about 8 to 45, past the end of primary), computed here by hand.
    int j = DemoTestGenerator.LOGGER_INCREMENT;
    SettlementCurve logger = TEST.increments().get(j).curve();
    List<double[]> late = new ArrayList<>();
    for (int k = 0; k < logger.size(); k++) {
      if (logger.elapsedSeconds(k) >= 4 * 3600.0) {
        late.add(new double[] {Math.log10(logger.elapsedSeconds(k)), logger.settlementMetres(k)});
      }
    }
    double mx = late.stream().mapToDouble(p -> p[0]).average().orElseThrow();
    double my = late.stream().mapToDouble(p -> p[1]).average().orElseThrow();
    double sxy = late.stream().mapToDouble(p -> (p[0] - mx) * (p[1] - my)).sum();
    double sxx = late.stream().mapToDouble(p -> (p[0] - mx) * (p[0] - mx)).sum();
    double perCycle = sxy / sxx;
    SecondaryCompressionResult secondary =
        SecondaryCompression.of(
            perCycle, TEST.heightOfSolidsMetres(), TEST.voidRatioAtEnd(j), cc.index());
    assertThat(secondary.mesriRatio().value().orElseThrow()).isBetween(0.03, 0.05);
    // C_alpha_eps of a normally consolidated clay: 0.005 - 0.03 (Cernica 1982, FACTS).
    assertThat(secondary.modifiedSecondaryCompressionIndex()).isBetween(0.005, 0.03);
  }

  @Test
  @DisplayName(
      "The logger increment reaches half its primary settlement at t50 = T50 H_dr^2 / c_v with"
          + " T50 = 0.1967307 (FACTS [exact]) and the chosen c_v = 1.4 m^2/yr, within 10 %")
  void loggerIncrementHasTheChosenCv() {
    int j = DemoTestGenerator.LOGGER_INCREMENT;
    SettlementCurve logger = TEST.increments().get(j).curve();
    IncrementTruth truth = TRUTH.get(j);
    double half =
        truth.parameters().initialSettlement() + 0.5 * truth.parameters().primarySettlement();
    int k = 1;
    while (logger.settlementMetres(k) < half) {
      k++;
    }
    // Linear interpolation between the readings either side of d50.
    double t0 = logger.elapsedSeconds(k - 1);
    double t1 = logger.elapsedSeconds(k);
    double d0 = logger.settlementMetres(k - 1);
    double d1 = logger.settlementMetres(k);
    double t50 = t0 + (half - d0) / (d1 - d0) * (t1 - t0);
    double h = truth.drainagePathMetres();
    double cvPerYear = 0.1967307 * h * h / t50 * 365.25 * 86_400;
    // The secondary term already adds s log10(1.2) (about 1.4 % of d_p) at T50, so t50 comes a
    // few per cent early: c_v reads a few per cent high.
    assertThat(cvPerYear).isCloseTo(1.4, within(0.14));
  }

  @Test
  @DisplayName(
      "The full-curve fit (with the generator's secondary onset T_s = 1) recovers every"
          + " increment's c_v (the generator's truth) within 5 %, and its 95 % interval holds the"
          + " truth in at least 10 of the 12 increments")
  void fullCurveFitRecoversEachIncrement() {
    int covered = 0;
    for (int j = 0; j < TEST.increments().size(); j++) {
      IncrementTruth truth = TRUTH.get(j);
      FullCurveResult fit =
          FullCurveMethod.fit(
              TEST.increments().get(j).curve(),
              truth.drainagePathMetres(),
              FullCurveOptions.defaults().withSecondaryOnset(DemoTestGenerator.SECONDARY_ONSET));
      double trueCv = truth.parameters().cv();
      assertThat(fit.cv() / trueCv - 1).as("increment %d: %s", j, fit).isCloseTo(0, within(0.05));
      if (fit.cvLow() <= trueCv && trueCv <= fit.cvHigh()) {
        covered++;
      }
    }
    assertThat(covered).isGreaterThanOrEqualTo(10);
  }

  private static List<PreconsolidationEstimate> allMethods(CompressionCurve curve) {
    return List.of(
        CasagrandeMethod.estimate(curve),
        PachecoSilvaMethod.estimate(curve),
        BilinearVolumeMethod.butterfield(curve),
        BilinearVolumeMethod.onitsuka(curve),
        WorkMethod.estimate(curve));
  }

  private static double[] pressures(List<PreconsolidationEstimate> estimates) {
    return estimates.stream()
        .mapToDouble(e -> e.preconsolidationPressure().orElseThrow())
        .toArray();
  }

  /** The end-of-primary curve: each increment's end-of-primary settlement from the generator. */
  private static CompressionCurve endOfPrimaryCurve() {
    double h0 = TEST.specimen().initialHeightMetres();
    List<IncrementDeformation> deformations = new ArrayList<>();
    for (int j = 0; j < TEST.increments().size(); j++) {
      deformations.add(
          IncrementDeformation.of(
              TEST.increments().get(j).stressAfterPascals(),
              h0 - TEST.heightAtEndMetres(j),
              h0
                  - TEST.heightAtStartMetres(j)
                  + TRUTH.get(j).parameters().endOfPrimarySettlement()));
    }
    return CompressionCurve.fromDeformations(
        SpecimenPhases.of(h0, TEST.heightOfSolidsMetres()),
        TEST.increments().get(0).stressBeforePascals(),
        deformations,
        DeformationBasis.END_OF_PRIMARY);
  }

  /**
   * Band, end-of-primary curve: every method within -10 % / +12 % of the 80 kPa break and all
   * together within a factor 1.20. Why: on a two-line curve with a softplus transition 0.05 log
   * cycle wide, Casagrande's construction itself lies about 10 % above the break (CasagrandeMethod
   * Javadoc, from the geometry of the construction); Pacheco Silva lies (Cr/Cc)^2 log10(sigma'_p /
   * sigma'_0) = (0.05/0.35)^2 * 1.204 = 0.025 log cycle, 5.5 %, below it (formula derived in
   * PachecoSilvaMethod); the bilinear and work methods lie at or above it. So some 16 % of spread
   * is inherent to the constructions; the band adds a few per cent for noise (1 um in 20 mm) and
   * the discrete stresses.
   */
  @Test
  @DisplayName(
      "sigma'_p methods on the demo's end-of-primary curve agree within a factor 1.20 and bracket"
          + " the 80 kPa break the data were built with")
  void preconsolidationMethodsAgreeOnTheEndOfPrimaryCurve() {
    double[] p = pressures(allMethods(endOfPrimaryCurve()));
    double sigmaP = DemoTestGenerator.PRECONSOLIDATION_PRESSURE;
    for (double value : p) {
      assertThat(value).isBetween(0.90 * sigmaP, 1.12 * sigmaP);
    }
    double min = Arrays.stream(p).min().orElseThrow();
    double max = Arrays.stream(p).max().orElseThrow();
    assertThat(max / min).isLessThanOrEqualTo(1.20);
    assertThat(min).isLessThanOrEqualTo(sigmaP);
    assertThat(max).isGreaterThanOrEqualTo(sigmaP);
    // Butterfield (ln) and Onitsuka (log10) give the same stress: the base cancels (FACTS).
    assertThat(p[2]).isCloseTo(p[3], within(1e-6 * p[2]));
  }

  /**
   * Band, end-of-increment (24 h) curve: all methods within a factor 1.30, bracketing the break of
   * the 24 h curve, and each below its value on the end-of-primary curve. Why: 24 h of secondary
   * compression lowers the normally consolidated points by C_alpha log10(1 + T_end) (about 0.022 in
   * e) but the overconsolidated ones by only about 0.005, so the 24 h curve's virgin line meets the
   * recompression line (0.022 - 0.005) / (Cc - Cr) = 0.057 log cycle lower, near 70 kPa; a curve
   * from 24 h readings gives a lower sigma'_p than the end-of-primary curve (Mesri and Choi 1985,
   * from memory). The points no longer follow one smooth two-line shape (the secondary shift grows
   * across the break), which widens the spread of the constructions beyond the 1.20 above.
   */
  @Test
  @DisplayName(
      "sigma'_p methods on the demo's end-of-increment curve agree within a factor 1.30, bracket"
          + " the 24 h break and lie below their end-of-primary values")
  void preconsolidationMethodsAgreeOnTheEndOfIncrementCurve() {
    double[] endOfIncrement = pressures(allMethods(CompressionCurve.fromTest(TEST)));
    double[] endOfPrimary = pressures(allMethods(endOfPrimaryCurve()));
    // Break of the 24 h curve by hand: each branch shifted down by its mean secondary
    // compression (in e) at 24 h, from the points themselves against the chosen curve.
    double hs = TEST.heightOfSolidsMetres();
    double overconsolidatedShift = meanSecondaryShift(0, 2, hs);
    double normallyConsolidatedShift = meanSecondaryShift(4, 6, hs);
    double break24h =
        DemoTestGenerator.PRECONSOLIDATION_PRESSURE
            * Math.pow(
                10,
                -(normallyConsolidatedShift - overconsolidatedShift)
                    / (DemoTestGenerator.COMPRESSION_INDEX
                        - DemoTestGenerator.RECOMPRESSION_INDEX));
    double min = Arrays.stream(endOfIncrement).min().orElseThrow();
    double max = Arrays.stream(endOfIncrement).max().orElseThrow();
    assertThat(max / min).isLessThanOrEqualTo(1.30);
    assertThat(min).isLessThanOrEqualTo(break24h);
    assertThat(max).isGreaterThanOrEqualTo(break24h);
    for (int m = 0; m < endOfIncrement.length; m++) {
      assertThat(endOfIncrement[m]).isLessThan(endOfPrimary[m]);
    }
  }

  /** Mean of (end-of-primary e - end-of-increment e) over increments first..last. */
  private static double meanSecondaryShift(int first, int last, double hs) {
    double sum = 0;
    for (int j = first; j <= last; j++) {
      double endOfPrimaryHeight =
          TEST.heightAtStartMetres(j) - TRUTH.get(j).parameters().endOfPrimarySettlement();
      sum += (endOfPrimaryHeight - TEST.heightAtEndMetres(j)) / hs;
    }
    return sum / (last - first + 1);
  }
}
