package org.oedometry.fitting.reduction;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.DrainagePathRule;
import org.oedometry.core.LoadIncrement;
import org.oedometry.core.OedometerTest;
import org.oedometry.core.SettlementCurve;
import org.oedometry.core.Specimen;
import org.oedometry.core.TestIdentifiers;
import org.oedometry.core.compressibility.DeformationBasis;
import org.oedometry.fitting.CvMethod;
import org.oedometry.fitting.FullCurveOptions;
import org.oedometry.fitting.FuzzCurves;
import org.oedometry.theory.Drainage;

/**
 * The whole reduction on random legal tests (invented): whatever the readings, a valid {@link
 * OedometerTest} is reduced without an exception (ARCHITECTURE.md: a method that cannot reduce an
 * increment leaves its reason in the row), no report format carries NaN or infinity
 * (ARCHITECTURE.md: "No NaN or infinity in any result"), and the same test gives the same report
 * (ARCHITECTURE.md, determinism), also when reduced in parallel.
 *
 * <p>The tests mix what a lab meets and what it should not: Terzaghi curves with c<sub>v</sub> from
 * 0.01 to 300 m<sup>2</sup>/yr (primary complete or far from it), with or without secondary
 * compression, immediate settlement and a zero reading; swelling on unloading; dial-gauge noise and
 * rounding; readings on the usual lab schedule, a log-spaced one, a data logger's uniform one or
 * with readings missing; and increments of pure noise, flat readings or a straight line in log
 * time.
 */
class TestReductionProperties {

  @Test
  @DisplayName(
      "random legal tests: reduced without exception, no NaN or Infinity in any format,"
          + " deterministic")
  void anyLegalTestIsReduced() {
    qt().withFixedSeed(20_261_202L)
        .withExamples(150)
        .forAll(longs().all())
        .checkAssert(
            seed -> {
              SplittableRandom random = new SplittableRandom(seed);
              OedometerTest test = randomTest(random);
              ReductionOptions options = randomOptions(random);
              TestReport report = TestReduction.reduce(test, options);
              String[] formats = {
                report.toText(), report.toCsv(), report.toJson(), report.toAgs4(), report.toString()
              };
              for (String text : formats) {
                assertThat(text).doesNotContain("NaN").doesNotContain("Infinity");
              }
              assertThat(report.increments()).hasSize(test.increments().size());
              for (IncrementReport row : report.increments()) {
                row.preferredCv().ifPresent(cv -> assertThat(cv).isPositive().isFinite());
                for (CvMethod method : CvMethod.values()) {
                  row.cv(method).ifPresent(cv -> assertThat(cv).isPositive().isFinite());
                }
              }
              // Determinism: a second reduction, and one on another thread, give the same bits.
              List<TestReport> parallel = TestReduction.reduceAll(List.of(test, test), options);
              assertThat(parallel).containsExactly(report, report);
              assertThat(parallel.get(1).toJson()).isEqualTo(report.toJson());
            });
  }

  /**
   * A random legal test of 1 to 10 increments; every value invented. Legal by construction: at most
   * 2 % of the height per increment plus a wild reading of 6 %, against a void fraction e0 / (1 +
   * e0) of at least 37.5 %.
   */
  static OedometerTest randomTest(SplittableRandom random) {
    double height = 0.010 + 0.030 * random.nextDouble();
    double diameter = 0.050 + 0.050 * random.nextDouble();
    double gs = 2.5 + 0.3 * random.nextDouble();
    double e0 = 0.6 + 1.8 * random.nextDouble();
    double area = Math.PI * diameter * diameter / 4;
    double dryMass = gs * 1000 * area * height / (1 + e0);
    Specimen.Builder specimen =
        Specimen.builder()
            .initialHeight(height)
            .diameter(diameter)
            .specificGravity(gs)
            .dryMass(dryMass)
            .initialWaterContent(e0 / gs * (0.8 + 0.3 * random.nextDouble()));
    if (random.nextBoolean()) {
      specimen.finalWaterContent(0.1 + 0.5 * random.nextDouble());
    }
    int count = 1 + random.nextInt(10);
    double stress = 5_000 + 50_000 * random.nextDouble();
    double current = height;
    List<LoadIncrement> increments = new ArrayList<>();
    for (int j = 0; j < count; j++) {
      boolean unload = j > 0 && random.nextInt(4) == 0;
      double next =
          unload ? stress / (2 + 3 * random.nextDouble()) : stress * (1.5 + random.nextDouble());
      SettlementCurve curve = FuzzCurves.curve(random, current, unload);
      increments.add(LoadIncrement.of(stress, next, curve));
      current -= curve.finalSettlementMetres();
      stress = next;
    }
    return OedometerTest.builder(specimen.build())
        .drainage(random.nextInt(3) == 0 ? Drainage.SINGLE : Drainage.DOUBLE)
        .drainagePathRule(
            DrainagePathRule.values()[random.nextInt(DrainagePathRule.values().length)])
        .identifiers(TestIdentifiers.of("Invented fuzz test", "BH-F", "F1", "1 m"))
        .increments(increments)
        .build();
  }

  static ReductionOptions randomOptions(SplittableRandom random) {
    ReductionOptions.Builder options = ReductionOptions.builder();
    if (random.nextBoolean()) {
      List<CvMethod> methods = new ArrayList<>(List.of(CvMethod.values()));
      java.util.Collections.shuffle(methods, new java.util.Random(random.nextLong()));
      options.preferredMethods(methods.subList(0, 1 + random.nextInt(methods.size())));
    }
    if (random.nextBoolean()) {
      List<CvMethod> methods = new ArrayList<>(List.of(CvMethod.values()));
      java.util.Collections.shuffle(methods, new java.util.Random(random.nextLong()));
      options.methods(methods.subList(0, 1 + random.nextInt(methods.size())));
      options.preferredMethods(List.of());
    }
    if (random.nextBoolean()) {
      options.drainagePathRule(
          DrainagePathRule.values()[random.nextInt(DrainagePathRule.values().length)]);
    }
    if (random.nextBoolean()) {
      options.deformationBasis(
          DeformationBasis.values()[random.nextInt(DeformationBasis.values().length)]);
    }
    if (random.nextBoolean()) {
      options.fullCurveOptions(
          FullCurveOptions.defaults()
              .withWeights(
                  FullCurveOptions.ReadingWeights.values()[
                      random.nextInt(FullCurveOptions.ReadingWeights.values().length)])
              .withSecondary(random.nextBoolean())
              .withConfidenceLevel(0.5 + 0.499 * random.nextDouble()));
    }
    if (random.nextBoolean()) {
      options.disagreementFactor(1 + 5 * random.nextDouble());
      double low = random.nextDouble();
      options.usualPrimaryRatio(low, low + 2 * random.nextDouble() + 1e-3);
    }
    return options.build();
  }
}
