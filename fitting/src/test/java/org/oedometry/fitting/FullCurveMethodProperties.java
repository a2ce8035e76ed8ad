package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.SplittableRandom;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

/** Invariances of the full-curve fit (QuickTheories, fixed seed). */
class FullCurveMethodProperties {

  private static final long SEED = 20261201L;

  /** A noisy lab-schedule curve from our forward model with c_v in [0.3, 30] m^2/yr. */
  private static SettlementCurve curve(double cvPerYear, long seed) {
    CurveParameters truth =
        CurveParameters.of(0.02e-3, 0.5e-3, cvPerYear / FullCurveMethodTest.YEAR, 0.02e-3);
    return FullCurveMethodTest.curve(
        FullCurveMethodTest.labSchedule(), truth, 1e-6, new SplittableRandom(seed));
  }

  @Test
  @DisplayName("Scaling time by k scales c_v by 1/k; scaling settlement by k leaves c_v unchanged")
  void scaling() {
    qt().withFixedSeed(SEED)
        .withExamples(25)
        .forAll(doubles().between(-0.5, 1.5), doubles().between(-1, 1), longs().all())
        .checkAssert(
            (logCv, logK, seed) -> {
              double k = Math.pow(10, logK);
              SettlementCurve c = curve(Math.pow(10, logCv), seed);
              FullCurveResult base = FullCurveMethod.fit(c, FullCurveMethodTest.DRAINAGE_PATH);
              double[] t = c.elapsedSeconds();
              double[] d = c.settlementMetres();
              double[] slower = new double[t.length];
              double[] larger = new double[d.length];
              for (int i = 0; i < t.length; i++) {
                slower[i] = k * t[i];
                larger[i] = k * d[i];
              }
              FullCurveResult timeScaled =
                  FullCurveMethod.fit(
                      SettlementCurve.of(slower, d), FullCurveMethodTest.DRAINAGE_PATH);
              FullCurveResult settlementScaled =
                  FullCurveMethod.fit(
                      SettlementCurve.of(t, larger), FullCurveMethodTest.DRAINAGE_PATH);
              assertThat(timeScaled.cv() * k / base.cv()).isCloseTo(1, within(1e-4));
              assertThat(settlementScaled.cv() / base.cv()).isCloseTo(1, within(1e-4));
              assertThat(settlementScaled.d100() / (k * base.d100())).isCloseTo(1, within(1e-4));
            });
  }

  @Test
  @DisplayName(
      "Adding a constant to every settlement shifts d0 and d100 by it; the interval always holds"
          + " c_v")
  void offsetAndInterval() {
    qt().withFixedSeed(SEED)
        .withExamples(25)
        .forAll(doubles().between(-0.5, 1.5), doubles().between(-1e-3, 1e-3), longs().all())
        .checkAssert(
            (logCv, offset, seed) -> {
              SettlementCurve c = curve(Math.pow(10, logCv), seed);
              FullCurveResult base = FullCurveMethod.fit(c, FullCurveMethodTest.DRAINAGE_PATH);
              double[] d = c.settlementMetres();
              for (int i = 0; i < d.length; i++) {
                d[i] += offset;
              }
              FullCurveResult shifted =
                  FullCurveMethod.fit(
                      SettlementCurve.of(c.elapsedSeconds(), d), FullCurveMethodTest.DRAINAGE_PATH);
              assertThat(shifted.d0() - base.d0()).isCloseTo(offset, within(1e-9));
              assertThat(shifted.d100() - base.d100()).isCloseTo(offset, within(1e-9));
              assertThat(shifted.cv() / base.cv()).isCloseTo(1, within(1e-4));
              assertThat(base.cvLow()).isLessThanOrEqualTo(base.cv());
              assertThat(base.cvHigh()).isGreaterThanOrEqualTo(base.cv());
            });
  }

  @Test
  @DisplayName(
      "A curve far from complete with one reading knocked far off: refused, or an interval that"
          + " excludes part of the c_v searched and is finite in m^2/yr [Terzaghi's closed form as"
          + " generator; the refusal rule of the class description]")
  void undeterminedCvIsRefused() {
    qt().withFixedSeed(SEED)
        .withExamples(60)
        .forAll(
            doubles().between(-3, -1),
            doubles().between(0.5, 2.5),
            integers().between(20, 80),
            longs().all())
        .checkAssert(
            (log10LastTimeFactor, log10Knock, readings, seed) -> {
              SplittableRandom random = new SplittableRandom(seed);
              boolean equalSteps = random.nextBoolean();
              double[] t = new double[readings];
              for (int i = 0; i < readings; i++) {
                t[i] = equalSteps ? 60.0 * (i + 1) : 6.0 * Math.pow(1.1, i);
              }
              double h = FullCurveMethodTest.DRAINAGE_PATH;
              double lastTime = t[readings - 1];
              double cv = Math.pow(10, log10LastTimeFactor) * h * h / lastTime;
              CurveParameters truth = CurveParameters.of(0.1e-3, 0.5e-3, cv, 0.01e-3);
              double[] d = new double[readings];
              for (int i = 0; i < readings; i++) {
                d[i] = ConsolidationCurveModel.of(h).settlement(t[i], truth);
              }
              d[readings / 2] += 0.5e-3 * Math.pow(10, log10Knock);
              FullCurveResult r;
              try {
                r = FullCurveMethod.fit(SettlementCurve.of(t, d), h);
              } catch (FitException e) {
                assertThat(e.getMessage()).isNotBlank();
                return;
              }
              // The search runs over T at the last reading from 1e-4 to 1e7 (class description).
              double slowest = 1e-4 * h * h / lastTime;
              double fastest = 1e7 * h * h / lastTime;
              assertThat(r.cvLow() > slowest || r.cvHigh() < fastest).as(r.toString()).isTrue();
              assertThat(r.cvLow()).isGreaterThanOrEqualTo(Double.MIN_NORMAL);
              assertThat(r.cvHigh() * FullCurveMethodTest.YEAR).isFinite();
              assertThat(r.toString()).doesNotContain("Infinity");
            });
  }

  @Test
  @DisplayName("Noise alone (no consolidation in the readings): a FitException or a warned result")
  void noiseOnly() {
    qt().withFixedSeed(SEED)
        .withExamples(40)
        .forAll(longs().all())
        .checkAssert(
            seed -> {
              SplittableRandom random = new SplittableRandom(seed);
              double[] t = FullCurveMethodTest.labSchedule();
              double[] d = new double[t.length];
              for (int i = 0; i < d.length; i++) {
                d[i] = 1e-6 * FullCurveMethodTest.gaussian(random);
              }
              try {
                FullCurveResult r =
                    FullCurveMethod.fit(
                        SettlementCurve.of(t, d), FullCurveMethodTest.DRAINAGE_PATH);
                assertThat(r.warnings()).as(r.toString()).isNotEmpty();
              } catch (FitException e) {
                assertThat(e.getMessage()).isNotBlank();
              }
            });
  }

  @Test
  @DisplayName(
      "Runs test: the branch-free count equals a plain sign-by-sign count for any residuals,"
          + " zeros included [Wald & Wolfowitz runs, counted directly]")
  void runsTestCountsLikeAPlainLoop() {
    qt().withFixedSeed(SEED)
        .withExamples(300)
        .forAll(integers().between(0, 60), longs().all(), integers().between(0, 3))
        .checkAssert(
            (n, seed, zeroEvery) -> {
              SplittableRandom random = new SplittableRandom(seed);
              double[] r = new double[n];
              for (int i = 0; i < n; i++) {
                r[i] =
                    zeroEvery > 0 && random.nextInt(10) < zeroEvery ? 0.0 : random.nextGaussian();
              }
              int positives = 0;
              int negatives = 0;
              int runs = 0;
              int last = 0;
              for (double value : r) {
                int s = (int) Math.signum(value);
                if (s == 0) {
                  continue;
                }
                positives += s > 0 ? 1 : 0;
                negatives += s < 0 ? 1 : 0;
                runs += s != last ? 1 : 0;
                last = s;
              }
              int total = positives + negatives;
              double expected = 0.0;
              if (positives >= 2 && negatives >= 2 && total >= 10) {
                double product = 2.0 * positives * negatives;
                double mean = product / total + 1;
                double variance =
                    product * (product - total) / ((double) total * total * (total - 1));
                expected = (runs - mean) / Math.sqrt(variance);
              }
              assertThat(FullCurveMethod.runsTestZ(r)).isCloseTo(expected, within(1e-12));
            });
  }
}
