package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Terzaghi;

class InflectionPointMethodTest {

  static final double H = ExactCurves.DRAINAGE_PATH;

  @Test
  @DisplayName(
      "T_I, U_I and the slope match FACTS.md (0.404176, 70.098 %, 0.686845 [exact]) and mpmath"
          + " (further_constants.py)")
  void constantsMatchPublishedAndMpmath() {
    // FACTS.md "Further published c_v methods", rounded to the digits given there.
    assertThat(InflectionPointMethod.INFLECTION_TIME_FACTOR).isCloseTo(0.404176, within(5e-7));
    assertThat(100 * InflectionPointMethod.INFLECTION_DEGREE).isCloseTo(70.098, within(5e-4));
    assertThat(InflectionPointMethod.INFLECTION_SLOPE_PER_LOG_CYCLE)
        .isCloseTo(0.686845, within(5e-7));
    // mpmath, 30 digits (src/test/resources/org/oedometry/fitting/further_constants.py).
    assertThat(InflectionPointMethod.INFLECTION_TIME_FACTOR)
        .isCloseTo(0.404176434311852942, within(1e-12));
    assertThat(InflectionPointMethod.INFLECTION_DEGREE)
        .isCloseTo(0.700980207288844597, within(1e-12));
    assertThat(InflectionPointMethod.INFLECTION_SLOPE_PER_LOG_CYCLE)
        .isCloseTo(0.686844947688048871, within(1e-12));
  }

  @Test
  @DisplayName(
      "Second formula: T U'(T) from Terzaghi's derivative is stationary at T_I (central difference)"
          + " and largest there")
  void inflectionIsTheSteepestPointOfTerzaghi() {
    double ti = InflectionPointMethod.INFLECTION_TIME_FACTOR;
    double h = 1e-5;
    double up = (ti + h) * Terzaghi.averageDegreeDerivative(ti + h);
    double down = (ti - h) * Terzaghi.averageDegreeDerivative(ti - h);
    double at = ti * Terzaghi.averageDegreeDerivative(ti);
    assertThat((up - down) / (2 * h)).isCloseTo(0, within(1e-9));
    assertThat(at).isGreaterThan(up).isGreaterThan(down);
    assertThat(InflectionPointMethod.inflectionCondition(ti)).isCloseTo(0, within(1e-14));
  }

  @Test
  @DisplayName(
      "Exact curves (our forward model, mpmath-checked): c_v within 0.1 % at 80 readings a cycle"
          + " and within 0.3 % at 20; d0 and d100 within 0.5 % of d_p")
  void exactCurves() {
    for (double cvPerYear : new double[] {0.3, 2, 10, 60}) {
      double cv = cvPerYear / ExactCurves.YEAR;
      CurveParameters truth = CurveParameters.of(0.02e-3, 0.5e-3, cv, 0);
      InflectionPointResult dense =
          InflectionPointMethod.fit(
              ExactCurves.curve(ExactCurves.logTimes(cv, 1e-3, 5, 80), truth), H);
      assertThat(dense.cv() / cv - 1).as("dense, %s m^2/yr", cvPerYear).isCloseTo(0, within(1e-3));
      assertThat(dense.d0()).isCloseTo(0.02e-3, within(0.005 * 0.5e-3));
      assertThat(dense.d100()).isCloseTo(0.52e-3, within(0.005 * 0.5e-3));
      assertThat(dense.warnings()).isEmpty();
      InflectionPointResult sparser =
          InflectionPointMethod.fit(
              ExactCurves.curve(ExactCurves.logTimes(cv, 1e-3, 5, 20), truth), H);
      assertThat(sparser.cv() / cv - 1).as("20 a cycle").isCloseTo(0, within(3e-3));
    }
  }

  @Test
  @DisplayName("Geometry: the tangent runs from d0 to d100 through the inflection point")
  void geometry() {
    double cv = 2 / ExactCurves.YEAR;
    InflectionPointResult r = InflectionPointMethod.fit(ExactCurves.dense(cv, 0), H);
    PlotPoint a = r.tangentLine().get(0);
    PlotPoint b = r.tangentLine().get(1);
    PlotPoint p = r.inflectionPoint();
    assertThat(a.y()).isEqualTo(r.d0());
    assertThat(b.y()).isEqualTo(r.d100());
    double slope = (b.y() - a.y()) / (b.x() - a.x());
    assertThat(slope).isCloseTo(r.slopePerLogCycle(), within(1e-9 * r.slopePerLogCycle()));
    assertThat(a.y() + slope * (p.x() - a.x())).isCloseTo(p.y(), within(1e-12));
    assertThat(Math.pow(10, p.x()))
        .isCloseTo(r.inflectionTime(), within(1e-9 * r.inflectionTime()));
    assertThat(r.readingsUsed()).hasSizeGreaterThanOrEqualTo(7);
    assertThat(r.method()).isEqualTo(CvMethod.INFLECTION_POINT);
    assertThat(r.toString()).startsWith("InflectionPointResult[cv 2.00");
  }

  @Test
  @DisplayName(
      "Usual 14-reading lab schedule (FACTS.md, from memory), exact Terzaghi curves from the"
          + " theory module with T at 24 h from 2 to 50, d_i 0 / 10 % of d_p, secondary slope 0 / 2"
          + " % of d_p per cycle: the inflection of a natural spline gives c_v within 7 % (measured"
          + " up to 6.1 %), always with the sparse-readings warning")
  void labSchedule() {
    double worst = 0;
    for (double lastT : LabScheduleCurves.lastTimeFactors(2, 50, 40)) {
      for (double initial : new double[] {0, 0.10}) {
        for (double secondary : new double[] {0, 0.02}) {
          InflectionPointResult r =
              InflectionPointMethod.fit(LabScheduleCurves.curve(lastT, initial, secondary), H);
          double error = r.cv() / LabScheduleCurves.cv(lastT) - 1;
          assertThat(error)
              .as("T %s, d_i %s, s %s", lastT, initial, secondary)
              .isCloseTo(0, within(0.07));
          worst = Math.max(worst, Math.abs(error));
          assertThat(r.hasWarning(FitWarning.Kind.FEW_READINGS_IN_RANGE)).isTrue();
        }
      }
    }
    assertThat(worst).isGreaterThan(0.05);
  }

  @Test
  @DisplayName(
      "Lab schedule with T at 24 h of 1.0 to 1.8: on sparse readings the inflection needs readings"
          + " to T = 2 (a spline's inflection was up to 15 % off there): FitException")
  void labScheduleEndingEarly() {
    for (double lastT : new double[] {1.0, 1.3, 1.6, 1.8}) {
      SettlementCurve c = LabScheduleCurves.curve(lastT, 0, 0);
      assertThatThrownBy(() -> InflectionPointMethod.fit(c, H))
          .as("T = %s", lastT)
          .isInstanceOf(FitException.class)
          .hasMessageContaining("sparse");
    }
  }

  @Test
  @DisplayName(
      "Incomplete curves (ending at U = 59 % and 76 %): no inflection, FitException (Mesri,"
          + " Geotechnique 63(10): flag rather than return a number)")
  void incompleteCurve() {
    double cv = 2 / ExactCurves.YEAR;
    for (double lastT : new double[] {0.3, 0.5}) {
      SettlementCurve c =
          ExactCurves.curve(
              ExactCurves.logTimes(cv, 1e-3, lastT, 80), CurveParameters.of(0, 0.5e-3, cv, 0));
      assertThatThrownBy(() -> InflectionPointMethod.fit(c, H))
          .isInstanceOf(FitException.class)
          .hasMessageContaining("primary consolidation may not be complete");
    }
  }

  @Test
  @DisplayName("Curve ending at U = 85 %: c_v still found, readings-end warning")
  void endsBeforeNinety() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve c =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 1e-3, 0.7, 80), CurveParameters.of(0, 0.5e-3, cv, 0));
    InflectionPointResult r = InflectionPointMethod.fit(c, H);
    assertThat(r.cv() / cv - 1).isCloseTo(0, within(2e-3));
    assertThat(r.hasWarning(FitWarning.Kind.READINGS_END_BEFORE_RANGE)).isTrue();
  }

  @Test
  void rejectsBadInput() {
    SettlementCurve good = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    assertThatThrownBy(() -> InflectionPointMethod.fit(good, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> InflectionPointMethod.fit(good, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (NaN m) must be finite and > 0");
    SettlementCurve few =
        SettlementCurve.of(
            new double[] {0, 6, 15, 30, 60, 120, 240, 480},
            new double[] {0, 1e-5, 2e-5, 3e-5, 4e-5, 5e-5, 6e-5, 7e-5});
    assertThatThrownBy(() -> InflectionPointMethod.fit(few, H))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "7 readings after t = 0 are too few for the inflection point method (needs at least"
                + " 8)");
    SettlementCurve flat = SettlementCurve.of(good.elapsedSeconds(), new double[good.size()]);
    assertThatThrownBy(() -> InflectionPointMethod.fit(flat, H))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("the readings do not move");
    assertThatThrownBy(() -> InflectionPointMethod.fit(null, H))
        .isInstanceOf(IllegalArgumentException.class);
    assertThatThrownBy(() -> InflectionPointOptions.defaults().withWindowHalfWidth(Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("window half-width (NaN log10 cycles) must be in [0.05, 1]");
    assertThatThrownBy(() -> InflectionPointOptions.defaults().withMinimumWindowReadings(5))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("minimum readings in a window (5) must be in [6, 50]");
  }

  @Test
  @DisplayName("Swelling: the negated curve gives the same c_v, negated settlements, a warning")
  void swelling() {
    SettlementCurve up = ExactCurves.dense(2 / ExactCurves.YEAR, 0.01e-3);
    InflectionPointResult a = InflectionPointMethod.fit(up, H);
    InflectionPointResult b = InflectionPointMethod.fit(ExactCurves.negated(up), H);
    assertThat(b.cv()).isCloseTo(a.cv(), within(1e-12 * a.cv()));
    assertThat(b.d100()).isCloseTo(-a.d100(), within(1e-15));
    assertThat(b.slopePerLogCycle()).isCloseTo(-a.slopePerLogCycle(), within(1e-15));
    assertThat(b.hasWarning(FitWarning.Kind.SWELLING_INCREMENT)).isTrue();
  }

  @Test
  @DisplayName("A zero reading is left out with a warning and does not change c_v")
  void zeroReading() {
    SettlementCurve c = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    double[] t = new double[c.size() + 1];
    double[] d = new double[c.size() + 1];
    System.arraycopy(c.elapsedSeconds(), 0, t, 1, c.size());
    System.arraycopy(c.settlementMetres(), 0, d, 1, c.size());
    d[0] = 0.05e-3;
    InflectionPointResult with = InflectionPointMethod.fit(SettlementCurve.of(t, d), H);
    assertThat(with.cv()).isEqualTo(InflectionPointMethod.fit(c, H).cv());
    assertThat(with.hasWarning(FitWarning.Kind.ZERO_READING_IGNORED)).isTrue();
  }
}
