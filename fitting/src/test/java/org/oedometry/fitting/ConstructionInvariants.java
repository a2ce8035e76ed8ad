package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.fitting.synthetic.SyntheticReadings;

/**
 * Invariances of a graphical construction that follow from its definition (c_v = T H^2 / t and a
 * construction made of straight lines): checked on noisy invented curves (1 micrometre noise, lab
 * schedule or 10 readings per log cycle, T at the last reading 3 to 20). Written once; the log-time
 * and root-time properties classes run them.
 *
 * @param <R> the construction's result
 */
abstract class ConstructionInvariants<R extends CvEstimate> {

  /** The construction with its defaults. */
  abstract R fit(SettlementCurve curve, double drainagePath);

  /** d0 of a result, m. */
  abstract double d0(R result);

  /** d100 of a result, m. */
  abstract double d100(R result);

  static final double HDR = 0.01;

  private static SettlementCurve curve(double lastT, int seed) {
    double[] times =
        seed % 2 == 0 ? ReadingSchedules.usualLab() : ReadingSchedules.logSpaced(6, Curves.DAY, 10);
    return SyntheticReadings.sample(
            Curves.terzaghi(0.4e-3, HDR, lastT),
            ReadingSchedules.withZeroReading(times),
            Curves.MICROMETRE,
            0,
            seed)
        .toCurve();
  }

  @Test
  @DisplayName("scaling time by k scales c_v by 1/k (c_v = T H^2 / t)")
  void timeScaling() {
    qt().withFixedSeed(41)
        .withExamples(60)
        .forAll(doubles().between(3, 20), integers().between(0, 999), doubles().between(-3, 3))
        .checkAssert(
            (lastT, seed, log10k) -> {
              double k = Math.pow(10, log10k);
              SettlementCurve c = curve(lastT, seed);
              R a = fit(c, HDR);
              R b = fit(Curves.transform(c, k, 1, 0), HDR);
              assertThat(b.cv() * k / a.cv()).isCloseTo(1.0, within(1e-6));
            });
  }

  @Test
  @DisplayName(
      "scaling settlement by k (10^-300 to 10^300) leaves c_v unchanged and scales d0, d100 by k"
          + " (the interpolation once took two tiny slopes of one sign for a change of sign)")
  void settlementScaling() {
    qt().withFixedSeed(42)
        .withExamples(120)
        .forAll(doubles().between(3, 20), integers().between(0, 999), doubles().between(-300, 300))
        .checkAssert(
            (lastT, seed, log10k) -> {
              double k = Math.pow(10, log10k);
              SettlementCurve c = curve(lastT, seed);
              R r = fit(c, HDR);
              R b = fit(Curves.transform(c, 1, k, 0), HDR);
              assertThat(b.cv() / r.cv()).isCloseTo(1.0, within(1e-9));
              assertThat(d0(b)).isCloseTo(k * d0(r), within(1e-9 * k * 1e-3));
              assertThat(d100(b)).isCloseTo(k * d100(r), within(1e-9 * k * 1e-3));
            });
  }

  @Test
  @DisplayName("adding a constant to every settlement shifts d0 and d100 by it, c_v unchanged")
  void offset() {
    qt().withFixedSeed(43)
        .withExamples(60)
        .forAll(
            doubles().between(3, 20), integers().between(0, 999), doubles().between(-0.02, 0.02))
        .checkAssert(
            (lastT, seed, shift) -> {
              SettlementCurve c = curve(lastT, seed);
              R r = fit(c, HDR);
              R b = fit(Curves.transform(c, 1, 1, shift), HDR);
              assertThat(b.cv() / r.cv()).isCloseTo(1.0, within(1e-6));
              assertThat(d0(b)).isCloseTo(d0(r) + shift, within(1e-10));
              assertThat(d100(b)).isCloseTo(d100(r) + shift, within(1e-10));
            });
  }

  @Test
  @DisplayName("a swelling curve (the compression negated) gives the same c_v, d0 and d100 negated")
  void negatedCurve() {
    qt().withFixedSeed(44)
        .withExamples(60)
        .forAll(doubles().between(3, 20), integers().between(0, 999))
        .checkAssert(
            (lastT, seed) -> {
              SettlementCurve c = curve(lastT, seed);
              R r = fit(c, HDR);
              R b = fit(Curves.transform(c, 1, -1, 0), HDR);
              assertThat(b.cv()).isEqualTo(r.cv());
              assertThat(d0(b)).isEqualTo(-d0(r));
              assertThat(d100(b)).isEqualTo(-d100(r));
              assertThat(b.warnings()).anyMatch(w -> w.is(FitWarning.Kind.SWELLING_INCREMENT));
            });
  }

  @Test
  @DisplayName(
      "any valid curve gives a finite result or a FitException (too few readings: an"
          + " IllegalArgumentException), never NaN or another error")
  void noNaN() {
    qt().withFixedSeed(45)
        .withExamples(300)
        .forAll(integers().between(5, 60), integers().all())
        .checkAssert(
            (n, seed) -> {
              java.util.SplittableRandom random = new java.util.SplittableRandom(seed);
              double[] t = new double[n];
              double[] d = new double[n];
              double time = random.nextBoolean() ? 0 : random.nextDouble() * 10;
              for (int i = 0; i < n; i++) {
                t[i] = time;
                time += Math.pow(10, random.nextDouble() * 4 - 1);
                d[i] = (random.nextDouble() - 0.3) * 1e-3 + (i > 0 ? d[i - 1] : 0);
              }
              try {
                R r = fit(SettlementCurve.of(t, d), HDR);
                assertThat(Double.isFinite(r.cv()) && r.cv() > 0).isTrue();
                assertThat(Double.isFinite(d0(r)) && Double.isFinite(d100(r))).isTrue();
              } catch (FitException e) {
                assertThat(e.getMessage()).isNotBlank();
              } catch (IllegalArgumentException e) {
                // ARCHITECTURE.md (Errors): too few readings after t = 0 is invalid input, and
                // the only invalid input these curves can hold (5 readings, the first at t = 0).
                assertThat(t[0]).isZero();
                assertThat(n - 1).isLessThan(5);
                assertThat(e.getMessage()).contains("readings after t = 0 are too few");
              }
            });
  }
}
