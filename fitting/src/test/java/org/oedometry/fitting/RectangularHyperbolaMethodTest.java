package org.oedometry.fitting;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.oedometry.core.SettlementCurve;
import org.oedometry.theory.CurveParameters;
import org.oedometry.theory.Terzaghi;

class RectangularHyperbolaMethodTest {

  static final double H = ExactCurves.DRAINAGE_PATH;

  @Test
  @DisplayName(
      "M and C: about 0.8215 and 0.2436 (FACTS.md, sampled at 1 % steps of U) and the mpmath"
          + " values of our continuous least squares over U (further_constants.py)")
  void constants() {
    // FACTS.md quotes M = 0.8215, C = 0.2436 from a least-squares fit over 60-90 %; the fit's
    // sampling moves the fourth digit (mpmath: 1 % steps in U give 0.82144 and 0.24370).
    assertThat(RectangularHyperbolaMethod.HYPERBOLA_SLOPE).isCloseTo(0.8215, within(1.5e-3));
    assertThat(RectangularHyperbolaMethod.HYPERBOLA_INTERCEPT).isCloseTo(0.2436, within(1.0e-3));
    // mpmath, 30 digits, U uniform over [0.6, 0.9].
    assertThat(RectangularHyperbolaMethod.HYPERBOLA_SLOPE)
        .isCloseTo(0.820644736233343366, within(1e-12));
    assertThat(RectangularHyperbolaMethod.HYPERBOLA_INTERCEPT)
        .isCloseTo(0.244087790253974911, within(1e-12));
  }

  @Test
  @DisplayName(
      "Second formula: T/U from Terzaghi stays within 0.4 % of M T + C over 60-90 %"
          + " (Sridharan & Sreepada Rao 1981: linear there)")
  void hyperbolaIsNearlyLinear() {
    for (int percent = 60; percent <= 90; percent++) {
      double u = percent / 100.0;
      double t = Terzaghi.timeFactor(u);
      double line =
          RectangularHyperbolaMethod.HYPERBOLA_SLOPE * t
              + RectangularHyperbolaMethod.HYPERBOLA_INTERCEPT;
      assertThat(line / (t / u) - 1).as("U = %d %%", percent).isCloseTo(0, within(4e-3));
    }
  }

  @Test
  @DisplayName(
      "Exact dense curves (our forward model, mpmath-checked): c_v within 0.3 %, d100 within 0.2"
          + " % of d_p")
  void exactCurves() {
    for (double cvPerYear : new double[] {0.3, 2, 10, 60}) {
      double cv = cvPerYear / ExactCurves.YEAR;
      RectangularHyperbolaResult r = RectangularHyperbolaMethod.fit(ExactCurves.dense(cv, 0), H);
      assertThat(r.cv() / cv - 1).as("%s m^2/yr", cvPerYear).isCloseTo(0, within(3e-3));
      assertThat(r.d100()).isCloseTo(0.5e-3, within(0.002 * 0.5e-3));
      assertThat(r.t60() * cv / (H * H)).isCloseTo(Terzaghi.timeFactor(0.6), within(0.003));
      assertThat(r.warnings()).isEmpty();
      assertThat(r.readingsUsed()).hasSizeGreaterThan(30);
    }
  }

  @Test
  @DisplayName("Lab schedule (FACTS.md, from memory): c_v within 2 %")
  void labSchedule() {
    double cv = 2 / ExactCurves.YEAR;
    double[] minutes = {0.1, 0.25, 0.5, 1, 2, 4, 8, 15, 30, 60, 120, 240, 480, 1440};
    double[] t = new double[minutes.length];
    for (int i = 0; i < t.length; i++) {
      t[i] = 60 * minutes[i];
    }
    RectangularHyperbolaResult r =
        RectangularHyperbolaMethod.fit(
            ExactCurves.curve(t, CurveParameters.of(0, 0.5e-3, cv, 0)), H);
    assertThat(r.cv() / cv - 1).isCloseTo(0, within(0.02));
    assertThat(r.hasWarning(FitWarning.Kind.FEW_READINGS_IN_RANGE)).isTrue();
  }

  @Test
  @DisplayName("Geometry: the line passes through t/d = m t + c at t60 and t90")
  void geometry() {
    RectangularHyperbolaResult r =
        RectangularHyperbolaMethod.fit(ExactCurves.dense(2 / ExactCurves.YEAR, 0), H);
    PlotPoint a = r.fittedLine().get(0);
    PlotPoint b = r.fittedLine().get(1);
    assertThat(a.x()).isEqualTo(r.t60());
    assertThat(b.x()).isEqualTo(r.t90());
    assertThat(a.y()).isCloseTo(r.slope() * r.t60() + r.intercept(), within(1e-9 * a.y()));
    assertThat(r.d100())
        .isCloseTo(RectangularHyperbolaMethod.HYPERBOLA_SLOPE / r.slope(), within(1e-15));
    assertThat(r.method()).isEqualTo(CvMethod.RECTANGULAR_HYPERBOLA);
    assertThat(r.toString()).startsWith("RectangularHyperbolaResult[cv 2.00");
  }

  @Test
  @DisplayName("Incomplete curves (ending at U = 25 %, 59 %, 76 %): FitException")
  void incompleteCurve() {
    double cv = 2 / ExactCurves.YEAR;
    for (double lastT : new double[] {0.05, 0.3, 0.5}) {
      SettlementCurve c =
          ExactCurves.curve(
              ExactCurves.logTimes(cv, 1e-3, lastT, 80), CurveParameters.of(0, 0.5e-3, cv, 0));
      assertThatThrownBy(() -> RectangularHyperbolaMethod.fit(c, H))
          .as("ending at T = %s", lastT)
          .isInstanceOf(FitException.class);
    }
  }

  @Test
  void rejectsBadInput() {
    SettlementCurve good = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    assertThatThrownBy(() -> RectangularHyperbolaMethod.fit(good, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> RectangularHyperbolaMethod.fit(good, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (NaN m) must be finite and > 0");
    SettlementCurve few =
        SettlementCurve.of(
            new double[] {0, 6, 15, 30, 60}, new double[] {0, 1e-5, 2e-5, 3e-5, 4e-5});
    assertThatThrownBy(() -> RectangularHyperbolaMethod.fit(few, H))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage(
            "4 readings after t = 0 are too few for the rectangular hyperbola method (needs at"
                + " least 5)");
    SettlementCurve flat = SettlementCurve.of(good.elapsedSeconds(), new double[good.size()]);
    assertThatThrownBy(() -> RectangularHyperbolaMethod.fit(flat, H))
        .isInstanceOf(FitException.class)
        .hasMessageContaining("the readings do not move");
  }

  @Test
  @DisplayName("Swelling: the negated curve gives the same c_v, a negated d100 and a warning")
  void swelling() {
    SettlementCurve up = ExactCurves.dense(2 / ExactCurves.YEAR, 0);
    RectangularHyperbolaResult a = RectangularHyperbolaMethod.fit(up, H);
    RectangularHyperbolaResult b = RectangularHyperbolaMethod.fit(ExactCurves.negated(up), H);
    assertThat(b.cv()).isCloseTo(a.cv(), within(1e-12 * a.cv()));
    assertThat(b.d100()).isCloseTo(-a.d100(), within(1e-15));
    assertThat(b.hasWarning(FitWarning.Kind.SWELLING_INCREMENT)).isTrue();
  }
}
