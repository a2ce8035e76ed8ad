package org.oedometry.theory;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.quicktheories.core.Gen;

/**
 * Property-based tests of the field forecast (QuickTheories, fixed seed so that CI is
 * reproducible), over layers far outside engineering practice but inside the contract (finite
 * thickness and c<sub>v</sub> &gt; 0).
 */
class ClayLayerProperties {

  private static final long SEED = 20261202L;

  /** A positive double log-uniform over [10^low, 10^high]. */
  private static Gen<Double> logUniform(double low, double high) {
    return doubles().between(low, high).map(e -> Math.pow(10, e));
  }

  private static Gen<Drainage> drainages() {
    return integers().between(0, 1).map(i -> i == 0 ? Drainage.DOUBLE : Drainage.SINGLE);
  }

  @Test
  @DisplayName(
      "Round trips on layers from 1e-145 m to 1e145 m and c_v from 1e-290 to 1e290 m^2/s:"
          + " U -> t -> U to 1e-13, s -> t -> s to 1e-13 s_ult, t -> U -> t to the conditioning"
          + " of T(U) (as TerzaghiProperties), timeToSettlement(U s_ult) = timeToDegree(U)")
  void roundTrips() {
    qt().withFixedSeed(SEED)
        .withExamples(3000)
        .forAll(
            doubles().between(-145, 145),
            drainages(),
            doubles().between(-145, 145),
            logUniform(-3, -0.005))
        .checkAssert(
            (thicknessExponent, drainage, relativeExponent, degree) -> {
              // log10 c_v = log10 H + r, so that log10 t = log10 T + log10 H - r (+ a constant)
              // stays inside the double range.
              double thickness = Math.pow(10, thicknessExponent);
              double cv = Math.pow(10, thicknessExponent + relativeExponent);
              ClayLayer layer = ClayLayer.of(thickness, drainage, cv, 0.25);
              double time = layer.timeToDegree(degree);
              assertThat(time).isPositive().isLessThan(Double.POSITIVE_INFINITY);
              assertThat(layer.degreeAt(time)).isCloseTo(degree, within(1e-13));
              double settlement = 0.25 * degree;
              double toSettlement = layer.timeToSettlement(settlement);
              assertThat(toSettlement / time - 1).isCloseTo(0.0, within(1e-12));
              assertThat(layer.settlementAt(toSettlement)).isCloseTo(settlement, within(2.5e-14));

              // t -> U -> t, with the conditioning of T(U) at this U (see TerzaghiProperties).
              double t = layer.timeFactorAt(time);
              double u = layer.degreeAt(time);
              double condition = Math.max(2, u / (t * Terzaghi.averageDegreeDerivative(t)));
              assertThat(layer.timeToDegree(u) / time - 1)
                  .isCloseTo(0.0, within(4e-16 * condition + 1e-14));
            });
  }

  @Test
  @DisplayName(
      "Similarity, exact: T = c_v t / H_dr^2 is unchanged when H is scaled by 2^a, c_v by 2^b and"
          + " t by 2^(2a - b) (Terzaghi's time factor is dimensionless; power-of-two scaling is"
          + " exact in binary floating point), for H_dr^2 far beyond the double range")
  void similarityIsExact() {
    qt().withFixedSeed(SEED)
        .withExamples(3000)
        .forAll(
            logUniform(-1, 2),
            logUniform(-10, -5),
            doubles().between(0.01, 0.99),
            integers()
                .between(-980, 1010)
                .zip(integers().between(-950, 950), (b, dd) -> new int[] {b, dd}))
        .checkAssert(
            (thickness, cv, degree, exponents) -> {
              // b scales c_v, a the thickness, d = 2a - b the time; each result stays normal.
              int b = exponents[0];
              int a = Math.floorDiv(b + exponents[1], 2);
              int d = 2 * a - b;
              ClayLayer base = ClayLayer.of(thickness, Drainage.DOUBLE, cv, 0.1);
              ClayLayer scaled =
                  ClayLayer.of(Math.scalb(thickness, a), Drainage.DOUBLE, Math.scalb(cv, b), 0.1);
              double time = base.timeToDegree(degree);
              assertThat(scaled.timeToDegree(degree)).isEqualTo(Math.scalb(time, d));
              assertThat(scaled.timeFactorAt(Math.scalb(time, d)))
                  .isEqualTo(base.timeFactorAt(time));
              assertThat(scaled.degreeAt(Math.scalb(time, d))).isEqualTo(base.degreeAt(time));
            });
  }

  @Test
  @DisplayName(
      "degreeAt is total on legal input: U in [0, 1], U(0) = 0, U(+inf) = 1 (Terzaghi's U(T)"
          + " limits) and non-decreasing in t, for any finite thickness and c_v > 0")
  void degreeIsTotalAndMonotone() {
    qt().withFixedSeed(SEED)
        .withExamples(3000)
        .forAll(logUniform(-307, 308), drainages(), logUniform(-307, 308), logUniform(-307, 307))
        .checkAssert(
            (thickness, drainage, cv, time) -> {
              ClayLayer layer = ClayLayer.of(thickness, drainage, cv, 1.0);
              assertThat(layer.degreeAt(0)).isZero();
              assertThat(layer.timeFactorAt(0)).isZero();
              assertThat(layer.degreeAt(Double.POSITIVE_INFINITY)).isEqualTo(1.0);
              double u = layer.degreeAt(time);
              assertThat(u).isBetween(0.0, 1.0);
              assertThat(layer.degreeAt(2 * time)).isGreaterThanOrEqualTo(u);
              assertThat(layer.settlementAt(time)).isBetween(0.0, 1.0);
            });
  }
}
