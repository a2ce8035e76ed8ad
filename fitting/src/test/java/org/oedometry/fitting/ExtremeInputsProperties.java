package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.oedometry.core.FiniteResults.notFinite;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.function.BiFunction;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;
import org.quicktheories.api.Pair;
import org.quicktheories.core.Gen;
import org.quicktheories.generators.Generate;

/**
 * The rule "no NaN or infinity ever leaves the library, and nothing but a FitException or an
 * IllegalArgumentException with a message escapes", checked on every per-increment c<sub>v</sub>
 * method (default options) with valid but extreme curves.
 *
 * <p>The curves come from {@link ConsolidationCurveModel} of the theory module (exact Terzaghi
 * primary consolidation plus the secondary term; its accuracy is proven against mpmath there), used
 * here as an independent generator at extreme scales: time scaled by 10<sup>-200</sup> to
 * 10<sup>200</sup> (c<sub>v</sub> = H<sub>dr</sub><sup>2</sup> / time scale), settlement by
 * 10<sup>-200</sup> to 10<sup>200</sup> of either sign, constant offsets up to 10<sup>200</sup>
 * times the movement (capped at 10<sup>300</sup> m so that every reading stays finite), 6 to 2000
 * readings, irregular, clustered or equal spacing, with or without a zero reading, H<sub>dr</sub>
 * log-uniform from 10<sup>-4</sup> to 10<sup>2</sup> m. Besides the exact curves: the whole
 * movement in the first or the last reading, a rise then an exactly flat end, readings rounded to a
 * coarse gauge step (repeated settlements), noise only, and a curve far from complete with one
 * reading knocked far off.
 *
 * <p>For each call: either a result whose every number, walked through all its accessors (nested
 * records, lists, optionals, geometry), is finite and whose {@code toString} (the values in mm,
 * minutes and m<sup>2</sup>/yr) shows no NaN or infinity, or a FitException /
 * IllegalArgumentException with a non-empty message that quotes no NaN or infinity (every input is
 * finite, so such a value was made inside the library). Scale invariance is checked elsewhere (the
 * methods' own properties classes), not here.
 */
class ExtremeInputsProperties {

  /** The kinds of curve generated. */
  enum Shape {
    /** Exact Terzaghi with secondary compression (a quarter of them with 0.1 % noise). */
    TERZAGHI,
    /** Exact Terzaghi read at equal time steps (what the Asaoka method expects). */
    EQUAL_STEPS,
    /** Exact Terzaghi rounded to a coarse gauge step: many repeated settlements. */
    ROUNDED,
    /** The whole movement already in the first reading (or the first interval), then nothing. */
    ALL_IN_FIRST,
    /** No movement until the last reading, which holds all of it. */
    ALL_IN_LAST,
    /** A rise (linear or root-time) that stops dead: exactly flat to the end. */
    RISE_THEN_FLAT,
    /** Noise only, no trend. */
    NOISE,
    /**
     * Exact Terzaghi far from complete (c<sub>v</sub> 10<sup>-3</sup> to 10<sup>-1</sup> of the
     * other shapes', so U at the last reading is a few per cent) with one reading in the middle
     * knocked by 3 to 300 times the movement: nothing determines c<sub>v</sub> (found by a fuzz
     * run: the fit's interval ran to 10<sup>301</sup> m<sup>2</sup>/s, infinite in m<sup>2
     * </sup>/yr).
     */
    KNOCKED_INCOMPLETE
  }

  /**
   * One generated input: the curve is built from these numbers, so that a falsifying example can be
   * rebuilt from the report.
   */
  record Case(
      Shape shape,
      int readings,
      double log10TimeScale,
      double log10SettlementScale,
      double log10OffsetRatio,
      long seed) {

    /** H<sub>dr</sub> for the call, m: log-uniform in 10<sup>-4</sup>..10<sup>2</sup>. */
    double drainagePath() {
      return Math.pow(10, -4 + 6 * new SplittableRandom(seed ^ 0x5DEECE66DL).nextDouble());
    }

    SettlementCurve curve() {
      SplittableRandom random = new SplittableRandom(seed);
      double timeScale = Math.pow(10, log10TimeScale);
      double movement = (random.nextBoolean() ? 1 : -1) * Math.pow(10, log10SettlementScale);
      double offset = 0;
      if (log10OffsetRatio > -3) {
        double log10Offset = Math.min(300, log10SettlementScale + log10OffsetRatio);
        offset = (random.nextBoolean() ? 1 : -1) * Math.pow(10, log10Offset);
      }
      boolean zeroReading = random.nextBoolean();
      int timed = zeroReading ? readings - 1 : readings;
      double[] unitTimes = unitTimes(random, timed, shape == Shape.EQUAL_STEPS);
      double[] t = new double[readings];
      double[] m = new double[readings];
      int first = zeroReading ? 1 : 0;
      for (int i = 0; i < timed; i++) {
        t[first + i] = timeScale * unitTimes[i];
      }
      // Strictly increasing after scaling (a product can round two close times together).
      for (int i = 1; i < readings; i++) {
        if (!(t[i] > t[i - 1])) {
          t[i] = Math.nextUp(t[i - 1]);
        }
      }
      double drainagePath = drainagePath();
      switch (shape) {
        case TERZAGHI, EQUAL_STEPS, ROUNDED, KNOCKED_INCOMPLETE -> {
          ConsolidationCurveModel model = ConsolidationCurveModel.of(drainagePath);
          double slower =
              shape == Shape.KNOCKED_INCOMPLETE ? Math.pow(10, -3 + 2 * random.nextDouble()) : 1;
          CurveParameters parameters =
              CurveParameters.of(
                  movement * 0.2 * random.nextDouble(),
                  movement,
                  slower * drainagePath * drainagePath / timeScale,
                  movement * 0.1 * random.nextDouble());
          ConsolidationCurveModel.Curve curve = model.curve(parameters);
          double noise = shape == Shape.TERZAGHI && random.nextInt(4) == 0 ? 1e-3 : 0;
          double step = movement * Math.pow(10, -3 + 2.5 * random.nextDouble());
          for (int i = 0; i < readings; i++) {
            m[i] = curve.settlement(t[i]) + noise * movement * (random.nextDouble() - 0.5);
            if (shape == Shape.ROUNDED) {
              m[i] = step * Math.rint(m[i] / step);
            }
          }
          if (shape == Shape.KNOCKED_INCOMPLETE) {
            m[readings / 2] += movement * Math.pow(10, 0.5 + 2 * random.nextDouble());
          }
        }
        case ALL_IN_FIRST -> {
          int variant = random.nextInt(3);
          Arrays.fill(m, movement);
          if (zeroReading || variant == 2) {
            m[0] = 0;
          }
        }
        case ALL_IN_LAST -> m[readings - 1] = movement;
        case RISE_THEN_FLAT -> {
          double power = random.nextBoolean() ? 1 : 0.5;
          double stop = t[first + 1 + random.nextInt(Math.max(1, timed - 2))];
          for (int i = 0; i < readings; i++) {
            m[i] = movement * Math.min(1, Math.pow(t[i] / stop, power));
          }
        }
        case NOISE -> {
          for (int i = 0; i < readings; i++) {
            m[i] = movement * (random.nextDouble() - 0.5);
          }
        }
      }
      for (int i = 0; i < readings; i++) {
        m[i] += offset;
      }
      return SettlementCurve.of(t, m);
    }

    /**
     * Time factors of the timed readings: first in 10<sup>-4</sup>..10<sup>-2</sup>, last in 1..100
     * (one case in five 0.3..1, primary incomplete); log spaced with jitter, clustered (sorted
     * log-uniform draws) or equally spaced.
     */
    private static double[] unitTimes(SplittableRandom random, int count, boolean equalSteps) {
      double logFirst = -4 + 2 * random.nextDouble();
      double logLast =
          random.nextInt(5) == 0 ? -0.5 * random.nextDouble() : 2 * random.nextDouble();
      double[] x = new double[count];
      int spacing = equalSteps ? 2 : random.nextInt(3);
      for (int i = 0; i < count; i++) {
        x[i] =
            switch (spacing) {
              case 0 ->
                  Math.pow(
                      10,
                      logFirst
                          + (logLast - logFirst)
                              * Math.min(
                                  1,
                                  Math.max(
                                      0, (i + 0.9 * (random.nextDouble() - 0.5)) / (count - 1))));
              case 1 -> Math.pow(10, logFirst + (logLast - logFirst) * random.nextDouble());
              default -> Math.pow(10, logLast) * (i + 1) / count;
            };
      }
      Arrays.sort(x);
      return x;
    }

    @Override
    public String toString() {
      return String.format(
          Locale.ROOT,
          "Case[%s, %d readings, time x 1e%.3f, settlement x 1e%.3f, offset ratio %s, seed %d,"
              + " H_dr %s m]",
          shape,
          readings,
          log10TimeScale,
          log10SettlementScale,
          log10OffsetRatio > -3 ? "1e" + String.format(Locale.ROOT, "%.3f", log10OffsetRatio) : "0",
          seed,
          drainagePath());
    }
  }

  /** Exponents from -200 to 200, the two ends and 0 drawn often. */
  private static Gen<Double> exponents() {
    return doubles()
        .between(-200, 200)
        .mix(Generate.pick(List.of(-200.0, 200.0, 0.0, -100.0, 100.0)), 30);
  }

  /** 6 to 2000 readings: mostly 6 to 200, one case in nine 200 to 2000. */
  private static Gen<Integer> readingCounts() {
    return Generate.frequency(
        Pair.of(4, integers().between(6, 40)),
        Pair.of(4, integers().between(41, 200)),
        Pair.of(1, integers().between(201, 2000)));
  }

  /** Exact curves most often; each degenerate shape in about one case in fifteen. */
  private static Gen<Shape> shapes() {
    return Generate.frequency(
        Pair.of(6, Generate.constant(Shape.TERZAGHI)),
        Pair.of(2, Generate.constant(Shape.EQUAL_STEPS)),
        Pair.of(2, Generate.constant(Shape.ROUNDED)),
        Pair.of(1, Generate.constant(Shape.ALL_IN_FIRST)),
        Pair.of(1, Generate.constant(Shape.ALL_IN_LAST)),
        Pair.of(1, Generate.constant(Shape.RISE_THEN_FLAT)),
        Pair.of(1, Generate.constant(Shape.NOISE)),
        Pair.of(1, Generate.constant(Shape.KNOCKED_INCOMPLETE)));
  }

  /**
   * log<sub>10</sub> of the offset over the movement: below -3 means no offset (half the cases); -3
   * to 3 (three in ten); 3 to 200, where the movement drowns in the rounding of the offset (two in
   * ten).
   */
  private static Gen<Double> offsetRatios() {
    return Generate.frequency(
        Pair.of(5, Generate.constant(-4.0)),
        Pair.of(3, doubles().between(-3, 3)),
        Pair.of(2, doubles().between(3, 200).mix(Generate.pick(List.of(16.0, 200.0)), 30)));
  }

  private static Gen<Case> cases() {
    return shapes()
        .zip(
            readingCounts(),
            exponents(),
            exponents(),
            (shape, n, time, settlement) -> new Object[] {shape, n, time, settlement})
        .zip(
            offsetRatios(),
            longs().all(),
            (head, offset, seed) ->
                new Case(
                    (Shape) head[0],
                    (Integer) head[1],
                    (Double) head[2],
                    (Double) head[3],
                    offset,
                    seed));
  }

  /**
   * Runs one method on generated cases: a finite result or a FitException /
   * IllegalArgumentException with a message that quotes no NaN or infinity; anything else fails the
   * property with the case.
   */
  private static void check(
      long seed, int examples, BiFunction<SettlementCurve, Double, Object> method) {
    qt().withFixedSeed(seed)
        .withExamples(examples)
        .forAll(cases())
        .checkAssert(
            c -> {
              SettlementCurve curve = c.curve();
              Object result;
              try {
                result = method.apply(curve, c.drainagePath());
              } catch (FitException | IllegalArgumentException e) {
                // Every input number is finite, so a message that quotes NaN or infinity reports a
                // value made inside the library (for an argument check: a leak, not bad input).
                assertThat(e.getMessage())
                    .as("%s: %s", c, e)
                    .isNotBlank()
                    .doesNotContain("NaN")
                    .doesNotContain("Infinity");
                return;
              }
              assertThat(notFinite(result)).as("%s", c).isEmpty();
              // What JShell shows (values converted to mm, minutes, m^2/yr) must be finite too.
              assertThat(result.toString())
                  .as("%s", c)
                  .doesNotContain("NaN")
                  .doesNotContain("Infinity");
            });
  }

  @Test
  @DisplayName(
      "LogTimeMethod.fit: finite result or clean exception on extreme exact Terzaghi curves"
          + " (ConsolidationCurveModel as independent generator)")
  void logTime() {
    check(20261211L, 1200, LogTimeMethod::fit);
  }

  @Test
  @DisplayName(
      "RootTimeMethod.fit: finite result or clean exception on extreme exact Terzaghi curves"
          + " (ConsolidationCurveModel as independent generator)")
  void rootTime() {
    check(20261212L, 1200, RootTimeMethod::fit);
  }

  @Test
  @DisplayName(
      "FullCurveMethod.fit: finite result or clean exception on extreme exact Terzaghi curves"
          + " (ConsolidationCurveModel as independent generator)")
  void fullCurve() {
    check(20261213L, 500, FullCurveMethod::fit);
  }

  @Test
  @DisplayName(
      "InflectionPointMethod.fit: finite result or clean exception on extreme exact Terzaghi"
          + " curves (ConsolidationCurveModel as independent generator)")
  void inflectionPoint() {
    check(20261214L, 1000, InflectionPointMethod::fit);
  }

  @Test
  @DisplayName(
      "RectangularHyperbolaMethod.fit: finite result or clean exception on extreme exact Terzaghi"
          + " curves (ConsolidationCurveModel as independent generator)")
  void rectangularHyperbola() {
    check(20261215L, 1200, RectangularHyperbolaMethod::fit);
  }

  @Test
  @DisplayName(
      "EarlySlopeMethod.fit: finite result or clean exception on extreme exact Terzaghi curves"
          + " (ConsolidationCurveModel as independent generator)")
  void earlySlope() {
    check(20261216L, 1200, EarlySlopeMethod::fit);
  }

  @Test
  @DisplayName(
      "AsaokaMethod.fit: finite result or clean exception on extreme exact Terzaghi curves"
          + " (ConsolidationCurveModel as independent generator)")
  void asaoka() {
    check(20261217L, 1200, AsaokaMethod::fit);
  }

  @Test
  @DisplayName(
      "MethodComparison.of: every row finite on extreme exact Terzaghi curves"
          + " (ConsolidationCurveModel as independent generator)")
  void comparison() {
    check(20261218L, 250, MethodComparison::of);
  }

  @Test
  @DisplayName(
      "Regression: FullCurveMethod on 25 readings 1 s apart, all 0 but the last (2^-515 m, about"
          + " 1.5e-155 m), H_dr 0.05 m: the outcome of the same curve with a 2^-10 m (about 1 mm)"
          + " step, bit for bit (the fit divides settlements of extreme magnitude by a power of"
          + " 2), no longer an IllegalArgumentException 'initial settlement (NaN m)'"
          + " from the theory module thrown inside Commons Math's optimiser")
  void fullCurveTinyStepInTheLastReading() {
    double[] t = new double[25];
    double[] tiny = new double[25];
    double[] millimetre = new double[25];
    for (int i = 0; i < t.length; i++) {
      t[i] = i;
    }
    tiny[24] = 0x1p-515;
    millimetre[24] = 0x1p-10;
    String tinyOutcome = outcome(() -> FullCurveMethod.fit(SettlementCurve.of(t, tiny), 0.05).cv());
    String millimetreOutcome =
        outcome(() -> FullCurveMethod.fit(SettlementCurve.of(t, millimetre), 0.05).cv());
    assertThat(tinyOutcome).isEqualTo(millimetreOutcome).doesNotContain("initial settlement");
  }

  /** The c_v to the last bit, or the exception's class and message. */
  private static String outcome(java.util.function.DoubleSupplier fit) {
    try {
      return Double.toString(fit.getAsDouble());
    } catch (RuntimeException e) {
      return e.getClass().getSimpleName() + ": " + e.getMessage();
    }
  }
}
