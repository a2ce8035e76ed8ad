package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Terzaghi;

class EarlySlopeMethodTest {

  static final double H = ExactCurves.DRAINAGE_PATH;
  static final EarlySlopeOptions LAST =
      EarlySlopeOptions.defaults().withPrimaryEnd(EarlySlopeOptions.PrimaryEnd.LAST_READING);

  @Test
  @DisplayName(
      "Second formula: the short-time form U = 2 sqrt(T/pi) (FACTS.md [exact], image correction"
          + " below 1e-18 at T = 0.02) gives back c_v ="
          + " (pi/4) H^2 (S/d_p)^2 from Terzaghi's own U")
  void formulaFromShortTimeForm() {
    double cv = 3 / ExactCurves.YEAR;
    double t = 20;
    double timeFactor = cv * t / (H * H);
    assertThat(timeFactor).isLessThan(0.03);
    // slope of U against sqrt(t) at small T, with d_p = 1
    double slope = Terzaghi.averageDegree(timeFactor) / Math.sqrt(t);
    assertThat(Math.PI / 4 * H * H * slope * slope / cv - 1).isCloseTo(0, within(1e-12));
  }

  @Test
  @DisplayName(
      "Exact dense curves (our forward model, mpmath-checked): c_v within 0.3 % with d100 from the"
          + " hyperbola, within 0.1 % with the last reading (T = 5, U = 1 - 4e-6)")
  void exactCurves() {
    for (double cvPerYear : new double[] {0.3, 2, 10, 60}) {
      double cv = cvPerYear / ExactCurves.YEAR;
      SettlementCurve c = ExactCurves.dense(cv, 0);
      EarlySlopeResult r = EarlySlopeMethod.fit(c, H);
      assertThat(r.cv() / cv - 1).as("%s m^2/yr", cvPerYear).isCloseTo(0, within(3e-3));
      assertThat(r.d0()).isCloseTo(0, within(1e-3 * 0.5e-3));
      assertThat(r.t50() * cv / (H * H)).isCloseTo(Terzaghi.TIME_FACTOR_50, within(2e-3));
      assertThat(r.warnings()).isEmpty();
      EarlySlopeResult last = EarlySlopeMethod.fit(c, H, LAST);
      assertThat(last.cv() / cv - 1).isCloseTo(0, within(1e-3));
      assertThat(last.primaryEnd()).isEqualTo(EarlySlopeOptions.PrimaryEnd.LAST_READING);
    }
  }

  @Test
  @DisplayName("Initial compression: d0 is the early line's intercept, c_v within 0.5 %")
  void initialCompression() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve c = ExactCurves.dense(cv, 0.02e-3);
    EarlySlopeResult r = EarlySlopeMethod.fit(c, H, LAST);
    assertThat(r.d0()).isCloseTo(0.02e-3, within(1e-3 * 0.5e-3));
    assertThat(r.primaryCompression()).isCloseTo(0.5e-3, within(1e-3 * 0.5e-3));
    assertThat(r.cv() / cv - 1).isCloseTo(0, within(5e-3));
  }

  @Test
  @DisplayName(
      "Initial compression 4 % and 10 % of d_p with the default d100 (the hyperbola counts from the"
          + " same corrected zero): c_v within the dense tolerance of 0.3 % (exact dense curves)")
  void initialCompressionWithHyperbola() {
    for (double fraction : new double[] {0.04, 0.10}) {
      double cv = 2 / ExactCurves.YEAR;
      EarlySlopeResult r = EarlySlopeMethod.fit(ExactCurves.dense(cv, fraction * 0.5e-3), H);
      assertThat(r.cv() / cv - 1).as("d_i %s d_p", fraction).isCloseTo(0, within(3e-3));
      assertThat(r.d0()).isCloseTo(fraction * 0.5e-3, within(1e-3 * 0.5e-3));
    }
  }

  @Test
  @DisplayName(
      "Usual 14-reading lab schedule (FACTS.md, from memory), exact Terzaghi curves from the"
          + " theory module with T at 24 h from 2 to 50, d_i 0 / 4 % / 10 % of d_p, secondary slope"
          + " 0 / 2 % of d_p per cycle: c_v within 2.5 % (measured up to 2.2 %), with the"
          + " hyperbola's warning")
  void labSchedule() {
    double worst = 0;
    for (double lastT : LabScheduleCurves.lastTimeFactors(2, 50, 40)) {
      for (double initial : new double[] {0, 0.04, 0.10}) {
        for (double secondary : new double[] {0, 0.02}) {
          EarlySlopeResult r =
              EarlySlopeMethod.fit(LabScheduleCurves.curve(lastT, initial, secondary), H);
          double error = r.cv() / LabScheduleCurves.cv(lastT) - 1;
          assertThat(error)
              .as("T %s, d_i %s, s %s", lastT, initial, secondary)
              .isCloseTo(0, within(0.025));
          worst = Math.max(worst, Math.abs(error));
          assertThat(r.warnings()).isNotEmpty();
        }
      }
    }
    assertThat(worst).isGreaterThan(0.015);
  }

  @Test
  @DisplayName(
      "Lab schedule, T at 24 h of 1.2 (the hyperbola has too few readings to interpolate):"
          + " FitException from the default, never a value")
  void labScheduleIncomplete() {
    SettlementCurve c = LabScheduleCurves.curve(1.2, 0.04, 0);
    assertThatThrownBy(() -> EarlySlopeMethod.fit(c, H))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("rectangular hyperbola");
  }

  @Test
  @DisplayName(
      "Only 2 readings before 50 % (T = 0.1 and 0.15), 3 before 60 %: the early line uses the"
          + " readings before 60 %, with a warning; c_v within 3 % (the square-root law is 1.3 %"
          + " off at 60 %, FACTS.md)")
  void fewEarlyReadingsWidenTheWindow() {
    double cv = 2 / ExactCurves.YEAR;
    double h2 = H * H;
    double[] factors = {0.1, 0.15, 0.25, 0.4, 0.6, 1, 2, 5};
    double[] t = new double[factors.length];
    for (int i = 0; i < t.length; i++) {
      t[i] = factors[i] * h2 / cv;
    }
    SettlementCurve c = ExactCurves.curve(t, CurveParameters.of(0, 0.5e-3, cv, 0));
    EarlySlopeResult r = EarlySlopeMethod.fit(c, H, LAST);
    assertThat(r.hasWarning(FitWarning.Kind.FEW_EARLY_READINGS)).isTrue();
    assertThat(r.readingsUsed()).hasSize(3);
    assertThat(r.cv() / cv - 1).isCloseTo(0, within(0.03));
  }

  @Test
  @DisplayName(
      "Documented bias: with secondary compression the last reading overstates d_p and c_v comes"
          + " out low")
  void lastReadingBiasWithSecondary() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve c =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 1e-3, 50, 40), CurveParameters.of(0, 0.5e-3, cv, 0.05e-3));
    EarlySlopeResult r = EarlySlopeMethod.fit(c, H, LAST);
    assertThat(r.cv()).isLessThan(0.9 * cv);
  }

  @Test
  @DisplayName("Geometry: the early line runs from (0, d0) to d100")
  void geometry() {
    EarlySlopeResult r = EarlySlopeMethod.fit(ExactCurves.dense(2 / ExactCurves.YEAR, 0), H);
    PlotPoint a = r.earlyLine().get(0);
    PlotPoint b = r.earlyLine().get(1);
    assertThat(a.x()).isZero();
    assertThat(a.y()).isEqualTo(r.d0());
    assertThat(b.y()).isEqualTo(r.d100());
    assertThat((b.y() - a.y()) / b.x()).isCloseTo(r.earlySlope(), within(1e-9 * r.earlySlope()));
    assertThat(r.method()).isEqualTo(CvMethod.EARLY_SLOPE);
    assertThat(r.toString()).startsWith("EarlySlopeResult[cv 2.00");
  }

  @Test
  @DisplayName(
      "Incomplete curve (ending at U = 59 %): the hyperbola cannot give d100, FitException")
  void incompleteCurve() {
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve c =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 1e-3, 0.3, 80), CurveParameters.of(0, 0.5e-3, cv, 0));
    assertThatThrownBy(() -> EarlySlopeMethod.fit(c, H))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("rectangular hyperbola");
  }

  @Test
  void rejectsBadInput() {
    SettlementCurve good = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    assertThatThrownBy(() -> EarlySlopeMethod.fit(good, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> EarlySlopeMethod.fit(good, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (NaN m) must be finite and > 0");
    SettlementCurve few =
        SettlementCurve.of(
            new double[] {0, 6, 15, 30, 60, 120}, new double[] {0, 1e-5, 2e-5, 3e-5, 4e-5, 5e-5});
    assertThatThrownBy(() -> EarlySlopeMethod.fit(few, H))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "5 readings after t = 0 are too few for the early-slope method (needs at least 6)");
    assertThatThrownBy(() -> new EarlySlopeOptions(null)).isInstanceOf(NullPointerException.class);
    // Readings that start after 50 % consolidation: no early line.
    double cv = 2 / ExactCurves.YEAR;
    SettlementCurve late =
        ExactCurves.curve(
            ExactCurves.logTimes(cv, 0.3, 5, 20), CurveParameters.of(0, 0.5e-3, cv, 0));
    assertThatThrownBy(() -> EarlySlopeMethod.fit(late, H, LAST))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("before 50 % consolidation")
        .hasMessageContaining("before 60 %");
  }

  @Test
  @DisplayName("Swelling: the negated curve gives the same c_v, negated settlements, a warning")
  void swelling() {
    SettlementCurve up = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    EarlySlopeResult a = EarlySlopeMethod.fit(up, H);
    EarlySlopeResult b = EarlySlopeMethod.fit(ExactCurves.negated(up), H);
    assertThat(b.cv()).isCloseTo(a.cv(), within(1e-12 * a.cv()));
    assertThat(b.d100()).isCloseTo(-a.d100(), within(1e-15));
    assertThat(b.earlySlope()).isCloseTo(-a.earlySlope(), within(1e-15));
    assertThat(b.hasWarning(FitWarning.Kind.SWELLING_INCREMENT)).isTrue();
  }
}
