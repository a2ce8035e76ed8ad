package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.fitting.synthetic.ReadingSchedules;
import org.oedometry.fitting.synthetic.SyntheticIncrement;
import org.oedometry.fitting.synthetic.SyntheticReadings;

/**
 * The lengths of the results' JShell summaries (our own display rule, documented on {@link
 * Results#millimetres}): a lab's values as before, extreme ones short and finite.
 */
class ResultsTest {

  @Test
  @DisplayName(
      "Millimetres: four decimals from 1e-4 to 1e6 mm, four significant digits beyond, metres"
          + " where millimetres overflow; micrometres to three digits")
  void lengthsForSummaries() {
    assertThat(Results.millimetres(0.0123456, "")).isEqualTo("12.3456 mm");
    assertThat(Results.millimetres(-2.5e-5, "/log cycle")).isEqualTo("-0.0250 mm/log cycle");
    assertThat(Results.millimetres(0, "")).isEqualTo("0.0000 mm");
    assertThat(Results.millimetres(1e300, "/log cycle")).isEqualTo("1.000e+303 mm/log cycle");
    assertThat(Results.millimetres(-1e-300, "")).isEqualTo("-1.000e-297 mm");
    assertThat(Results.millimetres(Double.MAX_VALUE, "")).isEqualTo("1.798e+308 m");
    assertThat(Results.micrometres(1.02e-6)).isEqualTo("1.02 um");
    assertThat(Results.micrometres(1e-300)).isEqualTo("1.00e-294 um");
    assertThat(Results.micrometres(1e303)).isEqualTo("1.000e+303 m");
  }

  @Test
  @DisplayName(
      "Summaries of fits on an exact Terzaghi curve (theory's U(T), invented) scaled to 1e300 m"
          + " stay short and finite: no number is printed with hundreds of digits")
  void summariesOfExtremeCurvesStayShort() {
    double path = 0.01;
    double cv = 20 * path * path / 86_400;
    for (double primary : new double[] {1e-3, 1e300, 1e-300}) {
      SyntheticIncrement increment =
          new SyntheticIncrement(
              0,
              0.05 * primary,
              primary,
              cv,
              path,
              SyntheticIncrement.CreepShape.NONE,
              0,
              path * path / cv);
      SettlementCurve curve =
          SyntheticReadings.sample(increment, ReadingSchedules.logSpaced(6, 86_400, 20), 0, 0, 1)
              .toCurve();
      for (Object result :
          new Object[] {
            FullCurveMethod.fit(curve, path),
            InflectionPointMethod.fit(curve, path),
            RectangularHyperbolaMethod.fit(curve, path),
            EarlySlopeMethod.fit(curve, path)
          }) {
        assertThat(result.toString())
            .as("primary %s m", primary)
            .hasSizeLessThan(400)
            .doesNotContain("Infinity")
            .doesNotContain("NaN");
      }
    }
  }
}
