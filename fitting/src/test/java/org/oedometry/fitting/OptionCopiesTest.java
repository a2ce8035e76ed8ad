package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.TDistribution;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.theory.CurveParameters;

/**
 * The option copies of the full curve, the inflection point and Asaoka's method, each checked for
 * its effect on a fit and for its range.
 */
class OptionCopiesTest {

  private static final double H = ExactCurves.DRAINAGE_PATH;

  @Test
  @DisplayName(
      "Full curve, confidence level: the half-width of the ln c_v interval scales with Student's t"
          + " quantile (Commons Math TDistribution, n - 4 degrees of freedom), 99 % against 95 %;"
          + " outside [0.5, 0.999] refused")
  void confidenceLevel() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve curve =
        FullCurveMethodTest.curve(
            ReadingSchedules.logSpaced(6, 86_400, 10),
            CurveParameters.of(2e-5, 4e-4, cv, 4e-6),
            1e-6,
            new SplittableRandom(3));
    FullCurveResult at95 = FullCurveMethod.fit(curve, H);
    FullCurveResult at99 =
        FullCurveMethod.fit(curve, H, FullCurveOptions.defaults().withConfidenceLevel(0.99));
    assertThat(at99.cv()).isEqualTo(at95.cv());
    assertThat(at99.confidenceLevel()).isEqualTo(0.99);
    int freedom = curve.size() - 4;
    TDistribution t = new TDistribution(freedom);
    double expected = t.inverseCumulativeProbability(0.995) / t.inverseCumulativeProbability(0.975);
    double ratio = Math.log(at99.cvHigh() / at99.cv()) / Math.log(at95.cvHigh() / at95.cv());
    assertThat(ratio).isCloseTo(expected, within(1e-6 * expected));
    assertThatThrownBy(() -> FullCurveOptions.defaults().withConfidenceLevel(0.9999))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("0.9999");
    assertThatThrownBy(() -> FullCurveOptions.defaults().withConfidenceLevel(0.4))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("0.4");
  }

  @Test
  @DisplayName(
      "Full curve, iteration limit: an exact curve fits to 0.1 % with the least limit allowed"
          + " (10); below it refused")
  void iterationLimit() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve curve =
        ExactCurves.curve(ReadingSchedules.usualLab(), CurveParameters.of(2e-5, 4e-4, cv, 4e-6));
    FullCurveResult r =
        FullCurveMethod.fit(curve, H, FullCurveOptions.defaults().withMaxIterations(10));
    assertThat(r.cv()).isCloseTo(cv, within(1e-3 * cv));
    assertThat(FullCurveOptions.defaults().withMaxIterations(10).maxIterations()).isEqualTo(10);
    assertThatThrownBy(() -> FullCurveOptions.defaults().withMaxIterations(9))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("9");
  }

  @Test
  @DisplayName(
      "Inflection point, fewest readings in a window: 8 to 50 give the exact curve's c_v to 1e-6"
          + " on dense readings (the window correction makes any window exact on Terzaghi's"
          + " curve); 7 and 51 refused")
  void minimumWindowReadings() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve curve = ExactCurves.dense(cv, 0.02e-3);
    for (int readings : new int[] {8, 20, 50}) {
      InflectionPointResult r =
          InflectionPointMethod.fit(
              curve, H, InflectionPointOptions.defaults().withMinimumWindowReadings(readings));
      assertThat(r.cv()).as("%d readings", readings).isCloseTo(cv, within(1e-6 * cv));
    }
    assertThatThrownBy(() -> InflectionPointOptions.defaults().withMinimumWindowReadings(7))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("7");
    assertThatThrownBy(() -> InflectionPointOptions.defaults().withMinimumWindowReadings(51))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("51");
  }

  @Test
  @DisplayName(
      "Asaoka, number of time steps: 5, 10 and 40 steps over the window give c_v within 0.3 % on"
          + " exact readings every 10 s, with about that many steps (each a whole number of"
          + " reading intervals)")
  void asaokaSteps() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve curve =
        ExactCurves.curve(
            ExactCurves.equalTimes(10, 8640), CurveParameters.of(0.01e-3, 0.5e-3, cv, 0));
    for (int steps : new int[] {5, 10, 40}) {
      AsaokaResult r = AsaokaMethod.fit(curve, H, AsaokaOptions.defaults().withSteps(steps));
      assertThat(r.cv()).as("%d steps", steps).isCloseTo(cv, within(3e-3 * cv));
      // The step is the whole number of reading intervals nearest to the window over the steps,
      // so the window holds the steps asked for, or one fewer where the rounding lengthened them.
      assertThat(r.sampledSettlements().size()).isBetween(steps, steps + 1);
      assertThat(r.timeStep() % 10).isCloseTo(0, within(1e-9));
    }
  }
}
