package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.SplittableRandom;
import java.util.function.BiFunction;
import java.util.function.Supplier;
import java.util.function.ToDoubleFunction;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
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

  /**
   * A seeded ordinary curve: an exact curve of our forward model (c_v 0.1 to 100 m^2/yr, d_p 10 um
   * to 10 mm, d_i up to 20 % and a secondary slope up to 3 % of d_p a cycle) with Gaussian noise up
   * to 1 % of d_p, on the usual lab schedule, 5 to 80 readings a cycle or a reading every 10 s for
   * a day; one in three with a zero reading, one in three swelling (negated).
   */
  static SettlementCurve ordinaryCurve(long seed) {
    SplittableRandom random = new SplittableRandom(seed);
    double cv = Math.pow(10, random.nextDouble(-1, 2)) / ExactCurves.YEAR;
    double primary = Math.pow(10, random.nextDouble(-5, -2));
    CurveParameters truth =
        CurveParameters.of(
            random.nextDouble(0, 0.2) * primary, primary, cv, random.nextDouble(0, 0.03) * primary);
    double[] times =
        switch (random.nextInt(3)) {
          case 0 -> ReadingSchedules.usualLab();
          case 1 -> ReadingSchedules.logSpaced(6, 86_400, 5 + random.nextInt(76));
          default -> ExactCurves.equalTimes(10, 8640);
        };
    SettlementCurve exact = ExactCurves.curve(times, truth);
    SettlementCurve c =
        ExactCurves.noisy(exact, random.nextDouble(0, 0.01) * primary, random.nextLong());
    if (random.nextInt(3) == 0) {
      double[] t = ReadingSchedules.withZeroReading(c.elapsedSeconds());
      double[] d = new double[t.length];
      System.arraycopy(c.settlementMetres(), 0, d, 1, c.size());
      c = SettlementCurve.of(t, d);
    }
    return random.nextInt(3) == 0 ? ExactCurves.negated(c) : c;
  }

  /**
   * The power-of-2 scaling changes no bit on ordinary curves ({@link #ordinaryCurve}, 200 seeds).
   * Two checks: (1) the fit with the scaling equals, in every component (records compare doubles by
   * their bits), the fit without it (exponent 0: the method's arithmetic as it was before the
   * scaling), or both throw a FitException with the same message; (2) the readings times 2^k (k
   * from -60 to 60) give the same c_v bit for bit and the settlement times 2^k exactly. Source:
   * IEEE 754 operations are correctly rounded, so multiplying every operand by a power of 2 (exact
   * while no value leaves the normal range) multiplies a homogeneous result by it exactly.
   */
  static <R extends CvEstimate> void sameBitsAsUnscaled(
      BiFunction<SettlementCurve, Double, R> fit,
      BiFunction<SettlementCurve, Double, R> unscaledFit,
      ToDoubleFunction<R> settlement) {
    qt().withFixedSeed(20261203L)
        .withExamples(200)
        .forAll(longs().all(), integers().between(-60, 60))
        .checkAssert(
            (seed, k) -> {
              SettlementCurve c = ordinaryCurve(seed);
              Object scaled = outcome(() -> fit.apply(c, ExactCurves.DRAINAGE_PATH));
              Object unscaled = outcome(() -> unscaledFit.apply(c, ExactCurves.DRAINAGE_PATH));
              assertThat(scaled).isEqualTo(unscaled);
              if (scaled instanceof CvEstimate) {
                @SuppressWarnings("unchecked")
                R r = (R) scaled;
                R b =
                    fit.apply(
                        ExactCurves.scaled(c, 1, Math.scalb(1.0, k)), ExactCurves.DRAINAGE_PATH);
                assertThat(b.cv()).isEqualTo(r.cv());
                assertThat(settlement.applyAsDouble(b))
                    .isEqualTo(Math.scalb(settlement.applyAsDouble(r), k));
              }
            });
  }

  /** The result, or the message of the FitException thrown. */
  private static Object outcome(Supplier<? extends CvEstimate> fit) {
    try {
      return fit.get();
    } catch (FitException e) {
      return "FitException: " + e.getMessage();
    }
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
