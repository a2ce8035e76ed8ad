package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.ConsolidationCurveModel;
import org.oedometry.theory.CurveParameters;

/** The {@link ConstructionInvariants} of the log-time construction, and its t50 invariant. */
class LogTimeMethodProperties extends ConstructionInvariants<LogTimeResult> {

  @Override
  LogTimeResult fit(SettlementCurve curve, double drainagePath) {
    return LogTimeMethod.fit(curve, drainagePath);
  }

  @Override
  double d0(LogTimeResult result) {
    return result.d0();
  }

  @Override
  double d100(LogTimeResult result) {
    return result.d100();
  }

  @Test
  @DisplayName(
      "t50 never lies before the first reading (the parabola rule keeps d0 >= 2 d_first - level,"
          + " LogTimeMethod's description): on 3,000 random curves (lab, logger and sparse"
          + " schedules, T at the last reading 0.3 to 100, deformation on loading, creep up to 5 %"
          + " of d_p a cycle either way, noise up to 5 % of d_p) the construction gives t50 at or"
          + " after the first reading, or refuses for another reason")
  void t50NeverBeforeTheFirstReading() {
    AtomicInteger found = new AtomicInteger();
    qt().withFixedSeed(20261202L)
        .withExamples(3000)
        .forAll(longs().all())
        .checkAssert(
            seed -> {
              SplittableRandom random = new SplittableRandom(seed);
              double[] t =
                  switch (random.nextInt(3)) {
                    case 0 -> ReadingSchedules.usualLab();
                    case 1 -> ReadingSchedules.logSpaced(6, 86_400, 5 + random.nextInt(40));
                    default ->
                        ReadingSchedules.logSpaced(
                            6 + 600 * random.nextDouble(), 86_400, 2 + random.nextInt(4));
                  };
              double lastT = 0.3 * Math.pow(100 / 0.3, random.nextDouble());
              double cv = lastT * HDR * HDR / t[t.length - 1];
              double dp = 1e-4 * (0.2 + 5 * random.nextDouble());
              CurveParameters p =
                  new CurveParameters(
                      dp * random.nextDouble(), dp, cv, dp * 0.05 * (2 * random.nextDouble() - 1));
              ConsolidationCurveModel model = ConsolidationCurveModel.of(HDR);
              double noise = dp * 0.05 * random.nextDouble();
              double[] d = new double[t.length];
              for (int i = 0; i < t.length; i++) {
                d[i] = model.settlement(t[i], p) + noise * (2 * random.nextDouble() - 1);
              }
              try {
                LogTimeResult r = LogTimeMethod.fit(SettlementCurve.of(t, d), HDR);
                assertThat(r.t50()).as("seed %d", seed).isGreaterThanOrEqualTo(t[0]);
                found.incrementAndGet();
              } catch (FitException e) {
                assertThat(e.getMessage())
                    .as("seed %d", seed)
                    .doesNotContain("t50 lies before the first reading");
              }
            });
    // Most of the curves reach t50, so the invariant is exercised, not only the refusals.
    assertThat(found.get()).isGreaterThan(1500);
  }
}
