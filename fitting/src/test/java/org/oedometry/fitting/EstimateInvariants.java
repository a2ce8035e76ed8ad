package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.function.BiFunction;
import java.util.function.ToDoubleFunction;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;

/**
 * The invariances every per-increment c_v method must keep (QuickTheories, fixed seed), written
 * once and run by each method's {@code *Properties} class with its own curve and tolerance.
 */
final class EstimateInvariants {

  static final long SEED = 20261201L;

  private EstimateInvariants() {}

  /** Time scaled by k: c_v scaled by 1/k (T = c_v t / H^2, Terzaghi). */
  static void timeScaling(
      BiFunction<SettlementCurve, Double, ? extends CvEstimate> fit,
      SettlementCurve base,
      int examples,
      double relativeTolerance) {
    double cv = fit.apply(base, ExactCurves.DRAINAGE_PATH).cv();
    qt().withFixedSeed(SEED)
        .withExamples(examples)
        .forAll(doubles().between(0.01, 100))
        .checkAssert(
            k -> {
              double scaled =
                  fit.apply(ExactCurves.scaled(base, k, 1), ExactCurves.DRAINAGE_PATH).cv();
              assertThat(scaled * k).isCloseTo(cv, within(relativeTolerance * cv));
            });
  }

  /**
   * Settlements of any magnitude, scaled by 10<sup>k</sup> with k from -300 to 300: c<sub>v</sub>
   * the same to 1e-9 and the given settlement of the result scaled by 10<sup>k</sup> to 1e-9 (U is
   * a ratio of settlements; the fits once left the double range beyond about 1e&plusmn;150 m).
   */
  static <R extends CvEstimate> void anyMagnitude(
      BiFunction<SettlementCurve, Double, R> fit,
      SettlementCurve base,
      ToDoubleFunction<R> settlement) {
    R reference = fit.apply(base, ExactCurves.DRAINAGE_PATH);
    double expected = settlement.applyAsDouble(reference);
    qt().withFixedSeed(20261202L)
        .withExamples(60)
        .forAll(integers().between(-300, 300))
        .checkAssert(
            k -> {
              double a = Math.pow(10, k);
              R r = fit.apply(ExactCurves.scaled(base, 1, a), ExactCurves.DRAINAGE_PATH);
              assertThat(r.cv())
                  .as("10^%d", k)
                  .isCloseTo(reference.cv(), within(1e-9 * reference.cv()));
              assertThat(settlement.applyAsDouble(r) / a)
                  .as("10^%d", k)
                  .isCloseTo(expected, within(1e-9 * Math.abs(expected)));
            });
  }

  /** Settlement scaled by a: c_v unchanged (U is a ratio of settlements). */
  static void settlementScaling(
      BiFunction<SettlementCurve, Double, ? extends CvEstimate> fit,
      SettlementCurve base,
      int examples,
      double relativeTolerance) {
    double cv = fit.apply(base, ExactCurves.DRAINAGE_PATH).cv();
    qt().withFixedSeed(SEED)
        .withExamples(examples)
        .forAll(doubles().between(0.01, 100))
        .checkAssert(
            a -> {
              double scaled =
                  fit.apply(ExactCurves.scaled(base, 1, a), ExactCurves.DRAINAGE_PATH).cv();
              assertThat(scaled).isCloseTo(cv, within(relativeTolerance * cv));
            });
  }

  /**
   * Noisy curves (0 to 10 um on 0.5 mm, 5 readings a cycle): a finite c_v or a FitException, never
   * another exception.
   */
  static void noisyCurvesGiveResultOrFitException(
      BiFunction<SettlementCurve, Double, ? extends CvEstimate> fit) {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve exact =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 1e-3, 5, 5), CurveParameters.of(0.01e-3, 0.5e-3, cv, 0.02e-3));
    qt().withFixedSeed(SEED)
        .withExamples(60)
        .forAll(doubles().between(0, 10e-6), longs().all())
        .checkAssert(
            (sigma, seed) -> {
              SettlementCurve c = ExactCurves.noisy(exact, sigma, seed);
              ExactCurves.resultOrFitException(() -> fit.apply(c, ExactCurves.DRAINAGE_PATH));
            });
  }
}
