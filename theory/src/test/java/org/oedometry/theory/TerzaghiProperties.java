package org.oedometry.theory;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.quicktheories.core.Gen;

/** Property-based tests (QuickTheories, fixed seed so that CI is reproducible). */
class TerzaghiProperties {

  private static final long SEED = 20261201L;

  /** T log-spaced over [1e-12, 20]. */
  private static Gen<Double> timeFactors() {
    return doubles().between(-12, Math.log10(20)).map(e -> Math.pow(10, e));
  }

  @Test
  @DisplayName("U is in [0, 1) and strictly increasing in T")
  void averageDegreeIsBoundedAndIncreasing() {
    qt().withFixedSeed(SEED)
        .withExamples(2000)
        .forAll(timeFactors(), doubles().between(1e-9, 1))
        .checkAssert(
            (t, relativeStep) -> {
              double u = Terzaghi.averageDegree(t);
              double later = Terzaghi.averageDegree(t * (1 + relativeStep));
              assertThat(u).isGreaterThanOrEqualTo(0).isLessThan(1);
              assertThat(later).isGreaterThanOrEqualTo(u);
              if (u < 0.999) {
                assertThat(later).isGreaterThan(u);
              }
              assertThat(Terzaghi.averageDegreeDerivative(t)).isPositive();
            });
  }

  @Test
  @DisplayName("timeFactor(averageDegree(T)) = T to 1e-13 relative")
  void inverseRoundTrip() {
    qt().withFixedSeed(SEED)
        .withExamples(3000)
        .forAll(doubles().between(-12, 1)) // T up to 10, where 1 - U is still > 1e-11
        .checkAssert(
            e -> {
              double t = Math.pow(10, e);
              double back = Terzaghi.timeFactor(Terzaghi.averageDegree(t));
              // U carries a relative rounding of 2^-53; T(U) amplifies it by dlnT/dlnU, which is
              // 2 for small T and (4 / pi^2) / ((1 - U) T) for large T.
              double u = Terzaghi.averageDegree(t);
              double condition = Math.max(2, u / (t * Terzaghi.averageDegreeDerivative(t)));
              assertThat(back / t - 1).isCloseTo(0.0, within(4e-16 * condition + 1e-14));
            });
  }

  @Test
  @DisplayName(
      "Image and Fourier forms agree where both converge (T in [1/36, 1])"
          + " [second formula: image form with Commons Math erfc]")
  void representationsAgree() {
    qt().withFixedSeed(SEED)
        .withExamples(500)
        .forAll(doubles().between(Terzaghi.SHORT_TIME_LIMIT, 1))
        .checkAssert(
            t -> assertThat(Terzaghi.averageDegree(t)).isCloseTo(imageForm(t), within(5e-15)));
  }

  @Test
  @DisplayName(
      "U equals 1 minus the depth average of u/u0 [Commons Math Gauss-Legendre" + " quadrature]")
  void averageDegreeIsDepthAverageOfPorePressure() {
    IterativeLegendreGaussIntegrator integrator =
        new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-14);
    qt().withFixedSeed(SEED)
        .withExamples(60)
        .forAll(doubles().between(Math.log10(0.002), Math.log10(3)))
        .checkAssert(
            e -> {
              double t = Math.pow(10, e);
              // Average over the doubly drained layer Z in [0, 2], split at Z = 1 so that each
              // half is smooth.
              double half =
                  integrator.integrate(1_000_000, z -> Terzaghi.porePressureRatio(z, t), 0.0, 1.0);
              assertThat(1 - half).isCloseTo(Terzaghi.averageDegree(t), within(1e-11));
            });
  }

  @Test
  @DisplayName("u/u0 is symmetric about the mid-plane Z = 1 of a doubly drained layer")
  void porePressureIsSymmetric() {
    qt().withFixedSeed(SEED)
        .withExamples(2000)
        .forAll(integers().between(0, 1 << 20), doubles().between(-6, 1.3))
        .checkAssert(
            (k, e) -> {
              // Dyadic depths, so that 2 - z is exact and the mirror image is the same point.
              double z = k / (double) (1 << 20);
              double t = Math.pow(10, e);
              double upper = Terzaghi.porePressureRatio(z, t);
              assertThat(Terzaghi.porePressureRatio(2 - z, t)).isEqualTo(upper);
              assertThat(upper).isBetween(0.0, 1.0);
            });
  }

  @Test
  @DisplayName("u/u0 falls with time at every depth")
  void porePressureFallsWithTime() {
    qt().withFixedSeed(SEED)
        .withExamples(2000)
        .forAll(doubles().between(0.001, 1), doubles().between(-6, 1), doubles().between(0, 1))
        .checkAssert(
            (z, e, step) -> {
              double t = Math.pow(10, e);
              assertThat(Terzaghi.porePressureRatio(z, t * (1 + step)))
                  .isLessThanOrEqualTo(Terzaghi.porePressureRatio(z, t) + 1e-15);
            });
  }

  /** The image form of U with Commons Math erfc, summed without truncation shortcuts. */
  private static double imageForm(double t) {
    double root = Math.sqrt(t);
    double sum = 0;
    for (int n = 1; n <= 12; n++) {
      double x = n / root;
      double ierfc = Math.exp(-x * x) / Math.sqrt(Math.PI) - x * Erf.erfc(x);
      sum += (n % 2 == 0 ? 1 : -1) * ierfc;
    }
    return 2 * Math.sqrt(t / Math.PI) + 4 * root * sum;
  }
}
