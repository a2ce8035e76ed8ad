package org.oedometry.theory;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import org.apache.commons.math3.analysis.differentiation.DerivativeStructure;
import org.apache.commons.math3.analysis.differentiation.FiniteDifferencesDifferentiator;
import org.apache.commons.math3.analysis.differentiation.UnivariateDifferentiableFunction;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ConsolidationCurveModelTest {

  private static final double YEAR = ClayLayer.SECONDS_PER_JULIAN_YEAR;
  private static final ConsolidationCurveModel MODEL = ConsolidationCurveModel.of(0.0095);
  private static final CurveParameters PARAMETERS =
      CurveParameters.of(0.05e-3, 0.80e-3, 2.0 / YEAR, 0.04e-3);

  @Test
  @DisplayName("Settlement is d_i + d_p U(T) + s log10(1 + T/T_s), term by term")
  void settlementFormula() {
    double t = 600;
    double ratio =
        2.0 / YEAR * t / (0.0095 * 0.0095) / ConsolidationCurveModel.DEFAULT_SECONDARY_ONSET;
    double expected =
        0.05e-3
            + 0.80e-3
                * Terzaghi.averageDegree(ratio * ConsolidationCurveModel.DEFAULT_SECONDARY_ONSET)
            + 0.04e-3 * Math.log10(1 + ratio);
    assertThat(MODEL.settlement(t, PARAMETERS)).isCloseTo(expected, within(1e-18));
    assertThat(MODEL.secondarySettlement(t, PARAMETERS))
        .isCloseTo(0.04e-3 * Math.log10(1 + ratio), within(1e-19));
    assertThat(MODEL.settlement(0, PARAMETERS)).isEqualTo(0.05e-3);
    assertThat(PARAMETERS.endOfPrimarySettlement()).isCloseTo(0.85e-3, within(1e-18));
  }

  @Test
  @DisplayName(
      "Analytic gradient matches a finite-difference derivative"
          + " [Commons Math FiniteDifferencesDifferentiator, 8 points]")
  void gradientMatchesFiniteDifferences() {
    FiniteDifferencesDifferentiator differentiator = new FiniteDifferencesDifferentiator(8, 1e-3);
    double[] gradient = new double[4];
    for (double t = 6; t < 2e5; t *= 2.5) {
      final double seconds = t;
      double value = MODEL.settlementAndGradient(seconds, PARAMETERS, gradient);
      assertThat(value).isEqualTo(MODEL.settlement(seconds, PARAMETERS));
      double[] numeric = {
        derivative(differentiator, x -> MODEL.settlement(seconds, with(0, x)), 0.05e-3),
        derivative(differentiator, x -> MODEL.settlement(seconds, with(1, x)), 0.80e-3),
        derivative(
            differentiator,
            x -> MODEL.settlement(seconds, with(2, Math.exp(x))),
            Math.log(2.0 / YEAR)),
        derivative(differentiator, x -> MODEL.settlement(seconds, with(3, x)), 0.04e-3)
      };
      for (int i = 0; i < 4; i++) {
        double scale = Math.max(Math.abs(numeric[i]), 1e-6);
        assertThat(gradient[i])
            .as("parameter %d at t = %s s", i, seconds)
            .isCloseTo(numeric[i], within(1e-8 * scale));
      }
    }
  }

  @Test
  @DisplayName("Secondary term vanishes early and becomes s per log10 cycle late")
  void secondaryTermShape() {
    qt().withFixedSeed(7L)
        .withExamples(300)
        .forAll(doubles().between(-6, -1.31), doubles().between(1e-6, 1e-3))
        .checkAssert(
            (e, slope) -> {
              CurveParameters p = CurveParameters.of(0, 1e-3, 1e-8, slope);
              double t = Math.pow(10, e) * 0.0095 * 0.0095 / 1e-8; // T = 10^e <= 0.049
              // log10(1 + x) <= x / ln 10: at most 2.1 % of s before T = 0.049.
              assertThat(MODEL.secondarySettlement(t, p)).isBetween(0.0, 0.0213 * slope);
            });
    CurveParameters p = CurveParameters.of(0, 1e-3, 1e-8, 2e-5);
    double primaryTime = 0.0095 * 0.0095 / 1e-8;
    double perCycle =
        MODEL.settlement(10_000 * primaryTime, p) - MODEL.settlement(1000 * primaryTime, p);
    assertThat(perCycle).isCloseTo(2e-5, within(2e-5 * 0.005));
  }

  @Test
  @DisplayName("Scaling time by k is the same curve with c_v / k (Terzaghi's scaling)")
  void timeScaling() {
    qt().withFixedSeed(11L)
        .withExamples(300)
        .forAll(doubles().between(0.01, 100), doubles().between(1, 1e5))
        .checkAssert(
            (k, t) -> {
              CurveParameters scaled =
                  CurveParameters.of(0.05e-3, 0.80e-3, 2.0 / YEAR / k, 0.04e-3);
              assertThat(MODEL.settlement(k * t, scaled))
                  .isCloseTo(MODEL.settlement(t, PARAMETERS), within(1e-15));
            });
  }

  @Test
  void rejectsBadInput() {
    assertThatThrownBy(() -> ConsolidationCurveModel.of(0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("drainage path (0.0 m) must be finite and > 0");
    assertThatThrownBy(() -> new ConsolidationCurveModel(0.01, Double.NaN))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("secondary onset time factor (NaN) must be finite and > 0");
    assertThatThrownBy(() -> MODEL.settlement(-1, PARAMETERS))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("elapsed time (-1.0 s) must be finite and >= 0");
    assertThatThrownBy(() -> MODEL.settlementAndGradient(1, PARAMETERS, new double[3]))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("gradient array length (3) must be >= 4");
    assertThatThrownBy(() -> CurveParameters.of(Double.NaN, 1, 1, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("initial settlement (NaN m) must be finite");
    assertThatThrownBy(() -> CurveParameters.of(0, 1, -1, 0))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("cv (-1.0 m^2/s) must be finite and > 0");
    assertThatThrownBy(() -> CurveParameters.of(0, 1, 1, Double.POSITIVE_INFINITY))
        .isInstanceOf(IllegalArgumentException.class)
        .hasMessage("secondary slope (Infinity m per log10 cycle) must be finite");
  }

  private static CurveParameters with(int index, double value) {
    double[] p = {0.05e-3, 0.80e-3, 2.0 / YEAR, 0.04e-3};
    p[index] = value;
    return CurveParameters.of(p[0], p[1], p[2], p[3]);
  }

  private static double derivative(
      FiniteDifferencesDifferentiator differentiator,
      java.util.function.DoubleUnaryOperator f,
      double at) {
    double step = Math.max(Math.abs(at), 1e-6) * 1e-3;
    FiniteDifferencesDifferentiator scaled = new FiniteDifferencesDifferentiator(8, step);
    UnivariateDifferentiableFunction g = scaled.differentiate(f::applyAsDouble);
    return g.value(new DerivativeStructure(1, 1, 0, at)).getPartialDerivative(1);
  }

  @Test
  @DisplayName(
      "ln(1 + x) by Goldberg's theorem 4: within 3 ulp of StrictMath.log1p (fdlibm, < 1 ulp) for x"
          + " from 1e-300 to 1e300 [java.lang.StrictMath as reference]")
  void logOnePlusAgainstStrictMath() {
    double worst = 0;
    for (double e = -300; e <= 300; e += 0.0137) {
      double x = Math.pow(10, e);
      double expected = StrictMath.log1p(x);
      worst =
          Math.max(
              worst,
              Math.abs(ConsolidationCurveModel.naturalLogOnePlus(x) - expected)
                  / Math.ulp(expected));
    }
    java.util.SplittableRandom random = new java.util.SplittableRandom(5);
    for (int k = 0; k < 200_000; k++) {
      double x = random.nextDouble() * 4;
      double expected = StrictMath.log1p(x);
      if (expected > 0) {
        worst =
            Math.max(
                worst,
                Math.abs(ConsolidationCurveModel.naturalLogOnePlus(x) - expected)
                    / Math.ulp(expected));
      }
    }
    assertThat(worst).as("largest error in ulp").isLessThanOrEqualTo(3);
    assertThat(ConsolidationCurveModel.naturalLogOnePlus(0)).isZero();
    assertThat(ConsolidationCurveModel.naturalLogOnePlus(Double.MAX_VALUE))
        .isEqualTo(Math.log(Double.MAX_VALUE));
  }

  @Test
  @DisplayName(
      "From T = 16 on the primary part of dd/dln c_v, d_p T U'(T), is dropped: the gradient stays"
          + " within 2.3e-16 d_p of the exact one [dU/dT from Terzaghi.averageDegreeDerivative]")
  void latePrimaryRateIsNegligible() {
    ConsolidationCurveModel.Curve curve = MODEL.curve(PARAMETERS);
    double[] gradient = new double[4];
    double timeFactorRate = PARAMETERS.cv() / (0.0095 * 0.0095);
    for (double t = 14 / timeFactorRate; t < 1e4 / timeFactorRate; t *= 1.01) {
      double value = curve.settlementAndGradient(t, gradient);
      double timeFactor = timeFactorRate * t;
      double ratio = timeFactor / ConsolidationCurveModel.DEFAULT_SECONDARY_ONSET;
      double exact =
          PARAMETERS.primarySettlement() * timeFactor * Terzaghi.averageDegreeDerivative(timeFactor)
              + PARAMETERS.secondarySlope() * ratio / ((1 + ratio) * Math.log(10));
      assertThat(gradient[2])
          .as("dd/dln c_v at T = %s", timeFactor)
          .isCloseTo(exact, within(2.3e-16 * PARAMETERS.primarySettlement() + 1e-15 * exact));
      assertThat(value).isEqualTo(curve.settlement(t));
      assertThat(value).isEqualTo(MODEL.settlement(t, PARAMETERS));
    }
  }

  @Test
  @DisplayName(
      "Over the whole double range of t, c_v, H_dr and T_s: a finite settlement and gradient, or"
          + " an IllegalArgumentException where c_v / (H^2 T_s) itself overflows (no NaN leaves the"
          + " library: project rule)")
  void finiteOverTheWholeDoubleRange() {
    qt().withFixedSeed(23L)
        .withExamples(3000)
        .forAll(
            doubles().between(-320, 308.25),
            doubles().between(-300, 300),
            doubles().between(-300, 300),
            doubles().between(-3, 3))
        .checkAssert(
            (logSeconds, logCv, logPath, logOnset) -> {
              double seconds = Math.pow(10, logSeconds);
              ConsolidationCurveModel model =
                  new ConsolidationCurveModel(Math.pow(10, logPath), Math.pow(10, logOnset));
              // log10 of c_v / (H^2 T_s), per second; the double range ends at 308.25.
              double logRate = logCv - 2 * logPath - logOnset;
              for (double slope : new double[] {0.0, 0.04e-3}) {
                CurveParameters p =
                    CurveParameters.of(0.05e-3, 0.80e-3, Math.pow(10, logCv), slope);
                if (logRate > 308.3) {
                  assertThatThrownBy(() -> model.settlement(seconds, p))
                      .isInstanceOf(IllegalArgumentException.class)
                      .hasMessageContaining("exceeds the double range");
                  continue;
                }
                if (logRate > 308.2) {
                  continue; // at the edge of the range either answer is right
                }
                double[] gradient = new double[4];
                double value = model.settlementAndGradient(seconds, p, gradient);
                assertThat(value).isFinite().isEqualTo(model.settlement(seconds, p));
                for (double entry : gradient) {
                  assertThat(entry).isFinite();
                }
                assertThat(model.secondarySettlement(seconds, p))
                    .isFinite()
                    .isGreaterThanOrEqualTo(0.0);
                assertThat(model.settlement(0.0, p)).isEqualTo(0.05e-3);
                assertThat(model.timeFactor(seconds, p.cv()))
                    .isNotNaN()
                    .isGreaterThanOrEqualTo(0.0);
              }
            });
  }

  @Test
  @DisplayName(
      "Where c_v t / (H^2 T_s) overflows, the secondary term continues ln(1 + x) = ln x"
          + " [log of a product = sum of logs]")
  void secondaryTermBeyondTheDoubleRange() {
    // c_v / H^2 = 1e10 / 1e-4 = 1e14 per second, T_s = 2: x overflows from t of about 3.6e294 s.
    ConsolidationCurveModel model = ConsolidationCurveModel.of(0.01);
    CurveParameters p = CurveParameters.of(0, 1e-3, 1e10, 1e-5);
    double justBelow = Double.MAX_VALUE / (1e14 / 2) * 0.999;
    double justAbove = justBelow * 1.002;
    double below = model.secondarySettlement(justBelow, p);
    double above = model.secondarySettlement(justAbove, p);
    // log10 of the product changes by log10(1.002 / 0.999) ... across the boundary.
    assertThat(above - below)
        .isCloseTo(1e-5 * Math.log10(1.002), within(1e-5 * Math.log10(1.002) * 1e-9));
    assertThat(above)
        .isCloseTo(
            1e-5 * (Math.log10(1e14 / 2) + Math.log10(justAbove)), within(1e-5 * 1e-14 * 700));
    double[] gradient = new double[4];
    model.settlementAndGradient(justAbove, p, gradient);
    // d(s log10(1 + x)) / d ln c_v -> s / ln 10 as x grows; the primary part is 0 at such T.
    assertThat(gradient[2]).isEqualTo(1e-5 / Math.log(10));
    assertThat(gradient[3]).isCloseTo(above / 1e-5, within(1e-12));
  }
}
